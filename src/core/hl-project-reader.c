/* hl-project-reader.c — reading .hoop project files safely
 *
 * The file comes from anywhere, so the reader trusts nothing: size is
 * capped before reading, DTDs and entity declarations are refused before
 * parsing (no expansion bombs, no external entities), the parser never
 * touches the network, depth is capped, the shape is checked against the
 * RELAX NG schema and then every value is checked like a typed field.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-project-reader"

#include "hl-project-file.h"
#include "hl-project-reader-private.h"
#include "hl-date.h"
#include "hl-field-table.h"
#include "hl-limits.h"
#include "hl-shell-check.h"

#include <gio/gio.h>
#include <libxml/parser.h>
#include <libxml/xmlerror.h>
#include <string.h>

G_DEFINE_QUARK (hl-project-file-error-quark, hl_project_file_error)



/* Values from the file are quoted “like this”; a megabyte pasted into
 * one must not come back whole in the message.  Takes @msg. */
static char *
shorten_quotes (char *msg)
{
  GString *out;
  const char *p = msg, *open, *close;

  if (strstr (msg, "“") == NULL)
    return msg;
  out = g_string_new (NULL);
  while ((open = strstr (p, "“")) != NULL && (close = strstr (open, "”")) != NULL)
    {
      const char *inside = open + strlen ("“");
      g_autofree char *value = g_strndup (inside, close - inside);
      g_autofree char *quoted = hl_text_quote (value, HL_QUOTE_CHARS);

      g_string_append_len (out, p, inside - p);
      g_string_append (out, quoted);
      p = close;
    }
  g_string_append (out, p);
  g_free (msg);
  return g_string_free (out, FALSE);
}

void
hl_reader_fail (HlReader     *rd,
      int         code,
      long        line,
      const char *element,
      const char *format,
      ...)
{
  g_autofree char *msg = NULL;
  g_autofree char *whole = NULL;
  g_autofree char *valid = NULL;
  va_list args;

  if (rd->error != NULL)
    return;
  va_start (args, format);
  msg = shorten_quotes (g_strdup_vprintf (format, args));
  va_end (args);
  if (element != NULL)
    whole = g_strdup_printf ("%s:%ld: %s: %s", rd->name, MAX (line, 1), element, msg);
  else
    whole = g_strdup_printf ("%s:%ld: %s", rd->name, MAX (line, 1), msg);
  /* libxml2 copies bytes of a broken file into its messages (an encoding
   * name, a cut character); the message goes to a window and a terminal */
  g_set_error_literal (&rd->error, HL_PROJECT_FILE_ERROR, code, valid = g_utf8_make_valid (whole, -1));
}

/* ---- libxml2 error capture ---------------------------------------- */

void
hl_reader_on_structured_error (void        *user_data,
                               xmlErrorPtr  err)
{
  HlReader *rd = user_data;
  g_autofree char *msg = NULL;
  const char *element = NULL;
  int code = err->domain == XML_FROM_RELAXNGV || err->domain == XML_FROM_RELAXNGP
               ? HL_PROJECT_FILE_ERROR_SCHEMA : HL_PROJECT_FILE_ERROR_SYNTAX;
  long line = err->line;

  if (err->level < XML_ERR_ERROR || rd->error != NULL)
    return;
  /* libxml2 messages may span lines; the caller promises one */
  msg = g_strdup (err->message != NULL ? err->message : "unknown XML error");
  g_strdelimit (msg, "\r\n\t", ' ');
  g_strstrip (msg);
  if (err->node != NULL && ((xmlNodePtr) err->node)->type == XML_ELEMENT_NODE)
    {
      element = (const char *) ((xmlNodePtr) err->node)->name;
      /* schema errors on attributes come without a line */
      if (line <= 0)
        line = xmlGetLineNo (err->node);
    }
  hl_reader_fail (rd, code, line, element, "%s", msg);
}

/* ---- tree checks --------------------------------------------------- */

const char *const hl_reader_known_project[] = {
  "title", "engineer", "description", "display-units", "material", "shell", "revision", "sign-off", NULL
};
static const char **
material_elements (void)
{
  const char *const *fields = hl_field_elements (HL_FIELD_OF_MATERIAL);
  guint n = g_strv_length ((char **) fields);
  const char **known = g_new0 (const char *, n + 2);

  known[0] = "origin";
  memcpy (known + 1, fields, n * sizeof *known);
  return known;
}

