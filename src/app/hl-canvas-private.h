/* hl-canvas-private.h — what the canvas's source files share
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-canvas.h"

G_BEGIN_DECLS

enum
{
  HL_CANVAS_PROP_0,
  HL_CANVAS_PROP_ZOOM,
};

struct _HlCanvas
{
  GtkDrawingArea parent_instance;

  HlDocument    *document;
  GSignalGroup  *follower;      /* calls on_document_changed_cb */
  guint          n_draws;

  /* hl-canvas-zoom.c */
  double         zoom;          /* 1: the figure fits the view */
  double         pointer_x, pointer_y;  /* last pointer position, canvas units */
  gboolean       anchor_pending;        /* scroll to the anchor once resized */
  double         anchor_fx, anchor_fy;  /* figure point, unzoomed units ... */
  double         anchor_vx, anchor_vy;  /* ... that stays at this view point */
  double         drag_x, drag_y;        /* scroll position when a pan began */
};

void hl_canvas_zoom_class_init (HlCanvasClass *klass);
void hl_canvas_zoom_init       (HlCanvas      *self);

G_END_DECLS
