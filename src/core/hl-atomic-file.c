/* hl-atomic-file.c — write a file so that it is complete or not there at all
 *
 * A save writes a temporary beside the target and renames it over the
 * target (POSIX rename(2) replaces the name in one step).  The rename
 * makes a new file, so the old one's owner, group and mode are copied
 * onto the temporary first.  Where a rename would do harm — the file has
 * other names that would keep the old content, or the folder takes no
 * new files — the file can only be written in place, which a crash can
 * cut short; that happens only with the caller's (the user's) consent,
 * never by default.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-atomic-file"

#include "hl-atomic-file.h"

#include <errno.h>
#include <fcntl.h>
#include <glib/gstdio.h>
#include <signal.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

/* A save writes and renames its temporary within a second even for the
 * largest project; one this old belongs to a save that was killed. */
#define LEFTOVER_SECONDS 10

G_DEFINE_QUARK (hl-atomic-error-quark, hl_atomic_error)

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

/* The temporary's name keeps the target's name readable and marks the
 * file as ours beyond doubt, so that hl_atomic_clean_leftovers() never
 * takes another program's file.  The name is cut so that the temporary
 * stays within NAME_MAX (255 bytes on Linux file systems). */
#define TEMP_TAG ".hoopline-save-"
#define TEMP_BASE_MAX 200
#define TEMP_RANDOM_LEN 6

static char *
temp_prefix (const char *target)
{
  g_autofree char *dir = g_path_get_dirname (target);
  g_autofree char *base = g_path_get_basename (target);
  g_autofree char *name = NULL;

  if (strlen (base) > TEMP_BASE_MAX)
    base[TEMP_BASE_MAX] = '\0';
  name = g_strconcat (".", base, TEMP_TAG, NULL);
  return g_build_filename (dir, name, NULL);
}

static gboolean
write_protected (const char     *target,
                 const GStatBuf *st,
                 int            *why)
{
  /* access() knows the bits, the immutable flag and read-only mounts */
  if (access (target, W_OK) != 0)
    {
      *why = errno;
      return TRUE;
    }
  /* root passes access() whatever the bits say; a file nobody may write
   * was protected on purpose */
  if (geteuid () == 0 && (st->st_mode & (S_IWUSR | S_IWGRP | S_IWOTH)) == 0)
    {
      *why = EACCES;
      return TRUE;
    }
  return FALSE;
}

static void
set_read_only_error (GError    **error,
                     const char *path,
                     int         why)
{
  g_set_error (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_READ_ONLY,
               "cannot write “%s”: the file is read-only (%s); make it writable or save under another name",
               path, g_strerror (why));
}

static gboolean
write_all (int         fd,
           const char *data,
           gsize       length)
{
  while (length > 0)
    {
      gssize n = write (fd, data, length);

      if (n < 0 && errno == EINTR)
        continue;
      if (n <= 0)
        return FALSE;
      data += n;
      length -= (gsize) n;
    }
  return TRUE;
}

/* The new file takes the place of the old one: it keeps its owner, group
 * and mode where the system lets us (a user may not give a file away,
 * but may give it to a group of theirs).  chown comes first because it
 * clears the set-id bits. */
static void
keep_attributes (int             fd,
                 const GStatBuf *old)
{
  if (fchown (fd, old->st_uid, old->st_gid) != 0 && fchown (fd, (uid_t) -1, old->st_gid) != 0)
    {
      /* not allowed: the file becomes ours, as any new file would */
    }
  if (fchmod (fd, old->st_mode & 07777) != 0)
    {
      /* the temporary is ours, so this does not fail in practice; the
       * mode it was made with is then kept */
    }
}

/* so that the rename itself survives a power cut (fsync(2)) */
static void
sync_folder (const char *target)
{
  g_autofree char *dir = g_path_get_dirname (target);
  int fd = g_open (dir, O_RDONLY | O_DIRECTORY, 0);

  if (fd >= 0)
    {
      fsync (fd);
      close (fd);
    }
}

G_LOCK_DEFINE_STATIC (permit);
static char *permitted_target;

void
hl_atomic_permit_in_place (const char *path)
{
  G_LOCK (permit);
  g_clear_pointer (&permitted_target, g_free);
  if (path != NULL)
    permitted_target = resolve_links (path);
  G_UNLOCK (permit);
}

static gboolean
in_place_permitted (const char *target)
{
  gboolean yes;

  G_LOCK (permit);
  yes = g_strcmp0 (permitted_target, target) == 0;
  G_UNLOCK (permit);
  return yes;
}

