/* hl-project-writer.c — writing .hoop project files
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-project-writer"

#include "hl-project-file.h"
#include "hl-atomic-file.h"
#include "hl-project-reader-private.h"
#include "hl-date.h"
#include "hl-field-table.h"
#include "hl-limits.h"
#include "hl-shell-check.h"

#include <string.h>

/* g_markup_escape_text() is not enough for a file that must read back
 * exactly: it leaves \r (which the parser turns into \n) and, in
 * attributes, tabs and newlines (which become spaces), and it writes
 * control characters as references that XML 1.0 forbids, so the file
 * would not load at all.  Those few characters XML cannot carry are
 * dropped; everything else survives a round trip. */
static char *
escape (const char *text,
        gboolean    attribute)
{
  GString *out = g_string_sized_new (text != NULL ? strlen (text) + 16 : 16);

  for (const char *p = text != NULL ? text : ""; *p != '\0'; p++)
    switch (*p)
      {
      case '&': g_string_append (out, "&amp;"); break;
      case '<': g_string_append (out, "&lt;"); break;
      case '>': g_string_append (out, "&gt;"); break;
      case '"': g_string_append (out, "&quot;"); break;
      case '\'': g_string_append (out, "&apos;"); break;
      case '\r': g_string_append (out, "&#13;"); break;
      case '\t': g_string_append (out, attribute ? "&#9;" : "\t"); break;
      case '\n': g_string_append (out, attribute ? "&#10;" : "\n"); break;
      default:
        if ((guchar) *p >= 0x20)
          g_string_append_c (out, *p);
        break;
      }
  return g_string_free (out, FALSE);
}

static void
put_text (GString    *out,
          int         indent,
          const char *element,
          const char *text)
{
  g_autofree char *escaped = escape (text, FALSE);

  g_string_append_printf (out, "%*s<%s>%s</%s>\n", indent, "", element, escaped, element);
}

static void
put_number (GString    *out,
            int         indent,
            const char *element,
            double      value)
{
  g_autofree char *num = hl_format_exact (value);

  g_string_append_printf (out, "%*s<%s>%s</%s>\n", indent, "", element, num, element);
}

static void
put_quantity (GString    *out,
              int         indent,
              const char *element,
              HlQuantity  q)
{
  g_autofree char *num = hl_format_exact (q.value);
  g_autofree char *unit = escape (q.unit, TRUE);

  g_string_append_printf (out, "%*s<%s unit=\"%s\">%s</%s>\n", indent, "", element, unit, num, element);
}

/* One row of the field table at @slot */
static void
put_field (GString       *out,
           const HlField *f,
           gconstpointer  slot)
{
  const HlFieldChoice *choice;

  switch (f->kind)
    {
    case HL_FIELD_TEXT:
      put_text (out, 4, f->element, slot);
      break;
    case HL_FIELD_RATIO:
      put_number (out, 4, f->element, *(const double *) slot);
      break;
    case HL_FIELD_CHOICE:
      choice = hl_field_choice_by_value (f, hl_field_choice_get (f, slot));
      if (choice != NULL)
        put_text (out, 4, f->element, choice->word);
      break;
    default:  /* the quantities */
      put_quantity (out, 4, f->element, *(const HlQuantity *) slot);
      break;
    }
}

static void
put_material (GString          *out,
              const char       *material_id,
              const HlMaterial *m,
              gboolean          built_in)
{
  g_autofree char *id = escape (material_id, TRUE);

  g_string_append_printf (out, "  <material id=\"%s\">\n", id);
  if (built_in)
    put_text (out, 4, "origin", "built-in");
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (f->owner == HL_FIELD_OF_MATERIAL)
        put_field (out, f, hl_field_material_cslot (f, m));
    }
  g_string_append (out, "  </material>\n");
}

/* Elements equal to what the reader assumes without them are left out:
 * with every element a shell took ~640 bytes, and a 27,000-shell
 * project read from 5 MB grew past the size cap when saved.  The
 * comparison is exact (value and unit), so the file reads back the same.
 * What the schema requires is always written, and the size in the one
 * element its kind names. */
