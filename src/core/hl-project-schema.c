/* hl-project-schema.c — validating a project file against the RELAX NG schema
 *
 * The schema ships in data/ and in the core's resources; libxml2 checks
 * the tree against it before the reader looks at any value.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-project-reader"

#include "hl-project-reader-private.h"
#include "hl-core-resources.h"

#include <gio/gio.h>
#include <libxml/relaxng.h>

/* For each value, libxml2 2.9 compiles a pattern facet's regular
 * expression anew (xmlSchemaCheckFacet calls xmlRegexpCompile) and looks
 * the XSD type up by its long namespace name: with ten numbers a shell,
 * that was two thirds of the time to load a 1,000-shell file.  The
 * reader checks every number (hl_parse_number) and every id (check_id)
 * itself with the same rules, so the in-memory copy of the schema takes
 * those values as plain text.  The shipped schema keeps the patterns for
 * other tools; should its text ever differ, the copy stays whole, only
 * slower. */
static GString *
fast_schema_text (const char *data,
                  gsize       size)
{
  static const char *const checked_here[] = {
    "<data type=\"string\"><param name=\"pattern\">[A-Za-z0-9_][A-Za-z0-9_.\\-]{0,62}</param></data>",
    "<data type=\"string\"><param name=\"pattern\">\\s*[+\\-]?([0-9]+(\\.[0-9]*)?|\\.[0-9]+)([eE][+\\-]?[0-9]+)?\\s*</param></data>",
  };
  GString *text = g_string_new_len (data, (gssize) size);

  for (guint i = 0; i < G_N_ELEMENTS (checked_here); i++)
    g_string_replace (text, checked_here[i], "<text/>", 1);
  return text;
}

static xmlRelaxNGPtr
load_schema (HlReader *rd)
{
  /* looked up in our own resource: a static library drops unreferenced
   * constructors, so global registration cannot be relied on */
  g_autoptr(GBytes) bytes = g_resource_lookup_data (hl_core_get_resource (),
                                                    "/org/hoopline/core/hoopline-project.rng",
                                                    G_RESOURCE_LOOKUP_FLAGS_NONE, NULL);
  g_autoptr(GString) text = NULL;
  xmlRelaxNGParserCtxtPtr pctx;
  xmlRelaxNGPtr schema;
  gsize size;
  const char *data;

  if (bytes == NULL)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_IO, 1, NULL, "the project schema is missing from this build");
      return NULL;
    }
  data = g_bytes_get_data (bytes, &size);
  text = fast_schema_text (data, size);
  pctx = xmlRelaxNGNewMemParserCtxt (text->str, (int) text->len);
  schema = xmlRelaxNGParse (pctx);
  xmlRelaxNGFreeParserCtxt (pctx);
  if (schema == NULL)
    hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_IO, 1, NULL, "the project schema of this build does not load");
  return schema;
}


/* libxml2's RELAX NG validator keeps, for a repeated pattern, every
 * state reached so far and compares each new one with all of them
 * (xmlRelaxNGAddStates in libxml2 2.9): n shells cost n² comparisons,
 * 18 s for 50,000.  So the root's lists are validated in slices: each
 * pass shows the validator the root's other children, one slice of
 * materials, shells and revisions, and a shell (the format asks for
 * one).  Every element meets the same rules, at linear cost. */
#define VALIDATE_SLICE 200

static gboolean
in_list (xmlNodePtr n)
{
  return n->type == XML_ELEMENT_NODE
         && (xmlStrEqual (n->name, BAD_CAST "shell") || xmlStrEqual (n->name, BAD_CAST "material")
             || xmlStrEqual (n->name, BAD_CAST "revision"));
}

