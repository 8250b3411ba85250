/* hl-figure-section.c — the cross-section of the shell, truly to scale
 *
 * One scale (user units per metre) serves every radius, so the drawn
 * outer/inner ratio is the shell's b/a.  Dimensions stay out of the
 * lower-left quadrant, which keeps a clear ray for reading the wall.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-section"

#include "hl-figure-private.h"

#include <math.h>

#define C45 0.70710678118654752
#define CLEAR_ANGLE (1.25 * G_PI)        /* 225°: lower left */
#define CENTRE_LINE_OVERHANG 1.08

typedef struct
{
  double a_new, a_cor, b;                /* metres */
  char  *size_value, *size_what;
  char  *wall_value, *wall_what;         /* NULL unless the wall reads at true scale */
  double size_w, size_h, wall_w, wall_h;
  double bar_w, bar_h;                   /* scale bar */
  double legend_w, legend_h;             /* horizontal legend row */
  HlRect content;
  double R, cx, cy;
} Plan;

static void
plan_clear (Plan *p)
{
  g_free (p->size_value);
  g_free (p->size_what);
  g_free (p->wall_value);
  g_free (p->wall_what);
}

static void
two_lines (HlFigure   *f,
           const char *value,
           const char *what,
           double     *w,
           double     *h)
{
  double w1, h1, w2 = 0, h2 = 0;

  hl_text_measure (f->text, HL_FONT_BODY, value, 0, &w1, &h1);
  if (what != NULL)
    hl_text_measure (f->text, HL_FONT_TINY, what, 0, &w2, &h2);
  *w = MAX (w1, w2);
  *h = h1 + h2;
}

static void
plan_texts (HlFigure *f,
            Plan     *p,
            gboolean  wall_label)
{
  static const char *const what[] = {
    N_("inner diameter, new"), N_("outer diameter"), N_("inner radius, new"), N_("outer radius")
  };
  const HlShellInputs *in = &f->sol->inputs;
  double dummy;
  g_autofree char *size = NULL;
  gboolean diameter = in->size_kind == HL_SIZE_INNER_DIAMETER || in->size_kind == HL_SIZE_OUTER_DIAMETER;
  gboolean inner = in->size_kind == HL_SIZE_INNER_DIAMETER || in->size_kind == HL_SIZE_INNER_RADIUS;

  hl_shell_inputs_radii (in, FALSE, &p->a_new, &p->b);
  hl_shell_inputs_radii (in, TRUE, &p->a_cor, &dummy);
  size = hl_length_text (f, (inner ? p->a_new : p->b) * (diameter ? 2 : 1), 5);
  p->size_value = g_strdup_printf ("%s%s", diameter ? "Ø" HL_NBSP : "R" HL_NBSP, size);
  p->size_what = g_strdup (_(what[in->size_kind]));
  two_lines (f, p->size_value, p->size_what, &p->size_w, &p->size_h);
  if (wall_label)
    {
      g_autofree char *t = hl_length_text (f, p->b - p->a_new, 4);

      p->wall_value = g_strdup_printf ("t" HL_NBSP "=" HL_NBSP "%s", t);
      if (p->a_cor > p->a_new)
        {
          g_autofree char *c = hl_length_text (f, p->a_cor - p->a_new, 3);

          p->wall_what = g_strdup_printf (_("new wall; hatched: corrosion allowance %s"), c);
        }
      else
        p->wall_what = g_strdup (_("wall thickness"));
      two_lines (f, p->wall_value, p->wall_what, &p->wall_w, &p->wall_h);
    }
}

/* how far the drawing reaches from the centre on each side for ring
 * radius R: the centre lines, and the leaders with their texts at 135°
 * (size) and 45° (wall) */
static double
leader (HlFigure *f,
        double    R)
{
  return 0.12 * R + 0.9 * f->text->base;
}

static gboolean
fits (HlFigure *f,
      Plan     *p,
      double    R,
      double   *left,
      double   *top)
{
  double cl = CENTRE_LINE_OVERHANG * R + f->lw;
  double diag = (R + leader (f, R)) * C45;
  double pad = 0.4 * f->text->base;
  double l = MAX (cl, diag + p->size_w + pad);
  double r = MAX (cl, p->wall_value != NULL ? diag + p->wall_w + pad : 0);
  double t = MAX (cl, diag + MAX (p->size_h, p->wall_h));
  double b = cl;

  *left = l + (p->content.width - l - r) / 2;
  *top = t + (p->content.height - t - b) / 2;
  return l + r <= p->content.width && t + b <= p->content.height;
}

