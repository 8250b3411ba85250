/* hl-figure-detail.c — a magnified piece of the wall, where it came from
 *
 * The detail is a pure magnification of the section about the middle of
 * the wall at the detail angle: the same arcs at M times the scale, so
 * curvature, thickness and corrosion band keep their true proportions.
 * (u, v) are along and across the wall inside the frame, v outwards.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-detail"

#include "hl-figure-private.h"

#include <math.h>

typedef struct
{
  double ex, ey;      /* outward radial direction on the page */
  double tx, ty;      /* along the wall */
  double fx, fy;      /* frame centre */
  double U, V;        /* half sizes of the frame along and across */
  double cx, cy;      /* the magnified ring centre */
  double s;           /* user units per metre in the detail */
  double rho_mid;     /* metres: the radius the frame centre sits on */
  double a_new, a_cor, b;
} View;

static double
nice_floor (double x)
{
  static const double mant[] = { 8, 6, 5, 4, 3, 2.5, 2, 1.5, 1 };
  double decade;

  if (!(x > 1))
    return 1;
  decade = pow (10, floor (log10 (x)));
  for (guint i = 0; i < G_N_ELEMENTS (mant); i++)
    if (mant[i] * decade <= x * (1 + 1e-9))
      return mant[i] * decade;
  return decade;
}

static double
caption_height (HlFigure *f)
{
  double h;

  hl_text_measure (f->text, HL_FONT_HEADING, _("Detail A"), 0, NULL, &h);
  return h + 2 * f->gap;
}

static void
frame_in (HlFigure     *f,
          const HlRect *area,
          HlSide        side,
          HlRect       *fr)
{
  double leg_w, leg_h;

  hl_stress_legend_size (f, TRUE, area->height - caption_height (f), &leg_w, &leg_h);
  fr->x = area->x;
  fr->y = area->y;
  fr->width = area->width - leg_w - 1.5 * f->gap;
  fr->height = area->height - caption_height (f);
  /* a frame much longer than it is deep shows little more */
  if (side == HL_SIDE_BELOW)
    fr->width = MIN (fr->width, 2.6 * fr->height);
  else
    fr->height = MIN (fr->height, 2.6 * fr->width);
}

gboolean
hl_detail_fits (HlFigure     *f,
                const HlRect *area)
{
  HlRect fr;
  double leg_w, leg_h;

  frame_in (f, area, HL_SIDE_BELOW, &fr);
  hl_stress_legend_size (f, TRUE, fr.height, &leg_w, &leg_h);
  return fr.width >= 12 * f->text->base && fr.height >= 7 * f->text->base && leg_h <= fr.height;
}

void
hl_detail_fit (HlFigure     *f,
               const HlRect *area,
               HlSide        side)
{
  HlSectionGeometry *g = &f->geom->section;
  double a_new, b, across, m;
  double bx, by, bw, bh, rho;
  HlRect *fr = &g->detail_frame;

  frame_in (f, area, side, fr);
  hl_shell_inputs_radii (&f->sol->inputs, FALSE, &a_new, &b);
  across = side == HL_SIDE_BELOW ? fr->height : fr->width;
  /* the wall takes a little under half the depth, leaving room for the
   * labels on the bore side and outside */
  m = nice_floor (0.42 * across / ((b - a_new) * g->px_per_m));
  g->magnification = m;

  rho = (a_new + b) / 2 * g->px_per_m;
  bx = g->cx + rho * cos (g->detail_angle);
  by = g->cy - rho * sin (g->detail_angle);
  /* a box smaller than a few units could not be seen; it then marks the
   * place rather than the exact extent */
  bw = MAX (fr->width / m, 0.9 * f->text->base);
  bh = MAX (fr->height / m, 0.9 * f->text->base);
  g->detail_box.x = bx - bw / 2;
  g->detail_box.y = by - bh / 2;
  g->detail_box.width = bw;
  g->detail_box.height = bh;
}

static void
view_init (HlFigure *f,
           View     *v)
{
  HlSectionGeometry *g = &f->geom->section;
  HlRect *fr = &g->detail_frame;
  double dummy;

  v->ex = cos (g->detail_angle);
  v->ey = -sin (g->detail_angle);
  /* along the wall: left to right when the wall lies flat */
  v->tx = -v->ey;
  v->ty = v->ex;
  if (v->tx < 0 || v->ty < 0)
    {
      v->tx = -v->tx;
      v->ty = -v->ty;
    }
  v->fx = fr->x + fr->width / 2;
  v->fy = fr->y + fr->height / 2;
  v->U = fabs (v->tx) > 0.5 ? fr->width / 2 : fr->height / 2;
  v->V = fabs (v->tx) > 0.5 ? fr->height / 2 : fr->width / 2;
  hl_shell_inputs_radii (&f->sol->inputs, FALSE, &v->a_new, &v->b);
  hl_shell_inputs_radii (&f->sol->inputs, TRUE, &v->a_cor, &dummy);
  v->s = g->px_per_m * g->magnification;
  v->rho_mid = (v->a_new + v->b) / 2;
  v->cx = v->fx - v->rho_mid * v->s * v->ex;
  v->cy = v->fy - v->rho_mid * v->s * v->ey;
}

