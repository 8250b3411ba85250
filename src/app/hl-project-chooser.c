/* hl-project-chooser.c — the file choosers and questions for project files
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-project-chooser"

#include "hl-config.h"
#include "hl-project-chooser.h"

#include <glib/gi18n.h>

#define MAX_RECENT 8

static GtkFileFilter *
project_filter (void)
{
  GtkFileFilter *filter = gtk_file_filter_new ();

  gtk_file_filter_set_name (filter, _("Hoopline projects"));
  gtk_file_filter_add_mime_type (filter, "application/x-hoopline-project");
  gtk_file_filter_add_pattern (filter, "*.hoop");
  return filter;
}

GtkFileChooserNative *
hl_project_chooser_new (GtkWindow  *parent,
                        gboolean    save,
                        GFile      *current,
                        const char *title)
{
  g_autoptr(GtkFileFilter) filter = project_filter ();
  GtkFileChooserNative *chooser;

  if (save)
    chooser = gtk_file_chooser_native_new (_("Save Project"), parent, GTK_FILE_CHOOSER_ACTION_SAVE,
                                           _("_Save"), _("_Cancel"));
  else
    chooser = gtk_file_chooser_native_new (_("Open Project"), parent, GTK_FILE_CHOOSER_ACTION_OPEN,
                                           _("_Open"), _("_Cancel"));
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (chooser), filter);
  if (save && current != NULL)
    gtk_file_chooser_set_file (GTK_FILE_CHOOSER (chooser), current, NULL);
  else if (save)
    {
      g_autofree char *name = g_strdup_printf ("%s.hoop", title);

      gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (chooser), name);
    }
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (chooser), TRUE);
  return chooser;
}

GFile *
hl_project_chooser_get_file (GtkNativeDialog *chooser,
                             gboolean         save,
                             gboolean        *extension_added)
{
  GFile *file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (chooser));
  g_autofree char *path = file != NULL ? g_file_get_path (file) : NULL;

  if (extension_added != NULL)
    *extension_added = FALSE;
  /* the file type is known by its extension */
  if (save && path != NULL && !g_str_has_suffix (path, ".hoop"))
    {
      g_autofree char *with = g_strconcat (path, ".hoop", NULL);

      g_object_unref (file);
      file = g_file_new_for_path (with);
      if (extension_added != NULL)
        *extension_added = TRUE;
    }
  return file;
}

GtkWidget *
hl_save_question_new (GtkWindow  *parent,
                      const char *question,
                      const char *detail,
                      const char *accept_label)
{
  GtkWidget *dialog = gtk_message_dialog_new (parent, GTK_DIALOG_MODAL | GTK_DIALOG_DESTROY_WITH_PARENT,
                                              GTK_MESSAGE_WARNING, GTK_BUTTONS_NONE, "%s", question);

  gtk_message_dialog_format_secondary_text (GTK_MESSAGE_DIALOG (dialog), "%s", detail);
  gtk_dialog_add_button (GTK_DIALOG (dialog), _("_Cancel"), GTK_RESPONSE_CANCEL);
  gtk_widget_add_css_class (gtk_dialog_add_button (GTK_DIALOG (dialog), accept_label, GTK_RESPONSE_ACCEPT),
                            "destructive-action");
  /* Enter must not overwrite anything: the safe answer is the default */
  gtk_dialog_set_default_response (GTK_DIALOG (dialog), GTK_RESPONSE_CANCEL);
  return dialog;
}

GtkWidget *
hl_unsaved_question_new (GtkWindow  *parent,
                         const char *title)
{
  GtkWidget *dialog, *discard;

  dialog = gtk_message_dialog_new (parent, GTK_DIALOG_MODAL | GTK_DIALOG_DESTROY_WITH_PARENT,
                                   GTK_MESSAGE_QUESTION, GTK_BUTTONS_NONE,
                                   _("Save changes to “%s”?"), title);
  gtk_message_dialog_format_secondary_text (GTK_MESSAGE_DIALOG (dialog), "%s",
                                            _("Changes that are not saved will be lost."));
  gtk_dialog_add_button (GTK_DIALOG (dialog), _("_Cancel"), GTK_RESPONSE_CANCEL);
  discard = gtk_dialog_add_button (GTK_DIALOG (dialog), _("_Discard"), GTK_RESPONSE_REJECT);
  gtk_widget_add_css_class (discard, "destructive-action");
  gtk_widget_add_css_class (gtk_dialog_add_button (GTK_DIALOG (dialog), _("_Save"), GTK_RESPONSE_ACCEPT),
                            "suggested-action");
  gtk_dialog_set_default_response (GTK_DIALOG (dialog), GTK_RESPONSE_ACCEPT);
  return dialog;
}

static void
rebuild_recent (GMenu *section)
{
  GtkRecentManager *manager = gtk_recent_manager_get_default ();
  GList *items = gtk_recent_manager_get_items (manager);
  guint n = 0;

  g_menu_remove_all (section);
  for (GList *l = items; l != NULL && n < MAX_RECENT; l = l->next)
    {
      GtkRecentInfo *info = l->data;
      const char *uri = gtk_recent_info_get_uri (info);
      g_autoptr(GMenuItem) item = NULL;

      if (!g_str_has_suffix (uri, ".hoop") || !gtk_recent_info_exists (info))
        continue;
      item = g_menu_item_new (gtk_recent_info_get_display_name (info), NULL);
      g_menu_item_set_action_and_target_value (item, "win.open-recent", g_variant_new_string (uri));
      g_menu_append_item (section, item);
      n++;
    }
  g_list_free_full (items, (GDestroyNotify) gtk_recent_info_unref);
}

static void
on_recent_changed_cb (GtkRecentManager *manager,
                      GMenu            *section)
{
  rebuild_recent (section);
}

void
hl_recent_menu_bind (GMenu    *section,
                     gpointer  owner)
{
  g_return_if_fail (G_IS_MENU (section));

  g_signal_connect_object (gtk_recent_manager_get_default (), "changed",
                           G_CALLBACK (on_recent_changed_cb), section, 0);
  g_object_set_data_full (G_OBJECT (owner), "hl-recent-section", g_object_ref (section), g_object_unref);
  rebuild_recent (section);
}

void
hl_recent_menu_remember (GFile *file)
{
  g_autofree char *uri = g_file_get_uri (file);

  gtk_recent_manager_add_item (gtk_recent_manager_get_default (), uri);
}
