/* hl-sizing.c — limits found by root finding on the Lamé solution
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-sizing"

#include "hl-config.h"
#include "hl-sizing.h"
#include "hl-roots.h"

#include <glib/gi18n-lib.h>
#include <math.h>

#define RATIO_MIN 0.5000005   /* b/a about 1e6 */
#define RATIO_MAX 1e8
#define RATIO_GRID 96

typedef struct
{
  const HlLame    *base;
  HlRadiusBasis    basis;
  HlVerdictMeasure measure;
  double           tolerance;
  HlCriterion      criterion;
  double           limit;
  gboolean         outer_fixed;
} SizingProblem;

static HlLame
with_wall (const HlLame *base,
           double        a,
           double        b,
           double        pi)
{
  HlLame l;

  hl_lame_init (&l, base->form, base->ends, a, b, pi, base->po, base->E, base->nu);
  return l;
}

static double
error_excess (double   m,
              gpointer data)
{
  const SizingProblem *sp = data;
  /* m = (a+b)/2 / (b-a) with a = 1 gives b = (2m+1)/(2m-1) */
  double b = (2 * m + 1) / (2 * m - 1);
  HlLame l;

  l = *sp->base;
  hl_lame_init (&l, l.form, l.ends, 1.0, b, l.pi, l.po, l.E, l.nu);
  /* "both": the larger of the two errors must be within the tolerance */
  if (sp->measure == HL_MEASURE_BOTH)
    return MAX (fabs (hl_thin_wall_error (&l, sp->basis, HL_MEASURE_HOOP)),
                fabs (hl_thin_wall_error (&l, sp->basis, HL_MEASURE_EQUIVALENT))) - sp->tolerance;
  return fabs (hl_thin_wall_error (&l, sp->basis, sp->measure)) - sp->tolerance;
}

/* Golden-section search for the largest f(exp(x)) on [x0, x1]; returns the
 * value and stores exp(x) of the maximum in @at. */
static double
hl_local_max (HlRootFunc f,
              gpointer   data,
              double     x0,
              double     x1,
              double    *at)
{
  const double r = (sqrt (5.0) - 1.0) / 2.0;
  double c = x1 - r * (x1 - x0), d = x0 + r * (x1 - x0);
  double fc = f (exp (c), data), fd = f (exp (d), data);

  for (int i = 0; i < 60 && fabs (x1 - x0) > 1e-13 * fabs (x0 + x1); i++)
    {
      if (fc > fd)
        {
          x1 = d;
          d = c;
          fd = fc;
          c = x1 - r * (x1 - x0);
          fc = f (exp (c), data);
        }
      else
        {
          x0 = c;
          c = d;
          fc = fd;
          d = x0 + r * (x1 - x0);
          fd = f (exp (d), data);
        }
    }
  *at = exp (fc > fd ? c : d);
  return MAX (fc, fd);
}

static gboolean
ratio_for_tolerance_search (const HlLame     *lame,
                            HlRadiusBasis     basis,
                            HlVerdictMeasure  measure,
                            double            tolerance_percent,
                            double           *ratio,
                            const char      **reason)
{
  HlLame base = *lame;
  SizingProblem sp = { &base, basis, measure, tolerance_percent, 0, 0, FALSE };
  double step = log (RATIO_MAX / RATIO_MIN) / (RATIO_GRID - 1);
  double g[RATIO_GRID];
  double last_bad_m = 0.0;
  int last_bad = -1;

  for (int i = 0; i < RATIO_GRID; i++)
    {
      g[i] = error_excess (RATIO_MIN * exp (step * i), &sp);
      if (!(g[i] <= 0.0))   /* NaN counts as outside the tolerance */
        {
          last_bad = i;
          last_bad_m = RATIO_MIN * exp (step * i);
        }
    }
  /* The error curve is smooth but need not be monotone (a sphere's
   * mean-radius error has a hump near R/t = 2.6).  A hump that pokes
   * above the tolerance between two grid points shows on the grid as a
   * local maximum; refine every one above the last bad point. */
  for (int i = MAX (last_bad + 1, 1); i < RATIO_GRID - 1; i++)
    if (g[i] > g[i - 1] && g[i] >= g[i + 1])
      {
        double m;
        double peak = hl_local_max (error_excess, &sp, log (RATIO_MIN) + step * (i - 1),
                                    log (RATIO_MIN) + step * (i + 1), &m);

        if (peak > 0.0 && m > last_bad_m)
          {
            last_bad = i;
            last_bad_m = m;
          }
      }
  if (last_bad == RATIO_GRID - 1)
    {
      *reason = N_("no wall ratio brings the error within the tolerance");
      return FALSE;
    }
  if (last_bad < 0)
    {
      *reason = N_("every wall ratio is within the tolerance");
      return FALSE;
    }
  if (!hl_root_bracketed (error_excess, &sp, last_bad_m,
                          RATIO_MIN * exp (step * (last_bad + 1)),
                          HL_SIZING_REL_TOL, TRUE, ratio))
    {
      *reason = N_("the error could not be evaluated");
      return FALSE;
    }
  return TRUE;
}

static double
peak_excess_pressure (double   pi,
                      gpointer data)
{
  const SizingProblem *sp = data;
  HlLame l = with_wall (sp->base, sp->base->a, sp->base->b, pi);

  return hl_lame_peak_equivalent (&l, sp->criterion) - sp->limit;
}

