/* test-figure-panels.c — what the figure shows: panels, key, leader, lines, words
 *
 * Figures drawn into image surfaces, no display, read back from their
 * pixels and from the geometry the figure reports.  The stresses the
 * lines must sit at are worked by hand from the closed forms:
 * - Lamé thick cylinder (Timoshenko, Strength of Materials II, thick
 *   cylinders): sigma_theta(r) = p a^2 / (b^2 - a^2) (1 + b^2 / r^2),
 *   sigma_r(r) = p a^2 / (b^2 - a^2) (1 - b^2 / r^2); so the hoop stress
 *   falls across the wall by exactly p, and equal pressures inside and
 *   out leave sigma_theta = sigma_r = -p all through the wall.
 * - Tresca: the largest principal stress difference, here sigma_theta -
 *   sigma_r = 2 p a^2 b^2 / ((b^2 - a^2) r^2) (Tresca 1864; common practice).
 * - Thin closed cylinder: sigma_theta = p R / t, sigma_z = sigma_theta / 2,
 *   sigma_r = 0, whose von Mises stress is (sqrt 3 / 2) sigma_theta
 *   (common practice).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-figure-panels"

#include "hl-config.h"
#include "hl-render-test.h"
#include "hl-figure-private.h"

#include <libintl.h>
#include <locale.h>
#include <math.h>
#include <string.h>

#define MPA 1e6

static const int sizes[][2] = {
  { 842, 595 }, { 1920, 1080 }, { 800, 500 }, { 600, 900 }, { 595, 842 }, { 1000, 1000 },
  { 1400, 500 }, { 500, 1400 }, { 500, 350 }, { 400, 300 }, { 300, 400 }, { 868, 579 },
};

static guint
count_colour (cairo_surface_t *s,
              HlRgb            c)
{
  guint n = 0;

  for (int y = 0; y < cairo_image_surface_get_height (s); y++)
    for (int x = 0; x < cairo_image_surface_get_width (s); x++)
      n += hl_rt_distance (hl_rt_pixel (s, x, y), c) <= 0.06 ? 1 : 0;
  return n;
}

/* A4 landscape at 72 dpi, the panels of @panels */
static cairo_surface_t *
render_panels (const HlProject  *project,
               const HlSolution *sol,
               guint             panels,
               HlFigureGeometry *g)
{
  HlFigureContext ctx = hl_rt_context (project, sol, HL_FIGURE_STYLE_LIGHT);

  ctx.panels = panels;
  return hl_rt_render_context (&ctx, 842, 595, g);
}

/* ---- panels: those asked for, and the room of those left out ---- */

static void
test_panels_honoured (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_find_shell (demo, "air-receiver"));
  const HlPalette *pal = hl_palette_get (HL_FIGURE_STYLE_LIGHT);
  HlFigureGeometry all = { 0 }, g = { 0 };
  cairo_surface_t *s;
  double all_plot;

  /* the thin-wall hoop line (dashed) and the radial curve are drawn in
   * colours no other panel uses: with the plot they are there ... */
  s = render_panels (demo, sol, 0, &all);
  g_assert_true (all.section.drawn && all.plot.drawn && all.chart.drawn);
  g_assert_cmpuint (count_colour (s, pal->thin_hoop) + count_colour (s, pal->radial), >, 50);
  all_plot = all.plot.area.width * all.plot.area.height;
  cairo_surface_destroy (s);

  /* ... and without it not one pixel of them */
  s = render_panels (demo, sol, HL_PANEL_SECTION | HL_PANEL_DETAIL | HL_PANEL_CHART, &g);
  g_assert_false (g.plot.drawn);
  g_assert_true (g.section.drawn && g.section.has_detail && g.chart.drawn);
  g_assert_cmpuint (count_colour (s, pal->thin_hoop) + count_colour (s, pal->radial), ==, 0);
  g_assert_cmpuint (g.dropped, ==, 0);
  cairo_surface_destroy (s);

  /* the plot alone takes the room of the others */
  s = render_panels (demo, sol, HL_PANEL_PLOT, &g);
  g_assert_true (g.plot.drawn);
  g_assert_false (g.section.drawn || g.chart.drawn);
  g_assert_cmpfloat (g.plot.area.width * g.plot.area.height, >, 2 * all_plot);
  cairo_surface_destroy (s);

  /* plot and chart, no section: no ring drawn, its room shared */
  s = render_panels (demo, sol, HL_PANEL_PLOT | HL_PANEL_CHART, &g);
  g_assert_true (g.plot.drawn && g.chart.drawn);
  g_assert_false (g.section.drawn);
  g_assert_cmpfloat (g.plot.area.width * g.plot.area.height, >, all_plot);
  cairo_surface_destroy (s);

  /* the section without its detail, though the 10 mm wall of a 1.2 m
   * ring would want one: not drawn, and not said to be missing */
  s = render_panels (demo, sol, HL_PANEL_SECTION, &g);
  g_assert_true (g.section.drawn);
  g_assert_false (g.section.has_detail || g.plot.drawn || g.chart.drawn);
  g_assert_cmpuint (g.dropped, ==, 0);
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&all);
  hl_figure_geometry_clear (&g);
}

