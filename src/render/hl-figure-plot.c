/* hl-figure-plot.c — stresses through the wall: Lamé curves, thin-wall lines
 *
 * Reads the solution's points; the thin-wall hoop is the solution's
 * membrane value, the thin-wall radial stress is zero by convention.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-plot"

#include "hl-figure-private.h"

#include <math.h>
#include <string.h>

typedef enum
{
  CURVE_HOOP,
  CURVE_THIN_HOOP,
  CURVE_RADIAL,
  CURVE_THIN_RADIAL,
  CURVE_AXIAL,
  CURVE_VON_MISES,
  CURVE_THIN_VON_MISES,
  CURVE_TRESCA,
  N_CURVES,
} Curve;

typedef struct
{
  gboolean shown;
  char    *label;
  HlRgb    colour;
  HlDash   dash;
  double   width;      /* times the base line width */
} CurveStyle;

typedef struct
{
  CurveStyle curves[N_CURVES];
  gboolean   band;
  double     a_new, a_cor;
  double     legend_w, legend_h;
  gboolean   legend_right;
  char      *subtitle;
} Plan;

static double
value_of (const HlWallPoint *p,
          Curve              c)
{
  switch (c)
    {
    case CURVE_HOOP:
      return p->hoop;
    case CURVE_THIN_HOOP:
      return p->thin_hoop;
    case CURVE_RADIAL:
      return p->radial;
    case CURVE_AXIAL:
      return p->axial;
    case CURVE_VON_MISES:
      return p->von_mises;
    case CURVE_THIN_VON_MISES:
      {
        /* the membrane state's equivalent stress, radial stress zero:
         * what the equivalent thin-wall verdict compares with Lamé */
        HlStress thin = { 0.0, p->thin_hoop, p->thin_axial };

        return hl_equivalent (thin, HL_CRITERION_VON_MISES);
      }
    case CURVE_TRESCA:
      return p->tresca;
    case CURVE_THIN_RADIAL:
    case N_CURVES:
    default:
      return 0.0;
    }
}

static void
plan_curves (HlFigure *f,
             Plan     *p)
{
  const HlSolution *sol = f->sol;
  const HlShellInputs *in = &sol->inputs;
  gboolean sphere = in->form == HL_FORM_SPHERE;
  const char *thin = in->thin_basis == HL_BASIS_INNER ? _("σθ thin wall (inner radius)")
                     : in->thin_basis == HL_BASIS_OUTER ? _("σθ thin wall (outer radius)")
                                                        : _("σθ thin wall (mean radius)");
  gboolean axial_zero = TRUE;
  double dummy;

  for (guint i = 0; i < sol->n_points; i++)
    axial_zero = axial_zero && sol->points[i].axial == 0.0;
  p->curves[CURVE_HOOP] = (CurveStyle) { TRUE, g_strdup (sphere ? _("σθ tangential, Lamé") : _("σθ hoop, Lamé")),
                                         f->pal->hoop, HL_DASH_SOLID, 2.0 };
  p->curves[CURVE_THIN_HOOP] = (CurveStyle) { TRUE, g_strdup (thin),
                                              f->pal->thin_hoop, HL_DASH_DASHED, 1.8 };
  p->curves[CURVE_RADIAL] = (CurveStyle) { TRUE, g_strdup (_("σr radial, Lamé")), f->pal->radial, HL_DASH_SOLID, 2.0 };
  p->curves[CURVE_THIN_RADIAL] = (CurveStyle) { TRUE, g_strdup (_("σr thin wall: 0 by convention")), f->pal->radial,
                                                HL_DASH_DOTTED, 1.8 };
  p->curves[CURVE_AXIAL] = (CurveStyle) { !sphere && !axial_zero,
                                          g_strdup (in->ends == HL_ENDS_PLANE_STRAIN ? _("σz axial, Lamé (plane strain)")
                                                                                     : _("σz axial, Lamé (closed ends)")),
                                          f->pal->axial, HL_DASH_DASH_DOT, 1.3 };
  p->curves[CURVE_VON_MISES] = (CurveStyle) { TRUE, g_strdup (_("σeq von Mises, Lamé")), f->pal->von_mises, HL_DASH_LONG,
                                              1.3 };
  /* the thin-wall line the verdict compares when it measures the
   * equivalent stress, dashed like the thin hoop */
  p->curves[CURVE_THIN_VON_MISES] = (CurveStyle) { in->verdict_measure != HL_MEASURE_HOOP,
                                                   g_strdup (_("σeq von Mises, thin wall")), f->pal->von_mises,
                                                   HL_DASH_DASHED, 1.8 };
  /* the criterion the wall is sized and checked by */
  p->curves[CURVE_TRESCA] = (CurveStyle) { in->sizing_criterion == HL_CRITERION_TRESCA,
                                           g_strdup (_("σeq Tresca, Lamé (criterion)")), f->pal->tresca,
                                           HL_DASH_DASH_DOT, 1.5 };
  hl_shell_inputs_radii (in, FALSE, &p->a_new, &dummy);
  hl_shell_inputs_radii (in, TRUE, &p->a_cor, &dummy);
  p->band = p->a_cor > p->a_new;
}

