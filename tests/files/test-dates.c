/* test-dates.c — one date rule for the reader, the writer and the dialog
 *
 * The file's dates are ISO 8601 calendar dates in the extended form
 * YYYY-MM-DD (ISO 8601-1:2019 §5.2.2.1).  The same standard also has
 * week dates (2026-W48-3, §5.2.4) and ordinal dates (2026-332, §5.2.3),
 * which are ten characters too; the file does not hold them, and neither
 * may the revisions dialog accept them, or a project stops saving.
 * 2026 is not a leap year, 2024 is (Gregorian rule, common practice).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-dates"

#include "hl-date.h"
#include "hl-project-file.h"

#include <string.h>

static void
test_rule (void)
{
  g_assert_true (hl_date_valid ("2026-12-02"));
  g_assert_true (hl_date_valid ("2024-02-29"));
  g_assert_true (hl_date_valid ("0001-01-01"));
  g_assert_false (hl_date_valid ("2026-W48-3"));  /* week date, ISO 8601 §5.2.4 */
  g_assert_false (hl_date_valid ("2026-W483"));
  g_assert_false (hl_date_valid ("2026-332"));    /* ordinal date */
  g_assert_false (hl_date_valid ("2026-02-29"));
  g_assert_false (hl_date_valid ("2026-13-01"));
  g_assert_false (hl_date_valid ("0000-01-01"));
  g_assert_false (hl_date_valid ("2026-12-02Z"));
  g_assert_false (hl_date_valid ("20261202"));
  g_assert_false (hl_date_valid (""));
  g_assert_false (hl_date_valid (NULL));
}

static HlProject *
project_with_date (const char *date)
{
  HlProject *project = hl_project_new ();
  HlShellInputs s = hl_shell_inputs_default ();

  hl_project_add_shell (project, &s);
  hl_project_add_revision (project, 1, date, "A. Tester", "First issue.");
  return project;
}

/* the writer refuses the week date with a message naming the revision */
static void
test_writer_refuses_week_date (void)
{
  g_autoptr(HlProject) good = project_with_date ("2026-11-25");
  g_autoptr(HlProject) week = project_with_date ("2026-W48-3");
  g_autoptr(GError) error = NULL;
  g_autofree char *ok = hl_project_to_checked_xml (good, NULL, &error);
  g_autofree char *bad = NULL;

  g_assert_no_error (error);
  g_assert_nonnull (ok);
  bad = hl_project_to_checked_xml (week, NULL, &error);
  g_assert_null (bad);
  g_assert_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE);
  g_assert_nonnull (strstr (error->message, "revision 1"));
  g_assert_nonnull (strstr (error->message, "2026-W48-3"));
}

/* and the reader refuses it in a file */
static void
test_reader_refuses_week_date (void)
{
  g_autoptr(HlProject) good = project_with_date ("2026-11-25");
  g_autofree char *xml = hl_project_to_xml (good);
  g_autofree char *week = NULL;
  g_autoptr(HlProject) back = NULL;
  g_autoptr(GError) error = NULL;
  char *at = strstr (xml, "2026-11-25");

  g_assert_nonnull (at);
  week = g_strdup_printf ("%.*s2026-W48-3%s", (int) (at - xml), xml, at + strlen ("2026-11-25"));
  back = hl_project_load_bytes (week, strlen (week), "week.hoop", NULL, &error);
  g_assert_null (back);
  g_assert_nonnull (error);
  g_assert_nonnull (strstr (error->message, "2026-W48-3"));
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/dates/rule", test_rule);
  g_test_add_func ("/dates/writer-refuses-week-date", test_writer_refuses_week_date);
  g_test_add_func ("/dates/reader-refuses-week-date", test_reader_refuses_week_date);
  return g_test_run ();
}
