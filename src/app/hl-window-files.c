/* hl-window-files.c — the window's file commands
 *
 * Anything that would drop unsaved work goes through
 * hl_window_ask_unsaved_then() (hl-window-unsaved.c), which runs the
 * command at once or after the user's answer.  A save
 * goes through save_from(), which asks before it writes over anything
 * the user may not mean to lose.  Watching the open file is in
 * hl-window-disk.c.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-window"

#include "hl-config.h"
#include "hl-window-private.h"
#include "hl-project-chooser.h"
#include "hl-questions.h"
#include "hl-recent-menu.h"
#include "hl-atomic-file.h"

#include <glib/gi18n.h>

static void save_as (HlWindow *self);

/* The questions a save may need, in the order they are asked. */
enum
{
  SAVE_STEP_NAME,      /* the chooser asked about the name without ".hoop" */
  SAVE_STEP_NEWER,     /* someone else saved the file since we read it */
  SAVE_STEP_IN_PLACE,  /* it cannot be replaced, only written over */
  SAVE_STEP_WRITE,
  SAVE_STEP_WRITE_IN_PLACE,
};

static gboolean
save_now (HlWindow *self,
          GFile    *file,
          gboolean  in_place)
{
  g_autoptr(GError) error = NULL;
  gboolean saved;

  /* the user's yes holds for this one save */
  if (in_place)
    hl_atomic_permit_in_place (g_file_peek_path (file));
  saved = hl_document_save (self->document, file, &error);
  if (in_place)
    hl_atomic_permit_in_place (NULL);
  if (!saved)
    {
      GtkWidget *dialog = hl_failure_notice_new (GTK_WINDOW (self), _("The project was not saved"), error->message);

      g_signal_connect (dialog, "response", G_CALLBACK (gtk_window_destroy), NULL);
      gtk_window_present (GTK_WINDOW (dialog));
      /* a failed save never continues into close or open */
      hl_window_drop_pending (self);
      return FALSE;
    }
  hl_recent_menu_remember (hl_document_get_file (self->document));
  /* what is on disk now is ours: its change notice must not come */
  hl_window_watch_file (self, NULL);
  {
    g_autofree char *name = g_file_get_basename (file);
    /* TRANSLATORS: %s is a file name */
    g_autofree char *text = g_strdup_printf (_("Saved “%s”."), name);

    hl_window_show_toast (self, text);
  }
  return TRUE;
}

/* the file we read was saved again by someone else (a file that is gone
 * has nothing to lose) */
static gboolean
changed_on_disk (HlWindow *self,
                 GFile    *file)
{
  g_autofree char *now = NULL;

  if (self->disk_etag == NULL || !hl_window_shows_file (self, file))
    return FALSE;
  now = hl_window_query_etag (file);
  return now != NULL && g_strcmp0 (now, self->disk_etag) != 0;
}

static void save_from (HlWindow *self,
                       GFile    *file,
                       int       step);

static void
on_save_question_response_cb (AdwMessageDialog *dialog,
                              const char       *response,
                              HlWindow         *self)
{
  g_autoptr(GFile) file = g_steal_pointer (&self->save_file);

  gtk_window_set_transient_for (GTK_WINDOW (dialog), NULL);
  gtk_window_destroy (GTK_WINDOW (dialog));
  self->question = NULL;
  if (g_strcmp0 (response, HL_QUESTION_ACCEPT) == 0)
    save_from (self, file, self->save_step);
  else
    hl_window_drop_pending (self);   /* nothing written; a close or open waits too */
}

/* asks @question; on yes the save of @file goes on at @next */
static void
ask_before_saving (HlWindow   *self,
                   GFile      *file,
                   int         next,
                   const char *question,
                   const char *detail,
                   const char *accept_label)
{
  GtkWidget *dialog = hl_save_question_new (GTK_WINDOW (self), question, detail, accept_label);

  g_set_object (&self->save_file, file);
  self->save_step = next;
  g_signal_connect (dialog, "response", G_CALLBACK (on_save_question_response_cb), self);
  self->question = dialog;
  gtk_window_present (GTK_WINDOW (dialog));
}

static gboolean
ask_in_place (HlWindow *self,
              GFile    *file)
{
  g_autoptr(GError) error = NULL;
  g_autofree char *name = g_file_get_basename (file);
  g_autofree char *question = NULL;
  const char *detail;

  if (g_file_peek_path (file) == NULL || hl_atomic_check_replace (g_file_peek_path (file), &error))
    return FALSE;
  if (g_error_matches (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_HARD_LINKS))
    detail = _("This file has other names (hard links). Saving safely would give only this name the new "
               "project, so it can only be written over directly: all its names then show it, but a crash "
               "or a full disk during the save can leave the file damaged.");
  else if (g_error_matches (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_NO_TEMP))
    detail = _("The folder takes no new files, so the safe way of saving (a new file that replaces the old "
               "one) is not possible here. Writing over the file directly works, but a crash or a full disk "
               "during the save can leave it damaged.");
  else
    return FALSE;   /* any other reason: the save itself says it */
  /* TRANSLATORS: %s is a file name */
  question = g_strdup_printf (_("Write over “%s” directly?"), name);
  ask_before_saving (self, file, SAVE_STEP_WRITE_IN_PLACE, question, detail, _("_Write Directly"));
  return TRUE;
}

