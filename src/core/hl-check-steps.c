/* hl-check-steps.c — each check of the design, as a checker redoes it
 *
 * The formulas are those the solver uses (hl-design-codes.c, hl-solve.c,
 * hl-lame.c); the numbers put into them are the solution's own, so the
 * substituted line works out to the result shown.  The symbols follow the
 * clauses: ASME VIII-1 UG-27 writes t, P, R, S, E; EN 13445-3 7.4 writes
 * e, P, Di, De, f, z.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-check-steps"

#include "hl-config.h"
#include "hl-check-steps.h"
#include "hl-lame.h"
#include "hl-number-format.h"
#include "hl-result-rows.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <string.h>

#define TIMES " × "
#define MINUS "−"

typedef struct
{
  const HlSolution *s;
  HlUnitSystem      units;
  gboolean          locale;
  GPtrArray        *steps;
} Steps;

static void
step_free (gpointer data)
{
  HlCheckStep *st = data;

  g_free (st->title);
  g_free (st->formula);
  g_free (st->substituted);
  g_free (st->result);
  g_free (st->criterion);
  g_free (st->reason);
  g_free (st);
}

/* a quantity as the sheet prints it: 4 significant digits and its unit */
static char *
num (const Steps *c,
     double       value)
{
  /* grouped, with a true minus, as in the formulas */
  return hl_format_for_reading (value, 4, c->locale);
}

static char *
q (const Steps *c,
   double       si,
   HlRowKind    kind)
{
  g_autofree char *number = num (c, hl_row_convert (kind, c->units, si));

  return g_strdup_printf ("%s %s", number, hl_row_unit (kind, c->units));
}

static char *
len (const Steps *c,
     double       m)
{
  return q (c, m, HL_ROW_LENGTH);
}

static char *
prs (const Steps *c,
     double       pa)
{
  return q (c, pa, HL_ROW_STRESS);
}

static HlCheckStep *
add (Steps      *c,
     const char *key,
     const char *title,
     const char *formula)
{
  HlCheckStep *st = g_new0 (HlCheckStep, 1);

  st->method_key = key;
  st->title = g_strdup (title);
  st->formula = g_strdup (formula);
  st->utilisation = NAN;
  st->value = NAN;
  st->verdict = HL_CHECK_NOT_APPLICABLE;
  g_ptr_array_add (c->steps, st);
  return st;
}

static void
not_applicable (HlCheckStep *st,
                const char  *reason)
{
  st->verdict = HL_CHECK_NOT_APPLICABLE;
  st->substituted = g_strdup ("—");
  st->result = g_strdup (_("no value"));
  st->criterion = g_strdup ("—");
  st->reason = g_strdup (reason != NULL ? _(reason) : _("not computable for this shell"));
}

/* a thickness step: @t (pressure thickness, no allowances) against the
 * available wall, which is the nominal wall less corrosion and mill
 * undertolerance — t <= t_avail is the same test as the design check's
 * "nominal needed <= nominal" */
static void
thickness_verdict (Steps       *c,
                   HlCheckStep *st,
                   const char  *symbol,
                   double       t)
{
  const HlDesignCheck *dc = &c->s->check;
  g_autofree char *avail = len (c, dc->available);
  g_autofree char *nom = len (c, dc->nominal);
  g_autofree char *corr = len (c, dc->corrosion);
  g_autofree char *mill = len (c, dc->mill);

  st->value = t;
  st->utilisation = t / dc->available;
  st->verdict = t <= dc->available ? HL_CHECK_PASS : HL_CHECK_FAIL;
  st->criterion = g_strdup_printf (_("%s ≤ t available = nominal %s c %s mill = %s %s %s %s %s = %s"), symbol,
                                   MINUS, MINUS, nom, MINUS, corr, MINUS, mill, avail);
  if (st->verdict == HL_CHECK_FAIL)
    {
      g_autofree char *tt = len (c, t);

      st->reason = g_strdup_printf (_("needs %s, has %s"), tt, avail);
    }
}

