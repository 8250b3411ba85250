/* hl-save-test-util.c — what the save tests of the core and of the window
 * share
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-save-test"

#include "hl-save-test-util.h"
#include "hl-atomic-file.h"

#include <fcntl.h>
#include <glib/gstdio.h>
#include <linux/fs.h>
#include <signal.h>
#include <sys/ioctl.h>
#include <sys/resource.h>
#include <sys/wait.h>
#include <unistd.h>

gboolean
hl_save_test_set_immutable (const char *path,
                            gboolean    on)
{
  int fd = open (path, O_RDONLY);
  int flags = 0;
  int rc = -1;

  if (fd >= 0 && ioctl (fd, FS_IOC_GETFLAGS, &flags) == 0)
    {
      flags = on ? (flags | FS_IMMUTABLE_FL) : (flags & ~FS_IMMUTABLE_FL);
      rc = ioctl (fd, FS_IOC_SETFLAGS, &flags);
    }
  if (fd >= 0)
    close (fd);
  return rc == 0;
}

gboolean
hl_save_test_close_folder (const char *dir,
                           gboolean   *immutable)
{
  g_autofree char *probe = g_build_filename (dir, "probe", NULL);
  int fd;

  *immutable = FALSE;
  g_assert_cmpint (g_chmod (dir, 0555), ==, 0);
  fd = g_open (probe, O_WRONLY | O_CREAT | O_EXCL, 0644);
  if (fd < 0)
    return TRUE;
  close (fd);
  g_unlink (probe);
  if (!hl_save_test_set_immutable (dir, TRUE))
    {
      g_test_skip ("running as root, and the immutable flag is not available here");
      return FALSE;
    }
  *immutable = TRUE;
  return TRUE;
}

void
hl_save_test_open_folder (const char *dir,
                          gboolean    immutable)
{
  if (immutable)
    hl_save_test_set_immutable (dir, FALSE);
  g_chmod (dir, 0700);
}

pid_t
hl_save_test_killed_save (const char *path)
{
  pid_t pid = fork ();
  int status = 0;

  g_assert_cmpint (pid, >=, 0);
  if (pid == 0)
    {
      struct rlimit limit = { 1024, 1024 };
      g_autofree char *big = g_strnfill (64 * 1024, 'x');

      setrlimit (RLIMIT_FSIZE, &limit);
      hl_atomic_write (path, big, -1, NULL);
      _exit (0);
    }
  g_assert_cmpint (waitpid (pid, &status, 0), ==, pid);
  g_assert_true (WIFSIGNALED (status));
  g_assert_cmpint (WTERMSIG (status), ==, SIGXFSZ);
  return pid;
}

guint
hl_save_test_count_entries (const char *dir_path)
{
  g_autoptr(GDir) dir = g_dir_open (dir_path, 0, NULL);
  guint n = 0;

  while (dir != NULL && g_dir_read_name (dir) != NULL)
    n++;
  return n;
}

GStatBuf
hl_save_test_stat (const char *path)
{
  GStatBuf st;

  g_assert_cmpint (g_stat (path, &st), ==, 0);
  return st;
}
