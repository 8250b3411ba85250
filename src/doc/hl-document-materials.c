/* hl-document-materials.c — the materials of the project and the rule for editing one
 *
 * The rule lives here, not in a view, so the window, a script or a test
 * that edits a material gets the same copies: a built-in material is
 * never changed (its first edit makes a project material), and a shared
 * project material is copied when the edit is for this shell only.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-document"

#include "hl-config.h"
#include "hl-document-private.h"
#include "hl-limits.h"

#include <glib/gi18n.h>
#include <string.h>

void
hl_document_put_material (HlDocument       *self,
                          const HlMaterial *material,
                          const char       *merge_key)
{
  HlShellInputs *shell;
  const HlMaterial *old;

  g_return_if_fail (HL_IS_DOCUMENT (self));
  g_return_if_fail (material != NULL);

  shell = (HlShellInputs *) hl_document_get_shell (self);
  old = hl_project_find_material (self->project, material->id);
  if (old != NULL && hl_material_equal (old, material) && shell != NULL
      && g_strcmp0 (shell->material_ref, material->id) == 0)
    return;
  hl_document_begin_edit (self, merge_key);
  hl_history_put_material (self->history, self->project, material);
  if (shell != NULL)
    {
      HlShellInputs changed = *shell;

      hl_utf8_copy (changed.material_ref, material->id, sizeof changed.material_ref);
      changed.material = *material;
      hl_history_set_shell (self->history, self->project, self->selected, &changed);
    }
  hl_document_end_edit (self);
}

guint
hl_document_count_material_users (HlDocument *self,
                                  const char *material_id)
{
  guint n = 0;

  g_return_val_if_fail (HL_IS_DOCUMENT (self), 0);

  for (guint i = 0; i < hl_project_n_shells (self->project); i++)
    if (g_strcmp0 (hl_project_shell (self->project, i)->material_ref, material_id) == 0)
      n++;
  return n;
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

const char *
hl_document_edit_material (HlDocument       *self,
                           const HlMaterial *material,
                           HlMaterialScope   scope,
                           const char       *field)
{
  const HlShellInputs *shell;
  HlMaterial m;
  g_autofree char *key = NULL;
  g_autofree char *id = NULL;
  g_autofree char *name = NULL;

  g_return_val_if_fail (HL_IS_DOCUMENT (self), NULL);
  g_return_val_if_fail (material != NULL && field != NULL, NULL);

  shell = hl_document_get_shell (self);
  g_return_val_if_fail (shell != NULL, NULL);
  m = *material;
  if (hl_project_find_material (self->project, m.id) == NULL)
    {
      id = unique_material_id (self->project, "material");
      /* TRANSLATORS: a built-in material copied to be edited */
      name = g_strdup_printf (_("%s, edited"), material->name);
    }
  else if (scope == HL_MATERIAL_SCOPE_THIS_SHELL && hl_document_count_material_users (self, m.id) > 1)
    {
      g_autofree char *stem = g_strdup_printf ("%s-copy", m.id);

      id = unique_material_id (self->project, stem);
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
  /* typing in one field of one shell's material is one undo step */
  key = g_strdup_printf ("material:%s:%s", shell->id, field);
  hl_document_put_material (self, &m, key);
  shell = hl_document_get_shell (self);
  return shell != NULL ? shell->material_ref : NULL;
}
