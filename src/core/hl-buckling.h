/* hl-buckling.h — shells under external pressure: classical elastic
 * buckling pressures and the closed-form code allowables
 *
 * SI throughout (m, Pa).  The classical values are for a perfect,
 * elastic shell — theoretical, never an allowable: real shells collapse
 * at a fraction of them, which the code rules' knock-down and safety
 * factors account for.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* Which load the von Mises finite-length solution takes. */
typedef enum
{
  HL_BUCKLING_LATERAL,          /* pressure on the side only (von Mises 1914) */
  HL_BUCKLING_LATERAL_AND_END,  /* hydrostatic: side and ends (von Mises 1929) */
} HlBucklingLoad;

/* Bryan (1888) long tube / Bresse ring: 2 E / (1 - nu^2) (t/D)^3,
 * @D the mean diameter. */
double   hl_buckling_bryan          (double E,
                                     double nu,
                                     double t,
                                     double D);

/* von Mises, simply supported ends a length @L apart, @R the mean
 * radius: the least pressure over whole lobe numbers n >= 2, and that n
 * in @lobes (may be NULL). */
double   hl_buckling_von_mises      (HlBucklingLoad load,
                                     double         E,
                                     double         nu,
                                     double         t,
                                     double         R,
                                     double         L,
                                     guint         *lobes);

/* The same for one lobe number, for a chart or a check by hand. */
double   hl_buckling_von_mises_n    (HlBucklingLoad load,
                                     double         E,
                                     double         nu,
                                     double         t,
                                     double         R,
                                     double         L,
                                     guint          n);

/* Length beyond which a tube buckles as the long tube (Roark, Table 35
 * case 19a): 4.90 R sqrt(R/t). */
double   hl_buckling_critical_length (double t,
                                      double R);

/* Zoelly (1915) sphere: 2 E (t/R)^2 / sqrt(3 (1 - nu^2)). */
double   hl_buckling_zoelly         (double E,
                                     double nu,
                                     double t,
                                     double R);

/* ASME VIII-2 4.4 closed-form allowable external pressure, with the
 * quantities a checker follows. */
typedef struct
{
  double Mx;     /* L / sqrt(Ro t); cylinders only */
  double Ch;     /* cylinders only */
  double Fhe;    /* elastic hoop buckling stress */
  double Fic;    /* predicted buckling stress */
  double FS;     /* design factor (4.4.2) */
  double Fha;    /* allowable hoop compressive stress */
  double Pa;     /* allowable external pressure */
} HlVessel2External;

/* Cylinder, 4.4.5: outside diameter @Do, thickness @t, unsupported
 * length @L, elastic modulus @Ey and yield strength @Sy at temperature. */
void     hl_buckling_viii2_cylinder (double             Do,
                                     double             t,
                                     double             L,
                                     double             Ey,
                                     double             Sy,
                                     HlVessel2External *out);

/* Sphere or hemispherical head, 4.4.7: outside radius @Ro. */
void     hl_buckling_viii2_sphere   (double             Ro,
                                     double             t,
                                     double             Ey,
                                     double             Sy,
                                     HlVessel2External *out);

/* The design factor of ASME VIII-2 4.4.2 for a predicted buckling
 * stress @Fic. */
double   hl_buckling_viii2_factor   (double Fic,
                                     double Sy);

/* ASME VIII-1 UG-28 with the factors A and B the user reads from the
 * code's charts (Hoopline ships no charts).  Cylinders: Do/t >= 10
 * takes Pa = 4 B / (3 Do/t) (or 2 A E / (3 Do/t) when A lies left of
 * the material line: @elastic); Do/t < 10 the lesser of Pa1 and Pa2
 * with S the lesser of twice the allowable stress and 0.9 yield.
 * Spheres: Pa = B / (Ro/t), elastic 0.0625 E / (Ro/t)^2. */
double   hl_buckling_ug28_cylinder  (double   Do,
                                     double   t,
                                     double   A,
                                     double   B,
                                     double   E,
                                     gboolean elastic,
                                     double   allowable,
                                     double   yield);
double   hl_buckling_ug28_sphere    (double   Ro,
                                     double   t,
                                     double   B,
                                     double   E,
                                     gboolean elastic);
/* UG-28(d): A = 0.125 / (Ro/t), the factor to read B with */
double   hl_buckling_ug28_sphere_A  (double   Ro,
                                     double   t);

G_END_DECLS
