/* test-test-pressure.c — test pressure of a shell and the stress check at test
 *
 * Sources, with the marks of METHODS-NEXT §E:
 * - ASME VIII-1 UG-99(b) PT = 1.3 × MAWP × LSR and UG-99(g) inspection at
 *   PT/1.3 [CONFIRMED]; UG-100 PT = 1.1 × MAWP × LSR, inspection at PT/1.1
 *   [CONFIRMED]; before the 1999 addenda 1.5 and 1.25 [MEMORY].
 * - PED 2014/68/EU Annex I 7.4 max(1.25 × loading, 1.43 PS) [CONFIRMED];
 *   EN 13445-5 wording max(1.25 Pd fa/fTd, 1.43 PS) [MEMORY].
 * - UG-27(c)(1) P = S E t / (R + 0.6 t), UG-27(d) P = 2 S E t / (R + 0.2 t)
 *   (the clause, as tests/formulas/test-design-codes.c uses it).
 * - 90 % of yield for the general membrane stress at test: common practice
 *   [CONFIRMED as practice].
 * - Stored energy E = P V / (γ − 1) [1 − (Pa/P)^((γ − 1)/γ)], ASME PCC-2
 *   [MEMORY].
 * - The check values of METHODS-NEXT §E [COMPUTED]: each is recomputed here
 *   from the formula (§H) and also held against the printed digits.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-test-pressure"

#include "hl-test-pressure.h"

#include <math.h>
#include <string.h>

#define MPA 1e6
#define MM  1e-3
#define REL 1e-12

static void
check_close (const char *what,
             double      got,
             double      want,
             double      rel_tol,
             double      abs_tol)
{
  if (!(fabs (got - want) <= MAX (rel_tol * fabs (want), abs_tol)))
    g_test_fail_printf ("%s = %.17g, want %.17g (difference %.3g)", what, got, want, got - want);
}

static void
check_value (const char *what,
             HlResult    got,
             double      want,
             double      rel_tol)
{
  if (got.reason != NULL)
    g_test_fail_printf ("%s is not available (%s), want %.17g", what, got.reason, want);
  else
    check_close (what, got.value, want, rel_tol, 0);
}

/* not available: NaN, and a reason that names @part */
static void
check_refused (const char *what,
               HlResult    got,
               const char *part)
{
  if (!isnan (got.value))
    g_test_fail_printf ("%s = %g, want NaN", what, got.value);
  if (got.reason == NULL || strstr (got.reason, part) == NULL)
    g_test_fail_printf ("%s: reason '%s' should name '%s'", what, got.reason != NULL ? got.reason : "(none)", part);
}

/* the §E inputs: MAWP 1.0 MPa, S at test 138 MPa, S at design 118 MPa */
static HlTestInputs
section_e_inputs (void)
{
  HlTestInputs in = hl_test_inputs_default ();

  in.mawp = 1.0 * MPA;
  in.design_pressure = 1.0 * MPA;
  in.ps = 1.0 * MPA;
  in.stress_ratio = 138.0 / 118.0;
  return in;
}

static void
test_ug99 (void)
{
  HlTestInputs in = section_e_inputs ();
  g_autoptr(HlTestPressure) test = hl_test_pressure_new (&in);
  const HlTestRulePressure *r = &test->rules[HL_TEST_UG99_HYDROSTATIC];

  /* LSR = 138/118 = 1.16949 (§E); PT = 1.3 × 1.0 × 138/118 = 179.4/118 */
  check_close ("LSR", in.stress_ratio, 1.16949, 0, 0.5e-5);
  check_value ("UG-99(b) PT", r->pressure, 1.3 * 138.0 / 118.0 * MPA, REL);
  /* §E prints 1.52034 MPa */
  check_close ("UG-99(b) PT, printed digits", r->pressure.value / MPA, 1.52034, 0, 0.5e-5);
  /* UG-99(g): PT / 1.3 = 1.0 × LSR */
  check_value ("UG-99(g) inspection", r->inspection, 138.0 / 118.0 * MPA, REL);
  g_assert_cmpstr (r->data->inspection_clause, ==, "UG-99(g)");
  g_assert_null (r->governing_words);
  g_assert_cmpstr (r->data->formula, ==, "UG-99(b): PT = 1.3 × MAWP × LSR");
}

