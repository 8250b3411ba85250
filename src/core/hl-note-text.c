/* hl-note-text.c — the design note as plain text
 *
 * The same rows the PDF sheet lays out, printed for a terminal or a
 * plain-text file: headings underlined, paragraphs wrapped, tables as
 * aligned columns whose cells wrap inside their column.  Every cell goes
 * through hl_report_escape_line(), so no user text can start a line.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-note-text"

#include "hl-note.h"
#include "hl-report.h"

#include <string.h>

#define INDENT     2
#define GAP        2
#define BOX_WIDTH  18   /* an empty sign-off box, in characters */
#define NBSP       "\xc2\xa0"

static glong
text_len (const char *text)
{
  return g_utf8_strlen (text, -1);
}

/* the no-break space keeps a number with its unit while wrapping; the
 * file gets a plain space */
static void
append_plain (GString    *out,
              const char *text)
{
  for (const char *p = text; *p != '\0'; p++)
    {
      if (strncmp (p, NBSP, 2) == 0)
        {
          g_string_append_c (out, ' ');
          p++;
        }
      else
        g_string_append_c (out, *p);
    }
}

/* @text cut into lines of at most @width characters at spaces (a word
 * longer than the line is cut where it must) */
static GPtrArray *
wrap (const char *text,
      glong       width)
{
  GPtrArray *lines = g_ptr_array_new_with_free_func (g_free);
  g_auto(GStrv) words = g_strsplit (text, " ", -1);
  GString *line = g_string_new (NULL);
  glong len = 0;

  width = MAX (width, 8);
  /* a text that fits stays as it is, runs of spaces included */
  if (text_len (text) <= width)
    {
      g_ptr_array_add (lines, g_strdup (text));
      g_string_free (line, TRUE);
      return lines;
    }
  for (guint i = 0; words[i] != NULL; i++)
    {
      const char *w = words[i];
      glong wl = text_len (w);

      if (wl == 0)
        continue;
      if (len > 0 && len + 1 + wl > width)
        {
          g_ptr_array_add (lines, g_string_free (line, FALSE));
          line = g_string_new (NULL);
          len = 0;
        }
      while (wl > width)
        {
          const char *cut = g_utf8_offset_to_pointer (w, width - len - (len > 0));

          if (len > 0)
            g_string_append_c (line, ' ');
          g_string_append_len (line, w, cut - w);
          g_ptr_array_add (lines, g_string_free (line, FALSE));
          line = g_string_new (NULL);
          len = 0;
          w = cut;
          wl = text_len (w);
        }
      if (len > 0)
        {
          g_string_append_c (line, ' ');
          len++;
        }
      g_string_append (line, w);
      len += wl;
    }
  if (len > 0 || lines->len == 0)
    g_ptr_array_add (lines, g_string_free (line, FALSE));
  else
    g_string_free (line, TRUE);
  return lines;
}

static void
pad (GString *out,
     glong    n)
{
  for (glong i = 0; i < n; i++)
    g_string_append_c (out, ' ');
}

/* @first before the first line, @next before the others */
static void
put_wrapped (GString    *out,
             const char *text,
             const char *first,
             const char *next,
             guint       width)
{
  g_autofree char *safe = hl_report_escape_line (text);
  g_autoptr(GPtrArray) lines = wrap (safe, (glong) width - text_len (first));

  for (guint i = 0; i < lines->len; i++)
    {
      g_string_append (out, i == 0 ? first : next);
      append_plain (out, g_ptr_array_index (lines, i));
      g_string_append_c (out, '\n');
    }
}

static void
underline (GString    *out,
           const char *text,
           char        c)
{
  g_autofree char *safe = hl_report_escape_line (text);

  append_plain (out, safe);
  g_string_append_c (out, '\n');
  for (glong i = 0; i < text_len (safe); i++)
    g_string_append_c (out, c);
  g_string_append_c (out, '\n');
}

static glong
cell_natural (const HlNoteRow *r,
              guint            c)
{
  g_autofree char *safe = hl_report_escape_line (r->cells[c]);

  return MAX (text_len (safe), r->boxed ? BOX_WIDTH : 0);
}

static glong
longest_word (const char *text)
{
  g_autofree char *safe = hl_report_escape_line (text);
  g_auto(GStrv) words = g_strsplit (safe, " ", -1);
  glong most = 0;

  for (guint i = 0; words[i] != NULL; i++)
    most = MAX (most, text_len (words[i]));
  return most;
}

/* Column widths for the table rows [@first, @last): each column as wide
 * as its widest cell when the line allows; else the columns narrower
 * than a fair share keep their width (found again as the share grows)
 * and the wide ones share the rest. */
