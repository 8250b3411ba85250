/* hl-lame.c — Lamé thick-wall solution and the thin-wall membrane formulas
 *
 * Cylinder: Timoshenko, Strength of Materials Part II, and Lai, Rubin &
 * Krempl, Introduction to Continuum Mechanics §5.18.  Sphere: Lai, Rubin &
 * Krempl §5.21.  Thin-wall growth: Roark's Formulas for Stress and Strain,
 * thin vessels table.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-lame"

#include "hl-lame.h"

#include <math.h>

void
hl_lame_init (HlLame *lame,
              HlForm  form,
              HlEnds  ends,
              double  a,
              double  b,
              double  pi,
              double  po,
              double  E,
              double  nu)
{
  lame->form = form;
  lame->ends = ends;
  lame->a = a;
  lame->b = b;
  lame->pi = pi;
  lame->po = po;
  lame->E = E;
  lame->nu = nu;
  if (form == HL_FORM_SPHERE)
    {
      double a3 = a * a * a, b3 = b * b * b;
      /* b^3 - a^3 written as a product keeps precision when b is close to a */
      double d = (b - a) * (b * b + a * b + a * a);

      lame->A = (pi * a3 - po * b3) / d;
      lame->B = (pi - po) * a3 * b3 / d;
      lame->qa = pi * a3 / d;
      lame->qb = po * b3 / d;
      lame->an = a3;
      lame->bn = b3;
    }
  else
    {
      double a2 = a * a, b2 = b * b;
      double d = (b - a) * (b + a);

      lame->A = (pi * a2 - po * b2) / d;
      lame->B = (pi - po) * a2 * b2 / d;
      lame->qa = pi * a2 / d;
      lame->qb = po * b2 / d;
      lame->an = a2;
      lame->bn = b2;
    }
}


double
hl_lame_displacement (const HlLame *lame,
                      double        r)
{
  double E = lame->E, nu = lame->nu, A = lame->A, B = lame->B;

  if (lame->form == HL_FORM_SPHERE)
    return ((1 - 2 * nu) * A * r + (1 + nu) * B / (2 * r * r)) / E;
  switch (lame->ends)
    {
    case HL_ENDS_CLOSED:
      return ((1 - 2 * nu) * A * r + (1 + nu) * B / r) / E;
    case HL_ENDS_OPEN:
      return ((1 - nu) * A * r + (1 + nu) * B / r) / E;
    case HL_ENDS_PLANE_STRAIN:
    default:
      return (1 + nu) / E * ((1 - 2 * nu) * A * r + B / r);
    }
}

double
hl_lame_axial_strain (const HlLame *lame)
{
  /* Hooke's law with sigma_r + sigma_theta = 2A through the wall */
  if (lame->form == HL_FORM_SPHERE)
    return 0.0;
  switch (lame->ends)
    {
    case HL_ENDS_CLOSED:
      return (1 - 2 * lame->nu) * lame->A / lame->E;
    case HL_ENDS_OPEN:
      return -2 * lame->nu * lame->A / lame->E;
    case HL_ENDS_PLANE_STRAIN:
    default:
      return 0.0;
    }
}

double
hl_lame_peak_hoop (const HlLame *lame)
{
  double inner = hl_lame_stress (lame, lame->a).hoop;
  double outer = hl_lame_stress (lame, lame->b).hoop;

  return fabs (inner) >= fabs (outer) ? inner : outer;
}



double
hl_equivalent (HlStress    s,
               HlCriterion criterion)
{
  return criterion == HL_CRITERION_TRESCA ? hl_tresca (s) : hl_von_mises (s);
}

double
hl_lame_peak_equivalent (const HlLame *lame,
                         HlCriterion   criterion)
{
  double inner = hl_equivalent (hl_lame_stress (lame, lame->a), criterion);
  double outer = hl_equivalent (hl_lame_stress (lame, lame->b), criterion);

  return MAX (inner, outer);
}

double
hl_thin_radius (HlRadiusBasis basis,
                double        a,
                double        b)
{
  switch (basis)
    {
    case HL_BASIS_INNER:
      return a;
    case HL_BASIS_OUTER:
      return b;
    case HL_BASIS_MEAN:
    default:
      return (a + b) / 2.0;
    }
}

double
hl_thin_hoop (HlForm form,
              double net_pressure,
              double radius,
              double t)
{
  double hoop = net_pressure * radius / t;

  return form == HL_FORM_SPHERE ? hoop / 2.0 : hoop;
}

double
hl_thin_axial (HlForm form,
               HlEnds ends,
               double nu,
               double hoop)
{
  if (form == HL_FORM_SPHERE)
    return hoop;
  switch (ends)
    {
    case HL_ENDS_CLOSED:
      return hoop / 2.0;
    case HL_ENDS_OPEN:
      return 0.0;
    case HL_ENDS_PLANE_STRAIN:
    default:
      return nu * hoop;
    }
}

double
hl_thin_growth (HlForm form,
                HlEnds ends,
                double p,
                double R,
                double t,
                double E,
                double nu)
{
  double base = p * R * R / (E * t);

  if (form == HL_FORM_SPHERE)
    return base * (1 - nu) / 2.0;
  switch (ends)
    {
    case HL_ENDS_CLOSED:
      return base * (2 - nu) / 2.0;
    case HL_ENDS_OPEN:
      return base;
    case HL_ENDS_PLANE_STRAIN:
    default:
      /* hoop strain with axial strain held at zero */
      return base * (1 - nu * nu);
    }
}

double
hl_thin_wall_error (const HlLame    *lame,
                    HlRadiusBasis    basis,
                    HlVerdictMeasure measure)
{
  double t = lame->b - lame->a;
  double R = hl_thin_radius (basis, lame->a, lame->b);
  double hoop = hl_thin_hoop (lame->form, lame->pi - lame->po, R, t);
  double thin, exact;

  if (measure == HL_MEASURE_EQUIVALENT)
    {
      HlStress s = { 0.0, hoop, hl_thin_axial (lame->form, lame->ends, lame->nu, hoop) };

      thin = hl_von_mises (s);
      exact = hl_lame_peak_equivalent (lame, HL_CRITERION_VON_MISES);
    }
  else
    {
      thin = hoop;
      exact = hl_lame_peak_hoop (lame);
    }
  if (exact == 0.0 || !isfinite (exact))
    return NAN;
  return 100.0 * (thin - exact) / fabs (exact);
}
