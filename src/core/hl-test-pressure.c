/* hl-test-pressure.c — test pressure of a shell and the stress check at test
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-test-pressure"

#include "hl-config.h"
#include "hl-test-pressure.h"

#include <glib/gi18n-lib.h>
#include <math.h>

/* The factors of the current editions (the sources are those of
 * METHODS-NEXT §E): ASME VIII-1 UG-99(b) 1.3 and UG-99(g) PT/1.3,
 * UG-100 1.1 and PT/1.1 (since the 1999 addenda); PED 2014/68/EU Annex I
 * 7.4 max(1.25 × the maximum loading, 1.43 PS), written in EN 13445-5
 * as max(1.25 Pd fa/fTd, 1.43 PS).  EN 13445-5 is not given an
 * inspection pressure here: its wording was not checked (from memory). */
static const HlTestRuleData current_rules[HL_TEST_N_RULES] = {
  { HL_TEST_UG99_HYDROSTATIC, "UG-99(b)", N_("UG-99(b): PT = 1.3 × MAWP × LSR"), 1.3, 0.0,
    { NULL, NULL }, 1.3, "UG-99(g)", NULL, FALSE },
  { HL_TEST_UG100_PNEUMATIC, "UG-100", N_("UG-100: PT = 1.1 × MAWP × LSR"), 1.1, 0.0,
    { NULL, NULL }, 1.1, "UG-100", NULL, TRUE },
  { HL_TEST_EN13445_HYDROSTATIC, "EN 13445-5 / PED Annex I 7.4",
    N_("EN 13445-5 / PED Annex I 7.4: PT = max(1.25 × Pd × fa/fTd, 1.43 × PS)"), 1.25, 1.43,
    { N_("1.25 × Pd × fa/fTd governs"), N_("1.43 × PS governs") }, 0.0, NULL,
    N_("no inspection pressure is set for this rule here: see EN 13445-5"), FALSE },
};

/* 0.90 of yield: common practice for the general membrane stress at
 * test; ASME VIII-1 itself asks only for no visible permanent distortion */
#define HL_TEST_LIMIT_PRACTICE 0.90
/* ISO 2533 standard atmosphere; air at room temperature (common practice) */
#define HL_TEST_ATMOSPHERE_PA  101325.0
#define HL_TEST_GAMMA_AIR      1.4

const HlTestRuleData *
hl_test_rule_current (HlTestRule rule)
{
  g_return_val_if_fail (rule < HL_TEST_N_RULES, NULL);
  return &current_rules[rule];
}

HlTestInputs
hl_test_inputs_default (void)
{
  HlTestInputs in = {
    .mawp = NAN,
    .mawp_is_design_pressure = FALSE,
    .design_pressure = NAN,
    .ps = NAN,
    .stress_ratio = 1.0,
    .yield_at_test = NAN,
    .limit_fraction = HL_TEST_LIMIT_PRACTICE,
    .rule = HL_TEST_UG99_HYDROSTATIC,
    .asme_edition = NULL,
    .en_edition = NULL,
    .form = HL_FORM_CYLINDER,
    .inner_radius = NAN,
    .thickness = NAN,
    .peak_equivalent_per_pa = NAN,
    .volume = NAN,
    .atmospheric = HL_TEST_ATMOSPHERE_PA,
    .gamma = HL_TEST_GAMMA_AIR,
  };

  return in;
}

static HlResult
ok (double v)
{
  HlResult r = { v, NULL };

  return r;
}

static HlResult
na (const char *reason)
{
  HlResult r = { NAN, reason };

  return r;
}

/* the reason why @v cannot be used as a quantity above zero, or NULL */
static const char *
positive (double      v,
          const char *missing,
          const char *not_positive)
{
  if (!isfinite (v))
    return missing;
  return v > 0 ? NULL : not_positive;
}

static const char *
asme_pressure_problem (const HlTestInputs *in)
{
  if (in->mawp_is_design_pressure)
    return positive (in->mawp, N_("design pressure (in place of the MAWP) not given or not a finite number"),
                     N_("design pressure must be above zero (vacuum-only vessels have their own rule, not covered "
                        "here)"));
  return positive (in->mawp, N_("MAWP not given or not a finite number"),
                   N_("MAWP must be above zero (vacuum-only vessels have their own rule, not covered here)"));
}

