/* hl-export.h — writing any output file: figures, CSV table, text report
 *
 * Shared by the command line and the window so both write the same files.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-project.h"

G_BEGIN_DECLS

typedef struct
{
  HlProject   *project;
  GList       *shells;        /* HlShellInputs *, at least one */
  const char  *path;          /* extension decides the format */
  HlUnitSystem units;
  guint        points;        /* CSV rows */
  const char  *size;          /* "WxH" or NULL for the default */
  gboolean     figure_only;   /* PDF without the calculation sheet */
  gboolean     shell_given;   /* --shell was given: TXT of that one only */
} HlExportRequest;

typedef enum
{
  HL_EXPORT_CSV,
  HL_EXPORT_TXT,
  HL_EXPORT_SVG,
  HL_EXPORT_PDF,
  HL_EXPORT_PNG,
  HL_EXPORT_UNKNOWN,
} HlExportFormat;

HlExportFormat hl_export_format_for_path (const char *path);

/* Returns 0, 1 (bad values, unwritable target) or 2 (bad request such as
 * an unknown extension or size), the command-line exit codes.  Nothing is
 * left at @path unless the whole export succeeded. */
int            hl_export_run             (const HlExportRequest *request,
                                          GError               **error);

G_END_DECLS