static void
test_ug100 (void)
{
  HlTestInputs in = section_e_inputs ();
  g_autoptr(HlTestPressure) test = hl_test_pressure_new (&in);
  const HlTestRulePressure *r = &test->rules[HL_TEST_UG100_PNEUMATIC];

  /* UG-100: 1.1 × 1.0 × 138/118 = 151.8/118; §E prints 1.28644 */
  check_value ("UG-100 PT", r->pressure, 1.1 * 138.0 / 118.0 * MPA, REL);
  check_close ("UG-100 PT, printed digits", r->pressure.value / MPA, 1.28644, 0, 0.5e-5);
  /* UG-100 inspection at PT / 1.1 = 1.0 × LSR */
  check_value ("UG-100 inspection", r->inspection, 138.0 / 118.0 * MPA, REL);
  g_assert_true (r->data->pneumatic);
  g_assert_false (test->rules[HL_TEST_UG99_HYDROSTATIC].data->pneumatic);
}

static void
test_en13445 (void)
{
  HlTestInputs in = section_e_inputs ();
  g_autoptr(HlTestPressure) test = hl_test_pressure_new (&in);
  g_autoptr(HlTestPressure) equal = NULL;
  const HlTestRulePressure *r = &test->rules[HL_TEST_EN13445_HYDROSTATIC];

  /* max(1.25 × 1.0 × 138/118, 1.43 × 1.0) = max(1.46186, 1.43): the
   * 1.25 term governs (§E) */
  check_value ("EN 1.25 term", r->terms[0], 1.25 * 138.0 / 118.0 * MPA, REL);
  check_close ("EN 1.25 term, printed digits", r->terms[0].value / MPA, 1.46186, 0, 0.5e-5);
  check_value ("EN 1.43 term", r->terms[1], 1.43 * MPA, REL);
  check_value ("EN PT", r->pressure, 1.25 * 138.0 / 118.0 * MPA, REL);
  g_assert_cmpint (r->governing, ==, HL_TEST_TERM_PRESSURE);
  g_assert_cmpstr (r->governing_words, ==, "1.25 × Pd × fa/fTd governs");
  check_refused ("EN inspection", r->inspection, "EN 13445-5");

  /* fa/fTd = 1, Pd = PS = 1.0: max(1.25, 1.43) = 1.43 governs (§E) */
  in.stress_ratio = 1.0;
  equal = hl_test_pressure_new (&in);
  r = &equal->rules[HL_TEST_EN13445_HYDROSTATIC];
  check_value ("EN PT, ratio 1", r->pressure, 1.43 * MPA, REL);
  check_value ("EN 1.25 term, ratio 1", r->terms[0], 1.25 * MPA, REL);
  g_assert_cmpint (r->governing, ==, HL_TEST_TERM_PS);
  g_assert_cmpstr (r->governing_words, ==, "1.43 × PS governs");
}

static void
test_membrane_at_test (void)
{
  HlTestInputs in = section_e_inputs ();
  g_autoptr(HlTestPressure) test = NULL;
  double pt = 1.3 * 138.0 / 118.0 * MPA;
  double sigma;

  in.inner_radius = 500 * MM; /* D = 1000 mm */
  in.thickness = 6 * MM;
  in.yield_at_test = 260 * MPA;
  test = hl_test_pressure_new (&in);

  /* UG-27 basis: σ = PT (R + 0.6 t) / t = PT × 503.6 / 6 (hand);
   * §E prints 127.61 MPa = 49.1 % of Sy = 260 */
  sigma = pt * 503.6 / 6.0;
  check_value ("membrane at test", test->membrane.stress, sigma, REL);
  check_close ("membrane at test, printed digits", test->membrane.stress.value / MPA, 127.61, 0, 0.005);
  check_value ("membrane / yield", test->membrane.of_yield, sigma / (260 * MPA), REL);
  check_close ("membrane / yield, printed digits", 100 * test->membrane.of_yield.value, 49.1, 0, 0.05);
  /* limit 0.90 × 260 = 234 MPa (common practice) */
  check_value ("limit", test->limit, 234 * MPA, REL);
  check_value ("membrane utilisation", test->membrane.utilisation, sigma / (234 * MPA), REL);
  g_assert_cmpint (test->membrane.verdict, ==, HL_TEST_CHECK_PASS);
  g_assert_nonnull (strstr (test->limit_words, "0.90 × yield"));
  g_assert_nonnull (strstr (test->limit_words, "common practice"));
  g_assert_nonnull (strstr (test->limit_words, "ASME VIII-1 gives no number"));
  g_assert_nonnull (strstr (test->membrane.basis, "(R + 0.6 t) / t"));
  /* the peak was not given: said, not NaN alone */
  check_refused ("peak, not given", test->peak.stress, "not given");
  g_assert_cmpint (test->peak.verdict, ==, HL_TEST_CHECK_NOT_DONE);
}