static const char *
ratio_problem (const HlTestInputs *in)
{
  return positive (in->stress_ratio, N_("stress ratio (test / design temperature) not given or not a finite number"),
                   N_("stress ratio (test / design temperature) must be above zero"));
}

static void
rule_pressure (const HlTestInputs   *in,
               const HlTestRuleData *data,
               HlTestRulePressure   *out)
{
  gboolean en = data->rule == HL_TEST_EN13445_HYDROSTATIC;
  const char *edition = en ? in->en_edition : in->asme_edition;
  const char *problem = ratio_problem (in);

  out->data = data;
  out->edition = edition != NULL && *edition != '\0' ? g_strdup (edition) : NULL;
  out->governing = HL_TEST_TERM_PRESSURE;
  out->governing_words = NULL;
  if (problem == NULL)
    problem = en ? positive (in->design_pressure, N_("design pressure Pd not given or not a finite number"),
                             N_("design pressure Pd must be above zero"))
                 : asme_pressure_problem (in);
  out->terms[0] = problem == NULL ? ok (data->factor * (en ? in->design_pressure : in->mawp) * in->stress_ratio)
                                  : na (problem);
  if (data->ps_factor > 0)
    {
      const char *ps_problem = positive (in->ps, N_("maximum allowable pressure PS not given or not a finite number"),
                                         N_("maximum allowable pressure PS must be above zero"));

      out->terms[1] = ps_problem == NULL ? ok (data->ps_factor * in->ps) : na (ps_problem);
      if (problem == NULL)
        problem = ps_problem;
    }
  else
    out->terms[1] = na (N_("this rule has no second term"));

  if (problem != NULL)
    {
      out->pressure = na (problem);
      out->inspection = na (problem);
      return;
    }
  out->pressure = out->terms[0];
  if (data->ps_factor > 0)
    {
      if (out->terms[1].value > out->terms[0].value)
        {
          out->governing = HL_TEST_TERM_PS;
          out->pressure = out->terms[1];
        }
      out->governing_words = data->term_words[out->governing];
    }
  out->inspection = data->inspection_divisor > 0 ? ok (out->pressure.value / data->inspection_divisor)
                                                 : na (data->no_inspection);
}

HlResult
hl_test_membrane_hoop (HlForm form,
                       double p,
                       double R,
                       double t)
{
  const char *problem = NULL;

  if (!isfinite (p) || p < 0)
    problem = N_("test pressure not available");
  else if ((problem = positive (R, N_("inner radius not given or not a finite number"),
                                N_("inner radius must be above zero"))) == NULL)
    problem = positive (t, N_("wall thickness not given or not a finite number"), N_("wall thickness must be above zero"));
  if (problem != NULL)
    return na (problem);
  if (form == HL_FORM_SPHERE)
    return ok (p * (R + 0.2 * t) / (2.0 * t));
  return ok (p * (R + 0.6 * t) / t);
}

HlResult
hl_test_stored_energy (double p_abs,
                       double volume,
                       double p_atm,
                       double gamma)
{
  const char *problem;
  double g1;

  if ((problem = positive (volume, N_("vessel volume not given or not a finite number"),
                           N_("vessel volume must be above zero"))) != NULL)
    return na (problem);
  if ((problem = positive (p_atm, N_("atmospheric pressure not given or not a finite number"),
                           N_("atmospheric pressure must be above zero"))) != NULL)
    return na (problem);
  if (!isfinite (gamma) || gamma <= 1.0)
    return na (N_("ratio of specific heats γ must be a number above 1"));
  if (!isfinite (p_abs) || p_abs < p_atm)
    return na (N_("absolute test pressure must be a number not below the atmospheric pressure"));
  g1 = gamma - 1.0;
  /* expm1/log keep the digits when P is close to Pa */
  return ok (-p_abs * volume / g1 * expm1 (g1 / gamma * log (p_atm / p_abs)));
}

/* @stress against @limit; the reasons of the inputs carry through */
static HlTestStress
stress_check (HlResult    stress,
              HlResult    yield,
              HlResult    limit,
              const char *basis)
{
  HlTestStress s = { stress, na (stress.reason), na (stress.reason), HL_TEST_CHECK_NOT_DONE, basis };

  if (stress.reason != NULL)
    return s;
  s.of_yield = yield.reason == NULL ? ok (stress.value / yield.value) : na (yield.reason);
  if (limit.reason != NULL)
    {
      s.utilisation = na (limit.reason);
      return s;
    }
  s.utilisation = ok (stress.value / limit.value);
  s.verdict = stress.value <= limit.value ? HL_TEST_CHECK_PASS : HL_TEST_CHECK_FAIL;
  return s;
}