static void
plan_subtitle (HlFigure *f,
               Plan     *p)
{
  const HlSolution *sol = f->sol;
  gboolean inner = fabs (sol->points[0].hoop) >= fabs (sol->points[sol->n_points - 1].hoop);
  double peak = inner ? sol->points[0].hoop : sol->points[sol->n_points - 1].hoop;
  g_autofree char *peak_s = hl_stress_text (f, peak, 4);
  g_autofree char *thin_s = hl_stress_text (f, sol->points[0].thin_hoop, 4);

  if (hl_result_ok (sol->thin_wall_error))
    {
      g_autofree char *err = hl_figure_format_sig (sol->thin_wall_error.value, 2, f->locale);

      g_autofree char *pct = g_strdup_printf ("%s" HL_NBSP "%%", err);

      p->subtitle = g_strdup_printf (inner ? _("Peak Lamé σθ %s (inner surface); thin wall σθ %s; difference %s")
                                           : _("Peak Lamé σθ %s (outer surface); thin wall σθ %s; difference %s"),
                                     peak_s, thin_s, pct);
    }
  else
    p->subtitle = g_strdup_printf (_("Peak Lamé σθ %s; thin wall σθ %s"), peak_s, thin_s);
}

static void
plan_clear (Plan *p)
{
  for (int i = 0; i < N_CURVES; i++)
    g_free (p->curves[i].label);
  g_free (p->subtitle);
}

static double
sample_width (HlFigure *f)
{
  return 2.6 * f->text->base;
}

static void
legend_entries_size (HlFigure *f,
                     Plan     *p,
                     double   *w,
                     double   *h)
{
  double lw, lh;

  *w = *h = 0;
  for (int i = 0; i < N_CURVES; i++)
    if (p->curves[i].shown)
      {
        hl_text_measure (f->text, HL_FONT_SMALL, p->curves[i].label, 0, &lw, &lh);
        *w = MAX (*w, lw);
        *h = MAX (*h, lh);
      }
  if (p->band)
    {
      hl_text_measure (f->text, HL_FONT_SMALL, _("corrosion allowance"), 0, &lw, &lh);
      *w = MAX (*w, lw);
    }
  *w += sample_width (f) + 0.5 * f->text->base;
}

static int
n_entries (Plan *p)
{
  int n = p->band ? 1 : 0;

  for (int i = 0; i < N_CURVES; i++)
    n += p->curves[i].shown ? 1 : 0;
  return n;
}

static void
legend_sample (HlFigure         *f,
               const CurveStyle *c,
               double            x,
               double            y)
{
  cairo_save (f->cr);
  hl_palette_set_source (f->cr, c->colour);
  cairo_set_line_width (f->cr, c->width * f->lw);
  hl_palette_set_dash (f->cr, c->dash, f->lw);
  cairo_move_to (f->cr, x, y);
  cairo_line_to (f->cr, x + sample_width (f) - 0.3 * f->text->base, y);
  cairo_stroke (f->cr);
  cairo_restore (f->cr);
}

