/* test-units-strict.c — units and numbers that must not change meaning
 *
 * Sources beside each check:
 *  - NIST SP 811 (2008) §6 and §10: unit symbols are printed in roman type
 *    and their case matters ("mPa" is the millipascal, "MPa" the
 *    megapascal, "Mm" the megametre).  Unit names (words) are ordinary
 *    nouns, written in lower case except at the start of a sentence.
 *  - NIST SP 811 §10.5.3 (from memory): neither a point nor a comma
 *    groups digits; a German reader writes 1.500 for one thousand five
 *    hundred (DIN 1333, common practice), an English reader 1,500.
 *  - IEEE 754-2008 §5.12.2: 17 significant digits carry a binary64
 *    through decimal text and back; the C library's printf and strtod
 *    are the reference for the shortest digit count.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-units-strict"

#include "hl-units.h"

#include <float.h>
#include <math.h>
#include <stdio.h>
#include <string.h>

/* ---- unit symbols: case matters ------------------------------------- */

static void
assert_unit_refused (const char     *text,
                     HlQuantityKind  kind,
                     const char     *known)
{
  g_autoptr(GError) error = NULL;
  double value = 42;
  const char *unit = NULL;

  g_test_message ("refuse “%s”", text);
  g_assert_false (hl_units_parse (text, kind, NULL, FALSE, &value, &unit, &error));
  g_assert_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_UNKNOWN_UNIT);
  /* the message lists the units that are known */
  if (error != NULL)
    g_assert_nonnull (strstr (error->message, known));
  g_assert_cmpfloat (value, ==, 42);
}

static void
test_symbols_case_matters (void)
{
  /* NIST SP 811 §6: mPa is 1e-3 Pa, Mm is 1e6 m: never MPa or mm */
  assert_unit_refused ("1 mPa", HL_KIND_STRESS, "MPa, bar");
  assert_unit_refused ("7 mpa", HL_KIND_STRESS, "MPa, bar");
  assert_unit_refused ("7 MPA", HL_KIND_STRESS, "MPa, bar");
  assert_unit_refused ("2 gpa", HL_KIND_MODULUS, "GPa");
  assert_unit_refused ("3 Mm", HL_KIND_LENGTH, "mm, cm, m, in, ft");
  assert_unit_refused ("3 MM", HL_KIND_LENGTH, "mm, cm, m, in, ft");
  assert_unit_refused ("3 M", HL_KIND_LENGTH, "mm, cm, m, in, ft");
  assert_unit_refused ("1 Bar", HL_KIND_STRESS, "MPa, bar");
  assert_unit_refused ("1 n/mm2", HL_KIND_STRESS, "N/mm2");

  g_assert_cmpfloat (hl_unit_factor (HL_KIND_STRESS, "mPa"), ==, 0.0);
  g_assert_cmpfloat (hl_unit_factor (HL_KIND_LENGTH, "Mm"), ==, 0.0);
  g_assert_null (hl_unit_canonical (HL_KIND_STRESS, "mPa"));
  g_assert_null (hl_unit_canonical (HL_KIND_LENGTH, "Mm"));
  g_assert_null (hl_unit_canonical (HL_KIND_STRESS, "kpa"));
}

static void
test_symbol_hint (void)
{
  /* a symbol that differs from a known one only in case is named, so the
   * user sees why "mPa" is refused (NIST SP 811 §6) */
  g_autoptr(GError) error = NULL;
  double value;

  g_assert_false (hl_units_parse ("1 mPa", HL_KIND_STRESS, NULL, FALSE, &value, NULL, &error));
  g_assert_nonnull (error);
  g_assert_nonnull (strstr (error->message, "case"));
  g_assert_nonnull (strstr (error->message, "“MPa”"));
}

