/* hl-sizing.h — limits found by root finding on the Lamé solution
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-lame.h"

G_BEGIN_DECLS

/* Relative convergence of every root found here (issue target 1e-9). */
#define HL_SIZING_REL_TOL 1e-12

/* Mean-radius/thickness ratio at which |thin-wall error| of @measure equals
 * @tolerance_percent, for the form, ends, basis and pressure ratio of
 * @lame.  FALSE with @reason when no ratio in 0.5..1e8 reaches it. */
gboolean hl_ratio_for_tolerance   (const HlLame     *lame,
                                   HlRadiusBasis     basis,
                                   HlVerdictMeasure  measure,
                                   double            tolerance_percent,
                                   double           *ratio,
                                   const char      **reason);

/* Internal pressure at which the Lamé peak equivalent stress of
 * @criterion reaches @limit, external pressure held. */
gboolean hl_lame_max_pressure     (const HlLame     *lame,
                                   HlCriterion       criterion,
                                   double            limit,
                                   double           *pressure,
                                   const char      **reason);

/* Corroded thickness at which the peak equivalent stress equals @limit,
 * with the inner radius (or with @outer_fixed the outer radius) held. */
gboolean hl_lame_required_wall    (const HlLame     *lame,
                                   gboolean          outer_fixed,
                                   HlCriterion       criterion,
                                   double            limit,
                                   double           *thickness,
                                   const char      **reason);

G_END_DECLS
