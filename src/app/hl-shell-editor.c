/* hl-shell-editor.c — the selected shell's inputs, in groups
 *
 * Values the user types go to the document as soon as they read as a
 * number with a unit; the core's checks then mark the fields that are
 * wrong, so the window and the loader give the same reasons.
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
#include "hl-shell-check.h"

#include <glib/gi18n.h>
#include <string.h>

struct _HlShellEditor
{
  GtkBox         parent_instance;

  GtkEntry      *name_entry;
  GtkDropDown   *form_dropdown;
  GtkDropDown   *ends_dropdown;
  GtkDropDown   *size_kind_dropdown;
  HlQuantityRow *size_row;
  HlQuantityRow *wall_thickness_row;
  HlQuantityRow *corrosion_allowance_row;
  HlQuantityRow *internal_pressure_row;
  HlQuantityRow *external_pressure_row;
  GtkDropDown   *material_dropdown;
  GtkLabel      *material_note_label;
  GtkWidget     *material_scope_box;
  GtkLabel      *material_users_label;
  GtkCheckButton *material_all_button;
  GtkCheckButton *material_this_button;
  GtkEntry      *material_name_entry;
  HlQuantityRow *elastic_modulus_row;
  HlQuantityRow *poisson_ratio_row;
  HlQuantityRow *yield_strength_row;
  HlQuantityRow *allowable_stress_row;
  GtkDropDown   *basis_dropdown;
  HlQuantityRow *thin_tolerance_row;
  GtkDropDown   *measure_dropdown;
  HlQuantityRow *joint_efficiency_row;
  GtkDropDown   *criterion_dropdown;

  HlDocument    *document;
  GSignalGroup  *follower;      /* calls on_document_changed_cb */
  HlShellInputs  shown;       /* what the fields show; equal means no reload */
  gboolean       has_shown;
  GPtrArray     *material_ids; /* char *, parallel to the material dropdown */
  /* the shell and material the scope choice was made for */
  char           scope_shell[HL_ID_MAX];
  char           scope_material[HL_ID_MAX];
  guint          updating;
};

G_DEFINE_FINAL_TYPE (HlShellEditor, hl_shell_editor, GTK_TYPE_BOX)

/* room for every row the template may hold, and the NULL at the end */
#define N_ROWS 48

static void
collect_in (GtkWidget     *widget,
            HlQuantityRow *rows[N_ROWS],
            guint         *n)
{
  for (GtkWidget *c = gtk_widget_get_first_child (widget); c != NULL; c = gtk_widget_get_next_sibling (c))
    if (HL_IS_QUANTITY_ROW (c))
      {
        if (*n < N_ROWS - 1)
          rows[(*n)++] = HL_QUANTITY_ROW (c);
      }
    else
      collect_in (c, rows, n);
}

/* the template's rows, found rather than listed: a new input's row is
 * one entry in the .ui, its field the table's element name */
static void
collect_rows (HlShellEditor *self,
              HlQuantityRow *rows[N_ROWS])
{
  guint n = 0;

  collect_in (GTK_WIDGET (self), rows, &n);
  rows[n] = NULL;
}

/* A row the template gives no label takes the table's, and every row
 * the table's tooltip, so a new input needs no more than its entry */
static void
label_rows (HlShellEditor *self)
{
  HlQuantityRow *rows[N_ROWS];

  collect_rows (self, rows);
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

/* where a field of the table lives in the inputs; size has four names */
static HlQuantity *
quantity_slot (HlShellInputs *s,
               const char    *field)
{
  const HlField *f = hl_field_lookup (field);

  if (f == NULL || !hl_field_is_number (f) || f->kind == HL_FIELD_RATIO)
    return NULL;
  return hl_field_slot (f, s);
}

static double *
number_slot (HlShellInputs *s,
             const char    *field)
{
  const HlField *f = hl_field_lookup (field);

  return f != NULL && f->kind == HL_FIELD_RATIO ? hl_field_slot (f, s) : NULL;
}

static gboolean
is_material_field (const char *field)
{
  return hl_field_find (HL_FIELD_OF_MATERIAL, field) != NULL;
}

static void
set_dropdown (HlShellEditor *self,
              GtkDropDown   *dropdown,
              guint          index)
{
  self->updating++;
  gtk_drop_down_set_selected (dropdown, index);
  self->updating--;
}

/* A drop-down of a choice row lists the row's choices in the table's
 * order, whatever the enum's order */
static void
set_choice (HlShellEditor *self,
            GtkDropDown   *dropdown,
            const char    *element)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, element);

  set_dropdown (self, dropdown,
                hl_field_choice_position (f, hl_field_choice_get (f, hl_field_cslot (f, &self->shown))));
}