/* a pressure step: the design pressure against @mawp */
static void
pressure_verdict (Steps       *c,
                  HlCheckStep *st,
                  double       mawp)
{
  double P = c->s->pi;
  g_autofree char *design = prs (c, P);
  g_autofree char *allow = prs (c, mawp);

  st->value = mawp;
  st->by_pressure = TRUE;
  st->utilisation = P / mawp;
  st->verdict = P <= mawp ? HL_CHECK_PASS : HL_CHECK_FAIL;
  st->criterion = g_strdup_printf (_("design P = %s ≤ MAWP = %s"), design, allow);
  if (st->verdict == HL_CHECK_FAIL)
    st->reason = g_strdup_printf (_("allows %s, below the design pressure %s"), allow, design);
}

/* the external pressure the allowable pressures count back, when the
 * user says it always acts */
static double
held (const Steps *c)
{
  return c->s->code_coincident ? c->s->po : 0.0;
}

static char *
held_text (const Steps *c)
{
  g_autofree char *po = prs (c, c->s->po);

  return held (c) > 0 ? g_strdup_printf (" + Po %s", po) : g_strdup ("");
}

static char *
edition_title (const Steps *c,
               const char  *clause,
               const char  *what)
{
  const char *edition = c->s->inputs.code_edition;

  /* the code's name before its clause numbers */
  const char *code = g_str_has_prefix (clause, "UG-") ? "ASME VIII-1 " : "";

  if (edition[0] != '\0')
    return g_strdup_printf ("%s%s (%s), %s", code, clause, edition, what);
  return g_strdup_printf ("%s%s, %s", code, clause, what);
}

static gboolean
outer_fixed (const Steps *c)
{
  HlSizeKind k = c->s->inputs.size_kind;

  return k == HL_SIZE_OUTER_DIAMETER || k == HL_SIZE_OUTER_RADIUS;
}

static void
ug27_thickness (Steps      *c,
                const char *clause,
                const char *what,
                const char *formula,
                double      k_se,
                double      k_p,
                gboolean    outside)
{
  const HlSolution *s = c->s;
  double P = s->code_pressure, SE = s->allowable, R = outside ? s->b : s->a;
  double S = SE / s->inputs.joint_efficiency, E = s->inputs.joint_efficiency;
  double t = P * R / (k_se * SE + k_p * P);
  g_autofree char *title = edition_title (c, clause, what);
  HlCheckStep *st = add (c, "ug27", title, formula);
  g_autofree char *pp = prs (c, P), *rr = len (c, R), *ss = prs (c, S), *ee = num (c, E), *tt = len (c, t);
  g_autofree char *kse = num (c, k_se), *kp = num (c, fabs (k_p));

  if (!hl_result_ok (s->treq_ug27))
    {
      not_applicable (st, s->treq_ug27.reason);
      return;
    }
  {
    /* "S × E" or "2 × S × E", as the clause writes the factor */
    g_autofree char *se = k_se == 1.0 ? g_strdup_printf ("%s × %s", ss, ee) : g_strdup_printf ("%s × %s × %s", kse, ss, ee);

    st->substituted = g_strdup_printf ("t = %s × %s / (%s %s %s × %s) = %s", pp, rr, se, k_p < 0 ? MINUS : "+", kp, pp,
                                       tt);
  }
  st->result = g_strdup_printf ("t = %s", tt);
  thickness_verdict (c, st, "t", t);
}

