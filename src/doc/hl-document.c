/* hl-document.c — the open project: file, modified flag, undo, selection
 *
 * The edit cycle (begin, change through the history, end: solve once,
 * emit, notify), loading and saving; the shells, materials and property
 * bookkeeping have their own files (hl-document-private.h lists them).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-document"

#include "hl-config.h"
#include "hl-document-private.h"
#include "hl-field-label.h"
#include "hl-shell-item.h"
#include "hl-limits.h"
#include "hl-project-file.h"
#include "hl-shell-check.h"

#include <glib/gi18n.h>
#include <string.h>

G_DEFINE_FINAL_TYPE (HlDocument, hl_document, G_TYPE_OBJECT)

GParamSpec *hl_document_props[N_PROPS];

enum { CHANGED, N_SIGNALS };
static guint signals[N_SIGNALS];

static void
append_problem_line (GString    *text,
                     const char *field,
                     const char *message)
{
  if (text->len > 0)
    g_string_append_c (text, '\n');
  /* TRANSLATORS: a field label and what is wrong with its value */
  g_string_append_printf (text, _("%s: %s"), hl_field_label (field), message);
}

/* Solves once per change, so every view reads the same solution. */
static void
update (HlDocument *self)
{
  g_autoptr(GString) text = g_string_new (NULL);
  const HlShellInputs *shell;
  GHashTableIter iter;
  gpointer key, value;

  g_clear_pointer (&self->solution, hl_solution_free);
  g_clear_pointer (&self->new_wall, hl_solution_free);
  g_clear_pointer (&self->problems, g_ptr_array_unref);
  g_clear_pointer (&self->problem_text, g_free);
  hl_document_sync_shells (self);
  if (!self->primed)
    hl_document_remember_properties (self);

  if (hl_project_n_shells (self->project) == 0)
    {
      self->problems = g_ptr_array_new ();
      self->problem_text = g_strdup (_("The project has no shells. Add one to see results."));
      return;
    }
  if (self->selected >= hl_project_n_shells (self->project))
    self->selected = hl_project_n_shells (self->project) - 1;
  shell = hl_project_shell (self->project, self->selected);
  self->problems = hl_shell_inputs_check (shell);

  g_hash_table_iter_init (&iter, self->input_errors);
  while (g_hash_table_iter_next (&iter, &key, &value))
    append_problem_line (text, key, value);
  for (guint i = 0; i < self->problems->len; i++)
    {
      const HlProblem *p = g_ptr_array_index (self->problems, i);

      /* the field's own text error says more than the stale stored value */
      if (!g_hash_table_contains (self->input_errors, p->field))
        append_problem_line (text, p->field, p->message);
    }

  if (text->len == 0)
    {
      g_autoptr(GError) error = NULL;

      self->solution = hl_solve (shell, HL_DEFAULT_POINTS, TRUE, &error);
      if (self->solution == NULL)
        g_string_append (text, error->message);
      else
        self->new_wall = hl_solve (shell, HL_DEFAULT_POINTS, FALSE, NULL);
    }
  if (text->len > 0)
    self->problem_text = g_strdup (text->str);
}

void
hl_document_emit_changed (HlDocument *self)
{
  update (self);
  g_signal_emit (self, signals[CHANGED], 0);
  hl_document_notify_properties (self);
}

void
hl_document_begin_edit (HlDocument *self,
            const char *merge_key)
{
  hl_history_begin (self->history, merge_key, self->selected);
}

void
hl_document_end_edit (HlDocument *self)
{
  hl_history_end (self->history, self->selected);
  hl_document_emit_changed (self);
}

static void
hl_document_finalize (GObject *object)
{
  HlDocument *self = HL_DOCUMENT (object);

  g_clear_pointer (&self->project, hl_project_free);
  g_clear_pointer (&self->saved, hl_project_free);
  g_clear_object (&self->file);
  g_clear_pointer (&self->history, hl_history_free);
  g_clear_pointer (&self->input_errors, g_hash_table_unref);
  g_clear_pointer (&self->solution, hl_solution_free);
  g_clear_pointer (&self->new_wall, hl_solution_free);
  g_clear_pointer (&self->problems, g_ptr_array_unref);
  g_clear_pointer (&self->problem_text, g_free);
  g_clear_pointer (&self->seen_title, g_free);
  g_clear_object (&self->seen_file);
  g_clear_object (&self->shells);
  G_OBJECT_CLASS (hl_document_parent_class)->finalize (object);
}

