/* hl-figure-chart.c — how thin is thin: the thin-wall error against R/t
 *
 * The curve comes from the engine: for each mean-radius/thickness ratio
 * m a wall a = 1, b = (2m + 1)/(2m - 1) (whose mean radius over
 * thickness is m) is loaded with this shell's pressures and material,
 * and hl_thin_wall_error() gives the error for this form, end condition,
 * radius basis and verdict measure.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-chart"

#include "hl-figure-private.h"

#include <math.h>

#define N_CURVE 160
#define M_MIN 0.5
#define M_MAX 1000.0
#define RULE_OF_THUMB 10.0   /* common practice: R/t >= 10 is thin */
#define ERROR_CLIP 150.0

guint
hl_chart_curve (const HlSolution *sol,
                double            m_lo,
                double            m_hi,
                guint             n,
                double           *m,
                double           *error)
{
  guint finite = 0;

  for (guint i = 0; i < n; i++)
    {
      HlLame l;
      double b;

      /* m = 0.5 is a wall with no bore; stay just above it */
      m[i] = exp (log (MAX (m_lo, M_MIN * 1.0005)) + (log (m_hi) - log (MAX (m_lo, M_MIN * 1.0005))) * i / (n - 1));
      b = (2 * m[i] + 1) / (2 * m[i] - 1);
      hl_lame_init (&l, sol->inputs.form, sol->inputs.ends, 1.0, b, sol->pi, sol->po, sol->lame.E, sol->lame.nu);
      error[i] = hl_thin_wall_error (&l, sol->inputs.thin_basis, sol->inputs.verdict_measure);
      finite += isfinite (error[i]) ? 1 : 0;
    }
  return finite;
}

static HlResult
design_error (const HlSolution *sol)
{
  return sol->inputs.verdict_measure == HL_MEASURE_EQUIVALENT ? sol->thin_wall_error_equivalent : sol->thin_wall_error;
}

typedef struct
{
  HlRect boxes[8];
  guint  n_boxes;
  double px[N_CURVE], py[N_CURVE];
  guint  n_points;
  HlRect area;
} Obstacles;

static int
conflicts (const Obstacles *o,
           const HlRect    *r)
{
  int n = 0;

  if (r->x < o->area.x || r->y < o->area.y || r->x + r->width > o->area.x + o->area.width
      || r->y + r->height > o->area.y + o->area.height)
    n += 100;
  for (guint i = 0; i < o->n_boxes; i++)
    n += hl_rect_overlaps (r, &o->boxes[i]) ? 10 : 0;
  for (guint i = 0; i < o->n_points; i++)
    n += o->px[i] >= r->x && o->px[i] <= r->x + r->width && o->py[i] >= r->y && o->py[i] <= r->y + r->height;
  return n;
}

/* the candidate box (anchor x, y with fractions ax, ay) with fewest
 * conflicts; the winner joins the obstacles.  A label that lands away
 * from (@px, @py) gets a leader to it; every label sits on a paper halo
 * so a grid line or curve under it cannot hide it. */
