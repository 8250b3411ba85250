/* test-cli-scope.c — what an export covers, its paper and panels, and
 * its numbers in a German locale, from the real program
 *
 * Spawns $HL_PROGRAM with no display over the invented demo project
 * (three shells: air-receiver, press-barrel, n2-sphere).  Sources beside
 * each check:
 *  - issue 11 ("One report for the project"): without --shell an export
 *    writes every shell, with --shell=ID one; PNG/SVG stay one figure,
 *    one file per shell.
 *  - DESIGN.md §5: exit 2 for a bad command line, nothing written to OUT
 *    unless the whole job succeeds.
 *  - RFC 4180 §2: CSV fields separated by commas; a decimal comma would
 *    split a number in two, so a CSV keeps the decimal point.
 *  - DIN 1333 (common practice in German documents): the decimal comma.
 *  - PNG (ISO/IEC 15948 §5.2): the eight signature bytes 89 50 4E 47 0D 0A 1A 0A.
 *  - ISO 216 A4 is 210 mm x 297 mm, ANSI Letter 8.5 in x 11 in (common practice).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-cli-scope"

#include "hl-test-program.h"

#include <glib/gstdio.h>
#include <locale.h>
#include <string.h>

static const char *const demo_ids[] = { "air-receiver", "press-barrel", "n2-sphere" };

typedef struct
{
  char *dir;
  char *demo;
} Temp;

static void
temp_setup (Temp         *t,
            gconstpointer data)
{
  (void) data;
  t->dir = hl_test_temp_dir ();
  t->demo = g_build_filename (g_getenv ("HL_SOURCE_DIR"), "data", "examples", "demo.hoop", NULL);
}

static void
temp_teardown (Temp         *t,
               gconstpointer data)
{
  (void) data;
  hl_test_remove_tree (t->dir);
  g_free (t->dir);
  g_free (t->demo);
}

static HlRun *
run_args (const char        *locale,
          const char *const *args)
{
  HlRun *run = hl_test_run_in (NULL, locale, args);

  g_assert_false (run->timed_out);
  return run;
}

static void
expect_ok (const char        *locale,
           const char *const *args)
{
  g_autoptr(HlRun) run = run_args (locale, args);

  if (run->status != 0)
    g_error ("exit %d: %s", run->status, run->err);
  g_assert_cmpstr (run->err, ==, "");
}

static char *
read_text (const char *path)
{
  char *text = NULL;
  g_autoptr(GError) error = NULL;

  g_assert_true (g_file_get_contents (path, &text, NULL, &error));
  g_assert_no_error (error);
  return text;
}

/* the "# shell = ID" lines of a CSV, in order */
static GPtrArray *
csv_shells (const char *path)
{
  g_autofree char *text = read_text (path);
  g_auto(GStrv) lines = hl_test_lines (text);
  GPtrArray *ids = g_ptr_array_new_with_free_func (g_free);

  for (guint i = 0; lines[i] != NULL; i++)
    if (g_str_has_prefix (lines[i], "# shell = "))
      g_ptr_array_add (ids, g_strdup (lines[i] + strlen ("# shell = ")));
  return ids;
}

static guint
count_files (const char *dir)
{
  g_autoptr(GDir) d = g_dir_open (dir, 0, NULL);
  guint n = 0;

  g_assert_nonnull (d);
  while (g_dir_read_name (d) != NULL)
    n++;
  return n;
}

/* issue 11: a CSV without --shell has every shell, in the project's
 * order, each with its header lines; with --shell that one */
static void
test_csv_scope (Temp         *t,
                gconstpointer data)
{
  g_autofree char *all = g_build_filename (t->dir, "all.csv", NULL);
  g_autofree char *one = g_build_filename (t->dir, "one.csv", NULL);
  g_autofree char *e_all = g_strdup_printf ("--export=%s", all);
  g_autofree char *e_one = g_strdup_printf ("--export=%s", one);
  g_autoptr(GPtrArray) ids = NULL;
  g_autoptr(GPtrArray) ids_one = NULL;
  g_autofree char *text = NULL;
  static const char *const keys[] = {
    "# table = ", "# name = ", "# units = SI (mm, MPa)", "# design_pressure = ", "# internal_pressure = ",
    "# external_pressure = ", "# design_verdict = ",
  };

  (void) data;
  expect_ok (NULL, (const char *const[]) { e_all, t->demo, NULL });
  expect_ok (NULL, (const char *const[]) { e_one, "--shell=n2-sphere", t->demo, NULL });
  ids = csv_shells (all);
  g_assert_cmpuint (ids->len, ==, G_N_ELEMENTS (demo_ids));
  for (guint i = 0; i < ids->len; i++)
    g_assert_cmpstr (g_ptr_array_index (ids, i), ==, demo_ids[i]);
  ids_one = csv_shells (one);
  g_assert_cmpuint (ids_one->len, ==, 1);
  g_assert_cmpstr (g_ptr_array_index (ids_one, 0), ==, "n2-sphere");
  /* every block says what it is, its units and its load */
  text = read_text (all);
  for (guint k = 0; k < G_N_ELEMENTS (keys); k++)
    {
      guint n = 0;

      for (const char *p = strstr (text, keys[k]); p != NULL; p = strstr (p + 1, keys[k]))
        n++;
      if (n != G_N_ELEMENTS (demo_ids))
        g_error ("“%s” is in %u blocks, not in each of %u", keys[k], n, (guint) G_N_ELEMENTS (demo_ids));
    }
  /* the demo's air receiver is at 11 bar, as typed in the file */
  g_assert_nonnull (strstr (text, "# internal_pressure = 11 bar\n"));
  /* the separator is said in the file (RFC 4180) */
  g_assert_nonnull (strstr (text, "separated by commas (RFC 4180)"));
}

