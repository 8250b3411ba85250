/* hl-report-text.c — the calculation report a reviewer can follow
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-report-text"

#include "hl-report.h"
#include "hl-field-table.h"
#include "hl-result-rows.h"
#include "hl-design-check.h"
#include "hl-test-pressure.h"

#include <math.h>

#define REPORT_DIGITS 6

/* @label, then @text escaped to one line (a title with a line break
 * must not start a line of the report: hl_report_escape_line()) */
static void
put_field (GString    *out,
           const char *label,
           const char *text)
{
  g_autofree char *safe = hl_report_escape_line (text);

  g_string_append_printf (out, "%s%s\n", label, safe);
}

static void
rule (GString *out,
      const char *title)
{
  g_string_append_printf (out, "\n%s\n", title);
  for (const char *p = title; *p != '\0'; p = g_utf8_next_char (p))
    g_string_append_c (out, '-');
  g_string_append_c (out, '\n');
}

/* printf widths count bytes; labels carry é and σ, so pad by characters */
static void
put_padded (GString    *out,
            const char *text,
            glong       width)
{
  glong len = g_utf8_strlen (text, -1);

  g_string_append (out, text);
  for (glong i = len; i < width; i++)
    g_string_append_c (out, ' ');
}

/* the value as typed, then in the report's units (issue 11: a US
 * report's column is in in, psi, ksi, °F whatever was typed) */
static void
input_line (GString        *out,
            const char     *label,
            HlQuantity      q,
            HlQuantityKind  kind,
            HlUnitSystem    system)
{
  g_autofree char *typed = hl_format_significant (q.value, 10);
  const char *unit;
  double shown = hl_unit_to_system (hl_quantity_si (q, kind), kind, system, &unit);
  g_autofree char *converted = hl_format_significant (shown, 8);
  g_autofree char *typed_unit = hl_report_escape_line (q.unit);

  g_string_append (out, "  ");
  put_padded (out, label, 35);
  g_string_append_printf (out, "%14s %-6s = %14s %s\n", typed, typed_unit, converted, unit);
}

/* one row of the field table; rows without a report label are not listed */
static void
input_field (GString             *out,
             const HlField       *f,
             const HlShellInputs *in,
             HlUnitSystem         system)
{
  gconstpointer slot = hl_field_cslot (f, in);
  const HlFieldChoice *choice;

  if (f->report == NULL || (f->is_size && f->size_kind != in->size_kind))
    return;
  if (f->kind == HL_FIELD_TEXT && f->owner == HL_FIELD_OF_SHELL)
    {
      g_autofree char *text = hl_report_escape_line (slot);

      g_string_append_printf (out, "  %-35s%s\n", f->report, text[0] ? text : "(not given)");
    }
  else if (f->kind == HL_FIELD_TEXT)
    {
      /* a material row: its name, with its id */
      g_autofree char *text = hl_report_escape_line (slot);
      g_autofree char *material_id = hl_report_escape_line (in->material.id);

      g_string_append_printf (out, "  %-35s%s (%s)\n", f->report, text, material_id);
    }
  else if (f->kind == HL_FIELD_RATIO)
    {
      g_autofree char *v = hl_format_significant (*(const double *) slot, 6);

      g_string_append_printf (out, "  %-35s%14s\n", f->report, v);
    }
  else if (f->kind == HL_FIELD_CHOICE)
    {
      choice = hl_field_choice_by_value (f, hl_field_choice_get (f, slot));
      g_string_append_printf (out, "  %-35s%s\n", f->report, choice != NULL ? choice->report : "");
    }
  else
    input_line (out, f->report, *(const HlQuantity *) slot, hl_field_quantity_kind (f), system);
}

static void
put_inputs (GString             *out,
            const HlShellInputs *in,
            HlUnitSystem         system)
{
  rule (out, "Inputs (as entered = converted)");
  g_string_append_printf (out, "  %-35s%s%s%s\n", "Form", hl_form_to_string (in->form),
                          in->form == HL_FORM_CYLINDER ? ", ends " : "",
                          in->form == HL_FORM_CYLINDER ? hl_ends_to_string (in->ends) : "");
  for (guint i = 0; i < hl_field_count (); i++)
    input_field (out, hl_field_nth (i), in, system);
}

