/* hl-test-formulas.c — shared helpers of the formula tests
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-test-formulas"

#include "hl-test-formulas.h"
#include "hl-lame.h"

#include <math.h>

HlShellInputs
hlt_shell (HlForm     form,
           HlEnds     ends,
           HlSizeKind kind,
           double     size_m,
           double     t_m,
           double     pi_pa,
           double     po_pa)
{
  HlShellInputs in = hl_shell_inputs_default ();

  in.form = form;
  in.ends = ends;
  in.size_kind = kind;
  in.size = hl_quantity_make (size_m, "m");
  in.wall_thickness = hl_quantity_make (t_m, "m");
  in.corrosion_allowance = hl_quantity_make (0, "m");
  in.internal_pressure = hl_quantity_make (pi_pa, "Pa");
  in.external_pressure = hl_quantity_make (po_pa, "Pa");
  in.material.elastic_modulus = hl_quantity_make (HLT_E, "Pa");
  in.material.poisson_ratio = HLT_NU;
  in.material.yield_strength = hl_quantity_make (HLT_YIELD, "Pa");
  in.material.allowable_stress = hl_quantity_make (HLT_ALLOW, "Pa");
  in.joint_efficiency = 1.0;
  /* the tests of the thin-wall error and its ratio check the hoop
   * measure by name; "both", the default since format 1.2, is checked
   * in tests/core/test-design-check.c */
  in.verdict_measure = HL_MEASURE_HOOP;
  return in;
}

HltClosed
hlt_closed_form (HlForm form,
                 HlEnds ends,
                 double a,
                 double b,
                 double pi,
                 double po,
                 double r)
{
  const double E = HLT_E, nu = HLT_NU;
  HltClosed c;

  if (form == HL_FORM_SPHERE)
    {
      double C = (pi * pow (a, 3) - po * pow (b, 3)) / (pow (b, 3) - pow (a, 3));
      double D = (pi - po) * pow (a, 3) * pow (b, 3) / (pow (b, 3) - pow (a, 3));

      c.radial = C - D / pow (r, 3);
      c.hoop = C + D / (2 * pow (r, 3));
      c.axial = c.hoop;
      c.u = ((1 - 2 * nu) * C * r + (1 + nu) * D / (2 * r * r)) / E;
      return c;
    }
  {
    double A = (pi * a * a - po * b * b) / (b * b - a * a);
    double B = (pi - po) * a * a * b * b / (b * b - a * a);

    c.radial = A - B / (r * r);
    c.hoop = A + B / (r * r);
    switch (ends)
      {
      case HL_ENDS_CLOSED:
        c.axial = A;
        c.u = ((1 - 2 * nu) * A * r + (1 + nu) * B / r) / E;
        break;
      case HL_ENDS_OPEN:
        c.axial = 0;
        c.u = ((1 - nu) * A * r + (1 + nu) * B / r) / E;
        break;
      case HL_ENDS_PLANE_STRAIN:
      default:
        c.axial = 2 * nu * A;
        c.u = (1 + nu) / E * ((1 - 2 * nu) * A * r + B / r);
        break;
      }
  }
  return c;
}

double
hlt_thin_wall_error (HlForm           form,
                     HlEnds           ends,
                     HlRadiusBasis    basis,
                     HlVerdictMeasure measure,
                     double           a,
                     double           b,
                     double           pi,
                     double           po)
{
  double t = b - a;
  double R = basis == HL_BASIS_INNER ? a : basis == HL_BASIS_OUTER ? b : (a + b) / 2;
  double hoop = (pi - po) * R / t / (form == HL_FORM_SPHERE ? 2 : 1);
  HltClosed ca = hlt_closed_form (form, ends, a, b, pi, po, a);
  HltClosed cb = hlt_closed_form (form, ends, a, b, pi, po, b);

  if (measure == HL_MEASURE_HOOP)
    {
      /* the Lamé hoop value of largest magnitude, at a or b */
      double peak = fabs (ca.hoop) >= fabs (cb.hoop) ? ca.hoop : cb.hoop;

      return 100 * (hoop - peak) / fabs (peak);
    }
  {
    /* thin-wall von Mises with radial = 0 against the Lamé peak, which
     * sits on a surface (von Mises is convex in B/r^2, D/r^3) */
    double axial = form == HL_FORM_SPHERE ? hoop
                   : ends == HL_ENDS_CLOSED ? hoop / 2
                   : ends == HL_ENDS_OPEN ? 0 : HLT_NU * hoop;
    HlStress thin = { 0, hoop, axial };
    HlStress sa = { ca.radial, ca.hoop, ca.axial };
    HlStress sb = { cb.radial, cb.hoop, cb.axial };
    double peak = MAX (hl_von_mises (sa), hl_von_mises (sb));

    return 100 * (hl_von_mises (thin) - peak) / peak;
  }
}