gboolean
hl_lame_max_pressure (const HlLame *lame,
                      HlCriterion   criterion,
                      double        limit,
                      double       *pressure,
                      const char  **reason)
{
  SizingProblem sp = { lame, 0, 0, 0, criterion, limit, FALSE };
  double lo, hi, scale;

  /* the peak equivalent stress is convex in pi (a norm of an affine map),
   * so the admissible pressures form one interval; its top end is the
   * answer.  Find a point inside it, then bracket upwards. */
  scale = MAX (MAX (lame->po, limit * 1e-6), 1.0);
  lo = lame->po;
  if (peak_excess_pressure (lo, &sp) > 0.0)
    {
      lo = 0.0;
      if (peak_excess_pressure (lo, &sp) > 0.0)
        {
          *reason = N_("the external pressure alone exceeds the allowable");
          return FALSE;
        }
    }
  hi = MAX (lo, scale);
  for (int i = 0; peak_excess_pressure (hi, &sp) <= 0.0; i++)
    {
      if (i > 200)
        {
          *reason = N_("no finite pressure reaches the allowable");
          return FALSE;
        }
      hi *= 2.0;
    }
  if (!hl_root_bracketed (peak_excess_pressure, &sp, lo, hi, HL_SIZING_REL_TOL, FALSE, pressure))
    {
      *reason = N_("the pressure could not be bracketed");
      return FALSE;
    }
  return TRUE;
}

static double
peak_excess_wall (double   t,
                  gpointer data)
{
  const SizingProblem *sp = data;
  HlLame l = sp->outer_fixed
               ? with_wall (sp->base, sp->base->b - t, sp->base->b, sp->base->pi)
               : with_wall (sp->base, sp->base->a, sp->base->a + t, sp->base->pi);

  return hl_lame_peak_equivalent (&l, sp->criterion) - sp->limit;
}

gboolean
hl_lame_required_wall (const HlLame *lame,
                       gboolean      outer_fixed,
                       HlCriterion   criterion,
                       double        limit,
                       double       *thickness,
                       const char  **reason)
{
  SizingProblem sp = { lame, 0, 0, 0, criterion, limit, outer_fixed };
  double fixed = outer_fixed ? lame->b : lame->a;
  /* from a film to a wall a million times the bore (or all of the
   * outer radius but a millionth) */
  double lo = fixed * 1e-9;
  double hi = outer_fixed ? fixed * (1 - 1e-6) : fixed * 1e6;

  if (lame->pi == lame->po)
    {
      *reason = N_("no pressure difference across the wall");
      return FALSE;
    }
  if (peak_excess_wall (hi, &sp) > 0.0)
    {
      *reason = N_("the allowable is below what any thickness can carry");
      return FALSE;
    }
  if (peak_excess_wall (lo, &sp) <= 0.0)
    {
      /* thinner than this the difference b - a has too few digits left to
       * be an answer; say so instead of returning the search bound */
      *reason = N_("the load is so small that a wall of 1e-9 of the radius carries it");
      return FALSE;
    }
  if (!hl_root_bracketed (peak_excess_wall, &sp, lo, hi, HL_SIZING_REL_TOL, TRUE, thickness))
    {
      *reason = N_("the thickness could not be bracketed");
      return FALSE;
    }
  return TRUE;
}

/* The search above costs about 200 error evaluations and its answer
 * depends only on the form, the end condition, the load ratio, the
 * material's constants, the basis, the measure and the tolerance — not
 * on the size.  A project of many shells of one material and load asks
 * the same question again and again, so the last few answers are kept
 * (per thread; exact comparison, so a kept answer is the answer). */
typedef struct
{
  gboolean valid;
  HlForm form;
  HlEnds ends;
  double pi, po, E, nu, tolerance;
  HlRadiusBasis basis;
  HlVerdictMeasure measure;
  gboolean found;
  double ratio;
  const char *reason;
} RatioMemo;

#define RATIO_MEMO_SIZE 8

static _Thread_local RatioMemo ratio_memo[RATIO_MEMO_SIZE];
static _Thread_local guint ratio_memo_next;

gboolean
hl_ratio_for_tolerance (const HlLame     *lame,
                        HlRadiusBasis     basis,
                        HlVerdictMeasure  measure,
                        double            tolerance_percent,
                        double           *ratio,
                        const char      **reason)
{
  /* The error depends on the pressure ratio, not the level: the search
   * runs at the larger pressure scaled to 1 (internal pressure alone when
   * there is no load at all), so every shell of one load ratio asks the
   * same question, whichever was solved before it. */
  double scale = MAX (fabs (lame->pi), fabs (lame->po));
  HlLame unit_load = *lame;
  RatioMemo *m = NULL;

  unit_load.pi = scale > 0.0 ? lame->pi / scale : 1.0;
  unit_load.po = scale > 0.0 ? lame->po / scale : 0.0;
  for (guint i = 0; i < RATIO_MEMO_SIZE && m == NULL; i++)
    {
      RatioMemo *e = &ratio_memo[i];

      if (e->valid && e->form == unit_load.form && e->ends == unit_load.ends && e->pi == unit_load.pi
          && e->po == unit_load.po && e->E == unit_load.E && e->nu == unit_load.nu
          && e->tolerance == tolerance_percent && e->basis == basis && e->measure == measure)
        m = e;
    }
  if (m == NULL)
    {
      RatioMemo fresh = { TRUE, unit_load.form, unit_load.ends, unit_load.pi, unit_load.po, unit_load.E,
                          unit_load.nu, tolerance_percent, basis, measure, FALSE, 0.0, NULL };

      fresh.found = ratio_for_tolerance_search (&unit_load, basis, measure, tolerance_percent, &fresh.ratio,
                                                &fresh.reason);
      m = &ratio_memo[ratio_memo_next];
      ratio_memo_next = (ratio_memo_next + 1) % RATIO_MEMO_SIZE;
      *m = fresh;
    }
  if (m->found)
    *ratio = m->ratio;
  else
    *reason = m->reason;
  return m->found;
}