/* every panel asked for is drawn or named as left out; a small export
 * (500 x 350 pt) keeps the stress plot */
static void
test_small_keeps_plot (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  static const guint panels[] = { HL_PANEL_SECTION, HL_PANEL_PLOT, HL_PANEL_CHART };

  for (guint i = 0; i < hl_project_n_shells (demo); i++)
    {
      g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_shell (demo, i));

      for (guint k = 0; k < G_N_ELEMENTS (sizes); k++)
        {
          HlFigureGeometry g = { 0 };
          cairo_surface_t *s = hl_rt_render (demo, sol, sizes[k][0], sizes[k][1], HL_FIGURE_STYLE_LIGHT, &g);
          gboolean drawn[] = { g.section.drawn, g.plot.drawn, g.chart.drawn };

          for (guint p = 0; p < G_N_ELEMENTS (panels); p++)
            if (drawn[p] == ((g.dropped & panels[p]) != 0))
              g_error ("%s %dx%d: panel %u drawn %d, said left out %d", sol->inputs.id, sizes[k][0], sizes[k][1],
                       panels[p], drawn[p], (g.dropped & panels[p]) != 0);
          if (sizes[k][0] == 500 && sizes[k][1] == 350)
            g_assert_true (g.plot.drawn);
          cairo_surface_destroy (s);
          hl_figure_geometry_clear (&g);
        }
    }
}

/* ---- the colour key of the shaded wall ---- */

static void
test_legend_ticks_thick (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  /* the press barrel, k = 2: Lamé hoop 66.7 MPa at the bore, 26.7 MPa
   * outside; a key over 40 MPa reads with three or more values */
  g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_find_shell (demo, "press-barrel"));

  for (guint k = 0; k < 8; k++)
    {
      HlFigureGeometry g = { 0 };
      cairo_surface_t *s = hl_rt_render (demo, sol, sizes[k][0], sizes[k][1], HL_FIGURE_STYLE_LIGHT, &g);

      g_assert_true (g.legend.drawn);
      g_test_message ("press-barrel %dx%d: %u ticks", sizes[k][0], sizes[k][1], g.legend.n_ticks);
      g_assert_cmpuint (g.legend.n_ticks, >=, 3);
      g_assert_false (g.legend.uniform);
      /* a 40 MPa spread over 67 MPa is no small variation */
      g_assert_cmpstr (g.legend.range, ==, "");
      cairo_surface_destroy (s);
      hl_figure_geometry_clear (&g);
    }
}

static void
test_legend_range_thin (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  /* the air receiver, corroded: a = 601.5 mm, b = 610 mm, p = 1.1 MPa;
   * Lamé: the hoop stress falls by p across the wall, which is
   * (b^2 - a^2) / (b^2 + a^2) = 1.40 % of its bore value */
  g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_find_shell (demo, "air-receiver"));
  HlFigureGeometry g = { 0 };
  cairo_surface_t *s = hl_rt_render (demo, sol, 842, 595, HL_FIGURE_STYLE_LIGHT, &g);
  double a = 0.6015, b = 0.610, lo, hi;

  hl_wall_hoop_range (sol, &lo, &hi);
  g_assert_cmpfloat_with_epsilon (hi - lo, 1.1 * MPA, 1e-6 * MPA);
  g_assert_cmpfloat_with_epsilon (100 * (hi - lo) / hi, 100 * (b * b - a * a) / (b * b + a * a), 1e-6);
  g_assert_true (g.legend.drawn);
  g_test_message ("air-receiver key: %s", g.legend.range);
  g_assert_nonnull (strstr (g.legend.range, "range 1.4" HL_NBSP "%"));
  g_assert_true (g_str_has_prefix (g.legend.range, "77.3 – 78.4"));
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);
}

