/* hl-shell-list.h — the project's shells; choosing one selects it
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"

G_BEGIN_DECLS

#define HL_TYPE_SHELL_LIST (hl_shell_list_get_type ())
G_DECLARE_FINAL_TYPE (HlShellList, hl_shell_list, HL, SHELL_LIST, GtkBox)

void hl_shell_list_set_document (HlShellList *self,
                                 HlDocument  *document);

G_END_DECLS
