/* test-note.c — the design note's content and its text form
 *
 * Sources beside each check:
 *  - Issue 11 and common practice for a calculation sheet a checker
 *    signs: boxes for prepared / checked / approved even when empty, the
 *    whole revision history, every input with its unit as entered.
 *  - NIST SP 811 (2008) §B.8 (from memory): 1 in = 25.4 mm exactly,
 *    1 psi = 6894.757 Pa, 1 ksi = 1000 psi; a US customary sheet shows
 *    lengths in inches and stresses in psi or ksi, never mm or MPa.
 *  - ASME VIII-1 UG-27(c)(1) (the lead's hl-check-steps.c carries it):
 *    each check's substituted formula and result as the text report prints
 *    them, compared with the rows the PDF lays out.
 *  - Common practice for a plain-text report: at most 100 columns (a
 *    printed page at 10 characters an inch).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-note"

#include "hl-test-formulas.h"
#include "hl-check-steps.h"
#include "hl-note.h"
#include "hl-number-format.h"
#include "hl-report.h"

#include <string.h>

static HlShellInputs
receiver (void)
{
  HlShellInputs in = hlt_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_DIAMETER, 1.2, 0.010, 1.1e6, 0);

  in.corrosion_allowance = hl_quantity_make (1.5, "mm");
  return in;
}

/* the rows of @in's note for @project, and the text report of them */
static GArray *
note_of (HlProject           *project,
         const HlShellInputs *in,
         HlUnitSystem         units,
         char               **text)
{
  g_autoptr(HlSolution) cor = hlt_solve (in, 11);
  g_autoptr(HlSolution) neu = hl_solve (in, 11, FALSE, NULL);

  if (text != NULL)
    *text = hl_report_text (project, neu, cor, units);
  return hl_note_content (project, cor, neu, units, FALSE, "2026-12-03");
}

/* the first row after the heading @heading, or G_MAXUINT */
static guint
after_heading (GArray     *rows,
               const char *heading)
{
  for (guint i = 0; i < rows->len; i++)
    if (hl_note_row (rows, i)->kind == HL_NOTE_HEADING && strcmp (hl_note_row (rows, i)->cells[0], heading) == 0)
      return i + 1;
  return G_MAXUINT;
}

static void
test_signoff_empty (void)
{
  g_autoptr(HlProject) project = hl_project_new ();
  HlShellInputs in = receiver ();
  g_autofree char *text = NULL;
  g_autoptr(GArray) rows = note_of (project, &in, HL_UNIT_SYSTEM_SI, &text);
  guint i = after_heading (rows, "Sign-off");
  static const char *const roles[] = { "Prepared", "Checked", "Approved" };

  g_assert_cmpuint (i, <, rows->len);
  /* a header row, then one box per role, empty */
  g_assert_true (hl_note_row (rows, i)->strong);
  for (guint r = 0; r < G_N_ELEMENTS (roles); r++)
    {
      const HlNoteRow *row = hl_note_row (rows, i + 1 + r);

      g_assert_true (row->boxed);
      g_assert_cmpstr (row->cells[0], ==, roles[r]);
      g_assert_cmpstr (row->cells[1], ==, "");
      g_assert_cmpstr (row->cells[2], ==, "");
    }
  /* the text report draws the empty boxes as lines to write on */
  g_assert_true (g_regex_match_simple ("\n  Checked +_{10,} +_{10,}\n", text, 0, 0));
}

static void
test_signoff_given (void)
{
  g_autoptr(HlProject) project = hl_project_new ();
  HlShellInputs in = receiver ();
  g_autofree char *text = NULL;
  g_autoptr(GArray) rows = NULL;
  guint i;

  hl_project_set_signoff (project, HL_SIGNOFF_PREPARED, "A. Preparer", "2026-11-30");
  hl_project_set_signoff (project, HL_SIGNOFF_APPROVED, "C. Approver", "2026-12-02");
  rows = note_of (project, &in, HL_UNIT_SYSTEM_SI, &text);
  i = after_heading (rows, "Sign-off");
  g_assert_cmpstr (hl_note_row (rows, i + 1)->cells[1], ==, "A. Preparer");
  g_assert_cmpstr (hl_note_row (rows, i + 1)->cells[2], ==, "2026-11-30");
  /* the checker has not signed: that box stays empty */
  g_assert_cmpstr (hl_note_row (rows, i + 2)->cells[1], ==, "");
  g_assert_cmpstr (hl_note_row (rows, i + 3)->cells[1], ==, "C. Approver");
  g_assert_true (g_regex_match_simple ("\n  Prepared +A\\. Preparer +2026-11-30\n", text, 0, 0));
  g_assert_true (g_regex_match_simple ("\n  Approved +C\\. Approver +2026-12-02\n", text, 0, 0));
}

