/* hl-quantity.c — a value as the user gave it: number plus unit
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-quantity"

#include "hl-quantity.h"

#include <math.h>
#include <string.h>

HlQuantity
hl_quantity_make (double      value,
                  const char *unit)
{
  HlQuantity q = { value, "" };

  g_strlcpy (q.unit, unit != NULL ? unit : "", sizeof q.unit);
  return q;
}

double
hl_quantity_si (HlQuantity     q,
                HlQuantityKind kind)
{
  double factor = hl_unit_factor (kind, q.unit);

  return factor > 0.0 ? q.value * factor + hl_unit_offset (kind, q.unit) : NAN;
}

HlQuantity
hl_quantity_convert (HlQuantity      q,
                     HlQuantityKind  kind,
                     const char     *unit)
{
  double to = hl_unit_factor (kind, unit);

  if (to <= 0.0)
    return q;
  return hl_quantity_make ((hl_quantity_si (q, kind) - hl_unit_offset (kind, unit)) / to,
                           hl_unit_canonical (kind, unit));
}

gboolean
hl_quantity_equal (HlQuantity a,
                   HlQuantity b)
{
  /* bitwise-equal numbers: a saved and reloaded file must match exactly */
  return (a.value == b.value || (isnan (a.value) && isnan (b.value)))
         && strcmp (a.unit, b.unit) == 0;
}
