/* hl-window.h — the main window: sidebar, canvas, results
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-canvas.h"
#include "hl-document.h"
#include "hl-checks-table.h"
#include "hl-results-table.h"
#include "hl-shell-editor.h"

G_BEGIN_DECLS

#define HL_TYPE_WINDOW (hl_window_get_type ())
G_DECLARE_FINAL_TYPE (HlWindow, hl_window, HL, WINDOW, GtkApplicationWindow)

HlWindow       *hl_window_new               (GtkApplication *application);

HlDocument     *hl_window_get_document      (HlWindow *self);
/* Loads @file here; a bad file leaves the project as it was and says
 * why in the window.  Returns FALSE then. */
gboolean        hl_window_load_file         (HlWindow *self,
                                             GFile    *file);
/* no file, no edits: a new window may reuse it */
gboolean        hl_window_is_pristine       (HlWindow *self);
gboolean        hl_window_shows_file        (HlWindow *self,
                                             GFile    *file);

/* Shows @text in the banner over the window until it is closed or the
 * project changes. */
void            hl_window_show_message      (HlWindow       *self,
                                             GtkMessageType  type,
                                             const char     *text);
/* Shows the recovered @document and keeps it in this run's
 * crash-recovery copy at once, so the copy it came from can go. */
void            hl_window_restore           (HlWindow   *self,
                                             HlDocument *document);

/* The session ends now (SIGTERM, SIGINT): unsaved work is kept as a
 * crash-recovery copy for the next start and the window goes without
 * asking. */
void            hl_window_end_session       (HlWindow *self);

/* For tests: the parts and the state a person would look at. */
HlShellEditor  *hl_window_get_shell_editor  (HlWindow *self);
HlChecksTable  *hl_window_get_checks_table  (HlWindow *self);
HlResultsTable *hl_window_get_results_table (HlWindow *self);
HlCanvas       *hl_window_get_canvas        (HlWindow *self);
/* the unsaved-changes question while it is open, else NULL */
GtkWidget      *hl_window_get_question      (HlWindow *self);
/* the problem shown in the banner over the window, or NULL */
const char     *hl_window_get_message       (HlWindow *self);
/* the short notice shown now ("Exported …", "Saved …"), or NULL */
const char     *hl_window_get_toast         (HlWindow *self);
/* the notice that the file changed on disk while it shows, else NULL */
const char     *hl_window_get_disk_notice   (HlWindow *self);

G_END_DECLS
