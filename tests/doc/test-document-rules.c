/* test-document-rules.c — the rules the document keeps once, for every view
 *
 * What an edit of a built-in or a shared material makes, and whether a
 * project can be written now, are the document's: the window, a script
 * and these tests meet the same rule.  No display is needed.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-document-rules"

#include "hl-document.h"
#include "hl-limits.h"
#include "hl-project-file.h"

#include <string.h>

static HlDocument *
open_demo (void)
{
  const char *src = g_getenv ("HL_SOURCE_DIR");
  g_autofree char *path = NULL;
  g_autoptr(GFile) file = NULL;
  g_autoptr(GError) error = NULL;
  HlShellInputs first = hl_shell_inputs_default ();
  HlDocument *doc;

  g_assert_nonnull (src);
  path = g_build_filename (src, "data", "examples", "demo.hoop", NULL);
  file = g_file_new_for_path (path);
  doc = hl_document_new (&first, HL_UNIT_SYSTEM_SI);
  g_assert_true (hl_document_load (doc, file, NULL, &error));
  g_assert_no_error (error);
  return doc;
}

static const HlShellInputs *
shell_by_id (HlDocument *doc,
             const char *id)
{
  const HlProject *p = hl_document_get_project (doc);

  for (guint i = 0; i < hl_project_n_shells (p); i++)
    if (strcmp (hl_project_shell (p, i)->id, id) == 0)
      return hl_project_shell (p, i);
  g_assert_not_reached ();
}

/* The demo's receiver (shell 0) and sphere share "p265gh" */
static void
test_shared_material_scope (void)
{
  g_autoptr(HlDocument) doc = open_demo ();
  HlMaterial m;
  const char *id;

  hl_document_set_selected (doc, 0);
  g_assert_cmpuint (hl_document_count_material_users (doc, "p265gh"), ==, 2);

  /* this shell only: a copy, named as one, the other shell untouched */
  m = hl_document_get_shell (doc)->material;
  m.allowable_stress.value = 130;
  id = hl_document_edit_material (doc, &m, HL_MATERIAL_SCOPE_THIS_SHELL, "allowable-stress");
  g_assert_cmpstr (id, ==, "p265gh-copy-1");
  g_assert_cmpstr (shell_by_id (doc, "air-receiver")->material_ref, ==, "p265gh-copy-1");
  g_assert_true (g_str_has_suffix (shell_by_id (doc, "air-receiver")->material.name, " (copy)"));
  g_assert_cmpfloat (shell_by_id (doc, "air-receiver")->material.allowable_stress.value, ==, 130);
  g_assert_cmpstr (shell_by_id (doc, "n2-sphere")->material_ref, ==, "p265gh");
  g_assert_cmpfloat (shell_by_id (doc, "n2-sphere")->material.allowable_stress.value, !=, 130);

  /* one undo step takes the copy away again */
  hl_document_undo (doc);
  g_assert_cmpstr (shell_by_id (doc, "air-receiver")->material_ref, ==, "p265gh");
  g_assert_null (hl_project_find_material (hl_document_get_project (doc), "p265gh-copy-1"));

  /* every shell using it: both follow, no copy */
  hl_document_set_selected (doc, 0);
  m = hl_document_get_shell (doc)->material;
  m.allowable_stress.value = 120;
  id = hl_document_edit_material (doc, &m, HL_MATERIAL_SCOPE_ALL_USERS, "allowable-stress");
  g_assert_cmpstr (id, ==, "p265gh");
  g_assert_cmpfloat (shell_by_id (doc, "n2-sphere")->material.allowable_stress.value, ==, 120);
  g_assert_cmpfloat (hl_project_find_material (hl_document_get_project (doc), "p265gh")->allowable_stress.value, ==, 120);
}

/* A built-in material is never changed: its first edit makes a project
 * material; a name being typed stays the user's own */
