/* hl-limits.h — one set of limits for the reader, the writer and the fields
 *
 * The project reader refuses what lies beyond these limits, so the writer
 * checks against the same numbers and the window's fields stop the user
 * at them while typing.  The schema (data/hoopline-project.rng) states
 * the same numbers for other tools; tests/files checks that they agree.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-material.h"

G_BEGIN_DECLS

/* characters (not bytes): title, engineer, a revision's author */
#define HL_LIMIT_SHORT_TEXT_CHARS 1000
/* characters: description, a revision's text */
#define HL_LIMIT_LONG_TEXT_CHARS  100000
/* bytes of UTF-8 (the struct slots are fixed arrays): names and ids */
#define HL_LIMIT_NAME_BYTES       (HL_NAME_MAX - 1)
#define HL_LIMIT_ID_BYTES         (HL_ID_MAX - 1)
/* revision numbers run from 1 to this */
#define HL_LIMIT_REVISION_NUMBER  1000000

/* Copies @src into @dest (@dest_size bytes with the NUL), cut at the last
 * whole UTF-8 character that fits, never inside one.  Returns TRUE when
 * nothing had to be cut. */
gboolean  hl_utf8_copy             (char       *dest,
                                    const char *src,
                                    gsize       dest_size);

/* The longest prefix of @text, in bytes, that holds at most @max_bytes
 * bytes and ends on a character boundary (@text is valid UTF-8). */
gsize     hl_utf8_fit_bytes        (const char *text,
                                    gsize       max_bytes);

/* TRUE when @text holds a control character (C0 other than the line
 * breaks and tab that @multi_line texts keep, DEL, or C1).  One-line
 * texts such as names refuse all of them: a newline in a name could
 * forge a line of the summary. */
gboolean  hl_text_has_control      (const char *text,
                                    gboolean    multi_line);

/* What a project text may hold: the reader refuses the rest, so the
 * writer and the fields check with the same function. */
typedef enum
{
  HL_TEXT_ONE_LINE,    /* title, engineer, a revision's author */
  HL_TEXT_MULTI_LINE,  /* description, a revision's text */
  HL_TEXT_NAME,        /* shell and material names (fixed slots: bytes) */
} HlTextKind;

/* NULL when @text (already stripped of outer white space, as the reader
 * strips it) fits @kind; else the reason, without the field's name:
 * "is 1001 characters long; at most 1000 are allowed". */
char     *hl_text_problem          (const char *text,
                                    HlTextKind  kind);

/* characters of a value a message quotes */
#define HL_QUOTE_CHARS 40

/* At most @max_chars characters of @text for a message, with "…" when
 * cut, so a pasted megabyte is not echoed back whole. */
char     *hl_text_quote            (const char *text,
                                    glong       max_chars);

G_END_DECLS
