/* test-check-steps.c — the steps a checker redoes: formula, numbers put
 * in, result, criterion, OK / NOT OK
 *
 * Sources beside each check: ASME BPVC VIII-1 UG-27(c)(1) t = P R / (S E
 * - 0.6 P), (c)(2) t = P R / (2 S E + 0.4 P), P = S E t / (R + 0.6 t),
 * UG-27(d) t = P R / (2 S E - 0.2 P); EN 13445-3 7.4.2 e = P Di / (2 f z
 * - P) (from memory, as REFERENCES.md marks it); Hill (1950) plastic
 * collapse Pc = (2/√3) Sy ln k for closed ends.  Besides the hand-worked
 * values, every substituted line of every shell of the demo and the check
 * cases is re-evaluated here from the numbers it prints, so a line that
 * does not work out to its own result fails.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-check-steps"

#include "hl-test-formulas.h"
#include "hl-check-steps.h"
#include "hl-project-file.h"
#include "hl-number-format.h"

#include <locale.h>
#include <math.h>
#include <stdlib.h>
#include <string.h>

#define MM  1e-3
#define MPA 1e6

static HlShellInputs
receiver (double t_mm,
          double p_bar)
{
  /* the failing receiver of issue 10: 2 m bore, S 80 MPa, Ej = 1 */
  HlShellInputs in = hlt_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_DIAMETER, 2000 * MM, t_mm * MM,
                                p_bar * 1e5, 0);

  in.material.allowable_stress = hl_quantity_make (80, "MPa");
  in.material.yield_strength = hl_quantity_make (260, "MPa");
  in.design_basis = HL_DESIGN_BASIS_UG27;
  return in;
}

static const HlCheckStep *
find (GPtrArray  *steps,
      const char *key,
      const char *title_part)
{
  for (guint i = 0; i < steps->len; i++)
    {
      const HlCheckStep *st = g_ptr_array_index (steps, i);

      if (strcmp (st->method_key, key) == 0 && strstr (st->title, title_part) != NULL)
        return st;
    }
  g_test_fail_printf ("no step %s “%s”", key, title_part);
  return NULL;
}

/* the numbers of a line, in order, as doubles */
static GArray *
numbers_of (const char *text)
{
  GArray *out = g_array_new (FALSE, FALSE, sizeof (double));
  g_autoptr(GString) plain = g_string_new (text);
  const char *p;

  /* digits grouped for a reader (ISO 80000-1) read as one number */
  g_string_replace (plain, HL_GROUP_SEPARATOR, "", 0);
  p = plain->str;

  while (*p != '\0')
    {
      char *end;
      double v;

      if (!g_ascii_isdigit (*p))
        {
          p++;
          continue;
        }
      v = g_ascii_strtod (p, &end);
      g_array_append_val (out, v);
      p = end;
    }
  return out;
}

#define N(i) g_array_index (n, double, (i))

/* Redo the arithmetic of a code step from the numbers it prints (4
 * significant digits each, so agreement to 0.2 %). */
static void
assert_works_out (const HlCheckStep *st)
{
  g_autoptr(GArray) n = NULL;
  double expect = NAN, shown;

  if (st->verdict == HL_CHECK_NOT_APPLICABLE && strcmp (st->substituted, "—") == 0)
    return;
  n = numbers_of (st->substituted);
  shown = N (n->len - 1);
  if (g_str_has_prefix (st->formula, "t = P·R / (S·E − 0.6·P)"))
    /* P, R, S, E, 0.6, P, t */
    expect = N (0) * N (1) / (N (2) * N (3) - N (4) * N (5));
  else if (g_str_has_prefix (st->formula, "t = P·R / (2·S·E + 0.4·P)"))
    expect = N (0) * N (1) / (N (2) * N (3) * N (4) + N (5) * N (6));
  else if (g_str_has_prefix (st->formula, "t = P·R / (2·S·E − 0.2·P)"))
    expect = N (0) * N (1) / (N (2) * N (3) * N (4) - N (5) * N (6));
  else if (g_str_has_prefix (st->formula, "P = S·E·t / (R + 0.6·t)") && n->len == 7)
    /* S, E, t, R, 0.6, t, MAWP */
    expect = N (0) * N (1) * N (2) / (N (3) + N (4) * N (5));
  else if (g_str_has_prefix (st->formula, "P = 2·S·E·t / (R − 0.4·t)") && n->len == 8)
    expect = N (0) * N (1) * N (2) * N (3) / (N (4) - N (5) * N (6));
  else if (g_str_has_prefix (st->formula, "e = P·Di / (2·f·z − P)"))
    /* P, Di, 2, f, z, P, e */
    expect = N (0) * N (1) / (N (2) * N (3) * N (4) - N (5));
  else if (g_str_has_prefix (st->formula, "Pmax = 2·f·z·e / Dm") && n->len == 7)
    /* 2, f, z, e, Di, e, Pmax */
    expect = N (0) * N (1) * N (2) * N (3) / (N (4) + N (5));
  else if (g_str_has_prefix (st->formula, "σθ = (Pi − Po)·R / t"))
    expect = N (0) * N (1) / N (2);
  else
    return;   /* a step without a closed arithmetic line (Lamé, floors) */
  if (fabs (expect - shown) > 2e-3 * fabs (shown))
    g_test_fail_printf ("“%s” works out to %.6g, not %.6g", st->substituted, expect, shown);
}