static void
ug27_mawp (Steps      *c,
           const char *clause,
           const char *formula,
           double      k_se,
           double      k_t)
{
  const HlSolution *s = c->s;
  double SE = s->allowable, S = SE / s->inputs.joint_efficiency, E = s->inputs.joint_efficiency;
  double R = s->a, t = s->t;
  double mawp = k_se * SE * t / (R + k_t * t) + held (c);
  g_autofree char *title = edition_title (c, clause, _("maximum allowable pressure of the available wall"));
  HlCheckStep *st = add (c, "ug27", title, formula);
  g_autofree char *ss = prs (c, S), *ee = num (c, E), *tt = len (c, t), *rr = len (c, R);
  g_autofree char *kse = num (c, k_se), *kt = num (c, fabs (k_t)), *mm = prs (c, mawp), *extra = held_text (c);

  if (!hl_result_ok (s->mawp_ug27))
    {
      not_applicable (st, s->mawp_ug27.reason);
      return;
    }
  st->substituted = g_strdup_printf ("MAWP = %s%s%s × %s × %s / (%s %s %s × %s)%s = %s", k_se == 1.0 ? "" : kse,
                                     k_se == 1.0 ? "" : TIMES, ss, ee, tt, rr, k_t < 0 ? MINUS : "+", kt, tt, extra,
                                     mm);
  st->result = g_strdup_printf ("MAWP = %s", mm);
  pressure_verdict (c, st, mawp);
}

static void
ug27 (Steps *c)
{
  const HlSolution *s = c->s;
  gboolean outside = outer_fixed (c);

  if (s->inputs.form == HL_FORM_SPHERE)
    {
      if (outside)
        ug27_thickness (c, "UG-27(d) / Appendix 1-1", _("spherical shell, outside radius"),
                        "t = P·Ro / (2·S·E + 0.8·P)", 2.0, 0.8, TRUE);
      else
        ug27_thickness (c, "UG-27(d)", _("spherical shell"), "t = P·R / (2·S·E − 0.2·P)", 2.0, -0.2, FALSE);
      ug27_mawp (c, "UG-27(d)", "P = 2·S·E·t / (R + 0.2·t)", 2.0, 0.2);
      return;
    }
  if (outside)
    ug27_thickness (c, "UG-27(c)(1) / Appendix 1-1", _("circumferential stress, outside radius"),
                    "t = P·Ro / (S·E + 0.4·P)", 1.0, 0.4, TRUE);
  else
    ug27_thickness (c, "UG-27(c)(1)", _("circumferential stress"), "t = P·R / (S·E − 0.6·P)", 1.0, -0.6, FALSE);
  if (s->inputs.ends == HL_ENDS_CLOSED)
    {
      if (outside)
        ug27_thickness (c, "UG-27(c)(2) / Appendix 1-1", _("longitudinal stress, outside radius"),
                        "t = P·Ro / (2·S·E + 1.4·P)", 2.0, 1.4, TRUE);
      else
        ug27_thickness (c, "UG-27(c)(2)", _("longitudinal stress"), "t = P·R / (2·S·E + 0.4·P)", 2.0, 0.4, FALSE);
    }
  ug27_mawp (c, "UG-27(c)(1)", "P = S·E·t / (R + 0.6·t)", 1.0, 0.6);
  if (s->inputs.ends == HL_ENDS_CLOSED)
    ug27_mawp (c, "UG-27(c)(2)", "P = 2·S·E·t / (R − 0.4·t)", 2.0, -0.4);
}

