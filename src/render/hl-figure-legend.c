/* hl-figure-legend.c — the wall's hoop-stress shading and its colour key
 *
 * The key runs from the lowest to the highest Lamé hoop stress in the
 * wall, the same range hl_wall_fill() maps onto the colour scale.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-legend"

#include "hl-figure-private.h"

#include <math.h>
#include <string.h>

typedef struct
{
  HlAxis axis;
  double bar_len, bar_thick;
  double title_w, title_h, label_w, label_h;
  double hatch_w, hatch_h;
  double end_gap;
  gboolean band;
  gboolean uniform;
  char *heading;     /* name, unit and, when the stress varies little, its range */
  char *range;
} Legend;

static const char *
title (HlFigure *f)
{
  return f->sol->inputs.form == HL_FORM_SPHERE ? _("σθ Lamé (tangential)") : _("σθ Lamé (hoop)");
}

/* the swatch's label in a narrow column, but never narrower than its
 * longest word ("Korrosionszuschlag") */
static double
swatch_wrap (HlFigure *f)
{
  return MAX (5.5 * f->text->base, hl_text_longest_word (f->text, HL_FONT_TINY, _("corrosion allowance")) + 0.1);
}

/* "77.39 – 78.4, range 1.4 %": a wall whose hoop stress varies by a few
 * per cent still runs the whole colour scale, so the key says how
 * little that is; NULL when the stress varies by a tenth or more */
static char *
range_text (HlFigure *f,
            double    lo,
            double    hi)
{
  double big = MAX (fabs (lo), fabs (hi)), rel = 100 * (hi - lo) / big;
  /* enough digits to tell the ends apart */
  int digits = CLAMP ((int) ceil (log10 (big / (hi - lo))) + 2, 3, 8);
  g_autofree char *a = NULL, *b = NULL, *r = NULL, *r_pct = NULL;

  if (!(rel < 10))
    return NULL;
  a = hl_figure_format_sig (hl_stress_value (f, lo), digits, f->locale);
  b = hl_figure_format_sig (hl_stress_value (f, hi), digits, f->locale);
  r = hl_figure_format_sig (rel, 2, f->locale);
  r_pct = g_strdup_printf ("%s" HL_NBSP "%%", r);
  /* TRANSLATORS: lowest and highest hoop stress in the wall, their difference in percent */
  return g_strdup_printf (_("%s – %s, range %s"), a, b, r_pct);
}

/* nice values at least a label apart: as many as fit, three or more
 * when the bar has the length */
static void
choose_ticks (HlFigure *f,
              Legend   *l,
              double    lo,
              double    hi,
              gboolean  vertical)
{
  for (guint target = 8; target >= 2; target--)
    {
      double widest = 0, w, spacing;

      hl_axis_linear (&l->axis, lo, hi, target, FALSE);
      for (guint i = 0; i < l->axis.n_ticks; i++)
        {
          g_autofree char *s = hl_axis_label (&l->axis, l->axis.ticks[i], f->locale);

          hl_text_measure (f->text, HL_FONT_TINY, s, 0, &w, NULL);
          widest = MAX (widest, w);
        }
      spacing = l->bar_len * l->axis.step / (hi - lo);
      if (spacing >= (vertical ? 1.3 * l->label_h : widest + 0.8 * f->text->base))
        return;
    }
}

static void
legend_clear (Legend *l)
{
  g_free (l->heading);
  g_free (l->range);
}

/* the one value of a uniform field, with its unit: the key's only label */
static char *
tick_text (HlFigure *f,
           Legend   *l,
           guint     i)
{
  double lo, hi;

  if (!l->uniform)
    return hl_axis_label (&l->axis, l->axis.ticks[i], f->locale);
  hl_wall_hoop_range (f->sol, &lo, &hi);
  return hl_figure_format_sig (hl_stress_value (f, lo), 4, f->locale);
}

