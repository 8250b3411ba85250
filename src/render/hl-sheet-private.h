/* hl-sheet-private.h — the sheet's content as rows to lay out
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-figure.h"
#include "hl-text.h"

G_BEGIN_DECLS

typedef enum
{
  HL_SHEET_TITLE,      /* sheet title, then the shell on a second line */
  HL_SHEET_HEADING,    /* section heading, kept with the next row */
  HL_SHEET_PARAGRAPH,
  HL_SHEET_BULLET,
  HL_SHEET_TABLE,      /* cells in columns of widths @cols (fractions) */
  HL_SHEET_BOX,        /* boxed paragraph: the caution */
} HlSheetRowKind;

#define HL_SHEET_MAX_CELLS 4

typedef struct
{
  HlSheetRowKind kind;
  char          *cells[HL_SHEET_MAX_CELLS];
  guint          n_cells;
  const double  *cols;
  gboolean       strong;   /* table header, bold */
  gboolean       note;     /* last cell is a reference note, set small */
  double         height;   /* laid out */
} HlSheetRow;

/* rows of the sheet of @ctx in reading order (HlSheetRow, cleared) */
GArray *hl_sheet_rows (const HlFigureContext *ctx);

G_END_DECLS
