/* hl-render-test.c — shared helpers of the render tests
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-render-test"

#include "hl-render-test.h"
#include "hl-project-file.h"

#include <math.h>

char *
hl_rt_demo_path (void)
{
  const char *src = g_getenv ("HL_SOURCE_DIR");

  g_assert_nonnull (src);
  return g_build_filename (src, "data", "examples", "demo.hoop", NULL);
}

HlProject *
hl_rt_load_demo (void)
{
  g_autofree char *path = hl_rt_demo_path ();
  g_autoptr(GError) error = NULL;
  HlProject *p = hl_project_load (path, NULL, &error);

  g_assert_no_error (error);
  g_assert_nonnull (p);
  return p;
}

HlShellInputs
hl_rt_cylinder (double id_mm,
                double t_mm,
                double bar,
                double ca_mm)
{
  HlShellInputs in = hl_shell_inputs_default ();

  in.size_kind = HL_SIZE_INNER_DIAMETER;
  in.size = hl_quantity_make (id_mm, "mm");
  in.wall_thickness = hl_quantity_make (t_mm, "mm");
  in.corrosion_allowance = hl_quantity_make (ca_mm, "mm");
  in.internal_pressure = hl_quantity_make (bar, "bar");
  in.material.elastic_modulus = hl_quantity_make (200, "GPa");
  in.material.poisson_ratio = 0.3;
  /* a strong material keeps the warnings few; they do not matter here */
  in.material.yield_strength = hl_quantity_make (2000, "MPa");
  in.material.allowable_stress = hl_quantity_make (1000, "MPa");
  return in;
}

HlSolution *
hl_rt_solve (const HlShellInputs *in)
{
  g_autoptr(GError) error = NULL;
  HlSolution *sol = hl_solve (in, HL_DEFAULT_POINTS, TRUE, &error);

  g_assert_no_error (error);
  return sol;
}

HlFigureContext
hl_rt_context (const HlProject  *project,
               const HlSolution *sol,
               HlFigureStyle     style)
{
  HlFigureContext ctx = { 0 };

  ctx.project = project;
  ctx.solution = sol;
  ctx.units = HL_UNIT_SYSTEM_SI;
  ctx.style = style;
  ctx.export_date = "2026-12-01";
  return ctx;
}

cairo_surface_t *
hl_rt_render_context (const HlFigureContext *ctx,
                      int                    width,
                      int                    height,
                      HlFigureGeometry      *geometry)
{
  cairo_surface_t *s = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, width, height);
  cairo_t *cr = cairo_create (s);

  hl_figure_draw_full (cr, width, height, ctx, geometry);
  g_assert_cmpint (cairo_status (cr), ==, CAIRO_STATUS_SUCCESS);
  cairo_destroy (cr);
  cairo_surface_flush (s);
  return s;
}

cairo_surface_t *
hl_rt_render (const HlProject  *project,
              const HlSolution *sol,
              int               width,
              int               height,
              HlFigureStyle     style,
              HlFigureGeometry *geometry)
{
  HlFigureContext ctx = hl_rt_context (project, sol, style);

  return hl_rt_render_context (&ctx, width, height, geometry);
}

HlRgb
hl_rt_pixel (cairo_surface_t *s,
             int              x,
             int              y)
{
  const unsigned char *data = cairo_image_surface_get_data (s);
  int stride = cairo_image_surface_get_stride (s);
  guint32 px;
  HlRgb c = { 1, 1, 1 };

  if (x < 0 || y < 0 || x >= cairo_image_surface_get_width (s) || y >= cairo_image_surface_get_height (s))
    return c;
  px = *(const guint32 *) (data + y * stride + 4 * x);
  /* the figure paints an opaque ground, so premultiplied = straight */
  c.r = ((px >> 16) & 0xff) / 255.0;
  c.g = ((px >> 8) & 0xff) / 255.0;
  c.b = (px & 0xff) / 255.0;
  return c;
}

double
hl_rt_distance (HlRgb a,
                HlRgb c)
{
  return MAX (fabs (a.r - c.r), MAX (fabs (a.g - c.g), fabs (a.b - c.b)));
}

gboolean
hl_rt_colour_near (cairo_surface_t *s,
                   double           x,
                   double           y,
                   int              radius,
                   HlRgb            c,
                   double           tol)
{
  for (int dy = -radius; dy <= radius; dy++)
    for (int dx = -radius; dx <= radius; dx++)
      if (hl_rt_distance (hl_rt_pixel (s, (int) floor (x) + dx, (int) floor (y) + dy), c) <= tol)
        return TRUE;
  return FALSE;
}
