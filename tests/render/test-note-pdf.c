/* test-note-pdf.c — the PDF report: pages, page labels, paper, the project
 * summary against --summary, and the same check lines as the text report
 *
 * The PDF is read back with poppler's pdftotext and pdfinfo
 * (poppler-utils, installed by tools/deps.sh).
 *
 * Sources beside each check:
 *  - ISO 216 (A4 = 210 mm × 297 mm) and ANSI/ASME Y14.1 (Letter =
 *    8.5 in × 11 in), at 72 points an inch (PostScript, from memory):
 *    595.28 × 841.89 pt and 612 × 792 pt.
 *  - Common practice for a document a checker signs: "page N of M"
 *    counts the pages of the whole document, N in reading order.
 *  - Common practice of typesetting (widows and orphans): the last page
 *    of a sheet does not hold a lone line.
 *  - DESIGN.md standing rule (the window, summary, CSV, text report and
 *    PDF say the same thing from one solution): the project summary
 *    page carries the values `hoopline --summary` prints.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-note-pdf"

#include "hl-render-test.h"
#include "hl-check-steps.h"
#include "hl-export.h"
#include "hl-export-pdf.h"
#include "hl-note.h"
#include "hl-report.h"
#include "hl-sheet-private.h"

#include <glib/gstdio.h>
#include <string.h>

typedef struct
{
  char *dir;
  char *pdf;
} Out;

static void
out_setup (Out          *o,
           gconstpointer data)
{
  g_autoptr(GError) error = NULL;

  o->dir = g_dir_make_tmp ("hl-note-pdf-XXXXXX", &error);
  g_assert_no_error (error);
  o->pdf = g_build_filename (o->dir, "note.pdf", NULL);
}

static void
out_teardown (Out          *o,
              gconstpointer data)
{
  g_remove (o->pdf);
  g_rmdir (o->dir);
  g_free (o->pdf);
  g_free (o->dir);
}

static char *
run (const char *const *argv)
{
  g_autofree char *out = NULL;
  g_autoptr(GError) error = NULL;
  int status = 0;

  if (!g_spawn_sync (NULL, (char **) argv, NULL, G_SPAWN_SEARCH_PATH | G_SPAWN_STDERR_TO_DEV_NULL, NULL, NULL,
                     &out, NULL, &status, &error))
    g_error ("%s: %s", argv[0], error->message);
  g_assert_true (g_spawn_check_wait_status (status, NULL));
  return g_steal_pointer (&out);
}

static gboolean
have_poppler (void)
{
  g_autofree char *a = g_find_program_in_path ("pdftotext");
  g_autofree char *b = g_find_program_in_path ("pdfinfo");

  if (a == NULL || b == NULL)
    {
      g_test_skip ("pdftotext/pdfinfo (poppler-utils) not installed");
      return FALSE;
    }
  return TRUE;
}

/* the text of page @page (from 1) */
static char *
page_text (const char *pdf,
           guint       page)
{
  g_autofree char *n = g_strdup_printf ("%u", page);

  return run ((const char *const[]) { "pdftotext", "-f", n, "-l", n, "-layout", pdf, "-", NULL });
}

/* pages, and each page's width and height in points */
static guint
page_sizes (const char *pdf,
            GArray     *sizes)
{
  g_autofree char *info = run ((const char *const[]) { "pdfinfo", "-f", "1", "-l", "9999", pdf, NULL });
  g_auto(GStrv) lines = g_strsplit (info, "\n", -1);
  guint pages = 0;

  for (guint i = 0; lines[i] != NULL; i++)
    {
      double w, h;
      guint p;

      if (sscanf (lines[i], "Page %u size: %lf x %lf pts", &p, &w, &h) == 3)
        {
          g_array_append_val (sizes, w);
          g_array_append_val (sizes, h);
        }
      else if (sscanf (lines[i], "Pages: %u", &p) == 1)
        pages = p;
    }
  g_assert_cmpuint (sizes->len, ==, 2 * pages);
  return pages;
}

