/* test-atomic-save.c — a save replaces the file, not what belongs to it
 *
 * A saved file keeps its mode, owner and group (what a desktop editor
 * does: common practice); a new one gets 0666 less the umask (POSIX
 * open(2)).  A write-protected file is refused: as root, whom the bits do
 * not stop, a file without any write bit counts as write-protected, as
 * rm(1) of GNU coreutils asks before removing one.  A file with several
 * names (POSIX link(2)) or in a folder that takes no new files cannot be
 * replaced by rename(2) without harm, so it is written in place only
 * once the caller permits it.  A save killed half-way leaves its
 * temporary, which the next open removes; nothing else is touched.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-atomic-save"

#include "hl-atomic-file.h"
#include "hl-project-file.h"
#include "hl-save-test-util.h"
#include "hl-test-program.h"

#include <glib/gstdio.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>
#include <utime.h>

#define OLD_TEXT "<old project/>\n"
#define NEW_TEXT "<new project/>\n"

typedef struct
{
  char    *dir;
  char    *target;     /* dir/project.hoop holding OLD_TEXT */
  gboolean immutable;  /* the folder was made immutable */
} Fixture;

static void
setup (Fixture      *f,
       gconstpointer data)
{
  f->dir = hl_test_temp_dir ();
  f->target = g_build_filename (f->dir, "project.hoop", NULL);
  g_assert_true (g_file_set_contents (f->target, OLD_TEXT, -1, NULL));
}

static void
teardown (Fixture      *f,
          gconstpointer data)
{
  hl_save_test_open_folder (f->dir, f->immutable);
  hl_test_remove_tree (f->dir);
  g_free (f->dir);
  g_free (f->target);
  hl_atomic_permit_in_place (NULL);
}

static void
assert_text (const char *path,
             const char *expected)
{
  g_autoptr(GBytes) bytes = hl_test_read_file (path);

  g_assert_nonnull (bytes);
  g_assert_cmpmem (g_bytes_get_data (bytes, NULL), g_bytes_get_size (bytes), expected, strlen (expected));
}

/* A shared project file (group-writable) or a private one (owner only)
 * stays so after a save; the old code made every file 0644. */
static void
test_keeps_mode (Fixture      *f,
                 gconstpointer data)
{
  const mode_t modes[] = { 0660, 0600, 0640 };

  for (guint i = 0; i < G_N_ELEMENTS (modes); i++)
    {
      g_autoptr(GError) error = NULL;

      g_assert_cmpint (g_chmod (f->target, modes[i]), ==, 0);
      g_assert_true (hl_atomic_write (f->target, NEW_TEXT, -1, &error));
      g_assert_no_error (error);
      g_assert_cmpuint (hl_save_test_stat (f->target).st_mode & 07777, ==, modes[i]);
    }
  assert_text (f->target, NEW_TEXT);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 1);
}

/* Owner and group come back as they were (ids chosen at random; only
 * root may give a file to them). */
static void
test_keeps_owner_and_group (Fixture      *f,
                            gconstpointer data)
{
  g_autoptr(GError) error = NULL;
  GStatBuf st;

  if (chown (f->target, 4321, 4322) != 0)
    {
      g_test_skip ("only root can give a file to another owner");
      return;
    }
  g_assert_true (hl_atomic_write (f->target, NEW_TEXT, -1, &error));
  g_assert_no_error (error);
  st = hl_save_test_stat (f->target);
  g_assert_cmpuint (st.st_uid, ==, 4321);
  g_assert_cmpuint (st.st_gid, ==, 4322);
}

/* A new file: 0666 less the umask (POSIX open(2)), so a umask of 077
 * keeps a new project private. */
