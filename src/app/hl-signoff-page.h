/* hl-signoff-page.h — who prepared, checked and approved the design note
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"

G_BEGIN_DECLS

#define HL_TYPE_SIGNOFF_PAGE (hl_signoff_page_get_type ())
G_DECLARE_FINAL_TYPE (HlSignoffPage, hl_signoff_page, HL, SIGNOFF_PAGE, GtkBox)

/* A name and a date per role, applied to @document as typed (undoable);
 * a date that is not YYYY-MM-DD is marked and not applied. */
GtkWidget   *hl_signoff_page_new        (HlDocument    *document);

/* For tests */
GtkEditable *hl_signoff_page_get_name   (HlSignoffPage *self,
                                         HlSignoffRole  role);
GtkEditable *hl_signoff_page_get_date   (HlSignoffPage *self,
                                         HlSignoffRole  role);
const char  *hl_signoff_page_get_error  (HlSignoffPage *self);

G_END_DECLS