const char *const *
hl_reader_known_material (void)
{
  static const char **known;

  if (g_once_init_enter (&known))
    g_once_init_leave (&known, material_elements ());
  return known;
}

const char *const *
hl_reader_known_shell (void)
{
  return hl_field_elements (HL_FIELD_OF_SHELL);
}

/* A newer minor format may add elements; this version skips them with a
 * warning instead of refusing the file. */
static void
drop_unknown (HlReader            *rd,
              xmlNodePtr         parent,
              const char *const *known)
{
  xmlNodePtr n = parent->children;

  while (n != NULL)
    {
      xmlNodePtr next = n->next;

      if (n->type == XML_ELEMENT_NODE)
        {
          if (!g_strv_contains (known, (const char *) n->name))
            {
              if (rd->warnings != NULL)
                g_ptr_array_add (rd->warnings,
                                 g_strdup_printf ("%s:%ld: %s: element of a newer format version, ignored",
                                                  rd->name, xmlGetLineNo (n), n->name));
              xmlUnlinkNode (n);
              xmlFreeNode (n);
            }
          else if (known == hl_reader_known_project && xmlStrEqual (n->name, BAD_CAST "material"))
            drop_unknown (rd, n, hl_reader_known_material ());
          else if (known == hl_reader_known_project && xmlStrEqual (n->name, BAD_CAST "shell"))
            drop_unknown (rd, n, hl_reader_known_shell ());
        }
      n = next;
    }
}

/* ---- values -------------------------------------------------------- */

char *
hl_reader_text (xmlNodePtr n)
{
  xmlChar *raw = xmlNodeGetContent (n);
  char *text = g_strdup (raw != NULL ? (const char *) raw : "");

  xmlFree (raw);
  return text;
}

xmlNodePtr
hl_reader_child (xmlNodePtr  parent,
       const char *name)
{
  for (xmlNodePtr n = parent->children; n != NULL; n = n->next)
    if (n->type == XML_ELEMENT_NODE && xmlStrEqual (n->name, BAD_CAST name))
      return n;
  return NULL;
}

static gboolean
read_number (HlReader    *rd,
             xmlNodePtr n,
             double    *value)
{
  g_autofree char *text = hl_reader_text (n);
  g_autoptr(GError) local = NULL;

  if (!hl_parse_number (text, value, &local))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), (const char *) n->name, "%s", local->message);
      return FALSE;
    }
  return TRUE;
}

static gboolean
read_quantity (HlReader        *rd,
               xmlNodePtr     parent,
               const char    *name,
               HlQuantityKind kind,
               HlQuantity    *q)
{
  xmlNodePtr n = hl_reader_child (parent, name);
  xmlChar *unit;
  const char *canonical;
  double value;

  if (n == NULL)
    return TRUE;  /* optional: the default stays */
  if (!read_number (rd, n, &value))
    return FALSE;
  unit = xmlGetProp (n, BAD_CAST "unit");
  canonical = unit != NULL ? hl_unit_canonical (kind, (const char *) unit)
                           : hl_unit_default (kind, HL_UNIT_SYSTEM_SI);
  if (canonical == NULL)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), name, "unknown unit “%s”", (const char *) unit);
      xmlFree (unit);
      return FALSE;
    }
  xmlFree (unit);
  *q = hl_quantity_make (value, canonical);
  return TRUE;
}

/* Refuses rather than truncates: a cut could split a UTF-8 character
 * and would change the project without a word. */
static gboolean
copy_text (HlReader     *rd,
           xmlNodePtr  parent,
           const char *name,
           char       *dest,
           gsize       size)
{
  xmlNodePtr n = hl_reader_child (parent, name);
  g_autofree char *text = NULL;

  if (n == NULL)
    return TRUE;
  text = hl_reader_text (n);
  g_strstrip (text);
  if (strcmp (name, "name") == 0)
    {
      g_autofree char *problem = hl_text_problem (text, HL_TEXT_NAME);

      if (problem != NULL)
        {
          hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), name, "%s", problem);
          return FALSE;
        }
    }
  else if (strlen (text) >= size)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), name,
            "is too long (%" G_GSIZE_FORMAT " bytes of UTF-8; this version keeps at most %" G_GSIZE_FORMAT ")",
            strlen (text), size - 1);
      return FALSE;
    }
  g_strlcpy (dest, text, size);
  return TRUE;
}

