/* test-window-saves.c — the window's saves hit the file the user means
 *
 * Driven as a person would: the real save chooser, the questions the
 * window asks, another program writing the open file, a killed save, and
 * SIGTERM / SIGINT sent to a real run of the program.  Facts relied on:
 * GTK's save chooser asks before replacing the file whose name was typed
 * (and only that one); rename(2) gives a file a new inode, so a program
 * that saves by renaming changes the etag GIO reports; POSIX link(2) and
 * setrlimit(2) (RLIMIT_FSIZE kills a writer with SIGXFSZ); a desktop
 * program ends on SIGTERM without asking (common practice).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-window-saves"

#include "hl-config.h"
#include "hl-application.h"
#include "hl-autosave.h"
#include "hl-ui-test-util.h"
#include "hl-project-file.h"
#include "hl-save-test-util.h"
#include "hl-test-program.h"
#include "hl-window.h"

#include <glib/gstdio.h>
#include <locale.h>
#include <signal.h>
#include <stdio.h>
#include <string.h>
#include <sys/stat.h>
#include <sys/wait.h>
#include <unistd.h>

static HlApplication *app;
static char *state_dir;

typedef struct
{
  char *dir;
  char *path;        /* dir/mine.hoop: a copy of the demo */
  HlWindow *window;  /* showing it */
  gboolean immutable;
} Fixture;

static HlProject *
demo_titled (const char *title)
{
  g_autofree char *demo = hl_ui_demo_path ();
  HlProject *p = hl_project_load (demo, NULL, NULL);

  g_assert_nonnull (p);
  hl_project_set_title (p, title);
  return p;
}

/* writes @path as another program would: a whole new file */
static void
write_project (const char *path,
               const char *title)
{
  g_autoptr(HlProject) p = demo_titled (title);
  g_autofree char *xml = hl_project_to_xml (p);

  g_assert_true (g_file_set_contents (path, xml, -1, NULL));
}

static char *
title_on_disk (const char *path)
{
  g_autoptr(HlProject) p = hl_project_load (path, NULL, NULL);

  g_assert_nonnull (p);
  return g_strdup (p->title);
}

static void
assert_title_on_disk (const char *path,
                      const char *title)
{
  g_autofree char *now = title_on_disk (path);

  g_assert_cmpstr (now, ==, title);
}

static void
setup (Fixture      *f,
       gconstpointer data)
{
  f->dir = g_dir_make_tmp ("hl-saves-XXXXXX", NULL);
  g_assert_nonnull (f->dir);
  f->path = g_build_filename (f->dir, "mine.hoop", NULL);
  write_project (f->path, "Mine as opened");
  f->window = hl_ui_open_window (app, f->path);
}

static void
destroy_all_windows (void)
{
  GList *windows = g_list_copy (gtk_application_get_windows (GTK_APPLICATION (app)));

  for (GList *l = windows; l != NULL; l = l->next)
    gtk_window_destroy (GTK_WINDOW (l->data));
  g_list_free (windows);
  hl_ui_iterate ();
}

static void
teardown (Fixture      *f,
          gconstpointer data)
{
  destroy_all_windows ();
  hl_save_test_open_folder (f->dir, f->immutable);
  hl_test_remove_tree (f->dir);
  g_free (f->dir);
  g_free (f->path);
}

static void
edit_title (HlWindow   *window,
            const char *title)
{
  HlDocument *doc = hl_window_get_document (window);
  const HlProject *p = hl_document_get_project (doc);

  hl_document_set_info (doc, title, p->engineer, p->description, p->display_units);
  hl_ui_iterate ();
}

static void
activate (HlWindow   *window,
          const char *action)
{
  g_assert_true (g_action_group_get_action_enabled (G_ACTION_GROUP (window), action));
  g_action_group_activate_action (G_ACTION_GROUP (window), action, NULL);
  hl_ui_iterate ();
}

/* the window's question, which must be there and mention @words */
static GtkWidget *
expect_question (HlWindow   *window,
                 const char *words)
{
  GtkWidget *question = hl_window_get_question (window);
  g_autofree char *text = NULL;

  g_assert_nonnull (question);
  g_assert_true (gtk_widget_get_visible (question));
  g_assert_true (gtk_window_get_modal (GTK_WINDOW (question)));
  text = hl_ui_question_text (question);
  g_test_message ("asked: %s", text);
  if (strstr (text, words) == NULL)
    g_error ("“%s” lacks “%s”", text, words);
  return question;
}

