/* test-gsl-independent.c — the engine against an independent numerical
 * solution computed with the GNU Scientific Library
 *
 * The thick wall is solved here without any closed form: the radial
 * equilibrium equation, Hooke's law and the strain-displacement relations
 * (which make the strains compatible) are integrated as an ODE in r with
 * gsl_odeiv2, and the boundary conditions radial(a) = -pi, radial(b) = -po
 * are met by shooting on u(a) with gsl_root_fsolver_brent.  For closed
 * and open cylinders the uniform axial strain is a second unknown, fixed
 * by the end thrust (closed) or by zero axial force (open), found by an
 * outer Brent root; plane strain has it zero.  (Timoshenko & Goodier,
 * Theory of Elasticity, axisymmetric and spherically symmetric problems;
 * REFERENCES.md, "Independent checks".)
 *
 * The limits found by root finding (ratio_for_tolerance, maximum pressure,
 * required thickness) are re-found with GSL's Brent solver on the
 * REFERENCES.md definitions, or checked against closed forms.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-gsl-independent"

#include "hl-test-formulas.h"
#include "hl-lame.h"

#include <gsl/gsl_errno.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_odeiv2.h>
#include <gsl/gsl_roots.h>
#include <math.h>

#define A0        0.1      /* bore, m */
#define REL       1e-7     /* the target against the ODE */
#define SIZING_REL 1e-9    /* the target for the roots */

/* ---- a Brent root with an expanding bracket ------------------------- */

typedef double (*Fn) (double x, void *data);

/* Root of @f between @lo and @hi, or FALSE when they do not bracket one. */
static gboolean
brent (Fn      f,
       void   *data,
       double  lo,
       double  hi,
       double  epsabs,
       double *root)
{
  gsl_function fn = { f, data };
  gsl_root_fsolver *s;
  int status = GSL_CONTINUE;
  double flo = f (lo, data), fhi = f (hi, data);

  if (flo == 0)
    {
      *root = lo;
      return TRUE;
    }
  if (fhi == 0)
    {
      *root = hi;
      return TRUE;
    }
  if ((flo < 0) == (fhi < 0) || !isfinite (flo) || !isfinite (fhi))
    return FALSE;
  s = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
  gsl_root_fsolver_set (s, &fn, lo, hi);
  for (int i = 0; i < 500 && status == GSL_CONTINUE; i++)
    {
      gsl_root_fsolver_iterate (s);
      status = gsl_root_test_interval (gsl_root_fsolver_x_lower (s), gsl_root_fsolver_x_upper (s),
                                       epsabs, 1e-14);
    }
  *root = gsl_root_fsolver_root (s);
  gsl_root_fsolver_free (s);
  return status == GSL_SUCCESS;
}

/* Root of a monotone (here: linear) @f, bracket grown from [-s, s]. */
static double
brent_expanding (Fn      f,
                 void   *data,
                 double  scale)
{
  double root = NAN;

  for (int i = 0; i < 80; i++, scale *= 4)
    if (brent (f, data, -scale, scale, 1e-15 * scale, &root))
      return root;
  g_test_fail_printf ("no bracket found for a linear shooting residual");
  return NAN;
}

/* ---- the boundary-value problem ------------------------------------- */

/* Dimensionless: rho = r/a, stresses over p_ref, u E / (p_ref a),
 * axial strain E / p_ref; so E = 1 and every unknown is of order 1. */
typedef struct
{
  HlForm form;
  HlEnds ends;
  double lambda, mu;     /* Lamé constants over E */
  double k;              /* b / a */
  double pi, po;         /* over p_ref */
  double ez;             /* axial strain (cylinders) */
  double u0;             /* u at the bore, shot */
} Bvp;

static void
bvp_stresses (const Bvp *p,
              double     rho,
              double     u,
              double     sr,
              double    *du,
              double    *st,
              double    *sz)
{
  double l = p->lambda, m = p->mu;

  if (p->form == HL_FORM_SPHERE)
    {
      /* Hooke: s_r = (l + 2m) u' + 2 l u/r, s_t = l u' + 2 (l + m) u/r */
      *du = (sr - 2 * l * u / rho) / (l + 2 * m);
      *st = l * *du + 2 * (l + m) * u / rho;
      *sz = *st;
    }
  else
    {
      /* Hooke: s_r = (l + 2m) u' + l u/r + l e_z,
       * s_t = l u' + (l + 2m) u/r + l e_z, s_z = l (u' + u/r) + (l + 2m) e_z */
      *du = (sr - l * u / rho - l * p->ez) / (l + 2 * m);
      *st = l * *du + (l + 2 * m) * u / rho + l * p->ez;
      *sz = l * (*du + u / rho) + (l + 2 * m) * p->ez;
    }
}

