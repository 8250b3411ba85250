/* hl-report-summary.c — summary lines and the CSV table
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-report-summary"

#include "hl-report.h"
#include "hl-design-check.h"
#include "hl-result-rows.h"

#include <math.h>
#include <string.h>

/* issue: at least 6 significant digits; 9 keeps round-off visible */
#define SUMMARY_DIGITS 9

char *
hl_report_escape_line (const char *text)
{
  GString *out;
  const char *end;

  if (text == NULL)
    return g_strdup ("");
  end = text + strlen (text);
  out = g_string_sized_new (end - text);
  for (const char *p = text; p < end;)
    {
      gunichar c = g_utf8_get_char_validated (p, end - p);
      const char *next;

      if (c == (gunichar) -1 || c == (gunichar) -2)
        {
          /* not UTF-8: the byte's value, never the raw byte */
          g_string_append_printf (out, "\\x%02x", (guchar) *p);
          p++;
          continue;
        }
      next = g_utf8_next_char (p);
      if (c == '\\')
        g_string_append (out, "\\\\");
      else if (c == '\n')
        g_string_append (out, "\\n");
      else if (c == '\r')
        g_string_append (out, "\\r");
      else if (c == '\t')
        g_string_append (out, "\\t");
      else if (c < 0x20 || c == 0x7F)
        g_string_append_printf (out, "\\x%02x", (guint) c);
      else if ((c >= 0x80 && c < 0xA0) || c == 0x2028 || c == 0x2029)
        g_string_append_printf (out, "\\u%04x", (guint) c);
      else
        g_string_append_len (out, p, next - p);
      p = next;
    }
  return g_string_free (out, FALSE);
}

char *
hl_report_csv_field (const char *text)
{
  g_autofree char *safe = hl_report_escape_line (text);
  GString *out;

  if (strpbrk (safe, ",\"") == NULL)
    return g_steal_pointer (&safe);
  out = g_string_new ("\"");
  for (const char *p = safe; *p != '\0'; p++)
    {
      if (*p == '"')
        g_string_append_c (out, '"');
      g_string_append_c (out, *p);
    }
  g_string_append_c (out, '"');
  return g_string_free (out, FALSE);
}

char *
hl_report_summary_block (const HlSolution *solution,
                         HlUnitSystem      system)
{
  g_autoptr(GArray) rows = hl_result_rows (solution);
  GString *out = g_string_new (NULL);

  for (guint i = 0; i < rows->len; i++)
    {
      const HlResultRow *r = &g_array_index (rows, HlResultRow, i);
      g_autofree char *text = hl_row_format (r, system, SUMMARY_DIGITS, TRUE);
      g_autofree char *safe = hl_report_escape_line (text);

      g_string_append_printf (out, "%s = %s\n", r->key, safe);
    }
  for (guint i = 0; i < solution->warnings->len; i++)
    {
      g_autofree char *safe = hl_report_escape_line (g_ptr_array_index (solution->warnings, i));

      g_string_append_printf (out, "warning = %s\n", safe);
    }
  return g_string_free (out, FALSE);
}

static void
put_csv_value (GString *out,
               double   value,
               gboolean last)
{
  g_autofree char *num = hl_format_significant (value, 10);

  g_string_append (out, num);
  g_string_append_c (out, last ? '\n' : ',');
}

/* a quantity as typed, C locale: "10 bar" */
static char *
csv_quantity (HlQuantity q)
{
  g_autofree char *num = hl_format_significant (q.value, 10);
  g_autofree char *unit = hl_report_escape_line (q.unit);

  return g_strdup_printf ("%s %s", num, unit);
}

static void
put_csv_identity (GString          *out,
                  const HlSolution *s,
                  HlUnitSystem      system)
{
  g_autofree char *id = hl_report_escape_line (s->inputs.id);
  g_autofree char *name = hl_report_escape_line (s->inputs.name);
  g_autofree char *p_in = csv_quantity (s->inputs.internal_pressure);
  g_autofree char *p_out = csv_quantity (s->inputs.external_pressure);
  double design = hl_row_convert (HL_ROW_STRESS, system, s->check.methods[0].design_pressure);
  g_autofree char *dp = hl_format_significant (design, 10);

  g_string_append (out, "# table = stresses through the wall; fields separated by commas (RFC 4180), "
                        "numbers in the C locale (decimal point, no grouping)\n");
  g_string_append_printf (out, "# shell = %s\n", id);
  g_string_append_printf (out, "# name = %s\n", name);
  g_string_append_printf (out, "# units = %s\n", hl_unit_system_words (system));
  g_string_append_printf (out, "# design_pressure = %s %s (internal, gauge)\n", dp,
                          hl_row_unit (HL_ROW_STRESS, system));
  g_string_append_printf (out, "# internal_pressure = %s\n", p_in);
  g_string_append_printf (out, "# external_pressure = %s\n", p_out);
}

char *
hl_report_csv (const HlSolution *s,
               HlUnitSystem      system)
{
  static const char *const columns[] = {
    "radius", "hoop_lame", "radial_lame", "axial_lame", "von_mises", "tresca", "hoop_thin", "axial_thin",
  };
  const char *lu = hl_row_unit (HL_ROW_LENGTH, system);
  const char *su = hl_row_unit (HL_ROW_STRESS, system);
  GString *out = g_string_new (NULL);
  g_autofree char *u = hl_format_significant (100 * s->check.utilisation, 9);

  /* what the table is and for which load, then the verdicts the other
   * outputs give, as comment lines a reader skips (pandas comment="#",
   * numpy's default), so a table sent on alone still says what it is
   * and whether the wall passes */
  put_csv_identity (out, s, system);
  g_string_append_printf (out, "# design_verdict = %s\n", hl_check_result_to_string (s->check.verdict));
  g_string_append_printf (out, "# governing_check = %s\n", s->check.governing);
  g_string_append_printf (out, "# utilisation = %s %%\n", isfinite (s->check.utilisation) ? u : "n/a");
  g_string_append_printf (out, "# thin_wall_verdict = %s\n", s->is_thin ? "thin" : "thick");
  for (guint k = 0; k < G_N_ELEMENTS (columns); k++)
    {
      g_autofree char *name = g_strdup_printf ("%s_%s", columns[k], k == 0 ? lu : su);
      g_autofree char *field = hl_report_csv_field (name);

      g_string_append (out, field);
      g_string_append_c (out, k + 1 == G_N_ELEMENTS (columns) ? '\n' : ',');
    }
  for (guint i = 0; i < s->n_points; i++)
    {
      const HlWallPoint *p = &s->points[i];
      double stresses[] = { p->hoop, p->radial, p->axial, p->von_mises, p->tresca, p->thin_hoop, p->thin_axial };

      put_csv_value (out, hl_row_convert (HL_ROW_LENGTH, system, p->r), FALSE);
      for (guint k = 0; k < G_N_ELEMENTS (stresses); k++)
        put_csv_value (out, hl_row_convert (HL_ROW_STRESS, system, stresses[k]), k + 1 == G_N_ELEMENTS (stresses));
    }
  return g_string_free (out, FALSE);
}