static void
plan_ring (HlFigure *f,
           Plan     *p)
{
  double lo = 0, hi = MAX (1.0, MIN (p->content.width, p->content.height) / 2);
  double left, top;

  /* every extent grows with R, so bisect for the largest that fits */
  for (int i = 0; i < 40; i++)
    {
      double mid = (lo + hi) / 2;

      if (fits (f, p, mid, &left, &top))
        lo = mid;
      else
        hi = mid;
    }
  p->R = MAX (lo, 1.0);
  fits (f, p, p->R, &left, &top);
  p->cx = p->content.x + left;
  p->cy = p->content.y + top;
}

static double
nice_length (double m)
{
  double decade = pow (10, floor (log10 (m)));
  double mant = m / decade;

  return (mant >= 5 ? 5 : mant >= 2 ? 2 : 1) * decade;
}

/* scale bar of a round length in display units, right-aligned at the
 * top of the panel */
static void
scale_bar_size (HlFigure *f,
                Plan     *p,
                double    R,
                double   *w,
                double   *h,
                double   *len,
                char    **label)
{
  double unit_si = hl_row_convert (HL_ROW_LENGTH, f->units, 1.0);   /* display units per metre */
  double want = 0.5 * p->b * unit_si;                                 /* about half the radius */
  double value = nice_length (want);
  double th, tw;
  g_autofree char *num = hl_figure_format_sig (value, 3, f->locale);

  g_free (*label);
  *label = g_strdup_printf ("%s" HL_NBSP "%s", num, hl_length_unit (f));
  hl_text_measure (f->text, HL_FONT_TINY, *label, 0, &tw, &th);
  *len = value / unit_si * (R / p->b);
  *w = MAX (*len, tw);
  *h = th + 0.5 * f->text->base;
}

static void
draw_scale_bar (HlFigure   *f,
                double      x_right,
                double      y_top,
                double      len,
                const char *label)
{
  cairo_t *cr = f->cr;
  double tick = 0.35 * f->text->base;
  HlRect r = hl_text_draw (f->text, HL_FONT_TINY, label, x_right - len / 2, y_top, 0.5, 0, 0, f->pal->muted);
  double y = r.y + r.height + tick;

  cairo_save (cr);
  cairo_set_line_width (cr, 0.9 * f->lw);
  hl_palette_set_source (cr, f->pal->muted);
  cairo_move_to (cr, x_right - len, y - tick);
  cairo_line_to (cr, x_right - len, y);
  cairo_line_to (cr, x_right, y);
  cairo_line_to (cr, x_right, y - tick);
  cairo_stroke (cr);
  cairo_restore (cr);
}

static void
annulus (cairo_t *cr,
         double   cx,
         double   cy,
         double   r0,
         double   r1)
{
  cairo_new_path (cr);
  cairo_arc (cr, cx, cy, r1, 0, 2 * G_PI);
  cairo_close_path (cr);
  cairo_new_sub_path (cr);
  cairo_arc_negative (cr, cx, cy, r0, 2 * G_PI, 0);
  cairo_close_path (cr);
}

static void
draw_ring (HlFigure *f,
           Plan     *p)
{
  cairo_t *cr = f->cr;
  double s = f->geom->section.px_per_m;
  double ra = f->sol->a * s, rb = f->sol->b * s;

  annulus (cr, p->cx, p->cy, MAX (ra, p->a_cor * s), rb);
  hl_wall_fill (f, p->cx, p->cy, s, MAX (ra, p->a_cor * s) / s, rb / s);
  if (p->a_cor > p->a_new)
    {
      annulus (cr, p->cx, p->cy, p->a_new * s, p->a_cor * s);
      hl_hatch (f);
      cairo_new_path (cr);
    }

  cairo_save (cr);
  hl_palette_set_source (cr, f->pal->ink);
  cairo_set_line_width (cr, f->geom->section.line_width);
  cairo_new_sub_path (cr);
  cairo_arc (cr, p->cx, p->cy, p->b * s, 0, 2 * G_PI);
  cairo_new_sub_path (cr);
  cairo_arc (cr, p->cx, p->cy, p->a_new * s, 0, 2 * G_PI);
  cairo_stroke (cr);
  cairo_restore (cr);
}