static void
export_demo_full (const char  *path,
                  HlProject   *demo,
                  gboolean     one_shell,
                  HlPaper      paper,
                  HlUnitSystem units,
                  gboolean     figure_only)
{
  g_autoptr(GList) shells = NULL;
  g_autoptr(GError) error = NULL;
  HlExportRequest req = { 0 };

  for (guint i = 0; i < hl_project_n_shells (demo) && !(one_shell && i > 0); i++)
    shells = g_list_append (shells, hl_project_shell (demo, i));
  req.project = demo;
  req.shells = shells;
  req.path = path;
  req.units = units;
  req.points = 11;
  req.shell_given = one_shell;
  req.paper = paper;
  req.figure_only = figure_only;
  g_assert_true (hl_export_run (&req, &error));
  g_assert_no_error (error);
}

static void
export_demo (const char  *path,
             HlProject   *demo,
             gboolean     one_shell,
             HlPaper     paper,
             HlUnitSystem units)
{
  export_demo_full (path, demo, one_shell, paper, units, FALSE);
}

/* the "page N of M" label of @text, or FALSE */
static gboolean
page_label (const char *text,
            guint      *n,
            guint      *m)
{
  const char *p = strstr (text, "page ");

  while (p != NULL)
    {
      if (sscanf (p, "page %u of %u", n, m) == 2)
        return TRUE;
      p = strstr (p + 1, "page ");
    }
  return FALSE;
}

/* figure only: one landscape figure page per shell, no summary, no sheet */
static void
test_figure_only (Out          *o,
                  gconstpointer data)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(GArray) sizes = g_array_new (FALSE, FALSE, sizeof (double));
  guint pages;

  if (!have_poppler ())
    return;
  export_demo_full (o->pdf, demo, FALSE, HL_PAPER_LETTER, HL_UNIT_SYSTEM_SI, TRUE);
  pages = page_sizes (o->pdf, sizes);
  g_assert_cmpuint (pages, ==, hl_project_n_shells (demo));
  for (guint p = 0; p < pages; p++)
    {
      g_autofree char *text = page_text (o->pdf, p + 1);
      guint n, m;

      g_assert_false (page_label (text, &n, &m));
      g_assert_cmpfloat_with_epsilon (g_array_index (sizes, double, 2 * p), 792, 0.01);
      g_assert_cmpfloat_with_epsilon (g_array_index (sizes, double, 2 * p + 1), 612, 0.01);
    }
}

static void
test_labels (Out          *o,
             gconstpointer data)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(GArray) sizes = g_array_new (FALSE, FALSE, sizeof (double));
  guint pages, labelled = 0, figures = 0;

  if (!have_poppler ())
    return;
  export_demo (o->pdf, demo, FALSE, HL_PAPER_A4, HL_UNIT_SYSTEM_SI);
  pages = page_sizes (o->pdf, sizes);
  /* a summary, then per shell a figure and at least one sheet page */
  g_assert_cmpuint (pages, >=, 1 + 2 * hl_project_n_shells (demo));
  for (guint p = 1; p <= pages; p++)
    {
      g_autofree char *text = page_text (o->pdf, p);
      guint n, m;

      if (page_label (text, &n, &m))
        {
          /* counted over the whole document, in reading order */
          g_assert_cmpuint (n, ==, p);
          g_assert_cmpuint (m, ==, pages);
          labelled++;
        }
      else
        figures++;
    }
  /* the figure pages are the only ones without a label: one per shell */
  g_assert_cmpuint (figures, ==, hl_project_n_shells (demo));
  g_assert_cmpuint (labelled, ==, pages - figures);
}

