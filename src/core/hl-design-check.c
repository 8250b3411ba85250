/* hl-design-check.c — does the wall pass: every method against the
 * design pressure, the design basis deciding
 *
 * A method with no value for this wall (outside its range, or under net
 * external pressure) is NOT APPLICABLE with its reason and never
 * decides PASS: a basis that cannot be applied leaves the wall not
 * shown to pass, which is a FAIL.  Yield at the bore and plastic
 * collapse fail the wall whatever the basis says.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-design-check"

#include "hl-config.h"
#include "hl-design-check.h"

#include <glib/gi18n-lib.h>
#include "hl-number-format.h"

#include <math.h>

static const struct
{
  const char *key;
  const char *name;
} method_names[HL_N_METHODS] = {
  [HL_METHOD_UG27] = { "ug27", N_ ("ASME VIII-1 UG-27") },
  [HL_METHOD_EN13445] = { "en13445", N_ ("EN 13445-3 7.4") },
  [HL_METHOD_LAME] = { "lame", N_ ("Lamé elastic") },
  [HL_METHOD_THIN] = { "thin", N_ ("thin wall") },
};

const char *
hl_check_result_to_string (HlCheckResult result)
{
  switch (result)
    {
    case HL_CHECK_PASS:
      return "pass";
    case HL_CHECK_FAIL:
      return "fail";
    case HL_CHECK_NOT_APPLICABLE:
    default:
      return "n/a";
    }
}

const char *
hl_check_result_word (HlCheckResult result)
{
  switch (result)
    {
    case HL_CHECK_PASS:
      return "PASS";
    case HL_CHECK_FAIL:
      return "FAIL";
    case HL_CHECK_NOT_APPLICABLE:
    default:
      return "NOT APPLICABLE";
    }
}

const char *
hl_design_basis_name (HlDesignBasis basis)
{
  return basis < (HlDesignBasis) HL_N_METHODS ? method_names[basis].name : method_names[0].name;
}

static char *
mm (double metres)
{
  return hl_format_significant (metres * 1e3, 4);
}

static char *
mpa (double pascals)
{
  return hl_format_significant (pascals / 1e6, 4);
}

/* The nominal wall a pressure thickness @treq (corrosion included) needs
 * when the mill may take a length, or a fraction of the nominal wall
 * itself: t_nom (1 - f) >= treq, so t_nom = treq / (1 - f). */
static double
nominal_needed (const HlDesignCheckInputs *in,
                double                     treq)
{
  return MAX (treq + in->mill_length, treq / (1.0 - in->mill_percent));
}

static void
check_method (const HlDesignCheckInputs *in,
              HlCheckMethod              m,
              double                     available,
              HlMethodCheck             *out)
{
  const HlMethodInput *mi = &in->methods[m];
  gboolean short_wall, over_pressure;

  out->key = method_names[m].key;
  out->name = method_names[m].name;
  out->clause = mi->clause != NULL ? mi->clause : method_names[m].name;
  out->nominal = in->nominal;
  out->available = available;
  out->design_pressure = in->design_pressure;
  out->required = mi->required_reason == NULL && isfinite (mi->required) ? nominal_needed (in, mi->required) : NAN;
  out->mawp = mi->mawp_reason == NULL && isfinite (mi->mawp) ? mi->mawp : NAN;
  out->utilisation_pressure = isfinite (out->mawp) && out->mawp > 0 ? in->design_pressure / out->mawp : NAN;
  out->utilisation_thickness = isfinite (out->required) ? (mi->required - in->corrosion) / available : NAN;
  out->reason[0] = '\0';

  /* out of range is not extended: no PASS without both values */
  if (!isfinite (out->required) || !isfinite (out->mawp))
    {
      /* neither half of an out-of-range formula is shown as a check */
      out->result = HL_CHECK_NOT_APPLICABLE;
      out->required = out->mawp = NAN;
      out->utilisation_pressure = out->utilisation_thickness = NAN;
      g_strlcpy (out->reason, mi->required_reason != NULL ? mi->required_reason
                              : mi->mawp_reason != NULL ? mi->mawp_reason : "not computable for this shell",
                 sizeof out->reason);
      return;
    }
  short_wall = out->required > in->nominal;
  over_pressure = in->design_pressure > out->mawp;
  if (!short_wall && !over_pressure)
    {
      out->result = HL_CHECK_PASS;
      return;
    }
  out->result = HL_CHECK_FAIL;
  {
    g_autofree char *need = mm (out->required);
    g_autofree char *have = mm (in->nominal);
    g_autofree char *allow = mpa (out->mawp);
    g_autofree char *design = mpa (in->design_pressure);

    if (short_wall && over_pressure)
      g_snprintf (out->reason, sizeof out->reason,
                  "needs %s mm nominal, has %s mm; allows %s MPa below the design pressure %s MPa", need, have, allow,
                  design);
    else if (short_wall)
      g_snprintf (out->reason, sizeof out->reason, "needs %s mm nominal, has %s mm", need, have);
    else
      g_snprintf (out->reason, sizeof out->reason, "allows %s MPa below the design pressure %s MPa", allow, design);
  }
}

