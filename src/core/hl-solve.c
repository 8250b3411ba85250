/* hl-solve.c — inputs in, complete solution out
 *
 * The only place formulas are combined into results; the window, the
 * figure and the command line read the solution and never recompute.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-solve"

#include "hl-config.h"
#include "hl-solution.h"
#include "hl-shell-check.h"
#include "hl-sizing.h"
#include "hl-design-codes.h"
#include "hl-number-format.h"
#include "hl-test-pressure.h"

#include <glib/gi18n-lib.h>
#include <math.h>

#define RULE_OF_THUMB_RATIO 10.0   /* common practice: R/t >= 10 is thin */
/* until the external-pressure checks exist, no internal-pressure sizing
 * stands in for them */
#define BUCKLING_GOVERNS N_("buckling governs; see the external-pressure check")

G_DEFINE_QUARK (hl-solve-error-quark, hl_solve_error)

G_STATIC_ASSERT (G_N_ELEMENTS (((HlSolution *) NULL)->test_sources) == HL_TEST_N_RULES);

static HlResult
ok (double value)
{
  HlResult r = { value, NULL };

  if (!isfinite (value))
    {
      r.value = NAN;
      r.reason = N_("not computable for this shell");
    }
  return r;
}

static HlResult
na (const char *reason)
{
  HlResult r = { NAN, reason };

  return r;
}

gboolean
hl_result_ok (HlResult r)
{
  return r.reason == NULL && isfinite (r.value);
}

static void
warn (HlSolution *s,
      const char *format,
      ...) G_GNUC_PRINTF (2, 3);

static void
warn (HlSolution *s,
      const char *format,
      ...)
{
  va_list args;

  va_start (args, format);
  g_ptr_array_add (s->warnings, g_strdup_vprintf (format, args));
  va_end (args);
}

static void
fill_points (HlSolution *s)
{
  double R = hl_thin_radius (s->inputs.thin_basis, s->a, s->b);
  double thin_hoop = hl_thin_hoop (s->inputs.form, s->pi - s->po, R, s->t);
  double thin_axial = hl_thin_axial (s->inputs.form, s->inputs.ends, s->lame.nu, thin_hoop);

  for (guint i = 0; i < s->n_points; i++)
    {
      HlWallPoint *p = &s->points[i];
      HlStress st;

      /* last point exactly on b, not a + t*(n-1)/(n-1) rounded */
      p->r = i + 1 == s->n_points ? s->b : s->a + s->t * i / (s->n_points - 1);
      st = hl_lame_stress (&s->lame, p->r);
      p->hoop = st.hoop;
      p->radial = st.radial;
      p->axial = st.axial;
      p->von_mises = hl_von_mises (st);
      p->tresca = hl_tresca (st);
      p->thin_hoop = thin_hoop;
      p->thin_axial = thin_axial;
    }
}

/* The thin-wall value against the Lamé peak in words, by magnitude:
 * error e = 100 (thin - exact) / |exact|, so thin / exact is 1 + e/100
 * for a positive peak and 1 - e/100 for a negative one (compression),
 * where a positive error means a smaller magnitude. */
static void
thin_wording (HlSolution *s,
              double      error,
              double      exact)
{
  double r = exact < 0 ? 1 - error / 100 : 1 + error / 100;
  g_autofree char *by = hl_format_significant (100 * fabs (1 - r), 3);
  gsize size = sizeof s->thin_words;
  char *buf = s->thin_words;

  s->thin_wording_by = 100 * fabs (1 - r);
  if (!isfinite (error) || exact == 0.0)
    {
      s->thin_wording = HL_THIN_WORDING_NOT_COMPARABLE;
      g_strlcpy (buf, "cannot be compared with the Lamé peak", size);
    }
  else if (r < 0)
    {
      s->thin_wording = HL_THIN_WORDING_OPPOSITE_SIGN;
      g_strlcpy (buf, "has the opposite sign of the Lamé peak (unconservative)", size);
    }
  else if (r < 1)
    {
      s->thin_wording = HL_THIN_WORDING_UNDER;
      g_snprintf (buf, size, "underestimates the peak by %s %% (unconservative)", by);
    }
  else if (r > 1)
    {
      s->thin_wording = HL_THIN_WORDING_OVER;
      g_snprintf (buf, size, "overestimates the peak by %s %% (conservative)", by);
    }
  else
    {
      s->thin_wording = HL_THIN_WORDING_EQUAL;
      g_strlcpy (buf, "equals the peak", size);
    }
}

