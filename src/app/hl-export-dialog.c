/* hl-export-dialog.c — choosing where to export, then what goes in it
 *
 * The format follows the name's extension, as on the command line; what
 * the file holds (shells, panels, size, paper) is asked once the name is
 * known, so that only the choices of that format are offered.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-export-dialog"

#include "hl-config.h"
#include "hl-export-dialog.h"
#include "hl-export.h"

#include <glib/gi18n.h>

typedef struct
{
  GtkWindow          *parent;
  HlDocument         *document;
  GSettings          *settings;
  HlExportChosenFunc  done;
  gpointer            user_data;
} Request;

static void
request_free (Request *r)
{
  g_clear_object (&r->parent);
  g_clear_object (&r->document);
  g_clear_object (&r->settings);
  g_free (r);
}

static void
on_chooser_response_cb (GtkNativeDialog *chooser,
                        int              response,
                        Request         *r)
{
  g_autoptr(GFile) file = NULL;
  g_autofree char *path = NULL;

  if (response == GTK_RESPONSE_ACCEPT)
    {
      file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (chooser));
      path = file != NULL ? g_file_get_path (file) : NULL;
    }
  if (path != NULL)
    gtk_window_present (GTK_WINDOW (hl_export_options_new (r->parent, r->document, r->settings, path, r->done,
                                                           r->user_data)));
  request_free (r);
  g_object_unref (chooser);
}

static void
add_filter (GtkFileChooser *chooser,
            const char     *name,
            const char     *pattern)
{
  g_autoptr(GtkFileFilter) filter = gtk_file_filter_new ();

  gtk_file_filter_set_name (filter, name);
  gtk_file_filter_add_pattern (filter, pattern);
  gtk_file_chooser_add_filter (chooser, filter);
}

void
hl_export_dialog_present (GtkWindow          *parent,
                          HlDocument         *document,
                          GSettings          *settings,
                          const char         *stem,
                          HlExportChosenFunc  done,
                          gpointer            user_data)
{
  GtkFileChooserNative *chooser;
  Request *r = g_new0 (Request, 1);
  g_autofree char *name = g_strdup_printf ("%s.pdf", stem);
  g_autoptr(GtkFileFilter) all = gtk_file_filter_new ();

  r->parent = g_object_ref (parent);
  r->document = g_object_ref (document);
  r->settings = settings != NULL ? g_object_ref (settings) : NULL;
  r->done = done;
  r->user_data = user_data;

  chooser = gtk_file_chooser_native_new (_("Export"), parent, GTK_FILE_CHOOSER_ACTION_SAVE,
                                         _("_Next"), _("_Cancel"));
  gtk_file_filter_set_name (all, _("All export formats"));
  for (const char *const *p = (const char *const[]) { "*.pdf", "*.svg", "*.png", "*.csv", "*.txt", NULL }; *p; p++)
    gtk_file_filter_add_pattern (all, *p);
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (chooser), all);
  add_filter (GTK_FILE_CHOOSER (chooser), _("PDF figure and calculation sheet (*.pdf)"), "*.pdf");
  add_filter (GTK_FILE_CHOOSER (chooser), _("SVG figure (*.svg)"), "*.svg");
  add_filter (GTK_FILE_CHOOSER (chooser), _("PNG image (*.png)"), "*.png");
  add_filter (GTK_FILE_CHOOSER (chooser), _("Through-thickness table (*.csv)"), "*.csv");
  add_filter (GTK_FILE_CHOOSER (chooser), _("Calculation report (*.txt)"), "*.txt");
  gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (chooser), name);
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (chooser), TRUE);
  g_signal_connect (chooser, "response", G_CALLBACK (on_chooser_response_cb), r);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (chooser));
}
