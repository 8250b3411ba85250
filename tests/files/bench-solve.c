/* bench-solve.c — time of one hl_solve() at 1,001 points through the wall
 *
 * A benchmark, not a test: it prints microseconds per solve and never
 * fails on time.  Target (project-file issue): under 50 µs.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "bench-solve"

#include "hl-solution.h"

#include <stdio.h>

#define POINTS 1001
#define ROUNDS 7

int
main (void)
{
  /* the demo's press barrel: ID 80 mm, wall 40 mm, 400 bar, closed ends */
  HlShellInputs in = hl_shell_inputs_default ();
  double best = G_MAXDOUBLE, sum = 0;
  guint per_round = 2000;
  double checksum = 0;

  in.size = hl_quantity_make (80, "mm");
  in.wall_thickness = hl_quantity_make (40, "mm");
  in.internal_pressure = hl_quantity_make (400, "bar");

  for (guint round = 0; round < ROUNDS; round++)
    {
      gint64 start = g_get_monotonic_time ();
      double us;

      for (guint i = 0; i < per_round; i++)
        {
          g_autoptr(GError) error = NULL;
          HlSolution *sol = hl_solve (&in, POINTS, TRUE, &error);

          g_assert_no_error (error);
          checksum += sol->points[POINTS / 2].hoop;  /* keeps the work observable */
          hl_solution_free (sol);
        }
      us = (double) (g_get_monotonic_time () - start) / per_round;
      best = MIN (best, us);
      sum += us;
    }
  printf ("hl_solve, %d points: best %.2f us, mean %.2f us per solve (%d rounds of %u; target < 50 us)\n",
          POINTS, best, sum / ROUNDS, ROUNDS, per_round);
  printf ("checksum %.6g\n", checksum);
  return 0;
}
