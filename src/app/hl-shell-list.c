/* hl-shell-list.c — the project's shells; choosing one selects it
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-shell-list"

#include "hl-config.h"
#include "hl-shell-list.h"
#include "hl-document-follower.h"
#include "hl-shell-item.h"

#include <glib/gi18n.h>

struct _HlShellList
{
  GtkBox      parent_instance;

  GtkListBox *list_box;

  HlDocument *document;
  GSignalGroup  *follower;      /* calls on_document_changed_cb */
};

G_DEFINE_FINAL_TYPE (HlShellList, hl_shell_list, GTK_TYPE_BOX)

static gboolean
form_to_text (GBinding     *binding,
              const GValue *from,
              GValue       *to,
              gpointer      user_data)
{
  g_value_set_string (to, g_value_get_uint (from) == HL_FORM_SPHERE ? _("Sphere") : _("Cylinder"));
  return TRUE;
}

/* A row shows its item's name and form through bindings, so an edited
 * name updates its own label and nothing else is rebuilt. */
static GtkWidget *
create_row_cb (gpointer item,
               gpointer user_data)
{
  GtkWidget *row = gtk_list_box_row_new ();
  GtkWidget *box = gtk_box_new (GTK_ORIENTATION_VERTICAL, 0);
  GtkWidget *name = gtk_label_new (NULL);
  GtkWidget *detail = gtk_label_new (NULL);

  gtk_label_set_xalign (GTK_LABEL (name), 0);
  gtk_label_set_ellipsize (GTK_LABEL (name), PANGO_ELLIPSIZE_END);
  gtk_label_set_xalign (GTK_LABEL (detail), 0);
  gtk_widget_add_css_class (detail, "dim-label");
  gtk_widget_add_css_class (detail, "caption");
  gtk_box_append (GTK_BOX (box), name);
  gtk_box_append (GTK_BOX (box), detail);
  gtk_widget_add_css_class (box, "hl-shell-row");
  g_object_bind_property (item, "name", name, "label", G_BINDING_SYNC_CREATE);
  g_object_bind_property_full (item, "form", detail, "label", G_BINDING_SYNC_CREATE, form_to_text, NULL, NULL, NULL);
  gtk_list_box_row_set_child (GTK_LIST_BOX_ROW (row), box);
  gtk_accessible_update_property (GTK_ACCESSIBLE (row), GTK_ACCESSIBLE_PROPERTY_LABEL,
                                  hl_shell_item_get_name (item), -1);
  return row;
}

/* the rows follow the document's list model; only the selection is ours */
static void
on_document_changed_cb (HlDocument  *document,
                        HlShellList *self)
{
  GtkListBoxRow *row = gtk_list_box_get_row_at_index (self->list_box, (int) hl_document_get_selected (document));

  if (row != NULL && gtk_list_box_get_selected_row (self->list_box) != row)
    gtk_list_box_select_row (self->list_box, row);
}

static void
on_list_box_row_selected_cb (GtkListBox    *list_box,
                             GtkListBoxRow *row,
                             HlShellList   *self)
{
  /* selecting the document's own row again changes nothing there */
  if (row == NULL || self->document == NULL)
    return;
  hl_document_set_selected (self->document, (guint) gtk_list_box_row_get_index (row));
}

static void
hl_shell_list_dispose (GObject *object)
{
  HlShellList *self = HL_SHELL_LIST (object);

  g_clear_object (&self->follower);
  g_clear_object (&self->document);
  gtk_widget_dispose_template (GTK_WIDGET (self), HL_TYPE_SHELL_LIST);
  G_OBJECT_CLASS (hl_shell_list_parent_class)->dispose (object);
}

static void
hl_shell_list_class_init (HlShellListClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = hl_shell_list_dispose;
  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-shell-list.ui");
  gtk_widget_class_bind_template_child (widget_class, HlShellList, list_box);
  gtk_widget_class_bind_template_callback (widget_class, on_list_box_row_selected_cb);
}

static void
hl_shell_list_init (HlShellList *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
  self->follower = hl_document_follower_new ((HlDocumentRefresh) on_document_changed_cb, self);
}

void
hl_shell_list_set_document (HlShellList *self,
                            HlDocument  *document)
{
  g_return_if_fail (HL_IS_SHELL_LIST (self));

  g_set_object (&self->document, document);
  gtk_list_box_bind_model (self->list_box, document != NULL ? hl_document_get_shells (document) : NULL,
                           create_row_cb, NULL, NULL);
  g_signal_group_set_target (self->follower, document);
}
