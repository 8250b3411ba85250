/* hl-figure-private.h — what the figure's panels share while drawing
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-figure-format.h"
#include "hl-figure-geometry.h"
#include "hl-palette.h"
#include "hl-result-rows.h"
#include "hl-text.h"

G_BEGIN_DECLS

typedef struct
{
  cairo_t               *cr;
  const HlFigureContext *ctx;
  const HlSolution      *sol;
  const HlPalette       *pal;
  HlText                *text;
  HlUnitSystem           units;
  gboolean               locale;
  double                 lw;     /* base line width */
  double                 gap;    /* base spacing */
  HlFigureGeometry      *geom;   /* always set; the caller's or a scratch one */
  cairo_surface_t       *hatch_tile;  /* made on first use, freed with the figure */
} HlFigure;

typedef enum
{
  HL_SIDE_NONE,
  HL_SIDE_BELOW,
  HL_SIDE_RIGHT,
} HlSide;

/* hl-figure-section.c: the ring to scale.  @detail is the area the
 * magnified detail will take (NULL when the wall reads at true scale);
 * fills f->geom->section and draws the ring, its dimensions and the box. */
gboolean hl_section_needs_detail (HlFigure     *f,
                                  const HlRect *area);
/* the ring, its dimensions and (without a detail) its key have room */
gboolean hl_section_fits         (HlFigure     *f,
                                  const HlRect *area,
                                  gboolean      with_detail);
void     hl_section_draw         (HlFigure     *f,
                                  const HlRect *area,
                                  const HlRect *detail,
                                  HlSide        detail_side);

/* hl-figure-detail.c: the magnified wall, shaded by the hoop stress */
void     hl_detail_fit           (HlFigure     *f,
                                  const HlRect *area,
                                  HlSide        side);
void     hl_detail_draw          (HlFigure     *f,
                                  const HlRect *area);
/* hl-figure-raster.c: fills the current path, the ring between radii
 * @r0 and @r1 (metres) about (@cx, @cy) at @px_per_m or a piece of it,
 * with the analysis wall's hoop-stress shading (the ring, the detail);
 * hl_hatch() fills the current path with the corrosion band's hatching */
void     hl_wall_fill            (HlFigure     *f,
                                  double        cx,
                                  double        cy,
                                  double        px_per_m,
                                  double        r0,
                                  double        r1);
/* where @hoop sits on the colour scale, 0..1; reversed for a wall in
 * compression, whose key then runs from the least to the most negative */
double   hl_wall_scale_position  (const HlSolution *sol,
                                  double            hoop);
gboolean hl_wall_scale_reversed  (const HlSolution *sol);
/* the lowest and highest Lamé hoop stress in the wall, SI */
void     hl_wall_hoop_range      (const HlSolution *sol,
                                  double           *lo,
                                  double           *hi);
/* the same stress all through the wall: one colour, one value */
gboolean hl_wall_scale_uniform   (const HlSolution *sol);
/* colour legend for the hoop stress, vertical (at most @room high) or
 * horizontal */
void     hl_stress_legend_size   (HlFigure     *f,
                                  gboolean      vertical,
                                  double        room,
                                  double       *width,
                                  double       *height);
void     hl_stress_legend_draw   (HlFigure     *f,
                                  const HlRect *area,
                                  gboolean      vertical);
void     hl_hatch                (HlFigure     *f);

/* hl-figure-plot.c, hl-figure-chart.c; _fits() says whether @area
 * leaves a readable plot once heading, legend and labels are placed */
gboolean hl_plot_fits            (HlFigure     *f,
                                  const HlRect *area);
void     hl_plot_draw            (HlFigure     *f,
                                  const HlRect *area);
gboolean hl_chart_fits           (HlFigure     *f,
                                  const HlRect *area);
void     hl_chart_draw           (HlFigure     *f,
                                  const HlRect *area);
gboolean hl_detail_fits          (HlFigure     *f,
                                  const HlRect *area);
/* the thin-wall error curve, from the engine: returns the finite count */
guint    hl_chart_curve          (const HlSolution *sol,
                                  double            m_lo,
                                  double            m_hi,
                                  guint             n,
                                  double           *m,
                                  double           *error);

/* hl-figure-axes.c: grid, frame, ticks and labels of a plot area */
double   hl_axes_tick_length     (HlFigure     *f);
void     hl_axes_layout          (HlFigure     *f,
                                  const HlRect *body,
                                  double        lo,
                                  double        hi,
                                  HlAxis       *y,
                                  HlRect       *area,
                                  double       *label_height);
void     hl_axes_draw            (HlFigure     *f,
                                  const HlRect *area,
                                  const HlAxis *x,
                                  const HlAxis *y);

/* hl-figure-title.c: verdict (top), title block (bottom), problem box */
double   hl_verdict_height       (HlFigure     *f,
                                  double        width);
void     hl_verdict_draw         (HlFigure     *f,
                                  const HlRect *area);
double   hl_title_block_height   (HlFigure     *f,
                                  double        width);
void     hl_title_block_draw     (HlFigure     *f,
                                  const HlRect *area);
void     hl_problem_draw         (HlFigure     *f,
                                  const HlRect *area);

/* hl-figure-parts.c: drawing pieces several panels use */
double   hl_panel_heading        (HlFigure     *f,
                                  const HlRect *area,
                                  const char   *title,
                                  const char   *subtitle);
double   hl_panel_heading_height (HlFigure     *f,
                                  double        width,
                                  const char   *title,
                                  const char   *subtitle);
double   hl_arrow_head_length    (HlFigure     *f);
void     hl_arrow_head           (HlFigure     *f,
                                  double        x,
                                  double        y,
                                  double        dx,
                                  double        dy);
void     hl_dimension            (HlFigure     *f,
                                  double        x0,
                                  double        y0,
                                  double        x1,
                                  double        y1);
void     hl_marker               (HlFigure     *f,
                                  double        x,
                                  double        y,
                                  double        size);
char    *hl_stress_text          (HlFigure     *f,
                                  double        si,
                                  int           digits);
char    *hl_length_text          (HlFigure     *f,
                                  double        si,
                                  int           digits);
const char *hl_stress_unit       (HlFigure     *f);
const char *hl_length_unit       (HlFigure     *f);
double   hl_stress_value         (HlFigure     *f,
                                  double        si);
double   hl_length_value         (HlFigure     *f,
                                  double        si);

G_END_DECLS
