/* test-bad-files.c — hostile and broken project files are refused cleanly
 *
 * Every file in tests/data/bad/ (and every file generated below) must be
 * refused by hl_project_load() with one "FILE:LINE: reason" line, and
 * `hoopline --check FILE` must print that same line alone on stderr and
 * exit 1, within HL_TEST_TIMEOUT_S.  The expectations follow the format
 * rules of the project-file issue and DESIGN.md §4 and §7: XML 1.0
 * (W3C Recommendation, 5th ed.) for well-formedness, UTF-8 only, no DTD
 * or entities, size and depth caps, values checked like typed fields.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-bad-files"

#include "hl-project-file.h"
#include "hl-test-program.h"

#include <glib/gstdio.h>
#include <string.h>
#include <unistd.h>

typedef struct
{
  const char *file;
  long        line;       /* where the reason points; 0: not checked */
  int         code;       /* HlProjectFileError */
  const char *reason;     /* substring the message must contain */
} BadFile;

#define IO     HL_PROJECT_FILE_ERROR_IO
#define BIG    HL_PROJECT_FILE_ERROR_TOO_LARGE
#define UNSAFE HL_PROJECT_FILE_ERROR_UNSAFE
#define SYNTAX HL_PROJECT_FILE_ERROR_SYNTAX
#define SCHEMA HL_PROJECT_FILE_ERROR_SCHEMA
#define VALUE  HL_PROJECT_FILE_ERROR_VALUE