/* y = (u, s_r, integral of s_z r dr) */
typedef double OdeState[3];

static int
bvp_rhs (double        rho,
         const double  y[],
         double        dydr[],
         void         *data)
{
  const Bvp *p = data;
  double du, st, sz;

  bvp_stresses (p, rho, y[0], y[1], &du, &st, &sz);
  dydr[0] = du;
  /* radial equilibrium: d s_r / dr = (s_t - s_r) / r (cylinder),
   * 2 (s_t - s_r) / r (sphere) */
  dydr[1] = (p->form == HL_FORM_SPHERE ? 2.0 : 1.0) * (st - y[1]) / rho;
  dydr[2] = sz * rho;
  return GSL_SUCCESS;
}

/* Integrates from the bore with the current u0 and e_z, stopping at each
 * of @rhos (ascending, the last one b/a); @out receives y there. */
static void
bvp_integrate (Bvp          *p,
               const double *rhos,
               guint         n,
               OdeState     *out)
{
  gsl_odeiv2_system sys = { bvp_rhs, NULL, 3, p };
  gsl_odeiv2_driver *d = gsl_odeiv2_driver_alloc_y_new (&sys, gsl_odeiv2_step_rk8pd,
                                                         (p->k - 1) * 1e-3, 1e-14, 1e-14);
  double rho = 1.0, y[3] = { p->u0, -p->pi, 0.0 };

  for (guint i = 0; i < n; i++)
    {
      if (rhos[i] > rho)
        {
          int status = gsl_odeiv2_driver_apply (d, &rho, rhos[i], y);

          if (status != GSL_SUCCESS)
            g_test_fail_printf ("gsl_odeiv2_driver_apply failed: %s", gsl_strerror (status));
        }
      out[i][0] = y[0];
      out[i][1] = y[1];
      out[i][2] = y[2];
    }
  gsl_odeiv2_driver_free (d);
}

static double
residual_outer_radial (double u0,
                       void  *data)
{
  Bvp *p = data;
  OdeState end[1];

  p->u0 = u0;
  bvp_integrate (p, &p->k, 1, end);
  return end[0][1] + p->po;       /* radial(b) = -po */
}

static double
residual_axial_force (double ez,
                      void  *data)
{
  Bvp *p = data;
  OdeState end[1];

  p->ez = ez;
  p->u0 = brent_expanding (residual_outer_radial, p, 1.0);
  bvp_integrate (p, &p->k, 1, end);
  /* closed ends: the wall carries the end thrust, integral s_z 2 pi r dr =
   * pi (pi a^2 - po b^2); open ends: no axial force (Timoshenko) */
  if (p->ends == HL_ENDS_CLOSED)
    return end[0][2] - (p->pi - p->po * p->k * p->k) / 2;
  return end[0][2];
}

static void
bvp_solve (Bvp *p)
{
  p->ez = 0.0;
  if (p->form == HL_FORM_CYLINDER && p->ends != HL_ENDS_PLANE_STRAIN)
    p->ez = brent_expanding (residual_axial_force, p, 1.0);
  p->u0 = brent_expanding (residual_outer_radial, p, 1.0);
}

/* ---- ODE against hl_solve ------------------------------------------- */

typedef struct
{
  HlForm form;
  HlEnds ends;
  double k, pi, po;
} OdeCase;

