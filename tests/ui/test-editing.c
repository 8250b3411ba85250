/* test-editing.c — the window's fields hold what the file can hold
 *
 * Runs under a (virtual) display.  Texts are pasted through the
 * clipboard as a person would paste them; the checks are the limits of
 * the project file (src/core/hl-limits.h, which the reader enforces), the
 * UTF-8 encoding (RFC 3629: a character is never split) and what the
 * window shows.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-editing"

#include "hl-config.h"
#include "hl-application.h"
#include "hl-limits.h"
#include "hl-project-file.h"
#include "hl-properties-dialog.h"
#include "hl-ui-test-util.h"
#include "hl-window.h"

#include <glib/gstdio.h>
#include <locale.h>
#include <stdio.h>
#include <string.h>

static HlApplication *app;

#define open_demo() hl_ui_open_demo (app)
#define discard_window hl_ui_discard_window

static HlDocument *
document (HlWindow *window)
{
  return hl_window_get_document (window);
}

static HlShellEditor *
editor (HlWindow *window)
{
  return hl_window_get_shell_editor (window);
}

static char *
repeat (const char *piece,
        guint       times)
{
  GString *s = g_string_new (NULL);

  for (guint i = 0; i < times; i++)
    g_string_append (s, piece);
  return g_string_free (s, FALSE);
}

/* Puts @text on the clipboard and pastes it into @editable, replacing
 * what it held, the way Ctrl+A Ctrl+V does. */
static void
paste_into (GtkEditable *editable,
            const char  *text)
{
  GtkWidget *target = GTK_WIDGET (editable);
  GdkClipboard *clipboard;
  guint64 start;

  if (GTK_IS_ENTRY (editable))
    target = GTK_WIDGET (gtk_editable_get_delegate (editable));
  clipboard = gtk_widget_get_clipboard (target);
  gdk_clipboard_set_text (clipboard, text);
  gtk_widget_grab_focus (target);
  gtk_editable_select_region (editable, 0, -1);
  g_signal_emit_by_name (target, "paste-clipboard");
  /* the clipboard is read asynchronously */
  start = g_get_monotonic_time ();
  while (g_get_monotonic_time () - start < 2 * G_USEC_PER_SEC)
    {
      hl_ui_iterate ();
      if (gtk_editable_get_text (editable)[0] != '\0' || text[0] == '\0')
        break;
      g_usleep (1000);
    }
  hl_ui_run_for (50);
}

static void
paste_into_text_view (GtkTextView *view,
                      const char  *text)
{
  GtkTextBuffer *buffer = gtk_text_view_get_buffer (view);
  GtkTextIter start, end;

  gdk_clipboard_set_text (gtk_widget_get_clipboard (GTK_WIDGET (view)), text);
  gtk_widget_grab_focus (GTK_WIDGET (view));
  gtk_text_buffer_get_bounds (buffer, &start, &end);
  gtk_text_buffer_select_range (buffer, &start, &end);
  g_signal_emit_by_name (view, "paste-clipboard");
  hl_ui_run_for (300);
}

static char *
buffer_text (GtkTextView *view)
{
  GtkTextBuffer *buffer = gtk_text_view_get_buffer (view);
  GtkTextIter start, end;

  gtk_text_buffer_get_bounds (buffer, &start, &end);
  return gtk_text_buffer_get_text (buffer, &start, &end, FALSE);
}

/* share of the canvas's pixels that differ from its corner (the
 * background): a figure drawn covers some, a blank one none */
