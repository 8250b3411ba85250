/* hl-export.c — writing any output file: figures, CSV table, text report
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-export"

#include "hl-export.h"
#include "hl-export-pdf.h"
#include "hl-export-private.h"
#include "hl-atomic-file.h"
#include "hl-figure.h"
#include "hl-note.h"
#include "hl-report.h"
#include "hl-solution.h"

#include <gio/gio.h>
#include <string.h>

G_DEFINE_QUARK (hl-export-error-quark, hl_export_error)

HlExportFormat
hl_export_format_for_path (const char *path)
{
  static const struct { const char *ext; HlExportFormat format; } table[] = {
    { ".csv", HL_EXPORT_CSV }, { ".txt", HL_EXPORT_TXT }, { ".svg", HL_EXPORT_SVG },
    { ".pdf", HL_EXPORT_PDF }, { ".png", HL_EXPORT_PNG },
  };
  g_autofree char *lower = g_ascii_strdown (path != NULL ? path : "", -1);

  for (guint i = 0; i < G_N_ELEMENTS (table); i++)
    if (g_str_has_suffix (lower, table[i].ext))
      return table[i].format;
  return HL_EXPORT_UNKNOWN;
}

/* the report of @shell after @out; its analysis joins @analyses */
static gboolean
append_report (GString             *out,
               HlProject           *project,
               const HlShellInputs *shell,
               HlUnitSystem         units,
               gboolean             locale_numbers,
               GPtrArray           *analyses,
               GError             **error)
{
  g_autoptr(HlSolution) fresh = hl_solve (shell, HL_DEFAULT_POINTS, FALSE, error);
  HlSolution *corroded = NULL;
  g_autofree char *text = NULL;

  if (fresh == NULL)
    return FALSE;
  corroded = hl_solve (shell, HL_DEFAULT_POINTS, TRUE, error);
  if (corroded == NULL)
    return FALSE;
  g_ptr_array_add (analyses, corroded);
  text = hl_report_text_in (project, fresh, corroded, units, locale_numbers);
  if (out->len > 0)
    g_string_append (out, "\n\f\n");
  g_string_append (out, text);
  return TRUE;
}

static gboolean
export_text (const HlExportRequest *req,
             GError               **error)
{
  g_autoptr(GString) out = g_string_new (NULL);
  g_autoptr(GError) local = NULL;
  g_autoptr(GPtrArray) analyses = g_ptr_array_new_with_free_func ((GDestroyNotify) hl_solution_free);

  /* without --shell the report covers every shell, one after another */
  for (GList *l = req->shells; l != NULL; l = l->next)
    if (!append_report (out, req->project, l->data, req->units, req->locale_numbers, analyses, &local))
      {
        g_set_error (error, local->domain, local->code, "shell %s: %s",
                     ((HlShellInputs *) l->data)->id, local->message);
        return FALSE;
      }
  /* ... after the project summary, as the PDF */
  if (!req->shell_given)
    {
      g_autoptr(GArray) rows = hl_note_project_summary (req->project, analyses, req->units, req->locale_numbers, NULL);
      g_autofree char *summary = hl_note_to_text (rows, HL_REPORT_TEXT_WIDTH);

      g_string_prepend (out, "\n\f\n");
      g_string_prepend (out, summary);
    }
  if (!hl_atomic_write (req->path, out->str, out->len, error))
    return FALSE;
  return TRUE;
}

/* one context per shell of @req, each with its analysis and new wall
 * (solved once here for every page); NULL with @error set when a shell
 * cannot be solved */
gboolean
hl_export_shell_context (const HlExportRequest *req,
                         const HlShellInputs   *shell,
                         GPtrArray             *keep,
                         HlFigureContext       *ctx,
                         GError               **error)
{
  g_autoptr(GError) local = NULL;
  HlSolution *sol = hl_solve (shell, HL_DEFAULT_POINTS, TRUE, &local);
  HlSolution *new_wall;

  if (sol == NULL)
    {
      g_set_error (error, local->domain, local->code, "shell %s: %s", shell->id, local->message);
      return FALSE;
    }
  new_wall = hl_solve (shell, HL_DEFAULT_POINTS, FALSE, NULL);
  g_ptr_array_add (keep, sol);
  if (new_wall != NULL)
    g_ptr_array_add (keep, new_wall);
  hl_figure_context_init (ctx, req->project, shell, sol, new_wall, NULL, HL_FIGURE_TARGET_PAPER);
  ctx->units = req->units;
  ctx->panels = req->panels;
  ctx->locale_numbers = req->locale_numbers;
  return TRUE;
}

static GPtrArray *
solve_shells (const HlExportRequest *req,
              GPtrArray             *keep,
              GError               **error)
{
  g_autoptr(GPtrArray) contexts = g_ptr_array_new_with_free_func (g_free);

  for (GList *l = req->shells; l != NULL; l = l->next)
    {
      HlFigureContext *ctx = g_new0 (HlFigureContext, 1);

      g_ptr_array_add (contexts, ctx);
      if (!hl_export_shell_context (req, l->data, keep, ctx, error))
        return NULL;
    }
  return g_steal_pointer (&contexts);
}

/* the design note: the project summary (without --shell), then each
 * shell's figure and calculation sheet */
static gboolean
export_pdf (const HlExportRequest *req,
            GError               **error)
{
  g_autoptr(GPtrArray) keep = g_ptr_array_new_with_free_func ((GDestroyNotify) hl_solution_free);
  g_autoptr(GPtrArray) contexts = NULL;
  g_autoptr(GError) local = NULL;
  guint width = 0, height = 0;

  if (!hl_export_parse_size (req->size, HL_EXPORT_PDF, &width, &height, &local))
    {
      g_set_error_literal (error, HL_EXPORT_ERROR, HL_EXPORT_ERROR_BAD_REQUEST, local->message);
      return FALSE;
    }
  if (!hl_atomic_check_target (req->path, error))
    return FALSE;
  contexts = solve_shells (req, keep, error);
  if (contexts == NULL)
    return FALSE;
  {
    /* without --size the figure takes the report's paper, landscape */
    HlPdfReport report = { contexts, !req->shell_given, req->figure_only, req->paper,
                           req->size != NULL ? width : 0, req->size != NULL ? height : 0 };

    return hl_export_pdf_report (req->path, &report, error);
  }
}

gboolean
hl_export_run (const HlExportRequest *req,
               GError               **error)
{
  HlExportFormat format = hl_export_format_for_path (req->path);

  g_return_val_if_fail (req != NULL && req->shells != NULL, FALSE);

  switch (format)
    {
    case HL_EXPORT_CSV:
      return hl_atomic_check_target (req->path, error) && hl_export_csv_shells (req, error);
    case HL_EXPORT_TXT:
      if (!hl_atomic_check_target (req->path, error))
        return FALSE;
      return export_text (req, error);
    case HL_EXPORT_SVG:
    case HL_EXPORT_PNG:
      return hl_export_figure_shells (req, format, error);
    case HL_EXPORT_PDF:
      return export_pdf (req, error);
    case HL_EXPORT_UNKNOWN:
    default:
      g_set_error (error, HL_EXPORT_ERROR, HL_EXPORT_ERROR_BAD_REQUEST,
                   "“%s”: the output name must end in .svg, .pdf, .png, .csv or .txt", req->path);
      return FALSE;
    }
}
