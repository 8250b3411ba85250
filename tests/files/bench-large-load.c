/* bench-large-load.c — load, validate and solve a project of N shells
 *
 * A benchmark, not a test: it prints milliseconds and never fails on
 * time.  The project (N shells given on the command line, 10,000 and
 * 50,000 in meson.build) is made in memory and written with
 * hl_project_to_xml(); each round parses and validates it with
 * hl_project_load_bytes() and solves every shell at 2 points, as
 * `hoopline --check` does.  Goal (window-saves issue): the time grows
 * linearly with N, and 50,000 shells take under 2 s in a release build.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "bench-large-load"

#include "hl-project-file.h"
#include "hl-solution.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define ROUNDS 3

static HlProject *
large_project (guint shells)
{
  HlProject *p = hl_project_new ();
  HlMaterial m = *hl_material_builtin (0);

  g_strlcpy (m.id, "plate", sizeof m.id);
  hl_project_put_material (p, &m);
  hl_project_set_title (p, "Benchmark: a large plant");
  for (guint i = 0; i < shells; i++)
    {
      HlShellInputs s = hl_shell_inputs_default ();

      g_snprintf (s.id, sizeof s.id, "shell-%u", i + 1);
      g_snprintf (s.name, sizeof s.name, "Shell %u of the benchmark", i + 1);
      s.form = i % 5 == 4 ? HL_FORM_SPHERE : HL_FORM_CYLINDER;
      s.size = hl_quantity_make (200 + i % 1000, "mm");
      s.wall_thickness = hl_quantity_make (4 + (i % 40), "mm");
      s.internal_pressure = hl_quantity_make (5 + i % 50, "bar");
      g_strlcpy (s.material_ref, m.id, sizeof s.material_ref);
      s.material = m;
      hl_project_add_shell (p, &s);
    }
  for (guint i = 0; i < shells / 10; i++)
    hl_project_add_revision (p, i + 1, "2026-12-01", "A. Tester", "Walls checked.");
  return p;
}

int
main (int    argc,
      char **argv)
{
  guint shells = argc > 1 ? (guint) strtoul (argv[1], NULL, 10) : 10000;
  g_autoptr(HlProject) source = large_project (shells);
  g_autofree char *xml = hl_project_to_xml (source);
  gsize length = strlen (xml);
  double best = G_MAXDOUBLE, best_load = 0, best_solve = 0;

  for (guint round = 0; round < ROUNDS; round++)
    {
      g_autoptr(GError) error = NULL;
      gint64 t0 = g_get_monotonic_time (), t1, t2;
      g_autoptr(HlProject) p = hl_project_load_bytes (xml, length, "bench.hoop", NULL, &error);

      g_assert_no_error (error);
      g_assert_cmpuint (hl_project_n_shells (p), ==, shells);
      t1 = g_get_monotonic_time ();
      for (guint i = 0; i < shells; i++)
        {
          HlSolution *sol = hl_solve (hl_project_shell (p, i), 2, TRUE, &error);

          g_assert_no_error (error);
          hl_solution_free (sol);
        }
      t2 = g_get_monotonic_time ();
      printf ("round %u: load %.1f ms + solve %.1f ms = %.1f ms\n", round + 1,
              (t1 - t0) / 1e3, (t2 - t1) / 1e3, (t2 - t0) / 1e3);
      if ((t2 - t0) / 1e3 < best)
        {
          best = (t2 - t0) / 1e3;
          best_load = (t1 - t0) / 1e3;
          best_solve = (t2 - t1) / 1e3;
        }
    }
  printf ("%u shells, %u revisions (%.1f MiB of XML), load + validate + solve: best %.1f ms "
          "(load %.1f + solve %.1f) over %d rounds, %.1f µs a shell\n",
          shells, shells / 10, length / (1024.0 * 1024.0), best, best_load, best_solve, ROUNDS,
          best * 1e3 / shells);
  return 0;
}
