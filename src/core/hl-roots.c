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

  for (int i = 0; i < 400; i++)
    {
      double mid = geometric ? sqrt (lo * hi) : lo + (hi - lo) / 2.0;
      double fmid = f (mid, data);

      if (fabs (hi - lo) <= rel_tol * fabs (mid) * 0.5 || fmid == 0.0)
        {
          *root = mid;
          return TRUE;
        }
      if ((fmid < 0) == (flo < 0))
        {
          lo = mid;
          flo = fmid;
        }
      else
        hi = mid;
    }
  *root = geometric ? sqrt (lo * hi) : lo + (hi - lo) / 2.0;
  return TRUE;
}
