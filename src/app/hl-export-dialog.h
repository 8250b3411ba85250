/* hl-export-dialog.h — choosing where to export, the format and the size
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"
#include "hl-export-job.h"

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

G_END_DECLS
