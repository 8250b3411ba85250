/* test-save-limits.c — a save that would not reopen is refused, by field
 *
 * The rule of the window-saves issue: the writer and the reader share
 * one set of limits (hl-limits.h), and a save that would not reopen, or
 * would reopen changed, is refused with a message naming the field; the
 * old file keeps its bytes (DESIGN.md §4).  A project right at each limit
 * saves and reopens equal.
 * Outside facts relied on: XML 1.0 (W3C) §2.2 lets no C0 control
 * character but tab, line feed and carriage return appear in a document;
 * XML Schema Part 2 §4.3.3 counts maxLength of a string in characters,
 * not bytes; RFC 3629 §3: "Ø" is C3 98, a lone C3 is no character.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-save-limits"

#include "hl-limits.h"
#include "hl-project-file.h"
#include "hl-test-program.h"

#include <glib/gstdio.h>
#include <libxml/parser.h>
#include <libxml/xpath.h>
#include <libxml/xpathInternals.h>
#include <string.h>

typedef struct
{
  char      *dir;
  char      *target;      /* dir/project.hoop, holding the old project */
  GBytes    *old_bytes;
  HlProject *project;     /* what each case tries to save */
} Fixture;

static HlProject *
sample_project (const char *title)
{
  HlProject *p = hl_project_new ();
  HlShellInputs s = hl_shell_inputs_default ();

  hl_project_set_title (p, title);
  g_strlcpy (s.id, "shell-1", sizeof s.id);
  g_strlcpy (s.name, "Receiver shell", sizeof s.name);
  hl_project_add_shell (p, &s);
  hl_project_put_material (p, &s.material);
  return p;
}

static char *
repeat (const char *unit,
        guint       times)
{
  GString *s = g_string_new (NULL);

  for (guint i = 0; i < times; i++)
    g_string_append (s, unit);
  return g_string_free (s, FALSE);
}

static void
setup (Fixture      *f,
       gconstpointer data)
{
  g_autoptr(HlProject) old = sample_project ("Old project");
  g_autoptr(GError) error = NULL;

  f->dir = hl_test_temp_dir ();
  f->target = g_build_filename (f->dir, "project.hoop", NULL);
  g_assert_true (hl_project_save (old, f->target, &error));
  g_assert_no_error (error);
  f->old_bytes = hl_test_read_file (f->target);
  g_assert_nonnull (f->old_bytes);
  f->project = sample_project ("Changed project");
}

static void
teardown (Fixture      *f,
          gconstpointer data)
{
  hl_test_remove_tree (f->dir);
  g_free (f->dir);
  g_free (f->target);
  g_bytes_unref (f->old_bytes);
  hl_project_free (f->project);
}

/* The save is refused with a message holding @field and @reason; the old
 * file keeps its bytes and nothing else is left in the folder. */
static void
expect_refused (Fixture    *f,
                const char *field,
                const char *reason)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GBytes) now = NULL;
  g_autoptr(GDir) dir = NULL;
  guint entries = 0;

  g_assert_false (hl_project_save (f->project, f->target, &error));
  g_assert_nonnull (error);
  g_assert_true (error->domain == HL_PROJECT_FILE_ERROR);
  g_test_message ("%s", error->message);
  if (!g_str_has_prefix (error->message, "Cannot save: ") || strstr (error->message, field) == NULL
      || strstr (error->message, reason) == NULL)
    g_error ("“%s” should name “%s” and say “%s”", error->message, field, reason);
  /* a message quotes, it does not echo a pasted megabyte */
  g_assert_cmpuint (strlen (error->message), <, 400);
  now = hl_test_read_file (f->target);
  g_assert_true (g_bytes_equal (now, f->old_bytes));
  dir = g_dir_open (f->dir, 0, NULL);
  while (g_dir_read_name (dir) != NULL)
    entries++;
  g_assert_cmpuint (entries, ==, 1);
}

/* The save succeeds and the file reopens as the project with its texts
 * stripped (as the reader strips them); saving that again writes the
 * same bytes. */