/* The UG-27 basis inverts the clause: at the UG-27 MAWP the membrane
 * stress is S E again.  R = 400 mm, t = 10 mm, S E = 85 MPa:
 * UG-27(c)(1) P = 85 × 10 / 406 = 2.0935960591133007 MPa;
 * UG-27(d) P = 2 × 85 × 10 / 402 = 4.228855721393035 MPa (hand). */
static void
test_membrane_inverts_ug27 (void)
{
  check_value ("cylinder at UG-27(c)(1) MAWP",
               hl_test_membrane_hoop (HL_FORM_CYLINDER, 2.0935960591133007 * MPA, 400 * MM, 10 * MM), 85 * MPA,
               1e-14);
  check_value ("sphere at UG-27(d) MAWP",
               hl_test_membrane_hoop (HL_FORM_SPHERE, 4.228855721393035 * MPA, 400 * MM, 10 * MM), 85 * MPA, 1e-14);
  /* sphere, R = 500 mm, t = 10 mm, 2 MPa: 2 × 502 / 20 = 50.2 MPa (hand) */
  check_value ("sphere hand", hl_test_membrane_hoop (HL_FORM_SPHERE, 2 * MPA, 500 * MM, 10 * MM), 50.2 * MPA,
               REL);
}

/* A thick closed-end barrel, bore 100 mm, wall 12.5 mm (k = 1.25),
 * MAWP 20 MPa, UG-100 pneumatic, ratio 1: PT = 22 MPa (hand).  The Lamé
 * peak von Mises of a closed-end cylinder at the bore, internal pressure
 * p: √3 k² p / (k² − 1) (Lamé with σz = p/(k² − 1); textbook closed form,
 * from memory), checked against the engine's hl_lame_peak_equivalent. */
static void
test_peak_at_test (void)
{
  HlTestInputs in = hl_test_inputs_default ();
  g_autoptr(HlTestPressure) test = NULL;
  HlLame lame;
  double k2 = 1.25 * 1.25, per_pa = sqrt (3.0) * k2 / (k2 - 1.0);
  double pt = 22 * MPA, membrane = pt * (50 + 7.5) / 12.5; /* 101.2 MPa */

  hl_lame_init (&lame, HL_FORM_CYLINDER, HL_ENDS_CLOSED, 50 * MM, 62.5 * MM, 1.0, 0.0, 200e9, 0.3);
  check_close ("Lamé peak per Pa", hl_lame_peak_equivalent (&lame, HL_CRITERION_VON_MISES), per_pa, 1e-12, 0);

  in.mawp = 20 * MPA;
  in.rule = HL_TEST_UG100_PNEUMATIC;
  in.inner_radius = 50 * MM;
  in.thickness = 12.5 * MM;
  in.peak_equivalent_per_pa = per_pa;
  in.yield_at_test = 120 * MPA; /* limit 108 MPa */
  test = hl_test_pressure_new (&in);

  g_assert_cmpint (test->checked_rule, ==, HL_TEST_UG100_PNEUMATIC);
  check_value ("pneumatic PT", test->rules[HL_TEST_UG100_PNEUMATIC].pressure, pt, REL);
  check_value ("membrane at pneumatic PT", test->membrane.stress, membrane, REL);
  g_assert_cmpint (test->membrane.verdict, ==, HL_TEST_CHECK_PASS); /* 101.2 <= 108 */
  /* 22 × 4.8113 = 105.85 MPa <= 108: passes; at yield 115 (limit
   * 103.5 MPa) it fails */
  check_value ("peak at test", test->peak.stress, per_pa * pt, REL);
  check_value ("peak utilisation", test->peak.utilisation, per_pa * pt / (108 * MPA), REL);
  g_assert_cmpint (test->peak.verdict, ==, HL_TEST_CHECK_PASS);

  g_clear_pointer (&test, hl_test_pressure_free);
  in.yield_at_test = 115 * MPA;
  test = hl_test_pressure_new (&in);
  g_assert_cmpint (test->peak.verdict, ==, HL_TEST_CHECK_FAIL);
  g_assert_cmpint (test->membrane.verdict, ==, HL_TEST_CHECK_PASS); /* 101.2 <= 103.5 */
  g_assert_cmpstr (hl_test_verdict_word (test->peak.verdict), ==, "FAIL");

  /* a user's fraction is named as the user's, not as practice */
  g_clear_pointer (&test, hl_test_pressure_free);
  in.limit_fraction = 0.95;
  test = hl_test_pressure_new (&in);
  check_value ("limit at 0.95", test->limit, 0.95 * 115 * MPA, REL);
  g_assert_null (strstr (test->limit_words, "0.90 × yield"));
}

