/* hl-document-follower.c — one way for a view to follow the open document
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-document-follower"

#include "hl-document-follower.h"

static void
on_bind_cb (GSignalGroup *group,
            GObject      *target,
            gpointer      view)
{
  HlDocumentRefresh refresh = (HlDocumentRefresh) g_object_get_data (G_OBJECT (group), "hl-refresh");

  refresh (HL_DOCUMENT (target), view);
}

GSignalGroup *
hl_document_follower_new (HlDocumentRefresh refresh,
                          gpointer          view)
{
  GSignalGroup *group = g_signal_group_new (HL_TYPE_DOCUMENT);

  g_return_val_if_fail (refresh != NULL, NULL);

  g_object_set_data (G_OBJECT (group), "hl-refresh", (gpointer) refresh);
  g_signal_group_connect (group, "changed", G_CALLBACK (refresh), view);
  g_signal_connect (group, "bind", G_CALLBACK (on_bind_cb), view);
  return group;
}
