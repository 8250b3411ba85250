/* fuzz-regress-main.c — replays saved fuzz inputs without libFuzzer
 *
 * Linked with one target's LLVMFuzzerTestOneInput, it feeds every file
 * of the directories named on the command line to it, one GLib test per
 * file, so the seed corpus and every crash once found run in the normal
 * test suite with any compiler.  A broken rule aborts the program, which
 * fails the test.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-fuzz"

#include "fuzz-common.h"

static void
replay (gconstpointer data)
{
  const char *path = data;
  g_autofree char *contents = NULL;
  g_autoptr(GError) error = NULL;
  gsize length = 0;

  g_file_get_contents (path, &contents, &length, &error);
  g_assert_no_error (error);
  g_assert_cmpint (LLVMFuzzerTestOneInput ((const uint8_t *) contents, length), ==, 0);
}

static gint
compare_names (gconstpointer a,
               gconstpointer b)
{
  return g_strcmp0 (*(char * const *) a, *(char * const *) b);
}

/* Adds a test per regular file of @dir; hidden files and README are
 * notes, not inputs.  Returns how many. */
static guint
add_directory (const char *target,
               const char *dir)
{
  g_autoptr(GDir) handle = g_dir_open (dir, 0, NULL);
  g_autoptr(GPtrArray) names = g_ptr_array_new_with_free_func (g_free);
  g_autofree char *label = g_path_get_basename (dir);
  const char *name;

  if (handle == NULL)
    return 0;
  while ((name = g_dir_read_name (handle)) != NULL)
    if (name[0] != '.' && g_strcmp0 (name, "README") != 0)
      g_ptr_array_add (names, g_strdup (name));
  g_ptr_array_sort (names, compare_names);
  for (guint i = 0; i < names->len; i++)
    {
      char *path = g_build_filename (dir, g_ptr_array_index (names, i), NULL);
      g_autofree char *test = g_strdup_printf ("/fuzz-regress/%s/%s/%s", target, label,
                                               (const char *) g_ptr_array_index (names, i));

      if (g_file_test (path, G_FILE_TEST_IS_REGULAR))
        g_test_add_data_func_full (test, path, replay, g_free);
      else
        g_free (path);
    }
  return names->len;
}

int
main (int    argc,
      char **argv)
{
  guint inputs = 0;

  g_test_init (&argc, &argv, NULL);
  LLVMFuzzerInitialize (&argc, &argv);
  if (argc < 3)
    {
      g_printerr ("usage: %s TARGET DIRECTORY...\n", argv[0]);
      return 2;
    }
  for (int i = 2; i < argc; i++)
    inputs += add_directory (argv[1], argv[i]);
  /* a missing corpus would pass by testing nothing */
  if (inputs == 0)
    {
      g_printerr ("%s: no inputs in the given directories\n", argv[1]);
      return 1;
    }
  return g_test_run ();
}