static HlProject *
expect_saved (Fixture *f)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) expected = hl_project_copy (f->project);
  g_autofree char *again = g_build_filename (f->dir, "again.hoop", NULL);
  g_autoptr(GBytes) first = NULL, second = NULL;
  HlProject *back;

  g_assert_true (hl_project_save (f->project, f->target, &error));
  g_assert_no_error (error);
  back = hl_project_load (f->target, NULL, &error);
  g_assert_no_error (error);
  hl_project_strip_texts (expected);
  g_assert_true (hl_project_equal (back, expected));
  g_assert_true (hl_project_save (back, again, &error));
  first = hl_test_read_file (f->target);
  second = hl_test_read_file (again);
  g_assert_true (g_bytes_equal (first, second));
  return back;
}

/* characters, not bytes: "ä" is two bytes (RFC 3629) */
static void
test_title (Fixture      *f,
            gconstpointer data)
{
  g_autofree char *over = repeat ("ä", HL_LIMIT_SHORT_TEXT_CHARS + 1);
  g_autofree char *at = repeat ("ä", HL_LIMIT_SHORT_TEXT_CHARS);
  g_autoptr(HlProject) back = NULL;

  hl_project_set_title (f->project, over);
  expect_refused (f, "title", "is 1001 characters long; at most 1000");
  hl_project_set_title (f->project, at);
  back = expect_saved (f);
  g_assert_cmpint (g_utf8_strlen (back->title, -1), ==, HL_LIMIT_SHORT_TEXT_CHARS);
}

static void
test_engineer (Fixture      *f,
               gconstpointer data)
{
  g_autofree char *over = repeat ("e", HL_LIMIT_SHORT_TEXT_CHARS + 1);
  g_autofree char *at = repeat ("e", HL_LIMIT_SHORT_TEXT_CHARS);

  hl_project_set_engineer (f->project, over);
  expect_refused (f, "engineer", "at most 1000");
  hl_project_set_engineer (f->project, at);
  hl_project_free (expect_saved (f));
}

/* a multi-line text keeps its line breaks and tabs (XML 1.0 §2.2) */
static void
test_description (Fixture      *f,
                  gconstpointer data)
{
  g_autofree char *body = repeat ("ab\tc\n", HL_LIMIT_LONG_TEXT_CHARS / 5);
  g_autofree char *over = g_strconcat (body, "z", NULL);
  g_autofree char *at = g_strconcat (body + 1, "z", NULL);
  g_autoptr(HlProject) back = NULL;

  /* 100,000 characters and one more; then one fewer */
  hl_project_set_description (f->project, over);
  expect_refused (f, "description", "is 100001 characters long; at most 100000");
  hl_project_set_description (f->project, at);
  back = expect_saved (f);
  g_assert_cmpint (g_utf8_strlen (back->description, -1), ==, HL_LIMIT_LONG_TEXT_CHARS);
}

static void
test_revision_number (Fixture      *f,
                      gconstpointer data)
{
  g_autoptr(HlProject) back = NULL;

  hl_project_add_revision (f->project, HL_LIMIT_REVISION_NUMBER + 1, "2026-12-01", "A. Tester", "Too far");
  expect_refused (f, "revision 1000001: number", "from 1 to 1000000");
  g_array_index (f->project->revisions, HlRevision, 0).number = 0;
  expect_refused (f, "revision 0: number", "from 1 to 1000000");
  g_array_index (f->project->revisions, HlRevision, 0).number = HL_LIMIT_REVISION_NUMBER;
  back = expect_saved (f);
  g_assert_cmpuint (hl_project_latest_revision (back)->number, ==, HL_LIMIT_REVISION_NUMBER);
}