/* Lines are those of the offending element in each file (see README.txt). */
static const BadFile bad_files[] = {
  { "bad-char-reference.hoop", 3, SYNTAX, "xmlChar value 0" },
  { "bad-id-characters.hoop", 11, VALUE, "shell: id “s 1/../x” is not" },
  { "bad-revision-date.hoop", 18, VALUE, "revision: date “2026-13-45” is not a YYYY-MM-DD date" },
  { "bad-revision-number.hoop", 18, VALUE, "revision: number “0” is not a whole number" },
  { "bad-unit.hoop", 15, VALUE, "wall-thickness: unknown unit “furlong”" },
  { "billion-laughs.hoop", 2, UNSAFE, "entities are not allowed" },
  { "binary-junk.hoop", 1, SYNTAX, "not valid UTF-8" },
  { "cdata-element.hoop", 11, SCHEMA, "shell: no size given" },
  { "cdata-junk-number.hoop", 15, VALUE, "wall-thickness: “10</wall-thickness>” is not a plain decimal number" },
  { "corrosion-equals-thickness.hoop", 17, VALUE, "corrosion-allowance: must be less than the wall thickness" },
  { "corrosion-over-thickness.hoop", 17, VALUE, "corrosion-allowance: must be less than the wall thickness" },
  { "dangling-material-ref.hoop", 13, VALUE, "material-ref: no material with the id “unobtainium”" },
  { "deep-nesting-12.hoop", 18, UNSAFE, "nested deeper than 8 levels" },
  { "diameter-1e200.hoop", 14, VALUE, "inner-diameter: is unrealistically large" },
  { "doctype-lowercase-trick.hoop", 2, UNSAFE, "document type declarations" },
  { "dtd-default-attributes.hoop", 2, UNSAFE, "document type declarations" },
  { "duplicate-material-id.hoop", 11, VALUE, "material: the id “steel” is used twice" },
  { "duplicate-shell-id.hoop", 18, VALUE, "shell: the id “s1” is used twice" },
  { "ebcdic.hoop", 1, SYNTAX, "not valid UTF-8" },
  { "empty.hoop", 1, SYNTAX, "the file is empty" },
  { "external-dtd.hoop", 2, UNSAFE, "document type declarations" },
  { "external-entity.hoop", 2, UNSAFE, "entities are not allowed" },
  { "format-2.hoop", 2, SCHEMA, "format “2” is not supported" },
  { "format-junk.hoop", 2, SCHEMA, "format “1abc” is not a version" },
  { "invalid-utf8.hoop", 3, SYNTAX, "not valid UTF-8 (byte 0xC3)" },
  { "joint-efficiency-0.hoop", 17, VALUE, "joint-efficiency: must be greater than 0 and at most 1" },
  { "joint-efficiency-1.5.hoop", 17, VALUE, "joint-efficiency: must be greater than 0 and at most 1" },
  { "json-not-xml.hoop", 1, SYNTAX, "Start tag expected" },
  { "late-xml-declaration.hoop", 2, SYNTAX, "XML declaration allowed only at the start" },
  { "latin1-declared-ascii.hoop", 1, SYNTAX, "declares the encoding “ISO-8859-1”" },
  { "latin1-declared.hoop", 3, SYNTAX, "not valid UTF-8 (byte 0xE4)" },
  { "long-id.hoop", 11, VALUE, "is not 1 to 63 letters" },
  { "long-material-name.hoop", 5, VALUE, "name: is too long" },
  { "long-shell-name.hoop", 12, VALUE, "name: is too long (400 bytes" },
  { "long-title.hoop", 3, VALUE, "title: is 1001 characters long" },
  { "mismatched-tags.hoop", 15, SYNTAX, "tag mismatch" },
  { "missing-material-ref.hoop", 11, SCHEMA, "shell: <material-ref> is missing" },
  { "missing-size.hoop", 11, SCHEMA, "shell: no size given" },
  { "missing-thickness.hoop", 11, SCHEMA, "shell: <wall-thickness> is missing" },
  { "missing-unit.hoop", 15, SCHEMA, "wall-thickness: the unit attribute is missing" },
  { "multiple-roots.hoop", 19, SYNTAX, "Extra content at the end of the document" },
  { "negative-pressure.hoop", 16, VALUE, "internal-pressure: must not be negative" },
  { "negative-thickness.hoop", 15, VALUE, "wall-thickness: must not be negative" },
  { "negative-zero-thickness.hoop", 15, VALUE, "wall-thickness: must be greater than zero" },
  { "no-bore.hoop", 15, VALUE, "wall-thickness: leaves no bore" },
  { "no-format.hoop", 2, SCHEMA, "the format attribute is missing" },
  { "no-shell.hoop", 2, SCHEMA, "<shell> is missing" },
  { "nul-bytes.hoop", 3, SYNTAX, "NUL byte" },
  { "number-1e309.hoop", 16, VALUE, "internal-pressure: “1e309” is too large" },
  { "number-decimal-comma.hoop", 15, VALUE, "“10,5” is not a plain decimal number" },
  { "number-empty.hoop", 15, VALUE, "wall-thickness: no value given" },
  { "number-hex.hoop", 15, VALUE, "“0x10” is not a plain decimal number" },
  { "number-inf.hoop", 16, VALUE, "“inf” is not a plain decimal number" },
  { "number-nan.hoop", 15, VALUE, "“NaN” is not a plain decimal number" },
  { "number-with-unit-text.hoop", 15, VALUE, "“10 mm” is not a plain decimal number" },
  { "overlong-utf8.hoop", 3, SYNTAX, "not valid UTF-8 (byte 0xC0)" },
  { "parameter-entities.hoop", 2, UNSAFE, "entities are not allowed" },
  { "poisson-0.5.hoop", 7, VALUE, "poisson-ratio: must lie between -1 and 0.5" },
  { "poisson-minus-1.hoop", 7, VALUE, "poisson-ratio: must lie between -1 and 0.5" },
  { "pressure-1e300.hoop", 16, VALUE, "internal-pressure: is unrealistically large" },
  { "revision-date-timezone.hoop", 18, VALUE, "date “2026-01-15+05:00” is not a YYYY-MM-DD date" },
  /* found by fuzzing: xsd:date allows years past 9999, the format does not */
  { "revision-date-five-digit-year.hoop", 21, VALUE, "revision: date “20286-01-02” is not a YYYY-MM-DD date" },
  { "revision-number-text.hoop", 18, VALUE, "number “one” is not a whole number" },
  { "text-not-xml.hoop", 1, SYNTAX, "Start tag expected" },
  { "thickness-1e-300.hoop", 15, VALUE, "wall-thickness: is unrealistically small" },
  { "tolerance-100.hoop", 17, VALUE, "thin-tolerance: must be less than 100 %" },
  { "truncated-mid-tag.hoop", 15, SYNTAX, "end of Start Tag" },
  { "two-sizes.hoop", 15, SCHEMA, "outer-diameter: a second size" },
  { "two-titles.hoop", 4, SCHEMA, "title: appears twice" },
  { "unclosed-comment.hoop", 0, SYNTAX, "Comment not terminated" },
  { "undefined-entity.hoop", 3, SYNTAX, "Entity 'nbsp' not defined" },
  { "unknown-attribute.hoop", 11, SCHEMA, "shell: has no attribute “colour”" },
  { "unknown-basis.hoop", 17, VALUE, "thin-radius-basis: “median” is not one of inner, mean, outer" },
  { "unknown-display-units.hoop", 4, VALUE, "display-units: “metric” is not one of si, us" },
  { "unknown-element-format-1.hoop", 17, SCHEMA, "paint-colour: is not an element of <shell>" },
  { "unknown-ends.hoop", 11, VALUE, "ends “capped” is not one of" },
  { "unknown-form.hoop", 11, VALUE, "form “cone” is not one of" },
  { "unused-material-bad.hoop", 13, VALUE, "elastic-modulus: must not be negative" },
  { "utf16-be-bom.hoop", 1, SYNTAX, "UTF-16" },
  { "utf16-le-bom.hoop", 1, SYNTAX, "UTF-16" },
  { "utf16-le-no-bom.hoop", 1, SYNTAX, "UTF-16" },
  { "utf7-declared.hoop", 1, SYNTAX, "declares the encoding “UTF-7”" },
  { "utf7-hidden-doctype.hoop", 1, SYNTAX, "declares the encoding “UTF-7”" },
  { "whitespace-only.hoop", 1, SYNTAX, "empty (white space only)" },
  { "wrong-kind-unit.hoop", 15, VALUE, "wall-thickness: unknown unit “bar”" },
  { "wrong-namespace.hoop", 2, SCHEMA, "namespace" },
  { "wrong-root.hoop", 2, SCHEMA, "not a Hoopline project" },
  { "xinclude-newer-format.hoop", 2, SCHEMA, "<shell> is missing" },
  { "xinclude.hoop", 11, SCHEMA, "include: is not an element" },
  { "zero-modulus.hoop", 6, VALUE, "elastic-modulus: must be greater than zero" },
  { "zero-thickness.hoop", 15, VALUE, "wall-thickness: must be greater than zero" },
};

