/* hl-result-rows.c — the scalar results of a solution as labelled rows
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-result-rows"

#include "hl-config.h"
#include "hl-result-rows.h"
#include "hl-test-pressure.h"

#include <glib/gi18n-lib.h>
#include <math.h>

#define LOAD_PATH "internal pressure raised, external held"

static void
row (GArray     *rows,
     const char *key,
     const char *label,
     HlRowKind   kind,
     HlResult    result,
     const char *source)
{
  HlResultRow r = { key, label, kind, result, NULL, source };

  g_array_append_val (rows, r);
}

static void
word (GArray     *rows,
      const char *key,
      const char *label,
      const char *value)
{
  HlResultRow r = { key, label, HL_ROW_WORD, { NAN, NULL }, value, NULL };

  g_array_append_val (rows, r);
}

static HlResult
percent_of (double fraction)
{
  HlResult r = { 100 * fraction, NULL };

  if (!isfinite (fraction))
    {
      r.value = NAN;
      r.reason = N_("no value for this method");
    }
  return r;
}

static void
design_check_rows (GArray           *rows,
                   const HlSolution *s)
{
  const HlDesignCheck *c = &s->check;
  static const char *const utilisation_keys[HL_N_METHODS] = {
    "utilisation_ug27", "utilisation_en13445", "utilisation_lame", "utilisation_thin",
  };
  static const char *const check_keys[HL_N_METHODS] = {
    "check_ug27", "check_en13445", "check_lame", "check_thin",
  };
  static const char *const utilisation_labels[HL_N_METHODS] = {
    N_("Utilisation, ASME VIII-1 UG-27"), N_("Utilisation, EN 13445-3 7.4"), N_("Utilisation, Lamé"),
    N_("Utilisation, thin-wall"),
  };
  static const char *const check_labels[HL_N_METHODS] = {
    N_("Check, ASME VIII-1 UG-27"), N_("Check, EN 13445-3 7.4"), N_("Check, Lamé"), N_("Check, thin-wall"),
  };
  HlResult available = { c->available, NULL };

  word (rows, "design_basis", "Design basis", hl_design_basis_to_string (c->basis));
  word (rows, "design_verdict", "Design verdict", hl_check_result_to_string (c->verdict));
  word (rows, "governing_check", "Governing check", c->governing);
  row (rows, "utilisation", "Utilisation (design basis)", HL_ROW_PERCENT, percent_of (c->utilisation),
       "design pressure / MAWP");
  row (rows, "available_thickness", "Available thickness (nominal - corrosion - mill)", HL_ROW_LENGTH,
       available, c->mill_text);
  for (int m = 0; m < HL_N_METHODS; m++)
    {
      const HlMethodCheck *mc = &c->methods[m];
      double u = isfinite (mc->utilisation_pressure) ? mc->utilisation_pressure : mc->utilisation_thickness;

      row (rows, utilisation_keys[m], utilisation_labels[m], HL_ROW_PERCENT, percent_of (u), mc->clause);
      word (rows, check_keys[m], check_labels[m], hl_check_result_to_string (mc->result));
    }
}

/* Rows of the test pressure (METHODS-NEXT §E): every rule's PT, then
 * the inspection pressure and the stresses of the chosen rule's */
static void
test_pressure_rows (GArray           *rows,
                    const HlSolution *s)
{
  const HlTestPressure *t = s->test;
  const HlTestRulePressure *chosen = &t->rules[t->checked_rule];

  row (rows, "test_pressure_hydrostatic", "Test pressure, UG-99(b) hydrostatic", HL_ROW_STRESS,
       t->rules[HL_TEST_UG99_HYDROSTATIC].pressure, s->test_sources[HL_TEST_UG99_HYDROSTATIC]);
  row (rows, "test_pressure_pneumatic", "Test pressure, UG-100 pneumatic", HL_ROW_STRESS,
       t->rules[HL_TEST_UG100_PNEUMATIC].pressure, s->test_sources[HL_TEST_UG100_PNEUMATIC]);
  row (rows, "test_pressure_en13445", "Test pressure, EN 13445-5 / PED", HL_ROW_STRESS,
       t->rules[HL_TEST_EN13445_HYDROSTATIC].pressure, s->test_sources[HL_TEST_EN13445_HYDROSTATIC]);
  row (rows, "membrane_stress_at_test", "General membrane stress at test", HL_ROW_STRESS, t->membrane.stress,
       t->membrane.basis);
  row (rows, "inspection_pressure", "Inspection pressure (chosen test rule)", HL_ROW_STRESS, chosen->inspection,
       chosen->data->inspection_clause != NULL ? chosen->data->inspection_clause : chosen->data->clause);
  row (rows, "peak_stress_at_test", "Peak von Mises stress at test", HL_ROW_STRESS, t->peak.stress, t->peak.basis);
  word (rows, "check_test", "Stress check at test (0.90 × yield)", hl_check_result_to_string (s->test_check));
}