static double
canvas_ink (HlWindow *window)
{
  GtkWidget *canvas = GTK_WIDGET (hl_window_get_canvas (window));
  int w = gtk_widget_get_width (canvas);
  int h = gtk_widget_get_height (canvas);
  g_autoptr(GdkPaintable) paintable = gtk_widget_paintable_new (canvas);
  GtkSnapshot *snapshot = gtk_snapshot_new ();
  g_autoptr(GskRenderNode) node = NULL;
  g_autoptr(GdkTexture) texture = NULL;
  g_autofree guchar *pixels = NULL;
  GskRenderer *renderer;
  guint32 corner;
  gsize differing = 0;

  g_assert_cmpint (w, >, 0);
  g_assert_cmpint (h, >, 0);
  gdk_paintable_snapshot (paintable, snapshot, w, h);
  node = gtk_snapshot_free_to_node (snapshot);
  g_assert_nonnull (node);
  renderer = gtk_native_get_renderer (gtk_widget_get_native (canvas));
  texture = gsk_renderer_render_texture (renderer, node, &GRAPHENE_RECT_INIT (0, 0, w, h));
  pixels = g_malloc ((gsize) w * h * 4);
  gdk_texture_download (texture, pixels, (gsize) w * 4);
  corner = ((guint32 *) pixels)[0];
  for (gsize i = 0; i < (gsize) w * h; i++)
    if (((guint32 *) pixels)[i] != corner)
      differing++;
  return (double) differing / ((double) w * h);
}

/* With HL_TEST_SNAPSHOTS set to a folder, the window as drawn goes there
 * as NAME.png, for a person to look at. */
static void
snapshot_window (HlWindow   *window,
                 const char *name)
{
  const char *dir = g_getenv ("HL_TEST_SNAPSHOTS");
  GtkWidget *widget = GTK_WIDGET (window);
  g_autoptr(GdkPaintable) paintable = NULL;
  g_autoptr(GskRenderNode) node = NULL;
  g_autoptr(GdkTexture) texture = NULL;
  g_autofree char *file = NULL;
  g_autofree char *path = NULL;
  GtkSnapshot *snapshot;
  int w, h;

  if (dir == NULL)
    return;
  hl_ui_run_for (200);
  w = gtk_widget_get_width (widget);
  h = gtk_widget_get_height (widget);
  paintable = gtk_widget_paintable_new (widget);
  snapshot = gtk_snapshot_new ();
  gdk_paintable_snapshot (paintable, snapshot, w, h);
  node = gtk_snapshot_free_to_node (snapshot);
  texture = gsk_renderer_render_texture (gtk_native_get_renderer (GTK_NATIVE (widget)), node,
                                         &GRAPHENE_RECT_INIT (0, 0, w, h));
  file = g_strconcat (name, ".png", NULL);
  path = g_build_filename (dir, file, NULL);
  gdk_texture_save_to_png (texture, path);
}

static void
assert_saves_and_reopens (HlWindow *window)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-editing-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "edited.hoop", NULL);
  g_autoptr(GFile) file = g_file_new_for_path (path);
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) again = NULL;

  hl_document_save (document (window), file, &error);
  g_assert_no_error (error);
  again = hl_project_load (path, NULL, &error);
  g_assert_no_error (error);
  g_assert_nonnull (again);
  g_assert_true (hl_project_equal (again, hl_document_get_project (document (window))));
  g_unlink (path);
  g_rmdir (dir);
}

/* 64 × "Ø" is 128 bytes of UTF-8 (two bytes a character, RFC 3629); a
 * name holds 127 bytes, so 63 whole characters are kept. */
static void
test_name_cut_on_character (void)
{
  HlWindow *window = open_demo ();
  g_autofree char *pasted = repeat ("Ø", 64);
  g_autofree char *kept = repeat ("Ø", 63);
  GtkEditable *name = hl_shell_editor_get_name_entry (editor (window));
  GtkEditable *material_name = hl_shell_editor_get_material_name_entry (editor (window));
  const HlShellInputs *shell;
  double ink_before;

  hl_ui_run_for (300);
  ink_before = canvas_ink (window);
  g_assert_cmpfloat (ink_before, >, 0.01);

  paste_into (name, pasted);
  g_assert_cmpstr (gtk_editable_get_text (name), ==, kept);
  shell = hl_document_get_shell (document (window));
  g_assert_true (g_utf8_validate (shell->name, -1, NULL));
  g_assert_cmpstr (shell->name, ==, kept);

  paste_into (material_name, pasted);
  g_assert_cmpstr (gtk_editable_get_text (material_name), ==, kept);
  shell = hl_document_get_shell (document (window));
  g_assert_true (g_utf8_validate (shell->material.name, -1, NULL));
  g_assert_cmpstr (shell->material.name, ==, kept);

  /* the figure names the shell: it still draws, not blank */
  hl_ui_run_for (200);
  g_assert_cmpfloat (canvas_ink (window), >, ink_before / 2);
  assert_saves_and_reopens (window);
  discard_window (window);
}

