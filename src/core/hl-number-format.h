/* hl-number-format.h — every number as text: files, reports, sheet,
 * figure and fields
 *
 * One module, so that a number reads the same wherever it is shown and
 * a file's number reads back exactly.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* C-locale text with the fewest significant digits that reads back to
 * exactly @value: a plain decimal for 1e-6 <= |v| < 1e15 ("2000",
 * "0.0125"), printf's exponent form beyond ("1e-320", "1e+22"). */
char         *hl_format_exact           (double value);

/* @value with @significant digits, C locale, no exponent for
 * 1e-4 <= |v| < 1e9.  Never prints nan or inf: those come out as "n/a". */
char         *hl_format_significant     (double value,
                                         int    significant);

/* Whether the user's locale (LC_NUMERIC) writes a decimal comma. */
gboolean      hl_format_locale_decimal_comma (void);

/* As hl_format_significant but in the user's locale (decimal comma). */
char         *hl_format_display         (double value,
                                         int    significant);

/* @decimals after the point (0 to 12), C locale unless @locale; a value
 * that would print as -0.00 prints as 0.00.  "n/a" when not finite. */
char         *hl_format_fixed           (double   value,
                                         int      decimals,
                                         gboolean locale);

/* For a reader of a figure or sheet: as hl_format_significant (or
 * hl_format_display with @locale), but fixed decimals, trailing zeros
 * trimmed, for 1e-9 <= |v| < 1e-4: 0.000001, not 1e-06. */
char         *hl_format_readable        (double   value,
                                         int      digits,
                                         gboolean locale);

/* The shortest text that reads back to exactly @value, without an
 * exponent for 1e-6 <= |v| < 1e15 (people type 10 and 0.0015), with a
 * decimal comma when @decimal_comma; "" when not finite.  What a field
 * shows, so showing a value and reading it again never changes it. */
char         *hl_format_shortest        (double   value,
                                         gboolean decimal_comma);

/* U+202F NARROW NO-BREAK SPACE: ISO 80000-1 groups digits in threes
 * with a small space, which reads the same under a decimal point and a
 * decimal comma (a comma or a point as separator would not). */
#define HL_GROUP_SEPARATOR "\xe2\x80\xaf"

/* @text (a number as the formatters above print it) with the digits
 * before the decimal mark grouped in threes for a reader: "29007.5" ->
 * "29 007.5"; numbers of four digits or fewer and exponent forms are
 * kept.  Never for files or fields, which read numbers back. */
char         *hl_format_grouped         (const char *text);

/* @text (owned, freed) with a leading "-" made the true minus U+2212,
 * as a reader's text prints it */
char         *hl_format_true_minus      (char       *text);

/* A number for a reader of the sheet or the text report:
 * hl_format_readable, digits grouped (hl_format_grouped), a true minus. */
char         *hl_format_for_reading     (double      value,
                                         int         digits,
                                         gboolean    locale);

G_END_DECLS
