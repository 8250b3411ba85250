/* hl-export-private.h — the export branches of several shells, for hl-export.c
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-export.h"

G_BEGIN_DECLS

/* One CSV of every shell of @req, each its own block (hl_report_csv). */
gboolean hl_export_csv_shells    (const HlExportRequest *req,
                                  GError               **error);

/* The SVG or PNG figure of each shell of @req: @req->path for one,
 * hl_export_output_paths() for several; all or none are written. */
gboolean hl_export_figure_shells (const HlExportRequest *req,
                                  HlExportFormat         format,
                                  GError               **error);

/* Solves @shell (the analysis and the new wall) and fills @ctx for paper
 * as @req asks (units, panels, decimal mark); the solutions join @keep,
 * which must outlive @ctx.  FALSE with "shell ID: reason" in @error. */
gboolean hl_export_shell_context (const HlExportRequest *req,
                                  const HlShellInputs   *shell,
                                  GPtrArray             *keep,
                                  HlFigureContext       *ctx,
                                  GError               **error);

G_END_DECLS
