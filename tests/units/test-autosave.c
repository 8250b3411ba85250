/* test-autosave.c — crash-recovery copies survive a killed process
 *
 * Expected behaviour is the common practice of desktop editors: a copy of
 * unsaved work is kept while the program runs, offered after a crash and
 * removed after a clean save or close.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-autosave"

#include "hl-autosave.h"
#include "hl-project-file.h"

#include <glib/gstdio.h>
#include <signal.h>
#include <sys/wait.h>
#include <unistd.h>

static HlProject *
sample_project (const char *title)
{
  HlProject *p = hl_project_new ();
  HlShellInputs s = hl_shell_inputs_default ();

  hl_project_set_title (p, title);
  s.wall_thickness = hl_quantity_make (12.5, "mm");
  hl_project_add_shell (p, &s);
  hl_project_put_material (p, &s.material);
  return p;
}

static void
test_own_copy_is_not_an_orphan (void)
{
  g_autoptr(HlProject) p = sample_project ("Live document");
  g_autoptr(HlAutosave) a = hl_autosave_new (NULL);
  g_autoptr(GPtrArray) orphans = NULL;
  g_autoptr(GError) error = NULL;

  g_assert_true (hl_autosave_write (a, p, &error));
  g_assert_no_error (error);
  /* the writer (this process) is alive: nothing to offer */
  orphans = hl_autosave_find_orphans ();
  g_assert_cmpuint (orphans->len, ==, 0);
  hl_autosave_discard (a);
}

static void
test_killed_writer_leaves_restorable_copy (void)
{
  g_autoptr(HlProject) p = sample_project ("Unsaved after crash");
  g_autoptr(GPtrArray) orphans = NULL;
  g_autoptr(HlProject) restored = NULL;
  g_autoptr(GError) error = NULL;
  int wstatus = 0;
  pid_t child = fork ();

  g_assert_cmpint (child, >=, 0);
  if (child == 0)
    {
      HlAutosave *a = hl_autosave_new ("/somewhere/receiver.hoop");

      if (!hl_autosave_write (a, p, NULL))
        _exit (2);
      /* a crash: no discard, no cleanup */
      kill (getpid (), SIGKILL);
      _exit (3);
    }
  g_assert_cmpint (waitpid (child, &wstatus, 0), ==, child);
  g_assert_true (WIFSIGNALED (wstatus));
  g_assert_cmpint (WTERMSIG (wstatus), ==, SIGKILL);

  orphans = hl_autosave_find_orphans ();
  g_assert_cmpuint (orphans->len, ==, 1);
  {
    HlAutosaveEntry *e = g_ptr_array_index (orphans, 0);

    g_assert_cmpstr (e->original_path, ==, "/somewhere/receiver.hoop");
    g_assert_cmpstr (e->title, ==, "Unsaved after crash");
    restored = hl_autosave_entry_load (e, &error);
    g_assert_no_error (error);
    g_assert_true (hl_project_equal (restored, p));
    hl_autosave_entry_delete (e);
  }
  g_clear_pointer (&orphans, g_ptr_array_unref);
  orphans = hl_autosave_find_orphans ();
  g_assert_cmpuint (orphans->len, ==, 0);
}

static void
test_discard_removes_files (void)
{
  g_autoptr(HlProject) p = sample_project ("Saved properly");
  g_autoptr(HlAutosave) a = hl_autosave_new ("/x/y.hoop");
  g_autofree char *dir = hl_autosave_dir ();
  g_autoptr(GDir) d = NULL;
  guint files = 0;

  g_assert_true (hl_autosave_write (a, p, NULL));
  hl_autosave_discard (a);
  d = g_dir_open (dir, 0, NULL);
  g_assert_nonnull (d);
  while (g_dir_read_name (d) != NULL)
    files++;
  g_assert_cmpuint (files, ==, 0);
}

int
main (int    argc,
      char **argv)
{
  g_autofree char *state = g_dir_make_tmp ("hl-autosave-XXXXXX", NULL);
  int rc;

  /* before GLib reads it for the first time */
  g_setenv ("XDG_STATE_HOME", state, TRUE);
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/autosave/own-copy-not-orphan", test_own_copy_is_not_an_orphan);
  g_test_add_func ("/autosave/killed-writer", test_killed_writer_leaves_restorable_copy);
  g_test_add_func ("/autosave/discard", test_discard_removes_files);
  rc = g_test_run ();
  {
    g_autofree char *dir = g_build_filename (state, "hoopline", "autosave", NULL);
    g_autofree char *parent = g_build_filename (state, "hoopline", NULL);

    g_rmdir (dir);
    g_rmdir (parent);
    g_rmdir (state);
  }
  return rc;
}