/* page position of along-wall @u and of radius @rho (metres) */
static void
at (const View *v,
    double      u,
    double      rho,
    double     *x,
    double     *y)
{
  double R = rho * v->s;
  double across = sqrt (MAX (R * R - u * u, 0));

  *x = v->cx + u * v->tx + across * v->ex;
  *y = v->cy + u * v->ty + across * v->ey;
}

/* the part of the magnified circles the frame can show: whole circles
 * of a hundred thousand units would cost thousands of curve pieces */
static void
visible_angles (const View *v,
                double      rho,
                double     *from,
                double     *to)
{
  double mid = atan2 (v->ey, v->ex);
  double reach = 1.5 * hypot (v->U, v->V) / (rho * v->s);
  double half = reach >= 1 ? G_PI : asin (reach);

  *from = mid - half;
  *to = mid + half;
}

static void
arc_path (cairo_t    *cr,
          const View *v,
          double      rho)
{
  double from, to;

  visible_angles (v, rho, &from, &to);
  cairo_new_sub_path (cr);
  cairo_arc (cr, v->cx, v->cy, rho * v->s, from, to);
}

static void
band_path (cairo_t    *cr,
           const View *v,
           double      r0,
           double      r1)
{
  double from, to;

  /* a sector between the two radii over the angles the inner, smaller
   * one needs to cross the frame; the outer crosses it within them */
  visible_angles (v, r0, &from, &to);
  cairo_new_path (cr);
  cairo_arc (cr, v->cx, v->cy, r1 * v->s, from, to);
  cairo_arc_negative (cr, v->cx, v->cy, r0 * v->s, to, from);
  cairo_close_path (cr);
}

static void
draw_wall (HlFigure   *f,
           const View *v)
{
  cairo_t *cr = f->cr;

  band_path (cr, v, MAX (f->sol->a, v->a_cor), v->b);
  hl_wall_fill (f, v->cx, v->cy, v->s, MAX (f->sol->a, v->a_cor), v->b);
  if (v->a_cor > v->a_new)
    {
      band_path (cr, v, v->a_new, v->a_cor);
      hl_hatch (f);
      cairo_new_path (cr);
    }
  cairo_save (cr);
  hl_palette_set_source (cr, f->pal->ink);
  cairo_set_line_width (cr, 1.1 * f->lw);
  arc_path (cr, v, v->b);
  arc_path (cr, v, v->a_new);
  cairo_stroke (cr);
  if (v->a_cor > v->a_new)
    {
      /* the surface after corrosion: thin and dashed, it is a future one */
      cairo_set_line_width (cr, 0.7 * f->lw);
      hl_palette_set_dash (cr, HL_DASH_DASHED, f->lw);
      arc_path (cr, v, v->a_cor);
      cairo_stroke (cr);
    }
  cairo_restore (cr);
}

typedef struct
{
  HlRect placed[8];
  guint  n;
} Placed;

/* text in the bore (@side < 0) or outside (@side > 0), next to the wall
 * surface at radius @rho, at along-wall @u; left out when it would
 * leave the frame or cover a text placed before it; @lift moves it
 * that much further from the wall */
static gboolean
side_text (HlFigure   *f,
           const View *v,
           Placed     *placed,
           double      u,
           double      rho,
           int         side,
           double      ax_along,
           const char *text,
           double      wrap,
           double      lift)
{
  HlRect *fr = &f->geom->section.detail_frame;
  double x, y, gap = 0.35 * f->text->base + lift;
  double ax, ay, w, h;
  HlRect r;

  at (v, u, rho, &x, &y);
  x += side * gap * v->ex;
  y += side * gap * v->ey;
  if (fabs (v->ey) > 0.5)
    {
      /* wall lies flat: texts above or below it */
      ax = ax_along;
      ay = (side > 0) == (v->ey > 0) ? 0 : 1;
    }
  else
    {
      ax = (side > 0) == (v->ex > 0) ? 0 : 1;
      ay = ax_along;
    }
  hl_text_measure (f->text, HL_FONT_SMALL, text, wrap, &w, &h);
  r = (HlRect) { x - ax * w, y - ay * h, w, h };
  if (r.x < fr->x || r.y < fr->y || r.x + r.width > fr->x + fr->width || r.y + r.height > fr->y + fr->height)
    return FALSE;
  for (guint i = 0; i < placed->n; i++)
    if (hl_rect_overlaps (&r, &placed->placed[i]))
      return FALSE;
  if (placed->n < G_N_ELEMENTS (placed->placed))
    placed->placed[placed->n++] = r;
  hl_text_draw (f->text, HL_FONT_SMALL, text, x, y, ax, ay, wrap, f->pal->ink);
  return TRUE;
}

