/* test-platform.c — the window on the GNOME platform library: light and
 * dark, notices, questions, the standard windows, Open Recent
 *
 * Runs under a (virtual) display, with its own recent-files list.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-platform"

#include "hl-config.h"
#include "hl-application.h"
#include "hl-canvas.h"
#include "hl-recent-menu.h"
#include "hl-ui-test-util.h"
#include "hl-window.h"

#include <glib/gstdio.h>
#include <locale.h>
#include <stdio.h>
#include <string.h>

static HlApplication *app;
static char *tmp_dir;

/* the .hoop files of the recent list and how many hours ago they were
 * last used (within GTK's default 30 days, past which it drops them) */
static const struct { const char *name; int hours_ago; } recent[] = {
  { "first-added.hoop", 3 },
  { "used-last.hoop", 1 },
  { "used-between.hoop", 2 },
};

static char *
recent_uri (const char *name)
{
  g_autofree char *path = g_build_filename (tmp_dir, name, NULL);

  return g_filename_to_uri (path, NULL, NULL);
}

/* A recent-files list in the XBEL form of the freedesktop.org Desktop
 * Bookmark Specification, as GLib's GBookmarkFile reads it; the files
 * are listed in the order they were first added, not of their last use. */
static void
write_recent_list (void)
{
  g_autoptr(GString) xbel = g_string_new ("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                                          "<xbel version=\"1.0\" "
                                          "xmlns:bookmark=\"http://www.freedesktop.org/standards/desktop-bookmarks\" "
                                          "xmlns:mime=\"http://www.freedesktop.org/standards/shared-mime-info\">\n");
  g_autofree char *data_dir = g_build_filename (tmp_dir, "data", NULL);
  g_autofree char *list = g_build_filename (data_dir, "recently-used.xbel", NULL);

  for (guint i = 0; i < G_N_ELEMENTS (recent); i++)
    {
      g_autofree char *path = g_build_filename (tmp_dir, recent[i].name, NULL);
      g_autofree char *uri = recent_uri (recent[i].name);
      g_autofree char *demo = hl_ui_demo_path ();
      g_autofree char *contents = NULL;
      g_autoptr(GDateTime) now = g_date_time_new_now_utc ();
      g_autoptr(GDateTime) used = g_date_time_add_hours (now, -recent[i].hours_ago);
      g_autoptr(GDateTime) added = g_date_time_add_hours (now, -recent[0].hours_ago);
      g_autofree char *used_text = g_date_time_format_iso8601 (used);
      g_autofree char *added_text = g_date_time_format_iso8601 (added);
      gsize length;

      g_assert_true (g_file_get_contents (demo, &contents, &length, NULL));
      g_assert_true (g_file_set_contents (path, contents, length, NULL));
      g_string_append_printf (xbel,
                              "<bookmark href=\"%s\" added=\"%s\" modified=\"%s\" visited=\"%s\">"
                              "<info><metadata owner=\"http://freedesktop.org\">"
                              "<mime:mime-type type=\"application/x-hoopline-project\"/>"
                              "<bookmark:applications><bookmark:application name=\"hoopline\" "
                              "exec=\"&apos;hoopline %%u&apos;\" modified=\"%s\" count=\"1\"/>"
                              "</bookmark:applications></metadata></info></bookmark>\n",
                              uri, added_text, used_text, used_text, used_text);
    }
  g_string_append (xbel, "</xbel>\n");
  g_assert_cmpint (g_mkdir_with_parents (data_dir, 0700), ==, 0);
  g_assert_true (g_file_set_contents (list, xbel->str, -1, NULL));
  /* GTK keeps the list under the user's data folder */
  g_setenv ("XDG_DATA_HOME", data_dir, TRUE);
}

static char *
menu_target (GMenuModel *menu,
             int         i)
{
  g_autoptr(GVariant) target = g_menu_model_get_item_attribute_value (menu, i, G_MENU_ATTRIBUTE_TARGET,
                                                                       G_VARIANT_TYPE_STRING);

  g_assert_nonnull (target);
  return g_variant_dup_string (target, NULL);
}

