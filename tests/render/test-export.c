/* test-export.c — SVG, PDF and PNG files, the sheet, and failures
 *
 * Files are checked by readers from outside the project: libxml2 parses
 * the SVG, the PDF is read for its header and page objects (PDF 1.x,
 * ISO 32000-1: every page is a dictionary of /Type /Page), cairo's PNG
 * reader gives the size.  Every demo shell goes through the real program.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-export"

#include "hl-render-test.h"
#include "hl-export.h"
#include "hl-sheet.h"
#include "hl-test-program.h"

#include <glib/gstdio.h>
#include <libxml/parser.h>
#include <libxml/tree.h>
#include <string.h>
#include <unistd.h>

static char *
temp_dir (void)
{
  g_autoptr(GError) error = NULL;
  char *dir = g_dir_make_tmp ("hl-render-XXXXXX", &error);

  g_assert_no_error (error);
  return dir;
}

static void
remove_tree (const char *dir)
{
  g_autoptr(GDir) d = g_dir_open (dir, 0, NULL);
  const char *name;

  while (d != NULL && (name = g_dir_read_name (d)) != NULL)
    {
      g_autofree char *p = g_build_filename (dir, name, NULL);

      if (g_file_test (p, G_FILE_TEST_IS_DIR))
        remove_tree (p);
      else
        g_unlink (p);
    }
  g_rmdir (dir);
}

static guint
count_entries (const char *dir)
{
  g_autoptr(GDir) d = g_dir_open (dir, 0, NULL);
  guint n = 0;

  while (d != NULL && g_dir_read_name (d) != NULL)
    n++;
  return n;
}

static void
check_svg (const char *path,
           const char *width,
           const char *height)
{
  xmlDocPtr doc = xmlReadFile (path, NULL, XML_PARSE_NONET | XML_PARSE_NOERROR | XML_PARSE_NOWARNING);
  xmlNodePtr root;
  xmlChar *w, *h;

  g_assert_nonnull (doc);
  root = xmlDocGetRootElement (doc);
  g_assert_nonnull (root);
  g_assert_cmpstr ((const char *) root->name, ==, "svg");
  w = xmlGetProp (root, (const xmlChar *) "width");
  h = xmlGetProp (root, (const xmlChar *) "height");
  g_assert_cmpstr ((const char *) w, ==, width);
  g_assert_cmpstr ((const char *) h, ==, height);
  xmlFree (w);
  xmlFree (h);
  xmlFreeDoc (doc);
}

/* page objects: "/Type /Page" not followed by "s" (that is the tree) */
static guint
pdf_pages (const char *path)
{
  g_autofree char *data = NULL;
  gsize len = 0;
  guint n = 0;

  g_assert_true (g_file_get_contents (path, &data, &len, NULL));
  g_assert_cmpuint (len, >, 8);
  g_assert_true (memcmp (data, "%PDF-", 5) == 0);
  /* compressed streams hold NUL bytes: scan bytes, not a C string */
  for (gsize i = 0; i + 11 < len; i++)
    if (memcmp (data + i, "/Type", 5) == 0)
      {
        gsize q = i + 5;

        while (q < len && (data[q] == ' ' || data[q] == '\n' || data[q] == '\r'))
          q++;
        if (q + 6 <= len && memcmp (data + q, "/Page", 5) == 0 && data[q + 5] != 's')
          n++;
      }
  return n;
}

static void
check_png (const char *path,
           int         width,
           int         height)
{
  cairo_surface_t *s = cairo_image_surface_create_from_png (path);

  g_assert_cmpint (cairo_surface_status (s), ==, CAIRO_STATUS_SUCCESS);
  g_assert_cmpint (cairo_image_surface_get_width (s), ==, width);
  g_assert_cmpint (cairo_image_surface_get_height (s), ==, height);
  cairo_surface_destroy (s);
}

