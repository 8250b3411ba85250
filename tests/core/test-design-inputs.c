/* test-design-inputs.c — the design check's inputs, in the file and in
 * every output
 *
 * Temperatures: NIST SP 811 (2008) B.9, T/K = t/°C + 273.15 and
 * T/K = (t/°F + 459.67) / 1.8.  Format versions: DESIGN.md §4 (a newer
 * minor version adds elements; older files load with the defaults).
 * The failing receiver of issue 10 (UG-27(c)(1): 1 x 1000 / (80 - 0.6)
 * = 12.594 mm > 12 mm) for the words of the outputs.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-design-inputs"

#include "hl-test-formulas.h"
#include "hl-field-table.h"
#include "hl-project-file.h"
#include "hl-report.h"
#include "hl-result-rows.h"
#include "hl-shell-check.h"

#include <math.h>
#include <string.h>

static void
test_temperature_units (void)
{
  static const struct
  {
    double      value;
    const char *unit;
    double      kelvin;
    const char *source;
  } cases[] = {
    { 20, "\xc2\xb0" "C", 293.15, "NIST SP 811 B.9: T = t + 273.15" },
    { -40, "\xc2\xb0" "C", 233.15, "NIST SP 811 B.9" },
    { -40, "\xc2\xb0" "F", 233.15, "NIST SP 811 B.9: (t + 459.67) / 1.8; -40 is the same in both scales" },
    { 212, "\xc2\xb0" "F", 373.15, "NIST SP 811 B.9: boiling point of water at 1 atm, 100 °C" },
    { 68, "degF", 293.15, "NIST SP 811 B.9" },
    { 0, "K", 0, "SI base unit" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      HlQuantity q = hl_quantity_make (cases[i].value, cases[i].unit);

      g_test_message ("%g %s: %s", cases[i].value, cases[i].unit, cases[i].source);
      g_assert_cmpfloat_with_epsilon (hl_quantity_si (q, HL_KIND_TEMPERATURE), cases[i].kelvin, 1e-10);
    }
  /* 100 °C is 212 °F (NIST SP 811 B.9) */
  {
    HlQuantity f = hl_quantity_convert (hl_quantity_make (100, "\xc2\xb0" "C"), HL_KIND_TEMPERATURE, "degF");

    g_assert_cmpfloat_with_epsilon (f.value, 212, 1e-10);
    g_assert_cmpstr (f.unit, ==, "\xc2\xb0" "F");
  }
  /* "C" alone is the coulomb, "F" the farad (NIST SP 811 Table 3) */
  g_assert_cmpfloat (hl_unit_factor (HL_KIND_TEMPERATURE, "C"), ==, 0.0);
  g_assert_cmpfloat (hl_unit_factor (HL_KIND_TEMPERATURE, "F"), ==, 0.0);
}

static void
test_field_checks (void)
{
  /* below absolute zero (0 K = -273.15 °C, NIST SP 811) is refused, and
   * the message names the field */
  HlShellInputs in = hl_shell_inputs_default ();
  g_autoptr(GPtrArray) problems = NULL;

  in.design_temperature = hl_quantity_make (-300, "\xc2\xb0" "C");
  problems = hl_shell_inputs_check (&in);
  g_assert_cmpuint (problems->len, ==, 1);
  g_assert_cmpstr (((HlProblem *) g_ptr_array_index (problems, 0))->field, ==, "design-temperature");
  g_clear_pointer (&problems, g_ptr_array_unref);

  /* 10 mm wall, 3 mm allowance, 7.5 mm mill: nothing left */
  in = hl_shell_inputs_default ();
  in.corrosion_allowance = hl_quantity_make (3, "mm");
  in.mill_tolerance = hl_quantity_make (7.5, "mm");
  problems = hl_shell_inputs_check (&in);
  g_assert_cmpuint (problems->len, ==, 1);
  g_assert_cmpstr (((HlProblem *) g_ptr_array_index (problems, 0))->field, ==, "mill-undertolerance");
}

static const char old_file[] =
  "<hoopline-project format=\"1\">\n"
  "  <shell id=\"tank\" form=\"cylinder\" ends=\"closed\">\n"
  "    <material-ref>typical-carbon-steel</material-ref>\n"
  "    <inner-diameter unit=\"mm\">1000</inner-diameter>\n"
  "    <wall-thickness unit=\"mm\">10</wall-thickness>\n"
  "    <internal-pressure unit=\"bar\">10</internal-pressure>\n"
  "  </shell>\n"
  "  <shell id=\"ball\" form=\"sphere\" ends=\"open\">\n"
  "    <material-ref>typical-carbon-steel</material-ref>\n"
  "    <inner-diameter unit=\"mm\">1000</inner-diameter>\n"
  "    <wall-thickness unit=\"mm\">10</wall-thickness>\n"
  "  </shell>\n"
  "</hoopline-project>\n";

