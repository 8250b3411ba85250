/* hl-project-chooser.c — the file choosers for project files
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-project-chooser"

#include "hl-config.h"
#include "hl-project-chooser.h"

#include <glib/gi18n.h>

/* GtkFileChooserNative is deprecated from GTK 4.10 in favour of
 * GtkFileDialog, which GTK 4.8 (Debian 12) does not have yet; it stays
 * until the oldest supported GTK offers the replacement. */

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
