/* hl-export-dialog.h — choosing where to export, then what goes in it
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"
#include "hl-export-options.h"

G_BEGIN_DECLS

/* Shows the save chooser, then the export options for the chosen name;
 * calls @done only when the user accepts both.  @settings keeps the
 * options (may be NULL). */
void  hl_export_dialog_present (GtkWindow          *parent,
                                HlDocument         *document,
                                GSettings          *settings,
                                const char         *stem,
                                HlExportChosenFunc  done,
                                gpointer            user_data);

G_END_DECLS