double
hlt_limit_pressure (HlForm      form,
                    HlEnds      ends,
                    HlCriterion criterion,
                    double      k,
                    double      limit)
{
  /*  closed cylinder: von Mises limit (1 - 1/k^2) / sqrt 3, Tresca
   *    limit (1 - 1/k^2) / 2 (REFERENCES.md; Timoshenko, Part II);
   *  open cylinder: von Mises limit (k^2 - 1) / sqrt(3 k^4 + 1) (from
   *    memory; at the bore von Mises^2 = 3 (B/a^2)^2 + A^2 confirms it);
   *  plane strain: the same bore algebra with s_z = 2 nu A gives
   *    von Mises^2 = 3 (B/a^2)^2 + (1 - 2 nu)^2 A^2, so
   *    limit (k^2 - 1) / sqrt(3 k^4 + (1 - 2 nu)^2) (derived here);
   *  open and plane strain Tresca: s_z lies between s_r and s_t at the
   *    bore, so as closed ends (derived here);
   *  sphere: (2/3) limit (1 - 1/k^3), both criteria (REFERENCES.md;
   *    Timoshenko, Part II). */
  if (form == HL_FORM_SPHERE)
    return 2.0 / 3.0 * limit * (1 - 1 / (k * k * k));
  if (criterion == HL_CRITERION_TRESCA)
    return limit * (1 - 1 / (k * k)) / 2;
  switch (ends)
    {
    case HL_ENDS_CLOSED:
      return limit * (1 - 1 / (k * k)) / sqrt (3);
    case HL_ENDS_OPEN:
      return limit * (k * k - 1) / sqrt (3 * pow (k, 4) + 1);
    case HL_ENDS_PLANE_STRAIN:
    default:
      return limit * (k * k - 1) / sqrt (3 * pow (k, 4) + pow (1 - 2 * HLT_NU, 2));
    }
}

HlSolution *
hlt_solve (const HlShellInputs *in,
           guint                n_points)
{
  g_autoptr(GError) error = NULL;
  HlSolution *s = hl_solve (in, n_points, TRUE, &error);

  if (s == NULL)
    g_test_fail_printf ("hl_solve refused valid inputs: %s",
                        error != NULL ? error->message : "(no error)");
  return s;
}

gboolean
hlt_check_close (const char *file,
                 int         line,
                 const char *what,
                 double      got,
                 double      want,
                 double      rel_tol,
                 double      abs_tol)
{
  double diff = fabs (got - want);
  double allowed = MAX (rel_tol * fabs (want), abs_tol);

  if (isfinite (got) && diff <= allowed)
    return TRUE;
  g_test_fail_printf ("%s:%d: %s = %.17g, expected %.17g (difference %.3g, allowed %.3g)",
                      file, line, what, got, want, diff, allowed);
  return FALSE;
}

gboolean
hlt_check_result (const char *file,
                  int         line,
                  const char *what,
                  HlResult    got,
                  double      want,
                  double      rel_tol,
                  double      abs_tol)
{
  if (got.reason != NULL)
    {
      g_test_fail_printf ("%s:%d: %s is not available ('%s'), expected %.17g",
                          file, line, what, got.reason, want);
      return FALSE;
    }
  return hlt_check_close (file, line, what, got.value, want, rel_tol, abs_tol);
}

gboolean
hlt_check_na (const char *file,
              int         line,
              const char *what,
              HlResult    got)
{
  if (isnan (got.value) && got.reason != NULL && got.reason[0] != '\0')
    return TRUE;
  g_test_fail_printf ("%s:%d: %s should be not available with a reason, got %.17g (reason %s)",
                      file, line, what, got.value, got.reason != NULL ? got.reason : "none");
  return FALSE;
}

char *
hlt_unwrap (const char *text)
{
  GString *out = g_string_new (NULL);

  for (const char *p = text; *p != '\0'; p++)
    {
      if (*p != '\n')
        {
          g_string_append_c (out, *p);
          continue;
        }
      /* the break, the indent and a table's or a box's margin */
      while (p[1] == ' ' || p[1] == '|')
        p++;
      g_string_append_c (out, ' ');
    }
  return g_string_free (out, FALSE);
}
