/* hl-lame.h — Lamé thick-wall solution and the thin-wall membrane formulas
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-shell.h"

#include <math.h>

G_BEGIN_DECLS

/* One loaded wall, SI units.  A and B are the Lamé constants of the
 * cylinder (radial = A - B/r^2) or C and D of the sphere
 * (radial = C - D/r^3). */
typedef struct
{
  HlForm form;
  HlEnds ends;
  double a, b;
  double pi, po;
  double E, nu;
  double A, B;
  /* the same field split by load: A = qa - qb, B = qa b^n - qb a^n with
   * n = 2 (cylinder) or 3 (sphere).  Evaluating the stresses as
   * qa (1 -/+ b^n/r^n) - qb (1 -/+ a^n/r^n) makes the free-surface
   * conditions exact: radial(b) is 0.0, not 1e-15, when po = 0. */
  double qa, qb, an, bn;
} HlLame;

typedef struct
{
  double radial, hoop, axial;
} HlStress;


void     hl_lame_init            (HlLame       *lame,
                                  HlForm        form,
                                  HlEnds        ends,
                                  double        a,
                                  double        b,
                                  double        pi,
                                  double        po,
                                  double        E,
                                  double        nu);
double   hl_lame_displacement    (const HlLame *lame,
                                  double        r);
/* axial (cylinder) strain; 0 for plane strain and spheres */
double   hl_lame_axial_strain    (const HlLame *lame);
/* Lamé hoop value of largest magnitude in the wall (it sits at a or b) */
double   hl_lame_peak_hoop       (const HlLame *lame);
/* peak equivalent stress in the wall; the equivalent stresses of the
 * Lamé field depend on r only through B/r^2 (D/r^3) and grow with it,
 * so the peak is on a surface and both surfaces are compared. */
double   hl_lame_peak_equivalent (const HlLame *lame,
                                  HlCriterion   criterion);

double   hl_equivalent           (HlStress      s,
                                  HlCriterion   criterion);

/* Thin-wall membrane theory, radial stress zero (common practice). */
double   hl_thin_radius          (HlRadiusBasis basis,
                                  double        a,
                                  double        b);
double   hl_thin_hoop            (HlForm        form,
                                  double        net_pressure,
                                  double        radius,
                                  double        t);
double   hl_thin_axial           (HlForm        form,
                                  HlEnds        ends,
                                  double        nu,
                                  double        hoop);
/* radial growth of the thin shell at @radius (Roark, thin vessels table) */
double   hl_thin_growth          (HlForm        form,
                                  HlEnds        ends,
                                  double        net_pressure,
                                  double        radius,
                                  double        t,
                                  double        E,
                                  double        nu);

/* 100 (thin - Lamé peak) / |Lamé peak| for the chosen measure; NaN when
 * the Lamé peak is zero. */
double   hl_thin_wall_error      (const HlLame    *lame,
                                  HlRadiusBasis    basis,
                                  HlVerdictMeasure measure);

/* Small and called per point through the wall: inline, so a solve at
 * 1,001 points stays well inside its time budget. */
static inline HlStress
hl_lame_stress (const HlLame *lame,
                double        r)
{
  HlStress s;

  if (lame->form == HL_FORM_SPHERE)
    {
      double rn = r * r * r;

      s.radial = lame->qa * (1 - lame->bn / rn) - lame->qb * (1 - lame->an / rn);
      s.hoop = lame->qa * (1 + lame->bn / (2 * rn)) - lame->qb * (1 + lame->an / (2 * rn));
      s.axial = s.hoop; /* both tangential directions */
      return s;
    }
  {
    double rn = r * r;

    s.radial = lame->qa * (1 - lame->bn / rn) - lame->qb * (1 - lame->an / rn);
    s.hoop = lame->qa * (1 + lame->bn / rn) - lame->qb * (1 + lame->an / rn);
    switch (lame->ends)
      {
      case HL_ENDS_CLOSED:
        s.axial = lame->A;
        break;
      case HL_ENDS_OPEN:
        s.axial = 0.0;
        break;
      case HL_ENDS_PLANE_STRAIN:
      default:
        s.axial = 2.0 * lame->nu * lame->A;
        break;
      }
  }
  return s;
}

static inline double
hl_von_mises (HlStress s)
{
  double d1 = s.hoop - s.radial, d2 = s.radial - s.axial, d3 = s.axial - s.hoop;

  return sqrt ((d1 * d1 + d2 * d2 + d3 * d3) / 2.0);
}

static inline double
hl_tresca (HlStress s)
{
  double hi = MAX (s.hoop, MAX (s.radial, s.axial));
  double lo = MIN (s.hoop, MIN (s.radial, s.axial));

  return hi - lo;
}

G_END_DECLS