static void
test_legend_uniform (void)
{
  /* 50 bar inside and out: sigma_theta = sigma_r = -5 MPa all through
   * the wall (Lamé) */
  HlShellInputs in = hl_rt_cylinder (80, 40, 50, 0);
  g_autoptr(HlSolution) sol = NULL;
  HlFigureGeometry g = { 0 };
  cairo_surface_t *s;
  HlRgb first;
  double ux, uy;

  in.external_pressure = hl_quantity_make (50, "bar");
  sol = hl_rt_solve (&in);
  for (guint i = 0; i < sol->n_points; i++)
    g_assert_cmpfloat_with_epsilon (sol->points[i].hoop, -5 * MPA, 1e-6 * MPA);
  s = hl_rt_render (NULL, sol, 842, 595, HL_FIGURE_STYLE_LIGHT, &g);
  g_assert_true (g.legend.drawn && g.legend.uniform);
  g_assert_cmpuint (g.legend.n_ticks, ==, 1);
  /* one colour across the wall, not stripes */
  ux = cos (g.section.clear_angle);
  uy = -sin (g.section.clear_angle);
  first = hl_rt_pixel (s, (int) (g.section.cx + (g.section.r_inner + 3) * ux),
                       (int) (g.section.cy + (g.section.r_inner + 3) * uy));
  for (double r = g.section.r_inner + 3; r < g.section.r_outer - 3; r += 1)
    g_assert_cmpfloat (hl_rt_distance (hl_rt_pixel (s, (int) (g.section.cx + r * ux), (int) (g.section.cy + r * uy)),
                                       first), <, 0.02);
  cairo_surface_destroy (s);
  hl_figure_geometry_clear (&g);
}

/* ---- the peak's leader in the detail ---- */

static void
test_leader_clear (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  HlShellInputs bare = hl_rt_cylinder (1200, 10, 11, 0);
  g_autoptr(HlSolution) corroded = hl_rt_solve (hl_project_find_shell (demo, "air-receiver"));
  g_autoptr(HlSolution) plain = hl_rt_solve (&bare);
  const HlSolution *sols[] = { corroded, plain };

  for (guint i = 0; i < G_N_ELEMENTS (sols); i++)
    for (guint k = 0; k < 6; k++)
      {
        HlFigureGeometry g = { 0 };
        cairo_surface_t *s = hl_rt_render (demo, sols[i], sizes[k][0], sizes[k][1], HL_FIGURE_STYLE_LIGHT, &g);

        /* a 10 mm wall on a 1.2 m ring: the detail shows it, with the
         * peak at the bore named (Lamé: the hoop stress peaks there) */
        g_assert_true (g.section.has_detail);
        g_assert_true (g.section.has_peak_leader);
        g_assert_false (hl_rect_overlaps (&g.section.peak_leader, &g.section.peak_label));
        for (guint j = 0; j < g.text_boxes->len; j++)
          g_assert_false (hl_rect_overlaps (&g.section.peak_leader, &g_array_index (g.text_boxes, HlRect, j)));
        cairo_surface_destroy (s);
        hl_figure_geometry_clear (&g);
      }
}

/* ---- the equivalent-stress lines of the plot ---- */

/* k = 2: bore 80 mm, wall 40 mm, 400 bar; a material whose limits keep
 * the stress axis short, so lines a few MPa apart are pixels apart */
static HlShellInputs
barrel (HlVerdictMeasure measure,
        HlCriterion      criterion)
{
  HlShellInputs in = hl_rt_cylinder (80, 40, 400, 0);

  in.material.yield_strength = hl_quantity_make (300, "MPa");
  in.material.allowable_stress = hl_quantity_make (150, "MPa");
  in.verdict_measure = measure;
  in.sizing_criterion = criterion;
  return in;
}

/* some dash of a line of colour @c crosses a stretch of 20 units from
 * (@r_si, @stress_si) to the right */
