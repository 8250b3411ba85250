/* hl-shell-editor.c — the selected shell's inputs, in groups
 *
 * Values the user types go to the document as soon as they read as a
 * number with a unit; the core's checks then mark the fields that are
 * wrong, so the window and the loader give the same reasons.  The
 * material has its own group (hl-material-group.c).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-shell-editor"

#include "hl-config.h"
#include "hl-shell-editor.h"
#include "hl-document-follower.h"
#include "hl-fields.h"
#include "hl-field-table.h"
#include "hl-limits.h"
#include "hl-material-group.h"
#include "hl-quantity-rows.h"
#include "hl-shell-check.h"

#include <glib/gi18n.h>
#include <string.h>

struct _HlShellEditor
{
  GtkBox           parent_instance;

  GtkEntry        *name_entry;
  GtkDropDown     *form_dropdown;
  GtkDropDown     *ends_dropdown;
  GtkDropDown     *size_kind_dropdown;
  HlQuantityRow   *size_row;
  HlMaterialGroup *material_group;
  GtkDropDown     *basis_dropdown;
  GtkDropDown     *measure_dropdown;
  GtkDropDown     *criterion_dropdown;
  GtkDropDown     *design_basis_dropdown;
  GtkDropDown     *coincident_dropdown;
  GtkDropDown     *test_rule_dropdown;
  GtkEntry        *code_edition_entry;
  GtkEntry        *material_spec_entry;
  GtkEntry        *allowable_source_entry;

  HlDocument      *document;
  GSignalGroup    *follower;      /* calls on_document_changed_cb */
};


static void on_name_entry_changed_cb (GtkEntry *entry, HlShellEditor *self);
static void on_text_entry_changed_cb (GtkEntry *entry, HlShellEditor *self);

/* the drop-downs of the table's choice rows and the entries of its text
 * rows, each knowing its element by the "hl-field" data */
#define N_CHOICES 6
#define N_TEXTS 3

static void
choice_dropdowns (HlShellEditor *self,
                  GtkDropDown   *out[N_CHOICES])
{
  out[0] = self->basis_dropdown;
  out[1] = self->measure_dropdown;
  out[2] = self->criterion_dropdown;
  out[3] = self->design_basis_dropdown;
  out[4] = self->coincident_dropdown;
  out[5] = self->test_rule_dropdown;
}

static void
text_entries (HlShellEditor *self,
              GtkEntry      *out[N_TEXTS])
{
  out[0] = self->code_edition_entry;
  out[1] = self->material_spec_entry;
  out[2] = self->allowable_source_entry;
}

G_DEFINE_FINAL_TYPE (HlShellEditor, hl_shell_editor, GTK_TYPE_BOX)

/* the editor's own rows; the material group keeps its own */
static void
own_rows (HlShellEditor *self,
          HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX])
{
  hl_quantity_rows_collect (GTK_WIDGET (self), HL_TYPE_MATERIAL_GROUP, rows);
}

/* A drop-down of a choice row lists the row's choices in the table's
 * order, whatever the enum's order */
static void
fill_choices (GtkDropDown *dropdown,
              const char  *element)
{
  /* which field the drop-down edits, for its handler */
  g_object_set_data (G_OBJECT (dropdown), "hl-field", (gpointer) element);
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, element);
  g_autoptr(GtkStringList) items = gtk_string_list_new (NULL);

  for (guint i = 0; i < hl_field_choice_count (f); i++)
    gtk_string_list_append (items, _(f->choices[i].label));
  gtk_drop_down_set_model (dropdown, G_LIST_MODEL (items));
}

static guint
choice_position (const HlShellInputs *shell,
                 const char          *element)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, element);

  return hl_field_choice_position (f, hl_field_choice_get (f, hl_field_cslot (f, shell)));
}

static void
get_choice (GtkDropDown   *dropdown,
            const char    *element,
            HlShellInputs *shell)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, element);
  guint i = gtk_drop_down_get_selected (dropdown);

  if (f->choices != NULL && i < hl_field_choice_count (f))
    hl_field_choice_set (f, hl_field_slot (f, shell), f->choices[i].value);
}