static void
put_methods (GString *out)
{
  rule (out, "Methods");
  g_string_append (out,
    "  Thin wall (membrane, radial stress 0): cylinder hoop = p R / t, axial = p R / 2t\n"
    "    (closed ends), 0 (open), nu x hoop (plane strain); sphere = p R / 2t.\n"
    "  Lamé thick wall (Timoshenko, Strength of Materials II; Lai, Rubin & Krempl\n"
    "    §5.18, §5.21): cylinder radial = A - B/r^2, hoop = A + B/r^2;\n"
    "    sphere radial = C - D/r^3, tangential = C + D/2r^3.\n"
    "  Equivalent stresses: von Mises and Tresca of the Lamé principal stresses.\n"
    "  Thin-wall error = 100 (thin - Lamé peak) / |Lamé peak|.\n"
    "  First yield: proportional loading to the yield strength at the peak.\n"
    "  Plastic collapse: Hill (1950), perfectly plastic, von Mises: cylinder\n"
    "    (closed ends) 2/sqrt(3) sy ln k, sphere 2 sy ln k.\n"
    "  Allowable pressure and required thickness: thin-wall hoop = S Ej; Lamé peak\n"
    "    equivalent stress = S Ej (root found to 1e-12 relative); ASME BPVC VIII-1\n"
    "    UG-27(c)(1), (c)(2), (d) and Appendix 1-1; EN 13445-3 7.4.2, 7.4.3 (f z);\n"
    "    Barlow P = 2 S Ej t / D.  Code formulas are used inside their ranges only.\n"
    "  Ej is the weld joint efficiency (z, the joint coefficient, in EN words);\n"
    "    E alone is the elastic modulus.\n"
    "  First yield, plastic collapse and the allowable pressures: the internal\n"
    "    pressure raised, the external held at its value.\n"
    "  Code formulas take the internal design pressure alone unless the external\n"
    "    pressure is stated to be always coincident; under net external pressure\n"
    "    no internal-pressure sizing applies (buckling governs, not checked here).\n"
    "  The analysis wall has the corrosion allowance and the mill undertolerance\n"
    "    removed from the inside; the allowable stress is the one at the design\n"
    "    temperature, as entered.\n");
}

static char *
escaped_row (const HlResultRow *row,
             HlUnitSystem       system)
{
  g_autofree char *text = hl_row_format (row, system, REPORT_DIGITS, TRUE);

  return hl_report_escape_line (text);
}

static void
put_results (GString          *out,
             const HlSolution *new_wall,
             const HlSolution *corroded,
             HlUnitSystem      system)
{
  g_autoptr(GArray) rows_new = hl_result_rows (new_wall);
  g_autoptr(GArray) rows_cor = hl_result_rows (corroded);

  rule (out, "Results (new wall, with no corrosion allowance | corroded wall)");
  for (guint i = 0; i < rows_cor->len; i++)
    {
      const HlResultRow *rn = &g_array_index (rows_new, HlResultRow, i);
      const HlResultRow *rc = &g_array_index (rows_cor, HlResultRow, i);
      g_autofree char *vn = NULL, *vc = NULL, *reason = NULL;

      if (rc->kind == HL_ROW_WORD && i < 4)
        continue;   /* name, id, form: in the header already */
      g_string_append (out, "  ");
      put_padded (out, rc->label, 44);
      if (rc->kind != HL_ROW_WORD && rn->result.reason != NULL && g_strcmp0 (rn->result.reason, rc->result.reason) == 0)
        {
          /* the same gap in both columns: say it once, across both */
          reason = hl_report_escape_line (rc->result.reason);
          g_string_append_printf (out, "n/a: %s\n", reason);
          continue;
        }
      vn = escaped_row (rn, system);
      vc = escaped_row (rc, system);
      put_padded (out, vn, 18);
      g_string_append_printf (out, " | %s", vc);
      if (rc->source != NULL)
        g_string_append_printf (out, "   [%s]", rc->source);
      g_string_append_c (out, '\n');
    }
}

