/* hl-window-unsaved.c — the unsaved-changes question
 *
 * A command that would drop unsaved work (new, open, close) waits here
 * as the pending continuation until the user saves, discards or
 * cancels; a save that fails or is cancelled drops it.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-window"

#include "hl-config.h"
#include "hl-window-private.h"
#include "hl-questions.h"

void
hl_window_run_pending (HlWindow *self)
{
  HlContinuation k = self->pending;
  g_autoptr(GFile) file = g_steal_pointer (&self->pending_file);

  self->pending = NULL;
  if (k != NULL)
    k (self, file);
}

void
hl_window_drop_pending (HlWindow *self)
{
  self->pending = NULL;
  g_clear_object (&self->pending_file);
  g_clear_object (&self->save_file);
}

static void
on_question_response_cb (AdwMessageDialog *dialog,
                         const char       *response,
                         HlWindow         *self)
{
  /* the answer may close this window while the signal still holds the
   * dialog: it must not point at a window that is gone */
  gtk_window_set_transient_for (GTK_WINDOW (dialog), NULL);
  gtk_window_destroy (GTK_WINDOW (dialog));
  self->question = NULL;

  if (g_strcmp0 (response, HL_QUESTION_SAVE) == 0)
    hl_window_save (self);           /* continues after the save */
  else if (g_strcmp0 (response, HL_QUESTION_DISCARD) == 0)
    hl_window_run_pending (self);
  else
    hl_window_drop_pending (self);
}

void
hl_window_ask_unsaved_then (HlWindow       *self,
                            HlContinuation  k,
                            GFile          *file)
{
  GtkWidget *dialog;

  /* one question at a time: it answers for the command that raised it */
  if (self->question != NULL)
    {
      gtk_window_present (GTK_WINDOW (self->question));
      return;
    }
  self->pending = k;
  g_set_object (&self->pending_file, file);
  if (!hl_document_get_modified (self->document))
    {
      hl_window_run_pending (self);
      return;
    }
  dialog = hl_unsaved_question_new (GTK_WINDOW (self), hl_document_get_title (self->document));
  g_signal_connect (dialog, "response", G_CALLBACK (on_question_response_cb), self);
  self->question = dialog;
  gtk_window_present (GTK_WINDOW (dialog));
}

static void
close_continuation (HlWindow *self,
                    GFile    *file)
{
  self->close_confirmed = TRUE;
  gtk_window_close (GTK_WINDOW (self));
}

gboolean
hl_window_ask_before_close (HlWindow *self)
{
  if (self->close_confirmed || !hl_document_get_modified (self->document))
    return FALSE;
  hl_window_ask_unsaved_then (self, close_continuation, NULL);
  return TRUE;
}