/* Each widget is set only where it shows something else than the
 * document: then its handler, which edits only where the widget differs
 * from the document, has nothing to do, and the field being typed in
 * keeps its cursor. */
static void
sync_dropdown (GtkDropDown *dropdown,
               guint        position)
{
  if (gtk_drop_down_get_selected (dropdown) != position)
    gtk_drop_down_set_selected (dropdown, position);
}

static void
sync_widgets (HlShellEditor       *self,
              const HlShellInputs *shell)
{
  const char *size_field = hl_size_kind_to_element (shell->size_kind);
  HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX];

  hl_quantity_rows_show_name (self->name_entry, shell->name, (gpointer) on_name_entry_changed_cb, self);
  sync_dropdown (self->form_dropdown, shell->form);
  sync_dropdown (self->ends_dropdown, shell->ends);
  gtk_widget_set_sensitive (GTK_WIDGET (self->ends_dropdown), shell->form == HL_FORM_CYLINDER);
  sync_dropdown (self->size_kind_dropdown, shell->size_kind);
  if (g_strcmp0 (hl_quantity_row_get_field (self->size_row), size_field) != 0)
    {
      g_autofree char *label = g_strdup_printf ("_%s", hl_field_label (size_field));

      hl_quantity_row_set_field (self->size_row, size_field);
      hl_quantity_row_set_label (self->size_row, label);
    }

  own_rows (self, rows);
  for (guint i = 0; rows[i] != NULL; i++)
    {
      const char *field = hl_quantity_row_get_field (rows[i]);
      const HlField *f = hl_field_lookup (field);

      /* a text that cannot be read is the user's, still being typed */
      if (f != NULL && hl_field_is_number (f) && hl_document_get_input_error (self->document, field) == NULL)
        hl_quantity_rows_show (rows[i], hl_quantity_rows_value (f, shell));
    }
  {
    GtkDropDown *choices[N_CHOICES];
    GtkEntry *texts[N_TEXTS];

    choice_dropdowns (self, choices);
    for (guint i = 0; i < N_CHOICES; i++)
      sync_dropdown (choices[i], choice_position (shell, g_object_get_data (G_OBJECT (choices[i]), "hl-field")));
    text_entries (self, texts);
    for (guint i = 0; i < N_TEXTS; i++)
      {
        const HlField *f = hl_field_lookup (g_object_get_data (G_OBJECT (texts[i]), "hl-field"));

        hl_quantity_rows_show_name (texts[i], hl_field_cslot (f, shell), (gpointer) on_text_entry_changed_cb, self);
      }
  }
  hl_quantity_rows_mark (rows, self->document);
}

static void
on_document_changed_cb (HlDocument    *document,
                        HlShellEditor *self)
{
  const HlShellInputs *shell = hl_document_get_shell (document);

  gtk_widget_set_sensitive (GTK_WIDGET (self), shell != NULL);
  if (shell != NULL)
    sync_widgets (self, shell);
}

/* the shell as the document holds it, or NULL before there is one */
static const HlShellInputs *
current_shell (HlShellEditor *self)
{
  return self->document != NULL ? hl_document_get_shell (self->document) : NULL;
}

static void
commit_shell (HlShellEditor       *self,
              const HlShellInputs *shell,
              const char          *field)
{
  g_autofree char *key = NULL;

  if (field != NULL)
    key = g_strdup_printf ("%s:%s", shell->id, field);
  hl_document_edit_shell (self->document, shell, key);
}

static void
on_row_edited_cb (HlQuantityRow *row,
                  HlShellEditor *self)
{
  const HlShellInputs *current = current_shell (self);
  HlShellInputs shell;

  if (current != NULL && hl_quantity_rows_read (row, self->document, current, &shell))
    commit_shell (self, &shell, hl_quantity_row_get_field (row));
}

/* One drop-down changed: only its own field is read, since the others
 * may not show the document's shell yet while it is being shown. */
