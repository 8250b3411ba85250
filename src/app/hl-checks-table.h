/* hl-checks-table.h — does the wall pass: the two verdicts and every method
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"

G_BEGIN_DECLS

#define HL_TYPE_CHECKS_TABLE (hl_checks_table_get_type ())
G_DECLARE_FINAL_TYPE (HlChecksTable, hl_checks_table, HL, CHECKS_TABLE, GtkWidget)

void        hl_checks_table_set_document  (HlChecksTable *self,
                                           HlDocument    *document);
/* the words the two badges and the verdict line show, for tests and
 * assistive technology: "PASS", "FAIL", "THIN", "THICK", "N/A" */
const char *hl_checks_table_get_design_word (HlChecksTable *self);
const char *hl_checks_table_get_thin_word   (HlChecksTable *self);
const char *hl_checks_table_get_verdict_text (HlChecksTable *self);
/* the thin-wall verdict's sentence beside its badge */
const char *hl_checks_table_get_thin_text (HlChecksTable *self);
/* why the wall fails or is not shown to pass, or NULL when it passes */
const char *hl_checks_table_get_reason_text (HlChecksTable *self);
/* the text of cell (@row, @column) of the methods table, row 0 the
 * headings; NULL outside it */
const char *hl_checks_table_get_cell      (HlChecksTable *self,
                                           guint          row,
                                           guint          column);

G_END_DECLS
