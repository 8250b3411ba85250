/* hl-print.h — printing the figure and the calculation sheet
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"

G_BEGIN_DECLS

/* Shows the print dialog for the selected shell, or with @pdf_path
 * writes the printout to that PDF without asking.  FALSE with @error
 * when printing could not start or failed. */
gboolean hl_print_run (GtkWindow  *parent,
                       HlDocument *document,
                       const char *pdf_path,
                       GError    **error);

G_END_DECLS
