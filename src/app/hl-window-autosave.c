/* hl-window-autosave.c — the window's crash-recovery copy
 *
 * A few seconds after a change that leaves the document modified, the
 * project is copied to the user's state folder.  A document that is
 * saved, back to its saved state, or closed on purpose needs no copy, so
 * the copy goes then; only a crash leaves it behind.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-window"

#include "hl-config.h"
#include "hl-window-private.h"

#define DEFAULT_DELAY_SECONDS 3

/* HL_AUTOSAVE_SECONDS shortens the wait for tests and demos */
static guint
delay_seconds (void)
{
  const char *text = g_getenv ("HL_AUTOSAVE_SECONDS");
  guint64 value;

  if (text != NULL && g_ascii_string_to_unsigned (text, 10, 0, 3600, &value, NULL))
    return (guint) value;
  return DEFAULT_DELAY_SECONDS;
}

static void
sync_original (HlWindow *self)
{
  GFile *file = hl_document_get_file (self->document);

  /* after "save as" the next copy names the new file */
  hl_autosave_set_original (self->autosave, file != NULL ? g_file_peek_path (file) : NULL);
}

void
hl_window_autosave_now (HlWindow *self)
{
  g_autoptr(GError) error = NULL;

  g_return_if_fail (HL_IS_WINDOW (self));

  g_clear_handle_id (&self->autosave_timer, g_source_remove);
  if (self->autosave == NULL || self->document == NULL || !hl_document_get_modified (self->document))
    return;
  sync_original (self);
  /* a copy the loader would refuse cannot be recovered: while a value is
   * bad, the last good copy stays (the bad value is one to fix anyway) */
  if (!hl_document_check_writable (self->document, NULL))
    return;
  /* the copy is a safety net: a failure is logged, never put in the
   * user's way while they work */
  if (!hl_autosave_write (self->autosave, hl_document_get_project (self->document), &error))
    g_message ("no crash-recovery copy was written: %s", error->message);
}

static gboolean
on_autosave_timeout_cb (gpointer user_data)
{
  HlWindow *self = HL_WINDOW (user_data);

  self->autosave_timer = 0;
  hl_window_autosave_now (self);
  return G_SOURCE_REMOVE;
}

void
hl_window_autosave_init (HlWindow *self)
{
  self->autosave = hl_autosave_new (NULL);
}

void
hl_window_autosave_update (HlWindow *self)
{
  if (self->autosave == NULL)
    return;
  g_clear_handle_id (&self->autosave_timer, g_source_remove);
  if (!hl_document_get_modified (self->document))
    {
      /* saved, reloaded, replaced, or undone back to the file */
      hl_autosave_discard (self->autosave);
      return;
    }
  /* restarted by each change: the copy is written once typing pauses */
  self->autosave_timer = g_timeout_add_seconds (delay_seconds (), on_autosave_timeout_cb, self);
}

void
hl_window_autosave_finish (HlWindow *self)
{
  g_clear_handle_id (&self->autosave_timer, g_source_remove);
  if (self->autosave == NULL)
    return;
  hl_autosave_discard (self->autosave);
  g_clear_pointer (&self->autosave, hl_autosave_free);
}

void
hl_window_restore (HlWindow   *self,
                   HlDocument *document)
{
  g_return_if_fail (HL_IS_WINDOW (self));
  g_return_if_fail (HL_IS_DOCUMENT (document));

  hl_window_set_document (self, document);
  hl_window_autosave_now (self);
}

void
hl_window_autosave_keep (HlWindow *self)
{
  if (self->autosave == NULL || self->document == NULL || !hl_document_get_modified (self->document))
    {
      hl_window_autosave_finish (self);
      return;
    }
  hl_window_autosave_now (self);
  /* let go of the slot without discarding it: its writer is about to be
   * gone, which makes it a copy to offer */
  g_clear_pointer (&self->autosave, hl_autosave_free);
}