/* entries in columns of @col_w, wrapping into rows when @area is narrow */
static void
draw_legend (HlFigure     *f,
             Plan         *p,
             const HlRect *area,
             double        col_w,
             double        row_h)
{
  int cols = MAX (1, (int) floor ((area->width + 0.01) / col_w));
  int k = 0;

  for (int i = 0; i <= N_CURVES; i++)
    {
      double x = area->x + (k % cols) * col_w, y = area->y + (k / cols) * row_h + row_h / 2;

      if (i < N_CURVES && !p->curves[i].shown)
        continue;
      if (i == N_CURVES && !p->band)
        continue;
      if (i < N_CURVES)
        {
          legend_sample (f, &p->curves[i], x, y);
          hl_text_draw (f->text, HL_FONT_SMALL, p->curves[i].label, x + sample_width (f), y, 0, 0.5, 0, f->pal->ink);
        }
      else
        {
          double sz = 0.8 * f->text->base;

          cairo_rectangle (f->cr, x, y - sz / 2, sample_width (f) - 0.3 * f->text->base, sz);
          hl_hatch (f);
          cairo_new_path (f->cr);
          hl_text_draw (f->text, HL_FONT_SMALL, _("corrosion allowance"), x + sample_width (f), y, 0, 0.5, 0,
                        f->pal->ink);
        }
      k++;
    }
}

static void
y_range (const HlSolution *sol,
         Plan             *p,
         double           *lo,
         double           *hi)
{
  *lo = 0.0;
  /* the allowable and the yield are on the plot, so the margin shows */
  *hi = MAX (isfinite (sol->allowable) ? sol->allowable : 0.0, isfinite (sol->yield) ? sol->yield : 0.0);
  for (guint i = 0; i < sol->n_points; i++)
    for (int c = 0; c < N_CURVES; c++)
      if (p->curves[c].shown)
        {
          *lo = MIN (*lo, value_of (&sol->points[i], c));
          *hi = MAX (*hi, value_of (&sol->points[i], c));
        }
}

static void
draw_axes (HlFigure       *f,
           HlPlotGeometry *g)
{
  cairo_t *cr = f->cr;
  HlRect *a = &g->area;

  hl_axes_draw (f, a, &g->x, &g->y);
  cairo_save (cr);
  /* the zero line carries the thin-wall radial stress: keep it visible */
  if (g->y.v0 < 0 && g->y.v1 > 0)
    {
      double y0 = hl_axis_map (&g->y, 0);

      hl_palette_set_source (cr, f->pal->frame);
      cairo_set_line_width (cr, 0.7 * f->lw);
      cairo_move_to (cr, a->x, y0);
      cairo_line_to (cr, a->x + a->width, y0);
      cairo_stroke (cr);
    }
  cairo_restore (cr);
}

/* A stress the wall is checked against: a thin line across the plot,
 * named beside it: at the right end above the line if there is room
 * (the corrosion band and the bore's peak are at the left), else below
 * it, else at the left end; never over the other limit's name.  Returns
 * where the name went. */
static HlRect
limit_line (HlFigure             *f,
            const HlPlotGeometry *g,
            double                stress,
            const char           *label,
            const HlRect         *avoid)
{
  cairo_t *cr = f->cr;
  double y = hl_axis_map (&g->y, hl_stress_value (f, stress));
  g_autofree char *value = hl_stress_text (f, stress, 4);
  g_autofree char *text = g_strdup_printf ("%s %s", label, value);
  double w, h, pad = 0.4 * f->text->base, lift = 0.15 * f->text->base;
  HlRect spot = { 0 };

  cairo_save (cr);
  hl_palette_set_source (cr, f->pal->ink);
  cairo_set_line_width (cr, 0.9 * f->lw);
  hl_palette_set_dash (cr, HL_DASH_DASHED, f->lw);
  cairo_move_to (cr, g->area.x, y);
  cairo_line_to (cr, g->area.x + g->area.width, y);
  cairo_stroke (cr);
  cairo_restore (cr);

  hl_text_measure (f->text, HL_FONT_SMALL, text, 0, &w, &h);
  for (guint k = 0; k < 4; k++)
    {
      double x = k < 2 ? g->area.x + g->area.width - pad - w : g->area.x + pad;
      double top = k % 2 == 0 ? y - lift - h : y + lift;

      spot = (HlRect) { x, top, w, h };
      if (top >= g->area.y && top + h <= g->area.y + g->area.height
          && (avoid == NULL || !hl_rect_overlaps (&spot, avoid)))
        break;
      spot.width = 0;
    }
  if (spot.width > 0)
    hl_text_draw (f->text, HL_FONT_SMALL, text, spot.x, spot.y, 0, 0, 0, f->pal->ink);
  return spot;
}