static void
answer (HlWindow   *window,
        const char *response)
{
  hl_ui_answer (hl_window_get_question (window), response);
  hl_ui_iterate ();
}

static gboolean
modified (HlWindow *window)
{
  return hl_document_get_modified (hl_window_get_document (window));
}

/* ---- Save As with a name typed without ".hoop" -------------------- */

static GtkWidget *
find_save_chooser (void)
{
  GList *toplevels = gtk_window_list_toplevels ();
  GtkWidget *found = NULL;

  for (GList *l = toplevels; l != NULL; l = l->next)
    if (GTK_IS_FILE_CHOOSER_DIALOG (l->data) && gtk_widget_get_visible (l->data))
      found = l->data;
  g_list_free (toplevels);
  return found;
}

/* types @name in the folder @dir into the save chooser and presses Save,
 * then waits until the chooser has gone */
static void
save_as_typed (HlWindow   *window,
               const char *dir,
               const char *name)
{
  g_autoptr(GFile) folder = g_file_new_for_path (dir);
  gint64 deadline;
  GtkWidget *chooser;

  activate (window, "save-as");
  chooser = find_save_chooser ();
  g_assert_nonnull (chooser);
  g_assert_true (gtk_file_chooser_set_current_folder (GTK_FILE_CHOOSER (chooser), folder, NULL));
  gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (chooser), name);
  hl_ui_run_for (200);
  gtk_dialog_response (GTK_DIALOG (chooser), GTK_RESPONSE_ACCEPT);
  /* the chooser checks the typed name in the background first */
  deadline = g_get_monotonic_time () + 10 * G_USEC_PER_SEC;
  while (find_save_chooser () != NULL && g_get_monotonic_time () < deadline)
    hl_ui_run_for (50);
  g_assert_null (find_save_chooser ());
  hl_ui_iterate ();
}

static void
test_save_as_without_extension (Fixture      *f,
                                gconstpointer data)
{
  g_autofree char *existing = g_build_filename (f->dir, "existing.hoop", NULL);
  g_autofree char *fresh = g_build_filename (f->dir, "fresh.hoop", NULL);

  write_project (existing, "Someone's existing project");
  edit_title (f->window, "Mine, edited");

  /* "existing" names no file, so the chooser asked nothing; the save
   * would write "existing.hoop", which the window asks about */
  save_as_typed (f->window, f->dir, "existing");
  expect_question (f->window, "existing.hoop");
  assert_title_on_disk (existing, "Someone's existing project");
  answer (f->window, HL_QUESTION_CANCEL);
  g_assert_null (hl_window_get_question (f->window));
  assert_title_on_disk (existing, "Someone's existing project");
  g_assert_true (modified (f->window));
  {
    g_autoptr(GFile) mine = g_file_new_for_path (f->path);

    g_assert_true (hl_window_shows_file (f->window, mine));
  }

  save_as_typed (f->window, f->dir, "existing");
  expect_question (f->window, "existing.hoop");
  answer (f->window, HL_QUESTION_ACCEPT);
  assert_title_on_disk (existing, "Mine, edited");
  g_assert_false (modified (f->window));
  assert_title_on_disk (f->path, "Mine as opened");

  /* a name that is free is saved at once */
  edit_title (f->window, "Mine, fresh");
  save_as_typed (f->window, f->dir, "fresh");
  g_assert_null (hl_window_get_question (f->window));
  assert_title_on_disk (fresh, "Mine, fresh");
}

/* ---- another program writes the open file ------------------------- */

static gboolean
wait_for_notice (HlWindow *window)
{
  gint64 deadline = g_get_monotonic_time () + 10 * G_USEC_PER_SEC;

  while (g_get_monotonic_time () < deadline)
    {
      if (hl_window_get_disk_notice (window) != NULL)
        return TRUE;
      hl_ui_run_for (50);
    }
  return FALSE;
}

