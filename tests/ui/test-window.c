/* test-window.c — the real window, driven as a person would drive it
 *
 * Runs under a (virtual) display.  Each test builds a fresh window on the
 * demo project, changes fields through their entries and actions, lets
 * GTK run until idle and then reads what the window shows.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-window"

#include "hl-config.h"
#include "hl-application.h"
#include "hl-ui-test-util.h"
#include "hl-project-file.h"
#include "hl-shell-check.h"
#include "hl-window.h"

#include <glib/gstdio.h>
#include <stdio.h>
#include <locale.h>
#include <math.h>
#include <string.h>

static HlApplication *app;

#define open_demo() hl_ui_open_demo (app)
#define discard_window hl_ui_discard_window

static HlQuantityRow *
row (HlWindow   *window,
     const char *field)
{
  HlQuantityRow *r = hl_shell_editor_get_row (hl_window_get_shell_editor (window), field);

  g_assert_nonnull (r);
  return r;
}

static void
type_into (HlWindow   *window,
           const char *field,
           const char *text)
{
  gtk_editable_set_text (hl_quantity_row_get_entry (row (window, field)), text);
  hl_ui_iterate ();
}

static const HlSolution *
solution (HlWindow *window)
{
  return hl_document_get_solution (hl_window_get_document (window));
}

static void
activate (HlWindow   *window,
          const char *action,
          GVariant   *param)
{
  g_assert_true (g_action_group_get_action_enabled (G_ACTION_GROUP (window), action));
  g_action_group_activate_action (G_ACTION_GROUP (window), action, param);
  hl_ui_iterate ();
}

/* The demo's air receiver: ID 1200 mm, t 10 mm, c 1.5 mm, 11 bar. */
static void
test_demo_edit_changes_results (void)
{
  HlWindow *window = open_demo ();
  const HlSolution *s;
  g_autofree char *before = NULL;
  g_autofree char *after = NULL;
  double a, t, r_mean;

  s = solution (window);
  g_assert_nonnull (s);
  before = hl_results_table_get_text (hl_window_get_results_table (window));
  g_assert_nonnull (strstr (before, "Thin-wall hoop stress\t"));

  type_into (window, "wall-thickness", "12");
  s = solution (window);
  g_assert_nonnull (s);
  /* thin-wall hoop stress p R / t on the mean radius of the corroded
   * wall (membrane formula, common practice): a = 600 + 1.5 mm,
   * t = 12 - 1.5 mm, p = 11 bar = 1.1 MPa */
  a = 0.6015;
  t = 0.0105;
  r_mean = a + t / 2;
  g_assert_cmpfloat_with_epsilon (s->t, t, 1e-12);
  g_assert_cmpfloat_with_epsilon (s->thin_hoop.value, 1.1e6 * r_mean / t, 1e-6 * 1.1e6 * r_mean / t);
  after = hl_results_table_get_text (hl_window_get_results_table (window));
  g_assert_cmpstr (before, !=, after);
  g_assert_true (hl_document_get_modified (hl_window_get_document (window)));
  discard_window (window);
}