static void
test_one_shell (Out          *o,
                gconstpointer data)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(GArray) sizes = g_array_new (FALSE, FALSE, sizeof (double));
  g_autofree char *first = NULL, *second = NULL;
  guint pages, n, m;

  if (!have_poppler ())
    return;
  export_demo (o->pdf, demo, TRUE, HL_PAPER_A4, HL_UNIT_SYSTEM_SI);
  pages = page_sizes (o->pdf, sizes);
  first = page_text (o->pdf, 1);
  second = page_text (o->pdf, 2);
  /* no project summary: the figure first, then the sheet, whose first
   * page is page 2 of all (today's "page 1 of 2" stood on page 2 of 3) */
  g_assert_false (page_label (first, &n, &m));
  g_assert_null (strstr (first, "Project summary"));
  g_assert_true (page_label (second, &n, &m));
  g_assert_cmpuint (n, ==, 2);
  g_assert_cmpuint (m, ==, pages);
  /* the header names project, item, basis and revision */
  g_assert_nonnull (strstr (second, "Larkfield works"));
  g_assert_nonnull (strstr (second, "Item: Plant air receiver AR-2 (id air-receiver)"));
  g_assert_nonnull (strstr (second, "Design basis: ASME VIII-1 UG-27"));
  g_assert_nonnull (strstr (second, "Rev. 2"));
}

static void
check_paper (const char *pdf,
             double      w,
             double      h)
{
  g_autoptr(GArray) sizes = g_array_new (FALSE, FALSE, sizeof (double));
  guint pages = page_sizes (pdf, sizes);

  for (guint p = 0; p < pages; p++)
    {
      double pw = g_array_index (sizes, double, 2 * p), ph = g_array_index (sizes, double, 2 * p + 1);

      /* sheet pages portrait, figure pages the same paper turned */
      if (ph > pw)
        {
          g_assert_cmpfloat_with_epsilon (pw, w, 0.01);
          g_assert_cmpfloat_with_epsilon (ph, h, 0.01);
        }
      else
        {
          g_assert_cmpfloat_with_epsilon (pw, h, 0.01);
          g_assert_cmpfloat_with_epsilon (ph, w, 0.01);
        }
    }
}

static void
test_paper (Out          *o,
            gconstpointer data)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();

  if (!have_poppler ())
    return;
  export_demo (o->pdf, demo, FALSE, HL_PAPER_A4, HL_UNIT_SYSTEM_SI);
  check_paper (o->pdf, 595.28, 841.89);
  export_demo (o->pdf, demo, FALSE, HL_PAPER_LETTER, HL_UNIT_SYSTEM_US);
  check_paper (o->pdf, 612, 792);
}

/* the value of @key in the --summary block of @shell */
static char *
summary_value (const HlShellInputs *shell,
               const char          *key,
               HlUnitSystem         units)
{
  g_autoptr(HlSolution) sol = hl_rt_solve (shell);
  g_autofree char *block = hl_report_summary_block (sol, units);
  g_autofree char *want = g_strdup_printf ("\n%s = ", key);
  const char *p = strstr (block, want);

  g_assert_nonnull (p);
  p += strlen (want);
  return g_strndup (p, strcspn (p, "\n"));
}

static void
test_summary_page (Out          *o,
                   gconstpointer data)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autofree char *text = NULL;

  if (!have_poppler ())
    return;
  export_demo (o->pdf, demo, FALSE, HL_PAPER_A4, HL_UNIT_SYSTEM_SI);
  text = page_text (o->pdf, 1);
  g_assert_nonnull (strstr (text, "Project summary"));
  for (guint i = 0; i < hl_project_n_shells (demo); i++)
    {
      const HlShellInputs *shell = hl_project_shell (demo, i);
      g_autofree char *u = summary_value (shell, "utilisation", HL_UNIT_SYSTEM_SI);
      g_autofree char *verdict = summary_value (shell, "design_verdict", HL_UNIT_SYSTEM_SI);
      g_autofree char *thin = summary_value (shell, "thin_wall_verdict", HL_UNIT_SYSTEM_SI);
      g_autofree char *upper_v = g_ascii_strup (verdict, -1);
      g_autofree char *upper_t = g_ascii_strup (thin, -1);
      g_autofree char *number = g_strndup (u, strcspn (u, " "));

      /* the number as --summary prints it (a cell may wrap before its unit) */
      g_assert_nonnull (strstr (text, number));
      g_assert_nonnull (strstr (text, upper_v));
      g_assert_nonnull (strstr (text, upper_t));
    }
}

