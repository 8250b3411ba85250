/* hl-recent-menu.h — the Open Recent menu of project files
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

G_BEGIN_DECLS

/* Keeps @section listing the recent .hoop files as win.open-recent
 * items for as long as @owner lives. */
void hl_recent_menu_bind     (GMenu    *section,
                              gpointer  owner);
void hl_recent_menu_remember (GFile    *file);

G_END_DECLS