static char *
bad_dir (void)
{
  return g_build_filename (g_getenv ("HL_SOURCE_DIR"), "tests", "data", "bad", NULL);
}

/* "PATH:LINE: " at the start, and a single line. */
static long
check_message_shape (const char *path,
                     const char *message)
{
  g_autofree char *prefix = g_strdup_printf ("%s:", path);
  const char *p;
  char *end = NULL;
  long line;

  g_assert_true (g_str_has_prefix (message, prefix));
  p = message + strlen (prefix);
  g_assert_true (g_ascii_isdigit (*p));
  line = strtol (p, &end, 10);
  g_assert_cmpint (line, >=, 1);
  g_assert_true (end[0] == ':' && end[1] == ' ' && end[2] != '\0');
  g_assert_null (strchr (message, '\n'));
  g_assert_true (g_utf8_validate (message, -1, NULL));
  return line;
}

/* The library refuses the file; returns the message. */
static char *
expect_refused (const char *path,
                int         code)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GPtrArray) warnings = NULL;
  HlProject *project = hl_project_load (path, &warnings, &error);

  if (project != NULL)
    g_error ("%s loaded, but must be refused", path);
  g_assert_null (warnings);
  g_assert_nonnull (error);
  if (code >= 0)
    g_assert_error (error, HL_PROJECT_FILE_ERROR, code);
  check_message_shape (path, error->message);
  return g_strdup (error->message);
}

/* The program refuses it the same way. */
static void
expect_check_fails (const char *path,
                    const char *library_message)
{
  g_autoptr(HlRun) run = hl_test_run ("--check", path, NULL);
  g_auto(GStrv) lines = hl_test_lines (run->err);

  g_assert_false (run->timed_out);
  g_assert_cmpint (run->status, ==, 1);
  g_assert_cmpstr (run->out, ==, "");
  g_assert_cmpuint (g_strv_length (lines), ==, 1);
  check_message_shape (path, lines[0]);
  g_assert_cmpstr (lines[0], ==, library_message);
}

