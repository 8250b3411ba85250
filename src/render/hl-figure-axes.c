/* hl-figure-axes.c — grid, frame, ticks and tick labels of a plot area
 *
 * Shared by the through-thickness plot and the thinness chart.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-axes"

#include "hl-figure-private.h"

#include <math.h>

double
hl_axes_tick_length (HlFigure *f)
{
  return 0.35 * f->text->base;
}

void
hl_axes_layout (HlFigure     *f,
                const HlRect *body,
                double        lo,
                double        hi,
                HlAxis       *y,
                HlRect       *area,
                double       *label_height)
{
  double th, lab_w = 0, w, tick = hl_axes_tick_length (f);

  /* a linear y axis with as many ticks as the height carries; the area
   * leaves room for the y labels and title on the left and the x labels
   * and title below */
  hl_text_measure (f->text, HL_FONT_SMALL, "0", 0, NULL, &th);
  hl_axis_linear (y, lo, hi, (guint) CLAMP ((body->height - 2 * th) / (2.4 * th), 2, 8), TRUE);
  for (guint i = 0; i < y->n_ticks; i++)
    {
      g_autofree char *s = hl_axis_label (y, y->ticks[i], f->locale);

      hl_text_measure (f->text, HL_FONT_SMALL, s, 0, &w, NULL);
      lab_w = MAX (lab_w, w);
    }
  area->x = body->x + th + tick + lab_w + 0.4 * f->text->base;
  area->y = body->y + 0.5 * th;
  area->width = body->x + body->width - area->x - 0.5 * th;
  area->height = body->y + body->height - area->y - 2 * th - tick - 0.3 * f->text->base;
  hl_axis_place (y, area->y + area->height, area->y);
  *label_height = th;
}

void
hl_axes_draw (HlFigure     *f,
              const HlRect *a,
              const HlAxis *x,
              const HlAxis *y)
{
  cairo_t *cr = f->cr;
  double tick = hl_axes_tick_length (f);

  cairo_save (cr);
  cairo_set_line_width (cr, 0.5 * f->lw);
  hl_palette_set_source (cr, f->pal->grid);
  for (guint i = 0; i < y->n_ticks; i++)
    {
      double p = hl_axis_map (y, y->ticks[i]);

      cairo_move_to (cr, a->x, p);
      cairo_line_to (cr, a->x + a->width, p);
    }
  for (guint i = 0; i < x->n_ticks; i++)
    {
      double p = hl_axis_map (x, x->ticks[i]);

      cairo_move_to (cr, p, a->y);
      cairo_line_to (cr, p, a->y + a->height);
    }
  cairo_stroke (cr);

  hl_palette_set_source (cr, f->pal->ink);
  cairo_set_line_width (cr, 0.8 * f->lw);
  cairo_rectangle (cr, a->x, a->y, a->width, a->height);
  cairo_stroke (cr);
  for (guint i = 0; i < y->n_ticks; i++)
    {
      double p = hl_axis_map (y, y->ticks[i]);
      g_autofree char *s = hl_axis_label (y, y->ticks[i], f->locale);

      cairo_move_to (cr, a->x - tick, p);
      cairo_line_to (cr, a->x, p);
      hl_text_draw (f->text, HL_FONT_SMALL, s, a->x - tick - 0.2 * f->text->base, p, 1, 0.5, 0, f->pal->ink);
    }
  /* x labels by rank: a log axis labels its decades first, then 2 and
   * 5 where they fit between; a label that would touch one already
   * placed is left out, its tick stays */
  {
    HlRect placed[HL_AXIS_MAX_TICKS];
    guint n_placed = 0;

    for (int rank = 0; rank < (x->log ? 2 : 1); rank++)
      for (guint i = 0; i < x->n_ticks; i++)
        {
          double p = hl_axis_map (x, x->ticks[i]);
          double mant = x->ticks[i] / pow (10, floor (log10 (x->ticks[i]) + 1e-9));
          gboolean decade = !x->log || fabs (mant - 1) < 1e-6;
          g_autofree char *s = NULL;
          /* labels on the corners stay inside the frame's width, clear
           * of the lowest y label and of the next panel */
          double ax = fabs (p - a->x) < 0.5 ? 0 : fabs (p - a->x - a->width) < 0.5 ? 1 : 0.5;
          double w, h;
          HlRect r;
          gboolean clear = TRUE;

          if (decade != (rank == 0))
            continue;
          cairo_move_to (cr, p, a->y + a->height);
          cairo_line_to (cr, p, a->y + a->height + tick);
          s = hl_axis_label (x, x->ticks[i], f->locale);
          hl_text_measure (f->text, HL_FONT_SMALL, s, 0, &w, &h);
          r = (HlRect) { p - ax * w - 0.3 * f->text->base, a->y + a->height + tick, w + 0.6 * f->text->base, h };
          for (guint k = 0; k < n_placed && clear; k++)
            clear = !hl_rect_overlaps (&r, &placed[k]);
          if (!clear)
            continue;
          placed[n_placed++] = r;
          hl_text_draw (f->text, HL_FONT_SMALL, s, p, a->y + a->height + tick, ax, 0, 0, f->pal->ink);
        }
  }
  for (guint i = 0; i < x->n_minor; i++)
    {
      double p = hl_axis_map (x, x->minor[i]);

      cairo_move_to (cr, p, a->y + a->height);
      cairo_line_to (cr, p, a->y + a->height + tick * 0.6);
    }
  cairo_stroke (cr);
  cairo_restore (cr);
}