static void
test_ug27_receiver (void)
{
  /* 2 m receiver, 12 mm, 10 bar, S E = 80 MPa: UG-27(c)(1) by hand,
   * t = 1.0 × 1000 / (80 − 0.6 × 1.0) = 12.594 mm > 12 mm: NOT OK;
   * P = 80 × 12 / (1000 + 0.6 × 12) = 0.95313 MPa < 1.0 MPa: NOT OK,
   * utilisation 1.0 / 0.95313 = 104.92 % (the 104.9 %). */
  HlShellInputs in = receiver (12, 10);
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);
  g_autoptr(GPtrArray) steps = hl_check_steps (s, HL_UNIT_SYSTEM_SI, FALSE);
  const HlCheckStep *t1 = find (steps, "ug27", "UG-27(c)(1), circumferential");
  const HlCheckStep *p1 = find (steps, "ug27", "UG-27(c)(1), maximum allowable");

  g_assert_nonnull (t1);
  g_assert_nonnull (p1);
  hlt_assert_close (t1->value, 1.0 * 1000 / (80 - 0.6) * MM, 1e-12, 0);
  g_assert_cmpint (t1->verdict, ==, HL_CHECK_FAIL);
  g_assert_cmpstr (t1->result, ==, "t = 12.59 mm");
  hlt_assert_close (p1->value, 80.0 * 12 / (1000 + 0.6 * 12) * MPA, 1e-12, 0);
  hlt_assert_close (p1->utilisation, 1.0 / (80.0 * 12 / (1000 + 0.6 * 12)), 1e-12, 0);
  g_assert_cmpint (p1->verdict, ==, HL_CHECK_FAIL);
  g_assert_true (p1->governing);
  g_assert_cmpstr (hl_check_step_word (p1->verdict), ==, "NOT OK");
  g_assert_nonnull (strstr (t1->substituted, "1 MPa × 1000 mm / (80 MPa × 1 − 0.6 × 1 MPa) = 12.59 mm"));
  assert_works_out (t1);
  assert_works_out (p1);
}

static void
test_ug27_passes_at_13mm (void)
{
  /* the same receiver with 13 mm: 12.594 ≤ 13 and P = 80 × 13 / (1000 +
   * 7.8) = 1.0319 MPa ≥ 1.0 MPa: OK (hand arithmetic, UG-27(c)(1)) */
  HlShellInputs in = receiver (13, 10);
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);
  g_autoptr(GPtrArray) steps = hl_check_steps (s, HL_UNIT_SYSTEM_SI, FALSE);
  const HlCheckStep *p1 = find (steps, "ug27", "UG-27(c)(1), maximum allowable");

  hlt_assert_close (p1->value, 80.0 * 13 / (1000 + 0.6 * 13) * MPA, 1e-12, 0);
  g_assert_cmpint (p1->verdict, ==, HL_CHECK_PASS);
  g_assert_cmpstr (hl_check_step_word (p1->verdict), ==, "OK");
}

static void
test_collapse_step (void)
{
  /* Hill (1950), closed ends: Pc = (2/√3) × 260 × ln(1012/1000) MPa =
   * 3.5894 MPa; at 100 bar the wall bursts and that step governs */
  HlShellInputs in = receiver (12, 100);
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);
  g_autoptr(GPtrArray) steps = hl_check_steps (s, HL_UNIT_SYSTEM_SI, FALSE);
  const HlCheckStep *pc = find (steps, "collapse", "plastic collapse");

  hlt_assert_close (pc->value, 2 / sqrt (3) * 260 * log (1012.0 / 1000) * MPA, 1e-12, 0);
  g_assert_cmpint (pc->verdict, ==, HL_CHECK_FAIL);
  g_assert_true (pc->governing);
}

