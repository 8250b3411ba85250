/* test-figure-format.c — an input shown in the unit system's unit
 *
 * Sources beside each check:
 *  - NIST SP 811 (2008) B.8: 1 ksi = 1000 psi = 6.894757 MPa; 1 in =
 *    25.4 mm exactly.  B.9: t/°F = 1.8 t/°C + 32.
 *  - Common practice: E of carbon steel 29,000 ksi in US tables (issue
 *    11: the sheet printed it as "29007548 psi").
 *  - DIN 1333 (common practice in German documents): the decimal comma.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-figure-format"

#include "hl-figure-format.h"

#include <locale.h>
#include <string.h>

#define NBSP "\xc2\xa0"

static void
expect (double          si,
        HlQuantityKind  kind,
        HlUnitSystem    system,
        gboolean        locale,
        const char     *want)
{
  g_autofree char *got = hl_figure_format_input (si, kind, system, 6, locale);

  g_assert_cmpstr (got, ==, want);
}

static void
test_input_units (void)
{
  /* 29000 ksi typed: the US column says 29000 ksi, not psi */
  expect (29000 * 6894757.293168, HL_KIND_MODULUS, HL_UNIT_SYSTEM_US, FALSE, "29000" NBSP "ksi");
  expect (200e9, HL_KIND_MODULUS, HL_UNIT_SYSTEM_SI, FALSE, "200" NBSP "GPa");
  /* 200 GPa in ksi: 29007.5 to 6 digits */
  expect (200e9, HL_KIND_MODULUS, HL_UNIT_SYSTEM_US, FALSE, "29007.5" NBSP "ksi");
  expect (0.0254, HL_KIND_LENGTH, HL_UNIT_SYSTEM_US, FALSE, "1" NBSP "in");
  expect (0.0254, HL_KIND_LENGTH, HL_UNIT_SYSTEM_SI, FALSE, "25.4" NBSP "mm");
  expect (6894757.293168, HL_KIND_STRESS, HL_UNIT_SYSTEM_US, FALSE, "1000" NBSP "psi");
  expect (373.15, HL_KIND_TEMPERATURE, HL_UNIT_SYSTEM_US, FALSE, "212" NBSP "\xc2\xb0" "F");
  expect (0.05, HL_KIND_PERCENT, HL_UNIT_SYSTEM_SI, FALSE, "5" NBSP "%");
}

static void
test_input_german (void)
{
  g_autofree char *old = g_strdup (setlocale (LC_NUMERIC, NULL));

  if (setlocale (LC_NUMERIC, "de_DE.UTF-8") == NULL)
    {
      g_test_skip ("the de_DE.UTF-8 locale is not installed (locale-gen de_DE.UTF-8)");
      return;
    }
  expect (0.0254, HL_KIND_LENGTH, HL_UNIT_SYSTEM_SI, TRUE, "25,4" NBSP "mm");
  expect (0.0254, HL_KIND_LENGTH, HL_UNIT_SYSTEM_SI, FALSE, "25.4" NBSP "mm");
  setlocale (LC_NUMERIC, old);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);

  g_test_add_func ("/figure-format/input-units", test_input_units);
  g_test_add_func ("/figure-format/input-german", test_input_german);
  return g_test_run ();
}
