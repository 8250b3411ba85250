/* hl-units.h — unit tables, parsing and formatting of physical values
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

typedef enum
{
  HL_KIND_LENGTH,
  HL_KIND_STRESS,   /* pressure and stress share one table */
  HL_KIND_PERCENT,
  HL_KIND_RATIO,    /* dimensionless, no unit accepted */
  HL_KIND_MODULUS,  /* same units as stress; kept apart for defaults */
} HlQuantityKind;

typedef enum
{
  HL_UNIT_SYSTEM_SI,
  HL_UNIT_SYSTEM_US,
} HlUnitSystem;

#define HL_UNITS_ERROR (hl_units_error_quark ())

typedef enum
{
  HL_UNITS_ERROR_EMPTY,
  HL_UNITS_ERROR_NOT_A_NUMBER,
  HL_UNITS_ERROR_UNKNOWN_UNIT,
  HL_UNITS_ERROR_OUT_OF_RANGE,
} HlUnitsError;

GQuark        hl_units_error_quark      (void);

/* Factor to SI (m, Pa, fraction) of @unit for @kind, or 0 when unknown.
 * Symbols match exactly, case included ("MPa" yes, "mPa" and "mpa" no:
 * NIST SP 811 §6), and so do the listed alternative spellings ("N/mm^2",
 * "N/mm²", "PSI", "\"" for inch); unit names are words and match in any
 * case ("inch", "Metre"). */
double        hl_unit_factor            (HlQuantityKind kind,
                                         const char    *unit);

/* Canonical symbol of @unit ("N/mm^2" -> "N/mm2", "Inch" -> "in"), or
 * NULL when unknown; the same matching as hl_unit_factor(). */
const char   *hl_unit_canonical         (HlQuantityKind kind,
                                         const char    *unit);

/* NULL-terminated list of canonical unit names for @kind. */
const char * const *hl_unit_names       (HlQuantityKind kind);

const char   *hl_unit_default           (HlQuantityKind kind,
                                         HlUnitSystem   system);

/* Parses "12 bar", "0.5in", "1.5e3 mm", "7,5 MPa" (with @decimal_comma).
 * A bare number takes @fallback_unit.  Rejects hex, inf, nan, overflow.
 * Digit grouping is refused in both locales, with the accepted forms in
 * the message: grouping is 1-3 leading digits (the first not 0), then
 * one or more groups of a mark ('.', ',' or a space) and exactly three
 * digits, then the end, a unit or a decimal part.  With a decimal point
 * a comma is never a decimal mark ("1,500" and "7,5" are refused); with
 * a decimal comma a pasted point still reads as a decimal point ("0.5",
 * "7.25", "1.5000", "1.500e3") except where it could group ("1.500",
 * "1.500,5", "1.500.000"), and "1,500.5" is refused as English grouping.
 * Messages quote at most 40 characters of @text and are in the user's
 * language: this parser reads what is typed in the window.
 * On success stores the number as typed in @value and the canonical unit
 * in @unit_out (static string). */
gboolean      hl_units_parse            (const char     *text,
                                         HlQuantityKind  kind,
                                         const char     *fallback_unit,
                                         gboolean        decimal_comma,
                                         double         *value,
                                         const char    **unit_out,
                                         GError        **error);

/* Strict C-locale number parse of a whole string (file values). */
gboolean      hl_parse_number           (const char *text,
                                         double     *value,
                                         GError    **error);

/* C-locale text with the fewest significant digits that reads back to
 * exactly @value: a plain decimal for 1e-6 <= |v| < 1e15 ("2000",
 * "0.0125"), printf's exponent form beyond ("1e-320", "1e+22"). */
char         *hl_format_exact           (double value);

/* @value with @significant digits, C locale, no exponent for
 * 1e-4 <= |v| < 1e9.  Never prints nan or inf: those come out as "n/a". */
char         *hl_format_significant     (double value,
                                         int    significant);

/* As hl_format_significant but in the user's locale (decimal comma). */
char         *hl_format_display         (double value,
                                         int    significant);

G_END_DECLS
