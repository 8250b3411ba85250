/* hl-note-format.c — numbers and words as the design note prints them
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-note-format"

#include "hl-note-private.h"
#include "hl-number-format.h"
#include "hl-report.h"

#include <math.h>
#include <string.h>

char *
hl_note_sig (double   value,
             int      digits,
             gboolean locale)
{
  return hl_format_for_reading (value, digits, locale);
}

char *
hl_note_quantity (const HlNoteCtx *ctx,
                  double           si,
                  HlRowKind        kind,
                  int              digits)
{
  const char *unit = hl_row_unit (kind, ctx->units);
  g_autofree char *number = NULL;

  if (!isfinite (si))
    return g_strdup ("—");
  number = hl_note_sig (hl_row_convert (kind, ctx->units, si), digits, ctx->loc);
  if (unit[0] == '\0')
    return g_steal_pointer (&number);
  return g_strconcat (number, HL_NOTE_NBSP, unit, NULL);
}

char *
hl_note_percent (const HlNoteCtx *ctx,
                 double           fraction)
{
  g_autofree char *n = NULL;

  if (!isfinite (fraction))
    return g_strdup ("—");
  n = hl_note_sig (100 * fraction, 4, ctx->loc);
  return g_strconcat (n, HL_NOTE_NBSP "%", NULL);
}

const char *
hl_note_core_text (const char *text)
{
  return text != NULL && text[0] != '\0' ? g_dgettext (GETTEXT_PACKAGE, text) : (text != NULL ? text : "");
}

const char *
hl_note_check_word (HlCheckResult result)
{
  return result == HL_CHECK_PASS ? _("PASS") : result == HL_CHECK_FAIL ? _("FAIL") : _("NOT APPLICABLE");
}

char *
hl_note_check_reason (const HlNoteCtx     *ctx,
                      const HlMethodCheck *check)
{
  return hl_note_method_reason (check, ctx->units, ctx->loc);
}

char *
hl_note_method_reason (const HlMethodCheck *check,
                       HlUnitSystem         units,
                       gboolean             locale_numbers)
{
  HlNoteCtx numbers = { 0 };
  const HlNoteCtx *ctx = &numbers;
  g_autofree char *need = NULL, *have = NULL, *allow = NULL, *design = NULL;
  gboolean short_wall, over_pressure;

  g_return_val_if_fail (check != NULL, NULL);
  numbers.units = units;
  numbers.loc = locale_numbers;
  if (check->result == HL_CHECK_PASS)
    return NULL;
  /* the core's reason for an out-of-range method is a fixed, marked text */
  if (check->result == HL_CHECK_NOT_APPLICABLE)
    return g_strdup (hl_note_core_text (check->reason));
  short_wall = check->required > check->nominal;
  over_pressure = check->design_pressure > check->mawp;
  need = hl_note_quantity (ctx, check->required, HL_ROW_LENGTH, 4);
  have = hl_note_quantity (ctx, check->nominal, HL_ROW_LENGTH, 4);
  allow = hl_note_quantity (ctx, check->mawp, HL_ROW_STRESS, 4);
  design = hl_note_quantity (ctx, check->design_pressure, HL_ROW_STRESS, 4);
  if (short_wall && over_pressure)
    /* TRANSLATORS: required and nominal thickness, allowable and design pressure */
    return g_strdup_printf (_("needs %s nominal, has %s; allows %s, below the design pressure %s"), need, have,
                            allow, design);
  if (short_wall)
    return g_strdup_printf (_("needs %s nominal, has %s"), need, have);
  return g_strdup_printf (_("allows %s, below the design pressure %s"), allow, design);
}

char *
hl_note_caution (void)
{
  return g_strdup_printf (_("Caution: %s"), _(HL_CAUTION));
}

const char *
hl_note_form_text (const HlShellInputs *in)
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