static int
run_export (HlProject           *project,
            const HlShellInputs *shell,
            const char          *path,
            const char          *size,
            gboolean             figure_only,
            GError             **error)
{
  g_autoptr(GList) shells = g_list_append (NULL, (gpointer) shell);
  HlExportRequest req = { project, shells, path, HL_UNIT_SYSTEM_SI, HL_DEFAULT_POINTS, size, figure_only, TRUE };
  g_autoptr(GError) local = NULL;
  int status;

  /* the command line's exit codes (DESIGN.md §5), from the error kind */
  if (hl_export_run (&req, &local))
    return 0;
  g_assert_nonnull (local);
  status = g_error_matches (local, HL_EXPORT_ERROR, HL_EXPORT_ERROR_BAD_REQUEST) ? 2 : 1;
  g_propagate_error (error, g_steal_pointer (&local));
  return status;
}

static void
test_parse_size (void)
{
  static const char *const bad[] = {
    "800", "x500", "800x", "99x500", "500x99", "20001x100", "800x500x2", "-800x500", "8e2x500", " 800x500",
    "800x500 ", "800 x 500", "0x0", "abc", "", "800x99999999999999999999",
  };
  guint w, h;

  g_assert_true (hl_export_parse_size ("800x500", HL_EXPORT_PNG, &w, &h, NULL));
  g_assert_cmpuint (w, ==, 800);
  g_assert_cmpuint (h, ==, 500);
  g_assert_true (hl_export_parse_size ("100X20000", HL_EXPORT_SVG, &w, &h, NULL));
  g_assert_cmpuint (h, ==, 20000);
  /* the default fits an A4 landscape page, 842 x 595 pt (ISO 216: 297 x
   * 210 mm); PNG at twice that */
  g_assert_true (hl_export_parse_size (NULL, HL_EXPORT_PDF, &w, &h, NULL));
  g_assert_cmpuint (w, ==, 842);
  g_assert_cmpuint (h, ==, 595);
  g_assert_true (hl_export_parse_size (NULL, HL_EXPORT_PNG, &w, &h, NULL));
  g_assert_cmpuint (w, ==, 1684);
  g_assert_cmpuint (h, ==, 1190);
  for (guint i = 0; i < G_N_ELEMENTS (bad); i++)
    {
      g_autoptr(GError) error = NULL;

      g_assert_false (hl_export_parse_size (bad[i], HL_EXPORT_PNG, &w, &h, &error));
      g_assert_nonnull (error);
      g_assert_nonnull (strstr (error->message, "--size"));
    }
}

static void
test_formats (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autofree char *dir = temp_dir ();
  g_autofree char *svg = g_build_filename (dir, "f.svg", NULL);
  g_autofree char *pdf = g_build_filename (dir, "f.pdf", NULL);
  g_autofree char *pdf1 = g_build_filename (dir, "f1.pdf", NULL);
  g_autofree char *png = g_build_filename (dir, "f.png", NULL);
  g_autofree char *png2 = g_build_filename (dir, "f2.png", NULL);
  const HlShellInputs *shell = hl_project_shell (demo, 0);
  g_autoptr(HlSolution) sol = hl_rt_solve (shell);
  HlFigureContext ctx = { 0 };
  guint sheet;

  g_assert_cmpint (run_export (demo, shell, svg, NULL, FALSE, NULL), ==, 0);
  check_svg (svg, "842pt", "595pt");
  g_assert_cmpint (run_export (demo, shell, svg, "1000x700", FALSE, NULL), ==, 0);
  check_svg (svg, "1000pt", "700pt");

  ctx.project = demo;
  ctx.solution = sol;
  sheet = hl_sheet_page_count (HL_SHEET_A4_WIDTH, HL_SHEET_A4_HEIGHT, &ctx);
  g_assert_cmpuint (sheet, >=, 1);
  g_assert_cmpint (run_export (demo, shell, pdf, NULL, FALSE, NULL), ==, 0);
  g_assert_cmpuint (pdf_pages (pdf), ==, 1 + sheet);
  g_assert_cmpint (run_export (demo, shell, pdf1, NULL, TRUE, NULL), ==, 0);
  g_assert_cmpuint (pdf_pages (pdf1), ==, 1);

  g_assert_cmpint (run_export (demo, shell, png, NULL, FALSE, NULL), ==, 0);
  check_png (png, 1684, 1190);
  g_assert_cmpint (run_export (demo, shell, png2, "800x500", FALSE, NULL), ==, 0);
  check_png (png2, 800, 500);
  /* five files and nothing else: no temporary left over */
  g_assert_cmpuint (count_entries (dir), ==, 5);
  remove_tree (dir);
}

