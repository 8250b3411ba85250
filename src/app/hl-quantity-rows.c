/* hl-quantity-rows.c — the quantity rows a panel's template holds
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-quantity-rows"

#include "hl-config.h"
#include "hl-quantity-rows.h"
#include "hl-field-table.h"
#include "hl-shell-check.h"

#include <glib/gi18n.h>
#include <string.h>

static void
collect_in (GtkWidget     *widget,
            GType          stop,
            HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX],
            guint         *n)
{
  for (GtkWidget *c = gtk_widget_get_first_child (widget); c != NULL; c = gtk_widget_get_next_sibling (c))
    if (HL_IS_QUANTITY_ROW (c))
      {
        if (*n < HL_QUANTITY_ROWS_MAX - 1)
          rows[(*n)++] = HL_QUANTITY_ROW (c);
      }
    else if (stop == G_TYPE_INVALID || !g_type_is_a (G_OBJECT_TYPE (c), stop))
      collect_in (c, stop, rows, n);
}

void
hl_quantity_rows_collect (GtkWidget     *root,
                          GType          stop,
                          HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX])
{
  guint n = 0;

  collect_in (root, stop, rows, &n);
  rows[n] = NULL;
}

void
hl_quantity_rows_label (HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX])
{
  for (guint i = 0; rows[i] != NULL; i++)
    {
      const HlField *f = hl_field_lookup (hl_quantity_row_get_field (rows[i]));
      g_autofree char *label = NULL;

      if (f == NULL)
        continue;
      if (f->tooltip != NULL)
        gtk_widget_set_tooltip_text (GTK_WIDGET (rows[i]), _(f->tooltip));
      g_object_get (rows[i], "label", &label, NULL);
      if ((label == NULL || label[0] == '\0') && f->label != NULL)
        {
          g_autofree char *mnemonic = g_strdup_printf ("_%s", _(f->label));

          hl_quantity_row_set_label (rows[i], mnemonic);
        }
    }
}

void
hl_quantity_rows_mark (HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX],
                       HlDocument    *document)
{
  GPtrArray *problems = hl_document_get_problems (document);

  for (guint i = 0; rows[i] != NULL; i++)
    {
      const char *field = hl_quantity_row_get_field (rows[i]);
      const char *message = hl_document_get_input_error (document, field);

      for (guint k = 0; message == NULL && problems != NULL && k < problems->len; k++)
        {
          const HlProblem *p = g_ptr_array_index (problems, k);

          if (strcmp (p->field, field) == 0)
            message = p->local != NULL ? p->local : p->message;
        }
      hl_quantity_row_set_error (rows[i], message);
    }
}

HlQuantity
hl_quantity_rows_value (const HlField       *field,
                        const HlShellInputs *shell)
{
  if (field->kind == HL_FIELD_RATIO)
    return hl_quantity_make (*(const double *) hl_field_cslot (field, shell), "");
  return *(const HlQuantity *) hl_field_cslot (field, shell);
}

void
hl_quantity_rows_set_value (const HlField *field,
                            HlShellInputs *shell,
                            HlQuantity     q)
{
  if (field->kind == HL_FIELD_RATIO)
    *(double *) hl_field_slot (field, shell) = q.value;
  else
    *(HlQuantity *) hl_field_slot (field, shell) = q;
}

void
hl_quantity_rows_show (HlQuantityRow *row,
                       HlQuantity     q)
{
  HlQuantity shown;

  if (hl_quantity_row_parse (row, &shown, NULL) && shown.value == q.value
      && (q.unit[0] == '\0' || strcmp (shown.unit, q.unit) == 0))
    return;
  hl_quantity_row_set_quantity (row, q);
}

gboolean
hl_quantity_rows_read (HlQuantityRow       *row,
                       HlDocument          *document,
                       const HlShellInputs *current,
                       HlShellInputs       *edited)
{
  g_autoptr(GError) error = NULL;
  const char *field = hl_quantity_row_get_field (row);
  HlQuantity q;

  if (!hl_quantity_row_parse (row, &q, &error))
    {
      hl_document_set_input_error (document, field, error->message);
      return FALSE;
    }
  hl_document_set_input_error (document, field, NULL);
  *edited = *current;
  hl_quantity_rows_set_value (hl_field_lookup (field), edited, q);
  return !hl_shell_inputs_equal (edited, current);
}

void
hl_quantity_rows_show_name (GtkEntry   *entry,
                            const char *name,
                            gpointer    handler,
                            gpointer    data)
{
  g_autofree char *shown = g_strstrip (g_strdup (gtk_editable_get_text (GTK_EDITABLE (entry))));

  if (strcmp (shown, name) == 0)
    return;
  g_signal_handlers_block_by_func (entry, handler, data);
  gtk_editable_set_text (GTK_EDITABLE (entry), name);
  g_signal_handlers_unblock_by_func (entry, handler, data);
}