/* makes @nodes the children of @parent (in that order), nothing else */
static void
relink (xmlNodePtr  parent,
        GPtrArray  *nodes)
{
  xmlNodePtr prev = NULL;

  parent->children = NULL;
  for (guint i = 0; i < nodes->len; i++)
    {
      xmlNodePtr n = g_ptr_array_index (nodes, i);

      n->prev = prev;
      n->next = NULL;
      if (prev != NULL)
        prev->next = n;
      else
        parent->children = n;
      prev = n;
    }
  parent->last = prev;
}

static int
validate_document (xmlRelaxNGPtr  schema,
                   HlReader      *rd,
                   xmlDocPtr      doc)
{
  xmlRelaxNGValidCtxtPtr vctx = xmlRelaxNGNewValidCtxt (schema);
  int rc;

  xmlRelaxNGSetValidStructuredErrors (vctx, hl_reader_on_structured_error, rd);
  rc = xmlRelaxNGValidateDoc (vctx, doc);
  xmlRelaxNGFreeValidCtxt (vctx);
  return rc;
}

static int
validate_in_slices (xmlRelaxNGPtr  schema,
                    HlReader      *rd,
                    xmlDocPtr      doc)
{
  xmlNodePtr root = xmlDocGetRootElement (doc);
  g_autoptr(GPtrArray) all = g_ptr_array_new ();
  g_autoptr(GPtrArray) others = g_ptr_array_new ();
  g_autoptr(GPtrArray) list = g_ptr_array_new ();
  g_autoptr(GPtrArray) view = g_ptr_array_new ();
  xmlNodePtr a_shell = NULL;
  int rc = 0;

  for (xmlNodePtr n = root->children; n != NULL; n = n->next)
    {
      g_ptr_array_add (all, n);
      if (in_list (n))
        {
          g_ptr_array_add (list, n);
          if (a_shell == NULL && xmlStrEqual (n->name, BAD_CAST "shell"))
            a_shell = n;
        }
      /* the validator skips blank text, comments and instructions too */
      else if (!(xmlIsBlankNode (n) || n->type == XML_COMMENT_NODE || n->type == XML_PI_NODE))
        g_ptr_array_add (others, n);
    }
  if (list->len <= VALIDATE_SLICE)
    return validate_document (schema, rd, doc);
  for (guint start = 0; start < list->len && rc == 0; start += VALIDATE_SLICE)
    {
      gboolean has_shell = FALSE;

      g_ptr_array_set_size (view, 0);
      for (guint i = 0; i < others->len; i++)
        g_ptr_array_add (view, g_ptr_array_index (others, i));
      for (guint i = start; i < MIN (start + VALIDATE_SLICE, list->len); i++)
        {
          xmlNodePtr n = g_ptr_array_index (list, i);

          has_shell = has_shell || n == a_shell;
          g_ptr_array_add (view, n);
        }
      if (!has_shell && a_shell != NULL)
        g_ptr_array_add (view, a_shell);
      relink (root, view);
      rc = validate_document (schema, rd, doc);
    }
  relink (root, all);
  return rc;
}

gboolean
hl_reader_validate (HlReader  *rd,
                    xmlDocPtr  doc)
{
  static xmlRelaxNGPtr schema; /* parsed once, read-only afterwards */
  static gsize schema_once;
  int rc;

  if (g_once_init_enter (&schema_once))
    {
      schema = load_schema (rd);
      g_once_init_leave (&schema_once, 1);
    }
  if (schema == NULL)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_IO, 1, NULL, "the project schema of this build does not load");
      return FALSE;
    }
  rc = validate_in_slices (schema, rd, doc);
  if (rc != 0)
    {
      GError *schema_error = g_steal_pointer (&rd->error);

      hl_reader_explain_invalid (rd, xmlDocGetRootElement (doc));
      if (rd->error != NULL)
        g_clear_error (&schema_error);
      else
        rd->error = schema_error;
      if (rd->error == NULL)
        hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SCHEMA, xmlGetLineNo (xmlDocGetRootElement (doc)), NULL,
              "the file does not follow the Hoopline project format");
    }
  return rc == 0;
}