/* One row of the field table, the size excepted (size_node).  An
 * element the file leaves out keeps the default. */
static gboolean
read_field (HlReader      *rd,
            xmlNodePtr     parent,
            const HlField *f,
            gpointer       slot)
{
  xmlNodePtr n;
  g_autofree char *text = NULL;
  const HlFieldChoice *choice;

  switch (f->kind)
    {
    case HL_FIELD_TEXT:
      return copy_text (rd, parent, f->element, slot, f->text_size);
    case HL_FIELD_RATIO:
      n = hl_reader_child (parent, f->element);
      return n == NULL || read_number (rd, n, slot);
    case HL_FIELD_CHOICE:
      /* the schema has already limited these to their listed words */
      if ((n = hl_reader_child (parent, f->element)) == NULL)
        return TRUE;
      text = hl_reader_text (n);
      if ((choice = hl_field_choice_by_word (f, g_strstrip (text))) != NULL)
        hl_field_choice_set (f, slot, choice->value);
      return TRUE;
    default:  /* the quantities */
      return read_quantity (rd, parent, f->element, hl_field_quantity_kind (f), slot);
    }
}

char *
hl_reader_prop (xmlNodePtr  n,
      const char *name)
{
  xmlChar *raw = xmlGetProp (n, BAD_CAST name);
  char *value = raw != NULL ? g_strdup ((const char *) raw) : NULL;

  xmlFree (raw);
  return value;
}

/* ids are not left to the schema (see fast_schema_text) */
static gboolean
check_id (HlReader     *rd,
          xmlNodePtr  n,
          const char *element,
          const char *id)
{
  if (hl_reader_valid_id (id))
    return TRUE;
  hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, n != NULL ? xmlGetLineNo (n) : 1, element,
        "id “%s” is not 1 to %d letters, digits, “_”, “.” or “-”", id != NULL ? id : "", HL_ID_MAX - 1);
  return FALSE;
}

/* Line of the element a problem's field names, else of @parent. */
static long
field_line (xmlNodePtr  parent,
            const char *field)
{
  xmlNodePtr n = hl_reader_child (parent, field);

  return xmlGetLineNo (n != NULL ? n : parent);
}

static gboolean
read_material (HlReader    *rd,
               HlProject *project,
               xmlNodePtr n)
{
  HlMaterial m = hl_material_default ();
  g_autofree char *id = hl_reader_prop (n, "id");
  g_autoptr(GPtrArray) problems = NULL;
  HlShellInputs probe;

  if (!check_id (rd, n, "material", id))
    return FALSE;
  if (g_hash_table_contains (rd->material_ids, id) || g_hash_table_contains (rd->copies, id))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), "material", "the id “%s” is used twice", id);
      return FALSE;
    }
  g_strlcpy (m.id, id, sizeof m.id);
  m.name[0] = '\0';
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (f->owner == HL_FIELD_OF_MATERIAL && !read_field (rd, n, f, hl_field_material_slot (f, &m)))
        return FALSE;
    }
  /* checked here, where the values stand, and even when no shell uses
   * the material: the default shell is valid, so what is left is ours */
  probe = hl_shell_inputs_default ();
  probe.material = m;
  problems = hl_shell_inputs_check (&probe);
  if (problems->len > 0)
    {
      HlProblem *p = g_ptr_array_index (problems, 0);

      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, field_line (n, p->field), p->field, "%s", p->message);
      return FALSE;
    }
  /* a built-in material the file keeps a copy of: its values are the
   * ones the shells were saved with, whatever this version's table says,
   * but it is not one of the project's own materials */
  if (hl_reader_child (n, "origin") != NULL)
    {
      g_hash_table_insert (rd->copies, g_strdup (id), g_memdup2 (&m, sizeof m));
      return TRUE;
    }
  g_array_append_val (project->materials, m);
  g_hash_table_insert (rd->material_ids, g_strdup (id), GUINT_TO_POINTER (project->materials->len));
  return TRUE;
}

