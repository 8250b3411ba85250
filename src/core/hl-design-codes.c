/* hl-design-codes.c — published design-by-formula rules for shells
 *
 * ASME BPVC VIII-1 UG-27(c)(1), (c)(2), (d) and Appendix 1-1; EN 13445-3
 * 7.4.2 and 7.4.3 (from memory).  Each formula is used only inside its
 * stated range; outside it the result is "not available" and the reason
 * points to the code's thick-shell rules, never an extrapolation.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-design-codes"

#include "hl-config.h"
#include "hl-design-codes.h"

#include <glib/gi18n-lib.h>
#include <math.h>

#define NO_NET_PRESSURE N_("no net internal pressure (external-pressure rules apply, not checked)")
#define UG27_RANGE      N_("outside the UG-27 range (t <= R/2, P <= 0.385 S E): use the code's thick-shell rules")
#define UG27D_RANGE     N_("outside the UG-27(d) range (t <= 0.356 R, P <= 0.665 S E): use the code's thick-shell rules")
#define EN_RANGE        N_("outside the EN 13445-3 7.4 range (e/De <= 0.16): use the code's thick-shell rules")

static HlCodeResult
ug27_cylinder (const HlCodeWall *w)
{
  HlCodeResult r = { NAN, NAN, NULL, NULL, NULL, FALSE };
  double P = w->P, SE = w->SE, t = w->b - w->a, R = w->a;
  gboolean longitudinal = w->ends == HL_ENDS_CLOSED;
  double t1, t2 = 0.0, R_req;

  /* required thickness, circumferential (c)(1) and longitudinal (c)(2) */
  if (w->outer_fixed)
    {
      t1 = P * w->b / (SE + 0.4 * P);          /* Appendix 1-1 */
      if (longitudinal)
        t2 = P * w->b / (2 * SE + 1.4 * P);    /* (c)(2) with R = Ro - t */
      R_req = w->b - MAX (t1, t2);
    }
  else
    {
      t1 = P * R / (SE - 0.6 * P);
      if (longitudinal)
        t2 = P * R / (2 * SE + 0.4 * P);
      R_req = R;
    }
  if (P > 0.385 * SE || !(t1 > 0) || MAX (t1, t2) > R_req / 2)
    r.treq_reason = UG27_RANGE;
  else
    r.treq = MAX (t1, t2) + w->c;

  /* maximum allowable pressure of the design's own corroded wall */
  if (t > R / 2)
    {
      r.mawp_reason = UG27_RANGE;
      r.out_of_range = TRUE;
    }
  else
    {
      double p1 = SE * t / (R + 0.6 * t);
      double p2 = longitudinal ? 2 * SE * t / (R - 0.4 * t) : INFINITY;

      r.mawp = MIN (p1, p2);
      if (P > 0.385 * SE)
        r.out_of_range = TRUE;
    }
  r.clause = w->outer_fixed ? "UG-27(c)(1) / Appendix 1-1" : "UG-27(c)(1)";
  return r;
}

static HlCodeResult
ug27_sphere (const HlCodeWall *w)
{
  HlCodeResult r = { NAN, NAN, NULL, NULL, NULL, FALSE };
  double P = w->P, SE = w->SE, t = w->b - w->a, R = w->a;
  double treq, R_req;

  if (w->outer_fixed)
    {
      treq = P * w->b / (2 * SE + 0.8 * P);    /* Appendix 1-1 */
      R_req = w->b - treq;
    }
  else
    {
      treq = P * R / (2 * SE - 0.2 * P);
      R_req = R;
    }
  if (P > 0.665 * SE || !(treq > 0) || treq > 0.356 * R_req)
    r.treq_reason = UG27D_RANGE;
  else
    r.treq = treq + w->c;

  if (t > 0.356 * R)
    {
      r.mawp_reason = UG27D_RANGE;
      r.out_of_range = TRUE;
    }
  else
    {
      r.mawp = 2 * SE * t / (R + 0.2 * t);
      if (P > 0.665 * SE)
        r.out_of_range = TRUE;
    }
  r.clause = w->outer_fixed ? "UG-27(d) / Appendix 1-1" : "UG-27(d)";
  return r;
}

HlCodeResult
hl_code_ug27 (const HlCodeWall *wall)
{
  HlCodeResult r;

  if (wall->form == HL_FORM_SPHERE)
    r = ug27_sphere (wall);
  else
    r = ug27_cylinder (wall);
  if (!(wall->P > 0))
    {
      r.treq = NAN;
      r.treq_reason = NO_NET_PRESSURE;
    }
  return r;
}

HlCodeResult
hl_code_en13445 (const HlCodeWall *w)
{
  HlCodeResult r = { NAN, NAN, NULL, NULL, NULL, FALSE };
  /* spheres carry twice the membrane capacity: 4 f z in place of 2 f z */
  double k = w->form == HL_FORM_SPHERE ? 4.0 : 2.0;
  double P = w->P, fz = w->SE;
  double Di = 2 * w->a, De = 2 * w->b, e = w->b - w->a;
  double ereq;

  r.clause = w->form == HL_FORM_SPHERE ? "EN 13445-3 7.4.3" : "EN 13445-3 7.4.2";
  if (w->outer_fixed)
    ereq = P * De / (k * fz + P);
  else
    ereq = P * Di / (k * fz - P);
  if (!(P > 0))
    r.treq_reason = NO_NET_PRESSURE;
  else if (!(ereq > 0) || ereq / (w->outer_fixed ? De : Di + 2 * ereq) > 0.16)
    r.treq_reason = EN_RANGE;
  else
    r.treq = ereq + w->c;

  if (e / De > 0.16)
    {
      r.mawp_reason = EN_RANGE;
      r.out_of_range = TRUE;
    }
  else
    r.mawp = k * fz * e / (Di + e);   /* Dm = mean diameter */
  return r;
}
