/* hl-report-summary.c — summary lines and the CSV table
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-report-summary"

#include "hl-report.h"
#include "hl-result-rows.h"

/* issue: at least 6 significant digits; 9 keeps round-off visible */
#define SUMMARY_DIGITS 9

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

      g_string_append_printf (out, "%s = %s\n", r->key, text);
    }
  for (guint i = 0; i < solution->warnings->len; i++)
    g_string_append_printf (out, "warning = %s\n", (const char *) g_ptr_array_index (solution->warnings, i));
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

char *
hl_report_csv (const HlSolution *s,
               HlUnitSystem      system)
{
  const char *lu = hl_row_unit (HL_ROW_LENGTH, system);
  const char *su = hl_row_unit (HL_ROW_STRESS, system);
  GString *out = g_string_new (NULL);

  g_string_append_printf (out,
                          "radius_%s,hoop_lame_%s,radial_lame_%s,axial_lame_%s,von_mises_%s,tresca_%s,hoop_thin_%s,axial_thin_%s\n",
                          lu, su, su, su, su, su, su, su);
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