/* @room: the height a vertical legend may take; the bar shrinks to fit */
static void
legend_plan (HlFigure *f,
             Legend   *l,
             gboolean  vertical,
             double    room)
{
  double lo, hi, w, h;
  double a_new, a_cor, dummy;

  memset (l, 0, sizeof *l);
  hl_wall_hoop_range (f->sol, &lo, &hi);
  l->uniform = hl_wall_scale_uniform (f->sol);
  l->range = l->uniform ? NULL : range_text (f, lo, hi);
  l->heading = l->range != NULL ? g_strdup_printf ("%s, %s\n%s", title (f), hl_stress_unit (f), l->range)
                                : g_strdup_printf ("%s, %s", title (f), hl_stress_unit (f));
  hl_text_measure (f->text, HL_FONT_TINY, "0", 0, NULL, &l->label_h);
  hl_text_measure (f->text, HL_FONT_TINY, l->heading, vertical ? 7 * f->text->base : 0, &l->title_w, &l->title_h);
  hl_shell_inputs_radii (&f->sol->inputs, FALSE, &a_new, &dummy);
  hl_shell_inputs_radii (&f->sol->inputs, TRUE, &a_cor, &dummy);
  l->band = a_cor > a_new;
  l->hatch_w = l->hatch_h = 0;
  if (l->band)
    {
      hl_text_measure (f->text, HL_FONT_TINY, _("corrosion allowance"), vertical ? swatch_wrap (f) : 0, &w, &h);
      l->hatch_w = 1.6 * f->text->base + w;
      l->hatch_h = MAX (h, 0.9 * f->text->base);
    }
  l->bar_thick = 0.8 * f->text->base;
  l->bar_len = 9 * f->text->base;
  /* the end labels stand half their height beyond the bar */
  l->end_gap = MAX (f->gap, l->label_h / 2 + 0.15 * f->text->base);
  if (vertical)
    l->bar_len = CLAMP (room - l->title_h - 2 * l->end_gap - (l->band ? l->hatch_h : 0), 3 * f->text->base,
                        l->bar_len);
  if (l->uniform)
    l->axis.n_ticks = 1;
  else
    choose_ticks (f, l, hl_stress_value (f, lo), hl_stress_value (f, hi), vertical);
  l->label_w = 0;
  for (guint i = 0; i < l->axis.n_ticks; i++)
    {
      g_autofree char *s = tick_text (f, l, i);

      hl_text_measure (f->text, HL_FONT_TINY, s, 0, &w, &h);
      l->label_w = MAX (l->label_w, w);
      l->label_h = MAX (l->label_h, h);
    }
}

void
hl_stress_legend_size (HlFigure *f,
                       gboolean  vertical,
                       double    room,
                       double   *width,
                       double   *height)
{
  Legend l;
  double tick = 0.3 * f->text->base;

  legend_plan (f, &l, vertical, room);
  legend_clear (&l);
  if (vertical)
    {
      *width = MAX (MAX (l.title_w, l.bar_thick + tick + l.label_w + 0.3 * f->text->base), l.hatch_w);
      *height = l.title_h + l.end_gap + l.bar_len + (l.band ? l.end_gap + l.hatch_h : 0);
    }
  else
    {
      *width = l.title_w + f->gap + l.bar_len + l.label_w + (l.band ? 2 * f->gap + l.hatch_w : 0);
      *height = MAX (l.title_h, l.bar_thick + tick + l.label_h);
    }
}

static void
hatch_swatch (HlFigure *f,
              double    x,
              double    y,
              double    wrap)
{
  double sz = 0.9 * f->text->base;

  cairo_rectangle (f->cr, x, y, sz, sz);
  hl_hatch (f);
  cairo_new_path (f->cr);
  cairo_save (f->cr);
  cairo_rectangle (f->cr, x, y, sz, sz);
  cairo_set_line_width (f->cr, 0.6 * f->lw);
  hl_palette_set_source (f->cr, f->pal->ink);
  cairo_stroke (f->cr);
  cairo_restore (f->cr);
  hl_text_draw (f->text, HL_FONT_TINY, _("corrosion allowance"), x + 1.6 * f->text->base, y + sz / 2, 0, 0.5, wrap,
                f->pal->muted);
}

