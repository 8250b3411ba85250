/* hl-number-format.c — every number as text: files, reports, sheet,
 * figure and fields
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-number-format"

#include "hl-number-format.h"

#include <locale.h>
#include <math.h>
#include <string.h>

/* Plain decimals for 1e-6 <= |v| < 1e15: the magnitudes of lengths in
 * metres and pressures in pascals a file holds read and diff better as
 * "2000" than as "2e+03"; beyond them the exponent is shorter and
 * clearer ("1e-320"). */
#define PLAIN_MIN_EXPONENT (-6)
#define PLAIN_MAX_EXPONENT 14

/* @sci is "[-]d[.ddd]e±X" as printf's %e writes it; the same decimal
 * number without the exponent, so it reads back to the same double. */
static char *
plain_from_scientific (const char *sci)
{
  GString *out = g_string_new (NULL);
  GString *digits = g_string_new (NULL);
  const char *e = strchr (sci, 'e');
  int exponent = (int) g_ascii_strtoll (e + 1, NULL, 10);
  const char *p = sci;

  if (*p == '-')
    g_string_append_c (out, *p++);
  for (; p < e; p++)
    if (g_ascii_isdigit (*p))
      g_string_append_c (digits, *p);
  if (exponent >= 0)
    {
      gsize int_len = (gsize) exponent + 1;

      for (gsize i = 0; i < int_len; i++)
        g_string_append_c (out, i < digits->len ? digits->str[i] : '0');
      if (digits->len > int_len)
        {
          g_string_append_c (out, '.');
          g_string_append (out, digits->str + int_len);
        }
    }
  else
    {
      g_string_append (out, "0.");
      for (int i = 0; i < -exponent - 1; i++)
        g_string_append_c (out, '0');
      g_string_append (out, digits->str);
    }
  g_string_free (digits, TRUE);
  return g_string_free (out, FALSE);
}

char *
hl_format_exact (double value)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];
  int exponent;

  if (!isfinite (value))
    return g_strdup ("n/a");
  if (value == 0.0)
    return g_strdup ("0");
  /* fewest significant digits that read back exactly (at most 17,
   * IEEE 754-2008 §5.12.2) */
  for (int digits = 1; digits <= 17; digits++)
    {
      char fmt[8];

      g_snprintf (fmt, sizeof fmt, "%%.%de", digits - 1);
      g_ascii_formatd (buf, sizeof buf, fmt, value);
      if (g_ascii_strtod (buf, NULL) == value)
        break;
    }
  exponent = (int) g_ascii_strtoll (strchr (buf, 'e') + 1, NULL, 10);
  if (exponent < PLAIN_MIN_EXPONENT || exponent > PLAIN_MAX_EXPONENT)
    return g_strdup (buf);
  return plain_from_scientific (buf);
}

gboolean
hl_format_locale_decimal_comma (void)
{
  const struct lconv *lc = localeconv ();

  return lc != NULL && lc->decimal_point != NULL && lc->decimal_point[0] == ',';
}

/* "%.*f" in the C locale without printf, for the common case: the value
 * scaled by 10^decimals is a whole number below 2^53 once rounded, and
 * not so near a half that the scaling's rounding (at most an ulp of the
 * product) could decide the last digit.  Otherwise FALSE, and printf's
 * exact conversion is used.  A 100,000-point CSV spends most of its time
 * in printf's multi-precision digits; this gives the same text
 * (tests/units: /units-strict/format/fast-fixed checks it against
 * printf). */