static void
test_listed (void)
{
  g_autofree char *dir_path = bad_dir ();
  g_autofree char *readme_path = g_build_filename (dir_path, "README.txt", NULL);
  g_autofree char *readme = NULL;
  g_autoptr(GDir) dir = g_dir_open (dir_path, 0, NULL);
  const char *name;
  guint count = 0;

  g_assert_nonnull (dir);
  g_assert_true (g_file_get_contents (readme_path, &readme, NULL, NULL));
  /* every file has an expectation and a line in the README */
  while ((name = g_dir_read_name (dir)) != NULL)
    {
      gboolean known = FALSE;
      g_autofree char *entry = g_strdup_printf ("\n%s ", name);

      if (strcmp (name, "README.txt") == 0)
        continue;
      for (guint i = 0; i < G_N_ELEMENTS (bad_files); i++)
        known = known || strcmp (bad_files[i].file, name) == 0;
      if (!known)
        g_error ("%s has no expectation in test-bad-files.c", name);
      if (strstr (readme, entry) == NULL)
        g_error ("%s is not described in README.txt", name);
      count++;
    }
  g_assert_cmpuint (count, ==, G_N_ELEMENTS (bad_files));
  g_assert_cmpuint (count, >=, 45);
}

static void
test_library (void)
{
  g_autofree char *dir = bad_dir ();

  for (guint i = 0; i < G_N_ELEMENTS (bad_files); i++)
    {
      const BadFile *b = &bad_files[i];
      g_autofree char *path = g_build_filename (dir, b->file, NULL);
      g_autofree char *message = NULL;
      g_autofree char *line = g_strdup_printf ("%s:%ld: ", path, b->line);

      g_test_message ("%s", b->file);
      message = expect_refused (path, b->code);
      if (strstr (message, b->reason) == NULL)
        g_error ("%s: message “%s” lacks “%s”", b->file, message, b->reason);
      if (b->line > 0 && !g_str_has_prefix (message, line))
        g_error ("%s: message “%s” does not point at line %ld", b->file, message, b->line);
    }
}

static void
test_program (void)
{
  g_autofree char *dir = bad_dir ();

  for (guint i = 0; i < G_N_ELEMENTS (bad_files); i++)
    {
      g_autofree char *path = g_build_filename (dir, bad_files[i].file, NULL);
      g_autofree char *message = expect_refused (path, bad_files[i].code);

      g_test_message ("%s", bad_files[i].file);
      expect_check_fails (path, message);
    }
}

/* ---- generated at run time ------------------------------------------ */

typedef struct
{
  char *dir;
} TempDir;

static void
temp_setup (TempDir      *t,
            gconstpointer data)
{
  t->dir = hl_test_temp_dir ();
}

static void
temp_teardown (TempDir      *t,
               gconstpointer data)
{
  hl_test_remove_tree (t->dir);
  g_free (t->dir);
}

static char *
write_temp (TempDir    *t,
            const char *name,
            const char *data,
            gsize       length)
{
  char *path = g_build_filename (t->dir, name, NULL);

  g_assert_true (g_file_set_contents (path, data, (gssize) length, NULL));
  return path;
}

/* A material and a shell, all on one line. */
static const char shell[] =
  "<material id=\"m\"><elastic-modulus unit=\"GPa\">200</elastic-modulus><poisson-ratio>0.3</poisson-ratio>"
  "<yield-strength unit=\"MPa\">250</yield-strength><allowable-stress unit=\"MPa\">140</allowable-stress></material>"
  "<shell id=\"s\"><material-ref>m</material-ref><inner-diameter unit=\"mm\">500</inner-diameter>"
  "<wall-thickness unit=\"mm\">10</wall-thickness></shell>\n";

static void
expect_both (const char *path,
             int         code,
             const char *reason)
{
  g_autofree char *message = expect_refused (path, code);

  if (reason != NULL && strstr (message, reason) == NULL)
    g_error ("message “%s” lacks “%s”", message, reason);
  expect_check_fails (path, message);
}