static xmlNodePtr
size_node (xmlNodePtr  shell,
           HlSizeKind *kind)
{
  static const HlSizeKind kinds[] = {
    HL_SIZE_INNER_DIAMETER, HL_SIZE_OUTER_DIAMETER, HL_SIZE_INNER_RADIUS, HL_SIZE_OUTER_RADIUS
  };

  for (guint i = 0; i < G_N_ELEMENTS (kinds); i++)
    {
      xmlNodePtr n = hl_reader_child (shell, hl_size_kind_to_element (kinds[i]));

      if (n != NULL)
        {
          *kind = kinds[i];
          return n;
        }
    }
  return NULL;
}

static const HlMaterial *
reader_material (HlReader        *rd,
                 const HlProject *project,
                 const char      *id)
{
  guint index = GPOINTER_TO_UINT (g_hash_table_lookup (rd->material_ids, id));

  if (index > 0)
    return &g_array_index (project->materials, HlMaterial, index - 1);
  return g_hash_table_lookup (rd->copies, id);
}

HlShellInputs
hl_reader_shell_default (const char *id)
{
  HlShellInputs s = hl_shell_inputs_default ();

  g_strlcpy (s.id, id, sizeof s.id);
  g_strlcpy (s.name, id, sizeof s.name);
  /* a pressure the file does not give is zero, not the window's
   * new-shell example value */
  s.internal_pressure = hl_quantity_make (0, "bar");
  return s;
}

static gboolean
read_shell (HlReader    *rd,
            HlProject *project,
            xmlNodePtr n)
{
  HlShellInputs s;
  g_autofree char *id = hl_reader_prop (n, "id");
  g_autofree char *form = hl_reader_prop (n, "form");
  g_autofree char *ends = hl_reader_prop (n, "ends");
  g_autoptr(GPtrArray) problems = NULL;
  const HlMaterial *material;
  xmlNodePtr nsize;

  if (!check_id (rd, n, "shell", id))
    return FALSE;
  if (!g_hash_table_add (rd->shell_ids, g_strdup (id)))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), "shell", "the id “%s” is used twice", id);
      return FALSE;
    }
  s = hl_reader_shell_default (id);
  /* the texts first: the material the shell names is looked up next */
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (f->owner == HL_FIELD_OF_SHELL && f->kind == HL_FIELD_TEXT
          && !read_field (rd, n, f, hl_field_slot (f, &s)))
        return FALSE;
    }
  if (!check_id (rd, hl_reader_child (n, "material-ref"), "material-ref", s.material_ref))
    return FALSE;
  if (form != NULL)
    hl_form_from_string (form, &s.form);
  if (ends != NULL)
    hl_ends_from_string (ends, &s.ends);
  /* files before format 1.2 wrote ends="closed" on every sphere; a
   * sphere has none, so the attribute is dropped, with a word when it
   * said something else */
  if (s.form == HL_FORM_SPHERE && s.ends != HL_ENDS_CLOSED)
    {
      if (rd->warnings != NULL)
        g_ptr_array_add (rd->warnings,
                         g_strdup_printf ("%s:%ld: shell “%s”: ends=\"%s\" ignored: a sphere has no ends",
                                          rd->name, xmlGetLineNo (n), id, ends));
      s.ends = HL_ENDS_CLOSED;
    }

  material = reader_material (rd, project, s.material_ref);
  if (material == NULL)
    material = hl_material_builtin_find (s.material_ref);
  if (material == NULL)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, field_line (n, "material-ref"), "material-ref",
            "no material with the id “%s” in this project", s.material_ref);
      return FALSE;
    }
  s.material = *material;

  nsize = size_node (n, &s.size_kind);
  if (nsize == NULL)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), "shell", "no size given");
      return FALSE;
    }
  if (!read_quantity (rd, n, hl_size_kind_to_element (s.size_kind), HL_KIND_LENGTH, &s.size))
    return FALSE;
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (f->owner == HL_FIELD_OF_SHELL && f->kind != HL_FIELD_TEXT && !f->is_size
          && !read_field (rd, n, f, hl_field_slot (f, &s)))
        return FALSE;
    }

  problems = hl_shell_inputs_check (&s);
  if (problems->len > 0)
    {
      HlProblem *p = g_ptr_array_index (problems, 0);
      /* material fields live in the material element */
      gboolean in_material = hl_reader_child (n, p->field) == NULL
                             && reader_material (rd, project, s.material_ref) != NULL;

      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, field_line (n, p->field), p->field, "%s%s", p->message,
            in_material ? " (in the shell's material)" : "");
      return FALSE;
    }
  g_array_append_val (project->shells, s);
  return TRUE;
}