/* where the hoop stress peaks: an arrow onto that surface from its
 * label, which stands beyond the arrow's tail so the head never runs
 * into the number */
static void
peak_leader (HlFigure   *f,
             const View *v,
             Placed     *placed,
             double      u,
             gboolean    inner,
             const char *text,
             double      wrap)
{
  HlSectionGeometry *g = &f->geom->section;
  const HlSolution *sol = f->sol;
  double r_peak = inner ? sol->a : sol->b, r_label = inner ? v->a_new : v->b;
  double head = hl_arrow_head_length (f), dir = inner ? 1 : -1;
  double depth = fabs (r_peak - r_label) * v->s;   /* tip below the label's surface */
  double lift = MAX (0, head + 0.8 * f->text->base - depth);
  double reach = depth + 0.35 * f->text->base + lift - 0.3 * f->text->base;
  double x0, y0, x1, y1, half = head / 3;

  if (!side_text (f, v, placed, u, r_label, inner ? -1 : 1, 0.5, text, wrap, lift))
    return;
  g->peak_label = placed->placed[placed->n - 1];
  at (v, u, r_peak, &x0, &y0);
  x1 = x0 - dir * reach * v->ex;
  y1 = y0 - dir * reach * v->ey;
  cairo_save (f->cr);
  hl_palette_set_source (f->cr, f->pal->ink);
  cairo_set_line_width (f->cr, 0.7 * f->lw);
  cairo_move_to (f->cr, x1, y1);
  cairo_line_to (f->cr, x0 - dir * head * v->ex, y0 - dir * head * v->ey);
  cairo_stroke (f->cr);
  hl_arrow_head (f, x0, y0, dir * v->ex, dir * v->ey);
  cairo_restore (f->cr);
  /* the leader's box, for the texts placed after it and for tests */
  g->peak_leader = (HlRect) { MIN (x0, x1) - half, MIN (y0, y1) - half, fabs (x1 - x0) + 2 * half,
                              fabs (y1 - y0) + 2 * half };
  g->has_peak_leader = TRUE;
  if (placed->n < G_N_ELEMENTS (placed->placed))
    placed->placed[placed->n++] = g->peak_leader;
}

static void
draw_labels (HlFigure   *f,
             const View *v)
{
  const HlSolution *sol = f->sol;
  gboolean flat = fabs (v->ey) > 0.5;
  double wall = (v->b - v->a_new) * v->s;
  double wrap = MAX (flat ? 0.5 * v->U : 0.8 * (v->V - wall / 2), 4 * f->text->base);
  double x0, y0, x1, y1;
  gboolean peak_inner = fabs (sol->points[0].hoop) >= fabs (sol->points[sol->n_points - 1].hoop);
  g_autofree char *t_new = hl_length_text (f, v->b - v->a_new, 4);
  g_autofree char *t_cor = hl_length_text (f, sol->b - sol->a, 4);
  g_autofree char *peak = hl_stress_text (f, peak_inner ? sol->points[0].hoop : sol->points[sol->n_points - 1].hoop, 4);
  g_autofree char *t_text = NULL, *p_text = NULL;
  double u_t = 0.66 * v->U, u_c = 0.02 * v->U, u_p = -0.45 * v->U;
  Placed placed = { 0 };

  /* most important first: what is left out for want of room is the
   * least needed */
  at (v, u_t, v->a_new, &x0, &y0);
  at (v, u_t, v->b, &x1, &y1);
  hl_dimension (f, x0, y0, x1, y1);
  if (v->a_cor > v->a_new)
    {
      g_autofree char *t_eq = g_strdup_printf ("t" HL_NBSP "=" HL_NBSP "%s", t_new);

      t_text = g_strdup_printf (_("%s new, %s after corrosion"), t_eq, t_cor);
    }
  else
    t_text = g_strdup_printf ("t" HL_NBSP "=" HL_NBSP "%s", t_new);
  if (!side_text (f, v, &placed, u_t, v->b, 1, 0.5, t_text, flat ? 0.62 * v->U : wrap, 0))
    side_text (f, v, &placed, u_t, v->b, 1, 0.5, t_new, flat ? 0.62 * v->U : wrap, 0);

  if (v->a_cor > v->a_new)
    {
      g_autofree char *c = hl_length_text (f, v->a_cor - v->a_new, 3);
      g_autofree char *c_text = g_strdup_printf (_("corrosion allowance %s"), c);
      /* a long compound ("Korrosionszuschlag") keeps its size: the
       * frame, not the wrap, bounds the label */
      double c_wrap = MAX (wrap, hl_text_longest_word (f->text, HL_FONT_SMALL, c_text) + 0.1);

      at (v, u_c, v->a_new, &x0, &y0);
      at (v, u_c, v->a_cor, &x1, &y1);
      hl_dimension (f, x0, y0, x1, y1);
      /* beside the dimension line, which may run out through the text */
      if (!side_text (f, v, &placed, u_c + 0.6 * f->text->base, v->a_new, -1, 0, c_text, c_wrap, 0))
        side_text (f, v, &placed, u_c + 0.6 * f->text->base, v->a_new, -1, 0, c, wrap, 0);
    }

  p_text = g_strdup_printf (_("peak σθ %s"), peak);
  peak_leader (f, v, &placed, u_p, peak_inner, p_text, wrap);

  /* bore and outside named at the start of the frame */
  side_text (f, v, &placed, -v->U + 0.3 * f->text->base, v->a_new, -1, 0, _("bore"), 0, 0);
  side_text (f, v, &placed, -v->U + 0.3 * f->text->base, v->b, 1, 0, _("outside"), 0, 0);
}

