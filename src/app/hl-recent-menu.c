/* hl-recent-menu.c — the Open Recent menu of project files
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-recent-menu"

#include "hl-config.h"
#include "hl-recent-menu.h"

#define MAX_RECENT 8

/* newest use first: opening and saving a file both count as a use */
static int
compare_last_use (gconstpointer a,
                  gconstpointer b)
{
  GDateTime *used_a = gtk_recent_info_get_modified ((GtkRecentInfo *) a);
  GDateTime *used_b = gtk_recent_info_get_modified ((GtkRecentInfo *) b);

  if (used_a == NULL || used_b == NULL)
    return (used_a == NULL) - (used_b == NULL);
  return g_date_time_compare (used_b, used_a);
}

static void
rebuild_recent (GMenu *section)
{
  GtkRecentManager *manager = gtk_recent_manager_get_default ();
  /* the manager lists them in the order they were first added */
  GList *items = g_list_sort (gtk_recent_manager_get_items (manager), compare_last_use);
  guint n = 0;

  g_menu_remove_all (section);
  for (GList *l = items; l != NULL && n < MAX_RECENT; l = l->next)
    {
      GtkRecentInfo *info = l->data;
      const char *uri = gtk_recent_info_get_uri (info);
      g_autoptr(GMenuItem) item = NULL;

      if (!g_str_has_suffix (uri, ".hoop") || !gtk_recent_info_exists (info))
        continue;
      item = g_menu_item_new (gtk_recent_info_get_display_name (info), NULL);
      g_menu_item_set_action_and_target_value (item, "win.open-recent", g_variant_new_string (uri));
      g_menu_append_item (section, item);
      n++;
    }
  g_list_free_full (items, (GDestroyNotify) gtk_recent_info_unref);
}

static void
on_recent_changed_cb (GtkRecentManager *manager,
                      GMenu            *section)
{
  rebuild_recent (section);
}

void
hl_recent_menu_bind (GMenu    *section,
                     gpointer  owner)
{
  g_return_if_fail (G_IS_MENU (section));

  g_signal_connect_object (gtk_recent_manager_get_default (), "changed",
                           G_CALLBACK (on_recent_changed_cb), section, 0);
  g_object_set_data_full (G_OBJECT (owner), "hl-recent-section", g_object_ref (section), g_object_unref);
  rebuild_recent (section);
}

void
hl_recent_menu_remember (GFile *file)
{
  g_autofree char *uri = g_file_get_uri (file);

  gtk_recent_manager_add_item (gtk_recent_manager_get_default (), uri);
}