static gboolean
write_in_place (const char *path,
                const char *target,
                const char *data,
                gsize       length,
                GError    **error)
{
  int fd = g_open (target, O_WRONLY | O_CREAT | O_CLOEXEC, 0666);
  int saved;

  if (fd < 0)
    {
      set_errno_error (error, "cannot write", path, errno);
      return FALSE;
    }
  /* written before the cut, so a shorter project never leaves a moment
   * with an empty file */
  if (write_all (fd, data, length) && ftruncate (fd, (off_t) length) == 0 && fsync (fd) == 0)
    {
      close (fd);
      return TRUE;
    }
  saved = errno;
  close (fd);
  set_errno_error (error, "cannot write", path, saved);
  return FALSE;
}

/* a folder that takes no new files while the file itself may be written */
static gboolean
errno_means_no_temp (int saved)
{
  return saved == EACCES || saved == EPERM || saved == ENAMETOOLONG;
}

static int
open_temp (const char *target,
           char      **temp)
{
  g_autofree char *prefix = temp_prefix (target);

  *temp = g_strdup_printf ("%s%d-XXXXXX", prefix, (int) getpid ());
  /* 0666 less the umask: a new project is made like any new file */
  return g_mkstemp_full (*temp, O_WRONLY | O_CLOEXEC, 0666);
}

static void
set_no_temp_error (GError    **error,
                   const char *path,
                   const char *target,
                   int         saved)
{
  g_autofree char *dir = g_path_get_dirname (target);

  g_set_error (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_NO_TEMP,
               "cannot write “%s”: no temporary file can be made in the folder “%s” (%s), "
               "so the file cannot be replaced safely", path, dir, g_strerror (saved));
}

static void
set_hard_links_error (GError    **error,
                      const char *path,
                      guint       links)
{
  g_set_error (error, HL_ATOMIC_ERROR, HL_ATOMIC_ERROR_HARD_LINKS,
               "cannot write “%s”: the file has %u names (hard links); replacing it would leave "
               "the other names with the old project", path, links);
}

typedef enum
{
  PLAN_FAIL,
  PLAN_REPLACE,    /* a temporary is open, to be renamed over the target */
  PLAN_IN_PLACE,   /* the target itself is to be written */
} Plan;

typedef struct
{
  char    *target;   /* @path with its links resolved */
  gboolean exists;
  GStatBuf st;
  char    *temp;
  int      fd;
} Replacement;

static void
replacement_clear (Replacement *r)
{
  if (r->fd >= 0)
    close (r->fd);
  if (r->temp != NULL)
    g_unlink (r->temp);
  g_free (r->temp);
  g_free (r->target);
}

G_DEFINE_AUTO_CLEANUP_CLEAR_FUNC (Replacement, replacement_clear)

/* What hl_atomic_check_replace() tells and hl_atomic_write() does: how
 * @path can be written, with @may_write_in_place standing for the user's
 * permission. */
static Plan
plan_write (const char  *path,
            Replacement *r,
            gboolean     may_write_in_place,
            GError     **error)
{
  int why = 0;

  r->fd = -1;
  if (!hl_atomic_check_target (path, error))
    return PLAN_FAIL;
  r->target = resolve_links (path);
  r->exists = g_stat (r->target, &r->st) == 0;
  if (r->exists && write_protected (r->target, &r->st, &why))
    {
      set_read_only_error (error, path, why);
      return PLAN_FAIL;
    }
  if (r->exists && r->st.st_nlink > 1)
    {
      if (may_write_in_place || in_place_permitted (r->target))
        return PLAN_IN_PLACE;
      set_hard_links_error (error, path, (guint) r->st.st_nlink);
      return PLAN_FAIL;
    }
  r->fd = open_temp (r->target, &r->temp);
  if (r->fd >= 0)
    return PLAN_REPLACE;
  why = errno;
  g_clear_pointer (&r->temp, g_free);
  if (!r->exists || !errno_means_no_temp (why))
    set_errno_error (error, "cannot write", path, why);
  else if (may_write_in_place || in_place_permitted (r->target))
    return PLAN_IN_PLACE;
  else
    set_no_temp_error (error, path, r->target, why);
  return PLAN_FAIL;
}

gboolean
hl_atomic_check_replace (const char *path,
                         GError    **error)
{
  g_auto(Replacement) r = { 0 };

  return plan_write (path, &r, FALSE, error) == PLAN_REPLACE;
}