static void
en13445 (Steps *c)
{
  const HlSolution *s = c->s;
  gboolean sphere = s->inputs.form == HL_FORM_SPHERE, outside = outer_fixed (c);
  const char *clause = sphere ? "EN 13445-3 7.4.3" : "EN 13445-3 7.4.2";
  double k = sphere ? 4.0 : 2.0, P = s->code_pressure, fz = s->allowable;
  double f = fz / s->inputs.joint_efficiency, z = s->inputs.joint_efficiency;
  double Di = 2 * s->a, De = 2 * s->b, e = s->t;
  double ereq = outside ? P * De / (k * fz + P) : P * Di / (k * fz - P);
  double mawp = k * fz * e / (Di + e) + held (c);
  g_autofree char *title = edition_title (c, clause, _("required thickness"));
  g_autofree char *mtitle = edition_title (c, clause, _("maximum allowable pressure of the available wall"));
  g_autofree char *pp = prs (c, P), *ff = prs (c, f), *zz = num (c, z), *kk = num (c, k);
  g_autofree char *dd = len (c, outside ? De : Di), *di = len (c, Di), *ee = len (c, e), *er = len (c, ereq);
  g_autofree char *mm = prs (c, mawp), *extra = held_text (c);
  HlCheckStep *st;

  st = add (c, "en13445", title,
            sphere ? (outside ? "e = P·De / (4·f·z + P)" : "e = P·Di / (4·f·z − P)")
                   : (outside ? "e = P·De / (2·f·z + P)" : "e = P·Di / (2·f·z − P)"));
  if (!hl_result_ok (s->treq_en13445))
    not_applicable (st, s->treq_en13445.reason);
  else
    {
      st->substituted = g_strdup_printf ("e = %s × %s / (%s × %s × %s %s %s) = %s", pp, dd, kk, ff, zz,
                                         outside ? "+" : MINUS, pp, er);
      st->result = g_strdup_printf ("e = %s", er);
      thickness_verdict (c, st, "e", ereq);
    }

  st = add (c, "en13445", mtitle, sphere ? "Pmax = 4·f·z·e / (Di + e)" : "Pmax = 2·f·z·e / Dm,  Dm = Di + e");
  if (!hl_result_ok (s->mawp_en13445))
    not_applicable (st, s->mawp_en13445.reason);
  else
    {
      st->substituted = g_strdup_printf ("Pmax = %s × %s × %s × %s / (%s + %s)%s = %s", kk, ff, zz, ee, di, ee, extra,
                                         mm);
      st->result = g_strdup_printf ("Pmax = %s", mm);
      pressure_verdict (c, st, mawp);
    }
}

/* a thickness the solver found (Lamé) or worked out (thin wall): the
 * result holds the corrosion allowance, the step shows the pressure
 * thickness alone */
static void
solved_thickness (Steps      *c,
                  const char *key,
                  const char *title,
                  const char *formula,
                  HlResult    required)
{
  double corrosion = c->s->corroded ? hl_quantity_si (c->s->inputs.corrosion_allowance, HL_KIND_LENGTH) : 0.0;
  HlCheckStep *st = add (c, key, title, formula);

  if (!hl_result_ok (required))
    {
      not_applicable (st, required.reason);
      return;
    }
  {
    double t = required.value - corrosion;
    g_autofree char *tt = len (c, t), *se = prs (c, c->s->allowable), *pp = prs (c, c->s->pi);

    st->substituted = g_strdup_printf (_("at P = %s and S·E = %s: t = %s"), pp, se, tt);
    st->result = g_strdup_printf ("t = %s", tt);
    thickness_verdict (c, st, "t", t);
  }
}

/* the peak equivalent stress of the Lamé field at the design load, on
 * the surface where it is largest */
