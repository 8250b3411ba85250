/* hl-project.c — a project: shells, materials, revision notes
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-project"

#include "hl-project.h"
#include "hl-field-table.h"

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
  for (guint i = 0; i < HL_N_SIGNOFFS; i++)
    p->signoff[i].name = g_strdup ("");
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
  for (guint i = 0; i < HL_N_SIGNOFFS; i++)
    hl_project_set_signoff (p, i, project->signoff[i].name, project->signoff[i].date);
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
  for (guint i = 0; i < HL_N_SIGNOFFS; i++)
    g_free (project->signoff[i].name);
  g_array_unref (project->materials);
  g_array_unref (project->shells);
  g_array_unref (project->revisions);
  g_free (project);
}

void
hl_project_strip_texts (HlProject *project)
{
  g_strstrip (project->title);
  g_strstrip (project->engineer);
  g_strstrip (project->description);
  for (guint i = 0; i < HL_N_SIGNOFFS; i++)
    g_strstrip (project->signoff[i].name);
  for (guint i = 0; i < project->materials->len; i++)
    g_strstrip (g_array_index (project->materials, HlMaterial, i).name);
  for (guint i = 0; i < project->shells->len; i++)
    {
      HlShellInputs *s = &g_array_index (project->shells, HlShellInputs, i);

      g_strstrip (s->name);
      g_strstrip (s->material.name);
    }
  for (guint i = 0; i < project->revisions->len; i++)
    {
      HlRevision *r = &g_array_index (project->revisions, HlRevision, i);

      g_strstrip (r->author);
      g_strstrip (r->text);
    }
}

static const char *
material_difference (const HlMaterial *a,
                     const HlMaterial *b)
{
  if (strcmp (a->id, b->id) != 0)
    return "id";
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (f->owner == HL_FIELD_OF_MATERIAL
          && !hl_field_equal (f, hl_field_material_cslot (f, a), hl_field_material_cslot (f, b)))
        return f->element;
    }
  return NULL;
}

/* the file's element (or attribute) names, so the message points at
 * the field to fix */
static char *
shell_difference (const HlShellInputs *a,
                  const HlShellInputs *b)
{
  const char *material;

  if (strcmp (a->id, b->id) != 0)
    return g_strdup ("id");
  if (strcmp (a->name, b->name) != 0)
    return g_strdup ("name");
  if (a->form != b->form)
    return g_strdup ("form");
  /* a sphere has no ends: the member is not saved for it */
  if (a->form != HL_FORM_SPHERE && a->ends != b->ends)
    return g_strdup ("ends");
  if (a->size_kind != b->size_kind || !hl_quantity_equal (a->size, b->size))
    return g_strdup (hl_size_kind_to_element (a->size_kind));
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (f->owner == HL_FIELD_OF_SHELL && !f->is_size
          && !hl_field_equal (f, hl_field_cslot (f, a), hl_field_cslot (f, b)))
        return g_strdup (f->element);
    }
  if ((material = material_difference (&a->material, &b->material)) != NULL)
    return g_strdup_printf ("material %s (the shell's copy differs from the material “%s” the file holds)",
                            material, a->material_ref);
  return NULL;
}

static char *
revision_difference (const HlRevision *a,
                     const HlRevision *b)
{
  const char *field = a->number != b->number ? "number"
                      : strcmp (a->date, b->date) != 0 ? "date"
                      : g_strcmp0 (a->author, b->author) != 0 ? "author"
                      : g_strcmp0 (a->text, b->text) != 0 ? "text" : NULL;

  return field != NULL ? g_strdup_printf ("revision %u: %s", a->number, field) : NULL;
}

char *
hl_project_first_difference (const HlProject *a,
                             const HlProject *b)
{
  g_return_val_if_fail (a != NULL && b != NULL, NULL);

  if (g_strcmp0 (a->title, b->title) != 0)
    return g_strdup ("title");
  if (g_strcmp0 (a->engineer, b->engineer) != 0)
    return g_strdup ("engineer");
  if (g_strcmp0 (a->description, b->description) != 0)
    return g_strdup ("description");
  if (a->display_units != b->display_units)
    return g_strdup ("display-units");
  for (guint i = 0; i < HL_N_SIGNOFFS; i++)
    if (g_strcmp0 (a->signoff[i].name, b->signoff[i].name) != 0 || strcmp (a->signoff[i].date, b->signoff[i].date) != 0)
      return g_strdup_printf ("sign-off “%s”", hl_signoff_role_to_string (i));
  for (guint i = 0; i < MIN (a->materials->len, b->materials->len); i++)
    {
      const HlMaterial *ma = &g_array_index (a->materials, HlMaterial, i);
      const char *field = material_difference (ma, &g_array_index (b->materials, HlMaterial, i));

      if (field != NULL)
        return g_strdup_printf ("material “%s”: %s", ma->id, field);
    }
  if (a->materials->len != b->materials->len)
    return g_strdup_printf ("the number of materials (%u, not %u)", b->materials->len, a->materials->len);
  for (guint i = 0; i < MIN (a->shells->len, b->shells->len); i++)
    {
      const HlShellInputs *sa = &g_array_index (a->shells, HlShellInputs, i);
      g_autofree char *field = shell_difference (sa, &g_array_index (b->shells, HlShellInputs, i));

      if (field != NULL)
        return g_strdup_printf ("shell “%s”: %s", sa->id, field);
    }
  if (a->shells->len != b->shells->len)
    return g_strdup_printf ("the number of shells (%u, not %u)", b->shells->len, a->shells->len);
  for (guint i = 0; i < MIN (a->revisions->len, b->revisions->len); i++)
    {
      char *field = revision_difference (&g_array_index (a->revisions, HlRevision, i),
                                         &g_array_index (b->revisions, HlRevision, i));

      if (field != NULL)
        return field;
    }
  if (a->revisions->len != b->revisions->len)
    return g_strdup_printf ("the number of revisions (%u, not %u)", b->revisions->len, a->revisions->len);
  return NULL;
}

gboolean
hl_project_equal (const HlProject *a,
                  const HlProject *b)
{
  g_autofree char *difference = hl_project_first_difference (a, b);

  return difference == NULL;
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

void
hl_project_set_signoff (HlProject     *project,
                        HlSignoffRole  role,
                        const char    *name,
                        const char    *date)
{
  g_return_if_fail (role < HL_N_SIGNOFFS);
  replace_string (&project->signoff[role].name, name);
  g_strlcpy (project->signoff[role].date, date != NULL ? date : "", sizeof project->signoff[role].date);
}

const char *
hl_signoff_role_to_string (HlSignoffRole role)
{
  static const char *const words[HL_N_SIGNOFFS] = { "prepared", "checked", "approved" };

  g_return_val_if_fail (role < HL_N_SIGNOFFS, "prepared");
  return words[role];
}
