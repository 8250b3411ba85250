/* hl-window-zoom.c — the window's zoom commands for the canvas
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-window-zoom"

#include "hl-config.h"
#include "hl-window-private.h"
#include "hl-canvas.h"

/* one handler: the action's name says which way */
static void
zoom_activated (GSimpleAction *action,
                GVariant      *parameter,
                gpointer       user_data)
{
  HlCanvas *canvas = HL_WINDOW (user_data)->canvas;
  const char *name = g_action_get_name (G_ACTION (action));

  if (g_str_equal (name, "zoom-in"))
    hl_canvas_zoom_in (canvas);
  else if (g_str_equal (name, "zoom-out"))
    hl_canvas_zoom_out (canvas);
  else
    hl_canvas_zoom_fit (canvas);
}

static const GActionEntry zoom_entries[] = {
  { "zoom-in", zoom_activated },
  { "zoom-out", zoom_activated },
  { "zoom-fit", zoom_activated },
};

/* the one place that decides which zoom commands can act */
static void
update_zoom_actions (HlWindow *self)
{
  gboolean zoomed = hl_canvas_get_zoom (self->canvas) > 1.0;

  g_simple_action_set_enabled (G_SIMPLE_ACTION (g_action_map_lookup_action (G_ACTION_MAP (self), "zoom-in")),
                               hl_canvas_can_zoom_in (self->canvas));
  g_simple_action_set_enabled (G_SIMPLE_ACTION (g_action_map_lookup_action (G_ACTION_MAP (self), "zoom-out")), zoomed);
  g_simple_action_set_enabled (G_SIMPLE_ACTION (g_action_map_lookup_action (G_ACTION_MAP (self), "zoom-fit")), zoomed);
}

void
hl_window_add_zoom_actions (HlWindow *self)
{
  g_action_map_add_action_entries (G_ACTION_MAP (self), zoom_entries, G_N_ELEMENTS (zoom_entries), self);
  g_signal_connect_object (self->canvas, "notify::zoom", G_CALLBACK (update_zoom_actions), self, G_CONNECT_SWAPPED);
  update_zoom_actions (self);
}