static void
column_widths (GArray *rows,
               guint   first,
               guint   last,
               guint   width,
               glong  *widths,
               guint  *n_cols)
{
  glong natural[HL_NOTE_MAX_CELLS] = { 0 }, longest[HL_NOTE_MAX_CELLS] = { 0 };
  gboolean fixed[HL_NOTE_MAX_CELLS] = { FALSE };
  const double *cols = hl_note_row (rows, first)->cols;
  glong room, left, total;
  double share;
  guint n = 0, n_left;
  gboolean changed = TRUE;

  for (guint i = first; i < last; i++)
    {
      const HlNoteRow *r = hl_note_row (rows, i);

      n = MAX (n, r->n_cells);
      for (guint c = 0; c < r->n_cells; c++)
        {
          natural[c] = MAX (natural[c], cell_natural (r, c));
          longest[c] = MAX (longest[c], longest_word (r->cells[c]));
        }
    }
  *n_cols = n;
  room = MAX ((glong) width - INDENT - GAP * ((glong) n - 1), (glong) n * 6);
  left = room;
  n_left = n;
  /* the first column names the row: whole when it takes at most 2/3 of the line */
  if (n > 1 && natural[0] <= room * 2 / 3)
    {
      fixed[0] = TRUE;
      widths[0] = natural[0];
      left -= natural[0];
      n_left--;
    }
  while (changed && n_left > 0)
    {
      changed = FALSE;
      for (guint c = 0; c < n; c++)
        if (!fixed[c] && natural[c] <= left / (glong) n_left)
          {
            fixed[c] = TRUE;
            widths[c] = natural[c];
            left -= natural[c];
            n_left--;
            changed = TRUE;
          }
    }
  /* the wide columns share by the fractions the note gives them */
  share = 0;
  for (guint c = 0; c < n; c++)
    if (!fixed[c])
      share += cols != NULL ? cols[c] : natural[c];
  for (guint c = 0; c < n; c++)
    if (!fixed[c])
      widths[c] = MAX (6, (glong) (left * (cols != NULL ? cols[c] : natural[c]) / MAX (share, 1e-9)));
  /* a number or a word is not cut while the line has room: the first
   * column gives back what the others need for their longest words */
  total = 0;
  for (guint c = 0; c < n; c++)
    {
      widths[c] = MAX (widths[c], MIN (longest[c], 24));
      total += widths[c];
    }
  if (total > room && fixed[0])
    widths[0] = MAX (MIN (longest[0], 24), widths[0] - (total - room));
}

static void
put_table_row (GString         *out,
               const HlNoteRow *r,
               const glong     *widths,
               guint            n,
               gboolean         header)
{
  GPtrArray *cells[HL_NOTE_MAX_CELLS] = { NULL };
  guint height = 1;

  for (guint c = 0; c < n; c++)
    {
      g_autofree char *safe = hl_report_escape_line (c < r->n_cells ? r->cells[c] : "");

      if (r->boxed && safe[0] == '\0')
        {
          g_free (safe);
          safe = g_strnfill (widths[c], '_');
        }
      cells[c] = wrap (safe, widths[c]);
      height = MAX (height, cells[c]->len);
    }
  for (guint line = 0; line < height; line++)
    {
      GString *text = g_string_new (NULL);

      pad (text, INDENT);
      for (guint c = 0; c < n; c++)
        {
          const char *part = line < cells[c]->len ? g_ptr_array_index (cells[c], line) : "";

          if (c > 0)
            pad (text, GAP);
          g_string_append (text, part);
          if (c + 1 < n)
            pad (text, widths[c] - text_len (part));
        }
      while (text->len > 0 && text->str[text->len - 1] == ' ')
        g_string_truncate (text, text->len - 1);
      append_plain (out, text->str);
      g_string_append_c (out, '\n');
      g_string_free (text, TRUE);
    }
  /* a rule under the header row only: a strong row further down is a
   * highlighted one (the design basis) */
  if (r->strong && header)
    {
      glong total = 0;

      for (guint c = 0; c < n; c++)
        total += widths[c] + (c > 0 ? GAP : 0);
      pad (out, INDENT);
      for (glong i = 0; i < total; i++)
        g_string_append_c (out, '-');
      g_string_append_c (out, '\n');
    }
  for (guint c = 0; c < n; c++)
    g_ptr_array_unref (cells[c]);
}

/* the rows from @first that belong to the same table: same columns */
static guint
table_end (GArray *rows,
           guint   first)
{
  const HlNoteRow *r0 = hl_note_row (rows, first);
  guint i = first + 1;

  while (i < rows->len && hl_note_row (rows, i)->kind == HL_NOTE_TABLE && hl_note_row (rows, i)->cols == r0->cols
         && hl_note_row (rows, i)->n_cells == r0->n_cells)
    i++;
  return i;
}

char *
hl_note_to_text (GArray *rows,
                 guint   width)
{
  GString *out = g_string_new (NULL);

  g_return_val_if_fail (rows != NULL, NULL);
  for (guint i = 0; i < rows->len;)
    {
      const HlNoteRow *r = hl_note_row (rows, i);

      switch (r->kind)
        {
        case HL_NOTE_TITLE:
          underline (out, r->cells[0], '=');
          if (r->n_cells > 1)
            put_wrapped (out, r->cells[1], "", "", width);
          g_string_append_c (out, '\n');
          break;
        case HL_NOTE_HEADING:
          g_string_append_c (out, '\n');
          underline (out, r->cells[0], '-');
          break;
        case HL_NOTE_PARAGRAPH:
          put_wrapped (out, r->cells[0], "  ", "  ", width);
          break;
        case HL_NOTE_BULLET:
          put_wrapped (out, r->cells[0], "  - ", "    ", width);
          break;
        case HL_NOTE_BOX:
          put_wrapped (out, r->cells[0], "  | ", "  | ", width);
          break;
        case HL_NOTE_TABLE:
        default:
          {
            guint last = table_end (rows, i), n;
            glong widths[HL_NOTE_MAX_CELLS];

            column_widths (rows, i, last, width, widths, &n);
            for (guint first = i; i < last; i++)
              put_table_row (out, hl_note_row (rows, i), widths, n, i == first);
            continue;
          }
        }
      i++;
    }
  return g_string_free (out, FALSE);
}
