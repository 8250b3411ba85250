/* hl-units.c — unit tables, parsing and formatting of physical values
 *
 * Factors follow NIST SP 811 (2008), Appendix B: 1 in = 0.0254 m and
 * 1 ft = 0.3048 m exactly, 1 bar = 1e5 Pa exactly,
 * 1 psi = 6894.757293168 Pa (lbf/in^2 from the exact pound-force).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-units"

#include "hl-units.h"

#include <math.h>
#include <stdio.h>
#include <string.h>
#include <locale.h>

typedef struct
{
  const char *name;     /* canonical */
  const char *aliases;  /* '|' separated, compared case-insensitively */
  double      factor;
} HlUnitRow;

static const HlUnitRow length_units[] = {
  { "m",  "metre|meter|meters|metres", 1.0 },
  { "cm", "centimetre|centimeter", 0.01 },
  { "mm", "millimetre|millimeter", 0.001 },
  { "in", "inch|inches|\"", 0.0254 },
  { "ft", "foot|feet|'", 0.3048 },
  { NULL, NULL, 0 }
};

static const HlUnitRow stress_units[] = {
  { "Pa",    "pascal", 1.0 },
  { "kPa",   "", 1e3 },
  { "MPa",   "", 1e6 },
  { "GPa",   "", 1e9 },
  { "bar",   "", 1e5 },
  { "psi",   "lbf/in2|lbf/in^2", 6894.757293168 },
  { "ksi",   "", 6894757.293168 },
  { "N/mm2", "N/mm^2|N/mm\xc2\xb2|N/sq.mm", 1e6 },
  { NULL, NULL, 0 }
};

static const HlUnitRow percent_units[] = {
  { "%", "percent|pct", 0.01 },
  { NULL, NULL, 0 }
};

static const HlUnitRow ratio_units[] = {
  { "", "", 1.0 },
  { NULL, NULL, 0 }
};

static const char * const length_names[] = { "mm", "cm", "m", "in", "ft", NULL };
static const char * const stress_names[] = { "MPa", "bar", "kPa", "Pa", "GPa", "N/mm2", "psi", "ksi", NULL };
static const char * const percent_names[] = { "%", NULL };
static const char * const ratio_names[] = { "", NULL };

G_DEFINE_QUARK (hl-units-error-quark, hl_units_error)

static const HlUnitRow *
table_for (HlQuantityKind kind)
{
  switch (kind)
    {
    case HL_KIND_LENGTH:
      return length_units;
    case HL_KIND_STRESS:
    case HL_KIND_MODULUS:
      return stress_units;
    case HL_KIND_PERCENT:
      return percent_units;
    case HL_KIND_RATIO:
    default:
      return ratio_units;
    }
}

static gboolean
alias_matches (const char *aliases,
               const char *unit)
{
  g_auto(GStrv) parts = g_strsplit (aliases, "|", -1);

  for (guint i = 0; parts[i] != NULL; i++)
    if (parts[i][0] != '\0' && g_ascii_strcasecmp (parts[i], unit) == 0)
      return TRUE;
  return FALSE;
}

static const HlUnitRow *
find_row (HlQuantityKind kind,
          const char    *unit)
{
  const HlUnitRow *rows = table_for (kind);

  if (unit == NULL)
    return NULL;
  for (guint i = 0; rows[i].name != NULL; i++)
    if (strcmp (rows[i].name, unit) == 0)
      return &rows[i];
  for (guint i = 0; rows[i].name != NULL; i++)
    if (g_ascii_strcasecmp (rows[i].name, unit) == 0 || alias_matches (rows[i].aliases, unit))
      return &rows[i];
  return NULL;
}

double
hl_unit_factor (HlQuantityKind kind,
                const char    *unit)
{
  const HlUnitRow *row = find_row (kind, unit);

  return row != NULL ? row->factor : 0.0;
}

const char *
hl_unit_canonical (HlQuantityKind kind,
                   const char    *unit)
{
  const HlUnitRow *row = find_row (kind, unit);

  return row != NULL ? row->name : NULL;
}

