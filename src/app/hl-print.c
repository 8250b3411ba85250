/* hl-print.c — printing the figure and the calculation sheet
 *
 * The printout is drawn by the same render code as the canvas and the
 * exports, in the light style whatever the window shows: the figure on a
 * landscape page, then the calculation sheet on portrait pages.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-print"

#include "hl-config.h"
#include "hl-print.h"
#include "hl-figure.h"
#include "hl-sheet.h"

#include <glib/gi18n.h>

typedef struct
{
  HlDocument *document;
  char        date[11];
  guint       sheet_pages;
} PrintJob;

static void
print_job_free (gpointer data)
{
  PrintJob *job = data;

  g_clear_object (&job->document);
  g_free (job);
}

static void
fill_context (PrintJob        *job,
              HlFigureContext *ctx)
{
  hl_figure_context_init (ctx, hl_document_get_project (job->document), hl_document_get_shell (job->document),
                          hl_document_get_solution (job->document), hl_document_get_new_wall_solution (job->document),
                          hl_document_get_problem_text (job->document), HL_FIGURE_TARGET_PAPER);
  ctx->export_date = job->date;
}

/* page 1 is the figure on landscape paper, the sheet follows portrait */
static void
on_begin_print_cb (GtkPrintOperation *operation,
                   GtkPrintContext   *context,
                   PrintJob          *job)
{
  HlFigureContext ctx = { 0 };
  double w = gtk_print_context_get_width (context);
  double h = gtk_print_context_get_height (context);
  fill_context (job, &ctx);
  job->sheet_pages = hl_sheet_page_count (MIN (w, h), MAX (w, h), &ctx);
  gtk_print_operation_set_n_pages (operation, 1 + (int) job->sheet_pages);
}

static void
on_request_page_setup_cb (GtkPrintOperation *operation,
                          GtkPrintContext   *context,
                          int                page,
                          GtkPageSetup      *setup,
                          PrintJob          *job)
{
  gtk_page_setup_set_orientation (setup, page == 0 ? GTK_PAGE_ORIENTATION_LANDSCAPE
                                                   : GTK_PAGE_ORIENTATION_PORTRAIT);
}

static void
on_draw_page_cb (GtkPrintOperation *operation,
                 GtkPrintContext   *context,
                 int                page,
                 PrintJob          *job)
{
  cairo_t *cr = gtk_print_context_get_cairo_context (context);
  double w = gtk_print_context_get_width (context);
  double h = gtk_print_context_get_height (context);
  HlFigureContext ctx = { 0 };

  fill_context (job, &ctx);
  if (page == 0)
    hl_figure_draw (cr, w, h, &ctx);
  else
    hl_sheet_draw_page (cr, w, h, (guint) page - 1, &ctx);
}

gboolean
hl_print_run (GtkWindow  *parent,
              HlDocument *document,
              const char *pdf_path,
              GError    **error)
{
  g_autoptr(GtkPrintOperation) operation = gtk_print_operation_new ();
  g_autoptr(GtkPageSetup) setup = gtk_page_setup_new ();
  g_autoptr(GtkPaperSize) a4 = gtk_paper_size_new (GTK_PAPER_NAME_A4);
  g_autoptr(GDateTime) now = g_date_time_new_now_local ();
  g_autofree char *date = g_date_time_format (now, "%Y-%m-%d");
  const HlShellInputs *shell = hl_document_get_shell (document);
  PrintJob *job = g_new0 (PrintJob, 1);
  GtkPrintOperationResult result;

  g_return_val_if_fail (HL_IS_DOCUMENT (document), FALSE);

  job->document = g_object_ref (document);
  g_strlcpy (job->date, date, sizeof job->date);
  /* the figure is laid out for a landscape page */
  gtk_page_setup_set_paper_size (setup, a4);
  gtk_page_setup_set_orientation (setup, GTK_PAGE_ORIENTATION_LANDSCAPE);
  gtk_print_operation_set_default_page_setup (operation, setup);
  gtk_print_operation_set_job_name (operation, shell != NULL ? shell->name : _("Hoopline figure"));
  gtk_print_operation_set_embed_page_setup (operation, TRUE);
  gtk_print_operation_set_unit (operation, GTK_UNIT_POINTS);
  g_signal_connect (operation, "begin-print", G_CALLBACK (on_begin_print_cb), job);
  g_signal_connect (operation, "request-page-setup", G_CALLBACK (on_request_page_setup_cb), job);
  g_signal_connect (operation, "draw-page", G_CALLBACK (on_draw_page_cb), job);
  g_object_set_data_full (G_OBJECT (operation), "hl-print-job", job, print_job_free);

  if (pdf_path != NULL)
    gtk_print_operation_set_export_filename (operation, pdf_path);
  result = gtk_print_operation_run (operation, pdf_path != NULL ? GTK_PRINT_OPERATION_ACTION_EXPORT
                                                                : GTK_PRINT_OPERATION_ACTION_PRINT_DIALOG,
                                    parent, error);
  return result != GTK_PRINT_OPERATION_RESULT_ERROR;
}