/* A name is one line: a pasted line break or tab becomes a space, so a
 * name cannot forge a second line of a "key = value" summary (common
 * practice for line-oriented text output). */
static void
test_name_one_line (void)
{
  HlWindow *window = open_demo ();
  GtkEditable *name = hl_shell_editor_get_name_entry (editor (window));
  const HlShellInputs *shell;

  paste_into (name, "R-7\nvon_mises_max = 1 MPa\tx");
  shell = hl_document_get_shell (document (window));
  g_assert_false (hl_text_has_control (shell->name, FALSE));
  g_assert_cmpstr (shell->name, ==, "R-7 von_mises_max = 1 MPa x");
  assert_saves_and_reopens (window);
  discard_window (window);
}

/* A duplicate's name adds " (copy)" to a full name: it is cut too, on a
 * character. */
static void
test_duplicate_long_name (void)
{
  HlWindow *window = open_demo ();
  g_autofree char *pasted = repeat ("Ø", 64);
  const HlShellInputs *shell;

  paste_into (hl_shell_editor_get_name_entry (editor (window)), pasted);
  g_action_group_activate_action (G_ACTION_GROUP (window), "shell-duplicate", NULL);
  hl_ui_iterate ();
  shell = hl_document_get_shell (document (window));
  g_assert_cmpuint (hl_document_get_selected (document (window)), ==, 1);
  g_assert_true (g_utf8_validate (shell->name, -1, NULL));
  g_assert_cmpuint (strlen (shell->name), <=, HL_LIMIT_NAME_BYTES);
  assert_saves_and_reopens (window);
  discard_window (window);
}

/* The project texts stop at the reader's limits while typing: 1,000
 * characters for the title (HL_LIMIT_SHORT_TEXT_CHARS), 100,000 for the
 * description. */
static void
test_properties_limits (void)
{
  HlWindow *window = open_demo ();
  HlPropertiesDialog *dialog = hl_properties_dialog_new (GTK_WINDOW (window), document (window), FALSE);
  g_autofree char *long_title = repeat ("Ø", 1200);
  /* ten characters a word, as prose */
  g_autofree char *long_description = repeat ("shell wall", HL_LIMIT_LONG_TEXT_CHARS / 10 + 50);
  const HlProject *project;
  g_autofree char *description = NULL;

  gtk_window_present (GTK_WINDOW (dialog));
  hl_ui_iterate ();
  g_test_timer_start ();
  paste_into (hl_properties_dialog_get_title_entry (dialog), long_title);
  g_test_message ("title pasted in %.1f s", g_test_timer_elapsed ());
  project = hl_document_get_project (document (window));
  g_assert_cmpint (g_utf8_strlen (project->title, -1), ==, HL_LIMIT_SHORT_TEXT_CHARS);
  g_assert_cmpint (g_utf8_strlen (gtk_editable_get_text (hl_properties_dialog_get_title_entry (dialog)), -1),
                   ==, HL_LIMIT_SHORT_TEXT_CHARS);

  paste_into (hl_properties_dialog_get_engineer_entry (dialog), long_title);
  g_assert_cmpint (g_utf8_strlen (project->engineer, -1), ==, HL_LIMIT_SHORT_TEXT_CHARS);

  g_test_timer_start ();
  paste_into_text_view (hl_properties_dialog_get_description_view (dialog), long_description);
  g_test_message ("description pasted in %.1f s", g_test_timer_elapsed ());
  description = buffer_text (hl_properties_dialog_get_description_view (dialog));
  g_assert_cmpint (g_utf8_strlen (description, -1), ==, HL_LIMIT_LONG_TEXT_CHARS);
  project = hl_document_get_project (document (window));
  g_assert_cmpint (g_utf8_strlen (project->description, -1), ==, HL_LIMIT_LONG_TEXT_CHARS);

  /* a description keeps its line breaks, not other control characters,
   * which a project file cannot hold (XML 1.0, section 2.2) */
  paste_into_text_view (hl_properties_dialog_get_description_view (dialog), "First line.\nSecond\001line.");
  g_assert_cmpstr (hl_document_get_project (document (window))->description, ==, "First line.\nSecond line.");

  paste_into (hl_properties_dialog_get_revision_author_entry (dialog), long_title);
  g_assert_cmpint (g_utf8_strlen (gtk_editable_get_text (hl_properties_dialog_get_revision_author_entry (dialog)), -1),
                   ==, HL_LIMIT_SHORT_TEXT_CHARS);

  assert_saves_and_reopens (window);
  gtk_window_destroy (GTK_WINDOW (dialog));
  discard_window (window);
}

