/* hl-buckling.c — shells under external pressure
 *
 * Sources, as METHODS-NEXT.md §B marks them: Bryan (1888) and the
 * critical length from Roark, Table 35 case 19a (confirmed); von Mises
 * (1914, 1929) finite-length solutions, Zoelly (1915) sphere (from
 * memory, checked against computed values); ASME VIII-2 4.4.5 cylinder
 * (the branch of the public printout confirmed, the others from memory)
 * and 4.4.7 sphere (from memory); ASME VIII-1 UG-28 with chart factors
 * the user reads (confirmed forms).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-buckling"

#include "hl-buckling.h"

#include <math.h>

/* Beyond this many lobes the bending term has long outgrown the
 * membrane term for any wall a pressure shell has (R/t up to 10^4). */
#define MAX_LOBES 400

double
hl_buckling_bryan (double E,
                   double nu,
                   double t,
                   double D)
{
  return 2 * E / (1 - nu * nu) * pow (t / D, 3);
}

double
hl_buckling_von_mises_n (HlBucklingLoad load,
                         double         E,
                         double         nu,
                         double         t,
                         double         R,
                         double         L,
                         guint          n)
{
  double n2 = (double) n * n, bend = t * t / (12 * R * R * (1 - nu * nu));

  if (load == HL_BUCKLING_LATERAL_AND_END)
    {
      double Z = G_PI * R / L, Z2 = Z * Z;
      double eps = 1 / (n2 - 1 + Z2 / 2)
                   * (1 / pow (n2 / Z2 + 1, 2) + bend * pow (n2 - 1 + Z2, 2));

      return E * t * eps / R;
    }
  {
    double w = 1 + pow (n * L / (G_PI * R), 2);

    return E * t / R * (1 / ((n2 - 1) * w * w) + bend * (n2 - 1 + (2 * n2 - 1 - nu) / w));
  }
}

double
hl_buckling_von_mises (HlBucklingLoad load,
                       double         E,
                       double         nu,
                       double         t,
                       double         R,
                       double         L,
                       guint         *lobes)
{
  double best = INFINITY;
  guint best_n = 2;

  /* every whole n: the curve over n has one minimum, but the scan is
   * cheap and needs no argument about where it lies */
  for (guint n = 2; n <= MAX_LOBES; n++)
    {
      double p = hl_buckling_von_mises_n (load, E, nu, t, R, L, n);

      if (p < best)
        {
          best = p;
          best_n = n;
        }
    }
  if (lobes != NULL)
    *lobes = best_n;
  return best;
}

double
hl_buckling_critical_length (double t,
                             double R)
{
  return 4.90 * R * sqrt (R / t);
}

double
hl_buckling_zoelly (double E,
                    double nu,
                    double t,
                    double R)
{
  return 2 * E * (t / R) * (t / R) / sqrt (3 * (1 - nu * nu));
}

double
hl_buckling_viii2_factor (double Fic,
                          double Sy)
{
  if (Fic <= 0.55 * Sy)
    return 2.0;
  if (Fic < Sy)
    return 2.407 - 0.741 * Fic / Sy;
  return 1.667;
}

/* 4.4.2: the design factor on the predicted stress, and the pressure
 * the allowable hoop stress carries across a wall of radius @radius */
static void
allowable_from (HlVessel2External *out,
                double             Sy,
                double             t,
                double             radius)
{
  out->FS = hl_buckling_viii2_factor (out->Fic, Sy);
  out->Fha = out->Fic / out->FS;
  out->Pa = 2 * out->Fha * t / radius;
}

void
hl_buckling_viii2_cylinder (double             Do,
                            double             t,
                            double             L,
                            double             Ey,
                            double             Sy,
                            HlVessel2External *out)
{
  double Ro = Do / 2, ratio;

  out->Mx = L / sqrt (Ro * t);
  /* the branches by the code's inequalities, never blended */
  if (out->Mx <= 1.5)
    out->Ch = 1.0;
  else if (out->Mx <= 13)
    out->Ch = 0.92 / (out->Mx - 0.579);
  else if (out->Mx < 2 * pow (Do / t, 0.94))
    out->Ch = 1.12 * pow (out->Mx, -1.058);
  else
    out->Ch = 0.55 * t / Do;
  out->Fhe = 1.6 * out->Ch * Ey * t / Do;
  ratio = out->Fhe / Sy;
  if (ratio <= 0.552)
    out->Fic = out->Fhe;
  else if (ratio < 2.439)
    out->Fic = 0.7 * Sy * pow (ratio, 0.4);
  else
    out->Fic = Sy;
  allowable_from (out, Sy, t, Do);
}

void
hl_buckling_viii2_sphere (double             Ro,
                          double             t,
                          double             Ey,
                          double             Sy,
                          HlVessel2External *out)
{
  double ratio;

  out->Mx = NAN;
  out->Ch = NAN;
  out->Fhe = 0.075 * Ey * t / Ro;
  ratio = out->Fhe / Sy;
  if (ratio <= 0.55)
    out->Fic = out->Fhe;
  else if (ratio <= 1.6)
    out->Fic = 0.18 * out->Fhe + 0.45 * Sy;
  else if (ratio < 6.25)
    out->Fic = 1.31 * Sy / (1.15 + Sy / out->Fhe);
  else
    out->Fic = Sy;
  allowable_from (out, Sy, t, Ro);
}

double
hl_buckling_ug28_cylinder (double   Do,
                           double   t,
                           double   A,
                           double   B,
                           double   E,
                           gboolean elastic,
                           double   allowable,
                           double   yield)
{
  double r = Do / t;

  if (r >= 10)
    return elastic ? 2 * A * E / (3 * r) : 4 * B / (3 * r);
  {
    double S = MIN (2 * allowable, 0.9 * yield);
    double Pa1 = (2.167 / r - 0.0833) * B;
    double Pa2 = 2 * S / r * (1 - 1 / r);

    return MIN (Pa1, Pa2);
  }
}

double
hl_buckling_ug28_sphere (double   Ro,
                         double   t,
                         double   B,
                         double   E,
                         gboolean elastic)
{
  double r = Ro / t;

  return elastic ? 0.0625 * E / (r * r) : B / r;
}

double
hl_buckling_ug28_sphere_A (double Ro,
                           double t)
{
  return 0.125 / (Ro / t);
}
