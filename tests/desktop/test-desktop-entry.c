/* test-desktop-entry.c — the launcher, the AppStream metadata and the
 * settings schema, checked by the freedesktop and GNOME validators and
 * against the facts the rest of the build states
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline-test"

#include "desktop-test-util.h"
#include "hl-report.h"

#include <gdk-pixbuf/gdk-pixbuf.h>
#include <libxml/parser.h>
#include <libxml/xpath.h>
#include <string.h>

/* ---- desktop file ---------------------------------------------------- */

/* Desktop Entry Specification 1.5, as checked by desktop-file-validate
 * (desktop-file-utils): exit 0 on a valid file.  Its warnings and hints
 * ("key is deprecated", "redundant category") also count as faults here. */
static void
test_entry_validates (void)
{
  g_autofree char *output = NULL;
  const char *argv[] = { dt_env ("DESKTOP_FILE_VALIDATE"), dt_env ("HL_DESKTOP_FILE"), NULL };
  int status = dt_run (argv, NULL, &output);

  g_test_message ("%s", output);
  g_assert_cmpint (status, ==, 0);
  g_assert_null (strstr (output, "error:"));
  g_assert_null (strstr (output, "warning:"));
  g_assert_null (strstr (output, "hint:"));
}

static GKeyFile *
load_entry (void)
{
  g_autoptr (GError) error = NULL;
  GKeyFile *entry = g_key_file_new ();

  g_key_file_load_from_file (entry, dt_env ("HL_DESKTOP_FILE"), G_KEY_FILE_KEEP_TRANSLATIONS, &error);
  g_assert_no_error (error);
  return entry;
}

static void
test_entry_keys (void)
{
  g_autoptr (GKeyFile) entry = load_entry ();
  const char *app_id = dt_env ("HL_APP_ID");
  g_autofree char *basename = g_path_get_basename (dt_env ("HL_DESKTOP_FILE"));
  g_autofree char *expected_basename = g_strconcat (app_id, ".desktop", NULL);
  g_autofree char *exec = g_key_file_get_string (entry, "Desktop Entry", "Exec", NULL);
  g_autofree char *icon = g_key_file_get_string (entry, "Desktop Entry", "Icon", NULL);
  g_auto (GStrv) exec_argv = NULL;
  g_auto (GStrv) mime_types = g_key_file_get_string_list (entry, "Desktop Entry", "MimeType", NULL, NULL);
  g_auto (GStrv) categories = g_key_file_get_string_list (entry, "Desktop Entry", "Categories", NULL, NULL);

  /* GApplication finds its launcher by the application id (GLib
   * GApplication docs; desktop-entry spec §"File naming") */
  g_assert_cmpstr (basename, ==, expected_basename);
  g_assert_cmpstr (icon, ==, app_id);

  /* The program the build installs, with %F so that a file manager can
   * hand over several project files (spec §"The Exec key") */
  g_assert_nonnull (exec);
  g_assert_true (g_shell_parse_argv (exec, NULL, &exec_argv, NULL));
  g_assert_cmpstr (exec_argv[0], ==, dt_env ("HL_PROGRAM_NAME"));
  g_assert_true (g_strv_contains ((const char *const *) exec_argv, "%F"));

  g_assert_nonnull (mime_types);
  g_assert_true (g_strv_contains ((const char *const *) mime_types, dt_env ("HL_MIME_TYPE")));

  /* Engineering is an additional category; the menu spec (Desktop Menu
   * Specification, appendix A) wants it beside the main category Science */
  g_assert_nonnull (categories);
  g_assert_true (g_strv_contains ((const char *const *) categories, "Engineering"));
  g_assert_true (g_strv_contains ((const char *const *) categories, "Science"));
  g_assert_false (g_key_file_get_boolean (entry, "Desktop Entry", "Terminal", NULL));
}

/* i18n.merge_file must carry the German catalogue into the launcher; an
 * unchanged or missing German text means the merge did not happen. */
static void
test_entry_translated (void)
{
  g_autoptr (GKeyFile) entry = load_entry ();
  const char *keys[] = { "GenericName", "Comment", "Keywords" };

  for (gsize i = 0; i < G_N_ELEMENTS (keys); i++)
    {
      g_autofree char *english = g_key_file_get_string (entry, "Desktop Entry", keys[i], NULL);
      g_autofree char *german = g_key_file_get_locale_string (entry, "Desktop Entry", keys[i], "de", NULL);
      g_autofree char *german_key = g_strdup_printf ("%s[de]", keys[i]);
      g_autofree char *german_raw = g_key_file_get_value (entry, "Desktop Entry", german_key, NULL);

      g_test_message ("%s: %s | %s", keys[i], english, german);
      g_assert_nonnull (german_raw);
      g_assert_cmpstr (german, !=, english);
    }
}

