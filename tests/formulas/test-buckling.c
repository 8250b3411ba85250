/* test-buckling.c — external pressure: classical buckling and the code
 * allowables against the check values of METHODS-NEXT.md §B
 *
 * Each value is marked as METHODS-NEXT marks it: "confirmed" (a named
 * public source), "computed" (worked from the formula there, by another
 * program than this one), "from memory".  The lobe minimisation is also
 * checked by brute force here, independently of the engine's scan.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-buckling"

#include "hl-test-formulas.h"
#include "hl-buckling.h"

#include <math.h>

#define MM  1e-3
#define MPA 1e6
#define GPA 1e9

/* METHODS-NEXT B.1, computed: E = 200 GPa, nu = 0.3, R = 500, t = 10 */
#define E0  (200 * GPA)
#define NU0 0.3
#define R0  (500 * MM)
#define T0  (10 * MM)

static void
test_bryan (void)
{
  /* B.1 computed: 0.43956 MPa; Roark Table 35 case 19a (confirmed):
   * q' = (1/4) E/(1 - nu^2) (t/r)^3 with r the mean radius — the same
   * formula in the radius */
  double p = hl_buckling_bryan (E0, NU0, T0, 2 * R0);

  hlt_assert_close (p / MPA, 0.43956, 5e-5, 0);
  hlt_assert_close (p, 0.25 * E0 / (1 - NU0 * NU0) * pow (T0 / R0, 3), 1e-13, 0);
  /* B.1 computed: critical length 4.90 r sqrt(r/t) = 17,324 mm */
  hlt_assert_close (hl_buckling_critical_length (T0, R0) / MM, 17324, 5e-5, 0);
}

static void
test_von_mises (void)
{
  /* B.1 computed, lateral + end / lateral only, with the lobe number */
  static const struct { double L_mm, both, lateral; guint n; } cases[] = {
    { 1000, 5.34676, 5.50238, 5 },
    { 2000, 2.69436, 2.73226, 4 },
    { 5000, 1.22198, 1.23632, 2 },
    { 10000, 0.49490, 0.49569, 2 },
    { 1e6, 0.43956, 0.43956, 2 },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      guint n_both = 0, n_lat = 0;
      double L = cases[i].L_mm * MM;
      double both = hl_buckling_von_mises (HL_BUCKLING_LATERAL_AND_END, E0, NU0, T0, R0, L, &n_both);
      double lateral = hl_buckling_von_mises (HL_BUCKLING_LATERAL, E0, NU0, T0, R0, L, &n_lat);

      hlt_assert_close (both / MPA, cases[i].both, 5e-5, 0);
      hlt_assert_close (lateral / MPA, cases[i].lateral, 5e-5, 0);
      g_assert_cmpuint (n_both, ==, cases[i].n);
      g_assert_cmpuint (n_lat, ==, cases[i].n);
    }
}

/* The minimum over n by brute force, written again here: for a fine
 * grid of lengths, no lobe number from 2 to 2000 gives less than the
 * engine's answer, and the engine's n gives exactly its answer; past the
 * critical length the minimum approaches Bryan from above (common
 * practice: a long tube buckles in two lobes). */
static void
test_lobes_brute_force (void)
{
  double bryan = hl_buckling_bryan (E0, NU0, T0, 2 * R0);

  for (double L = 100 * MM; L < 200000 * MM; L *= 1.07)
    for (int load = 0; load < 2; load++)
      {
        guint n = 0;
        double p = hl_buckling_von_mises (load, E0, NU0, T0, R0, L, &n);
        double least = INFINITY;

        for (guint k = 2; k <= 2000; k++)
          least = MIN (least, hl_buckling_von_mises_n (load, E0, NU0, T0, R0, L, k));
        hlt_assert_close (p, least, 1e-15, 0);
        hlt_assert_close (p, hl_buckling_von_mises_n (load, E0, NU0, T0, R0, L, n), 1e-15, 0);
        g_assert_cmpfloat (p, >=, bryan * (1 - 1e-12));
        if (L > 3 * hl_buckling_critical_length (T0, R0))
          g_assert_cmpuint (n, ==, 2);
      }
}

static void
test_zoelly (void)
{
  /* B.1, sphere R = 1000, t = 10: 24.2091 MPa (computed); 1.2105 E (t/R)^2
   * for nu = 0.3 (from memory) and EN's 1.21 E ea^2/R^2 (confirmed) */
  double p = hl_buckling_zoelly (E0, NU0, T0, 1000 * MM);

  hlt_assert_close (p / MPA, 24.2091, 5e-6, 0);
  hlt_assert_close (p / (E0 * 1e-4), 1.2105, 5e-5, 0);
}