static void
hl_document_get_property (GObject    *object,
                          guint       prop_id,
                          GValue     *value,
                          GParamSpec *pspec)
{
  HlDocument *self = HL_DOCUMENT (object);

  switch (prop_id)
    {
    case PROP_TITLE:
      g_value_set_string (value, hl_document_get_title (self));
      break;
    case PROP_FILE:
      g_value_set_object (value, self->file);
      break;
    case PROP_MODIFIED:
      g_value_set_boolean (value, hl_document_get_modified (self));
      break;
    case PROP_SELECTED:
      g_value_set_uint (value, self->selected);
      break;
    case PROP_SOLUTION:
      g_value_set_pointer (value, self->solution);
      break;
    case PROP_CAN_UNDO:
      g_value_set_boolean (value, hl_document_can_undo (self));
      break;
    case PROP_CAN_REDO:
      g_value_set_boolean (value, hl_document_can_redo (self));
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
hl_document_class_init (HlDocumentClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);

  object_class->finalize = hl_document_finalize;
  object_class->get_property = hl_document_get_property;

  /* read-only: every change goes through the edit functions, so undo,
   * the modified flag and the one solve per change stay in step */
  hl_document_props[PROP_TITLE] = g_param_spec_string ("title", NULL, "the project title, or “Untitled project”", NULL,
                                           G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  hl_document_props[PROP_FILE] = g_param_spec_object ("file", NULL, "the file saves go to, or NULL", G_TYPE_FILE,
                                          G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  hl_document_props[PROP_MODIFIED] = g_param_spec_boolean ("modified", NULL, "differs from the file", FALSE,
                                               G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  hl_document_props[PROP_SELECTED] = g_param_spec_uint ("selected", NULL, "index of the selected shell", 0, G_MAXUINT, 0,
                                            G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  hl_document_props[PROP_SOLUTION] = g_param_spec_pointer ("solution", NULL, "the selected shell's HlSolution, or NULL",
                                               G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  hl_document_props[PROP_CAN_UNDO] = g_param_spec_boolean ("can-undo", NULL, "an edit can be undone", FALSE,
                                               G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  hl_document_props[PROP_CAN_REDO] = g_param_spec_boolean ("can-redo", NULL, "an undone edit can be redone", FALSE,
                                               G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  g_object_class_install_properties (object_class, N_PROPS, hl_document_props);

  /* Anything changed: project, selection, file, modified flag, problems. */
  signals[CHANGED] = g_signal_new ("changed", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST,
                                   0, NULL, NULL, NULL, G_TYPE_NONE, 0);
}

static void
hl_document_init (HlDocument *self)
{
  self->history = hl_history_new ();
  self->input_errors = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, g_free);
  self->shells = g_list_store_new (HL_TYPE_SHELL_ITEM);
}

HlDocument *
hl_document_new (const HlShellInputs *first_shell,
                 HlUnitSystem         units)
{
  HlDocument *self = g_object_new (HL_TYPE_DOCUMENT, NULL);

  g_return_val_if_fail (first_shell != NULL, self);

  self->project = hl_project_new ();
  self->project->display_units = units;
  hl_project_add_shell (self->project, first_shell);
  self->saved = hl_project_copy (self->project);
  update (self);
  return self;
}

HlDocument *
hl_document_new_restored (HlProject *project,
                          GFile     *file)
{
  HlDocument *self = g_object_new (HL_TYPE_DOCUMENT, NULL);
  g_autofree char *path = file != NULL ? g_file_get_path (file) : NULL;

  self->project = project;
  /* the file as it is now, so that the mark shows what saving would change;
   * a file gone or unreadable compares as nothing saved yet */
  if (path != NULL)
    self->saved = hl_project_load (path, NULL, NULL);
  if (self->saved == NULL)
    self->saved = hl_project_new ();
  g_set_object (&self->file, file);
  update (self);
  return self;
}

gboolean
hl_document_load (HlDocument  *self,
                  GFile       *file,
                  GPtrArray  **warnings,
                  GError     **error)
{
  g_autofree char *path = NULL;
  HlProject *project;

  g_return_val_if_fail (HL_IS_DOCUMENT (self), FALSE);
  g_return_val_if_fail (G_IS_FILE (file), FALSE);

  path = g_file_get_path (file);
  if (path == NULL)
    {
      g_autofree char *uri = g_file_get_uri (file);

      g_set_error (error, G_IO_ERROR, G_IO_ERROR_NOT_SUPPORTED,
                   _("“%s” is not a local file"), uri);
      return FALSE;
    }
  project = hl_project_load (path, warnings, error);
  if (project == NULL)
    return FALSE;

  hl_project_free (self->project);
  self->project = project;
  g_clear_pointer (&self->saved, hl_project_free);
  self->saved = hl_project_copy (project);
  g_set_object (&self->file, file);
  self->selected = 0;
  hl_history_clear (self->history);
  g_hash_table_remove_all (self->input_errors);
  hl_document_emit_changed (self);
  return TRUE;
}

/* A file the loader would refuse is no safe copy of the work, so a
 * project with bad values is not written; the shell's own words come
 * first, the writer's field limits after. */
gboolean
hl_document_check_writable (HlDocument *self,
                            GError    **error)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), FALSE);

  for (guint i = 0; i < hl_project_n_shells (self->project); i++)
    {
      const HlShellInputs *shell = hl_project_shell (self->project, i);
      g_autoptr(GPtrArray) problems = hl_shell_inputs_check (shell);

      if (problems->len > 0)
        {
          const HlProblem *p = g_ptr_array_index (problems, 0);

          g_set_error (error, G_IO_ERROR, G_IO_ERROR_INVALID_DATA,
                       /* TRANSLATORS: shell name, field label, reason */
                       _("Shell “%s”: %s %s. Fix the marked values, then save again."),
                       shell->name, hl_field_label (p->field), p->message);
          return FALSE;
        }
    }
  if (g_hash_table_size (self->input_errors) > 0)
    {
      g_set_error_literal (error, G_IO_ERROR, G_IO_ERROR_INVALID_DATA,
                           _("Some values cannot be read. Fix the marked values, then save again."));
      return FALSE;
    }
  return hl_project_check_writable (self->project, error);
}

gboolean
hl_document_save (HlDocument *self,
                  GFile      *file,
                  GError    **error)
{
  g_autofree char *path = NULL;

  g_return_val_if_fail (HL_IS_DOCUMENT (self), FALSE);

  if (file == NULL)
    file = self->file;
  g_return_val_if_fail (G_IS_FILE (file), FALSE);

  if (!hl_document_check_writable (self, error))
    return FALSE;
  path = g_file_get_path (file);
  if (path == NULL)
    {
      g_set_error_literal (error, G_IO_ERROR, G_IO_ERROR_NOT_SUPPORTED,
                           _("Projects can only be saved to local files"));
      return FALSE;
    }
  if (!hl_project_save (self->project, path, error))
    return FALSE;

  g_clear_pointer (&self->saved, hl_project_free);
  self->saved = hl_project_copy (self->project);
  g_set_object (&self->file, file);
  hl_history_break_merge (self->history);
  hl_document_emit_changed (self);
  return TRUE;
}

const HlProject *
hl_document_get_project (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  return self->project;
}

GFile *
hl_document_get_file (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  return self->file;
}

gboolean
hl_document_get_modified (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), FALSE);
  return !hl_project_equal (self->project, self->saved);
}

const char *
hl_document_get_title (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  if (self->project->title == NULL || self->project->title[0] == '\0')
    return _("Untitled project");
  return self->project->title;
}

guint
hl_document_get_selected (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), 0);
  return self->selected;
}

