/* hl-export-figure.c — the figure as an SVG, PDF or PNG file
 *
 * cairo writes to a temporary name beside the target; only a complete,
 * error-free file is renamed over it.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-export-figure"

#include "hl-export.h"
#include "hl-png.h"
#include "hl-atomic-file.h"
#include "hl-export-pdf.h"
#include "hl-sheet.h"

#include <cairo-pdf.h>
#include <cairo-svg.h>
#include <errno.h>
#include <fcntl.h>
#include <gio/gio.h>
#include <glib/gstdio.h>
#include <string.h>
#include <unistd.h>

gboolean
hl_export_parse_size (const char     *text,
                      HlExportFormat  format,
                      guint          *width,
                      guint          *height,
                      GError        **error)
{
  guint64 w, h;
  char *end;
  const char *x;

  if (text == NULL)
    {
      guint scale = format == HL_EXPORT_PNG ? HL_EXPORT_PNG_SCALE : 1;

      *width = HL_EXPORT_DEFAULT_WIDTH * scale;
      *height = HL_EXPORT_DEFAULT_HEIGHT * scale;
      return TRUE;
    }
  x = strpbrk (text, "xX");
  if (x == NULL || x == text || !g_ascii_isdigit (text[0]) || !g_ascii_isdigit (x[1]))
    goto bad;
  w = g_ascii_strtoull (text, &end, 10);
  if (end != x)
    goto bad;
  h = g_ascii_strtoull (x + 1, &end, 10);
  if (*end != '\0')
    goto bad;
  if (w < HL_EXPORT_SIZE_MIN || h < HL_EXPORT_SIZE_MIN || w > HL_EXPORT_SIZE_MAX || h > HL_EXPORT_SIZE_MAX)
    {
      g_set_error (error, G_IO_ERROR, G_IO_ERROR_INVALID_ARGUMENT,
                   "--size=%s: width and height must be from %d to %d (%s)", text, HL_EXPORT_SIZE_MIN,
                   HL_EXPORT_SIZE_MAX, format == HL_EXPORT_PNG ? "pixels" : "points");
      return FALSE;
    }
  *width = (guint) w;
  *height = (guint) h;
  return TRUE;

bad:
  g_set_error (error, G_IO_ERROR, G_IO_ERROR_INVALID_ARGUMENT,
               "--size=%s: give the size as WIDTHxHEIGHT in whole %s, e.g. 1200x800", text,
               format == HL_EXPORT_PNG ? "pixels" : "points");
  return FALSE;
}

static gboolean
check (cairo_status_t status,
       const char    *path,
       GError       **error)
{
  if (status == CAIRO_STATUS_SUCCESS)
    return TRUE;
  g_set_error (error, G_IO_ERROR, G_IO_ERROR_FAILED, "cannot write “%s”: %s", path, cairo_status_to_string (status));
  return FALSE;
}

/* a PNG keeps the layout of a page-sized figure and gains resolution:
 * 1684x1190 pixels draws the 842x595 figure at twice the scale */
static double
png_scale (guint width,
           guint height)
{
  return MAX (1.0, MIN ((double) width / HL_EXPORT_DEFAULT_WIDTH, (double) height / HL_EXPORT_DEFAULT_HEIGHT));
}

/* the title names the shell when the file holds one (@ctx), else the project */
static void
set_pdf_metadata (cairo_surface_t       *surface,
                  const HlFigureContext *ctx,
                  const HlProject       *pr)
{
  g_autofree char *title = NULL;

  if (ctx != NULL && ctx->solution != NULL)
    title = g_strdup_printf ("%s — %s", pr != NULL && pr->title != NULL ? pr->title : "Hoopline",
                             ctx->solution->inputs.name);
  else
    title = g_strdup (pr != NULL && pr->title != NULL ? pr->title : "Hoopline");
  cairo_pdf_surface_set_metadata (surface, CAIRO_PDF_METADATA_TITLE, title);
  if (pr != NULL && pr->engineer != NULL && pr->engineer[0] != '\0')
    cairo_pdf_surface_set_metadata (surface, CAIRO_PDF_METADATA_AUTHOR, pr->engineer);
  cairo_pdf_surface_set_metadata (surface, CAIRO_PDF_METADATA_CREATOR, "Hoopline");
}

/* the figure at @scale into @surface's first page */
static cairo_status_t
draw_figure (cairo_surface_t       *surface,
             double                 width,
             double                 height,
             double                 scale,
             const HlFigureContext *ctx)
{
  cairo_t *cr = cairo_create (surface);
  cairo_status_t status;

  cairo_scale (cr, scale, scale);
  hl_figure_draw (cr, width / scale, height / scale, ctx);
  status = cairo_status (cr);
  cairo_destroy (cr);
  return status;
}