/* ---- AppStream metadata ------------------------------------------------ */

/* AppStream specification, as checked by appstreamcli validate; --no-net
 * keeps the screenshot and homepage addresses from being fetched. */
static void
test_metainfo_validates (void)
{
  const char *argv[] = { dt_env ("APPSTREAMCLI"), "validate", "--no-net", dt_env ("HL_METAINFO_FILE"), NULL };

  dt_assert_runs (argv, NULL);
}

typedef struct
{
  xmlDocPtr          doc;
  xmlXPathContextPtr xpath;
} Metainfo;

static void
metainfo_open (Metainfo *mi)
{
  mi->doc = xmlReadFile (dt_env ("HL_METAINFO_FILE"), NULL, XML_PARSE_NONET | XML_PARSE_NOBLANKS);
  g_assert_nonnull (mi->doc);
  mi->xpath = xmlXPathNewContext (mi->doc);
  g_assert_nonnull (mi->xpath);
}

static void
metainfo_close (Metainfo *mi)
{
  xmlXPathFreeContext (mi->xpath);
  xmlFreeDoc (mi->doc);
}

/* The text of every node the expression finds, white space folded the way
 * AppStream folds it in paragraphs. */
static GPtrArray *
metainfo_texts (Metainfo   *mi,
                const char *expression)
{
  GPtrArray *texts = g_ptr_array_new_with_free_func (g_free);
  xmlXPathObjectPtr found = xmlXPathEvalExpression ((const xmlChar *) expression, mi->xpath);

  g_assert_nonnull (found);
  for (int i = 0; found->nodesetval != NULL && i < found->nodesetval->nodeNr; i++)
    {
      xmlChar *raw = xmlNodeGetContent (found->nodesetval->nodeTab[i]);
      g_auto (GStrv) words = g_strsplit_set ((const char *) raw, " \t\n\r", -1);
      g_autoptr (GString) folded = g_string_new (NULL);

      for (int w = 0; words[w] != NULL; w++)
        if (*words[w] != '\0')
          g_string_append_printf (folded, "%s%s", folded->len > 0 ? " " : "", words[w]);
      g_ptr_array_add (texts, g_string_free (g_steal_pointer (&folded), FALSE));
      xmlFree (raw);
    }
  xmlXPathFreeObject (found);
  return texts;
}

static char *
metainfo_text (Metainfo   *mi,
               const char *expression)
{
  g_autoptr (GPtrArray) texts = metainfo_texts (mi, expression);

  g_test_message ("%s: %u match(es)", expression, texts->len);
  g_assert_cmpuint (texts->len, ==, 1);
  return g_strdup (texts->pdata[0]);
}

/* What the metadata says must agree with what the build makes: the same
 * id, launcher, program, licence and version. */
static void
test_metainfo_agrees_with_build (void)
{
  Metainfo mi;
  g_autofree char *desktop_basename = g_path_get_basename (dt_env ("HL_DESKTOP_FILE"));
  g_autofree char *id = NULL, *launchable = NULL, *binary = NULL, *mediatype = NULL;
  g_autofree char *license = NULL, *version = NULL, *rating = NULL;

  metainfo_open (&mi);
  id = metainfo_text (&mi, "/component/id");
  launchable = metainfo_text (&mi, "/component/launchable[@type='desktop-id']");
  binary = metainfo_text (&mi, "/component/provides/binary");
  mediatype = metainfo_text (&mi, "/component/provides/mediatype");
  license = metainfo_text (&mi, "/component/project_license");
  version = metainfo_text (&mi, "/component/releases/release[1]/@version");
  rating = metainfo_text (&mi, "/component/content_rating/@type");

  g_assert_cmpstr (id, ==, dt_env ("HL_APP_ID"));
  g_assert_cmpstr (launchable, ==, desktop_basename);
  g_assert_cmpstr (binary, ==, dt_env ("HL_PROGRAM_NAME"));
  g_assert_cmpstr (mediatype, ==, dt_env ("HL_MIME_TYPE"));
  g_assert_cmpstr (license, ==, dt_env ("HL_LICENSE"));
  /* the newest release comes first (AppStream spec, <releases>) */
  g_assert_cmpstr (version, ==, dt_env ("HL_VERSION"));
  g_assert_cmpstr (rating, ==, "oars-1.1");
  metainfo_close (&mi);
}

