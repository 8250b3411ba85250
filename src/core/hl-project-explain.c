/* hl-project-explain.c — plain reasons for files the schema refuses
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-project-reader"

#include "hl-project-reader-private.h"
#include "hl-date.h"
#include "hl-field-table.h"
#include "hl-limits.h"

#include <string.h>

/* ---- plain reasons for schema failures ----------------------------- */
/* libxml2's RELAX NG messages name the pattern that failed ("Extra
 * element title in interleave") rather than the mistake.  Once the
 * schema has refused a file, these checks look for the usual mistakes
 * and say them plainly.  They only choose the message: whether a file
 * loads is decided by the schema and the value checks alone. */

/* words of elements outside the field table */
static const struct { const char *element, *words; } word_elements[] = {
  { "display-units", "si us" }, { "origin", "built-in" },
};

/* a number element of shells or materials */
static const HlField *
number_field (const char *name)
{
  const HlField *f = hl_field_lookup (name);

  return f != NULL && hl_field_is_number (f) ? f : NULL;
}

static gboolean
is_size_element (const char *name)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, name);

  return f != NULL && f->is_size;
}

/* "inner-diameter, outer-diameter, ...": the ways to give a size */
static char *
size_list (void)
{
  g_autoptr(GStrvBuilder) builder = g_strv_builder_new ();
  g_auto(GStrv) names = NULL;

  for (guint i = 0; i < hl_field_count (); i++)
    if (hl_field_nth (i)->is_size)
      g_strv_builder_add (builder, hl_field_nth (i)->element);
  names = g_strv_builder_end (builder);
  return g_strjoinv (", ", names);
}

/* the words @name may hold, or NULL when it is no word element */
static GStrv
choice_words (const char *name)
{
  const HlField *f = hl_field_lookup (name);
  g_autoptr(GStrvBuilder) builder = g_strv_builder_new ();
  g_auto(GStrv) words = NULL;

  if (f != NULL && f->kind == HL_FIELD_CHOICE)
    for (const HlFieldChoice *c = f->choices; c->word != NULL; c++)
      g_strv_builder_add (builder, c->word);
  else
    for (guint i = 0; i < G_N_ELEMENTS (word_elements); i++)
      if (strcmp (name, word_elements[i].element) == 0)
        {
          g_auto(GStrv) split = g_strsplit (word_elements[i].words, " ", -1);

          g_strv_builder_addv (builder, (const char **) split);
        }
  words = g_strv_builder_end (builder);
  if (words[0] == NULL)
    return NULL;
  return g_steal_pointer (&words);
}

gboolean
hl_reader_valid_id (const char *id)
{
  gsize len = id != NULL ? strlen (id) : 0;

  if (len == 0 || len >= HL_ID_MAX || !(g_ascii_isalnum (id[0]) || id[0] == '_'))
    return FALSE;
  for (gsize i = 1; i < len; i++)
    if (!(g_ascii_isalnum (id[i]) || strchr ("_.-", id[i]) != NULL))
      return FALSE;
  return TRUE;
}

