/* hl-units.c — unit tables, parsing and formatting of physical values
 *
 * Factors follow NIST SP 811 (2008), Appendix B: 1 in = 0.0254 m and
 * 1 ft = 0.3048 m exactly, 1 bar = 1e5 Pa exactly,
 * 1 psi = 6894.757293168 Pa (lbf/in^2 from the exact pound-force).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-units"

#include "hl-config.h"
#include "hl-units.h"
#include "hl-limits.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>
#include <string.h>
#include <locale.h>

/* Unit symbols are matched exactly: their case is part of the symbol
 * (NIST SP 811 §6: "mPa" is the millipascal, "MPa" the megapascal, "Mm"
 * the megametre), so a case-insensitive match would silently change a
 * value by nine orders of magnitude.  Besides the canonical symbol a row
 * lists the other spellings we accept on purpose, also exactly: the same
 * symbol typed without a superscript key ("N/mm^2"), the quote marks for
 * inch and foot, the capitals of US drawings ("PSI").  Unit *names* are
 * words, not symbols: "Inch" at the start of a sentence is still the
 * inch and no unit name differs from another only by case, so words are
 * compared ignoring ASCII case. */
typedef struct
{
  const char *name;       /* canonical symbol */
  const char *spellings;  /* '|' separated, compared exactly */
  const char *words;      /* '|' separated unit names, any ASCII case */
  double      factor;
  double      offset;     /* SI = value * factor + offset (temperatures) */
} HlUnitRow;

static const HlUnitRow length_units[] = {
  { "m",  "", "metre|meter|metres|meters", 1.0 },
  { "cm", "", "centimetre|centimeter|centimetres|centimeters", 0.01 },
  { "mm", "", "millimetre|millimeter|millimetres|millimeters", 0.001 },
  { "in", "\"", "inch|inches", 0.0254 },
  { "ft", "'", "foot|feet", 0.3048 },
  { NULL, NULL, NULL, 0 }
};

static const HlUnitRow stress_units[] = {
  { "Pa",    "", "pascal|pascals", 1.0 },
  { "kPa",   "", "", 1e3 },
  { "MPa",   "", "", 1e6 },
  { "GPa",   "", "", 1e9 },
  { "bar",   "", "", 1e5 },
  { "psi",   "PSI|lbf/in2|lbf/in^2", "", 6894.757293168 },
  { "ksi",   "KSI", "", 6894757.293168 },
  { "N/mm2", "N/mm^2|N/mm\xc2\xb2|N/sq.mm", "", 1e6 },
  { NULL, NULL, NULL, 0 }
};

static const HlUnitRow percent_units[] = {
  { "%", "pct", "percent", 0.01 },
  { NULL, NULL, NULL, 0 }
};

/* NIST SP 811 (2008) B.9: T/K = t/°C + 273.15; T/K = (t/°F + 459.67) / 1.8,
 * so factor 5/9 and offset 459.67 * 5/9 K.  "C" and "F" alone are the
 * coulomb and the farad, so the degree sign (or "deg") is part of the
 * symbol. */
static const HlUnitRow temperature_units[] = {
  { "\xc2\xb0""C", "degC|\xe2\x84\x83", "celsius", 1.0, 273.15 },
  { "K", "", "kelvin|kelvins", 1.0, 0.0 },
  { "\xc2\xb0""F", "degF|\xe2\x84\x89", "fahrenheit", 5.0 / 9.0,
    459.67 * 5.0 / 9.0 },
  { NULL, NULL, NULL, 0, 0 }
};

static const HlUnitRow ratio_units[] = {
  { "", "", "", 1.0 },
  { NULL, NULL, NULL, 0 }
};

static const char * const length_names[] = { "mm", "cm", "m", "in", "ft", NULL };
static const char * const stress_names[] = { "MPa", "bar", "kPa", "Pa", "GPa", "N/mm2", "psi", "ksi", NULL };
static const char * const percent_names[] = { "%", NULL };
static const char * const ratio_names[] = { "", NULL };
static const char * const temperature_names[] = { "\xc2\xb0""C", "K", "\xc2\xb0""F", NULL };

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
    case HL_KIND_TEMPERATURE:
      return temperature_units;
    case HL_KIND_RATIO:
    default:
      return ratio_units;
    }
}