/* The same limits the writer checks (hl_text_problem); the schema has
 * already held the length, this adds control characters. */
static gboolean
check_text (HlReader   *rd,
            xmlNodePtr  n,
            const char *field,
            const char *text,
            HlTextKind  kind)
{
  g_autofree char *problem = hl_text_problem (text, kind);

  if (problem == NULL)
    return TRUE;
  hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), field, "%s", problem);
  return FALSE;
}

static gboolean
read_text (HlReader   *rd,
           xmlNodePtr  parent,
           const char *name,
           HlTextKind  kind,
           char      **text)
{
  xmlNodePtr n = hl_reader_child (parent, name);

  if (n == NULL)
    return TRUE;
  *text = g_strstrip (hl_reader_text (n));
  return check_text (rd, n, name, *text, kind);
}

static gboolean
read_revision (HlReader    *rd,
               HlProject *project,
               xmlNodePtr n)
{
  g_autofree char *number = hl_reader_prop (n, "number");
  g_autofree char *date = hl_reader_prop (n, "date");
  g_autofree char *author = hl_reader_prop (n, "author");
  g_autofree char *text = hl_reader_text (n);
  guint64 value = 0;

  if (!g_ascii_string_to_unsigned (g_strstrip (number), 10, 1, HL_LIMIT_REVISION_NUMBER, &value, NULL))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), "revision", "number “%s” is not a whole number from 1 to %d", number,
                      HL_LIMIT_REVISION_NUMBER);
      return FALSE;
    }
  /* the schema's date type also takes time zones and five-digit years */
  if (!hl_date_valid (g_strstrip (date)))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), "revision", "date “%s” is not a YYYY-MM-DD date", date);
      return FALSE;
    }
  if (author != NULL && !check_text (rd, n, "revision author", g_strstrip (author), HL_TEXT_ONE_LINE))
    return FALSE;
  if (!check_text (rd, n, "revision", g_strstrip (text), HL_TEXT_MULTI_LINE))
    return FALSE;
  hl_project_add_revision (project, (guint) value, g_strstrip (date), author, text);
  return TRUE;
}

/* <sign-off role="checked" date="2026-12-01">A. Name</sign-off>, each
 * role at most once (format 1.3) */
static gboolean
read_signoff (HlReader  *rd,
              HlProject *project,
              xmlNodePtr n)
{
  g_autofree char *role = hl_reader_prop (n, "role");
  g_autofree char *date = hl_reader_prop (n, "date");
  g_autofree char *name = hl_reader_text (n);
  int r;

  for (r = 0; r < HL_N_SIGNOFFS; r++)
    if (role != NULL && strcmp (g_strstrip (role), hl_signoff_role_to_string (r)) == 0)
      break;
  if (r == HL_N_SIGNOFFS)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), "sign-off",
                      "role “%s” is not prepared, checked or approved", role != NULL ? role : "");
      return FALSE;
    }
  if (project->signoff[r].name[0] != '\0' || project->signoff[r].date[0] != '\0')
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), "sign-off", "role “%s” is given twice", role);
      return FALSE;
    }
  if (date != NULL && !hl_date_valid (g_strstrip (date)))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_VALUE, xmlGetLineNo (n), "sign-off", "date “%s” is not a YYYY-MM-DD date",
                      date);
      return FALSE;
    }
  if (!check_text (rd, n, "sign-off", g_strstrip (name), HL_TEXT_ONE_LINE))
    return FALSE;
  hl_project_set_signoff (project, r, name, date != NULL ? date : "");
  return TRUE;
}

