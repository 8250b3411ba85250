/* test-document.c — the open document without a display
 *
 * The document is GLib only (src/doc), so its behaviour is checked here
 * without GTK: properties that notify only on a change, undo and redo
 * back to the exact project, the modified flag against the file, and one
 * solve per change.  The one number checked is the thin-wall hoop stress
 * p R / t on the mean radius of the corroded wall (membrane formula,
 * common practice).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-document"

#include "hl-document.h"
#include "hl-project-file.h"
#include "hl-shell-item.h"

#include <glib/gstdio.h>
#include <string.h>

typedef struct
{
  GHashTable *counts;   /* property name -> notifications */
} Notes;

static void
on_notify_cb (GObject    *object,
              GParamSpec *pspec,
              Notes      *notes)
{
  const char *name = g_param_spec_get_name (pspec);
  guint n = GPOINTER_TO_UINT (g_hash_table_lookup (notes->counts, name));

  g_hash_table_insert (notes->counts, (gpointer) g_intern_string (name), GUINT_TO_POINTER (n + 1));
}

static guint
count (Notes      *notes,
       const char *name)
{
  return GPOINTER_TO_UINT (g_hash_table_lookup (notes->counts, g_intern_string (name)));
}

static void
reset (Notes *notes)
{
  g_hash_table_remove_all (notes->counts);
}

static char *
demo_path (void)
{
  const char *src = g_getenv ("HL_SOURCE_DIR");

  g_assert_nonnull (src);
  return g_build_filename (src, "data", "examples", "demo.hoop", NULL);
}

static HlDocument *
open_demo (Notes *notes)
{
  g_autofree char *path = demo_path ();
  g_autoptr(GFile) file = g_file_new_for_path (path);
  g_autoptr(GError) error = NULL;
  HlShellInputs first = hl_shell_inputs_default ();
  HlDocument *doc = hl_document_new (&first, HL_UNIT_SYSTEM_SI);

  notes->counts = g_hash_table_new (g_direct_hash, g_direct_equal);
  g_assert_true (hl_document_load (doc, file, NULL, &error));
  g_assert_no_error (error);
  g_signal_connect (doc, "notify", G_CALLBACK (on_notify_cb), notes);
  return doc;
}

static void
close_demo (HlDocument *doc,
            Notes      *notes)
{
  g_object_unref (doc);
  g_hash_table_unref (notes->counts);
}

static HlShellInputs
thicker (HlDocument *doc,
         double      mm)
{
  HlShellInputs s = *hl_document_get_shell (doc);

  s.wall_thickness = hl_quantity_make (mm, "mm");
  return s;
}

static void
test_properties_notify_on_change (void)
{
  Notes notes;
  HlDocument *doc = open_demo (&notes);
  HlShellInputs s = thicker (doc, 12);
  gboolean modified = TRUE, can_undo = FALSE;
  g_autofree char *title = NULL;

  g_object_get (doc, "title", &title, "modified", &modified, "can-undo", &can_undo, NULL);
  g_assert_cmpstr (title, ==, hl_document_get_project (doc)->title);
  g_assert_false (modified);
  g_assert_false (can_undo);

  hl_document_edit_shell (doc, &s, NULL);
  g_assert_cmpuint (count (&notes, "modified"), ==, 1);
  g_assert_cmpuint (count (&notes, "can-undo"), ==, 1);
  g_assert_cmpuint (count (&notes, "solution"), ==, 1);
  g_assert_cmpuint (count (&notes, "title"), ==, 0);
  g_assert_cmpuint (count (&notes, "selected"), ==, 0);
  g_assert_cmpuint (count (&notes, "can-redo"), ==, 0);

  /* a second edit changes neither flag: no word of them */
  reset (&notes);
  s = thicker (doc, 13);
  hl_document_edit_shell (doc, &s, NULL);
  g_assert_cmpuint (count (&notes, "modified"), ==, 0);
  g_assert_cmpuint (count (&notes, "can-undo"), ==, 0);
  g_assert_cmpuint (count (&notes, "solution"), ==, 1);

  reset (&notes);
  hl_document_set_selected (doc, 1);
  g_assert_cmpuint (count (&notes, "selected"), ==, 1);
  g_object_get (doc, "modified", &modified, NULL);
  g_assert_true (modified);
  close_demo (doc, &notes);
}

