/* hl-window-files.c — the window's file commands and the unsaved-changes
 * question
 *
 * Anything that would drop unsaved work goes through ask_unsaved_then(),
 * which runs the command at once or after the user's answer.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-window"

#include "hl-config.h"
#include "hl-window-private.h"
#include "hl-project-chooser.h"

#include <glib/gi18n.h>

static void save_as (HlWindow *self);

/* ---- unsaved work ------------------------------------------------- */

static void
run_pending (HlWindow *self)
{
  HlContinuation k = self->pending;
  g_autoptr(GFile) file = g_steal_pointer (&self->pending_file);

  self->pending = NULL;
  if (k != NULL)
    k (self, file);
}

static gboolean
save_now (HlWindow *self,
          GFile    *file)
{
  g_autoptr(GError) error = NULL;

  if (!hl_document_save (self->document, file, &error))
    {
      GtkWidget *dialog = gtk_message_dialog_new (GTK_WINDOW (self), GTK_DIALOG_MODAL | GTK_DIALOG_DESTROY_WITH_PARENT,
                                                  GTK_MESSAGE_ERROR, GTK_BUTTONS_CLOSE,
                                                  "%s", _("The project was not saved"));

      gtk_message_dialog_format_secondary_text (GTK_MESSAGE_DIALOG (dialog), "%s", error->message);
      g_signal_connect (dialog, "response", G_CALLBACK (gtk_window_destroy), NULL);
      gtk_window_present (GTK_WINDOW (dialog));
      /* a failed save never continues into close or open */
      self->pending = NULL;
      g_clear_object (&self->pending_file);
      return FALSE;
    }
  hl_recent_menu_remember (hl_document_get_file (self->document));
  return TRUE;
}

static void
on_question_response_cb (GtkDialog *dialog,
                         int        response,
                         HlWindow  *self)
{
  /* the answer may close this window while the signal still holds the
   * dialog: it must not point at a window that is gone */
  gtk_window_set_transient_for (GTK_WINDOW (dialog), NULL);
  gtk_window_destroy (GTK_WINDOW (dialog));
  self->question = NULL;

  switch (response)
    {
    case GTK_RESPONSE_ACCEPT:
      if (hl_document_get_file (self->document) == NULL)
        save_as (self);              /* continues after the save */
      else if (save_now (self, NULL))
        run_pending (self);
      break;
    case GTK_RESPONSE_REJECT:
      run_pending (self);
      break;
    default:
      self->pending = NULL;
      g_clear_object (&self->pending_file);
      break;
    }
}

/* Runs @k at once when nothing would be lost, else after the user has
 * chosen to save or to discard. */
static void
ask_unsaved_then (HlWindow     *self,
                  HlContinuation k,
                  GFile        *file)
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
      run_pending (self);
      return;
    }
  dialog = hl_unsaved_question_new (GTK_WINDOW (self), hl_document_get_title (self->document));
  g_signal_connect (dialog, "response", G_CALLBACK (on_question_response_cb), self);
  self->question = dialog;
  gtk_window_present (GTK_WINDOW (dialog));
}

/* ---- file commands ------------------------------------------------ */

gboolean
hl_window_load_file (HlWindow *self,
                     GFile    *file)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GPtrArray) warnings = NULL;

  g_return_val_if_fail (HL_IS_WINDOW (self), FALSE);
  g_return_val_if_fail (G_IS_FILE (file), FALSE);

  if (!hl_document_load (self->document, file, &warnings, &error))
    {
      /* TRANSLATORS: %s is the loader's message, with file and line */
      g_autofree char *text = g_strdup_printf (_("The project could not be opened. %s"), error->message);

      hl_window_show_message (self, GTK_MESSAGE_ERROR, text);
      return FALSE;
    }
  hl_window_hide_message (self);
  if (warnings != NULL && warnings->len > 0)
    {
      g_ptr_array_add (warnings, NULL);
      {
        g_autofree char *joined = g_strjoinv ("\n", (char **) warnings->pdata);

        hl_window_show_message (self, GTK_MESSAGE_WARNING, joined);
      }
    }
  hl_recent_menu_remember (file);
  return TRUE;
}

static void
load_continuation (HlWindow *self,
                   GFile    *file)
{
  if (file != NULL)
    hl_window_load_file (self, file);
}

static void
new_continuation (HlWindow *self,
                  GFile    *file)
{
  g_autoptr(HlDocument) document = hl_window_new_document (self);

  hl_window_set_document (self, document);
}

