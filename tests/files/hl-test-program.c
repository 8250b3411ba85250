/* hl-test-program.c — run the real hoopline program from a test
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-test-program"

#include "hl-test-program.h"

#include <gio/gio.h>
#include <glib/gstdio.h>
#include <string.h>

typedef struct
{
  gboolean done;
  GBytes  *out, *err;
  GError  *error;
} Pending;

static void
on_communicated (GObject      *source,
                 GAsyncResult *result,
                 gpointer      user_data)
{
  Pending *p = user_data;

  g_subprocess_communicate_finish (G_SUBPROCESS (source), result, &p->out, &p->err, &p->error);
  p->done = TRUE;
}

static gboolean
on_timeout (gpointer user_data)
{
  *(gboolean *) user_data = TRUE;
  return G_SOURCE_REMOVE;
}

static char *
bytes_to_string (GBytes *bytes)
{
  gsize len = 0;
  const char *data = bytes != NULL ? g_bytes_get_data (bytes, &len) : NULL;

  return g_strndup (data != NULL ? data : "", len);
}

HlRun *
hl_test_run_in (const char        *cwd,
                const char        *locale,
                const char *const *args)
{
  const char *program = g_getenv ("HL_PROGRAM");
  g_autoptr(GSubprocessLauncher) launcher = NULL;
  g_autoptr(GSubprocess) child = NULL;
  g_autoptr(GPtrArray) argv = g_ptr_array_new ();
  g_autoptr(GMainContext) context = g_main_context_new ();
  g_autoptr(GError) error = NULL;
  g_autoptr(GSource) timer = NULL;
  Pending pending = { 0 };
  gboolean expired = FALSE;
  gint64 start;
  HlRun *run = g_new0 (HlRun, 1);

  g_assert_nonnull (program);  /* set by tests/meson.build */
  g_ptr_array_add (argv, (gpointer) program);
  for (guint i = 0; args[i] != NULL; i++)
    g_ptr_array_add (argv, (gpointer) args[i]);
  g_ptr_array_add (argv, NULL);

  launcher = g_subprocess_launcher_new (G_SUBPROCESS_FLAGS_STDOUT_PIPE | G_SUBPROCESS_FLAGS_STDERR_PIPE);
  /* the command line must work without any display */
  g_subprocess_launcher_unsetenv (launcher, "DISPLAY");
  g_subprocess_launcher_unsetenv (launcher, "WAYLAND_DISPLAY");
  g_subprocess_launcher_setenv (launcher, "LC_ALL", locale != NULL ? locale : "C.UTF-8", TRUE);
  if (cwd != NULL)
    g_subprocess_launcher_set_cwd (launcher, cwd);

  g_main_context_push_thread_default (context);
  start = g_get_monotonic_time ();
  child = g_subprocess_launcher_spawnv (launcher, (const char *const *) argv->pdata, &error);
  g_assert_no_error (error);
  g_subprocess_communicate_async (child, NULL, NULL, on_communicated, &pending);
  timer = g_timeout_source_new_seconds (HL_TEST_TIMEOUT_S);
  g_source_set_callback (timer, on_timeout, &expired, NULL);
  g_source_attach (timer, context);
  while (!pending.done && !expired)
    g_main_context_iteration (context, TRUE);
  if (!pending.done)
    {
      g_subprocess_force_exit (child);
      while (!pending.done)
        g_main_context_iteration (context, TRUE);
      run->timed_out = TRUE;
    }
  g_source_destroy (timer);
  g_subprocess_wait (child, NULL, NULL);
  g_main_context_pop_thread_default (context);

  run->seconds = (g_get_monotonic_time () - start) / 1e6;
  run->status = g_subprocess_get_if_exited (child) ? g_subprocess_get_exit_status (child) : -1;
  run->out = bytes_to_string (pending.out);
  run->err = bytes_to_string (pending.err);
  g_clear_pointer (&pending.out, g_bytes_unref);
  g_clear_pointer (&pending.err, g_bytes_unref);
  g_clear_error (&pending.error);
  return run;
}

HlRun *
hl_test_run_valist (const char *first_arg,
                    va_list     rest)
{
  g_autoptr(GPtrArray) args = g_ptr_array_new ();

  for (const char *a = first_arg; a != NULL; a = va_arg (rest, const char *))
    g_ptr_array_add (args, (gpointer) a);
  g_ptr_array_add (args, NULL);
  return hl_test_run_in (NULL, NULL, (const char *const *) args->pdata);
}

HlRun *
hl_test_run (const char *first_arg,
             ...)
{
  HlRun *run;
  va_list ap;

  va_start (ap, first_arg);
  run = hl_test_run_valist (first_arg, ap);
  va_end (ap);
  return run;
}

void
hl_run_free (HlRun *run)
{
  if (run == NULL)
    return;
  g_free (run->out);
  g_free (run->err);
  g_free (run);
}

GStrv
hl_test_lines (const char *text)
{
  GStrv lines = g_strsplit (text, "\n", -1);
  guint n = g_strv_length (lines);

  if (n > 0 && lines[n - 1][0] == '\0')
    g_clear_pointer (&lines[n - 1], g_free);
  return lines;
}

GBytes *
hl_test_read_file (const char *path)
{
  char *data = NULL;
  gsize len = 0;

  if (!g_file_get_contents (path, &data, &len, NULL))
    return NULL;
  return g_bytes_new_take (data, len);
}

char *
hl_test_temp_dir (void)
{
  g_autoptr(GError) error = NULL;
  char *dir = g_dir_make_tmp ("hl-test-XXXXXX", &error);

  g_assert_no_error (error);
  return dir;
}

void
hl_test_remove_tree (const char *path)
{
  g_autoptr(GDir) dir = g_dir_open (path, 0, NULL);
  const char *name;

  while (dir != NULL && (name = g_dir_read_name (dir)) != NULL)
    {
      g_autofree char *child = g_build_filename (path, name, NULL);

      if (g_file_test (child, G_FILE_TEST_IS_DIR) && !g_file_test (child, G_FILE_TEST_IS_SYMLINK))
        hl_test_remove_tree (child);
      else
        g_unlink (child);
    }
  g_rmdir (path);
}