static void
draw_limits (HlFigure             *f,
             const HlPlotGeometry *g)
{
  const HlSolution *sol = f->sol;
  HlRect first = { 0 };

  /* the allowable the code checks the membrane stress against */
  if (isfinite (sol->allowable) && sol->allowable > 0)
    first = limit_line (f, g, sol->allowable, _("allowable S·Ej"), NULL);
  if (isfinite (sol->yield) && sol->yield > 0)
    limit_line (f, g, sol->yield, _("yield"), first.width > 0 ? &first : NULL);
}

static void
draw_curves (HlFigure       *f,
             Plan           *p,
             HlPlotGeometry *g)
{
  const HlSolution *sol = f->sol;
  cairo_t *cr = f->cr;

  cairo_save (cr);
  cairo_rectangle (cr, g->area.x, g->area.y, g->area.width, g->area.height);
  cairo_clip (cr);
  if (p->band)
    {
      double x0 = hl_axis_map (&g->x, hl_length_value (f, p->a_new));
      double x1 = hl_axis_map (&g->x, hl_length_value (f, p->a_cor));

      cairo_rectangle (cr, x0, g->area.y, x1 - x0, g->area.height);
      hl_hatch (f);
      cairo_new_path (cr);
    }
  cairo_set_line_join (cr, CAIRO_LINE_JOIN_ROUND);
  /* thin-wall lines first so the exact curves stay on top where they
   * coincide; dashes then show through as breaks in the colour */
  static const Curve order[] = { CURVE_TRESCA, CURVE_VON_MISES, CURVE_AXIAL, CURVE_RADIAL, CURVE_HOOP,
                                 CURVE_THIN_RADIAL, CURVE_THIN_VON_MISES, CURVE_THIN_HOOP };
  for (guint k = 0; k < G_N_ELEMENTS (order); k++)
    {
      Curve c = order[k];
      const CurveStyle *st = &p->curves[c];

      if (!st->shown)
        continue;
      for (guint i = 0; i < sol->n_points; i++)
        {
          double x = hl_axis_map (&g->x, hl_length_value (f, sol->points[i].r));
          double y = hl_axis_map (&g->y, hl_stress_value (f, value_of (&sol->points[i], c)));

          if (i == 0)
            cairo_move_to (cr, x, y);
          else
            cairo_line_to (cr, x, y);
        }
      hl_palette_set_source (cr, st->colour);
      cairo_set_line_width (cr, st->width * f->lw);
      cairo_save (cr);
      hl_palette_set_dash (cr, st->dash, f->lw);
      cairo_stroke (cr);
      cairo_restore (cr);
    }
  cairo_restore (cr);
  draw_limits (f, g);
  {
    gboolean inner = fabs (sol->points[0].hoop) >= fabs (sol->points[sol->n_points - 1].hoop);
    const HlWallPoint *pk = &sol->points[inner ? 0 : sol->n_points - 1];

    hl_marker (f, hl_axis_map (&g->x, hl_length_value (f, pk->r)), hl_axis_map (&g->y, hl_stress_value (f, pk->hoop)),
               0.75 * f->text->base);
  }
}

typedef struct
{
  double head_h, entry_w, row_h, th;
  HlRect body, legend;
} Layout;