static void
test_builtin_material_copied (void)
{
  g_autoptr(HlDocument) doc = open_demo ();
  const HlMaterial *builtin = hl_material_builtin (0);
  HlShellInputs shell = *hl_document_get_shell (doc);
  HlMaterial m;
  const char *id;
  double typical = builtin->yield_strength.value;

  shell.material = *builtin;
  g_strlcpy (shell.material_ref, builtin->id, sizeof shell.material_ref);
  hl_document_edit_shell (doc, &shell, NULL);
  g_assert_cmpstr (hl_document_get_shell (doc)->material_ref, ==, builtin->id);

  m = hl_document_get_shell (doc)->material;
  m.yield_strength.value = typical + 10;
  id = hl_document_edit_material (doc, &m, HL_MATERIAL_SCOPE_ALL_USERS, "yield-strength");
  g_assert_cmpstr (id, !=, builtin->id);
  g_assert_nonnull (hl_project_find_material (hl_document_get_project (doc), id));
  g_assert_true (g_str_has_suffix (hl_document_get_shell (doc)->material.name, ", edited"));
  g_assert_cmpfloat (hl_material_builtin_find (builtin->id)->yield_strength.value, ==, typical);

  /* typing a name into a shell on another built-in: the typed name stays */
  shell = *hl_document_get_shell (doc);
  shell.material = *builtin;
  g_strlcpy (shell.material_ref, builtin->id, sizeof shell.material_ref);
  hl_document_edit_shell (doc, &shell, NULL);
  m = hl_document_get_shell (doc)->material;
  g_strlcpy (m.name, "Plate from heat 4711", sizeof m.name);
  id = hl_document_edit_material (doc, &m, HL_MATERIAL_SCOPE_ALL_USERS, "name");
  g_assert_cmpstr (id, !=, builtin->id);
  g_assert_cmpstr (hl_document_get_shell (doc)->material.name, ==, "Plate from heat 4711");
}

/* One rule says whether the project can be written now; a save refused
 * by it leaves the document modified and the file untouched */
static void
test_check_writable (void)
{
  g_autoptr(HlDocument) doc = open_demo ();
  g_autoptr(GError) error = NULL;
  HlShellInputs shell;
  g_autofree char *title = NULL;

  g_assert_true (hl_document_check_writable (doc, &error));
  g_assert_no_error (error);

  /* a value the shell check refuses (a negative wall) */
  shell = *hl_document_get_shell (doc);
  shell.wall_thickness.value = -1;
  hl_document_edit_shell (doc, &shell, NULL);
  g_assert_false (hl_document_check_writable (doc, &error));
  g_assert_error (error, G_IO_ERROR, G_IO_ERROR_INVALID_DATA);
  g_assert_nonnull (strstr (error->message, "Plant air receiver AR-2"));
  g_clear_error (&error);
  hl_document_undo (doc);
  g_assert_true (hl_document_check_writable (doc, NULL));

  /* a field whose text cannot be read */
  hl_document_set_input_error (doc, "wall-thickness", "is not a number");
  g_assert_false (hl_document_check_writable (doc, &error));
  g_assert_error (error, G_IO_ERROR, G_IO_ERROR_INVALID_DATA);
  g_clear_error (&error);
  hl_document_clear_input_errors (doc);

  /* past the file's limit for a one-line text: the writer's own rule */
  title = g_strnfill (HL_LIMIT_SHORT_TEXT_CHARS + 1, 'x');
  hl_document_set_info (doc, title, NULL, NULL, HL_UNIT_SYSTEM_SI);
  g_assert_false (hl_document_check_writable (doc, &error));
  g_assert_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_VALUE);
  g_assert_nonnull (strstr (error->message, "title"));
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/document-rules/shared-material-scope", test_shared_material_scope);
  g_test_add_func ("/document-rules/builtin-material-copied", test_builtin_material_copied);
  g_test_add_func ("/document-rules/check-writable", test_check_writable);
  return g_test_run ();
}
