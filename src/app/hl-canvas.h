/* hl-canvas.h — the figure of the selected shell, sized to the window
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

#include "hl-document.h"
#include "hl-figure.h"

G_BEGIN_DECLS

#define HL_TYPE_CANVAS (hl_canvas_get_type ())
G_DECLARE_FINAL_TYPE (HlCanvas, hl_canvas, HL, CANVAS, GtkDrawingArea)

void     hl_canvas_set_document (HlCanvas   *self,
                                 HlDocument *document);
/* frames drawn so far, for tests */
guint    hl_canvas_get_n_draws  (HlCanvas   *self);
gboolean hl_canvas_get_dark     (HlCanvas   *self);
/* hl-canvas-zoom.c: the figure magnified inside the scrolled window
 * around the canvas; 1 fits it to the view.  "zoom" notifies. */
double   hl_canvas_get_zoom     (HlCanvas   *self);
void     hl_canvas_zoom_in      (HlCanvas   *self);
void     hl_canvas_zoom_out     (HlCanvas   *self);
void     hl_canvas_zoom_fit     (HlCanvas   *self);
gboolean hl_canvas_can_zoom_in  (HlCanvas   *self);
/* the context the canvas draws with (hl_figure_context_init) */
void     hl_canvas_build_context (HlCanvas        *self,
                                  HlFigureContext *ctx);

G_END_DECLS
