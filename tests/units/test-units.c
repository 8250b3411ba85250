/* test-units.c — unit factors, parsing and formatting
 *
 * Factors: NIST SP 811 (2008), Appendix B.8/B.9 — 1 in = 0.0254 m and
 * 1 ft = 0.3048 m exactly, 1 bar = 1e5 Pa exactly, 1 psi (lbf/in^2) =
 * 6.894 757 293 168 kPa, 1 ksi = 1000 psi; 1 N/mm^2 = 1 MPa (SI prefixes).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-units"

#include "hl-units.h"
#include "hl-quantity.h"

#include <math.h>
#include <locale.h>

typedef struct
{
  HlQuantityKind kind;
  const char    *unit;
  double         factor;
  const char    *source;
} FactorCase;

static const FactorCase factors[] = {
  { HL_KIND_LENGTH, "m", 1.0, "SI base unit" },
  { HL_KIND_LENGTH, "cm", 0.01, "SI prefix centi" },
  { HL_KIND_LENGTH, "mm", 0.001, "SI prefix milli" },
  { HL_KIND_LENGTH, "in", 0.0254, "NIST SP 811 B.8, exact" },
  { HL_KIND_LENGTH, "ft", 0.3048, "NIST SP 811 B.8, exact" },
  { HL_KIND_STRESS, "Pa", 1.0, "SI derived unit" },
  { HL_KIND_STRESS, "kPa", 1e3, "SI prefix kilo" },
  { HL_KIND_STRESS, "MPa", 1e6, "SI prefix mega" },
  { HL_KIND_STRESS, "GPa", 1e9, "SI prefix giga" },
  { HL_KIND_STRESS, "bar", 1e5, "NIST SP 811 B.8, exact" },
  { HL_KIND_STRESS, "psi", 6894.757293168, "NIST SP 811 B.8 (lbf/in^2)" },
  { HL_KIND_STRESS, "ksi", 6894757.293168, "NIST SP 811: 1 ksi = 1000 psi" },
  { HL_KIND_STRESS, "N/mm2", 1e6, "1 N/mm^2 = 1 MPa (SI)" },
  { HL_KIND_MODULUS, "GPa", 1e9, "SI prefix giga" },
  { HL_KIND_PERCENT, "%", 0.01, "definition of percent (NIST SP 811 7.10.2)" },
};

static void
test_factors (void)
{
  for (guint i = 0; i < G_N_ELEMENTS (factors); i++)
    {
      const FactorCase *c = &factors[i];

      g_test_message ("%s: %s", c->unit, c->source);
      g_assert_cmpfloat_with_epsilon (hl_unit_factor (c->kind, c->unit), c->factor, c->factor * 1e-15);
    }
  /* one inch of mercury is not a length; unknown names are refused */
  g_assert_cmpfloat (hl_unit_factor (HL_KIND_LENGTH, "furlong"), ==, 0.0);
  g_assert_cmpfloat (hl_unit_factor (HL_KIND_LENGTH, "MPa"), ==, 0.0);
  g_assert_cmpfloat (hl_unit_factor (HL_KIND_STRESS, "mm"), ==, 0.0);
}

static void
test_psi_to_mpa (void)
{
  /* NIST SP 811 B.9: 1000 psi = 6.894 757 MPa; 14.503 77 psi = 1 bar */
  HlQuantity q = hl_quantity_make (1000, "psi");
  HlQuantity bar = hl_quantity_convert (hl_quantity_make (1, "bar"), HL_KIND_STRESS, "psi");

  g_assert_cmpfloat_with_epsilon (hl_quantity_si (q, HL_KIND_STRESS) / 1e6, 6.894757293168, 1e-12);
  g_assert_cmpfloat_with_epsilon (bar.value, 14.503773773, 1e-8);
  g_assert_cmpstr (bar.unit, ==, "psi");
  /* 1 ft = 12 in exactly */
  g_assert_cmpfloat_with_epsilon (hl_quantity_convert (hl_quantity_make (1, "ft"), HL_KIND_LENGTH, "in").value,
                                  12.0, 1e-13);
}

typedef struct
{
  const char    *text;
  HlQuantityKind kind;
  gboolean       comma;
  double         value;
  const char    *unit;
} ParseCase;

