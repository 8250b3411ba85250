/* hl-properties-dialog.h — title, engineer, description, revision notes
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"
#include "hl-signoff-page.h"

G_BEGIN_DECLS

#define HL_TYPE_PROPERTIES_DIALOG (hl_properties_dialog_get_type ())
G_DECLARE_FINAL_TYPE (HlPropertiesDialog, hl_properties_dialog, HL, PROPERTIES_DIALOG, GtkWindow)

/* Edits apply at once (and undo like any edit).  With @revisions the
 * dialog opens on the revision notes. */
HlPropertiesDialog *hl_properties_dialog_new (GtkWindow  *parent,
                                              HlDocument *document,
                                              gboolean    revisions);

/* For tests: the fields, and the reason a revision was refused ("" when
 * none). */
GtkEditable        *hl_properties_dialog_get_title_entry           (HlPropertiesDialog *self);
GtkEditable        *hl_properties_dialog_get_engineer_entry        (HlPropertiesDialog *self);
GtkTextView        *hl_properties_dialog_get_description_view      (HlPropertiesDialog *self);
GtkEditable        *hl_properties_dialog_get_revision_date_entry   (HlPropertiesDialog *self);
GtkEditable        *hl_properties_dialog_get_revision_author_entry (HlPropertiesDialog *self);
GtkEditable        *hl_properties_dialog_get_revision_text_entry   (HlPropertiesDialog *self);
const char         *hl_properties_dialog_get_revision_error        (HlPropertiesDialog *self);
HlSignoffPage      *hl_properties_dialog_get_signoff_page          (HlPropertiesDialog *self);

G_END_DECLS
