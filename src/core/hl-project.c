/* hl-project.c — a project: shells, materials, revision notes
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-project"

#include "hl-project.h"

#include <string.h>

static void
revision_clear (gpointer data)
{
  HlRevision *r = data;

  g_clear_pointer (&r->author, g_free);
  g_clear_pointer (&r->text, g_free);
}

HlProject *
hl_project_new (void)
{
  HlProject *p = g_new0 (HlProject, 1);

  p->title = g_strdup ("");
  p->engineer = g_strdup ("");
  p->description = g_strdup ("");
  p->display_units = HL_UNIT_SYSTEM_SI;
  p->materials = g_array_new (FALSE, TRUE, sizeof (HlMaterial));
  p->shells = g_array_new (FALSE, TRUE, sizeof (HlShellInputs));
  p->revisions = g_array_new (FALSE, TRUE, sizeof (HlRevision));
  g_array_set_clear_func (p->revisions, revision_clear);
  return p;
}

HlProject *
hl_project_copy (const HlProject *project)
{
  HlProject *p = hl_project_new ();

  hl_project_set_title (p, project->title);
  hl_project_set_engineer (p, project->engineer);
  hl_project_set_description (p, project->description);
  p->display_units = project->display_units;
  g_array_append_vals (p->materials, project->materials->data, project->materials->len);
  g_array_append_vals (p->shells, project->shells->data, project->shells->len);
  for (guint i = 0; i < project->revisions->len; i++)
    {
      const HlRevision *r = &g_array_index (project->revisions, HlRevision, i);

      hl_project_add_revision (p, r->number, r->date, r->author, r->text);
    }
  return p;
}

void
hl_project_free (HlProject *project)
{
  if (project == NULL)
    return;
  g_free (project->title);
  g_free (project->engineer);
  g_free (project->description);
  g_array_unref (project->materials);
  g_array_unref (project->shells);
  g_array_unref (project->revisions);
  g_free (project);
}

gboolean
hl_project_equal (const HlProject *a,
                  const HlProject *b)
{
  if (g_strcmp0 (a->title, b->title) != 0
      || g_strcmp0 (a->engineer, b->engineer) != 0
      || g_strcmp0 (a->description, b->description) != 0
      || a->display_units != b->display_units
      || a->materials->len != b->materials->len
      || a->shells->len != b->shells->len
      || a->revisions->len != b->revisions->len)
    return FALSE;
  for (guint i = 0; i < a->materials->len; i++)
    if (!hl_material_equal (&g_array_index (a->materials, HlMaterial, i),
                            &g_array_index (b->materials, HlMaterial, i)))
      return FALSE;
  for (guint i = 0; i < a->shells->len; i++)
    if (!hl_shell_inputs_equal (&g_array_index (a->shells, HlShellInputs, i),
                                &g_array_index (b->shells, HlShellInputs, i)))
      return FALSE;
  for (guint i = 0; i < a->revisions->len; i++)
    {
      const HlRevision *ra = &g_array_index (a->revisions, HlRevision, i);
      const HlRevision *rb = &g_array_index (b->revisions, HlRevision, i);

      if (ra->number != rb->number || strcmp (ra->date, rb->date) != 0
          || g_strcmp0 (ra->author, rb->author) != 0 || g_strcmp0 (ra->text, rb->text) != 0)
        return FALSE;
    }
  return TRUE;
}

static void
replace_string (char       **slot,
                const char  *value)
{
  char *copy = g_strdup (value != NULL ? value : "");

  g_free (*slot);
  *slot = copy;
}

void
hl_project_set_title (HlProject  *project,
                      const char *title)
{
  replace_string (&project->title, title);
}

void
hl_project_set_engineer (HlProject  *project,
                         const char *engineer)
{
  replace_string (&project->engineer, engineer);
}

void
hl_project_set_description (HlProject  *project,
                            const char *description)
{
  replace_string (&project->description, description);
}

guint
hl_project_n_shells (const HlProject *project)
{
  return project->shells->len;
}

HlShellInputs *
hl_project_shell (const HlProject *project,
                  guint            index)
{
  g_return_val_if_fail (index < project->shells->len, NULL);
  return &g_array_index (project->shells, HlShellInputs, index);
}

const HlShellInputs *
hl_project_find_shell (const HlProject *project,
                       const char      *id)
{
  for (guint i = 0; i < project->shells->len; i++)
    if (g_strcmp0 (g_array_index (project->shells, HlShellInputs, i).id, id) == 0)
      return &g_array_index (project->shells, HlShellInputs, i);
  return NULL;
}

void
hl_project_add_shell (HlProject           *project,
                      const HlShellInputs *shell)
{
  g_array_append_vals (project->shells, shell, 1);
}

void
hl_project_insert_shell (HlProject           *project,
                         guint                index,
                         const HlShellInputs *shell)
{
  g_array_insert_vals (project->shells, MIN (index, project->shells->len), shell, 1);
}

void
hl_project_remove_shell (HlProject *project,
                         guint      index)
{
  g_return_if_fail (index < project->shells->len);
  g_array_remove_index (project->shells, index);
}

char *
hl_project_unique_shell_id (const HlProject *project,
                            const char      *stem)
{
  for (guint n = 1;; n++)
    {
      char *id = g_strdup_printf ("%s-%u", stem, n);

      if (hl_project_find_shell (project, id) == NULL)
        return id;
      g_free (id);
    }
}

guint
hl_project_n_materials (const HlProject *project)
{
  return project->materials->len;
}

HlMaterial *
hl_project_material (const HlProject *project,
                     guint            index)
{
  g_return_val_if_fail (index < project->materials->len, NULL);
  return &g_array_index (project->materials, HlMaterial, index);
}

HlMaterial *
hl_project_find_material (const HlProject *project,
                          const char      *id)
{
  for (guint i = 0; i < project->materials->len; i++)
    if (g_strcmp0 (g_array_index (project->materials, HlMaterial, i).id, id) == 0)
      return &g_array_index (project->materials, HlMaterial, i);
  return NULL;
}

void
hl_project_put_material (HlProject        *project,
                         const HlMaterial *material)
{
  HlMaterial *slot = hl_project_find_material (project, material->id);

  if (slot != NULL)
    *slot = *material;
  else
    g_array_append_vals (project->materials, material, 1);
  for (guint i = 0; i < project->shells->len; i++)
    {
      HlShellInputs *s = &g_array_index (project->shells, HlShellInputs, i);

      if (strcmp (s->material_ref, material->id) == 0)
        s->material = *material;
    }
}

void
hl_project_add_revision (HlProject  *project,
                         guint       number,
                         const char *date,
                         const char *author,
                         const char *text)
{
  HlRevision r = { 0 };

  r.number = number;
  g_strlcpy (r.date, date != NULL ? date : "", sizeof r.date);
  r.author = g_strdup (author != NULL ? author : "");
  r.text = g_strdup (text != NULL ? text : "");
  g_array_append_val (project->revisions, r);
}

const HlRevision *
hl_project_latest_revision (const HlProject *project)
{
  const HlRevision *best = NULL;

  for (guint i = 0; i < project->revisions->len; i++)
    {
      const HlRevision *r = &g_array_index (project->revisions, HlRevision, i);

      if (best == NULL || r->number >= best->number)
        best = r;
    }
  return best;
}
