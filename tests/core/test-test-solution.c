/* test-test-solution.c — the test pressure through hl_solve, its summary
 * keys, its words in the report and its inputs in the project file
 *
 * Sources, with the marks of METHODS-NEXT §E:
 * - ASME VIII-1 UG-99(b) PT = 1.3 × MAWP × LSR, UG-99(g) inspection at
 *   PT / 1.3 [CONFIRMED]; UG-100 PT = 1.1 × MAWP × LSR [CONFIRMED];
 *   the design pressure in place of an MAWP not calculated (UG-99(b)
 *   footnote) [CONFIRMED].
 * - PED 2014/68/EU Annex I 7.4 max(1.25 × loading, 1.43 PS) [CONFIRMED];
 *   EN 13445-5 max(1.25 Pd fa/fTd, 1.43 PS) [MEMORY].
 * - UG-27(c)(1): P = S E t / (R + 0.6 t), so σ = P (R + 0.6 t) / t (the
 *   clause, hand arithmetic).
 * - 0.90 × yield for the general membrane stress at test: common practice
 *   [CONFIRMED as practice]; ASME VIII-1 gives no number.
 * - Lamé, closed-end cylinder: peak von Mises at the bore
 *   √3 p k² / (k² − 1), the inverse of the first-yield pressure
 *   sy (1 − 1/k²) / √3 [COMPUTED, algebra, METHODS-NEXT §H].
 * - The check values of §E [COMPUTED] (MAWP 1.0, S_test 138, S_design 118,
 *   LSR 1.16949: UG-99(b) 1.52034 MPa, UG-100 1.28644, PED 1.46186; with
 *   fa/fTd = 1 1.43 governs; membrane at D 1000, t 6: 127.61 MPa = 49.1 %
 *   of Sy 260) are recomputed from the formulas here and held against the
 *   printed digits.
 * - Format versions: DESIGN.md §4 (a newer minor version adds elements;
 *   older files load with the defaults).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-test-solution"

#include "hl-test-formulas.h"
#include "hl-test-pressure.h"
#include "hl-project-file.h"
#include "hl-report.h"
#include "hl-result-rows.h"
#include "hl-shell-check.h"

#include <math.h>
#include <string.h>

#define MPA 1e6
#define REL 1e-9

/* §E: D = 1000 mm, t = 6 mm, Sy = 260 MPa; the allowable chosen so that
 * UG-27(c)(1) gives MAWP = S t / (R + 0.6 t) = 1.0 MPa exactly (hand
 * arithmetic from the clause: S = 503.6 / 6 MPa); design pressure 1.0 MPa,
 * LSR = 138 / 118. */
static HlShellInputs
section_e_shell (void)
{
  HlShellInputs in = hlt_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_DIAMETER, 1.0, 0.006, 1.0 * MPA, 0);

  in.material.allowable_stress = hl_quantity_make (503.6 / 6.0 * MPA, "Pa");
  in.material.yield_strength = hl_quantity_make (260 * MPA, "Pa");
  in.test_stress_ratio = 138.0 / 118.0;
  return in;
}