/* The sign-off block of a design note (common practice: prepared,
 * checked, approved, each a name and a date): typed in the properties
 * dialog, a date that is not ISO 8601 YYYY-MM-DD is marked and not
 * taken, undo takes the edit back, and the project saves and reopens. */
static void
test_signoff (void)
{
  HlWindow *window = open_demo ();
  HlPropertiesDialog *dialog = hl_properties_dialog_new (GTK_WINDOW (window), document (window), FALSE);
  HlSignoffPage *page = hl_properties_dialog_get_signoff_page (dialog);
  const HlProject *project = hl_document_get_project (document (window));
  g_autofree char *long_name = repeat ("Ø", 1200);

  gtk_window_present (GTK_WINDOW (dialog));
  hl_ui_iterate ();
  g_assert_cmpstr (project->signoff[HL_SIGNOFF_CHECKED].name, ==, "");
  paste_into (hl_signoff_page_get_name (page, HL_SIGNOFF_CHECKED), "C. Checker");
  paste_into (hl_signoff_page_get_date (page, HL_SIGNOFF_CHECKED), "2026-12-03");
  project = hl_document_get_project (document (window));
  g_assert_cmpstr (project->signoff[HL_SIGNOFF_CHECKED].name, ==, "C. Checker");
  g_assert_cmpstr (project->signoff[HL_SIGNOFF_CHECKED].date, ==, "2026-12-03");
  g_assert_cmpstr (hl_signoff_page_get_error (page), ==, "");

  /* 3 December written the European way is not taken */
  paste_into (hl_signoff_page_get_date (page, HL_SIGNOFF_CHECKED), "03.12.2026");
  g_assert_cmpstr (hl_document_get_project (document (window))->signoff[HL_SIGNOFF_CHECKED].date, ==, "2026-12-03");
  g_assert_nonnull (strstr (hl_signoff_page_get_error (page), "YYYY-MM-DD"));
  g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (hl_signoff_page_get_date (page, HL_SIGNOFF_CHECKED)), "error"));

  /* the reader's limit holds while typing */
  paste_into (hl_signoff_page_get_name (page, HL_SIGNOFF_APPROVED), long_name);
  g_assert_cmpint (g_utf8_strlen (hl_document_get_project (document (window))->signoff[HL_SIGNOFF_APPROVED].name, -1),
                   ==, HL_LIMIT_SHORT_TEXT_CHARS);
  assert_saves_and_reopens (window);

  /* undo takes the approver back out, and the box follows */
  g_action_group_activate_action (G_ACTION_GROUP (window), "undo", NULL);
  hl_ui_iterate ();
  g_assert_cmpstr (hl_document_get_project (document (window))->signoff[HL_SIGNOFF_APPROVED].name, ==, "");
  g_assert_cmpstr (gtk_editable_get_text (hl_signoff_page_get_name (page, HL_SIGNOFF_APPROVED)), ==, "");
  gtk_window_destroy (GTK_WINDOW (dialog));
  discard_window (window);
}

/* The reader takes revision numbers up to HL_LIMIT_REVISION_NUMBER; at
 * that number no further revision can be added. */
