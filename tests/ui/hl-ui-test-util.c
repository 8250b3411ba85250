/* hl-ui-test-util.c — what the window's tests share
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-ui-test"

#include "hl-ui-test-util.h"
#include "hl-window.h"

void
hl_ui_iterate (void)
{
  while (g_main_context_pending (NULL))
    g_main_context_iteration (NULL, FALSE);
}

static gboolean
timeout_cb (gpointer data)
{
  *(gboolean *) data = TRUE;
  return G_SOURCE_REMOVE;
}

void
hl_ui_run_for (guint ms)
{
  gboolean done = FALSE;

  g_timeout_add (ms, timeout_cb, &done);
  while (!done)
    g_main_context_iteration (NULL, TRUE);
  hl_ui_iterate ();
}

char *
hl_ui_demo_path (void)
{
  const char *src = g_getenv ("HL_SOURCE_DIR");

  g_assert_nonnull (src);
  return g_build_filename (src, "data", "examples", "demo.hoop", NULL);
}

HlWindow *
hl_ui_open_window (HlApplication *app,
                   const char    *path)
{
  g_autoptr(GFile) file = g_file_new_for_path (path);
  HlWindow *window = hl_window_new (GTK_APPLICATION (app));

  g_assert_true (hl_window_load_file (window, file));
  gtk_window_present (GTK_WINDOW (window));
  hl_ui_iterate ();
  return window;
}

HlWindow *
hl_ui_open_demo (HlApplication *app)
{
  g_autofree char *path = hl_ui_demo_path ();

  return hl_ui_open_window (app, path);
}

void
hl_ui_discard_window (HlWindow *window)
{
  gtk_window_destroy (GTK_WINDOW (window));
  hl_ui_iterate ();
}

void
hl_ui_answer (GtkWidget  *question,
              const char *response)
{
  g_assert_true (ADW_IS_MESSAGE_DIALOG (question));
  g_assert_true (adw_message_dialog_has_response (ADW_MESSAGE_DIALOG (question), response));
  g_assert_true (adw_message_dialog_get_response_enabled (ADW_MESSAGE_DIALOG (question), response));
  adw_message_dialog_response (ADW_MESSAGE_DIALOG (question), response);
}

char *
hl_ui_question_text (GtkWidget *question)
{
  g_assert_true (ADW_IS_MESSAGE_DIALOG (question));
  return g_strdup (adw_message_dialog_get_heading (ADW_MESSAGE_DIALOG (question)));
}

HlApplication *
hl_ui_application_new (void)
{
  g_autoptr(GError) error = NULL;
  HlApplication *app = hl_application_new (G_APPLICATION_NON_UNIQUE);
  /* a test machine may have no session bus, and GTK warns about it at
   * start-up; the window needs none */
  GLogLevelFlags fatal = g_log_set_always_fatal (G_LOG_FATAL_MASK);

  if (!g_application_register (G_APPLICATION (app), NULL, &error))
    g_error ("cannot register the application: %s", error->message);
  g_log_set_always_fatal (fatal);
  return app;
}