static void
solve_membrane_and_lame (HlSolution *s)
{
  const HlShellInputs *in = &s->inputs;
  double R = hl_thin_radius (in->thin_basis, s->a, s->b);
  double hoop = hl_thin_hoop (in->form, s->pi - s->po, R, s->t);
  HlStress inner = hl_lame_stress (&s->lame, s->a);
  HlStress outer = hl_lame_stress (&s->lame, s->b);
  double err_hoop, err_eq, chosen;

  s->thin_hoop = ok (hoop);
  /* a sphere has no axis: neither the thin nor the Lamé axial stress
   * exists (both tangential stresses are the hoop stress) */
  if (in->form == HL_FORM_SPHERE)
    s->thin_axial = na (N_("a sphere has two equal tangential stresses: see the hoop stress"));
  else
    s->thin_axial = ok (hl_thin_axial (in->form, in->ends, s->lame.nu, hoop));
  s->lame_hoop_inner = ok (inner.hoop);
  s->lame_hoop_outer = ok (outer.hoop);
  s->lame_radial_inner = ok (inner.radial);
  s->lame_radial_outer = ok (outer.radial);
  if (in->form == HL_FORM_SPHERE)
    s->lame_axial = na (N_("a sphere has two equal tangential stresses: see the hoop stress"));
  else
    s->lame_axial = ok (inner.axial);

  err_hoop = hl_thin_wall_error (&s->lame, in->thin_basis, HL_MEASURE_HOOP);
  err_eq = hl_thin_wall_error (&s->lame, in->thin_basis, HL_MEASURE_EQUIVALENT);
  s->thin_wall_error = isfinite (err_hoop) ? ok (err_hoop) : na (N_("no hoop stress under this load"));
  s->thin_wall_error_equivalent = isfinite (err_eq) ? ok (err_eq) : na (N_("no equivalent stress under this load"));
  /* "both": the larger error decides, and a missing one leaves the wall
   * not shown to be thin */
  if (in->verdict_measure == HL_MEASURE_EQUIVALENT
      || (in->verdict_measure == HL_MEASURE_BOTH && !(fabs (err_hoop) >= fabs (err_eq))))
    s->thin_governing = HL_MEASURE_EQUIVALENT;
  else
    s->thin_governing = HL_MEASURE_HOOP;
  chosen = s->thin_governing == HL_MEASURE_EQUIVALENT ? err_eq : err_hoop;
  s->is_thin = isfinite (chosen) && fabs (chosen) <= s->tolerance
               && (in->verdict_measure != HL_MEASURE_BOTH || (isfinite (err_hoop) && isfinite (err_eq)));
  thin_wording (s, chosen, s->thin_governing == HL_MEASURE_HOOP ? hl_lame_peak_hoop (&s->lame) : 1.0);
  s->rule_of_thumb = s->mean_ratio >= RULE_OF_THUMB_RATIO;

  {
    double ratio;
    const char *reason = NULL;

    if (hl_ratio_for_tolerance (&s->lame, in->thin_basis, in->verdict_measure, s->tolerance, &ratio, &reason))
      s->ratio_for_tolerance = ok (ratio);
    else
      s->ratio_for_tolerance = na (reason);
  }

  s->von_mises_max = ok (hl_lame_peak_equivalent (&s->lame, HL_CRITERION_VON_MISES));
  s->tresca_max = ok (hl_lame_peak_equivalent (&s->lame, HL_CRITERION_TRESCA));
  {
    double ua = hl_lame_displacement (&s->lame, s->a);

    s->displacement_inner = ok (ua);
    s->displacement_outer = ok (hl_lame_displacement (&s->lame, s->b));
    s->thin_growth_mean = ok (hl_thin_growth (in->form, in->ends, s->pi - s->po, (s->a + s->b) / 2,
                                              s->t, s->lame.E, s->lame.nu));
    /* bore volume strain, small strains: 2 u/a + axial strain (cylinder),
     * 3 u/a (sphere) */
    if (in->form == HL_FORM_SPHERE)
      s->volume_strain = ok (3 * ua / s->a);
    else
      s->volume_strain = ok (2 * ua / s->a + hl_lame_axial_strain (&s->lame));
  }
}

