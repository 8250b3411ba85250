/* test-export-options.c — the Export dialog's choices and what they
 * write; a US project's new shell; the English window's decimal mark
 *
 * Sources beside each check:
 *  - issue 11: the window's Export offers this shell or all shells and
 *    figure only; PNG/SVG stay one figure, one file per shell with all
 *    shells; a US project's new shells start in inches and psi, the
 *    material in ksi; the English window explains "12,5".
 *  - Common practice: E of carbon steel 29,000 ksi in US tables.
 *  - ISO 80000-1 §7.3.1 (from memory): an English text writes the
 *    decimal sign as a point.
 *  - PDF 1.x (ISO 32000-1 §7.5.2): a PDF file starts with "%PDF-".
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-export-options"

#include "hl-config.h"
#include "hl-application.h"
#include "hl-export-options.h"
#include "hl-quantity-row.h"
#include "hl-shell-editor.h"
#include "hl-ui-test-util.h"
#include "hl-window.h"

#include <adwaita.h>
#include <glib/gstdio.h>
#include <locale.h>
#include <stdio.h>
#include <string.h>

static HlApplication *app;
static const char *const demo_ids[] = { "air-receiver", "press-barrel", "n2-sphere" };

/* a template child of @root by its id in the .ui */
static GtkWidget *
find_child (GtkWidget  *root,
            const char *id)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c != NULL; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *found;

      if (g_strcmp0 (gtk_buildable_get_buildable_id (GTK_BUILDABLE (c)), id) == 0)
        return c;
      found = find_child (c, id);
      if (found != NULL)
        return found;
    }
  return NULL;
}

static GtkWidget *
child (HlExportOptions *options,
       const char      *id)
{
  GtkWidget *w = find_child (GTK_WIDGET (options), id);

  if (w == NULL)
    g_error ("no “%s” in the export options", id);
  return w;
}

/* the options window the "export-options" action opened */
static HlExportOptions *
open_options (HlWindow   *window,
              const char *path)
{
  g_autoptr(GListModel) toplevels = NULL;
  HlExportOptions *found = NULL;

  g_action_group_activate_action (G_ACTION_GROUP (window), "export-options", g_variant_new_string (path));
  hl_ui_iterate ();
  toplevels = g_object_ref (gtk_window_get_toplevels ());
  for (guint i = 0; i < g_list_model_get_n_items (toplevels); i++)
    {
      g_autoptr(GObject) w = g_list_model_get_item (toplevels, i);

      if (HL_IS_EXPORT_OPTIONS (w) && gtk_widget_get_visible (GTK_WIDGET (w)))
        found = HL_EXPORT_OPTIONS (w);
    }
  g_assert_nonnull (found);
  return found;
}

static void
press_export (HlExportOptions *options)
{
  GtkWidget *button = child (options, "export_button");

  g_assert_true (gtk_widget_is_sensitive (button));
  g_signal_emit_by_name (button, "clicked");
  hl_ui_run_for (50);
}

static guint
count_files (const char *dir)
{
  g_autoptr(GDir) d = g_dir_open (dir, 0, NULL);
  guint n = 0;

  while (d != NULL && g_dir_read_name (d) != NULL)
    n++;
  return n;
}

static void
remove_dir (const char *dir)
{
  g_autoptr(GDir) d = g_dir_open (dir, 0, NULL);
  const char *name;

  while (d != NULL && (name = g_dir_read_name (d)) != NULL)
    {
      g_autofree char *p = g_build_filename (dir, name, NULL);

      g_unlink (p);
    }
  g_rmdir (dir);
}

/* issue 11: "All shells" as SVG writes one file per shell beside the
 * chosen name, says their names before and after, and is remembered */
