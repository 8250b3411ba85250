/* hl-sheet-private.h — the sheet's content as rows to lay out
 *
 * The rows are the design note's (src/core/hl-note.h): the text report
 * prints the same rows, so sheet and report cannot disagree.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-figure.h"
#include "hl-note.h"
#include "hl-text.h"

G_BEGIN_DECLS

typedef HlNoteRow HlSheetRow;

#define HL_SHEET_TITLE     HL_NOTE_TITLE
#define HL_SHEET_HEADING   HL_NOTE_HEADING
#define HL_SHEET_PARAGRAPH HL_NOTE_PARAGRAPH
#define HL_SHEET_BULLET    HL_NOTE_BULLET
#define HL_SHEET_TABLE     HL_NOTE_TABLE
#define HL_SHEET_BOX       HL_NOTE_BOX

/* rows of the sheet of @ctx in reading order (HlNoteRow, cleared) */
GArray *hl_sheet_rows (const HlFigureContext *ctx);

G_END_DECLS
