/* hl-palette.c — the figure's colours, line widths and dash patterns
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-palette"

#include "hl-palette.h"

#include <math.h>

#define RGB(hex) { ((hex) >> 16 & 0xff) / 255.0, ((hex) >> 8 & 0xff) / 255.0, ((hex) & 0xff) / 255.0 }

/* Okabe–Ito hues; on paper the darker members carry the main curves */
static const HlPalette light = {
  .paper = RGB (0xffffff), .ink = RGB (0x1a1a1a), .muted = RGB (0x5c5c5c),
  .grid = RGB (0xdedede), .frame = RGB (0x9a9a9a),
  .hoop = RGB (0x0072b2), .thin_hoop = RGB (0xe69f00), .radial = RGB (0xd55e00),
  .axial = RGB (0x009e73), .von_mises = RGB (0xcc79a7), .tresca = RGB (0x6a3d9a),
  .band = RGB (0x56b4e9), .rule = RGB (0x6b6b6b), .marker = RGB (0x1a1a1a), .marker_edge = RGB (0xffffff),
  .corrosion = RGB (0xefe4cc), .corrosion_hatch = RGB (0x8a7450),
  .problem_fill = RGB (0xf4f6f8), .problem_edge = RGB (0x7d8a96),
  .pass = RGB (0x007a5a), .fail = RGB (0xb34700),
  .band_alpha = 0.22,
};

/* on a dark ground the lighter members of the same set read best */
static const HlPalette dark = {
  .paper = RGB (0x1e1f22), .ink = RGB (0xe6e6e6), .muted = RGB (0xa8a8a8),
  .grid = RGB (0x3b3d42), .frame = RGB (0x6e7076),
  .hoop = RGB (0x56b4e9), .thin_hoop = RGB (0xf0c040), .radial = RGB (0xf08040),
  .axial = RGB (0x2fc99f), .von_mises = RGB (0xe3a0cb), .tresca = RGB (0xb9a3e0),
  .band = RGB (0x56b4e9), .rule = RGB (0xa0a0a0), .marker = RGB (0xf5f5f5), .marker_edge = RGB (0x1e1f22),
  .corrosion = RGB (0x4a4335), .corrosion_hatch = RGB (0xc2ad84),
  .problem_fill = RGB (0x2a2c30), .problem_edge = RGB (0x8a96a2),
  .pass = RGB (0x4fd1a5), .fail = RGB (0xf29a5c),
  .band_alpha = 0.20,
};

const HlPalette *
hl_palette_get (HlFigureStyle style)
{
  return style == HL_FIGURE_STYLE_DARK ? &dark : &light;
}

void
hl_palette_set_source (cairo_t *cr,
                       HlRgb    colour)
{
  cairo_set_source_rgb (cr, colour.r, colour.g, colour.b);
}

void
hl_palette_set_source_a (cairo_t *cr,
                         HlRgb    colour,
                         double   alpha)
{
  cairo_set_source_rgba (cr, colour.r, colour.g, colour.b, alpha);
}

void
hl_palette_set_dash (cairo_t *cr,
                     HlDash   dash,
                     double   unit)
{
  /* butt caps throughout: round-capped dots cost a polygon each, and
   * short square dashes read as dots at line widths of a unit or two */
  double dashed[] = { 5 * unit, 3 * unit };
  double dotted[] = { 1.2 * unit, 1.6 * unit };
  double dash_dot[] = { 7 * unit, 2 * unit, 1.2 * unit, 2 * unit };
  double long_dash[] = { 11 * unit, 3.5 * unit };

  cairo_set_line_cap (cr, CAIRO_LINE_CAP_BUTT);

  switch (dash)
    {
    case HL_DASH_DASHED:
      cairo_set_dash (cr, dashed, G_N_ELEMENTS (dashed), 0);
      break;
    case HL_DASH_DOTTED:
      cairo_set_dash (cr, dotted, G_N_ELEMENTS (dotted), 0);
      break;
    case HL_DASH_DASH_DOT:
      cairo_set_dash (cr, dash_dot, G_N_ELEMENTS (dash_dot), 0);
      break;
    case HL_DASH_LONG:
      cairo_set_dash (cr, long_dash, G_N_ELEMENTS (long_dash), 0);
      break;
    case HL_DASH_SOLID:
    default:
      cairo_set_dash (cr, NULL, 0, 0);
      break;
    }
}

HlRgb
hl_palette_scale (double t)
{
  /* a viridis-like ramp run from light to dark: yellow, green, teal,
   * blue, violet; lightness falls monotonically along it */
  static const HlRgb stops[] = {
    RGB (0xfde725), RGB (0x7ad151), RGB (0x22a884), RGB (0x2a788e), RGB (0x414487), RGB (0x440154),
  };
  const int last = G_N_ELEMENTS (stops) - 1;
  double x, f;
  int i;
  HlRgb c;

  if (!isfinite (t))
    t = 0.5;
  x = CLAMP (t, 0.0, 1.0) * last;
  i = MIN ((int) floor (x), last - 1);
  f = x - i;
  c.r = stops[i].r + f * (stops[i + 1].r - stops[i].r);
  c.g = stops[i].g + f * (stops[i + 1].g - stops[i].g);
  c.b = stops[i].b + f * (stops[i + 1].b - stops[i].b);
  return c;
}
