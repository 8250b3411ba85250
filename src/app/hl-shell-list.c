/* hl-shell-list.c — the project's shells; choosing one selects it
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-shell-list"

#include "hl-config.h"
#include "hl-shell-list.h"
#include "hl-document-follower.h"

#include <glib/gi18n.h>

struct _HlShellList
{
  GtkBox      parent_instance;

  GtkListBox *list_box;

  HlDocument *document;
  GSignalGroup  *follower;      /* calls on_document_changed_cb */
  char       *shown;      /* names, forms and selection last listed */
  guint       updating;
};

G_DEFINE_FINAL_TYPE (HlShellList, hl_shell_list, GTK_TYPE_BOX)

static GtkWidget *
make_row (const HlShellInputs *shell)
{
  GtkWidget *box = gtk_box_new (GTK_ORIENTATION_VERTICAL, 0);
  GtkWidget *name = gtk_label_new (shell->name[0] != '\0' ? shell->name : shell->id);
  GtkWidget *detail = gtk_label_new (shell->form == HL_FORM_SPHERE ? _("Sphere") : _("Cylinder"));

  gtk_label_set_xalign (GTK_LABEL (name), 0);
  gtk_label_set_ellipsize (GTK_LABEL (name), PANGO_ELLIPSIZE_END);
  gtk_label_set_xalign (GTK_LABEL (detail), 0);
  gtk_widget_add_css_class (detail, "dim-label");
  gtk_widget_add_css_class (detail, "caption");
  gtk_box_append (GTK_BOX (box), name);
  gtk_box_append (GTK_BOX (box), detail);
  gtk_widget_add_css_class (box, "hl-shell-row");
  return box;
}

static void
rebuild (HlShellList *self)
{
  const HlProject *project = hl_document_get_project (self->document);
  guint selected = hl_document_get_selected (self->document);
  GtkWidget *child;

  self->updating++;
  while ((child = gtk_widget_get_first_child (GTK_WIDGET (self->list_box))) != NULL)
    gtk_list_box_remove (self->list_box, child);
  for (guint i = 0; i < hl_project_n_shells (project); i++)
    {
      const HlShellInputs *shell = hl_project_shell (project, i);
      GtkWidget *row = gtk_list_box_row_new ();

      gtk_list_box_row_set_child (GTK_LIST_BOX_ROW (row), make_row (shell));
      gtk_accessible_update_property (GTK_ACCESSIBLE (row), GTK_ACCESSIBLE_PROPERTY_LABEL,
                                      shell->name, -1);
      gtk_list_box_append (self->list_box, row);
    }
  gtk_list_box_select_row (self->list_box, gtk_list_box_get_row_at_index (self->list_box, (int) selected));
  self->updating--;
}

static char *
signature (HlDocument *document)
{
  const HlProject *project = hl_document_get_project (document);
  GString *s = g_string_new (NULL);

  g_string_append_printf (s, "%u", hl_document_get_selected (document));
  for (guint i = 0; i < hl_project_n_shells (project); i++)
    {
      const HlShellInputs *shell = hl_project_shell (project, i);

      g_string_append_printf (s, "\n%d %s", shell->form, shell->name);
    }
  return g_string_free (s, FALSE);
}

static void
on_document_changed_cb (HlDocument  *document,
                        HlShellList *self)
{
  g_autofree char *now = signature (document);

  /* typing a value changes nothing listed here */
  if (g_strcmp0 (now, self->shown) == 0)
    return;
  g_free (self->shown);
  self->shown = g_steal_pointer (&now);
  rebuild (self);
}

static void
on_list_box_row_selected_cb (GtkListBox    *list_box,
                             GtkListBoxRow *row,
                             HlShellList   *self)
{
  if (self->updating > 0 || row == NULL || self->document == NULL)
    return;
  hl_document_set_selected (self->document, (guint) gtk_list_box_row_get_index (row));
}

static void
hl_shell_list_dispose (GObject *object)
{
  HlShellList *self = HL_SHELL_LIST (object);

  g_clear_object (&self->follower);
  g_clear_object (&self->document);
  g_clear_pointer (&self->shown, g_free);
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
  g_clear_pointer (&self->shown, g_free);
  g_signal_group_set_target (self->follower, document);
}