static void
test_all_revisions (void)
{
  g_autoptr(HlProject) project = hl_project_new ();
  HlShellInputs in = receiver ();
  g_autofree char *text = NULL;
  g_autoptr(GArray) rows = NULL;
  g_autofree char *label = NULL;
  guint i;

  hl_project_add_revision (project, 1, "2026-01-10", "A. One", "First issue.");
  hl_project_add_revision (project, 2, "2026-03-15", "B. Two", "Allowance raised.");
  hl_project_add_revision (project, 3, "2026-06-20", "C. Three", "Wall thickened.");
  rows = note_of (project, &in, HL_UNIT_SYSTEM_SI, &text);
  i = after_heading (rows, "Revision history");
  g_assert_cmpuint (i + 3, <, rows->len);
  /* every revision, in file order, not only the latest */
  for (guint r = 0; r < 3; r++)
    {
      const HlNoteRow *row = hl_note_row (rows, i + 1 + r);
      g_autofree char *n = g_strdup_printf ("%u", r + 1);

      g_assert_cmpstr (row->cells[0], ==, n);
    }
  g_assert_cmpstr (hl_note_row (rows, i + 1)->cells[3], ==, "First issue.");
  g_assert_cmpstr (hl_note_row (rows, i + 3)->cells[2], ==, "C. Three");
  g_assert_nonnull (strstr (text, "First issue."));
  g_assert_nonnull (strstr (text, "Allowance raised."));
  g_assert_nonnull (strstr (text, "Wall thickened."));
  /* the label on every page is the latest */
  label = hl_note_revision_label (project);
  g_assert_cmpstr (label, ==, "Rev. 3");
}

static void
test_no_revision (void)
{
  g_autoptr(HlProject) project = hl_project_new ();
  g_autofree char *label = hl_note_revision_label (project);

  g_assert_cmpstr (label, ==, "no revision recorded");
}

/* A US shell typed in inches and psi, material in ksi: the sheet's
 * column in its own units holds no SI unit (NIST SP 811) */
static void
test_us_inputs (void)
{
  g_autoptr(HlProject) project = hl_project_new ();
  HlShellInputs in = hl_shell_inputs_default ();
  g_autoptr(GArray) rows = NULL;
  guint i;
  static const char *const si_units[] = { "mm", "MPa", "GPa", "kPa", "bar", "°C", " m" };
  gboolean saw_modulus = FALSE;
  /* the SI units a US sheet must not show, as whole words */
  g_autoptr(GRegex) si = g_regex_new ("\\b(mm|MPa|GPa|kPa|bar)\\b", 0, 0, NULL);

  in.size_kind = HL_SIZE_INNER_DIAMETER;
  in.size = hl_quantity_make (48, "in");
  in.wall_thickness = hl_quantity_make (0.5, "in");
  in.corrosion_allowance = hl_quantity_make (0.0625, "in");
  in.internal_pressure = hl_quantity_make (150, "psi");
  in.material.elastic_modulus = hl_quantity_make (29000, "ksi");
  in.material.yield_strength = hl_quantity_make (38, "ksi");
  in.material.allowable_stress = hl_quantity_make (20, "ksi");
  in.design_temperature = hl_quantity_make (100, "°F");
  in.mill_tolerance = hl_quantity_make (0, "in");
  in.external_pressure = hl_quantity_make (0, "psi");
  in.test_ps = hl_quantity_make (0, "psi");
  rows = note_of (project, &in, HL_UNIT_SYSTEM_US, NULL);
  i = after_heading (rows, "Inputs");
  g_assert_cmpuint (i, <, rows->len);
  for (i++; i < rows->len && hl_note_row (rows, i)->kind == HL_NOTE_TABLE; i++)
    {
      const HlNoteRow *row = hl_note_row (rows, i);

      for (guint u = 0; u < G_N_ELEMENTS (si_units); u++)
        if (strstr (row->cells[2], si_units[u]) != NULL)
          g_error ("US input row “%s” shows an SI unit: “%s”", row->cells[0], row->cells[2]);
      if (g_str_has_prefix (row->cells[0], "Elastic modulus"))
        {
          /* 29,000 ksi = 29e6 psi, shown in ksi, its digits grouped with a
           * narrow space (ISO 80000-1) */
          g_assert_nonnull (strstr (row->cells[2], "29" HL_GROUP_SEPARATOR "000"));
          g_assert_nonnull (strstr (row->cells[2], "ksi"));
          saw_modulus = TRUE;
        }
      if (g_str_has_prefix (row->cells[0], "Inner diameter"))
        {
          /* as typed, and in the sheet's units */
          g_assert_cmpstr (row->cells[1], ==, "48" "\xc2\xa0" "in");
          g_assert_cmpstr (row->cells[2], ==, "48" "\xc2\xa0" "in");
        }
    }
  g_assert_true (saw_modulus);
  /* and nowhere else in the note: every number in US units, but for the
   * inputs as the user typed them (all in US units here too) */
  for (i = 0; i < rows->len; i++)
    {
      const HlNoteRow *row = hl_note_row (rows, i);

      for (guint c = 0; c < row->n_cells; c++)
        if (g_regex_match (si, row->cells[c], 0, NULL))
          g_error ("US note row %u cell %u shows an SI unit: %s", i, c, row->cells[c]);
    }
}

