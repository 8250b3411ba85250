/* test-autosave-limits.c — a recovery copy that would not reopen is not written
 *
 * The crash-recovery copy follows the rule of a save (window-saves
 * issue, DESIGN.md §7): only bytes the reader accepts and that read back
 * as the project are written; otherwise the last good copy and its note
 * stay as they were, and the error names the field.
 * Outside facts: XML 1.0 (W3C) §2.2 (no control characters but tab,
 * line feed and carriage return); RFC 3629 §3 ("Ø" is C3 98, so a cut
 * after 127 bytes of "ØØ…" leaves a lone C3).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-autosave-limits"

#include "hl-autosave.h"
#include "hl-limits.h"
#include "hl-project-file.h"
#include "hl-test-program.h"

#include <glib/gstdio.h>
#include <string.h>

typedef struct
{
  HlAutosave *autosave;
  HlProject  *project;
  char       *copy;       /* the slot's .hoop file */
  GBytes     *copy_bytes; /* the last good copy */
  GBytes     *info_bytes; /* and its note */
} Fixture;

static HlProject *
sample_project (void)
{
  HlProject *p = hl_project_new ();
  HlShellInputs s = hl_shell_inputs_default ();

  hl_project_set_title (p, "Receiver, unsaved edits");
  g_strlcpy (s.id, "shell-1", sizeof s.id);
  g_strlcpy (s.name, "Receiver shell", sizeof s.name);
  hl_project_add_shell (p, &s);
  hl_project_put_material (p, &s.material);
  return p;
}

/* the folder holds exactly one copy and one note: @suffix's path */
static char *
slot_file (const char *suffix)
{
  g_autofree char *dir_path = hl_autosave_dir ();
  g_autoptr(GDir) dir = g_dir_open (dir_path, 0, NULL);
  char *found = NULL;
  guint entries = 0;
  const char *name;

  g_assert_nonnull (dir);
  while ((name = g_dir_read_name (dir)) != NULL)
    {
      entries++;
      if (g_str_has_suffix (name, suffix))
        {
          g_assert_null (found);
          found = g_build_filename (dir_path, name, NULL);
        }
    }
  g_assert_cmpuint (entries, ==, 2);
  g_assert_nonnull (found);
  return found;
}

static void
setup (Fixture      *f,
       gconstpointer data)
{
  g_autoptr(GError) error = NULL;
  g_autofree char *info = NULL;

  f->autosave = hl_autosave_new ("/somewhere/receiver.hoop");
  f->project = sample_project ();
  g_assert_true (hl_autosave_write (f->autosave, f->project, &error));
  g_assert_no_error (error);
  f->copy = slot_file (".hoop");
  info = slot_file (".info");
  f->copy_bytes = hl_test_read_file (f->copy);
  f->info_bytes = hl_test_read_file (info);
}

static void
teardown (Fixture      *f,
          gconstpointer data)
{
  hl_autosave_discard (f->autosave);
  hl_autosave_free (f->autosave);
  hl_project_free (f->project);
  g_free (f->copy);
  g_bytes_unref (f->copy_bytes);
  g_bytes_unref (f->info_bytes);
}

/* refused, naming @field; the last good copy and note are untouched
 * and the copy still reopens */
static void
expect_kept (Fixture    *f,
             const char *field)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GBytes) copy_now = NULL, info_now = NULL;
  g_autofree char *info = NULL;
  g_autoptr(HlProject) back = NULL;

  g_assert_false (hl_autosave_write (f->autosave, f->project, &error));
  g_assert_nonnull (error);
  g_test_message ("%s", error->message);
  if (strstr (error->message, field) == NULL)
    g_error ("“%s” does not name “%s”", error->message, field);
  info = slot_file (".info");
  copy_now = hl_test_read_file (f->copy);
  info_now = hl_test_read_file (info);
  g_assert_true (g_bytes_equal (copy_now, f->copy_bytes));
  g_assert_true (g_bytes_equal (info_now, f->info_bytes));
  back = hl_project_load (f->copy, NULL, NULL);
  g_assert_nonnull (back);
  g_assert_cmpstr (back->title, ==, "Receiver, unsaved edits");
}

static void
test_name_cut_in_a_character (Fixture      *f,
                              gconstpointer data)
{
  HlShellInputs *s = hl_project_shell (f->project, 0);

  for (guint i = 0; i + 2 <= HL_LIMIT_NAME_BYTES; i += 2)
    memcpy (s->name + i, "Ø", 2);
  s->name[HL_LIMIT_NAME_BYTES - 1] = "Ø"[0];
  s->name[HL_LIMIT_NAME_BYTES] = '\0';
  expect_kept (f, "shell “shell-1”: name");
}

static void
test_control_character (Fixture      *f,
                        gconstpointer data)
{
  hl_project_set_title (f->project, "Receiver\tR-7");
  expect_kept (f, "title");
}

static void
test_too_long (Fixture      *f,
               gconstpointer data)
{
  g_autoptr(GString) text = g_string_new (NULL);

  while (text->len <= HL_LIMIT_LONG_TEXT_CHARS)
    g_string_append (text, "Notes. ");
  hl_project_set_description (f->project, text->str);
  expect_kept (f, "description");
}

/* White space the reader would strip does not stop the copy: it is
 * written as the reader reads it. */
static void
test_outer_white_space (Fixture      *f,
                        gconstpointer data)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) back = NULL;

  hl_project_set_title (f->project, " Receiver, retyped ");
  g_assert_true (hl_autosave_write (f->autosave, f->project, &error));
  g_assert_no_error (error);
  back = hl_project_load (f->copy, NULL, &error);
  g_assert_no_error (error);
  g_assert_cmpstr (back->title, ==, "Receiver, retyped");
}

int
main (int    argc,
      char **argv)
{
  g_autofree char *state = g_dir_make_tmp ("hl-autosave-limits-XXXXXX", NULL);
  int rc;

  /* before GLib reads it for the first time */
  g_setenv ("XDG_STATE_HOME", state, TRUE);
  g_test_init (&argc, &argv, NULL);
#define ADD(path, func) g_test_add (path, Fixture, NULL, setup, func, teardown)
  ADD ("/files/autosave-limits/name-cut-in-a-character", test_name_cut_in_a_character);
  ADD ("/files/autosave-limits/control-character", test_control_character);
  ADD ("/files/autosave-limits/too-long", test_too_long);
  ADD ("/files/autosave-limits/outer-white-space", test_outer_white_space);
#undef ADD
  rc = g_test_run ();
  hl_test_remove_tree (state);
  return rc;
}
