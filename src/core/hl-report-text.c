/* hl-report-text.c — the calculation report a reviewer can follow
 *
 * The design note's rows (hl-note-content.c), the same the PDF sheet
 * lays out, printed as plain text: the two cannot disagree.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-report-text"

#include "hl-report.h"
#include "hl-note.h"


char *
hl_report_text (const HlProject  *project,
                const HlSolution *new_wall,
                const HlSolution *corroded,
                HlUnitSystem      system)
{
  return hl_report_text_in (project, new_wall, corroded, system, FALSE);
}

char *
hl_report_text_in (const HlProject  *project,
                   const HlSolution *new_wall,
                   const HlSolution *corroded,
                   HlUnitSystem      system,
                   gboolean          locale_numbers)
{
  g_autoptr(GArray) rows = NULL;
  double c;

  g_return_val_if_fail (corroded != NULL, NULL);
  /* the new wall stands beside the corroded one only when an allowance
   * makes them differ, as on the sheet */
  c = hl_quantity_si (corroded->inputs.corrosion_allowance, HL_KIND_LENGTH);
  rows = hl_note_content (project, corroded, corroded->corroded && c > 0 && new_wall != corroded ? new_wall : NULL,
                          system, locale_numbers, NULL);
  return hl_note_to_text (rows, HL_REPORT_TEXT_WIDTH);
}