static void
test_bad_value_is_marked (void)
{
  HlWindow *window = open_demo ();
  HlQuantityRow *thickness = row (window, "wall-thickness");
  GtkWidget *entry = GTK_WIDGET (hl_quantity_row_get_entry (thickness));
  g_autofree char *text = NULL;

  type_into (window, "wall-thickness", "ten");
  g_assert_true (gtk_widget_has_css_class (entry, "error"));
  g_assert_null (solution (window));
  g_assert_nonnull (hl_document_get_problem_text (hl_window_get_document (window)));
  /* the canvas's title block still names the shell being fixed, as the
   * printout and the exports do (one context builder) */
  {
    HlFigureContext ctx;

    hl_canvas_build_context (hl_window_get_canvas (window), &ctx);
    g_assert_null (ctx.solution);
    g_assert_nonnull (ctx.problem_text);
    g_assert_nonnull (ctx.shell);
    g_assert_cmpstr (ctx.shell->name, ==, "Plant air receiver AR-2");
    g_assert_true (ctx.locale_numbers);
  }
  text = hl_results_table_get_text (hl_window_get_results_table (window));
  g_assert_cmpstr (text, ==, "");
  g_assert_false (g_action_group_get_action_enabled (G_ACTION_GROUP (window), "export"));

  /* reads as a number but no wall can be negative (common practice) */
  type_into (window, "wall-thickness", "-3");
  g_assert_true (gtk_widget_has_css_class (entry, "error"));
  g_assert_null (solution (window));

  /* the allowance cannot take the whole wall (common practice) */
  type_into (window, "wall-thickness", "1");
  g_assert_null (solution (window));
  g_assert_true (hl_quantity_row_has_error (row (window, "corrosion-allowance")));

  type_into (window, "wall-thickness", "10");
  g_assert_false (gtk_widget_has_css_class (entry, "error"));
  g_assert_false (hl_quantity_row_has_error (row (window, "corrosion-allowance")));
  g_assert_nonnull (solution (window));
  discard_window (window);
}

static void
test_unit_change_keeps_quantity (void)
{
  HlWindow *window = open_demo ();
  HlQuantityRow *thickness = row (window, "wall-thickness");
  GtkDropDown *units = hl_quantity_row_get_unit_dropdown (thickness);
  const char *const *names = hl_unit_names (HL_KIND_LENGTH);
  const HlShellInputs *shell;
  guint inch = 0;

  for (guint i = 0; names[i] != NULL; i++)
    if (strcmp (names[i], "in") == 0)
      inch = i;
  g_assert_cmpuint (inch, >, 0);
  gtk_drop_down_set_selected (units, inch);
  hl_ui_iterate ();
  shell = hl_document_get_shell (hl_window_get_document (window));
  g_assert_cmpstr (shell->wall_thickness.unit, ==, "in");
  /* 1 in = 25.4 mm exactly (NIST SP 811): 10 mm = 0.3937007874 in */
  g_assert_cmpfloat_with_epsilon (shell->wall_thickness.value, 10.0 / 25.4, 1e-9);
  g_assert_cmpfloat_with_epsilon (hl_quantity_si (shell->wall_thickness, HL_KIND_LENGTH), 0.010, 1e-12);

  /* a unit typed with the number is taken too */
  type_into (window, "internal-pressure", "1.2 MPa");
  shell = hl_document_get_shell (hl_window_get_document (window));
  g_assert_cmpstr (shell->internal_pressure.unit, ==, "MPa");
  g_assert_cmpfloat (shell->internal_pressure.value, ==, 1.2);
  discard_window (window);
}

static void
test_undo_redo (void)
{
  HlWindow *window = open_demo ();
  HlDocument *doc = hl_window_get_document (window);

  g_assert_false (g_action_group_get_action_enabled (G_ACTION_GROUP (window), "undo"));
  /* typing "1" then "12" in one field is one step */
  type_into (window, "wall-thickness", "1");
  type_into (window, "wall-thickness", "12");
  g_assert_cmpfloat (hl_document_get_shell (doc)->wall_thickness.value, ==, 12);
  activate (window, "undo", NULL);
  g_assert_cmpfloat (hl_document_get_shell (doc)->wall_thickness.value, ==, 10);
  g_assert_false (hl_document_get_modified (doc));
  g_assert_cmpstr (gtk_editable_get_text (hl_quantity_row_get_entry (row (window, "wall-thickness"))), ==, "10");
  activate (window, "redo", NULL);
  g_assert_cmpfloat (hl_document_get_shell (doc)->wall_thickness.value, ==, 12);
  g_assert_true (hl_document_get_modified (doc));
  discard_window (window);
}