static HlProject *
build_project (HlReader    *rd,
               xmlNodePtr root)
{
  g_autoptr(HlProject) project = hl_project_new ();
  g_autofree char *title = NULL, *engineer = NULL, *description = NULL, *units = NULL;
  xmlNodePtr n;

  if (!read_text (rd, root, "title", HL_TEXT_ONE_LINE, &title)
      || !read_text (rd, root, "engineer", HL_TEXT_ONE_LINE, &engineer)
      || !read_text (rd, root, "description", HL_TEXT_MULTI_LINE, &description))
    return NULL;
  hl_project_set_title (project, title);
  hl_project_set_engineer (project, engineer);
  hl_project_set_description (project, description);
  if ((n = hl_reader_child (root, "display-units")) != NULL)
    project->display_units = strcmp (g_strstrip (units = hl_reader_text (n)), "us") == 0
                               ? HL_UNIT_SYSTEM_US : HL_UNIT_SYSTEM_SI;

  /* materials first: shells refer to them wherever they stand */
  for (n = root->children; n != NULL; n = n->next)
    if (n->type == XML_ELEMENT_NODE && xmlStrEqual (n->name, BAD_CAST "material")
        && !read_material (rd, project, n))
      return NULL;
  for (n = root->children; n != NULL; n = n->next)
    if (n->type == XML_ELEMENT_NODE && xmlStrEqual (n->name, BAD_CAST "shell")
        && !read_shell (rd, project, n))
      return NULL;
  for (n = root->children; n != NULL; n = n->next)
    if (n->type == XML_ELEMENT_NODE && xmlStrEqual (n->name, BAD_CAST "revision")
        && !read_revision (rd, project, n))
      return NULL;
  for (n = root->children; n != NULL; n = n->next)
    if (n->type == XML_ELEMENT_NODE && xmlStrEqual (n->name, BAD_CAST "sign-off")
        && !read_signoff (rd, project, n))
      return NULL;
  return g_steal_pointer (&project);
}

static gboolean
check_root (HlReader    *rd,
            xmlNodePtr root)
{
  g_autofree char *format = NULL;
  char *end = NULL;
  guint64 major;

  if (root == NULL || !xmlStrEqual (root->name, BAD_CAST "hoopline-project"))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, root != NULL ? xmlGetLineNo (root) : 1, NULL,
            "not a Hoopline project (the root element is <%s>, expected <hoopline-project>)",
            root != NULL ? (const char *) root->name : "nothing");
      return FALSE;
    }
  format = hl_reader_prop (root, "format");
  if (format == NULL)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, xmlGetLineNo (root), "hoopline-project", "the format attribute is missing");
      return FALSE;
    }
  major = g_ascii_strtoull (format, &end, 10);
  if (end == format || major != 1)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, xmlGetLineNo (root), "hoopline-project",
            "format “%s” is not supported by this version (it reads format 1)", format);
      return FALSE;
    }
  if (*end == '.')
    drop_unknown (rd, root, hl_reader_known_project);
  return TRUE;
}

/* @data need not end in a NUL (fuzzers and callers pass exact buffers) */
static gboolean
only_space (const char *data,
            gsize       length)
{
  for (gsize i = 0; i < length; i++)
    if (data[i] != ' ' && data[i] != '\t' && data[i] != '\r' && data[i] != '\n')
      return FALSE;
  return TRUE;
}