static void
solve_yield_and_collapse (HlSolution *s)
{
  const HlShellInputs *in = &s->inputs;
  double value;
  const char *reason = NULL;

  /* one load path for first yield, collapse and the allowable pressure:
   * the internal pressure raised, the external held at its value */
  if (s->pi == s->po && s->pi > 0.0)
    {
      s->first_yield_von_mises = na (N_("no deviatoric stress: the internal and external pressures are equal"));
      s->first_yield_tresca = s->first_yield_von_mises;
    }
  else
    {
      s->first_yield_von_mises = hl_lame_max_pressure (&s->lame, HL_CRITERION_VON_MISES, s->yield, &value, &reason)
                                   ? ok (value) : na (reason);
      s->first_yield_tresca = hl_lame_max_pressure (&s->lame, HL_CRITERION_TRESCA, s->yield, &value, &reason)
                                ? ok (value) : na (reason);
    }

  /* Hill (1950): perfectly plastic wall, internal pressure over the
   * external one */
  if (in->form == HL_FORM_SPHERE)
    s->plastic_collapse = ok (s->po + 2 * s->yield * log (s->k));
  else if (in->ends != HL_ENDS_OPEN)
    /* closed ends and plane strain: the axial stress is the mean of the
     * other two in the incompressible plastic state (Hill 1950) */
    s->plastic_collapse = ok (s->po + 2 / sqrt (3) * s->yield * log (s->k));
  else
    s->plastic_collapse = na (N_("no closed form for open ends (von Mises)"));
  /* Tresca: the yield condition does not involve the axial stress, so the
   * cylinder result holds for every end condition */
  if (in->form == HL_FORM_SPHERE)
    s->plastic_collapse_tresca = ok (s->po + 2 * s->yield * log (s->k));
  else
    s->plastic_collapse_tresca = ok (s->po + s->yield * log (s->k));
}

/* the clause with the edition the user names, and the pressure the
 * formula took, for the labels of every output */
static void
code_source (const HlSolution *s,
             char             *buf,
             gsize             size,
             const char       *clause)
{
  const char *edition = s->inputs.code_edition;

  g_snprintf (buf, size, "%s%s%s%s; %s", clause, edition[0] ? " (" : "", edition, edition[0] ? ")" : "",
              s->code_coincident ? "P = internal - external (external always coincident)"
                                 : "P = internal design pressure alone");
}

