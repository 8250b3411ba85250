/* hl-shell-editor.h — the selected shell's inputs, in groups
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"
#include "hl-quantity-row.h"

G_BEGIN_DECLS

#define HL_TYPE_SHELL_EDITOR (hl_shell_editor_get_type ())
G_DECLARE_FINAL_TYPE (HlShellEditor, hl_shell_editor, HL, SHELL_EDITOR, GtkBox)

void           hl_shell_editor_set_document (HlShellEditor *self,
                                             HlDocument    *document);
void           hl_shell_editor_focus_name   (HlShellEditor *self);
/* the row of @field ("wall-thickness"), for tests and focus */
HlQuantityRow *hl_shell_editor_get_row      (HlShellEditor *self,
                                             const char    *field);
/* For tests: the name fields, the "used by N shells" note of the
 * material (NULL while one shell uses it) and the "this shell only"
 * choice beside it. */
GtkEditable   *hl_shell_editor_get_name_entry          (HlShellEditor *self);
GtkEditable   *hl_shell_editor_get_material_name_entry (HlShellEditor *self);
const char    *hl_shell_editor_get_material_users_text (HlShellEditor *self);
GtkWidget     *hl_shell_editor_get_material_scope      (HlShellEditor *self);

G_END_DECLS