/* The demo cut short anywhere before its root closes is never a project. */
static void
test_truncations (TempDir      *t,
                  gconstpointer data)
{
  g_autofree char *demo_path = g_build_filename (g_getenv ("HL_SOURCE_DIR"), "data", "examples", "demo.hoop", NULL);
  g_autofree char *demo = NULL;
  gsize length;
  const char *close;
  gsize limit, offsets[24];
  guint n = 0;

  g_assert_true (g_file_get_contents (demo_path, &demo, &length, NULL));
  close = strstr (demo, "</hoopline-project>");
  g_assert_nonnull (close);
  limit = close - demo + strlen ("</hoopline-project>") - 1;  /* last '>' missing */
  offsets[n++] = 1;
  offsets[n++] = strstr (demo, "?>") - demo + 2;               /* declaration only */
  offsets[n++] = strstr (demo, "format=\"") - demo + 8;         /* inside an attribute */
  offsets[n++] = strstr (demo, ">205<") - demo + 2;             /* inside a number */
  offsets[n++] = strstr (demo, "</shell>") - demo;              /* before a closing tag */
  offsets[n++] = limit;
  for (guint i = 1; n < G_N_ELEMENTS (offsets); i++)
    offsets[n++] = limit * i / (G_N_ELEMENTS (offsets) - 5);

  for (guint i = 0; i < n; i++)
    {
      g_autofree char *name = g_strdup_printf ("demo-cut-%05" G_GSIZE_FORMAT ".hoop", offsets[i]);
      g_autofree char *path = NULL;

      g_assert_cmpuint (offsets[i], >, 0);
      g_assert_cmpuint (offsets[i], <=, limit);
      path = write_temp (t, name, demo, offsets[i]);
      g_test_message ("cut at byte %" G_GSIZE_FORMAT, offsets[i]);
      expect_both (path, -1, NULL);
    }
}

/* Refused from its size alone: a sparse file, so nothing is really
 * stored, and the loader must not read it (the run is bounded by the
 * child timeout). */
static void
test_hundred_megabytes (TempDir      *t,
                        gconstpointer data)
{
  g_autofree char *path = g_build_filename (t->dir, "huge.hoop", NULL);
  g_autoptr(HlRun) run = NULL;
  FILE *f = fopen (path, "w");

  g_assert_nonnull (f);
  g_assert_cmpint (ftruncate (fileno (f), 100 * 1024 * 1024), ==, 0);
  fclose (f);
  expect_both (path, BIG, "larger than 16 MiB");
  run = hl_test_run ("--check", path, NULL);
  g_test_message ("100 MB file refused in %.3f s", run->seconds);
}

/* One byte over the cap is refused; at the cap the file is read (and
 * refused for what it holds). */
static void
test_size_boundary (TempDir      *t,
                    gconstpointer data)
{
  gsize cap = HL_PROJECT_FILE_MAX_BYTES;
  g_autofree char *junk = g_malloc (cap + 1);
  g_autofree char *over = NULL, *at = NULL;

  memset (junk, 'x', cap + 1);
  over = write_temp (t, "over.hoop", junk, cap + 1);
  expect_both (over, BIG, "larger than 16 MiB");
  at = write_temp (t, "at.hoop", junk, cap);
  expect_both (at, SYNTAX, "Start tag expected");
}

/* Big but under the cap: junk text, and a valid start with a title far
 * over its length limit; both refused within the timeout. */
static void
test_big_junk (TempDir      *t,
               gconstpointer data)
{
  gsize size = 15 * 1024 * 1024;
  g_autofree char *junk = g_malloc (size);
  g_autoptr(GString) title = g_string_new ("<?xml version=\"1.0\"?>\n<hoopline-project format=\"1\">\n<title>");
  g_autofree char *p1 = NULL, *p2 = NULL, *p3 = NULL;
  GRand *rand = g_rand_new_with_seed (7);

  for (gsize i = 0; i < size; i++)
    junk[i] = (char) g_rand_int_range (rand, 0x20, 0x7f);  /* printable ASCII: not refused as binary */
  junk[0] = '<';
  g_rand_free (rand);
  p1 = write_temp (t, "junk.hoop", junk, size);
  expect_both (p1, SYNTAX, NULL);

  /* 2 MiB of title reaches the schema; 15 MiB stops at libxml2's own
   * 10 MB text-node limit first */
  while (title->len < 2 * 1024 * 1024)
    g_string_append (title, "Larkfield compressor house ");
  g_string_append_printf (title, "</title>\n%s</hoopline-project>\n", shell);
  p2 = write_temp (t, "long-title.hoop", title->str, title->len);
  expect_both (p2, VALUE, "title: is");
  g_string_truncate (title, title->len - strlen ("</title>\n</hoopline-project>\n") - strlen (shell));
  while (title->len < size)
    g_string_append (title, "Larkfield compressor house ");
  g_string_append_printf (title, "</title>\n%s</hoopline-project>\n", shell);
  p3 = write_temp (t, "longer-title.hoop", title->str, title->len);
  expect_both (p3, -1, NULL);
}