static void
test_demo_all (void)
{
  static const char *const ext[] = { "svg", "pdf", "png" };
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autofree char *demo_path = hl_rt_demo_path ();
  g_autofree char *dir = temp_dir ();

  for (guint i = 0; i < hl_project_n_shells (demo); i++)
    for (guint k = 0; k < G_N_ELEMENTS (ext); k++)
      {
        const char *id = hl_project_shell (demo, i)->id;
        g_autofree char *out = g_strdup_printf ("%s/%s.%s", dir, id, ext[k]);
        g_autofree char *a_out = g_strdup_printf ("--export=%s", out);
        g_autofree char *a_shell = g_strdup_printf ("--shell=%s", id);
        g_autoptr(HlRun) run = hl_test_run (a_out, a_shell, demo_path, NULL);

        if (run->status != 0)
          g_error ("%s %s: exit %d: %s", id, ext[k], run->status, run->err);
        if (k == 0)
          check_svg (out, "842pt", "595pt");
        else if (k == 1)
          g_assert_cmpuint (pdf_pages (out), >=, 2);
        else
          check_png (out, 1684, 1190);
      }
  /* without --shell: a PNG is one figure, so one file per shell, named
   * after it (issue 11) */
  {
    g_autofree char *out = g_build_filename (dir, "all.png", NULL);
    g_autofree char *a_out = g_strdup_printf ("--export=%s", out);
    g_autoptr(HlRun) run = hl_test_run (a_out, "--size=600x900", demo_path, NULL);

    g_assert_cmpint (run->status, ==, 0);
    g_assert_false (g_file_test (out, G_FILE_TEST_EXISTS));
    for (guint i = 0; i < hl_project_n_shells (demo); i++)
      {
        g_autofree char *each = g_strdup_printf ("%s/all-%s.png", dir, hl_project_shell (demo, i)->id);

        check_png (each, 600, 900);
      }
  }
  g_assert_cmpuint (count_entries (dir), ==, 4 * hl_project_n_shells (demo));
  remove_tree (dir);
}

static void
expect_failure (HlProject  *demo,
                const char *path,
                int         status)
{
  g_autoptr(GError) error = NULL;

  g_assert_cmpint (run_export (demo, hl_project_shell (demo, 0), path, NULL, FALSE, &error), ==, status);
  g_assert_nonnull (error);
  g_test_message ("%s: %s", path, error->message);
  g_assert_false (g_file_test (path, G_FILE_TEST_IS_REGULAR));
}

static void
test_failures (void)
{
  static const char *const ext[] = { "svg", "pdf", "png" };
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autofree char *dir = temp_dir ();
  g_autofree char *folder_png = g_build_filename (dir, "folder.png", NULL);
  g_autofree char *ro = g_build_filename (dir, "read-only", NULL);

  g_assert_cmpint (g_mkdir (folder_png, 0755), ==, 0);
  g_assert_cmpint (g_mkdir (ro, 0555), ==, 0);
  for (guint k = 0; k < G_N_ELEMENTS (ext); k++)
    {
      g_autofree char *folder = g_strdup_printf ("%s/folder.%s", dir, ext[k]);
      g_autofree char *missing = g_strdup_printf ("%s/no-such-folder/out.%s", dir, ext[k]);
      g_autofree char *in_ro = g_strdup_printf ("%s/out.%s", ro, ext[k]);
      g_autofree char *in_proc = g_strdup_printf ("/proc/hoopline-render-test.%s", ext[k]);

      if (k != 2)
        g_assert_cmpint (g_mkdir (folder, 0755), ==, 0);
      /* a folder where the file should go */
      {
        g_autoptr(GError) error = NULL;

        g_assert_cmpint (run_export (demo, hl_project_shell (demo, 0), folder, NULL, FALSE, &error), ==, 1);
        g_assert_true (g_file_test (folder, G_FILE_TEST_IS_DIR));
      }
      expect_failure (demo, missing, 1);
      /* root writes anywhere it has permission bits for; /proc takes no
       * new files from anyone */
      if (geteuid () != 0)
        {
          expect_failure (demo, in_ro, 1);
          g_assert_cmpuint (count_entries (ro), ==, 0);
        }
      expect_failure (demo, in_proc, 1);
    }
  /* nothing but the folders made above */
  g_assert_cmpuint (count_entries (dir), ==, 4);
  g_chmod (ro, 0755);
  remove_tree (dir);
}

