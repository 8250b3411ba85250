/* hl-export-job.h — exporting the open document, as the command line would
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-document.h"

G_BEGIN_DECLS

/* The "WxH" of a size preset for the format of @path, or NULL for
 * "custom".  Presets: "a4-landscape", "a4-portrait", "1920x1080". */
char *hl_export_preset_size    (const char *preset,
                                const char *path);

/* Writes @path from the document as the command line would: a figure
 * or table of the selected shell, the report of every shell.  @size as
 * above, or NULL or "" for the default. */
gboolean hl_export_document    (HlDocument  *document,
                                const char  *path,
                                const char  *size,
                                GError     **error);

G_END_DECLS
