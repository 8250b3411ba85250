/* test-recovery.c — crash-recovery copies from the real window
 *
 * The copy is written a moment after an edit and removed when the work is
 * saved or closed on purpose.  A real run of the program is killed with
 * SIGKILL after an edit (no handler of its own runs then, as in a crash);
 * the next start offers its copy, and Recover brings the edit back
 * unsaved while Discard removes it.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-recovery"

#include "hl-config.h"
#include "hl-application.h"
#include "hl-ui-test-util.h"
#include "hl-autosave.h"
#include "hl-project-file.h"
#include "hl-recovery.h"
#include "hl-window.h"

#include <glib/gstdio.h>
#include <locale.h>
#include <signal.h>
#include <stdio.h>
#include <string.h>
#include <sys/types.h>
#include <sys/wait.h>

static HlApplication *app;
static char *state_dir;     /* XDG_STATE_HOME of this test and its children */

/* the demo copied to @dir, so nothing can touch the one in the tree */
static char *
copy_demo (const char *dir,
           const char *name)
{
  g_autofree char *src = hl_ui_demo_path ();
  g_autofree char *text = NULL;
  char *path = g_build_filename (dir, name, NULL);
  gsize len;

  g_assert_true (g_file_get_contents (src, &text, &len, NULL));
  g_assert_true (g_file_set_contents (path, text, len, NULL));
  return path;
}

/* files in the autosave folder with @suffix */
static guint
count_copies (const char *suffix)
{
  g_autofree char *path = hl_autosave_dir ();
  g_autoptr(GDir) dir = g_dir_open (path, 0, NULL);
  const char *name;
  guint n = 0;

  if (dir == NULL)
    return 0;
  while ((name = g_dir_read_name (dir)) != NULL)
    if (g_str_has_suffix (name, suffix))
      n++;
  return n;
}

/* waits (the main loop running) until @n notes are there; 60 s covers a
 * child starting under the sanitizers */
/* path of the one autosave file with @suffix */
static char *
first_copy (const char *suffix)
{
  g_autofree char *dir_path = hl_autosave_dir ();
  g_autoptr(GDir) dir = g_dir_open (dir_path, 0, NULL);
  const char *name;

  while (dir != NULL && (name = g_dir_read_name (dir)) != NULL)
    if (g_str_has_suffix (name, suffix))
      return g_build_filename (dir_path, name, NULL);
  g_assert_not_reached ();
  return NULL;
}

static GBytes *
read_bytes (const char *path)
{
  char *data = NULL;
  gsize len = 0;

  g_assert_true (g_file_get_contents (path, &data, &len, NULL));
  return g_bytes_new_take (data, len);
}