static void
test_ode (gconstpointer data)
{
  const OdeCase *c = data;
  HlShellInputs in = hlt_shell (c->form, c->ends, HL_SIZE_INNER_RADIUS, A0, A0 * (c->k - 1), c->pi, c->po);
  g_autoptr(HlSolution) s = hlt_solve (&in, HL_DEFAULT_POINTS);
  double pref = MAX (c->pi, c->po);
  Bvp p;
  g_autofree double *rhos = NULL;
  g_autofree OdeState *y = NULL;
  double u_scale;

  if (s == NULL)
    return;
  p.form = c->form;
  p.ends = c->ends;
  p.lambda = HLT_NU / ((1 + HLT_NU) * (1 - 2 * HLT_NU));
  p.mu = 1 / (2 * (1 + HLT_NU));
  p.k = s->b / s->a;
  p.pi = c->pi / pref;
  p.po = c->po / pref;
  bvp_solve (&p);

  rhos = g_new (double, s->n_points);
  y = g_new (OdeState, s->n_points);
  for (guint i = 0; i < s->n_points; i++)
    rhos[i] = s->points[i].r / s->a;
  rhos[s->n_points - 1] = p.k;
  bvp_integrate (&p, rhos, s->n_points, y);

  u_scale = pref * s->a / HLT_E;
  for (guint i = 0; i < s->n_points; i += 5)
    {
      const HlWallPoint *pt = &s->points[i];
      double du, st, sz;

      bvp_stresses (&p, rhos[i], y[i][0], y[i][1], &du, &st, &sz);
      hlt_assert_close (pt->radial, y[i][1] * pref, REL, 1e-9 * pref);
      hlt_assert_close (pt->hoop, st * pref, REL, 1e-9 * pref);
      hlt_assert_close (pt->axial, sz * pref, REL, 1e-9 * pref);
      hlt_assert_close (hl_lame_displacement (&s->lame, pt->r), y[i][0] * u_scale, REL, 1e-9 * u_scale);
    }
  hlt_assert_result (s->displacement_inner, y[0][0] * u_scale, REL, 1e-9 * u_scale);
  hlt_assert_result (s->displacement_outer, y[s->n_points - 1][0] * u_scale, REL, 1e-9 * u_scale);
  if (c->form == HL_FORM_CYLINDER)
    hlt_assert_close (hl_lame_axial_strain (&s->lame), p.ez * pref / HLT_E, REL, 1e-9 * pref / HLT_E);
}

/* ---- equilibrium by GSL quadrature ---------------------------------- */

static double
hoop_at (double r,
         void  *data)
{
  return hl_lame_stress (data, r).hoop;
}

static void
test_equilibrium_quadrature (void)
{
  /* REFERENCES.md: integral_a^b hoop dr = pi a - po b (half ring), here
   * with gsl_integration_qag on the engine's stress function. */
  static const double ks[] = { 1.01, 1.1, 1.5, 2, 4 };
  gsl_integration_workspace *w = gsl_integration_workspace_alloc (200);

  for (guint j = 0; j < G_N_ELEMENTS (ks); j++)
    for (HlEnds ends = HL_ENDS_CLOSED; ends <= HL_ENDS_PLANE_STRAIN; ends++)
      {
        HlLame l;
        gsl_function fn = { hoop_at, &l };
        double b = A0 * ks[j], pi = 20e6, po = 5e6, result, abserr;

        hl_lame_init (&l, HL_FORM_CYLINDER, ends, A0, b, pi, po, HLT_E, HLT_NU);
        gsl_integration_qag (&fn, A0, b, 0, 1e-13, 200, GSL_INTEG_GAUSS61, w, &result, &abserr);
        hlt_assert_close (result, pi * A0 - po * b, 1e-10, 1e-10 * pi * b);
      }
  gsl_integration_workspace_free (w);
}

/* ---- maximum pressure (Lamé) ---------------------------------------- */

typedef struct
{
  HlForm      form;
  HlEnds      ends;
  HlCriterion criterion;
  double      a, b, po, limit;
} PeakProblem;

/* peak equivalent stress from the closed forms: the von Mises and Tresca
 * stresses of the Lamé field are convex in x = B/r^2 (D/r^3), so the peak
 * over the wall sits on a surface */
static double
own_peak (const PeakProblem *pp,
          double             a,
          double             b,
          double             pi)
{
  HltClosed ca = hlt_closed_form (pp->form, pp->ends, a, b, pi, pp->po, a);
  HltClosed cb = hlt_closed_form (pp->form, pp->ends, a, b, pi, pp->po, b);
  HlStress sa = { ca.radial, ca.hoop, ca.axial };
  HlStress sb = { cb.radial, cb.hoop, cb.axial };

  return MAX (hl_equivalent (sa, pp->criterion), hl_equivalent (sb, pp->criterion));
}

static double
peak_minus_limit (double pi,
                  void  *data)
{
  const PeakProblem *pp = data;

  return own_peak (pp, pp->a, pp->b, pi) - pp->limit;
}

