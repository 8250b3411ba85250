/* hl-palette.h — the figure's colours, line widths and dash patterns
 *
 * Colours follow the Okabe–Ito set, which stays distinct for the common
 * colour-vision deficiencies; every curve also has its own dash pattern
 * so a greyscale print still tells them apart.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <cairo.h>
#include <glib.h>

#include "hl-figure.h"

G_BEGIN_DECLS

typedef struct
{
  double r, g, b;
} HlRgb;

typedef enum
{
  HL_DASH_SOLID,
  HL_DASH_DASHED,
  HL_DASH_DOTTED,
  HL_DASH_DASH_DOT,
  HL_DASH_LONG,
} HlDash;

typedef struct
{
  HlRgb paper, ink, muted, grid, frame;
  HlRgb hoop, thin_hoop, radial, axial, von_mises, tresca;
  HlRgb band, rule, marker, marker_edge;
  HlRgb corrosion, corrosion_hatch;
  HlRgb problem_fill, problem_edge;
  HlRgb pass, fail;
  double band_alpha;
} HlPalette;

const HlPalette *hl_palette_get          (HlFigureStyle style);

void             hl_palette_set_source   (cairo_t      *cr,
                                          HlRgb         colour);
void             hl_palette_set_source_a (cairo_t      *cr,
                                          HlRgb         colour,
                                          double        alpha);
/* @unit is the figure's base line width; patterns scale with it */
void             hl_palette_set_dash     (cairo_t      *cr,
                                          HlDash        dash,
                                          double        unit);

/* Sequential colour scale for the wall shading, @t in [0, 1] from the
 * lowest to the highest stress.  Lightness falls steadily with @t, so
 * "darker = more stressed" also holds in greyscale. */
HlRgb            hl_palette_scale        (double        t);

G_END_DECLS