/* issue 11: the text report without --shell has every shell, with
 * --shell=ID that one only */
static void
test_txt_scope (Temp         *t,
                gconstpointer data)
{
  g_autofree char *all = g_build_filename (t->dir, "all.txt", NULL);
  g_autofree char *one = g_build_filename (t->dir, "one.txt", NULL);
  g_autofree char *e_all = g_strdup_printf ("--export=%s", all);
  g_autofree char *e_one = g_strdup_printf ("--export=%s", one);
  g_autofree char *text_all = NULL;
  g_autofree char *text_one = NULL;

  (void) data;
  expect_ok (NULL, (const char *const[]) { e_all, t->demo, NULL });
  expect_ok (NULL, (const char *const[]) { e_one, "--shell=press-barrel", t->demo, NULL });
  text_all = read_text (all);
  text_one = read_text (one);
  for (guint i = 0; i < G_N_ELEMENTS (demo_ids); i++)
    {
      if (strstr (text_all, demo_ids[i]) == NULL)
        g_error ("the report of the project lacks shell %s", demo_ids[i]);
      if ((strstr (text_one, demo_ids[i]) != NULL) != (strcmp (demo_ids[i], "press-barrel") == 0))
        g_error ("the report of press-barrel is wrong about shell %s", demo_ids[i]);
    }
}

static gboolean
is_png (const char *path)
{
  g_autoptr(GBytes) bytes = hl_test_read_file (path);
  gsize len = 0;
  const guchar *d = bytes != NULL ? g_bytes_get_data (bytes, &len) : NULL;

  return d != NULL && len > 8 && memcmp (d, "\x89PNG\r\n\x1a\n", 8) == 0;
}

static gboolean
is_svg (const char *path)
{
  g_autofree char *text = NULL;

  return g_file_get_contents (path, &text, NULL, NULL) && strstr (text, "<svg") != NULL;
}

/* issue 11: an SVG or PNG is one figure; without --shell one file per
 * shell, named OUT's stem, "-", the id; with --shell the one file OUT */
static void
test_figure_per_shell (Temp         *t,
                       gconstpointer data)
{
  static const char *const exts[] = { "svg", "png" };

  (void) data;
  for (guint e = 0; e < G_N_ELEMENTS (exts); e++)
    {
      g_autofree char *sub = g_build_filename (t->dir, exts[e], NULL);
      g_autofree char *out = NULL;
      g_autofree char *opt = NULL;
      g_autofree char *one = NULL;
      g_autofree char *e_one = NULL;

      g_assert_cmpint (g_mkdir (sub, 0700), ==, 0);
      out = g_strdup_printf ("%s/plan.%s", sub, exts[e]);
      opt = g_strdup_printf ("--export=%s", out);
      expect_ok (NULL, (const char *const[]) { opt, t->demo, NULL });
      g_assert_false (g_file_test (out, G_FILE_TEST_EXISTS));
      for (guint i = 0; i < G_N_ELEMENTS (demo_ids); i++)
        {
          g_autofree char *path = g_strdup_printf ("%s/plan-%s.%s", sub, demo_ids[i], exts[e]);

          if (!(e == 0 ? is_svg (path) : is_png (path)))
            g_error ("%s is not a figure", path);
        }
      g_assert_cmpuint (count_files (sub), ==, G_N_ELEMENTS (demo_ids));

      one = g_strdup_printf ("%s/one.%s", sub, exts[e]);
      e_one = g_strdup_printf ("--export=%s", one);
      expect_ok (NULL, (const char *const[]) { e_one, "--shell=press-barrel", t->demo, NULL });
      g_assert_true (e == 0 ? is_svg (one) : is_png (one));
      g_assert_cmpuint (count_files (sub), ==, G_N_ELEMENTS (demo_ids) + 1);
    }
}