/* A change on disk is shown at once; Reload brings that version. */
static void
test_changed_on_disk_reload (Fixture      *f,
                             gconstpointer data)
{
  const char *notice;

  g_assert_null (hl_window_get_disk_notice (f->window));
  edit_title (f->window, "Mine, edited");
  write_project (f->path, "Theirs, newer");
  g_assert_true (wait_for_notice (f->window));
  notice = hl_window_get_disk_notice (f->window);
  g_test_message ("notice: %s", notice);
  g_assert_nonnull (strstr (notice, "mine.hoop"));
  g_assert_nonnull (strstr (notice, "changed by another program"));

  activate (f->window, "disk-reload");
  g_assert_null (hl_window_get_disk_notice (f->window));
  g_assert_cmpstr (hl_document_get_project (hl_window_get_document (f->window))->title, ==, "Theirs, newer");
  g_assert_false (modified (f->window));
}

/* Our own saves are not "someone else": no notice, no question. */
static void
test_own_saves_are_quiet (Fixture      *f,
                          gconstpointer data)
{
  for (int i = 0; i < 3; i++)
    {
      g_autofree char *title = g_strdup_printf ("Mine, save %d", i);

      edit_title (f->window, title);
      activate (f->window, "save");
      g_assert_null (hl_window_get_question (f->window));
      assert_title_on_disk (f->path, title);
    }
  hl_ui_run_for (1500);
  g_assert_null (hl_window_get_disk_notice (f->window));
}

/* The file was replaced since it was read: saving asks first, and
 * Cancel leaves the other version. */
static void
test_newer_version_asks_before_save (Fixture      *f,
                                     gconstpointer data)
{
  edit_title (f->window, "Mine, edited");
  write_project (f->path, "Theirs, newer");
  activate (f->window, "save");
  expect_question (f->window, "changed by someone else");
  assert_title_on_disk (f->path, "Theirs, newer");
  answer (f->window, HL_QUESTION_CANCEL);
  assert_title_on_disk (f->path, "Theirs, newer");
  g_assert_true (modified (f->window));

  activate (f->window, "save");
  expect_question (f->window, "changed by someone else");
  answer (f->window, HL_QUESTION_ACCEPT);
  assert_title_on_disk (f->path, "Mine, edited");
  g_assert_false (modified (f->window));
  /* the version on disk is ours now: the next save asks nothing */
  edit_title (f->window, "Mine, edited again");
  activate (f->window, "save");
  g_assert_null (hl_window_get_question (f->window));
  assert_title_on_disk (f->path, "Mine, edited again");
}

/* Keep Mine: the notice goes and the save that follows replaces the
 * other version without asking again. */
static void
test_keep_mine (Fixture      *f,
                gconstpointer data)
{
  edit_title (f->window, "Mine, edited");
  write_project (f->path, "Theirs, newer");
  g_assert_true (wait_for_notice (f->window));
  activate (f->window, "disk-keep");
  g_assert_null (hl_window_get_disk_notice (f->window));
  g_assert_cmpstr (hl_document_get_project (hl_window_get_document (f->window))->title, ==, "Mine, edited");
  activate (f->window, "save");
  g_assert_null (hl_window_get_question (f->window));
  assert_title_on_disk (f->path, "Mine, edited");
}

/* The unsaved-changes question's Save goes through the same check: a
 * close does not silently replace the newer version. */
static void
test_close_save_asks_about_newer (Fixture      *f,
                                  gconstpointer data)
{
  edit_title (f->window, "Mine, edited");
  write_project (f->path, "Theirs, newer");
  gtk_window_close (GTK_WINDOW (f->window));
  hl_ui_iterate ();
  expect_question (f->window, "Save changes");
  answer (f->window, HL_QUESTION_SAVE);
  expect_question (f->window, "changed by someone else");
  answer (f->window, HL_QUESTION_CANCEL);
  g_assert_null (hl_window_get_question (f->window));
  /* nothing written, and the window stays with the work */
  assert_title_on_disk (f->path, "Theirs, newer");
  g_assert_nonnull (g_list_find (gtk_application_get_windows (GTK_APPLICATION (app)), f->window));
}

/* ---- files that must not simply be replaced ----------------------- */

/* chmod a-w: the save is refused, the file and its mode stay. */
static void
test_read_only_refused (Fixture      *f,
                        gconstpointer data)
{
  g_assert_cmpint (g_chmod (f->path, 0444), ==, 0);
  edit_title (f->window, "Mine, edited");
  activate (f->window, "save");
  hl_ui_iterate ();
  assert_title_on_disk (f->path, "Mine as opened");
  g_assert_cmpuint (hl_save_test_stat (f->path).st_mode & 07777, ==, 0444);
  g_assert_true (modified (f->window));
}