static void
choice_changed (HlShellEditor *self,
                GtkDropDown   *dropdown)
{
  const HlShellInputs *current = current_shell (self);
  guint selected = gtk_drop_down_get_selected (dropdown);
  HlShellInputs shell;

  if (current == NULL || selected == GTK_INVALID_LIST_POSITION)
    return;
  shell = *current;
  if (dropdown == self->form_dropdown)
    shell.form = (HlForm) selected;
  else if (dropdown == self->ends_dropdown)
    shell.ends = (HlEnds) selected;
  else if (dropdown == self->size_kind_dropdown)
    shell.size_kind = (HlSizeKind) selected;
  else
    get_choice (dropdown, g_object_get_data (G_OBJECT (dropdown), "hl-field"), &shell);
  if (hl_shell_inputs_equal (&shell, current))
    return;
  /* the size number is kept; only its meaning changes */
  hl_document_clear_input_errors (self->document);
  commit_shell (self, &shell, NULL);
}

static void
on_dropdown_selected_cb (GtkDropDown   *dropdown,
                         GParamSpec    *pspec,
                         HlShellEditor *self)
{
  choice_changed (self, dropdown);
}

static void
on_name_entry_changed_cb (GtkEntry      *entry,
                          HlShellEditor *self)
{
  const HlShellInputs *current = current_shell (self);
  HlShellInputs shell;

  if (current == NULL)
    return;
  shell = *current;
  /* the entry stops at the limit already; the cut is a second guard,
   * on a character boundary so the name stays valid UTF-8 */
  hl_utf8_copy (shell.name, gtk_editable_get_text (GTK_EDITABLE (entry)), sizeof shell.name);
  g_strstrip (shell.name);
  if (strcmp (shell.name, current->name) != 0)
    commit_shell (self, &shell, "name");
}

/* a text row of the table (code edition, material specification, …) */
static void
on_text_entry_changed_cb (GtkEntry      *entry,
                          HlShellEditor *self)
{
  const HlShellInputs *current = current_shell (self);
  const char *element = g_object_get_data (G_OBJECT (entry), "hl-field");
  const HlField *f = hl_field_lookup (element);
  HlShellInputs shell;
  char *slot;

  if (current == NULL || f == NULL)
    return;
  shell = *current;
  slot = hl_field_slot (f, &shell);
  hl_utf8_copy (slot, gtk_editable_get_text (GTK_EDITABLE (entry)), f->text_size);
  g_strstrip (slot);
  if (strcmp (slot, (const char *) hl_field_cslot (f, current)) != 0)
    commit_shell (self, &shell, element);
}

static void
hl_shell_editor_dispose (GObject *object)
{
  HlShellEditor *self = HL_SHELL_EDITOR (object);

  g_clear_object (&self->follower);
  g_clear_object (&self->document);
  gtk_widget_dispose_template (GTK_WIDGET (self), HL_TYPE_SHELL_EDITOR);
  G_OBJECT_CLASS (hl_shell_editor_parent_class)->dispose (object);
}

static void
hl_shell_editor_class_init (HlShellEditorClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = hl_shell_editor_dispose;

  g_type_ensure (HL_TYPE_QUANTITY_ROW);
  g_type_ensure (HL_TYPE_MATERIAL_GROUP);
  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-shell-editor.ui");
#define CHILD(name) gtk_widget_class_bind_template_child (widget_class, HlShellEditor, name)
  CHILD (name_entry);
  CHILD (form_dropdown);
  CHILD (ends_dropdown);
  CHILD (size_kind_dropdown);
  CHILD (size_row);
  CHILD (material_group);
  CHILD (basis_dropdown);
  CHILD (measure_dropdown);
  CHILD (criterion_dropdown);
  CHILD (design_basis_dropdown);
  CHILD (coincident_dropdown);
  CHILD (test_rule_dropdown);
  CHILD (code_edition_entry);
  CHILD (material_spec_entry);
  CHILD (allowable_source_entry);
#undef CHILD
#define CALLBACK(name) gtk_widget_class_bind_template_callback (widget_class, name)
  CALLBACK (on_row_edited_cb);
  CALLBACK (on_dropdown_selected_cb);
  CALLBACK (on_name_entry_changed_cb);
  CALLBACK (on_text_entry_changed_cb);
#undef CALLBACK
}