/* what the text report prints of each check is what the PDF lays out:
 * the same steps, the same substituted numbers */
static void
test_steps_in_text (void)
{
  g_autoptr(HlProject) project = hl_project_new ();
  HlShellInputs in = receiver ();
  g_autofree char *text = NULL;
  g_autofree char *flat = NULL;
  g_autoptr(GArray) rows = note_of (project, &in, HL_UNIT_SYSTEM_SI, &text);
  g_autoptr(HlSolution) cor = hlt_solve (&in, 11);
  g_autoptr(GPtrArray) steps = hl_check_steps (cor, HL_UNIT_SYSTEM_SI, FALSE);
  g_auto(GStrv) lines = g_strsplit (text, "\n", -1);
  guint found = 0;

  flat = hlt_unwrap (text);
  g_assert_cmpuint (steps->len, >=, 6);
  for (guint i = 0; i < steps->len; i++)
    {
      const HlCheckStep *st = g_ptr_array_index (steps, i);

      if (strstr (flat, st->title) == NULL || strstr (flat, st->substituted) == NULL
          || strstr (flat, st->result) == NULL)
        g_error ("the text report lacks step %u “%s”", i, st->title);
      /* and the note's rows carry the same lines */
      for (guint r = 0; r < rows->len; r++)
        if (hl_note_row (rows, r)->kind == HL_NOTE_TABLE && hl_note_row (rows, r)->n_cells == 2
            && strcmp (hl_note_row (rows, r)->cells[1], st->substituted) == 0)
          {
            found++;
            break;
          }
    }
  g_assert_cmpuint (found, ==, steps->len);
  /* the governing check is stated in words */
  g_assert_nonnull (strstr (flat, "Governing check: "));
  /* the limits of the note are stated */
  g_assert_nonnull (strstr (flat, "No thermal, local, wind, seismic or support loads"));
  g_assert_nonnull (strstr (flat, "not checked"));
  g_assert_nonnull (strstr (flat, "Radial stress in the thin-wall formulas: taken as 0"));
  /* 100 columns at most: a word longer than a column is the only excuse */
  for (guint i = 0; lines[i] != NULL; i++)
    if (g_utf8_strlen (lines[i], -1) > HL_REPORT_TEXT_WIDTH)
      g_error ("line %u is %ld columns: %s", i + 1, g_utf8_strlen (lines[i], -1), lines[i]);
}

/* the project summary carries the --summary's values */
static void
test_project_summary (void)
{
  g_autoptr(HlProject) project = hl_project_new ();
  HlShellInputs in = receiver ();
  g_autoptr(HlSolution) cor = hlt_solve (&in, 11);
  g_autoptr(GPtrArray) sols = g_ptr_array_new ();
  g_autoptr(GArray) rows = NULL;
  g_autofree char *block = hl_report_summary_block (cor, HL_UNIT_SYSTEM_SI);
  const HlNoteRow *line = NULL;
  g_autofree char *want_u = NULL, *want_mawp = NULL;

  g_ptr_array_add (sols, cor);
  rows = hl_note_project_summary (project, sols, HL_UNIT_SYSTEM_SI, FALSE, NULL);
  for (guint i = 0; i < rows->len; i++)
    if (hl_note_row (rows, i)->n_cells == HL_NOTE_SUMMARY_N_COLUMNS && !hl_note_row (rows, i)->strong)
      line = hl_note_row (rows, i);
  g_assert_nonnull (line);
  want_u = g_strdup_printf ("\nutilisation = %s\n", line->cells[HL_NOTE_SUMMARY_UTILISATION]);
  want_mawp = g_strdup_printf ("\nmax_allowable_pressure_ug27 = %s\n", line->cells[HL_NOTE_SUMMARY_MAWP]);
  g_assert_nonnull (strstr (block, want_u));
  g_assert_nonnull (strstr (block, want_mawp));
  g_assert_nonnull (strstr (block, "\ndesign_verdict = pass\n"));
  g_assert_cmpstr (line->cells[HL_NOTE_SUMMARY_DESIGN_VERDICT], ==, "PASS");
  g_assert_nonnull (strstr (block, "\nthin_wall_verdict = thin\n"));
  g_assert_cmpstr (line->cells[HL_NOTE_SUMMARY_THIN_VERDICT], ==, "THIN");
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/note/signoff-empty", test_signoff_empty);
  g_test_add_func ("/note/signoff-given", test_signoff_given);
  g_test_add_func ("/note/all-revisions", test_all_revisions);
  g_test_add_func ("/note/no-revision", test_no_revision);
  g_test_add_func ("/note/us-inputs", test_us_inputs);
  g_test_add_func ("/note/steps-in-text", test_steps_in_text);
  g_test_add_func ("/note/project-summary", test_project_summary);
  return g_test_run ();
}