static void
fill_choices (GtkDropDown *dropdown,
              const char  *element)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, element);
  g_autoptr(GtkStringList) items = gtk_string_list_new (NULL);

  for (guint i = 0; i < hl_field_choice_count (f); i++)
    gtk_string_list_append (items, _(f->choices[i].label));
  gtk_drop_down_set_model (dropdown, G_LIST_MODEL (items));
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

static void
set_entry (HlShellEditor *self,
           GtkEntry      *entry,
           const char    *text)
{
  if (g_strcmp0 (gtk_editable_get_text (GTK_EDITABLE (entry)), text) == 0)
    return;
  self->updating++;
  gtk_editable_set_text (GTK_EDITABLE (entry), text);
  self->updating--;
}

static void
reload_materials (HlShellEditor *self)
{
  const HlProject *project = hl_document_get_project (self->document);
  g_autoptr(GtkStringList) names = gtk_string_list_new (NULL);
  guint selected = GTK_INVALID_LIST_POSITION;

  g_ptr_array_set_size (self->material_ids, 0);
  for (guint i = 0; i < hl_project_n_materials (project); i++)
    {
      const HlMaterial *m = hl_project_material (project, i);

      gtk_string_list_append (names, m->name);
      g_ptr_array_add (self->material_ids, g_strdup (m->id));
    }
  for (guint i = 0; i < hl_material_builtin_count (); i++)
    {
      const HlMaterial *m = hl_material_builtin (i);

      gtk_string_list_append (names, m->name);
      g_ptr_array_add (self->material_ids, g_strdup (m->id));
    }
  for (guint i = 0; i < self->material_ids->len; i++)
    if (strcmp (g_ptr_array_index (self->material_ids, i), self->shown.material_ref) == 0)
      selected = i;

  self->updating++;
  gtk_drop_down_set_model (self->material_dropdown, G_LIST_MODEL (names));
  gtk_drop_down_set_selected (self->material_dropdown, selected);
  self->updating--;
}

/* A project material several shells use says so; the user picks
 * whether a change goes to all of them or to a copy for this shell.
 * Another shell or material starts again at "all", the file's meaning
 * of a shared material. */