static void
explain_value (HlReader    *rd,
               xmlNodePtr n)
{
  const char *name = (const char *) n->name;
  g_autofree char *text = hl_reader_text (n);
  g_autofree char *unit = hl_reader_prop (n, "unit");
  g_auto(GStrv) words = NULL;
  long line = xmlGetLineNo (n);
  glong chars = g_utf8_strlen (text, -1);
  glong limit = g_strv_contains ((const char *const[]) { "description", "revision", NULL }, name)
                  ? HL_LIMIT_LONG_TEXT_CHARS : HL_LIMIT_SHORT_TEXT_CHARS;

  for (xmlNodePtr c = n->children; c != NULL; c = c->next)
    if (c->type == XML_ELEMENT_NODE)
      {
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, xmlGetLineNo (c), name, "holds the element <%s> where a value belongs", c->name);
        return;
      }
  if (number_field (name) != NULL)
    {
      g_autoptr(GError) local = NULL;
      double v;

      if (!hl_parse_number (text, &v, &local))
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name, "%s", local->message);
      else if (unit == NULL && !hl_field_unit_optional (number_field (name)))
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, line, name, "the unit attribute is missing");
      return;
    }
  if ((words = choice_words (name)) != NULL)
    {
      g_autofree char *list = g_strjoinv (", ", words);

      if (!g_strv_contains ((const char *const *) words, g_strstrip (text)))
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name, "“%s” is not one of %s", text, list);
      return;
    }
  if (strcmp (name, "material-ref") == 0 && !hl_reader_valid_id (g_strstrip (text)))
    hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name, "“%s” is not an id", text);
  else if (strcmp (name, "name") == 0)
    {
      g_autofree char *problem = hl_text_problem (g_strstrip (text), HL_TEXT_NAME);

      if (problem != NULL)
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name, "%s", problem);
    }
  else if (chars > limit)
    hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name, "is %ld characters long; at most %ld are allowed", chars, limit);
}

static void
explain_attributes (HlReader    *rd,
                    xmlNodePtr n)
{
  static const char *const shell_attrs[] = { "id", "form", "ends", NULL };
  static const char *const revision_attrs[] = { "number", "date", "author", NULL };
  const char *name = (const char *) n->name;
  const char *const *allowed = strcmp (name, "shell") == 0 ? shell_attrs
                               : strcmp (name, "revision") == 0 ? revision_attrs
                               : strcmp (name, "material") == 0 ? (const char *const[]) { "id", NULL }
                               : strcmp (name, "hoopline-project") == 0 ? (const char *const[]) { "format", NULL }
                               : number_field (name) != NULL ? (const char *const[]) { "unit", NULL }
                               : (const char *const[]) { NULL };
  g_autofree char *id = hl_reader_prop (n, "id");
  g_autofree char *form = hl_reader_prop (n, "form");
  g_autofree char *ends = hl_reader_prop (n, "ends");
  long line = xmlGetLineNo (n);
  HlForm f;
  HlEnds e;

  for (xmlAttrPtr a = n->properties; a != NULL; a = a->next)
    if (!g_strv_contains (allowed, (const char *) a->name))
      {
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, line, name, "has no attribute “%s” in this format", a->name);
        return;
      }
  if (allowed == shell_attrs || strcmp (name, "material") == 0)
    {
      if (id == NULL)
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, line, name, "the id attribute is missing");
      else if (!hl_reader_valid_id (id))
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name,
              "id “%s” is not 1 to %d letters, digits, “_”, “.” or “-”", id, HL_ID_MAX - 1);
    }
  if (strcmp (name, "hoopline-project") == 0)
    {
      g_autofree char *format = hl_reader_prop (n, "format");

      if (format != NULL && !g_regex_match_simple ("^1(\\.[0-9]+)?$", format, 0, 0))
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, line, name, "format “%s” is not a version such as 1 or 1.2", format);
    }
  if (form != NULL && !hl_form_from_string (form, &f))
    hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name, "form “%s” is not one of cylinder, sphere", form);
  if (ends != NULL && !hl_ends_from_string (ends, &e))
    hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name, "ends “%s” is not one of closed, open, plane-strain", ends);
  if (allowed == revision_attrs)
    {
      g_autofree char *number = hl_reader_prop (n, "number");
      g_autofree char *date = hl_reader_prop (n, "date");
      guint64 v;

      g_autofree char *author = hl_reader_prop (n, "author");
      glong author_chars = author != NULL && g_utf8_validate (author, -1, NULL) ? g_utf8_strlen (author, -1) : 0;

      if (author_chars > HL_LIMIT_SHORT_TEXT_CHARS)
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, "revision author",
                        "is %ld characters long; at most %d are allowed", author_chars, HL_LIMIT_SHORT_TEXT_CHARS);
      else if (number == NULL || !g_ascii_string_to_unsigned (number, 10, 1, HL_LIMIT_REVISION_NUMBER, &v, NULL))
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name, "number “%s” is not a whole number from 1 to %d",
              number != NULL ? number : "", HL_LIMIT_REVISION_NUMBER);
      else if (!hl_date_valid (date))
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, line, name, "date “%s” is not a YYYY-MM-DD date", date != NULL ? date : "");
    }
}

