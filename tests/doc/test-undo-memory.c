/* test-undo-memory.c — undo on a large project: exact, and bounded in memory
 *
 * The document is driven through its edit calls only (no window, no
 * display).  The reference for "exact" is the project itself: a copy
 * taken before and after each edit must come back, byte for byte as
 * hl_project_equal() compares, after undo and redo.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-undo-memory"

#include "hl-config.h"
#include "hl-document.h"

#include <locale.h>
#include <stdio.h>
#include <string.h>
#include <unistd.h>

#define N_SHELLS 10000
#define N_EDITS  100

static HlDocument *
large_document (void)
{
  HlProject *project = hl_project_new ();
  HlMaterial plate = hl_material_default ();

  g_strlcpy (plate.id, "plate", sizeof plate.id);
  g_strlcpy (plate.name, "Plate (test values)", sizeof plate.name);
  plate.allowable_stress = hl_quantity_make (140, "MPa");
  hl_project_put_material (project, &plate);
  for (guint i = 0; i < N_SHELLS; i++)
    {
      HlShellInputs s = hl_shell_inputs_default ();

      g_snprintf (s.id, sizeof s.id, "shell-%u", i + 1);
      g_snprintf (s.name, sizeof s.name, "Shell %u", i + 1);
      s.wall_thickness = hl_quantity_make (8 + i % 7, "mm");
      /* every second shell on the shared project material */
      if (i % 2 == 0)
        {
          s.material = plate;
          g_strlcpy (s.material_ref, plate.id, sizeof s.material_ref);
        }
      hl_project_add_shell (project, &s);
    }
  return hl_document_new_restored (project, NULL);
}

/* the kinds of edit a person makes, in turn: mostly values of one shell,
 * now and then a shared material, the project texts, a revision, and a
 * change of the list itself */
static void
make_edit (HlDocument *doc,
           guint       k)
{
  const HlProject *project = hl_document_get_project (doc);
  guint n = hl_project_n_shells (project);

  switch (k % 10)
    {
    case 6:
      {
        HlMaterial m = *hl_project_find_material ((HlProject *) project, "plate");

        m.allowable_stress.value = 100 + k;
        hl_document_set_selected (doc, 0);
        hl_document_put_material (doc, &m, NULL);
      }
      break;
    case 7:
      {
        g_autofree char *title = g_strdup_printf ("Large plant, edit %u", k);

        hl_document_set_info (doc, title, project->engineer, project->description, project->display_units);
      }
      break;
    case 8:
      g_assert_true (hl_document_add_revision (doc, "2026-12-02", "A. Tester", "Walls checked again."));
      break;
    case 9:
      hl_document_set_selected (doc, (k * 31) % n);
      if (k % 40 == 9)
        hl_document_add_shell (doc, hl_project_shell (project, 1));
      else if (k % 40 == 19)
        hl_document_duplicate_shell (doc);
      else if (k % 40 == 29)
        hl_document_remove_shell (doc);
      else
        hl_document_move_shell (doc, 1);
      break;
    default:
      {
        HlShellInputs s;

        hl_document_set_selected (doc, (k * 97) % n);
        s = *hl_document_get_shell (doc);
        s.wall_thickness.value += 0.5;
        hl_document_edit_shell (doc, &s, NULL);
      }
      break;
    }
}

static gsize
resident_bytes (void)
{
  g_autofree char *statm = NULL;
  gulong size = 0, resident = 0;

  if (!g_file_get_contents ("/proc/self/statm", &statm, NULL, NULL)
      || sscanf (statm, "%lu %lu", &size, &resident) != 2)
    return 0;
  return (gsize) resident * (gsize) sysconf (_SC_PAGESIZE);
}

/* 100 edits of every kind: each undoes and redoes to the exact project,
 * and all 100 undo back to the start (none lost to the memory bound). */
