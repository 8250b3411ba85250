/* hl-material-group.h — the selected shell's material: choice, scope, values
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"
#include "hl-quantity-row.h"

G_BEGIN_DECLS

#define HL_TYPE_MATERIAL_GROUP (hl_material_group_get_type ())
G_DECLARE_FINAL_TYPE (HlMaterialGroup, hl_material_group, HL, MATERIAL_GROUP, GtkBox)

void           hl_material_group_set_document (HlMaterialGroup *self,
                                               HlDocument      *document);

GtkEditable   *hl_material_group_get_name_entry (HlMaterialGroup *self);
/* "Used by N shells …" while the material is shared, else NULL */
const char    *hl_material_group_get_users_text (HlMaterialGroup *self);
/* the "this shell only" choice */
GtkWidget     *hl_material_group_get_scope      (HlMaterialGroup *self);

G_END_DECLS
