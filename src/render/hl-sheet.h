/* hl-sheet.h — the calculation sheet: inputs, results, methods, warnings
 *
 * Pages of a given size drawn into any cairo context: the PDF export
 * appends them after the figure, the window's print uses them as is.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-figure.h"

G_BEGIN_DECLS

/* A4 portrait in points */
#define HL_SHEET_A4_WIDTH  595.0
#define HL_SHEET_A4_HEIGHT 842.0

/* Pages the sheet of @ctx takes at @width x @height user units (>= 1;
 * 0 when @ctx has no solution). */
guint hl_sheet_page_count (double                 width,
                           double                 height,
                           const HlFigureContext *ctx);
/* Draws page @page (from 0) filling @width x @height of @cr. */
void  hl_sheet_draw_page  (cairo_t               *cr,
                           double                 width,
                           double                 height,
                           guint                  page,
                           const HlFigureContext *ctx);

G_END_DECLS
