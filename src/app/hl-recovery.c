/* hl-recovery.c — offering the copies a crashed run left behind
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-recovery"

#include "hl-config.h"
#include "hl-recovery.h"
#include "hl-autosave.h"
#include "hl-window.h"

#include <glib/gi18n.h>

#define STATE_KEY "hl-recovery"

typedef struct
{
  GtkApplication *application;
  GPtrArray      *entries;     /* HlAutosaveEntry *, newest first */
  guint           next;
  GtkWidget      *question;
} Recovery;

static void
recovery_free (gpointer data)
{
  Recovery *r = data;

  if (r->question != NULL)
    {
      g_object_remove_weak_pointer (G_OBJECT (r->question), (gpointer *) &r->question);
      gtk_window_destroy (GTK_WINDOW (r->question));
    }
  g_clear_pointer (&r->entries, g_ptr_array_unref);
  g_free (r);
}

static char *
format_time (GDateTime *when)
{
  g_autoptr(GDateTime) now = g_date_time_new_now_local ();

  if (g_date_time_get_year (now) == g_date_time_get_year (when)
      && g_date_time_get_day_of_year (now) == g_date_time_get_day_of_year (when))
    return g_date_time_format (when, "%H:%M");
  /* an older copy needs its day too */
  return g_date_time_format (when, "%x %H:%M");
}

static void
recover (Recovery              *r,
         const HlAutosaveEntry *entry,
         GtkWindow             *parent)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) project = hl_autosave_entry_load (entry, &error);
  g_autoptr(GFile) file = NULL;
  g_autoptr(HlDocument) document = NULL;
  HlWindow *window;

  if (project == NULL)
    {
      /* the copy stays for another try; the user is told in the window */
      g_message ("crash-recovery copy %s not loaded: %s", entry->copy_path, error->message);
      if (HL_IS_WINDOW (parent))
        {
          g_autofree char *text = g_strdup_printf (_("The unsaved changes could not be recovered. %s"),
                                                   error->message);

          hl_window_show_message (HL_WINDOW (parent), GTK_MESSAGE_ERROR, text);
        }
      return;
    }
  if (entry->original_path != NULL && entry->original_path[0] != '\0')
    file = g_file_new_for_path (entry->original_path);
  document = hl_document_new_restored (g_steal_pointer (&project), file);

  if (HL_IS_WINDOW (parent) && hl_window_is_pristine (HL_WINDOW (parent)))
    window = HL_WINDOW (parent);
  else
    window = hl_window_new (r->application);
  hl_window_restore (window, document);
  /* the work now lives in this run's copy, so the old one can go */
  hl_autosave_entry_delete (entry);
  gtk_window_present (GTK_WINDOW (window));
}

static void ask_next (Recovery  *r,
                      GtkWindow *parent);

static void
on_response_cb (AdwMessageDialog *dialog,
                const char       *response,
                Recovery         *r)
{
  GtkWindow *parent = gtk_window_get_transient_for (GTK_WINDOW (dialog));
  const HlAutosaveEntry *entry = g_ptr_array_index (r->entries, r->next);

  /* the parent outlives the question's destruction only with a reference */
  if (parent != NULL)
    g_object_ref (parent);
  g_object_remove_weak_pointer (G_OBJECT (r->question), (gpointer *) &r->question);
  r->question = NULL;
  gtk_window_destroy (GTK_WINDOW (dialog));
  r->next++;

  if (g_strcmp0 (response, HL_RECOVERY_RESPONSE_RECOVER) == 0)
    recover (r, entry, parent);
  else if (g_strcmp0 (response, HL_RECOVERY_RESPONSE_DISCARD) == 0)
    hl_autosave_entry_delete (entry);
  /* else "Later" or the question closed: the copy waits for the next start */
  ask_next (r, parent);
  g_clear_object (&parent);
}

static void
ask_next (Recovery  *r,
          GtkWindow *parent)
{
  const HlAutosaveEntry *entry;
  g_autofree char *when = NULL;
  const char *title;
  GtkWidget *dialog;
  AdwMessageDialog *question;

  if (r->next >= r->entries->len)
    return;
  entry = g_ptr_array_index (r->entries, r->next);
  when = format_time (entry->saved_at);
  title = entry->title != NULL && entry->title[0] != '\0' ? entry->title : _("Untitled project");
  if (parent == NULL)
    parent = gtk_application_get_active_window (r->application);

  dialog = adw_message_dialog_new (parent, NULL, NULL);
  question = ADW_MESSAGE_DIALOG (dialog);
  /* TRANSLATORS: project title, time of the copy */
  adw_message_dialog_format_heading (question, _("Hoopline closed unexpectedly. Recover unsaved changes to “%s” from %s?"),
                                     title, when);
  if (entry->original_path != NULL && entry->original_path[0] != '\0')
    adw_message_dialog_format_body (question, _("The project is saved as “%s”. Recovered changes are "
                                                "written there only when you save."),
                                    entry->original_path);
  else
    adw_message_dialog_set_body (question, _("The project had not been saved yet."));
  adw_message_dialog_add_responses (question,
                                    HL_RECOVERY_RESPONSE_LATER, _("_Later"),
                                    HL_RECOVERY_RESPONSE_DISCARD, _("_Discard"),
                                    HL_RECOVERY_RESPONSE_RECOVER, _("_Recover"),
                                    NULL);
  adw_message_dialog_set_response_appearance (question, HL_RECOVERY_RESPONSE_RECOVER, ADW_RESPONSE_SUGGESTED);
  adw_message_dialog_set_default_response (question, HL_RECOVERY_RESPONSE_RECOVER);
  adw_message_dialog_set_close_response (question, HL_RECOVERY_RESPONSE_LATER);
  gtk_window_set_modal (GTK_WINDOW (dialog), TRUE);
  gtk_window_set_destroy_with_parent (GTK_WINDOW (dialog), TRUE);
  g_signal_connect (dialog, "response", G_CALLBACK (on_response_cb), r);
  r->question = dialog;
  /* closed with its parent, the question must not be answered later */
  g_object_add_weak_pointer (G_OBJECT (dialog), (gpointer *) &r->question);
  gtk_window_present (GTK_WINDOW (dialog));
}

void
hl_recovery_offer (GtkApplication *application,
                   GtkWindow      *parent)
{
  Recovery *r;

  g_return_if_fail (GTK_IS_APPLICATION (application));

  if (g_object_get_data (G_OBJECT (application), STATE_KEY) != NULL)
    return;   /* asked once per run */
  r = g_new0 (Recovery, 1);
  r->application = application;
  r->entries = hl_autosave_find_orphans ();
  g_object_set_data_full (G_OBJECT (application), STATE_KEY, r, recovery_free);
  ask_next (r, parent);
}

GtkWidget *
hl_recovery_get_question (GtkApplication *application)
{
  Recovery *r = g_object_get_data (G_OBJECT (application), STATE_KEY);

  return r != NULL ? r->question : NULL;
}