/* Pressure equipment can kill: the software centre page carries the same
 * caution as the window and the reports, word for word. */
static void
test_metainfo_caution (void)
{
  Metainfo mi;
  g_autoptr (GPtrArray) paragraphs = NULL;
  gboolean found = FALSE;

  metainfo_open (&mi);
  paragraphs = metainfo_texts (&mi, "/component/description/p[not(@xml:lang)]");
  for (guint i = 0; i < paragraphs->len; i++)
    found = found || g_str_equal (paragraphs->pdata[i], HL_CAUTION);
  g_assert_true (found);
  metainfo_close (&mi);
}

/* Each translatable line has its German twin after the merge. */
static void
test_metainfo_translated (void)
{
  Metainfo mi;
  const char *elements[] = { "summary", "description/p", "description/ul/li", "screenshots/screenshot/caption" };

  metainfo_open (&mi);
  for (gsize i = 0; i < G_N_ELEMENTS (elements); i++)
    {
      g_autofree char *english_xp = g_strdup_printf ("/component/%s[not(@xml:lang)]", elements[i]);
      g_autofree char *german_xp = g_strdup_printf ("/component/%s[@xml:lang='de']", elements[i]);
      g_autoptr (GPtrArray) english = metainfo_texts (&mi, english_xp);
      g_autoptr (GPtrArray) german = metainfo_texts (&mi, german_xp);

      g_test_message ("%s: %u English, %u German", elements[i], english->len, german->len);
      g_assert_cmpuint (english->len, >, 0);
      g_assert_cmpuint (german->len, ==, english->len);
    }
  metainfo_close (&mi);
}

/* The screenshot address names the picture kept in the repository under
 * the same path, so that the published copy can be refreshed from it. */
static void
test_metainfo_screenshot (void)
{
  g_autofree char *format_name = NULL;
  Metainfo mi;
  g_autofree char *image = NULL;
  g_autofree char *in_tree = dt_source_path ("docs", "screenshot-window.png", NULL);
  GdkPixbufFormat *format;
  int width = 0, height = 0;

  metainfo_open (&mi);
  image = metainfo_text (&mi, "/component/screenshots/screenshot[@type='default']/image");
  g_assert_true (g_str_has_suffix (image, "/docs/screenshot-window.png"));
  metainfo_close (&mi);

  g_assert_true (g_file_test (in_tree, G_FILE_TEST_IS_REGULAR));
  format = gdk_pixbuf_get_file_info (in_tree, &width, &height);
  g_assert_nonnull (format);
  format_name = gdk_pixbuf_format_get_name (format);
  g_assert_cmpstr (format_name, ==, "png");
  /* appstream-glib asks for source screenshots of at least 624 x 351
   * (from memory) */
  g_assert_cmpint (width, >=, 624);
  g_assert_cmpint (height, >=, 351);
}

/* ---- settings schema --------------------------------------------------- */

/* glib-compile-schemas --strict refuses unknown elements, bad defaults and
 * out-of-range values (GLib GSettings documentation). */
static void
test_schema_compiles (void)
{
  g_autofree char *data_dir = dt_source_path ("data", NULL);
  g_autofree char *schema_name = g_strconcat (dt_env ("HL_APP_ID"), ".gschema.xml", NULL);
  g_autofree char *schema = g_build_filename (data_dir, schema_name, NULL);
  const char *argv[] = { dt_env ("GLIB_COMPILE_SCHEMAS"), "--strict", "--dry-run", data_dir, NULL };

  if (!g_file_test (schema, G_FILE_TEST_IS_REGULAR))
    {
      g_test_skip ("no settings schema in data/ yet");
      return;
    }
  dt_assert_runs (argv, NULL);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);

  g_test_add_func ("/desktop/entry/validates", test_entry_validates);
  g_test_add_func ("/desktop/entry/keys", test_entry_keys);
  g_test_add_func ("/desktop/entry/translated", test_entry_translated);
  g_test_add_func ("/desktop/metainfo/validates", test_metainfo_validates);
  g_test_add_func ("/desktop/metainfo/agrees-with-build", test_metainfo_agrees_with_build);
  g_test_add_func ("/desktop/metainfo/caution", test_metainfo_caution);
  g_test_add_func ("/desktop/metainfo/translated", test_metainfo_translated);
  g_test_add_func ("/desktop/metainfo/screenshot", test_metainfo_screenshot);
  g_test_add_func ("/desktop/schema/compiles", test_schema_compiles);

  return g_test_run ();
}
