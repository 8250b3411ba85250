/* hl-export-figure.c — the figure as an SVG, PDF or PNG file
 *
 * cairo writes to a temporary name beside the target; only a complete,
 * error-free file is renamed over it.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-export-figure"

#include "hl-export.h"
#include "hl-atomic-file.h"
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

static void
set_pdf_metadata (cairo_surface_t       *surface,
                  const HlFigureContext *ctx)
{
  const HlProject *pr = ctx->project;
  g_autofree char *title = NULL;

  if (ctx->solution != NULL)
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
      set_pdf_metadata (surface, ctx);
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
        check (cairo_surface_write_to_png (surface, temp), path, error);
      break;
    }
  cairo_surface_destroy (surface);
  return error == NULL || *error == NULL;
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
  g_autofree char *temp = NULL;
  g_autoptr(GError) local = NULL;

  g_return_val_if_fail (ctx != NULL, FALSE);
  g_return_val_if_fail (format == HL_EXPORT_SVG || format == HL_EXPORT_PDF || format == HL_EXPORT_PNG, FALSE);

  if (!hl_atomic_check_target (path, error))
    return FALSE;
  temp = hl_atomic_temp_name (path);
  /* cairo reports a folder that takes no files only as a write error;
   * making the temporary first gives the reason in the system's words */
  {
    int fd = g_open (temp, O_WRONLY | O_CREAT | O_EXCL, 0644);

    if (fd < 0)
      {
        int saved = errno;

        g_set_error (error, G_FILE_ERROR, g_file_error_from_errno (saved), "cannot write “%s”: %s", path,
                     g_strerror (saved));
        return FALSE;
      }
    close (fd);
  }
  if (!write_to (temp, path, format, width, height, ctx, figure_only, &local))
    {
      hl_atomic_abandon (temp);
      g_propagate_error (error, g_steal_pointer (&local));
      return FALSE;
    }
  return hl_atomic_commit (temp, path, error);
}