static void
put_shell (GString             *out,
           const HlShellInputs *s)
{
  g_autofree char *id = escape (s->id, TRUE);
  HlShellInputs d = hl_reader_shell_default (s->id);

  /* a sphere has no ends (format 1.2 leaves the attribute out) */
  if (s->form == HL_FORM_SPHERE)
    g_string_append_printf (out, "  <shell id=\"%s\" form=\"%s\">\n", id, hl_form_to_string (s->form));
  else
    g_string_append_printf (out, "  <shell id=\"%s\" form=\"%s\" ends=\"%s\">\n", id,
                            hl_form_to_string (s->form), hl_ends_to_string (s->ends));
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);
      gconstpointer slot;

      if (f->owner != HL_FIELD_OF_SHELL || (f->is_size && f->size_kind != s->size_kind))
        continue;
      slot = hl_field_cslot (f, s);
      if (f->required || f->is_size || !hl_field_equal (f, slot, hl_field_cslot (f, &d)))
        put_field (out, f, slot);
    }
  g_string_append (out, "  </shell>\n");
}

/* A shell that uses a built-in material (one the project does not hold)
 * would otherwise reopen with whatever the built-in table of the reading
 * version says.  The file keeps a copy with the values the shell has,
 * marked as built-in; format 1.1 names the new element, which readers of
 * 1.0 skip, reading the copy as a project material.  Returns whether any
 * copy was written. */
static gboolean
put_built_in_copies (GString         *out,
                     const HlProject *project)
{
  g_autoptr(GHashTable) written = g_hash_table_new (g_str_hash, g_str_equal);
  gboolean any = FALSE;

  for (guint i = 0; i < project->materials->len; i++)
    g_hash_table_add (written, g_array_index (project->materials, HlMaterial, i).id);
  for (guint i = 0; i < project->shells->len; i++)
    {
      const HlShellInputs *s = &g_array_index (project->shells, HlShellInputs, i);

      if (g_hash_table_add (written, (gpointer) s->material_ref))
        {
          put_material (out, s->material_ref, &s->material, TRUE);
          any = TRUE;
        }
    }
  return any;
}

/* A row of the field table added in format 1.2 (the design check's
 * inputs) that differs from the reader's default needs 1.2; without
 * one the file is still readable as 1.0 or 1.1.  The verdict measure a
 * file leaves out is "both" from 1.2 on, also in older files: the hoop
 * measure they implied called thick barrels thin (issue 10), so they
 * open with the stricter verdict. */
static gboolean
uses_format_1_2 (const HlProject *project)
{
  for (guint i = 0; i < project->shells->len; i++)
    {
      const HlShellInputs *s = &g_array_index (project->shells, HlShellInputs, i);
      HlShellInputs d = hl_reader_shell_default (s->id);

      for (guint k = 0; k < hl_field_count (); k++)
        {
          const HlField *f = hl_field_nth (k);

          if (f->owner == HL_FIELD_OF_SHELL && f->since_minor >= 2
              && !hl_field_equal (f, hl_field_cslot (f, s), hl_field_cslot (f, &d)))
            return TRUE;
        }
    }
  return FALSE;
}

/* 1.3 added the sign-off block */
static gboolean
uses_signoff (const HlProject *project)
{
  for (int r = 0; r < HL_N_SIGNOFFS; r++)
    if (project->signoff[r].name[0] != '\0' || project->signoff[r].date[0] != '\0')
      return TRUE;
  return FALSE;
}