static void
test_viii2_cylinder (void)
{
  HlVessel2External x;

  /* B.4, the public printout case (confirmed): Do = 8117, t = 57,
   * L = 60000, Ey = 204100, Sy = 344.8: Mx 124.747, Ch 0.0067861,
   * Fhe 15.562, Fha 7.781, Pa = 0.10928 (printout 0.109) */
  hl_buckling_viii2_cylinder (8117 * MM, 57 * MM, 60000 * MM, 204100 * MPA, 344.8 * MPA, &x);
  hlt_assert_close (x.Mx, 124.747, 5e-6, 0);
  hlt_assert_close (x.Ch, 0.0067861, 5e-5, 0);
  hlt_assert_close (x.Fhe / MPA, 15.562, 5e-5, 0);
  hlt_assert_close (x.FS, 2.0, 0, 0);
  hlt_assert_close (x.Fha / MPA, 7.781, 5e-5, 0);
  hlt_assert_close (x.Pa / MPA, 0.10928, 5e-5, 0);

  /* B.4 computed: Do = 1010, t = 10, L = 2000, E = 200 GPa, Sy = 250 */
  hl_buckling_viii2_cylinder (1010 * MM, 10 * MM, 2000 * MM, 200 * GPA, 250 * MPA, &x);
  hlt_assert_close (x.Mx, 28.1439, 5e-6, 0);
  hlt_assert_close (x.Ch, 0.032792, 5e-5, 0);
  hlt_assert_close (x.Fhe / MPA, 103.896, 5e-6, 0);
  hlt_assert_close (x.Pa / MPA, 1.02867, 5e-6, 0);
  /* ... and L = 1e6: the long-cylinder branch Ch = 0.55 t/Do */
  hl_buckling_viii2_cylinder (1010 * MM, 10 * MM, 1e6 * MM, 200 * GPA, 250 * MPA, &x);
  hlt_assert_close (x.Ch, 0.55 * 10 / 1010, 1e-14, 0);
  hlt_assert_close (x.Pa / MPA, 0.17082, 5e-5, 0);

  /* B.4 computed, the inelastic branch: Do = 219.1, t = 8.18, L = 3000 */
  hl_buckling_viii2_cylinder (219.1 * MM, 8.18 * MM, 3000 * MM, 200 * GPA, 250 * MPA, &x);
  hlt_assert_close (x.Fhe / MPA, 245.321, 5e-6, 0);
  hlt_assert_close (x.Fhe / (250 * MPA), 0.9813, 5e-5, 0);
  hlt_assert_close (x.Fic / MPA, 173.682, 5e-6, 0);
  hlt_assert_close (x.FS, 1.89221, 5e-6, 0);
  hlt_assert_close (x.Pa / MPA, 6.85375, 5e-6, 0);
}

/* B.4: the branches of Ch meet within 1.6 % and those of Fic and FS
 * within 0.2 % (computed) — so a branch slip shows as a jump */
static void
test_viii2_continuity (void)
{
  double Do = 1010 * MM, t = 10 * MM, Ro = Do / 2;
  double breaks[] = { 1.5, 13, 2 * pow (Do / t, 0.94) };

  for (guint i = 0; i < G_N_ELEMENTS (breaks); i++)
    {
      HlVessel2External below, above;
      double L = breaks[i] * sqrt (Ro * t);

      hl_buckling_viii2_cylinder (Do, t, L * (1 - 1e-9), 200 * GPA, 250 * MPA, &below);
      hl_buckling_viii2_cylinder (Do, t, L * (1 + 1e-9), 200 * GPA, 250 * MPA, &above);
      g_assert_cmpfloat (fabs (above.Ch / below.Ch - 1), <, 0.017);
    }
  /* Fic at Fhe/Sy = 0.552 and 2.439; FS at Fic = 0.55 Sy and Sy */
  g_assert_cmpfloat (fabs (0.7 * pow (0.552, 0.4) / 0.552 - 1), <, 0.002);
  g_assert_cmpfloat (fabs (0.7 * pow (2.439, 0.4) - 1), <, 0.002);
  g_assert_cmpfloat (fabs (hl_buckling_viii2_factor (0.55 * (1 + 1e-9), 1) / 2.0 - 1), <, 0.002);
  g_assert_cmpfloat (fabs (hl_buckling_viii2_factor (1 - 1e-9, 1) / 1.667 - 1), <, 0.002);
}

