/* hl-units.h — unit tables and parsing of physical values (numbers as
 * text: hl-number-format.h)
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-number-format.h"

#include <glib.h>

G_BEGIN_DECLS

typedef enum
{
  HL_KIND_LENGTH,
  HL_KIND_STRESS,   /* pressure and stress share one table */
  HL_KIND_PERCENT,
  HL_KIND_RATIO,    /* dimensionless, no unit accepted */
  HL_KIND_MODULUS,  /* same units as stress; kept apart for defaults */
  HL_KIND_TEMPERATURE, /* SI kelvin; °C and °F carry an offset */
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

/* Offset to SI of @unit for @kind: SI = value * factor + offset.  Zero
 * for every kind but temperature (NIST SP 811 B.9: T/K = t/°C + 273.15,
 * T/K = (t/°F + 459.67) / 1.8). */
double        hl_unit_offset            (HlQuantityKind kind,
                                         const char    *unit);

/* Canonical symbol of @unit ("N/mm^2" -> "N/mm2", "Inch" -> "in"), or
 * NULL when unknown; the same matching as hl_unit_factor(). */
const char   *hl_unit_canonical         (HlQuantityKind kind,
                                         const char    *unit);

/* NULL-terminated list of canonical unit names for @kind. */
const char * const *hl_unit_names       (HlQuantityKind kind);

const char   *hl_unit_default           (HlQuantityKind kind,
                                         HlUnitSystem   system);

/* SI @si (m, Pa, fraction, K) as a number in @system's unit for @kind
 * (hl_unit_default: mm or in, MPa or psi, GPa or ksi for a modulus, %,
 * °C or °F), that unit in @unit_out (may be NULL).  What a listing of
 * inputs shows beside the value as typed, so that a US project's column
 * is in US units whatever was typed. */
double        hl_unit_to_system         (double          si,
                                         HlQuantityKind  kind,
                                         HlUnitSystem    system,
                                         const char    **unit_out);

/* The one wording of a unit system, "SI (mm, MPa)" or "US customary
 * (in, psi)", in English and marked with N_(): the window, the figure
 * and the sheet show it through gettext, files and the CSV as it is. */
const char   *hl_unit_system_words      (HlUnitSystem   system);

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

G_END_DECLS