static gboolean
fixed_fast (char   *buf,
            gsize   size,
            double  value,
            int     decimals)
{
  static const double powers[] = { 1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12,
                                   1e13, 1e14, 1e15 };
  double scaled, whole, frac;
  guint64 n;
  char digits[24];
  int len = 0, pos = 0;

  if (decimals < 0 || decimals >= (int) G_N_ELEMENTS (powers) || size < 32)
    return FALSE;
  scaled = fabs (value) * powers[decimals];
  if (!(scaled < 4503599627370496.0))   /* 2^52: whole and half steps exact */
    return FALSE;
  whole = floor (scaled);
  frac = scaled - whole;
  /* the product is off by at most half an ulp (2^-53 relative); keep
   * well clear of a tie */
  if (fabs (frac - 0.5) <= scaled * 1e-15 + 1e-12)
    return FALSE;
  n = (guint64) whole + (frac > 0.5 ? 1 : 0);
  /* the digits of n, least first, at least decimals + 1 of them */
  do
    {
      digits[len++] = (char) ('0' + n % 10);
      n /= 10;
    }
  while (n > 0 || len <= decimals);
  /* printf writes the sign of a negative value even when it rounds to 0 */
  if (value < 0)
    buf[pos++] = '-';
  for (int i = len - 1; i >= 0; i--)
    {
      buf[pos++] = digits[i];
      if (i == decimals && decimals > 0)
        buf[pos++] = '.';
    }
  buf[pos] = '\0';
  return TRUE;
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
          if (!fixed_fast (buf, sizeof buf, value, decimals))
            {
              char fmt[16];

              g_snprintf (fmt, sizeof fmt, "%%.%df", decimals);
              g_ascii_formatd (buf, sizeof buf, fmt, value);
            }
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

char *
hl_format_fixed (double   value,
                 int      decimals,
                 gboolean locale)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  if (!isfinite (value))
    return g_strdup ("n/a");
  decimals = CLAMP (decimals, 0, 12);
  /* "-0.0" is not a value anyone wants to read on an axis */
  if (fabs (value) < 0.5 * pow (10, -decimals))
    value = 0.0;
  if (locale)
    g_snprintf (buf, sizeof buf, "%.*f", decimals, value);
  else
    {
      char fmt[16];

      g_snprintf (fmt, sizeof fmt, "%%.%df", decimals);
      g_ascii_formatd (buf, sizeof buf, fmt, value);
    }
  return g_strdup (buf);
}

char *
hl_format_readable (double   value,
                    int      digits,
                    gboolean locale)
{
  if (value != 0 && fabs (value) < 1e-4 && fabs (value) >= 1e-9)
    {
      int decimals = digits - 1 - (int) floor (log10 (fabs (value)));
      char *s = hl_format_fixed (value, MIN (decimals, 12), locale);
      char *end = s + strlen (s) - 1;

      while (end > s && *end == '0')
        *end-- = '\0';
      return s;
    }
  return locale ? hl_format_display (value, digits) : hl_format_significant (value, digits);
}

char *
hl_format_shortest (double   value,
                    gboolean decimal_comma)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];
  int digits;
  char *text;

  if (!isfinite (value))
    return g_strdup ("");
  for (digits = 1; digits <= 17; digits++)
    {
      char fmt[8];

      g_snprintf (fmt, sizeof fmt, "%%.%dg", digits);
      g_ascii_formatd (buf, sizeof buf, fmt, value);
      if (g_ascii_strtod (buf, NULL) == value)
        break;
    }
  if (strchr (buf, 'e') != NULL && value != 0.0 && fabs (value) >= 1e-6 && fabs (value) < 1e15)
    {
      int decimals = MAX (0, digits - 1 - (int) floor (log10 (fabs (value))));
      char fmt[16];

      g_snprintf (fmt, sizeof fmt, "%%.%df", decimals);
      g_ascii_formatd (buf, sizeof buf, fmt, value);
    }
  text = g_strdup (buf);
  if (decimal_comma)
    g_strdelimit (text, ".", ',');
  return text;
}

char *
hl_format_grouped (const char *text)
{
  GString *out = g_string_new (NULL);
  const char *p = text, *digits, *end;

  /* the sign, then the run of digits before the decimal mark */
  while (*p != '\0' && !g_ascii_isdigit (*p))
    p++;
  digits = p;
  while (g_ascii_isdigit (*p))
    p++;
  end = p;
  g_string_append_len (out, text, digits - text);
  /* no exponent form is grouped, nor a four-digit number (ISO 80000-1
   * leaves those as they are) */
  if (end - digits < 5 || strpbrk (end, "eE") != NULL)
    {
      g_string_append (out, digits);
      return g_string_free (out, FALSE);
    }
  for (const char *d = digits; d < end; d++)
    {
      g_string_append_c (out, *d);
      if (d + 1 < end && (end - d - 1) % 3 == 0)
        g_string_append (out, HL_GROUP_SEPARATOR);
    }
  g_string_append (out, end);
  return g_string_free (out, FALSE);
}

char *
hl_format_true_minus (char *text)
{
  char *out;

  if (text == NULL || text[0] != '-')
    return text;
  out = g_strconcat ("\xe2\x88\x92", text + 1, NULL);
  g_free (text);
  return out;
}

char *
hl_format_for_reading (double   value,
                       int      digits,
                       gboolean locale)
{
  g_autofree char *plain = hl_format_readable (value, digits, locale);

  return hl_format_true_minus (hl_format_grouped (plain));
}
