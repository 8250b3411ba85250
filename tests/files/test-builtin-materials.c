/* test-builtin-materials.c — a built-in material a shell uses is kept in the file
 *
 * A reopened project must not change when this program's built-in
 * table changes (window-saves issue; DESIGN.md §4: a project holds its
 * materials).  The file keeps a copy of every built-in material a shell
 * uses, marked <origin>built-in</origin> and written as format 1.1, so
 * readers of format 1.0 skip the element as one of a newer minor
 * version (DESIGN.md §4) and read the copy as a project material.
 * Files without the copy (format 1.0) still load from the table.
 * Material values are the table's typical ones (hl-material.c, common
 * practice: carbon steel yield about 260 MPa).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-builtin-materials"

#include "hl-project-file.h"

#include <string.h>

static HlProject *
project_on_builtin (const char *material_id,
                    guint       shells)
{
  HlProject *p = hl_project_new ();
  HlShellInputs s = hl_shell_inputs_default ();

  hl_project_set_title (p, "Receiver on a built-in material");
  s.material = *hl_material_builtin_find (material_id);
  g_strlcpy (s.material_ref, material_id, sizeof s.material_ref);
  for (guint i = 0; i < shells; i++)
    {
      g_snprintf (s.id, sizeof s.id, "shell-%u", i + 1);
      hl_project_add_shell (p, &s);
    }
  return p;
}

static HlProject *
load_text (const char *xml,
           GPtrArray **warnings)
{
  g_autoptr(GError) error = NULL;
  HlProject *p = hl_project_load_bytes (xml, strlen (xml), "memory", warnings, &error);

  g_assert_no_error (error);
  g_assert_nonnull (p);
  return p;
}

static guint
count (const char *text,
       const char *what)
{
  guint n = 0;

  for (const char *p = text; (p = strstr (p, what)) != NULL; p += strlen (what))
    n++;
  return n;
}

/* @xml with the text of the first <@element …>…</@element> set to @value */
static char *
set_first_value (const char *xml,
                 const char *element,
                 const char *value)
{
  g_autofree char *open = g_strdup_printf ("<%s ", element);
  g_autofree char *close = g_strdup_printf ("</%s>", element);
  const char *start = strstr (xml, open);
  const char *text, *end;

  g_assert_nonnull (start);
  text = strchr (start, '>') + 1;
  end = strstr (text, close);
  g_assert_nonnull (end);
  return g_strdup_printf ("%.*s%s%s", (int) (text - xml), xml, value, end);
}

static void
test_copy_is_written (void)
{
  g_autoptr(HlProject) p = project_on_builtin ("typical-carbon-steel", 3);
  g_autoptr(GError) error = NULL;
  g_autofree char *xml = hl_project_to_checked_xml (p, NULL, &error);
  g_autoptr(HlProject) back = NULL;

  g_assert_no_error (error);
  g_assert_nonnull (strstr (xml, "<hoopline-project format=\"1.1\">"));
  /* one copy for three shells */
  g_assert_cmpuint (count (xml, "<material id=\"typical-carbon-steel\">\n    <origin>built-in</origin>\n"), ==, 1);
  back = load_text (xml, NULL);
  g_assert_true (hl_project_equal (p, back));
  /* a copy, not one of the project's own materials */
  g_assert_cmpuint (hl_project_n_materials (back), ==, 0);
}

/* The table may change between versions: the file's values win.  The
 * change is simulated by editing the values in the file. */
static void
test_file_values_win (void)
{
  g_autoptr(HlProject) p = project_on_builtin ("typical-carbon-steel", 1);
  g_autofree char *xml = hl_project_to_xml (p);
  g_autofree char *edited = set_first_value (xml, "yield-strength", "300");
  g_autoptr(HlProject) back = NULL;
  g_autofree char *again = NULL;

  /* the first <yield-strength> is the copy's: materials come first */
  g_assert_true (strstr (xml, "<yield-strength ") < strstr (xml, "<shell "));
  back = load_text (edited, NULL);
  g_assert_cmpfloat (hl_project_shell (back, 0)->material.yield_strength.value, ==, 300);
  g_assert_cmpfloat (hl_material_builtin_find ("typical-carbon-steel")->yield_strength.value, ==, 260);
  g_assert_cmpstr (hl_project_shell (back, 0)->material_ref, ==, "typical-carbon-steel");
  /* and a save keeps them */
  again = hl_project_to_xml (back);
  g_clear_pointer (&back, hl_project_free);
  back = load_text (again, NULL);
  g_assert_cmpfloat (hl_project_shell (back, 0)->material.yield_strength.value, ==, 300);
}