static gboolean
list_matches (const char *list,
              const char *unit,
              gboolean    any_case)
{
  /* Scanned in place: this runs for every quantity of every shell read
   * and solved, and splitting the list cost three quarters of loading
   * and checking a 50,000-shell project. */
  size_t unit_len = strlen (unit);
  const char *part = list;

  if (list == NULL || unit_len == 0)
    return FALSE;
  while (*part != '\0')
    {
      const char *end = strchr (part, '|');
      size_t len = end != NULL ? (size_t) (end - part) : strlen (part);

      if (len == unit_len
          && (any_case ? g_ascii_strncasecmp (part, unit, len) : strncmp (part, unit, len)) == 0)
        return TRUE;
      if (end == NULL)
        break;
      part = end + 1;
    }
  return FALSE;
}

static const HlUnitRow *
find_row (HlQuantityKind kind,
          const char    *unit)
{
  const HlUnitRow *rows = table_for (kind);

  if (unit == NULL)
    return NULL;
  /* the symbols first: files and the window use them, so the lists of
   * other spellings are read only for what is typed by hand */
  for (guint i = 0; rows[i].name != NULL; i++)
    if (strcmp (rows[i].name, unit) == 0)
      return &rows[i];
  for (guint i = 0; rows[i].name != NULL; i++)
    if (list_matches (rows[i].spellings, unit, FALSE) || list_matches (rows[i].words, unit, TRUE))
      return &rows[i];
  return NULL;
}

/* The symbol @unit would be with its case changed ("mPa" -> "MPa"), for
 * the message that says why it is refused; NULL when there is none. */
static const char *
case_slip (HlQuantityKind kind,
           const char    *unit)
{
  const HlUnitRow *rows = table_for (kind);

  for (guint i = 0; rows[i].name != NULL; i++)
    if (rows[i].name[0] != '\0'
        && (g_ascii_strcasecmp (rows[i].name, unit) == 0 || list_matches (rows[i].spellings, unit, TRUE)))
      return rows[i].name;
  return NULL;
}

double
hl_unit_factor (HlQuantityKind kind,
                const char    *unit)
{
  const HlUnitRow *row = find_row (kind, unit);

  return row != NULL ? row->factor : 0.0;
}

double
hl_unit_offset (HlQuantityKind kind,
                const char    *unit)
{
  const HlUnitRow *row = find_row (kind, unit);

  return row != NULL ? row->offset : 0.0;
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
    case HL_KIND_TEMPERATURE:
      return temperature_names;
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
    case HL_KIND_TEMPERATURE:
      return us ? "\xc2\xb0""F" : "\xc2\xb0""C";
    case HL_KIND_RATIO:
    default:
      return "";
    }
}

double
hl_unit_to_system (double          si,
                   HlQuantityKind  kind,
                   HlUnitSystem    system,
                   const char    **unit_out)
{
  const char *unit = hl_unit_default (kind, system);
  const HlUnitRow *row = find_row (kind, unit);

  if (unit_out != NULL)
    *unit_out = unit;
  if (row == NULL)
    return si;
  return (si - row->offset) / row->factor;
}

const char *
hl_unit_system_words (HlUnitSystem system)
{
  /* one wording everywhere: window, --help, reports, sheet */
  return system == HL_UNIT_SYSTEM_US ? N_("US customary (in, psi)") : N_("SI (mm, MPa)");
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

/* How much of a typed value a message quotes: enough to recognise it,
 * not a pasted megabyte. */
#define QUOTE_CHARS 40

static gboolean
convert_number (const char *start,
                gsize       len,
                char        separator,
                gboolean    translate,
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
      g_autofree char *quoted = hl_text_quote (copy, QUOTE_CHARS);

      g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_OUT_OF_RANGE,
                   translate ? _("“%s” is too large to be a value") : "“%s” is too large to be a value", quoted);
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
      g_autofree char *quoted = hl_text_quote (stripped, QUOTE_CHARS);

      g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_NOT_A_NUMBER,
                   "“%s” is not a plain decimal number", quoted);
      return FALSE;
    }
  return convert_number (stripped, len, '.', FALSE, value, error);
}