static void
test_add_remove_shell (void)
{
  HlWindow *window = open_demo ();
  HlDocument *doc = hl_window_get_document (window);
  const HlProject *project = hl_document_get_project (doc);

  g_assert_cmpuint (hl_project_n_shells (project), ==, 3);
  activate (window, "shell-add", NULL);
  project = hl_document_get_project (doc);
  g_assert_cmpuint (hl_project_n_shells (project), ==, 4);
  g_assert_cmpuint (hl_document_get_selected (doc), ==, 3);
  g_assert_nonnull (solution (window));
  activate (window, "shell-duplicate", NULL);
  g_assert_cmpuint (hl_project_n_shells (hl_document_get_project (doc)), ==, 5);
  activate (window, "shell-up", NULL);
  g_assert_cmpuint (hl_document_get_selected (doc), ==, 3);
  for (int i = 0; i < 4; i++)
    activate (window, "shell-remove", NULL);
  g_assert_cmpuint (hl_project_n_shells (hl_document_get_project (doc)), ==, 1);
  /* the last shell stays */
  g_assert_false (g_action_group_get_action_enabled (G_ACTION_GROUP (window), "shell-remove"));
  activate (window, "undo", NULL);
  g_assert_cmpuint (hl_project_n_shells (hl_document_get_project (doc)), ==, 2);
  discard_window (window);
}

static void
test_save_and_reopen (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-ui-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "saved.hoop", NULL);
  g_autoptr(GFile) file = g_file_new_for_path (path);
  HlWindow *window = open_demo ();
  HlWindow *again;
  HlDocument *doc = hl_window_get_document (window);

  type_into (window, "wall-thickness", "12.5");
  activate (window, "save-to", g_variant_new_string (path));
  g_assert_false (hl_document_get_modified (doc));
  g_assert_true (hl_window_shows_file (window, file));

  again = hl_window_new (GTK_APPLICATION (app));
  g_assert_true (hl_window_load_file (again, file));
  g_assert_true (hl_project_equal (hl_document_get_project (doc),
                                   hl_document_get_project (hl_window_get_document (again))));
  g_assert_cmpfloat (hl_document_get_shell (hl_window_get_document (again))->wall_thickness.value, ==, 12.5);
  discard_window (again);
  discard_window (window);
  g_unlink (path);
  g_rmdir (dir);
}

static void
test_failed_save_keeps_modified (void)
{
  HlWindow *window = open_demo ();
  HlDocument *doc = hl_window_get_document (window);

  type_into (window, "wall-thickness", "11");
  /* a folder that does not exist cannot take the file */
  g_action_group_activate_action (G_ACTION_GROUP (window), "save-to",
                                  g_variant_new_string ("/nonexistent-hoopline-dir/x.hoop"));
  hl_ui_iterate ();
  g_assert_true (hl_document_get_modified (doc));
  discard_window (window);
}

static void
test_unsaved_question (void)
{
  HlWindow *window = open_demo ();
  GtkWidget *question;

  /* unmodified: nothing to ask */
  type_into (window, "wall-thickness", "11");
  gtk_window_close (GTK_WINDOW (window));
  hl_ui_iterate ();
  question = hl_window_get_question (window);
  g_assert_nonnull (question);
  g_assert_true (gtk_widget_get_visible (GTK_WIDGET (window)));
  hl_ui_answer (question, HL_QUESTION_CANCEL);
  hl_ui_iterate ();
  g_assert_null (hl_window_get_question (window));
  g_assert_true (hl_document_get_modified (hl_window_get_document (window)));

  /* the same question guards a dropped or recent file ... */
  {
    g_autofree char *path = hl_ui_demo_path ();

    activate (window, "open-file", g_variant_new_string (path));
    g_assert_nonnull (hl_window_get_question (window));
    hl_ui_answer (hl_window_get_question (window), HL_QUESTION_CANCEL);
    hl_ui_iterate ();
    g_assert_true (hl_document_get_modified (hl_window_get_document (window)));
  }

  /* ... and a new project */
  activate (window, "new", NULL);
  g_assert_nonnull (hl_window_get_question (window));
  hl_ui_answer (hl_window_get_question (window), HL_QUESTION_DISCARD);
  hl_ui_iterate ();
  g_assert_null (hl_document_get_file (hl_window_get_document (window)));
  g_assert_false (hl_document_get_modified (hl_window_get_document (window)));

  {
    GtkWidget *w = GTK_WIDGET (window);

    g_object_add_weak_pointer (G_OBJECT (w), (gpointer *) &w);
    gtk_window_close (GTK_WINDOW (window));
    hl_ui_iterate ();
    /* nothing to lose now: closed without a question */
    g_assert_null (w);
  }
}