static void
put_design_check (GString          *out,
                  const HlSolution *s,
                  HlUnitSystem      system)
{
  const HlDesignCheck *c = &s->check;
  gboolean us = system == HL_UNIT_SYSTEM_US;
  const char *lu = us ? "in" : "mm", *pu = us ? "psi" : "MPa";
  double lf = us ? 0.0254 : 1e-3, pf = us ? 6894.757293168 : 1e6;
  g_autofree char *nom = hl_format_significant (c->nominal / lf, 6);
  g_autofree char *ca = hl_format_significant (c->corrosion / lf, 6);
  g_autofree char *mill = hl_report_escape_line (c->mill_text);
  g_autofree char *av = hl_format_significant (c->available / lf, 6);
  g_autofree char *verdict = hl_report_escape_line (c->verdict_text);
  g_autofree char *governing = hl_report_escape_line (c->governing);
  g_autofree char *edition = hl_report_escape_line (s->inputs.code_edition);

  rule (out, "Design check (corroded wall)");
  g_string_append_printf (out, "  Verdict: %s\n", hl_check_result_word (c->verdict));
  g_string_append_printf (out, "  %s\n", verdict);
  g_string_append_printf (out, "  Design basis: %s%s%s%s; governing: %s\n", hl_design_basis_name (c->basis),
                          edition[0] ? " (edition " : "", edition, edition[0] ? ")" : "", governing);
  if (isfinite (c->utilisation))
    {
      g_autofree char *u = hl_format_significant (100 * c->utilisation, 4);

      g_string_append_printf (out, "  Utilisation: %s %%\n", u);
    }
  else
    g_string_append (out, "  Utilisation: n/a\n");
  g_string_append_printf (out, "  Available thickness = nominal %s - corrosion %s - mill %s = %s %s\n", nom, ca,
                          mill, av, lu);
  g_string_append_printf (out, "  Pressure in the code formulas: %s\n",
                          s->code_coincident ? "internal - external (external always coincident)"
                                             : "internal design pressure alone");
  g_string_append (out, "  ");
  put_padded (out, "Method", 20);
  g_string_append_printf (out, "%12s %12s %12s %12s %8s  %s\n", "req. t", "avail. t", "MAWP", "design P", "util.",
                          "result");
  for (int m = 0; m < HL_N_METHODS; m++)
    {
      const HlMethodCheck *mc = &c->methods[m];
      double u = isfinite (mc->utilisation_pressure) ? mc->utilisation_pressure : mc->utilisation_thickness;
      g_autofree char *rq = isfinite (mc->required) ? hl_format_significant (mc->required / lf, 5) : g_strdup ("n/a");
      g_autofree char *at = hl_format_significant (mc->available / lf, 5);
      g_autofree char *mw = isfinite (mc->mawp) ? hl_format_significant (mc->mawp / pf, 5) : g_strdup ("n/a");
      g_autofree char *dp = hl_format_significant (mc->design_pressure / pf, 5);
      g_autofree char *ut = isfinite (u) ? g_strdup_printf ("%.1f %%", 100 * u) : g_strdup ("n/a");
      g_autofree char *reason = hl_report_escape_line (mc->reason);
      g_autofree char *clause = hl_report_escape_line (mc->clause);

      g_string_append (out, "  ");
      put_padded (out, mc->name, 20);
      g_string_append_printf (out, "%12s %12s %12s %12s %8s  %s", rq, at, mw, dp, ut, hl_check_result_word (mc->result));
      if (reason[0] != '\0')
        g_string_append_printf (out, ": %s", reason);
      g_string_append_printf (out, "   [%s]\n", clause);
    }
  g_string_append_printf (out, "  (lengths in %s, pressures in %s; required t is nominal, allowances included)\n", lu,
                          pu);
  if (c->bursts || c->yields)
    g_string_append_printf (out, "  DANGER: %s\n", c->bursts ? "the wall would burst" : "the wall yields at the bore");
}

/* "1.52034 MPa", or "n/a (reason)" */
static char *
test_value (HlResult    r,
            double      factor,
            const char *unit)
{
  g_autofree char *num = NULL;

  if (!hl_result_ok (r))
    return hl_report_escape_line (r.reason != NULL ? r.reason : "not computable");
  num = hl_format_significant (r.value / factor, REPORT_DIGITS);
  return g_strdup_printf ("%s %s", num, unit);
}

static void
put_test_stress (GString            *out,
                 const HlTestStress *st,
                 const char         *pu,
                 double              pf)
{
  g_autofree char *sv = test_value (st->stress, pf, pu);

  g_string_append_printf (out, "  %s:\n    %s", st->basis, sv);
  if (hl_result_ok (st->of_yield))
    g_string_append_printf (out, " = %.1f %% of yield", 100 * st->of_yield.value);
  if (hl_result_ok (st->utilisation))
    g_string_append_printf (out, ", %.1f %% of the limit", 100 * st->utilisation.value);
  g_string_append_printf (out, ": %s\n", hl_test_verdict_word (st->verdict));
}