/* DESIGN.md §5: nothing written unless the whole job succeeds; one of
 * the three names taken by a folder stops all three */
static void
test_figure_per_shell_atomic (Temp         *t,
                              gconstpointer data)
{
  g_autofree char *out = g_build_filename (t->dir, "plan.svg", NULL);
  g_autofree char *opt = g_strdup_printf ("--export=%s", out);
  g_autofree char *blocker = g_build_filename (t->dir, "plan-n2-sphere.svg", NULL);
  g_autoptr(HlRun) run = NULL;

  (void) data;
  g_assert_cmpint (g_mkdir (blocker, 0700), ==, 0);
  run = run_args (NULL, (const char *const[]) { opt, t->demo, NULL });
  g_assert_cmpint (run->status, ==, 1);
  g_assert_nonnull (strstr (run->err, "plan-n2-sphere.svg"));
  g_assert_cmpuint (count_files (t->dir), ==, 1);   /* the folder alone */
}

/* --paper and --panels: accepted values write the file, others are a
 * bad command line (exit 2) that writes nothing */
static void
test_paper_and_panels (Temp         *t,
                       gconstpointer data)
{
  g_autofree char *out = g_build_filename (t->dir, "x.svg", NULL);
  g_autofree char *opt = g_strdup_printf ("--export=%s", out);
  static const char *const good[] = {
    "--paper=a4", "--paper=letter", "--paper=Letter", "--panels=plot", "--panels=section,detail,plot,chart",
    "--panels=chart, plot",
  };
  static const char *const bad[] = {
    "--paper=a5", "--paper=", "--panels=", "--panels=plot,plot", "--panels=plots", "--panels=plot,,chart",
  };

  (void) data;
  for (guint i = 0; i < G_N_ELEMENTS (good); i++)
    {
      expect_ok (NULL, (const char *const[]) { opt, good[i], "--shell=air-receiver", t->demo, NULL });
      g_assert_true (is_svg (out));
      g_assert_cmpint (g_unlink (out), ==, 0);
    }
  for (guint i = 0; i < G_N_ELEMENTS (bad); i++)
    {
      g_autoptr(HlRun) run = run_args (NULL, (const char *const[]) { opt, bad[i], "--shell=air-receiver",
                                                                     t->demo, NULL });

      g_test_message ("%s -> %d: %s", bad[i], run->status, run->err);
      g_assert_cmpint (run->status, ==, 2);
      g_assert_cmpstr (run->out, ==, "");
      g_assert_nonnull (strstr (run->err, g_str_has_prefix (bad[i], "--paper") ? "--paper" : "--panels"));
      g_assert_false (g_file_test (out, G_FILE_TEST_EXISTS));
    }
}

/* --help names the new options, the default paper and the scope rule */
static void
test_help (void)
{
  g_autoptr(HlRun) help = run_args (NULL, (const char *const[]) { "--help", NULL });
  static const char *const words[] = {
    "--paper", "a4|letter", "Letter when the project's units are US customary", "--panels",
    "section, detail, plot, chart", "one file per", "RFC 4180", "SI (mm, MPa)", "US customary (in, psi)",
  };

  g_assert_cmpint (help->status, ==, 0);
  for (guint i = 0; i < G_N_ELEMENTS (words); i++)
    if (strstr (help->out, words[i]) == NULL)
      g_error ("--help does not say “%s”", words[i]);
}

static gboolean
have_german (void)
{
  g_autofree char *old = g_strdup (setlocale (LC_ALL, NULL));
  gboolean ok = setlocale (LC_ALL, "de_DE.UTF-8") != NULL;

  setlocale (LC_ALL, old);
  if (!ok)
    g_test_skip ("the de_DE.UTF-8 locale is not installed (locale-gen de_DE.UTF-8)");
  return ok;
}

/* RFC 4180: a CSV written in a German locale keeps the decimal point,
 * byte for byte the C locale's file */
static void
test_csv_german_points (Temp         *t,
                        gconstpointer data)
{
  g_autofree char *c = g_build_filename (t->dir, "c.csv", NULL);
  g_autofree char *de = g_build_filename (t->dir, "de.csv", NULL);
  g_autofree char *e_c = g_strdup_printf ("--export=%s", c);
  g_autofree char *e_de = g_strdup_printf ("--export=%s", de);
  g_autofree char *text_c = NULL;
  g_autofree char *text_de = NULL;

  (void) data;
  if (!have_german ())
    return;
  expect_ok ("C", (const char *const[]) { e_c, t->demo, NULL });
  expect_ok ("de_DE.UTF-8", (const char *const[]) { e_de, t->demo, NULL });
  text_c = read_text (c);
  text_de = read_text (de);
  g_assert_cmpstr (text_de, ==, text_c);
  /* the barrel's bore hoop stress, 5p/3 for k = 2 (Lamé, Timoshenko), in
   * C-locale digits: 66.66666667 MPa */
  g_assert_nonnull (strstr (text_de, ",66.66666667,"));
}