/* format 1.0, before copies: the table gives the values */
static void
test_old_file_still_loads (void)
{
  static const char xml[] =
    "<hoopline-project format=\"1\"><shell id=\"s\"><material-ref>typical-copper</material-ref>"
    "<inner-diameter unit=\"mm\">100</inner-diameter><wall-thickness unit=\"mm\">5</wall-thickness></shell>"
    "</hoopline-project>";
  g_autoptr(HlProject) p = load_text (xml, NULL);

  g_assert_true (hl_material_equal (&hl_project_shell (p, 0)->material, hl_material_builtin_find ("typical-copper")));
}

/* A project material keeps format 1: nothing new is written. */
static void
test_project_material_only (void)
{
  g_autoptr(HlProject) p = project_on_builtin ("typical-copper", 1);
  HlMaterial m = *hl_material_builtin_find ("typical-copper");
  g_autofree char *xml = NULL;

  hl_project_put_material (p, &m);
  xml = hl_project_to_xml (p);
  g_assert_nonnull (strstr (xml, "<hoopline-project format=\"1\">"));
  g_assert_null (strstr (xml, "<origin>"));
  g_assert_cmpuint (count (xml, "<material id="), ==, 1);
}

/* How a reader of format 1.0 sees the file: the schema of 1.0 has no
 * <origin>, and format 1.1 makes it skip the element with a warning
 * (DESIGN.md §4).  Here an element this version does not know stands in
 * for <origin>: the copy is read as a project material. */
static void
test_older_reader_view (void)
{
  g_autoptr(HlProject) p = project_on_builtin ("typical-stainless-304", 1);
  g_autofree char *xml = hl_project_to_xml (p);
  g_auto(GStrv) parts = g_strsplit (xml, "<origin>built-in</origin>", 2);
  g_autofree char *older = g_strjoinv ("<kept-as>built-in</kept-as>", parts);
  g_autoptr(GPtrArray) warnings = NULL;
  g_autoptr(HlProject) back = load_text (older, &warnings);

  g_assert_cmpuint (warnings->len, ==, 1);
  g_assert_nonnull (strstr (g_ptr_array_index (warnings, 0), "kept-as"));
  g_assert_cmpuint (hl_project_n_materials (back), ==, 1);
  g_assert_true (hl_material_equal (hl_project_material (back, 0), hl_material_builtin_find ("typical-stainless-304")));
}

/* a copy and a project material with one id: refused, by id */
static void
test_copy_id_used_twice (void)
{
  g_autoptr(HlProject) p = project_on_builtin ("typical-copper", 1);
  g_autofree char *xml = hl_project_to_xml (p);
  g_auto(GStrv) parts = g_strsplit (xml, "  <shell ", 2);
  const char *start = strstr (xml, "  <material id=");
  g_autofree char *copy = NULL;
  g_auto(GStrv) without = NULL;
  g_autofree char *own = NULL;
  g_autofree char *twice = NULL;
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) back = NULL;

  /* the copy, once as written and once without its origin */
  g_assert_nonnull (start);
  copy = g_strndup (start, strstr (start, "</material>\n") + strlen ("</material>\n") - start);
  without = g_strsplit (copy, "    <origin>built-in</origin>\n", 2);
  g_assert_cmpuint (g_strv_length (without), ==, 2);
  own = g_strjoinv ("", without);
  twice = g_strconcat (parts[0], own, "  <shell ", parts[1], NULL);
  back = hl_project_load_bytes (twice, strlen (twice), "memory", NULL, &error);

  g_assert_null (back);
  g_assert_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE);
  g_assert_nonnull (strstr (error->message, "the id “typical-copper” is used twice"));
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/files/builtin-materials/copy-is-written", test_copy_is_written);
  g_test_add_func ("/files/builtin-materials/file-values-win", test_file_values_win);
  g_test_add_func ("/files/builtin-materials/old-file-still-loads", test_old_file_still_loads);
  g_test_add_func ("/files/builtin-materials/project-material-only", test_project_material_only);
  g_test_add_func ("/files/builtin-materials/older-reader-view", test_older_reader_view);
  g_test_add_func ("/files/builtin-materials/copy-id-used-twice", test_copy_id_used_twice);
  return g_test_run ();
}