void
hl_document_set_selected (HlDocument *self,
                          guint       index)
{
  g_return_if_fail (HL_IS_DOCUMENT (self));

  if (index >= hl_project_n_shells (self->project) || index == self->selected)
    return;
  self->selected = index;
  g_hash_table_remove_all (self->input_errors);
  hl_document_emit_changed (self);
}

const HlShellInputs *
hl_document_get_shell (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  if (self->selected >= hl_project_n_shells (self->project))
    return NULL;
  return hl_project_shell (self->project, self->selected);
}

const HlSolution *
hl_document_get_solution (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  return self->solution;
}

const HlSolution *
hl_document_get_new_wall_solution (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  return self->new_wall;
}

const char *
hl_document_get_problem_text (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  return self->problem_text;
}

GPtrArray *
hl_document_get_problems (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  return self->problems;
}

void
hl_document_set_input_error (HlDocument *self,
                             const char *field,
                             const char *message)
{
  const char *old;

  g_return_if_fail (HL_IS_DOCUMENT (self));
  g_return_if_fail (field != NULL);

  old = g_hash_table_lookup (self->input_errors, field);
  if (g_strcmp0 (old, message) == 0)
    return;
  if (message == NULL)
    g_hash_table_remove (self->input_errors, field);
  else
    g_hash_table_insert (self->input_errors, g_strdup (field), g_strdup (message));
  hl_document_emit_changed (self);
}

