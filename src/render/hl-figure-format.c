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
hl_figure_format_input (double         si,
                        HlQuantityKind kind,
                        HlUnitSystem   system,
                        int            digits,
                        gboolean       locale)
{
  const char *unit;
  double shown = hl_unit_to_system (si, kind, system, &unit);
  g_autofree char *number = hl_figure_format_sig (shown, digits, locale);

  if (unit[0] == '\0')
    return g_steal_pointer (&number);
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

char *
hl_figure_check_reason (const HlMethodCheck *check,
                        HlUnitSystem         system,
                        gboolean             locale)
{
  g_autofree char *need = NULL, *have = NULL, *allow = NULL, *design = NULL;
  gboolean short_wall, over_pressure;

  g_return_val_if_fail (check != NULL, NULL);

  if (check->result == HL_CHECK_PASS)
    return NULL;
  /* the core's reason for an out-of-range method is a fixed, marked text */
  if (check->result == HL_CHECK_NOT_APPLICABLE)
    return g_strdup (hl_figure_core_text (check->reason));
  short_wall = check->required > check->nominal;
  over_pressure = check->design_pressure > check->mawp;
  need = hl_figure_format_quantity (check->required, HL_ROW_LENGTH, system, 4, locale);
  have = hl_figure_format_quantity (check->nominal, HL_ROW_LENGTH, system, 4, locale);
  allow = hl_figure_format_quantity (check->mawp, HL_ROW_STRESS, system, 4, locale);
  design = hl_figure_format_quantity (check->design_pressure, HL_ROW_STRESS, system, 4, locale);
  if (short_wall && over_pressure)
    /* TRANSLATORS: required and nominal thickness, allowable and design pressure */
    return g_strdup_printf (_("needs %s nominal, has %s; allows %s, below the design pressure %s"), need, have,
                            allow, design);
  if (short_wall)
    return g_strdup_printf (_("needs %s nominal, has %s"), need, have);
  return g_strdup_printf (_("allows %s, below the design pressure %s"), allow, design);
}