char *
hl_project_to_xml (const HlProject *project)
{
  GString *out = g_string_new ("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
  gsize format_at;
  gboolean copies;

  g_return_val_if_fail (project != NULL, NULL);

  g_string_append (out, "<hoopline-project format=\"1\">\n");
  format_at = out->len - strlen ("\">\n");
  put_text (out, 2, "title", project->title);
  put_text (out, 2, "engineer", project->engineer);
  put_text (out, 2, "description", project->description);
  put_text (out, 2, "display-units", project->display_units == HL_UNIT_SYSTEM_US ? "us" : "si");
  for (guint i = 0; i < project->materials->len; i++)
    {
      const HlMaterial *m = &g_array_index (project->materials, HlMaterial, i);

      put_material (out, m->id, m, FALSE);
    }
  copies = put_built_in_copies (out, project);
  for (guint i = 0; i < project->shells->len; i++)
    put_shell (out, &g_array_index (project->shells, HlShellInputs, i));
  for (guint i = 0; i < project->revisions->len; i++)
    {
      const HlRevision *r = &g_array_index (project->revisions, HlRevision, i);
      g_autofree char *author = escape (r->author, TRUE);
      g_autofree char *date = escape (r->date, TRUE);
      g_autofree char *text = escape (r->text, FALSE);

      g_string_append_printf (out, "  <revision number=\"%u\" date=\"%s\" author=\"%s\">%s</revision>\n",
                              r->number, date, author, text);
    }
  for (int r = 0; r < HL_N_SIGNOFFS; r++)
    if (project->signoff[r].name[0] != '\0' || project->signoff[r].date[0] != '\0')
      {
        g_autofree char *name = escape (project->signoff[r].name, FALSE);

        g_string_append_printf (out, "  <sign-off role=\"%s\"", hl_signoff_role_to_string (r));
        if (project->signoff[r].date[0] != '\0')
          g_string_append_printf (out, " date=\"%s\"", project->signoff[r].date);
        g_string_append_printf (out, ">%s</sign-off>\n", name);
      }
  g_string_append (out, "</hoopline-project>\n");
  /* the lowest version that holds what was written */
  if (uses_signoff (project))
    g_string_insert (out, format_at, ".3");
  else if (uses_format_1_2 (project))
    g_string_insert (out, format_at, ".2");
  else if (copies)
    g_string_insert (out, format_at, ".1");
  return g_string_free (out, FALSE);
}

/* The reader's message reads "NAME:LINE: element: reason"; the line is
 * of bytes the user never sees, so the message keeps element and reason. */
static char *
strip_location (const char *message)
{
  const char *p = message;

  for (int colons = 0; colons < 2 && (p = strchr (p, ':')) != NULL; colons++)
    p++;
  if (p == NULL)
    return g_strdup (message);
  while (*p == ' ')
    p++;
  return g_strdup (p);
}

static gboolean
check_text (const char  *owner,
            const char  *field,
            const char  *text,
            HlTextKind   kind,
            GError     **error)
{
  g_autofree char *problem = hl_text_problem (text, kind);

  if (problem == NULL)
    return TRUE;
  g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE, "Cannot save: %s%s: %s", owner, field, problem);
  return FALSE;
}

static gboolean
check_id (const char  *what,
          const char  *id,
          GError     **error)
{
  g_autofree char *quoted = NULL;

  if (hl_reader_valid_id (id))
    return TRUE;
  quoted = hl_text_quote (id, HL_QUOTE_CHARS);
  g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE,
               "Cannot save: %s “%s” is not 1 to %d letters, digits, “_”, “.” or “-”", what, quoted, HL_LIMIT_ID_BYTES);
  return FALSE;
}

/* The reader's limits, checked field by field before anything is
 * written, so the message names the field to fix rather than a line of
 * a file the user never sees. */