/* Open Recent lists the most recently used project first. */
static void
test_recent_newest_first (void)
{
  g_autoptr(GMenu) section = g_menu_new ();
  g_autoptr(GObject) owner = g_object_new (G_TYPE_OBJECT, NULL);
  static const guint expected[] = { 1, 2, 0 };
  gint64 deadline;

  hl_recent_menu_bind (section, owner);
  g_assert_cmpint (g_menu_model_get_n_items (G_MENU_MODEL (section)), ==, G_N_ELEMENTS (recent));
  for (guint i = 0; i < G_N_ELEMENTS (expected); i++)
    {
      g_autofree char *uri = recent_uri (recent[expected[i]].name);
      g_autofree char *target = menu_target (G_MENU_MODEL (section), i);

      g_assert_cmpstr (target, ==, uri);
    }

  /* opening the oldest one again makes it the newest */
  {
    g_autofree char *path = g_build_filename (tmp_dir, recent[0].name, NULL);
    g_autofree char *uri = recent_uri (recent[0].name);
    g_autoptr(GFile) file = g_file_new_for_path (path);
    g_autofree char *first = NULL;

    hl_recent_menu_remember (file);
    deadline = g_get_monotonic_time () + 5 * G_USEC_PER_SEC;
    do
      {
        hl_ui_run_for (50);
        g_clear_pointer (&first, g_free);
        first = menu_target (G_MENU_MODEL (section), 0);
      }
    while (g_strcmp0 (first, uri) != 0 && g_get_monotonic_time () < deadline);
    g_assert_cmpstr (first, ==, uri);
    g_assert_cmpint (g_menu_model_get_n_items (G_MENU_MODEL (section)), ==, G_N_ELEMENTS (recent));
  }
}

/* The dark-style preference forces the dark style (libadwaita's
 * ADW_COLOR_SCHEME_FORCE_DARK); off, the desktop decides, and the
 * virtual display states no preference, which means light.  The figure
 * follows the widgets. */
static void
test_dark_style (void)
{
  GSettings *settings = hl_application_get_settings (app);
  AdwStyleManager *manager = adw_style_manager_get_default ();
  g_autofree char *path = hl_ui_demo_path ();
  HlWindow *window = hl_ui_open_window (app, path);

  g_assert_true (ADW_IS_APPLICATION (app));
  g_settings_set_boolean (settings, "dark-style", TRUE);
  hl_ui_iterate ();
  g_assert_cmpint (adw_style_manager_get_color_scheme (manager), ==, ADW_COLOR_SCHEME_FORCE_DARK);
  g_assert_true (adw_style_manager_get_dark (manager));
  g_assert_true (hl_canvas_get_dark (hl_window_get_canvas (window)));

  g_settings_set_boolean (settings, "dark-style", FALSE);
  hl_ui_iterate ();
  g_assert_cmpint (adw_style_manager_get_color_scheme (manager), ==, ADW_COLOR_SCHEME_PREFER_LIGHT);
  if (!adw_style_manager_get_system_supports_color_schemes (manager))
    g_assert_false (adw_style_manager_get_dark (manager));
  g_assert_cmpint (hl_canvas_get_dark (hl_window_get_canvas (window)), ==, adw_style_manager_get_dark (manager));
  gtk_window_destroy (GTK_WINDOW (window));
  hl_ui_iterate ();
}

/* "Exported" and "Saved" pass as toasts; a problem stays in the banner
 * until it is closed or solved. */