static void
refresh_material_scope (HlShellEditor *self)
{
  const HlShellInputs *shell = hl_document_get_shell (self->document);
  const HlProject *project = hl_document_get_project (self->document);
  guint users = 0;

  if (shell != NULL && hl_project_find_material (project, shell->material_ref) != NULL)
    users = hl_document_count_material_users (self->document, shell->material_ref);
  if (shell == NULL || strcmp (shell->id, self->scope_shell) != 0
      || strcmp (shell->material_ref, self->scope_material) != 0)
    {
      hl_utf8_copy (self->scope_shell, shell != NULL ? shell->id : "", sizeof self->scope_shell);
      hl_utf8_copy (self->scope_material, shell != NULL ? shell->material_ref : "", sizeof self->scope_material);
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
refresh_marks (HlShellEditor *self)
{
  GPtrArray *problems = hl_document_get_problems (self->document);
  HlQuantityRow *rows[N_ROWS];

  collect_rows (self, rows);
  for (guint i = 0; rows[i] != NULL; i++)
    {
      HlQuantityRow *row = rows[i];
      const char *field = hl_quantity_row_get_field (row);
      const char *message = hl_document_get_input_error (self->document, field);

      for (guint k = 0; message == NULL && problems != NULL && k < problems->len; k++)
        {
          const HlProblem *p = g_ptr_array_index (problems, k);

          if (strcmp (p->field, field) == 0)
            message = p->local != NULL ? p->local : p->message;
        }
      hl_quantity_row_set_error (row, message);
    }
}

static void
reload (HlShellEditor *self)
{
  const HlShellInputs *shell = hl_document_get_shell (self->document);
  const HlProject *project = hl_document_get_project (self->document);
  const char *size_field;
  HlQuantityRow *rows[N_ROWS];

  gtk_widget_set_sensitive (GTK_WIDGET (self), shell != NULL);
  if (shell == NULL)
    {
      self->has_shown = FALSE;
      return;
    }
  self->shown = *shell;
  self->has_shown = TRUE;

  set_entry (self, self->name_entry, shell->name);
  set_dropdown (self, self->form_dropdown, shell->form);
  set_dropdown (self, self->ends_dropdown, shell->ends);
  gtk_widget_set_sensitive (GTK_WIDGET (self->ends_dropdown), shell->form == HL_FORM_CYLINDER);
  set_dropdown (self, self->size_kind_dropdown, shell->size_kind);
  size_field = hl_size_kind_to_element (shell->size_kind);
  hl_quantity_row_set_field (self->size_row, size_field);
  {
    g_autofree char *label = g_strdup_printf ("_%s", hl_field_label (size_field));

    hl_quantity_row_set_label (self->size_row, label);
  }

  collect_rows (self, rows);
  for (guint i = 0; rows[i] != NULL; i++)
    {
      const char *field = hl_quantity_row_get_field (rows[i]);
      HlQuantity *q = quantity_slot (&self->shown, field);
      double *d = number_slot (&self->shown, field);

      if (q != NULL || d != NULL)
        hl_quantity_row_set_quantity (rows[i], q != NULL ? *q : hl_quantity_make (*d, ""));
    }

  reload_materials (self);
  set_entry (self, self->material_name_entry, shell->material.name);
  gtk_widget_set_visible (GTK_WIDGET (self->material_note_label),
                          hl_project_find_material (project, shell->material_ref) == NULL
                          && hl_material_builtin_find (shell->material_ref) != NULL);

  set_choice (self, self->basis_dropdown, "thin-radius-basis");
  set_choice (self, self->measure_dropdown, "verdict-measure");
  set_choice (self, self->criterion_dropdown, "sizing-criterion");
}

static void
on_document_changed_cb (HlDocument    *document,
                        HlShellEditor *self)
{
  const HlShellInputs *shell = hl_document_get_shell (document);

  /* an edit made here already shows; reloading would move the cursor */
  if (shell == NULL || !self->has_shown || !hl_shell_inputs_equal (shell, &self->shown))
    reload (self);
  refresh_material_scope (self);
  refresh_marks (self);
}

static void
commit_shell (HlShellEditor       *self,
              const HlShellInputs *shell,
              const char          *field)
{
  g_autofree char *key = NULL;

  if (field != NULL)
    key = g_strdup_printf ("%s:%s", shell->id, field);
  self->shown = *shell;
  hl_document_edit_shell (self->document, shell, key);
}

/* "<stem>-N" that no project or built-in material uses; a long stem
 * is shortened so that the number always fits the id */
static char *
unique_material_id (const HlProject *project,
                    const char      *stem)
{
  for (guint n = 1;; n++)
    {
      g_autofree char *suffix = g_strdup_printf ("-%u", n);
      int room = (int) (HL_LIMIT_ID_BYTES - strlen (suffix));
      char *id = g_strdup_printf ("%.*s%s", MIN (room, (int) strlen (stem)), stem, suffix);

      if (hl_project_find_material (project, id) == NULL && hl_material_builtin_find (id) == NULL)
        return id;
      g_free (id);
    }
}

/* A built-in material is never changed: its first edit makes a project
 * material, so the built-in list keeps its typical values.  A shared
 * project material is copied when the user chose this shell only. */
static void
commit_material (HlShellEditor    *self,
                 const HlMaterial *material,
                 const char       *field)
{
  const HlProject *project = hl_document_get_project (self->document);
  HlMaterial m = *material;
  g_autofree char *key = g_strdup_printf ("material:%s:%s", self->shown.id, field);
  g_autofree char *id = NULL;
  g_autofree char *name = NULL;

  if (hl_project_find_material (project, m.id) == NULL)
    {
      id = unique_material_id (project, "material");
      /* TRANSLATORS: a built-in material copied to be edited */
      name = g_strdup_printf (_("%s, edited"), material->name);
    }
  else if (gtk_check_button_get_active (self->material_this_button)
           && hl_document_count_material_users (self->document, m.id) > 1)
    {
      g_autofree char *stem = g_strdup_printf ("%s-copy", m.id);

      id = unique_material_id (project, stem);
      /* TRANSLATORS: name of a copy; %s is the original's name */
      name = g_strdup_printf (_("%s (copy)"), material->name);
    }
  if (id != NULL)
    {
      hl_utf8_copy (m.id, id, sizeof m.id);
      /* a name being typed is the user's own */
      if (strcmp (field, "name") != 0)
        hl_utf8_copy (m.name, name, sizeof m.name);
    }
  self->shown.material = m;
  hl_utf8_copy (self->shown.material_ref, m.id, sizeof self->shown.material_ref);
  hl_document_put_material (self->document, &m, key);
  if (id != NULL)
    {
      /* the new material joins the list, and the choice is made */
      reload_materials (self);
      refresh_material_scope (self);
    }
}

static void
row_edited (HlShellEditor *self,
            HlQuantityRow *row)
{
  g_autoptr(GError) error = NULL;
  const char *field = hl_quantity_row_get_field (row);
  HlShellInputs shell;
  HlQuantity q;
  HlQuantity *qslot;
  double *dslot;

  if (self->updating > 0 || self->document == NULL || !self->has_shown)
    return;
  if (!hl_quantity_row_parse (row, &q, &error))
    {
      hl_document_set_input_error (self->document, field, error->message);
      return;
    }
  hl_document_set_input_error (self->document, field, NULL);

  shell = self->shown;
  qslot = quantity_slot (&shell, field);
  dslot = number_slot (&shell, field);
  if (qslot != NULL)
    *qslot = q;
  else if (dslot != NULL)
    *dslot = q.value;
  if (is_material_field (field))
    commit_material (self, &shell.material, field);
  else
    commit_shell (self, &shell, field);
}

static void
on_row_edited_cb (HlQuantityRow *row,
                  HlShellEditor *self)
{
  row_edited (self, row);
}

static void
choices_changed (HlShellEditor *self)
{
  HlShellInputs shell;

  if (self->updating > 0 || self->document == NULL || !self->has_shown)
    return;
  shell = self->shown;
  shell.form = (HlForm) gtk_drop_down_get_selected (self->form_dropdown);
  shell.ends = (HlEnds) gtk_drop_down_get_selected (self->ends_dropdown);
  shell.size_kind = (HlSizeKind) gtk_drop_down_get_selected (self->size_kind_dropdown);
  get_choice (self->basis_dropdown, "thin-radius-basis", &shell);
  get_choice (self->measure_dropdown, "verdict-measure", &shell);
  get_choice (self->criterion_dropdown, "sizing-criterion", &shell);
  gtk_widget_set_sensitive (GTK_WIDGET (self->ends_dropdown), shell.form == HL_FORM_CYLINDER);
  /* the size number is kept; only its meaning changes */
  hl_document_clear_input_errors (self->document);
  commit_shell (self, &shell, NULL);
  /* the size row's label follows the size kind */
  reload (self);
  refresh_marks (self);
}

#define CHOICE_CALLBACK(name) \
  static void on_##name##_selected_cb (GObject *o, GParamSpec *p, HlShellEditor *self) { choices_changed (self); }
CHOICE_CALLBACK (form_dropdown)
CHOICE_CALLBACK (ends_dropdown)
CHOICE_CALLBACK (size_kind_dropdown)
CHOICE_CALLBACK (basis_dropdown)
CHOICE_CALLBACK (measure_dropdown)
CHOICE_CALLBACK (criterion_dropdown)
#undef CHOICE_CALLBACK

static void
on_material_dropdown_selected_cb (GObject       *dropdown,
                                  GParamSpec    *pspec,
                                  HlShellEditor *self)
{
  const HlProject *project;
  const HlMaterial *m;
  HlShellInputs shell;
  guint i;
  const char *id;

  if (self->updating > 0 || self->document == NULL || !self->has_shown)
    return;
  i = gtk_drop_down_get_selected (self->material_dropdown);
  if (i >= self->material_ids->len)
    return;
  id = g_ptr_array_index (self->material_ids, i);
  project = hl_document_get_project (self->document);
  m = hl_project_find_material (project, id);
  if (m == NULL)
    m = hl_material_builtin_find (id);
  if (m == NULL)
    return;
  shell = self->shown;
  shell.material = *m;
  hl_utf8_copy (shell.material_ref, m->id, sizeof shell.material_ref);
  commit_shell (self, &shell, NULL);
  reload (self);
  refresh_marks (self);
}

static void
on_name_entry_changed_cb (GtkEntry      *entry,
                          HlShellEditor *self)
{
  HlShellInputs shell;

  if (self->updating > 0 || self->document == NULL || !self->has_shown)
    return;
  shell = self->shown;
  /* the entry stops at the limit already; the cut is a second guard,
   * on a character boundary so the name stays valid UTF-8 */
  hl_utf8_copy (shell.name, gtk_editable_get_text (GTK_EDITABLE (entry)), sizeof shell.name);
  /* the file keeps no space at either end; the entry keeps what is
   * typed, so a space before the next word stays */
  g_strstrip (shell.name);
  commit_shell (self, &shell, "name");
}

static void
on_material_name_entry_changed_cb (GtkEntry      *entry,
                                   HlShellEditor *self)
{
  HlMaterial m;

  if (self->updating > 0 || self->document == NULL || !self->has_shown)
    return;
  m = self->shown.material;
  hl_utf8_copy (m.name, gtk_editable_get_text (GTK_EDITABLE (entry)), sizeof m.name);
  g_strstrip (m.name);
  commit_material (self, &m, "name");
  reload_materials (self);
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
hl_shell_editor_finalize (GObject *object)
{
  HlShellEditor *self = HL_SHELL_EDITOR (object);

  g_clear_pointer (&self->material_ids, g_ptr_array_unref);
  G_OBJECT_CLASS (hl_shell_editor_parent_class)->finalize (object);
}

static void
hl_shell_editor_class_init (HlShellEditorClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = hl_shell_editor_dispose;
  object_class->finalize = hl_shell_editor_finalize;

  g_type_ensure (HL_TYPE_QUANTITY_ROW);
  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-shell-editor.ui");
#define CHILD(name) gtk_widget_class_bind_template_child (widget_class, HlShellEditor, name)
  CHILD (name_entry);
  CHILD (form_dropdown);
  CHILD (ends_dropdown);
  CHILD (size_kind_dropdown);
  CHILD (size_row);
  CHILD (wall_thickness_row);
  CHILD (corrosion_allowance_row);
  CHILD (internal_pressure_row);
  CHILD (external_pressure_row);
  CHILD (material_dropdown);
  CHILD (material_note_label);
  CHILD (material_scope_box);
  CHILD (material_users_label);
  CHILD (material_all_button);
  CHILD (material_this_button);
  CHILD (material_name_entry);
  CHILD (elastic_modulus_row);
  CHILD (poisson_ratio_row);
  CHILD (yield_strength_row);
  CHILD (allowable_stress_row);
  CHILD (basis_dropdown);
  CHILD (thin_tolerance_row);
  CHILD (measure_dropdown);
  CHILD (joint_efficiency_row);
  CHILD (criterion_dropdown);
#undef CHILD
#define CALLBACK(name) gtk_widget_class_bind_template_callback (widget_class, name)
  CALLBACK (on_row_edited_cb);
  CALLBACK (on_form_dropdown_selected_cb);
  CALLBACK (on_ends_dropdown_selected_cb);
  CALLBACK (on_size_kind_dropdown_selected_cb);
  CALLBACK (on_basis_dropdown_selected_cb);
  CALLBACK (on_measure_dropdown_selected_cb);
  CALLBACK (on_criterion_dropdown_selected_cb);
  CALLBACK (on_material_dropdown_selected_cb);
  CALLBACK (on_name_entry_changed_cb);
  CALLBACK (on_material_name_entry_changed_cb);
#undef CALLBACK
}

/* Material names are long; ellipsized they leave the sidebar its width,
 * and the open list still shows them whole. */
static void
on_material_item_setup_cb (GtkSignalListItemFactory *factory,
                           GtkListItem              *item,
                           gpointer                  user_data)
{
  GtkWidget *label = gtk_label_new (NULL);

  gtk_label_set_ellipsize (GTK_LABEL (label), PANGO_ELLIPSIZE_END);
  gtk_label_set_xalign (GTK_LABEL (label), 0);
  gtk_list_item_set_child (item, label);
}

static void
on_material_item_bind_cb (GtkSignalListItemFactory *factory,
                          GtkListItem              *item,
                          gpointer                  user_data)
{
  GtkStringObject *name = gtk_list_item_get_item (item);
  GtkWidget *label = gtk_list_item_get_child (item);

  gtk_label_set_text (GTK_LABEL (label), gtk_string_object_get_string (name));
  gtk_widget_set_tooltip_text (label, gtk_string_object_get_string (name));
}

static void
hl_shell_editor_init (HlShellEditor *self)
{
  g_autoptr(GtkListItemFactory) factory = gtk_signal_list_item_factory_new ();

  self->material_ids = g_ptr_array_new_with_free_func (g_free);
  gtk_widget_init_template (GTK_WIDGET (self));
  self->updating++;
  fill_choices (self->basis_dropdown, "thin-radius-basis");
  fill_choices (self->measure_dropdown, "verdict-measure");
  fill_choices (self->criterion_dropdown, "sizing-criterion");
  self->updating--;
  label_rows (self);
  /* Ctrl+Z belongs to the document's undo, which covers every field */
  gtk_editable_set_enable_undo (GTK_EDITABLE (self->name_entry), FALSE);
  gtk_editable_set_enable_undo (GTK_EDITABLE (self->material_name_entry), FALSE);
  /* names are fixed slots of bytes in the file model */
  hl_fields_limit_editable (GTK_EDITABLE (self->name_entry), 0, HL_LIMIT_NAME_BYTES, TRUE);
  hl_fields_limit_editable (GTK_EDITABLE (self->material_name_entry), 0, HL_LIMIT_NAME_BYTES, TRUE);
  g_signal_connect (factory, "setup", G_CALLBACK (on_material_item_setup_cb), NULL);
  g_signal_connect (factory, "bind", G_CALLBACK (on_material_item_bind_cb), NULL);
  gtk_drop_down_set_factory (self->material_dropdown, factory);
  self->follower = hl_document_follower_new ((HlDocumentRefresh) on_document_changed_cb, self);
}

void
hl_shell_editor_set_document (HlShellEditor *self,
                              HlDocument    *document)
{
  g_return_if_fail (HL_IS_SHELL_EDITOR (self));

  g_set_object (&self->document, document);
  self->has_shown = FALSE;
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
  HlQuantityRow *rows[N_ROWS];

  g_return_val_if_fail (HL_IS_SHELL_EDITOR (self), NULL);

  collect_rows (self, rows);
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
  return GTK_EDITABLE (self->material_name_entry);
}

const char *
hl_shell_editor_get_material_users_text (HlShellEditor *self)
{
  g_return_val_if_fail (HL_IS_SHELL_EDITOR (self), NULL);
  if (!gtk_widget_get_visible (self->material_scope_box))
    return NULL;
  return gtk_label_get_text (self->material_users_label);
}

GtkWidget *
hl_shell_editor_get_material_scope (HlShellEditor *self)
{
  g_return_val_if_fail (HL_IS_SHELL_EDITOR (self), NULL);
  return GTK_WIDGET (self->material_this_button);
}
