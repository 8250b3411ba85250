/* hl-axis.h — value-to-position mapping and nice tick values
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

#define HL_AXIS_MAX_TICKS 48

typedef struct
{
  double   v0, v1;      /* value range */
  double   p0, p1;      /* positions of v0 and v1 (any direction) */
  gboolean log;
  double   step;        /* linear: tick spacing */
  int      decimals;    /* linear: digits after the point in labels */
  guint    n_ticks;     /* labelled ticks */
  double   ticks[HL_AXIS_MAX_TICKS];
  guint    n_minor;     /* unlabelled ticks (log axes) */
  double   minor[HL_AXIS_MAX_TICKS];
} HlAxis;

/* Linear axis over [@lo, @hi] with about @target ticks spaced 1, 2, 2.5
 * or 5 times a power of ten.  With @extend the range grows to the
 * neighbouring ticks; without it the range stays and ticks fall inside. */
void    hl_axis_linear  (HlAxis   *axis,
                         double    lo,
                         double    hi,
                         guint     target,
                         gboolean  extend);
/* Log axis over [@lo, @hi]: labels at 1, 2, 5 of each decade when
 * @dense, at decades only otherwise; minor ticks at 1..9. */
void    hl_axis_log     (HlAxis   *axis,
                         double    lo,
                         double    hi,
                         gboolean  dense);
void    hl_axis_place   (HlAxis   *axis,
                         double    p0,
                         double    p1);
double  hl_axis_map     (const HlAxis *axis,
                         double        value);
/* tick label: just enough decimals for the step, a true minus sign,
 * C locale unless @locale */
char   *hl_axis_label   (const HlAxis *axis,
                         double        value,
                         gboolean      locale);

/* the step a linear axis would choose for @span and @target ticks */
double  hl_axis_nice_step (double span,
                           guint  target);

G_END_DECLS
