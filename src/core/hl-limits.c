/* hl-limits.c — cutting and checking texts against the shared limits
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-limits"

#include "hl-limits.h"

#include <string.h>

gsize
hl_utf8_fit_bytes (const char *text,
                   gsize       max_bytes)
{
  gsize len;

  g_return_val_if_fail (text != NULL, 0);

  len = strlen (text);
  if (len <= max_bytes)
    return len;
  /* step back over continuation bytes (10xxxxxx) to a lead byte */
  len = max_bytes;
  while (len > 0 && ((guchar) text[len] & 0xC0) == 0x80)
    len--;
  return len;
}

gboolean
hl_utf8_copy (char       *dest,
              const char *src,
              gsize       dest_size)
{
  gsize fit;

  g_return_val_if_fail (dest != NULL && dest_size > 0, FALSE);

  if (src == NULL)
    src = "";
  fit = hl_utf8_fit_bytes (src, dest_size - 1);
  memmove (dest, src, fit);
  dest[fit] = '\0';
  return src[fit] == '\0';
}

gboolean
hl_text_has_control (const char *text,
                     gboolean    multi_line)
{
  if (text == NULL)
    return FALSE;
  for (const char *p = text; *p != '\0'; p = g_utf8_next_char (p))
    {
      gunichar c = g_utf8_get_char_validated (p, -1);

      if (c == (gunichar) -1 || c == (gunichar) -2)
        return TRUE;
      if (multi_line && (c == '\n' || c == '\t' || c == '\r'))
        continue;
      if (c < 0x20 || (c >= 0x7F && c < 0xA0) || c == 0x2028 || c == 0x2029)
        return TRUE;
    }
  return FALSE;
}

char *
hl_text_quote (const char *text,
               glong       max_chars)
{
  const char *end;

  if (text == NULL)
    return g_strdup ("");
  if (!g_utf8_validate (text, -1, NULL))
    return g_strdup ("(not UTF-8)");
  if (g_utf8_strlen (text, -1) <= max_chars)
    return g_strdup (text);
  end = g_utf8_offset_to_pointer (text, max_chars);
  return g_strdup_printf ("%.*s…", (int) (end - text), text);
}

char *
hl_text_problem (const char *text,
                 HlTextKind  kind)
{
  gboolean multi_line = kind == HL_TEXT_MULTI_LINE;
  glong limit = multi_line ? HL_LIMIT_LONG_TEXT_CHARS : HL_LIMIT_SHORT_TEXT_CHARS;
  gsize bytes;
  glong chars;

  if (text == NULL)
    return NULL;
  /* a slot cut inside a character holds a partial sequence */
  if (!g_utf8_validate (text, -1, NULL))
    return g_strdup ("is not valid UTF-8 (a character is cut or broken)");
  bytes = strlen (text);
  if (kind == HL_TEXT_NAME && bytes > HL_LIMIT_NAME_BYTES)
    return g_strdup_printf ("is too long (%" G_GSIZE_FORMAT " bytes of UTF-8; this version keeps at most %d)",
                            bytes, HL_LIMIT_NAME_BYTES);
  chars = g_utf8_strlen (text, -1);
  if (kind != HL_TEXT_NAME && chars > limit)
    return g_strdup_printf ("is %ld characters long; at most %ld are allowed", chars, limit);
  if (hl_text_has_control (text, multi_line))
    return g_strdup (multi_line
                     ? "holds a control character a project file cannot keep (only line breaks and tabs are kept)"
                     : "holds a control character (a line break, tab or similar): a one-line text cannot keep it");
  return NULL;
}