static void
test_export_from_window (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-ui-XXXXXX", NULL);
  g_autofree char *csv = g_build_filename (dir, "table.csv", NULL);
  g_autofree char *svg = g_build_filename (dir, "figure.svg", NULL);
  g_autofree char *bad = g_build_filename (dir, "figure.xyz", NULL);
  g_autofree char *contents = NULL;
  HlWindow *window = open_demo ();

  activate (window, "export-to", g_variant_new ("(ss)", csv, ""));
  g_assert_true (g_file_get_contents (csv, &contents, NULL, NULL));
  /* one line per point through the wall, and a header */
  g_assert_cmpuint (strlen (contents), >, 0);
  g_clear_pointer (&contents, g_free);

  activate (window, "export-to", g_variant_new ("(ss)", svg, "842x595"));
  if (g_file_get_contents (svg, &contents, NULL, NULL))
    g_assert_nonnull (strstr (contents, "<svg"));
  else
    g_test_message ("SVG export not available: %s", hl_window_get_message (window));

  activate (window, "export-to", g_variant_new ("(ss)", bad, ""));
  g_assert_false (g_file_test (bad, G_FILE_TEST_EXISTS));
  g_assert_nonnull (hl_window_get_message (window));

  discard_window (window);
  g_unlink (csv);
  g_unlink (svg);
  g_rmdir (dir);
}

/* The printout: figure first, then the calculation sheet's pages. */
static void
test_print_to_pdf (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-ui-XXXXXX", NULL);
  g_autofree char *pdf = g_build_filename (dir, "print.pdf", NULL);
  g_autofree char *contents = NULL;
  gsize length = 0;
  HlWindow *window = open_demo ();
  guint pages = 0;

  activate (window, "print-to", g_variant_new_string (pdf));
  g_assert_true (g_file_get_contents (pdf, &contents, &length, NULL));
  /* a PDF file starts with its version line (ISO 32000-1, 7.5.2) */
  g_assert_true (g_str_has_prefix (contents, "%PDF-"));
  /* each page is a dictionary of /Type /Page (ISO 32000-1, 7.7.3.3) */
  for (gsize i = 0; i + 12 <= length; i++)
    if (memcmp (contents + i, "/Type /Page", 11) == 0 && contents[i + 11] != 's')
      pages++;
  g_assert_cmpuint (pages, >=, 2);
  discard_window (window);
  g_unlink (pdf);
  g_rmdir (dir);
}

static void
test_bad_file_leaves_project (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-ui-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "broken.hoop", NULL);
  g_autoptr(GFile) file = g_file_new_for_path (path);
  HlWindow *window = open_demo ();
  g_autoptr(HlProject) before = hl_project_copy (hl_document_get_project (hl_window_get_document (window)));

  g_assert_true (g_file_set_contents (path, "<hoopline-project format=\"1\"><shell>", -1, NULL));
  g_assert_false (hl_window_load_file (window, file));
  g_assert_nonnull (hl_window_get_message (window));
  g_assert_nonnull (strstr (hl_window_get_message (window), "broken.hoop"));
  g_assert_true (hl_project_equal (before, hl_document_get_project (hl_window_get_document (window))));
  discard_window (window);
  g_unlink (path);
  g_rmdir (dir);
}

