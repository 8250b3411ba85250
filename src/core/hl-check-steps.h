/* hl-check-steps.h — each check of the design as a checker redoes it:
 * the formula as the clause prints it, the same with the numbers put in,
 * the result, the criterion and OK / NOT OK
 *
 * Read by the calculation sheet and the text report, so both show the
 * same steps.  Every number comes from the one solution, and each step's
 * result is what the solver found (the tests redo the arithmetic of the
 * substituted line and compare).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-solution.h"
#include "hl-units.h"

G_BEGIN_DECLS

typedef struct
{
  const char   *method_key;   /* "ug27", "en13445", "lame", "thin", then the floors "yield", "collapse" */
  char         *title;        /* "ASME VIII-1 UG-27(c)(1), circumferential stress" */
  char         *formula;      /* as printed in the clause: "t = P·R / (S·E − 0.6·P)" */
  char         *substituted;  /* the same with the numbers and units put in, ending "= result" */
  char         *result;       /* "t = 12.59 mm" */
  char         *criterion;    /* "t ≤ t available = 12.00 mm" */
  double        utilisation;  /* fraction; NaN: none */
  HlCheckResult verdict;      /* PASS (OK), FAIL (NOT OK), NOT_APPLICABLE */
  gboolean      governing;    /* this step decides the design verdict */
  gboolean      by_pressure;  /* compares the design pressure with an allowable one */
  char         *reason;       /* why FAIL or NOT APPLICABLE, or NULL */
  /* for the tests: the step's result in SI (m or Pa), NaN when none */
  double        value;
} HlCheckStep;

/* In the order of the checks table (UG-27, EN 13445-3, Lamé, thin
 * wall), then the floors (first yield, plastic collapse).  Numbers in
 * @units, with the user's decimal separator when @locale_numbers.
 * g_ptr_array_unref() frees the steps. */
GPtrArray  *hl_check_steps          (const HlSolution *solution,
                                     HlUnitSystem      units,
                                     gboolean          locale_numbers);

/* "OK", "NOT OK", "NOT APPLICABLE": the words of a step's verdict */
const char *hl_check_step_word      (HlCheckResult     verdict);

G_END_DECLS
