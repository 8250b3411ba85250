/* hl-quantity-row.h — one input value: label, number, unit, reason if bad
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-quantity.h"

G_BEGIN_DECLS

#define HL_TYPE_QUANTITY_ROW (hl_quantity_row_get_type ())
G_DECLARE_FINAL_TYPE (HlQuantityRow, hl_quantity_row, HL, QUANTITY_ROW, GtkBox)

const char *hl_quantity_row_get_field    (HlQuantityRow *self);
void        hl_quantity_row_set_field    (HlQuantityRow *self,
                                          const char    *field);
HlQuantityKind hl_quantity_row_get_kind  (HlQuantityRow *self);
void        hl_quantity_row_set_label    (HlQuantityRow *self,
                                          const char    *label);

/* Shows @q without emitting "edited". */
void        hl_quantity_row_set_quantity (HlQuantityRow *self,
                                          HlQuantity     q);
/* Reads the text; the error carries the reason in words. */
gboolean    hl_quantity_row_parse        (HlQuantityRow *self,
                                          HlQuantity    *q,
                                          GError       **error);
/* Marks the field bad with @message, or clears the mark with NULL. */
void        hl_quantity_row_set_error    (HlQuantityRow *self,
                                          const char    *message);
gboolean    hl_quantity_row_has_error    (HlQuantityRow *self);
/* the message shown under the field, or NULL */
const char *hl_quantity_row_get_error    (HlQuantityRow *self);
GtkEditable *hl_quantity_row_get_entry   (HlQuantityRow *self);
GtkDropDown *hl_quantity_row_get_unit_dropdown (HlQuantityRow *self);

G_END_DECLS