/* places heading, legend and axes in @area; fills f->geom->plot */
static void
layout (HlFigure     *f,
        Plan         *p,
        const HlRect *area,
        Layout       *l)
{
  HlPlotGeometry *g = &f->geom->plot;
  double lo, hi, entry_h;

  l->head_h = hl_panel_heading_height (f, area->width, _("Stress through the wall"), p->subtitle);
  legend_entries_size (f, p, &l->entry_w, &entry_h);
  l->row_h = entry_h * 1.15;
  l->body = *area;
  l->body.y += l->head_h;
  l->body.height -= l->head_h;
  /* legend beside the plot when there is width to spare, else in rows
   * under it */
  p->legend_right = area->width - l->entry_w > 26 * f->text->base;
  if (p->legend_right)
    {
      l->legend = (HlRect) { area->x + area->width - l->entry_w, l->body.y, l->entry_w, n_entries (p) * l->row_h };
      l->body.width -= l->entry_w + 1.5 * f->gap;
    }
  else
    {
      int cols = MAX (1, (int) floor (area->width / (l->entry_w + f->gap)));
      int rows = (n_entries (p) + cols - 1) / cols;

      l->legend = (HlRect) { area->x, area->y + area->height - rows * l->row_h, area->width, rows * l->row_h };
      l->body.height -= l->legend.height + f->gap;
    }

  y_range (f->sol, p, &lo, &hi);
  hl_axes_layout (f, &l->body, hl_stress_value (f, lo), hl_stress_value (f, hi), &g->y, &g->area, &l->th);
  {
    double x_lo = hl_length_value (f, p->a_new), x_hi = hl_length_value (f, f->sol->b);

    /* as many ticks as their labels leave a gap between: try dense,
     * thin out until they fit */
    for (guint target = 10; target >= 2; target--)
      {
        double widest = 0;

        hl_axis_linear (&g->x, x_lo, x_hi, target, FALSE);
        for (guint i = 0; i < g->x.n_ticks; i++)
          {
            g_autofree char *s = hl_axis_label (&g->x, g->x.ticks[i], f->locale);
            double w;

            hl_text_measure (f->text, HL_FONT_SMALL, s, 0, &w, NULL);
            widest = MAX (widest, w);
          }
        if (g->x.n_ticks * (widest + 1.5 * f->text->base) <= g->area.width)
          break;
      }
  }
  hl_axis_place (&g->x, g->area.x, g->area.x + g->area.width);
}

gboolean
hl_plot_fits (HlFigure     *f,
              const HlRect *area)
{
  Plan p = { 0 };
  Layout l;
  HlPlotGeometry saved = f->geom->plot;
  gboolean fits;

  plan_curves (f, &p);
  plan_subtitle (f, &p);
  layout (f, &p, area, &l);
  /* room for a curve to show its shape, and for a few ticks */
  fits = f->geom->plot.area.width >= 14 * f->text->base && f->geom->plot.area.height >= 6 * f->text->base;
  f->geom->plot = saved;
  plan_clear (&p);
  return fits;
}

void
hl_plot_draw (HlFigure     *f,
              const HlRect *area)
{
  HlPlotGeometry *g = &f->geom->plot;
  Plan p = { 0 };
  Layout l;
  double tick = hl_axes_tick_length (f);
  g_autofree char *xt = g_strdup_printf (_("radius r, %s"), hl_length_unit (f));
  g_autofree char *yt = g_strdup_printf (_("stress, %s"), hl_stress_unit (f));

  plan_curves (f, &p);
  plan_subtitle (f, &p);
  layout (f, &p, area, &l);
  g->drawn = TRUE;
  hl_panel_heading (f, area, _("Stress through the wall"), p.subtitle);
  draw_axes (f, g);
  draw_curves (f, &p, g);
  hl_text_draw (f->text, HL_FONT_SMALL, xt, g->area.x + g->area.width / 2, g->area.y + g->area.height + tick + l.th,
                0.5, 0, 0, f->pal->muted);
  hl_text_draw_up (f->text, HL_FONT_SMALL, yt, l.body.x + l.th / 2, g->area.y + g->area.height / 2, f->pal->muted);
  draw_legend (f, &p, &l.legend, p.legend_right ? l.entry_w : l.entry_w + f->gap, l.row_h);
  plan_clear (&p);
}

void
hl_plot_geometry_to_user (const HlPlotGeometry *plot,
                          HlUnitSystem          units,
                          double                r_si,
                          double                stress_si,
                          double               *x,
                          double               *y)
{
  *x = hl_axis_map (&plot->x, hl_row_convert (HL_ROW_LENGTH, units, r_si));
  *y = hl_axis_map (&plot->y, hl_row_convert (HL_ROW_STRESS, units, stress_si));
}
