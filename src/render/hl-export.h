/* hl-export.h — writing any output file: figures, CSV table, text report
 *
 * Shared by the command line and the window so both write the same files.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-figure.h"
#include "hl-paper.h"
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
  gboolean     shell_given;   /* --shell was given: a report of that one only,
                              * without the project summary */
  /* Fields added for the design note: zero is the old behaviour. */
  HlPaper      paper;         /* sheet pages of a PDF */
  guint        panels;        /* HlFigurePanels; 0: all that fit */
  gboolean     locale_numbers; /* figure, sheet and report numbers with the
                               * user's decimal mark (a German window); a
                               * CSV is C locale whatever this says */
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

/* Default figure size: an A4 landscape page in points.  PNG files are
 * drawn at twice that in pixels so they print sharp. */
#define HL_EXPORT_DEFAULT_WIDTH  842
#define HL_EXPORT_DEFAULT_HEIGHT 595
#define HL_EXPORT_PNG_SCALE      2
#define HL_EXPORT_SIZE_MIN       100
#define HL_EXPORT_SIZE_MAX       20000

/* "WxH", whole numbers from HL_EXPORT_SIZE_MIN to HL_EXPORT_SIZE_MAX.
 * NULL gives the default for @format (PNG: 1684x1190 pixels). */
gboolean       hl_export_parse_size      (const char     *text,
                                          HlExportFormat  format,
                                          guint          *width,
                                          guint          *height,
                                          GError        **error);

/* Writes the figure of @ctx to @path (SVG, PDF or PNG by @format),
 * @width x @height points (SVG, PDF) or pixels (PNG).  A PDF gets the
 * calculation sheet after the figure unless @figure_only.  Atomic:
 * on failure nothing is left at @path. */
gboolean       hl_export_figure_file     (const char            *path,
                                          HlExportFormat         format,
                                          guint                  width,
                                          guint                  height,
                                          const HlFigureContext *ctx,
                                          gboolean               figure_only,
                                          GError               **error);

#define HL_EXPORT_ERROR (hl_export_error_quark ())

/* The export's own errors; others come from the solver and the file
 * (GIO, HL_ATOMIC_ERROR).  Only the caller knows what a failure means
 * to it: the command line maps a bad request to its exit code 2. */
typedef enum
{
  HL_EXPORT_ERROR_BAD_REQUEST,   /* unknown extension, bad size */
} HlExportError;

GQuark         hl_export_error_quark     (void);

/* Whether @request writes one file per shell: an SVG or PNG is one
 * figure, so a scope of several shells gives one file each. */
gboolean       hl_export_one_file_per_shell (const HlExportRequest *request);

/* The files hl_export_run() writes for @request, in the order of its
 * shells: @request->path, or for one file per shell "STEM-ID.EXT"
 * beside it ("out/receiver.svg" -> "out/receiver-shell-1.svg"). */
GPtrArray     *hl_export_output_paths    (const HlExportRequest *request);

/* Nothing is left at @path unless the whole export succeeded; of one
 * file per shell, none is written unless all are. */
gboolean       hl_export_run             (const HlExportRequest *request,
                                          GError               **error);

G_END_DECLS
