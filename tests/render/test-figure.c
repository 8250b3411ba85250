/* test-figure.c — the figure measured from its pixels
 *
 * Figures are drawn into image surfaces, no display.  The section must be
 * to scale (drawn radii in the ratio b/a), the plot must put known Lamé
 * stresses where its axes say, and no two texts may overlap at any size.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-figure"

#include "hl-render-test.h"
#include "hl-figure-private.h"
#include "hl-sheet-private.h"

#include <math.h>

#define MPA 1e6

/* ---- the section, read along the ray the figure keeps clear ---- */

static double
coverage (cairo_surface_t *s,
          HlRgb            paper,
          double           x,
          double           y)
{
  int x0 = (int) floor (x), y0 = (int) floor (y);
  double fx = x - x0, fy = y - y0;
  /* pixel centres sit at +0.5: sample the four around the point */
  double d00 = hl_rt_distance (hl_rt_pixel (s, x0, y0), paper);
  double d10 = hl_rt_distance (hl_rt_pixel (s, x0 + 1, y0), paper);
  double d01 = hl_rt_distance (hl_rt_pixel (s, x0, y0 + 1), paper);
  double d11 = hl_rt_distance (hl_rt_pixel (s, x0 + 1, y0 + 1), paper);

  return (1 - fy) * ((1 - fx) * d00 + fx * d10) + fy * ((1 - fx) * d01 + fx * d11);
}

/* innermost and outermost radius along the clear ray where the drawing
 * is half way from paper to ink: the edges of the two surface lines */
static void
measure_wall (cairo_surface_t         *s,
              const HlSectionGeometry *g,
              HlRgb                    paper,
              double                  *inner,
              double                  *outer)
{
  double ux = cos (g->clear_angle), uy = -sin (g->clear_angle);
  double r0 = 0.5 * g->r_inner_new, r1 = 1.25 * g->r_outer;
  const double half = 0.45;

  *inner = *outer = NAN;
  for (double r = r0; r <= r1; r += 0.02)
    if (coverage (s, paper, g->cx + r * ux - 0.5, g->cy + r * uy - 0.5) >= half)
      {
        *inner = r;
        break;
      }
  for (double r = r1; r >= r0; r -= 0.02)
    if (coverage (s, paper, g->cx + r * ux - 0.5, g->cy + r * uy - 0.5) >= half)
      {
        *outer = r;
        break;
      }
}

static void
check_to_scale (const HlShellInputs *in,
                int                  width,
                int                  height)
{
  g_autoptr(HlSolution) sol = hl_rt_solve (in);
  HlFigureGeometry g = { 0 };
  cairo_surface_t *s = hl_rt_render (NULL, sol, width, height, HL_FIGURE_STYLE_LIGHT, &g);
  const HlPalette *pal = hl_palette_get (HL_FIGURE_STYLE_LIGHT);
  double a_new, b, dummy, inner, outer, lw = g.section.line_width;
  double k_new;

  hl_shell_inputs_radii (in, FALSE, &a_new, &b);
  hl_shell_inputs_radii (in, TRUE, &dummy, &dummy);
  k_new = b / a_new;
  g_assert_true (g.section.drawn);
  /* the geometry the figure reports: one scale for every radius */
  g_assert_cmpfloat_with_epsilon (g.section.r_outer / g.section.r_inner_new, k_new, 1e-9 * k_new);
  g_assert_cmpfloat_with_epsilon (g.section.r_outer / g.section.r_inner, sol->b / sol->a, 1e-9 * sol->k);
  g_assert_cmpfloat_with_epsilon (g.section.r_outer, b * g.section.px_per_m, 1e-9 * g.section.r_outer);

  /* and what the pixels say: the surface lines are centred on the
   * surfaces, so the ink reaches half a line width beyond each */
  measure_wall (s, &g.section, pal->paper, &inner, &outer);
  g_test_message ("%s %dx%d: outer %.2f (drawn %.2f), inner %.2f (drawn %.2f), k %.5f", in->id, width, height,
                  outer - lw / 2, g.section.r_outer, inner + lw / 2, g.section.r_inner_new, k_new);
  g_assert_true (isfinite (inner) && isfinite (outer));
  g_assert_cmpfloat (fabs (outer - lw / 2 - g.section.r_outer), <=, 1.0);
  g_assert_cmpfloat (fabs (inner + lw / 2 - g.section.r_inner_new), <=, 1.0);
  /* the measured outer radius is the measured inner one times b/a */
  g_assert_cmpfloat (fabs ((outer - lw / 2) - k_new * (inner + lw / 2)), <=, 1.0);
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);
}

