/* hl-window-disk.c — the window watches its file on disk
 *
 * The open file is watched, so that a version saved by someone else is
 * neither missed nor silently lost: a banner offers to reload it or to
 * keep the version here, and a save asks before replacing it.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-window"

#include "hl-config.h"
#include "hl-window-private.h"

#include <glib/gi18n.h>

char *
hl_window_query_etag (GFile *file)
{
  g_autoptr(GFileInfo) info = g_file_query_info (file, G_FILE_ATTRIBUTE_ETAG_VALUE,
                                                 G_FILE_QUERY_INFO_NONE, NULL, NULL);

  return info != NULL ? g_strdup (g_file_info_get_etag (info)) : NULL;
}

static void
show_disk_notice (HlWindow *self,
                  gboolean  gone)
{
  GFile *file = hl_document_get_file (self->document);
  g_autofree char *name = g_file_get_basename (file);
  g_autofree char *text = NULL;

  if (gone)
    /* TRANSLATORS: %s is a file name */
    text = g_strdup_printf (_("“%s” was deleted or moved by another program. Saving writes it again."), name);
  else
    /* TRANSLATORS: %s is a file name */
    text = g_strdup_printf (_("“%s” was changed by another program. Reload shows that version and drops any "
                              "unsaved changes made here; Keep Mine keeps this version, and saving replaces the "
                              "file with it."), name);
  g_simple_action_set_enabled (G_SIMPLE_ACTION (g_action_map_lookup_action (G_ACTION_MAP (self), "disk-reload")),
                               !gone);
  hl_banner_show (self->disk_bar, GTK_MESSAGE_WARNING, text);
}

static void
hide_disk_notice (HlWindow *self)
{
  hl_banner_hide (self->disk_bar);
}

/* Every kind of event ends here: the etag alone tells whether the file
 * is another one now, and it is the one our own saves leave. */
static void
on_file_monitor_changed_cb (GFileMonitor      *monitor,
                            GFile             *file,
                            GFile             *other,
                            GFileMonitorEvent  event,
                            HlWindow          *self)
{
  GFile *mine = hl_document_get_file (self->document);
  g_autofree char *now = NULL;

  if (event == G_FILE_MONITOR_EVENT_ATTRIBUTE_CHANGED || mine == NULL)
    return;
  now = hl_window_query_etag (mine);
  if (now == NULL)
    show_disk_notice (self, TRUE);
  else if (g_strcmp0 (now, self->disk_etag) != 0)
    show_disk_notice (self, FALSE);
}

void
hl_window_unwatch_file (HlWindow *self)
{
  if (self->monitor != NULL)
    {
      g_signal_handlers_disconnect_by_data (self->monitor, self);
      g_file_monitor_cancel (self->monitor);
      g_clear_object (&self->monitor);
    }
  g_clear_pointer (&self->disk_etag, g_free);
  /* dispose may come twice, the second time without the template */
  if (self->disk_bar != NULL)
    hide_disk_notice (self);
}

void
hl_window_watch_file (HlWindow   *self,
                      const char *etag)
{
  GFile *file = hl_document_get_file (self->document);
  g_autofree char *kept = g_strdup (etag);

  hl_window_unwatch_file (self);
  if (file == NULL)
    return;
  self->disk_etag = kept != NULL ? g_steal_pointer (&kept) : hl_window_query_etag (file);
  /* moves too: another program's save usually renames a new file over
   * this one */
  self->monitor = g_file_monitor_file (file, G_FILE_MONITOR_WATCH_MOVES, NULL, NULL);
  if (self->monitor != NULL)
    g_signal_connect (self->monitor, "changed", G_CALLBACK (on_file_monitor_changed_cb), self);
}

static void
disk_reload_activated (GSimpleAction *action,
                       GVariant      *param,
                       gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  g_autoptr(GFile) file = NULL;

  if (hl_document_get_file (self->document) == NULL)
    return;
  file = g_object_ref (hl_document_get_file (self->document));
  hl_window_load_file (self, file);
}

/* the user has seen the other version and keeps theirs: a save then
 * replaces it without asking again */
static void
disk_keep_activated (GSimpleAction *action,
                     GVariant      *param,
                     gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  GFile *file = hl_document_get_file (self->document);

  if (file != NULL)
    {
      g_free (self->disk_etag);
      self->disk_etag = hl_window_query_etag (file);
    }
  hide_disk_notice (self);
}

static const GActionEntry disk_entries[] = {
  { "disk-reload", disk_reload_activated },
  { "disk-keep", disk_keep_activated },
};

void
hl_window_add_disk_actions (HlWindow *self)
{
  g_action_map_add_action_entries (G_ACTION_MAP (self), disk_entries, G_N_ELEMENTS (disk_entries), self);
}