static gboolean
wait_for_notes (guint n)
{
  gint64 deadline = g_get_monotonic_time () + 60 * G_USEC_PER_SEC;

  while (g_get_monotonic_time () < deadline)
    {
      if (count_copies (".info") >= n)
        return TRUE;
      hl_ui_run_for (100);
    }
  return FALSE;
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

static HlWindow *
open_file (const char *path)
{
  return hl_ui_open_window (app, path);
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
remove_tree (const char *path)
{
  g_autoptr(GDir) dir = g_dir_open (path, 0, NULL);
  const char *name;

  if (dir != NULL)
    while ((name = g_dir_read_name (dir)) != NULL)
      {
        g_autofree char *child = g_build_filename (path, name, NULL);

        remove_tree (child);
      }
  g_remove (path);
}

/* An edit leaves a copy after the delay; saving removes it, and so do a
 * close with "discard" and a plain close. */
static void
test_copy_follows_edits (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-recovery-XXXXXX", NULL);
  g_autofree char *path = copy_demo (dir, "receiver.hoop");
  g_autofree char *saved = g_build_filename (dir, "saved.hoop", NULL);
  HlWindow *window = open_file (path);
  g_autoptr(GPtrArray) orphans = NULL;
  GtkWidget *question;

  g_assert_cmpuint (count_copies (".info"), ==, 0);
  edit_title (window, "Receiver, edited");
  /* nothing yet: the copy waits for typing to pause */
  g_assert_cmpuint (count_copies (".info"), ==, 0);
  g_assert_true (wait_for_notes (1));
  g_assert_cmpuint (count_copies (".hoop"), ==, 1);
  /* this process still runs, so its copy is no orphan */
  orphans = hl_autosave_find_orphans ();
  g_assert_cmpuint (orphans->len, ==, 0);

  g_action_group_activate_action (G_ACTION_GROUP (window), "save-to", g_variant_new_string (saved));
  hl_ui_iterate ();
  g_assert_false (hl_document_get_modified (hl_window_get_document (window)));
  g_assert_cmpuint (count_copies (".info"), ==, 0);
  g_assert_cmpuint (count_copies (".hoop"), ==, 0);

  /* answered "discard" when closing */
  edit_title (window, "Receiver, edited again");
  g_assert_true (wait_for_notes (1));
  gtk_window_close (GTK_WINDOW (window));
  hl_ui_iterate ();
  question = hl_window_get_question (window);
  g_assert_nonnull (question);
  hl_ui_answer (question, HL_QUESTION_DISCARD);
  hl_ui_iterate ();
  g_assert_null (gtk_application_get_windows (GTK_APPLICATION (app)));
  g_assert_cmpuint (count_copies (".info"), ==, 0);
  g_assert_cmpuint (count_copies (".hoop"), ==, 0);

  /* a window that simply goes */
  window = open_file (path);
  edit_title (window, "Receiver, third edit");
  g_assert_true (wait_for_notes (1));
  destroy_all_windows ();
  g_assert_cmpuint (count_copies (".info"), ==, 0);
  g_assert_cmpuint (count_copies (".hoop"), ==, 0);

  remove_tree (dir);
}

/* While a value is one the loader would refuse (here corrosion eats the
 * whole wall), no copy is written: the last loadable copy stays, so what
 * is offered after a crash always opens. */
static void
test_bad_value_keeps_last_good_copy (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-recovery-XXXXXX", NULL);
  g_autofree char *path = copy_demo (dir, "receiver.hoop");
  HlWindow *window = open_file (path);
  HlDocument *doc = hl_window_get_document (window);
  g_autoptr(GBytes) good = NULL;
  g_autoptr(GBytes) later = NULL;
  g_autofree char *copy = NULL;
  HlShellInputs shell;

  edit_title (window, "Receiver, good edit");
  g_assert_true (wait_for_notes (1));
  copy = first_copy (".hoop");
  good = read_bytes (copy);

  shell = *hl_document_get_shell (doc);
  shell.corrosion_allowance = hl_quantity_make (50, "mm");
  hl_document_edit_shell (doc, &shell, NULL);
  hl_ui_iterate ();
  g_assert_nonnull (hl_document_get_problem_text (doc));
  hl_ui_run_for (2500);   /* well past the 1 s delay of the tests */
  later = read_bytes (copy);
  g_assert_true (g_bytes_equal (good, later));

  destroy_all_windows ();
  g_assert_cmpuint (count_copies (".hoop"), ==, 0);
  remove_tree (dir);
}

/* starts the real program on @path with an edit of the title */
static GPid
spawn_editing_run (const char *path,
                   const char *title)
{
  const char *program = g_getenv ("HL_PROGRAM");
  g_auto(GStrv) env = g_get_environ ();
  g_autoptr(GError) error = NULL;
  const char *argv[] = { program, path, NULL };
  GPid pid = 0;

  g_assert_nonnull (program);
  env = g_environ_setenv (env, "HL_AUTOSAVE_SECONDS", "1", TRUE);
  env = g_environ_setenv (env, "HL_TEST_HOOKS", "1", TRUE);
  env = g_environ_setenv (env, "HL_TEST_EDIT", title, TRUE);
  /* its stdout would mix with this test's TAP lines */
  if (!g_spawn_async (NULL, (char **) argv, env,
                      G_SPAWN_DO_NOT_REAP_CHILD | G_SPAWN_STDOUT_TO_DEV_NULL,
                      NULL, NULL, &pid, &error))
    g_error ("cannot start %s: %s", program, error->message);
  return pid;
}

static void
crash (GPid pid)
{
  int status = 0;

  g_assert_cmpint (kill (pid, SIGKILL), ==, 0);
  g_assert_cmpint (waitpid (pid, &status, 0), ==, pid);
  g_assert_true (WIFSIGNALED (status));
  g_spawn_close_pid (pid);
}

/* Two runs crash with unsaved edits; the next start asks about each: one
 * is recovered, the other discarded. */
static void
test_crash_then_recover (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-recovery-XXXXXX", NULL);
  g_autofree char *keep_path = copy_demo (dir, "keep.hoop");
  g_autofree char *drop_path = copy_demo (dir, "drop.hoop");
  g_autoptr(HlProject) on_disk = hl_project_load (keep_path, NULL, NULL);
  g_autoptr(HlProject) expected = NULL;
  g_autoptr(GPtrArray) orphans = NULL;
  GPid keep_pid, drop_pid;
  GtkWindow *window;
  HlDocument *doc;
  gboolean saw_keep = FALSE, saw_drop = FALSE;

  g_assert_nonnull (on_disk);
  /* one after the other: a second run could hand its file to the first
   * over the session bus */
  keep_pid = spawn_editing_run (keep_path, "Receiver to keep");
  g_assert_true (wait_for_notes (1));
  /* while it runs nobody may take its copy */
  orphans = hl_autosave_find_orphans ();
  g_assert_cmpuint (orphans->len, ==, 0);
  g_clear_pointer (&orphans, g_ptr_array_unref);
  crash (keep_pid);
  drop_pid = spawn_editing_run (drop_path, "Receiver to drop");
  g_assert_true (wait_for_notes (2));
  crash (drop_pid);

  orphans = hl_autosave_find_orphans ();
  g_assert_cmpuint (orphans->len, ==, 2);
  for (guint i = 0; i < orphans->len; i++)
    {
      const HlAutosaveEntry *e = g_ptr_array_index (orphans, i);

      if (g_strcmp0 (e->title, "Receiver to keep") == 0)
        g_assert_cmpstr (e->original_path, ==, keep_path);
      else
        {
          g_assert_cmpstr (e->title, ==, "Receiver to drop");
          g_assert_cmpstr (e->original_path, ==, drop_path);
        }
    }

  /* the next start: the first window and the questions over it */
  g_application_activate (G_APPLICATION (app));
  hl_ui_iterate ();
  for (int asked = 0; asked < 2; asked++)
    {
      GtkWidget *question = hl_recovery_get_question (GTK_APPLICATION (app));
      g_autofree char *text = NULL;
      gboolean listed = FALSE;

      g_assert_nonnull (question);
      /* a person sees it: a toplevel, modal, over the window */
      {
        GList *toplevels = gtk_window_list_toplevels ();

        listed = g_list_find (toplevels, question) != NULL;
        g_list_free (toplevels);
      }
      g_assert_true (listed);
      g_assert_true (gtk_window_get_modal (GTK_WINDOW (question)));
      g_assert_nonnull (gtk_window_get_transient_for (GTK_WINDOW (question))); /* over the window */
      text = hl_ui_question_text (question);
      if (strstr (text, "Receiver to keep") != NULL)
        {
          g_assert_false (saw_keep);
          saw_keep = TRUE;
          hl_ui_answer (question, HL_RECOVERY_RESPONSE_RECOVER);
        }
      else
        {
          g_assert_nonnull (strstr (text, "Receiver to drop"));
          g_assert_false (saw_drop);
          saw_drop = TRUE;
          hl_ui_answer (question, HL_RECOVERY_RESPONSE_DISCARD);
        }
      hl_ui_iterate ();
    }
  g_assert_true (saw_keep && saw_drop);
  g_assert_null (hl_recovery_get_question (GTK_APPLICATION (app)));

  /* the recovered window: the edited project, unsaved, bound for its file */
  window = gtk_application_get_active_window (GTK_APPLICATION (app));
  g_assert_true (HL_IS_WINDOW (window));
  g_assert_cmpuint (g_list_length (gtk_application_get_windows (GTK_APPLICATION (app))), ==, 1);
  doc = hl_window_get_document (HL_WINDOW (window));
  expected = hl_project_copy (on_disk);
  hl_project_set_title (expected, "Receiver to keep");
  g_assert_true (hl_project_equal (hl_document_get_project (doc), expected));
  g_assert_true (hl_document_get_modified (doc));
  g_assert_cmpstr (g_file_peek_path (hl_document_get_file (doc)), ==, keep_path);
  {
    /* the file itself is untouched until the user saves */
    g_autoptr(HlProject) still = hl_project_load (keep_path, NULL, NULL);

    g_assert_true (hl_project_equal (still, on_disk));
  }

  /* the crashed runs' copies are gone; the recovered work has this
   * run's own copy, which is no orphan */
  g_clear_pointer (&orphans, g_ptr_array_unref);
  orphans = hl_autosave_find_orphans ();
  g_assert_cmpuint (orphans->len, ==, 0);
  g_assert_cmpuint (count_copies (".info"), ==, 1);
  g_assert_cmpuint (count_copies (".hoop"), ==, 1);

  destroy_all_windows ();
  g_assert_cmpuint (count_copies (".info"), ==, 0);
  g_assert_cmpuint (count_copies (".hoop"), ==, 0);
  remove_tree (dir);
}

/* "Later" keeps the copy for the next start.  A second application
 * stands for that start: each asks only once per run. */
static void
test_later_keeps_copy (void)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-recovery-XXXXXX", NULL);
  g_autofree char *path = copy_demo (dir, "later.hoop");
  g_autoptr(GtkApplication) next_start = gtk_application_new ("org.hoopline.RecoveryTest",
                                                               G_APPLICATION_NON_UNIQUE);
  g_autoptr(GPtrArray) orphans = NULL;
  GtkWidget *question;
  GPid pid = spawn_editing_run (path, "Receiver for later");

  g_assert_true (wait_for_notes (1));
  crash (pid);
  hl_recovery_offer (next_start, NULL);
  question = hl_recovery_get_question (next_start);
  g_assert_nonnull (question);
  hl_ui_answer (question, HL_RECOVERY_RESPONSE_LATER);
  hl_ui_iterate ();
  g_assert_null (hl_recovery_get_question (next_start));
  orphans = hl_autosave_find_orphans ();
  g_assert_cmpuint (orphans->len, ==, 1);
  g_assert_cmpstr (((HlAutosaveEntry *) orphans->pdata[0])->title, ==, "Receiver for later");
  hl_autosave_entry_delete (orphans->pdata[0]);
  remove_tree (dir);
}

int
main (int    argc,
      char **argv)
{
  int status;

  setlocale (LC_ALL, "C.UTF-8");
  /* before GLib reads them: the copies, and the children's recent files,
   * stay in a folder of this test's own */
  state_dir = g_dir_make_tmp ("hl-state-XXXXXX", NULL);
  g_assert_nonnull (state_dir);
  g_setenv ("XDG_STATE_HOME", state_dir, TRUE);
  g_setenv ("XDG_DATA_HOME", state_dir, TRUE);
  g_setenv ("HL_AUTOSAVE_SECONDS", "1", TRUE);
  g_test_init (&argc, &argv, NULL);
  if (!gtk_init_check ())
    {
      printf ("1..0 # SKIP no display\n");
      remove_tree (state_dir);
      return 0;
    }
  app = hl_ui_application_new ();

  g_test_add_func ("/recovery/copy-follows-edits", test_copy_follows_edits);
  g_test_add_func ("/recovery/crash-then-recover", test_crash_then_recover);
  g_test_add_func ("/recovery/later-keeps-copy", test_later_keeps_copy);
  g_test_add_func ("/recovery/bad-value-keeps-last-good-copy", test_bad_value_keeps_last_good_copy);
  status = g_test_run ();
  destroy_all_windows ();
  g_clear_object (&app);
  remove_tree (state_dir);
  g_free (state_dir);
  return status;
}
