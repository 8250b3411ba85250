/* hl-report-text.c — the calculation report a reviewer can follow
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-report-text"

#include "hl-report.h"
#include "hl-field-table.h"
#include "hl-result-rows.h"

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

static void
input_line (GString        *out,
            const char     *label,
            HlQuantity      q,
            HlQuantityKind  kind)
{
  g_autofree char *typed = hl_format_significant (q.value, 10);
  double si = hl_quantity_si (q, kind);
  g_autofree char *converted = NULL;
  const char *unit;

  switch (kind)
    {
    case HL_KIND_LENGTH:
      converted = hl_format_significant (si * 1e3, 8);
      unit = "mm";
      break;
    case HL_KIND_PERCENT:
      converted = hl_format_significant (si * 100, 8);
      unit = "%";
      break;
    case HL_KIND_TEMPERATURE:
      converted = hl_format_significant (si - 273.15, 8);
      unit = "\xc2\xb0""C";
      break;
    default:
      converted = hl_format_significant (si / 1e6, 8);
      unit = "MPa";
      break;
    }
  g_autofree char *typed_unit = hl_report_escape_line (q.unit);

  g_string_append (out, "  ");
  put_padded (out, label, 35);
  g_string_append_printf (out, "%14s %-6s = %14s %s\n", typed, typed_unit, converted, unit);
}

/* one row of the field table; rows without a report label are not listed */
static void
input_field (GString             *out,
             const HlField       *f,
             const HlShellInputs *in)
{
  gconstpointer slot = hl_field_cslot (f, in);
  const HlFieldChoice *choice;

  if (f->report == NULL || (f->is_size && f->size_kind != in->size_kind))
    return;
  if (f->kind == HL_FIELD_TEXT)
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
    input_line (out, f->report, *(const HlQuantity *) slot, hl_field_quantity_kind (f));
}

static void
put_inputs (GString             *out,
            const HlShellInputs *in)
{
  rule (out, "Inputs (as entered = converted)");
  g_string_append_printf (out, "  %-35s%s%s%s\n", "Form", hl_form_to_string (in->form),
                          in->form == HL_FORM_CYLINDER ? ", ends " : "",
                          in->form == HL_FORM_CYLINDER ? hl_ends_to_string (in->ends) : "");
  for (guint i = 0; i < hl_field_count (); i++)
    input_field (out, hl_field_nth (i), in);
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
    "  Allowable pressure and required thickness: thin-wall hoop = S E; Lamé peak\n"
    "    equivalent stress = S E (root found to 1e-12 relative); ASME BPVC VIII-1\n"
    "    UG-27(c)(1), (c)(2), (d) and Appendix 1-1; EN 13445-3 7.4.2, 7.4.3;\n"
    "    Barlow P = 2 S t / D.  Code formulas are used inside their ranges only.\n"
    "  The analysis wall has the corrosion allowance removed from the inside.\n");
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

  rule (out, "Results (new wall | corroded wall)");
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
put_verdict (GString          *out,
             const HlSolution *s,
             HlUnitSystem      system)
{
  gboolean eq = s->inputs.verdict_measure == HL_MEASURE_EQUIVALENT;
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
    g_autofree char *e_abs = hl_format_significant (fabs (err.value), 3);

    g_string_append_printf (out,
                            "  The thin-wall %s stress (%s radius basis) differs from the Lamé peak\n"
                            "  by %s %%. The tolerance is %s %%, so the thin-wall formulas are %s\n"
                            "  for this wall%s\n",
                            eq ? "von Mises" : "hoop", hl_basis_to_string (s->inputs.thin_basis), e, tol,
                            s->is_thin ? "ADEQUATE" : "NOT ADEQUATE",
                            s->is_thin ? "." : ": use the Lamé (thick-wall) results.");
    if (err.value < 0)
      g_string_append_printf (out, "  The thin-wall value is %s %% below the exact peak (unconservative).\n", e_abs);
    else if (err.value > 0)
      g_string_append_printf (out, "  The thin-wall value is %s %% above the exact peak (conservative).\n", e_abs);
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
  g_string_append_printf (out, "Printed:   %s, units %s\n", today, system == HL_UNIT_SYSTEM_US ? "in, psi" : "mm, MPa");
  g_string_append_printf (out, "\nCAUTION: %s\n", HL_CAUTION);

  put_inputs (out, &corroded->inputs);
  put_methods (out);
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
