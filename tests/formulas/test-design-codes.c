/* test-design-codes.c — published design-by-formula rules, hand-worked
 *
 * ASME BPVC Section VIII Division 1: UG-27(c)(1) circumferential stress,
 * UG-27(c)(2) longitudinal stress, UG-27(d) spheres, Appendix 1-1 outside
 * radius; EN 13445-3 7.4.2 cylinders and 7.4.3 spheres (from memory, as
 * REFERENCES.md marks them); Barlow's formula for pipe.  R is the inside
 * radius in the corroded condition, S Ej the allowable times the joint
 * efficiency (REFERENCES.md).  The arithmetic of every expected value is
 * shown beside it.
 *
 * Most cases: P = 2 MPa, S = 100 MPa, Ej = 0.85 (S Ej = 85 MPa), R = 400 mm
 * (Di = 800 mm), t = 10 mm, Ro = 410 mm (De = 820 mm).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-design-codes"

#include "hl-test-formulas.h"
#include "hl-design-codes.h"

#include <math.h>
#include <string.h>

#define REL 1e-12
#define MM  1e-3
#define MPA 1e6

static HlShellInputs
code_shell (HlForm     form,
            HlEnds     ends,
            HlSizeKind kind,
            double     size_m,
            double     t_m,
            double     pi_pa)
{
  HlShellInputs in = hlt_shell (form, ends, kind, size_m, t_m, pi_pa, 0);

  in.joint_efficiency = 0.85;
  return in;
}

static void
assert_clause (const char *clause,
               const char *part)
{
  if (clause == NULL || strstr (clause, part) == NULL)
    g_test_fail_printf ("clause '%s' should name %s", clause != NULL ? clause : "(none)", part);
}

static gboolean
has_warning (const HlSolution *s,
             const char       *part)
{
  for (guint i = 0; i < s->warnings->len; i++)
    if (strstr (g_ptr_array_index (s->warnings, i), part) != NULL)
      return TRUE;
  return FALSE;
}

static void
test_ug27_cylinder (void)
{
  /* UG-27(c)(1): t = P R / (S E - 0.6 P) = 2 x 400 / (85 - 1.2) =
   * 800 / 83.8 = 9.546539379474941 mm;
   * P = S E t / (R + 0.6 t) = 85 x 10 / 406 = 2.0935960591133007 MPa.
   * UG-27(c)(2), closed ends: t = P R / (2 S E + 0.4 P) = 800 / 170.8 =
   * 4.68384074941452 mm, P = 2 S E t / (R - 0.4 t) = 1700 / 396 =
   * 4.292929292929293 MPa: the circumferential rule governs, so closed,
   * open and plane-strain cylinders all get the (c)(1) numbers. */
  for (HlEnds ends = HL_ENDS_CLOSED; ends <= HL_ENDS_PLANE_STRAIN; ends++)
    {
      HlShellInputs in = code_shell (HL_FORM_CYLINDER, ends, HL_SIZE_INNER_RADIUS, 0.400, 0.010, 2 * MPA);
      g_autoptr(HlSolution) s = hlt_solve (&in, 11);

      if (s == NULL)
        return;
      hlt_assert_result (s->treq_ug27, 9.546539379474941 * MM, REL, 0);
      hlt_assert_result (s->mawp_ug27, 2.0935960591133007 * MPA, REL, 0);
      assert_clause (s->ug27_clause, "UG-27(c)(1)");
      g_assert_false (has_warning (s, "UG-27"));
    }

  /* the same through the low-level rule */
  {
    HlCodeWall wall = { HL_FORM_CYLINDER, HL_ENDS_CLOSED, FALSE, 0.400, 0.410, 0, 2 * MPA, 85 * MPA };
    HlCodeResult r = hl_code_ug27 (&wall);

    hlt_assert_close (r.treq, 9.546539379474941 * MM, REL, 0);
    hlt_assert_close (r.mawp, 2.0935960591133007 * MPA, REL, 0);
    g_assert_null (r.treq_reason);
    g_assert_null (r.mawp_reason);
    g_assert_false (r.out_of_range);
    /* (c)(2) would ask for less and allow more */
    g_assert_cmpfloat (r.treq, >, 4.68384074941452 * MM);
    g_assert_cmpfloat (r.mawp, <, 4.292929292929293 * MPA);
  }
}