static void
solve_allowables (HlSolution *s)
{
  const HlShellInputs *in = &s->inputs;
  gboolean outer_fixed = in->size_kind == HL_SIZE_OUTER_DIAMETER || in->size_kind == HL_SIZE_OUTER_RADIUS;
  double c = hl_quantity_si (in->corrosion_allowance, HL_KIND_LENGTH);
  double allow = s->allowable, net = s->pi - s->po;
  gboolean net_external = s->po > s->pi;
  /* membrane capacity per unit radius-over-thickness: sigma = p R / (f t) */
  double f = in->form == HL_FORM_SPHERE ? 2.0 : 1.0;
  double alpha = in->thin_basis == HL_BASIS_INNER ? 0.0 : in->thin_basis == HL_BASIS_MEAN ? 0.5 : 1.0;
  double value;
  const char *reason = NULL;

  /* the required thicknesses hold the corrosion allowance; the design
   * check adds the mill undertolerance (a share of the nominal wall it
   * finds) */
  if (!s->corroded)
    c = 0.0;
  s->mawp_thin = ok (s->po + f * allow * s->t / hl_thin_radius (in->thin_basis, s->a, s->b));

  /* thin required thickness with the entered radius fixed and the basis
   * radius moving with t: inner fixed Rb = a + alpha t, outer fixed
   * Rb = b - (1 - alpha) t */
  if (net_external)
    s->treq_thin = na (BUCKLING_GOVERNS);
  else if (!(net > 0))
    s->treq_thin = na (N_("no net internal pressure (external-pressure rules apply, not checked)"));
  else if (outer_fixed)
    s->treq_thin = ok (net * s->b / (f * allow + (1 - alpha) * net) + c);
  else if (f * allow - alpha * net <= 0)
    s->treq_thin = na (N_("the allowable is below what any thickness can carry"));
  else
    s->treq_thin = ok (net * s->a / (f * allow - alpha * net) + c);

  if (hl_lame_max_pressure (&s->lame, in->sizing_criterion, allow, &value, &reason))
    s->mawp_lame = ok (value);
  else
    s->mawp_lame = na (reason);
  if (net_external)
    s->treq_lame = na (BUCKLING_GOVERNS);
  else if (hl_lame_required_wall (&s->lame, outer_fixed, in->sizing_criterion, allow, &value, &reason))
    s->treq_lame = ok (value + c);
  else
    s->treq_lame = na (reason);

  {
    /* the code formulas take the internal design pressure alone: an
     * external pressure that can be lost must not thin the wall.  Only
     * when it always acts do they see the difference, and then the
     * allowable pressure counts it back. */
    double held = s->code_coincident ? s->po : 0.0;
    HlCodeWall wall = { in->form, in->ends, outer_fixed, s->a, s->b, c, s->code_pressure, allow };
    HlCodeResult ug = hl_code_ug27 (&wall);
    HlCodeResult en = hl_code_en13445 (&wall);

    s->treq_ug27 = net_external ? na (BUCKLING_GOVERNS) : ug.treq_reason ? na (ug.treq_reason) : ok (ug.treq);
    s->mawp_ug27 = ug.mawp_reason ? na (ug.mawp_reason) : ok (ug.mawp + held);
    s->ug27_clause = ug.clause;
    s->treq_en13445 = net_external ? na (BUCKLING_GOVERNS) : en.treq_reason ? na (en.treq_reason) : ok (en.treq);
    s->mawp_en13445 = en.mawp_reason ? na (en.mawp_reason) : ok (en.mawp + held);
    s->en13445_clause = en.clause;
    code_source (s, s->ug27_source, sizeof s->ug27_source, ug.clause);
    code_source (s, s->en13445_source, sizeof s->en13445_source, en.clause);
    if (ug.out_of_range)
      warn (s, N_("this wall is outside the range of the UG-27 formulas: use the code's thick-shell rules"));
    if (en.out_of_range)
      warn (s, N_("this wall is outside the range of EN 13445-3 7.4 (e/De <= 0.16): use the code's thick-shell rules"));
  }
  if (in->form == HL_FORM_CYLINDER)
    s->barlow_pressure = ok (s->po + 2 * allow * s->t / (2 * s->b));
  else
    s->barlow_pressure = na (N_("Barlow's formula is for pipe (cylinders)"));
}

static void
method_input (HlMethodInput *m,
              HlResult       required,
              HlResult       mawp,
              const char    *clause)
{
  m->required = required.value;
  m->required_reason = hl_result_ok (required) ? NULL : required.reason != NULL ? required.reason
                                                                                 : "not computable for this shell";
  m->mawp = mawp.value;
  m->mawp_reason = hl_result_ok (mawp) ? NULL : mawp.reason != NULL ? mawp.reason : "not computable for this shell";
  m->clause = clause;
}

