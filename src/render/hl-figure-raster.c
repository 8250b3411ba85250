/* hl-figure-raster.c — wall shading and hatching, fast on pixel surfaces
 *
 * cairo's radial gradients and many stroked hatch lines cost tens of
 * milliseconds on a large image surface.  On pixel targets (the window's
 * canvas, PNG) the shading is computed once per pixel from a colour
 * table and the hatch is a repeating tile; on vector targets (PDF, SVG)
 * both stay true vector: a radial gradient and stroked lines.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-raster"

#include "hl-figure-private.h"

#include <math.h>

#define LUT_SIZE 1024
#define MAX_PIXELS (24 * 1024 * 1024)

typedef struct
{
  double sx, sy;     /* user units to pixels */
  double tx, ty;     /* pixel position of the user origin */
} Raster;

/* TRUE on an image surface with an axis-aligned transformation */
static gboolean
raster_of (cairo_t *cr,
           Raster  *r)
{
  cairo_surface_t *target = cairo_get_group_target (cr);
  cairo_matrix_t m;
  double dsx = 1, dsy = 1, dox = 0, doy = 0;

  if (cairo_surface_get_type (target) != CAIRO_SURFACE_TYPE_IMAGE)
    return FALSE;
  cairo_get_matrix (cr, &m);
  if (m.xy != 0 || m.yx != 0 || !(m.xx > 0) || !(m.yy > 0))
    return FALSE;
  cairo_surface_get_device_scale (target, &dsx, &dsy);
  cairo_surface_get_device_offset (target, &dox, &doy);
  r->sx = m.xx * dsx;
  r->sy = m.yy * dsy;
  r->tx = m.x0 * dsx + dox;
  r->ty = m.y0 * dsy + doy;
  return TRUE;
}

/* extents of the current path within the clip, snapped to pixels */
static gboolean
pixel_box (cairo_t      *cr,
           const Raster *r,
           double       *x0,
           double       *y0,
           int          *w,
           int          *h)
{
  double a0, b0, a1, b1, c0, d0, c1, d1, px0, py0, px1, py1;

  cairo_fill_extents (cr, &a0, &b0, &a1, &b1);
  cairo_clip_extents (cr, &c0, &d0, &c1, &d1);
  a0 = MAX (a0, c0);
  b0 = MAX (b0, d0);
  a1 = MIN (a1, c1);
  b1 = MIN (b1, d1);
  if (!(a1 > a0 && b1 > b0))
    return FALSE;
  px0 = floor (a0 * r->sx + r->tx);
  py0 = floor (b0 * r->sy + r->ty);
  px1 = ceil (a1 * r->sx + r->tx);
  py1 = ceil (b1 * r->sy + r->ty);
  *x0 = (px0 - r->tx) / r->sx;
  *y0 = (py0 - r->ty) / r->sy;
  *w = (int) (px1 - px0);
  *h = (int) (py1 - py0);
  return *w > 0 && *h > 0 && (double) *w * *h <= MAX_PIXELS;
}

static void
set_pixel_source (cairo_t         *cr,
                  cairo_surface_t *image,
                  const Raster    *r,
                  double           x0,
                  double           y0,
                  cairo_extend_t   extend)
{
  cairo_pattern_t *pat = cairo_pattern_create_for_surface (image);
  cairo_matrix_t m;

  /* pattern space is the image's pixels: one pixel per device pixel */
  cairo_matrix_init_scale (&m, r->sx, r->sy);
  cairo_matrix_translate (&m, -x0, -y0);
  cairo_pattern_set_matrix (pat, &m);
  cairo_pattern_set_filter (pat, CAIRO_FILTER_NEAREST);
  cairo_pattern_set_extend (pat, extend);
  cairo_set_source (cr, pat);
  cairo_pattern_destroy (pat);
}

void
hl_wall_hoop_range (const HlSolution *sol,
                    double           *lo,
                    double           *hi)
{
  *lo = INFINITY;
  *hi = -INFINITY;
  for (guint i = 0; i < sol->n_points; i++)
    {
      *lo = MIN (*lo, sol->points[i].hoop);
      *hi = MAX (*hi, sol->points[i].hoop);
    }
}

/* hoop stress at @r (metres) between the solution's points */
static double
hoop_at (const HlSolution *sol,
         double            r)
{
  double x = (r - sol->a) / (sol->b - sol->a) * (sol->n_points - 1);
  int i = (int) floor (x);

  if (i < 0)
    return sol->points[0].hoop;
  if (i >= (int) sol->n_points - 1)
    return sol->points[sol->n_points - 1].hoop;
  return sol->points[i].hoop + (x - i) * (sol->points[i + 1].hoop - sol->points[i].hoop);
}

/* a wall all in compression (external pressure) is darkest where the
 * hoop stress is most negative: the scale follows the magnitude */
static gboolean
reversed_range (double lo,
                double hi)
{
  return hi <= 0 && lo < 0;
}