static void
draw_leaders (HlFigure *f)
{
  HlSectionGeometry *g = &f->geom->section;
  HlRect *b = &g->detail_box, *fr = &g->detail_frame;
  gboolean below = fabs (g->detail_angle - 1.5 * G_PI) < 0.1;

  cairo_save (f->cr);
  hl_palette_set_source (f->cr, f->pal->muted);
  cairo_set_line_width (f->cr, 0.6 * f->lw);
  if (below)
    {
      cairo_move_to (f->cr, b->x, b->y + b->height);
      cairo_line_to (f->cr, fr->x, fr->y);
      cairo_move_to (f->cr, b->x + b->width, b->y + b->height);
      cairo_line_to (f->cr, fr->x + fr->width, fr->y);
    }
  else
    {
      cairo_move_to (f->cr, b->x + b->width, b->y);
      cairo_line_to (f->cr, fr->x, fr->y);
      cairo_move_to (f->cr, b->x + b->width, b->y + b->height);
      cairo_line_to (f->cr, fr->x, fr->y + fr->height);
    }
  cairo_stroke (f->cr);
  cairo_restore (f->cr);
}

void
hl_detail_draw (HlFigure     *f,
                const HlRect *area)
{
  HlSectionGeometry *g = &f->geom->section;
  HlRect *fr = &g->detail_frame;
  cairo_t *cr = f->cr;
  View v;
  double leg_w, leg_h, note_w, note_h;
  g_autofree char *mag = hl_figure_format_sig (g->magnification, 3, f->locale);
  g_autofree char *cap = g_strdup_printf (_("Detail A  ×%s"), mag);
  g_autofree char *note = g_strdup_printf (_("the wall magnified %s times; shaded by the hoop stress"), mag);
  HlRect r;

  view_init (f, &v);
  draw_leaders (f);
  cairo_save (cr);
  cairo_rectangle (cr, fr->x, fr->y, fr->width, fr->height);
  hl_palette_set_source (cr, f->pal->paper);
  cairo_fill_preserve (cr);
  cairo_clip (cr);
  draw_wall (f, &v);
  draw_labels (f, &v);
  cairo_restore (cr);

  cairo_save (cr);
  cairo_rectangle (cr, fr->x, fr->y, fr->width, fr->height);
  hl_palette_set_source (cr, f->pal->frame);
  cairo_set_line_width (cr, 0.8 * f->lw);
  cairo_stroke (cr);
  cairo_restore (cr);

  r = hl_text_draw (f->text, HL_FONT_HEADING, cap, fr->x, fr->y + fr->height + f->gap, 0, 0, 0, f->pal->ink);
  /* the note beside the caption, when two short lines hold it */
  note_w = fr->width - r.width - f->gap;
  if (note_w > 4 * f->text->base)
    {
      hl_text_measure (f->text, HL_FONT_TINY, note, note_w, NULL, &note_h);
      if (note_h <= caption_height (f) - 0.5 * f->gap)
        hl_text_draw (f->text, HL_FONT_TINY, note, r.x + r.width + f->gap, r.y, 0, 0, note_w, f->pal->muted);
    }

  hl_stress_legend_size (f, TRUE, fr->height, &leg_w, &leg_h);
  {
    HlRect leg = { fr->x + fr->width + 1.5 * f->gap, fr->y, leg_w, fr->height };

    hl_stress_legend_draw (f, &leg, TRUE);
  }
}