static void
test_section_thin (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  /* R/t about 100, no allowance: a wall of two or three pixels */
  HlShellInputs pipe = hl_rt_cylinder (1000, 5, 10, 0);

  g_strlcpy (pipe.id, "thin-pipe", sizeof pipe.id);
  check_to_scale (&pipe, 1200, 800);
  check_to_scale (&pipe, 600, 900);
  check_to_scale (hl_project_find_shell (demo, "air-receiver"), 1200, 800);
  check_to_scale (hl_project_find_shell (demo, "air-receiver"), 800, 500);
}

static void
test_section_thick (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  HlShellInputs k3 = hl_rt_cylinder (50, 50, 100, 2);

  g_strlcpy (k3.id, "k3-with-allowance", sizeof k3.id);
  check_to_scale (hl_project_find_shell (demo, "press-barrel"), 1200, 800);
  check_to_scale (hl_project_find_shell (demo, "press-barrel"), 600, 900);
  check_to_scale (hl_project_find_shell (demo, "n2-sphere"), 1200, 800);
  check_to_scale (&k3, 1000, 700);
}

static void
test_section_detail (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(HlSolution) thin = hl_rt_solve (hl_project_find_shell (demo, "air-receiver"));
  g_autoptr(HlSolution) thick = hl_rt_solve (hl_project_find_shell (demo, "press-barrel"));
  HlFigureGeometry g = { 0 };
  cairo_surface_t *s = hl_rt_render (demo, thin, 1200, 850, HL_FIGURE_STYLE_LIGHT, &g);
  double wall_px;

  /* a 10 mm wall on a 1.2 m bore is a few pixels at true scale: a
   * magnified detail must come with it, and it must make the wall
   * readable */
  g_assert_true (g.section.has_detail);
  wall_px = (g.section.r_outer - g.section.r_inner_new) * g.section.magnification;
  g_assert_cmpfloat (g.section.r_outer - g.section.r_inner_new, <, 14);
  g_assert_cmpfloat (wall_px, >=, 30);
  /* the box on the ring is the frame scaled down by the magnification */
  g_assert_cmpfloat_with_epsilon (g.section.detail_box.width * g.section.magnification,
                                  MAX (g.section.detail_frame.width, 0.9 * g.font_size * g.section.magnification),
                                  1e-6 * g.section.detail_frame.width);
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);

  s = hl_rt_render (demo, thick, 1200, 850, HL_FIGURE_STYLE_LIGHT, &g);
  g_assert_false (g.section.has_detail);
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);
}

/* ---- the through-thickness plot against Timoshenko's closed forms ---- */

/* Timoshenko, Strength of Materials Part II (thick cylinder, internal
 * pressure p only): hoop = p a^2/(b^2 - a^2) (1 + b^2/r^2),
 * radial = p a^2/(b^2 - a^2) (1 - b^2/r^2) */
static double
timoshenko_hoop (double p, double a, double b, double r)
{
  return p * a * a / (b * b - a * a) * (1 + b * b / (r * r));
}

static double
timoshenko_radial (double p, double a, double b, double r)
{
  return p * a * a / (b * b - a * a) * (1 - b * b / (r * r));
}