static void
test_max_pressure (void)
{
  /* Closed forms, internal pressure alone, S = 100 MPa (x Ej): the
   * REFERENCES.md first-yield formulas with sy replaced by the allowable,
   * e.g. closed cylinder von Mises S (1 - 1/k^2) / sqrt 3 exactly (see
   * hlt_limit_pressure for every form, end and criterion). */
  static const double ks[] = { 1.01, 1.1, 1.5, 2, 4 };
  static const double ejs[] = { 1.0, 0.85 };

  for (guint j = 0; j < G_N_ELEMENTS (ks); j++)
    for (guint e = 0; e < G_N_ELEMENTS (ejs); e++)
      for (HlCriterion crit = HL_CRITERION_VON_MISES; crit <= HL_CRITERION_TRESCA; crit++)
        for (guint f = 0; f < 4; f++)
          {
            HlForm form = f == 3 ? HL_FORM_SPHERE : HL_FORM_CYLINDER;
            HlEnds ends = f == 3 ? HL_ENDS_CLOSED : (HlEnds) f;
            HlShellInputs in = hlt_shell (form, ends, HL_SIZE_INNER_RADIUS, A0, A0 * (ks[j] - 1), 1e6, 0);
            g_autoptr(HlSolution) s = NULL;

            in.joint_efficiency = ejs[e];
            in.sizing_criterion = crit;
            s = hlt_solve (&in, 11);
            if (s == NULL)
              return;
            hlt_assert_result (s->mawp_lame, hlt_limit_pressure (form, ends, crit, s->b / s->a, HLT_ALLOW * ejs[e]),
                               SIZING_REL, 0);
          }

  /* External pressure held (REFERENCES.md, maximum allowable pressure):
   * Brent on the closed-form peak, every form, both criteria. */
  for (guint j = 0; j < G_N_ELEMENTS (ks); j++)
    for (HlCriterion crit = HL_CRITERION_VON_MISES; crit <= HL_CRITERION_TRESCA; crit++)
      for (guint f = 0; f < 4; f++)
        {
          HlForm form = f == 3 ? HL_FORM_SPHERE : HL_FORM_CYLINDER;
          HlEnds ends = f == 3 ? HL_ENDS_CLOSED : (HlEnds) f;
          HlShellInputs in = hlt_shell (form, ends, HL_SIZE_INNER_RADIUS, A0, A0 * (ks[j] - 1), 1e6, 5e6);
          g_autoptr(HlSolution) s = NULL;
          PeakProblem pp;
          double want;

          in.sizing_criterion = crit;
          s = hlt_solve (&in, 11);
          if (s == NULL)
            return;
          pp = (PeakProblem) { form, ends, crit, s->a, s->b, 5e6, HLT_ALLOW };
          /* at pi = po the peak is at most po = 5 MPa, far below S (the
           * wall is hydrostatic but for the axial stress) */
          if (!brent (peak_minus_limit, &pp, 5e6, 1e10, 0, &want))
            g_test_fail_printf ("no bracket for the maximum pressure");
          hlt_assert_result (s->mawp_lame, want, SIZING_REL, 0);
        }
}

/* ---- required thickness (Lamé) -------------------------------------- */

typedef struct
{
  PeakProblem pp;
  double      pi;
  gboolean    outer_fixed;
  double      fixed;
} WallProblem;

static double
wall_peak_minus_limit (double t,
                       void  *data)
{
  const WallProblem *wp = data;
  double a = wp->outer_fixed ? wp->fixed - t : wp->fixed;
  double b = wp->outer_fixed ? wp->fixed : wp->fixed + t;

  return own_peak (&wp->pp, a, b, wp->pi) - wp->pp.limit;
}