static void
close_continuation (HlWindow *self,
                    GFile    *file)
{
  self->close_confirmed = TRUE;
  gtk_window_close (GTK_WINDOW (self));
}

static void
on_open_chooser_response_cb (GtkNativeDialog *chooser,
                             int              response,
                             HlWindow        *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr(GFile) file = hl_project_chooser_get_file (chooser, FALSE);

      hl_window_load_file (self, file);
    }
  g_clear_object (&self->chooser);
}

static void
open_chooser_continuation (HlWindow *self,
                           GFile    *file)
{
  GtkFileChooserNative *chooser = hl_project_chooser_new (GTK_WINDOW (self), FALSE, NULL, NULL);

  g_signal_connect (chooser, "response", G_CALLBACK (on_open_chooser_response_cb), self);
  g_clear_object (&self->chooser);
  self->chooser = GTK_NATIVE_DIALOG (chooser);
  gtk_native_dialog_show (self->chooser);
}

static void
on_save_chooser_response_cb (GtkNativeDialog *chooser,
                             int              response,
                             HlWindow        *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr(GFile) file = hl_project_chooser_get_file (chooser, TRUE);

      if (save_now (self, file))
        run_pending (self);
    }
  else
    {
      self->pending = NULL;
      g_clear_object (&self->pending_file);
    }
  g_clear_object (&self->chooser);
}

static void
save_as (HlWindow *self)
{
  GtkFileChooserNative *chooser = hl_project_chooser_new (GTK_WINDOW (self), TRUE,
                                                         hl_document_get_file (self->document),
                                                         hl_document_get_title (self->document));

  g_signal_connect (chooser, "response", G_CALLBACK (on_save_chooser_response_cb), self);
  g_clear_object (&self->chooser);
  self->chooser = GTK_NATIVE_DIALOG (chooser);
  gtk_native_dialog_show (self->chooser);
}

/* ---- actions ------------------------------------------------------ */

static void
new_activated (GSimpleAction *action,
               GVariant      *param,
               gpointer       user_data)
{
  ask_unsaved_then (HL_WINDOW (user_data), new_continuation, NULL);
}

static void
open_activated (GSimpleAction *action,
                GVariant      *param,
                gpointer       user_data)
{
  ask_unsaved_then (HL_WINDOW (user_data), open_chooser_continuation, NULL);
}

/* "open-file" with a path or URI: the same as dropping the file on the
 * window; recent files come this way too */
static void
open_file_activated (GSimpleAction *action,
                     GVariant      *param,
                     gpointer       user_data)
{
  g_autoptr(GFile) file = g_file_new_for_commandline_arg (g_variant_get_string (param, NULL));

  ask_unsaved_then (HL_WINDOW (user_data), load_continuation, file);
}

static void
save_activated (GSimpleAction *action,
                GVariant      *param,
                gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);

  if (hl_document_get_file (self->document) == NULL)
    save_as (self);
  else
    save_now (self, NULL);
}

/* "save-to" with a path: saving without the chooser (tests, scripts) */
static void
save_to_activated (GSimpleAction *action,
                   GVariant      *param,
                   gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  g_autoptr(GFile) file = g_file_new_for_commandline_arg (g_variant_get_string (param, NULL));

  save_now (self, file);
}

static void
save_as_activated (GSimpleAction *action,
                   GVariant      *param,
                   gpointer       user_data)
{
  save_as (HL_WINDOW (user_data));
}

static const GActionEntry file_entries[] = {
  { "new", new_activated },
  { "open", open_activated },
  { "open-recent", open_file_activated, "s" },
  { "open-file", open_file_activated, "s" },
  { "save", save_activated },
  { "save-to", save_to_activated, "s" },
  { "save-as", save_as_activated },
};

void
hl_window_open_when_safe (HlWindow *self,
                          GFile    *file)
{
  ask_unsaved_then (self, load_continuation, file);
}

void
hl_window_add_file_actions (HlWindow *self)
{
  g_action_map_add_action_entries (G_ACTION_MAP (self), file_entries, G_N_ELEMENTS (file_entries), self);
}

gboolean
hl_window_ask_before_close (HlWindow *self)
{
  if (self->close_confirmed || !hl_document_get_modified (self->document))
    return FALSE;
  ask_unsaved_then (self, close_continuation, NULL);
  return TRUE;
}
