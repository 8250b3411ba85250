/* hl-note.h — the design note's content as rows, before any layout
 *
 * One builder (hl-note-content.c) fills the rows; the PDF sheet lays
 * them out on pages (src/render/hl-sheet.c) and the text report prints
 * them as plain text (hl-note-text.c), so the two cannot disagree.
 * GLib only: no cairo, no GTK.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-project.h"
#include "hl-solution.h"

G_BEGIN_DECLS

typedef enum
{
  HL_NOTE_TITLE,      /* title, then the item on a second cell */
  HL_NOTE_HEADING,    /* section heading, kept with the rows after it */
  HL_NOTE_PARAGRAPH,
  HL_NOTE_BULLET,
  HL_NOTE_TABLE,      /* cells in columns of widths @cols (fractions of the line) */
  HL_NOTE_BOX,        /* boxed paragraph: the caution */
} HlNoteRowKind;

#define HL_NOTE_MAX_CELLS 8

typedef struct
{
  HlNoteRowKind kind;
  char         *cells[HL_NOTE_MAX_CELLS];
  guint         n_cells;
  const double *cols;      /* tables: one fraction per cell; the rows of one
                            * table share the pointer */
  gboolean      strong;    /* a table's header row, or a verdict: bold */
  gboolean      note;      /* the last cell is a reference note, set small */
  gboolean      boxed;     /* a table whose cells are boxes to fill in (sign-off) */
} HlNoteRow;

/* An empty list of rows that frees its cells. */
GArray  *hl_note_new        (void);
/* Appends a row of @n cells (const char *, NULL for ""), copied. */
void     hl_note_add        (GArray         *rows,
                             HlNoteRowKind   kind,
                             const double   *cols,
                             gboolean        strong,
                             guint           n,
                             ...);
/* Appends a one-cell row and frees @owned. */
void     hl_note_add_owned  (GArray         *rows,
                             HlNoteRowKind   kind,
                             gboolean        strong,
                             char           *owned);
/* Row @i of @rows */
#define  hl_note_row(rows, i) (&g_array_index ((rows), HlNoteRow, (i)))

/* The note of one shell.  @corroded is the analysis (with the corrosion
 * allowance when there is one), @new_wall the same shell without it, or
 * NULL (then no new-wall column).  Words in the user's language; numbers
 * with the user's decimal separator only when @locale_numbers.
 * @export_date "YYYY-MM-DD" or NULL for today. */
GArray  *hl_note_content    (const HlProject  *project,
                             const HlSolution *corroded,
                             const HlSolution *new_wall,
                             HlUnitSystem      units,
                             gboolean          locale_numbers,
                             const char       *export_date);

/* The first part of a whole-project note: the project, then one line per
 * shell of @solutions (const HlSolution *, each the analysis of a shell:
 * corroded when it has an allowance) — form, size, design pressure, MAWP
 * of the design basis, utilisation, design and thin-wall verdicts — with
 * the values exactly as `hoopline --summary` prints them (C locale
 * unless @locale_numbers). */
GArray  *hl_note_project_summary (const HlProject *project,
                                  GPtrArray       *solutions,
                                  HlUnitSystem     units,
                                  gboolean         locale_numbers,
                                  const char      *export_date);
/* The summary's columns (for tests that read a cell by its meaning) */
typedef enum
{
  HL_NOTE_SUMMARY_SHELL,
  HL_NOTE_SUMMARY_FORM,
  HL_NOTE_SUMMARY_SIZE,
  HL_NOTE_SUMMARY_DESIGN_PRESSURE,
  HL_NOTE_SUMMARY_MAWP,
  HL_NOTE_SUMMARY_UTILISATION,
  HL_NOTE_SUMMARY_DESIGN_VERDICT,
  HL_NOTE_SUMMARY_THIN_VERDICT,
  HL_NOTE_SUMMARY_N_COLUMNS,
} HlNoteSummaryColumn;

/* Columns of the text report: a printed page at 10 characters an inch */
#define HL_REPORT_TEXT_WIDTH 100

/* The rows as plain text: tables as aligned columns, paragraphs wrapped
 * at @width columns, every cell through hl_report_escape_line(). */
char    *hl_note_to_text    (GArray         *rows,
                             guint           width);

/* "Rev. 3", or "no revision recorded": the label of every page */
char    *hl_note_revision_label (const HlProject *project);

/* Words the note shares with the figure and the window, so they read
 * the same everywhere: */
/* the core's N_() text in the user's language ("" for NULL) */
const char *hl_note_core_text      (const char          *text);
/* "Caution: " and HL_CAUTION in the user's language */
char       *hl_note_caution        (void);
/* "sphere", "cylinder, closed ends", ... */
const char *hl_note_form_text      (const HlShellInputs *inputs);
/* why a method of the design check fails or does not apply, with its
 * numbers in @units; NULL when it passes */
char       *hl_note_method_reason  (const HlMethodCheck *check,
                                    HlUnitSystem         units,
                                    gboolean             locale_numbers);

G_END_DECLS
