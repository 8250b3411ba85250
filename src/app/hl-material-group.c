/* hl-material-group.c — the selected shell's material: choice, scope, values
 *
 * Every widget shows the document's value and is set only where it
 * shows something else, and every handler turns its widget's value into
 * an edit only where that differs from the document: the two meet
 * without a flag saying who is speaking.  What an edit of a built-in or
 * a shared material makes is the document's rule (hl_document_edit_material).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-material-group"

#include "hl-config.h"
#include "hl-material-group.h"
#include "hl-document-follower.h"
#include "hl-field-table.h"
#include "hl-fields.h"
#include "hl-limits.h"
#include "hl-quantity-rows.h"

#include <glib/gi18n.h>
#include <string.h>

struct _HlMaterialGroup
{
  GtkBox          parent_instance;

  GtkDropDown    *material_dropdown;
  GtkLabel       *material_note_label;
  GtkWidget      *material_scope_box;
  GtkLabel       *material_users_label;
  GtkCheckButton *material_all_button;
  GtkCheckButton *material_this_button;
  GtkEntry       *material_name_entry;

  HlDocument     *document;
  GSignalGroup   *follower;     /* calls on_document_changed_cb */
  GPtrArray      *material_ids; /* char *, parallel to the drop-down */
  GPtrArray      *material_names;
  /* the shell and material the scope choice was made for */
  char            scope_shell[HL_ID_MAX];
  char            scope_material[HL_ID_MAX];
};

static void on_material_name_entry_changed_cb (GtkEntry *entry, HlMaterialGroup *self);

G_DEFINE_FINAL_TYPE (HlMaterialGroup, hl_material_group, GTK_TYPE_BOX)

static void on_material_dropdown_selected_cb (GObject *dropdown, GParamSpec *pspec, HlMaterialGroup *self);

/* The project's materials, then the built-in ones */
static void
list_materials (const HlProject *project,
                GPtrArray       *ids,
                GPtrArray       *names)
{
  for (guint i = 0; i < hl_project_n_materials (project); i++)
    {
      g_ptr_array_add (ids, g_strdup (hl_project_material (project, i)->id));
      g_ptr_array_add (names, g_strdup (hl_project_material (project, i)->name));
    }
  for (guint i = 0; i < hl_material_builtin_count (); i++)
    {
      g_ptr_array_add (ids, g_strdup (hl_material_builtin (i)->id));
      g_ptr_array_add (names, g_strdup (hl_material_builtin (i)->name));
    }
}

static gboolean
same_strings (GPtrArray *a,
              GPtrArray *b)
{
  if (a->len != b->len)
    return FALSE;
  for (guint i = 0; i < a->len; i++)
    if (strcmp (g_ptr_array_index (a, i), g_ptr_array_index (b, i)) != 0)
      return FALSE;
  return TRUE;
}

/* The list is replaced only when a material was added, removed or
 * renamed; the choice follows the shell's reference. */
static void
sync_list (HlMaterialGroup     *self,
           const HlShellInputs *shell)
{
  g_autoptr(GPtrArray) ids = g_ptr_array_new_with_free_func (g_free);
  g_autoptr(GPtrArray) names = g_ptr_array_new_with_free_func (g_free);
  guint selected = GTK_INVALID_LIST_POSITION;

  list_materials (hl_document_get_project (self->document), ids, names);
  if (!same_strings (ids, self->material_ids) || !same_strings (names, self->material_names))
    {
      g_autoptr(GtkStringList) model = gtk_string_list_new (NULL);

      for (guint i = 0; i < names->len; i++)
        gtk_string_list_append (model, g_ptr_array_index (names, i));
      g_ptr_array_unref (self->material_ids);
      g_ptr_array_unref (self->material_names);
      self->material_ids = g_ptr_array_ref (ids);
      self->material_names = g_ptr_array_ref (names);
      /* a new model selects its first item on its own: not a choice */
      g_signal_handlers_block_by_func (self->material_dropdown, on_material_dropdown_selected_cb, self);
      gtk_drop_down_set_model (self->material_dropdown, G_LIST_MODEL (model));
      gtk_drop_down_set_selected (self->material_dropdown, GTK_INVALID_LIST_POSITION);
      g_signal_handlers_unblock_by_func (self->material_dropdown, on_material_dropdown_selected_cb, self);
    }
  for (guint i = 0; i < self->material_ids->len; i++)
    if (strcmp (g_ptr_array_index (self->material_ids, i), shell->material_ref) == 0)
      selected = i;
  if (gtk_drop_down_get_selected (self->material_dropdown) != selected)
    gtk_drop_down_set_selected (self->material_dropdown, selected);
}

/* A row shows the stored value unless its own text reads as it already,
 * or cannot be read at all (the user is still typing it). */