/* ---- digit grouping ---------------------------------------------------
 *
 * A value is never read with digit grouping, in either locale, because
 * the same text means different numbers to different readers: "1.500" is
 * one and a half to an English reader and fifteen hundred to a German
 * one (DIN 1333).  Grouping is, precisely:
 *   [sign] 1 to 3 digits, the first not 0,
 *   then one or more groups: a mark ('.', ',' or a space) and exactly
 *   three digits, not followed by a further digit,
 *   then the end, a unit, or a decimal part (the other mark and digits);
 *   an exponent right after the groups ("1.500e3") makes it a decimal.
 * "0.500", "1.5000" and "1234.567" are therefore not grouping.  Which
 * marks count depends on the locale:
 *   decimal point: a comma is never a decimal mark, so "1,500" is refused
 *     as grouping and "7,5" as a comma where a point belongs;
 *   decimal comma: a pasted point is still read as a decimal point
 *     ("0.5", "7.25 MPa": engineers paste both), except where it could be
 *     a group mark ("1.500", "1.500,5", "1.500.000"); and a comma group
 *     before a point ("1,500.5") is English grouping, refused too.
 * Each refusal shows the forms that are accepted. */

typedef struct
{
  gsize    int_end;    /* end of the grouped integer part */
  gsize    end;        /* end of the whole number (fraction included) */
  guint    groups;
  gboolean fraction;
} Grouping;

static gboolean
scan_grouped (const char *s,
              char        mark,
              char        decimal,
              Grouping   *g)
{
  gsize i = 0, lead = 0;

  memset (g, 0, sizeof *g);
  if (s[i] == '+' || s[i] == '-')
    i++;
  if (s[i] == '0')
    return FALSE;
  while (g_ascii_isdigit (s[i + lead]))
    lead++;
  if (lead == 0 || lead > 3)
    return FALSE;
  i += lead;
  while (s[i] == mark && g_ascii_isdigit (s[i + 1]) && g_ascii_isdigit (s[i + 2])
         && g_ascii_isdigit (s[i + 3]) && !g_ascii_isdigit (s[i + 4]))
    {
      i += 4;
      g->groups++;
    }
  if (g->groups == 0)
    return FALSE;
  if ((s[i] == 'e' || s[i] == 'E')
      && (g_ascii_isdigit (s[i + 1]) || ((s[i + 1] == '+' || s[i + 1] == '-') && g_ascii_isdigit (s[i + 2]))))
    return FALSE;
  /* "1.500.5" is no number at all: left to the ordinary messages */
  if (s[i] == mark && g_ascii_isdigit (s[i + 1]))
    return FALSE;
  g->int_end = i;
  if (s[i] == decimal && g_ascii_isdigit (s[i + 1]))
    {
      g->fraction = TRUE;
      for (i++; g_ascii_isdigit (s[i]); i++)
        ;
    }
  g->end = i;
  return TRUE;
}

/* @s[0..g->end] with the marks dropped and @decimal as decimal mark,
 * then the rest of @s as typed: "1.500,5 MPa" -> "1500,5 MPa". */
static char *
ungrouped (const char     *s,
           const Grouping *g,
           char            decimal)
{
  GString *out = g_string_new (NULL);

  for (gsize i = 0; i < g->int_end; i++)
    if (g_ascii_isdigit (s[i]) || s[i] == '+' || s[i] == '-')
      g_string_append_c (out, s[i]);
  if (g->fraction)
    {
      g_string_append_c (out, decimal);
      g_string_append_len (out, s + g->int_end + 1, g->end - g->int_end - 1);
    }
  g_string_append (out, s + g->end);
  return g_string_free (out, FALSE);
}

/* The other reading of a single group, its mark taken as the decimal
 * mark and written with @decimal: "12.000 bar" -> "12 bar". */
static char *
as_decimal (const char     *s,
            const Grouping *g,
            char            decimal)
{
  gsize mark_at = g->int_end - 4;
  gsize frac_len = 3;

  while (frac_len > 0 && s[mark_at + frac_len] == '0')
    frac_len--;
  if (frac_len == 0)
    return g_strdup_printf ("%.*s%s", (int) mark_at, s, s + g->end);
  return g_strdup_printf ("%.*s%c%.*s%s", (int) mark_at, s, decimal, (int) frac_len, s + mark_at + 1, s + g->end);
}

