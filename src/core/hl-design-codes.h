/* hl-design-codes.h — published design-by-formula rules for shells
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-shell.h"

G_BEGIN_DECLS

/* The wall a code formula sees: corroded inside radius R = a, outside
 * radius Ro = b, corroded thickness t = b - a, corrosion allowance c,
 * net internal pressure P, S Ej.  @outer_fixed says the entered size is
 * an outside one, so required thickness grows inwards. */
typedef struct
{
  HlForm   form;
  HlEnds   ends;
  gboolean outer_fixed;
  double   a, b, c;
  double   P;
  double   SE;
} HlCodeWall;

typedef struct
{
  double      treq;            /* includes c; NaN when not available */
  double      mawp;
  const char *treq_reason;     /* why not available, or NULL */
  const char *mawp_reason;
  const char *clause;          /* governing clause, for labels */
  gboolean    out_of_range;    /* the design itself is outside the range */
} HlCodeResult;

/* ASME BPVC Section VIII Division 1, UG-27 (inside radius) and
 * Appendix 1-1 (outside radius). */
HlCodeResult hl_code_ug27     (const HlCodeWall *wall);
/* EN 13445-3 7.4.2 (cylinders) and 7.4.3 (spheres). */
HlCodeResult hl_code_en13445  (const HlCodeWall *wall);

G_END_DECLS