static void
sync_rows (HlMaterialGroup     *self,
           const HlShellInputs *shell)
{
  HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX];

  hl_quantity_rows_collect (GTK_WIDGET (self), G_TYPE_INVALID, rows);
  for (guint i = 0; rows[i] != NULL; i++)
    {
      const char *field = hl_quantity_row_get_field (rows[i]);
      const HlField *f = hl_field_lookup (field);

      if (f != NULL && hl_field_is_number (f) && hl_document_get_input_error (self->document, field) == NULL)
        hl_quantity_rows_show (rows[i], hl_quantity_rows_value (f, shell));
    }
}

/* A project material several shells use says so; the user picks
 * whether a change goes to all of them or to a copy for this shell.
 * Another shell or material starts again at "all", the file's meaning
 * of a shared material. */
static void
sync_scope (HlMaterialGroup     *self,
            const HlShellInputs *shell)
{
  const HlProject *project = hl_document_get_project (self->document);
  guint users = 0;

  if (hl_project_find_material (project, shell->material_ref) != NULL)
    users = hl_document_count_material_users (self->document, shell->material_ref);
  if (strcmp (shell->id, self->scope_shell) != 0 || strcmp (shell->material_ref, self->scope_material) != 0)
    {
      hl_utf8_copy (self->scope_shell, shell->id, sizeof self->scope_shell);
      hl_utf8_copy (self->scope_material, shell->material_ref, sizeof self->scope_material);
      gtk_check_button_set_active (self->material_all_button, TRUE);
    }
  gtk_widget_set_visible (self->material_scope_box, users > 1);
  if (users > 1)
    {
      /* TRANSLATORS: above the choice "every shell using it" / "this shell only";
       * %u is two or more */
      g_autofree char *text = g_strdup_printf (_("Used by %u shells. Changes go to:"), users);

      gtk_label_set_text (self->material_users_label, text);
    }
}

static void
on_document_changed_cb (HlDocument      *document,
                        HlMaterialGroup *self)
{
  const HlShellInputs *shell = hl_document_get_shell (document);
  HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX];

  if (shell == NULL)
    return;
  sync_list (self, shell);
  hl_quantity_rows_show_name (self->material_name_entry, shell->material.name,
                              (gpointer) on_material_name_entry_changed_cb, self);
  sync_rows (self, shell);
  sync_scope (self, shell);
  gtk_widget_set_visible (GTK_WIDGET (self->material_note_label),
                          hl_project_find_material (hl_document_get_project (document), shell->material_ref) == NULL
                          && hl_material_builtin_find (shell->material_ref) != NULL);
  hl_quantity_rows_collect (GTK_WIDGET (self), G_TYPE_INVALID, rows);
  hl_quantity_rows_mark (rows, document);
}

static void
edit (HlMaterialGroup  *self,
      const HlMaterial *material,
      const char       *field)
{
  HlMaterialScope scope = gtk_check_button_get_active (self->material_this_button)
                            ? HL_MATERIAL_SCOPE_THIS_SHELL : HL_MATERIAL_SCOPE_ALL_USERS;

  hl_document_edit_material (self->document, material, scope, field);
}

static void
on_row_edited_cb (HlQuantityRow   *row,
                  HlMaterialGroup *self)
{
  const HlShellInputs *current;
  HlShellInputs shell;

  if (self->document != NULL && (current = hl_document_get_shell (self->document)) != NULL
      && hl_quantity_rows_read (row, self->document, current, &shell))
    edit (self, &shell.material, hl_quantity_row_get_field (row));
}

static void
on_material_name_entry_changed_cb (GtkEntry        *entry,
                                   HlMaterialGroup *self)
{
  const HlShellInputs *shell;
  HlMaterial m;

  if (self->document == NULL || (shell = hl_document_get_shell (self->document)) == NULL)
    return;
  m = shell->material;
  /* the entry stops at the limit already; the cut is a second guard,
   * on a character boundary so the name stays valid UTF-8 */
  hl_utf8_copy (m.name, gtk_editable_get_text (GTK_EDITABLE (entry)), sizeof m.name);
  g_strstrip (m.name);
  if (strcmp (m.name, shell->material.name) != 0)
    edit (self, &m, "name");
}