static void
lame (Steps *c)
{
  const HlSolution *s = c->s;
  gboolean tresca = s->inputs.sizing_criterion == HL_CRITERION_TRESCA;
  const HlWallPoint *in = &s->points[0], *out = &s->points[s->n_points - 1];
  double eq_in = tresca ? in->tresca : in->von_mises, eq_out = tresca ? out->tresca : out->von_mises;
  const HlWallPoint *p = eq_in >= eq_out ? in : out;
  double eq = MAX (eq_in, eq_out);
  g_autofree char *th = prs (c, p->hoop), *ra = prs (c, p->radial), *ax = prs (c, p->axial), *qq = prs (c, eq);
  g_autofree char *se = prs (c, s->allowable), *at = len (c, p->r);
  g_autofree char *title = g_strdup_printf (_("Lamé, peak %s stress at the design load (r = %s)"),
                                            tresca ? "Tresca" : "von Mises", at);
  HlCheckStep *st = add (c, "lame", title,
                         tresca ? "σT = max(|σθ − σr|, |σr − σz|, |σz − σθ|)"
                                : "σvM = √(½·[(σθ − σr)² + (σr − σz)² + (σz − σθ)²])");

  if (tresca)
    st->substituted = g_strdup_printf ("σθ = %s, σr = %s, σz = %s: σT = %s", th, ra, ax, qq);
  else
    st->substituted = g_strdup_printf ("σθ = %s, σr = %s, σz = %s: σvM = %s", th, ra, ax, qq);
  st->result = g_strdup_printf ("%s = %s", tresca ? "σT" : "σvM", qq);
  st->criterion = g_strdup_printf (_("%s ≤ S·E = %s"), tresca ? "σT" : "σvM", se);
  st->value = eq;
  st->utilisation = eq / s->allowable;
  st->verdict = eq <= s->allowable ? HL_CHECK_PASS : HL_CHECK_FAIL;
  if (st->verdict == HL_CHECK_FAIL)
    st->reason = g_strdup_printf (_("the peak stress %s is above S·E = %s"), qq, se);

  st = add (c, "lame", _("Lamé, maximum allowable pressure (external pressure held)"),
            tresca ? "MAWP: the internal pressure at which the peak σT = S·E"
                   : "MAWP: the internal pressure at which the peak σvM = S·E");
  if (!hl_result_ok (s->mawp_lame))
    not_applicable (st, s->mawp_lame.reason);
  else
    {
      g_autofree char *mm = prs (c, s->mawp_lame.value);
      g_autofree char *aa = len (c, s->a), *bb = len (c, s->b);

      st->substituted = g_strdup_printf (_("solved for the available wall, a = %s, b = %s: MAWP = %s"), aa, bb, mm);
      st->result = g_strdup_printf ("MAWP = %s", mm);
      pressure_verdict (c, st, s->mawp_lame.value);
    }
  solved_thickness (c, "lame", _("Lamé, required thickness"),
                    tresca ? "t: the wall at which the peak σT = S·E at the design load"
                           : "t: the wall at which the peak σvM = S·E at the design load",
                    s->treq_lame);
}

static void
thin (Steps *c)
{
  const HlSolution *s = c->s;
  gboolean sphere = s->inputs.form == HL_FORM_SPHERE;
  double R = hl_thin_radius (s->inputs.thin_basis, s->a, s->b), net = s->pi - s->po;
  double sigma = net * R / ((sphere ? 2.0 : 1.0) * s->t);
  /* whole titles, so a translation can decline the radius */
  const char *title = s->inputs.thin_basis == HL_BASIS_INNER ? _("thin wall, membrane stress on the inside radius")
                      : s->inputs.thin_basis == HL_BASIS_OUTER ? _("thin wall, membrane stress on the outside radius")
                                                               : _("thin wall, membrane stress on the mean radius");
  g_autofree char *pp = prs (c, net), *rr = len (c, R), *tt = len (c, s->t), *ss = prs (c, sigma);
  g_autofree char *se = prs (c, s->allowable);
  HlCheckStep *st = add (c, "thin", title, sphere ? "σ = (Pi − Po)·R / (2·t)" : "σθ = (Pi − Po)·R / t");

  if (!(net > 0))
    {
      not_applicable (st, hl_result_ok (s->mawp_thin) ? N_("no net internal pressure") : s->mawp_thin.reason);
      return;
    }
  st->substituted = g_strdup_printf (sphere ? "σ = %s × %s / (2 × %s) = %s" : "σθ = %s × %s / %s = %s", pp, rr, tt,
                                     ss);
  st->result = g_strdup_printf ("%s = %s", sphere ? "σ" : "σθ", ss);
  st->criterion = g_strdup_printf (_("%s ≤ S·E = %s"), sphere ? "σ" : "σθ", se);
  st->value = sigma;
  st->utilisation = sigma / s->allowable;
  st->verdict = sigma <= s->allowable ? HL_CHECK_PASS : HL_CHECK_FAIL;
  if (st->verdict == HL_CHECK_FAIL)
    st->reason = g_strdup_printf (_("the membrane stress %s is above S·E = %s"), ss, se);

  st = add (c, "thin", _("thin wall, maximum allowable pressure"),
            sphere ? "MAWP = 2·S·E·t / R + Po" : "MAWP = S·E·t / R + Po");
  if (!hl_result_ok (s->mawp_thin))
    not_applicable (st, s->mawp_thin.reason);
  else
    {
      g_autofree char *mm = prs (c, s->mawp_thin.value), *po = prs (c, s->po);

      st->substituted = g_strdup_printf ("MAWP = %s%s × %s / %s + %s = %s", sphere ? "2 × " : "", se, tt, rr, po, mm);
      st->result = g_strdup_printf ("MAWP = %s", mm);
      pressure_verdict (c, st, s->mawp_thin.value);
    }
  {
    /* the basis radius moves with t: R = a + α·t with the bore fixed,
     * R = b − (1 − α)·t with the outside fixed (hl-solve.c) */
    double alpha = s->inputs.thin_basis == HL_BASIS_INNER ? 0.0 : s->inputs.thin_basis == HL_BASIS_MEAN ? 0.5 : 1.0;
    gboolean outside = outer_fixed (c);
    double k = outside ? 1.0 - alpha : alpha;
    g_autofree char *kk = num (c, k);
    g_autofree char *load = k == 0.0 ? g_strdup ("") : k == 1.0 ? g_strdup_printf (" %s P", outside ? "+" : MINUS)
                                                     : g_strdup_printf (" %s %s·P", outside ? "+" : MINUS, kk);
    g_autofree char *formula = g_strdup_printf ("t = P·%s / (%sS·E%s)", outside ? "b" : "a", sphere ? "2·" : "", load);

    solved_thickness (c, "thin", _("thin wall, required thickness"), formula, s->treq_thin);
  }
}