static void
test_canvas_draws (void)
{
  HlWindow *window = open_demo ();
  HlCanvas *canvas = hl_window_get_canvas (window);
  guint drawn;

  hl_ui_run_for (300);
  drawn = hl_canvas_get_n_draws (canvas);
  g_assert_cmpuint (drawn, >, 0);
  g_assert_cmpint (gtk_widget_get_width (GTK_WIDGET (canvas)), >, 300);
  type_into (window, "internal-pressure", "12");
  hl_ui_run_for (100);
  g_assert_cmpuint (hl_canvas_get_n_draws (canvas), >, drawn);
  discard_window (window);
}

/* Under a German locale the window reads and writes decimal commas
 * (common practice there); the file keeps C-locale numbers. */
static void
test_decimal_comma (void)
{
  g_autofree char *old = g_strdup (setlocale (LC_NUMERIC, NULL));
  HlWindow *window;
  g_autofree char *text = NULL;

  if (setlocale (LC_NUMERIC, "de_DE.UTF-8") == NULL)
    {
      g_test_skip ("locale de_DE.UTF-8 is not installed");
      return;
    }
  window = open_demo ();
  type_into (window, "wall-thickness", "10,5");
  g_assert_cmpfloat (hl_document_get_shell (hl_window_get_document (window))->wall_thickness.value, ==, 10.5);
  text = hl_results_table_get_text (hl_window_get_results_table (window));
  g_assert_nonnull (strchr (text, ','));
  {
    g_autofree char *xml = hl_project_to_xml (hl_document_get_project (hl_window_get_document (window)));

    g_assert_nonnull (strstr (xml, ">10.5<"));
  }
  discard_window (window);
  setlocale (LC_NUMERIC, old);
}

/* Editing a project material changes every shell that uses it; a
 * built-in one is copied first so the typical values stay. */
static void
test_material_edit (void)
{
  HlWindow *window = open_demo ();
  HlDocument *doc = hl_window_get_document (window);
  const HlProject *project;
  const HlShellInputs *sphere;

  /* the receiver and the sphere both use p265gh in the demo */
  type_into (window, "allowable-stress", "140");
  project = hl_document_get_project (doc);
  g_assert_cmpfloat (hl_project_find_material ((HlProject *) project, "p265gh")->allowable_stress.value, ==, 140);
  sphere = hl_project_find_shell (project, "n2-sphere");
  g_assert_cmpfloat (sphere->material.allowable_stress.value, ==, 140);

  /* a shell on a built-in material gets a project copy when edited */
  activate (window, "shell-add", NULL);
  g_assert_nonnull (hl_material_builtin_find (hl_document_get_shell (doc)->material_ref));
  type_into (window, "yield-strength", "300");
  project = hl_document_get_project (doc);
  g_assert_null (hl_material_builtin_find (hl_document_get_shell (doc)->material_ref));
  g_assert_nonnull (hl_project_find_material ((HlProject *) project, hl_document_get_shell (doc)->material_ref));
  g_assert_cmpfloat (hl_material_builtin (0)->yield_strength.value, !=, 300);
  discard_window (window);
}

/* New shells take the preferred units and tolerance. */
static void
test_preferences_shape_new_shells (void)
{
  GSettings *settings = hl_application_get_settings (app);
  HlWindow *window;
  const HlShellInputs *shell;

  g_settings_set_string (settings, "unit-system", "us");
  g_settings_set_double (settings, "default-tolerance", 2.5);
  window = hl_window_new (GTK_APPLICATION (app));
  shell = hl_document_get_shell (hl_window_get_document (window));
  g_assert_cmpstr (shell->wall_thickness.unit, ==, "in");
  g_assert_cmpstr (shell->internal_pressure.unit, ==, "psi");
  g_assert_cmpfloat (shell->thin_tolerance.value, ==, 2.5);
  g_assert_nonnull (hl_document_get_solution (hl_window_get_document (window)));
  g_assert_cmpint (hl_document_get_project (hl_window_get_document (window))->display_units, ==,
                   HL_UNIT_SYSTEM_US);
  g_settings_reset (settings, "unit-system");
  g_settings_reset (settings, "default-tolerance");
  discard_window (window);
}