/* UG-100, hand: MAWP 2.5 MPa, ratio 1: PT = 2.75 MPa, inspection 2.5 MPa;
 * UG-99(b) 3.25 MPa, inspection 2.5 MPa. */
static void
test_hand (void)
{
  HlTestInputs in = hl_test_inputs_default ();
  g_autoptr(HlTestPressure) test = NULL;

  in.mawp = 2.5 * MPA;
  test = hl_test_pressure_new (&in);
  check_value ("UG-100 PT hand", test->rules[HL_TEST_UG100_PNEUMATIC].pressure, 2.75 * MPA, REL);
  check_value ("UG-100 inspection hand", test->rules[HL_TEST_UG100_PNEUMATIC].inspection, 2.5 * MPA, REL);
  check_value ("UG-99(b) PT hand", test->rules[HL_TEST_UG99_HYDROSTATIC].pressure, 3.25 * MPA, REL);
  check_value ("UG-99(g) inspection hand", test->rules[HL_TEST_UG99_HYDROSTATIC].inspection, 2.5 * MPA, REL);
  /* no Pd, no PS: the EN rule says which is missing */
  check_refused ("EN without Pd", test->rules[HL_TEST_EN13445_HYDROSTATIC].pressure, "Pd");
  /* no yield, no wall: the check says so */
  check_refused ("limit without yield", test->limit, "yield strength");
  check_refused ("membrane without wall", test->membrane.stress, "inner radius");
  g_assert_cmpint (test->membrane.verdict, ==, HL_TEST_CHECK_NOT_DONE);
  g_assert_cmpstr (hl_test_verdict_word (HL_TEST_CHECK_NOT_DONE), ==, "not checked");
  g_assert_cmpstr (hl_test_verdict_word (HL_TEST_CHECK_PASS), ==, "PASS");
}

/* §E: P = 1.3 MPa absolute, V = 1 m³, γ = 1.4, exact exponent 0.4/1.4:
 * 1682.5 kJ with Pa = 101.3 kPa, 1682.36 kJ with Pa = 101.325 kPa. */
static void
test_stored_energy (void)
{
  HlTestInputs in = hl_test_inputs_default ();
  g_autoptr(HlTestPressure) test = NULL;
  double want = 1.3 * MPA / 0.4 * (1 - pow (101.3e3 / 1.3e6, 0.4 / 1.4));
  double p = 1.3 * MPA, pa = 101.3e3;

  check_value ("energy, formula", hl_test_stored_energy (p, 1.0, pa, 1.4), want, 1e-13);
  check_close ("energy, printed digits (kJ)", hl_test_stored_energy (p, 1.0, pa, 1.4).value / 1e3, 1682.5, 0, 0.05);
  check_close ("energy, Pa = 101.325 kPa (kJ)", hl_test_stored_energy (p, 1.0, 101325, 1.4).value / 1e3, 1682.36,
               0, 0.005);
  /* twice the volume, twice the energy (the formula is linear in V) */
  check_value ("energy, 2 m³", hl_test_stored_energy (p, 2.0, pa, 1.4), 2 * want, 1e-13);
  /* γ → 1 is the isothermal expansion work P V ln(P/Pa) (thermodynamics
   * textbook, from memory); the adiabatic energy is below it */
  check_value ("energy, γ → 1", hl_test_stored_energy (p, 1.0, pa, 1.0 + 1e-7), p * log (p / pa), 1e-6);
  g_assert_cmpfloat (want, <, p * log (p / pa));
  /* no expansion at atmospheric pressure */
  check_value ("energy at Pa", hl_test_stored_energy (pa, 1.0, pa, 1.4), 0.0, 0);

  /* through the rule: the gauge UG-100 PT plus the stated Pa */
  in.mawp = (p - pa) / 1.1;
  in.volume = 1.0;
  in.atmospheric = pa;
  test = hl_test_pressure_new (&in);
  check_value ("energy at UG-100 PT", test->stored_energy, want, 1e-12);
  check_close ("atmospheric used", test->atmospheric, pa, 0, 0);
  check_close ("gamma used", test->gamma, 1.4, 0, 0);
}