static gboolean
line_near (cairo_surface_t        *s,
           const HlFigureGeometry *g,
           double                  r_si,
           double                  stress_si,
           HlRgb                   c)
{
  double x, y;

  hl_plot_geometry_to_user (&g->plot, HL_UNIT_SYSTEM_SI, r_si, stress_si, &x, &y);
  for (int dx = 0; dx < 20; dx++)
    if (hl_rt_colour_near (s, x + dx, y, 1, c, 0.12))
      return TRUE;
  return FALSE;
}

static void
test_thin_von_mises_line (void)
{
  const HlPalette *pal = hl_palette_get (HL_FIGURE_STYLE_LIGHT);
  const double p = 40 * MPA;
  /* mean radius 60 mm, t 40 mm: p R / t = 1.5 p = 60 MPa, von Mises of
   * the membrane state (sqrt 3 / 2) 60 = 51.96 MPa */
  const double thin_vm = sqrt (3) / 2 * 1.5 * p;
  HlVerdictMeasure measures[] = { HL_MEASURE_EQUIVALENT, HL_MEASURE_HOOP };

  for (guint m = 0; m < G_N_ELEMENTS (measures); m++)
    {
      HlShellInputs in = barrel (measures[m], HL_CRITERION_VON_MISES);
      g_autoptr(HlSolution) sol = hl_rt_solve (&in);
      HlFigureGeometry g = { 0 };
      cairo_surface_t *s = hl_rt_render (NULL, sol, 1200, 800, HL_FIGURE_STYLE_LIGHT, &g);

      g_assert_true (g.plot.drawn);
      /* near the bore, where the Lamé von Mises curve (same colour,
       * long dashes) stands near 80 MPa, far from the thin line */
      g_assert_true (line_near (s, &g, 0.0415, thin_vm, pal->von_mises) == (measures[m] == HL_MEASURE_EQUIVALENT));
      g_assert_true (line_near (s, &g, 0.0430, thin_vm, pal->von_mises) == (measures[m] == HL_MEASURE_EQUIVALENT));
      cairo_surface_destroy (s);
      hl_figure_geometry_clear (&g);
    }
}

static void
test_tresca_line (void)
{
  const HlPalette *pal = hl_palette_get (HL_FIGURE_STYLE_LIGHT);
  const double p = 40 * MPA, a = 0.040, b = 0.080;
  HlCriterion criteria[] = { HL_CRITERION_TRESCA, HL_CRITERION_VON_MISES };

  for (guint c = 0; c < G_N_ELEMENTS (criteria); c++)
    {
      HlShellInputs in = barrel (HL_MEASURE_HOOP, criteria[c]);
      g_autoptr(HlSolution) sol = hl_rt_solve (&in);
      HlFigureGeometry g = { 0 };
      cairo_surface_t *s = hl_rt_render (NULL, sol, 1200, 800, HL_FIGURE_STYLE_LIGHT, &g);

      for (double r = 0.050; r < 0.075; r += 0.01)
        {
          double tresca = 2 * p * a * a * b * b / ((b * b - a * a) * r * r);

          g_assert_true (line_near (s, &g, r, tresca, pal->tresca) == (criteria[c] == HL_CRITERION_TRESCA));
        }
      cairo_surface_destroy (s);
      hl_figure_geometry_clear (&g);
    }
}

/* ---- on screen: no title block, the room to the plots, text of 9 px ---- */

static void
test_screen_target (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_find_shell (demo, "air-receiver"));
  HlFigureContext screen, paper;
  HlFigureGeometry gs = { 0 }, gp = { 0 };
  cairo_surface_t *s1, *s2;
  HlText *t;

  hl_figure_context_init (&screen, demo, NULL, sol, NULL, NULL, HL_FIGURE_TARGET_SCREEN);
  hl_figure_context_init (&paper, demo, NULL, sol, NULL, NULL, HL_FIGURE_TARGET_PAPER);
  /* the canvas of the default 1280 x 800 window is 868 x 579 */
  s1 = hl_rt_render_context (&screen, 868, 579, &gs);
  s2 = hl_rt_render_context (&paper, 868, 579, &gp);
  g_assert_cmpfloat (gp.title_block.width, >, 0);
  g_assert_cmpfloat (gs.title_block.width, ==, 0);
  g_assert_true (gs.plot.drawn && gs.chart.drawn && gs.section.drawn);
  /* the title block's room goes to the panels: the chart reaches down
   * past where the title block stands on paper */
  g_assert_cmpfloat (gs.chart.area.y + gs.chart.area.height, >, gp.title_block.y);
  /* the smallest text the canvas writes is 9 px or more, a floor of
   * legible screen text (common practice) */
  t = hl_text_new (NULL, gs.font_size);
  g_assert_cmpfloat (hl_text_size (t, HL_FONT_TINY), >=, 9.0);
  hl_text_free (t);
  cairo_surface_destroy (s1);
  cairo_surface_destroy (s2);
  hl_figure_geometry_clear (&gs);
  hl_figure_geometry_clear (&gp);
}

