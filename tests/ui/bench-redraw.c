/* bench-redraw.c — what one edit in the window costs: solve plus draw
 *
 * The window solves once per change and redraws the canvas; this times
 * that pair for the demo shells at the default window's canvas size,
 * with no display, so it runs anywhere.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "bench-redraw"

#include "hl-figure.h"
#include "hl-project-file.h"

#include <stdio.h>

#define ROUNDS 200

static int
run (HlProject *project,
     int        scale)
{
  /* the canvas of a 1280 x 800 window, at the monitor's scale */
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 900 * scale, 500 * scale);
  cairo_t *cr;
  g_autoptr(GError) error = NULL;
  double solve_us = 0, draw_us = 0;

  cairo_surface_set_device_scale (surface, scale, scale);
  cr = cairo_create (surface);
  for (guint i = 0; i < ROUNDS; i++)
    {
      HlShellInputs shell = *hl_project_shell (project, i % hl_project_n_shells (project));
      HlFigureContext ctx = { 0 };
      g_autoptr(HlSolution) solution = NULL;
      gint64 t0, t1, t2;

      /* an edit: the wall grows a little each round */
      shell.wall_thickness.value *= 1.0 + 0.001 * (i % 10);
      t0 = g_get_monotonic_time ();
      solution = hl_solve (&shell, HL_DEFAULT_POINTS, TRUE, &error);
      t1 = g_get_monotonic_time ();
      if (solution == NULL)
        {
          fprintf (stderr, "%s\n", error->message);
          return 1;
        }
      ctx.project = project;
      ctx.solution = solution;
      ctx.units = project->display_units;
      ctx.locale_numbers = TRUE;
      cairo_save (cr);
      hl_figure_draw (cr, 900, 500, &ctx);
      cairo_restore (cr);
      cairo_surface_flush (surface);
      t2 = g_get_monotonic_time ();
      solve_us += (double) (t1 - t0);
      draw_us += (double) (t2 - t1);
    }
  printf ("per edit: solve %.3f ms, draw %.3f ms, total %.3f ms (%d rounds, 900x500 at scale %d)\n",
          solve_us / ROUNDS / 1000.0, draw_us / ROUNDS / 1000.0, (solve_us + draw_us) / ROUNDS / 1000.0,
          ROUNDS, scale);
  cairo_destroy (cr);
  cairo_surface_destroy (surface);
  return 0;
}

int
main (int    argc,
      char **argv)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) project = NULL;

  if (argc != 2)
    {
      fprintf (stderr, "usage: %s PROJECT\n", argv[0]);
      return 2;
    }
  project = hl_project_load (argv[1], NULL, &error);
  if (project == NULL)
    {
      fprintf (stderr, "%s\n", error->message);
      return 1;
    }
  for (int scale = 1; scale <= 2; scale++)
    if (run (project, scale) != 0)
      return 1;
  return 0;
}