/* A project shared by a group keeps its mode after a save from the window. */
static void
test_save_keeps_mode (Fixture      *f,
                      gconstpointer data)
{
  g_assert_cmpint (g_chmod (f->path, 0664), ==, 0);
  edit_title (f->window, "Mine, edited");
  activate (f->window, "save");
  assert_title_on_disk (f->path, "Mine, edited");
  g_assert_cmpuint (hl_save_test_stat (f->path).st_mode & 07777, ==, 0664);
}

/* The folder takes no new files (a user: no write permission; root: the
 * immutable flag): writing over the file happens only after a yes. */
static void
test_no_temp_asks (Fixture      *f,
                   gconstpointer data)
{
  if (!hl_save_test_close_folder (f->dir, &f->immutable))
    return;
  edit_title (f->window, "Mine, edited");
  activate (f->window, "save");
  expect_question (f->window, "directly");
  answer (f->window, HL_QUESTION_CANCEL);
  assert_title_on_disk (f->path, "Mine as opened");
  g_assert_true (modified (f->window));

  activate (f->window, "save");
  expect_question (f->window, "directly");
  answer (f->window, HL_QUESTION_ACCEPT);
  assert_title_on_disk (f->path, "Mine, edited");
  g_assert_false (modified (f->window));
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 1);
}

/* Two names for the file: a yes writes it in place, so both show it. */
static void
test_hard_links_ask (Fixture      *f,
                     gconstpointer data)
{
  g_autofree char *second = g_build_filename (f->dir, "second-name.hoop", NULL);

  g_assert_cmpint (link (f->path, second), ==, 0);
  edit_title (f->window, "Mine, edited");
  activate (f->window, "save");
  expect_question (f->window, "directly");
  answer (f->window, HL_QUESTION_ACCEPT);
  assert_title_on_disk (f->path, "Mine, edited");
  assert_title_on_disk (second, "Mine, edited");
  g_assert_cmpuint (hl_save_test_stat (f->path).st_nlink, ==, 2);
}

/* ---- a killed save ------------------------------------------------ */

/* A save killed while it writes (RLIMIT_FSIZE: SIGXFSZ) leaves its
 * temporary beside the file; opening the file removes it. */
static void
test_killed_save_leftover_cleaned (Fixture      *f,
                                   gconstpointer data)
{
  destroy_all_windows ();
  hl_save_test_killed_save (f->path);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 2);

  f->window = hl_ui_open_window (app, f->path);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 1);
  assert_title_on_disk (f->path, "Mine as opened");
}

/* ---- SIGTERM and SIGINT ------------------------------------------- */

/* reads the child's output until @line comes; FALSE after 60 s (a child
 * under the sanitizers starts slowly) or at its end */
static gboolean
wait_for_line (int         fd,
               const char *line)
{
  g_autoptr(GString) seen = g_string_new (NULL);
  gint64 deadline = g_get_monotonic_time () + 60 * G_USEC_PER_SEC;

  while (strstr (seen->str, line) == NULL)
    {
      GPollFD poll_fd = { fd, G_IO_IN | G_IO_HUP, 0 };
      gint64 left = (deadline - g_get_monotonic_time ()) / 1000;
      char buffer[256];
      gssize n;

      if (left <= 0 || g_poll (&poll_fd, 1, (int) left) <= 0)
        return FALSE;
      n = read (fd, buffer, sizeof buffer);
      if (n <= 0)
        return FALSE;
      g_string_append_len (seen, buffer, n);
    }
  return TRUE;
}

/* Runs the program on @path with an edit, waits for the edit, signals
 * it; the run ends cleanly and leaves a copy holding the edit. */