static void
test_deliberate_spellings (void)
{
  /* The alternatives listed in the tables: N/mm^2 and N/mm² are the
   * same symbol typed without a superscript key (NIST SP 811 §6.1.7,
   * exponents); psi and ksi are the customary US abbreviations, "PSI"
   * the capitals US drawings print (common practice); unit names are
   * words and may start with a capital (NIST SP 811 §9.1). */
  static const struct { const char *text; HlQuantityKind kind; double value; const char *unit; } cases[] = {
    { "210 N/mm2", HL_KIND_STRESS, 210, "N/mm2" },
    { "210 N/mm^2", HL_KIND_STRESS, 210, "N/mm2" },
    { "210 N/mm\xc2\xb2", HL_KIND_STRESS, 210, "N/mm2" },
    { "150 psi", HL_KIND_STRESS, 150, "psi" },
    { "150 PSI", HL_KIND_STRESS, 150, "psi" },
    { "30 ksi", HL_KIND_STRESS, 30, "ksi" },
    { "3 inch", HL_KIND_LENGTH, 3, "in" },
    { "3 Inches", HL_KIND_LENGTH, 3, "in" },
    { "2 metre", HL_KIND_LENGTH, 2, "m" },
    { "2 Metres", HL_KIND_LENGTH, 2, "m" },
    { "5 millimetre", HL_KIND_LENGTH, 5, "mm" },
    { "100 pascal", HL_KIND_STRESS, 100, "Pa" },
    { "5 percent", HL_KIND_PERCENT, 5, "%" },
    { "12 mm", HL_KIND_LENGTH, 12, "mm" },
    { "12 MPa", HL_KIND_STRESS, 12, "MPa" },
    { "12 kPa", HL_KIND_STRESS, 12, "kPa" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autoptr(GError) error = NULL;
      const char *unit = NULL;
      double value = NAN;

      g_test_message ("accept “%s”", cases[i].text);
      g_assert_true (hl_units_parse (cases[i].text, cases[i].kind, NULL, FALSE, &value, &unit, &error));
      g_assert_no_error (error);
      g_assert_cmpfloat (value, ==, cases[i].value);
      g_assert_cmpstr (unit, ==, cases[i].unit);
    }
}

/* ---- digit grouping ------------------------------------------------- */

typedef struct
{
  const char *text;
  gboolean    comma;
  const char *hint1;   /* accepted form(s) the message shows */
  const char *hint2;   /* or NULL */
} GroupCase;

static void
test_grouping_refused (void)
{
  static const GroupCase cases[] = {
    /* DIN 1333 (common practice): 1.500 is one thousand five hundred */
    { "1.500", TRUE, "“1500”", "“1,5”" },
    { "1.500 MPa", TRUE, "“1500 MPa”", "“1,5 MPa”" },
    { "-2.250", TRUE, "“-2250”", "“-2,25”" },
    { "1.500,5", TRUE, "“1500,5”", NULL },
    { "1.500.000", TRUE, "“1500000”", NULL },
    { "12.000 bar", TRUE, "“12000 bar”", "“12 bar”" },
    /* English grouping pasted into a German field */
    { "1,500.5", TRUE, "“1500,5”", NULL },
    /* C locale: a comma is never a decimal mark, nor a group mark */
    { "1,500", FALSE, "“1500”", "“1.5”" },
    { "1,500.25 mm", FALSE, "“1500.25 mm”", NULL },
    { "1,500,000", FALSE, "“1500000”", NULL },
    { "7,5", FALSE, "“7.5”", NULL },
    { "0,500", FALSE, "“0.500”", NULL },
    /* SI grouping with spaces (NIST SP 811 §10.5.3) is not read either */
    { "1 500 mm", FALSE, "“1500 mm”", NULL },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      const GroupCase *c = &cases[i];
      g_autoptr(GError) error = NULL;
      double value = 42;

      g_test_message ("refuse “%s” (%s)", c->text, c->comma ? "decimal comma" : "decimal point");
      g_assert_false (hl_units_parse (c->text, HL_KIND_STRESS, "MPa", c->comma, &value, NULL, &error));
      g_assert_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_NOT_A_NUMBER);
      g_assert_cmpfloat (value, ==, 42);
      if (error == NULL)
        continue;
      g_test_message ("  %s", error->message);
      g_assert_nonnull (strstr (error->message, c->hint1));
      if (c->hint2 != NULL)
        g_assert_nonnull (strstr (error->message, c->hint2));
    }
}

