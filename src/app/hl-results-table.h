/* hl-results-table.h — the key numbers of the selected shell, copyable
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"

G_BEGIN_DECLS

#define HL_TYPE_RESULTS_TABLE (hl_results_table_get_type ())
G_DECLARE_FINAL_TYPE (HlResultsTable, hl_results_table, HL, RESULTS_TABLE, GtkWidget)

void  hl_results_table_set_document (HlResultsTable *self,
                                     HlDocument     *document);
/* label TAB value TAB unit lines, as shown (user-locale numbers);
 * empty when there are no results */
char *hl_results_table_get_text     (HlResultsTable *self);

G_END_DECLS