static void
test_notices (void)
{
  g_autofree char *path = hl_ui_demo_path ();
  g_autofree char *csv = g_build_filename (tmp_dir, "table.csv", NULL);
  g_autofree char *saved = g_build_filename (tmp_dir, "saved-here.hoop", NULL);
  g_autofree char *broken = g_build_filename (tmp_dir, "broken.hoop", NULL);
  g_autoptr(GFile) broken_file = g_file_new_for_path (broken);
  HlWindow *window = hl_ui_open_window (app, path);

  g_assert_null (hl_window_get_toast (window));
  g_action_group_activate_action (G_ACTION_GROUP (window), "export-to", g_variant_new ("(ss)", csv, ""));
  hl_ui_iterate ();
  g_assert_true (g_file_test (csv, G_FILE_TEST_EXISTS));
  g_assert_nonnull (hl_window_get_toast (window));
  g_assert_nonnull (strstr (hl_window_get_toast (window), "table.csv"));
  g_assert_null (hl_window_get_message (window));

  g_action_group_activate_action (G_ACTION_GROUP (window), "save-to", g_variant_new_string (saved));
  hl_ui_iterate ();
  g_assert_true (g_file_test (saved, G_FILE_TEST_EXISTS));
  g_assert_nonnull (strstr (hl_window_get_toast (window), "Saved"));
  g_assert_nonnull (strstr (hl_window_get_toast (window), "saved-here.hoop"));

  g_assert_true (g_file_set_contents (broken, "<hoopline-project format=\"1\"><shell>", -1, NULL));
  g_assert_false (hl_window_load_file (window, broken_file));
  g_assert_nonnull (hl_window_get_message (window));
  g_assert_nonnull (strstr (hl_window_get_message (window), "broken.hoop"));

  gtk_window_destroy (GTK_WINDOW (window));
  hl_ui_iterate ();
  g_unlink (csv);
  g_unlink (saved);
  g_unlink (broken);
}

/* the first widget under @root of @type with @tooltip (nullable) */
static GtkWidget *
find_descendant (GtkWidget  *root,
                 GType       type,
                 const char *tooltip)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c != NULL; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *found;

      if (G_TYPE_CHECK_INSTANCE_TYPE (c, type)
          && (tooltip == NULL || g_strcmp0 (gtk_widget_get_tooltip_text (c), tooltip) == 0))
        return c;
      found = find_descendant (c, type, tooltip);
      if (found != NULL)
        return found;
    }
  return NULL;
}

static GtkWindow *
find_toplevel (GType type)
{
  GList *toplevels = gtk_window_list_toplevels ();
  GtkWindow *found = NULL;

  for (GList *l = toplevels; l != NULL; l = l->next)
    if (G_TYPE_CHECK_INSTANCE_TYPE (l->data, type) && gtk_widget_get_visible (l->data))
      found = l->data;
  g_list_free (toplevels);
  return found;
}

/* Escape on the unsaved-changes question is Cancel (GNOME Human
 * Interface Guidelines: Escape closes a dialog without acting), and the
 * work stays; Enter is Save. */
static void
test_question_escape_keeps_work (void)
{
  g_autofree char *path = hl_ui_demo_path ();
  HlWindow *window = hl_ui_open_window (app, path);
  GtkWidget *question;
  HlDocument *document = hl_window_get_document (window);
  const HlProject *p = hl_document_get_project (document);

  hl_document_set_info (document, "Edited title", p->engineer, p->description, p->display_units);
  gtk_window_close (GTK_WINDOW (window));
  hl_ui_iterate ();
  question = hl_window_get_question (window);
  g_assert_true (ADW_IS_MESSAGE_DIALOG (question));
  g_assert_cmpstr (adw_message_dialog_get_default_response (ADW_MESSAGE_DIALOG (question)), ==, HL_QUESTION_SAVE);
  gtk_window_close (GTK_WINDOW (question));
  hl_ui_iterate ();
  g_assert_null (hl_window_get_question (window));
  g_assert_true (gtk_widget_get_visible (GTK_WIDGET (window)));
  g_assert_true (hl_document_get_modified (document));
  gtk_window_destroy (GTK_WINDOW (window));
  hl_ui_iterate ();
}

