/* hl-sheet-content.c — what the calculation sheet says: the design note
 *
 * The note's builder is in core (hl-note-content.c), shared with the text
 * report; this file only picks the figure context's parts for it.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-sheet-content"

#include "hl-sheet-private.h"

GArray *
hl_sheet_rows (const HlFigureContext *ctx)
{
  const HlSolution *s = ctx->solution;
  g_autoptr(HlSolution) solved_here = NULL;
  const HlSolution *new_wall = NULL;
  double c = hl_quantity_si (s->inputs.corrosion_allowance, HL_KIND_LENGTH);

  /* with an allowance the sheet shows the new wall beside the corroded
   * one, as the text report does: the caller's analysis, when it has one */
  if (s->corroded && c > 0)
    new_wall = ctx->new_wall != NULL ? ctx->new_wall
                                     : (solved_here = hl_solve (&s->inputs, HL_DEFAULT_POINTS, FALSE, NULL));
  return hl_note_content (ctx->project, s, new_wall, ctx->units, ctx->locale_numbers, ctx->export_date);
}
