/* hl-figure-format.c — numbers and quantities as the figure shows them
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-format"

#include "hl-figure-format.h"
#include "hl-report.h"

#include <math.h>
#include <string.h>

#define MINUS "\xe2\x88\x92"

static char *
true_minus (char *text)
{
  char *out;

  if (text[0] != '-')
    return text;
  out = g_strconcat (MINUS, text + 1, NULL);
  g_free (text);
  return out;
}

char *
hl_figure_format_fixed (double   value,
                        int      decimals,
                        gboolean locale)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  if (!isfinite (value))
    return g_strdup (_("n/a"));
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
  return true_minus (g_strdup (buf));
}

char *
hl_figure_format_sig (double   value,
                      int      digits,
                      gboolean locale)
{
  /* a reader of a figure gets 0.000001, not 1e-06: fixed decimals down
   * to a billionth, trailing zeros trimmed */
  if (value != 0 && fabs (value) < 1e-4 && fabs (value) >= 1e-9)
    {
      int decimals = digits - 1 - (int) floor (log10 (fabs (value)));
      char *s = hl_figure_format_fixed (value, MIN (decimals, 12), locale);
      char *end = s + strlen (s) - 1;

      while (end > s && *end == '0')
        *end-- = '\0';
      return s;
    }
  return true_minus (locale ? hl_format_display (value, digits) : hl_format_significant (value, digits));
}

char *
hl_figure_format_quantity (double       si,
                           HlRowKind    kind,
                           HlUnitSystem system,
                           int          digits,
                           gboolean     locale)
{
  const char *unit = hl_row_unit (kind, system);
  g_autofree char *number = hl_figure_format_sig (hl_row_convert (kind, system, si), digits, locale);

  if (unit[0] == '\0')
    return g_steal_pointer (&number);
  if (strcmp (unit, "%") == 0)
    return g_strconcat (number, HL_NBSP "%", NULL);
  return g_strconcat (number, HL_NBSP, unit, NULL);
}

char *
hl_figure_caution (void)
{
  return g_strdup_printf (_("Caution: %s"), _(HL_CAUTION));
}

const char *
hl_figure_form_text (const HlShellInputs *in)
{
  if (in->form == HL_FORM_SPHERE)
    return _("sphere");
  switch (in->ends)
    {
    case HL_ENDS_OPEN:
      return _("cylinder, open ends");
    case HL_ENDS_PLANE_STRAIN:
      return _("cylinder, plane-strain ends");
    case HL_ENDS_CLOSED:
    default:
      return _("cylinder, closed ends");
    }
}

const char *
hl_figure_core_text (const char *text)
{
  return text != NULL && text[0] != '\0' ? g_dgettext (GETTEXT_PACKAGE, text) : text;
}