/* Opening a file that a window already shows brings that window back. */
static void
test_open_twice_reuses_window (void)
{
  g_autofree char *path = hl_ui_demo_path ();
  GFile *files[1];
  guint before;

  files[0] = g_file_new_for_path (path);
  g_application_open (G_APPLICATION (app), files, 1, "");
  hl_ui_iterate ();
  before = g_list_length (gtk_application_get_windows (GTK_APPLICATION (app)));
  g_assert_cmpuint (before, >=, 1);
  g_application_open (G_APPLICATION (app), files, 1, "");
  hl_ui_iterate ();
  g_assert_cmpuint (g_list_length (gtk_application_get_windows (GTK_APPLICATION (app))), ==, before);
  for (GList *l = gtk_application_get_windows (GTK_APPLICATION (app)); l != NULL;
       l = gtk_application_get_windows (GTK_APPLICATION (app)))
    gtk_window_destroy (l->data);
  hl_ui_iterate ();
  g_object_unref (files[0]);
}

static void
on_clipboard_text_cb (GObject      *clipboard,
                      GAsyncResult *result,
                      gpointer      user_data)
{
  char **text = user_data;

  *text = gdk_clipboard_read_text_finish (GDK_CLIPBOARD (clipboard), result, NULL);
  if (*text == NULL)
    *text = g_strdup ("");
}

/* Copy puts the table on the clipboard as tab-separated lines. */
static void
test_copy_results (void)
{
  HlWindow *window = open_demo ();
  GdkClipboard *clipboard = gtk_widget_get_clipboard (GTK_WIDGET (window));
  g_autofree char *shown = hl_results_table_get_text (hl_window_get_results_table (window));
  g_autofree char *copied = NULL;

  activate (window, "copy-results", NULL);
  gdk_clipboard_read_text_async (clipboard, NULL, on_clipboard_text_cb, &copied);
  while (copied == NULL)
    g_main_context_iteration (NULL, TRUE);
  g_assert_cmpstr (copied, ==, shown);
  g_assert_nonnull (strstr (copied, "Mean radius / thickness\t"));
  discard_window (window);
}

/* The title names the project and the file, with a mark while modified;
 * a revision note added gets the next number. */
static void
test_title_and_revisions (void)
{
  HlWindow *window = open_demo ();
  HlDocument *doc = hl_window_get_document (window);
  const HlRevision *latest;

  g_assert_nonnull (strstr (gtk_window_get_title (GTK_WINDOW (window)), "Larkfield works"));
  g_assert_nonnull (strstr (gtk_window_get_title (GTK_WINDOW (window)), "demo.hoop"));
  g_assert_null (strstr (gtk_window_get_title (GTK_WINDOW (window)), "•"));
  hl_document_add_revision (doc, "2026-12-01", "A. Tester", "Wall raised to 12 mm.");
  hl_ui_iterate ();
  latest = hl_project_latest_revision (hl_document_get_project (doc));
  g_assert_cmpuint (latest->number, ==, 3);
  g_assert_cmpstr (latest->author, ==, "A. Tester");
  g_assert_nonnull (strstr (gtk_window_get_title (GTK_WINDOW (window)), "•"));
  activate (window, "undo", NULL);
  g_assert_cmpuint (hl_project_latest_revision (hl_document_get_project (doc))->number, ==, 2);
  g_assert_null (strstr (gtk_window_get_title (GTK_WINDOW (window)), "•"));
  discard_window (window);
}

/* ---- the canvas: zoom, panning room, no title block (issue 11) ----
 * Ctrl+plus, Ctrl+minus and Ctrl+0 are the desktop's zoom keys (GNOME
 * Human Interface Guidelines, keyboard: standard shortcuts); the window
 * offers them as actions, lists them in its shortcuts window and zooms
 * inside a scrolled window, so a zoomed figure pans.  The canvas leaves
 * out the title block and the caution the window shows itself, while
 * the printout keeps them. */

static void
zoom (HlWindow   *window,
      const char *action)
{
  activate (window, action, NULL);
  /* the new size request is laid out and the view scrolled */
  hl_ui_run_for (150);
}

