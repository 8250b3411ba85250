/* test-sheet-verdict.c — the calculation sheet says whether the wall passes
 *
 * The receiver of data/examples/check-cases.hoop: Di 2000 mm, t 12 mm,
 * 10 bar, S 80 MPa, Ej 1.  ASME VIII-1 UG-27(c)(1) by hand from the
 * clause: P = S E t / (R + 0.6 t) = 80 × 12 / 1007.2 = 0.9531 MPa < 1 MPa,
 * utilisation 1 / 0.9531 = 104.9 %: the sheet must say FAIL in words,
 * with the governing clause, near its top; the passing demo receiver says
 * PASS; the 100 bar case, above the plastic collapse pressure (Hill 1950,
 * from memory: (2/√3) 235 ln 1.012 = 3.24 MPa), says DANGER and burst.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-sheet-verdict"

#include "hl-render-test.h"
#include "hl-project-file.h"
#include "hl-sheet-private.h"

#include <string.h>

static HlProject *
load_cases (void)
{
  const char *src = g_getenv ("HL_SOURCE_DIR");
  g_autofree char *path = g_build_filename (src, "data", "examples", "check-cases.hoop", NULL);
  g_autoptr(GError) error = NULL;
  HlProject *p = hl_project_load (path, NULL, &error);

  g_assert_no_error (error);
  return p;
}

/* the first rows of the sheet, up to the inputs, joined */
static char *
design_part (const HlProject *project,
             guint            index)
{
  const HlShellInputs *shell = hl_project_shell (project, index);
  g_autoptr(HlSolution) sol = hl_rt_solve (shell);
  g_autoptr(GArray) rows = NULL;
  HlFigureContext ctx;
  GString *out = g_string_new (NULL);

  hl_figure_context_init (&ctx, project, shell, sol, NULL, NULL, HL_FIGURE_TARGET_PAPER);
  rows = hl_sheet_rows (&ctx);
  for (guint i = 0; i < rows->len; i++)
    {
      const HlSheetRow *r = &g_array_index (rows, HlSheetRow, i);

      if (r->kind == HL_SHEET_HEADING && g_strcmp0 (r->cells[0], "Inputs") == 0)
        break;
      for (guint c = 0; c < r->n_cells; c++)
        g_string_append_printf (out, "%s|", r->cells[c] != NULL ? r->cells[c] : "");
      g_string_append_c (out, '\n');
    }
  return g_string_free (out, FALSE);
}

static void
test_failing_receiver (void)
{
  g_autoptr(HlProject) cases = load_cases ();
  g_autofree char *text = design_part (cases, 0);

  g_assert_nonnull (strstr (text, "Design check"));
  /* a no-break space keeps the percent sign with its number */
  g_assert_nonnull (strstr (text, "FAIL — utilisation 104.9\xc2\xa0% by UG-27(c)(1)"));
  /* the sheet puts a no-break space between number and unit */
  g_assert_nonnull (strstr (text, "0.9531"));
  g_assert_nonnull (strstr (text, "12.59"));
  g_assert_null (strstr (text, "PASS —"));
}

static void
test_bursting_receiver (void)
{
  g_autoptr(HlProject) cases = load_cases ();
  g_autofree char *text = design_part (cases, 2);

  g_assert_nonnull (strstr (text, "FAIL — DANGER: the wall would burst"));
}

static void
test_passing_demo (void)
{
  g_autoptr(HlProject) demo = hl_rt_load_demo ();
  g_autofree char *text = design_part (demo, 0);

  g_assert_nonnull (strstr (text, "PASS — utilisation"));
  g_assert_null (strstr (text, "FAIL"));
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/sheet-verdict/failing-receiver", test_failing_receiver);
  g_test_add_func ("/sheet-verdict/bursting-receiver", test_bursting_receiver);
  g_test_add_func ("/sheet-verdict/passing-demo", test_passing_demo);
  return g_test_run ();
}