static void
test_section_e_values (void)
{
  HlShellInputs in = section_e_shell ();
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);
  const HlTestPressure *t = s->test;
  double lsr = 138.0 / 118.0;
  double k = 0.506 / 0.5;

  /* the MAWP the ASME rules multiply is UG-27's, hand arithmetic */
  hlt_assert_result (s->mawp_ug27, 1.0 * MPA, REL, 0);
  g_assert_false (s->test_mawp_is_design_pressure);
  hlt_assert_close (s->test_mawp, 1.0 * MPA, REL, 0);
  /* UG-99(b), UG-100 and PED Annex I 7.4 [CONFIRMED], values [COMPUTED] */
  hlt_assert_result (t->rules[HL_TEST_UG99_HYDROSTATIC].pressure, 1.3 * 1.0 * MPA * lsr, REL, 0);
  hlt_assert_result (t->rules[HL_TEST_UG99_HYDROSTATIC].pressure, 1.52034 * MPA, 5e-6, 0);
  hlt_assert_result (t->rules[HL_TEST_UG100_PNEUMATIC].pressure, 1.1 * 1.0 * MPA * lsr, REL, 0);
  hlt_assert_result (t->rules[HL_TEST_UG100_PNEUMATIC].pressure, 1.28644 * MPA, 5e-6, 0);
  /* PS not given: the design pressure, 1.0 MPa; 1.25 × 1.0 × LSR > 1.43 */
  hlt_assert_close (s->test_ps, 1.0 * MPA, REL, 0);
  hlt_assert_result (t->rules[HL_TEST_EN13445_HYDROSTATIC].pressure, MAX (1.25 * MPA * lsr, 1.43 * MPA), REL, 0);
  hlt_assert_result (t->rules[HL_TEST_EN13445_HYDROSTATIC].pressure, 1.46186 * MPA, 5e-6, 0);
  g_assert_cmpint (t->rules[HL_TEST_EN13445_HYDROSTATIC].governing, ==, HL_TEST_TERM_PRESSURE);
  /* UG-99(g): inspection at PT / 1.3 [CONFIRMED] */
  hlt_assert_result (t->rules[HL_TEST_UG99_HYDROSTATIC].inspection, 1.3 * MPA * lsr / 1.3, REL, 0);
  /* membrane on the UG-27 basis at PT of UG-99(b): 127.61 MPa, 49.1 % of
   * 260 MPa [COMPUTED]; the limit 0.90 × 260 (common practice) */
  hlt_assert_result (t->membrane.stress, 1.3 * MPA * lsr * (500 + 0.6 * 6) / 6, REL, 0);
  hlt_assert_result (t->membrane.stress, 127.61 * MPA, 5e-5, 0);
  hlt_assert_result (t->membrane.of_yield, 0.491, 1e-3, 0);
  hlt_assert_result (t->limit, 0.90 * 260 * MPA, REL, 0);
  g_assert_cmpint (t->membrane.verdict, ==, HL_TEST_CHECK_PASS);
  /* Lamé peak von Mises at PT, closed ends: √3 PT k² / (k² − 1) */
  hlt_assert_result (t->peak.stress, sqrt (3) * 1.3 * MPA * lsr * k * k / (k * k - 1), 1e-9, 0);
  g_assert_cmpint (t->peak.verdict, ==, HL_TEST_CHECK_PASS);
  g_assert_cmpint (s->test_check, ==, HL_CHECK_PASS);
  /* the source names the clause, the formula and the MAWP taken */
  g_assert_nonnull (strstr (s->test_sources[HL_TEST_UG99_HYDROSTATIC], "UG-99(b): PT = 1.3 × MAWP × LSR"));
  g_assert_nonnull (strstr (s->test_sources[HL_TEST_UG99_HYDROSTATIC], "MAWP of ASME VIII-1 UG-27"));
  g_assert_nonnull (strstr (s->test_sources[HL_TEST_EN13445_HYDROSTATIC], "PS not given: the design pressure"));
}

/* with fa/fTd = 1 the PS term governs: 1.43 × 1.0 > 1.25 × 1.0 (§E); a
 * given PS of 1.2 MPa: 1.43 × 1.2 = 1.716 MPa (PED Annex I 7.4) */
static void
test_ps_term (void)
{
  HlShellInputs in = section_e_shell ();

  in.test_stress_ratio = 1.0;
  {
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    hlt_assert_result (s->test->rules[HL_TEST_EN13445_HYDROSTATIC].pressure, 1.43 * MPA, REL, 0);
    g_assert_cmpint (s->test->rules[HL_TEST_EN13445_HYDROSTATIC].governing, ==, HL_TEST_TERM_PS);
    g_assert_nonnull (strstr (s->test_sources[HL_TEST_EN13445_HYDROSTATIC], "1.43 × PS governs"));
  }
  in.test_ps = hl_quantity_make (12, "bar");
  {
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    hlt_assert_close (s->test_ps, 1.2 * MPA, REL, 0);
    hlt_assert_result (s->test->rules[HL_TEST_EN13445_HYDROSTATIC].pressure, 1.43 * 1.2 * MPA, REL, 0);
    g_assert_nonnull (strstr (s->test_sources[HL_TEST_EN13445_HYDROSTATIC], "PS as given"));
  }
}

/* Without an MAWP of the basis method (the thick barrel of issue 10 is
 * outside UG-27's range, t > R/2) the design pressure stands in
 * (UG-99(b) footnote); the Lamé basis multiplies its own MAWP, whose
 * closed form for closed ends is S (1 − 1/k²) / √3 (first yield with
 * sy = S, METHODS-NEXT §H). */
