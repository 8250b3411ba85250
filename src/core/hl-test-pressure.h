/* hl-test-pressure.h — test pressure of a shell and the stress check at test
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-solution.h"

G_BEGIN_DECLS

/* The rules, each computed on its own: a test pressure per rule, the
 * stress check for the one the user chose. */
typedef enum
{
  HL_TEST_UG99_HYDROSTATIC,     /* ASME VIII-1 UG-99(b) */
  HL_TEST_UG100_PNEUMATIC,      /* ASME VIII-1 UG-100 */
  HL_TEST_EN13445_HYDROSTATIC,  /* EN 13445-5 / PED 2014/68/EU Annex I 7.4 */
  HL_TEST_N_RULES
} HlTestRule;

/* The factors of a rule are data, not code, so that another edition of a
 * code can be handed in with its own (ASME VIII-1 before the 1999 addenda
 * used 1.5 and 1.25, from memory).  Only the current factors ship:
 * hl_test_rule_current().  The texts are marked with N_(): the caller
 * translates them. */
typedef struct
{
  HlTestRule  rule;
  const char *clause;              /* "UG-99(b)": a clause number, not translated */
  const char *formula;             /* "UG-99(b): PT = 1.3 × MAWP × LSR", marked for translation */
  double      factor;              /* on MAWP × LSR (ASME) or Pd × fa/fTd (EN) */
  double      ps_factor;           /* on PS (PED); 0 when the rule has no second term */
  const char *term_words[2];       /* "1.25 × Pd × fa/fTd governs", "1.43 × PS governs" */
  double      inspection_divisor;  /* PT / divisor; 0 when the rule sets none here */
  const char *inspection_clause;   /* "UG-99(g)", or NULL */
  const char *no_inspection;       /* N_() reason when inspection_divisor is 0 */
  gboolean    pneumatic;
} HlTestRuleData;

const HlTestRuleData *hl_test_rule_current (HlTestRule rule);

/* All pressures gauge, in Pa; lengths in m; stresses in Pa.  A value that
 * is not given is NaN (hl_test_inputs_default() sets them so). */
typedef struct
{
  /* the pressure the ASME rules multiply: the MAWP, or the design
   * pressure when the MAWP is not calculated (UG-99(b) footnote) */
  double      mawp;
  gboolean    mawp_is_design_pressure;
  double      design_pressure;      /* Pd, EN 13445-5 */
  double      ps;                   /* PS, maximum allowable pressure (PED) */
  /* allowable at test temperature / at design temperature: LSR (ASME),
   * fa/fTd (EN); the user gives the lowest of the pressure parts'
   * materials.  Default 1. */
  double      stress_ratio;
  double      yield_at_test;        /* yield strength at test temperature */
  double      limit_fraction;       /* of yield; default 0.90 (common practice) */
  HlTestRule  rule;                 /* the rule whose PT the stress check uses */
  const char *asme_edition;         /* labels shown with each clause; NULL or "" */
  const char *en_edition;           /* when not stated */

  /* the wall for the stress check, corroded: inner radius R, thickness t */
  HlForm      form;
  double      inner_radius;
  double      thickness;
  /* Lamé peak von Mises for 1 Pa internal pressure (Pa/Pa); NaN: not given */
  double      peak_equivalent_per_pa;

  /* pneumatic stored energy: vessel volume (m³; NaN: not given),
   * atmospheric pressure and the ratio of specific heats */
  double      volume;
  double      atmospheric;          /* default 101 325 Pa (standard atmosphere) */
  double      gamma;                /* default 1.4 (air) */
} HlTestInputs;

typedef enum { HL_TEST_TERM_PRESSURE, HL_TEST_TERM_PS } HlTestTerm;

typedef struct
{
  const HlTestRuleData *data;
  char       *edition;              /* owned copy; NULL when not stated */
  HlResult    pressure;             /* PT */
  HlResult    terms[2];             /* the factor × pressure term and the PS term (NaN when the rule has none) */
  HlTestTerm  governing;            /* the larger term; the pressure term on a tie */
  const char *governing_words;      /* N_() words, NULL when there is no choice of term */
  HlResult    inspection;           /* inspection pressure */
} HlTestRulePressure;

typedef enum
{
  HL_TEST_CHECK_NOT_DONE,           /* the result's reason says why */
  HL_TEST_CHECK_PASS,
  HL_TEST_CHECK_FAIL,
} HlTestVerdict;

typedef struct
{
  HlResult      stress;             /* at the chosen rule's PT */
  HlResult      of_yield;           /* stress / yield at test */
  HlResult      utilisation;        /* stress / limit */
  HlTestVerdict verdict;
  const char   *basis;              /* N_() words: which stress, which formula */
} HlTestStress;

/* typedef in hl-solution.h, which holds one */
struct _HlTestPressure
{
  HlTestRulePressure rules[HL_TEST_N_RULES];
  HlTestRule   checked_rule;
  HlResult     limit;               /* limit_fraction × yield */
  const char  *limit_words;         /* N_() words naming the limit and its source */
  HlTestStress membrane;            /* general membrane hoop, UG-27 basis */
  HlTestStress peak;                /* Lamé peak von Mises */
  HlResult     stored_energy;       /* J, for the pneumatic rule's PT */
  double       atmospheric, gamma;  /* the ones the energy used */
};

/* MAWP, Pd, PS, R, t, peak, yield, volume not given; ratio 1, limit 0.90,
 * UG-99(b), cylinder, 101 325 Pa, γ = 1.4. */
HlTestInputs    hl_test_inputs_default     (void);

/* Every rule's PT, the stress check and the energy.  Never fails: a
 * value that cannot be had is NaN with a reason naming the input. */
HlTestPressure *hl_test_pressure_new       (const HlTestInputs   *in);
/* the same with the caller's factors (another edition); @rules holds
 * HL_TEST_N_RULES entries, each for the rule of its index */
HlTestPressure *hl_test_pressure_new_with  (const HlTestInputs   *in,
                                            const HlTestRuleData *rules);
void            hl_test_pressure_free      (HlTestPressure       *test);

/* General membrane hoop stress on the UG-27 basis, pressure @p on inner
 * radius @R and thickness @t: cylinder UG-27(c)(1) solved for S,
 * σ = p (R + 0.6 t) / t; sphere UG-27(d), σ = p (R + 0.2 t) / (2 t). */
HlResult        hl_test_membrane_hoop      (HlForm                form,
                                            double                p,
                                            double                R,
                                            double                t);

/* Energy released by expanding a gas adiabatically from @p_abs (absolute)
 * to @p_atm in volume @volume (ASME PCC-2, from memory):
 * E = P V / (γ − 1) [1 − (Pa/P)^((γ − 1)/γ)]. */
HlResult        hl_test_stored_energy      (double                p_abs,
                                            double                volume,
                                            double                p_atm,
                                            double                gamma);

/* N_() words: "PASS", "FAIL", "not checked" */
const char     *hl_test_verdict_word       (HlTestVerdict         verdict);

G_DEFINE_AUTOPTR_CLEANUP_FUNC (HlTestPressure, hl_test_pressure_free)

G_END_DECLS