static HlRect
place (HlFigure      *f,
       Obstacles     *o,
       HlFontRole     role,
       const char    *text,
       const double (*cand)[4],
       guint          n_cand,
       double         px,
       double         py,
       HlRgb          colour)
{
  double w, h, halo = 0.15 * f->text->base;
  int best = -1, best_score = G_MAXINT;
  HlRect r, c;

  hl_text_measure (f->text, role, text, 0, &w, &h);
  for (guint i = 0; i < n_cand; i++)
    {
      int score;

      double m = 0.35 * f->text->base;

      /* a margin round the text, so a curve does not graze it */
      c = (HlRect) { cand[i][0] - cand[i][2] * w - m, cand[i][1] - cand[i][3] * h - m, w + 2 * m, h + 2 * m };
      /* prefer the nearer places when both are clear */
      score = conflicts (o, &c) * 4 + (int) (i / 4);
      if (score < best_score)
        {
          best_score = score;
          best = (int) i;
        }
    }
  c = (HlRect) { cand[best][0] - cand[best][2] * w, cand[best][1] - cand[best][3] * h, w, h };
  if (isfinite (px) && (px < c.x - 2 * halo || px > c.x + c.width + 2 * halo)
      && (py < c.y - 1.2 * f->text->base || py > c.y + c.height + 1.2 * f->text->base))
    {
      cairo_save (f->cr);
      hl_palette_set_source (f->cr, f->pal->muted);
      cairo_set_line_width (f->cr, 0.6 * f->lw);
      cairo_move_to (f->cr, px, py);
      cairo_line_to (f->cr, CLAMP (px, c.x, c.x + c.width), py < c.y ? c.y : c.y + c.height);
      cairo_stroke (f->cr);
      cairo_restore (f->cr);
    }
  cairo_save (f->cr);
  cairo_rectangle (f->cr, c.x - halo, c.y, c.width + 2 * halo, c.height);
  hl_palette_set_source_a (f->cr, f->pal->paper, 0.8);
  cairo_fill (f->cr);
  cairo_restore (f->cr);
  r = hl_text_draw (f->text, role, text, cand[best][0], cand[best][1], cand[best][2], cand[best][3], 0, colour);
  if (o->n_boxes < G_N_ELEMENTS (o->boxes))
    o->boxes[o->n_boxes++] = r;
  return r;
}

static char *
subtitle (HlFigure *f)
{
  const HlSolution *sol = f->sol;
  const HlShellInputs *in = &sol->inputs;
  const char *basis = in->thin_basis == HL_BASIS_INNER ? _("inner radius")
                      : in->thin_basis == HL_BASIS_OUTER ? _("outer radius") : _("mean radius");
  const char *measure = in->verdict_measure == HL_MEASURE_EQUIVALENT ? _("von Mises stress") : _("hoop stress");
  GString *s = g_string_new (NULL);

  g_string_printf (s, "%s; %s; %s", hl_figure_form_text (in), basis, measure);
  if (hl_result_ok (sol->ratio_for_tolerance))
    {
      g_autofree char *m = hl_figure_format_sig (sol->ratio_for_tolerance.value, 3, f->locale);

      g_autofree char *bound = g_strdup_printf ("R/t" HL_NBSP "≥" HL_NBSP "%s", m);

      g_string_append (s, "; ");
      g_string_append_printf (s, _("within tolerance for %s"), bound);
    }
  return g_string_free (s, FALSE);
}

static void
y_range (const HlSolution *sol,
         const double     *err,
         guint             n,
         double           *lo,
         double           *hi)
{
  HlResult d = design_error (sol);

  *lo = -sol->tolerance;
  *hi = sol->tolerance;
  for (guint i = 0; i < n; i++)
    if (isfinite (err[i]))
      {
        *lo = MIN (*lo, err[i]);
        *hi = MAX (*hi, err[i]);
      }
  if (hl_result_ok (d))
    {
      *lo = MIN (*lo, d.value);
      *hi = MAX (*hi, d.value);
    }
  *lo = MAX (*lo, -ERROR_CLIP);
  *hi = MIN (*hi, ERROR_CLIP);
}

typedef struct
{
  double m[N_CURVE], err[N_CURVE];
  double th;
  char  *subtitle;
} Layout;

static void
layout (HlFigure     *f,
        const HlRect *area,
        Layout       *l)
{
  const HlSolution *sol = f->sol;
  HlChartGeometry *g = &f->geom->chart;
  double lo, hi, m_hi;
  HlRect body = *area;

  l->subtitle = subtitle (f);
  body.y += hl_panel_heading_height (f, area->width, _("Thin-wall error against R/t"), l->subtitle);
  body.height -= body.y - area->y;
  m_hi = MAX (M_MAX, pow (10, ceil (log10 (MAX (sol->mean_ratio, 1.0)))));
  hl_chart_curve (sol, M_MIN, m_hi, N_CURVE, l->m, l->err);
  y_range (sol, l->err, N_CURVE, &lo, &hi);
  hl_axes_layout (f, &body, lo, hi, &g->y, &g->area, &l->th);
  hl_axis_log (&g->x, M_MIN, m_hi, g->area.width > 30 * f->text->base);
  hl_axis_place (&g->x, g->area.x, g->area.x + g->area.width);
}