/* ---- German words wrap whole ---- */

/* a line may begin after a space or after a hyphen the text has; a
 * break anywhere else cuts a word where no hyphenation rule was asked */
static void
check_breaks (PangoLayout *layout,
              const char  *where)
{
  const char *text = pango_layout_get_text (layout);

  for (GSList *it = pango_layout_get_lines_readonly (layout); it != NULL; it = it->next)
    {
      int start = ((PangoLayoutLine *) it->data)->start_index;
      gunichar before;

      if (start == 0)
        continue;
      before = g_utf8_get_char (g_utf8_prev_char (text + start));
      if (!(g_unichar_isspace (before) || before == '-' || before == 0x2010))
        g_error ("%s: \"%s\" broken inside a word at byte %d", where, text, start);
    }
}

static void
test_german_words (void)
{
  g_autoptr(HlProject) demo = NULL;
  g_autofree char *po = g_build_filename (g_getenv ("HL_BUILD_DIR"), "po", NULL);
  guint n_wrapped = 0;

  if (setlocale (LC_ALL, "de_DE.UTF-8") == NULL)
    {
      g_test_skip ("no de_DE.UTF-8 locale on this machine");
      return;
    }
  g_setenv ("LANGUAGE", "de", TRUE);
  bindtextdomain (GETTEXT_PACKAGE, po);
  bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
  /* the catalogue is there, or the test would check English */
  g_assert_cmpstr (g_dgettext (GETTEXT_PACKAGE, "corrosion allowance"), ==, "Korrosionszuschlag");
  demo = hl_rt_load_demo ();
  for (guint i = 0; i < hl_project_n_shells (demo); i++)
    {
      g_autoptr(HlSolution) sol = hl_rt_solve (hl_project_shell (demo, i));

      for (guint k = 0; k < G_N_ELEMENTS (sizes); k++)
        for (int target = HL_FIGURE_TARGET_SCREEN; target <= HL_FIGURE_TARGET_PAPER; target++)
          {
            HlFigureContext ctx;
            HlFigureGeometry g = { 0 };
            cairo_surface_t *s;
            g_autofree char *where = g_strdup_printf ("%s %dx%d", sol->inputs.id, sizes[k][0], sizes[k][1]);

            hl_figure_context_init (&ctx, demo, NULL, sol, NULL, NULL, target);
            s = hl_rt_render_context (&ctx, sizes[k][0], sizes[k][1], &g);
            for (guint j = 0; j < g.wrapped->len; j++)
              {
                check_breaks (g_ptr_array_index (g.wrapped, j), where);
                n_wrapped++;
              }
            cairo_surface_destroy (s);
            hl_figure_geometry_clear (&g);
          }
    }
  /* the check read something: the verdicts and the caution wrap */
  g_assert_cmpuint (n_wrapped, >, 100);
  g_setenv ("LANGUAGE", "C", TRUE);
  setlocale (LC_ALL, "C.UTF-8");
}

int
main (int    argc,
      char **argv)
{
  setlocale (LC_ALL, "C.UTF-8");
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/figure/panels/honoured", test_panels_honoured);
  g_test_add_func ("/figure/panels/small-keeps-plot", test_small_keeps_plot);
  g_test_add_func ("/figure/legend/ticks-thick", test_legend_ticks_thick);
  g_test_add_func ("/figure/legend/range-thin", test_legend_range_thin);
  g_test_add_func ("/figure/legend/uniform", test_legend_uniform);
  g_test_add_func ("/figure/leader/clear", test_leader_clear);
  g_test_add_func ("/figure/plot/thin-von-mises", test_thin_von_mises_line);
  g_test_add_func ("/figure/plot/tresca", test_tresca_line);
  g_test_add_func ("/figure/screen/no-title-block", test_screen_target);
  /* last: it leaves the catalogue bound */
  g_test_add_func ("/figure/text/german-words", test_german_words);
  return g_test_run ();
}
