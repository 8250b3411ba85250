/* test-mime.c — the .hoop file type: the shared-mime-info package is
 * compiled with update-mime-database into a private folder and GIO, the
 * library every GTK file chooser and file manager asks, must then know a
 * project file by its name and by its content
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline-test"

#include "desktop-test-util.h"

#include <gio/gio.h>
#include <glib/gstdio.h>
#include <string.h>

static char *mime_root;

/* Builds <tmp>/mime from our package alone, as an installed system would
 * after update-mime-database, and points GIO at it before any lookup. */
static void
build_mime_database (void)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *contents = NULL;
  g_autofree char *packages = NULL;
  g_autofree char *package = NULL;
  gsize length = 0;
  const char *dirs[3] = { NULL, "/usr/share/mime", NULL };

  mime_root = dt_make_tmp ();
  packages = g_build_filename (mime_root, "mime", "packages", NULL);
  package = g_build_filename (packages, "org.hoopline.Hoopline.xml", NULL);
  g_assert_cmpint (g_mkdir_with_parents (packages, 0700), ==, 0);
  g_file_get_contents (dt_env ("HL_MIME_FILE"), &contents, &length, &error);
  g_assert_no_error (error);
  g_file_set_contents (package, contents, length, &error);
  g_assert_no_error (error);

  {
    g_autofree char *db = g_build_filename (mime_root, "mime", NULL);
    const char *argv[] = { dt_env ("UPDATE_MIME_DATABASE"), db, NULL };
    g_autofree char *output = NULL;
    int status = dt_run (argv, NULL, &output);

    if (status != 0)
      g_error ("update-mime-database failed (%d): %s", status, output);
    /* ours first, so that the system's own types (application/xml and its
     * parents) are still known behind it */
    dirs[0] = db;
    g_content_type_set_mime_dirs (dirs);
  }
}

/* Shared MIME-info Database spec: a glob match on the file name decides
 * when the content is not looked at. */
static void
test_glob (void)
{
  gboolean uncertain = TRUE;
  g_autofree char *type = g_content_type_guess ("Larkfield receivers.hoop", NULL, 0, &uncertain);

  g_assert_cmpstr (type, ==, dt_env ("HL_MIME_TYPE"));
}

/* The file is XML; anything that handles XML may open it (spec,
 * sub-class-of). */
static void
test_is_xml (void)
{
  g_assert_true (g_content_type_is_a (dt_env ("HL_MIME_TYPE"), "application/xml"));
  g_assert_true (g_content_type_is_a (dt_env ("HL_MIME_TYPE"), "text/plain"));
}

/* A project saved without its extension (a mail attachment, a download)
 * is still known by its root element: the shipped demo file, nameless. */
static void
test_content (void)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *demo = dt_source_path ("data", "examples", "demo.hoop", NULL);
  g_autofree char *data = NULL;
  g_autofree char *type = NULL;
  gsize length = 0;
  gboolean uncertain = TRUE;

  g_file_get_contents (demo, &data, &length, &error);
  g_assert_no_error (error);
  type = g_content_type_guess (NULL, (const guchar *) data, length, &uncertain);
  g_assert_cmpstr (type, ==, dt_env ("HL_MIME_TYPE"));
  g_assert_false (uncertain);
}

/* Plain XML that is not a project must not be claimed. */
static void
test_other_xml_not_claimed (void)
{
  const char *other = "<?xml version=\"1.0\"?>\n<hoopline-notes>a hoopline-project</hoopline-notes>\n";
  g_autofree char *type = g_content_type_guess (NULL, (const guchar *) other, strlen (other), NULL);

  g_assert_cmpstr (type, !=, dt_env ("HL_MIME_TYPE"));
}

static void
test_description (void)
{
  g_autofree char *description = g_content_type_get_description (dt_env ("HL_MIME_TYPE"));

  g_assert_cmpstr (description, ==, "Hoopline project");
}

int
main (int    argc,
      char **argv)
{
  int status;

  /* the description test reads the untranslated comment */
  g_setenv ("LC_ALL", "C", TRUE);
  g_setenv ("LANGUAGE", "", TRUE);
  g_test_init (&argc, &argv, NULL);
  build_mime_database ();

  g_test_add_func ("/desktop/mime/glob", test_glob);
  g_test_add_func ("/desktop/mime/is-xml", test_is_xml);
  g_test_add_func ("/desktop/mime/content", test_content);
  g_test_add_func ("/desktop/mime/other-xml-not-claimed", test_other_xml_not_claimed);
  g_test_add_func ("/desktop/mime/description", test_description);

  status = g_test_run ();
  dt_remove_tree (mime_root);
  g_free (mime_root);
  return status;
}