static cairo_status_t
draw_pdf (cairo_surface_t       *surface,
          guint                  width,
          guint                  height,
          const HlFigureContext *ctx,
          gboolean               figure_only)
{
  cairo_t *cr = cairo_create (surface);
  cairo_status_t status;

  hl_figure_draw (cr, width, height, ctx);
  cairo_show_page (cr);
  if (!figure_only && ctx->solution != NULL)
    {
      guint pages = hl_sheet_page_count (HL_SHEET_A4_WIDTH, HL_SHEET_A4_HEIGHT, ctx);

      for (guint p = 0; p < pages; p++)
        {
          cairo_pdf_surface_set_size (surface, HL_SHEET_A4_WIDTH, HL_SHEET_A4_HEIGHT);
          hl_sheet_draw_page (cr, HL_SHEET_A4_WIDTH, HL_SHEET_A4_HEIGHT, p, ctx);
          cairo_show_page (cr);
        }
    }
  status = cairo_status (cr);
  cairo_destroy (cr);
  return status;
}

static gboolean
write_to (const char            *temp,
          const char            *path,
          HlExportFormat         format,
          guint                  width,
          guint                  height,
          const HlFigureContext *ctx,
          gboolean               figure_only,
          GError               **error)
{
  cairo_surface_t *surface;

  switch (format)
    {
    case HL_EXPORT_SVG:
      surface = cairo_svg_surface_create (temp, width, height);
      if (!check (cairo_surface_status (surface), path, error))
        break;
      cairo_svg_surface_set_document_unit (surface, CAIRO_SVG_UNIT_PT);
      if (check (draw_figure (surface, width, height, 1.0, ctx), path, error))
        {
          cairo_surface_finish (surface);
          check (cairo_surface_status (surface), path, error);
        }
      break;
    case HL_EXPORT_PDF:
      surface = cairo_pdf_surface_create (temp, width, height);
      if (!check (cairo_surface_status (surface), path, error))
        break;
      set_pdf_metadata (surface, ctx, ctx->project);
      if (check (draw_pdf (surface, width, height, ctx, figure_only), path, error))
        {
          cairo_surface_finish (surface);
          check (cairo_surface_status (surface), path, error);
        }
      break;
    case HL_EXPORT_PNG:
    default:
      surface = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, (int) width, (int) height);
      if (!check (cairo_surface_status (surface), path, error))
        break;
      if (check (draw_figure (surface, width, height, png_scale (width, height), ctx), path, error))
        {
          g_autoptr(GError) local = NULL;

          if (!hl_png_write (surface, temp, &local))
            g_set_error (error, G_IO_ERROR, G_IO_ERROR_FAILED, "cannot write “%s”: %s", path, local->message);
        }
      break;
    }
  cairo_surface_destroy (surface);
  return error == NULL || *error == NULL;
}

/* a temporary beside @path, created: cairo reports a folder that takes
 * no files only as a write error; making it first gives the reason in
 * the system's words */
static char *
make_temp (const char *path,
           GError    **error)
{
  g_autofree char *temp = NULL;
  int fd;

  if (!hl_atomic_check_target (path, error))
    return NULL;
  temp = hl_atomic_temp_name (path);
  fd = g_open (temp, O_WRONLY | O_CREAT | O_EXCL, 0644);
  if (fd < 0)
    {
      int saved = errno;

      g_set_error (error, G_FILE_ERROR, g_file_error_from_errno (saved), "cannot write “%s”: %s", path,
                   g_strerror (saved));
      return NULL;
    }
  close (fd);
  return g_steal_pointer (&temp);
}

static gboolean
finish (char       *temp,
        const char *path,
        gboolean    written,
        GError     *local,
        GError    **error)
{
  g_autofree char *owned = temp;

  if (!written)
    {
      hl_atomic_abandon (owned);
      g_propagate_error (error, local);
      return FALSE;
    }
  return hl_atomic_commit (owned, path, error);
}

gboolean
hl_export_figure_file (const char            *path,
                       HlExportFormat         format,
                       guint                  width,
                       guint                  height,
                       const HlFigureContext *ctx,
                       gboolean               figure_only,
                       GError               **error)
{
  char *temp;
  GError *local = NULL;
  gboolean ok;

  g_return_val_if_fail (ctx != NULL, FALSE);
  g_return_val_if_fail (format == HL_EXPORT_SVG || format == HL_EXPORT_PDF || format == HL_EXPORT_PNG, FALSE);

  temp = make_temp (path, error);
  if (temp == NULL)
    return FALSE;
  ok = write_to (temp, path, format, width, height, ctx, figure_only, &local);
  return finish (temp, path, ok, local, error);
}

