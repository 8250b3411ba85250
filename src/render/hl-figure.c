/* hl-figure.c — the figure of one shell: layout of the panels
 *
 * Landscape sizes get two columns (section and its detail on the left,
 * plot and chart on the right); tall or narrow sizes stack the panels.
 * The base font shrinks within limits until every panel asked for has
 * the room it needs; below that the chart, the detail and the section
 * are left out in turn (the figure says so) to keep the stress plot, and
 * below that only the section, the verdict and the title block are
 * drawn, so nothing ever overlaps.  On screen the window shows the title
 * block and the caution itself: the figure leaves them out.
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
/* on screen the smallest role (0.78 of the base) stays at 9 px */
#define FONT_MIN_SCREEN 11.6
#define FONT_TINY 4.0   /* only for the caution on a postage-stamp figure */

typedef struct
{
  HlFigureLayout layout;
  HlRect verdict, title, body, note;
  HlRect section, detail, plot, chart;
  guint shown;      /* HlFigurePanels laid out */
  guint dropped;    /* asked for, left out for want of room: said in the note */
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

/* "thinness chart left out: figure too small": what the reader would
 * otherwise look for */
static char *
note_text (guint dropped)
{
  static const struct
  {
    guint       panel;
    const char *name;
  } names[] = {
    { HL_PANEL_SECTION, N_("section") },
    { HL_PANEL_DETAIL, N_("wall detail") },
    { HL_PANEL_PLOT, N_("stress plot") },
    { HL_PANEL_CHART, N_("thinness chart") },
  };
  g_autoptr(GString) list = g_string_new (NULL);

  if (dropped == 0)
    return NULL;
  for (guint i = 0; i < G_N_ELEMENTS (names); i++)
    if (dropped & names[i].panel)
      g_string_append_printf (list, "%s%s", list->len > 0 ? ", " : "", _(names[i].name));
  /* TRANSLATORS: %s lists panels of the figure ("stress plot, thinness chart") */
  return g_strdup_printf (_("%s left out: figure too small"), list->str);
}

/* the body split among the panels of @l->shown: the section (and its
 * detail) on the left or on top, the plot and the chart beside or under it */
static void
split_body (HlFigure *f,
            Layout   *l)
{
  double fs = f->text->base, gap = 1.2 * fs, colgap = 2.0 * fs;
  const HlRect *b = &l->body;
  gboolean sec = (l->shown & HL_PANEL_SECTION) != 0, want_detail = (l->shown & HL_PANEL_DETAIL) != 0;
  gboolean plot = (l->shown & HL_PANEL_PLOT) != 0, chart = (l->shown & HL_PANEL_CHART) != 0;
  guint n_right = (plot ? 1 : 0) + (chart ? 1 : 0);
  gboolean wide = b->width >= 1.15 * b->height;
  HlRect rest = *b;

  l->layout = wide ? HL_FIGURE_LAYOUT_WIDE : HL_FIGURE_LAYOUT_TALL;
  l->detail_shown = FALSE;
  if (sec)
    {
      /* the section's share: a column when wide, a row when tall; all
       * of the body when it is the only panel */
      HlRect s = *b;

      if (n_right > 0 && wide)
        {
          s.width = 0.44 * (b->width - colgap);
          rest = rect (b->x + s.width + colgap, b->y, b->width - s.width - colgap, b->height);
        }
      else if (n_right > 0)
        {
          s.height = (n_right == 2 ? 0.38 : 0.5) * (b->height - n_right * gap);
          rest = rect (b->x, b->y + s.height + gap, b->width, b->height - s.height - gap);
        }
      l->section = s;
      if (want_detail && needs_detail (f, &s))
        {
          /* the detail under a column, beside a row */
          gboolean below = n_right > 0 ? wide : !wide;

          l->detail_shown = TRUE;
          l->detail_side = below ? HL_SIDE_BELOW : HL_SIDE_RIGHT;
          if (below)
            {
              l->section.height = 0.52 * (s.height - gap);
              l->detail = rect (s.x, s.y + l->section.height + gap, s.width, s.height - l->section.height - gap);
            }
          else
            {
              l->section.width = 0.46 * (s.width - colgap);
              l->detail = rect (s.x + l->section.width + colgap, s.y, s.width - l->section.width - colgap, s.height);
            }
        }
    }
  if (n_right == 2)
    {
      /* stacked in a column or under the section; side by side when
       * they have the body to themselves and it is wide */
      if (!sec && wide)
        {
          double w = (rest.width - colgap) / 2;

          l->plot = rect (rest.x, rest.y, w, rest.height);
          l->chart = rect (rest.x + w + colgap, rest.y, rest.width - w - colgap, rest.height);
        }
      else
        {
          double ph = (sec && !wide ? 0.31 / 0.62 : 0.5) * (rest.height - gap);

          l->plot = rect (rest.x, rest.y, rest.width, ph);
          l->chart = rect (rest.x, rest.y + ph + gap, rest.width, rest.height - ph - gap);
        }
    }
  else if (plot)
    l->plot = rest;
  else if (chart)
    l->chart = rest;
}

/* the detail is only missed where the section would have needed one,
 * and it goes with the section: neither is worth a word otherwise */
static void
settle_dropped (HlFigure *f,
                Layout   *l)
{
  if (l->dropped & HL_PANEL_SECTION)
    l->dropped &= ~HL_PANEL_DETAIL;
  else if ((l->dropped & HL_PANEL_DETAIL) && !needs_detail (f, &l->section))
    l->dropped &= ~HL_PANEL_DETAIL;
}

static gboolean
plan (HlFigure *f,
      double    width,
      double    height,
      guint     panels,
      guint     dropped,
      Layout   *l)
{
  double fs = f->text->base, m = 0.9 * fs, gap = 1.2 * fs;
  double inner_w = width - 2 * m;
  double vh = f->sol != NULL ? hl_verdict_height (f, inner_w) : 0;
  gboolean screen = f->ctx->screen;
  double th = screen ? 0 : hl_title_block_height (f, inner_w);
  double nh = 0, bottom;
  g_autofree char *note = f->sol != NULL ? note_text (dropped) : NULL;
  HlRect *b = &l->body;

  l->verdict = rect (m, m, inner_w, vh);
  l->title = rect (m, height - m - th, inner_w, th);
  l->verdict_shown = f->sol != NULL;
  l->title_shown = !screen;
  l->caution_only = FALSE;
  l->shown = panels;
  l->dropped = f->sol != NULL ? dropped : 0;
  bottom = height - m - (th > 0 ? th + gap : 0);
  if (note != NULL)
    {
      hl_text_measure (f->text, HL_FONT_SMALL, note, inner_w, NULL, &nh);
      l->note = rect (m, bottom - nh, inner_w, nh);
      bottom -= nh + f->gap;
    }
  *b = rect (m, m + (vh > 0 ? vh + gap : 0), inner_w, bottom - m - (vh > 0 ? vh + gap : 0));
  l->detail_shown = FALSE;
  if (b->height < 4 * fs || b->width < 10 * fs)
    return FALSE;
  if (f->sol == NULL)
    {
      l->layout = HL_FIGURE_LAYOUT_PROBLEM;
      return TRUE;
    }
  split_body (f, l);
  settle_dropped (f, l);
  return (!(panels & HL_PANEL_SECTION) || hl_section_fits (f, &l->section, l->detail_shown))
         && (!(panels & HL_PANEL_PLOT) || hl_plot_fits (f, &l->plot))
         && (!(panels & HL_PANEL_CHART) || hl_chart_fits (f, &l->chart))
         && (!l->detail_shown || hl_detail_fits (f, &l->detail));
}

/* too small for the plot: the section alone fills the body; smaller
 * still, the verdict and the caution; at the very least the caution */
static gboolean
plan_small (HlFigure *f,
            double    width,
            double    height,
            guint     panels,
            Layout   *l)
{
  double m = 0.9 * f->text->base, inner_w = width - 2 * m;
  double vh, ch;
  g_autofree char *caution = NULL;

  plan (f, width, height, panels & HL_PANEL_SECTION, panels & ~HL_PANEL_SECTION, l);
  l->layout = HL_FIGURE_LAYOUT_SMALL;
  l->section = l->body;
  l->detail_shown = FALSE;
  settle_dropped (f, l);
  if (l->body.height >= 6 * f->text->base && l->body.width >= 8 * f->text->base)
    return TRUE;
  l->title_shown = FALSE;
  l->caution_only = !f->ctx->screen;
  l->dropped = 0;
  caution = hl_figure_caution ();
  for (double fs = f->text->base; fs >= FONT_TINY; fs *= 0.9)
    {
      set_font (f, fs);
      m = 0.9 * fs;
      inner_w = width - 2 * m;
      ch = 0;
      if (l->caution_only)
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

/* every panel asked for at the largest font that holds them, down to
 * @lo; then, at @lo, fewer panels: the chart goes first, then the
 * detail, then the section, so the stress plot stays longest */
static gboolean
plan_fonts (HlFigure *f,
            double    width,
            double    height,
            guint     want,
            double    lo,
            Layout   *l)
{
  const guint drops[] = { HL_PANEL_CHART, HL_PANEL_CHART | HL_PANEL_DETAIL,
                          HL_PANEL_CHART | HL_PANEL_DETAIL | HL_PANEL_SECTION };

  for (double fs = MAX (start_font (width, height), lo); fs >= lo - 1e-9; fs *= 0.92)
    {
      set_font (f, fs);
      if (plan (f, width, height, want, 0, l))
        return TRUE;
    }
  set_font (f, lo);
  for (guint i = 0; i < G_N_ELEMENTS (drops); i++)
    {
      guint keep = want & ~drops[i];

      if (keep != want && (keep & (HL_PANEL_SECTION | HL_PANEL_PLOT | HL_PANEL_CHART)) != 0
          && plan (f, width, height, keep, want & ~keep, l))
        return TRUE;
    }
  return FALSE;
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
  guint want;

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
    {
      f.text->boxes = g_array_new (FALSE, FALSE, sizeof (HlRect));
      f.text->wrapped = g_ptr_array_new_with_free_func (g_object_unref);
    }

  want = (ctx->panels & HL_PANELS_ALL) != 0 ? ctx->panels & HL_PANELS_ALL : HL_PANELS_ALL;
  /* the detail magnifies a piece of the section: it comes with it */
  if (!(want & HL_PANEL_SECTION))
    want &= ~HL_PANEL_DETAIL;
  if (want == 0)
    want = HL_PANEL_SECTION;
  /* on screen, readable text first; smaller text only when even the
   * stress plot alone does not fit at 9 px */
  if (ctx->screen)
    ok = plan_fonts (&f, width, height, want, FONT_MIN_SCREEN, &l);
  if (!ok)
    ok = plan_fonts (&f, width, height, want, FONT_MIN, &l);
  if (!ok)
    {
      set_font (&f, FONT_MIN);
      body = plan_small (&f, width, height, want, &l);
      if (f.sol == NULL)
        l.layout = HL_FIGURE_LAYOUT_PROBLEM;
    }
  f.geom->layout = l.layout;
  f.geom->font_size = f.text->base;
  f.geom->dropped = body ? l.dropped : 0;
  if (l.title_shown)
    f.geom->title_block = l.title;

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
  if (body && l.dropped != 0)
    {
      g_autofree char *note = note_text (l.dropped);

      hl_text_draw (f.text, HL_FONT_SMALL, note, l.note.x, l.note.y, 0, 0, l.note.width, f.pal->muted);
    }
  if (body && f.sol == NULL)
    hl_problem_draw (&f, &l.body);
  else if (body)
    {
      if (l.shown & HL_PANEL_SECTION)
        hl_section_draw (&f, &l.section, l.detail_shown ? &l.detail : NULL, l.detail_side);
      if (l.detail_shown)
        hl_detail_draw (&f, &l.detail);
      if (l.layout != HL_FIGURE_LAYOUT_SMALL && (l.shown & HL_PANEL_PLOT))
        hl_plot_draw (&f, &l.plot);
      if (l.layout != HL_FIGURE_LAYOUT_SMALL && (l.shown & HL_PANEL_CHART))
        hl_chart_draw (&f, &l.chart);
    }
  cairo_restore (cr);

  if (geometry != NULL)
    {
      geometry->text_boxes = f.text->boxes;
      geometry->wrapped = f.text->wrapped;
      f.text->boxes = NULL;
      f.text->wrapped = NULL;
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
  ctx->screen = target == HL_FIGURE_TARGET_SCREEN;
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
  if (g->wrapped != NULL)
    g_ptr_array_unref (g->wrapped);
  memset (g, 0, sizeof *g);
}
