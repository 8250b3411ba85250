/* hl-quantity-rows.h — the quantity rows a panel's template holds
 *
 * A panel finds its rows rather than listing them, so a new input's row
 * is one entry in a .ui: its field is the table's element name, and the
 * table gives the label (when the .ui has none) and the tooltip.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-document.h"
#include "hl-field-table.h"
#include "hl-quantity-row.h"

G_BEGIN_DECLS

/* room for every row a panel may hold, and the NULL at the end */
#define HL_QUANTITY_ROWS_MAX 48

/* The rows under @root in template order, NULL-terminated in @rows; the
 * search does not enter a child of type @stop (G_TYPE_INVALID: none),
 * a panel of its own with its own rows. */
void hl_quantity_rows_collect (GtkWidget     *root,
                               GType          stop,
                               HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX]);
/* Gives each row the field table's tooltip, and its label where the
 * template gives none. */
void hl_quantity_rows_label   (HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX]);
/* Marks each row with the document's reason for its field: the text
 * that cannot be read first, else the stored value's first problem. */
void hl_quantity_rows_mark    (HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX],
                               HlDocument    *document);

/* The value of a numeric field of the table (a ratio has no unit). */
HlQuantity hl_quantity_rows_value     (const HlField       *field,
                                       const HlShellInputs *shell);
void       hl_quantity_rows_set_value (const HlField       *field,
                                       HlShellInputs       *shell,
                                       HlQuantity           q);
/* Shows @q unless the row's own text already reads as it: a view set
 * only where it differs keeps the cursor of the one being typed in. */
void       hl_quantity_rows_show      (HlQuantityRow       *row,
                                       HlQuantity           q);

/* A row was edited: its text read as a value of @current's field gives
 * the edited shell in @edited (TRUE when it differs from @current); a
 * text that cannot be read is the document's input error until fixed. */
gboolean   hl_quantity_rows_read      (HlQuantityRow       *row,
                                       HlDocument          *document,
                                       const HlShellInputs *current,
                                       HlShellInputs       *edited);
/* Shows @name in a name entry unless it shows it already, save spaces at
 * either end (the file keeps none; a space before the next word stays).
 * Setting a text passes through the empty text, so @handler (the entry's
 * "changed" handler for @data) is held meanwhile. */
void       hl_quantity_rows_show_name (GtkEntry            *entry,
                                       const char          *name,
                                       gpointer             handler,
                                       gpointer             data);

G_END_DECLS