static gboolean
enabled (HlWindow   *window,
         const char *action)
{
  return g_action_group_get_action_enabled (G_ACTION_GROUP (window), action);
}

static GtkScrolledWindow *
scroller (HlCanvas *canvas)
{
  GtkWidget *sw = gtk_widget_get_ancestor (GTK_WIDGET (canvas), GTK_TYPE_SCROLLED_WINDOW);

  g_assert_nonnull (sw);
  return GTK_SCROLLED_WINDOW (sw);
}

static void
test_zoom_actions (void)
{
  HlWindow *window = open_demo ();
  HlCanvas *canvas = hl_window_get_canvas (window);
  GtkScrolledWindow *sw = scroller (canvas);
  int fit_w, fit_h, view_w;
  double upper;

  hl_ui_run_for (300);
  fit_w = gtk_widget_get_width (GTK_WIDGET (canvas));
  fit_h = gtk_widget_get_height (GTK_WIDGET (canvas));
  view_w = gtk_widget_get_width (GTK_WIDGET (sw));
  g_assert_cmpint (fit_w, >, 300);
  /* fitted: the figure fills the view, nothing to zoom out of */
  g_assert_cmpfloat (hl_canvas_get_zoom (canvas), ==, 1.0);
  g_assert_cmpint (fit_w, ==, view_w);
  g_assert_false (enabled (window, "zoom-out"));
  g_assert_false (enabled (window, "zoom-fit"));

  /* zoomed in twice by 1.25: the canvas grows past the view and the
   * view can scroll over it */
  zoom (window, "zoom-in");
  zoom (window, "zoom-in");
  g_assert_cmpfloat_with_epsilon (hl_canvas_get_zoom (canvas), 1.5625, 1e-9);
  g_assert_cmpint (gtk_widget_get_width (GTK_WIDGET (canvas)), >=, (int) (1.5 * fit_w));
  g_assert_cmpint (gtk_widget_get_height (GTK_WIDGET (canvas)), >=, (int) (1.5 * fit_h));
  g_assert_cmpint (gtk_widget_get_width (GTK_WIDGET (sw)), ==, view_w);
  upper = gtk_adjustment_get_upper (gtk_scrolled_window_get_hadjustment (sw));
  g_assert_cmpfloat (upper, >, gtk_adjustment_get_page_size (gtk_scrolled_window_get_hadjustment (sw)));
  /* zoomed about the view's centre: the view has scrolled into the figure */
  g_assert_cmpfloat (gtk_adjustment_get_value (gtk_scrolled_window_get_hadjustment (sw)), >, 0);
  g_assert_true (enabled (window, "zoom-out"));

  zoom (window, "zoom-out");
  g_assert_cmpfloat_with_epsilon (hl_canvas_get_zoom (canvas), 1.25, 1e-9);
  zoom (window, "zoom-fit");
  g_assert_cmpfloat (hl_canvas_get_zoom (canvas), ==, 1.0);
  g_assert_cmpint (gtk_widget_get_width (GTK_WIDGET (canvas)), ==, view_w);
  g_assert_false (enabled (window, "zoom-fit"));

  /* the zoom stops somewhere: a figure magnified without end is no use */
  for (int i = 0; i < 40 && enabled (window, "zoom-in"); i++)
    zoom (window, "zoom-in");
  g_assert_false (enabled (window, "zoom-in"));
  zoom (window, "zoom-fit");
  discard_window (window);
}