static void
draw_bar (HlFigure     *f,
          Legend       *l,
          const HlRect *bar,
          gboolean      vertical)
{
  cairo_t *cr = f->cr;
  double tick = 0.3 * f->text->base;
  cairo_pattern_t *pat;
  const int steps = 12;

  /* the bar's own gradient runs lowest to highest stress; one stress
   * all through the wall is the one colour the wall is painted in */
  if (l->uniform)
    {
      HlRgb c = hl_palette_scale (0.5);

      pat = cairo_pattern_create_rgb (c.r, c.g, c.b);
    }
  else if (vertical)
    pat = cairo_pattern_create_linear (0, bar->y + bar->height, 0, bar->y);
  else
    pat = cairo_pattern_create_linear (bar->x, 0, bar->x + bar->width, 0);
  for (int i = 0; i <= steps && !l->uniform; i++)
    {
      HlRgb c = hl_palette_scale ((double) i / steps);

      cairo_pattern_add_color_stop_rgb (pat, (double) i / steps, c.r, c.g, c.b);
    }
  cairo_rectangle (cr, bar->x, bar->y, bar->width, bar->height);
  cairo_set_source (cr, pat);
  cairo_fill (cr);
  cairo_pattern_destroy (pat);
  cairo_save (cr);
  cairo_rectangle (cr, bar->x, bar->y, bar->width, bar->height);
  cairo_set_line_width (cr, 0.6 * f->lw);
  hl_palette_set_source (cr, f->pal->ink);
  cairo_stroke (cr);
  /* the bar runs light to dark, bottom to top or left to right; the
   * lowest stress sits at the light end, the most negative one at the
   * dark end when the wall is in compression */
  {
    double light = vertical ? bar->y + bar->height : bar->x;
    double dark = vertical ? bar->y : bar->x + bar->width;

    if (l->uniform)
      {
        /* the one value in the middle of the bar */
        l->axis.v0 = l->axis.ticks[0] - 1;
        l->axis.v1 = l->axis.ticks[0] + 1;
        hl_axis_place (&l->axis, light, dark);
      }
    else if (hl_wall_scale_reversed (f->sol))
      hl_axis_place (&l->axis, dark, light);
    else
      hl_axis_place (&l->axis, light, dark);
  }
  for (guint i = 0; i < l->axis.n_ticks; i++)
    {
      double p = hl_axis_map (&l->axis, l->axis.ticks[i]);
      g_autofree char *s = tick_text (f, l, i);

      if (vertical)
        {
          cairo_move_to (cr, bar->x + bar->width, p);
          cairo_line_to (cr, bar->x + bar->width + tick, p);
          hl_text_draw (f->text, HL_FONT_TINY, s, bar->x + bar->width + tick + 0.15 * f->text->base, p, 0, 0.5, 0,
                        f->pal->ink);
        }
      else
        {
          cairo_move_to (cr, p, bar->y + bar->height);
          cairo_line_to (cr, p, bar->y + bar->height + tick);
          hl_text_draw (f->text, HL_FONT_TINY, s, p, bar->y + bar->height + tick, 0.5, 0, 0, f->pal->ink);
        }
    }
  cairo_stroke (cr);
  cairo_restore (cr);
}

void
hl_stress_legend_draw (HlFigure     *f,
                       const HlRect *area,
                       gboolean      vertical)
{
  HlLegendGeometry *g = &f->geom->legend;
  Legend l;
  HlRect bar;

  legend_plan (f, &l, vertical, area->height);
  g->drawn = TRUE;
  g->n_ticks = l.axis.n_ticks;
  g->uniform = l.uniform;
  g_strlcpy (g->range, l.range != NULL ? l.range : "", sizeof g->range);
  if (vertical)
    {
      HlRect r = hl_text_draw (f->text, HL_FONT_TINY, l.heading, area->x, area->y, 0, 0, 7 * f->text->base,
                               f->pal->ink);

      bar.x = area->x;
      bar.y = r.y + r.height + l.end_gap;
      bar.width = l.bar_thick;
      bar.height = l.bar_len;
      draw_bar (f, &l, &bar, TRUE);
      if (l.band)
        /* the swatch's label is centred on it: its top, not the
         * swatch's, keeps clear of the bar's last label */
        hatch_swatch (f, area->x, bar.y + bar.height + l.end_gap + (l.hatch_h - 0.9 * f->text->base) / 2,
                      swatch_wrap (f));
    }
  else
    {
      double x = area->x, ticked = l.bar_thick + 0.3 * f->text->base + l.label_h;
      /* a heading of two lines (with the range) is as tall as the bar
       * with its labels: both centred in the row */
      double bar_y = area->y + MAX (0, (l.title_h - ticked) / 2);
      double title_y = MAX (area->y, bar_y + l.bar_thick / 2 - l.title_h / 2);

      hl_text_draw (f->text, HL_FONT_TINY, l.heading, x, title_y, 0, 0, 0, f->pal->ink);
      x += l.title_w + f->gap + l.label_w / 2;
      bar.x = x;
      bar.y = bar_y;
      bar.width = l.bar_len;
      bar.height = l.bar_thick;
      draw_bar (f, &l, &bar, FALSE);
      x += l.bar_len + l.label_w / 2 + 2 * f->gap;
      if (l.band)
        hatch_swatch (f, x, bar_y, 0);
    }
  legend_clear (&l);
}
