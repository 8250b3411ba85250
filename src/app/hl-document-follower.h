/* hl-document-follower.h — one way for a view to follow the open document
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-document.h"

G_BEGIN_DECLS

/* What a view does when the document changes, or is set. */
typedef void (*HlDocumentRefresh) (HlDocument *document,
                                   gpointer    view);

/* A signal group on HlDocument that calls @refresh (document, @view) on
 * every "changed" and as soon as a document is set with
 * g_signal_group_set_target().  The view owns it and clears it in its
 * dispose, which disconnects everything: no view keeps a hand-made
 * connect/disconnect block. */
GSignalGroup *hl_document_follower_new (HlDocumentRefresh refresh,
                                        gpointer          view);

G_END_DECLS