/* Saves @file (NULL: the document's), asking first where a save would
 * write over something unasked: from @step on. */
static void
save_from (HlWindow *self,
           GFile    *file,
           int       step)
{
  g_autoptr(GFile) target = g_object_ref (file != NULL ? file : hl_document_get_file (self->document));
  g_autofree char *name = g_file_get_basename (target);

  /* one question at a time: it answers for the save that raised it */
  if (self->question != NULL)
    {
      gtk_window_present (GTK_WINDOW (self->question));
      return;
    }
  if (step <= SAVE_STEP_NAME && g_file_query_exists (target, NULL))
    {
      /* TRANSLATORS: %s is a file name */
      g_autofree char *question = g_strdup_printf (_("“%s” already exists. Replace it?"), name);

      ask_before_saving (self, target, SAVE_STEP_NEWER, question,
                         _("Saving writes this project over the one in that file."), _("_Replace"));
      return;
    }
  if (step <= SAVE_STEP_NEWER && changed_on_disk (self, target))
    {
      /* TRANSLATORS: %s is a file name */
      g_autofree char *question = g_strdup_printf (_("“%s” was changed by someone else"), name);

      ask_before_saving (self, target, SAVE_STEP_IN_PLACE, question,
                         _("Since it was opened here, another program saved a newer version of this file. "
                           "Saving now replaces that version with yours, and its changes are lost."),
                         _("_Replace"));
      return;
    }
  if (step <= SAVE_STEP_IN_PLACE && ask_in_place (self, target))
    return;
  if (save_now (self, target, step == SAVE_STEP_WRITE_IN_PLACE))
    hl_window_run_pending (self);
  else
    hl_window_drop_pending (self);
}

/* ---- file commands ------------------------------------------------ */

gboolean
hl_window_load_file (HlWindow *self,
                     GFile    *file)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GPtrArray) warnings = NULL;
  g_autofree char *etag = NULL;

  g_return_val_if_fail (HL_IS_WINDOW (self), FALSE);
  g_return_val_if_fail (G_IS_FILE (file), FALSE);

  /* what saves of this file left when they were killed */
  if (g_file_peek_path (file) != NULL)
    hl_atomic_clean_leftovers (g_file_peek_path (file));
  /* taken before reading: a change in between makes the save ask once
   * too often, never once too few */
  etag = hl_window_query_etag (file);
  if (!hl_document_load (self->document, file, &warnings, &error))
    {
      /* TRANSLATORS: %s is the loader's message, with file and line */
      g_autofree char *text = g_strdup_printf (_("The project could not be opened. %s"), error->message);

      hl_window_show_message (self, GTK_MESSAGE_ERROR, text);
      return FALSE;
    }
  hl_window_hide_message (self);
  hl_window_watch_file (self, etag);
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
on_open_chooser_response_cb (GtkNativeDialog *chooser,
                             int              response,
                             HlWindow        *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr(GFile) file = hl_project_chooser_get_file (chooser, FALSE, NULL);

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
      gboolean extension_added = FALSE;
      g_autoptr(GFile) file = hl_project_chooser_get_file (chooser, TRUE, &extension_added);

      /* the chooser asked about the name as typed; with ".hoop" added
       * it is another file, which may exist */
      save_from (self, file, extension_added ? SAVE_STEP_NAME : SAVE_STEP_NEWER);
    }
  else
    hl_window_drop_pending (self);
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
  hl_window_ask_unsaved_then (HL_WINDOW (user_data), new_continuation, NULL);
}

static void
open_activated (GSimpleAction *action,
                GVariant      *param,
                gpointer       user_data)
{
  hl_window_ask_unsaved_then (HL_WINDOW (user_data), open_chooser_continuation, NULL);
}

/* "open-file" with a path or URI: the same as dropping the file on the
 * window; recent files come this way too */
static void
open_file_activated (GSimpleAction *action,
                     GVariant      *param,
                     gpointer       user_data)
{
  g_autoptr(GFile) file = g_file_new_for_commandline_arg (g_variant_get_string (param, NULL));

  hl_window_ask_unsaved_then (HL_WINDOW (user_data), load_continuation, file);
}

void
hl_window_save (HlWindow *self)
{
  if (hl_document_get_file (self->document) == NULL)
    save_as (self);              /* goes on once a file is chosen */
  else
    save_from (self, NULL, SAVE_STEP_NEWER);
}

static void
save_activated (GSimpleAction *action,
                GVariant      *param,
                gpointer       user_data)
{
  hl_window_save (HL_WINDOW (user_data));
}

/* "save-to" with a path: saving without the chooser (tests, scripts) */
static void
save_to_activated (GSimpleAction *action,
                   GVariant      *param,
                   gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  g_autoptr(GFile) file = g_file_new_for_commandline_arg (g_variant_get_string (param, NULL));

  save_from (self, file, SAVE_STEP_NEWER);
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
  hl_window_ask_unsaved_then (self, load_continuation, file);
}

void
hl_window_add_file_actions (HlWindow *self)
{
  g_action_map_add_action_entries (G_ACTION_MAP (self), file_entries, G_N_ELEMENTS (file_entries), self);
  hl_window_add_disk_actions (self);
}