static void
test_mawp_choice (void)
{
  HlShellInputs barrel = hlt_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_DIAMETER, 0.05, 0.0125,
                                    35 * MPA, 0);
  HlShellInputs in = section_e_shell ();

  {
    g_autoptr(HlSolution) s = hlt_solve (&barrel, 11);

    g_assert_false (hl_result_ok (s->mawp_ug27));
    g_assert_true (s->test_mawp_is_design_pressure);
    hlt_assert_result (s->test->rules[HL_TEST_UG99_HYDROSTATIC].pressure, 1.3 * 35 * MPA, REL, 0);
    g_assert_nonnull (strstr (s->test_sources[HL_TEST_UG99_HYDROSTATIC], "design pressure in its place"));
  }
  in.design_basis = HL_DESIGN_BASIS_LAME;
  {
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);
    double k = 0.506 / 0.5, S = 503.6 / 6.0 * MPA;

    hlt_assert_close (s->test_mawp, S * (1 - 1 / (k * k)) / sqrt (3), 1e-9, 0);
    hlt_assert_result (s->test->rules[HL_TEST_UG99_HYDROSTATIC].pressure,
                       1.3 * S * (1 - 1 / (k * k)) / sqrt (3) * 138.0 / 118.0, 1e-9, 0);
    g_assert_nonnull (strstr (s->test_sources[HL_TEST_UG99_HYDROSTATIC], "MAWP of the Lamé basis"));
  }
}

static void
test_summary_keys (void)
{
  /* issue 10's test keys, then the ones of the chosen rule, after the
   * design check's last key */
  static const char *const keys[] = {
    "check_thin", "test_pressure_hydrostatic", "test_pressure_pneumatic", "test_pressure_en13445",
    "membrane_stress_at_test", "inspection_pressure", "peak_stress_at_test", "check_test",
  };
  HlShellInputs in = section_e_shell ();
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);
  g_autoptr(GArray) rows = hl_result_rows (s);
  g_autofree char *block = hl_report_summary_block (s, HL_UNIT_SYSTEM_SI);
  const HlResultRow *at = hl_result_rows_find (rows, keys[0]);

  /* in this order, and the last of all */
  g_assert_nonnull (at);
  g_assert_true (at + G_N_ELEMENTS (keys) == &g_array_index (rows, HlResultRow, rows->len - 1) + 1);
  for (guint i = 0; i < G_N_ELEMENTS (keys); i++)
    g_assert_cmpstr (at[i].key, ==, keys[i]);
  /* §E [COMPUTED], printed to 9 digits: 1.3 × 1.0 × 138/118 = 1.52033898 */
  g_assert_nonnull (strstr (block, "\ntest_pressure_hydrostatic = 1.52033898 MPa\n"));
  g_assert_nonnull (strstr (block, "\ntest_pressure_pneumatic = 1.28644068 MPa\n"));
  g_assert_nonnull (strstr (block, "\ntest_pressure_en13445 = 1.46186441 MPa\n"));
  /* UG-99(g): PT / 1.3 = MAWP × LSR = 1.16949153 */
  g_assert_nonnull (strstr (block, "\ninspection_pressure = 1.16949153 MPa\n"));
  g_assert_nonnull (strstr (block, "\nmembrane_stress_at_test = 127.607"));
  g_assert_nonnull (strstr (block, "\ncheck_test = pass\n"));
}

static char *
report_of (const HlShellInputs *in)
{
  g_autoptr(HlProject) p = hl_project_new ();
  g_autoptr(HlSolution) fresh = NULL;
  g_autoptr(HlSolution) corroded = NULL;
  g_autoptr(GError) error = NULL;

  hl_project_add_shell (p, in);
  fresh = hl_solve (in, 11, FALSE, &error);
  g_assert_no_error (error);
  corroded = hl_solve (in, 11, TRUE, &error);
  g_assert_no_error (error);
  return hl_report_text (p, fresh, corroded, HL_UNIT_SYSTEM_SI);
}