static void
test_revision_texts (Fixture      *f,
                     gconstpointer data)
{
  g_autofree char *long_author = repeat ("Ø", HL_LIMIT_SHORT_TEXT_CHARS + 1);
  g_autofree char *long_text = repeat ("t", HL_LIMIT_LONG_TEXT_CHARS + 1);
  HlRevision *r;

  hl_project_add_revision (f->project, 2, "2026-12-01", long_author, "Wall raised.");
  expect_refused (f, "revision 2: author", "is 1001 characters long");
  r = &g_array_index (f->project->revisions, HlRevision, 0);
  long_author[strlen (long_author) - strlen ("Ø")] = '\0';
  g_free (r->author);
  r->author = g_strdup (long_author);
  g_free (r->text);
  r->text = g_strdup (long_text);
  expect_refused (f, "revision 2: text", "is 100001 characters long");
  long_text[HL_LIMIT_LONG_TEXT_CHARS] = '\0';
  g_free (r->text);
  r->text = g_strdup (long_text);
  hl_project_free (expect_saved (f));
}

/* 64 × "Ø" is 128 bytes: a byte cut at 127 leaves a lone C3 (RFC 3629),
 * which a file cannot hold as UTF-8 */
static void
test_names_cut_in_a_character (Fixture      *f,
                               gconstpointer data)
{
  g_autofree char *oes = repeat ("Ø", 64);
  HlShellInputs *s = hl_project_shell (f->project, 0);
  HlMaterial *m = hl_project_material (f->project, 0);

  memcpy (s->name, oes, HL_LIMIT_NAME_BYTES);
  s->name[HL_LIMIT_NAME_BYTES] = '\0';
  expect_refused (f, "shell “shell-1”: name", "not valid UTF-8");
  /* at the limit: 63 × "Ø" and one "x" are 127 bytes */
  memcpy (s->name + HL_LIMIT_NAME_BYTES - 1, "x", 2);
  g_assert_cmpuint (strlen (s->name), ==, HL_LIMIT_NAME_BYTES);
  memcpy (m->name, oes, HL_LIMIT_NAME_BYTES);
  m->name[HL_LIMIT_NAME_BYTES] = '\0';
  s->material = *m;
  expect_refused (f, "material “typical-carbon-steel”: name", "not valid UTF-8");
  g_assert_true (hl_utf8_copy (m->name, s->name, sizeof m->name));
  s->material = *m;
  hl_project_free (expect_saved (f));
}

/* a name with a line break could forge a line of --summary */
static void
test_control_characters (Fixture      *f,
                         gconstpointer data)
{
  HlShellInputs *s = hl_project_shell (f->project, 0);

  hl_project_set_title (f->project, "Receiver\tR-7");
  expect_refused (f, "title", "control character");
  hl_project_set_title (f->project, "Receiver R-7");
  hl_project_set_engineer (f->project, "A.\nTester");
  expect_refused (f, "engineer", "control character");
  hl_project_set_engineer (f->project, "A. Tester");
  g_strlcpy (s->name, "R-7\nvon_mises_max = 1 MPa", sizeof s->name);
  expect_refused (f, "shell “shell-1”: name", "control character");
  g_strlcpy (s->name, "R-7", sizeof s->name);
  hl_project_add_revision (f->project, 1, "2026-12-01", "A.\tTester", "First issue");
  expect_refused (f, "revision 1: author", "control character");
  g_free (g_array_index (f->project->revisions, HlRevision, 0).author);
  g_array_index (f->project->revisions, HlRevision, 0).author = g_strdup ("A. Tester");
  /* XML 1.0 §2.2: U+0007 cannot be written at all */
  hl_project_set_description (f->project, "Bell\a here");
  expect_refused (f, "description", "control character");
  /* line breaks and tabs are a multi-line text's own */
  hl_project_set_description (f->project, "Line one\n\tindented\r\nline three");
  g_free (g_array_index (f->project->revisions, HlRevision, 0).text);
  g_array_index (f->project->revisions, HlRevision, 0).text = g_strdup ("Wall:\n\t12 mm");
  hl_project_free (expect_saved (f));
}

/* The reader strips outer white space (as XML tools commonly do for
 * such fields); the save writes what the reader will read, so the
 * file reopens equal instead of the save being refused. */
