/* hl-export-dialog.h — choosing where to export, the format and the size
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"

G_BEGIN_DECLS

/* @size is "WxH" (pixels for PNG, points for SVG and PDF) or "" */
typedef void (*HlExportChosenFunc) (const char *path,
                                    const char *size,
                                    gpointer    user_data);

/* Shows the save chooser; calls @done only when the user accepts. */
void  hl_export_dialog_present (GtkWindow          *parent,
                                const char         *stem,
                                HlExportChosenFunc  done,
                                gpointer            user_data);

/* The "WxH" of a size preset for the format of @path, or NULL for
 * "custom".  Presets: "a4-landscape", "a4-portrait", "1920x1080". */
char *hl_export_preset_size    (const char *preset,
                                const char *path);

/* Writes @path from the document as the command line would: a figure
 * or table of the selected shell, the report of every shell.  @size as
 * above, or NULL or "" for the default. */
gboolean hl_export_document    (HlDocument  *document,
                                const char  *path,
                                const char  *size,
                                GError     **error);

G_END_DECLS