static void
check_at_test (const HlTestInputs *in,
               HlTestPressure     *test)
{
  const HlResult *pt = &test->rules[in->rule].pressure;
  const char *problem = positive (in->yield_at_test, N_("yield strength at test temperature not given or not a finite "
                                                        "number"),
                                  N_("yield strength at test temperature must be above zero"));
  HlResult yield = problem == NULL ? ok (in->yield_at_test) : na (problem);
  HlResult membrane, peak;

  test->checked_rule = in->rule;
  test->limit_words = in->limit_fraction == HL_TEST_LIMIT_PRACTICE
                        ? N_("0.90 × yield at test temperature (common practice; ASME VIII-1 gives no number)")
                        : N_("the given fraction of yield at test temperature (ASME VIII-1 gives no number)");
  if (problem == NULL && !(isfinite (in->limit_fraction) && in->limit_fraction > 0 && in->limit_fraction <= 1))
    problem = N_("test-stress limit must be a fraction of yield above 0 and at most 1");
  test->limit = problem == NULL ? ok (in->limit_fraction * in->yield_at_test) : na (problem);

  membrane = pt->reason != NULL ? na (pt->reason)
                                : hl_test_membrane_hoop (in->form, pt->value, in->inner_radius, in->thickness);
  test->membrane = stress_check (membrane, yield, test->limit,
                                 in->form == HL_FORM_SPHERE
                                   ? N_("general membrane stress, UG-27(d) basis: σ = PT (R + 0.2 t) / (2 t)")
                                   : N_("general membrane hoop stress, UG-27(c)(1) basis: σ = PT (R + 0.6 t) / t"));

  if (pt->reason != NULL)
    peak = na (pt->reason);
  else if (isnan (in->peak_equivalent_per_pa))
    peak = na (N_("peak von Mises stress per unit pressure not given"));
  else if (!isfinite (in->peak_equivalent_per_pa) || in->peak_equivalent_per_pa < 0)
    peak = na (N_("peak von Mises stress per unit pressure must be a finite number not below zero"));
  else
    peak = ok (in->peak_equivalent_per_pa * pt->value);
  test->peak = stress_check (peak, yield, test->limit,
                             N_("peak von Mises stress of the Lamé solution at PT (internal pressure alone)"));
}

HlTestPressure *
hl_test_pressure_new_with (const HlTestInputs   *in,
                           const HlTestRuleData *rules)
{
  HlTestPressure *test;
  const HlResult *pneumatic;

  g_return_val_if_fail (in != NULL && rules != NULL, NULL);
  g_return_val_if_fail (in->rule < HL_TEST_N_RULES, NULL);
  for (int i = 0; i < HL_TEST_N_RULES; i++)
    g_return_val_if_fail (rules[i].rule == (HlTestRule) i, NULL);

  test = g_new0 (HlTestPressure, 1);
  for (int i = 0; i < HL_TEST_N_RULES; i++)
    rule_pressure (in, &rules[i], &test->rules[i]);
  check_at_test (in, test);

  test->atmospheric = in->atmospheric;
  test->gamma = in->gamma;
  pneumatic = &test->rules[HL_TEST_UG100_PNEUMATIC].pressure;
  test->stored_energy = pneumatic->reason != NULL
                          ? na (pneumatic->reason)
                          : hl_test_stored_energy (pneumatic->value + in->atmospheric, in->volume, in->atmospheric,
                                                   in->gamma);
  return test;
}

HlTestPressure *
hl_test_pressure_new (const HlTestInputs *in)
{
  return hl_test_pressure_new_with (in, current_rules);
}

void
hl_test_pressure_free (HlTestPressure *test)
{
  if (test == NULL)
    return;
  for (int i = 0; i < HL_TEST_N_RULES; i++)
    g_free (test->rules[i].edition);
  g_free (test);
}

const char *
hl_test_verdict_word (HlTestVerdict verdict)
{
  switch (verdict)
    {
    case HL_TEST_CHECK_PASS:
      return N_("PASS");
    case HL_TEST_CHECK_FAIL:
      return N_("FAIL");
    case HL_TEST_CHECK_NOT_DONE:
    default:
      return N_("not checked");
    }
}