static void
floors (Steps *c)
{
  const HlSolution *s = c->s;
  const HlDesignCheck *dc = &c->s->check;
  gboolean tresca = s->inputs.sizing_criterion == HL_CRITERION_TRESCA;
  double peak = hl_lame_peak_equivalent (&s->lame, s->inputs.sizing_criterion);
  gboolean von_mises_collapse = hl_result_ok (s->plastic_collapse);
  HlResult pc = von_mises_collapse ? s->plastic_collapse : s->plastic_collapse_tresca;
  gboolean sphere = s->inputs.form == HL_FORM_SPHERE;
  g_autofree char *qq = prs (c, peak), *sy = prs (c, s->yield), *aa = len (c, s->a), *bb = len (c, s->b);
  g_autofree char *extra = NULL;
  HlCheckStep *st;

  st = add (c, "yield", _("first yield at the design load (Lamé, the sizing criterion)"),
            tresca ? "peak σT ≤ Sy" : "peak σvM ≤ Sy");
  st->substituted = g_strdup_printf ("%s = %s, Sy = %s", tresca ? "σT" : "σvM", qq, sy);
  st->result = g_strdup_printf ("%s = %s", tresca ? "σT" : "σvM", qq);
  st->criterion = g_strdup_printf ("%s ≤ Sy = %s", tresca ? "σT" : "σvM", sy);
  st->value = peak;
  st->utilisation = peak / s->yield;
  st->verdict = dc->yields ? HL_CHECK_FAIL : HL_CHECK_PASS;
  if (dc->yields)
    st->reason = g_strdup (_("the wall yields at the design load"));

  st = add (c, "collapse", _("plastic collapse (Hill 1950, perfectly plastic wall, external pressure held)"),
            sphere ? "Pc = 2·Sy·ln(b/a) + Po"
                   : von_mises_collapse ? "Pc = (2/√3)·Sy·ln(b/a) + Po" : "Pc = Sy·ln(b/a) + Po (Tresca)");
  if (!hl_result_ok (pc))
    {
      not_applicable (st, pc.reason);
      return;
    }
  {
    g_autofree char *po = prs (c, s->po), *pcs = prs (c, pc.value), *design = prs (c, s->pi);

    extra = g_strdup_printf ("%s × %s × ln(%s / %s) + %s = %s",
                             sphere ? "2" : von_mises_collapse ? "(2/√3)" : "1", sy, bb, aa, po, pcs);
    st->substituted = g_strdup_printf ("Pc = %s", extra);
    st->result = g_strdup_printf ("Pc = %s", pcs);
    st->criterion = g_strdup_printf (_("design P = %s < Pc = %s"), design, pcs);
    st->value = pc.value;
    st->utilisation = s->pi / pc.value;
    st->verdict = dc->bursts ? HL_CHECK_FAIL : HL_CHECK_PASS;
    if (dc->bursts)
      st->reason = g_strdup (_("the wall would burst"));
  }
}

