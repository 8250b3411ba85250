/* hl-roots.c — bracketing root finder
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-roots"

#include "hl-roots.h"

#include <math.h>

gboolean
hl_root_bracketed (HlRootFunc f,
                   gpointer   data,
                   double     lo,
                   double     hi,
                   double     rel_tol,
                   gboolean   geometric,
                   double    *root)
{
  double flo = f (lo, data), fhi = f (hi, data);

  if (!isfinite (flo) || !isfinite (fhi))
    return FALSE;
  if (flo == 0.0)
    {
      *root = lo;
      return TRUE;
    }
  if (fhi == 0.0)
    {
      *root = hi;
      return TRUE;
    }
  if ((flo < 0) == (fhi < 0))
    return FALSE;
  if (geometric && !(lo > 0.0 && hi > 0.0))
    geometric = FALSE;

  /* Illinois variant of regula falsi: keeps the bracket like bisection
   * but converges superlinearly; a bisection step every few iterations
   * guards against slow one-sided progress.  In log space when geometric. */
  {
    double x0 = geometric ? log (lo) : lo, x1 = geometric ? log (hi) : hi;
    double f0 = flo, f1 = fhi;
    int side = 0;

    for (int i = 0; i < 300; i++)
      {
        double x = (i % 4 == 3) ? 0.5 * (x0 + x1) : (x0 * f1 - x1 * f0) / (f1 - f0);
        double xr = geometric ? exp (x) : x;
        double fx;

        if (!(x > MIN (x0, x1) && x < MAX (x0, x1)))
          x = 0.5 * (x0 + x1), xr = geometric ? exp (x) : x;
        fx = f (xr, data);
        if (fx == 0.0 || !isfinite (fx))
          {
            *root = xr;
            return isfinite (fx);
          }
        if ((fx < 0) == (f1 < 0))
          {
            x1 = x;
            f1 = fx;
            if (side == -1)
              f0 /= 2;
            side = -1;
          }
        else
          {
            x0 = x;
            f0 = fx;
            if (side == 1)
              f1 /= 2;
            side = 1;
          }
        {
          double a0 = geometric ? exp (x0) : x0, a1 = geometric ? exp (x1) : x1;

          if (fabs (a1 - a0) <= rel_tol * fabs (xr) * 0.5)
            {
              *root = 0.5 * (a0 + a1);
              return TRUE;
            }
        }
      }
    lo = geometric ? exp (x0) : x0;
    hi = geometric ? exp (x1) : x1;
  }
  *root = geometric ? sqrt (lo * hi) : lo + (hi - lo) / 2.0;
  return TRUE;
}
