/* hl-paper.h — the paper a report is printed on
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

typedef enum
{
  HL_PAPER_A4,       /* ISO 216: 210 mm x 297 mm */
  HL_PAPER_LETTER,   /* ANSI A: 8.5 in x 11 in */
} HlPaper;

/* Portrait size in PostScript points (1/72 in). */
#define HL_PAPER_A4_WIDTH      (210.0 / 25.4 * 72.0)
#define HL_PAPER_A4_HEIGHT     (297.0 / 25.4 * 72.0)
#define HL_PAPER_LETTER_WIDTH  612.0
#define HL_PAPER_LETTER_HEIGHT 792.0

G_END_DECLS