static void
test_plot_k2 (void)
{
  /* k = 2: bore 80 mm, wall 40 mm, 400 bar = 40 MPa */
  HlShellInputs in = hl_rt_cylinder (80, 40, 400, 0);
  g_autoptr(HlSolution) sol = hl_rt_solve (&in);
  const HlPalette *pal = hl_palette_get (HL_FIGURE_STYLE_LIGHT);
  const double p = 40 * MPA, a = 0.040, b = 0.080, t = b - a;
  HlFigureGeometry g = { 0 };
  cairo_surface_t *s = hl_rt_render (NULL, sol, 1200, 800, HL_FIGURE_STYLE_LIGHT, &g);
  double x, y, x0, y0;

  g_assert_true (g.plot.drawn);
  /* the wall spans the plot: r = a on the left edge, r = b on the right */
  hl_plot_geometry_to_user (&g.plot, HL_UNIT_SYSTEM_SI, a, 0, &x0, &y0);
  g_assert_cmpfloat (fabs (x0 - g.plot.area.x), <, 1e-6);
  hl_plot_geometry_to_user (&g.plot, HL_UNIT_SYSTEM_SI, b, 0, &x, &y);
  g_assert_cmpfloat (fabs (x - g.plot.area.x - g.plot.area.width), <, 1e-6);
  g_assert_cmpfloat (g.plot.y.v0, <=, -40);
  g_assert_cmpfloat (g.plot.y.v1, >=, 5 * 40 / 3.0);

  /* Timoshenko: for k = 2 the inner hoop stress is 5p/3; the peak
   * marker sits there, its centre in marker colour, a few units off not */
  hl_plot_geometry_to_user (&g.plot, HL_UNIT_SYSTEM_SI, a, 5 * p / 3, &x, &y);
  g_assert_true (hl_rt_colour_near (s, x, y, 0, pal->marker, 0.1));
  g_assert_false (hl_rt_colour_near (s, x + 1, y + 0.9 * g.font_size, 0, pal->marker, 0.1));

  /* the curves cross the pixels of the closed-form stresses */
  for (double f = 0.05; f < 1.0; f += 0.3)
    {
      double r = a + f * t;

      hl_plot_geometry_to_user (&g.plot, HL_UNIT_SYSTEM_SI, r, timoshenko_hoop (p, a, b, r), &x, &y);
      g_assert_true (hl_rt_colour_near (s, x, y, 1, pal->hoop, 0.12));
      /* and not a line width or two away from them */
      g_assert_false (hl_rt_colour_near (s, x, y + 6, 1, pal->hoop, 0.12));
      g_assert_false (hl_rt_colour_near (s, x, y - 6, 1, pal->hoop, 0.12));
      hl_plot_geometry_to_user (&g.plot, HL_UNIT_SYSTEM_SI, r, timoshenko_radial (p, a, b, r), &x, &y);
      g_assert_true (hl_rt_colour_near (s, x, y, 1, pal->radial, 0.12));
    }
  /* Timoshenko: the outer hoop stress for k = 2 is 2p/3 */
  hl_plot_geometry_to_user (&g.plot, HL_UNIT_SYSTEM_SI, b - 0.01 * t, 2 * p / 3, &x, &y);
  g_assert_true (hl_rt_colour_near (s, x - 1, y, 1, pal->hoop, 0.12));

  /* thin-wall hoop on the mean radius, p R / t = 1.5 p, dashed: some
   * dash lies in any stretch of a few dash lengths */
  {
    gboolean seen = FALSE;

    for (int dx = 0; dx < 20 && !seen; dx++)
      {
        hl_plot_geometry_to_user (&g.plot, HL_UNIT_SYSTEM_SI, a + 0.6 * t, 1.5 * p, &x, &y);
        seen = hl_rt_colour_near (s, x + dx, y, 1, pal->thin_hoop, 0.12);
      }
    g_assert_true (seen);
  }
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);
}

/* ---- the thinness chart reads the engine ---- */

