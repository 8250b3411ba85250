/* test-report-words.c — texts from the user cannot forge lines of an output
 *
 * Sources beside each check:
 *  - ISO C11 §6.4.4.4: the simple escapes \n, \r, \t, \\ and the
 *    hexadecimal \xNN, the notation the escaped text uses.
 *  - The Unicode Standard, §23.1 (from memory): the control codes are
 *    U+0000..U+001F, U+007F and U+0080..U+009F; U+2028 and U+2029 are the
 *    line and paragraph separators, which also end a line.
 *  - RFC 4180 §2: fields holding a comma or a double quote are enclosed in
 *    double quotes, and a quote inside is written twice.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-report-words"

#include "hl-report.h"
#include "hl-limits.h"

#include <string.h>

#define FORGED "R-7\nvon_mises_max = 1 MPa"

static void
test_escape_line (void)
{
  static const struct { const char *text; const char *escaped; } cases[] = {
    { FORGED, "R-7\\nvon_mises_max = 1 MPa" },
    { "a\tb", "a\\tb" },
    { "a\rb", "a\\rb" },
    { "back\\slash", "back\\\\slash" },
    { "bell\x07", "bell\\x07" },
    { "esc\x1b[2J", "esc\\x1b[2J" },
    { "del\x7f", "del\\x7f" },
    { "next line\xc2\x85", "next line\\u0085" },       /* C1 NEL */
    { "line sep\xe2\x80\xa8", "line sep\\u2028" },
    { "para sep\xe2\x80\xa9", "para sep\\u2029" },
    { "bad \xff byte", "bad \\xff byte" },             /* not UTF-8 */
    { "Ø 1 200 «Prüfung» 漢字", "Ø 1 200 «Prüfung» 漢字" },
    { "", "" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *escaped = hl_report_escape_line (cases[i].text);

      g_assert_cmpstr (escaped, ==, cases[i].escaped);
      g_assert_true (g_utf8_validate (escaped, -1, NULL));
      g_assert_false (hl_text_has_control (escaped, FALSE));
    }
}

static void
test_csv_field (void)
{
  /* RFC 4180 §2 rules 6 and 7; a line break is escaped, not quoted raw,
   * so each record stays one line */
  static const struct { const char *text; const char *field; } cases[] = {
    { "radius_mm", "radius_mm" },
    { "a,b", "\"a,b\"" },
    { "say \"hi\"", "\"say \"\"hi\"\"\"" },
    { "two\nlines", "two\\nlines" },
    { "two\nlines, quoted", "\"two\\nlines, quoted\"" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *field = hl_report_csv_field (cases[i].text);

      g_assert_cmpstr (field, ==, cases[i].field);
    }
}

static HlSolution *
solve_forged (void)
{
  HlShellInputs in = hl_shell_inputs_default ();
  g_autoptr(GError) error = NULL;
  HlSolution *s = hl_solve (&in, HL_DEFAULT_POINTS, TRUE, &error);

  g_assert_no_error (error);
  g_assert_nonnull (s);
  /* the checks refuse such names at every entry point; the outputs must
   * hold even so, should a name reach them by another way */
  g_strlcpy (s->inputs.name, FORGED, sizeof s->inputs.name);
  g_strlcpy (s->inputs.material.name, "Steel\r\nwarning = none", sizeof s->inputs.material.name);
  return s;
}

/* Every line of @text is free of control characters, and no line starts
 * with @forged_start. */
static void
assert_lines_clean (const char *text,
                    const char *forged_start)
{
  g_auto(GStrv) lines = g_strsplit (text, "\n", -1);

  for (guint i = 0; lines[i] != NULL; i++)
    {
      /* the report's own page break between shells is the one exception */
      if (strcmp (lines[i], "\f") == 0)
        continue;
      if (hl_text_has_control (lines[i], FALSE))
        g_error ("line %u holds a control character: %s", i + 1, lines[i]);
      g_assert_false (g_str_has_prefix (lines[i], forged_start));
    }
}

static void
test_summary_escapes (void)
{
  g_autoptr(HlSolution) s = solve_forged ();
  g_autofree char *block = hl_report_summary_block (s, HL_UNIT_SYSTEM_SI);
  g_auto(GStrv) lines = g_strsplit (block, "\n", -1);
  guint von_mises = 0;

  assert_lines_clean (block, "von_mises_max = 1 MPa");
  for (guint i = 0; lines[i] != NULL; i++)
    if (g_str_has_prefix (lines[i], "von_mises_max = "))
      von_mises++;
  g_assert_cmpuint (von_mises, ==, 1);
  g_assert_nonnull (strstr (block, "shell = R-7\\nvon_mises_max = 1 MPa\n"));
}

static void
test_report_escapes (void)
{
  g_autoptr(HlSolution) s = solve_forged ();
  g_autoptr(HlProject) project = hl_project_new ();
  g_autofree char *report = NULL;

  hl_project_set_title (project, "Vessel\nCAUTION: none");
  hl_project_set_engineer (project, "A. Engineer\x1b[2J");
  hl_project_add_revision (project, 1, "2026-12-02", "Author\nShell:     forged", "Text\r\nCaution\n  none");
  report = hl_report_text (project, s, s, HL_UNIT_SYSTEM_SI);
  assert_lines_clean (report, "CAUTION: none");
  assert_lines_clean (report, "Shell:     forged");
  assert_lines_clean (report, "von_mises_max");
  /* the escaped texts are there, each within its own line */
  g_assert_nonnull (strstr (report, "Vessel\\nCAUTION: none\n"));
  g_assert_nonnull (strstr (report, "R-7\\nvon_mises_max = 1 MPa (id "));
  g_assert_nonnull (strstr (report, "Steel\\r\\nwarning"));   /* one word: a cell wraps at spaces only */
  g_assert_nonnull (strstr (report, "Author\\nShell:     forged"));
  /* the caution stays intact: in the box under the header, which the
   * text report wraps at 100 columns as every paragraph */
  g_assert_nonnull (strstr (report, "  | Caution: Preliminary checking only."));
  g_assert_nonnull (strstr (report, "licensed engineer.\n"));
}

static void
test_csv_records (void)
{
  /* RFC 4180 §2: one header and one record per point, all with the same
   * number of fields; nothing from the user is in the table */
  g_autoptr(HlSolution) s = solve_forged ();
  g_autofree char *csv = hl_report_csv (s, HL_UNIT_SYSTEM_SI);
  g_auto(GStrv) lines = g_strsplit (csv, "\n", -1);

  assert_lines_clean (csv, "von_mises_max");
  /* four comment lines with the verdicts come first (issue 10), then
   * the header and the records */
  g_assert_cmpuint (g_strv_length (lines), ==, HL_CSV_PREAMBLE_LINES + s->n_points + 2);   /* the last is empty */
  for (guint i = 0; i < HL_CSV_PREAMBLE_LINES; i++)
    g_assert_true (lines[i][0] == '#');
  for (guint i = HL_CSV_PREAMBLE_LINES; lines[i + 1] != NULL; i++)
    {
      g_auto(GStrv) fields = g_strsplit (lines[i], ",", -1);

      g_assert_cmpuint (g_strv_length (fields), ==, 8);
    }
  g_assert_cmpstr (lines[g_strv_length (lines) - 1], ==, "");
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/report-words/escape-line", test_escape_line);
  g_test_add_func ("/report-words/csv-field", test_csv_field);
  g_test_add_func ("/report-words/summary", test_summary_escapes);
  g_test_add_func ("/report-words/report", test_report_escapes);
  g_test_add_func ("/report-words/csv", test_csv_records);
  return g_test_run ();
}
