/* fuzz-project-load.c — any bytes as a project file
 *
 * Loads, checks and solves every shell, writes every text output, saves
 * the project and reopens the saved text: a file the loader accepts must
 * come back equal after a save (DESIGN.md §1, "reopen and revise").
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-fuzz"

#include "fuzz-common.h"
#include "hl-shell-check.h"

int
LLVMFuzzerTestOneInput (const uint8_t *data,
                        size_t         size)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GPtrArray) warnings = NULL;
  g_autoptr(HlProject) project = NULL;
  g_autoptr(HlProject) copy = NULL;

  project = hl_project_load_bytes ((const char *) data, size, "fuzz.hoop", &warnings, &error);
  if (project == NULL)
    {
      if (error == NULL || error->domain != HL_PROJECT_FILE_ERROR)
        fuzz_fail ("a refused file has no project-file error");
      if (!g_utf8_validate (error->message, -1, NULL))
        fuzz_fail ("the error message is not UTF-8");
      return 0;
    }
  if (error != NULL || warnings == NULL)
    fuzz_fail ("a loaded project came with an error or without its warning list");

  for (guint i = 0; i < hl_project_n_shells (project); i++)
    {
      const HlShellInputs *shell = hl_project_shell (project, i);
      g_autoptr(GPtrArray) problems = hl_shell_inputs_check (shell);
      g_autoptr(HlSolution) corroded = NULL;
      g_autoptr(HlSolution) new_wall = NULL;
      g_autoptr(GError) solve_error = NULL;
      g_autofree char *report = NULL;

      /* the loader checks every shell, so what it returns is valid */
      if (problems->len > 0)
        {
          g_autofree char *text = hl_problems_join (problems);

          fuzz_fail ("loaded shell %s has problems: %s", shell->id, text);
        }
      corroded = hl_solve (shell, HL_DEFAULT_POINTS, TRUE, &solve_error);
      if (corroded == NULL)
        fuzz_fail ("valid shell %s does not solve: %s", shell->id, solve_error->message);
      new_wall = hl_solve (shell, HL_DEFAULT_POINTS, FALSE, &solve_error);
      if (new_wall == NULL)
        fuzz_fail ("valid shell %s does not solve new: %s", shell->id, solve_error->message);
      fuzz_check_solution (corroded);
      fuzz_check_solution (new_wall);
      fuzz_check_outputs (corroded);
      report = hl_report_text (project, new_wall, corroded, project->display_units);
      if (report == NULL || !g_utf8_validate (report, -1, NULL))
        fuzz_fail ("the calculation report of %s is missing or not UTF-8", shell->id);
    }

  copy = hl_project_copy (project);
  if (!hl_project_equal (project, copy))
    fuzz_fail ("a copy of the project differs from it");
  fuzz_check_round_trip (project);
  return 0;
}
