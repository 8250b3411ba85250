/* test-save.c — a failed save leaves the old file as it was
 *
 * DESIGN.md §4: saving is atomic (write a new file, then replace); a
 * failed save leaves the old file untouched and says why.  Each case
 * below makes the save fail in a different way and checks the message,
 * the old file's bytes and that no temporary file is left behind.
 * Facts relied on (POSIX rename(2), Linux chattr(1)): rename replaces the
 * directory entry itself, so renaming over a device or a pipe replaces
 * the node; root ignores permission bits but not the immutable flag.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-save"

#include "hl-atomic-file.h"
#include "hl-project-file.h"
#include "hl-test-program.h"

#include <errno.h>
#include <fcntl.h>
#include <glib/gstdio.h>
#include <linux/fs.h>
#include <string.h>
#include <sys/ioctl.h>
#include <sys/stat.h>
#include <sys/sysmacros.h>
#include <unistd.h>

typedef struct
{
  char      *dir;
  char      *target;      /* dir/project.hoop, holding the old project */
  GBytes    *old_bytes;
  HlProject *changed;     /* what the failing saves try to write */
  gboolean   immutable;   /* the folder was made immutable */
} Fixture;

static HlProject *
sample_project (const char *title)
{
  HlProject *p = hl_project_new ();
  HlShellInputs s = hl_shell_inputs_default ();

  hl_project_set_title (p, title);
  hl_project_add_shell (p, &s);
  return p;
}

static GBytes *
file_bytes (const char *path)
{
  GBytes *bytes = hl_test_read_file (path);

  g_assert_nonnull (bytes);
  return bytes;
}

static int
compare_names (gconstpointer a,
               gconstpointer b)
{
  return strcmp (*(const char *const *) a, *(const char *const *) b);
}

static GPtrArray *
folder_names (const char *dir_path)
{
  GPtrArray *names = g_ptr_array_new_with_free_func (g_free);
  g_autoptr(GDir) dir = g_dir_open (dir_path, 0, NULL);
  const char *name;

  while (dir != NULL && (name = g_dir_read_name (dir)) != NULL)
    g_ptr_array_add (names, g_strdup (name));
  g_ptr_array_sort (names, compare_names);
  return names;
}

static void
assert_folder_is (const char        *dir,
                  const char *const *expected)
{
  g_autoptr(GPtrArray) names = folder_names (dir);

  g_ptr_array_add (names, NULL);
  if (!g_strv_equal ((const char *const *) names->pdata, expected))
    {
      g_autofree char *got = g_strjoinv (", ", (char **) names->pdata);

      g_error ("%s holds %s", dir, got);
    }
}

static void
setup (Fixture      *f,
       gconstpointer data)
{
  g_autoptr(HlProject) old = sample_project ("Old project");
  g_autoptr(GError) error = NULL;

  f->dir = hl_test_temp_dir ();
  f->target = g_build_filename (f->dir, "project.hoop", NULL);
  g_assert_true (hl_project_save (old, f->target, &error));
  g_assert_no_error (error);
  f->old_bytes = file_bytes (f->target);
  f->changed = sample_project ("Changed project");
}

static void
set_immutable (const char *dir,
               gboolean    on,
               int        *saved_errno)
{
  int fd = open (dir, O_RDONLY | O_DIRECTORY);
  int flags = 0;
  int rc = -1;

  if (fd >= 0 && ioctl (fd, FS_IOC_GETFLAGS, &flags) == 0)
    {
      flags = on ? (flags | FS_IMMUTABLE_FL) : (flags & ~FS_IMMUTABLE_FL);
      rc = ioctl (fd, FS_IOC_SETFLAGS, &flags);
    }
  if (saved_errno != NULL)
    *saved_errno = rc == 0 ? 0 : errno;
  if (fd >= 0)
    close (fd);
}

static void
teardown (Fixture      *f,
          gconstpointer data)
{
  if (f->immutable)
    set_immutable (f->dir, FALSE, NULL);
  g_chmod (f->dir, 0700);
  hl_test_remove_tree (f->dir);
  g_free (f->dir);
  g_free (f->target);
  g_bytes_unref (f->old_bytes);
  hl_project_free (f->changed);
}

