/* hl-note-private.h — what the parts of the note builder share
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-config.h"
#include "hl-note.h"
#include "hl-design-check.h"
#include "hl-result-rows.h"

#include <glib/gi18n-lib.h>

G_BEGIN_DECLS

/* No-break space between a number and its unit, so a wrap never
 * separates them (the text report prints a plain space). */
#define HL_NOTE_NBSP "\xc2\xa0"

typedef struct
{
  const HlProject  *project;    /* may be NULL */
  const HlSolution *s;          /* the analysis: corroded when there is an allowance */
  const HlSolution *new_wall;   /* or NULL */
  HlUnitSystem      units;
  gboolean          loc;        /* user's decimal separator */
  const char       *date;       /* "YYYY-MM-DD" */
} HlNoteCtx;

/* @digits significant, fixed decimals for small values, a true minus */
char       *hl_note_sig            (double           value,
                                    int              digits,
                                    gboolean         locale);
/* SI @si in the row unit of @kind for the note's units: "66.3 MPa";
 * "—" when not finite */
char       *hl_note_quantity       (const HlNoteCtx *ctx,
                                    double           si,
                                    HlRowKind        kind,
                                    int              digits);
/* "104.9 %", or "—" */
char       *hl_note_percent        (const HlNoteCtx *ctx,
                                    double           fraction);
/* "PASS", "FAIL", "NOT APPLICABLE": a verdict */
const char *hl_note_check_word     (HlCheckResult    result);
/* why a method fails or does not apply; NULL when it passes */
char       *hl_note_check_reason   (const HlNoteCtx     *ctx,
                                    const HlMethodCheck *check);

/* the sections, in hl-note-*.c */
void        hl_note_checks_summary (GArray *rows, const HlNoteCtx *ctx);
void        hl_note_design_check   (GArray *rows, const HlNoteCtx *ctx);
void        hl_note_check_steps    (GArray *rows, const HlNoteCtx *ctx);
void        hl_note_inputs         (GArray *rows, const HlNoteCtx *ctx);
void        hl_note_results        (GArray *rows, const HlNoteCtx *ctx);
void        hl_note_test_pressure  (GArray *rows, const HlNoteCtx *ctx);
void        hl_note_verdict        (GArray *rows, const HlNoteCtx *ctx);
void        hl_note_limits         (GArray *rows, const HlNoteCtx *ctx);

G_END_DECLS