/* A method the design check finds not applicable (out of its range,
 * net external pressure) shows no OK in any of its steps. */
static void
follow_method_results (Steps *c)
{
  const HlDesignCheck *dc = &c->s->check;

  for (guint i = 0; i < c->steps->len; i++)
    {
      HlCheckStep *st = g_ptr_array_index (c->steps, i);

      for (int m = 0; m < HL_N_METHODS; m++)
        if (dc->methods[m].key != NULL && strcmp (dc->methods[m].key, st->method_key) == 0
            && dc->methods[m].result == HL_CHECK_NOT_APPLICABLE && st->verdict != HL_CHECK_NOT_APPLICABLE)
          {
            st->verdict = HL_CHECK_NOT_APPLICABLE;
            st->utilisation = NAN;
            g_free (st->criterion);
            st->criterion = g_strdup ("—");
            g_free (st->reason);
            st->reason = g_strdup (_(dc->methods[m].reason));
          }
    }
}

/* The governing step: the floor that fails, else the basis method's
 * step the design check's utilisation is read from — its allowable
 * pressure where it has one (the lowest, so the highest utilisation),
 * else its thickness. */
static void
mark_governing (Steps *c)
{
  const HlDesignCheck *dc = &c->s->check;
  const HlMethodCheck *basis = &dc->methods[dc->basis];
  const char *floor_key = dc->bursts ? "collapse" : dc->yields ? "yield" : NULL;
  gboolean by_pressure = isfinite (basis->utilisation_pressure);
  HlCheckStep *best = NULL;

  for (guint i = 0; i < c->steps->len; i++)
    {
      HlCheckStep *st = g_ptr_array_index (c->steps, i);

      if (floor_key != NULL)
        {
          if (strcmp (st->method_key, floor_key) == 0)
            best = st;
          continue;
        }
      if (strcmp (st->method_key, basis->key) != 0)
        continue;
      if (basis->result == HL_CHECK_NOT_APPLICABLE)
        {
          /* the first step says why the basis does not apply */
          if (best == NULL)
            best = st;
          continue;
        }
      if (st->by_pressure != by_pressure || !isfinite (st->utilisation))
        continue;
      if (best == NULL || st->utilisation > best->utilisation)
        best = st;
    }
  if (best != NULL)
    best->governing = TRUE;
}

GPtrArray *
hl_check_steps (const HlSolution *solution,
                HlUnitSystem      units,
                gboolean          locale_numbers)
{
  Steps c = { solution, units, locale_numbers, g_ptr_array_new_with_free_func (step_free) };

  g_return_val_if_fail (solution != NULL, c.steps);

  ug27 (&c);
  en13445 (&c);
  lame (&c);
  thin (&c);
  floors (&c);
  follow_method_results (&c);
  mark_governing (&c);
  return c.steps;
}

const char *
hl_check_step_word (HlCheckResult verdict)
{
  switch (verdict)
    {
    case HL_CHECK_PASS:
      return _("OK");
    case HL_CHECK_FAIL:
      return _("NOT OK");
    case HL_CHECK_NOT_APPLICABLE:
    default:
      return _("NOT APPLICABLE");
    }
}
