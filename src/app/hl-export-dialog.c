/* hl-export-dialog.c — choosing where to export, the format and the size
 *
 * The format follows the name's extension, as on the command line; the
 * size is a choice inside the save chooser, and "Custom" asks for it.
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
  HlExportChosenFunc  done;
  gpointer            user_data;
  char               *path;
  GtkSpinButton      *width;
  GtkSpinButton      *height;
} Request;

static void
request_free (Request *r)
{
  g_clear_object (&r->parent);
  g_free (r->path);
  g_free (r);
}

static void
on_custom_response_cb (GtkDialog *dialog,
                       int        response,
                       Request   *r)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autofree char *size = g_strdup_printf ("%dx%d", gtk_spin_button_get_value_as_int (r->width),
                                               gtk_spin_button_get_value_as_int (r->height));

      r->done (r->path, size, r->user_data);
    }
  gtk_window_destroy (GTK_WINDOW (dialog));
  request_free (r);
}

static GtkWidget *
spin_row (GtkGrid       *grid,
          int            line,
          const char    *label,
          double         value,
          GtkSpinButton **out)
{
  GtkWidget *name = gtk_label_new_with_mnemonic (label);
  GtkWidget *spin = gtk_spin_button_new_with_range (HL_EXPORT_SIZE_MIN, HL_EXPORT_SIZE_MAX, 1);

  gtk_spin_button_set_value (GTK_SPIN_BUTTON (spin), value);
  gtk_label_set_mnemonic_widget (GTK_LABEL (name), spin);
  gtk_label_set_xalign (GTK_LABEL (name), 0);
  gtk_grid_attach (grid, name, 0, line, 1, 1);
  gtk_grid_attach (grid, spin, 1, line, 1, 1);
  *out = GTK_SPIN_BUTTON (spin);
  return spin;
}

static void
ask_custom_size (Request *r)
{
  gboolean png = hl_export_format_for_path (r->path) == HL_EXPORT_PNG;
  GtkWidget *dialog = gtk_dialog_new_with_buttons (_("Figure Size"), r->parent,
                                                   GTK_DIALOG_MODAL | GTK_DIALOG_DESTROY_WITH_PARENT
                                                   | GTK_DIALOG_USE_HEADER_BAR,
                                                   _("_Cancel"), GTK_RESPONSE_CANCEL,
                                                   _("_Export"), GTK_RESPONSE_ACCEPT, NULL);
  GtkWidget *content = gtk_dialog_get_content_area (GTK_DIALOG (dialog));
  GtkWidget *grid = gtk_grid_new ();
  GtkWidget *hint = gtk_label_new (png ? _("Size in pixels.") : _("Size in points (1/72 inch)."));

  gtk_grid_set_row_spacing (GTK_GRID (grid), 6);
  gtk_grid_set_column_spacing (GTK_GRID (grid), 12);
  g_object_set (grid, "margin-start", 18, "margin-end", 18, "margin-top", 18, "margin-bottom", 18, NULL);
  spin_row (GTK_GRID (grid), 0, _("_Width"), HL_EXPORT_DEFAULT_WIDTH * (png ? HL_EXPORT_PNG_SCALE : 1), &r->width);
  spin_row (GTK_GRID (grid), 1, _("_Height"), HL_EXPORT_DEFAULT_HEIGHT * (png ? HL_EXPORT_PNG_SCALE : 1), &r->height);
  gtk_label_set_xalign (GTK_LABEL (hint), 0);
  gtk_widget_add_css_class (hint, "dim-label");
  gtk_grid_attach (GTK_GRID (grid), hint, 0, 2, 2, 1);
  gtk_box_append (GTK_BOX (content), grid);
  gtk_dialog_set_default_response (GTK_DIALOG (dialog), GTK_RESPONSE_ACCEPT);
  g_signal_connect (dialog, "response", G_CALLBACK (on_custom_response_cb), r);
  gtk_window_present (GTK_WINDOW (dialog));
}

static void
on_chooser_response_cb (GtkNativeDialog *chooser,
                        int              response,
                        Request         *r)
{
  g_autoptr(GFile) file = NULL;
  g_autofree char *size = NULL;
  const char *preset;

  if (response != GTK_RESPONSE_ACCEPT)
    goto out;
  file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (chooser));
  r->path = g_file_get_path (file);
  if (r->path == NULL)
    goto out;
  preset = gtk_file_chooser_get_choice (GTK_FILE_CHOOSER (chooser), "size");
  if (g_strcmp0 (preset, "custom") == 0 && hl_export_format_for_path (r->path) >= HL_EXPORT_SVG
      && hl_export_format_for_path (r->path) != HL_EXPORT_UNKNOWN)
    {
      ask_custom_size (g_steal_pointer (&r));
      goto out;
    }
  size = hl_export_preset_size (preset, r->path);
  r->done (r->path, size != NULL ? size : "", r->user_data);

out:
  if (r != NULL)
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
                          const char         *stem,
                          HlExportChosenFunc  done,
                          gpointer            user_data)
{
  static const char *ids[] = { "a4-landscape", "a4-portrait", "1920x1080", "custom", NULL };
  const char *labels[] = { _("A4 landscape"), _("A4 portrait"), _("1920 × 1080"), _("Custom…"), NULL };
  GtkFileChooserNative *chooser;
  Request *r = g_new0 (Request, 1);
  g_autofree char *name = g_strdup_printf ("%s.pdf", stem);
  g_autoptr(GtkFileFilter) all = gtk_file_filter_new ();

  r->parent = g_object_ref (parent);
  r->done = done;
  r->user_data = user_data;

  chooser = gtk_file_chooser_native_new (_("Export"), parent, GTK_FILE_CHOOSER_ACTION_SAVE,
                                         _("_Export"), _("_Cancel"));
  gtk_file_filter_set_name (all, _("All export formats"));
  for (const char *const *p = (const char *const[]) { "*.pdf", "*.svg", "*.png", "*.csv", "*.txt", NULL }; *p; p++)
    gtk_file_filter_add_pattern (all, *p);
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (chooser), all);
  add_filter (GTK_FILE_CHOOSER (chooser), _("PDF figure and calculation sheet (*.pdf)"), "*.pdf");
  add_filter (GTK_FILE_CHOOSER (chooser), _("SVG figure (*.svg)"), "*.svg");
  add_filter (GTK_FILE_CHOOSER (chooser), _("PNG image (*.png)"), "*.png");
  add_filter (GTK_FILE_CHOOSER (chooser), _("Through-thickness table (*.csv)"), "*.csv");
  add_filter (GTK_FILE_CHOOSER (chooser), _("Calculation report (*.txt)"), "*.txt");
  gtk_file_chooser_add_choice (GTK_FILE_CHOOSER (chooser), "size", _("Figure size"), ids, labels);
  gtk_file_chooser_set_choice (GTK_FILE_CHOOSER (chooser), "size", "a4-landscape");
  gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (chooser), name);
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (chooser), TRUE);
  g_signal_connect (chooser, "response", G_CALLBACK (on_chooser_response_cb), r);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (chooser));
}