static const char *
ends_word (HlEnds ends)
{
  switch (ends)
    {
    case HL_ENDS_OPEN:
      return N_("open");
    case HL_ENDS_PLANE_STRAIN:
      return N_("plane-strain");
    case HL_ENDS_CLOSED:
    default:
      return N_("closed");
    }
}

static HlResult
value (double v)
{
  HlResult r = { v, NULL };

  return r;
}

GArray *
hl_result_rows (const HlSolution *s)
{
  GArray *rows = g_array_new (FALSE, TRUE, sizeof (HlResultRow));
  const HlShellInputs *in = &s->inputs;
  gboolean sphere = in->form == HL_FORM_SPHERE;

  word (rows, "shell", "Shell", in->name);
  word (rows, "id", "Id", in->id);
  /* the same words as hl_form_to_string() and hl_ends_to_string(), so
   * the summary keeps its values, but marked for the displaying layers */
  word (rows, "form", "Form", sphere ? N_("sphere") : N_("cylinder"));
  word (rows, "ends", "Ends", sphere ? N_("n/a (sphere)") : ends_word (in->ends));
  row (rows, "analysis_inner_radius", "Inner radius (analysis)", HL_ROW_LENGTH, value (s->a), NULL);
  row (rows, "analysis_wall_thickness", "Wall thickness (analysis)", HL_ROW_LENGTH, value (s->t), NULL);
  row (rows, "mean_radius_over_thickness", "Mean radius / thickness", HL_ROW_RATIO, value (s->mean_ratio), NULL);
  row (rows, "thin_hoop_stress", sphere ? N_("Thin-wall membrane stress") : N_("Thin-wall hoop stress"), HL_ROW_STRESS,
       s->thin_hoop, sphere ? "p R / 2t" : "p R / t");
  row (rows, "thin_axial_stress", "Thin-wall axial stress", HL_ROW_STRESS, s->thin_axial,
       sphere ? NULL : "p R / 2t (closed), 0 (open), nu hoop (plane strain)");
  row (rows, "lame_hoop_stress_inner", "Lamé hoop stress, inner surface", HL_ROW_STRESS, s->lame_hoop_inner, "Lamé");
  row (rows, "lame_hoop_stress_outer", "Lamé hoop stress, outer surface", HL_ROW_STRESS, s->lame_hoop_outer, "Lamé");
  row (rows, "lame_radial_stress_inner", "Lamé radial stress, inner surface", HL_ROW_STRESS, s->lame_radial_inner, "Lamé");
  row (rows, "lame_radial_stress_outer", "Lamé radial stress, outer surface", HL_ROW_STRESS, s->lame_radial_outer, "Lamé");
  row (rows, "lame_axial_stress", "Lamé axial stress", HL_ROW_STRESS, s->lame_axial, "Lamé");
  row (rows, "thin_wall_error", "Thin-wall error (hoop)", HL_ROW_PERCENT, s->thin_wall_error, NULL);
  row (rows, "thin_wall_error_equivalent", "Thin-wall error (von Mises)", HL_ROW_PERCENT, s->thin_wall_error_equivalent, NULL);
  word (rows, "thin_wall_verdict", "Thin-wall verdict", s->is_thin ? N_("thin") : N_("thick"));
  word (rows, "rule_of_thumb", "Rule of thumb (R/t >= 10)", s->rule_of_thumb ? N_("met") : N_("not met"));
  row (rows, "ratio_for_tolerance", "R/t where the error meets the tolerance", HL_ROW_RATIO, s->ratio_for_tolerance, NULL);
  row (rows, "von_mises_max", "Peak von Mises stress", HL_ROW_STRESS, s->von_mises_max, "Lamé");
  row (rows, "tresca_max", "Peak Tresca stress", HL_ROW_STRESS, s->tresca_max, "Lamé");
  row (rows, "radial_displacement_inner", "Radial displacement, inner", HL_ROW_SMALL_LENGTH, s->displacement_inner, "Lamé");
  row (rows, "radial_displacement_outer", "Radial displacement, outer", HL_ROW_SMALL_LENGTH, s->displacement_outer, "Lamé");
  /* first yield, collapse and the allowable pressures share one load
   * path, which the sources say */
  row (rows, "first_yield_pressure_von_mises", "First-yield pressure (von Mises)", HL_ROW_STRESS, s->first_yield_von_mises,
       LOAD_PATH);
  row (rows, "first_yield_pressure_tresca", "First-yield pressure (Tresca)", HL_ROW_STRESS, s->first_yield_tresca,
       LOAD_PATH);
  row (rows, "plastic_collapse_pressure", "Plastic collapse pressure (von Mises)", HL_ROW_STRESS, s->plastic_collapse,
       "Hill 1950; " LOAD_PATH);
  row (rows, "max_allowable_pressure_thin", "Max. allowable pressure, thin-wall", HL_ROW_STRESS, s->mawp_thin, LOAD_PATH);
  row (rows, "max_allowable_pressure_lame", "Max. allowable pressure, Lamé", HL_ROW_STRESS, s->mawp_lame,
       in->sizing_criterion == HL_CRITERION_TRESCA ? "Lamé, Tresca; " LOAD_PATH : "Lamé, von Mises; " LOAD_PATH);
  row (rows, "required_thickness_thin", "Required thickness, thin-wall (incl. corrosion allowance)", HL_ROW_LENGTH,
       s->treq_thin, NULL);
  row (rows, "required_thickness_lame", "Required thickness, Lamé (incl. corrosion allowance)", HL_ROW_LENGTH,
       s->treq_lame, in->sizing_criterion == HL_CRITERION_TRESCA ? "Lamé, Tresca" : "Lamé, von Mises");
  row (rows, "required_thickness_ug27", "Required thickness, ASME VIII-1 (incl. corrosion allowance)",
       HL_ROW_LENGTH, s->treq_ug27, s->ug27_source);
  row (rows, "max_allowable_pressure_ug27", "Max. allowable pressure, ASME VIII-1", HL_ROW_STRESS, s->mawp_ug27,
       s->ug27_source);
  row (rows, "required_thickness_en13445", "Required thickness, EN 13445-3 (incl. corrosion allowance)",
       HL_ROW_LENGTH, s->treq_en13445, s->en13445_source);
  row (rows, "max_allowable_pressure_en13445", "Max. allowable pressure, EN 13445-3", HL_ROW_STRESS, s->mawp_en13445,
       s->en13445_source);
  /* Ej, the joint efficiency, not the modulus E */
  row (rows, "max_allowable_pressure_barlow", "Barlow pressure (pipe)", HL_ROW_STRESS, s->barlow_pressure,
       "P = 2 S Ej t / D");
  row (rows, "thin_radial_growth_mean", "Thin-wall radial growth (mean radius)", HL_ROW_SMALL_LENGTH, s->thin_growth_mean,
       "Roark");
  row (rows, "plastic_collapse_pressure_tresca", "Plastic collapse pressure (Tresca)", HL_ROW_STRESS,
       s->plastic_collapse_tresca, "Hill 1950");
  row (rows, "bore_volume_strain", "Bore volume strain dV/V", HL_ROW_RATIO, s->volume_strain, "Lamé");
  /* issue 10: appended, so the keys before keep their places */
  design_check_rows (rows, s);
  test_pressure_rows (rows, s);
  return rows;
}

