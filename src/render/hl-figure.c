/* hl-figure.c — the figure of one shell: layout of the panels
 *
 * Landscape sizes get two columns (section and its detail on the left,
 * plot and chart on the right); tall or narrow sizes stack the panels.
 * The base font shrinks within limits until every panel has the room it
 * needs; below that only the section, the verdict and the title block
 * are drawn, so nothing ever overlaps.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure"

#include "hl-figure-private.h"
#include "hl-report.h"

#include <math.h>
#include <string.h>

#define FONT_MAX 13.0
#define FONT_MIN 7.0
#define FONT_TINY 4.0   /* only for the caution on a postage-stamp figure */

typedef struct
{
  HlFigureLayout layout;
  HlRect verdict, title, body;
  HlRect section, detail, plot, chart;
  gboolean detail_shown;
  HlSide detail_side;
  gboolean verdict_shown, title_shown, caution_only;
} Layout;

static HlRect
rect (double x,
      double y,
      double w,
      double h)
{
  HlRect r = { x, y, w, h };

  return r;
}

/* the section's content is its panel without heading and legend row */
static gboolean
needs_detail (HlFigure     *f,
              const HlRect *panel)
{
  HlRect content = *panel;

  content.y += 3 * f->text->base;
  content.height -= 5.5 * f->text->base;
  return hl_section_needs_detail (f, &content);
}

static void
set_font (HlFigure *f,
          double    size)
{
  hl_text_set_base (f->text, size);
  f->lw = MAX (0.5, size / 11.0);
  f->gap = 0.45 * size;
}

static gboolean
plan (HlFigure *f,
      double    width,
      double    height,
      Layout   *l)
{
  double fs = f->text->base, m = 0.9 * fs, gap = 1.2 * fs, colgap = 2.0 * fs;
  double inner_w = width - 2 * m;
  double vh = f->sol != NULL ? hl_verdict_height (f, inner_w) : 0;
  double th = hl_title_block_height (f, inner_w);
  HlRect *b = &l->body;

  l->verdict = rect (m, m, inner_w, vh);
  l->title = rect (m, height - m - th, inner_w, th);
  l->verdict_shown = f->sol != NULL;
  l->title_shown = TRUE;
  l->caution_only = FALSE;
  *b = rect (m, m + (vh > 0 ? vh + gap : 0), inner_w, height - 2 * m - th - gap - (vh > 0 ? vh + gap : 0));
  l->detail_shown = FALSE;
  if (b->height < 4 * fs || b->width < 10 * fs)
    return FALSE;
  if (f->sol == NULL)
    {
      l->layout = HL_FIGURE_LAYOUT_PROBLEM;
      return TRUE;
    }

  if (b->width >= 1.15 * b->height)
    {
      double lw = 0.44 * (b->width - colgap), rw = b->width - colgap - lw;
      double ph = (b->height - gap) / 2;
      HlRect left = rect (b->x, b->y, lw, b->height);

      l->layout = HL_FIGURE_LAYOUT_WIDE;
      l->plot = rect (b->x + lw + colgap, b->y, rw, ph);
      l->chart = rect (b->x + lw + colgap, b->y + ph + gap, rw, b->height - ph - gap);
      l->section = left;
      if (needs_detail (f, &left))
        {
          double sh = 0.52 * (b->height - gap);

          l->section = rect (b->x, b->y, lw, sh);
          l->detail = rect (b->x, b->y + sh + gap, lw, b->height - sh - gap);
          l->detail_shown = TRUE;
          l->detail_side = HL_SIDE_BELOW;
        }
    }
  else
    {
      double avail = b->height - 2 * gap;
      double sh = 0.38 * avail, ph = 0.31 * avail;
      HlRect row = rect (b->x, b->y, b->width, sh);

      l->layout = HL_FIGURE_LAYOUT_TALL;
      l->section = row;
      l->plot = rect (b->x, b->y + sh + gap, b->width, ph);
      l->chart = rect (b->x, b->y + sh + ph + 2 * gap, b->width, avail - sh - ph);
      if (needs_detail (f, &row))
        {
          double sw = 0.46 * (b->width - colgap);

          l->section = rect (b->x, b->y, sw, sh);
          l->detail = rect (b->x + sw + colgap, b->y, b->width - sw - colgap, sh);
          l->detail_shown = TRUE;
          l->detail_side = HL_SIDE_RIGHT;
        }
    }
  return l->section.width >= 12 * fs && l->section.height >= 12 * fs && hl_plot_fits (f, &l->plot)
         && hl_chart_fits (f, &l->chart) && (!l->detail_shown || hl_detail_fits (f, &l->detail));
}

/* too small for the panels: the section alone fills the body; smaller
 * still, the verdict and the caution; at the very least the caution */