const char * const *
hl_unit_names (HlQuantityKind kind)
{
  switch (kind)
    {
    case HL_KIND_LENGTH:
      return length_names;
    case HL_KIND_STRESS:
    case HL_KIND_MODULUS:
      return stress_names;
    case HL_KIND_PERCENT:
      return percent_names;
    case HL_KIND_RATIO:
    default:
      return ratio_names;
    }
}

const char *
hl_unit_default (HlQuantityKind kind,
                 HlUnitSystem   system)
{
  gboolean us = system == HL_UNIT_SYSTEM_US;

  switch (kind)
    {
    case HL_KIND_LENGTH:
      return us ? "in" : "mm";
    case HL_KIND_STRESS:
      return us ? "psi" : "MPa";
    case HL_KIND_MODULUS:
      return us ? "ksi" : "GPa";
    case HL_KIND_PERCENT:
      return "%";
    case HL_KIND_RATIO:
    default:
      return "";
    }
}

/* Length of the longest prefix of @s that is a plain decimal number:
 * [sign] digits [sep digits] [e|E [sign] digits].  Hex, inf and nan are
 * not numbers here, which is why strtod is not used directly. */
static gsize
scan_number (const char *s,
             char        separator)
{
  gsize i = 0, digits = 0;

  if (s[i] == '+' || s[i] == '-')
    i++;
  while (g_ascii_isdigit (s[i]))
    i++, digits++;
  if (s[i] == separator)
    {
      i++;
      while (g_ascii_isdigit (s[i]))
        i++, digits++;
    }
  if (digits == 0)
    return 0;
  if (s[i] == 'e' || s[i] == 'E')
    {
      gsize j = i + 1, exp_digits = 0;

      if (s[j] == '+' || s[j] == '-')
        j++;
      while (g_ascii_isdigit (s[j]))
        j++, exp_digits++;
      if (exp_digits > 0)
        i = j;
    }
  return i;
}

static gboolean
convert_number (const char *start,
                gsize       len,
                char        separator,
                double     *value,
                GError    **error)
{
  g_autofree char *copy = g_strndup (start, len);
  double v;

  if (separator != '.')
    g_strdelimit (copy, ",", '.');
  v = g_ascii_strtod (copy, NULL);
  if (!isfinite (v))
    {
      g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_OUT_OF_RANGE,
                   "“%s” is too large to be a value", copy);
      return FALSE;
    }
  /* -0 is zero: keeps sign tests and the printed value honest */
  *value = v == 0.0 ? 0.0 : v;
  return TRUE;
}

gboolean
hl_parse_number (const char *text,
                 double     *value,
                 GError    **error)
{
  g_autofree char *stripped = NULL;
  gsize len;

  g_return_val_if_fail (value != NULL, FALSE);

  stripped = g_strstrip (g_strdup (text != NULL ? text : ""));
  if (stripped[0] == '\0')
    {
      g_set_error_literal (error, HL_UNITS_ERROR, HL_UNITS_ERROR_EMPTY, "no value given");
      return FALSE;
    }
  len = scan_number (stripped, '.');
  if (len == 0 || stripped[len] != '\0')
    {
      g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_NOT_A_NUMBER,
                   "“%s” is not a plain decimal number", stripped);
      return FALSE;
    }
  return convert_number (stripped, len, '.', value, error);
}

