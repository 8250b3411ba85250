/* hl-report.h — text outputs: summary lines, CSV table, calculation report
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-project.h"
#include "hl-solution.h"

G_BEGIN_DECLS

/* The caution every output carries. */
#define HL_CAUTION \
  "Preliminary checking only. Pressure equipment can kill: design and " \
  "approval follow the applicable code, local rules and a qualified, " \
  "licensed engineer."

/* @text made safe for one line of a text output, so that no user text
 * (a name, a title) can start a line of its own or move a column: a
 * backslash becomes "\\", the C escapes "\n", "\r", "\t" stand for
 * their characters, any other control character (C0, DEL) is "\xNN",
 * a C1 control or U+2028/U+2029 is "\uNNNN", and a byte that is not
 * UTF-8 is "\xNN".  Everything else is kept as it is. */
char *hl_report_escape_line   (const char *text);

/* @text as one CSV field (RFC 4180 §2): escaped as hl_report_escape_line
 * (so a record stays one line for tools that read by lines), then
 * enclosed in double quotes, with each quote doubled, when it holds a
 * comma, a double quote or leading or trailing spaces. */
char *hl_report_csv_field     (const char *text);

/* "key = value unit" block for one solution, warnings last; every value
 * and warning goes through hl_report_escape_line(). */
char *hl_report_summary_block (const HlSolution *solution,
                               HlUnitSystem      system);

/* Through-thickness table, inner to outer surface inclusive; CSV with
 * fields per hl_report_csv_field(), separated by commas (RFC 4180),
 * numbers in the C locale whatever the user's, after
 * HL_CSV_PREAMBLE_LINES comment lines "# key = value": what the table is
 * and its separator (table), the shell (shell, name), the unit system
 * (units), the load (design_pressure, internal_pressure,
 * external_pressure) and the verdicts (design_verdict, governing_check,
 * utilisation, thin_wall_verdict).  A CSV of several shells is these
 * blocks one after another, each starting at its "# table =" line. */
#define HL_CSV_PREAMBLE_LINES 11
char *hl_report_csv           (const HlSolution *solution,
                               HlUnitSystem      system);

/* Calculation report a reviewer can follow.  @new_wall and @corroded are
 * the same shell solved without and with the corrosion allowance.  Every
 * text from the project is printed through hl_report_escape_line(). */
char *hl_report_text          (const HlProject  *project,
                               const HlSolution *new_wall,
                               const HlSolution *corroded,
                               HlUnitSystem      system);

/* The same with the user's decimal separator when @locale_numbers (an
 * export from a decimal-comma window); the words follow the user's
 * language either way. */
char *hl_report_text_in       (const HlProject  *project,
                               const HlSolution *new_wall,
                               const HlSolution *corroded,
                               HlUnitSystem      system,
                               gboolean          locale_numbers);

G_END_DECLS