const HlResultRow *
hl_result_rows_find (GArray     *rows,
                     const char *key)
{
  for (guint i = 0; i < rows->len; i++)
    if (g_strcmp0 (g_array_index (rows, HlResultRow, i).key, key) == 0)
      return &g_array_index (rows, HlResultRow, i);
  return NULL;
}

const char *
hl_row_unit (HlRowKind    kind,
             HlUnitSystem system)
{
  gboolean us = system == HL_UNIT_SYSTEM_US;

  switch (kind)
    {
    case HL_ROW_LENGTH:
    case HL_ROW_SMALL_LENGTH:
      return us ? "in" : "mm";
    case HL_ROW_STRESS:
      return us ? "psi" : "MPa";
    case HL_ROW_PERCENT:
      return "%";
    case HL_ROW_RATIO:
    case HL_ROW_WORD:
    default:
      return "";
    }
}

double
hl_row_convert (HlRowKind    kind,
                HlUnitSystem system,
                double       si)
{
  switch (kind)
    {
    case HL_ROW_LENGTH:
    case HL_ROW_SMALL_LENGTH:
      return si / hl_unit_factor (HL_KIND_LENGTH, hl_row_unit (kind, system));
    case HL_ROW_STRESS:
      return si / hl_unit_factor (HL_KIND_STRESS, hl_row_unit (kind, system));
    case HL_ROW_PERCENT:
    case HL_ROW_RATIO:
    case HL_ROW_WORD:
    default:
      return si;
    }
}

char *
hl_row_format (const HlResultRow *r,
               HlUnitSystem       system,
               int                digits,
               gboolean           c_locale)
{
  g_autofree char *num = NULL;
  const char *unit;

  if (r->kind == HL_ROW_WORD)
    return g_strdup (r->word != NULL ? r->word : "");
  if (r->result.reason != NULL || !isfinite (r->result.value))
    return g_strdup_printf ("n/a (%s)", r->result.reason != NULL ? r->result.reason : N_("not computable"));
  {
    double v = hl_row_convert (r->kind, system, r->result.value);

    num = c_locale ? hl_format_significant (v, digits) : hl_format_display (v, digits);
  }
  unit = hl_row_unit (r->kind, system);
  return unit[0] != '\0' ? g_strdup_printf ("%s %s", num, unit) : g_strdup (num);
}