HlProject *
hl_project_load_bytes (const char  *data,
                       gsize        length,
                       const char  *display_name,
                       GPtrArray  **warnings,
                       GError     **error)
{
  HlReader rd = { display_name != NULL ? display_name : "project", NULL, NULL,
                  g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL),
                  g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL),
                  g_hash_table_new_full (g_str_hash, g_str_equal, g_free, g_free), 0 };
  xmlParserCtxtPtr ctxt;
  xmlDocPtr doc = NULL;
  HlProject *project = NULL;

  g_return_val_if_fail (data != NULL || length == 0, NULL);
  g_return_val_if_fail (error == NULL || *error == NULL, NULL);

  if (warnings != NULL)
    rd.warnings = g_ptr_array_new_with_free_func (g_free);
  if (length > HL_PROJECT_FILE_MAX_BYTES)
    hl_reader_fail (&rd, HL_PROJECT_FILE_ERROR_TOO_LARGE, 1, NULL, "the file is larger than %d MiB: not a project file",
          HL_PROJECT_FILE_MAX_BYTES / (1024 * 1024));
  else if (length == 0)
    hl_reader_fail (&rd, HL_PROJECT_FILE_ERROR_SYNTAX, 1, NULL, "the file is empty");
  else if (only_space (data, length))
    hl_reader_fail (&rd, HL_PROJECT_FILE_ERROR_SYNTAX, 1, NULL, "the file is empty (white space only)");
  else if (hl_reader_refuse_declarations (&rd, data, length))
    {
      ctxt = xmlNewParserCtxt ();
      ctxt->_private = &rd;
      hl_reader_cap_depth_while_parsing (ctxt);
      xmlSetStructuredErrorFunc (&rd, hl_reader_on_structured_error);
      /* NONET: never fetch; no NOENT/DTDLOAD: never expand or load;
       * the bytes are UTF-8 whatever the declaration says.  HUGE lifts
       * libxml2's 10 MB limits on one text, comment or lookahead, which
       * refused files below our own 16 MiB cap ("Huge input lookup",
       * "Comment too big"); it also lifts libxml2's depth limit, so
       * ours applies while parsing. */
      doc = xmlCtxtReadMemory (ctxt, data, (int) length, rd.name, "UTF-8",
                               XML_PARSE_NONET | XML_PARSE_NOCDATA | XML_PARSE_IGNORE_ENC | XML_PARSE_BIG_LINES
                               | XML_PARSE_COMPACT | XML_PARSE_HUGE);
      xmlSetStructuredErrorFunc (NULL, NULL);
      if (doc == NULL && rd.error == NULL)
        hl_reader_fail (&rd, HL_PROJECT_FILE_ERROR_SYNTAX, 1, NULL, "not a well-formed XML document");
      xmlFreeParserCtxt (ctxt);
    }

  if (doc != NULL && rd.error == NULL
      && hl_reader_check_depth (&rd, xmlDocGetRootElement (doc), 1)
      && check_root (&rd, xmlDocGetRootElement (doc))
      && hl_reader_validate (&rd, doc))
    project = build_project (&rd, xmlDocGetRootElement (doc));
  if (doc != NULL)
    xmlFreeDoc (doc);
  g_hash_table_unref (rd.shell_ids);
  g_hash_table_unref (rd.material_ids);
  g_hash_table_unref (rd.copies);

  if (rd.error != NULL)
    {
      g_clear_pointer (&project, hl_project_free);
      g_propagate_error (error, rd.error);
      g_clear_pointer (&rd.warnings, g_ptr_array_unref);
      return NULL;
    }
  if (warnings != NULL)
    *warnings = rd.warnings;
  return project;
}

HlProject *
hl_project_load (const char  *path,
                 GPtrArray  **warnings,
                 GError     **error)
{
  g_autoptr(GFile) file = g_file_new_for_path (path);
  g_autoptr(GFileInfo) info = NULL;
  g_autoptr(GError) local = NULL;
  g_autofree char *data = NULL;
  /* the name starts every message, which must be UTF-8 whatever the path */
  g_autofree char *name = g_filename_display_name (path);
  gsize length = 0;

  g_return_val_if_fail (path != NULL, NULL);

  /* refuse a huge file before reading a byte of it */
  info = g_file_query_info (file, G_FILE_ATTRIBUTE_STANDARD_SIZE "," G_FILE_ATTRIBUTE_STANDARD_TYPE,
                            G_FILE_QUERY_INFO_NONE, NULL, &local);
  if (info == NULL)
    {
      /* GIO's own text repeats the path the prefix already gives */
      g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_IO, "%s:1: cannot open: %s", name,
                   g_error_matches (local, G_IO_ERROR, G_IO_ERROR_NOT_FOUND) ? "no such file"
                   : g_error_matches (local, G_IO_ERROR, G_IO_ERROR_PERMISSION_DENIED) ? "permission denied"
                   : local->message);
      return NULL;
    }
  if (g_file_info_get_file_type (info) != G_FILE_TYPE_REGULAR)
    {
      g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_IO, "%s:1: not a regular file", name);
      return NULL;
    }
  if (g_file_info_get_size (info) > HL_PROJECT_FILE_MAX_BYTES)
    {
      g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_TOO_LARGE,
                   "%s:1: the file is larger than %d MiB: not a project file", name,
                   HL_PROJECT_FILE_MAX_BYTES / (1024 * 1024));
      return NULL;
    }
  if (!g_file_get_contents (path, &data, &length, &local))
    {
      g_set_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_IO, "%s:1: cannot read: %s", name, local->message);
      return NULL;
    }
  return hl_project_load_bytes (data, length, name, warnings, error);
}
