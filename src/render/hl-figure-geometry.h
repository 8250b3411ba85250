/* hl-figure-geometry.h — where the figure put things, for tests and hit tests
 *
 * hl_figure_draw_full() reports the drawn geometry: the ring's radii in
 * user units, the plot's and the chart's axes, every text box.  Tests
 * check the pixels against it; the window may use it to answer clicks.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-axis.h"
#include "hl-figure.h"
#include "hl-text.h"

G_BEGIN_DECLS

typedef enum
{
  HL_FIGURE_LAYOUT_WIDE,      /* 2 x 2 panels */
  HL_FIGURE_LAYOUT_TALL,      /* panels stacked */
  HL_FIGURE_LAYOUT_SMALL,     /* too small for all panels: section only */
  HL_FIGURE_LAYOUT_PROBLEM,   /* no solution: the message box */
} HlFigureLayout;

typedef struct
{
  gboolean drawn;
  double   cx, cy;             /* ring centre */
  double   r_outer;            /* outer surface */
  double   r_inner_new;        /* inner surface of the new wall */
  double   r_inner;            /* inner surface after corrosion (analysis wall) */
  double   px_per_m;           /* drawing scale, user units per metre */
  double   line_width;         /* outline width, centred on each surface */
  double   clear_angle;        /* radians, counter-clockwise from +x with y up:
                                * a ray from the centre that crosses nothing
                                * but the wall */
  gboolean has_detail;
  double   magnification;      /* of the detail relative to the section */
  double   detail_angle;       /* where on the ring the detail comes from */
  HlRect   detail_box;         /* the small box on the ring */
  HlRect   detail_frame;       /* the magnified view */
  gboolean has_peak_leader;    /* the detail's arrow to the peak hoop stress */
  HlRect   peak_leader;        /* its box, head and shaft */
  HlRect   peak_label;         /* its text */
} HlSectionGeometry;

typedef struct
{
  gboolean drawn;
  HlRect   area;               /* inside the axes */
  HlAxis   x;                  /* radius in the display length unit */
  HlAxis   y;                  /* stress in the display stress unit */
} HlPlotGeometry;

typedef struct
{
  gboolean drawn;
  HlRect   area;
  HlAxis   x;                  /* mean radius / thickness, log */
  HlAxis   y;                  /* thin-wall error, percent */
  double   design_x, design_y; /* where this design's point is drawn */
} HlChartGeometry;

/* the colour key of the shaded wall */
typedef struct
{
  gboolean drawn;
  guint    n_ticks;            /* values written on the key */
  gboolean uniform;            /* one colour, one value */
  char     range[128];         /* stated when the stress varies little, else "" */
} HlLegendGeometry;

typedef struct
{
  HlFigureLayout    layout;
  double            font_size;  /* base size used, user units */
  HlSectionGeometry section;
  HlPlotGeometry    plot;
  HlChartGeometry   chart;
  HlLegendGeometry  legend;
  GArray           *text_boxes; /* HlRect of every string drawn */
  guint             dropped;    /* HlFigurePanels asked for, left out for want of
                                 * room (the figure says which) */
  HlRect            title_block; /* zero when not drawn (on screen) */
  GPtrArray        *wrapped;    /* PangoLayout of every string drawn wrapped */
} HlFigureGeometry;

/* hl_figure_draw() that also fills @geometry (may be NULL). */
void hl_figure_draw_full        (cairo_t               *cr,
                                 double                 width,
                                 double                 height,
                                 const HlFigureContext *ctx,
                                 HlFigureGeometry      *geometry);
void hl_figure_geometry_clear   (HlFigureGeometry      *geometry);

/* user-space position of radius @r_si (m) and stress @stress_si (Pa) */
void hl_plot_geometry_to_user   (const HlPlotGeometry  *plot,
                                 HlUnitSystem           units,
                                 double                 r_si,
                                 double                 stress_si,
                                 double                *x,
                                 double                *y);

G_END_DECLS
