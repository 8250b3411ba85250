/* test-cli-words.c — words and numbers in a file that would change meaning
 *
 * The real program, spawned with no display, over copies of the invented
 * demo project with one text changed.  Sources beside each check:
 *  - XML 1.0 §4.1: "&#10;" in element content is a line feed, so a file
 *    can carry a name with a line break in it.
 *  - NIST SP 811 §6: unit symbols keep their case ("mPa" is the
 *    millipascal, "Mm" the megametre).
 *  - ASME VIII-1 Table UW-12 (from memory): weld joint efficiencies
 *    tabulate from 0.45 to 1.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-cli-words"

#include "hl-test-program.h"

#include <string.h>

typedef struct
{
  char *dir;
  char *demo;   /* the demo project's text */
} Temp;

static void
temp_set_up (Temp         *t,
             gconstpointer data)
{
  g_autofree char *path = g_build_filename (g_getenv ("HL_SOURCE_DIR"), "data", "examples", "demo.hoop", NULL);
  g_autoptr(GError) error = NULL;

  (void) data;
  t->dir = hl_test_temp_dir ();
  g_assert_true (g_file_get_contents (path, &t->demo, NULL, &error));
  g_assert_no_error (error);
}

static void
temp_tear_down (Temp         *t,
                gconstpointer data)
{
  (void) data;
  hl_test_remove_tree (t->dir);
  g_free (t->dir);
  g_free (t->demo);
}

/* The demo with @from replaced by @to (exactly once), written as
 * NAME.hoop in the temporary folder; returns its path. */
static char *
demo_with (Temp       *t,
           const char *name,
           const char *from,
           const char *to)
{
  g_autoptr(GString) text = g_string_new (t->demo);
  g_autofree char *file = g_strconcat (name, ".hoop", NULL);
  char *path = g_build_filename (t->dir, file, NULL);
  g_autoptr(GError) error = NULL;

  g_assert_cmpuint (g_string_replace (text, from, to, 0), ==, 1);
  g_assert_true (g_file_set_contents (path, text->str, text->len, &error));
  g_assert_no_error (error);
  return path;
}

typedef struct
{
  const char *path;      /* test path */
  const char *what;      /* why this case, and its source */
  const char *from;      /* text of the demo ... */
  const char *to;        /* ... replaced by this */
  const char *action;
  const char *expected[3];
} WordCase;

static const WordCase cases[] = {
  { "forged-shell-name", "before: --summary printed “von_mises_max = 1 MPa” as a line of its own",
    "<name>Plant air receiver AR-2</name>", "<name>R-7&#10;von_mises_max = 1 MPa</name>",
    "--summary", { ":24: name: ", "control character", NULL } },
  { "forged-shell-name-check", "the same file under --check",
    "<name>Plant air receiver AR-2</name>", "<name>R-7&#10;von_mises_max = 1 MPa</name>",
    "--check", { ":24: name: ", NULL, NULL } },
  { "forged-material-name", "a tab and a carriage return in a material's name",
    "<name>Boiler plate, 265 MPa class (demo values)</name>", "<name>Plate&#9;265&#13;</name>",
    "--summary", { ":10: name: ", "control character", NULL } },
  { "unit-mpa", "NIST SP 811 §6: read as the megapascal before, 1e9 times too much",
    "<allowable-stress unit=\"MPa\">147</allowable-stress>", "<allowable-stress unit=\"mPa\">147</allowable-stress>",
    "--check", { "allowable-stress", "unknown unit", "mPa" } },
  { "unit-megametre", "NIST SP 811 §6: Mm is the megametre, not mm",
    "<wall-thickness unit=\"mm\">10</wall-thickness>", "<wall-thickness unit=\"Mm\">10</wall-thickness>",
    "--check", { "wall-thickness", "unknown unit", "Mm" } },
  { "joint-efficiency", "UW-12 (from memory) tabulates from 0.45; 1e-320 was accepted",
    "<joint-efficiency>0.85</joint-efficiency>", "<joint-efficiency>1e-320</joint-efficiency>",
    "--check", { "joint-efficiency", "0.1", NULL } },
  { "new-wall", "a corrosion allowance of 100 m hid a 1 nm bore in a 200 m wall",
    "<inner-diameter unit=\"mm\">1200</inner-diameter>\n"
    "    <wall-thickness unit=\"mm\">10</wall-thickness>\n"
    "    <corrosion-allowance unit=\"mm\">1.5</corrosion-allowance>",
    "<inner-diameter unit=\"m\">2e-9</inner-diameter>\n"
    "    <wall-thickness unit=\"m\">200</wall-thickness>\n"
    "    <corrosion-allowance unit=\"m\">100</corrosion-allowance>",
    "--check", { "inner-diameter", "0.1 mm", NULL } },
};

/* The changed demo is refused with exit 1 (bad input), nothing on
 * stdout, and each expected text in a message of one line: a name's
 * line break is not echoed. */
static void
test_refused (Temp         *t,
              gconstpointer data)
{
  const WordCase *c = data;
  g_autofree char *path = demo_with (t, c->path, c->from, c->to);
  g_autoptr(HlRun) run = hl_test_run (c->action, path, NULL);

  g_test_message ("%s", c->what);
  g_test_message ("hoopline %s -> %d: %s", c->action, run->status, run->err);
  g_assert_false (run->timed_out);
  g_assert_cmpint (run->status, ==, 1);
  g_assert_cmpstr (run->out, ==, "");
  for (guint i = 0; i < G_N_ELEMENTS (c->expected) && c->expected[i] != NULL; i++)
    g_assert_nonnull (strstr (run->err, c->expected[i]));
  g_assert_nonnull (strchr (run->err, '\n'));
  g_assert_cmpuint (strchr (run->err, '\n') - run->err + 1, ==, strlen (run->err));
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *path = g_strconcat ("/cli-words/", cases[i].path, NULL);

      g_test_add (path, Temp, &cases[i], temp_set_up, test_refused, temp_tear_down);
    }
  return g_test_run ();
}
