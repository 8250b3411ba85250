/* hl-fields.h — human names of the input fields
 *
 * The core names every field by its project-file element
 * ("wall-thickness"); the window shows the same field by a translated
 * label, so messages from the core can point at what the user sees.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-field-label.h"

G_BEGIN_DECLS

/* TRUE when the user's locale writes numbers with a decimal comma. */
gboolean    hl_locale_decimal_comma (void);

/* @value as the field shows it: exact, in the user's locale. */
char       *hl_format_field_number  (double value);

/* Keeps what the user types or pastes into @editable (an entry) within
 * @max_chars characters and @max_bytes bytes of UTF-8 (0: no such
 * limit), so a text the file could not hold cannot be entered: what
 * passes the limit is cut at the last whole character that fits.  With
 * @one_line, control characters (a pasted line break, a tab) become
 * spaces. */
void        hl_fields_limit_editable    (GtkEditable   *editable,
                                         glong          max_chars,
                                         gsize          max_bytes,
                                         gboolean       one_line);
/* The same for a multi-line text, in characters; it keeps line breaks
 * and tabs. */
void        hl_fields_limit_text_buffer (GtkTextBuffer *buffer,
                                         glong          max_chars);

/* Items of @dropdown end in an ellipsis where they would widen it. */
void        hl_fields_ellipsize_dropdown (GtkDropDown *dropdown);

G_END_DECLS
