/* desktop-test-util.c — running the validators and reading the test's
 * environment, shared by the desktop-integration tests
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline-test"

#include "desktop-test-util.h"

#include <glib/gstdio.h>
#include <stdarg.h>
#include <sys/wait.h>

/* meson passes every path and tool through the environment; a missing
 * variable means the test was started by hand, which should fail loudly
 * rather than test the wrong file. */
const char *
dt_env (const char *name)
{
  const char *value = g_getenv (name);

  if (value == NULL || *value == '\0')
    g_error ("%s is not set; run this test through meson test", name);
  return value;
}

char *
dt_source_path (const char *first_element,
                ...)
{
  g_autoptr (GPtrArray) parts = g_ptr_array_new ();
  va_list args;

  g_ptr_array_add (parts, (gpointer) dt_env ("HL_SOURCE_DIR"));
  va_start (args, first_element);
  for (const char *p = first_element; p != NULL; p = va_arg (args, const char *))
    g_ptr_array_add (parts, (gpointer) p);
  va_end (args);
  g_ptr_array_add (parts, NULL);
  return g_build_filenamev ((char **) parts->pdata);
}

/* Runs a tool to the end and returns its exit status (or -1 when it could
 * not start); stdout and stderr come back together, because validators
 * report on either. */
int
dt_run (const char *const *argv,
        const char        *working_dir,
        char             **output)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *out = NULL;
  g_autofree char *err = NULL;
  int wait_status = 0;

  if (!g_spawn_sync (working_dir, (char **) argv, NULL, G_SPAWN_DEFAULT, NULL, NULL, &out, &err, &wait_status,
                     &error))
    {
      if (output != NULL)
        *output = g_strdup (error->message);
      return -1;
    }
  if (output != NULL)
    *output = g_strconcat (out, err, NULL);
  if (WIFEXITED (wait_status))
    return WEXITSTATUS (wait_status);
  return -1;
}

void
dt_assert_runs (const char *const *argv,
                const char        *working_dir)
{
  g_autofree char *output = NULL;
  g_autofree char *command = g_strjoinv (" ", (char **) argv);
  int status = dt_run (argv, working_dir, &output);

  if (status != 0)
    {
      g_test_message ("%s exited with %d:\n%s", command, status, output);
      g_test_fail ();
    }
}

char *
dt_make_tmp (void)
{
  g_autoptr (GError) error = NULL;
  char *dir = g_dir_make_tmp ("hoopline-desktop-XXXXXX", &error);

  g_assert_no_error (error);
  return dir;
}

void
dt_remove_tree (const char *path)
{
  if (g_file_test (path, G_FILE_TEST_IS_DIR) && !g_file_test (path, G_FILE_TEST_IS_SYMLINK))
    {
      g_autoptr (GDir) dir = g_dir_open (path, 0, NULL);
      const char *name;

      while (dir != NULL && (name = g_dir_read_name (dir)) != NULL)
        {
          g_autofree char *child = g_build_filename (path, name, NULL);
          dt_remove_tree (child);
        }
    }
  g_remove (path);
}