static void
test_every_edit_exact (void)
{
  g_autoptr(HlDocument) doc = large_document ();
  g_autoptr(HlProject) start = hl_project_copy (hl_document_get_project (doc));
  g_autoptr(HlProject) end = NULL;
  HlProject *checkpoints[N_EDITS / 25 + 1] = { NULL };
  gsize bytes;

  g_assert_false (hl_document_can_undo (doc));
  for (guint k = 0; k < N_EDITS; k++)
    {
      g_autoptr(HlProject) before = hl_project_copy (hl_document_get_project (doc));
      g_autoptr(HlProject) after = NULL;

      if (k % 25 == 0)
        checkpoints[k / 25] = hl_project_copy (before);
      make_edit (doc, k);
      after = hl_project_copy (hl_document_get_project (doc));
      g_assert_false (hl_project_equal (before, after));
      hl_document_undo (doc);
      g_assert_true (hl_project_equal (before, hl_document_get_project (doc)));
      g_assert_true (hl_document_can_redo (doc));
      hl_document_redo (doc);
      g_assert_true (hl_project_equal (after, hl_document_get_project (doc)));
      g_assert_false (hl_document_can_redo (doc));
    }
  end = hl_project_copy (hl_document_get_project (doc));

  /* a full copy of this project is about 7 MB (N_SHELLS shells of some
   * 700 bytes each); 100 steps of what changed stay far below one copy */
  bytes = hl_document_get_history_bytes (doc);
  g_test_message ("history after %u edits on %u shells: %" G_GSIZE_FORMAT " bytes", N_EDITS, N_SHELLS, bytes);
  g_assert_cmpuint (bytes, <, 2 * 1024 * 1024);

  for (guint k = N_EDITS; k > 0; k--)
    {
      g_assert_true (hl_document_can_undo (doc));
      hl_document_undo (doc);
      if ((k - 1) % 25 == 0)
        g_assert_true (hl_project_equal (checkpoints[(k - 1) / 25], hl_document_get_project (doc)));
    }
  g_assert_false (hl_document_can_undo (doc));
  g_assert_true (hl_project_equal (start, hl_document_get_project (doc)));
  for (guint k = 0; k < N_EDITS; k++)
    {
      if (k % 25 == 0)
        g_assert_true (hl_project_equal (checkpoints[k / 25], hl_document_get_project (doc)));
      hl_document_redo (doc);
    }
  g_assert_true (hl_project_equal (end, hl_document_get_project (doc)));
  for (guint i = 0; i < G_N_ELEMENTS (checkpoints); i++)
    g_clear_pointer (&checkpoints[i], hl_project_free);
}

/* Shell edits keep one shell's old and new inputs: 100 of them hold
 * well under a megabyte, and the process does not grow by a copy of the
 * project per edit. */
static void
test_shell_edits_bounded (void)
{
  g_autoptr(HlDocument) doc = large_document ();
  gsize rss_before, rss_after, bytes;

  rss_before = resident_bytes ();
  for (guint k = 0; k < N_EDITS; k++)
    make_edit (doc, k * 10 + (k % 6));
  rss_after = resident_bytes ();
  bytes = hl_document_get_history_bytes (doc);
  g_test_message ("history after %u shell edits: %" G_GSIZE_FORMAT " bytes; resident grew by %"
                  G_GSIZE_FORMAT " bytes", N_EDITS, bytes, rss_after - MIN (rss_after, rss_before));
#ifndef __SANITIZE_ADDRESS__
  /* (the address sanitizer keeps freed memory in quarantine, so the
   * resident size says nothing there) */
  if (rss_before > 0)
    g_assert_cmpuint (rss_after - MIN (rss_after, rss_before), <, 64 * 1024 * 1024);
#endif
  g_assert_cmpuint (bytes, <, 512 * 1024);
}

/* Typing a long value in one field is one step, and stays one shell's
 * worth of memory however many keys it took. */
static void
test_typing_is_one_small_step (void)
{
  g_autoptr(HlDocument) doc = large_document ();
  g_autoptr(HlProject) start = hl_project_copy (hl_document_get_project (doc));
  HlShellInputs s = *hl_document_get_shell (doc);
  HlMaterial m = *hl_project_find_material ((HlProject *) hl_document_get_project (doc), "plate");
  gsize bytes;

  for (guint i = 0; i < 1000; i++)
    {
      s.internal_pressure.value = i + 1;
      hl_document_edit_shell (doc, &s, "shell-1:internal-pressure");
    }
  for (guint i = 0; i < 1000; i++)
    {
      m.yield_strength.value = 200 + i;
      hl_document_put_material (doc, &m, "material:shell-1:yield-strength");
    }
  bytes = hl_document_get_history_bytes (doc);
  g_assert_cmpuint (bytes, <, 64 * 1024);
  hl_document_undo (doc);
  hl_document_undo (doc);
  g_assert_false (hl_document_can_undo (doc));
  g_assert_true (hl_project_equal (start, hl_document_get_project (doc)));
}

/* Past the kept 100 steps the oldest go, so memory stays bounded however
 * long the session; the newest 100 always remain. */
static void
test_old_steps_dropped (void)
{
  HlShellInputs first = hl_shell_inputs_default ();
  g_autoptr(HlDocument) doc = hl_document_new (&first, HL_UNIT_SYSTEM_SI);
  guint steps = 0;

  for (guint i = 0; i < 3000; i++)
    {
      HlShellInputs s = *hl_document_get_shell (doc);

      s.wall_thickness.value = 10 + (i % 2);
      hl_document_edit_shell (doc, &s, NULL);
    }
  while (hl_document_can_undo (doc))
    {
      hl_document_undo (doc);
      steps++;
    }
  g_assert_cmpuint (steps, >=, 100);
  g_assert_cmpuint (steps, <, 3000);
}

int
main (int    argc,
      char **argv)
{
  setlocale (LC_ALL, "C.UTF-8");
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/undo-memory/every-edit-exact", test_every_edit_exact);
  g_test_add_func ("/undo-memory/shell-edits-bounded", test_shell_edits_bounded);
  g_test_add_func ("/undo-memory/typing-is-one-small-step", test_typing_is_one_small_step);
  g_test_add_func ("/undo-memory/old-steps-dropped", test_old_steps_dropped);
  return g_test_run ();
}
