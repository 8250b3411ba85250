/* hl-canvas-zoom.c — the canvas magnified, panned inside its scrolled window
 *
 * Zooming keeps the layout the figure has at the view's size and draws
 * it larger: the canvas asks for the view's size times the zoom, the
 * scrolled window around it scrolls, and the figure point under the
 * pointer (or the view's centre, from the keyboard) stays where it is.
 * Ctrl+scroll zooms; a drag with the primary button pans.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-canvas-zoom"

#include "hl-config.h"
#include "hl-canvas-private.h"

#include <math.h>

#define ZOOM_STEP 1.25
#define ZOOM_MAX  8.0
/* the size the canvas asks for when it fits the view */
#define FIT_WIDTH  360
#define FIT_HEIGHT 240

static GParamSpec *zoom_pspec;

static GtkScrolledWindow *
scroller (HlCanvas *self)
{
  GtkWidget *sw = gtk_widget_get_ancestor (GTK_WIDGET (self), GTK_TYPE_SCROLLED_WINDOW);

  return sw != NULL ? GTK_SCROLLED_WINDOW (sw) : NULL;
}

/* zooms to @zoom keeping the figure point under the view point (@vx,
 * @vy) in place */
static void
set_zoom_at (HlCanvas *self,
             double    zoom,
             double    vx,
             double    vy)
{
  GtkScrolledWindow *sw = scroller (self);

  zoom = CLAMP (zoom, 1.0, ZOOM_MAX);
  /* the last step lands on the limits exactly */
  if (fabs (zoom - 1.0) < 0.01)
    zoom = 1.0;
  if (zoom == self->zoom)
    return;
  if (sw != NULL)
    {
      GtkAdjustment *h = gtk_scrolled_window_get_hadjustment (sw);
      GtkAdjustment *v = gtk_scrolled_window_get_vadjustment (sw);
      double view_w = gtk_widget_get_width (GTK_WIDGET (sw)), view_h = gtk_widget_get_height (GTK_WIDGET (sw));

      self->anchor_fx = (gtk_adjustment_get_value (h) + vx) / self->zoom;
      self->anchor_fy = (gtk_adjustment_get_value (v) + vy) / self->zoom;
      self->anchor_vx = vx;
      self->anchor_vy = vy;
      self->anchor_pending = TRUE;
      /* the view's size stands for the size that fits; at 1 the canvas
       * takes whatever the view gives it */
      if (zoom > 1.0)
        gtk_widget_set_size_request (GTK_WIDGET (self), (int) ceil (view_w * zoom), (int) ceil (view_h * zoom));
      else
        gtk_widget_set_size_request (GTK_WIDGET (self), FIT_WIDTH, FIT_HEIGHT);
    }
  self->zoom = zoom;
  gtk_widget_queue_draw (GTK_WIDGET (self));
  g_object_notify_by_pspec (G_OBJECT (self), zoom_pspec);
}

/* the view's centre, for zooming from the keyboard */
static void
zoom_centred (HlCanvas *self,
              double    zoom)
{
  GtkScrolledWindow *sw = scroller (self);
  GtkWidget *view = sw != NULL ? GTK_WIDGET (sw) : GTK_WIDGET (self);

  set_zoom_at (self, zoom, gtk_widget_get_width (view) / 2.0, gtk_widget_get_height (view) / 2.0);
}

/* once the viewport has given the canvas its new size, the adjustments
 * know the new range: scroll the anchor back under its view point */
static void
on_resize_cb (GtkDrawingArea *area,
              int             width,
              int             height,
              HlCanvas       *self)
{
  GtkScrolledWindow *sw = scroller (self);

  if (!self->anchor_pending || sw == NULL)
    return;
  self->anchor_pending = FALSE;
  gtk_adjustment_set_value (gtk_scrolled_window_get_hadjustment (sw), self->anchor_fx * self->zoom - self->anchor_vx);
  gtk_adjustment_set_value (gtk_scrolled_window_get_vadjustment (sw), self->anchor_fy * self->zoom - self->anchor_vy);
}

static void
on_motion_cb (GtkEventControllerMotion *motion,
              double                    x,
              double                    y,
              HlCanvas                 *self)
{
  self->pointer_x = x;
  self->pointer_y = y;
}

static gboolean
on_scroll_cb (GtkEventControllerScroll *scroll,
              double                    dx,
              double                    dy,
              HlCanvas                 *self)
{
  GdkModifierType state = gtk_event_controller_get_current_event_state (GTK_EVENT_CONTROLLER (scroll));
  GtkScrolledWindow *sw = scroller (self);
  double vx = self->pointer_x, vy = self->pointer_y;

  /* without Ctrl the scrolled window pans */
  if (!(state & GDK_CONTROL_MASK) || dy == 0)
    return FALSE;
  if (sw != NULL)
    {
      vx -= gtk_adjustment_get_value (gtk_scrolled_window_get_hadjustment (sw));
      vy -= gtk_adjustment_get_value (gtk_scrolled_window_get_vadjustment (sw));
    }
  /* a wheel click is one step; a touchpad's fractions give fractions */
  set_zoom_at (self, self->zoom * pow (ZOOM_STEP, -dy), vx, vy);
  return TRUE;
}