static void
test_all_shells_svg (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-ui-XXXXXX", NULL);
  g_autofree char *svg = g_build_filename (dir, "plan.svg", NULL);
  g_autoptr(GSettings) settings = g_settings_new ("org.hoopline.Hoopline");
  HlWindow *window = hl_ui_open_demo (app);
  HlExportOptions *options = open_options (window, svg);
  const char *files;

  /* an SVG has no sheet: its paper and "figure only" do not apply */
  g_assert_false (gtk_widget_is_sensitive (child (options, "paper_row")));
  g_assert_false (gtk_widget_is_sensitive (child (options, "figure_only_row")));
  g_assert_true (gtk_widget_is_sensitive (child (options, "panels_row")));
  adw_combo_row_set_selected (ADW_COMBO_ROW (child (options, "scope_row")), 1);
  hl_ui_iterate ();
  files = gtk_label_get_text (GTK_LABEL (child (options, "files_label")));
  for (guint i = 0; i < G_N_ELEMENTS (demo_ids); i++)
    {
      g_autofree char *name = g_strdup_printf ("plan-%s.svg", demo_ids[i]);

      if (strstr (files, name) == NULL)
        g_error ("the options do not say they write %s: %s", name, files);
    }
  /* HL_TEST_HOLD_MS: time to take a screenshot of the dialog (import -window root) */
  if (g_getenv ("HL_TEST_HOLD_MS") != NULL)
    hl_ui_run_for ((guint) g_ascii_strtoull (g_getenv ("HL_TEST_HOLD_MS"), NULL, 10));
  press_export (options);

  g_assert_false (g_file_test (svg, G_FILE_TEST_EXISTS));
  for (guint i = 0; i < G_N_ELEMENTS (demo_ids); i++)
    {
      g_autofree char *name = g_strdup_printf ("plan-%s.svg", demo_ids[i]);
      g_autofree char *path = g_build_filename (dir, name, NULL);
      g_autofree char *text = NULL;

      g_assert_true (g_file_get_contents (path, &text, NULL, NULL));
      g_assert_nonnull (strstr (text, "<svg"));
      g_assert_nonnull (strstr (hl_window_get_toast (window), name));
    }
  g_assert_cmpuint (count_files (dir), ==, G_N_ELEMENTS (demo_ids));
  g_assert_cmpint (g_settings_get_enum (settings, "export-scope"), ==, 1);

  /* the next export starts from "All shells" */
  options = open_options (window, svg);
  g_assert_cmpuint (adw_combo_row_get_selected (ADW_COMBO_ROW (child (options, "scope_row"))), ==, 1);
  gtk_window_destroy (GTK_WINDOW (options));
  g_settings_reset (settings, "export-scope");
  hl_ui_discard_window (window);
  remove_dir (dir);
}

/* issue 11: "This shell" writes the shown shell only, one file; a PDF
 * offers paper and "figure only", which are remembered; no panel at
 * all cannot be exported */
static void
test_this_shell_pdf (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-ui-XXXXXX", NULL);
  g_autofree char *pdf = g_build_filename (dir, "note.pdf", NULL);
  g_autofree char *csv = g_build_filename (dir, "table.csv", NULL);
  g_autoptr(GSettings) settings = g_settings_new ("org.hoopline.Hoopline");
  HlWindow *window = hl_ui_open_demo (app);
  HlExportOptions *options = open_options (window, pdf);
  g_autofree char *head = NULL;
  g_autofree char *table = NULL;
  guint tables = 0;

  g_assert_cmpuint (adw_combo_row_get_selected (ADW_COMBO_ROW (child (options, "scope_row"))), ==, 0);
  g_assert_true (gtk_widget_is_sensitive (child (options, "paper_row")));
  g_assert_true (gtk_widget_is_sensitive (child (options, "figure_only_row")));
  /* SI project, paper not chosen before: A4 */
  g_assert_cmpuint (adw_combo_row_get_selected (ADW_COMBO_ROW (child (options, "paper_row"))), ==, 0);
  for (guint i = 0; i < 4; i++)
    {
      static const char *const checks[] = { "section_check", "detail_check", "plot_check", "chart_check" };

      gtk_check_button_set_active (GTK_CHECK_BUTTON (child (options, checks[i])), FALSE);
    }
  hl_ui_iterate ();
  g_assert_false (gtk_widget_is_sensitive (child (options, "export_button")));
  gtk_check_button_set_active (GTK_CHECK_BUTTON (child (options, "plot_check")), TRUE);
  gtk_switch_set_active (GTK_SWITCH (child (options, "figure_only_switch")), TRUE);
  adw_combo_row_set_selected (ADW_COMBO_ROW (child (options, "paper_row")), 1);
  hl_ui_iterate ();
  press_export (options);

  g_assert_true (g_file_get_contents (pdf, &head, NULL, NULL));
  g_assert_true (g_str_has_prefix (head, "%PDF-"));
  g_assert_cmpuint (count_files (dir), ==, 1);
  g_assert_true (g_settings_get_boolean (settings, "export-figure-only"));
  {
    g_autofree char *paper = g_settings_get_string (settings, "export-paper");

    g_assert_cmpstr (paper, ==, "letter");
  }
  {
    g_auto(GStrv) panels = g_settings_get_strv (settings, "export-panels");

    g_assert_cmpuint (g_strv_length (panels), ==, 1);
    g_assert_cmpstr (panels[0], ==, "plot");
  }

  /* a CSV of this shell: one table, of the shell shown */
  options = open_options (window, csv);
  g_assert_false (gtk_widget_is_sensitive (child (options, "panels_row")));
  press_export (options);
  g_assert_true (g_file_get_contents (csv, &table, NULL, NULL));
  for (const char *p = strstr (table, "# shell = "); p != NULL; p = strstr (p + 1, "# shell = "))
    tables++;
  g_assert_cmpuint (tables, ==, 1);
  g_assert_nonnull (strstr (table, "# shell = air-receiver\n"));

  g_settings_reset (settings, "export-figure-only");
  g_settings_reset (settings, "export-paper");
  g_settings_reset (settings, "export-panels");
  hl_ui_discard_window (window);
  remove_dir (dir);
}

