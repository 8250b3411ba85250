/* hl-document-shells.c — the shells: the list model views bind to, and the shell edits
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-document"

#include "hl-config.h"
#include "hl-document-private.h"
#include "hl-limits.h"
#include "hl-shell-item.h"

#include <glib/gi18n.h>
#include <string.h>

static gboolean
same_id (GListModel      *items,
         guint            position,
         const HlProject *project,
         guint            index)
{
  g_autoptr(HlShellItem) item = g_list_model_get_item (items, position);

  return strcmp (hl_shell_item_get_id (item), hl_project_shell (project, index)->id) == 0;
}

/* The list of shells follows the project with the least change: items
 * whose shell stays keep their identity (and notify a new name or form),
 * and one splice replaces the run that was added, removed or moved, so a
 * list view rebuilds only what changed and typing a value touches none. */
void
hl_document_sync_shells (HlDocument *self)
{
  GListModel *items = G_LIST_MODEL (self->shells);
  guint n_old = g_list_model_get_n_items (items);
  guint n_new = hl_project_n_shells (self->project);
  guint start = 0, end_old = n_old, end_new = n_new;
  g_autoptr(GPtrArray) added = g_ptr_array_new_with_free_func (g_object_unref);

  while (start < n_old && start < n_new && same_id (items, start, self->project, start))
    start++;
  while (end_old > start && end_new > start && same_id (items, end_old - 1, self->project, end_new - 1))
    end_old--, end_new--;
  for (guint i = 0; i < start; i++)
    {
      g_autoptr(HlShellItem) item = g_list_model_get_item (items, i);

      hl_shell_item_update (item, hl_project_shell (self->project, i));
    }
  for (guint i = end_old; i < n_old; i++)
    {
      g_autoptr(HlShellItem) item = g_list_model_get_item (items, i);

      hl_shell_item_update (item, hl_project_shell (self->project, i - end_old + end_new));
    }
  for (guint i = start; i < end_new; i++)
    g_ptr_array_add (added, hl_shell_item_new (hl_project_shell (self->project, i)));
  if (end_old > start || added->len > 0)
    g_list_store_splice (self->shells, start, end_old - start, added->pdata, added->len);
}


void
hl_document_edit_shell (HlDocument          *self,
                        const HlShellInputs *shell,
                        const char          *merge_key)
{
  const HlShellInputs *slot;

  g_return_if_fail (HL_IS_DOCUMENT (self));
  g_return_if_fail (shell != NULL);

  slot = hl_document_get_shell (self);
  g_return_if_fail (slot != NULL);
  if (hl_shell_inputs_equal (slot, shell))
    return;
  hl_document_begin_edit (self, merge_key);
  hl_history_set_shell (self->history, self->project, self->selected, shell);
  hl_document_end_edit (self);
}

static guint
number_in_id (const char *id)
{
  const char *dash = strrchr (id, '-');

  return dash != NULL ? (guint) g_ascii_strtoull (dash + 1, NULL, 10) : 0;
}

void
hl_document_add_shell (HlDocument          *self,
                       const HlShellInputs *template_shell)
{
  HlShellInputs shell;
  g_autofree char *id = NULL;
  g_autofree char *name = NULL;

  g_return_if_fail (HL_IS_DOCUMENT (self));
  g_return_if_fail (template_shell != NULL);

  shell = *template_shell;
  id = hl_project_unique_shell_id (self->project, "shell");
  /* TRANSLATORS: name of a new shell; %u is its number */
  name = g_strdup_printf (_("Shell %u"), number_in_id (id));
  hl_utf8_copy (shell.id, id, sizeof shell.id);
  hl_utf8_copy (shell.name, name, sizeof shell.name);

  hl_document_begin_edit (self, NULL);
  hl_history_insert_shell (self->history, self->project, hl_project_n_shells (self->project), &shell);
  self->selected = hl_project_n_shells (self->project) - 1;
  g_hash_table_remove_all (self->input_errors);
  hl_document_end_edit (self);
}

void
hl_document_duplicate_shell (HlDocument *self)
{
  const HlShellInputs *current;
  HlShellInputs shell;
  g_autofree char *id = NULL;
  g_autofree char *name = NULL;

  g_return_if_fail (HL_IS_DOCUMENT (self));

  current = hl_document_get_shell (self);
  if (current == NULL)
    return;
  shell = *current;
  id = hl_project_unique_shell_id (self->project, current->id);
  /* TRANSLATORS: name of a duplicated shell; %s is the original's name */
  name = g_strdup_printf (_("%s (copy)"), current->name);
  /* a name near the limit loses its end, never half a character, and
   * no space is left at the end (the file would not keep it) */
  hl_utf8_copy (shell.id, id, sizeof shell.id);
  hl_utf8_copy (shell.name, name, sizeof shell.name);
  g_strchomp (shell.name);

  hl_document_begin_edit (self, NULL);
  hl_history_insert_shell (self->history, self->project, self->selected + 1, &shell);
  self->selected++;
  g_hash_table_remove_all (self->input_errors);
  hl_document_end_edit (self);
}

void
hl_document_remove_shell (HlDocument *self)
{
  g_return_if_fail (HL_IS_DOCUMENT (self));

  if (self->selected >= hl_project_n_shells (self->project))
    return;
  hl_document_begin_edit (self, NULL);
  hl_history_remove_shell (self->history, self->project, self->selected);
  if (self->selected > 0 && self->selected >= hl_project_n_shells (self->project))
    self->selected--;
  g_hash_table_remove_all (self->input_errors);
  hl_document_end_edit (self);
}

void
hl_document_move_shell (HlDocument *self,
                        int         delta)
{
  guint n, to;
  HlShellInputs moved;

  g_return_if_fail (HL_IS_DOCUMENT (self));

  n = hl_project_n_shells (self->project);
  if (self->selected >= n || (delta < 0 && self->selected == 0)
      || (delta > 0 && self->selected + 1 >= n) || delta == 0)
    return;
  to = delta < 0 ? self->selected - 1 : self->selected + 1;
  hl_document_begin_edit (self, NULL);
  moved = *hl_project_shell (self->project, self->selected);
  hl_history_remove_shell (self->history, self->project, self->selected);
  hl_history_insert_shell (self->history, self->project, to, &moved);
  self->selected = to;
  hl_document_end_edit (self);
}

GListModel *
hl_document_get_shells (HlDocument *self)
{
  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  return G_LIST_MODEL (self->shells);
}