static void
test_chart_curve (void)
{
  HlShellInputs cyl = hl_rt_cylinder (100, 5, 10, 0);
  HlShellInputs sph = cyl;
  g_autoptr(HlSolution) sc = hl_rt_solve (&cyl);
  g_autoptr(HlSolution) ss = NULL;
  double m[40], e[40];

  sph.form = HL_FORM_SPHERE;
  ss = hl_rt_solve (&sph);
  g_assert_cmpuint (hl_chart_curve (sc, 0.6, 1000, 40, m, e), ==, 40);
  for (guint i = 0; i < 40; i++)
    {
      /* a = 1, b = (2m+1)/(2m-1): mean radius over thickness is m.
       * Timoshenko: peak hoop p (a^2 + b^2)/(b^2 - a^2); thin p Rm / t */
      double a = 1, b = (2 * m[i] + 1) / (2 * m[i] - 1), t = b - a, rm = (a + b) / 2;
      double peak = (a * a + b * b) / (b * b - a * a), thin = rm / t;

      g_assert_cmpfloat_with_epsilon (rm / t, m[i], 1e-9 * m[i]);
      g_assert_cmpfloat_with_epsilon (e[i], 100 * (thin - peak) / peak, 1e-7);
    }
  g_assert_cmpuint (hl_chart_curve (ss, 0.6, 1000, 40, m, e), ==, 40);
  for (guint i = 0; i < 40; i++)
    {
      /* Lai, Rubin & Krempl §5.21: tangential at a = p (b^3 + 2 a^3) /
       * (2 (b^3 - a^3)); thin sphere p Rm / 2t */
      double a = 1, b = (2 * m[i] + 1) / (2 * m[i] - 1), t = b - a, rm = (a + b) / 2;
      double peak = (b * b * b + 2 * a * a * a) / (2 * (b * b * b - a * a * a)), thin = rm / (2 * t);

      g_assert_cmpfloat_with_epsilon (e[i], 100 * (thin - peak) / peak, 1e-7);
    }
}

static void
test_chart_design_point (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_find_shell (demo, "press-barrel"));
  HlFigureGeometry g = { 0 };
  cairo_surface_t *s = hl_rt_render (demo, sol, 1200, 800, HL_FIGURE_STYLE_LIGHT, &g);
  const HlPalette *pal = hl_palette_get (HL_FIGURE_STYLE_LIGHT);

  /* the point sits at this design's R/t and error on the chart's axes */
  g_assert_true (g.chart.drawn);
  g_assert_true (g.chart.x.log);
  g_assert_cmpfloat (fabs (g.chart.design_x - hl_axis_map (&g.chart.x, sol->mean_ratio)), <, 1e-9);
  g_assert_cmpfloat (fabs (g.chart.design_y - hl_axis_map (&g.chart.y, sol->thin_wall_error.value)), <, 1e-9);
  g_assert_true (hl_rt_colour_near (s, g.chart.design_x, g.chart.design_y, 0, pal->marker, 0.1));
  /* the rule-of-thumb line at R/t = 10 is drawn (common practice),
   * dashed: a dash lies in any stretch of a few dash lengths */
  {
    gboolean seen = FALSE;

    for (int dy = 0; dy < 20 && !seen; dy++)
      seen = hl_rt_colour_near (s, hl_axis_map (&g.chart.x, 10), g.chart.area.y + g.chart.area.height / 2 + dy, 1,
                                pal->rule, 0.2);
    g_assert_true (seen);
  }
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);
}

/* ---- layout: no overlaps, at every size ---- */