/* ---- the whole report ---------------------------------------------------- */

void
hl_paper_size (HlPaper paper,
               double *width,
               double *height)
{
  *width = paper == HL_PAPER_LETTER ? HL_PAPER_LETTER_WIDTH : HL_PAPER_A4_WIDTH;
  *height = paper == HL_PAPER_LETTER ? HL_PAPER_LETTER_HEIGHT : HL_PAPER_A4_HEIGHT;
}

static void
figure_size (const HlPdfReport *report,
             double            *width,
             double            *height)
{
  double pw, ph;

  if (report->figure_width > 0 && report->figure_height > 0)
    {
      *width = report->figure_width;
      *height = report->figure_height;
      return;
    }
  /* the same paper turned: the figure is wider than high */
  hl_paper_size (report->paper, &pw, &ph);
  *width = ph;
  *height = pw;
}

static guint
summary_pages (const HlPdfReport *report,
               double             w,
               double             h)
{
  return report->summary && !report->figure_only ? hl_sheet_summary_page_count (w, h, report->contexts) : 0;
}

static guint
shell_pages (const HlPdfReport     *report,
             const HlFigureContext *ctx,
             double                 w,
             double                 h)
{
  return 1 + (report->figure_only ? 0 : hl_sheet_page_count (w, h, ctx));
}

guint
hl_pdf_report_pages (const HlPdfReport *report)
{
  double w, h;
  guint n;

  g_return_val_if_fail (report != NULL && report->contexts != NULL, 0);
  hl_paper_size (report->paper, &w, &h);
  n = summary_pages (report, w, h);
  for (guint i = 0; i < report->contexts->len; i++)
    n += shell_pages (report, g_ptr_array_index (report->contexts, i), w, h);
  return n;
}

static cairo_status_t
draw_report (cairo_surface_t   *surface,
             const HlPdfReport *report)
{
  cairo_t *cr = cairo_create (surface);
  cairo_status_t status;
  double w, h, fw, fh;
  HlSheetNumbering num = { 0, hl_pdf_report_pages (report) };
  guint n;

  hl_paper_size (report->paper, &w, &h);
  figure_size (report, &fw, &fh);
  n = summary_pages (report, w, h);
  for (guint p = 0; p < n; p++)
    {
      cairo_pdf_surface_set_size (surface, w, h);
      hl_sheet_summary_draw_page (cr, w, h, p, report->contexts, &num);
      cairo_show_page (cr);
    }
  num.first += n;
  for (guint i = 0; i < report->contexts->len; i++)
    {
      const HlFigureContext *ctx = g_ptr_array_index (report->contexts, i);

      cairo_pdf_surface_set_size (surface, fw, fh);
      hl_figure_draw (cr, fw, fh, ctx);
      cairo_show_page (cr);
      num.first++;
      n = report->figure_only ? 0 : hl_sheet_page_count (w, h, ctx);
      for (guint p = 0; p < n; p++)
        {
          cairo_pdf_surface_set_size (surface, w, h);
          hl_sheet_draw_page_numbered (cr, w, h, p, ctx, &num);
          cairo_show_page (cr);
        }
      num.first += n;
    }
  status = cairo_status (cr);
  cairo_destroy (cr);
  return status;
}

gboolean
hl_export_pdf_report (const char        *path,
                      const HlPdfReport *report,
                      GError           **error)
{
  const HlFigureContext *first;
  cairo_surface_t *surface;
  GError *local = NULL;
  char *temp;
  gboolean ok;

  g_return_val_if_fail (report != NULL && report->contexts != NULL && report->contexts->len > 0, FALSE);
  first = g_ptr_array_index (report->contexts, 0);
  temp = make_temp (path, error);
  if (temp == NULL)
    return FALSE;
  surface = cairo_pdf_surface_create (temp, HL_PAPER_A4_WIDTH, HL_PAPER_A4_HEIGHT);
  ok = check (cairo_surface_status (surface), path, &local);
  if (ok)
    {
      set_pdf_metadata (surface, report->contexts->len == 1 ? first : NULL, first->project);
      ok = check (draw_report (surface, report), path, &local);
      cairo_surface_finish (surface);
      ok = ok && check (cairo_surface_status (surface), path, &local);
    }
  cairo_surface_destroy (surface);
  return finish (temp, path, ok, local, error);
}
