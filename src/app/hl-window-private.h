/* hl-window-private.h — what the window's source files share
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <adwaita.h>

#include "hl-autosave.h"
#include "hl-banner.h"
#include "hl-checks-table.h"
#include "hl-results-table.h"
#include "hl-shell-editor.h"
#include "hl-shell-list.h"
#include "hl-window.h"

G_BEGIN_DECLS

typedef void (*HlContinuation) (HlWindow *self,
                                GFile    *file);

struct _HlWindow
{
  GtkApplicationWindow parent_instance;

  GtkLabel       *title_label;
  GtkLabel       *subtitle_label;
  GtkMenuButton  *primary_menu_button;
  GMenu          *recent_section;
  AdwToastOverlay *toast_overlay;
  HlBanner       *info_bar;
  HlBanner       *disk_bar;      /* the open file changed on disk */
  AdwToast       *toast;         /* the one shown, while it is */
  GtkPaned       *paned;
  GtkPaned       *results_paned;
  HlShellList    *shell_list;
  HlShellEditor  *shell_editor;
  HlCanvas       *canvas;
  GtkLabel       *results_shell_label;
  HlResultsTable *results_table;
  HlChecksTable  *figure_checks;   /* under the figure */
  HlChecksTable  *results_checks;  /* above all the results */
  AdwViewStack   *view_stack;
  GtkLabel       *caution_label;

  HlDocument     *document;
  GtkWidget      *question;
  GtkNativeDialog *chooser;
  HlContinuation  pending;       /* runs once unsaved work is dealt with */
  GFile          *pending_file;
  gboolean        close_confirmed;
  HlAutosave     *autosave;      /* crash-recovery copy of unsaved edits */
  guint           autosave_timer;

  GFileMonitor   *monitor;       /* on the document's file */
  char           *disk_etag;     /* its etag when read or saved here */
  GFile          *save_file;     /* a save waiting for the user's answer */
  int             save_step;     /* where that save goes on */
};

void        hl_window_hide_message     (HlWindow       *self);
/* a short notice that goes by itself ("saved", "exported") */
void        hl_window_show_toast       (HlWindow       *self,
                                        const char     *text);
void        hl_window_set_document     (HlWindow       *self,
                                        HlDocument     *document);
HlDocument *hl_window_new_document     (HlWindow       *self);

/* hl-window-zoom.c: win.zoom-in, win.zoom-out, win.zoom-fit */
void        hl_window_add_zoom_actions (HlWindow       *self);

/* hl-window-files.c: new, open, save */
void        hl_window_add_file_actions (HlWindow       *self);
/* saves to the document's file, or asks for one first */
void        hl_window_save             (HlWindow       *self);
/* loads @file once unsaved work is saved or given up */
void        hl_window_open_when_safe   (HlWindow       *self,
                                        GFile          *file);

/* hl-window-unsaved.c: the unsaved-changes question.  Runs @k at once
 * when nothing would be lost, else after the user has chosen to save
 * or to discard */
void        hl_window_ask_unsaved_then (HlWindow       *self,
                                        HlContinuation  k,
                                        GFile          *file);
/* the command waiting for the answer goes on, or is dropped */
void        hl_window_run_pending      (HlWindow       *self);
void        hl_window_drop_pending     (HlWindow       *self);
/* TRUE when closing must wait for the user's answer */
gboolean    hl_window_ask_before_close (HlWindow       *self);

/* hl-window-disk.c: the file on disk.  Watches the document's file for
 * changes by others; @etag (nullable) is the one its content was read
 * with, else the file's etag now */
void        hl_window_watch_file       (HlWindow       *self,
                                        const char     *etag);
void        hl_window_unwatch_file     (HlWindow       *self);
/* the etag of @file now, NULL when it cannot be read */
char       *hl_window_query_etag       (GFile          *file);
/* win.disk-reload, win.disk-keep: the banner's answers */
void        hl_window_add_disk_actions (HlWindow       *self);

/* hl-window-autosave.c: the crash-recovery copy.  _update after every
 * change of the document, _now to write at once, _finish when the window
 * goes (the work was saved or given up on purpose). */
void        hl_window_autosave_init    (HlWindow       *self);
void        hl_window_autosave_update  (HlWindow       *self);
void        hl_window_autosave_now     (HlWindow       *self);
void        hl_window_autosave_finish  (HlWindow       *self);
/* the process ends without asking: unsaved work stays as a copy that
 * the next start offers */
void        hl_window_autosave_keep    (HlWindow       *self);

G_END_DECLS