gboolean
hl_units_parse (const char     *text,
                HlQuantityKind  kind,
                const char     *fallback_unit,
                gboolean        decimal_comma,
                double         *value,
                const char    **unit_out,
                GError        **error)
{
  g_autofree char *stripped = NULL;
  const char *unit_text;
  const char *canonical;
  char separator = decimal_comma ? ',' : '.';
  gsize len;

  g_return_val_if_fail (value != NULL, FALSE);

  stripped = g_strstrip (g_strdup (text != NULL ? text : ""));
  if (stripped[0] == '\0')
    {
      g_set_error_literal (error, HL_UNITS_ERROR, HL_UNITS_ERROR_EMPTY, "no value given");
      return FALSE;
    }
  len = scan_number (stripped, separator);
  /* accept a point even with a comma locale: engineers paste both */
  if (decimal_comma && (len == 0 || stripped[len] == '.'))
    {
      separator = '.';
      len = scan_number (stripped, separator);
    }
  if (len == 0)
    {
      g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_NOT_A_NUMBER,
                   "“%s” does not start with a number", stripped);
      return FALSE;
    }
  unit_text = stripped + len;
  while (*unit_text == ' ' || *unit_text == '\t')
    unit_text++;
  if (*unit_text == '\0')
    {
      /* a bare number takes the field's unit, or the kind's own default */
      canonical = hl_unit_canonical (kind, fallback_unit);
      if (canonical == NULL)
        canonical = hl_unit_canonical (kind, hl_unit_default (kind, HL_UNIT_SYSTEM_SI));
    }
  else
    canonical = hl_unit_canonical (kind, unit_text);
  if (canonical == NULL)
    {
      g_autofree char *known = g_strjoinv (", ", (char **) hl_unit_names (kind));

      if (kind == HL_KIND_RATIO)
        g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_UNKNOWN_UNIT,
                     "“%s” is not expected here: this value is a plain number", unit_text);
      else
        g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_UNKNOWN_UNIT,
                     "unknown unit “%s” (use one of %s)", unit_text, known);
      return FALSE;
    }
  if (!convert_number (stripped, len, separator, value, error))
    return FALSE;
  if (unit_out != NULL)
    *unit_out = canonical;
  return TRUE;
}

char *
hl_format_exact (double value)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  if (!isfinite (value))
    return g_strdup ("n/a");
  if (value == 0.0)
    return g_strdup ("0");
  for (int digits = 1; digits <= 17; digits++)
    {
      char fmt[8];

      g_snprintf (fmt, sizeof fmt, "%%.%dg", digits);
      g_ascii_formatd (buf, sizeof buf, fmt, value);
      if (g_ascii_strtod (buf, NULL) == value)
        break;
    }
  return g_strdup (buf);
}

static char *
format_with (double   value,
             int      significant,
             gboolean c_locale)
{
  char buf[64];
  double mag;

  if (!isfinite (value))
    return g_strdup ("n/a");
  significant = CLAMP (significant, 1, 17);
  if (value == 0.0)
    return g_strdup ("0");
  mag = fabs (value);
  if (mag >= 1e-4 && mag < 1e9)
    {
      int decimals = significant - 1 - (int) floor (log10 (mag));

      decimals = MAX (decimals, 0);
      if (c_locale)
        {
          char fmt[16];

          g_snprintf (fmt, sizeof fmt, "%%.%df", decimals);
          g_ascii_formatd (buf, sizeof buf, fmt, value);
        }
      else
        g_snprintf (buf, sizeof buf, "%.*f", decimals, value);
      /* trim trailing zeros after the separator: "12.50" -> "12.5" */
      if (decimals > 0)
        {
          char *end = buf + strlen (buf) - 1;

          while (end > buf && *end == '0')
            *end-- = '\0';
          if (*end == '.' || *end == ',')
            *end = '\0';
        }
    }
  else if (c_locale)
    {
      char fmt[16];

      g_snprintf (fmt, sizeof fmt, "%%.%dg", significant);
      g_ascii_formatd (buf, sizeof buf, fmt, value);
    }
  else
    g_snprintf (buf, sizeof buf, "%.*g", significant, value);
  if (strcmp (buf, "-0") == 0)
    return g_strdup ("0");
  return g_strdup (buf);
}

char *
hl_format_significant (double value,
                       int    significant)
{
  return format_with (value, significant, TRUE);
}

char *
hl_format_display (double value,
                   int    significant)
{
  return format_with (value, significant, FALSE);
}
