/* hl-atomic-file.c — write a file so that it is complete or not there at all
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-atomic-file"

#include "hl-atomic-file.h"

#include <errno.h>
#include <fcntl.h>
#include <glib/gstdio.h>
#include <string.h>
#include <unistd.h>


static void
set_errno_error (GError    **error,
                 const char *what,
                 const char *path,
                 int         saved_errno)
{
  g_set_error (error, G_FILE_ERROR, g_file_error_from_errno (saved_errno),
               "%s “%s”: %s", what, path, g_strerror (saved_errno));
}

gboolean
hl_atomic_check_target (const char *path,
                        GError    **error)
{
  g_autofree char *dir = NULL;

  if (path == NULL || path[0] == '\0')
    {
      g_set_error_literal (error, G_FILE_ERROR, G_FILE_ERROR_INVAL, "no output file name given");
      return FALSE;
    }
  if (g_file_test (path, G_FILE_TEST_IS_DIR))
    {
      g_set_error (error, G_FILE_ERROR, G_FILE_ERROR_ISDIR, "cannot write “%s”: it is a folder", path);
      return FALSE;
    }
  /* a save renames a new file over the target: over a device, a pipe or
   * a socket that would replace the node itself (as root, /dev/full would
   * become a plain file), so only regular files are replaced */
  if (g_file_test (path, G_FILE_TEST_EXISTS) && !g_file_test (path, G_FILE_TEST_IS_REGULAR))
    {
      g_set_error (error, G_FILE_ERROR, G_FILE_ERROR_INVAL, "cannot write “%s”: it is not a regular file", path);
      return FALSE;
    }
  dir = g_path_get_dirname (path);
  if (g_file_test (dir, G_FILE_TEST_EXISTS) && !g_file_test (dir, G_FILE_TEST_IS_DIR))
    {
      g_set_error (error, G_FILE_ERROR, G_FILE_ERROR_NOTDIR, "cannot write “%s”: “%s” is not a folder", path, dir);
      return FALSE;
    }
  if (!g_file_test (dir, G_FILE_TEST_IS_DIR))
    {
      g_set_error (error, G_FILE_ERROR, G_FILE_ERROR_NOENT, "cannot write “%s”: the folder “%s” does not exist", path, dir);
      return FALSE;
    }
  return TRUE;
}

/* A save through a symbolic link updates the file it points at, as an
 * editor does, instead of replacing the link with a plain file. */
static char *
resolve_links (const char *path)
{
  char *current = g_strdup (path);

  for (int depth = 0; depth < 16 && g_file_test (current, G_FILE_TEST_IS_SYMLINK); depth++)
    {
      g_autofree char *target = g_file_read_link (current, NULL);
      char *next;

      if (target == NULL)
        break;
      if (g_path_is_absolute (target))
        next = g_strdup (target);
      else
        {
          g_autofree char *dir = g_path_get_dirname (current);

          next = g_build_filename (dir, target, NULL);
        }
      g_free (current);
      current = next;
    }
  return current;
}

gboolean
hl_atomic_write (const char *path,
                 const char *data,
                 gssize      length,
                 GError    **error)
{
  g_autoptr(GError) local = NULL;
  g_autofree char *target = NULL;

  if (!hl_atomic_check_target (path, error))
    return FALSE;
  target = resolve_links (path);
  if (!g_file_set_contents_full (target, data, length,
                                 G_FILE_SET_CONTENTS_CONSISTENT | G_FILE_SET_CONTENTS_ONLY_EXISTING,
                                 0644, &local))
    {
      g_set_error (error, local->domain, local->code, "cannot write “%s”: %s", path, local->message);
      return FALSE;
    }
  return TRUE;
}

char *
hl_atomic_temp_name (const char *path)
{
  g_autofree char *target = resolve_links (path);
  g_autofree char *dir = g_path_get_dirname (target);
  g_autofree char *base = g_path_get_basename (target);
  /* hidden, and unique per process and call */
  static guint counter;

  return g_strdup_printf ("%s%c.%s.%d-%u.tmp", dir, G_DIR_SEPARATOR, base, (int) getpid (),
                          g_atomic_int_add (&counter, 1));
}

gboolean
hl_atomic_commit (const char *temp,
                  const char *path,
                  GError    **error)
{
  g_autofree char *target = resolve_links (path);
  int fd = g_open (temp, O_RDONLY, 0);

  if (fd >= 0)
    {
      /* the data must be on disk before the name points at it */
      if (fsync (fd) != 0)
        {
          int saved = errno;

          close (fd);
          hl_atomic_abandon (temp);
          set_errno_error (error, "cannot write", path, saved);
          return FALSE;
        }
      close (fd);
    }
  if (g_rename (temp, target) != 0)
    {
      int saved = errno;

      hl_atomic_abandon (temp);
      set_errno_error (error, "cannot write", path, saved);
      return FALSE;
    }
  return TRUE;
}

void
hl_atomic_abandon (const char *temp)
{
  if (temp != NULL)
    g_unlink (temp);
}