static void
test_undo_redo_exact (void)
{
  Notes notes;
  HlDocument *doc = open_demo (&notes);
  g_autoptr(HlProject) before = hl_project_copy (hl_document_get_project (doc));
  g_autoptr(HlProject) after = NULL;
  HlShellInputs s = thicker (doc, 12);
  gboolean can_redo = FALSE;

  hl_document_edit_shell (doc, &s, NULL);
  hl_document_add_shell (doc, hl_document_get_shell (doc));
  g_assert_cmpuint (hl_project_n_shells (hl_document_get_project (doc)), ==, hl_project_n_shells (before) + 1);
  after = hl_project_copy (hl_document_get_project (doc));

  reset (&notes);
  hl_document_undo (doc);
  hl_document_undo (doc);
  g_assert_true (hl_project_equal (hl_document_get_project (doc), before));
  g_assert_false (hl_document_get_modified (doc));
  g_assert_false (hl_document_can_undo (doc));
  g_assert_cmpuint (count (&notes, "modified"), ==, 1);
  g_assert_cmpuint (count (&notes, "can-redo"), ==, 1);
  g_assert_cmpuint (count (&notes, "can-undo"), ==, 1);
  g_object_get (doc, "can-redo", &can_redo, NULL);
  g_assert_true (can_redo);

  hl_document_redo (doc);
  hl_document_redo (doc);
  g_assert_true (hl_project_equal (hl_document_get_project (doc), after));
  g_assert_false (hl_document_can_redo (doc));
  close_demo (doc, &notes);
}

/* Sign-off edits undo exactly, and an edit of the other project texts
 * leaves the sign-off alone both ways (hl_project_equal compares all). */
static void
test_signoff_undo (void)
{
  Notes notes;
  HlDocument *doc = open_demo (&notes);
  g_autoptr(HlProject) before = hl_project_copy (hl_document_get_project (doc));
  g_autoptr(HlProject) signed_off = NULL;
  const HlProject *p = hl_document_get_project (doc);

  hl_document_set_signoff (doc, HL_SIGNOFF_PREPARED, "P. Preparer", "2026-12-01");
  hl_document_set_signoff (doc, HL_SIGNOFF_APPROVED, "A. Approver", "");
  signed_off = hl_project_copy (hl_document_get_project (doc));
  hl_document_set_info (doc, "Another title", p->engineer, p->description, p->display_units);
  g_assert_cmpstr (hl_document_get_project (doc)->signoff[HL_SIGNOFF_PREPARED].name, ==, "P. Preparer");
  hl_document_undo (doc);
  g_assert_true (hl_project_equal (hl_document_get_project (doc), signed_off));
  hl_document_undo (doc);
  hl_document_undo (doc);
  g_assert_true (hl_project_equal (hl_document_get_project (doc), before));
  hl_document_redo (doc);
  hl_document_redo (doc);
  hl_document_redo (doc);
  g_assert_cmpstr (hl_document_get_project (doc)->title, ==, "Another title");
  g_assert_cmpstr (hl_document_get_project (doc)->signoff[HL_SIGNOFF_APPROVED].name, ==, "A. Approver");
  g_assert_cmpstr (hl_document_get_project (doc)->signoff[HL_SIGNOFF_PREPARED].date, ==, "2026-12-01");
  close_demo (doc, &notes);
}

static void
test_save_and_file (void)
{
  Notes notes;
  HlDocument *doc = open_demo (&notes);
  g_autofree char *dir = g_dir_make_tmp ("hl-doc-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "copy.hoop", NULL);
  g_autoptr(GFile) target = g_file_new_for_path (path);
  g_autoptr(GFile) file = NULL;
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) back = NULL;
  HlShellInputs s = thicker (doc, 14);

  hl_document_edit_shell (doc, &s, NULL);
  reset (&notes);
  g_assert_true (hl_document_save (doc, target, &error));
  g_assert_no_error (error);
  g_assert_cmpuint (count (&notes, "file"), ==, 1);
  g_assert_cmpuint (count (&notes, "modified"), ==, 1);
  g_object_get (doc, "file", &file, NULL);
  g_assert_true (g_file_equal (file, target));
  back = hl_project_load (path, NULL, &error);
  g_assert_no_error (error);
  g_assert_true (hl_project_equal (back, hl_document_get_project (doc)));
  g_unlink (path);
  g_rmdir (dir);
  close_demo (doc, &notes);
}

static void
test_one_solution_per_change (void)
{
  Notes notes;
  HlDocument *doc = open_demo (&notes);
  HlShellInputs s = thicker (doc, 12);
  const HlSolution *sol;
  gpointer from_property = NULL;
  double a, t, r_mean;

  hl_document_set_selected (doc, 0);
  s = thicker (doc, 12);
  hl_document_edit_shell (doc, &s, NULL);
  sol = hl_document_get_solution (doc);
  g_assert_nonnull (sol);
  g_object_get (doc, "solution", &from_property, NULL);
  g_assert_true (from_property == sol);
  /* demo receiver: inner diameter 1200 mm, allowance 1.5 mm, 11 bar:
   * a = 600 + 1.5 mm, t = 12 - 1.5 mm */
  a = 0.6015;
  t = 0.0105;
  r_mean = a + t / 2;
  g_assert_cmpfloat_with_epsilon (sol->thin_hoop.value, 1.1e6 * r_mean / t, 1e-6 * 1.1e6 * r_mean / t);
  /* and the wall as built, solved in the same change: a = 600 mm,
   * t = 12 mm */
  g_assert_nonnull (hl_document_get_new_wall_solution (doc));
  g_assert_false (hl_document_get_new_wall_solution (doc)->corroded);
  r_mean = 0.600 + 0.012 / 2;
  g_assert_cmpfloat_with_epsilon (hl_document_get_new_wall_solution (doc)->thin_hoop.value, 1.1e6 * r_mean / 0.012,
                                  1e-6 * 1.1e6 * r_mean / 0.012);

  /* a bad value: no solution, and a text that says what to fix */
  s = thicker (doc, -3);
  hl_document_edit_shell (doc, &s, NULL);
  g_assert_null (hl_document_get_solution (doc));
  g_assert_null (hl_document_get_new_wall_solution (doc));
  g_assert_nonnull (hl_document_get_problem_text (doc));
  close_demo (doc, &notes);
}