static void
test_parse_accepts (void)
{
  static const ParseCase cases[] = {
    { "12 bar", HL_KIND_STRESS, FALSE, 12, "bar" },
    { "12bar", HL_KIND_STRESS, FALSE, 12, "bar" },
    { "0.5 in", HL_KIND_LENGTH, FALSE, 0.5, "in" },
    { "1.5e3 mm", HL_KIND_LENGTH, FALSE, 1500, "mm" },
    { "  7 MPa  ", HL_KIND_STRESS, FALSE, 7, "MPa" },
    { "3 Inch", HL_KIND_LENGTH, FALSE, 3, "in" },   /* a unit name is a word: any case */
    { "210 N/mm^2", HL_KIND_STRESS, FALSE, 210, "N/mm2" },
    { "210 N/mm\xc2\xb2", HL_KIND_STRESS, FALSE, 210, "N/mm2" },
    { "3 inch", HL_KIND_LENGTH, FALSE, 3, "in" },
    { "5 %", HL_KIND_PERCENT, FALSE, 5, "%" },
    { "5", HL_KIND_PERCENT, FALSE, 5, "%" },
    { "7,5 MPa", HL_KIND_STRESS, TRUE, 7.5, "MPa" },
    { "7.5 MPa", HL_KIND_STRESS, TRUE, 7.5, "MPa" },   /* a pasted point still works */
    { "-0", HL_KIND_STRESS, FALSE, 0, "MPa" },
    { ".5 m", HL_KIND_LENGTH, FALSE, 0.5, "m" },
    { "2 ft", HL_KIND_LENGTH, FALSE, 2, "ft" },
    { "30 ksi", HL_KIND_STRESS, FALSE, 30, "ksi" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autoptr(GError) error = NULL;
      const char *unit = NULL;
      double value = NAN;
      gboolean ok = hl_units_parse (cases[i].text, cases[i].kind, "MPa", cases[i].comma, &value, &unit, &error);

      if (cases[i].kind == HL_KIND_PERCENT && unit == NULL)
        unit = "%";
      g_test_message ("parse “%s”", cases[i].text);
      g_assert_no_error (error);
      g_assert_true (ok);
      g_assert_cmpfloat (value, ==, cases[i].value);
      g_assert_false (signbit (value));
      g_assert_cmpstr (unit, ==, cases[i].unit);
    }
}

static void
test_parse_rejects (void)
{
  static const struct { const char *text; HlQuantityKind kind; int code; } cases[] = {
    { "", HL_KIND_LENGTH, HL_UNITS_ERROR_EMPTY },
    { "   ", HL_KIND_LENGTH, HL_UNITS_ERROR_EMPTY },
    { "abc", HL_KIND_LENGTH, HL_UNITS_ERROR_NOT_A_NUMBER },
    { "mm 12", HL_KIND_LENGTH, HL_UNITS_ERROR_NOT_A_NUMBER },
    { "12 furlong", HL_KIND_LENGTH, HL_UNITS_ERROR_UNKNOWN_UNIT },
    { "12 bar", HL_KIND_LENGTH, HL_UNITS_ERROR_UNKNOWN_UNIT },
    { "12 mm", HL_KIND_STRESS, HL_UNITS_ERROR_UNKNOWN_UNIT },
    { "0x10", HL_KIND_LENGTH, HL_UNITS_ERROR_UNKNOWN_UNIT },     /* "0" then "x10" */
    { "inf", HL_KIND_STRESS, HL_UNITS_ERROR_NOT_A_NUMBER },
    { "nan", HL_KIND_STRESS, HL_UNITS_ERROR_NOT_A_NUMBER },
    { "1e309", HL_KIND_STRESS, HL_UNITS_ERROR_OUT_OF_RANGE },
    { "-1e309 mm", HL_KIND_LENGTH, HL_UNITS_ERROR_OUT_OF_RANGE },
    { "12 mm mm", HL_KIND_LENGTH, HL_UNITS_ERROR_UNKNOWN_UNIT },
    { "0.3 %", HL_KIND_RATIO, HL_UNITS_ERROR_UNKNOWN_UNIT },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autoptr(GError) error = NULL;
      double value = 42;

      g_test_message ("reject “%s”", cases[i].text);
      g_assert_false (hl_units_parse (cases[i].text, cases[i].kind, NULL, FALSE, &value, NULL, &error));
      g_assert_error (error, HL_UNITS_ERROR, cases[i].code);
      g_assert_cmpfloat (value, ==, 42);   /* untouched on failure */
    }
}

static void
test_parse_number_strict (void)
{
  static const char *const bad[] = { "", "1,5", "0x10", "1e309", "nan", "inf", "1 mm", "--1", "1e", NULL };
  double v;

  g_assert_true (hl_parse_number (" 2.5e-3 ", &v, NULL));
  g_assert_cmpfloat (v, ==, 2.5e-3);
  g_assert_true (hl_parse_number ("-0", &v, NULL));
  g_assert_false (signbit (v));
  for (guint i = 0; bad[i] != NULL; i++)
    {
      g_autoptr(GError) error = NULL;

      /* "1e" reads as the number 1 followed by junk */
      g_assert_false (hl_parse_number (bad[i], &v, &error));
      g_assert_nonnull (error);
    }
}

static void
test_format_exact_round_trips (void)
{
  static const double values[] = { 0.1, 1.0 / 3.0, 123456.789, 1e-7, 6894.757293168, 2.5, 1e22, 5e-324, -7.25 };

  for (guint i = 0; i < G_N_ELEMENTS (values); i++)
    {
      g_autofree char *text = hl_format_exact (values[i]);

      g_assert_cmpfloat (g_ascii_strtod (text, NULL), ==, values[i]);
    }
  {
    g_autofree char *tenth = hl_format_exact (0.1);
    g_autofree char *nan_text = hl_format_exact (NAN);

    g_assert_cmpstr (tenth, ==, "0.1");     /* shortest form, not 0.1000000000000000055 */
    g_assert_cmpstr (nan_text, ==, "n/a");
  }
}

static void
test_format_significant (void)
{
  static const struct { double v; int digits; const char *text; } cases[] = {
    { 66.66666666, 6, "66.6667" },
    { 1500, 6, "1500" },
    { 0.000123456, 3, "0.000123" },
    { 12.5, 6, "12.5" },
    { -0.0, 6, "0" },
    { 1.23456e-7, 3, "1.23e-07" },
    { 2.0e10, 4, "2e+10" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *text = hl_format_significant (cases[i].v, cases[i].digits);

      g_assert_cmpstr (text, ==, cases[i].text);
    }
  {
    g_autofree char *a = hl_format_significant (NAN, 6);
    g_autofree char *b = hl_format_significant (INFINITY, 6);

    g_assert_cmpstr (a, ==, "n/a");
    g_assert_cmpstr (b, ==, "n/a");
  }
}

static void
test_format_display_uses_locale (void)
{
  const char *old = setlocale (LC_NUMERIC, NULL);
  g_autofree char *saved = g_strdup (old);

  if (setlocale (LC_NUMERIC, "de_DE.UTF-8") == NULL)
    {
      g_test_skip ("de_DE.UTF-8 locale is not available");
      return;
    }
  {
    g_autofree char *shown = hl_format_display (7.5, 4);
    g_autofree char *file = hl_format_exact (7.5);
    g_autofree char *c = hl_format_significant (7.5, 4);

    g_assert_cmpstr (shown, ==, "7,5");   /* German decimal comma in the window */
    g_assert_cmpstr (file, ==, "7.5");    /* files stay in the C locale */
    g_assert_cmpstr (c, ==, "7.5");
  }
  setlocale (LC_NUMERIC, saved);
}

int
main (int    argc,
      char **argv)
{
  setlocale (LC_ALL, "");
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/units/factors", test_factors);
  g_test_add_func ("/units/psi-to-mpa", test_psi_to_mpa);
  g_test_add_func ("/units/parse/accepts", test_parse_accepts);
  g_test_add_func ("/units/parse/rejects", test_parse_rejects);
  g_test_add_func ("/units/parse/number-strict", test_parse_number_strict);
  g_test_add_func ("/units/format/exact-round-trips", test_format_exact_round_trips);
  g_test_add_func ("/units/format/significant", test_format_significant);
  g_test_add_func ("/units/format/display-locale", test_format_display_uses_locale);
  return g_test_run ();
}
