/* test-limits.c — cutting texts on character boundaries, control characters
 *
 * UTF-8 byte patterns: RFC 3629 §3 (lead bytes 0xC2–0xF4, continuation
 * bytes 10xxxxxx); "Ø" is U+00D8 = C3 98, "€" is U+20AC = E2 82 AC.
 * Control characters: Unicode general category Cc (U+0000–001F,
 * U+007F–009F), plus the line and paragraph separators U+2028/2029.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-limits"

#include "hl-limits.h"

#include <string.h>

static void
test_cut_two_byte (void)
{
  g_autoptr(GString) name = g_string_new (NULL);
  char slot[HL_NAME_MAX];

  for (int i = 0; i < 64; i++)
    g_string_append (name, "Ø");               /* 128 bytes */
  g_assert_cmpuint (name->len, ==, 128);
  g_assert_false (hl_utf8_copy (slot, name->str, sizeof slot));
  /* 127 bytes would end inside the 64th "Ø": the cut keeps 63 whole ones */
  g_assert_cmpuint (strlen (slot), ==, 126);
  g_assert_true (g_utf8_validate (slot, -1, NULL));
  g_assert_cmpint (g_utf8_strlen (slot, -1), ==, 63);
}

static void
test_cut_three_byte (void)
{
  /* 42 × "€" = 126 bytes, a 43rd does not fit in 127 */
  g_autoptr(GString) text = g_string_new (NULL);
  char slot[HL_NAME_MAX];

  for (int i = 0; i < 50; i++)
    g_string_append (text, "€");
  g_assert_false (hl_utf8_copy (slot, text->str, sizeof slot));
  g_assert_cmpuint (strlen (slot), ==, 126);
  g_assert_true (g_utf8_validate (slot, -1, NULL));
  for (gsize max = 0; max < text->len; max++)
    {
      gsize fit = hl_utf8_fit_bytes (text->str, max);

      g_assert_cmpuint (fit, <=, max);
      g_assert_cmpuint (fit % 3, ==, 0);
      g_assert_cmpuint (max - fit, <, 3);
    }
}

static void
test_no_cut_when_it_fits (void)
{
  char slot[8];

  g_assert_true (hl_utf8_copy (slot, "R-7", sizeof slot));
  g_assert_cmpstr (slot, ==, "R-7");
  g_assert_true (hl_utf8_copy (slot, "1234567", sizeof slot));
  g_assert_cmpstr (slot, ==, "1234567");
  g_assert_false (hl_utf8_copy (slot, "12345678", sizeof slot));
  g_assert_cmpstr (slot, ==, "1234567");
  g_assert_true (hl_utf8_copy (slot, NULL, sizeof slot));
  g_assert_cmpstr (slot, ==, "");
}

static void
test_control_characters (void)
{
  g_assert_false (hl_text_has_control ("Receiver R-7 Ø2000", FALSE));
  g_assert_true (hl_text_has_control ("R-7\nvon_mises_max = 1 MPa", FALSE));
  g_assert_true (hl_text_has_control ("a\rb", FALSE));
  g_assert_true (hl_text_has_control ("tab\there", FALSE));
  g_assert_true (hl_text_has_control ("del\x7f", FALSE));
  g_assert_true (hl_text_has_control ("c1\xc2\x85", FALSE));       /* U+0085 NEL */
  g_assert_true (hl_text_has_control ("ls\xe2\x80\xa8", FALSE));   /* U+2028 */
  g_assert_true (hl_text_has_control ("esc\x1b[2J", TRUE));
  g_assert_false (hl_text_has_control ("line 1\nline 2\ttab", TRUE));
  g_assert_true (hl_text_has_control ("\xff bad", FALSE));         /* not UTF-8 */
}

static void
test_quote (void)
{
  g_autoptr(GString) big = g_string_new (NULL);
  g_autofree char *short_q = hl_text_quote ("12 bar", 40);
  g_autofree char *long_q = NULL;

  for (int i = 0; i < 100000; i++)
    g_string_append (big, "Ø");
  long_q = hl_text_quote (big->str, 40);
  g_assert_cmpstr (short_q, ==, "12 bar");
  g_assert_cmpint (g_utf8_strlen (long_q, -1), ==, 41);
  g_assert_true (g_str_has_suffix (long_q, "…"));
}

int
main (int   argc,
      char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/limits/cut-two-byte", test_cut_two_byte);
  g_test_add_func ("/limits/cut-three-byte", test_cut_three_byte);
  g_test_add_func ("/limits/no-cut-when-it-fits", test_no_cut_when_it_fits);
  g_test_add_func ("/limits/control-characters", test_control_characters);
  g_test_add_func ("/limits/quote", test_quote);
  return g_test_run ();
}