static gboolean
plan_small (HlFigure *f,
            double    width,
            double    height,
            Layout   *l)
{
  double m = 0.9 * f->text->base, inner_w = width - 2 * m;
  double vh, ch;
  g_autofree char *caution = NULL;

  plan (f, width, height, l);
  l->layout = HL_FIGURE_LAYOUT_SMALL;
  l->section = l->body;
  l->detail_shown = FALSE;
  if (l->body.height >= 6 * f->text->base && l->body.width >= 8 * f->text->base)
    return TRUE;
  l->title_shown = FALSE;
  l->caution_only = TRUE;
  caution = hl_figure_caution ();
  for (double fs = f->text->base; fs >= FONT_TINY; fs *= 0.9)
    {
      set_font (f, fs);
      m = 0.9 * fs;
      inner_w = width - 2 * m;
      hl_text_measure (f->text, HL_FONT_SMALL, caution, inner_w, NULL, &ch);
      vh = f->sol != NULL ? hl_verdict_height (f, inner_w) : 0;
      l->title = rect (m, height - m - ch, inner_w, ch);
      l->verdict = rect (m, m, inner_w, vh);
      l->verdict_shown = f->sol != NULL && vh + ch + 2 * m <= height;
      if (ch + 2 * m <= height)
        break;
    }
  return FALSE;
}

static double
start_font (double width,
            double height)
{
  return CLAMP (MIN (width, height) / 56.0, FONT_MIN, FONT_MAX);
}

void
hl_figure_draw_full (cairo_t               *cr,
                     double                 width,
                     double                 height,
                     const HlFigureContext *ctx,
                     HlFigureGeometry      *geometry)
{
  HlFigureGeometry scratch = { 0 };
  HlFigure f = { 0 };
  Layout l = { 0 };
  gboolean ok = FALSE, body = TRUE;

  g_return_if_fail (cr != NULL && ctx != NULL);

  f.cr = cr;
  f.ctx = ctx;
  f.sol = ctx->solution;
  f.pal = hl_palette_get (ctx->style);
  f.units = ctx->units;
  f.locale = ctx->locale_numbers;
  f.geom = geometry != NULL ? geometry : &scratch;
  hl_figure_geometry_clear (f.geom);
  f.text = hl_text_new (cr, start_font (width, height));
  if (geometry != NULL)
    f.text->boxes = g_array_new (FALSE, FALSE, sizeof (HlRect));

  for (double fs = start_font (width, height); fs >= FONT_MIN - 1e-9 && !ok; fs *= 0.92)
    {
      set_font (&f, fs);
      ok = plan (&f, width, height, &l);
    }
  if (!ok)
    {
      set_font (&f, FONT_MIN);
      body = plan_small (&f, width, height, &l);
      if (f.sol == NULL)
        l.layout = HL_FIGURE_LAYOUT_PROBLEM;
    }
  f.geom->layout = l.layout;
  f.geom->font_size = f.text->base;

  cairo_save (cr);
  /* a quarter of a device unit keeps curves smooth and flattens the big
   * circles into half the pieces of cairo's default tenth */
  cairo_set_tolerance (cr, 0.25);
  cairo_rectangle (cr, 0, 0, width, height);
  hl_palette_set_source (cr, f.pal->paper);
  cairo_fill (cr);
  cairo_set_line_cap (cr, CAIRO_LINE_CAP_BUTT);

  if (l.verdict_shown)
    hl_verdict_draw (&f, &l.verdict);
  if (l.title_shown)
    hl_title_block_draw (&f, &l.title);
  else if (l.caution_only)
    {
      g_autofree char *caution = hl_figure_caution ();

      hl_text_draw (f.text, HL_FONT_SMALL, caution, l.title.x, l.title.y, 0, 0, l.title.width, f.pal->ink);
    }
  if (body && f.sol == NULL)
    hl_problem_draw (&f, &l.body);
  else if (body)
    {
      hl_section_draw (&f, &l.section, l.detail_shown ? &l.detail : NULL, l.detail_side);
      if (l.detail_shown)
        hl_detail_draw (&f, &l.detail);
      if (l.layout != HL_FIGURE_LAYOUT_SMALL)
        {
          hl_plot_draw (&f, &l.plot);
          hl_chart_draw (&f, &l.chart);
        }
    }
  cairo_restore (cr);

  if (geometry != NULL)
    {
      geometry->text_boxes = f.text->boxes;
      f.text->boxes = NULL;
    }
  hl_text_free (f.text);
  g_clear_pointer (&f.hatch_tile, cairo_surface_destroy);
}

void
hl_figure_context_init (HlFigureContext     *ctx,
                        const HlProject     *project,
                        const HlShellInputs *shell,
                        const HlSolution    *solution,
                        const HlSolution    *new_wall,
                        const char          *problem_text,
                        HlFigureTarget       target)
{
  g_return_if_fail (ctx != NULL);

  *ctx = (HlFigureContext) { 0 };
  ctx->project = project;
  ctx->solution = solution;
  ctx->new_wall = solution != NULL ? new_wall : NULL;
  ctx->problem_text = solution == NULL ? problem_text : NULL;
  ctx->shell = solution != NULL ? &solution->inputs : shell;
  ctx->units = project != NULL ? project->display_units : HL_UNIT_SYSTEM_SI;
  ctx->style = HL_FIGURE_STYLE_LIGHT;
  ctx->locale_numbers = target == HL_FIGURE_TARGET_SCREEN;
}

void
hl_figure_draw (cairo_t               *cr,
                double                 width,
                double                 height,
                const HlFigureContext *ctx)
{
  hl_figure_draw_full (cr, width, height, ctx, NULL);
}

void
hl_figure_geometry_clear (HlFigureGeometry *g)
{
  if (g == NULL)
    return;
  if (g->text_boxes != NULL)
    g_array_unref (g->text_boxes);
  memset (g, 0, sizeof *g);
}