/* one stress all through the wall, to the rounding of the solution
 * (no load, or equal pressures inside and out): one colour, not stripes
 * of rounding noise stretched over the scale */
static gboolean
uniform_range (double lo,
               double hi)
{
  return !(hi - lo > 1e-9 * MAX (fabs (lo), fabs (hi)));
}

gboolean
hl_wall_scale_uniform (const HlSolution *sol)
{
  double lo, hi;

  hl_wall_hoop_range (sol, &lo, &hi);
  return uniform_range (lo, hi);
}

static double
position_in (double hoop,
             double lo,
             double hi)
{
  double t = !uniform_range (lo, hi) ? (hoop - lo) / (hi - lo) : 0.5;

  return reversed_range (lo, hi) ? 1 - t : t;
}

gboolean
hl_wall_scale_reversed (const HlSolution *sol)
{
  double lo, hi;

  hl_wall_hoop_range (sol, &lo, &hi);
  return reversed_range (lo, hi);
}

double
hl_wall_scale_position (const HlSolution *sol,
                        double            hoop)
{
  double lo, hi;

  hl_wall_hoop_range (sol, &lo, &hi);
  return position_in (hoop, lo, hi);
}

static cairo_pattern_t *
wall_gradient (HlFigure *f,
               double    cx,
               double    cy,
               double    px_per_m)
{
  const HlSolution *sol = f->sol;
  cairo_pattern_t *pat = cairo_pattern_create_radial (cx, cy, sol->a * px_per_m, cx, cy, sol->b * px_per_m);
  const int stops = 24;

  for (int i = 0; i < stops; i++)
    {
      double r = sol->a + (sol->b - sol->a) * i / (stops - 1);
      HlRgb c = hl_palette_scale (hl_wall_scale_position (sol, hoop_at (sol, r)));

      cairo_pattern_add_color_stop_rgb (pat, (double) i / (stops - 1), c.r, c.g, c.b);
    }
  return pat;
}

/* premultiplied @colour at coverage @alpha */
static guint32
argb (guint32 colour,
      double  alpha)
{
  guint32 a = (guint32) lround (alpha * 255);

  if (a >= 255)
    return colour;
  return a << 24 | (((colour >> 16) & 0xff) * a / 255) << 16 | (((colour >> 8) & 0xff) * a / 255) << 8
         | ((colour & 0xff) * a / 255);
}

/* The ring between @r0 and @r1 (metres), shaded and with its edges
 * blended by their exact coverage, painted as one image: cheaper than
 * rasterising the two circles as a mask. */
static gboolean
wall_pixels (HlFigure *f,
             double    cx,
             double    cy,
             double    px_per_m,
             double    r0,
             double    r1)
{
  const HlSolution *sol = f->sol;
  cairo_t *cr = f->cr;
  Raster r;
  double x0, y0, lo, hi;
  int w, h, stride;
  cairo_surface_t *img;
  unsigned char *data;
  guint32 lut[LUT_SIZE];

  /* a circle stays a circle in pixels only under a uniform scale */
  if (!raster_of (cr, &r) || fabs (r.sx - r.sy) > 1e-9 || !pixel_box (cr, &r, &x0, &y0, &w, &h))
    return FALSE;
  hl_wall_hoop_range (sol, &lo, &hi);
  for (int k = 0; k < LUT_SIZE; k++)
    {
      double r2 = sol->a * sol->a + (sol->b * sol->b - sol->a * sol->a) * k / (LUT_SIZE - 1);
      HlRgb c = hl_palette_scale (position_in (hoop_at (sol, sqrt (r2)), lo, hi));

      lut[k] = 0xff000000u | (guint32) lround (c.r * 255) << 16 | (guint32) lround (c.g * 255) << 8
               | (guint32) lround (c.b * 255);
    }
  img = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, w, h);
  if (cairo_surface_status (img) != CAIRO_STATUS_SUCCESS)
    {
      cairo_surface_destroy (img);
      return FALSE;
    }
  cairo_surface_flush (img);
  data = cairo_image_surface_get_data (img);
  stride = cairo_image_surface_get_stride (img);
  {
    /* in pixels of the image: centre, the ring's radii, and the squared
     * radii of the table and of the fully covered band; each row visits
     * only the two chords the ring crosses */
    double ccx = (cx - x0) * r.sx;
    double ra = r0 * px_per_m * r.sx, rb = r1 * px_per_m * r.sx;
    double la = sol->a * px_per_m * r.sx, lb = sol->b * px_per_m * r.sx;
    double k0 = la * la, kscale = (LUT_SIZE - 1) / (lb * lb - la * la);
    double in2 = (ra + 0.5) * (ra + 0.5), out2 = MAX (rb - 0.5, 0) * MAX (rb - 0.5, 0);
    double lo2 = MAX (ra - 0.5, 0) * MAX (ra - 0.5, 0), hi2 = (rb + 0.5) * (rb + 0.5);

    for (int j = 0; j < h; j++)
      {
        guint32 *row = (guint32 *) (data + (gsize) j * stride);
        double dy = (y0 - cy) * r.sy + j + 0.5, dy2 = dy * dy;
        double outer = dy2 < hi2 ? sqrt (hi2 - dy2) + 1 : -1;
        double inner = dy2 < lo2 ? MAX (sqrt (lo2 - dy2) - 1, 0) : 0;

        if (outer < 0)
          continue;
        for (int side = -1; side <= 1; side += 2)
          {
            double from = ccx + side * inner, to = ccx + side * outer;
            int i0 = MAX (0, (int) floor (MIN (from, to))), i1 = MIN (w, (int) ceil (MAX (from, to)));

            for (int i = i0; i < i1; i++)
              {
                double dx = i + 0.5 - ccx, d2 = dx * dx + dy2;
                double k = (d2 - k0) * kscale;
                guint32 c = lut[k <= 0 ? 0 : k >= LUT_SIZE - 1 ? LUT_SIZE - 1 : (int) k];

                if (d2 >= in2 && d2 <= out2)
                  row[i] = c;
                else if (d2 > lo2 && d2 < hi2)
                  {
                    double d = sqrt (d2);

                    row[i] = argb (c, CLAMP (rb - d + 0.5, 0, 1) * CLAMP (d - ra + 0.5, 0, 1));
                  }
              }
          }
      }
  }
  cairo_surface_mark_dirty (img);
  cairo_new_path (cr);
  set_pixel_source (cr, img, &r, x0, y0, CAIRO_EXTEND_NONE);
  cairo_paint (cr);
  cairo_surface_destroy (img);
  return TRUE;
}