static void
test_report_words (void)
{
  HlShellInputs in = section_e_shell ();
  g_autofree char *raw = NULL;
  g_autofree char *text = NULL;
  g_autofree char *pneumatic = NULL;
  g_autofree char *summary = NULL;

  g_strlcpy (in.code_edition, "2021", sizeof in.code_edition);
  raw = report_of (&in);
  g_assert_nonnull (strstr (raw, "\nTest pressure (corroded wall)\n"));
  /* the report wraps at 100 columns: phrases are looked for unwrapped */
  text = hlt_unwrap (raw);
  /* each rule's formula with the edition and the LSR */
  g_assert_nonnull (strstr (text, "UG-99(b): PT = 1.3 × MAWP × LSR (2021)"));
  g_assert_nonnull (strstr (text, "UG-100: PT = 1.1 × MAWP × LSR (2021)"));
  g_assert_nonnull (strstr (text, "PT = max(1.25 × Pd × fa/fTd, 1.43 × PS)"));
  g_assert_nonnull (strstr (text, "LSR = 1.16949"));
  g_assert_nonnull (strstr (text, "PT = 1.52034 MPa; inspection pressure 1.16949 MPa (UG-99(g): PT / 1.3)"));
  /* the limit named with its source */
  g_assert_nonnull (strstr (text, "0.90 × yield at test temperature (common practice; ASME VIII-1 gives no number)"));
  g_assert_nonnull (strstr (text, "127.607 MPa = 49.1 % of yield"));
  g_assert_nonnull (strstr (text, "Result: PASS"));
  /* hydrostatic: no hazard note */
  g_assert_null (strstr (text, "HAZARD"));
  g_assert_null (strstr (text, "DANGER: at the test pressure"));

  /* the pneumatic rule: the hazard, in the block and in the warnings */
  in.test_rule = HL_TEST_UG100_PNEUMATIC;
  g_free (raw);
  raw = report_of (&in);
  pneumatic = hlt_unwrap (raw);
  g_assert_nonnull (strstr (pneumatic, "HAZARD: a pneumatic test"));
  g_assert_nonnull (strstr (pneumatic, "Chosen rule: ASME VIII-1 UG-100, pneumatic"));
  {
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    summary = hl_report_summary_block (s, HL_UNIT_SYSTEM_SI);
    g_assert_nonnull (strstr (summary, "\nwarning = a pneumatic test stores far more energy"));
    /* UG-100's own inspection: PT / 1.1 = MAWP × LSR */
    g_assert_nonnull (strstr (summary, "\ninspection_pressure = 1.16949153 MPa\n"));
  }
}

/* LSR 3 on the §E vessel: PT = 3.9 MPa, σ = 3.9 × 503.6 / 6 = 327.3 MPa
 * > 0.90 × 260 = 234 MPa (hand arithmetic; the limit common practice):
 * FAIL, in words and in the warnings, never "none" */
static void
test_failing_stress (void)
{
  HlShellInputs in = section_e_shell ();
  g_autofree char *raw = NULL;
  g_autofree char *text = NULL;
  g_autofree char *summary = NULL;
  const char *warnings;

  in.test_stress_ratio = 3.0;
  {
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    hlt_assert_result (s->test->membrane.stress, 3.9 * MPA * 503.6 / 6, REL, 0);
    g_assert_cmpint (s->test->membrane.verdict, ==, HL_TEST_CHECK_FAIL);
    g_assert_cmpint (s->test_check, ==, HL_CHECK_FAIL);
    summary = hl_report_summary_block (s, HL_UNIT_SYSTEM_SI);
    g_assert_nonnull (strstr (summary, "\ncheck_test = fail\n"));
    g_assert_nonnull (strstr (summary, "\nwarning = at the test pressure the general membrane stress exceeds 0.90"));
  }
  raw = report_of (&in);
  text = hlt_unwrap (raw);
  g_assert_nonnull (strstr (text, "Result: FAIL"));
  g_assert_nonnull (strstr (text, "of the limit: FAIL"));
  /* 327.3 MPa is above the yield strength itself, 260 MPa */
  g_assert_nonnull (strstr (text, "DANGER: at the test pressure the general membrane stress is above yield"));
  warnings = strstr (raw, "\nWarnings\n");
  g_assert_nonnull (warnings);
  g_assert_null (strstr (warnings, "None for this shell."));
  warnings = strstr (text, " Warnings ");
  g_assert_nonnull (warnings);
  g_assert_nonnull (strstr (warnings, "at the test pressure the general membrane stress exceeds 0.90 × yield"));
}