static void
test_zoom_keys (void)
{
  static const struct
  {
    const char *action, *accel;
  } keys[] = {
    { "win.zoom-in", "<Control>plus" },
    { "win.zoom-out", "<Control>minus" },
    { "win.zoom-fit", "<Control>0" },
  };
  g_autoptr(GtkBuilder) builder = gtk_builder_new_from_resource ("/org/hoopline/Hoopline/gtk/help-overlay.ui");
  GSList *objects = gtk_builder_get_objects (builder);

  for (guint i = 0; i < G_N_ELEMENTS (keys); i++)
    {
      g_auto(GStrv) accels = gtk_application_get_accels_for_action (GTK_APPLICATION (app), keys[i].action);
      gboolean listed = FALSE;
      guint key, want_key;
      GdkModifierType mods, want_mods;

      g_assert_true (gtk_accelerator_parse (keys[i].accel, &want_key, &want_mods));
      g_assert_nonnull (accels);
      g_assert_nonnull (accels[0]);
      g_assert_true (gtk_accelerator_parse (accels[0], &key, &mods));
      g_assert_cmpuint (key, ==, want_key);
      g_assert_cmpuint (mods, ==, want_mods);
      /* and the shortcuts window lists the action, so the keys show */
      for (GSList *it = objects; it != NULL; it = it->next)
        if (GTK_IS_SHORTCUTS_SHORTCUT (it->data))
          {
            g_autofree char *name = NULL;

            g_object_get (it->data, "action-name", &name, NULL);
            listed = listed || g_strcmp0 (name, keys[i].action) == 0;
          }
      g_assert_true (listed);
    }
  g_slist_free (objects);
}

static void
test_screen_context (void)
{
  HlWindow *window = open_demo ();
  HlFigureContext ctx;

  hl_ui_run_for (200);
  /* the window shows the caution and the project itself: its figure
   * leaves out the title block; print and export keep it */
  hl_canvas_build_context (hl_window_get_canvas (window), &ctx);
  g_assert_true (ctx.screen);
  hl_figure_context_init (&ctx, NULL, NULL, NULL, NULL, "x", HL_FIGURE_TARGET_PAPER);
  g_assert_false (ctx.screen);
  discard_window (window);
}

int
main (int    argc,
      char **argv)
{
  int status;

  setlocale (LC_ALL, "C.UTF-8");
  g_test_init (&argc, &argv, NULL);
  if (!gtk_init_check ())
    {
      /* CI runs these under Xvfb; a run without any display cannot test a window */
      printf ("1..0 # SKIP no display\n");
      return 0;
    }
  app = hl_ui_application_new ();
  /* startup has run: actions, accelerators, style */

  g_test_add_func ("/window/demo-edit-changes-results", test_demo_edit_changes_results);
  g_test_add_func ("/window/bad-value-is-marked", test_bad_value_is_marked);
  g_test_add_func ("/window/unit-change-keeps-quantity", test_unit_change_keeps_quantity);
  g_test_add_func ("/window/undo-redo", test_undo_redo);
  g_test_add_func ("/window/add-remove-shell", test_add_remove_shell);
  g_test_add_func ("/window/save-and-reopen", test_save_and_reopen);
  g_test_add_func ("/window/failed-save-keeps-modified", test_failed_save_keeps_modified);
  g_test_add_func ("/window/unsaved-question", test_unsaved_question);
  g_test_add_func ("/window/export", test_export_from_window);
  g_test_add_func ("/window/print-to-pdf", test_print_to_pdf);
  g_test_add_func ("/window/bad-file-leaves-project", test_bad_file_leaves_project);
  g_test_add_func ("/window/canvas-draws", test_canvas_draws);
  g_test_add_func ("/window/decimal-comma", test_decimal_comma);
  g_test_add_func ("/window/material-edit", test_material_edit);
  g_test_add_func ("/window/preferences-shape-new-shells", test_preferences_shape_new_shells);
  g_test_add_func ("/window/open-twice-reuses-window", test_open_twice_reuses_window);
  g_test_add_func ("/window/copy-results", test_copy_results);
  g_test_add_func ("/window/title-and-revisions", test_title_and_revisions);
  g_test_add_func ("/window/canvas/zoom-actions", test_zoom_actions);
  g_test_add_func ("/window/canvas/zoom-keys", test_zoom_keys);
  g_test_add_func ("/window/canvas/screen-context", test_screen_context);
  status = g_test_run ();
  g_clear_object (&app);
  return status;
}