static void
check_no_overlap_on (const HlProject  *project,
                     const HlSolution *sol,
                     int               width,
                     int               height,
                     HlFigureStyle     style,
                     gboolean          screen)
{
  HlFigureGeometry g = { 0 };
  HlFigureContext ctx = hl_rt_context (project, sol, style);
  cairo_surface_t *s;
  GArray *b;

  /* on screen the title block and the caution are the window's */
  ctx.screen = screen;
  s = hl_rt_render_context (&ctx, width, height, &g);
  b = g.text_boxes;
  g_assert_nonnull (b);
  if (!screen)
    g_assert_cmpuint (b->len, >=, 1);   /* the caution, at the least */
  /* the leader to the peak hoop stress in the detail crosses no text,
   * its own label included */
  for (guint i = 0; g.section.has_peak_leader && i < b->len; i++)
    if (hl_rect_overlaps (&g.section.peak_leader, &g_array_index (b, HlRect, i)))
      g_error ("%s %dx%d: the peak leader crosses text %u", sol ? sol->inputs.id : "-", width, height, i);
  for (guint i = 0; i < b->len; i++)
    {
      const HlRect *r = &g_array_index (b, HlRect, i);

      if (r->x < -0.5 || r->y < -0.5 || r->x + r->width > width + 0.5 || r->y + r->height > height + 0.5)
        g_error ("%s %dx%d: text %u outside the figure (%.1f, %.1f, %.1f x %.1f)", sol ? sol->inputs.id : "-",
                 width, height, i, r->x, r->y, r->width, r->height);
      for (guint j = i + 1; j < b->len; j++)
        if (hl_rect_overlaps (r, &g_array_index (b, HlRect, j)))
          {
            const HlRect *q = &g_array_index (b, HlRect, j);

            g_error ("%s %dx%d: texts %u (%.1f, %.1f, %.1f x %.1f) and %u (%.1f, %.1f, %.1f x %.1f) overlap",
                     sol ? sol->inputs.id : "-", width, height, i, r->x, r->y, r->width, r->height, j, q->x, q->y,
                     q->width, q->height);
          }
    }
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);
}

static void
check_no_overlap (const HlProject  *project,
                  const HlSolution *sol,
                  int               width,
                  int               height,
                  HlFigureStyle     style)
{
  check_no_overlap_on (project, sol, width, height, style, FALSE);
}

static void
test_no_overlap (void)
{
  static const int sizes[][2] = {
    { 842, 595 }, { 1920, 1080 }, { 800, 500 }, { 600, 900 }, { 595, 842 }, { 1000, 1000 },
    { 1400, 500 }, { 500, 1400 }, { 400, 300 }, { 300, 400 }, { 160, 120 }, { 100, 100 },
  };
  g_autoptr(HlProject) demo = hl_rt_load_demo ();

  for (guint i = 0; i < hl_project_n_shells (demo); i++)
    {
      g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_shell (demo, i));

      for (guint k = 0; k < G_N_ELEMENTS (sizes); k++)
        {
          check_no_overlap (demo, sol, sizes[k][0], sizes[k][1], HL_FIGURE_STYLE_LIGHT);
          check_no_overlap (demo, sol, sizes[k][0], sizes[k][1], HL_FIGURE_STYLE_DARK);
          check_no_overlap_on (demo, sol, sizes[k][0], sizes[k][1], HL_FIGURE_STYLE_DARK, TRUE);
        }
    }
  for (guint k = 0; k < G_N_ELEMENTS (sizes); k++)
    check_no_overlap (demo, NULL, sizes[k][0], sizes[k][1], HL_FIGURE_STYLE_LIGHT);
}

/* shells at the edges of what the figure must draw: external pressure,
 * no load, a wall far thinner than any chart default, a very thick one,
 * spheres, open and plane-strain ends, radii given instead of diameters */
