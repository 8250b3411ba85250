/* hl-quantity.h — a value as the user gave it: number plus unit
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-units.h"

G_BEGIN_DECLS

#define HL_UNIT_MAX 12

/* Plain struct, copies by assignment.  The number and unit are kept as
 * entered so files and fields show what the engineer typed. */
typedef struct
{
  double value;
  char   unit[HL_UNIT_MAX];
} HlQuantity;

HlQuantity hl_quantity_make     (double          value,
                                 const char     *unit);
/* value in SI base units (m, Pa, fraction); NaN when the unit is unknown */
double     hl_quantity_si       (HlQuantity      q,
                                 HlQuantityKind  kind);
/* the same quantity expressed in @unit */
HlQuantity hl_quantity_convert  (HlQuantity      q,
                                 HlQuantityKind  kind,
                                 const char     *unit);
gboolean   hl_quantity_equal    (HlQuantity      a,
                                 HlQuantity      b);

G_END_DECLS