static void
put_test_pressure (GString          *out,
                   const HlSolution *s,
                   HlUnitSystem      system)
{
  const HlTestPressure *t = s->test;
  const HlField *rule_field = hl_field_find (HL_FIELD_OF_SHELL, "test-rule");
  const HlFieldChoice *chosen = hl_field_choice_by_value (rule_field, t->checked_rule);
  gboolean us = system == HL_UNIT_SYSTEM_US;
  const char *pu = us ? "psi" : "MPa";
  double pf = us ? 6894.757293168 : 1e6;
  HlResult mawp = { s->test_mawp, NULL }, ps = { s->test_ps, NULL };
  g_autofree char *lsr = hl_format_significant (s->inputs.test_stress_ratio, 6);
  g_autofree char *mawp_text = test_value (mawp, pf, pu);
  g_autofree char *ps_text = test_value (ps, pf, pu);
  g_autofree char *limit = test_value (t->limit, pf, pu);
  g_autofree char *yield = hl_format_significant (s->yield / pf, REPORT_DIGITS);

  rule (out, "Test pressure (corroded wall)");
  g_string_append_printf (out, "  Chosen rule: %s\n", chosen != NULL ? chosen->report : "");
  g_string_append_printf (out, "  Stress ratio LSR (fa/fTd in EN words) = %s: allowable stress at test temperature\n"
                               "    over the one at design temperature, the lowest of the pressure parts' materials\n",
                          lsr);
  g_string_append_printf (out, "  MAWP the ASME rules multiply: %s%s\n", mawp_text,
                          s->test_mawp_is_design_pressure ? " (the design pressure in its place, UG-99(b) footnote)"
                                                          : "");
  g_string_append_printf (out, "  PS (PED) = %s%s\n", ps_text,
                          hl_quantity_si (s->inputs.test_ps, HL_KIND_STRESS) > 0 ? ""
                                                                                 : " (not given: the design pressure)");
  for (int i = 0; i < HL_TEST_N_RULES; i++)
    {
      const HlTestRulePressure *r = &t->rules[i];
      g_autofree char *pt = test_value (r->pressure, pf, pu);
      g_autofree char *insp = test_value (r->inspection, pf, pu);
      g_autofree char *source = hl_report_escape_line (s->test_sources[i]);

      g_string_append_printf (out, "  %s\n    PT = %s", source, pt);
      if (hl_result_ok (r->pressure))
        {
          if (r->data->ps_factor > 0)
            {
              g_autofree char *a = test_value (r->terms[0], pf, pu);
              g_autofree char *b = test_value (r->terms[1], pf, pu);

              g_string_append_printf (out, " = max(%s, %s)", a, b);
            }
          if (r->data->inspection_divisor > 0)
            {
              g_autofree char *div = hl_format_significant (r->data->inspection_divisor, 3);

              g_string_append_printf (out, "; inspection pressure %s (%s: PT / %s)", insp, r->data->inspection_clause,
                                      div);
            }
          else
            g_string_append_printf (out, "; %s", r->data->no_inspection);
        }
      g_string_append_c (out, '\n');
    }
  g_string_append_printf (out, "  Stress at the test pressure of the chosen rule, against %s = %s\n"
                               "    (yield strength as entered, %s %s, taken for the test temperature)\n",
                          t->limit_words, limit, yield, pu);
  put_test_stress (out, &t->membrane, pu, pf);
  put_test_stress (out, &t->peak, pu, pf);
  if (s->test_check == HL_CHECK_FAIL)
    g_string_append (out, "  Result: FAIL: the stress at the test pressure exceeds the limit; lower the test\n"
                          "    pressure (where the rule allows) or thicken the wall.\n");
  else if (s->test_check == HL_CHECK_PASS)
    g_string_append (out, "  Result: PASS: the stress at the test pressure is within the limit.\n");
  else
    g_string_append (out, "  Result: NOT APPLICABLE: the stress at test could not be checked.\n");
  if (hl_result_ok (t->membrane.of_yield) && t->membrane.of_yield.value > 1.0)
    g_string_append (out, "  DANGER: at the test pressure the general membrane stress is above yield: the wall\n"
                          "    would deform permanently in the test.\n");
  if (t->checked_rule == HL_TEST_UG100_PNEUMATIC)
    {
      g_autofree char *kj = hl_format_significant (t->stored_energy.value / 1e3, 4);
      g_autofree char *energy = hl_result_ok (t->stored_energy) ? g_strdup_printf ("%s kJ", kj)
                                                                : hl_report_escape_line (t->stored_energy.reason);

      g_string_append_printf (out, "  HAZARD: a pneumatic test stores far more energy than a hydrostatic one; a rupture\n"
                                   "    throws fragments. Keep people clear; test with water where the vessel allows.\n"
                                   "    Stored energy (ASME PCC-2, adiabatic): %s.\n", energy);
    }
  g_string_append (out, "  UG-99(c), the calculated test pressure, is not covered.\n");
}

static const char *
measure_word (HlVerdictMeasure m)
{
  switch (m)
    {
    case HL_MEASURE_EQUIVALENT:
      return "von Mises";
    case HL_MEASURE_BOTH:
      return "hoop and von Mises, each";
    case HL_MEASURE_HOOP:
    default:
      return "hoop";
    }
}