static void
test_viii2_sphere (void)
{
  HlVessel2External x;

  /* B.4 computed (sphere rule from memory): Ro = 1005, t = 10, Sy = 250 */
  hl_buckling_viii2_sphere (1005 * MM, 10 * MM, 200 * GPA, 250 * MPA, &x);
  hlt_assert_close (x.Fhe / MPA, 149.254, 5e-6, 0);
  hlt_assert_close (x.Fic / MPA, 139.366, 5e-6, 0);
  hlt_assert_close (x.FS, 1.99392, 5e-6, 0);
  hlt_assert_close (x.Pa / MPA, 1.39095, 5e-6, 0);
  hl_buckling_viii2_sphere (2005 * MM, 10 * MM, 200 * GPA, 250 * MPA, &x);
  hlt_assert_close (x.FS, 2.0, 0, 0);
  hlt_assert_close (x.Pa / MPA, 0.37313, 5e-5, 0);
}

static void
test_ug28 (void)
{
  /* B.3 computed: sphere Ro = 1005, t = 10: A = 0.0012438; elastic
   * Pa = 0.0625 E / (Ro/t)^2 = 1.2376 MPa */
  hlt_assert_close (hl_buckling_ug28_sphere_A (1005 * MM, 10 * MM), 0.0012438, 5e-5, 0);
  hlt_assert_close (hl_buckling_ug28_sphere (1005 * MM, 10 * MM, 0, 200 * GPA, TRUE) / MPA, 1.2376, 5e-5, 0);
  /* B.3 confirmed forms, hand arithmetic: Pa = B / (Ro/t) with B = 80 MPa
   * read by the user: 80 / 100.5 = 0.79602 MPa */
  hlt_assert_close (hl_buckling_ug28_sphere (1005 * MM, 10 * MM, 80 * MPA, 200 * GPA, FALSE) / MPA, 80 / 100.5, 1e-13,
                    0);
  /* cylinders, Do/t = 101 >= 10: Pa = 4 B / (3 Do/t) = 4 × 60 / 303 MPa;
   * elastic: 2 A E / (3 Do/t) with A = 0.0002: 2 × 0.0002 × 200000 / 303 */
  hlt_assert_close (hl_buckling_ug28_cylinder (1010 * MM, 10 * MM, 0, 60 * MPA, 200 * GPA, FALSE, 138 * MPA,
                                               260 * MPA) / MPA,
                    4 * 60.0 / 303, 1e-13, 0);
  hlt_assert_close (hl_buckling_ug28_cylinder (1010 * MM, 10 * MM, 0.0002, 0, 200 * GPA, TRUE, 138 * MPA, 260 * MPA)
                      / MPA,
                    2 * 0.0002 * 200000 / 303, 1e-13, 0);
  /* Do/t = 8 < 10: Pa1 = (2.167/8 - 0.0833) B, Pa2 = 2 S/8 (1 - 1/8),
   * S = min(2 × 138, 0.9 × 260) = 234 MPa; B = 100 MPa gives Pa1 =
   * 18.7575 < Pa2 = 51.1875 */
  hlt_assert_close (hl_buckling_ug28_cylinder (80 * MM, 10 * MM, 0, 100 * MPA, 200 * GPA, FALSE, 138 * MPA,
                                               260 * MPA) / MPA,
                    (2.167 / 8 - 0.0833) * 100, 1e-13, 0);
  hlt_assert_close (hl_buckling_ug28_cylinder (80 * MM, 10 * MM, 0, 1000 * MPA, 200 * GPA, FALSE, 138 * MPA,
                                               260 * MPA) / MPA,
                    2 * 234.0 / 8 * (1 - 1.0 / 8), 1e-13, 0);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/buckling/bryan", test_bryan);
  g_test_add_func ("/buckling/von-mises", test_von_mises);
  g_test_add_func ("/buckling/lobes-brute-force", test_lobes_brute_force);
  g_test_add_func ("/buckling/zoelly", test_zoelly);
  g_test_add_func ("/buckling/viii2-cylinder", test_viii2_cylinder);
  g_test_add_func ("/buckling/viii2-continuity", test_viii2_continuity);
  g_test_add_func ("/buckling/viii2-sphere", test_viii2_sphere);
  g_test_add_func ("/buckling/ug28", test_ug28);
  return g_test_run ();
}