static void
test_outer_white_space (Fixture      *f,
                        gconstpointer data)
{
  HlShellInputs *s = hl_project_shell (f->project, 0);
  g_autoptr(HlProject) back = NULL;

  hl_project_set_title (f->project, " A ");
  hl_project_set_engineer (f->project, "\tB. Tester ");
  hl_project_set_description (f->project, "\n Notes \n");
  g_strlcpy (s->name, "  Shell S  ", sizeof s->name);
  hl_project_add_revision (f->project, 1, "2026-12-01", " C. Checker ", "\n Issued \n");
  back = expect_saved (f);
  g_assert_cmpstr (back->title, ==, "A");
  g_assert_cmpstr (back->engineer, ==, "B. Tester");
  g_assert_cmpstr (back->description, ==, "Notes");
  g_assert_cmpstr (hl_project_shell (back, 0)->name, ==, "Shell S");
  g_assert_cmpstr (hl_project_latest_revision (back)->author, ==, "C. Checker");
  g_assert_cmpstr (hl_project_latest_revision (back)->text, ==, "Issued");
  /* the project in memory keeps what was typed */
  g_assert_cmpstr (f->project->title, ==, " A ");
}

/* A value the reader would refuse names the shell as well as the field
 * (a corrosion allowance must be less than the wall, common practice). */
static void
test_shell_value_named (Fixture      *f,
                        gconstpointer data)
{
  HlShellInputs *s = hl_project_shell (f->project, 0);

  s->corrosion_allowance = hl_quantity_make (20, "mm");
  expect_refused (f, "shell “shell-1”: corrosion-allowance", "less than the wall thickness");
}

/* A shell whose copy of its material differs from the project's
 * material would reopen with the project's values: the message says
 * which shell and which value. */
static void
test_difference_is_named (Fixture      *f,
                          gconstpointer data)
{
  HlShellInputs *s = hl_project_shell (f->project, 0);

  s->material.yield_strength = hl_quantity_make (300, "MPa");
  expect_refused (f, "shell “shell-1”: material yield-strength", "would not read back");
}

static void
add_shells (HlProject           *project,
            const HlShellInputs *model,
            guint                shells)
{
  HlShellInputs s = *model;

  for (guint i = 2; i <= shells; i++)
    {
      g_snprintf (s.id, sizeof s.id, "shell-%u", i);
      g_snprintf (s.name, sizeof s.name, "Receiver shell number %u of the large plant", i);
      hl_project_add_shell (project, &s);
    }
}

/* 27,000 shells that each need every element (~700 bytes) are more
 * than 16 MiB written */
static void
test_too_large (Fixture      *f,
                gconstpointer data)
{
  HlShellInputs s = *hl_project_shell (f->project, 0);

  s.corrosion_allowance = hl_quantity_make (1.5, "mm");
  s.external_pressure = hl_quantity_make (0.5, "bar");
  s.joint_efficiency = 0.85;
  s.thin_basis = HL_BASIS_INNER;
  s.thin_tolerance = hl_quantity_make (2, "%");
  s.verdict_measure = HL_MEASURE_EQUIVALENT;
  s.sizing_criterion = HL_CRITERION_TRESCA;
  add_shells (f->project, &s, 27000);
  expect_refused (f, "more than the 16 MiB", "remove shells or revisions");
}

/* The case of the window-saves issue: 27,000 shells with the usual
 * settings, read from a 5 MB file, grew past the cap when saved with
 * every optional element.  Elements equal to the reader's defaults are
 * left out, and the project saves and reopens equal. */
static void
test_large_project_fits (Fixture      *f,
                         gconstpointer data)
{
  g_autoptr(HlProject) back = NULL;
  GStatBuf st;

  add_shells (f->project, hl_project_shell (f->project, 0), 27000);
  back = expect_saved (f);
  g_assert_cmpuint (hl_project_n_shells (back), ==, 27000);
  g_assert_cmpint (g_stat (f->target, &st), ==, 0);
  g_test_message ("27,000 shells: %.1f MiB", st.st_size / (1024.0 * 1024.0));
  g_assert_cmpint (st.st_size, <, HL_PROJECT_FILE_MAX_BYTES);
}

