/* test-units-system.c — a project's unit system end to end: the value a
 * listing shows beside the typed one, the built-in materials in US
 * units, the text report's input column, one wording for the systems,
 * and the decimal mark of the English window
 *
 * Sources beside each check:
 *  - NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly; 1 psi =
 *    6.894757 kPa; 1 ksi = 1000 psi.  B.9: t/°F = 1.8 t/°C + 32.
 *  - Common practice: E of carbon steel 200 GPa in SI tables, 29,000 ksi
 *    in US ones; of aluminium 69 GPa and 10,000 ksi.
 *  - ISO 80000-1 §7.3.1 (from memory): the decimal sign is a comma or a
 *    point on the line; an English text uses the point.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-units-system"

#include "hl-material.h"
#include "hl-note.h"
#include "hl-number-format.h"
#include "hl-report.h"
#include "hl-shell.h"
#include "hl-units.h"

#include <math.h>
#include <string.h>

#define PSI_PA 6894.757   /* NIST SP 811 B.8, to its printed digits */

static void
assert_rel (double got,
            double want,
            double tol)
{
  if (fabs (got - want) > tol * fabs (want))
    g_error ("%.12g is not %.12g within %g", got, want, tol);
}

/* NIST SP 811 B.8 and B.9 through hl_unit_to_system */
static void
test_to_system (void)
{
  const char *unit = NULL;

  /* 1 in = 25.4 mm exactly */
  g_assert_cmpfloat (hl_unit_to_system (0.0254, HL_KIND_LENGTH, HL_UNIT_SYSTEM_US, &unit), ==, 1.0);
  g_assert_cmpstr (unit, ==, "in");
  assert_rel (hl_unit_to_system (0.0254, HL_KIND_LENGTH, HL_UNIT_SYSTEM_SI, &unit), 25.4, 1e-15);
  g_assert_cmpstr (unit, ==, "mm");
  /* 1 psi = 6.894757 kPa (7 digits printed) */
  assert_rel (hl_unit_to_system (PSI_PA, HL_KIND_STRESS, HL_UNIT_SYSTEM_US, &unit), 1.0, 1e-7);
  g_assert_cmpstr (unit, ==, "psi");
  /* a modulus in ksi = 1000 psi: 200 GPa = 29007.5 ksi */
  assert_rel (hl_unit_to_system (200e9, HL_KIND_MODULUS, HL_UNIT_SYSTEM_US, &unit), 200e9 / (1000 * PSI_PA), 1e-7);
  g_assert_cmpstr (unit, ==, "ksi");
  g_assert_cmpfloat (hl_unit_to_system (200e9, HL_KIND_MODULUS, HL_UNIT_SYSTEM_SI, &unit), ==, 200.0);
  g_assert_cmpstr (unit, ==, "GPa");
  /* 20 °C = 68 °F, 100 °C = 212 °F */
  assert_rel (hl_unit_to_system (293.15, HL_KIND_TEMPERATURE, HL_UNIT_SYSTEM_US, &unit), 68.0, 1e-12);
  assert_rel (hl_unit_to_system (373.15, HL_KIND_TEMPERATURE, HL_UNIT_SYSTEM_US, NULL), 212.0, 1e-12);
  g_assert_cmpstr (unit, ==, "\xc2\xb0" "F");
  assert_rel (hl_unit_to_system (0.05, HL_KIND_PERCENT, HL_UNIT_SYSTEM_US, &unit), 5.0, 1e-15);
  g_assert_cmpstr (unit, ==, "%");
}

/* common practice: E = 29,000 ksi for carbon steel in US tables; every
 * built-in material in US units within its rounding of the SI row */
static void
test_us_materials (void)
{
  HlMaterial steel = hl_material_default_in (HL_UNIT_SYSTEM_US);
  HlMaterial si = hl_material_default_in (HL_UNIT_SYSTEM_SI);

  g_assert_cmpfloat (steel.elastic_modulus.value, ==, 29000);
  g_assert_cmpstr (steel.elastic_modulus.unit, ==, "ksi");
  g_assert_cmpstr (steel.yield_strength.unit, ==, "ksi");
  g_assert_cmpstr (steel.allowable_stress.unit, ==, "ksi");
  g_assert_cmpstr (steel.id, ==, si.id);
  g_assert_cmpfloat (si.elastic_modulus.value, ==, 200);
  g_assert_cmpstr (si.elastic_modulus.unit, ==, "GPa");
  /* 29000 ksi = 199.95 GPa: the same steel, rounded as each table does */
  assert_rel (hl_quantity_si (steel.elastic_modulus, HL_KIND_MODULUS), 200e9, 5e-4);

  for (guint i = 0; i < hl_material_builtin_count (); i++)
    {
      const HlMaterial *m = hl_material_builtin (i);
      const HlMaterial *us = hl_material_builtin_find_in (m->id, HL_UNIT_SYSTEM_US);

      g_assert_nonnull (us);
      g_assert_true (hl_material_builtin_find_in (m->id, HL_UNIT_SYSTEM_SI) == m);
      g_assert_cmpstr (us->name, ==, m->name);
      g_assert_cmpfloat (us->poisson_ratio, ==, m->poisson_ratio);
      assert_rel (hl_quantity_si (us->elastic_modulus, HL_KIND_MODULUS),
                  hl_quantity_si (m->elastic_modulus, HL_KIND_MODULUS), 0.005);
      /* copper's 10 ksi against 70 MPa is the widest: 1.5 % */
      assert_rel (hl_quantity_si (us->yield_strength, HL_KIND_STRESS),
                  hl_quantity_si (m->yield_strength, HL_KIND_STRESS), 0.02);
      assert_rel (hl_quantity_si (us->allowable_stress, HL_KIND_STRESS),
                  hl_quantity_si (m->allowable_stress, HL_KIND_STRESS), 0.005);
    }
  g_assert_null (hl_material_builtin_find_in ("no-such-material", HL_UNIT_SYSTEM_US));
}