/* an older edition is data: ASME VIII-1 before the 1999 addenda used 1.5
 * (hydrostatic) and 1.25 (pneumatic) [MEMORY]; not shipped, handed in */
static void
test_edition_factors (void)
{
  HlTestInputs in = section_e_inputs ();
  HlTestRuleData older[HL_TEST_N_RULES];
  g_autoptr(HlTestPressure) test = NULL;

  for (int i = 0; i < HL_TEST_N_RULES; i++)
    older[i] = *hl_test_rule_current (i);
  older[HL_TEST_UG99_HYDROSTATIC].factor = 1.5;
  older[HL_TEST_UG100_PNEUMATIC].factor = 1.25;
  in.asme_edition = "1998";
  in.en_edition = "";
  test = hl_test_pressure_new_with (&in, older);
  check_value ("UG-99(b) PT, 1.5", test->rules[HL_TEST_UG99_HYDROSTATIC].pressure, 1.5 * 138.0 / 118.0 * MPA, REL);
  check_value ("UG-100 PT, 1.25", test->rules[HL_TEST_UG100_PNEUMATIC].pressure, 1.25 * 138.0 / 118.0 * MPA, REL);
  g_assert_cmpstr (test->rules[HL_TEST_UG99_HYDROSTATIC].edition, ==, "1998");
  g_assert_cmpstr (test->rules[HL_TEST_UG100_PNEUMATIC].edition, ==, "1998");
  g_assert_null (test->rules[HL_TEST_EN13445_HYDROSTATIC].edition);
  /* the shipped table stays the current one */
  check_close ("current UG-99(b) factor", hl_test_rule_current (HL_TEST_UG99_HYDROSTATIC)->factor, 1.3, 0, 0);
}

/* The formula text shown with each clause says the factors the rule
 * computes with: the words and the data cannot drift apart. */
static void
test_formula_words (void)
{
  for (int i = 0; i < HL_TEST_N_RULES; i++)
    {
      const HlTestRuleData *d = hl_test_rule_current (i);
      g_autofree char *factor = g_strdup_printf ("%g × ", d->factor);

      g_assert_cmpint (d->rule, ==, i);
      g_assert_true (g_str_has_prefix (d->formula, d->clause));
      if (strstr (d->formula, factor) == NULL)
        g_test_fail_printf ("'%s' should say %s", d->formula, factor);
      if (d->ps_factor > 0)
        {
          g_autofree char *ps = g_strdup_printf ("%g × PS", d->ps_factor);

          g_assert_nonnull (strstr (d->formula, ps));
          g_assert_nonnull (strstr (d->term_words[1], ps));
          g_assert_nonnull (strstr (d->term_words[0], factor));
        }
      if (d->inspection_divisor > 0)
        g_assert_nonnull (d->inspection_clause);
      else
        g_assert_nonnull (d->no_inspection);
    }
  g_assert_null (hl_test_rule_current (HL_TEST_EN13445_HYDROSTATIC)->inspection_clause);
}

/* every result of @test is a number or NaN with a reason: never NaN
 * silently */