/* The save fails with a message naming @path and containing @reason;
 * the old file keeps its bytes. */
static void
expect_failed_save (Fixture    *f,
                    const char *path,
                    const char *reason)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GBytes) now = NULL;

  g_assert_false (hl_project_save (f->changed, path, &error));
  g_assert_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_IO);
  g_test_message ("%s", error->message);
  g_assert_nonnull (strstr (error->message, path));
  if (strstr (error->message, reason) == NULL)
    g_error ("“%s” lacks “%s”", error->message, reason);
  now = file_bytes (f->target);
  g_assert_true (g_bytes_equal (now, f->old_bytes));
}

static void
test_success (Fixture      *f,
              gconstpointer data)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GBytes) now = NULL;
  g_autofree char *xml = hl_project_to_xml (f->changed);

  g_assert_true (hl_project_save (f->changed, f->target, &error));
  g_assert_no_error (error);
  now = file_bytes (f->target);
  g_assert_cmpmem (g_bytes_get_data (now, NULL), g_bytes_get_size (now), xml, strlen (xml));
  assert_folder_is (f->dir, (const char *const[]) { "project.hoop", NULL });
}

/* Saving through a symbolic link updates the file it points at and keeps
 * the link, as desktop editors do (common practice). */
static void
test_through_symlink (Fixture      *f,
                      gconstpointer data)
{
  g_autofree char *link = g_build_filename (f->dir, "link.hoop", NULL);
  g_autofree char *xml = hl_project_to_xml (f->changed);
  g_autoptr(GError) error = NULL;
  g_autoptr(GBytes) now = NULL;

  g_assert_cmpint (symlink ("project.hoop", link), ==, 0);
  g_assert_true (hl_project_save (f->changed, link, &error));
  g_assert_no_error (error);
  g_assert_true (g_file_test (link, G_FILE_TEST_IS_SYMLINK));
  now = file_bytes (f->target);
  g_assert_cmpmem (g_bytes_get_data (now, NULL), g_bytes_get_size (now), xml, strlen (xml));
  assert_folder_is (f->dir, (const char *const[]) { "link.hoop", "project.hoop", NULL });
}

/* A revision with a malformed date would make a file the loader refuses:
 * the save says so and writes nothing. */
static void
test_bad_revision_date_refused (Fixture      *f,
                                gconstpointer data)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GBytes) now = NULL;

  hl_project_add_revision (f->changed, 3, "2026-02-30", "A. Tester", "no such day");
  g_assert_false (hl_project_save (f->changed, f->target, &error));
  g_assert_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE);
  g_assert_nonnull (strstr (error->message, "2026-02-30"));
  now = file_bytes (f->target);
  g_assert_true (g_bytes_equal (now, f->old_bytes));
}

static void
test_read_only_folder (Fixture      *f,
                       gconstpointer data)
{
  g_autofree char *probe = g_build_filename (f->dir, "probe", NULL);
  int fd;

  g_assert_cmpint (g_chmod (f->dir, 0555), ==, 0);
  fd = g_open (probe, O_WRONLY | O_CREAT | O_EXCL, 0644);
  if (fd >= 0)
    {
      /* root: permission bits do not stop it; the immutable flag does */
      int err = 0;

      close (fd);
      g_unlink (probe);
      set_immutable (f->dir, TRUE, &err);
      if (err != 0)
        {
          g_autofree char *why = g_strdup_printf ("running as root, and the immutable flag is not available here: %s",
                                                  g_strerror (err));

          g_test_skip (why);
          return;
        }
      f->immutable = TRUE;
    }
  expect_failed_save (f, f->target, "cannot write");
  assert_folder_is (f->dir, (const char *const[]) { "project.hoop", NULL });
}

static void
test_target_is_folder (Fixture      *f,
                       gconstpointer data)
{
  g_autofree char *sub = g_build_filename (f->dir, "folder.hoop", NULL);

  g_assert_cmpint (g_mkdir (sub, 0755), ==, 0);
  expect_failed_save (f, sub, "it is a folder");
  g_assert_true (g_file_test (sub, G_FILE_TEST_IS_DIR));
  assert_folder_is (f->dir, (const char *const[]) { "folder.hoop", "project.hoop", NULL });
  assert_folder_is (sub, (const char *const[]) { NULL });
}

