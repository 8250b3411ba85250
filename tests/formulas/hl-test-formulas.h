/* hl-test-formulas.h — shared helpers of the formula tests
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-solution.h"

G_BEGIN_DECLS

/* The material every formula test uses unless it says otherwise:
 * a steel-like E and nu (common practice), round yield and allowable. */
#define HLT_E      200e9
#define HLT_NU     0.3
#define HLT_YIELD  250e6
#define HLT_ALLOW  100e6

/* The Lamé closed forms of REFERENCES.md (Lai, Rubin & Krempl §5.18
 * cylinder, §5.21 sphere) written out independently of the engine, for
 * the material above. */
typedef struct
{
  double radial, hoop, axial;   /* sphere: axial = the second tangential */
  double u;                     /* radial displacement */
} HltClosed;

HltClosed     hlt_closed_form    (HlForm        form,
                                  HlEnds        ends,
                                  double        a,
                                  double        b,
                                  double        pi,
                                  double        po,
                                  double        r);

/* REFERENCES.md thin_wall_error (hoop) or thin_wall_error_equivalent,
 * from the closed forms above and the membrane formulas. */
double        hlt_thin_wall_error (HlForm           form,
                                   HlEnds           ends,
                                   HlRadiusBasis    basis,
                                   HlVerdictMeasure measure,
                                   double           a,
                                   double           b,
                                   double           pi,
                                   double           po);

/* Internal pressure alone (po = 0) at which the peak equivalent stress of
 * @criterion reaches @limit, for a wall of radius ratio @k: the closed
 * forms of REFERENCES.md (first yield with sy = @limit). */
double        hlt_limit_pressure (HlForm        form,
                                  HlEnds        ends,
                                  HlCriterion   criterion,
                                  double        k,
                                  double        limit);

/* A shell entered in metres and pascals, so that round inputs stay exact
 * where a test depends on it; corrosion allowance 0, Ej 1. */
HlShellInputs hlt_shell          (HlForm        form,
                                  HlEnds        ends,
                                  HlSizeKind    kind,
                                  double        size_m,
                                  double        t_m,
                                  double        pi_pa,
                                  double        po_pa);

/* hl_solve on the corroded wall; fails the test (and returns NULL) when
 * the engine refuses valid inputs. */
HlSolution   *hlt_solve          (const HlShellInputs *in,
                                  guint                n_points);

gboolean      hlt_check_close    (const char   *file,
                                  int           line,
                                  const char   *what,
                                  double        got,
                                  double        want,
                                  double        rel_tol,
                                  double        abs_tol);
gboolean      hlt_check_result   (const char   *file,
                                  int           line,
                                  const char   *what,
                                  HlResult      got,
                                  double        want,
                                  double        rel_tol,
                                  double        abs_tol);
gboolean      hlt_check_na       (const char   *file,
                                  int           line,
                                  const char   *what,
                                  HlResult      got);

/* |got - want| <= max(rel_tol |want|, abs_tol); the failure message names
 * the expression, both values and the difference.  Assertions are
 * non-fatal so one TAP run reports every wrong number. */
#define hlt_assert_close(got, want, rel_tol, abs_tol) \
  hlt_check_close (__FILE__, __LINE__, #got, (got), (want), (rel_tol), (abs_tol))
/* an available result (no reason) close to @want */
#define hlt_assert_result(got, want, rel_tol, abs_tol) \
  hlt_check_result (__FILE__, __LINE__, #got, (got), (want), (rel_tol), (abs_tol))
/* a result that is not available: NaN value and a reason in words */
#define hlt_assert_na(got) \
  hlt_check_na (__FILE__, __LINE__, #got, (got))

/* @text with each line break and the indent after it made one space:
 * the text report wraps at 100 columns, a phrase may span two lines */
char         *hlt_unwrap         (const char   *text);

G_END_DECLS