/* Element children of @n against what it may hold: unknown, repeated,
 * missing.  @required lists what must be there. */
static void
explain_children (HlReader            *rd,
                  xmlNodePtr         n,
                  const char *const *known,
                  const char *const *required)
{
  const char *name = (const char *) n->name;
  g_autoptr(GHashTable) seen = g_hash_table_new (g_str_hash, g_str_equal);
  const char *size = NULL;
  g_autofree char *sizes = size_list ();

  for (xmlNodePtr c = n->children; c != NULL && rd->error == NULL; c = c->next)
    {
      const char *cname = (const char *) c->name;

      if (c->type != XML_ELEMENT_NODE)
        continue;
      if (!g_strv_contains (known, cname))
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, xmlGetLineNo (c), cname, "is not an element of <%s> in format 1", name);
      else if (is_size_element (cname) && size != NULL)
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, xmlGetLineNo (c), cname,
              "a second size after <%s>: give exactly one of %s", size, sizes);
      else if (g_hash_table_contains (seen, cname)
               && !g_strv_contains ((const char *const[]) { "material", "shell", "revision", NULL }, cname))
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, xmlGetLineNo (c), cname, "appears twice in <%s>", name);
      g_hash_table_add (seen, (gpointer) cname);
      if (is_size_element (cname))
        size = cname;
    }
  for (guint i = 0; required[i] != NULL && rd->error == NULL; i++)
    if (!g_hash_table_contains (seen, required[i]))
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, xmlGetLineNo (n), name, "<%s> is missing", required[i]);
  if (rd->error == NULL && strcmp (name, "shell") == 0 && size == NULL)
    hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, xmlGetLineNo (n), name,
          "no size given: one of %s", sizes);
}

void
hl_reader_explain_invalid (HlReader    *rd,
                 xmlNodePtr root)
{
  g_autoptr(GStrvBuilder) material_builder = g_strv_builder_new ();
  g_autoptr(GStrvBuilder) shell_builder = g_strv_builder_new ();
  g_auto(GStrv) material_required = NULL;
  g_auto(GStrv) shell_required = NULL;

  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (f->required)
        g_strv_builder_add (f->owner == HL_FIELD_OF_MATERIAL ? material_builder : shell_builder, f->element);
    }
  material_required = g_strv_builder_end (material_builder);
  shell_required = g_strv_builder_end (shell_builder);

  explain_attributes (rd, root);
  explain_children (rd, root, hl_reader_known_project, (const char *const[]) { "shell", NULL });
  for (xmlNodePtr n = root->children; n != NULL && rd->error == NULL; n = n->next)
    {
      gboolean material = xmlStrEqual (n->name, BAD_CAST "material");
      gboolean shell = xmlStrEqual (n->name, BAD_CAST "shell");

      if (n->type != XML_ELEMENT_NODE)
        continue;
      explain_attributes (rd, n);
      if (material || shell)
        {
          if (rd->error == NULL)
            explain_children (rd, n, material ? hl_reader_known_material () : hl_reader_known_shell (),
                              (const char *const *) (material ? material_required : shell_required));
          for (xmlNodePtr c = n->children; c != NULL && rd->error == NULL; c = c->next)
            if (c->type == XML_ELEMENT_NODE)
              {
                explain_attributes (rd, c);
                if (rd->error == NULL)
                  explain_value (rd, c);
              }
        }
      else if (rd->error == NULL)
        explain_value (rd, n);
    }
}