static void
test_required_wall (void)
{
  /* Closed cylinder, von Mises, internal p: S = sqrt 3 p k^2 / (k^2 - 1)
   * gives k^2 = S / (S - sqrt 3 p); Tresca k^2 = S / (S - 2p); sphere
   * (both) k^3 = S / (S - 1.5 p) (REFERENCES.md first-yield forms solved
   * for k).  Inner radius held: t = a (k - 1); outer held: t = b (1 - 1/k);
   * the corrosion allowance c is added and the corroded bore is a_new + c
   * (REFERENCES.md, required thickness).  Open ends: Brent on the closed
   * forms.  S = 100 MPa. */
  static const double ps[] = { 1e6, 10e6, 30e6, 45e6 };
  static const double cs[] = { 0, 2e-3 };

  for (guint j = 0; j < G_N_ELEMENTS (ps); j++)
    for (guint ci = 0; ci < G_N_ELEMENTS (cs); ci++)
      for (int outer = 0; outer <= 1; outer++)
        for (HlCriterion crit = HL_CRITERION_VON_MISES; crit <= HL_CRITERION_TRESCA; crit++)
          for (guint f = 0; f < 4; f++)
            {
              HlForm form = f == 3 ? HL_FORM_SPHERE : HL_FORM_CYLINDER;
              HlEnds ends = f == 3 ? HL_ENDS_CLOSED : (HlEnds) f;
              double p = ps[j], c = cs[ci], S = HLT_ALLOW, wall = 0;
              HlShellInputs in = hlt_shell (form, ends, outer ? HL_SIZE_OUTER_RADIUS : HL_SIZE_INNER_RADIUS,
                                            outer ? 0.2 : A0, 0.05, p, 0);
              g_autoptr(HlSolution) s = NULL;
              double fixed, k = NAN;

              in.corrosion_allowance = hl_quantity_make (c, "m");
              in.sizing_criterion = crit;
              s = hlt_solve (&in, 11);
              if (s == NULL)
                return;
              fixed = outer ? s->b : s->a;
              if (form == HL_FORM_SPHERE)
                k = cbrt (S / (S - 1.5 * p));
              else if (ends == HL_ENDS_CLOSED || crit == HL_CRITERION_TRESCA)
                k = sqrt (crit == HL_CRITERION_TRESCA ? S / (S - 2 * p) : S / (S - sqrt (3) * p));
              if (!isnan (k))
                wall = outer ? fixed * (1 - 1 / k) : fixed * (k - 1);
              else
                {
                  WallProblem wp = { { form, ends, crit, 0, 0, 0, S }, p, outer, fixed };

                  if (!brent (wall_peak_minus_limit, &wp, fixed * 1e-9, outer ? fixed * (1 - 1e-9) : fixed * 1e3,
                              0, &wall))
                    g_test_fail_printf ("no bracket for the required wall");
                }
              hlt_assert_result (s->treq_lame, wall + c, SIZING_REL, 0);
            }
}