gboolean
hl_atomic_write (const char *path,
                 const char *data,
                 gssize      length,
                 GError    **error)
{
  g_auto(Replacement) r = { 0 };
  gsize len = length < 0 ? strlen (data) : (gsize) length;
  int saved;

  switch (plan_write (path, &r, FALSE, error))
    {
    case PLAN_FAIL:
      return FALSE;
    case PLAN_IN_PLACE:
      return write_in_place (path, r.target, data, len, error);
    case PLAN_REPLACE:
    default:
      break;
    }
  if (r.exists)
    keep_attributes (r.fd, &r.st);
  /* the data must be on disk before the name points at it */
  saved = write_all (r.fd, data, len) && fsync (r.fd) == 0 ? 0 : errno;
  close (g_steal_fd (&r.fd));
  if (saved == 0 && g_rename (r.temp, r.target) != 0)
    saved = errno;
  if (saved != 0)
    {
      set_errno_error (error, "cannot write", path, saved);
      return FALSE;
    }
  g_clear_pointer (&r.temp, g_free);   /* renamed: nothing to remove */
  sync_folder (r.target);
  return TRUE;
}

gboolean
hl_atomic_write_in_place (const char *path,
                          const char *data,
                          gssize      length,
                          GError    **error)
{
  g_auto(Replacement) r = { 0 };

  if (plan_write (path, &r, TRUE, error) == PLAN_FAIL)
    return FALSE;
  return write_in_place (path, r.target, data, length < 0 ? strlen (data) : (gsize) length, error);
}

char *
hl_atomic_temp_name (const char *path)
{
  g_autofree char *target = resolve_links (path);
  g_autofree char *prefix = temp_prefix (target);
  /* unique per process and call; six characters like mkstemp's */
  static guint counter;

  return g_strdup_printf ("%s%d-%06u", prefix, (int) getpid (), g_atomic_int_add (&counter, 1) % 1000000);
}

gboolean
hl_atomic_commit (const char *temp,
                  const char *path,
                  GError    **error)
{
  g_autofree char *target = resolve_links (path);
  GStatBuf st;
  gboolean exists = g_stat (target, &st) == 0;
  int why = 0, fd;

  if (exists && write_protected (target, &st, &why))
    {
      hl_atomic_abandon (temp);
      set_read_only_error (error, path, why);
      return FALSE;
    }
  /* the same rule as for a save: a rename would split the names */
  if (exists && st.st_nlink > 1)
    {
      hl_atomic_abandon (temp);
      set_hard_links_error (error, path, (guint) st.st_nlink);
      return FALSE;
    }
  fd = g_open (temp, O_RDONLY, 0);
  if (fd >= 0)
    {
      if (exists)
        keep_attributes (fd, &st);
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
  sync_folder (target);
  return TRUE;
}

void
hl_atomic_abandon (const char *temp)
{
  if (temp != NULL)
    g_unlink (temp);
}

/* "PID-XXXXXX" after our prefix: the writer's process and six letters or
 * digits, nothing else */
static gboolean
parse_temp_tail (const char *tail,
                 guint64    *pid)
{
  const char *dash = strchr (tail, '-');
  g_autofree char *digits = NULL;

  if (dash == NULL || dash == tail || strlen (dash + 1) != TEMP_RANDOM_LEN)
    return FALSE;
  for (const char *p = dash + 1; *p != '\0'; p++)
    if (!g_ascii_isalnum (*p))
      return FALSE;
  digits = g_strndup (tail, (gsize) (dash - tail));
  return g_ascii_string_to_unsigned (digits, 10, 1, G_MAXINT, pid, NULL);
}

static gboolean
process_gone (guint64 pid)
{
  return kill ((pid_t) pid, 0) != 0 && errno == ESRCH;
}

guint
hl_atomic_clean_leftovers (const char *path)
{
  g_autofree char *target = NULL;
  g_autofree char *prefix = NULL;
  g_autofree char *dir_path = NULL;
  g_autofree char *prefix_name = NULL;
  g_autoptr(GDir) dir = NULL;
  const char *name;
  gint64 now = g_get_real_time () / G_USEC_PER_SEC;
  guint removed = 0;

  g_return_val_if_fail (path != NULL, 0);

  target = resolve_links (path);
  prefix = temp_prefix (target);
  dir_path = g_path_get_dirname (prefix);
  prefix_name = g_path_get_basename (prefix);
  dir = g_dir_open (dir_path, 0, NULL);
  while (dir != NULL && (name = g_dir_read_name (dir)) != NULL)
    {
      g_autofree char *full = NULL;
      guint64 pid = 0;
      GStatBuf st;

      if (!g_str_has_prefix (name, prefix_name) || !parse_temp_tail (name + strlen (prefix_name), &pid))
        continue;
      full = g_build_filename (dir_path, name, NULL);
      /* never through a link, never another user's file */
      if (g_lstat (full, &st) != 0 || !S_ISREG (st.st_mode) || st.st_uid != geteuid ())
        continue;
      if (now - (gint64) st.st_mtime < LEFTOVER_SECONDS && !process_gone (pid))
        continue;
      if (g_unlink (full) == 0)
        removed++;
    }
  return removed;
}
