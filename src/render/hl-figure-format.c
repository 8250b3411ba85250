/* hl-figure-format.c — numbers and quantities as the figure shows them
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-format"

#include "hl-figure-format.h"
#include "hl-note.h"
#include "hl-report.h"

#include <math.h>
#include <string.h>

char *
hl_figure_format_fixed (double   value,
                        int      decimals,
                        gboolean locale)
{
  if (!isfinite (value))
    return g_strdup (_("n/a"));
  return hl_format_true_minus (hl_format_fixed (value, decimals, locale));
}

char *
hl_figure_format_sig (double   value,
                      int      digits,
                      gboolean locale)
{
  return hl_format_true_minus (hl_format_readable (value, digits, locale));
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

/* the words below are the design note's (core), so the figure, the
 * window and the sheet say the same */
char *
hl_figure_caution (void)
{
  return hl_note_caution ();
}

const char *
hl_figure_form_text (const HlShellInputs *in)
{
  return hl_note_form_text (in);
}

const char *
hl_figure_core_text (const char *text)
{
  return text != NULL ? hl_note_core_text (text) : NULL;
}

char *
hl_figure_check_reason (const HlMethodCheck *check,
                        HlUnitSystem         system,
                        gboolean             locale)
{
  return hl_note_method_reason (check, system, locale);
}
