/* hl-text.c — Pango text for the figure: measure, place, remember
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-text"

#include "hl-text.h"

#include <math.h>

static const struct
{
  double      scale;
  PangoWeight weight;
} roles[HL_N_FONTS] = {
  [HL_FONT_BODY] = { 1.0, PANGO_WEIGHT_NORMAL },
  [HL_FONT_SMALL] = { 0.88, PANGO_WEIGHT_NORMAL },
  [HL_FONT_TINY] = { 0.78, PANGO_WEIGHT_NORMAL },
  [HL_FONT_HEADING] = { 1.0, PANGO_WEIGHT_BOLD },
  [HL_FONT_TITLE] = { 1.2, PANGO_WEIGHT_BOLD },
  [HL_FONT_VALUE] = { 1.0, PANGO_WEIGHT_SEMIBOLD },
};

HlText *
hl_text_new (cairo_t *cr,
             double   base_size)
{
  HlText *t = g_new0 (HlText, 1);
  cairo_font_options_t *options = cairo_font_options_create ();

  t->cr = cr;
  t->layout = pango_cairo_create_layout (cr);
  /* unhinted metrics: the same widths on every surface and scale, so a
   * layout that fits on screen fits in the PDF too */
  cairo_font_options_set_hint_metrics (options, CAIRO_HINT_METRICS_OFF);
  cairo_font_options_set_hint_style (options, CAIRO_HINT_STYLE_NONE);
  pango_cairo_context_set_font_options (pango_layout_get_context (t->layout), options);
  pango_layout_context_changed (t->layout);
  cairo_font_options_destroy (options);
  for (int i = 0; i < HL_N_FONTS; i++)
    {
      t->fonts[i] = pango_font_description_from_string ("Sans");
      pango_font_description_set_weight (t->fonts[i], roles[i].weight);
    }
  hl_text_set_base (t, base_size);
  return t;
}

void
hl_text_free (HlText *t)
{
  if (t == NULL)
    return;
  for (int i = 0; i < HL_N_FONTS; i++)
    pango_font_description_free (t->fonts[i]);
  g_clear_object (&t->layout);
  if (t->boxes != NULL)
    g_array_unref (t->boxes);
  g_free (t);
}

void
hl_text_set_base (HlText *t,
                  double  base_size)
{
  t->base = base_size;
  for (int i = 0; i < HL_N_FONTS; i++)
    pango_font_description_set_absolute_size (t->fonts[i], base_size * roles[i].scale * PANGO_SCALE);
}

double
hl_text_size (HlText     *t,
              HlFontRole  role)
{
  return t->base * roles[role].scale;
}

static void
prepare (HlText     *t,
         HlFontRole  role,
         const char *str,
         double      wrap,
         double      ax)
{
  pango_layout_set_font_description (t->layout, t->fonts[role]);
  if (wrap > 0)
    {
      pango_layout_set_width (t->layout, (int) (wrap * PANGO_SCALE));
      pango_layout_set_wrap (t->layout, PANGO_WRAP_WORD_CHAR);
    }
  else
    pango_layout_set_width (t->layout, -1);
  pango_layout_set_alignment (t->layout, ax > 0.75 ? PANGO_ALIGN_RIGHT : ax > 0.25 ? PANGO_ALIGN_CENTER
                                                                                  : PANGO_ALIGN_LEFT);
  pango_layout_set_text (t->layout, str, -1);
}

void
hl_text_measure (HlText     *t,
                 HlFontRole  role,
                 const char *str,
                 double      wrap,
                 double     *width,
                 double     *height)
{
  PangoRectangle logical;

  prepare (t, role, str, wrap, 0);
  pango_layout_get_extents (t->layout, NULL, &logical);
  if (width != NULL)
    *width = (double) logical.width / PANGO_SCALE;
  if (height != NULL)
    *height = (double) logical.height / PANGO_SCALE;
}

static HlRect
show (HlText *t,
      double  x,
      double  y,
      double  ax,
      double  ay,
      HlRgb   colour)
{
  PangoRectangle logical;
  HlRect box;

  pango_layout_get_extents (t->layout, NULL, &logical);
  box.width = (double) logical.width / PANGO_SCALE;
  box.height = (double) logical.height / PANGO_SCALE;
  box.x = x - ax * box.width;
  box.y = y - ay * box.height;
  cairo_save (t->cr);
  hl_palette_set_source (t->cr, colour);
  /* wrapped layouts are as wide as the wrap width; logical.x shifts the
   * ink to the aligned side */
  cairo_move_to (t->cr, box.x - (double) logical.x / PANGO_SCALE, box.y - (double) logical.y / PANGO_SCALE);
  pango_cairo_show_layout (t->cr, t->layout);
  cairo_restore (t->cr);
  if (t->boxes != NULL)
    g_array_append_val (t->boxes, box);
  return box;
}

HlRect
hl_text_draw (HlText     *t,
              HlFontRole  role,
              const char *str,
              double      x,
              double      y,
              double      ax,
              double      ay,
              double      wrap,
              HlRgb       colour)
{
  prepare (t, role, str, wrap, ax);
  return show (t, x, y, ax, ay, colour);
}

HlRect
hl_text_draw_line (HlText     *t,
                   HlFontRole  role,
                   const char *str,
                   double      x,
                   double      y,
                   double      width,
                   HlRgb       colour)
{
  HlRect r;

  prepare (t, role, str, 0, 0);
  pango_layout_set_width (t->layout, (int) (MAX (width, 1) * PANGO_SCALE));
  pango_layout_set_ellipsize (t->layout, PANGO_ELLIPSIZE_END);
  r = show (t, x, y, 0, 0, colour);
  pango_layout_set_ellipsize (t->layout, PANGO_ELLIPSIZE_NONE);
  return r;
}

HlRect
hl_text_draw_up (HlText     *t,
                 HlFontRole  role,
                 const char *str,
                 double      x,
                 double      y,
                 HlRgb       colour)
{
  PangoRectangle logical;
  HlRect box;
  double w, h;

  prepare (t, role, str, 0, 0);
  pango_layout_get_extents (t->layout, NULL, &logical);
  w = (double) logical.width / PANGO_SCALE;
  h = (double) logical.height / PANGO_SCALE;
  cairo_save (t->cr);
  hl_palette_set_source (t->cr, colour);
  cairo_translate (t->cr, x, y);
  cairo_rotate (t->cr, -G_PI / 2);
  cairo_move_to (t->cr, -w / 2, -h / 2);
  pango_cairo_update_layout (t->cr, t->layout);
  pango_cairo_show_layout (t->cr, t->layout);
  cairo_restore (t->cr);
  pango_cairo_update_layout (t->cr, t->layout);
  box.x = x - h / 2;
  box.y = y - w / 2;
  box.width = h;
  box.height = w;
  if (t->boxes != NULL)
    g_array_append_val (t->boxes, box);
  return box;
}

gboolean
hl_rect_overlaps (const HlRect *a,
                  const HlRect *b)
{
  /* touching boxes (stacked lines) do not count */
  const double eps = 0.25;

  return a->x + eps < b->x + b->width && b->x + eps < a->x + a->width
         && a->y + eps < b->y + b->height && b->y + eps < a->y + a->height;
}
