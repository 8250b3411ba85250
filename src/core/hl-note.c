/* hl-note.c — rows of the design note
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-note"

#include "hl-config.h"
#include "hl-note.h"

#include <glib/gi18n-lib.h>

static void
clear_row (gpointer data)
{
  HlNoteRow *r = data;

  for (guint i = 0; i < r->n_cells; i++)
    g_free (r->cells[i]);
}

GArray *
hl_note_new (void)
{
  GArray *rows = g_array_new (FALSE, TRUE, sizeof (HlNoteRow));

  g_array_set_clear_func (rows, clear_row);
  return rows;
}

void
hl_note_add (GArray        *rows,
             HlNoteRowKind  kind,
             const double  *cols,
             gboolean       strong,
             guint          n,
             ...)
{
  HlNoteRow r = { kind, { NULL }, MIN (n, HL_NOTE_MAX_CELLS), cols, strong, FALSE, FALSE };
  va_list args;

  g_return_if_fail (rows != NULL);
  va_start (args, n);
  for (guint i = 0; i < r.n_cells; i++)
    {
      const char *s = va_arg (args, const char *);

      r.cells[i] = g_strdup (s != NULL ? s : "");
    }
  va_end (args);
  g_array_append_val (rows, r);
}

void
hl_note_add_owned (GArray        *rows,
                   HlNoteRowKind  kind,
                   gboolean       strong,
                   char          *owned)
{
  hl_note_add (rows, kind, NULL, strong, 1, owned);
  g_free (owned);
}

char *
hl_note_revision_label (const HlProject *project)
{
  const HlRevision *rev = project != NULL ? hl_project_latest_revision (project) : NULL;

  if (rev == NULL)
    return g_strdup (_("no revision recorded"));
  /* TRANSLATORS: the revision label of a page, "Rev. 3" */
  return g_strdup_printf (_("Rev. %u"), rev->number);
}