static void
check_no_silent_nan (const HlTestPressure *test)
{
  HlResult all[4 * HL_TEST_N_RULES + 8];
  guint n = 0;

  for (int i = 0; i < HL_TEST_N_RULES; i++)
    {
      all[n++] = test->rules[i].pressure;
      all[n++] = test->rules[i].terms[0];
      all[n++] = test->rules[i].terms[1];
      all[n++] = test->rules[i].inspection;
    }
  all[n++] = test->limit;
  all[n++] = test->membrane.stress;
  all[n++] = test->membrane.of_yield;
  all[n++] = test->membrane.utilisation;
  all[n++] = test->peak.stress;
  all[n++] = test->peak.of_yield;
  all[n++] = test->peak.utilisation;
  all[n++] = test->stored_energy;
  for (guint i = 0; i < n; i++)
    if (isnan (all[i].value) != (all[i].reason != NULL))
      g_test_fail_printf ("result %u: value %g with reason '%s'", i, all[i].value,
                          all[i].reason != NULL ? all[i].reason : "(none)");
}

static void
test_bad_inputs (void)
{
  static const struct
  {
    const char *what;
    double      value;
    const char *part;
  } mawps[] = {
    { "negative MAWP", -1 * MPA, "above zero" },
    { "zero MAWP", 0, "above zero" },
    { "NaN MAWP", NAN, "not given" },
    { "infinite MAWP", INFINITY, "not a finite number" },
  }, ratios[] = {
    { "ratio 0", 0, "stress ratio" },
    { "ratio -1", -1, "stress ratio" },
    { "NaN ratio", NAN, "stress ratio" },
  }, yields[] = {
    { "yield 0", 0, "yield strength" },
    { "yield -1", -1, "yield strength" },
    { "NaN yield", NAN, "yield strength" },
  };
  HlTestInputs good = section_e_inputs ();

  good.inner_radius = 500 * MM;
  good.thickness = 6 * MM;
  good.yield_at_test = 260 * MPA;
  good.peak_equivalent_per_pa = 90.0;
  good.volume = 1.0;

  for (gsize i = 0; i < G_N_ELEMENTS (mawps); i++)
    {
      HlTestInputs in = good;
      g_autoptr(HlTestPressure) test = NULL;

      in.mawp = mawps[i].value;
      test = hl_test_pressure_new (&in);
      check_refused (mawps[i].what, test->rules[HL_TEST_UG99_HYDROSTATIC].pressure, mawps[i].part);
      check_refused (mawps[i].what, test->rules[HL_TEST_UG99_HYDROSTATIC].pressure, "MAWP");
      check_refused (mawps[i].what, test->rules[HL_TEST_UG100_PNEUMATIC].inspection, "MAWP");
      check_refused (mawps[i].what, test->membrane.stress, "MAWP");
      check_refused (mawps[i].what, test->stored_energy, "MAWP");
      g_assert_cmpint (test->membrane.verdict, ==, HL_TEST_CHECK_NOT_DONE);
      /* the EN rule does not use the MAWP */
      check_value (mawps[i].what, test->rules[HL_TEST_EN13445_HYDROSTATIC].pressure, 1.25 * 138.0 / 118.0 * MPA,
                   REL);
      check_no_silent_nan (test);

      /* the footnote's design pressure is named as such */
      in.mawp_is_design_pressure = TRUE;
      g_clear_pointer (&test, hl_test_pressure_free);
      test = hl_test_pressure_new (&in);
      check_refused (mawps[i].what, test->rules[HL_TEST_UG99_HYDROSTATIC].pressure, "design pressure");
    }
  for (gsize i = 0; i < G_N_ELEMENTS (ratios); i++)
    {
      HlTestInputs in = good;
      g_autoptr(HlTestPressure) test = NULL;

      in.stress_ratio = ratios[i].value;
      test = hl_test_pressure_new (&in);
      for (int r = 0; r < HL_TEST_N_RULES; r++)
        check_refused (ratios[i].what, test->rules[r].pressure, ratios[i].part);
      check_no_silent_nan (test);
    }
  for (gsize i = 0; i < G_N_ELEMENTS (yields); i++)
    {
      HlTestInputs in = good;
      g_autoptr(HlTestPressure) test = NULL;

      in.yield_at_test = yields[i].value;
      test = hl_test_pressure_new (&in);
      check_refused (yields[i].what, test->limit, yields[i].part);
      check_refused (yields[i].what, test->membrane.utilisation, yields[i].part);
      check_refused (yields[i].what, test->peak.of_yield, yields[i].part);
      g_assert_cmpint (test->membrane.verdict, ==, HL_TEST_CHECK_NOT_DONE);
      g_assert_cmpint (test->peak.verdict, ==, HL_TEST_CHECK_NOT_DONE);
      /* the stress itself does not need the yield */
      check_value (yields[i].what, test->membrane.stress, 1.3 * 138.0 / 118.0 * MPA * 503.6 / 6.0, REL);
      check_no_silent_nan (test);
    }
  {
    HlTestInputs in = good;
    g_autoptr(HlTestPressure) test = NULL;

    in.limit_fraction = 1.2;
    in.peak_equivalent_per_pa = -1;
    in.ps = -1;
    in.gamma = 1.0;
    test = hl_test_pressure_new (&in);
    check_refused ("limit 1.2", test->limit, "fraction of yield");
    check_refused ("limit 1.2", test->membrane.utilisation, "fraction of yield");
    check_refused ("negative thickness", hl_test_membrane_hoop (HL_FORM_CYLINDER, 1 * MPA, 0.5, -1 * MM),
                   "wall thickness");
    check_refused ("negative peak", test->peak.stress, "peak von Mises");
    check_refused ("negative PS", test->rules[HL_TEST_EN13445_HYDROSTATIC].pressure, "PS");
    check_refused ("negative PS", test->rules[HL_TEST_EN13445_HYDROSTATIC].terms[1], "PS");
    check_refused ("γ = 1", test->stored_energy, "γ");
    check_no_silent_nan (test);
  }
  {
    HlTestInputs in = good;
    g_autoptr(HlTestPressure) test = NULL;

    in.limit_fraction = 0;
    in.inner_radius = 0;
    in.design_pressure = NAN;
    test = hl_test_pressure_new (&in);
    check_refused ("limit 0", test->limit, "fraction of yield");
    check_refused ("zero radius", test->membrane.stress, "inner radius");
    check_refused ("no Pd", test->rules[HL_TEST_EN13445_HYDROSTATIC].pressure, "Pd");
    check_no_silent_nan (test);
  }
  {
    HlTestInputs in = hl_test_inputs_default ();
    g_autoptr(HlTestPressure) test = hl_test_pressure_new (&in);

    /* nothing given: every result says why */
    check_no_silent_nan (test);
    check_refused ("no volume", hl_test_stored_energy (1.3 * MPA, NAN, 101.3e3, 1.4), "volume");
    check_refused ("negative volume", hl_test_stored_energy (1.3 * MPA, -1, 101.3e3, 1.4), "volume");
    check_refused ("zero atmosphere", hl_test_stored_energy (1.3 * MPA, 1, 0, 1.4), "atmospheric");
    check_refused ("below atmosphere", hl_test_stored_energy (50e3, 1, 101.3e3, 1.4), "atmospheric");
    check_refused ("NaN pressure", hl_test_stored_energy (NAN, 1, 101.3e3, 1.4), "test pressure");
    check_refused ("NaN γ", hl_test_stored_energy (1.3 * MPA, 1, 101.3e3, NAN), "γ");
    check_refused ("negative pressure", hl_test_membrane_hoop (HL_FORM_CYLINDER, -1, 0.5, 0.006),
                   "test pressure");
  }
}

int
main (int   argc,
      char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  g_test_set_nonfatal_assertions ();

  g_test_add_func ("/test-pressure/ug99b", test_ug99);
  g_test_add_func ("/test-pressure/ug100", test_ug100);
  g_test_add_func ("/test-pressure/en13445-ped", test_en13445);
  g_test_add_func ("/test-pressure/membrane", test_membrane_at_test);
  g_test_add_func ("/test-pressure/membrane-inverts-ug27", test_membrane_inverts_ug27);
  g_test_add_func ("/test-pressure/peak", test_peak_at_test);
  g_test_add_func ("/test-pressure/hand", test_hand);
  g_test_add_func ("/test-pressure/stored-energy", test_stored_energy);
  g_test_add_func ("/test-pressure/edition-factors", test_edition_factors);
  g_test_add_func ("/test-pressure/formula-words", test_formula_words);
  g_test_add_func ("/test-pressure/bad-inputs", test_bad_inputs);
  return g_test_run ();
}