static void
test_ug27_sphere (void)
{
  /* UG-27(d): t = P R / (2 S E - 0.2 P) = 800 / (170 - 0.4) = 800 / 169.6
   * = 4.716981132075472 mm; P = 2 S E t / (R + 0.2 t) = 1700 / 402 =
   * 4.2288557213930345 MPa. */
  HlShellInputs in = code_shell (HL_FORM_SPHERE, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 0.400, 0.010, 2 * MPA);
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);

  if (s == NULL)
    return;
  hlt_assert_result (s->treq_ug27, 4.716981132075472 * MM, REL, 0);
  hlt_assert_result (s->mawp_ug27, 4.2288557213930345 * MPA, REL, 0);
  assert_clause (s->ug27_clause, "UG-27(d)");
}

static void
test_ug27_outside (void)
{
  /* Appendix 1-1, outside radius Ro = 410 mm (entered as an outer
   * diameter of 820 mm or an outer radius of 410 mm):
   *   cylinder t = P Ro / (S E + 0.4 P) = 820 / 85.8 = 9.557109557109557 mm,
   *            P = S E t / (Ro - 0.4 t) = 850 / 406 = 2.0935960591133007 MPa;
   *   sphere   t = P Ro / (2 S E + 0.8 P) = 820 / 171.6 = 4.778554778554779 mm,
   *            P = 2 S E t / (Ro - 0.8 t) = 1700 / 402 = 4.2288557213930345 MPa. */
  static const struct { HlForm form; double treq, mawp; } cases[] = {
    { HL_FORM_CYLINDER, 9.557109557109557, 2.0935960591133007 },
    { HL_FORM_SPHERE, 4.778554778554779, 4.2288557213930345 },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    for (int radius = 0; radius <= 1; radius++)
      {
        HlShellInputs in = code_shell (cases[i].form, HL_ENDS_CLOSED,
                                       radius ? HL_SIZE_OUTER_RADIUS : HL_SIZE_OUTER_DIAMETER,
                                       radius ? 0.410 : 0.820, 0.010, 2 * MPA);
        g_autoptr(HlSolution) s = hlt_solve (&in, 11);

        if (s == NULL)
          return;
        hlt_assert_result (s->treq_ug27, cases[i].treq * MM, REL, 0);
        hlt_assert_result (s->mawp_ug27, cases[i].mawp * MPA, REL, 0);
        assert_clause (s->ug27_clause, "Appendix 1-1");
      }
}

static void
test_ug27_corrosion (void)
{
  /* c = 3 mm.  Inside radius entered 397 mm, t = 13 mm: corroded R = 400,
   * t = 10 (REFERENCES.md), so t_req = 9.546539379474941 + 3 =
   * 12.546539379474941 mm and P = 2.0935960591133007 MPa as above.
   * Outer diameter 820 mm, t = 13 mm: Ro is untouched by corrosion,
   * t_req = 9.557109557109557 + 3 = 12.557109557109557 mm, P on the
   * corroded 10 mm wall 2.0935960591133007 MPa. */
  static const struct { HlSizeKind kind; double size, treq; } cases[] = {
    { HL_SIZE_INNER_RADIUS, 0.397, 12.546539379474941 },
    { HL_SIZE_OUTER_DIAMETER, 0.820, 12.557109557109557 },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, cases[i].kind, cases[i].size, 0.013, 2 * MPA);
      g_autoptr(HlSolution) s = NULL;

      in.corrosion_allowance = hl_quantity_make (3, "mm");
      s = hlt_solve (&in, 11);
      if (s == NULL)
        return;
      hlt_assert_result (s->treq_ug27, cases[i].treq * MM, 1e-11, 0);
      hlt_assert_result (s->mawp_ug27, 2.0935960591133007 * MPA, 1e-11, 0);
    }
}