static void
solve_design_check (HlSolution *s)
{
  const HlShellInputs *in = &s->inputs;
  HlDesignCheckInputs d = { 0 };

  d.basis = in->design_basis;
  d.nominal = hl_quantity_si (in->wall_thickness, HL_KIND_LENGTH);
  d.corrosion = s->corroded ? hl_quantity_si (in->corrosion_allowance, HL_KIND_LENGTH) : 0.0;
  d.mill = s->mill;
  d.mill_percent = s->corroded ? hl_quantity_si (in->mill_tolerance_percent, HL_KIND_PERCENT) : 0.0;
  d.mill_length = s->corroded ? hl_quantity_si (in->mill_tolerance, HL_KIND_LENGTH) : 0.0;
  d.design_pressure = s->pi;
  method_input (&d.methods[HL_METHOD_UG27], s->treq_ug27, s->mawp_ug27, s->ug27_clause);
  method_input (&d.methods[HL_METHOD_EN13445], s->treq_en13445, s->mawp_en13445, s->en13445_clause);
  method_input (&d.methods[HL_METHOD_LAME], s->treq_lame, s->mawp_lame,
                in->sizing_criterion == HL_CRITERION_TRESCA ? "Lamé, Tresca = S Ej" : "Lamé, von Mises = S Ej");
  method_input (&d.methods[HL_METHOD_THIN], s->treq_thin, s->mawp_thin,
                in->form == HL_FORM_SPHERE ? "thin wall, p R / 2t = S Ej" : "thin wall, p R / t = S Ej");
  d.peak_equivalent = hl_lame_peak_equivalent (&s->lame, in->sizing_criterion);
  d.yield = s->yield;
  d.collapse = hl_result_ok (s->plastic_collapse) ? s->plastic_collapse.value
               : hl_result_ok (s->plastic_collapse_tresca) ? s->plastic_collapse_tresca.value : NAN;
  hl_design_check_run (&d, &s->check);
}

/* The pressure the ASME test rules multiply: the MAWP of the design
 * basis's own method, where it has one (@words names it; NULL: UG-27's).  The EN basis has no ASME MAWP
 * of its own, so the ASME rules take UG-27's there too (the EN rule
 * takes Pd).  Without one the design pressure stands in, as the
 * footnote to UG-99(b) allows. */
static HlResult
test_mawp (const HlSolution *s,
           const char      **words)
{
  switch (s->inputs.design_basis)
    {
    case HL_DESIGN_BASIS_LAME:
      *words = s->inputs.sizing_criterion == HL_CRITERION_TRESCA ? "MAWP of the Lamé basis (peak Tresca = S Ej)"
                                                                  : "MAWP of the Lamé basis (peak von Mises = S Ej)";
      return s->mawp_lame;
    case HL_DESIGN_BASIS_THIN:
      *words = "MAWP of the thin-wall basis (membrane stress = S Ej)";
      return s->mawp_thin;
    case HL_DESIGN_BASIS_UG27:
    case HL_DESIGN_BASIS_EN13445:
    default:
      *words = NULL;
      return s->mawp_ug27;
    }
}

static void
test_source (HlSolution *s,
             HlTestRule  rule,
             const char *pressure_words)
{
  const HlTestRulePressure *r = &s->test->rules[rule];
  g_autofree char *lsr = hl_format_significant (s->inputs.test_stress_ratio, 6);

  g_snprintf (s->test_sources[rule], sizeof s->test_sources[rule], "%s%s%s%s; %s; %s = %s%s%s", r->data->formula,
              r->edition != NULL ? " (" : "", r->edition != NULL ? r->edition : "", r->edition != NULL ? ")" : "",
              pressure_words, rule == HL_TEST_EN13445_HYDROSTATIC ? "fa/fTd" : "LSR", lsr,
              r->governing_words != NULL ? "; " : "", r->governing_words != NULL ? r->governing_words : "");
}

static HlCheckResult
test_check (const HlTestPressure *t)
{
  HlTestVerdict m = t->membrane.verdict, p = t->peak.verdict;

  if (m == HL_TEST_CHECK_FAIL || p == HL_TEST_CHECK_FAIL)
    return HL_CHECK_FAIL;
  if (m == HL_TEST_CHECK_PASS || p == HL_TEST_CHECK_PASS)
    return HL_CHECK_PASS;
  return HL_CHECK_NOT_APPLICABLE;
}

/* Every test rule's pressure and the stress check at the chosen one's,
 * on the analysis wall (METHODS-NEXT §E) */
