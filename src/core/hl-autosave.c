/* hl-autosave.c — crash-recovery copies of unsaved edits
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-autosave"

#include "hl-autosave.h"
#include "hl-atomic-file.h"
#include "hl-project-file.h"

#include <errno.h>
#include <glib/gstdio.h>
#include <signal.h>
#include <sys/types.h>
#include <string.h>
#include <unistd.h>

#define INFO_GROUP "autosave"

struct _HlAutosave
{
  char *slot;            /* file stem, unique per process and document */
  char *original_path;
};

char *
hl_autosave_dir (void)
{
  return g_build_filename (g_get_user_state_dir (), "hoopline", "autosave", NULL);
}

HlAutosave *
hl_autosave_new (const char *original_path)
{
  static guint counter;
  HlAutosave *a = g_new0 (HlAutosave, 1);

  /* pid + counter: two windows of one process never share a slot */
  a->slot = g_strdup_printf ("doc-%d-%" G_GINT64_FORMAT "-%u", (int) getpid (),
                             g_get_real_time () / G_USEC_PER_SEC, g_atomic_int_add (&counter, 1));
  a->original_path = g_strdup (original_path);
  return a;
}

void
hl_autosave_free (HlAutosave *autosave)
{
  if (autosave == NULL)
    return;
  g_free (autosave->slot);
  g_free (autosave->original_path);
  g_free (autosave);
}

void
hl_autosave_set_original (HlAutosave *autosave,
                          const char *original_path)
{
  g_free (autosave->original_path);
  autosave->original_path = g_strdup (original_path);
}

static char *
slot_path (const HlAutosave *a,
           const char       *suffix)
{
  g_autofree char *dir = hl_autosave_dir ();
  g_autofree char *name = g_strconcat (a->slot, suffix, NULL);

  return g_build_filename (dir, name, NULL);
}

gboolean
hl_autosave_write (HlAutosave      *autosave,
                   const HlProject *project,
                   GError         **error)
{
  g_autofree char *dir = hl_autosave_dir ();
  g_autofree char *copy = slot_path (autosave, ".hoop");
  g_autofree char *info = slot_path (autosave, ".info");
  g_autofree char *text = NULL;
  g_autoptr(GKeyFile) kf = g_key_file_new ();

  if (g_mkdir_with_parents (dir, 0700) != 0)
    {
      int saved = errno;

      g_set_error (error, G_FILE_ERROR, g_file_error_from_errno (saved),
                   "cannot create the autosave folder “%s”: %s", dir, g_strerror (saved));
      return FALSE;
    }
  if (!hl_project_save (project, copy, error))
    return FALSE;
  /* the copy first, then the note that points at it: a crash between the
   * two leaves a copy without a note, which is ignored and cleaned up */
  g_key_file_set_integer (kf, INFO_GROUP, "pid", (int) getpid ());
  g_key_file_set_int64 (kf, INFO_GROUP, "saved", g_get_real_time () / G_USEC_PER_SEC);
  g_key_file_set_string (kf, INFO_GROUP, "title", project->title != NULL ? project->title : "");
  if (autosave->original_path != NULL)
    g_key_file_set_string (kf, INFO_GROUP, "original", autosave->original_path);
  text = g_key_file_to_data (kf, NULL, NULL);
  return hl_atomic_write (info, text, -1, error);
}

void
hl_autosave_discard (HlAutosave *autosave)
{
  g_autofree char *copy = slot_path (autosave, ".hoop");
  g_autofree char *info = slot_path (autosave, ".info");

  g_unlink (info);
  g_unlink (copy);
}

static gboolean
process_alive (int pid)
{
  if (pid <= 0)
    return FALSE;
  if (pid == (int) getpid ())
    return TRUE;
  return kill ((pid_t) pid, 0) == 0 || errno == EPERM;
}

static gint
newest_first (gconstpointer a,
              gconstpointer b)
{
  const HlAutosaveEntry *ea = *(HlAutosaveEntry **) a;
  const HlAutosaveEntry *eb = *(HlAutosaveEntry **) b;

  return g_date_time_compare (eb->saved_at, ea->saved_at);
}

GPtrArray *
hl_autosave_find_orphans (void)
{
  GPtrArray *found = g_ptr_array_new_with_free_func ((GDestroyNotify) hl_autosave_entry_free);
  g_autofree char *dir_path = hl_autosave_dir ();
  g_autoptr(GDir) dir = g_dir_open (dir_path, 0, NULL);
  const char *name;

  if (dir == NULL)
    return found;
  while ((name = g_dir_read_name (dir)) != NULL)
    {
      g_autoptr(GKeyFile) kf = g_key_file_new ();
      g_autofree char *info = NULL;
      g_autofree char *stem = NULL;
      HlAutosaveEntry *e;

      if (!g_str_has_suffix (name, ".info"))
        continue;
      info = g_build_filename (dir_path, name, NULL);
      if (!g_key_file_load_from_file (kf, info, G_KEY_FILE_NONE, NULL))
        continue;
      if (process_alive (g_key_file_get_integer (kf, INFO_GROUP, "pid", NULL)))
        continue;   /* another window is still working on it */
      stem = g_strndup (name, strlen (name) - strlen (".info"));
      e = g_new0 (HlAutosaveEntry, 1);
      e->info_path = g_steal_pointer (&info);
      e->copy_path = g_strconcat (dir_path, G_DIR_SEPARATOR_S, stem, ".hoop", NULL);
      e->original_path = g_key_file_get_string (kf, INFO_GROUP, "original", NULL);
      e->title = g_key_file_get_string (kf, INFO_GROUP, "title", NULL);
      e->saved_at = g_date_time_new_from_unix_local (g_key_file_get_int64 (kf, INFO_GROUP, "saved", NULL));
      if (e->saved_at == NULL)
        e->saved_at = g_date_time_new_now_local ();
      if (!g_file_test (e->copy_path, G_FILE_TEST_IS_REGULAR))
        {
          hl_autosave_entry_delete (e);
          hl_autosave_entry_free (e);
          continue;
        }
      g_ptr_array_add (found, e);
    }
  g_ptr_array_sort (found, newest_first);
  return found;
}

HlProject *
hl_autosave_entry_load (const HlAutosaveEntry *entry,
                        GError               **error)
{
  return hl_project_load (entry->copy_path, NULL, error);
}

void
hl_autosave_entry_delete (const HlAutosaveEntry *entry)
{
  g_unlink (entry->info_path);
  g_unlink (entry->copy_path);
}

void
hl_autosave_entry_free (HlAutosaveEntry *entry)
{
  if (entry == NULL)
    return;
  g_free (entry->copy_path);
  g_free (entry->info_path);
  g_free (entry->original_path);
  g_free (entry->title);
  g_clear_pointer (&entry->saved_at, g_date_time_unref);
  g_free (entry);
}