/* DIN 1333: a figure written in a German locale has decimal commas, as
 * the window shows it; the same figure in the C locale has points.  The
 * figure-only PDF keeps its text, so pdftotext reads it back. */
static void
test_figure_german_commas (Temp         *t,
                           gconstpointer data)
{
  g_autofree char *de = g_build_filename (t->dir, "de.pdf", NULL);
  g_autofree char *c = g_build_filename (t->dir, "c.pdf", NULL);
  g_autofree char *e_de = g_strdup_printf ("--export=%s", de);
  g_autofree char *e_c = g_strdup_printf ("--export=%s", c);
  g_autofree char *out_de = NULL, *out_c = NULL;
  g_autofree char *pdftotext = g_find_program_in_path ("pdftotext");

  (void) data;
  if (!have_german ())
    return;
  if (pdftotext == NULL)
    {
      g_test_skip ("pdftotext (poppler-utils) is not installed");
      return;
    }
  expect_ok ("de_DE.UTF-8", (const char *const[]) { e_de, "--figure-only", "--shell=press-barrel", t->demo, NULL });
  expect_ok ("C", (const char *const[]) { e_c, "--figure-only", "--shell=press-barrel", t->demo, NULL });
  g_assert_true (g_spawn_sync (NULL, (char *[]) { pdftotext, de, "-", NULL }, NULL, 0, NULL, NULL, &out_de, NULL,
                               NULL, NULL));
  g_assert_true (g_spawn_sync (NULL, (char *[]) { pdftotext, c, "-", NULL }, NULL, 0, NULL, NULL, &out_c, NULL,
                               NULL, NULL));
  /* Lamé bore hoop stress 5p/3 = 66.67 MPa at 400 bar, k = 2 (Timoshenko) */
  g_assert_nonnull (strstr (out_de, "66,67"));
  g_assert_null (strstr (out_de, "66.67"));
  g_assert_nonnull (strstr (out_c, "66.67"));
  g_assert_null (strstr (out_c, "66,67"));
}

/* DIN 1333: the text report written in a German locale has decimal
 * commas and German words, as the sheet; the C locale's has points */
static void
test_text_german_commas (Temp         *t,
                         gconstpointer data)
{
  g_autofree char *de = g_build_filename (t->dir, "de.txt", NULL);
  g_autofree char *c = g_build_filename (t->dir, "c.txt", NULL);
  g_autofree char *e_de = g_strdup_printf ("--export=%s", de);
  g_autofree char *e_c = g_strdup_printf ("--export=%s", c);
  g_autofree char *text_de = NULL, *text_c = NULL;

  (void) data;
  if (!have_german ())
    return;
  expect_ok ("de_DE.UTF-8", (const char *const[]) { e_de, "--shell=press-barrel", t->demo, NULL });
  expect_ok ("C", (const char *const[]) { e_c, "--shell=press-barrel", t->demo, NULL });
  text_de = read_text (de);
  text_c = read_text (c);
  /* Lamé bore hoop stress 5p/3 = 66.67 MPa at 400 bar, k = 2 (Timoshenko) */
  g_assert_nonnull (strstr (text_de, "66,67"));
  g_assert_null (strstr (text_de, "66.67"));
  g_assert_nonnull (strstr (text_c, "66.67"));
  g_assert_nonnull (strstr (text_de, "Berechnungsblatt"));
  g_assert_nonnull (strstr (text_c, "Calculation sheet"));
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);

  g_test_add ("/cli/scope/csv", Temp, NULL, temp_setup, test_csv_scope, temp_teardown);
  g_test_add ("/cli/scope/txt", Temp, NULL, temp_setup, test_txt_scope, temp_teardown);
  g_test_add ("/cli/scope/figure-per-shell", Temp, NULL, temp_setup, test_figure_per_shell, temp_teardown);
  g_test_add ("/cli/scope/figure-per-shell-atomic", Temp, NULL, temp_setup, test_figure_per_shell_atomic,
              temp_teardown);
  g_test_add ("/cli/options/paper-and-panels", Temp, NULL, temp_setup, test_paper_and_panels, temp_teardown);
  g_test_add_func ("/cli/options/help", test_help);
  g_test_add ("/cli/locale/csv-points", Temp, NULL, temp_setup, test_csv_german_points, temp_teardown);
  g_test_add ("/cli/locale/figure-commas", Temp, NULL, temp_setup, test_figure_german_commas, temp_teardown);
  g_test_add ("/cli/locale/text-commas", Temp, NULL, temp_setup, test_text_german_commas, temp_teardown);
  return g_test_run ();
}
