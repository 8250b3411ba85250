/* hl-result-rows.h — the scalar results of a solution as labelled rows
 *
 * One list feeds the --summary keys, the text report, the window's
 * result table and the figure's annotations, so they never disagree.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-solution.h"

G_BEGIN_DECLS

typedef enum
{
  HL_ROW_LENGTH,
  HL_ROW_SMALL_LENGTH,  /* displacements */
  HL_ROW_STRESS,
  HL_ROW_PERCENT,
  HL_ROW_RATIO,
  HL_ROW_WORD,          /* text value: form, verdict */
} HlRowKind;

typedef struct
{
  const char *key;      /* summary key, stable */
  const char *label;    /* human label, translatable, English here */
  HlRowKind   kind;
  HlResult    result;   /* numbers, SI */
  const char *word;     /* for HL_ROW_WORD */
  const char *source;   /* formula or clause, or NULL */
} HlResultRow;

/* Rows in summary order.  The array owns nothing the solution does not. */
GArray     *hl_result_rows        (const HlSolution *solution);
const HlResultRow *hl_result_rows_find (GArray *rows, const char *key);

/* Unit a row is shown in for @system ("mm", "MPa", "%", "") */
const char *hl_row_unit           (HlRowKind    kind,
                                   HlUnitSystem system);
/* SI value -> value in hl_row_unit() */
double      hl_row_convert        (HlRowKind    kind,
                                   HlUnitSystem system,
                                   double       si);

/* "12.3456 MPa", "n/a (reason)", the word: C locale, @digits significant */
char       *hl_row_format         (const HlResultRow *row,
                                   HlUnitSystem       system,
                                   int                digits,
                                   gboolean           c_locale);

G_END_DECLS
