/* hl-export-pdf.h — the PDF report: project summary, then each shell's
 * figure and calculation sheet
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-figure.h"
#include "hl-paper.h"

G_BEGIN_DECLS

typedef struct
{
  GPtrArray *contexts;      /* HlFigureContext *, one per shell, each with a solution */
  gboolean   summary;       /* the project summary first */
  gboolean   figure_only;   /* no summary, no sheets */
  HlPaper    paper;         /* sheet pages portrait; the figure landscape */
  guint      figure_width;  /* points; 0: the paper, landscape */
  guint      figure_height;
} HlPdfReport;

/* Portrait size of @paper in points (ISO 216 A4, ANSI A Letter). */
void     hl_paper_size        (HlPaper            paper,
                               double            *width,
                               double            *height);

/* Pages of the whole report, for "page N of M". */
guint    hl_pdf_report_pages  (const HlPdfReport *report);

/* Atomic: on failure nothing is left at @path. */
gboolean hl_export_pdf_report (const char        *path,
                               const HlPdfReport *report,
                               GError           **error);

G_END_DECLS