static void
test_us_units (void)
{
  /* in US customary units no step prints a millimetre or a megapascal
   * (NIST SP 811: 1 in = 25.4 mm, 1 psi = 6894.757 Pa) */
  HlShellInputs in = receiver (12, 10);
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);
  g_autoptr(GPtrArray) steps = hl_check_steps (s, HL_UNIT_SYSTEM_US, FALSE);
  const HlCheckStep *t1 = find (steps, "ug27", "UG-27(c)(1), circumferential");

  for (guint i = 0; i < steps->len; i++)
    {
      const HlCheckStep *st = g_ptr_array_index (steps, i);
      const char *texts[] = { st->substituted, st->result, st->criterion };

      for (guint k = 0; k < G_N_ELEMENTS (texts); k++)
        if (strstr (texts[k], " mm") != NULL || strstr (texts[k], "MPa") != NULL)
          g_test_fail_printf ("US step shows SI: %s", texts[k]);
    }
  /* 12.594 mm = 0.4958 in */
  g_assert_cmpstr (t1->result, ==, "t = 0.4958 in");
  assert_works_out (t1);
}

/* Every step of every shell of the example projects: a substituted line
 * that works out, a verdict that agrees with its utilisation and with
 * its method's result in the design check, one governing step. */
static void
check_project (const char *name)
{
  g_autofree char *path = g_build_filename (g_getenv ("HL_SOURCE_DIR"), "data", "examples", name, NULL);
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) p = hl_project_load (path, NULL, &error);

  g_assert_no_error (error);
  for (guint i = 0; i < hl_project_n_shells (p); i++)
    for (int units = 0; units < 2; units++)
      {
        g_autoptr(HlSolution) s = hl_solve (hl_project_shell (p, i), 11, TRUE, &error);
        g_autoptr(GPtrArray) steps = NULL;
        guint governing = 0;

        g_assert_no_error (error);
        steps = hl_check_steps (s, units, FALSE);
        g_assert_cmpuint (steps->len, >=, 8);
        for (guint k = 0; k < steps->len; k++)
          {
            const HlCheckStep *st = g_ptr_array_index (steps, k);

            g_assert_nonnull (st->formula);
            g_assert_nonnull (st->substituted);
            g_assert_nonnull (st->result);
            g_assert_nonnull (st->criterion);
            governing += st->governing;
            assert_works_out (st);
            if (st->verdict == HL_CHECK_PASS && isfinite (st->utilisation))
              g_assert_cmpfloat (st->utilisation, <=, 1.0);
            if (st->verdict == HL_CHECK_FAIL && isfinite (st->utilisation))
              g_assert_cmpfloat (st->utilisation, >, 1.0);
            if (st->verdict != HL_CHECK_PASS)
              g_assert_nonnull (st->reason);
            for (int m = 0; m < HL_N_METHODS; m++)
              if (strcmp (s->check.methods[m].key, st->method_key) == 0)
                {
                  /* a method that passes has no step NOT OK; one that
                   * does not apply has no step OK (common practice: a
                   * formula is not used outside its range) */
                  if (s->check.methods[m].result == HL_CHECK_PASS)
                    g_assert_cmpint (st->verdict, ==, HL_CHECK_PASS);
                  if (s->check.methods[m].result == HL_CHECK_NOT_APPLICABLE)
                    g_assert_cmpint (st->verdict, ==, HL_CHECK_NOT_APPLICABLE);
                }
          }
        g_assert_cmpuint (governing, ==, 1);
      }
}

static void
test_examples (void)
{
  check_project ("demo.hoop");
  check_project ("check-cases.hoop");
}

int
main (int    argc,
      char **argv)
{
  setlocale (LC_ALL, "C.UTF-8");
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/check-steps/ug27-receiver", test_ug27_receiver);
  g_test_add_func ("/check-steps/ug27-passes-at-13mm", test_ug27_passes_at_13mm);
  g_test_add_func ("/check-steps/collapse", test_collapse_step);
  g_test_add_func ("/check-steps/us-units", test_us_units);
  g_test_add_func ("/check-steps/examples", test_examples);
  return g_test_run ();
}
