/* hl-sheet.h — the calculation sheet: the design note laid out on pages
 *
 * Pages of a given size drawn into any cairo context: the PDF export
 * puts them after each shell's figure, the window's print uses them as
 * is.  Every page has a header (project, item, design basis and code
 * edition, revision, page N of M over the whole document) and the
 * caution in its footer.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-figure.h"

G_BEGIN_DECLS

/* A4 portrait in points */
#define HL_SHEET_A4_WIDTH  595.0
#define HL_SHEET_A4_HEIGHT 842.0

/* Where the pages drawn stand in the whole document, for "page N of M". */
typedef struct
{
  guint first;   /* the document's number (from 0) of the part's first page */
  guint total;   /* pages in the whole document */
} HlSheetNumbering;

/* Pages the sheet of @ctx takes at @width x @height user units (>= 1;
 * 0 when @ctx has no solution). */
guint hl_sheet_page_count (double                 width,
                           double                 height,
                           const HlFigureContext *ctx);
/* Draws page @page (from 0) filling @width x @height of @cr, numbered as
 * the print and a one-shell PDF lay the pages out: the figure first,
 * then the sheet. */
void  hl_sheet_draw_page  (cairo_t               *cr,
                           double                 width,
                           double                 height,
                           guint                  page,
                           const HlFigureContext *ctx);
/* The same, numbered by @numbering. */
void  hl_sheet_draw_page_numbered (cairo_t                *cr,
                                   double                  width,
                                   double                  height,
                                   guint                   page,
                                   const HlFigureContext  *ctx,
                                   const HlSheetNumbering *numbering);

/* The project summary that opens a whole-project report: @contexts holds
 * one HlFigureContext * per shell (each with a solution); the first
 * context's project, units, number format and date are the report's. */
guint hl_sheet_summary_page_count (double      width,
                                   double      height,
                                   GPtrArray  *contexts);
void  hl_sheet_summary_draw_page  (cairo_t                *cr,
                                   double                  width,
                                   double                  height,
                                   guint                   page,
                                   GPtrArray              *contexts,
                                   const HlSheetNumbering *numbering);

G_END_DECLS