static void
test_grouping_not_confused (void)
{
  /* What is not grouping keeps working: a point that is not followed by
   * exactly three digits, or that follows a 0 or four digits, cannot be a
   * group mark (DIN 1333 groups are 1 to 3 leading digits, then threes),
   * so in a comma locale it is the pasted decimal point it was. */
  static const struct { const char *text; gboolean comma; double value; } cases[] = {
    { "0.5", TRUE, 0.5 },
    { "7.25 MPa", TRUE, 7.25 },
    { "1.5", TRUE, 1.5 },
    { "1.5000", TRUE, 1.5 },
    { "0.125", TRUE, 0.125 },
    { "1234.567", TRUE, 1234.567 },
    { "1.500e3", TRUE, 1500 },
    { "1,5", TRUE, 1.5 },
    { "1,500", TRUE, 1.5 },       /* the comma is the decimal mark here */
    { "1500", TRUE, 1500 },
    { "1.500", FALSE, 1.5 },      /* the point is the decimal mark here */
    { "1500", FALSE, 1500 },
    { "0.000123", FALSE, 0.000123 },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autoptr(GError) error = NULL;
      double value = NAN;

      g_test_message ("accept “%s” (%s)", cases[i].text, cases[i].comma ? "decimal comma" : "decimal point");
      g_assert_true (hl_units_parse (cases[i].text, HL_KIND_STRESS, "MPa", cases[i].comma, &value, NULL, &error));
      g_assert_no_error (error);
      g_assert_cmpfloat (value, ==, cases[i].value);
    }
}

/* ---- messages quote a few dozen characters -------------------------- */

static void
assert_short (const GError *error,
              gsize         pasted)
{
  g_assert_nonnull (error);
  if (error == NULL)
    return;
  /* a pasted megabyte is not echoed back: the message stays a line */
  g_assert_cmpuint (strlen (error->message), <, 300);
  g_assert_cmpuint (strlen (error->message), <, pasted);
  g_assert_true (g_utf8_validate (error->message, -1, NULL));
}

static void
test_messages_are_short (void)
{
  GString *junk = g_string_new ("12 ");
  GString *digits = g_string_new ("1");
  g_autofree char *junk_text = NULL, *digit_text = NULL, *word_text = NULL;

  for (guint i = 0; i < 60000; i++)
    g_string_append (junk, "\xc3\x98");   /* "Ø": cut on a character */
  for (guint i = 0; i < 400; i++)
    g_string_append_c (digits, '0');      /* 1e400: past the double range */
  junk_text = g_string_free (junk, FALSE);
  digit_text = g_string_free (digits, FALSE);
  word_text = g_strnfill (50000, 'x');

  {
    g_autoptr(GError) error = NULL;
    double v;

    g_assert_false (hl_units_parse (junk_text, HL_KIND_LENGTH, NULL, FALSE, &v, NULL, &error));
    assert_short (error, strlen (junk_text));
  }
  {
    g_autoptr(GError) error = NULL;
    double v;

    g_assert_false (hl_units_parse (digit_text, HL_KIND_LENGTH, NULL, FALSE, &v, NULL, &error));
    g_assert_error (error, HL_UNITS_ERROR, HL_UNITS_ERROR_OUT_OF_RANGE);
    assert_short (error, strlen (digit_text));
  }
  {
    g_autoptr(GError) error = NULL;
    double v;

    g_assert_false (hl_units_parse (word_text, HL_KIND_LENGTH, NULL, FALSE, &v, NULL, &error));
    assert_short (error, strlen (word_text));
  }
  {
    g_autoptr(GError) error = NULL;
    double v;

    g_assert_false (hl_parse_number (word_text, &v, &error));
    assert_short (error, strlen (word_text));
  }
  {
    g_autoptr(GError) error = NULL;
    double v;

    g_assert_false (hl_parse_number (digit_text, &v, &error));
    assert_short (error, strlen (digit_text));
  }
}

/* ---- the file's numbers: plain decimals, exact ---------------------- */

