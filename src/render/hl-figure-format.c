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
  if (!isfinite (value))
    return g_strdup (_("n/a"));
  return true_minus (hl_format_fixed (value, decimals, locale));
}

char *
hl_figure_format_sig (double   value,
                      int      digits,
                      gboolean locale)
{
  return true_minus (hl_format_readable (value, digits, locale));
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