static void
test_new_file_follows_umask (Fixture      *f,
                             gconstpointer data)
{
  g_autofree char *fresh = g_build_filename (f->dir, "fresh.hoop", NULL);
  g_autofree char *other = g_build_filename (f->dir, "other.hoop", NULL);
  mode_t old = umask (077);

  g_assert_true (hl_atomic_write (fresh, NEW_TEXT, -1, NULL));
  umask (022);
  g_assert_true (hl_atomic_write (other, NEW_TEXT, -1, NULL));
  umask (old);
  g_assert_cmpuint (hl_save_test_stat (fresh).st_mode & 0777, ==, 0600);
  g_assert_cmpuint (hl_save_test_stat (other).st_mode & 0777, ==, 0644);
}

static void
expect_refused (const char    *path,
                HlAtomicError  code,
                const char    *words)
{
  g_autoptr(GError) error = NULL;

  g_assert_false (hl_atomic_write (path, NEW_TEXT, -1, &error));
  g_assert_error (error, HL_ATOMIC_ERROR, (int) code);
  g_test_message ("%s", error->message);
  g_assert_nonnull (strstr (error->message, path));
  if (strstr (error->message, words) == NULL)
    g_error ("“%s” lacks “%s”", error->message, words);
}

/* chmod a-w: refused even as root, and by the project writer too; the
 * old code replaced it. */
static void
test_read_only_refused (Fixture      *f,
                        gconstpointer data)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) project = hl_project_new ();
  HlShellInputs shell = hl_shell_inputs_default ();

  g_assert_cmpint (g_chmod (f->target, 0444), ==, 0);
  expect_refused (f->target, HL_ATOMIC_ERROR_READ_ONLY, "read-only");
  g_assert_false (hl_atomic_check_replace (f->target, &error));
  g_assert_error (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_READ_ONLY);
  g_clear_error (&error);
  /* the user's permission to write in place does not lift it */
  hl_atomic_permit_in_place (f->target);
  g_assert_false (hl_atomic_write_in_place (f->target, NEW_TEXT, -1, &error));
  g_assert_error (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_READ_ONLY);
  g_clear_error (&error);
  hl_project_add_shell (project, &shell);
  g_assert_false (hl_project_save (project, f->target, &error));
  g_assert_nonnull (strstr (error->message, "read-only"));
  assert_text (f->target, OLD_TEXT);
  g_assert_cmpuint (hl_save_test_stat (f->target).st_mode & 07777, ==, 0444);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 1);
}

/* Two names for one file: a rename would give only one of them the new
 * project.  Refused until permitted, then written in place so that both
 * names see it (same inode). */
static void
test_hard_links (Fixture      *f,
                 gconstpointer data)
{
  g_autofree char *second = g_build_filename (f->dir, "second-name.hoop", NULL);
  g_autoptr(GError) error = NULL;
  ino_t inode;

  g_assert_cmpint (link (f->target, second), ==, 0);
  inode = hl_save_test_stat (f->target).st_ino;
  expect_refused (f->target, HL_ATOMIC_ERROR_HARD_LINKS, "hard links");
  g_assert_false (hl_atomic_check_replace (f->target, &error));
  g_assert_error (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_HARD_LINKS);
  g_clear_error (&error);
  assert_text (f->target, OLD_TEXT);
  assert_text (second, OLD_TEXT);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 2);

  /* a permission for another name does not count */
  hl_atomic_permit_in_place (second);
  expect_refused (f->target, HL_ATOMIC_ERROR_HARD_LINKS, "hard links");
  hl_atomic_permit_in_place (f->target);
  g_assert_true (hl_atomic_write (f->target, NEW_TEXT, -1, &error));
  g_assert_no_error (error);
  assert_text (second, NEW_TEXT);
  g_assert_cmpuint (hl_save_test_stat (f->target).st_ino, ==, inode);
  g_assert_cmpuint (hl_save_test_stat (f->target).st_nlink, ==, 2);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 2);
  /* in place, a shorter text leaves no tail of the longer one */
  g_assert_true (hl_atomic_write (f->target, "<p/>", -1, &error));
  assert_text (second, "<p/>");
}

/* The folder takes no new files but the file may be written: as a user
 * a folder without write permission, as root an immutable folder. */