static void
hl_shell_editor_init (HlShellEditor *self)
{
  HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX];

  gtk_widget_init_template (GTK_WIDGET (self));
  fill_choices (self->basis_dropdown, "thin-radius-basis");
  fill_choices (self->measure_dropdown, "verdict-measure");
  fill_choices (self->criterion_dropdown, "sizing-criterion");
  fill_choices (self->design_basis_dropdown, "design-basis");
  fill_choices (self->coincident_dropdown, "external-pressure-coincident");
  fill_choices (self->test_rule_dropdown, "test-rule");
  hl_fields_ellipsize_dropdown (self->design_basis_dropdown);
  hl_fields_ellipsize_dropdown (self->test_rule_dropdown);
  {
    GtkEntry *texts[N_TEXTS];
    static const char *const elements[N_TEXTS] = { "code-edition", "material-specification",
                                                   "allowable-stress-source" };

    text_entries (self, texts);
    for (guint i = 0; i < N_TEXTS; i++)
      {
        const HlField *f = hl_field_lookup (elements[i]);

        g_object_set_data (G_OBJECT (texts[i]), "hl-field", (gpointer) elements[i]);
        gtk_editable_set_enable_undo (GTK_EDITABLE (texts[i]), FALSE);
        /* the file's slot, less the end byte */
        hl_fields_limit_editable (GTK_EDITABLE (texts[i]), 0, f->text_size - 1, TRUE);
        if (f->tooltip != NULL)
          gtk_widget_set_tooltip_text (GTK_WIDGET (texts[i]), _(f->tooltip));
      }
  }
  own_rows (self, rows);
  hl_quantity_rows_label (rows);
  /* Ctrl+Z belongs to the document's undo, which covers every field */
  gtk_editable_set_enable_undo (GTK_EDITABLE (self->name_entry), FALSE);
  /* names are fixed slots of bytes in the file model */
  hl_fields_limit_editable (GTK_EDITABLE (self->name_entry), 0, HL_LIMIT_NAME_BYTES, TRUE);
  self->follower = hl_document_follower_new ((HlDocumentRefresh) on_document_changed_cb, self);
}

void
hl_shell_editor_set_document (HlShellEditor *self,
                              HlDocument    *document)
{
  g_return_if_fail (HL_IS_SHELL_EDITOR (self));

  g_set_object (&self->document, document);
  hl_material_group_set_document (self->material_group, document);
  g_signal_group_set_target (self->follower, document);
}

void
hl_shell_editor_focus_name (HlShellEditor *self)
{
  g_return_if_fail (HL_IS_SHELL_EDITOR (self));
  gtk_widget_grab_focus (GTK_WIDGET (self->name_entry));
}

HlQuantityRow *
hl_shell_editor_get_row (HlShellEditor *self,
                         const char    *field)
{
  HlQuantityRow *rows[HL_QUANTITY_ROWS_MAX];

  g_return_val_if_fail (HL_IS_SHELL_EDITOR (self), NULL);

  /* the material group's rows too */
  hl_quantity_rows_collect (GTK_WIDGET (self), G_TYPE_INVALID, rows);
  for (guint i = 0; rows[i] != NULL; i++)
    if (g_strcmp0 (hl_quantity_row_get_field (rows[i]), field) == 0)
      return rows[i];
  return NULL;
}

GtkEditable *
hl_shell_editor_get_name_entry (HlShellEditor *self)
{
  g_return_val_if_fail (HL_IS_SHELL_EDITOR (self), NULL);
  return GTK_EDITABLE (self->name_entry);
}

GtkEditable *
hl_shell_editor_get_material_name_entry (HlShellEditor *self)
{
  g_return_val_if_fail (HL_IS_SHELL_EDITOR (self), NULL);
  return hl_material_group_get_name_entry (self->material_group);
}

const char *
hl_shell_editor_get_material_users_text (HlShellEditor *self)
{
  g_return_val_if_fail (HL_IS_SHELL_EDITOR (self), NULL);
  return hl_material_group_get_users_text (self->material_group);
}

GtkWidget *
hl_shell_editor_get_material_scope (HlShellEditor *self)
{
  g_return_val_if_fail (HL_IS_SHELL_EDITOR (self), NULL);
  return hl_material_group_get_scope (self->material_group);
}