static void
test_format_plain (void)
{
  /* The decimal notation of each value (arithmetic): 2e+03 is 2000. */
  static const struct { double v; const char *text; } cases[] = {
    { 2000, "2000" },
    { 10, "10" },
    { 400, "400" },
    { 0.0125, "0.0125" },
    { 0.1, "0.1" },
    { -7.25, "-7.25" },
    { 1e-6, "0.000001" },
    { 2.5e-5, "0.000025" },
    { 205e9, "205000000000" },
    { 6894.757293168, "6894.757293168" },
    { 123456789012345.0, "123456789012345" },
    { 1.0 / 3.0, "0.3333333333333333" },
    /* extreme magnitudes keep the exponent */
    { 1e-320, "1e-320" },
    { 1.5e-7, "1.5e-07" },
    { 1e15, "1e+15" },
    { 1e22, "1e+22" },
    { -5e-324, "-5e-324" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *text = hl_format_exact (cases[i].v);

      g_assert_cmpstr (text, ==, cases[i].text);
    }
}

/* Significant digits of a decimal text: leading zeros do not count. */
static int
significant_digits (const char *text)
{
  int n = 0, pending_zeros = 0;
  gboolean started = FALSE;

  for (const char *p = text; *p != '\0' && *p != 'e'; p++)
    {
      if (!g_ascii_isdigit (*p))
        continue;
      if (*p == '0')
        {
          if (started)
            pending_zeros++;
          continue;
        }
      started = TRUE;
      n += pending_zeros + 1;
      pending_zeros = 0;
    }
  return MAX (n, 1);
}

/* Fewest significant digits that bring @v back through the C library's
 * printf("%.*e") and strtod (IEEE 754-2008 §5.12.2: at most 17). */
static int
fewest_digits (double v)
{
  for (int p = 1; p <= 17; p++)
    {
      char buf[64];

      snprintf (buf, sizeof buf, "%.*e", p - 1, v);
      if (g_ascii_strtod (buf, NULL) == v)
        return p;
    }
  return 17;
}

static void
check_exact (double v)
{
  g_autofree char *text = NULL;
  g_autoptr(GError) error = NULL;
  double back = NAN;

  if (!isfinite (v))
    return;   /* the next double after the largest: not a value */
  text = hl_format_exact (v);
  if (g_ascii_strtod (text, NULL) != v)
    g_error ("hl_format_exact (%.17g) = “%s” does not read back", v, text);
  if (!hl_parse_number (text, &back, &error) || back != (v == 0.0 ? 0.0 : v))
    g_error ("hl_format_exact (%.17g) = “%s” is not read by hl_parse_number", v, text);
  if (v != 0.0 && significant_digits (text) != fewest_digits (v))
    g_error ("hl_format_exact (%.17g) = “%s” is not the shortest (%d digits)", v, text, fewest_digits (v));
  if (fabs (v) >= 1e-6 && fabs (v) < 1e15 && strchr (text, 'e') != NULL)
    g_error ("hl_format_exact (%.17g) = “%s” is not plain", v, text);
}

static void
test_format_round_trip (void)
{
  static const double edges[] = {
    0.0, 1.0, -1.0, DBL_MIN, DBL_MAX, -DBL_MAX, DBL_TRUE_MIN, DBL_EPSILON, 1e-6, 1e15, 9.999999999999999e14,
    0.1, 0.2, 0.3, 1e23, 5e-324, 2.2250738585072009e-308, 123456789.123456789, 0.5, 1e-5, 1e14,
  };
  GRand *rand = g_rand_new_with_seed (20261202);
  guint n = 0;

  for (guint i = 0; i < G_N_ELEMENTS (edges); i++)
    {
      check_exact (edges[i]);
      check_exact (nextafter (edges[i], INFINITY));
      check_exact (nextafter (edges[i], -INFINITY));
      n += 3;
    }
  /* every power of ten of the double range and its neighbours */
  for (int e = -323; e <= 308; e++)
    {
      char buf[16];
      double p;

      g_snprintf (buf, sizeof buf, "1e%d", e);
      p = g_ascii_strtod (buf, NULL);

      check_exact (p);
      check_exact (nextafter (p, 0.0));
      check_exact (nextafter (p, INFINITY));
      n += 3;
    }
  /* random bit patterns cover every exponent; random values of ordinary
   * magnitude cover the plain form */
  for (guint i = 0; i < 60000; i++)
    {
      guint64 bits = ((guint64) g_rand_int (rand) << 32) | g_rand_int (rand);
      double v;

      memcpy (&v, &bits, sizeof v);
      if (isfinite (v))
        check_exact (v), n++;
      v = g_rand_double_range (rand, -1e6, 1e6) * pow (10.0, g_rand_int_range (rand, -8, 10));
      check_exact (v), n++;
    }
  g_rand_free (rand);
  g_test_message ("%u values round-tripped", n);
}

/* ISO 80000-1 7.3.1: digits of five or more grouped in threes with a
 * small space, on either side of nothing but the integer part here;
 * four digits and exponent forms stay as they are */
static void
test_format_grouped (void)
{
  static const struct { const char *in, *out; } cases[] = {
    { "29007.5", "29" HL_GROUP_SEPARATOR "007.5" },
    { "-1234567", "-1" HL_GROUP_SEPARATOR "234" HL_GROUP_SEPARATOR "567" },
    { "21320,5", "21" HL_GROUP_SEPARATOR "320,5" },
    { "9999", "9999" },
    { "0.000125", "0.000125" },
    { "12345e+20", "12345e+20" },
    { "n/a", "n/a" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *got = hl_format_grouped (cases[i].in);

      g_assert_cmpstr (got, ==, cases[i].out);
    }
}

/* The significant-digit formatter's own fast path gives exactly what the
 * C library's printf gives (ISO C 7.21.6.1, "%.Nf": correctly rounded in
 * glibc), over 400,000 values of every magnitude it takes, ties and
 * near-ties included (x.5 and x.5 +- an ulp at the last digit). */
static char *
printf_reference (double value,
                  int    significant)
{
  int decimals = MAX (significant - 1 - (int) floor (log10 (fabs (value))), 0);
  char buf[64], fmt[16];

  g_snprintf (fmt, sizeof fmt, "%%.%df", decimals);
  g_ascii_formatd (buf, sizeof buf, fmt, value);
  if (decimals > 0)
    {
      char *end = buf + strlen (buf) - 1;

      while (end > buf && *end == '0')
        *end-- = '\0';
      if (*end == '.')
        *end = '\0';
    }
  return g_strdup (buf);
}

static void
test_format_fast_fixed (void)
{
  guint checked = 0;

  for (guint i = 0; i < 400000; i++)
    {
      int significant = g_test_rand_int_range (1, 18);
      double mag = pow (10, g_test_rand_double_range (-4, 9));
      double value = (g_test_rand_bit () ? -1 : 1) * mag;
      g_autofree char *got = NULL, *want = NULL;

      if (i % 4 == 0)
        {
          /* a tie at the last digit shown, and its neighbours */
          int decimals = MAX (significant - 1 - (int) floor (log10 (mag)), 0);
          double step = pow (10, -decimals);

          value = (floor (value / step) + 0.5) * step;
          if (i % 8 == 0)
            value = nextafter (value, i % 16 == 0 ? INFINITY : -INFINITY);
        }
      if (!(fabs (value) >= 1e-4 && fabs (value) < 1e9))
        continue;
      got = hl_format_significant (value, significant);
      want = printf_reference (value, significant);
      if (strcmp (got, want) != 0)
        g_error ("%.17g to %d digits: %s, printf %s", value, significant, got, want);
      checked++;
    }
  g_assert_cmpuint (checked, >, 360000);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/units-strict/symbols/case-matters", test_symbols_case_matters);
  g_test_add_func ("/units-strict/symbols/hint", test_symbol_hint);
  g_test_add_func ("/units-strict/symbols/deliberate-spellings", test_deliberate_spellings);
  g_test_add_func ("/units-strict/grouping/refused", test_grouping_refused);
  g_test_add_func ("/units-strict/grouping/not-confused", test_grouping_not_confused);
  g_test_add_func ("/units-strict/messages/short", test_messages_are_short);
  g_test_add_func ("/units-strict/format/plain", test_format_plain);
  g_test_add_func ("/units-strict/format/round-trip", test_format_round_trip);
  g_test_add_func ("/units-strict/format/grouped", test_format_grouped);
  g_test_add_func ("/units-strict/format/fast-fixed", test_format_fast_fixed);
  return g_test_run ();
}