static void
test_no_temp_folder (Fixture      *f,
                     gconstpointer data)
{
  g_autoptr(GError) error = NULL;

  if (!hl_save_test_close_folder (f->dir, &f->immutable))
    return;
  g_assert_false (hl_atomic_check_replace (f->target, &error));
  g_assert_error (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_NO_TEMP);
  g_clear_error (&error);
  expect_refused (f->target, HL_ATOMIC_ERROR_NO_TEMP, "no temporary file can be made");
  assert_text (f->target, OLD_TEXT);

  hl_atomic_permit_in_place (f->target);
  g_assert_true (hl_atomic_write (f->target, NEW_TEXT, -1, &error));
  g_assert_no_error (error);
  assert_text (f->target, NEW_TEXT);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 1);
  /* taken back: refused again */
  hl_atomic_permit_in_place (NULL);
  expect_refused (f->target, HL_ATOMIC_ERROR_NO_TEMP, "cannot write");
}

static void
touch (const char *dir,
       const char *name,
       time_t      age)
{
  g_autofree char *path = g_build_filename (dir, name, NULL);
  struct utimbuf times;

  g_assert_true (g_file_set_contents (path, "x", -1, NULL));
  times.actime = times.modtime = time (NULL) - age;
  g_assert_cmpint (utime (path, &times), ==, 0);
}

static gboolean
exists_in (const char *dir,
           const char *name)
{
  g_autofree char *path = g_build_filename (dir, name, NULL);

  return g_file_test (path, G_FILE_TEST_EXISTS | G_FILE_TEST_IS_SYMLINK);
}

static void
test_leftovers (Fixture      *f,
                gconstpointer data)
{
  pid_t dead = hl_save_test_killed_save (f->target);
  g_autofree char *dead_temp = NULL;
  g_autofree char *old_live = g_strdup_printf (".project.hoop.hoopline-save-%d-OldOne", (int) getpid ());
  g_autofree char *new_live = g_strdup_printf (".project.hoop.hoopline-save-%d-NewOne", (int) getpid ());
  g_autofree char *other_project = g_strdup_printf (".other.hoop.hoopline-save-%d-aBcDeF", (int) dead);
  g_autofree char *bad_tail = g_strdup_printf (".project.hoop.hoopline-save-%d-abc", (int) dead);
  g_autofree char *link_name = g_strdup_printf (".project.hoop.hoopline-save-%d-LiNkEd", (int) dead);
  g_autofree char *elsewhere = g_build_filename (f->dir, "kept-target", NULL);
  g_autofree char *link_path = g_build_filename (f->dir, link_name, NULL);
  const char *kept[] = { "project.hoop.AbC123", ".project.hoop.swp", "project.hoop~" };

  /* the killed save left its temporary; the project is untouched */
  assert_text (f->target, OLD_TEXT);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 2);
  {
    g_autoptr(GDir) dir = g_dir_open (f->dir, 0, NULL);
    const char *name;

    while ((name = g_dir_read_name (dir)) != NULL)
      if (strcmp (name, "project.hoop") != 0)
        dead_temp = g_strdup (name);
  }
  g_test_message ("left by the killed save: %s", dead_temp);
  g_assert_true (g_str_has_prefix (dead_temp, ".project.hoop.hoopline-save-"));

  /* ours: a live writer's old one goes, its fresh one stays (a save may
   * be running) */
  touch (f->dir, old_live, 3600);
  touch (f->dir, new_live, 0);
  /* not ours, or not this project's: kept whatever their age */
  for (guint i = 0; i < G_N_ELEMENTS (kept); i++)
    touch (f->dir, kept[i], 3600);
  touch (f->dir, other_project, 3600);
  touch (f->dir, bad_tail, 3600);
  touch (f->dir, "kept-target", 3600);
  g_assert_cmpint (symlink (elsewhere, link_path), ==, 0);

  g_assert_cmpuint (hl_atomic_clean_leftovers (f->target), ==, 2);
  g_assert_false (exists_in (f->dir, dead_temp));
  g_assert_false (exists_in (f->dir, old_live));
  g_assert_true (exists_in (f->dir, new_live));
  for (guint i = 0; i < G_N_ELEMENTS (kept); i++)
    g_assert_true (exists_in (f->dir, kept[i]));
  g_assert_true (exists_in (f->dir, other_project));
  g_assert_true (exists_in (f->dir, bad_tail));
  g_assert_true (exists_in (f->dir, link_name));
  g_assert_true (exists_in (f->dir, "kept-target"));
  assert_text (f->target, OLD_TEXT);
}

