/* test-messages-de.c — validation and parse messages reach a German user
 * in German, while files, reports and the command line keep English
 *
 * Under de_DE.UTF-8 with the catalogue the build compiles from po/de.po,
 * each problem of hl_shell_inputs_check() carries its message twice: the
 * English one (what --check, --summary and the text report print, as
 * before) and the translated one the window shows.  The unit parser reads
 * only what is typed in the window, so its GError is translated.  The
 * German texts are those of po/de.po; "Schweißnahtfaktor" is the German
 * trade word for the weld joint efficiency (common practice).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-messages-de"

#include "hl-shell-check.h"
#include "hl-units.h"
#include "desktop-test-util.h"

#include <libintl.h>
#include <locale.h>
#include <string.h>

static gboolean
german (void)
{
  if (setlocale (LC_ALL, "de_DE.UTF-8") == NULL)
    {
      g_test_skip ("no de_DE.UTF-8 locale on this machine");
      return FALSE;
    }
  bindtextdomain ("hoopline", dt_env ("HL_BUILD_LOCALEDIR"));
  bind_textdomain_codeset ("hoopline", "UTF-8");
  return TRUE;
}

static const HlProblem *
problem_of (GPtrArray  *problems,
            const char *field)
{
  for (guint i = 0; i < problems->len; i++)
    {
      const HlProblem *p = g_ptr_array_index (problems, i);

      if (strcmp (p->field, field) == 0)
        return p;
    }
  return NULL;
}

static void
test_check_messages (void)
{
  HlShellInputs in;
  g_autoptr(GPtrArray) problems = NULL;
  const HlProblem *p;

  if (!german ())
    return;
  in = hl_shell_inputs_default ();
  in.wall_thickness = hl_quantity_make (-1, "mm");
  in.joint_efficiency = 0.05;
  in.external_pressure = hl_quantity_make (1e-9, "Pa");
  problems = hl_shell_inputs_check (&in);

  p = problem_of (problems, "wall-thickness");
  g_assert_nonnull (p);
  g_assert_cmpstr (p->message, ==, "must not be negative");
  g_assert_cmpstr (p->local, ==, "darf nicht negativ sein");

  p = problem_of (problems, "joint-efficiency");
  g_assert_nonnull (p);
  g_assert_nonnull (strstr (p->message, "weld joint efficiencies tabulate from 0.45 to 1"));
  g_assert_nonnull (strstr (p->local, "Schweißnahtfaktoren"));

  /* the bound's reason is translated inside the sentence */
  p = problem_of (problems, "external-pressure");
  g_assert_nonnull (p);
  g_assert_cmpstr (p->message, ==, "is unrealistically small (under 1 µPa, other than 0: no gauge reads less; 0 means none)");
  g_assert_cmpstr (p->local, ==, "ist unrealistisch klein (unter 1 µPa, außer 0: kein Manometer zeigt weniger an; 0 heißt keiner)");

  /* the English entry points stay English */
  {
    g_autofree char *en = hl_check_quantity ("wall-thickness", hl_quantity_make (-1, "mm"), HL_KIND_LENGTH, FALSE);

    g_assert_cmpstr (en, ==, "must not be negative");
  }
  setlocale (LC_ALL, "C");
}

static void
test_parse_messages (void)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GError) file_error = NULL;
  double v;

  if (!german ())
    return;
  /* DIN 1333 grouping, refused in the window: "1.500" */
  g_assert_false (hl_units_parse ("1.500 mm", HL_KIND_LENGTH, NULL, TRUE, &v, NULL, &error));
  g_assert_nonnull (strstr (error->message, "Zifferngruppierung"));
  g_clear_error (&error);
  g_assert_false (hl_units_parse ("12 furlong", HL_KIND_LENGTH, NULL, TRUE, &v, NULL, &error));
  g_assert_nonnull (strstr (error->message, "unbekannte Einheit „furlong“"));
  g_clear_error (&error);
  g_assert_false (hl_units_parse ("", HL_KIND_LENGTH, NULL, TRUE, &v, NULL, &error));
  g_assert_cmpstr (error->message, ==, "kein Wert angegeben");
  /* a number in a file is the reader's, whose messages stay English */
  g_assert_false (hl_parse_number ("", &v, &file_error));
  g_assert_cmpstr (file_error->message, ==, "no value given");
  setlocale (LC_ALL, "C");
}

int
main (int    argc,
      char **argv)
{
  /* LANGUAGE would outrank the locale */
  g_unsetenv ("LANGUAGE");
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/messages-de/check", test_check_messages);
  g_test_add_func ("/messages-de/parse", test_parse_messages);
  return g_test_run ();
}
