/* hl-project-chooser.h — the file choosers for project files
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

G_BEGIN_DECLS

/* An open or save chooser for .hoop files; a save chooser starts at
 * @current or, without it, suggests "@title.hoop". */
GtkFileChooserNative *hl_project_chooser_new      (GtkWindow  *parent,
                                                   gboolean    save,
                                                   GFile      *current,
                                                   const char *title);
/* The chosen file; a name saved without extension gets ".hoop", and
 * then @extension_added (nullable) is TRUE: the chooser's own question
 * about replacing a file was about the name without it. */
GFile                *hl_project_chooser_get_file (GtkNativeDialog *chooser,
                                                   gboolean         save,
                                                   gboolean        *extension_added);

G_END_DECLS
