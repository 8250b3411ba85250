/* hl-axis.c — value-to-position mapping and nice tick values
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-axis"

#include "hl-axis.h"
#include "hl-figure-format.h"

#include <math.h>

double
hl_axis_nice_step (double span,
                   guint  target)
{
  static const double mantissas[] = { 1, 2, 2.5, 5, 10 };
  double raw, decade;

  if (!(span > 0) || !isfinite (span))
    return 1.0;
  raw = span / MAX (target, 1);
  decade = pow (10, floor (log10 (raw)));
  for (guint i = 0; i < G_N_ELEMENTS (mantissas); i++)
    if (mantissas[i] * decade >= raw * (1 - 1e-9))
      return mantissas[i] * decade;
  return 10 * decade;
}

static int
decimals_for (double step)
{
  for (int d = 0; d < 12; d++)
    {
      double scaled = step * pow (10, d);

      if (fabs (scaled - round (scaled)) < 1e-6 * MAX (1.0, scaled))
        return d;
    }
  return 12;
}

void
hl_axis_linear (HlAxis   *axis,
                double    lo,
                double    hi,
                guint     target,
                gboolean  extend)
{
  double step, first;

  axis->log = FALSE;
  axis->n_ticks = axis->n_minor = 0;
  if (!(hi > lo))
    {
      /* a flat range (no load, thin wall) still gets a readable axis */
      double pad = lo != 0 ? fabs (lo) * 0.1 : 1.0;

      lo -= pad;
      hi += pad;
    }
  step = hl_axis_nice_step (hi - lo, target);
  /* keep the count bounded whatever the caller's range */
  while ((hi - lo) / step > HL_AXIS_MAX_TICKS - 2)
    step *= 2;
  if (extend)
    {
      lo = floor (lo / step + 1e-9) * step;
      hi = ceil (hi / step - 1e-9) * step;
    }
  axis->v0 = lo;
  axis->v1 = hi;
  axis->step = step;
  axis->decimals = decimals_for (step);
  first = ceil (lo / step - 1e-9) * step;
  for (double v = first; v <= hi + step * 1e-9 && axis->n_ticks < HL_AXIS_MAX_TICKS; v += step)
    axis->ticks[axis->n_ticks++] = fabs (v) < step * 1e-9 ? 0.0 : v;
}

void
hl_axis_log (HlAxis   *axis,
             double    lo,
             double    hi,
             gboolean  dense)
{
  static const double labelled[] = { 1, 2, 5 };

  axis->log = TRUE;
  axis->v0 = lo;
  axis->v1 = hi;
  axis->n_ticks = axis->n_minor = 0;
  axis->decimals = 0;
  for (int e = (int) floor (log10 (lo)) - 1; e <= (int) ceil (log10 (hi)); e++)
    for (int m = 1; m <= 9; m++)
      {
        double v = m * pow (10, e);
        gboolean label = m == 1;

        if (v < lo * (1 - 1e-9) || v > hi * (1 + 1e-9))
          continue;
        if (dense)
          for (guint i = 0; i < G_N_ELEMENTS (labelled); i++)
            label = label || m == labelled[i];
        if (label && axis->n_ticks < HL_AXIS_MAX_TICKS)
          {
            axis->ticks[axis->n_ticks++] = v;
            axis->decimals = MAX (axis->decimals, e < 0 ? -e : 0);
          }
        else if (!label && axis->n_minor < HL_AXIS_MAX_TICKS)
          axis->minor[axis->n_minor++] = v;
      }
}

void
hl_axis_place (HlAxis *axis,
               double  p0,
               double  p1)
{
  axis->p0 = p0;
  axis->p1 = p1;
}

double
hl_axis_map (const HlAxis *axis,
             double        value)
{
  double f;

  if (axis->log)
    f = (log (value) - log (axis->v0)) / (log (axis->v1) - log (axis->v0));
  else
    f = (value - axis->v0) / (axis->v1 - axis->v0);
  return axis->p0 + f * (axis->p1 - axis->p0);
}

char *
hl_axis_label (const HlAxis *axis,
               double        value,
               gboolean      locale)
{
  /* log labels (0.5, 1, 2, 500) each take only the digits they need */
  return hl_figure_format_fixed (value, axis->log ? decimals_for (value) : axis->decimals, locale);
}
