/* test-install.c — `meson install` into a private DESTDIR puts every
 * desktop file where the freedesktop specifications look for it, and the
 * installed tree passes appstreamcli's tree check
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline-test"

#include "desktop-test-util.h"

#include <glib/gi18n.h>
#include <locale.h>

static char *destdir;

/* <destdir><prefix>/<dir>/<name...>: meson hands over the prefix and the
 * install folders, which may be relative to the prefix. */
static char *
installed_path (const char *dir_variable,
                const char *first_element,
                ...)
{
  g_autoptr (GPtrArray) parts = g_ptr_array_new ();
  const char *dir = dt_env (dir_variable);
  va_list args;

  g_ptr_array_add (parts, destdir);
  if (!g_path_is_absolute (dir))
    g_ptr_array_add (parts, (gpointer) dt_env ("HL_PREFIX"));
  g_ptr_array_add (parts, (gpointer) dir);
  va_start (args, first_element);
  for (const char *p = first_element; p != NULL; p = va_arg (args, const char *))
    g_ptr_array_add (parts, (gpointer) p);
  va_end (args);
  g_ptr_array_add (parts, NULL);
  return g_build_filenamev ((char **) parts->pdata);
}

static void
install_once (void)
{
  const char *argv[] = { dt_env ("MESON"), "install", "-C", dt_env ("HL_BUILD_DIR"), "--no-rebuild", "--quiet",
                         "--destdir", destdir, NULL };
  g_autofree char *output = NULL;
  int status;

  status = dt_run (argv, NULL, &output);
  if (status != 0)
    g_error ("meson install failed (%d):\n%s", status, output);
}

static void
assert_installed (const char *path)
{
  g_test_message ("%s", path);
  g_assert_true (g_file_test (path, G_FILE_TEST_IS_REGULAR));
}

static void
assert_same_file (const char *installed,
                  const char *original)
{
  g_autofree char *a = NULL, *b = NULL;
  gsize na = 0, nb = 0;

  g_assert_true (g_file_get_contents (installed, &a, &na, NULL));
  g_assert_true (g_file_get_contents (original, &b, &nb, NULL));
  g_assert_cmpmem (a, na, b, nb);
}

/* Where each file must land: Desktop Entry spec (applications/), AppStream
 * spec (metainfo/), Shared MIME-info spec (mime/packages/), Icon Theme spec
 * (icons/hicolor/<size>/apps/), GSettings (glib-2.0/schemas/), gettext
 * (<localedir>/<lang>/LC_MESSAGES/<domain>.mo). */
static void
test_tree (void)
{
  const char *id = dt_env ("HL_APP_ID");
  g_autofree char *desktop = g_strconcat (id, ".desktop", NULL);
  g_autofree char *metainfo = g_strconcat (id, ".metainfo.xml", NULL);
  g_autofree char *mime = g_strconcat (id, ".xml", NULL);
  g_autofree char *icon = g_strconcat (id, ".svg", NULL);
  g_autofree char *symbolic = g_strconcat (id, "-symbolic.svg", NULL);
  g_autofree char *schema = g_strconcat (id, ".gschema.xml", NULL);
  g_autofree char *schema_source = dt_source_path ("data", schema, NULL);
  g_autofree char *demo_source = dt_source_path ("data", "examples", "demo.hoop", NULL);
  g_autofree char *rng_source = dt_source_path ("data", "hoopline-project.rng", NULL);
  g_autofree char *icon_source = dt_source_path ("icons", "hicolor", "scalable", "apps", icon, NULL);
  g_autofree char *demo = installed_path ("HL_DATADIR", "hoopline", "examples", "demo.hoop", NULL);
  g_autofree char *rng = installed_path ("HL_DATADIR", "hoopline", "hoopline-project.rng", NULL);
  g_autofree char *icon_installed = installed_path ("HL_DATADIR", "icons", "hicolor", "scalable", "apps", icon, NULL);
  const char *paths[][2] = {
    { "HL_BINDIR", dt_env ("HL_PROGRAM_NAME") },
    /* the window program hoopline starts (src/main.c) */
    { "HL_LIBEXECDIR", dt_env ("HL_WINDOW_PROGRAM_NAME") },
    { "HL_DATADIR", "applications" },
    { "HL_DATADIR", "metainfo" },
    { "HL_DATADIR", "mime/packages" },
    { "HL_DATADIR", "icons/hicolor/symbolic/apps" },
    { "HL_LOCALEDIR", "de/LC_MESSAGES/hoopline.mo" },
  };
  const char *names[] = { NULL, NULL, desktop, metainfo, mime, symbolic, NULL };

  for (gsize i = 0; i < G_N_ELEMENTS (paths); i++)
    {
      g_autofree char *path = installed_path (paths[i][0], paths[i][1], names[i], NULL);
      assert_installed (path);
    }
  assert_installed (icon_installed);
  assert_same_file (icon_installed, icon_source);
  assert_installed (demo);
  assert_same_file (demo, demo_source);
  assert_installed (rng);
  assert_same_file (rng, rng_source);

  if (g_file_test (schema_source, G_FILE_TEST_IS_REGULAR))
    {
      g_autofree char *installed = installed_path ("HL_DATADIR", "glib-2.0", "schemas", schema, NULL);
      assert_installed (installed);
      assert_same_file (installed, schema_source);
    }
}

/* appstreamcli validate-tree checks the installed metadata together with
 * the launcher it names (AppStream spec, <launchable>). */
static void
test_appstream_tree (void)
{
  g_autofree char *prefix = g_build_filename (destdir, dt_env ("HL_PREFIX"), NULL);
  const char *argv[] = { dt_env ("APPSTREAMCLI"), "validate-tree", "--no-net", prefix, NULL };

  dt_assert_runs (argv, NULL);
}

/* The installed catalogue answers in German.  gettext only reads it under
 * a German locale; without one installed on this machine there is nothing
 * to ask. */
static void
test_catalogue (void)
{
  g_autofree char *localedir = NULL;

  if (setlocale (LC_ALL, "de_DE.UTF-8") == NULL)
    {
      g_test_skip ("no de_DE.UTF-8 locale on this machine");
      return;
    }
  localedir = installed_path ("HL_LOCALEDIR", NULL);
  bindtextdomain ("hoopline", localedir);
  bind_textdomain_codeset ("hoopline", "UTF-8");
  g_assert_cmpstr (g_dgettext ("hoopline", "Hoopline project"), ==, "Hoopline-Projekt");
  setlocale (LC_ALL, "C");
}

int
main (int    argc,
      char **argv)
{
  int status;

  /* LANGUAGE would outrank the locale in the catalogue test */
  g_unsetenv ("LANGUAGE");
  g_test_init (&argc, &argv, NULL);
  destdir = dt_make_tmp ();
  install_once ();

  g_test_add_func ("/desktop/install/tree", test_tree);
  g_test_add_func ("/desktop/install/appstream-tree", test_appstream_tree);
  g_test_add_func ("/desktop/install/catalogue", test_catalogue);

  status = g_test_run ();
  dt_remove_tree (destdir);
  g_free (destdir);
  return status;
}
