/* hl-project-chooser.h — the file choosers and questions for project files
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

/* A question before a save writes over something: @question in bold,
 * @detail below, Cancel (GTK_RESPONSE_CANCEL, the default) and
 * @accept_label (GTK_RESPONSE_ACCEPT). */
GtkWidget            *hl_save_question_new        (GtkWindow  *parent,
                                                   const char *question,
                                                   const char *detail,
                                                   const char *accept_label);

/* "Save changes to “@title”?" with Cancel, Discard (GTK_RESPONSE_REJECT)
 * and Save (GTK_RESPONSE_ACCEPT). */
GtkWidget            *hl_unsaved_question_new     (GtkWindow  *parent,
                                                   const char *title);

/* Keeps @section listing the recent .hoop files as win.open-recent
 * items for as long as @owner lives. */
void                  hl_recent_menu_bind         (GMenu      *section,
                                                   gpointer    owner);
void                  hl_recent_menu_remember     (GFile      *file);

G_END_DECLS
