/* hl-shell-item.h — one shell of the open document, as a list item
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gio/gio.h>

#include "hl-shell.h"

G_BEGIN_DECLS

#define HL_TYPE_SHELL_ITEM (hl_shell_item_get_type ())
G_DECLARE_FINAL_TYPE (HlShellItem, hl_shell_item, HL, SHELL_ITEM, GObject)

/* The document's list of shells (hl_document_get_shells) holds these;
 * an item keeps its identity while its shell is edited, and notifies
 * "name" or "form" only when that changed. */
HlShellItem *hl_shell_item_new      (const HlShellInputs *shell);
const char  *hl_shell_item_get_id   (HlShellItem *self);
const char  *hl_shell_item_get_name (HlShellItem *self);
HlForm       hl_shell_item_get_form (HlShellItem *self);
/* takes the shell's id, name and form; notifies what changed */
void         hl_shell_item_update   (HlShellItem         *self,
                                     const HlShellInputs *shell);

G_END_DECLS