static void
draw_centre (HlFigure *f,
             Plan     *p)
{
  cairo_t *cr = f->cr;
  double ext = CENTRE_LINE_OVERHANG * p->R;
  double mark = MIN (0.6 * f->text->base, 0.25 * p->a_new * f->geom->section.px_per_m);

  cairo_save (cr);
  hl_palette_set_source (cr, f->pal->muted);
  /* chain lines through the centre, as on a drawing */
  cairo_set_line_width (cr, 0.6 * f->lw);
  hl_palette_set_dash (cr, HL_DASH_DASH_DOT, 1.2 * f->lw);
  cairo_move_to (cr, p->cx - ext, p->cy);
  cairo_line_to (cr, p->cx + ext, p->cy);
  cairo_move_to (cr, p->cx, p->cy - ext);
  cairo_line_to (cr, p->cx, p->cy + ext);
  cairo_stroke (cr);
  hl_palette_set_dash (cr, HL_DASH_SOLID, 1);
  cairo_set_line_width (cr, 1.0 * f->lw);
  hl_palette_set_source (cr, f->pal->ink);
  cairo_move_to (cr, p->cx - mark, p->cy);
  cairo_line_to (cr, p->cx + mark, p->cy);
  cairo_move_to (cr, p->cx, p->cy - mark);
  cairo_line_to (cr, p->cx, p->cy + mark);
  cairo_stroke (cr);
  cairo_restore (cr);
}

/* leader from radius @r0 along the diagonal (@sx, @sy) to an elbow
 * beyond the ring, a shoulder under the two-line text */
static void
leader_text (HlFigure   *f,
             Plan       *p,
             double      r0,
             double      sx,
             double      sy,
             const char *value,
             const char *what,
             double      text_w)
{
  cairo_t *cr = f->cr;
  double re = p->R + leader (f, p->R);
  double ex = p->cx + sx * re * C45, ey = p->cy + sy * re * C45;
  double pad = 0.2 * f->text->base;
  double endx = ex + (sx < 0 ? -1 : 1) * (text_w + 2 * pad);
  double tx = sx < 0 ? endx + pad : ex + pad;
  HlRect r;

  cairo_save (cr);
  hl_palette_set_source (cr, f->pal->ink);
  cairo_set_line_width (cr, 0.8 * f->lw);
  cairo_move_to (cr, p->cx + sx * r0 * C45, p->cy + sy * r0 * C45);
  cairo_line_to (cr, ex, ey);
  cairo_line_to (cr, endx, ey);
  cairo_stroke (cr);
  cairo_restore (cr);
  /* value above the shoulder, what it is above that */
  r = hl_text_draw (f->text, HL_FONT_BODY, value, tx, ey, 0, 1, 0, f->pal->ink);
  if (what != NULL)
    hl_text_draw (f->text, HL_FONT_TINY, what, tx, r.y, 0, 1, 0, f->pal->muted);
}

static void
draw_dimensions (HlFigure *f,
                 Plan     *p)
{
  const HlShellInputs *in = &f->sol->inputs;
  double s = f->geom->section.px_per_m;
  gboolean inner = in->size_kind == HL_SIZE_INNER_DIAMETER || in->size_kind == HL_SIZE_INNER_RADIUS;
  gboolean diameter = in->size_kind == HL_SIZE_INNER_DIAMETER || in->size_kind == HL_SIZE_OUTER_DIAMETER;
  double r = (inner ? p->a_new : p->b) * s;
  double x1 = p->cx - r * C45, y1 = p->cy - r * C45;

  /* size: through the centre from 315° to 135° (diameter) or from the
   * centre to 135° (radius), arrows on the surface the user gave */
  cairo_save (f->cr);
  hl_palette_set_source (f->cr, f->pal->ink);
  cairo_set_line_width (f->cr, 0.8 * f->lw);
  cairo_move_to (f->cr, diameter ? p->cx + r * C45 : p->cx, diameter ? p->cy + r * C45 : p->cy);
  cairo_line_to (f->cr, x1, y1);
  cairo_stroke (f->cr);
  hl_arrow_head (f, x1, y1, -1, -1);
  if (diameter)
    hl_arrow_head (f, p->cx + r * C45, p->cy + r * C45, 1, 1);
  cairo_restore (f->cr);
  leader_text (f, p, r, -1, -1, p->size_value, p->size_what, p->size_w);

  if (p->wall_value != NULL)
    {
      double ra = p->a_new * s, rb = p->b * s;

      hl_dimension (f, p->cx + ra * C45, p->cy - ra * C45, p->cx + rb * C45, p->cy - rb * C45);
      leader_text (f, p, rb, 1, -1, p->wall_value, p->wall_what, p->wall_w);
    }
}

static void
draw_detail_box (HlFigure *f)
{
  HlSectionGeometry *g = &f->geom->section;
  HlRect *b = &g->detail_box;
  gboolean below = fabs (g->detail_angle - 1.5 * G_PI) < 0.1;

  cairo_save (f->cr);
  hl_palette_set_source (f->cr, f->pal->ink);
  cairo_set_line_width (f->cr, 0.9 * f->lw);
  cairo_rectangle (f->cr, b->x, b->y, b->width, b->height);
  cairo_stroke (f->cr);
  cairo_restore (f->cr);
  if (below)
    hl_text_draw (f->text, HL_FONT_HEADING, "A", b->x + b->width + 0.3 * f->text->base, b->y + b->height / 2, 0, 0.5,
                  0, f->pal->ink);
  else
    hl_text_draw (f->text, HL_FONT_HEADING, "A", b->x + b->width + 0.2 * f->text->base, b->y - 0.1 * f->text->base, 0,
                  1, 0, f->pal->ink);
}