void
hl_document_clear_input_errors (HlDocument *self)
{
  g_return_if_fail (HL_IS_DOCUMENT (self));

  if (g_hash_table_size (self->input_errors) == 0)
    return;
  g_hash_table_remove_all (self->input_errors);
  hl_document_emit_changed (self);
}

const char *
hl_document_get_input_error (HlDocument *self,
                             const char *field)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  return g_hash_table_lookup (self->input_errors, field);
}

void
hl_document_set_info (HlDocument  *self,
                      const char  *title,
                      const char  *engineer,
                      const char  *description,
                      HlUnitSystem units)
{
  HlProject *p;

  g_return_if_fail (HL_IS_DOCUMENT (self));

  p = self->project;
  if (g_strcmp0 (p->title, title) == 0 && g_strcmp0 (p->engineer, engineer) == 0
      && g_strcmp0 (p->description, description) == 0 && p->display_units == units)
    return;
  hl_document_begin_edit (self, "project-info");
  hl_history_set_info (self->history, p, title, engineer, description, units);
  hl_document_end_edit (self);
}

void
hl_document_set_signoff (HlDocument    *self,
                         HlSignoffRole  role,
                         const char    *name,
                         const char    *date)
{
  static const char *const merge_keys[HL_N_SIGNOFFS] = { "signoff-prepared", "signoff-checked", "signoff-approved" };
  const HlSignoff *so;

  g_return_if_fail (HL_IS_DOCUMENT (self));
  g_return_if_fail (role < HL_N_SIGNOFFS);

  so = &self->project->signoff[role];
  if (g_strcmp0 (so->name, name != NULL ? name : "") == 0 && g_strcmp0 (so->date, date != NULL ? date : "") == 0)
    return;
  /* typing in the same box is one undo step, like the project texts */
  hl_document_begin_edit (self, merge_keys[role]);
  hl_history_set_signoff (self->history, self->project, role, name, date);
  hl_document_end_edit (self);
}

gboolean
hl_document_add_revision (HlDocument *self,
                          const char *date,
                          const char *author,
                          const char *text)
{
  const HlRevision *latest;
  guint number;

  g_return_val_if_fail (HL_IS_DOCUMENT (self), FALSE);

  latest = hl_project_latest_revision (self->project);
  number = latest != NULL ? latest->number + 1 : 1;
  /* the reader refuses what lies past the shared limits: such a note
   * would make a file that does not open again */
  if (number > HL_LIMIT_REVISION_NUMBER
      || g_utf8_strlen (author != NULL ? author : "", -1) > HL_LIMIT_SHORT_TEXT_CHARS
      || g_utf8_strlen (text != NULL ? text : "", -1) > HL_LIMIT_LONG_TEXT_CHARS)
    return FALSE;
  hl_document_begin_edit (self, NULL);
  hl_history_add_revision (self->history, self->project, number, date, author, text);
  hl_document_end_edit (self);
  return TRUE;
}

gboolean
hl_document_can_undo (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), FALSE);
  return hl_history_can_undo (self->history);
}

gboolean
hl_document_can_redo (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), FALSE);
  return hl_history_can_redo (self->history);
}

static void
after_restore (HlDocument *self,
               guint       selected)
{
  self->selected = selected;
  g_hash_table_remove_all (self->input_errors);
  hl_document_emit_changed (self);
}

void
hl_document_undo (HlDocument *self)
{
  guint selected;

  g_return_if_fail (HL_IS_DOCUMENT (self));
  if (hl_history_undo (self->history, self->project, &selected))
    after_restore (self, selected);
}

void
hl_document_redo (HlDocument *self)
{
  guint selected;

  g_return_if_fail (HL_IS_DOCUMENT (self));
  if (hl_history_redo (self->history, self->project, &selected))
    after_restore (self, selected);
}

gsize
hl_document_get_history_bytes (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), 0);
  return hl_history_bytes (self->history);
}