static void
on_drag_begin_cb (GtkGestureDrag *drag,
                  double          x,
                  double          y,
                  HlCanvas       *self)
{
  GtkScrolledWindow *sw = scroller (self);

  if (self->zoom <= 1.0 || sw == NULL)
    {
      gtk_gesture_set_state (GTK_GESTURE (drag), GTK_EVENT_SEQUENCE_DENIED);
      return;
    }
  self->drag_x = gtk_adjustment_get_value (gtk_scrolled_window_get_hadjustment (sw));
  self->drag_y = gtk_adjustment_get_value (gtk_scrolled_window_get_vadjustment (sw));
  gtk_widget_set_cursor_from_name (GTK_WIDGET (self), "grabbing");
}

static void
on_drag_update_cb (GtkGestureDrag *drag,
                   double          dx,
                   double          dy,
                   HlCanvas       *self)
{
  GtkScrolledWindow *sw = scroller (self);
  GtkAdjustment *h, *v;
  double moved_x, moved_y;

  if (sw == NULL)
    return;
  h = gtk_scrolled_window_get_hadjustment (sw);
  v = gtk_scrolled_window_get_vadjustment (sw);
  /* the offset is in canvas units, and the canvas has moved with the
   * scrolling since the press: what the pointer moved over the view is
   * the offset less that */
  moved_x = dx - (gtk_adjustment_get_value (h) - self->drag_x);
  moved_y = dy - (gtk_adjustment_get_value (v) - self->drag_y);
  gtk_adjustment_set_value (h, self->drag_x - moved_x);
  gtk_adjustment_set_value (v, self->drag_y - moved_y);
}

static void
on_drag_end_cb (GtkGestureDrag *drag,
                double          dx,
                double          dy,
                HlCanvas       *self)
{
  gtk_widget_set_cursor (GTK_WIDGET (self), NULL);
}

void
hl_canvas_zoom_class_init (HlCanvasClass *klass)
{
  zoom_pspec = g_param_spec_double ("zoom", NULL, NULL, 1.0, ZOOM_MAX, 1.0,
                                    G_PARAM_READABLE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  g_object_class_install_property (G_OBJECT_CLASS (klass), HL_CANVAS_PROP_ZOOM, zoom_pspec);
}

void
hl_canvas_zoom_init (HlCanvas *self)
{
  GtkEventController *scroll = gtk_event_controller_scroll_new (GTK_EVENT_CONTROLLER_SCROLL_VERTICAL);
  GtkEventController *motion = gtk_event_controller_motion_new ();
  GtkGesture *drag = gtk_gesture_drag_new ();

  self->zoom = 1.0;
  g_signal_connect (scroll, "scroll", G_CALLBACK (on_scroll_cb), self);
  gtk_widget_add_controller (GTK_WIDGET (self), scroll);
  g_signal_connect (motion, "motion", G_CALLBACK (on_motion_cb), self);
  gtk_widget_add_controller (GTK_WIDGET (self), motion);
  gtk_gesture_single_set_button (GTK_GESTURE_SINGLE (drag), GDK_BUTTON_PRIMARY);
  g_signal_connect (drag, "drag-begin", G_CALLBACK (on_drag_begin_cb), self);
  g_signal_connect (drag, "drag-update", G_CALLBACK (on_drag_update_cb), self);
  g_signal_connect (drag, "drag-end", G_CALLBACK (on_drag_end_cb), self);
  gtk_widget_add_controller (GTK_WIDGET (self), GTK_EVENT_CONTROLLER (drag));
  g_signal_connect (self, "resize", G_CALLBACK (on_resize_cb), self);
}

double
hl_canvas_get_zoom (HlCanvas *self)
{
  g_return_val_if_fail (HL_IS_CANVAS (self), 1.0);
  return self->zoom;
}

gboolean
hl_canvas_can_zoom_in (HlCanvas *self)
{
  g_return_val_if_fail (HL_IS_CANVAS (self), FALSE);
  return self->zoom < ZOOM_MAX;
}

void
hl_canvas_zoom_in (HlCanvas *self)
{
  g_return_if_fail (HL_IS_CANVAS (self));
  zoom_centred (self, self->zoom * ZOOM_STEP);
}

void
hl_canvas_zoom_out (HlCanvas *self)
{
  g_return_if_fail (HL_IS_CANVAS (self));
  zoom_centred (self, self->zoom / ZOOM_STEP);
}

void
hl_canvas_zoom_fit (HlCanvas *self)
{
  g_return_if_fail (HL_IS_CANVAS (self));
  zoom_centred (self, 1.0);
}
