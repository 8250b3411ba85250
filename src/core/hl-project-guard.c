/* hl-project-guard.c — checks on a project file before and after parsing
 *
 * Bytes first: the file must be UTF-8 and declare nothing that libxml2
 * would expand or fetch.  Then the tree: its depth is capped while it is
 * parsed (ctxt->_private is the HlReader) and checked once more after.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-project-reader"

#include "hl-project-reader-private.h"

#include <libxml/SAX2.h>
#include <string.h>

/* ---- before parsing ------------------------------------------------ */

static long
line_of_offset (const char *data,
                gsize       offset)
{
  long line = 1;

  for (gsize i = 0; i < offset; i++)
    if (data[i] == '\n')
      line++;
  return line;
}

/* The format is UTF-8, the only thing the writer writes.  Checking the
 * bytes before libxml2 sees them also closes a side door: a file that
 * declares another encoding (UTF-7, EBCDIC) can spell "<!DOCTYPE" in
 * bytes that the plain search in hl_reader_refuse_declarations() does not see. */
static gboolean
check_encoding (HlReader     *rd,
                const char *data,
                gsize       length)
{
  const guchar *u = (const guchar *) data;
  const char *nul = memchr (data, '\0', length);
  const char *bad = NULL;

  if (length >= 2 && ((u[0] == 0xFE && u[1] == 0xFF) || (u[0] == 0xFF && u[1] == 0xFE)))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SYNTAX, 1, NULL,
            "the file is UTF-16 text (it starts with a UTF-16 byte-order mark): project files are UTF-8");
      return FALSE;
    }
  if (length >= 2 && ((u[0] == '<' && u[1] == 0) || (u[0] == 0 && u[1] == '<')))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SYNTAX, 1, NULL, "the file is UTF-16 text: project files are UTF-8");
      return FALSE;
    }
  if (nul != NULL)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SYNTAX, line_of_offset (data, nul - data), NULL,
            "the file contains a NUL byte: not a text project file");
      return FALSE;
    }
  if (!g_utf8_validate_len (data, length, &bad))
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SYNTAX, line_of_offset (data, bad - data), NULL,
            "the file is not valid UTF-8 (byte 0x%02X): project files are UTF-8", *(const guchar *) bad);
      return FALSE;
    }
  return TRUE;
}

/* The declaration may name only an encoding that reads the same as UTF-8. */
static gboolean
check_declared_encoding (HlReader     *rd,
                         const char *data,
                         gsize       length)
{
  gsize skip = length >= 3 && memcmp (data, "\xEF\xBB\xBF", 3) == 0 ? 3 : 0;
  const char *decl = data + skip;
  gsize span = MIN (length - skip, 256);
  const char *close, *enc;
  g_autofree char *name = NULL;
  char quote;

  if (span < 5 || memcmp (decl, "<?xml", 5) != 0
      || (close = g_strstr_len (decl, span, "?>")) == NULL
      || (enc = g_strstr_len (decl, close - decl, "encoding")) == NULL)
    return TRUE;
  enc += strlen ("encoding");
  while (enc < close && (*enc == ' ' || *enc == '=' || *enc == '\t' || *enc == '\r' || *enc == '\n'))
    enc++;
  quote = enc < close ? *enc : '\0';
  if (quote == '"' || quote == '\'')
    {
      const char *end = memchr (enc + 1, quote, close - enc - 1);

      if (end != NULL)
        name = g_strndup (enc + 1, end - enc - 1);
    }
  if (name == NULL)
    return TRUE;  /* malformed: the parser says so */
  if (g_ascii_strcasecmp (name, "UTF-8") == 0 || g_ascii_strcasecmp (name, "UTF8") == 0
      || g_ascii_strcasecmp (name, "US-ASCII") == 0 || g_ascii_strcasecmp (name, "ASCII") == 0)
    return TRUE;
  hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_SYNTAX, line_of_offset (data, enc - data), NULL,
        "the file declares the encoding “%s”: project files are UTF-8", name);
  return FALSE;
}

gboolean
hl_reader_refuse_declarations (HlReader     *rd,
                     const char *data,
                     gsize       length)
{
  static const char *const forbidden[] = { "<!DOCTYPE", "<!ENTITY", "<!ELEMENT", "<!ATTLIST" };
  const char *end = data + length;

  if (!check_encoding (rd, data, length) || !check_declared_encoding (rd, data, length))
    return FALSE;
  /* one pass over the markup openings, not one search per word */
  for (const char *p = data; (p = memchr (p, '<', end - p)) != NULL; p++)
    for (guint f = 0; f < G_N_ELEMENTS (forbidden) && end - p >= 2 && p[1] == '!'; f++)
      if ((gsize) (end - p) >= strlen (forbidden[f]) && memcmp (p, forbidden[f], strlen (forbidden[f])) == 0)
        {
          hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_UNSAFE, line_of_offset (data, p - data), NULL,
                "document type declarations and entities are not allowed in a project file");
          return FALSE;
        }
  return TRUE;
}

/* ---- while parsing ------------------------------------------------ */

/* The depth cap while parsing: without it a file of "<x><x>…" would
 * build millions of nested nodes before hl_reader_check_depth() saw them. */
static void
on_start_element (void           *ctx,
                  const xmlChar  *localname,
                  const xmlChar  *prefix,
                  const xmlChar  *uri,
                  int             nb_namespaces,
                  const xmlChar **namespaces,
                  int             nb_attributes,
                  int             nb_defaulted,
                  const xmlChar **attributes)
{
  xmlParserCtxtPtr ctxt = ctx;
  HlReader *rd = ctxt->_private;

  if (++rd->parse_depth > HL_PROJECT_FILE_MAX_DEPTH)
    {
      hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_UNSAFE, xmlSAX2GetLineNumber (ctx), (const char *) localname,
                      "elements nested deeper than %d levels", HL_PROJECT_FILE_MAX_DEPTH);
      xmlStopParser (ctxt);
      return;
    }
  xmlSAX2StartElementNs (ctx, localname, prefix, uri, nb_namespaces, namespaces, nb_attributes, nb_defaulted,
                         attributes);
}

static void
on_end_element (void          *ctx,
                const xmlChar *localname,
                const xmlChar *prefix,
                const xmlChar *uri)
{
  xmlParserCtxtPtr ctxt = ctx;
  HlReader *rd = ctxt->_private;

  rd->parse_depth--;
  xmlSAX2EndElementNs (ctx, localname, prefix, uri);
}

void
hl_reader_cap_depth_while_parsing (xmlParserCtxtPtr ctxt)
{
  ctxt->sax->startElementNs = on_start_element;
  ctxt->sax->endElementNs = on_end_element;
}

/* ---- after parsing ------------------------------------------------- */

gboolean
hl_reader_check_depth (HlReader    *rd,
             xmlNodePtr node,
             int        depth)
{
  for (xmlNodePtr n = node; n != NULL; n = n->next)
    {
      if (n->type != XML_ELEMENT_NODE)
        continue;
      if (depth > HL_PROJECT_FILE_MAX_DEPTH)
        {
          hl_reader_fail (rd, HL_PROJECT_FILE_ERROR_UNSAFE, xmlGetLineNo (n), (const char *) n->name,
                "elements nested deeper than %d levels", HL_PROJECT_FILE_MAX_DEPTH);
          return FALSE;
        }
      if (!hl_reader_check_depth (rd, n->children, depth + 1))
        return FALSE;
    }
  return TRUE;
}