/* the PDF's sheet and the text report come from the same rows */
static void
test_same_rows (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(GRegex) wrap = g_regex_new ("\n[ |]*", 0, 0, NULL);

  for (guint i = 0; i < hl_project_n_shells (demo); i++)
    {
      const HlShellInputs *shell = hl_project_shell (demo, i);
      g_autoptr(HlSolution) cor = hl_rt_solve (shell);
      g_autoptr(HlSolution) neu = hl_solve (shell, HL_DEFAULT_POINTS, FALSE, NULL);
      g_autoptr(GPtrArray) steps = hl_check_steps (cor, HL_UNIT_SYSTEM_SI, FALSE);
      g_autoptr(GArray) sheet = NULL;
      g_autofree char *report = hl_report_text (demo, neu, cor, HL_UNIT_SYSTEM_SI);
      g_autofree char *flat = g_regex_replace (wrap, report, -1, 0, " ", 0, NULL);
      HlFigureContext ctx;
      guint matched = 0;

      hl_figure_context_init (&ctx, demo, shell, cor, neu, NULL, HL_FIGURE_TARGET_PAPER);
      ctx.units = HL_UNIT_SYSTEM_SI;
      sheet = hl_sheet_rows (&ctx);
      /* every check's substituted line is a row of the sheet, and the
       * text report prints it (unwrapped: it wraps at 100 columns) */
      for (guint s = 0; s < steps->len; s++)
        {
          const HlCheckStep *st = g_ptr_array_index (steps, s);

          for (guint r = 0; r < sheet->len; r++)
            {
              const HlSheetRow *row = hl_note_row (sheet, r);

              if (row->kind == HL_SHEET_TABLE && row->n_cells == 2 && strcmp (row->cells[1], st->substituted) == 0)
                {
                  matched++;
                  break;
                }
            }
          if (strstr (flat, st->substituted) == NULL)
            g_error ("the text report lacks “%s”", st->substituted);
        }
      g_assert_cmpuint (matched, ==, steps->len);
    }
}

/* no sheet ends with a lone row on its last page */
static void
test_last_page (Out          *o,
                gconstpointer data)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(GArray) sizes = g_array_new (FALSE, FALSE, sizeof (double));
  guint pages;

  if (!have_poppler ())
    return;
  for (HlPaper paper = HL_PAPER_A4; paper <= HL_PAPER_LETTER; paper++)
    {
      export_demo (o->pdf, demo, FALSE, paper, HL_UNIT_SYSTEM_SI);
      g_array_set_size (sizes, 0);
      pages = page_sizes (o->pdf, sizes);
      for (guint p = 2; p <= pages; p++)
        {
          g_autofree char *text = page_text (o->pdf, p);
          g_autofree char *next = p < pages ? page_text (o->pdf, p + 1) : g_strdup ("");
          g_auto(GStrv) lines = NULL;
          guint content = 0, n, m;

          /* the last sheet page of a shell: a labelled page before a
           * figure page or the end */
          if (!page_label (text, &n, &m) || page_label (next, &n, &m))
            continue;
          lines = g_strsplit (text, "\n", -1);
          /* header two lines, the caution two at the foot */
          for (guint l = 2; lines[l] != NULL; l++)
            if (g_strstrip (lines[l])[0] != '\0' && !g_str_has_prefix (lines[l], "Caution:")
                && !g_str_has_prefix (lines[l], "licensed engineer"))
              content++;
          g_assert_cmpuint (content, >=, 3);
        }
    }
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add ("/note-pdf/page-labels", Out, NULL, out_setup, test_labels, out_teardown);
  g_test_add ("/note-pdf/one-shell", Out, NULL, out_setup, test_one_shell, out_teardown);
  g_test_add ("/note-pdf/paper", Out, NULL, out_setup, test_paper, out_teardown);
  g_test_add ("/note-pdf/figure-only", Out, NULL, out_setup, test_figure_only, out_teardown);
  g_test_add ("/note-pdf/summary-page", Out, NULL, out_setup, test_summary_page, out_teardown);
  g_test_add ("/note-pdf/last-page", Out, NULL, out_setup, test_last_page, out_teardown);
  g_test_add_func ("/note-pdf/same-rows", test_same_rows);
  return g_test_run ();
}