static void
test_bad_values (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autofree char *dir = temp_dir ();
  g_autofree char *out = g_build_filename (dir, "bad.png", NULL);
  HlShellInputs bad = *hl_project_shell (demo, 0);
  g_autoptr(GError) error = NULL;
  g_autoptr(GList) shells = NULL;

  /* a wall of no thickness: exit 1 naming the shell, nothing written */
  bad.wall_thickness = hl_quantity_make (0, "mm");
  shells = g_list_append (NULL, &bad);
  {
    HlExportRequest req = { demo, shells, out, HL_UNIT_SYSTEM_SI, HL_DEFAULT_POINTS, NULL, FALSE, FALSE };

    g_assert_false (hl_export_run (&req, &error));
  g_assert_false (g_error_matches (error, HL_EXPORT_ERROR, HL_EXPORT_ERROR_BAD_REQUEST));
    g_assert_nonnull (strstr (error->message, bad.id));
  }
  g_assert_cmpuint (count_entries (dir), ==, 0);
  g_clear_error (&error);
  /* a bad size is a bad command line: exit 2 */
  g_assert_cmpint (run_export (demo, hl_project_shell (demo, 0), out, "50x50", FALSE, &error), ==, 2);
  g_assert_cmpuint (count_entries (dir), ==, 0);
  remove_tree (dir);
}

static void
test_bad_size_program (void)
{
  g_autofree char *demo_path = hl_rt_demo_path ();
  g_autofree char *dir = temp_dir ();
  g_autofree char *out = g_build_filename (dir, "x.png", NULL);
  g_autofree char *a_out = g_strdup_printf ("--export=%s", out);
  static const char *const sizes[] = { "--size=abc", "--size=99x500", "--size=20001x100", "--size=800x" };

  for (guint i = 0; i < G_N_ELEMENTS (sizes); i++)
    {
      g_autoptr(HlRun) run = hl_test_run (a_out, sizes[i], demo_path, NULL);

      g_assert_cmpint (run->status, ==, 2);
      g_assert_nonnull (strstr (run->err, "--size"));
      g_assert_false (g_file_test (out, G_FILE_TEST_EXISTS));
    }
  remove_tree (dir);
}

static void
test_sheet_pages (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_shell (demo, 0));
  HlFigureContext ctx = { 0 };
  guint a4, small;

  ctx.project = demo;
  ctx.solution = sol;
  a4 = hl_sheet_page_count (HL_SHEET_A4_WIDTH, HL_SHEET_A4_HEIGHT, &ctx);
  small = hl_sheet_page_count (HL_SHEET_A4_WIDTH, HL_SHEET_A4_HEIGHT / 2, &ctx);
  g_assert_cmpuint (a4, >=, 1);
  /* half the height, more pages */
  g_assert_cmpuint (small, >, a4);
  for (guint p = 0; p < a4; p++)
    {
      cairo_surface_t *s = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 595, 842);
      cairo_t *cr = cairo_create (s);

      hl_sheet_draw_page (cr, HL_SHEET_A4_WIDTH, HL_SHEET_A4_HEIGHT, p, &ctx);
      g_assert_cmpint (cairo_status (cr), ==, CAIRO_STATUS_SUCCESS);
      cairo_destroy (cr);
      cairo_surface_destroy (s);
    }
  ctx.solution = NULL;
  g_assert_cmpuint (hl_sheet_page_count (HL_SHEET_A4_WIDTH, HL_SHEET_A4_HEIGHT, &ctx), ==, 0);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/render/export/parse-size", test_parse_size);
  g_test_add_func ("/render/export/formats", test_formats);
  g_test_add_func ("/render/export/demo-every-shell", test_demo_all);
  g_test_add_func ("/render/export/unwritable", test_failures);
  g_test_add_func ("/render/export/bad-values", test_bad_values);
  g_test_add_func ("/render/export/bad-size-program", test_bad_size_program);
  g_test_add_func ("/render/sheet/pages", test_sheet_pages);
  return g_test_run ();
}