static gboolean
refuse_grouping (const char *s,
                 gboolean    decimal_comma,
                 GError    **error)
{
  char decimal = decimal_comma ? ',' : '.';
  char other = decimal_comma ? '.' : ',';
  g_autofree char *quoted = hl_text_quote (s, QUOTE_CHARS);
  g_autofree char *plain = NULL;
  g_autofree char *plain_q = NULL;
  Grouping g;

  if (scan_grouped (s, other, decimal, &g) || scan_grouped (s, ' ', decimal, &g))
    {
      plain = ungrouped (s, &g, decimal);
      plain_q = hl_text_quote (plain, QUOTE_CHARS);
      /* one group and no decimal part: the mark may have been meant as a
       * decimal mark, so both readings are offered */
      if (g.groups == 1 && !g.fraction && s[g.int_end - 4] == other)
        {
          g_autofree char *alt = as_decimal (s, &g, decimal);
          g_autofree char *alt_q = hl_text_quote (alt, QUOTE_CHARS);

          g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_NOT_A_NUMBER,
                       _("“%s”: digit grouping is not accepted; write “%s” or “%s”"), quoted, plain_q, alt_q);
        }
      else
        g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_NOT_A_NUMBER,
                     _("“%s”: digit grouping is not accepted; write “%s”"), quoted, plain_q);
      return TRUE;
    }
  /* the locale's own decimal mark used as a group mark before the other
   * one: "1,500.5" with a decimal comma, "1.500,5" with a point */
  if (scan_grouped (s, decimal, other, &g) && g.fraction)
    {
      plain = ungrouped (s, &g, decimal);
      plain_q = hl_text_quote (plain, QUOTE_CHARS);
      g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_NOT_A_NUMBER,
                   _("“%s”: digit grouping is not accepted; write “%s”"), quoted, plain_q);
      return TRUE;
    }
  if (!decimal_comma)
    {
      gsize len = scan_number (s, '.');

      /* "7,5" but not "1e3,5": after an exponent no decimal part fits */
      if (len > 0 && s[len] == ',' && g_ascii_isdigit (s[len + 1])
          && memchr (s, 'e', len) == NULL && memchr (s, 'E', len) == NULL)
        {
          plain = g_strdup (s);
          plain[len] = '.';
          plain_q = hl_text_quote (plain, QUOTE_CHARS);
          g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_NOT_A_NUMBER,
                       _("“%s”: use a point as the decimal separator; write “%s”"), quoted, plain_q);
          return TRUE;
        }
    }
  return FALSE;
}

static void
set_unknown_unit (GError        **error,
                  HlQuantityKind  kind,
                  const char     *unit_text)
{
  g_autofree char *known = g_strjoinv (", ", (char **) hl_unit_names (kind));
  g_autofree char *quoted = hl_text_quote (unit_text, QUOTE_CHARS);
  const char *slip;

  if (kind == HL_KIND_RATIO)
    {
      g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_UNKNOWN_UNIT,
                   _("“%s” is not expected here: this value is a plain number"), quoted);
      return;
    }
  slip = case_slip (kind, unit_text);
  if (slip != NULL)
    g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_UNKNOWN_UNIT,
                 _("unknown unit “%s”: the case of a unit symbol matters, did you mean “%s”? "
                   "(use one of %s)"), quoted, slip, known);
  else
    g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_UNKNOWN_UNIT,
                 _("unknown unit “%s” (use one of %s)"), quoted, known);
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
      g_set_error_literal (error, HL_UNITS_ERROR, HL_UNITS_ERROR_EMPTY, _("no value given"));
      return FALSE;
    }
  if (refuse_grouping (stripped, decimal_comma, error))
    return FALSE;
  len = scan_number (stripped, separator);
  /* accept a point even with a comma locale: engineers paste both (where
   * it could be a group mark, refuse_grouping() has refused already) */
  if (decimal_comma && (len == 0 || stripped[len] == '.'))
    {
      separator = '.';
      len = scan_number (stripped, separator);
    }
  if (len == 0)
    {
      g_autofree char *quoted = hl_text_quote (stripped, QUOTE_CHARS);

      g_set_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_NOT_A_NUMBER,
                   _("“%s” does not start with a number"), quoted);
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
      set_unknown_unit (error, kind, unit_text);
      return FALSE;
    }
  if (!convert_number (stripped, len, separator, TRUE, value, error))
    return FALSE;
  if (unit_out != NULL)
    *unit_out = canonical;
  return TRUE;
}