typedef struct
{
  guint calls, position, removed, added;
} Splice;

static void
on_items_changed_cb (GListModel *model,
                     guint       position,
                     guint       removed,
                     guint       added,
                     Splice     *sp)
{
  sp->calls++;
  sp->position = position;
  sp->removed = removed;
  sp->added = added;
}

static void
on_item_notify_cb (GObject    *item,
                   GParamSpec *pspec,
                   guint      *count)
{
  (*count)++;
}

/* The list of shells changes only where shells were added, removed or
 * moved: typing a value touches no item, a new name notifies its item. */
static void
test_shell_list_model (void)
{
  Notes notes;
  HlDocument *doc = open_demo (&notes);
  GListModel *shells = hl_document_get_shells (doc);
  guint n = hl_project_n_shells (hl_document_get_project (doc));
  g_autoptr(HlShellItem) first = NULL;
  g_autoptr(HlShellItem) again = NULL;
  Splice sp = { 0 };
  guint name_notes = 0;
  HlShellInputs s;

  g_assert_cmpuint (g_list_model_get_n_items (shells), ==, n);
  first = g_list_model_get_item (shells, 0);
  g_assert_cmpstr (hl_shell_item_get_id (first), ==, hl_project_shell (hl_document_get_project (doc), 0)->id);
  g_signal_connect (shells, "items-changed", G_CALLBACK (on_items_changed_cb), &sp);
  g_signal_connect (first, "notify::name", G_CALLBACK (on_item_notify_cb), &name_notes);

  /* a value: nothing listed changes */
  s = thicker (doc, 12);
  hl_document_edit_shell (doc, &s, NULL);
  g_assert_cmpuint (sp.calls, ==, 0);
  g_assert_cmpuint (name_notes, ==, 0);

  /* a name: the same item, told of it */
  g_strlcpy (s.name, "Receiver R-9", sizeof s.name);
  hl_document_edit_shell (doc, &s, NULL);
  g_assert_cmpuint (sp.calls, ==, 0);
  g_assert_cmpuint (name_notes, ==, 1);
  g_assert_cmpstr (hl_shell_item_get_name (first), ==, "Receiver R-9");

  /* add after the selected shell (the first): one item in at 1 */
  hl_document_add_shell (doc, hl_document_get_shell (doc));
  g_assert_cmpuint (g_list_model_get_n_items (shells), ==, n + 1);
  g_assert_cmpuint (sp.calls, ==, 1);
  g_assert_cmpuint (sp.removed, ==, 0);
  g_assert_cmpuint (sp.added, ==, 1);

  /* undo the add: that item out again, the others kept */
  sp.calls = 0;
  hl_document_undo (doc);
  g_assert_cmpuint (g_list_model_get_n_items (shells), ==, n);
  g_assert_cmpuint (sp.calls, ==, 1);
  g_assert_cmpuint (sp.removed, ==, 1);
  g_assert_cmpuint (sp.added, ==, 0);
  again = g_list_model_get_item (shells, 0);
  g_assert_true (again == first);

  /* every item stands for its shell, in order */
  for (guint i = 0; i < g_list_model_get_n_items (shells); i++)
    {
      g_autoptr(HlShellItem) item = g_list_model_get_item (shells, i);

      g_assert_cmpstr (hl_shell_item_get_id (item), ==, hl_project_shell (hl_document_get_project (doc), i)->id);
    }
  g_signal_handlers_disconnect_by_data (shells, &sp);
  g_signal_handlers_disconnect_by_data (first, &name_notes);
  close_demo (doc, &notes);
}

int
main (int   argc,
      char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/document/properties-notify-on-change", test_properties_notify_on_change);
  g_test_add_func ("/document/undo-redo-exact", test_undo_redo_exact);
  g_test_add_func ("/document/sign-off-undo", test_signoff_undo);
  g_test_add_func ("/document/save-and-file", test_save_and_file);
  g_test_add_func ("/document/one-solution-per-change", test_one_solution_per_change);
  g_test_add_func ("/document/shell-list-model", test_shell_list_model);
  return g_test_run ();
}