static void
test_joint_efficiency (void)
{
  /* Ej multiplies S: S = 100 MPa with Ej = 0.85 is S = 85 MPa with Ej = 1
   * (the numbers above); Ej = 1 with S = 100 MPa gives
   * t = 800 / (100 - 1.2) = 8.097165991902834 mm and
   * P = 1000 / 406 = 2.4630541871921183 MPa (UG-27(c)(1)); EN 13445-3
   * 7.4.2 e = 1600 / (200 - 2) = 8.080808080808081 mm. */
  HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 0.400, 0.010, 2 * MPA);

  in.joint_efficiency = 1.0;
  in.material.allowable_stress = hl_quantity_make (85, "MPa");
  {
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_result (s->treq_ug27, 9.546539379474941 * MM, REL, 0);
    hlt_assert_result (s->treq_en13445, 9.523809523809524 * MM, REL, 0);
  }
  in.material.allowable_stress = hl_quantity_make (100, "MPa");
  {
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_result (s->treq_ug27, 8.097165991902834 * MM, REL, 0);
    hlt_assert_result (s->mawp_ug27, 2.4630541871921183 * MPA, REL, 0);
    hlt_assert_result (s->treq_en13445, 8.080808080808081 * MM, REL, 0);
  }
}

static void
test_ug27_range (void)
{
  /* UG-27 applies for t <= R/2 and P <= 0.385 S E (cylinders), t <= 0.356 R
   * and P <= 0.665 S E (spheres); outside, the result is not available
   * with a reason pointing to the thick-shell rules, never extrapolated. */

  /* P = 40 MPa > 0.385 x 85 = 32.725 MPa: no required thickness; the
   * design's 10 mm wall (t <= R/2) still has its pressure, 2.0936 MPa,
   * and the design is flagged outside the range. */
  {
    HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 0.400, 0.010, 40 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_na (s->treq_ug27);
    hlt_assert_result (s->mawp_ug27, 2.0935960591133007 * MPA, REL, 0);
    g_assert_true (has_warning (s, "UG-27"));
  }
  /* P = 32.6 MPa, just inside: t = 32.6 x 400 / (85 - 19.56) = 13040 /
   * 65.44 = 199.26650366748166 mm <= R/2 = 200 mm. */
  {
    HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 0.400, 0.010, 32.6 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_result (s->treq_ug27, 199.26650366748166 * MM, 1e-11, 0);
  }
  /* t = R/2 exactly (R = 1 m, t = 0.5 m, binary-exact): in range,
   * P = 85 x 0.5 / (1 + 0.3) = 32.69230769230769 MPa; 1 um more: out. */
  {
    HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 1.0, 0.5, 1 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_result (s->mawp_ug27, 32.69230769230769 * MPA, REL, 0);
  }
  {
    HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 1.0, 0.500001, 1 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_na (s->mawp_ug27);
    g_assert_true (has_warning (s, "UG-27"));
  }
  /* Sphere: P = 60 MPa > 0.665 x 85 = 56.525 MPa, no thickness; a 40 mm
   * wall on R = 100 mm is over 0.356 R = 35.6 mm, no pressure. */
  {
    HlShellInputs in = code_shell (HL_FORM_SPHERE, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 0.400, 0.010, 60 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_na (s->treq_ug27);
  }
  {
    HlShellInputs in = code_shell (HL_FORM_SPHERE, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 0.100, 0.040, 1 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_na (s->mawp_ug27);
  }
  /* Sphere just inside: t = 0.35 R (R = 100, t = 35 mm): P = 2 x 85 x 35
   * / (100 + 7) = 5950 / 107 = 55.607476635514018 MPa. */
  {
    HlShellInputs in = code_shell (HL_FORM_SPHERE, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 0.100, 0.035, 1 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_result (s->mawp_ug27, 55.607476635514018 * MPA, 1e-11, 0);
  }
  /* No net internal pressure: nothing to size (external-pressure rules). */
  {
    HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 0.400, 0.010, 1 * MPA);
    g_autoptr(HlSolution) s = NULL;

    in.external_pressure = hl_quantity_make (2, "MPa");
    s = hlt_solve (&in, 11);
    if (s == NULL)
      return;
    hlt_assert_na (s->treq_ug27);
    hlt_assert_na (s->treq_en13445);
  }
}

static void
test_external_held (void)
{
  /* REFERENCES.md: with the external pressure stated to be always
   * coincident (issue 10: otherwise the internal pressure alone) the
   * formulas take the net pressure, and the maximum allowable pressure
   * is the internal one with the external pressure held.  pi = 3 MPa,
   * po = 1 MPa: UG-27(c)(1) t as for 2 MPa,
   * 9.546539379474941 mm; P = 1 + 2.0935960591133007 MPa; EN 13445-3
   * e = 9.523809523809524 mm, P = 1 + 2.0987654320987654 MPa. */
  HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, 0.400, 0.010, 3 * MPA);
  g_autoptr(HlSolution) s = NULL;

  in.external_pressure = hl_quantity_make (1, "MPa");
  in.external_coincident = TRUE;
  s = hlt_solve (&in, 11);
  if (s == NULL)
    return;
  hlt_assert_result (s->treq_ug27, 9.546539379474941 * MM, REL, 0);
  hlt_assert_result (s->mawp_ug27, 3.0935960591133007 * MPA, REL, 0);
  hlt_assert_result (s->treq_en13445, 9.523809523809524 * MM, REL, 0);
  hlt_assert_result (s->mawp_en13445, 3.0987654320987654 * MPA, REL, 0);
}

static void
test_en13445 (void)
{
  /* EN 13445-3 (from memory), f z = 85 MPa, P = 2 MPa:
   *   7.4.2 cylinder  e = P Di / (2 f z - P) = 1600 / 168 = 9.523809523809524 mm
   *                   e = P De / (2 f z + P) = 1640 / 172 = 9.534883720930232 mm
   *                   Pmax = 2 f z e / Dm = 1700 / 810 = 2.0987654320987654 MPa
   *   7.4.3 sphere    e = P Di / (4 f z - P) = 1600 / 338 = 4.733727810650888 mm
   *                   e = P De / (4 f z + P) = 1640 / 342 = 4.795321637426901 mm
   *                   Pmax = 4 f z e / Dm = 3400 / 810 = 4.197530864197531 MPa
   * (Dm = Di + e = 810 mm for the 10 mm wall either way).  With c = 3 mm
   * on the inside the required thickness grows by 3 mm. */
  static const struct
  {
    HlForm form;
    HlSizeKind kind;
    double size, treq, pmax;
    const char *clause;
  } cases[] = {
    { HL_FORM_CYLINDER, HL_SIZE_INNER_DIAMETER, 0.800, 9.523809523809524, 2.0987654320987654, "7.4.2" },
    { HL_FORM_CYLINDER, HL_SIZE_OUTER_DIAMETER, 0.820, 9.534883720930232, 2.0987654320987654, "7.4.2" },
    { HL_FORM_SPHERE, HL_SIZE_INNER_DIAMETER, 0.800, 4.733727810650888, 4.197530864197531, "7.4.3" },
    { HL_FORM_SPHERE, HL_SIZE_OUTER_DIAMETER, 0.820, 4.795321637426901, 4.197530864197531, "7.4.3" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    for (int corroded = 0; corroded <= 1; corroded++)
      {
        double c = corroded ? 3.0 : 0.0;
        /* the corroded wall is the same 10 mm one: the bore grows by 2c in
         * diameter when an inside size was entered, so enter it smaller */
        double size = cases[i].kind == HL_SIZE_INNER_DIAMETER ? cases[i].size - 2 * c * MM : cases[i].size;
        HlShellInputs in = code_shell (cases[i].form, HL_ENDS_CLOSED, cases[i].kind, size, 0.010 + c * MM, 2 * MPA);
        g_autoptr(HlSolution) s = NULL;

        in.corrosion_allowance = hl_quantity_make (c, "mm");
        s = hlt_solve (&in, 11);
        if (s == NULL)
          return;
        hlt_assert_result (s->treq_en13445, (cases[i].treq + c) * MM, 1e-11, 0);
        hlt_assert_result (s->mawp_en13445, cases[i].pmax * MPA, 1e-11, 0);
        assert_clause (s->en13445_clause, cases[i].clause);
        assert_clause (s->en13445_clause, "EN 13445-3");
      }
}

static void
test_en13445_range (void)
{
  /* 7.4.2 applies for e / De <= 0.16 (REFERENCES.md).  Di = 100 mm:
   * e = 20 mm gives 20 / 140 = 0.143, in range, Pmax = 2 x 85 x 20 / 120 =
   * 28.333333333333333 MPa; e = 25 mm gives 25 / 150 = 0.167, out: not
   * available.  Required thickness at P = 40 MPa: e = 40 x 100 / 130 =
   * 30.77 mm, e / De = 30.77 / 161.5 = 0.19 > 0.16: not available. */
  {
    HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_DIAMETER, 0.100, 0.020, 1 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_result (s->mawp_en13445, 28.333333333333333 * MPA, 1e-11, 0);
  }
  {
    HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_DIAMETER, 0.100, 0.025, 1 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_na (s->mawp_en13445);
    g_assert_true (has_warning (s, "EN 13445"));
  }
  {
    HlShellInputs in = code_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_DIAMETER, 0.100, 0.010, 40 * MPA);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s == NULL)
      return;
    hlt_assert_na (s->treq_en13445);
  }
  /* the low-level rule says the same */
  {
    HlCodeWall wall = { HL_FORM_CYLINDER, HL_ENDS_CLOSED, FALSE, 0.050, 0.075, 0, 1 * MPA, 85 * MPA };
    HlCodeResult r = hl_code_en13445 (&wall);

    g_assert_true (isnan (r.mawp));
    g_assert_nonnull (r.mawp_reason);
    g_assert_true (r.out_of_range);
  }
}

static void
test_barlow (void)
{
  /* Barlow: P = 2 S t / D with D the outside diameter.  S = 85 MPa,
   * t = 10 mm, D = 820 mm: 1700 / 820 = 2.073170731707317 MPa, whether
   * the pipe is entered by its outer or its inner (800 mm) diameter; with
   * c = 3 mm on a 13 mm wall the corroded 10 mm is used.  Spheres are not
   * pipe: not available. */
  static const struct { HlSizeKind kind; double size, t, c; } cases[] = {
    { HL_SIZE_OUTER_DIAMETER, 0.820, 0.010, 0 },
    { HL_SIZE_INNER_DIAMETER, 0.800, 0.010, 0 },
    { HL_SIZE_OUTER_DIAMETER, 0.820, 0.013, 3 },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      HlShellInputs in = hlt_shell (HL_FORM_CYLINDER, HL_ENDS_OPEN, cases[i].kind, cases[i].size, cases[i].t,
                                    1 * MPA, 0);
      g_autoptr(HlSolution) s = NULL;

      in.material.allowable_stress = hl_quantity_make (85, "MPa");
      in.corrosion_allowance = hl_quantity_make (cases[i].c, "mm");
      s = hlt_solve (&in, 11);
      if (s == NULL)
        return;
      hlt_assert_result (s->barlow_pressure, 2.073170731707317 * MPA, 1e-11, 0);
    }
  {
    HlShellInputs in = hlt_shell (HL_FORM_SPHERE, HL_ENDS_CLOSED, HL_SIZE_OUTER_DIAMETER, 0.820, 0.010, 1 * MPA, 0);
    g_autoptr(HlSolution) s = hlt_solve (&in, 11);

    if (s != NULL)
      hlt_assert_na (s->barlow_pressure);
  }
}

int
main (int   argc,
      char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  g_test_set_nonfatal_assertions ();

  g_test_add_func ("/codes/ug27/cylinder", test_ug27_cylinder);
  g_test_add_func ("/codes/ug27/sphere", test_ug27_sphere);
  g_test_add_func ("/codes/ug27/outside-radius", test_ug27_outside);
  g_test_add_func ("/codes/ug27/corrosion", test_ug27_corrosion);
  g_test_add_func ("/codes/ug27/range", test_ug27_range);
  g_test_add_func ("/codes/joint-efficiency", test_joint_efficiency);
  g_test_add_func ("/codes/external-pressure-held", test_external_held);
  g_test_add_func ("/codes/en13445", test_en13445);
  g_test_add_func ("/codes/en13445/range", test_en13445_range);
  g_test_add_func ("/codes/barlow", test_barlow);
  return g_test_run ();
}