void
hl_wall_fill (HlFigure *f,
              double    cx,
              double    cy,
              double    px_per_m,
              double    r0,
              double    r1)
{
  cairo_pattern_t *pat;

  if (wall_pixels (f, cx, cy, px_per_m, r0, r1))
    return;
  pat = wall_gradient (f, cx, cy, px_per_m);
  cairo_set_source (f->cr, pat);
  cairo_fill (f->cr);
  cairo_pattern_destroy (pat);
}

static double
hatch_step (HlFigure *f)
{
  return MAX (3.0, 0.45 * f->text->base);
}

static gboolean
hatch_pixels (HlFigure *f)
{
  cairo_t *cr = f->cr;
  Raster r;
  int n;

  if (!raster_of (cr, &r) || fabs (r.sx - r.sy) > 1e-9)
    return FALSE;
  /* a square tile of whole pixels with one diagonal; repeated, the
   * diagonals join into lines.  One tile serves the whole figure. */
  n = MAX (3, (int) lround (hatch_step (f) * r.sx));
  if (f->hatch_tile == NULL || cairo_image_surface_get_width (f->hatch_tile) != n)
    {
      cairo_t *tc;

      g_clear_pointer (&f->hatch_tile, cairo_surface_destroy);
      f->hatch_tile = cairo_image_surface_create (CAIRO_FORMAT_RGB24, n, n);
      tc = cairo_create (f->hatch_tile);
      hl_palette_set_source (tc, f->pal->corrosion);
      cairo_paint (tc);
      hl_palette_set_source (tc, f->pal->corrosion_hatch);
      cairo_set_line_width (tc, MAX (0.6 * f->lw * r.sx, 0.8));
      for (int k = -1; k <= 1; k++)
        {
          cairo_move_to (tc, k * n, n);
          cairo_line_to (tc, k * n + n, 0);
        }
      cairo_stroke (tc);
      cairo_destroy (tc);
    }
  set_pixel_source (cr, f->hatch_tile, &r, -r.tx / r.sx, -r.ty / r.sy, CAIRO_EXTEND_REPEAT);
  cairo_fill (cr);
  return TRUE;
}

void
hl_hatch (HlFigure *f)
{
  /* fills the current path with the corrosion band: a light ground and
   * diagonal lines, which survive greyscale and colour-blind reading */
  double step = hatch_step (f);
  double x0, y0, x1, y1;

  if (hatch_pixels (f))
    return;
  cairo_save (f->cr);
  cairo_clip_preserve (f->cr);
  hl_palette_set_source (f->cr, f->pal->corrosion);
  cairo_fill_preserve (f->cr);
  cairo_clip_extents (f->cr, &x0, &y0, &x1, &y1);
  cairo_new_path (f->cr);
  for (double s = x0 - (y1 - y0); s < x1; s += step)
    {
      cairo_move_to (f->cr, s, y1);
      cairo_line_to (f->cr, s + (y1 - y0), y0);
    }
  cairo_set_line_width (f->cr, 0.6 * f->lw);
  hl_palette_set_source (f->cr, f->pal->corrosion_hatch);
  cairo_stroke (f->cr);
  cairo_restore (f->cr);
}