/* The reader refuses control characters in one-line texts of a file,
 * by field and line. */
static void
test_reader_refuses_control_characters (void)
{
  static const char shell[] =
    "<shell id=\"s\"><name>%s</name><material-ref>typical-copper</material-ref>"
    "<inner-diameter unit=\"mm\">100</inner-diameter><wall-thickness unit=\"mm\">5</wall-thickness></shell>";
  static const struct { const char *inside, *name, *where; } cases[] = {
    { "<title>Receiver\tR-7</title>", "R-7", "hl:2: title: holds a control character" },
    { "<engineer>A.&#10;Tester</engineer>", "R-7", "hl:2: engineer: holds a control character" },
    { "<revision number=\"1\" date=\"2026-12-01\" author=\"A.&#9;T\">x</revision>", "R-7",
      "hl:2: revision author: holds a control character" },
    { "", "R-7\nvon_mises_max = 1 MPa", "hl:2: name: holds a control character" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *one = g_strdup_printf (shell, cases[i].name);
      g_autofree char *xml = g_strdup_printf ("<hoopline-project format=\"1\">\n%s%s</hoopline-project>",
                                              cases[i].inside, one);
      g_autoptr(GError) error = NULL;
      g_autoptr(HlProject) p = hl_project_load_bytes (xml, strlen (xml), "hl", NULL, &error);

      g_assert_null (p);
      g_assert_nonnull (error);
      g_test_message ("%s", error->message);
      if (strstr (error->message, cases[i].where) == NULL)
        g_error ("“%s” lacks “%s”", error->message, cases[i].where);
    }
}

/* A value quoted in a message is cut to a few dozen characters. */
static void
test_reader_quotes_short (void)
{
  static const struct { const char *before, *after; } around[] = {
    { "<hoopline-project format=\"1\"><display-units>",
      "</display-units><shell id=\"s\"><material-ref>typical-copper</material-ref><inner-diameter unit=\"mm\">1"
      "</inner-diameter><wall-thickness unit=\"mm\">1</wall-thickness></shell></hoopline-project>" },
    { "<hoopline-project format=\"1\"><shell id=\"s\" form=\"",
      "\"><material-ref>x</material-ref><inner-diameter unit=\"mm\">1</inner-diameter>"
      "<wall-thickness unit=\"mm\">1</wall-thickness></shell></hoopline-project>" },
  };
  g_autofree char *paste = repeat ("si us ", 200000);

  for (guint i = 0; i < G_N_ELEMENTS (around); i++)
    {
      g_autofree char *xml = g_strconcat (around[i].before, paste, around[i].after, NULL);
      g_autoptr(GError) error = NULL;
      g_autoptr(HlProject) p = hl_project_load_bytes (xml, strlen (xml), "paste.hoop", NULL, &error);

      g_assert_null (p);
      g_test_message ("%s", error->message);
      g_assert_cmpuint (strlen (error->message), <, 300);
      g_assert_nonnull (strstr (error->message, "…"));
    }
}

/* The shipped schema states the same numbers as hl-limits.h. */
static gint64
schema_number (xmlXPathContextPtr ctx,
               const char        *path)
{
  xmlXPathObjectPtr obj = xmlXPathEvalExpression (BAD_CAST path, ctx);
  g_autofree char *text = NULL;
  g_assert_nonnull (obj);
  if (obj->nodesetval == NULL || obj->nodesetval->nodeNr != 1)
    g_error ("the schema has no single node at %s", path);
  {
    xmlChar *raw = xmlNodeGetContent (obj->nodesetval->nodeTab[0]);

    text = g_strdup ((const char *) raw);
    xmlFree (raw);
  }
  xmlXPathFreeObject (obj);
  return g_ascii_strtoll (text, NULL, 10);
}

static void
test_schema_agrees (void)
{
  g_autofree char *path = g_build_filename (g_getenv ("HL_SOURCE_DIR"), "data", "hoopline-project.rng", NULL);
  xmlDocPtr doc = xmlReadFile (path, NULL, XML_PARSE_NONET);
  xmlXPathContextPtr ctx;

  g_assert_nonnull (doc);
  ctx = xmlXPathNewContext (doc);
  xmlXPathRegisterNs (ctx, BAD_CAST "r", BAD_CAST "http://relaxng.org/ns/structure/1.0");
  g_assert_cmpint (schema_number (ctx, "//r:define[@name='short-text']//r:param[@name='maxLength']"), ==,
                   HL_LIMIT_SHORT_TEXT_CHARS);
  g_assert_cmpint (schema_number (ctx, "//r:define[@name='long-text']//r:param[@name='maxLength']"), ==,
                   HL_LIMIT_LONG_TEXT_CHARS);
  g_assert_cmpint (schema_number (ctx, "//r:define[@name='name-text']//r:param[@name='maxLength']"), ==,
                   HL_LIMIT_NAME_BYTES);
  g_assert_cmpint (schema_number (ctx, "//r:attribute[@name='number']//r:param[@name='maxInclusive']"), ==,
                   HL_LIMIT_REVISION_NUMBER);
  g_assert_cmpint (schema_number (ctx, "//r:attribute[@name='author']//r:param[@name='maxLength']"), ==,
                   HL_LIMIT_SHORT_TEXT_CHARS);
  /* names use the name limit, titles the short one */
  {
    xmlXPathObjectPtr names = xmlXPathEvalExpression (BAD_CAST "count(//r:element[@name='name']/r:ref[@name='name-text'])", ctx);
    xmlXPathObjectPtr all = xmlXPathEvalExpression (BAD_CAST "count(//r:element[@name='name'])", ctx);

    g_assert_cmpfloat (names->floatval, ==, 2);
    g_assert_cmpfloat (all->floatval, ==, 2);
    xmlXPathFreeObject (names);
    xmlXPathFreeObject (all);
  }
  /* ids: a first character and at most 62 more */
  {
    xmlXPathObjectPtr obj = xmlXPathEvalExpression (BAD_CAST "string(//r:define[@name='id']//r:param[@name='pattern'])", ctx);
    g_autofree char *expected = g_strdup_printf ("{0,%d}", HL_LIMIT_ID_BYTES - 1);

    g_assert_nonnull (strstr ((const char *) obj->stringval, expected));
    xmlXPathFreeObject (obj);
  }
  xmlXPathFreeContext (ctx);
  xmlFreeDoc (doc);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);

#define ADD(path, func) g_test_add (path, Fixture, NULL, setup, func, teardown)
  ADD ("/files/save-limits/title", test_title);
  ADD ("/files/save-limits/engineer", test_engineer);
  ADD ("/files/save-limits/description", test_description);
  ADD ("/files/save-limits/revision-number", test_revision_number);
  ADD ("/files/save-limits/revision-texts", test_revision_texts);
  ADD ("/files/save-limits/names-cut-in-a-character", test_names_cut_in_a_character);
  ADD ("/files/save-limits/control-characters", test_control_characters);
  ADD ("/files/save-limits/outer-white-space", test_outer_white_space);
  ADD ("/files/save-limits/difference-is-named", test_difference_is_named);
  ADD ("/files/save-limits/shell-value-named", test_shell_value_named);
  ADD ("/files/save-limits/too-large", test_too_large);
  ADD ("/files/save-limits/large-project-fits", test_large_project_fits);
#undef ADD
  g_test_add_func ("/files/save-limits/reader-refuses-control-characters", test_reader_refuses_control_characters);
  g_test_add_func ("/files/save-limits/reader-quotes-short", test_reader_quotes_short);
  g_test_add_func ("/files/save-limits/schema-agrees", test_schema_agrees);
  return g_test_run ();
}