static void
solve_test_pressure (HlSolution *s)
{
  const HlShellInputs *in = &s->inputs;
  HlTestInputs t = hl_test_inputs_default ();
  const char *mawp_words = NULL;
  HlResult mawp = test_mawp (s, &mawp_words);
  double ps = hl_quantity_si (in->test_ps, HL_KIND_STRESS);
  HlLame unit;
  char asme[200], en[200];
  g_autofree char *ps_words = NULL;

  s->test_mawp_is_design_pressure = !hl_result_ok (mawp);
  s->test_mawp = s->test_mawp_is_design_pressure ? s->pi : mawp.value;
  s->test_ps = ps > 0 ? ps : s->pi;
  t.mawp = s->test_mawp;
  t.mawp_is_design_pressure = s->test_mawp_is_design_pressure;
  t.design_pressure = s->pi;
  t.ps = s->test_ps;
  t.stress_ratio = in->test_stress_ratio;
  /* the yield strength as entered stands for the one at test
   * temperature: a test runs near ambient, where it is not lower */
  t.yield_at_test = s->yield;
  t.rule = (HlTestRule) CLAMP (in->test_rule, 0, HL_TEST_N_RULES - 1);
  t.asme_edition = in->code_edition;
  t.en_edition = in->code_edition;
  t.form = in->form;
  t.inner_radius = s->a;
  t.thickness = s->t;
  /* Lamé is linear in the pressure: the peak at 1 Pa inside alone,
   * the outside at atmosphere as in the test */
  hl_lame_init (&unit, in->form, in->ends, s->a, s->b, 1.0, 0.0, s->lame.E, s->lame.nu);
  t.peak_equivalent_per_pa = hl_lame_peak_equivalent (&unit, HL_CRITERION_VON_MISES);
  s->test = hl_test_pressure_new (&t);
  s->test_check = test_check (s->test);

  if (s->test_mawp_is_design_pressure)
    g_snprintf (asme, sizeof asme, "MAWP: design pressure in its place (UG-99(b) footnote; %s: %s)",
                mawp_words != NULL ? mawp_words : "MAWP of ASME VIII-1 UG-27",
                mawp.reason != NULL ? mawp.reason : "not computable");
  else if (mawp_words == NULL)
    /* UG-27's own: the clause that governs it */
    g_snprintf (asme, sizeof asme, "MAWP of ASME VIII-1 %s, of the analysis wall",
                s->ug27_clause != NULL ? s->ug27_clause : "UG-27");
  else
    g_snprintf (asme, sizeof asme, "%s, of the analysis wall", mawp_words);
  ps_words = ps > 0 ? g_strdup ("PS as given") : g_strdup ("PS not given: the design pressure");
  g_snprintf (en, sizeof en, "Pd = internal design pressure; %s", ps_words);
  test_source (s, HL_TEST_UG99_HYDROSTATIC, asme);
  test_source (s, HL_TEST_UG100_PNEUMATIC, asme);
  test_source (s, HL_TEST_EN13445_HYDROSTATIC, en);
}

static void
collect_test_warnings (HlSolution *s)
{
  const HlTestPressure *t = s->test;

  if (t->membrane.verdict == HL_TEST_CHECK_FAIL)
    warn (s, "%s", N_("at the test pressure the general membrane stress exceeds 0.90 × yield (common practice; "
                      "ASME VIII-1 gives no number): lower the test pressure or thicken the wall"));
  if (t->peak.verdict == HL_TEST_CHECK_FAIL)
    warn (s, "%s", N_("at the test pressure the peak von Mises stress exceeds 0.90 × yield (common practice): "
                      "the bore may yield during the test"));
  if (t->checked_rule == HL_TEST_UG100_PNEUMATIC)
    warn (s, "%s", N_("a pneumatic test stores far more energy than a hydrostatic one: a rupture throws fragments; "
                      "keep people clear and test with water where the vessel allows"));
}

