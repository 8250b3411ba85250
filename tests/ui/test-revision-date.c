/* test-revision-date.c — the revisions dialog keeps the file's date rule
 *
 * ISO 8601-1:2019 has week dates (2026-W48-3, §5.2.4) as well as the
 * calendar dates (YYYY-MM-DD, §5.2.2.1) a project file holds.  A week
 * date the dialog took would make the project refuse to save; the dialog
 * must refuse it as the writer does (tests/files/test-dates.c).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-revision-date"

#include "hl-config.h"
#include "hl-application.h"
#include "hl-properties-dialog.h"
#include "hl-ui-test-util.h"
#include "hl-window.h"

#include <locale.h>
#include <stdio.h>

static HlApplication *app;

/* the revision count after adding one with @date through the dialog */
static guint
add_with_date (HlWindow   *window,
               const char *date)
{
  HlDocument *document = hl_window_get_document (window);
  HlPropertiesDialog *dialog = hl_properties_dialog_new (GTK_WINDOW (window), document, TRUE);
  guint after;

  gtk_window_present (GTK_WINDOW (dialog));
  hl_ui_iterate ();
  gtk_editable_set_text (hl_properties_dialog_get_revision_date_entry (dialog), date);
  gtk_editable_set_text (hl_properties_dialog_get_revision_text_entry (dialog), "Checked again.");
  g_signal_emit_by_name (hl_properties_dialog_get_revision_text_entry (dialog), "activate");
  hl_ui_iterate ();
  after = hl_document_get_project (document)->revisions->len;
  if (g_strcmp0 (date, "2026-W48-3") == 0)
    g_assert_cmpstr (hl_properties_dialog_get_revision_error (dialog), !=, "");
  gtk_window_destroy (GTK_WINDOW (dialog));
  hl_ui_iterate ();
  return after;
}

static void
test_week_date_refused (void)
{
  g_autofree char *path = hl_ui_demo_path ();
  HlWindow *window = hl_ui_open_window (app, path);
  guint before = hl_document_get_project (hl_window_get_document (window))->revisions->len;

  g_assert_cmpuint (add_with_date (window, "2026-W48-3"), ==, before);
  g_assert_false (hl_document_get_modified (hl_window_get_document (window)));
  /* a calendar date is taken: the check above can tell them apart */
  g_assert_cmpuint (add_with_date (window, "2026-11-25"), ==, before + 1);

  gtk_window_destroy (GTK_WINDOW (window));
  hl_ui_iterate ();
}

int
main (int    argc,
      char **argv)
{
  int status;

  setlocale (LC_ALL, "C.UTF-8");
  g_test_init (&argc, &argv, NULL);
  if (!gtk_init_check ())
    {
      /* CI runs these under Xvfb; a run without any display cannot test a window */
      printf ("1..0 # SKIP no display\n");
      return 0;
    }
  app = hl_ui_application_new ();
  g_test_add_func ("/revision-date/week-date-refused", test_week_date_refused);
  status = g_test_run ();
  g_object_unref (app);
  return status;
}
