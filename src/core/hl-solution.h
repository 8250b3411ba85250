/* hl-solution.h — everything computed for one shell, read by every output
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-lame.h"
#include "hl-design-check.h"

G_BEGIN_DECLS

#define HL_DEFAULT_POINTS 101
#define HL_MAX_POINTS     100001

/* how the thin-wall value compares with the Lamé peak */
typedef enum
{
  HL_THIN_WORDING_NOT_COMPARABLE,
  HL_THIN_WORDING_OPPOSITE_SIGN,  /* unconservative */
  HL_THIN_WORDING_UNDER,          /* unconservative */
  HL_THIN_WORDING_OVER,           /* conservative */
  HL_THIN_WORDING_EQUAL,
} HlThinWording;

typedef struct
{
  double r;
  double hoop, radial, axial;     /* Lamé */
  double von_mises, tresca;       /* of the Lamé state */
  double thin_hoop, thin_axial;   /* membrane, constant through the wall */
} HlWallPoint;

/* A scalar result that may not exist for this shell; then @reason says
 * why in a few words and @value is NaN. */
typedef struct
{
  double      value;
  const char *reason;
} HlResult;

/* hl-test-pressure.h */
typedef struct _HlTestPressure HlTestPressure;

typedef struct
{
  HlShellInputs inputs;
  gboolean      corroded;       /* analysis wall has the allowance removed */

  /* analysis wall and loads, SI */
  double a, b, t, k;
  double mean_ratio;            /* mean radius / thickness */
  double pi, po;
  double mill;                  /* undertolerance removed with the allowance (m) */
  double code_pressure;         /* what the code formulas took: pi, or pi - po */
  gboolean code_coincident;     /* ... pi - po: the external pressure always acts */
  double allowable;             /* S Ej */
  double yield;
  double tolerance;             /* percent */
  HlLame lame;

  guint        n_points;
  HlWallPoint *points;

  HlResult thin_hoop, thin_axial;
  HlResult lame_hoop_inner, lame_hoop_outer;
  HlResult lame_radial_inner, lame_radial_outer;
  HlResult lame_axial;
  HlResult thin_wall_error, thin_wall_error_equivalent;
  gboolean is_thin;             /* verdict of the chosen measure */
  HlVerdictMeasure thin_governing; /* HOOP or EQUIVALENT: the error that decides */
  char thin_words[120];         /* "underestimates the peak by 30.6 % (unconservative)" */
  /* the same in parts, for a view that words it in its own language */
  HlThinWording thin_wording;
  double        thin_wording_by; /* percent, for UNDER and OVER */
  gboolean rule_of_thumb;       /* mean radius / t >= 10 */
  HlResult ratio_for_tolerance;
  HlResult von_mises_max, tresca_max;
  HlResult displacement_inner, displacement_outer;
  HlResult thin_growth_mean;
  HlResult volume_strain;       /* dV/V of the bore */
  HlResult first_yield_von_mises, first_yield_tresca;
  HlResult plastic_collapse;          /* von Mises */
  HlResult plastic_collapse_tresca;
  HlResult mawp_thin, mawp_lame;
  HlResult treq_thin, treq_lame;
  HlResult treq_ug27, mawp_ug27;
  HlResult treq_en13445, mawp_en13445;
  HlResult barlow_pressure;
  const char *ug27_clause;      /* which formula governs, for the labels */
  const char *en13445_clause;
  char ug27_source[160];        /* clause, edition and the pressure taken */
  char en13445_source[160];
  HlDesignCheck check;          /* PASS / FAIL, read by every output */
  /* the test pressure of every rule and the stress check at test of the
   * chosen one (hl-test-pressure.h); owned */
  HlTestPressure *test;
  double   test_mawp;           /* what the ASME rules multiply */
  gboolean test_mawp_is_design_pressure;
  double   test_ps;             /* PS the PED rule took */
  char     test_sources[3][240]; /* per HlTestRule: clause, formula, the pressures taken */
  HlCheckResult test_check;     /* worst of the stress checks at test; NOT_APPLICABLE: none done */

  GPtrArray *warnings;          /* char * */
} HlSolution;

#define HL_SOLVE_ERROR (hl_solve_error_quark ())
typedef enum { HL_SOLVE_ERROR_INVALID } HlSolveError;
GQuark      hl_solve_error_quark (void);

/* The one entry point.  @n_points >= 2 through the wall, inner to outer.
 * With @corroded (the normal case) the allowance is removed first.
 * Returns NULL with an error naming every bad field when @in is invalid. */
HlSolution *hl_solve          (const HlShellInputs *in,
                               guint                n_points,
                               gboolean             corroded,
                               GError             **error);
void        hl_solution_free  (HlSolution          *solution);

gboolean    hl_result_ok      (HlResult             r);

G_DEFINE_AUTOPTR_CLEANUP_FUNC (HlSolution, hl_solution_free)

G_END_DECLS