static void
signal_after_edit (const char *path,
                   int         signum,
                   const char *title)
{
  const char *program = g_getenv ("HL_PROGRAM");
  g_auto(GStrv) env = g_get_environ ();
  g_autoptr(GError) error = NULL;
  g_autoptr(GPtrArray) orphans = NULL;
  g_autoptr(HlProject) copy = NULL;
  const char *argv[] = { program, path, NULL };
  GPid pid = 0;
  int out = -1, status = 0;

  g_assert_nonnull (program);
  /* far past the test: only the signal can write the copy */
  env = g_environ_setenv (env, "HL_AUTOSAVE_SECONDS", "600", TRUE);
  env = g_environ_setenv (env, "HL_TEST_HOOKS", "1", TRUE);
  env = g_environ_setenv (env, "HL_TEST_EDIT", title, TRUE);
  if (!g_spawn_async_with_pipes (NULL, (char **) argv, env, G_SPAWN_DO_NOT_REAP_CHILD, NULL, NULL,
                                 &pid, NULL, &out, NULL, &error))
    g_error ("cannot start %s: %s", program, error->message);
  if (!wait_for_line (out, "test edit applied"))
    {
      kill (pid, SIGKILL);
      waitpid (pid, &status, 0);
      g_error ("the run never said that it had made the edit");
    }
  g_assert_cmpint (kill (pid, signum), ==, 0);
  g_assert_cmpint (waitpid (pid, &status, 0), ==, pid);
  close (out);
  g_spawn_close_pid (pid);
  g_assert_true (WIFEXITED (status));
  g_assert_cmpint (WEXITSTATUS (status), ==, 0);

  orphans = hl_autosave_find_orphans ();
  g_assert_cmpuint (orphans->len, ==, 1);
  g_assert_cmpstr (((HlAutosaveEntry *) orphans->pdata[0])->title, ==, title);
  g_assert_cmpstr (((HlAutosaveEntry *) orphans->pdata[0])->original_path, ==, path);
  copy = hl_autosave_entry_load (orphans->pdata[0], &error);
  g_assert_no_error (error);
  g_assert_cmpstr (copy->title, ==, title);
  hl_autosave_entry_delete (orphans->pdata[0]);
  /* the file itself was not touched */
  assert_title_on_disk (path, "Mine as opened");
}

static void
test_signals_keep_recovery_copy (Fixture      *f,
                                 gconstpointer data)
{
  destroy_all_windows ();
  signal_after_edit (f->path, SIGTERM, "Edited just before SIGTERM");
  signal_after_edit (f->path, SIGINT, "Edited just before SIGINT");
}

int
main (int    argc,
      char **argv)
{
  int status;

  setlocale (LC_ALL, "C.UTF-8");
  /* before GLib reads them: the copies and recent files of this test and
   * its children stay in a folder of its own */
  state_dir = g_dir_make_tmp ("hl-state-XXXXXX", NULL);
  g_assert_nonnull (state_dir);
  g_setenv ("XDG_STATE_HOME", state_dir, TRUE);
  g_setenv ("XDG_DATA_HOME", state_dir, TRUE);
  g_test_init (&argc, &argv, NULL);
  if (!gtk_init_check ())
    {
      printf ("1..0 # SKIP no display\n");
      hl_test_remove_tree (state_dir);
      return 0;
    }
  app = hl_ui_application_new ();

#define ADD(path, func) g_test_add (path, Fixture, NULL, setup, func, teardown)
  ADD ("/window-saves/save-as-without-extension", test_save_as_without_extension);
  ADD ("/window-saves/changed-on-disk-reload", test_changed_on_disk_reload);
  ADD ("/window-saves/own-saves-are-quiet", test_own_saves_are_quiet);
  ADD ("/window-saves/newer-version-asks-before-save", test_newer_version_asks_before_save);
  ADD ("/window-saves/keep-mine", test_keep_mine);
  ADD ("/window-saves/close-save-asks-about-newer", test_close_save_asks_about_newer);
  ADD ("/window-saves/read-only-refused", test_read_only_refused);
  ADD ("/window-saves/save-keeps-mode", test_save_keeps_mode);
  ADD ("/window-saves/no-temp-asks", test_no_temp_asks);
  ADD ("/window-saves/hard-links-ask", test_hard_links_ask);
  ADD ("/window-saves/killed-save-leftover-cleaned", test_killed_save_leftover_cleaned);
  ADD ("/window-saves/signals-keep-recovery-copy", test_signals_keep_recovery_copy);
#undef ADD
  status = g_test_run ();
  destroy_all_windows ();
  g_clear_object (&app);
  hl_test_remove_tree (state_dir);
  g_free (state_dir);
  return status;
}