static GPtrArray *
edge_shells (void)
{
  GPtrArray *list = g_ptr_array_new_with_free_func (g_free);
  HlShellInputs base = hl_rt_cylinder (500, 10, 20, 1), *s;

#define ADD(code) (s = g_memdup2 (&base, sizeof base), code, g_ptr_array_add (list, s))
  ADD ((s->external_pressure = hl_quantity_make (40, "bar"), s->internal_pressure = hl_quantity_make (0, "bar")));
  ADD ((s->internal_pressure = hl_quantity_make (0, "bar")));
  ADD ((s->size = hl_quantity_make (5000, "mm"), s->wall_thickness = hl_quantity_make (0.5, "mm"),
        s->corrosion_allowance = hl_quantity_make (0, "mm")));
  ADD ((s->size = hl_quantity_make (20, "mm"), s->wall_thickness = hl_quantity_make (90, "mm")));
  ADD ((s->form = HL_FORM_SPHERE, s->external_pressure = hl_quantity_make (5, "bar")));
  ADD ((s->ends = HL_ENDS_OPEN, s->size_kind = HL_SIZE_OUTER_RADIUS));
  ADD ((s->ends = HL_ENDS_PLANE_STRAIN, s->size_kind = HL_SIZE_INNER_RADIUS, s->thin_basis = HL_BASIS_OUTER,
        s->verdict_measure = HL_MEASURE_EQUIVALENT));
  ADD ((s->thin_basis = HL_BASIS_INNER, s->corrosion_allowance = hl_quantity_make (8, "mm")));
  /* the Tresca and the thin von Mises lines with their legend entries;
   * equal pressures inside and out, one stress through the wall */
  ADD ((s->sizing_criterion = HL_CRITERION_TRESCA, s->verdict_measure = HL_MEASURE_BOTH));
  ADD ((s->external_pressure = hl_quantity_make (20, "bar")));
#undef ADD
  return list;
}

static void
test_edge_shells (void)
{
  static const int sizes[][2] = { { 842, 595 }, { 600, 900 }, { 1920, 1080 }, { 800, 500 } };
  g_autoptr(GPtrArray) shells = edge_shells ();

  for (guint i = 0; i < shells->len; i++)
    {
      g_autoptr(HlSolution) sol = hl_rt_solve (g_ptr_array_index (shells, i));

      for (guint k = 0; k < G_N_ELEMENTS (sizes); k++)
        check_no_overlap (NULL, sol, sizes[k][0], sizes[k][1], HL_FIGURE_STYLE_LIGHT);
    }
}

static void
test_layouts (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_find_shell (demo, "air-receiver"));
  HlFigureGeometry g = { 0 };
  cairo_surface_t *s;

  s = hl_rt_render (demo, sol, 842, 595, HL_FIGURE_STYLE_LIGHT, &g);
  g_assert_cmpint (g.layout, ==, HL_FIGURE_LAYOUT_WIDE);
  g_assert_true (g.section.drawn && g.plot.drawn && g.chart.drawn);
  cairo_surface_destroy (s);
  s = hl_rt_render (demo, sol, 600, 900, HL_FIGURE_STYLE_LIGHT, &g);
  g_assert_cmpint (g.layout, ==, HL_FIGURE_LAYOUT_TALL);
  g_assert_true (g.section.drawn && g.plot.drawn && g.chart.drawn);
  cairo_surface_destroy (s);
  /* too small for every panel: the section only, still to scale */
  s = hl_rt_render (demo, sol, 200, 160, HL_FIGURE_STYLE_LIGHT, &g);
  g_assert_cmpint (g.layout, ==, HL_FIGURE_LAYOUT_SMALL);
  g_assert_false (g.plot.drawn);
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);
}

static void
test_problem (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  const HlPalette *pal = hl_palette_get (HL_FIGURE_STYLE_LIGHT);
  cairo_surface_t *s = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 900, 600);
  cairo_t *cr = cairo_create (s);
  HlFigureContext ctx = { 0 };
  HlFigureGeometry g = { 0 };
  gboolean box = FALSE;

  ctx.project = demo;
  ctx.problem_text = "Wall thickness: must be greater than zero.";
  ctx.shell = hl_project_shell (demo, 0);
  hl_figure_draw_full (cr, 900, 600, &ctx, &g);
  cairo_surface_flush (s);
  /* a message instead of results: no panel, the box in the middle */
  g_assert_cmpint (g.layout, ==, HL_FIGURE_LAYOUT_PROBLEM);
  g_assert_false (g.section.drawn || g.plot.drawn || g.chart.drawn);
  /* in the middle of the room the title block leaves */
  for (int x = 300; x < 600 && !box; x += 5)
    for (int y = 150; y < 350 && !box; y += 5)
      box = hl_rt_distance (hl_rt_pixel (s, x, y), pal->problem_fill) < 0.02;
  g_assert_true (box);
  cairo_destroy (cr);
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);
}

