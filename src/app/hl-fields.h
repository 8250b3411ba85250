/* hl-fields.h — human names of the input fields
 *
 * The core names every field by its project-file element
 * ("wall-thickness"); the window shows the same field by a translated
 * label, so messages from the core can point at what the user sees.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* Translated label of @field, or @field itself when unknown. */
const char *hl_field_label  (const char *field);

/* TRUE when the user's locale writes numbers with a decimal comma. */
gboolean    hl_locale_decimal_comma (void);

/* @value as the field shows it: exact, in the user's locale. */
char       *hl_format_field_number  (double value);

G_END_DECLS