static void
put_verdict (GString          *out,
             const HlSolution *s,
             HlUnitSystem      system)
{
  gboolean eq = s->thin_governing == HL_MEASURE_EQUIVALENT;
  HlResult err = eq ? s->thin_wall_error_equivalent : s->thin_wall_error;
  g_autofree char *mr = hl_format_significant (s->mean_ratio, 4);
  g_autofree char *tol = hl_format_significant (s->tolerance, 3);

  rule (out, "Thin-wall verdict (corroded wall)");
  if (!hl_result_ok (err))
    {
      g_autofree char *reason = hl_report_escape_line (err.reason);

      g_string_append_printf (out, "  The thin-wall error cannot be formed: %s.\n", reason);
      return;
    }
  {
    g_autofree char *e = hl_format_significant (err.value, 3);

    /* "ADEQUATE" says the formulas describe the stress, never that the
     * wall holds: beside a failed design check the word is not used */
    gboolean fails = s->check.verdict != HL_CHECK_PASS;

    g_string_append_printf (out,
                            "  Measure: %s (governing: %s).  The thin-wall %s stress (%s radius basis)\n"
                            "  differs from the Lamé peak by %s %%. The tolerance is %s %%, so the wall is %s\n"
                            "  and the thin-wall formulas %s%s\n",
                            measure_word (s->inputs.verdict_measure), eq ? "von Mises" : "hoop",
                            eq ? "von Mises" : "hoop", hl_basis_to_string (s->inputs.thin_basis), e, tol,
                            s->is_thin ? "THIN" : "THICK",
                            s->is_thin ? (fails ? "describe its stresses, but the wall FAILS the design check"
                                                : "are ADEQUATE for its stresses")
                                       : "are NOT ADEQUATE",
                            s->is_thin ? "." : ": use the Lamé (thick-wall) results.");
    g_string_append_printf (out, "  The thin-wall value %s.\n", s->thin_words);
  }
  g_string_append_printf (out, "  Mean radius / thickness = %s: the common rule of thumb (>= 10) is %s.\n", mr,
                          s->rule_of_thumb ? "met" : "not met");
  if (hl_result_ok (s->ratio_for_tolerance))
    {
      g_autofree char *rt = hl_format_significant (s->ratio_for_tolerance.value, 4);

      g_string_append_printf (out, "  The error equals the tolerance at mean radius / thickness = %s.\n", rt);
    }
  (void) system;
}

char *
hl_report_text (const HlProject  *project,
                const HlSolution *new_wall,
                const HlSolution *corroded,
                HlUnitSystem      system)
{
  GString *out = g_string_new (NULL);
  const HlRevision *rev = hl_project_latest_revision (project);
  g_autoptr(GDateTime) now = g_date_time_new_now_local ();
  g_autofree char *today = g_date_time_format (now, "%Y-%m-%d");

  g_string_append (out, "HOOPLINE CALCULATION REPORT\n");
  g_string_append (out, "===========================\n");
  put_field (out, "Project:   ", project->title[0] ? project->title : "(untitled)");
  put_field (out, "Engineer:  ", project->engineer[0] ? project->engineer : "(not given)");
  if (rev != NULL)
    {
      g_autofree char *date = hl_report_escape_line (rev->date);
      g_autofree char *author = hl_report_escape_line (rev->author);
      g_autofree char *text = hl_report_escape_line (rev->text);

      g_string_append_printf (out, "Revision:  %u, %s, %s: %s\n", rev->number, date, author, text);
    }
  {
    g_autofree char *name = hl_report_escape_line (corroded->inputs.name);
    g_autofree char *id = hl_report_escape_line (corroded->inputs.id);

    g_string_append_printf (out, "Shell:     %s (id %s)\n", name, id);
  }
  g_string_append_printf (out, "Printed:   %s, units %s\n", today, hl_unit_system_words (system));
  g_string_append_printf (out, "\nCAUTION: %s\n", HL_CAUTION);

  put_inputs (out, &corroded->inputs, system);
  put_methods (out);
  put_design_check (out, corroded, system);
  put_test_pressure (out, corroded, system);
  put_results (out, new_wall, corroded, system);
  put_verdict (out, corroded, system);

  rule (out, "Warnings");
  if (corroded->warnings->len == 0)
    g_string_append (out, "  none\n");
  for (guint i = 0; i < corroded->warnings->len; i++)
    put_field (out, "  - ", g_ptr_array_index (corroded->warnings, i));

  rule (out, "Caution");
  g_string_append_printf (out, "  %s\n", HL_CAUTION);
  return g_string_free (out, FALSE);
}