/* issue 11: a new shell of a US project starts in inches and psi, its
 * material in ksi (29,000 ksi: common practice for carbon steel) */
static void
test_us_new_shell (void)
{
  HlWindow *window = hl_ui_open_demo (app);
  HlDocument *doc = hl_window_get_document (window);
  const HlProject *p = hl_document_get_project (doc);
  const HlShellInputs *shell;

  hl_document_set_info (doc, p->title, p->engineer, p->description, HL_UNIT_SYSTEM_US);
  g_action_group_activate_action (G_ACTION_GROUP (window), "shell-add", NULL);
  hl_ui_iterate ();
  shell = hl_document_get_shell (doc);
  g_assert_cmpuint (hl_document_get_selected (doc), ==, 3);
  g_assert_cmpstr (shell->size.unit, ==, "in");
  g_assert_cmpstr (shell->wall_thickness.unit, ==, "in");
  g_assert_cmpstr (shell->internal_pressure.unit, ==, "psi");
  g_assert_cmpfloat (shell->material.elastic_modulus.value, ==, 29000);
  g_assert_cmpstr (shell->material.elastic_modulus.unit, ==, "ksi");
  g_assert_cmpstr (shell->material.yield_strength.unit, ==, "ksi");
  /* the field shows it as stored */
  hl_ui_iterate ();
  {
    HlQuantityRow *e = hl_shell_editor_get_row (hl_window_get_shell_editor (window), "elastic-modulus");
    const char *text = gtk_editable_get_text (hl_quantity_row_get_entry (e));

    g_assert_nonnull (e);
    g_assert_cmpstr (text, ==, "29000");
  }
  hl_ui_discard_window (window);
}

/* ISO 80000-1: the English window asks for a decimal point */
static void
test_english_decimal_comma (void)
{
  HlWindow *window = hl_ui_open_demo (app);
  HlQuantityRow *row = hl_shell_editor_get_row (hl_window_get_shell_editor (window), "internal-pressure");

  g_assert_nonnull (row);
  gtk_editable_set_text (hl_quantity_row_get_entry (row), "12,5");
  hl_ui_iterate ();
  g_assert_true (hl_quantity_row_has_error (row));
  g_assert_nonnull (strstr (hl_quantity_row_get_error (row), "use a point as the decimal separator"));
  g_assert_nonnull (strstr (hl_quantity_row_get_error (row), "12.5"));
  hl_ui_discard_window (window);
}

int
main (int    argc,
      char **argv)
{
  int status;

  /* the words checked are the English ones */
  setlocale (LC_ALL, "C.UTF-8");
  g_setenv ("LANGUAGE", "C", TRUE);
  g_test_init (&argc, &argv, NULL);
  if (!gtk_init_check ())
    {
      printf ("1..0 # SKIP no display\n");
      return 0;
    }
  app = hl_ui_application_new ();
  g_test_add_func ("/export-options/all-shells-svg", test_all_shells_svg);
  g_test_add_func ("/export-options/this-shell-pdf", test_this_shell_pdf);
  g_test_add_func ("/export-options/us-new-shell", test_us_new_shell);
  g_test_add_func ("/export-options/english-decimal-comma", test_english_decimal_comma);
  status = g_test_run ();
  g_object_unref (app);
  return status;
}