static void
test_required_wall_impossible (void)
{
  /* No thickness carries the load when S is below the thick-wall limit of
   * the peak stress: closed cylinder von Mises sqrt 3 p (k -> infinity in
   * S = sqrt 3 p k^2 / (k^2 - 1)), Tresca 2p, sphere 1.5 p.  The result is
   * not available, with a reason, for either radius held. */
  static const struct { HlForm form; HlCriterion crit; double p; } cases[] = {
    { HL_FORM_CYLINDER, HL_CRITERION_VON_MISES, 60e6 },   /* sqrt 3 x 60 = 103.9 > 100 */
    { HL_FORM_CYLINDER, HL_CRITERION_TRESCA, 55e6 },      /* 2 x 55 = 110 > 100 */
    { HL_FORM_SPHERE, HL_CRITERION_VON_MISES, 70e6 },     /* 1.5 x 70 = 105 > 100 */
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    for (int outer = 0; outer <= 1; outer++)
      {
        HlShellInputs in = hlt_shell (cases[i].form, HL_ENDS_CLOSED,
                                      outer ? HL_SIZE_OUTER_RADIUS : HL_SIZE_INNER_RADIUS,
                                      outer ? 0.2 : A0, 0.05, cases[i].p, 0);
        g_autoptr(HlSolution) s = NULL;

        in.sizing_criterion = cases[i].crit;
        s = hlt_solve (&in, 11);
        if (s != NULL)
          hlt_assert_na (s->treq_lame);
      }
}

static void
test_required_wall_tiny_pressure (void)
{
  /* A vanishing but valid pressure (0.01 Pa, S = 100 MPa) needs a wall of
   * a (k - 1) with k^2 - 1 = sqrt 3 p / (S - sqrt 3 p): 8.66e-12 m on a
   * 100 mm bore.  REFERENCES.md defines the required thickness as the one
   * at which the peak equals the allowable: the answer is that thickness,
   * or "not available" with a reason — never a different number. */
  HlShellInputs in = hlt_shell (HL_FORM_CYLINDER, HL_ENDS_CLOSED, HL_SIZE_INNER_RADIUS, A0, 0.01, 0.01, 0);
  g_autoptr(HlSolution) s = hlt_solve (&in, 11);
  double S = HLT_ALLOW, p = 0.01, k2m1, wall;

  if (s == NULL)
    return;
  k2m1 = sqrt (3) * p / (S - sqrt (3) * p);
  wall = A0 * k2m1 / (sqrt (1 + k2m1) + 1);
  if (s->treq_lame.reason == NULL)
    hlt_assert_result (s->treq_lame, wall, 1e-6, 0);
}

/* ---- ratio for the tolerance ---------------------------------------- */

typedef struct
{
  HlForm           form;
  HlEnds           ends;
  HlRadiusBasis    basis;
  HlVerdictMeasure measure;
  double           pi, po, tolerance;
} RatioProblem;

/* REFERENCES.md thin-wall error at the mean ratio m, a = 1,
 * b = (2m + 1) / (2m - 1) */
static double
own_error (double m,
           void  *data)
{
  const RatioProblem *rp = data;

  return hlt_thin_wall_error (rp->form, rp->ends, rp->basis, rp->measure,
                              1, (2 * m + 1) / (2 * m - 1), rp->pi, rp->po);
}

static double
error_excess (double m,
              void  *data)
{
  const RatioProblem *rp = data;

  return fabs (own_error (m, data)) - rp->tolerance;
}

/* The largest m with |error| = tolerance: a fine scan down from m = 1e7
 * finds the first ratio outside the tolerance, Brent the crossing.
 * NaN when every ratio scanned is within the tolerance. */
static double
own_ratio (RatioProblem *rp)
{
  const int n = 20000;
  double lo = 0.5000005, hi = 1e7, step = log (hi / lo) / (n - 1), prev = hi, root = NAN;

  for (int i = n - 1; i >= 0; i--)
    {
      double m = lo * exp (step * i);

      if (error_excess (m, rp) > 0)
        {
          if (i == n - 1 || !brent (error_excess, rp, m, prev, 0, &root))
            return NAN;
          return root;
        }
      prev = m;
    }
  return NAN;
}

static void
check_ratio (RatioProblem *rp)
{
  HlShellInputs in = hlt_shell (rp->form, rp->ends, HL_SIZE_INNER_RADIUS, A0, A0 / 7, rp->pi, rp->po);
  g_autoptr(HlSolution) s = NULL;
  double want;

  in.thin_basis = rp->basis;
  in.verdict_measure = rp->measure;
  in.thin_tolerance = hl_quantity_make (rp->tolerance, "%");
  s = hlt_solve (&in, 11);
  if (s == NULL)
    return;
  want = own_ratio (rp);
  if (isnan (want))
    hlt_assert_na (s->ratio_for_tolerance);
  else if (!hlt_assert_result (s->ratio_for_tolerance, want, SIZING_REL, 0))
    g_test_message ("form %d ends %d basis %d measure %d pi %g po %g tolerance %g %%",
                    rp->form, rp->ends, rp->basis, rp->measure, rp->pi, rp->po, rp->tolerance);
}

static void
test_ratio_for_tolerance (void)
{
  /* Closed form: cylinder, mean basis, po = 0, hoop measure: the error is
   * -100 / (4 m^2 + 1) % (see test-lame), so the ratio is
   * m = sqrt((100 / tol - 1) / 4): 5 % -> sqrt(4.75) = 2.1794495, 1 % ->
   * sqrt(24.75) = 4.9749372. */
  static const double tols[] = { 5, 1 };

  for (guint i = 0; i < G_N_ELEMENTS (tols); i++)
    for (HlEnds ends = HL_ENDS_CLOSED; ends <= HL_ENDS_PLANE_STRAIN; ends++)
      {
        HlShellInputs in = hlt_shell (HL_FORM_CYLINDER, ends, HL_SIZE_INNER_RADIUS, A0, A0 / 7, 10e6, 0);
        g_autoptr(HlSolution) s = NULL;

        in.thin_tolerance = hl_quantity_make (tols[i], "%");
        s = hlt_solve (&in, 11);
        if (s != NULL)
          hlt_assert_result (s->ratio_for_tolerance, sqrt ((100 / tols[i] - 1) / 4), SIZING_REL, 0);
      }

  /* Brent on the definition: every form, end, basis, measure, pressure
   * ratio, three tolerances. */
  {
    static const double load[][2] = { { 10e6, 0 }, { 0, 10e6 }, { 20e6, 5e6 } };
    static const double tol3[] = { 1, 5, 10 };

    for (guint f = 0; f < 4; f++)
      for (HlRadiusBasis basis = HL_BASIS_INNER; basis <= HL_BASIS_OUTER; basis++)
        for (HlVerdictMeasure m = HL_MEASURE_HOOP; m <= HL_MEASURE_EQUIVALENT; m++)
          for (guint l = 0; l < G_N_ELEMENTS (load); l++)
            for (guint t = 0; t < G_N_ELEMENTS (tol3); t++)
              {
                RatioProblem rp = {
                  f == 3 ? HL_FORM_SPHERE : HL_FORM_CYLINDER,
                  f == 3 ? HL_ENDS_CLOSED : (HlEnds) f,
                  basis, m, load[l][0], load[l][1], tol3[t]
                };

                check_ratio (&rp);
              }
  }
}

static void
test_ratio_narrow_excursion (void)
{
  /* Sphere, mean basis, internal pressure: the hoop error is not
   * monotone in R/t; it rises to a maximum of 10.4837 % near R/t = 2.602
   * and falls off like 50/m beyond (own closed forms; the +5 % at k = 2 of
   * test-lame is on its rising side).  With a 10.475 % tolerance the ratios
   * from about 2.531 to 2.677 are outside it, so by the REFERENCES.md
   * definition ("every ratio above it is within tolerance") the ratio is
   * the upper crossing, 2.6770560 — a narrow band a coarse scan can step
   * over (below it the error falls to -10.475 % again near R/t = 1). */
  RatioProblem rp = { HL_FORM_SPHERE, HL_ENDS_CLOSED, HL_BASIS_MEAN, HL_MEASURE_HOOP, 10e6, 0, 10.475 };

  check_ratio (&rp);
}

int
main (int   argc,
      char *argv[])
{
  static const HlForm forms[] = { HL_FORM_CYLINDER, HL_FORM_CYLINDER, HL_FORM_CYLINDER, HL_FORM_SPHERE };
  static const HlEnds ends[] = { HL_ENDS_CLOSED, HL_ENDS_OPEN, HL_ENDS_PLANE_STRAIN, HL_ENDS_CLOSED };
  static const char *shape_names[] = { "cylinder-closed", "cylinder-open", "cylinder-plane-strain", "sphere" };
  static const double ks[] = { 1.01, 1.1, 1.5, 2, 4 };
  static const struct { const char *name; double pi, po; } loads[] = {
    { "internal", 10e6, 0 }, { "external", 0, 10e6 }, { "both", 20e6, 5e6 },
  };

  g_test_init (&argc, &argv, NULL);
  g_test_set_nonfatal_assertions ();
  gsl_set_error_handler_off ();

  for (guint f = 0; f < G_N_ELEMENTS (forms); f++)
    for (guint l = 0; l < G_N_ELEMENTS (loads); l++)
      for (guint j = 0; j < G_N_ELEMENTS (ks); j++)
        {
          OdeCase *c = g_new (OdeCase, 1);
          g_autofree char *path = g_strdup_printf ("/gsl/ode/%s/%s/k%g", shape_names[f], loads[l].name, ks[j]);

          *c = (OdeCase) { forms[f], ends[f], ks[j], loads[l].pi, loads[l].po };
          g_test_add_data_func_full (path, c, test_ode, g_free);
        }
  g_test_add_func ("/gsl/equilibrium-quadrature", test_equilibrium_quadrature);
  g_test_add_func ("/gsl/max-pressure", test_max_pressure);
  g_test_add_func ("/gsl/required-wall", test_required_wall);
  g_test_add_func ("/gsl/required-wall/impossible", test_required_wall_impossible);
  g_test_add_func ("/gsl/required-wall/tiny-pressure", test_required_wall_tiny_pressure);
  g_test_add_func ("/gsl/ratio-for-tolerance", test_ratio_for_tolerance);
  g_test_add_func ("/gsl/ratio-for-tolerance/narrow-excursion", test_ratio_narrow_excursion);
  return g_test_run ();
}