/* issue 11: a US report's input column is in US units (its header said
 * in, psi while the column was mm, MPa); the typed column keeps mm */
static void
test_report_input_column (void)
{
  HlShellInputs in = hl_shell_inputs_default ();
  g_autoptr(GError) error = NULL;
  g_autoptr(HlSolution) s = NULL;
  g_autoptr(HlProject) project = hl_project_new ();
  g_autofree char *report = NULL;
  g_autoptr(GArray) rows = NULL;
  gboolean inside = FALSE;
  guint converted = 0;

  in.size = hl_quantity_make (1000, "mm");
  in.wall_thickness = hl_quantity_make (25.4, "mm");
  s = hl_solve (&in, HL_DEFAULT_POINTS, TRUE, &error);
  g_assert_no_error (error);
  report = hl_report_text (project, s, s, HL_UNIT_SYSTEM_US);
  g_assert_nonnull (strstr (report, "US customary (in, psi)"));
  /* the text report prints these rows: the inputs table's third column
   * is the value in the report's units */
  rows = hl_note_content (project, s, NULL, HL_UNIT_SYSTEM_US, FALSE, NULL);
  for (guint i = 0; i < rows->len; i++)
    {
      const HlNoteRow *row = hl_note_row (rows, i);
      g_autoptr(GString) value = NULL;
      const char *right;

      if (row->kind == HL_NOTE_HEADING)
        {
          inside = g_str_has_prefix (row->cells[0], "Inputs");
          continue;
        }
      if (!inside || row->kind != HL_NOTE_TABLE || row->strong || row->n_cells < 3 || row->cells[2][0] == '\0')
        continue;
      /* the note keeps a number and its unit together with a no-break space */
      value = g_string_new (row->cells[2]);
      g_string_replace (value, "\xc2\xa0", " ", 0);
      /* and groups digits with a narrow one (ISO 80000-1) */
      g_string_replace (value, HL_GROUP_SEPARATOR, "", 0);
      right = value->str;
      converted++;
      if (!(g_str_has_suffix (right, " in") || g_str_has_suffix (right, " psi") || g_str_has_suffix (right, " ksi")
            || g_str_has_suffix (right, " %") || g_str_has_suffix (right, " \xc2\xb0" "F")))
        g_error ("a US report's input column is not in US units: %s: %s", row->cells[0], right);
      /* 25.4 mm typed is 1 in exactly (NIST SP 811 B.8) */
      if (g_str_has_prefix (row->cells[0], "Wall thickness"))
        g_assert_cmpstr (right, ==, "1 in");
      /* E of the default steel: 200 GPa typed, 29007.548 ksi (1 ksi = 1000 psi),
       * shown to 5 significant digits */
      if (g_str_has_prefix (row->cells[0], "Elastic modulus"))
        {
          g_test_message ("E shown as %s", right);
          g_assert_cmpstr (right, ==, "29008 ksi");
        }
    }
  g_assert_cmpuint (converted, >=, 8);
}

/* one wording for the unit systems everywhere */
static void
test_system_words (void)
{
  g_assert_cmpstr (hl_unit_system_words (HL_UNIT_SYSTEM_SI), ==, "SI (mm, MPa)");
  g_assert_cmpstr (hl_unit_system_words (HL_UNIT_SYSTEM_US), ==, "US customary (in, psi)");
}

/* ISO 80000-1: the English window reads a decimal point; "12,5" is
 * refused with the point to use, a German window reads it as 12.5 */
static void
test_decimal_comma_message (void)
{
  g_autoptr(GError) error = NULL;
  const char *unit = NULL;
  double v = 0;

  g_assert_false (hl_units_parse ("12,5", HL_KIND_STRESS, "bar", FALSE, &v, &unit, &error));
  g_assert_nonnull (error);
  g_assert_nonnull (strstr (error->message, "use a point as the decimal separator"));
  g_assert_nonnull (strstr (error->message, "“12.5”"));
  g_assert_true (hl_units_parse ("12,5", HL_KIND_STRESS, "bar", TRUE, &v, &unit, NULL));
  g_assert_cmpfloat (v, ==, 12.5);
  g_assert_cmpstr (unit, ==, "bar");
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);

  g_test_add_func ("/units-system/to-system", test_to_system);
  g_test_add_func ("/units-system/us-materials", test_us_materials);
  g_test_add_func ("/units-system/report-input-column", test_report_input_column);
  g_test_add_func ("/units-system/words", test_system_words);
  g_test_add_func ("/units-system/decimal-comma-message", test_decimal_comma_message);
  return g_test_run ();
}