/* A writer that names its own temporary (the figure export) gets the
 * same rules at the commit: mode kept, read-only and hard-linked
 * targets refused, the temporary gone either way. */
static void
test_commit_same_rules (Fixture      *f,
                        gconstpointer data)
{
  g_autofree char *second = g_build_filename (f->dir, "second-name.hoop", NULL);
  g_autoptr(GError) error = NULL;
  char *temp;

  g_assert_cmpint (g_chmod (f->target, 0640), ==, 0);
  temp = hl_atomic_temp_name (f->target);
  g_assert_true (g_file_set_contents (temp, NEW_TEXT, -1, NULL));
  g_assert_true (hl_atomic_commit (temp, f->target, &error));
  g_assert_no_error (error);
  g_free (temp);
  assert_text (f->target, NEW_TEXT);
  g_assert_cmpuint (hl_save_test_stat (f->target).st_mode & 07777, ==, 0640);

  g_assert_cmpint (link (f->target, second), ==, 0);
  temp = hl_atomic_temp_name (f->target);
  g_assert_true (g_file_set_contents (temp, OLD_TEXT, -1, NULL));
  g_assert_false (hl_atomic_commit (temp, f->target, &error));
  g_assert_error (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_HARD_LINKS);
  g_clear_error (&error);
  g_free (temp);
  g_assert_cmpint (g_unlink (second), ==, 0);

  g_assert_cmpint (g_chmod (f->target, 0444), ==, 0);
  temp = hl_atomic_temp_name (f->target);
  g_assert_true (g_file_set_contents (temp, OLD_TEXT, -1, NULL));
  g_assert_false (hl_atomic_commit (temp, f->target, &error));
  g_assert_error (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_READ_ONLY);
  g_free (temp);
  assert_text (f->target, NEW_TEXT);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 1);
}

/* A symbolic link still points at the file it named, and that file
 * keeps its mode. */
static void
test_symlink_keeps_mode (Fixture      *f,
                         gconstpointer data)
{
  g_autofree char *link_path = g_build_filename (f->dir, "link.hoop", NULL);

  g_assert_cmpint (g_chmod (f->target, 0600), ==, 0);
  g_assert_cmpint (symlink ("project.hoop", link_path), ==, 0);
  g_assert_true (hl_atomic_write (link_path, NEW_TEXT, -1, NULL));
  g_assert_true (g_file_test (link_path, G_FILE_TEST_IS_SYMLINK));
  assert_text (f->target, NEW_TEXT);
  g_assert_cmpuint (hl_save_test_stat (f->target).st_mode & 07777, ==, 0600);
  g_assert_cmpuint (hl_save_test_count_entries (f->dir), ==, 2);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);

#define ADD(path, func) g_test_add (path, Fixture, NULL, setup, func, teardown)
  ADD ("/files/atomic/keeps-mode", test_keeps_mode);
  ADD ("/files/atomic/keeps-owner-and-group", test_keeps_owner_and_group);
  ADD ("/files/atomic/new-file-follows-umask", test_new_file_follows_umask);
  ADD ("/files/atomic/read-only-refused", test_read_only_refused);
  ADD ("/files/atomic/hard-links", test_hard_links);
  ADD ("/files/atomic/no-temp-folder", test_no_temp_folder);
  ADD ("/files/atomic/leftovers", test_leftovers);
  ADD ("/files/atomic/symlink-keeps-mode", test_symlink_keeps_mode);
  ADD ("/files/atomic/commit-same-rules", test_commit_same_rules);
#undef ADD
  return g_test_run ();
}
