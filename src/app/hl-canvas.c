/* hl-canvas.c — the figure of the selected shell, sized to the window
 *
 * The render layer draws everything; this widget only hands it the
 * document's one solution and the style.  GTK gives the draw function a
 * cairo context already scaled for the monitor, so HiDPI stays sharp.
 * Zoomed in (hl-canvas-zoom.c), the figure laid out for the view is
 * drawn larger inside the scrolled window around the canvas.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-canvas"

#include "hl-config.h"
#include "hl-canvas-private.h"
#include "hl-document-follower.h"
#include "hl-startup-trace.h"
#include "hl-figure.h"

#include <adwaita.h>
#include <stdio.h>

G_DEFINE_FINAL_TYPE (HlCanvas, hl_canvas, GTK_TYPE_DRAWING_AREA)

gboolean
hl_canvas_get_dark (HlCanvas *self)
{
  g_return_val_if_fail (HL_IS_CANVAS (self), FALSE);
  /* the figure follows the widgets, whose style the style manager sets
   * from the desktop's preference and ours */
  return adw_style_manager_get_dark (adw_style_manager_get_default ());
}

void
hl_canvas_build_context (HlCanvas        *self,
                         HlFigureContext *ctx)
{
  g_return_if_fail (HL_IS_CANVAS (self) && self->document != NULL);

  hl_figure_context_init (ctx, hl_document_get_project (self->document), hl_document_get_shell (self->document),
                          hl_document_get_solution (self->document),
                          hl_document_get_new_wall_solution (self->document),
                          hl_document_get_problem_text (self->document), HL_FIGURE_TARGET_SCREEN);
  ctx->style = hl_canvas_get_dark (self) ? HL_FIGURE_STYLE_DARK : HL_FIGURE_STYLE_LIGHT;
}

static void
draw_cb (GtkDrawingArea *area,
         cairo_t        *cr,
         int             width,
         int             height,
         gpointer        user_data)
{
  HlCanvas *self = HL_CANVAS (area);
  HlFigureContext ctx = { 0 };
  gint64 before = g_get_monotonic_time ();

  if (self->document == NULL)
    return;
  hl_canvas_build_context (self, &ctx);
  /* the layout of the view's size, magnified: zooming shows the same
   * figure larger, it does not lay it out again */
  cairo_scale (cr, self->zoom, self->zoom);
  hl_figure_draw (cr, width / self->zoom, height / self->zoom, &ctx);

  if (self->n_draws++ == 0)
    hl_startup_trace_first_frame ();
  if (g_getenv ("HL_TRACE_DRAW") != NULL)
    fprintf (stderr, "hoopline: figure drawn in %.2f ms (%d x %d)\n",
             (g_get_monotonic_time () - before) / 1000.0, width, height);
}

static void
on_document_changed_cb (HlDocument *document,
                        HlCanvas   *self)
{
  gtk_widget_queue_draw (GTK_WIDGET (self));
  gtk_accessible_update_property (GTK_ACCESSIBLE (self), GTK_ACCESSIBLE_PROPERTY_DESCRIPTION,
                                  hl_document_get_problem_text (document) != NULL
                                  ? hl_document_get_problem_text (document) : "", -1);
}

static void
on_dark_changed_cb (AdwStyleManager *manager,
                    GParamSpec      *pspec,
                    HlCanvas        *self)
{
  gtk_widget_queue_draw (GTK_WIDGET (self));
}

static void
hl_canvas_realize (GtkWidget *widget)
{
  GTK_WIDGET_CLASS (hl_canvas_parent_class)->realize (widget);
  g_signal_connect_object (adw_style_manager_get_default (), "notify::dark",
                           G_CALLBACK (on_dark_changed_cb), widget, 0);
}

static void
hl_canvas_dispose (GObject *object)
{
  HlCanvas *self = HL_CANVAS (object);

  g_clear_object (&self->follower);
  g_clear_object (&self->document);
  G_OBJECT_CLASS (hl_canvas_parent_class)->dispose (object);
}

static void
hl_canvas_get_property (GObject    *object,
                        guint       prop_id,
                        GValue     *value,
                        GParamSpec *pspec)
{
  HlCanvas *self = HL_CANVAS (object);

  if (prop_id == HL_CANVAS_PROP_ZOOM)
    g_value_set_double (value, self->zoom);
  else
    G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
}

static void
hl_canvas_class_init (HlCanvasClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = hl_canvas_dispose;
  object_class->get_property = hl_canvas_get_property;
  hl_canvas_zoom_class_init (klass);
  widget_class->realize = hl_canvas_realize;
  gtk_widget_class_set_css_name (widget_class, "hl-canvas");
  gtk_widget_class_set_accessible_role (widget_class, GTK_ACCESSIBLE_ROLE_IMG);
}

static void
hl_canvas_init (HlCanvas *self)
{
  gtk_drawing_area_set_draw_func (GTK_DRAWING_AREA (self), draw_cb, NULL, NULL);
  gtk_widget_set_hexpand (GTK_WIDGET (self), TRUE);
  gtk_widget_set_vexpand (GTK_WIDGET (self), TRUE);
  gtk_widget_set_size_request (GTK_WIDGET (self), 360, 240);
  self->follower = hl_document_follower_new ((HlDocumentRefresh) on_document_changed_cb, self);
  hl_canvas_zoom_init (self);
}

void
hl_canvas_set_document (HlCanvas   *self,
                        HlDocument *document)
{
  g_return_if_fail (HL_IS_CANVAS (self));

  g_set_object (&self->document, document);
  g_signal_group_set_target (self->follower, document);
}

guint
hl_canvas_get_n_draws (HlCanvas *self)
{
  g_return_val_if_fail (HL_IS_CANVAS (self), 0);
  return self->n_draws;
}