static void
put_verdict (const HlDesignCheckInputs *in,
             HlDesignCheck             *c)
{
  const HlMethodCheck *b = &c->methods[c->basis];

  if (c->bursts)
    {
      g_autofree char *p = mpa (in->design_pressure);
      g_autofree char *pc = mpa (in->collapse);

      g_strlcpy (c->governing, "plastic collapse (Hill 1950)", sizeof c->governing);
      g_snprintf (c->verdict_text, sizeof c->verdict_text,
                  "FAIL: the wall would burst: the design pressure %s MPa is above the plastic collapse pressure "
                  "%s MPa", p, pc);
    }
  else if (c->yields)
    {
      g_autofree char *peak = mpa (in->peak_equivalent);
      g_autofree char *sy = mpa (in->yield);

      g_strlcpy (c->governing, "yield at the bore (Lamé)", sizeof c->governing);
      g_snprintf (c->verdict_text, sizeof c->verdict_text,
                  "FAIL: the wall yields at the bore: the peak equivalent stress %s MPa is above the yield "
                  "strength %s MPa", peak, sy);
    }
  else if (b->result == HL_CHECK_NOT_APPLICABLE)
    {
      g_strlcpy (c->governing, b->clause, sizeof c->governing);
      g_snprintf (c->verdict_text, sizeof c->verdict_text,
                  "FAIL: not shown to pass: the design basis (%s) does not apply: %s", b->name, b->reason);
    }
  else
    {
      g_autofree char *u = hl_format_significant (100 * c->utilisation, 4);

      g_strlcpy (c->governing, b->clause, sizeof c->governing);
      if (b->result == HL_CHECK_PASS)
        g_snprintf (c->verdict_text, sizeof c->verdict_text, "PASS: utilisation %s %% by %s", u, b->clause);
      else
        g_snprintf (c->verdict_text, sizeof c->verdict_text, "FAIL: utilisation %s %% by %s: %s", u, b->clause,
                    b->reason);
    }
  c->verdict = !c->bursts && !c->yields && b->result == HL_CHECK_PASS ? HL_CHECK_PASS : HL_CHECK_FAIL;
}

void
hl_design_check_run (const HlDesignCheckInputs *in,
                     HlDesignCheck             *c)
{
  const HlMethodCheck *b;

  g_return_if_fail (in != NULL && c != NULL);

  *c = (HlDesignCheck) { 0 };
  c->basis = in->basis < (HlDesignBasis) HL_N_METHODS ? in->basis : HL_DESIGN_BASIS_UG27;
  c->nominal = in->nominal;
  c->corrosion = in->corrosion;
  c->mill = in->mill;
  c->available = in->nominal - in->corrosion - in->mill;
  {
    g_autofree char *m = mm (in->mill);
    g_autofree char *pct = hl_format_significant (100 * in->mill_percent, 4);
    g_autofree char *len = mm (in->mill_length);

    if (in->mill_percent > 0 && in->mill_length > 0)
      g_snprintf (c->mill_text, sizeof c->mill_text, "%s mm, the larger of %s %% of nominal and %s mm", m, pct, len);
    else if (in->mill_percent > 0)
      g_snprintf (c->mill_text, sizeof c->mill_text, "%s mm = %s %% of nominal", m, pct);
    else
      g_snprintf (c->mill_text, sizeof c->mill_text, "%s mm", m);
  }
  for (int m = 0; m < HL_N_METHODS; m++)
    check_method (in, (HlCheckMethod) m, c->available, &c->methods[m]);

  b = &c->methods[c->basis];
  c->utilisation = isfinite (b->utilisation_pressure) ? b->utilisation_pressure : b->utilisation_thickness;
  c->yields = in->peak_equivalent > in->yield;
  c->bursts = isfinite (in->collapse) && in->design_pressure > in->collapse;
  put_verdict (in, c);
}