/* Nesting: libxml2 stops at its own limit long before the stack is at
 * risk; our cap of HL_PROJECT_FILE_MAX_DEPTH is enforced even in a newer
 * minor format whose unknown elements would otherwise be skipped. */
static void
test_deep_nesting (TempDir      *t,
                   gconstpointer data)
{
  g_autoptr(GString) deep = g_string_new ("<hoopline-project format=\"1.1\">\n");
  g_autofree char *path = NULL;
  guint levels = 100000;

  for (guint i = 0; i < levels; i++)
    g_string_append (deep, "<x>");
  for (guint i = 0; i < levels; i++)
    g_string_append (deep, "</x>");
  g_string_append_printf (deep, "\n%s</hoopline-project>\n", shell);
  path = write_temp (t, "deep.hoop", deep->str, deep->len);
  expect_both (path, -1, NULL);

  /* exactly at the cap (root = level 1) loads, one deeper does not */
  for (guint depth = HL_PROJECT_FILE_MAX_DEPTH; depth <= HL_PROJECT_FILE_MAX_DEPTH + 1; depth++)
    {
      g_autoptr(GString) doc = g_string_new ("<hoopline-project format=\"1.1\">\n");
      g_autoptr(GError) error = NULL;
      g_autoptr(GPtrArray) warnings = NULL;
      g_autoptr(HlProject) project = NULL;

      for (guint i = 1; i < depth; i++)
        g_string_append (doc, "<x>");
      for (guint i = 1; i < depth; i++)
        g_string_append (doc, "</x>");
      g_string_append_printf (doc, "\n%s</hoopline-project>\n", shell);
      project = hl_project_load_bytes (doc->str, doc->len, "nest.hoop", &warnings, &error);
      if (depth <= HL_PROJECT_FILE_MAX_DEPTH)
        {
          g_assert_no_error (error);
          g_assert_nonnull (project);
          g_assert_cmpuint (warnings->len, ==, 1);
        }
      else
        {
          g_assert_null (project);
          g_assert_error (error, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_UNSAFE);
          g_assert_true (g_str_has_prefix (error->message, "nest.hoop:2: x: elements nested deeper"));
        }
    }
}

/* Not regular files: a folder and a missing path. */
static void
test_not_files (TempDir      *t,
                gconstpointer data)
{
  g_autofree char *missing = g_build_filename (t->dir, "no-such.hoop", NULL);

  expect_both (t->dir, IO, "not a regular file");
  expect_both (missing, IO, "cannot open");
}

/* The same checks on memory buffers that do not end in a NUL, as a
 * caller such as a fuzzer passes them. */
static void
test_exact_buffers (void)
{
  static const char *const texts[] = { " \n ", "<", "<hoopline-project format=\"1\">", "\xef\xbb\xbf" };

  for (guint i = 0; i < G_N_ELEMENTS (texts); i++)
    {
      gsize len = strlen (texts[i]);
      g_autofree char *copy = g_malloc (len);
      g_autoptr(GError) error = NULL;
      HlProject *project;

      memcpy (copy, texts[i], len);
      project = hl_project_load_bytes (copy, len, "buffer", NULL, &error);
      g_assert_null (project);
      g_assert_nonnull (error);
      check_message_shape ("buffer", error->message);
    }
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);

  g_test_add_func ("/files/bad/listed", test_listed);
  g_test_add_func ("/files/bad/library", test_library);
  g_test_add_func ("/files/bad/program", test_program);
  g_test_add_func ("/files/bad/exact-buffers", test_exact_buffers);
  g_test_add ("/files/bad/truncations", TempDir, NULL, temp_setup, test_truncations, temp_teardown);
  g_test_add ("/files/bad/hundred-megabytes", TempDir, NULL, temp_setup, test_hundred_megabytes, temp_teardown);
  g_test_add ("/files/bad/size-boundary", TempDir, NULL, temp_setup, test_size_boundary, temp_teardown);
  g_test_add ("/files/bad/big-junk", TempDir, NULL, temp_setup, test_big_junk, temp_teardown);
  g_test_add ("/files/bad/deep-nesting", TempDir, NULL, temp_setup, test_deep_nesting, temp_teardown);
  g_test_add ("/files/bad/not-files", TempDir, NULL, temp_setup, test_not_files, temp_teardown);
  return g_test_run ();
}