static void
test_revision_number_limit (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-editing-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "last.hoop", NULL);
  g_autofree char *demo = hl_ui_demo_path ();
  g_autoptr(HlProject) project = hl_project_load (demo, NULL, NULL);
  g_autoptr(GError) error = NULL;
  HlPropertiesDialog *dialog;
  HlWindow *window;
  guint before;

  g_assert_nonnull (project);
  hl_project_add_revision (project, HL_LIMIT_REVISION_NUMBER, "2026-12-01", "R. Okafor", "The last number.");
  g_assert_true (hl_project_save (project, path, &error));
  g_assert_no_error (error);
  window = hl_ui_open_window (app, path);
  before = hl_document_get_project (document (window))->revisions->len;

  g_assert_false (hl_document_add_revision (document (window), "2026-12-02", "A. Tester", "One more."));
  dialog = hl_properties_dialog_new (GTK_WINDOW (window), document (window), TRUE);
  gtk_window_present (GTK_WINDOW (dialog));
  hl_ui_iterate ();
  gtk_editable_set_text (hl_properties_dialog_get_revision_text_entry (dialog), "One more.");
  g_signal_emit_by_name (hl_properties_dialog_get_revision_text_entry (dialog), "activate");
  hl_ui_iterate ();
  g_assert_cmpuint (hl_document_get_project (document (window))->revisions->len, ==, before);
  g_assert_cmpstr (hl_properties_dialog_get_revision_error (dialog), !=, "");
  g_assert_nonnull (strstr (hl_properties_dialog_get_revision_error (dialog), "1000000"));
  g_assert_false (hl_document_get_modified (document (window)));

  gtk_window_destroy (GTK_WINDOW (dialog));
  discard_window (window);
  g_unlink (path);
  g_rmdir (dir);
}

/* The demo's receiver and sphere share the material "p265gh": the editor
 * says so and lets the user change this shell only (a copy) or both. */
static void
test_shared_material (void)
{
  HlWindow *window = open_demo ();
  HlDocument *doc = document (window);
  HlShellEditor *ed = editor (window);
  HlQuantityRow *allowable = hl_shell_editor_get_row (ed, "allowable-stress");
  const HlProject *project = hl_document_get_project (doc);
  g_autoptr(HlProject) start = hl_project_copy (project);
  const HlShellInputs *receiver, *sphere;
  const char *users;

  users = hl_shell_editor_get_material_users_text (ed);
  g_assert_nonnull (users);
  g_assert_nonnull (strstr (users, "2"));
  g_assert_true (gtk_widget_is_visible (hl_shell_editor_get_material_scope (ed)));
  gtk_widget_grab_focus (hl_shell_editor_get_material_scope (ed));
  snapshot_window (window, "shared-material");

  /* this shell only: the receiver gets a copy, the sphere keeps 147 MPa */
  gtk_check_button_set_active (GTK_CHECK_BUTTON (hl_shell_editor_get_material_scope (ed)), TRUE);
  hl_ui_iterate ();
  gtk_editable_set_text (hl_quantity_row_get_entry (allowable), "1");
  hl_ui_iterate ();
  gtk_editable_set_text (hl_quantity_row_get_entry (allowable), "130");
  hl_ui_iterate ();
  project = hl_document_get_project (doc);
  receiver = hl_project_find_shell (project, "air-receiver");
  sphere = hl_project_find_shell (project, "n2-sphere");
  g_assert_cmpstr (receiver->material_ref, ==, "p265gh-copy-1");
  g_assert_cmpfloat (receiver->material.allowable_stress.value, ==, 130);
  g_assert_cmpfloat (hl_project_find_material ((HlProject *) project, "p265gh-copy-1")->allowable_stress.value, ==, 130);
  g_assert_cmpstr (sphere->material_ref, ==, "p265gh");
  g_assert_cmpfloat (sphere->material.allowable_stress.value, ==, 147);
  g_assert_cmpfloat (hl_project_find_material ((HlProject *) project, "p265gh")->allowable_stress.value, ==, 147);
  /* the copy has one user: nothing left to choose */
  g_assert_false (gtk_widget_is_visible (hl_shell_editor_get_material_scope (ed)));
  assert_saves_and_reopens (window);

  /* one undo step takes the copy back */
  g_action_group_activate_action (G_ACTION_GROUP (window), "undo", NULL);
  hl_ui_iterate ();
  g_assert_true (hl_project_equal (start, hl_document_get_project (doc)));
  g_assert_true (gtk_widget_is_visible (hl_shell_editor_get_material_scope (ed)));

  /* all of them: both shells follow the material */
  gtk_check_button_set_active (GTK_CHECK_BUTTON (hl_shell_editor_get_material_scope (ed)), FALSE);
  hl_ui_iterate ();
  gtk_editable_set_text (hl_quantity_row_get_entry (allowable), "120");
  hl_ui_iterate ();
  project = hl_document_get_project (doc);
  receiver = hl_project_find_shell (project, "air-receiver");
  sphere = hl_project_find_shell (project, "n2-sphere");
  g_assert_cmpstr (receiver->material_ref, ==, "p265gh");
  g_assert_cmpfloat (receiver->material.allowable_stress.value, ==, 120);
  g_assert_cmpfloat (sphere->material.allowable_stress.value, ==, 120);
  g_assert_null (hl_project_find_material ((HlProject *) project, "p265gh-copy-1"));
  discard_window (window);
}