static void
on_material_dropdown_selected_cb (GObject         *dropdown,
                                  GParamSpec      *pspec,
                                  HlMaterialGroup *self)
{
  const HlShellInputs *current;
  const HlMaterial *m;
  HlShellInputs shell;
  guint i = gtk_drop_down_get_selected (self->material_dropdown);
  const char *id;

  if (self->document == NULL || (current = hl_document_get_shell (self->document)) == NULL
      || i >= self->material_ids->len)
    return;
  id = g_ptr_array_index (self->material_ids, i);
  if (strcmp (id, current->material_ref) == 0)
    return;
  m = hl_project_find_material (hl_document_get_project (self->document), id);
  /* a built-in material in the project's units: ksi in a US project */
  if (m == NULL)
    m = hl_material_builtin_find_in (id, hl_document_get_project (self->document)->display_units);
  if (m == NULL)
    return;
  shell = *current;
  shell.material = *m;
  hl_utf8_copy (shell.material_ref, m->id, sizeof shell.material_ref);
  hl_document_edit_shell (self->document, &shell, NULL);
}

static void
hl_material_group_dispose (GObject *object)
{
  HlMaterialGroup *self = HL_MATERIAL_GROUP (object);

  g_clear_object (&self->follower);
  g_clear_object (&self->document);
  gtk_widget_dispose_template (GTK_WIDGET (self), HL_TYPE_MATERIAL_GROUP);
  G_OBJECT_CLASS (hl_material_group_parent_class)->dispose (object);
}

static void
hl_material_group_finalize (GObject *object)
{
  HlMaterialGroup *self = HL_MATERIAL_GROUP (object);

  g_clear_pointer (&self->material_ids, g_ptr_array_unref);
  g_clear_pointer (&self->material_names, g_ptr_array_unref);
  G_OBJECT_CLASS (hl_material_group_parent_class)->finalize (object);
}

static void
hl_material_group_class_init (HlMaterialGroupClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = hl_material_group_dispose;
  object_class->finalize = hl_material_group_finalize;

  g_type_ensure (HL_TYPE_QUANTITY_ROW);
  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-material-group.ui");
  gtk_widget_class_bind_template_child (widget_class, HlMaterialGroup, material_dropdown);
  gtk_widget_class_bind_template_child (widget_class, HlMaterialGroup, material_note_label);
  gtk_widget_class_bind_template_child (widget_class, HlMaterialGroup, material_scope_box);
  gtk_widget_class_bind_template_child (widget_class, HlMaterialGroup, material_users_label);
  gtk_widget_class_bind_template_child (widget_class, HlMaterialGroup, material_all_button);
  gtk_widget_class_bind_template_child (widget_class, HlMaterialGroup, material_this_button);
  gtk_widget_class_bind_template_child (widget_class, HlMaterialGroup, material_name_entry);
  gtk_widget_class_bind_template_callback (widget_class, on_row_edited_cb);
  gtk_widget_class_bind_template_callback (widget_class, on_material_dropdown_selected_cb);
  gtk_widget_class_bind_template_callback (widget_class, on_material_name_entry_changed_cb);
}

static void
hl_material_group_init (HlMaterialGroup *self)
{
  HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX];

  self->material_ids = g_ptr_array_new_with_free_func (g_free);
  self->material_names = g_ptr_array_new_with_free_func (g_free);
  gtk_widget_init_template (GTK_WIDGET (self));
  hl_quantity_rows_collect (GTK_WIDGET (self), G_TYPE_INVALID, rows);
  hl_quantity_rows_label (rows);
  /* Ctrl+Z belongs to the document's undo, which covers every field */
  gtk_editable_set_enable_undo (GTK_EDITABLE (self->material_name_entry), FALSE);
  /* names are fixed slots of bytes in the file model */
  hl_fields_limit_editable (GTK_EDITABLE (self->material_name_entry), 0, HL_LIMIT_NAME_BYTES, TRUE);
  hl_fields_ellipsize_dropdown (self->material_dropdown);
  self->follower = hl_document_follower_new ((HlDocumentRefresh) on_document_changed_cb, self);
}

void
hl_material_group_set_document (HlMaterialGroup *self,
                                HlDocument      *document)
{
  g_return_if_fail (HL_IS_MATERIAL_GROUP (self));

  g_set_object (&self->document, document);
  g_signal_group_set_target (self->follower, document);
}

GtkEditable *
hl_material_group_get_name_entry (HlMaterialGroup *self)
{
  g_return_val_if_fail (HL_IS_MATERIAL_GROUP (self), NULL);
  return GTK_EDITABLE (self->material_name_entry);
}

const char *
hl_material_group_get_users_text (HlMaterialGroup *self)
{
  g_return_val_if_fail (HL_IS_MATERIAL_GROUP (self), NULL);
  if (!gtk_widget_get_visible (self->material_scope_box))
    return NULL;
  return gtk_label_get_text (self->material_users_label);
}

GtkWidget *
hl_material_group_get_scope (HlMaterialGroup *self)
{
  g_return_val_if_fail (HL_IS_MATERIAL_GROUP (self), NULL);
  return GTK_WIDGET (self->material_this_button);
}