static void
test_missing_folder (Fixture      *f,
                     gconstpointer data)
{
  g_autofree char *path = g_build_filename (f->dir, "missing", "x.hoop", NULL);

  expect_failed_save (f, path, "does not exist");
  assert_folder_is (f->dir, (const char *const[]) { "project.hoop", NULL });
}

/* "notdir/x.hoop" where notdir is a regular file: works as root too. */
static void
test_folder_is_a_file (Fixture      *f,
                       gconstpointer data)
{
  g_autofree char *path = g_build_filename (f->target, "x.hoop", NULL);

  expect_failed_save (f, path, "is not a folder");
  assert_folder_is (f->dir, (const char *const[]) { "project.hoop", NULL });
}

/* Renaming over a pipe would replace the pipe with a plain file. */
static void
test_target_is_pipe (Fixture      *f,
                     gconstpointer data)
{
  g_autofree char *pipe = g_build_filename (f->dir, "pipe.hoop", NULL);
  GStatBuf st;

  g_assert_cmpint (mkfifo (pipe, 0644), ==, 0);
  expect_failed_save (f, pipe, "not a regular file");
  g_assert_cmpint (g_lstat (pipe, &st), ==, 0);
  g_assert_true (S_ISFIFO (st.st_mode));
  assert_folder_is (f->dir, (const char *const[]) { "pipe.hoop", "project.hoop", NULL });
}

/* A device node: first a private copy of /dev/full (char 1:7, Linux
 * devices.txt) in the test folder, so that a regression replaces only
 * the copy; then the real one, only once the target check refuses it. */
static void
test_target_is_device (Fixture      *f,
                       gconstpointer data)
{
  g_autofree char *copy = g_build_filename (f->dir, "full", NULL);
  g_autoptr(GError) error = NULL;
  GStatBuf st;

  if (mknod (copy, S_IFCHR | 0666, makedev (1, 7)) == 0)
    {
      expect_failed_save (f, copy, "not a regular file");
      g_assert_cmpint (g_lstat (copy, &st), ==, 0);
      g_assert_true (S_ISCHR (st.st_mode));
      assert_folder_is (f->dir, (const char *const[]) { "full", "project.hoop", NULL });
    }
  else
    g_test_message ("mknod: %s; only /dev/full itself is tried", g_strerror (errno));

  if (g_lstat ("/dev/full", &st) != 0 || !S_ISCHR (st.st_mode))
    {
      g_test_skip ("/dev/full is not a character device here");
      return;
    }
  g_assert_false (hl_atomic_check_target ("/dev/full", &error));
  g_assert_error (error, G_FILE_ERROR, G_FILE_ERROR_INVAL);
  expect_failed_save (f, "/dev/full", "not a regular file");
  g_assert_cmpint (g_lstat ("/dev/full", &st), ==, 0);
  g_assert_true (S_ISCHR (st.st_mode));
  {
    g_autoptr(GPtrArray) names = folder_names ("/dev");

    for (guint i = 0; i < names->len; i++)
      g_assert_false (g_str_has_prefix (g_ptr_array_index (names, i), "full."));
  }
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);

#define ADD(path, func) g_test_add (path, Fixture, NULL, setup, func, teardown)
  ADD ("/files/save/success", test_success);
  ADD ("/files/save/through-symlink", test_through_symlink);
  ADD ("/files/save/bad-revision-date", test_bad_revision_date_refused);
  ADD ("/files/save/read-only-folder", test_read_only_folder);
  ADD ("/files/save/target-is-folder", test_target_is_folder);
  ADD ("/files/save/missing-folder", test_missing_folder);
  ADD ("/files/save/folder-is-a-file", test_folder_is_a_file);
  ADD ("/files/save/target-is-pipe", test_target_is_pipe);
  ADD ("/files/save/target-is-device", test_target_is_device);
#undef ADD
  return g_test_run ();
}