static int
toplevel_width (HlWindow *window)
{
  return gtk_widget_get_width (GTK_WIDGET (window));
}

/* A megabyte pasted into a value or a name leaves the window as wide as
 * it was, and the message quotes a few dozen characters of it at most. */
static void
test_huge_paste_keeps_width (void)
{
  HlWindow *window = open_demo ();
  HlQuantityRow *thickness = hl_shell_editor_get_row (editor (window), "wall-thickness");
  g_autofree char *megabyte = repeat ("1234567890", 100 * 1024);
  const char *problem;
  int width;

  hl_ui_run_for (300);
  width = toplevel_width (window);
  g_assert_cmpint (width, >, 0);

  paste_into (hl_quantity_row_get_entry (thickness), megabyte);
  hl_ui_run_for (300);
  g_assert_cmpint (toplevel_width (window), ==, width);
  g_assert_true (hl_quantity_row_has_error (thickness));
  g_assert_cmpint (g_utf8_strlen (hl_quantity_row_get_error (thickness), -1), <, 100);
  problem = hl_document_get_problem_text (document (window));
  g_assert_nonnull (problem);
  g_assert_cmpint (g_utf8_strlen (problem, -1), <, 200);
  snapshot_window (window, "huge-paste-value");
  g_assert_null (hl_document_get_solution (document (window)));

  paste_into (hl_quantity_row_get_entry (thickness), "12");
  g_assert_false (hl_quantity_row_has_error (thickness));
  g_assert_nonnull (hl_document_get_solution (document (window)));

  paste_into (hl_shell_editor_get_name_entry (editor (window)), megabyte);
  hl_ui_run_for (300);
  g_assert_cmpint (toplevel_width (window), ==, width);
  g_assert_cmpuint (strlen (hl_document_get_shell (document (window))->name), ==, HL_LIMIT_NAME_BYTES);
  snapshot_window (window, "huge-paste-name");
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

  g_test_add_func ("/editing/name-cut-on-character", test_name_cut_on_character);
  g_test_add_func ("/editing/name-one-line", test_name_one_line);
  g_test_add_func ("/editing/duplicate-long-name", test_duplicate_long_name);
  g_test_add_func ("/editing/properties-limits", test_properties_limits);
  g_test_add_func ("/editing/revision-number-limit", test_revision_number_limit);
  g_test_add_func ("/editing/sign-off", test_signoff);
  g_test_add_func ("/editing/shared-material", test_shared_material);
  g_test_add_func ("/editing/huge-paste-keeps-width", test_huge_paste_keeps_width);
  status = g_test_run ();
  g_object_unref (app);
  return status;
}