static void
test_old_format_forward (void)
{
  /* a format-1 file loads with the design check's defaults: ASME UG-27,
   * 20 °C, no mill undertolerance, external pressure not coincident */
  g_autoptr(GError) error = NULL;
  g_autoptr(GPtrArray) warnings = NULL;
  g_autoptr(HlProject) p = hl_project_load_bytes (old_file, strlen (old_file), "old.hoop", &warnings, &error);
  g_autoptr(HlProject) back = NULL;
  g_autofree char *same = NULL;
  g_autofree char *forward = NULL;
  HlShellInputs *s;
  gboolean warned = FALSE;

  g_assert_no_error (error);
  s = (HlShellInputs *) hl_project_shell (p, 0);
  g_assert_cmpint (s->design_basis, ==, HL_DESIGN_BASIS_UG27);
  g_assert_cmpfloat_with_epsilon (hl_quantity_si (s->design_temperature, HL_KIND_TEMPERATURE), 293.15, 1e-9);
  g_assert_cmpfloat (hl_quantity_si (s->mill_tolerance, HL_KIND_LENGTH), ==, 0);
  g_assert_cmpfloat (hl_quantity_si (s->mill_tolerance_percent, HL_KIND_PERCENT), ==, 0);
  g_assert_false (s->external_coincident);
  g_assert_cmpstr (s->code_edition, ==, "");
  /* a sphere has no ends: the attribute is dropped, with a warning */
  g_assert_cmpint (hl_project_shell (p, 1)->ends, ==, HL_ENDS_CLOSED);
  for (guint i = 0; i < warnings->len; i++)
    warned |= strstr (g_ptr_array_index (warnings, i), "a sphere has no ends") != NULL;
  g_assert_true (warned);

  /* saved unchanged it stays the lowest format that holds it (1.1 for
   * the copy of the built-in material, not 1.2) */
  same = hl_project_to_checked_xml (p, NULL, &error);
  g_assert_no_error (error);
  g_assert_nonnull (strstr (same, "<hoopline-project format=\"1.1\">"));
  g_assert_null (strstr (same, "form=\"sphere\" ends="));

  /* with the new inputs it saves forward as 1.2 and reads back exactly */
  s->mill_tolerance_percent = hl_quantity_make (12.5, "%");
  s->design_temperature = hl_quantity_make (120, "\xc2\xb0" "C");
  s->design_basis = HL_DESIGN_BASIS_EN13445;
  s->external_coincident = TRUE;
  g_strlcpy (s->material_spec, "invented plate grade P-1", sizeof s->material_spec);
  g_strlcpy (s->allowable_source, "invented table, 120 °C", sizeof s->allowable_source);
  g_strlcpy (s->code_edition, "2021", sizeof s->code_edition);
  forward = hl_project_to_checked_xml (p, NULL, &error);
  g_assert_no_error (error);
  g_assert_nonnull (strstr (forward, "<hoopline-project format=\"1.2\">"));
  g_assert_nonnull (strstr (forward, "<mill-undertolerance-percent unit=\"%\">12.5</mill-undertolerance-percent>"));
  back = hl_project_load_bytes (forward, strlen (forward), "forward.hoop", NULL, &error);
  g_assert_no_error (error);
  g_assert_true (hl_shell_inputs_equal (hl_project_shell (back, 0), s));
  g_assert_cmpstr (hl_project_shell (back, 0)->code_edition, ==, "2021");
}

static HlShellInputs
receiver (void)
{
  /* issue 10: Di 2000 mm, t 12 mm, 10 bar, S 80 MPa, Ej 1, CA 0 */
  HlShellInputs in = hlt_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_DIAMETER, 2.0, 0.012, 1e6, 0);

  in.material.allowable_stress = hl_quantity_make (80, "MPa");
  in.material.yield_strength = hl_quantity_make (260, "MPa");
  in.verdict_measure = HL_MEASURE_BOTH;
  return in;
}