static void
collect_warnings (HlSolution *s)
{
  const HlShellInputs *in = &s->inputs;
  double peak = hl_lame_peak_equivalent (&s->lame, in->sizing_criterion);
  gboolean tresca = in->sizing_criterion == HL_CRITERION_TRESCA;

  /* a failed check is never without a warning beside it */
  if (s->check.verdict != HL_CHECK_PASS)
    warn (s, "the design check fails (%s): %s", hl_design_basis_name (s->check.basis),
          g_str_has_prefix (s->check.verdict_text, "FAIL: ") ? s->check.verdict_text + 6 : s->check.verdict_text);
  if (s->pi == 0.0 && s->po == 0.0)
    warn (s, N_("no pressure is applied: every stress is zero"));
  if (s->po > 0.0)
    warn (s, N_("external pressure acts: buckling may govern and is not checked here"));
  if (s->po > s->pi)
    warn (s, N_("the net pressure is external: the wall is in compression"));
  if (peak > s->yield)
    warn (s, "%s", tresca ? N_("the wall yields: the peak Tresca stress exceeds the yield strength")
                          : N_("the wall yields: the peak von Mises stress exceeds the yield strength"));
  else if (peak > s->allowable)
    warn (s, "%s", tresca ? N_("the peak Tresca stress exceeds the allowable stress times the joint efficiency")
                          : N_("the peak von Mises stress exceeds the allowable stress times the joint efficiency"));
  if (s->allowable / in->joint_efficiency > s->yield)
    warn (s, N_("the allowable stress is above the yield strength: check the material data"));
  if (!s->is_thin && (s->pi != 0.0 || s->po != 0.0))
    warn (s, N_("the thin-wall formulas are outside the tolerance here: use the Lamé (thick-wall) results"));
  collect_test_warnings (s);
}

HlSolution *
hl_solve (const HlShellInputs *in,
          guint                n_points,
          gboolean             corroded,
          GError             **error)
{
  g_autoptr(GPtrArray) problems = NULL;
  HlSolution *s;

  g_return_val_if_fail (in != NULL, NULL);
  g_return_val_if_fail (error == NULL || *error == NULL, NULL);

  problems = hl_shell_inputs_check (in);
  if (problems->len > 0)
    {
      g_autofree char *text = hl_problems_join (problems);

      g_set_error (error, HL_SOLVE_ERROR, HL_SOLVE_ERROR_INVALID, "%s", text);
      return NULL;
    }

  s = g_new0 (HlSolution, 1);
  s->inputs = *in;
  s->corroded = corroded;
  hl_shell_inputs_radii (in, corroded, &s->a, &s->b);
  /* the mill undertolerance goes with the allowance: the design wall
   * is the least the mill may deliver, corroded (new wall: as bought) */
  {
    double nominal = hl_quantity_si (in->wall_thickness, HL_KIND_LENGTH);

    s->mill = corroded ? MAX (hl_quantity_si (in->mill_tolerance, HL_KIND_LENGTH),
                              hl_quantity_si (in->mill_tolerance_percent, HL_KIND_PERCENT) * nominal)
                       : 0.0;
    s->a += s->mill;
  }
  s->t = s->b - s->a;
  s->k = s->b / s->a;
  s->mean_ratio = (s->a + s->b) / 2 / s->t;
  s->pi = hl_quantity_si (in->internal_pressure, HL_KIND_STRESS);
  s->po = hl_quantity_si (in->external_pressure, HL_KIND_STRESS);
  s->code_coincident = in->external_coincident;
  s->code_pressure = in->external_coincident ? s->pi - s->po : s->pi;
  s->yield = hl_quantity_si (in->material.yield_strength, HL_KIND_STRESS);
  s->allowable = hl_quantity_si (in->material.allowable_stress, HL_KIND_STRESS) * in->joint_efficiency;
  s->tolerance = hl_quantity_si (in->thin_tolerance, HL_KIND_PERCENT) * 100.0;
  hl_lame_init (&s->lame, in->form, in->ends, s->a, s->b, s->pi, s->po,
                hl_quantity_si (in->material.elastic_modulus, HL_KIND_MODULUS),
                in->material.poisson_ratio);
  s->warnings = g_ptr_array_new_with_free_func (g_free);

  s->n_points = CLAMP (n_points, 2, HL_MAX_POINTS);
  s->points = g_new (HlWallPoint, s->n_points);
  fill_points (s);
  solve_membrane_and_lame (s);
  solve_yield_and_collapse (s);
  solve_allowables (s);
  solve_design_check (s);
  solve_test_pressure (s);
  collect_warnings (s);
  return s;
}

void
hl_solution_free (HlSolution *solution)
{
  if (solution == NULL)
    return;
  g_free (solution->points);
  g_clear_pointer (&solution->test, hl_test_pressure_free);
  g_clear_pointer (&solution->warnings, g_ptr_array_unref);
  g_free (solution);
}