gboolean
hl_chart_fits (HlFigure     *f,
               const HlRect *area)
{
  HlChartGeometry saved = f->geom->chart;
  Layout l;
  gboolean fits;

  layout (f, area, &l);
  fits = f->geom->chart.area.width >= 14 * f->text->base && f->geom->chart.area.height >= 6 * f->text->base;
  g_free (l.subtitle);
  f->geom->chart = saved;
  return fits;
}

void
hl_chart_draw (HlFigure     *f,
               const HlRect *area)
{
  const HlSolution *sol = f->sol;
  HlChartGeometry *g = &f->geom->chart;
  cairo_t *cr = f->cr;
  Layout l;
  double *m = l.m, *err = l.err, th, tick = hl_axes_tick_length (f);
  HlResult d = design_error (sol);
  Obstacles obs = { 0 };
  HlRect *a = &g->area;

  layout (f, area, &l);
  th = l.th;
  hl_panel_heading (f, area, _("Thin-wall error against R/t"), l.subtitle);
  g->drawn = TRUE;
  obs.area = *a;

  /* tolerance band under the grid, then the rule of thumb and the curve
   * over both, clipped to the axes */
  {
    double y0 = hl_axis_map (&g->y, sol->tolerance), y1 = hl_axis_map (&g->y, -sol->tolerance);

    cairo_save (cr);
    cairo_rectangle (cr, a->x, a->y, a->width, a->height);
    cairo_clip (cr);
    cairo_rectangle (cr, a->x, y0, a->width, y1 - y0);
    hl_palette_set_source_a (cr, f->pal->band, f->pal->band_alpha);
    cairo_fill (cr);
    cairo_restore (cr);
  }
  hl_axes_draw (f, &g->area, &g->x, &g->y);
  cairo_save (cr);
  cairo_rectangle (cr, a->x, a->y, a->width, a->height);
  cairo_clip (cr);
  {
    double x = hl_axis_map (&g->x, RULE_OF_THUMB);

    hl_palette_set_source (cr, f->pal->rule);
    cairo_set_line_width (cr, 1.0 * f->lw);
    hl_palette_set_dash (cr, HL_DASH_DASHED, f->lw);
    cairo_move_to (cr, x, a->y);
    cairo_line_to (cr, x, a->y + a->height);
    cairo_stroke (cr);
    hl_palette_set_dash (cr, HL_DASH_SOLID, 1);
    /* labels keep off the line */
    obs.boxes[obs.n_boxes++] = (HlRect) { x - f->lw, a->y, 2 * f->lw, a->height };
  }
  {
    gboolean pen = FALSE;

    for (guint i = 0; i < N_CURVE; i++)
      {
        double x = hl_axis_map (&g->x, m[i]), y;

        if (!isfinite (err[i]))
          {
            pen = FALSE;
            continue;
          }
        y = hl_axis_map (&g->y, CLAMP (err[i], -2 * ERROR_CLIP, 2 * ERROR_CLIP));
        if (pen)
          cairo_line_to (cr, x, y);
        else
          cairo_move_to (cr, x, y);
        pen = TRUE;
        obs.px[obs.n_points] = x;
        obs.py[obs.n_points++] = y;
      }
    hl_palette_set_source (cr, f->pal->hoop);
    cairo_set_line_width (cr, 2.0 * f->lw);
    cairo_set_line_join (cr, CAIRO_LINE_JOIN_ROUND);
    cairo_stroke (cr);
  }
  cairo_restore (cr);

  {
    double xr = hl_axis_map (&g->x, RULE_OF_THUMB), pad = 0.3 * f->text->base;
    double y_top = hl_axis_map (&g->y, sol->tolerance), y_bot = hl_axis_map (&g->y, -sol->tolerance);
    g_autofree char *tol = hl_figure_format_sig (sol->tolerance, 3, f->locale);
    g_autofree char *tol_pct = g_strdup_printf ("±%s" HL_NBSP "%%", tol);
    g_autofree char *tol_text = g_strdup_printf (_("tolerance %s"), tol_pct);
    g_autofree char *rule_text = g_strdup_printf (_("rule of thumb %s"), "R/t" HL_NBSP "=" HL_NBSP "10");
    const double rule_cand[][4] = {
      { xr + pad, a->y + pad, 0, 0 }, { xr - pad, a->y + pad, 1, 0 },
      { xr + pad, a->y + a->height - pad, 0, 1 }, { xr - pad, a->y + a->height - pad, 1, 1 },
    };
    const double tol_cand[][4] = {
      { a->x + a->width - pad, (y_top + y_bot) / 2, 1, 0.5 }, { a->x + a->width - pad, y_top - pad, 1, 1 },
      { a->x + a->width - pad, y_bot + pad, 1, 0 }, { a->x + pad, y_top - pad, 0, 1 },
      { a->x + pad, y_bot + pad, 0, 0 },
    };

    place (f, &obs, HL_FONT_TINY, rule_text, rule_cand, G_N_ELEMENTS (rule_cand),
           NAN, NAN, f->pal->muted);
    place (f, &obs, HL_FONT_TINY, tol_text, tol_cand, G_N_ELEMENTS (tol_cand), NAN, NAN, f->pal->muted);
  }

  if (hl_result_ok (d))
    {
      double x = hl_axis_map (&g->x, sol->mean_ratio);
      double y = hl_axis_map (&g->y, CLAMP (d.value, g->y.v0, g->y.v1));
      double o = 0.6 * f->text->base;
      g_autofree char *mr = hl_figure_format_sig (sol->mean_ratio, 3, f->locale);
      g_autofree char *e = hl_figure_format_sig (d.value, 2, f->locale);
      g_autofree char *values = g_strdup_printf ("R/t" HL_NBSP "=" HL_NBSP "%s, %s" HL_NBSP "%%", mr, e);
      g_autofree char *label = g_strdup_printf (_("this design: %s"), values);
      const double cand[][4] = {
        { x + o, y - o, 0, 1 }, { x + o, y + o, 0, 0 }, { x - o, y - o, 1, 1 }, { x - o, y + o, 1, 0 },
        { x + o, y - 2.5 * o, 0, 1 }, { x + o, y + 2.5 * o, 0, 0 }, { x - o, y - 2.5 * o, 1, 1 },
        { x - o, y + 2.5 * o, 1, 0 }, { x, y - 1.8 * o, 0.5, 1 }, { x, y + 1.8 * o, 0.5, 0 },
        { x, y - 1.8 * o, 0.8, 1 }, { x, y + 1.8 * o, 0.8, 0 }, { x, y - 1.8 * o, 0.2, 1 },
        { x, y + 1.8 * o, 0.2, 0 }, { x + 3 * o, y + 4 * o, 0, 0 }, { x + 3 * o, y - 4 * o, 0, 1 },
        { x - 3 * o, y + 4 * o, 1, 0 }, { x - 3 * o, y - 4 * o, 1, 1 }, { x + 3 * o, y + 7 * o, 0, 0 },
        { x - 3 * o, y + 7 * o, 1, 0 }, { x + 3 * o, y - 7 * o, 0, 1 }, { x - 3 * o, y - 7 * o, 1, 1 },
      };

      g->design_x = x;
      g->design_y = y;
      /* the marker goes over its leader: draw it after the label */
      obs.boxes[obs.n_boxes++] = (HlRect) { x - 0.75 * o, y - 0.75 * o, 1.5 * o, 1.5 * o };
      place (f, &obs, HL_FONT_SMALL, label, cand, G_N_ELEMENTS (cand), x, y, f->pal->ink);
      hl_marker (f, x, y, 0.9 * f->text->base);
    }

  {
    g_autofree char *yt = g_strdup (_("thin-wall error, %"));

    hl_text_draw (f->text, HL_FONT_SMALL, _("mean radius / thickness R/t (log scale)"), a->x + a->width / 2,
                  a->y + a->height + tick + th, 0.5, 0, 0, f->pal->muted);
    hl_text_draw_up (f->text, HL_FONT_SMALL, yt, area->x + th / 2, a->y + a->height / 2, f->pal->muted);
  }
  g_free (l.subtitle);
}