static void
test_summary_keys (void)
{
  /* the new keys come after the existing ones, in the order */
  static const char *const keys[] = {
    "design_basis", "design_verdict", "governing_check", "utilisation", "available_thickness",
    "utilisation_ug27", "check_ug27", "utilisation_en13445", "check_en13445",
    "utilisation_lame", "check_lame", "utilisation_thin", "check_thin",
  };
  HlShellInputs in = receiver ();
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);
  g_autoptr(GArray) rows = hl_result_rows (s);
  g_autofree char *block = hl_report_summary_block (s, HL_UNIT_SYSTEM_SI);
  /* the test pressure's keys follow these (test-test-solution) */
  guint first = hl_result_rows_find (rows, "design_basis") - (const HlResultRow *) (gpointer) rows->data;

  for (guint i = 0; i < G_N_ELEMENTS (keys); i++)
    g_assert_cmpstr (g_array_index (rows, HlResultRow, first + i).key, ==, keys[i]);
  /* the existing last key stays where it was */
  g_assert_cmpstr (g_array_index (rows, HlResultRow, first - 1).key, ==, "bore_volume_strain");
  g_assert_nonnull (strstr (block, "\ndesign_basis = asme-ug27\n"));
  g_assert_nonnull (strstr (block, "\ndesign_verdict = fail\n"));
  g_assert_nonnull (strstr (block, "\ncheck_ug27 = fail\n"));
  /* 1 / 0.95313 = 104.92 % */
  g_assert_nonnull (strstr (block, "\nutilisation = 104.91"));
  g_assert_nonnull (strstr (block, "\navailable_thickness = 12 mm\n"));
  g_assert_nonnull (strstr (block, "\ngoverning_check = UG-27(c)(1)\n"));
  /* the joint efficiency's own symbol in Barlow's formula */
  g_assert_nonnull (hl_result_rows_find (rows, "max_allowable_pressure_barlow"));
  g_assert_cmpstr (hl_result_rows_find (rows, "max_allowable_pressure_barlow")->source, ==, "P = 2 S Ej t / D");
}

static void
test_sphere_axial (void)
{
  /* a sphere has no axis: thin and Lamé axial stress both absent */
  HlShellInputs in = hlt_shell (HL_FORM_SPHERE, HL_ENDS_CLOSED, HL_SIZE_INNER_DIAMETER, 1.0, 0.01, 1e6, 0);
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);

  hlt_assert_na (s->thin_axial);
  hlt_assert_na (s->lame_axial);
}

static void
test_text_report (void)
{
  /* the failing receiver: the verdict in words, never "Warnings: none"
   * beside it, never "ADEQUATE" for a wall that fails */
  HlShellInputs in = receiver ();
  g_autoptr(HlSolution) cor = hlt_solve (&in, 11);
  g_autoptr(HlSolution) neu = hl_solve (&in, 11, FALSE, NULL);
  g_autoptr(HlProject) project = hl_project_new ();
  g_autofree char *raw = NULL, *text = NULL, *line = NULL;
  const char *design_temperature;

  hl_project_add_shell (project, &in);
  raw = hl_report_text (project, neu, cor, HL_UNIT_SYSTEM_SI);
  /* the report wraps at 100 columns: phrases are looked for unwrapped */
  text = hlt_unwrap (raw);
  g_assert_nonnull (strstr (raw, "\nDesign check (corroded wall)\n"));
  g_assert_nonnull (strstr (text, "FAIL — utilisation 104.9 % by UG-27(c)(1)"));
  g_assert_nonnull (strstr (text, "ASME VIII-1 UG-27"));
  g_assert_nonnull (strstr (text, "EN 13445-3 7.4"));
  g_assert_nonnull (strstr (text, "Lamé, von Mises = S Ej"));
  g_assert_nonnull (strstr (raw, "Warnings\n--------\n  - the design check fails"));
  g_assert_null (strstr (raw, "Warnings\n--------\n  None"));
  g_assert_null (strstr (text, "ADEQUATE"));
  g_assert_null (strstr (text, "adequate for this wall."));
  g_assert_nonnull (strstr (text, "Required thickness, ASME VIII-1 (incl. corrosion allowance)"));
  g_assert_nonnull (strstr (text, "Pressure in the code formulas: internal design pressure alone"));
  /* the default design temperature, 20 °C, as entered and in °C (not
   * as a stress) */
  design_temperature = strstr (raw, "  Design temperature ");
  g_assert_nonnull (design_temperature);
  line = g_strndup (design_temperature, strcspn (design_temperature, "\n"));
  g_assert_nonnull (strstr (line, "20 \xc2\xb0" "C"));
  g_assert_null (strstr (line, "MPa"));
  g_assert_true (g_regex_match_simple ("\n  Material specification +\\(not given\\)", raw, 0, 0));
}

int
main (int   argc,
      char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/design-inputs/temperature-units", test_temperature_units);
  g_test_add_func ("/design-inputs/field-checks", test_field_checks);
  g_test_add_func ("/design-inputs/old-format-forward", test_old_format_forward);
  g_test_add_func ("/design-inputs/summary-keys", test_summary_keys);
  g_test_add_func ("/design-inputs/sphere-axial", test_sphere_axial);
  g_test_add_func ("/design-inputs/text-report", test_text_report);
  return g_test_run ();
}
