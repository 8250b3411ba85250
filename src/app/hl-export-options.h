/* hl-export-options.h — what an export holds: shells, panels, size, paper
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"
#include "hl-export-job.h"

G_BEGIN_DECLS

/* @choices are the dialog's; valid during the call */
typedef void (*HlExportChosenFunc) (const char            *path,
                                    const HlExportChoices *choices,
                                    gpointer               user_data);

#define HL_TYPE_EXPORT_OPTIONS (hl_export_options_get_type ())

G_DECLARE_FINAL_TYPE (HlExportOptions, hl_export_options, HL, EXPORT_OPTIONS, GtkWindow)

/* The options for writing @document to @path, set as last chosen (kept
 * in @settings, which may be NULL); Export calls @done and keeps the
 * choices in @settings.  The window is presented by the caller. */
HlExportOptions *hl_export_options_new (GtkWindow          *parent,
                                        HlDocument         *document,
                                        GSettings          *settings,
                                        const char         *path,
                                        HlExportChosenFunc  done,
                                        gpointer            user_data);

G_END_DECLS