/* the ratio's bounds name the field (DESIGN.md §7) */
static void
test_ratio_refused (void)
{
  static const double bad[] = { 0.0, 0.49, 20.5, NAN };
  HlShellInputs in = section_e_shell ();

  for (guint i = 0; i < G_N_ELEMENTS (bad); i++)
    {
      g_autoptr(GError) error = NULL;
      g_autoptr(HlSolution) s = NULL;

      in.test_stress_ratio = bad[i];
      s = hl_solve (&in, 11, TRUE, &error);
      g_assert_null (s);
      g_assert_error (error, HL_SOLVE_ERROR, HL_SOLVE_ERROR_INVALID);
      g_assert_nonnull (strstr (error->message, "test-stress-ratio"));
    }
}

static const char file_1_1[] =
  "<hoopline-project format=\"1.1\">\n"
  "  <shell id=\"tank\" form=\"cylinder\" ends=\"closed\">\n"
  "    <material-ref>typical-carbon-steel</material-ref>\n"
  "    <inner-diameter unit=\"mm\">1000</inner-diameter>\n"
  "    <wall-thickness unit=\"mm\">10</wall-thickness>\n"
  "    <internal-pressure unit=\"bar\">10</internal-pressure>\n"
  "  </shell>\n"
  "</hoopline-project>\n";

static void
test_file_formats (void)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) p = hl_project_load_bytes (file_1_1, strlen (file_1_1), "old.hoop", NULL, &error);
  g_autoptr(HlProject) back = NULL;
  g_autofree char *same = NULL;
  g_autofree char *forward = NULL;
  HlShellInputs *s;

  g_assert_no_error (error);
  s = (HlShellInputs *) hl_project_shell (p, 0);
  /* the defaults: UG-99(b), ratio 1, PS not given */
  g_assert_cmpint (s->test_rule, ==, HL_TEST_UG99_HYDROSTATIC);
  g_assert_cmpfloat (s->test_stress_ratio, ==, 1.0);
  g_assert_cmpfloat (hl_quantity_si (s->test_ps, HL_KIND_STRESS), ==, 0.0);
  /* unchanged, it is not raised to 1.2 */
  same = hl_project_to_checked_xml (p, NULL, &error);
  g_assert_no_error (error);
  g_assert_null (strstr (same, "format=\"1.2\""));
  g_assert_null (strstr (same, "test-"));

  /* each test input alone raises the file to 1.2 and reads back */
  s->test_rule = HL_TEST_EN13445_HYDROSTATIC;
  s->test_stress_ratio = 1.25;
  s->test_ps = hl_quantity_make (12, "bar");
  forward = hl_project_to_checked_xml (p, NULL, &error);
  g_assert_no_error (error);
  g_assert_nonnull (strstr (forward, "<hoopline-project format=\"1.2\">"));
  g_assert_nonnull (strstr (forward, "<test-rule>en13445-5</test-rule>"));
  g_assert_nonnull (strstr (forward, "<test-stress-ratio>1.25</test-stress-ratio>"));
  g_assert_nonnull (strstr (forward, "<maximum-allowable-pressure-ps unit=\"bar\">12</maximum-allowable-pressure-ps>"));
  back = hl_project_load_bytes (forward, strlen (forward), "forward.hoop", NULL, &error);
  g_assert_no_error (error);
  g_assert_true (hl_shell_inputs_equal (hl_project_shell (back, 0), s));
  g_assert_cmpint (hl_project_shell (back, 0)->test_rule, ==, HL_TEST_EN13445_HYDROSTATIC);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/test-solution/section-e-values", test_section_e_values);
  g_test_add_func ("/test-solution/ps-term", test_ps_term);
  g_test_add_func ("/test-solution/mawp-choice", test_mawp_choice);
  g_test_add_func ("/test-solution/summary-keys", test_summary_keys);
  g_test_add_func ("/test-solution/report-words", test_report_words);
  g_test_add_func ("/test-solution/failing-stress", test_failing_stress);
  g_test_add_func ("/test-solution/ratio-refused", test_ratio_refused);
  g_test_add_func ("/test-solution/file-formats", test_file_formats);
  return g_test_run ();
}
