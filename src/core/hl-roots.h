/* hl-roots.h — bracketing root finder
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

typedef double (*HlRootFunc) (double x, gpointer data);

/* Root of @f in [lo, hi] where f(lo) and f(hi) differ in sign, to
 * @rel_tol relative to the root.  FALSE when the bracket holds no sign
 * change.  Bisection in log space when @geometric (positive brackets
 * spanning decades), plain otherwise; robust first, fast enough. */
gboolean hl_root_bracketed (HlRootFunc f,
                            gpointer   data,
                            double     lo,
                            double     hi,
                            double     rel_tol,
                            gboolean   geometric,
                            double    *root);

G_END_DECLS