gboolean
hl_section_needs_detail (HlFigure     *f,
                         const HlRect *area)
{
  Plan p = { 0 };
  double wall_px;

  plan_texts (f, &p, TRUE);
  p.content = *area;
  plan_ring (f, &p);
  wall_px = (p.b - p.a_new) * p.R / p.b;
  plan_clear (&p);
  /* a wall must show its surfaces, the shading and an arrowed dimension.
   * A thin corrosion band on a wall that reads well is left to the
   * hatching, the label and the plot: a detail of a thick wall would
   * magnify little */
  return wall_px < MAX (14.0, 1.6 * f->text->base);
}

gboolean
hl_section_fits (HlFigure     *f,
                 const HlRect *area,
                 gboolean      with_detail)
{
  Plan p = { 0 };
  double left, top, head_h;
  const char *sub = f->sol->inputs.form == HL_FORM_SPHERE ? _("sphere: section through the centre")
                                                           : _("cylinder: ring cross-section");
  gboolean ok;

  if (area->width < 12 * f->text->base || area->height < 12 * f->text->base)
    return FALSE;
  plan_texts (f, &p, !with_detail);
  head_h = hl_panel_heading_height (f, area->width / 2, _("Section to scale"), sub);
  p.content = *area;
  p.content.y += head_h;
  p.content.height -= head_h;
  if (!with_detail)
    {
      hl_stress_legend_size (f, FALSE, 0, &p.legend_w, &p.legend_h);
      p.content.height -= p.legend_h + f->gap;
    }
  /* the dimensions' texts beside a ring big enough to read, and the
   * key under it */
  ok = fits (f, &p, 3 * f->text->base, &left, &top) && (with_detail || p.legend_w <= area->width);
  plan_clear (&p);
  return ok;
}

void
hl_section_draw (HlFigure     *f,
                 const HlRect *area,
                 const HlRect *detail,
                 HlSide        detail_side)
{
  HlSectionGeometry *g = &f->geom->section;
  const char *sub = f->sol->inputs.form == HL_FORM_SPHERE ? _("sphere: section through the centre")
                                                           : _("cylinder: ring cross-section");
  Plan p = { 0 };
  double bar_w, bar_h, bar_len, head_h;
  g_autofree char *bar_label = NULL;
  HlRect head = *area;

  plan_texts (f, &p, detail == NULL);
  /* the scale bar's size depends on R, which depends on the room left by
   * the heading; a first guess of R is close enough for its width */
  scale_bar_size (f, &p, MIN (area->width, area->height) / 2, &bar_w, &bar_h, &bar_len, &bar_label);
  head.width = MAX (area->width - bar_w - f->gap, area->width / 2);
  head_h = MAX (hl_panel_heading_height (f, head.width, _("Section to scale"), sub), bar_h + f->gap);
  p.content = *area;
  p.content.y += head_h;
  p.content.height -= head_h;
  if (detail == NULL)
    {
      hl_stress_legend_size (f, FALSE, 0, &p.legend_w, &p.legend_h);
      p.content.height -= p.legend_h + f->gap;
    }
  plan_ring (f, &p);

  g->drawn = TRUE;
  g->cx = p.cx;
  g->cy = p.cy;
  g->px_per_m = p.R / p.b;
  g->r_outer = p.b * g->px_per_m;
  g->r_inner_new = p.a_new * g->px_per_m;
  g->r_inner = f->sol->a * g->px_per_m;
  g->line_width = 0.9 * f->lw;
  g->clear_angle = CLEAR_ANGLE;
  g->has_detail = detail != NULL;
  g->detail_angle = detail_side == HL_SIDE_RIGHT ? 0.0 : 1.5 * G_PI;
  if (detail != NULL)
    hl_detail_fit (f, detail, detail_side);

  hl_panel_heading (f, &head, _("Section to scale"), sub);
  scale_bar_size (f, &p, p.R, &bar_w, &bar_h, &bar_len, &bar_label);
  draw_scale_bar (f, area->x + area->width, area->y, bar_len, bar_label);
  draw_ring (f, &p);
  draw_centre (f, &p);
  draw_dimensions (f, &p);
  if (detail != NULL)
    draw_detail_box (f);
  else
    {
      HlRect legend = { area->x, area->y + area->height - p.legend_h, area->width, p.legend_h };

      hl_stress_legend_draw (f, &legend, FALSE);
    }
  plan_clear (&p);
}
