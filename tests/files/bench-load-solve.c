/* bench-load-solve.c — load a 1,000-shell project and solve every shell
 *
 * A benchmark, not a test: it prints milliseconds and never fails on
 * time.  The project is made in memory and turned into file text with
 * hl_project_to_xml(); each round parses, validates and checks it with
 * hl_project_load_bytes() and solves every shell at 101 points.  Target
 * (project-file issue): under 50 ms.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "bench-load-solve"

#include "hl-project-file.h"
#include "hl-solution.h"

#include <stdio.h>
#include <string.h>

#define SHELLS 1000
#define ROUNDS 10

static HlProject *
big_project (void)
{
  HlProject *p = hl_project_new ();
  HlMaterial m = *hl_material_builtin (0);

  g_strlcpy (m.id, "plate", sizeof m.id);
  hl_project_put_material (p, &m);
  hl_project_set_title (p, "Benchmark: a thousand shells");
  for (guint i = 0; i < SHELLS; i++)
    {
      HlShellInputs s = hl_shell_inputs_default ();

      g_snprintf (s.id, sizeof s.id, "shell-%u", i + 1);
      g_snprintf (s.name, sizeof s.name, "Shell %u of the benchmark", i + 1);
      s.form = i % 5 == 4 ? HL_FORM_SPHERE : HL_FORM_CYLINDER;
      s.ends = (HlEnds) (i % 3);
      s.size_kind = (HlSizeKind) (i % 4);
      s.size = hl_quantity_make (200 + i, "mm");
      s.wall_thickness = hl_quantity_make (4 + (i % 40), "mm");
      s.corrosion_allowance = hl_quantity_make (i % 2 ? 1 : 0, "mm");
      s.internal_pressure = hl_quantity_make (5 + i % 50, "bar");
      g_strlcpy (s.material_ref, m.id, sizeof s.material_ref);
      s.material = m;
      hl_project_add_shell (p, &s);
    }
  return p;
}

int
main (void)
{
  g_autoptr(HlProject) source = big_project ();
  g_autofree char *xml = hl_project_to_xml (source);
  gsize length = strlen (xml);
  double best = G_MAXDOUBLE, sum = 0, best_load = G_MAXDOUBLE, best_solve = G_MAXDOUBLE;

  for (guint round = 0; round < ROUNDS; round++)
    {
      g_autoptr(GError) error = NULL;
      gint64 t0 = g_get_monotonic_time (), t1, t2;
      g_autoptr(HlProject) p = hl_project_load_bytes (xml, length, "bench.hoop", NULL, &error);

      g_assert_no_error (error);
      g_assert_cmpuint (hl_project_n_shells (p), ==, SHELLS);
      t1 = g_get_monotonic_time ();
      for (guint i = 0; i < SHELLS; i++)
        {
          HlSolution *sol = hl_solve (hl_project_shell (p, i), HL_DEFAULT_POINTS, TRUE, &error);

          g_assert_no_error (error);
          hl_solution_free (sol);
        }
      t2 = g_get_monotonic_time ();
      best = MIN (best, (t2 - t0) / 1e3);
      best_load = MIN (best_load, (t1 - t0) / 1e3);
      best_solve = MIN (best_solve, (t2 - t1) / 1e3);
      sum += (t2 - t0) / 1e3;
      /* the first round also pays for parsing the schema once */
      printf ("round %u: load %.2f ms + solve %.2f ms = %.2f ms\n", round + 1,
              (t1 - t0) / 1e3, (t2 - t1) / 1e3, (t2 - t0) / 1e3);
    }
  printf ("%d shells (%" G_GSIZE_FORMAT " bytes of XML), load + solve at %d points: best %.2f ms "
          "(load %.2f + solve %.2f), mean %.2f ms over %d rounds; target < 50 ms\n",
          SHELLS, length, HL_DEFAULT_POINTS, best, best_load, best_solve, sum / ROUNDS, ROUNDS);
  return 0;
}
