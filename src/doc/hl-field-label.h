/* hl-field-label.h — the user's name of an input field
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* the field table's label in the user's language, for any element name
 * of the file ("wall-thickness"); the element itself when unknown */
const char *hl_field_label (const char *field);

G_END_DECLS
