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

/* Written here in the compact form a hand or another tool would write
 * (only what the format requires), so 50,000 shells stay below the
 * 16 MiB cap: the writer's every-element form takes ~640 bytes a shell. */
static char *
large_xml (guint shells)
{
  GString *xml = g_string_new ("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<hoopline-project format=\"1\">\n"
                               "<title>Benchmark: a large plant</title>\n"
                               "<material id=\"plate\"><name>Plate</name><elastic-modulus unit=\"GPa\">200</elastic-modulus>"
                               "<poisson-ratio>0.3</poisson-ratio><yield-strength unit=\"MPa\">260</yield-strength>"
                               "<allowable-stress unit=\"MPa\">138</allowable-stress></material>\n");

  for (guint i = 0; i < shells; i++)
    g_string_append_printf (xml,
                            "<shell id=\"shell-%u\" form=\"%s\"><name>Shell %u of the benchmark</name>"
                            "<material-ref>plate</material-ref><inner-diameter unit=\"mm\">%u</inner-diameter>"
                            "<wall-thickness unit=\"mm\">%u</wall-thickness>"
                            "<internal-pressure unit=\"bar\">%u</internal-pressure></shell>\n",
                            i + 1, i % 5 == 4 ? "sphere" : "cylinder", i + 1, 200 + i % 1000, 4 + i % 40, 5 + i % 50);
  for (guint i = 0; i < shells / 10; i++)
    g_string_append_printf (xml, "<revision number=\"%u\" date=\"2026-12-01\" author=\"A. Tester\">Walls checked.</revision>\n",
                            i + 1);
  g_string_append (xml, "</hoopline-project>\n");
  return g_string_free (xml, FALSE);
}

int
main (int    argc,
      char **argv)
{
  guint shells = argc > 1 ? (guint) strtoul (argv[1], NULL, 10) : 10000;
  g_autofree char *xml = large_xml (shells);
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