/* the sheet's text of @ctx, rows joined */
static char *
sheet_text (const HlFigureContext *ctx)
{
  g_autoptr(GArray) rows = hl_sheet_rows (ctx);
  GString *out = g_string_new (NULL);

  for (guint i = 0; i < rows->len; i++)
    {
      const HlSheetRow *r = &g_array_index (rows, HlSheetRow, i);

      for (guint c = 0; c < r->n_cells; c++)
        g_string_append_printf (out, "%s|", r->cells[c] != NULL ? r->cells[c] : "");
      g_string_append_c (out, '\n');
    }
  return g_string_free (out, FALSE);
}

/* The sheet shows the new wall beside the corroded one from the
 * caller's analysis (solved once per export or print job), not from a
 * solve of its own per page: the demo receiver has a 1.5 mm allowance. */
static void
test_sheet_reads_new_wall (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  const HlShellInputs *shell = hl_project_shell (demo, 0);
  g_autoptr(HlSolution) corroded = hl_rt_solve (shell);
  g_autoptr(HlSolution) fresh = hl_solve (shell, HL_DEFAULT_POINTS, FALSE, NULL);
  HlShellInputs thicker = *shell;
  g_autoptr(HlSolution) other = NULL;
  HlFigureContext own, given, wrong;
  g_autofree char *own_text = NULL, *given_text = NULL, *wrong_text = NULL;

  g_assert_nonnull (fresh);
  thicker.wall_thickness = hl_quantity_make (20, "mm");
  other = hl_solve (&thicker, HL_DEFAULT_POINTS, FALSE, NULL);
  hl_figure_context_init (&own, demo, shell, corroded, NULL, NULL, HL_FIGURE_TARGET_PAPER);
  hl_figure_context_init (&given, demo, shell, corroded, fresh, NULL, HL_FIGURE_TARGET_PAPER);
  hl_figure_context_init (&wrong, demo, shell, corroded, other, NULL, HL_FIGURE_TARGET_PAPER);
  own_text = sheet_text (&own);
  given_text = sheet_text (&given);
  wrong_text = sheet_text (&wrong);
  g_assert_cmpstr (given_text, ==, own_text);
  g_assert_cmpstr (wrong_text, !=, own_text);
}

static void
test_dark (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_shell (demo, 0));
  cairo_surface_t *s = hl_rt_render (demo, sol, 842, 595, HL_FIGURE_STYLE_DARK, NULL);
  const HlPalette *dark = hl_palette_get (HL_FIGURE_STYLE_DARK);

  g_assert_cmpfloat (hl_rt_distance (hl_rt_pixel (s, 1, 1), dark->paper), <, 0.01);
  g_assert_cmpfloat (hl_rt_distance (hl_rt_pixel (s, 1, 1), hl_palette_get (HL_FIGURE_STYLE_LIGHT)->paper), >, 0.5);
  cairo_surface_destroy (s);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/render/section/thin-to-scale", test_section_thin);
  g_test_add_func ("/render/section/thick-to-scale", test_section_thick);
  g_test_add_func ("/render/section/detail", test_section_detail);
  g_test_add_func ("/render/plot/timoshenko-k2", test_plot_k2);
  g_test_add_func ("/render/chart/curve", test_chart_curve);
  g_test_add_func ("/render/chart/design-point", test_chart_design_point);
  g_test_add_func ("/render/layout/no-overlap", test_no_overlap);
  g_test_add_func ("/render/layout/choice", test_layouts);
  g_test_add_func ("/render/layout/edge-shells", test_edge_shells);
  g_test_add_func ("/render/problem", test_problem);
  g_test_add_func ("/render/dark", test_dark);
  g_test_add_func ("/render/sheet-reads-new-wall", test_sheet_reads_new_wall);
  return g_test_run ();
}
