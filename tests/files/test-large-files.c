/* test-large-files.c — files up to the size cap load, or get our message
 *
 * The project reader caps files at HL_PROJECT_FILE_MAX_BYTES (16 MiB)
 * itself; below the cap libxml2's own 10,000,000-byte limits on a
 * single comment, text or lookahead (XML_MAX_TEXT_LENGTH and
 * XML_MAX_LOOKUP_LIMIT in libxml2's parserInternals.h) must not refuse
 * a file, and no file may get libxml2's words instead of ours.  XML 1.0
 * (W3C) §2.5 allows comments of any length and §2.8 white space after
 * the root element.  The reader validates long lists in slices (see
 * hl-project-reader.c): an error far down a list is still found.
 * No timing is asserted.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-large-files"

#include "hl-project-file.h"

#include <string.h>

static char *
project_xml (guint shells)
{
  g_autoptr(HlProject) p = hl_project_new ();
  HlShellInputs s = hl_shell_inputs_default ();

  hl_project_set_title (p, "Large plant");
  hl_project_put_material (p, &s.material);
  for (guint i = 0; i < shells; i++)
    {
      g_snprintf (s.id, sizeof s.id, "shell-%u", i + 1);
      g_snprintf (s.name, sizeof s.name, "Shell %u", i + 1);
      hl_project_add_shell (p, &s);
    }
  return hl_project_to_xml (p);
}

static HlProject *
load (const GString *xml,
      GError       **error)
{
  return hl_project_load_bytes (xml->str, xml->len, "large.hoop", NULL, error);
}

/* a comment longer than libxml2's 10,000,000-byte limit, in a file
 * below our cap */
static void
test_long_comment (void)
{
  g_autofree char *xml = project_xml (4000);
  g_autoptr(GString) text = g_string_new (NULL);
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) p = NULL;
  const char *title = strstr (xml, "  <title>");

  g_string_append_len (text, xml, title - xml);
  g_string_append (text, "<!-- ");
  for (guint i = 0; i < 10500000 / 50; i++)
    g_string_append (text, "Notes of the plant, kept in the file by the user. ");
  g_string_append (text, "-->\n");
  g_string_append (text, title);
  g_assert_cmpuint (text->len, <, HL_PROJECT_FILE_MAX_BYTES);
  p = load (text, &error);
  g_assert_no_error (error);
  g_assert_cmpuint (hl_project_n_shells (p), ==, 4000);
}

/* exactly at the cap loads; one byte more gets our own message */
static void
test_at_the_cap (void)
{
  g_autofree char *xml = project_xml (6000);
  g_autoptr(GString) text = g_string_new (xml);
  g_autoptr(HlProject) p = NULL;
  g_autoptr(GError) error = NULL;

  while (text->len < HL_PROJECT_FILE_MAX_BYTES)
    g_string_append_c (text, text->len % 80 == 0 ? '\n' : ' ');
  g_assert_cmpuint (text->len, ==, HL_PROJECT_FILE_MAX_BYTES);
  p = load (text, &error);
  g_assert_no_error (error);
  g_assert_cmpuint (hl_project_n_shells (p), ==, 6000);
  g_string_append_c (text, ' ');
  g_clear_pointer (&p, hl_project_free);
  p = load (text, &error);
  g_assert_null (p);
  g_assert_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_TOO_LARGE);
  g_assert_cmpstr (error->message, ==, "large.hoop:1: the file is larger than 16 MiB: not a project file");
}

/* one bad shell far down a long list: the schema still sees it */
static void
test_error_late_in_a_list (void)
{
  static const struct { const char *from, *to, *message; } cases[] = {
    { "<shell id=\"shell-777\" form=\"cylinder\" ends=\"closed\">\n",
      "<shell id=\"shell-777\" form=\"cylinder\" ends=\"closed\">\n    <colour>red</colour>\n",
      "colour: is not an element of <shell> in format 1" },
    { "<shell id=\"shell-999\" form=\"cylinder\" ends=\"closed\">", "<shell id=\"shell-999\" form=\"cone\" ends=\"closed\">",
      "shell: form “cone” is not one of cylinder, sphere" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *xml = project_xml (1000);
      g_auto(GStrv) parts = g_strsplit (xml, cases[i].from, 2);
      g_autofree char *bad = g_strjoinv (cases[i].to, parts);
      g_autoptr(GString) text = g_string_new (bad);
      g_autoptr(GError) error = NULL;
      g_autoptr(HlProject) p = NULL;

      g_assert_cmpuint (g_strv_length (parts), ==, 2);
      p = load (text, &error);
      g_assert_null (p);
      g_assert_nonnull (error);
      g_test_message ("%s", error->message);
      if (strstr (error->message, cases[i].message) == NULL)
        g_error ("“%s” lacks “%s”", error->message, cases[i].message);
    }
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/files/large/long-comment", test_long_comment);
  g_test_add_func ("/files/large/at-the-cap", test_at_the_cap);
  g_test_add_func ("/files/large/error-late-in-a-list", test_error_late_in_a_list);
  return g_test_run ();
}