/* The banner's close button takes the problem notice away. */
static void
test_banner_closes (void)
{
  g_autofree char *path = hl_ui_demo_path ();
  g_autofree char *broken = g_build_filename (tmp_dir, "broken-again.hoop", NULL);
  g_autoptr(GFile) broken_file = g_file_new_for_path (broken);
  HlWindow *window = hl_ui_open_window (app, path);
  GtkWidget *close;

  g_assert_true (g_file_set_contents (broken, "<hoopline-project format=\"1\"><shell>", -1, NULL));
  g_assert_false (hl_window_load_file (window, broken_file));
  g_assert_nonnull (hl_window_get_message (window));
  close = find_descendant (GTK_WIDGET (window), GTK_TYPE_BUTTON, "Close the notice");
  g_assert_nonnull (close);
  g_signal_emit_by_name (close, "clicked");
  hl_ui_iterate ();
  g_assert_null (hl_window_get_message (window));
  gtk_window_destroy (GTK_WINDOW (window));
  hl_ui_iterate ();
  g_unlink (broken);
}

/* Preferences and About are libadwaita's standard windows. */
static void
test_standard_windows (void)
{
  g_autofree char *path = hl_ui_demo_path ();
  HlWindow *window = hl_ui_open_window (app, path);
  GtkWindow *found;

  g_action_group_activate_action (G_ACTION_GROUP (app), "preferences", NULL);
  hl_ui_iterate ();
  found = find_toplevel (ADW_TYPE_PREFERENCES_WINDOW);
  g_assert_nonnull (found);
  g_assert_true (gtk_window_get_transient_for (found) == GTK_WINDOW (window));
  /* its rows store their choice at once */
  {
    GtkWidget *units = find_descendant (GTK_WIDGET (found), ADW_TYPE_COMBO_ROW, NULL);
    GSettings *settings = hl_application_get_settings (app);
    g_autofree char *system = NULL;

    g_assert_nonnull (units);
    adw_combo_row_set_selected (ADW_COMBO_ROW (units), 1);
    system = g_settings_get_string (settings, "unit-system");
    g_assert_cmpstr (system, ==, "us");
    g_settings_reset (settings, "unit-system");
    g_assert_cmpuint (adw_combo_row_get_selected (ADW_COMBO_ROW (units)), ==, 0);
  }
  gtk_window_destroy (found);

  g_action_group_activate_action (G_ACTION_GROUP (app), "about", NULL);
  hl_ui_iterate ();
  found = find_toplevel (ADW_TYPE_ABOUT_WINDOW);
  g_assert_nonnull (found);
  g_assert_cmpstr (adw_about_window_get_version (ADW_ABOUT_WINDOW (found)), ==, HL_VERSION);
  /* the caution text stays where the program describes itself */
  g_assert_nonnull (strstr (adw_about_window_get_comments (ADW_ABOUT_WINDOW (found)), "Pressure equipment can kill"));
  gtk_window_destroy (found);

  gtk_window_destroy (GTK_WINDOW (window));
  hl_ui_iterate ();
}

int
main (int    argc,
      char **argv)
{
  int status;

  setlocale (LC_ALL, "C.UTF-8");
  g_test_init (&argc, &argv, NULL);
  tmp_dir = g_dir_make_tmp ("hl-platform-XXXXXX", NULL);
  g_assert_nonnull (tmp_dir);
  /* before GTK reads it */
  write_recent_list ();
  if (!gtk_init_check ())
    {
      /* CI runs these under Xvfb; a run without any display cannot test a window */
      printf ("1..0 # SKIP no display\n");
      return 0;
    }
  app = hl_ui_application_new ();

  g_test_add_func ("/platform/recent-newest-first", test_recent_newest_first);
  g_test_add_func ("/platform/dark-style", test_dark_style);
  g_test_add_func ("/platform/notices", test_notices);
  g_test_add_func ("/platform/question-escape-keeps-work", test_question_escape_keeps_work);
  g_test_add_func ("/platform/banner-closes", test_banner_closes);
  g_test_add_func ("/platform/standard-windows", test_standard_windows);
  status = g_test_run ();
  g_clear_object (&app);
  return status;
}