static gboolean
check_fields (const HlProject *project,
              GError         **error)
{
  if (!check_text ("", "title", project->title, HL_TEXT_ONE_LINE, error)
      || !check_text ("", "engineer", project->engineer, HL_TEXT_ONE_LINE, error)
      || !check_text ("", "description", project->description, HL_TEXT_MULTI_LINE, error))
    return FALSE;
  for (int r = 0; r < HL_N_SIGNOFFS; r++)
    {
      g_autofree char *what = g_strdup_printf ("“%s” name", hl_signoff_role_to_string (r));

      if (!check_text ("sign-off ", what, project->signoff[r].name, HL_TEXT_ONE_LINE, error))
        return FALSE;
      if (project->signoff[r].date[0] != '\0' && !hl_date_valid (project->signoff[r].date))
        {
          g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE,
                       "Cannot save: the “%s” sign-off date “%s” is not a YYYY-MM-DD date", hl_signoff_role_to_string (r),
                       project->signoff[r].date);
          return FALSE;
        }
    }
  for (guint i = 0; i < project->materials->len; i++)
    {
      const HlMaterial *m = &g_array_index (project->materials, HlMaterial, i);
      g_autofree char *owner = g_strdup_printf ("material “%s”: ", m->id);

      if (!check_id ("material id", m->id, error) || !check_text (owner, "name", m->name, HL_TEXT_NAME, error))
        return FALSE;
    }
  for (guint i = 0; i < project->shells->len; i++)
    {
      const HlShellInputs *s = &g_array_index (project->shells, HlShellInputs, i);
      g_autofree char *owner = g_strdup_printf ("shell “%s”: ", s->id);
      g_autofree char *ref = g_strdup_printf ("shell “%s”: material-ref", s->id);

      g_autoptr(GPtrArray) problems = NULL;

      /* the shell's copy of its material is what a built-in copy holds */
      if (!check_id ("shell id", s->id, error) || !check_text (owner, "name", s->name, HL_TEXT_NAME, error)
          || !check_id (ref, s->material_ref, error)
          || !check_text (owner, "material name", s->material.name, HL_TEXT_NAME, error))
        return FALSE;
      /* the reader checks every shell's values; its message would name
       * the field but not the shell */
      problems = hl_shell_inputs_check (s);
      if (problems->len > 0)
        {
          const HlProblem *p = g_ptr_array_index (problems, 0);

          g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE, "Cannot save: %s%s: %s", owner,
                       p->field, p->message);
          return FALSE;
        }
    }
  for (guint i = 0; i < project->revisions->len; i++)
    {
      const HlRevision *r = &g_array_index (project->revisions, HlRevision, i);
      g_autofree char *owner = g_strdup_printf ("revision %u: ", r->number);

      if (r->number < 1 || r->number > HL_LIMIT_REVISION_NUMBER)
        {
          g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE,
                       "Cannot save: revision %u: number: must be a whole number from 1 to %d",
                       r->number, HL_LIMIT_REVISION_NUMBER);
          return FALSE;
        }
      /* a clearer word than the reader's for what the user can fix */
      if (!hl_date_valid (r->date))
        {
          g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE,
                       "Cannot save: revision %u has the date “%s”, not a YYYY-MM-DD date", r->number, r->date);
          return FALSE;
        }
      if (!check_text (owner, "author", r->author, HL_TEXT_ONE_LINE, error)
          || !check_text (owner, "text", r->text, HL_TEXT_MULTI_LINE, error))
        return FALSE;
    }
  return TRUE;
}

gboolean
hl_project_check_writable (const HlProject *project,
                           GError         **error)
{
  g_return_val_if_fail (project != NULL, FALSE);
  return check_fields (project, error);
}

char *
hl_project_to_checked_xml (const HlProject *project,
                           gsize           *length,
                           GError         **error)
{
  g_autoptr(HlProject) stripped = NULL;
  g_autofree char *xml = NULL;
  g_autofree char *difference = NULL;
  g_autoptr(HlProject) back = NULL;
  g_autoptr(GError) local = NULL;
  gsize len;

  g_return_val_if_fail (project != NULL, NULL);

  /* the reader strips outer white space: a title " A " is saved as "A"
   * rather than refused for reading back different */
  stripped = hl_project_copy (project);
  hl_project_strip_texts (stripped);
  if (!check_fields (stripped, error))
    return NULL;
  xml = hl_project_to_xml (stripped);
  len = strlen (xml);
  back = hl_project_load_bytes (xml, len, "save", NULL, &local);
  if (back == NULL)
    {
      g_autofree char *why = strip_location (local->message);

      if (g_error_matches (local, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_TOO_LARGE))
        g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_TOO_LARGE,
                     "Cannot save: the project would take %.1f MiB, more than the %d MiB a project file may hold "
                     "(remove shells or revisions, or split the project)",
                     len / (1024.0 * 1024.0), HL_PROJECT_FILE_MAX_BYTES / (1024 * 1024));
      else
        g_set_error (error, HL_PROJECT_FILE_ERROR, local->code, "Cannot save: %s", why);
      return NULL;
    }
  difference = hl_project_first_difference (stripped, back);
  if (difference != NULL)
    {
      g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE,
                   "Cannot save: %s would not read back as it is now", difference);
      return NULL;
    }
  if (length != NULL)
    *length = len;
  return g_steal_pointer (&xml);
}

gboolean
hl_project_save (const HlProject *project,
                 const char      *path,
                 GError         **error)
{
  g_autofree char *xml = NULL;
  g_autoptr(GError) local = NULL;
  gsize length = 0;

  g_return_val_if_fail (project != NULL && path != NULL, FALSE);

  /* never write a file this program would refuse to open again */
  xml = hl_project_to_checked_xml (project, &length, error);
  if (xml == NULL)
    return FALSE;
  if (!hl_atomic_write (path, xml, (gssize) length, &local))
    {
      g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_IO, "Cannot save: %s", local->message);
      return FALSE;
    }
  return TRUE;
}
