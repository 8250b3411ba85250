/* test-validation.c — bad inputs are refused field by field; extreme but
 * valid ones give finite results everywhere
 *
 * DESIGN.md §7 (reliability rules): every input path rejects NaN,
 * infinities, negatives where meaningless, zero thickness and absurd
 * magnitudes with a message naming the field.  The limits themselves are
 * facts of the trade (common practice): Poisson's ratio of a stable
 * isotropic solid lies in (-1, 0.5) (Timoshenko & Goodier, Theory of
 * Elasticity); a weld joint efficiency is in (0, 1] (ASME VIII-1 UW-12);
 * the corrosion allowance is part of the wall, so it is less than it.
 * Physical lower bounds (src/core/hl-shell-check.c names each reason):
 * weld joint efficiencies tabulate from 0.45 (ASME VIII-1 Table UW-12,
 * from memory), ligament efficiencies to about 0.2 (from memory), so
 * 0.1 is the floor; a capillary bore of 0.1 mm (from memory) is the
 * smallest; a wall under 0.01 mm is a foil (bellows plies 0.1 mm,
 * diaphragms 0.025 mm, from memory), new or corroded; the outer radius
 * stays within 1000 bore radii (thick high-pressure parts run to k of 3
 * to 10, common practice); elastomers (about 1 MPa) bound the modulus
 * from below and diamond (about 1 100 GPa, from memory) from above; lead
 * (about 5 MPa yield, from memory) bounds the strength.  A name is one
 * line: a control character in it could forge a line of the summary.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-validation"

#include "hl-test-formulas.h"
#include "hl-shell-check.h"

#include <math.h>
#include <string.h>

typedef void (*Mutate) (HlShellInputs *in);

typedef struct
{
  const char *what;
  Mutate      mutate;
  const char *field;       /* expected field */
  const char *alt_field;   /* another acceptable one, or NULL */
} BadCase;

#define MUTATION(name, body) \
  static void name (HlShellInputs *in) { body; }

MUTATION (size_nan, in->size.value = NAN)
MUTATION (size_inf, in->size.value = INFINITY)
MUTATION (size_negative, in->size.value = -1000)
MUTATION (size_zero, in->size.value = 0)
MUTATION (size_unit, g_strlcpy (in->size.unit, "furlong", sizeof in->size.unit))
MUTATION (size_absurd, in->size = hl_quantity_make (1e9, "m"))
MUTATION (t_nan, in->wall_thickness.value = NAN)
MUTATION (t_inf, in->wall_thickness.value = -INFINITY)
MUTATION (t_negative, in->wall_thickness.value = -10)
MUTATION (t_zero, in->wall_thickness.value = 0)
MUTATION (t_unit, g_strlcpy (in->wall_thickness.unit, "bar", sizeof in->wall_thickness.unit))
MUTATION (t_absurd_small, in->wall_thickness = hl_quantity_make (1e-15, "m"))
MUTATION (c_nan, in->corrosion_allowance.value = NAN)
MUTATION (c_negative, in->corrosion_allowance.value = -1)
MUTATION (c_equal, in->corrosion_allowance = hl_quantity_make (10, "mm"))
MUTATION (c_more, in->corrosion_allowance = hl_quantity_make (1.2, "cm"))
MUTATION (no_bore_od, in->size_kind = HL_SIZE_OUTER_DIAMETER; in->size = hl_quantity_make (20, "mm"))
MUTATION (no_bore_or, in->size_kind = HL_SIZE_OUTER_RADIUS; in->size = hl_quantity_make (8, "mm"))
MUTATION (pi_nan, in->internal_pressure.value = NAN)
MUTATION (pi_inf, in->internal_pressure.value = INFINITY)
MUTATION (pi_negative, in->internal_pressure.value = -1)
MUTATION (pi_unit, g_strlcpy (in->internal_pressure.unit, "mm", sizeof in->internal_pressure.unit))
MUTATION (pi_absurd, in->internal_pressure = hl_quantity_make (1e20, "Pa"))
MUTATION (po_nan, in->external_pressure.value = NAN)
MUTATION (po_negative, in->external_pressure.value = -0.5)
MUTATION (po_unit, g_strlcpy (in->external_pressure.unit, "atmos", sizeof in->external_pressure.unit))
MUTATION (e_nan, in->material.elastic_modulus.value = NAN)
MUTATION (e_zero, in->material.elastic_modulus.value = 0)
MUTATION (e_negative, in->material.elastic_modulus.value = -200)
MUTATION (e_unit, g_strlcpy (in->material.elastic_modulus.unit, "%", sizeof in->material.elastic_modulus.unit))
MUTATION (e_absurd, in->material.elastic_modulus = hl_quantity_make (1e20, "Pa"))
MUTATION (nu_nan, in->material.poisson_ratio = NAN)
MUTATION (nu_inf, in->material.poisson_ratio = INFINITY)
MUTATION (nu_half, in->material.poisson_ratio = 0.5)
MUTATION (nu_above, in->material.poisson_ratio = 0.7)
MUTATION (nu_minus_one, in->material.poisson_ratio = -1.0)
MUTATION (nu_below, in->material.poisson_ratio = -1.5)
MUTATION (sy_nan, in->material.yield_strength.value = NAN)
MUTATION (sy_zero, in->material.yield_strength.value = 0)
MUTATION (sy_negative, in->material.yield_strength.value = -250)
MUTATION (sy_absurd, in->material.yield_strength = hl_quantity_make (1e20, "Pa"))
MUTATION (s_nan, in->material.allowable_stress.value = NAN)
MUTATION (s_zero, in->material.allowable_stress.value = 0)
/* a modulus of 5e-324 Pa is a unit slip (found by fuzzing) */
MUTATION (e_tiny, in->material.elastic_modulus = hl_quantity_make (5e-324, "Pa"))
MUTATION (s_tiny, in->material.allowable_stress = hl_quantity_make (0.5, "Pa"))
MUTATION (s_unit, g_strlcpy (in->material.allowable_stress.unit, "kg", sizeof in->material.allowable_stress.unit))
MUTATION (ej_zero, in->joint_efficiency = 0)
MUTATION (ej_negative, in->joint_efficiency = -0.5)
MUTATION (ej_above, in->joint_efficiency = 1.0001)
MUTATION (ej_nan, in->joint_efficiency = NAN)
MUTATION (ej_inf, in->joint_efficiency = INFINITY)
MUTATION (tol_nan, in->thin_tolerance.value = NAN)
MUTATION (tol_negative, in->thin_tolerance.value = -5)
MUTATION (tol_unit, g_strlcpy (in->thin_tolerance.unit, "mm", sizeof in->thin_tolerance.unit))
MUTATION (ej_subnormal, in->joint_efficiency = 1e-320)
MUTATION (ej_low, in->joint_efficiency = 0.05)
/* corrosion hid the pin hole: the corroded bore is 100 m, the new one
 * 1 nm, and only the corroded wall was checked */
MUTATION (nm_bore, in->size = hl_quantity_make (2e-9, "m");
          in->wall_thickness = hl_quantity_make (200, "m");
          in->corrosion_allowance = hl_quantity_make (100, "m"))
MUTATION (bore_small, in->size = hl_quantity_make (0.05, "mm"))
MUTATION (bore_small_outer, in->size_kind = HL_SIZE_OUTER_DIAMETER;
          in->size = hl_quantity_make (20.05, "mm");
          in->wall_thickness = hl_quantity_make (10, "mm");
          in->corrosion_allowance = hl_quantity_make (0, "mm"))
MUTATION (t_foil, in->wall_thickness = hl_quantity_make (0.005, "mm");
          in->corrosion_allowance = hl_quantity_make (0, "mm"))
MUTATION (t_corroded_foil, in->wall_thickness = hl_quantity_make (10, "mm");
          in->corrosion_allowance = hl_quantity_make (9.995, "mm"))
MUTATION (ratio_new_wall, in->size = hl_quantity_make (2, "mm");
          in->wall_thickness = hl_quantity_make (1500, "mm");
          in->corrosion_allowance = hl_quantity_make (2, "mm"))
MUTATION (c_subnormal, in->corrosion_allowance = hl_quantity_make (1e-320, "m"))
MUTATION (pi_subnormal, in->internal_pressure = hl_quantity_make (1e-320, "Pa"))
MUTATION (pi_huge, in->internal_pressure = hl_quantity_make (20, "GPa"))
MUTATION (po_tiny, in->external_pressure = hl_quantity_make (1e-9, "Pa"))
MUTATION (e_soft, in->material.elastic_modulus = hl_quantity_make (0.5, "MPa"))
MUTATION (e_stiff, in->material.elastic_modulus = hl_quantity_make (5000, "GPa"))
MUTATION (sy_weak, in->material.yield_strength = hl_quantity_make (0.5, "MPa"))
MUTATION (sy_strong, in->material.yield_strength = hl_quantity_make (20, "GPa"))
MUTATION (s_low, in->material.allowable_stress = hl_quantity_make (0.05, "MPa"))
MUTATION (tol_subnormal, in->thin_tolerance = hl_quantity_make (1e-320, "%"))
MUTATION (name_newline, g_strlcpy (in->name, "R-7\nvon_mises_max = 1 MPa", sizeof in->name))
MUTATION (name_cr, g_strlcpy (in->name, "R-7\r", sizeof in->name))
MUTATION (material_name_tab, g_strlcpy (in->material.name, "Steel\t42", sizeof in->material.name))
MUTATION (material_name_c1, g_strlcpy (in->material.name, "Steel \xc2\x85", sizeof in->material.name))

static const BadCase bad_cases[] = {
  { "size NaN", size_nan, "inner-diameter", NULL },
  { "size infinite", size_inf, "inner-diameter", NULL },
  { "size negative", size_negative, "inner-diameter", NULL },
  { "size zero", size_zero, "inner-diameter", NULL },
  { "size unknown unit", size_unit, "inner-diameter", NULL },
  { "size 1e9 m", size_absurd, "inner-diameter", NULL },
  { "thickness NaN", t_nan, "wall-thickness", NULL },
  { "thickness -inf", t_inf, "wall-thickness", NULL },
  { "thickness negative", t_negative, "wall-thickness", NULL },
  { "thickness zero", t_zero, "wall-thickness", NULL },
  { "thickness in bar", t_unit, "wall-thickness", NULL },
  { "thickness 1e-15 m", t_absurd_small, "wall-thickness", NULL },
  { "corrosion NaN", c_nan, "corrosion-allowance", NULL },
  { "corrosion negative", c_negative, "corrosion-allowance", NULL },
  { "corrosion equal to thickness", c_equal, "corrosion-allowance", NULL },
  { "corrosion above thickness", c_more, "corrosion-allowance", NULL },
  /* an outer size with t >= the outer radius leaves an inner radius <= 0:
   * either value may be the one named */
  { "no bore outer diameter", no_bore_od, "wall-thickness", "outer-diameter" },
  { "no bore outer radius", no_bore_or, "wall-thickness", "outer-radius" },
  { "internal pressure NaN", pi_nan, "internal-pressure", NULL },
  { "internal pressure inf", pi_inf, "internal-pressure", NULL },
  { "internal pressure negative", pi_negative, "internal-pressure", NULL },
  { "internal pressure in mm", pi_unit, "internal-pressure", NULL },
  { "internal pressure 1e20 Pa", pi_absurd, "internal-pressure", NULL },
  { "external pressure NaN", po_nan, "external-pressure", NULL },
  { "external pressure negative", po_negative, "external-pressure", NULL },
  { "external pressure unknown unit", po_unit, "external-pressure", NULL },
  { "modulus NaN", e_nan, "elastic-modulus", NULL },
  { "modulus zero", e_zero, "elastic-modulus", NULL },
  { "modulus negative", e_negative, "elastic-modulus", NULL },
  { "modulus in percent", e_unit, "elastic-modulus", NULL },
  { "modulus 1e20 Pa", e_absurd, "elastic-modulus", NULL },
  { "Poisson NaN", nu_nan, "poisson-ratio", NULL },
  { "Poisson inf", nu_inf, "poisson-ratio", NULL },
  { "Poisson 0.5", nu_half, "poisson-ratio", NULL },
  { "Poisson 0.7", nu_above, "poisson-ratio", NULL },
  { "Poisson -1", nu_minus_one, "poisson-ratio", NULL },
  { "Poisson -1.5", nu_below, "poisson-ratio", NULL },
  { "yield NaN", sy_nan, "yield-strength", NULL },
  { "yield zero", sy_zero, "yield-strength", NULL },
  { "yield negative", sy_negative, "yield-strength", NULL },
  { "yield 1e20 Pa", sy_absurd, "yield-strength", NULL },
  { "allowable NaN", s_nan, "allowable-stress", NULL },
  { "allowable zero", s_zero, "allowable-stress", NULL },
  { "allowable in kg", s_unit, "allowable-stress", NULL },
  { "modulus 5e-324 Pa", e_tiny, "elastic-modulus", NULL },
  { "allowable 0.5 Pa", s_tiny, "allowable-stress", NULL },
  { "joint efficiency 0", ej_zero, "joint-efficiency", NULL },
  { "joint efficiency negative", ej_negative, "joint-efficiency", NULL },
  { "joint efficiency above 1", ej_above, "joint-efficiency", NULL },
  { "joint efficiency NaN", ej_nan, "joint-efficiency", NULL },
  { "joint efficiency inf", ej_inf, "joint-efficiency", NULL },
  { "tolerance NaN", tol_nan, "thin-tolerance", NULL },
  { "tolerance negative", tol_negative, "thin-tolerance", NULL },
  { "tolerance in mm", tol_unit, "thin-tolerance", NULL },
  { "joint efficiency 1e-320", ej_subnormal, "joint-efficiency", NULL },
  { "joint efficiency 0.05", ej_low, "joint-efficiency", NULL },
  { "1 nm bore in a 100 m wall", nm_bore, "wall-thickness", "inner-diameter" },
  { "bore 0.05 mm", bore_small, "inner-diameter", NULL },
  { "bore 0.05 mm from the outside", bore_small_outer, "wall-thickness", "outer-diameter" },
  { "wall 0.005 mm", t_foil, "wall-thickness", NULL },
  { "corroded wall 0.005 mm", t_corroded_foil, "corrosion-allowance", "wall-thickness" },
  { "new wall over 1000 bore radii", ratio_new_wall, "wall-thickness", NULL },
  { "corrosion 1e-320 m", c_subnormal, "corrosion-allowance", NULL },
  { "internal pressure 1e-320 Pa", pi_subnormal, "internal-pressure", NULL },
  { "internal pressure 20 GPa", pi_huge, "internal-pressure", NULL },
  { "external pressure 1e-9 Pa", po_tiny, "external-pressure", NULL },
  { "modulus 0.5 MPa", e_soft, "elastic-modulus", NULL },
  { "modulus 5000 GPa", e_stiff, "elastic-modulus", NULL },
  { "yield 0.5 MPa", sy_weak, "yield-strength", NULL },
  { "yield 20 GPa", sy_strong, "yield-strength", NULL },
  { "allowable 0.05 MPa", s_low, "allowable-stress", NULL },
  { "tolerance 1e-320 %", tol_subnormal, "thin-tolerance", NULL },
  { "shell name with a newline", name_newline, "name", NULL },
  { "shell name with a carriage return", name_cr, "name", NULL },
  { "material name with a tab", material_name_tab, "name", NULL },
  { "material name with a C1 control", material_name_c1, "name", NULL },
};

static void
test_default_valid (void)
{
  HlShellInputs def = hl_shell_inputs_default ();
  HlShellInputs mine = hlt_shell (HL_FORM_SPHERE, HL_ENDS_OPEN, HL_SIZE_OUTER_RADIUS, 1, 0.1, 1e6, 1e5);
  g_autoptr(GPtrArray) p1 = hl_shell_inputs_check (&def);
  g_autoptr(GPtrArray) p2 = hl_shell_inputs_check (&mine);

  g_assert_cmpuint (p1->len, ==, 0);
  g_assert_cmpuint (p2->len, ==, 0);
}

static void
test_bad (gconstpointer data)
{
  const BadCase *c = data;
  HlShellInputs in = hl_shell_inputs_default ();
  g_autoptr(GPtrArray) problems = NULL;
  g_autoptr(GError) error = NULL;
  g_autoptr(HlSolution) s = NULL;
  gboolean named = FALSE;

  c->mutate (&in);
  problems = hl_shell_inputs_check (&in);
  if (problems->len == 0)
    {
      g_test_fail_printf ("%s: no problem reported", c->what);
      return;
    }
  for (guint i = 0; i < problems->len; i++)
    {
      HlProblem *p = g_ptr_array_index (problems, i);

      g_assert_nonnull (p->message);
      g_assert_cmpstr (p->message, !=, "");
      if (g_strcmp0 (p->field, c->field) == 0 || g_strcmp0 (p->field, c->alt_field) == 0)
        named = TRUE;
      else
        g_test_fail_printf ("%s: unexpected problem on %s: %s", c->what, p->field, p->message);
    }
  if (!named)
    g_test_fail_printf ("%s: the problem is not reported on %s", c->what, c->field);

  s = hl_solve (&in, HL_DEFAULT_POINTS, TRUE, &error);
  g_assert_null (s);
  g_assert_error (error, HL_SOLVE_ERROR, HL_SOLVE_ERROR_INVALID);
  if (error != NULL && strstr (error->message, c->field) == NULL
      && (c->alt_field == NULL || strstr (error->message, c->alt_field) == NULL))
    g_test_fail_printf ("%s: the error '%s' does not name %s", c->what, error->message, c->field);
}

static void
test_several (void)
{
  /* Five problems at once: each reported with its own field, once, and
   * all named in the solver's error. */
  static const char *fields[] = {
    "wall-thickness", "internal-pressure", "poisson-ratio", "allowable-stress", "joint-efficiency",
  };
  HlShellInputs in = hl_shell_inputs_default ();
  g_autoptr(GPtrArray) problems = NULL;
  g_autoptr(GError) error = NULL;
  g_autoptr(HlSolution) s = NULL;
  g_autofree char *joined = NULL;

  in.wall_thickness.value = NAN;
  in.internal_pressure.value = -3;
  in.material.poisson_ratio = 0.7;
  g_strlcpy (in.material.allowable_stress.unit, "parsec", sizeof in.material.allowable_stress.unit);
  in.joint_efficiency = 2;
  problems = hl_shell_inputs_check (&in);
  g_assert_cmpuint (problems->len, ==, G_N_ELEMENTS (fields));
  for (guint f = 0; f < G_N_ELEMENTS (fields); f++)
    {
      guint count = 0;

      for (guint i = 0; i < problems->len; i++)
        if (g_strcmp0 (((HlProblem *) g_ptr_array_index (problems, i))->field, fields[f]) == 0)
          count++;
      g_assert_cmpuint (count, ==, 1);
    }
  joined = hl_problems_join (problems);
  s = hl_solve (&in, HL_DEFAULT_POINTS, TRUE, &error);
  g_assert_null (s);
  g_assert_error (error, HL_SOLVE_ERROR, HL_SOLVE_ERROR_INVALID);
  for (guint f = 0; f < G_N_ELEMENTS (fields); f++)
    {
      g_assert_nonnull (strstr (joined, fields[f]));
      if (error != NULL)
        g_assert_nonnull (strstr (error->message, fields[f]));
    }
}

static void
test_valid_edges (void)
{
  /* Values at the edge of the valid ranges are accepted (common practice:
   * auxetic foams have nu near -1, rubber near 0.5; an unwelded part may
   * take Ej = 1, 0.1 is the lowest accepted; zero pressures and allowance
   * mean "none"). */
  static const double nus[] = { 0.4999, -0.999, 0.0 };
  static const double ejs[] = { 1.0, 0.1 };

  for (guint i = 0; i < G_N_ELEMENTS (nus); i++)
    for (guint j = 0; j < G_N_ELEMENTS (ejs); j++)
      {
        HlShellInputs in = hl_shell_inputs_default ();
        g_autoptr(GPtrArray) problems = NULL;

        in.material.poisson_ratio = nus[i];
        in.joint_efficiency = ejs[j];
        in.internal_pressure.value = 0;
        in.thin_tolerance = hl_quantity_make (0.01, "%");
        problems = hl_shell_inputs_check (&in);
        g_assert_cmpuint (problems->len, ==, 0);
      }
}

static void
test_bounds_named (void)
{
  /* DESIGN.md §7: the message names the bound, so the user knows what
   * to type (the bounds and their sources: the head of this file) */
  static const struct { Mutate mutate; const char *bound; } cases[] = {
    { ej_low, "0.1" },
    { ej_subnormal, "0.1" },
    { bore_small, "0.1 mm" },
    { bore_small_outer, "0.1 mm" },
    { t_foil, "0.01 mm" },
    { t_corroded_foil, "0.01 mm" },
    { ratio_new_wall, "1000" },
    { pi_huge, "10 GPa" },
    { pi_subnormal, "1 µPa" },
    { e_soft, "1 MPa" },
    { e_stiff, "2000 GPa" },
    { sy_weak, "1 MPa" },
    { s_low, "0.1 MPa" },
    { tol_subnormal, "0.001 %" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      HlShellInputs in = hl_shell_inputs_default ();
      g_autoptr(GPtrArray) problems = NULL;
      g_autofree char *joined = NULL;

      cases[i].mutate (&in);
      problems = hl_shell_inputs_check (&in);
      joined = hl_problems_join (problems);
      g_test_message ("%s", joined);
      g_assert_cmpuint (problems->len, ==, 1);
      g_assert_nonnull (strstr (joined, cases[i].bound));
    }
}

static void
test_check_quantity (void)
{
  g_autofree char *ok_msg = hl_check_quantity ("wall-thickness", hl_quantity_make (10, "mm"), HL_KIND_LENGTH, FALSE);
  g_autofree char *zero_ok = hl_check_quantity ("external-pressure", hl_quantity_make (0, "bar"), HL_KIND_STRESS, TRUE);
  g_autofree char *zero_bad = hl_check_quantity ("wall-thickness", hl_quantity_make (0, "mm"), HL_KIND_LENGTH, FALSE);
  g_autofree char *nan_msg = hl_check_quantity ("wall-thickness", hl_quantity_make (NAN, "mm"), HL_KIND_LENGTH, FALSE);
  g_autofree char *neg = hl_check_quantity ("internal-pressure", hl_quantity_make (-1, "psi"), HL_KIND_STRESS, TRUE);
  g_autofree char *unit = hl_check_quantity ("internal-pressure", hl_quantity_make (1, "furlong"), HL_KIND_STRESS, TRUE);

  g_assert_null (ok_msg);
  g_assert_null (zero_ok);
  g_assert_nonnull (zero_bad);
  g_assert_nonnull (nan_msg);
  g_assert_nonnull (neg);
  g_assert_nonnull (unit);
}

/* ---- extreme but valid inputs --------------------------------------- */

#define RESULT(field) { #field, G_STRUCT_OFFSET (HlSolution, field) }
static const struct { const char *name; gsize offset; } result_fields[] = {
  RESULT (thin_hoop), RESULT (thin_axial),
  RESULT (lame_hoop_inner), RESULT (lame_hoop_outer),
  RESULT (lame_radial_inner), RESULT (lame_radial_outer), RESULT (lame_axial),
  RESULT (thin_wall_error), RESULT (thin_wall_error_equivalent), RESULT (ratio_for_tolerance),
  RESULT (von_mises_max), RESULT (tresca_max),
  RESULT (displacement_inner), RESULT (displacement_outer), RESULT (thin_growth_mean),
  RESULT (volume_strain),
  RESULT (first_yield_von_mises), RESULT (first_yield_tresca), RESULT (plastic_collapse),
  RESULT (mawp_thin), RESULT (mawp_lame), RESULT (treq_thin), RESULT (treq_lame),
  RESULT (treq_ug27), RESULT (mawp_ug27), RESULT (treq_en13445), RESULT (mawp_en13445),
  RESULT (barlow_pressure),
};

/* Common practice for a results table: a value is a finite number, or it
 * is "n/a" with a reason — never a NaN nobody explains. */
static void
scan_solution (const HlSolution *s,
               const char       *label)
{
  const double scalars[] = { s->a, s->b, s->t, s->k, s->mean_ratio, s->pi, s->po, s->allowable, s->yield };

  for (guint i = 0; i < G_N_ELEMENTS (result_fields); i++)
    {
      const HlResult *r = G_STRUCT_MEMBER_P (s, result_fields[i].offset);
      gboolean available = r->reason == NULL && isfinite (r->value);
      gboolean explained = r->reason != NULL && r->reason[0] != '\0' && isnan (r->value);

      if (!available && !explained)
        g_test_fail_printf ("%s: %s = %g with reason %s", label, result_fields[i].name, r->value,
                            r->reason != NULL ? r->reason : "(none)");
    }
  for (guint i = 0; i < G_N_ELEMENTS (scalars); i++)
    if (!isfinite (scalars[i]))
      g_test_fail_printf ("%s: scalar %u is %g", label, i, scalars[i]);
  for (guint i = 0; i < s->n_points; i++)
    {
      const HlWallPoint *p = &s->points[i];

      if (!(isfinite (p->r) && isfinite (p->hoop) && isfinite (p->radial) && isfinite (p->axial)
            && isfinite (p->von_mises) && isfinite (p->tresca) && isfinite (p->thin_hoop)
            && isfinite (p->thin_axial)))
        {
          g_test_fail_printf ("%s: point %u is not finite", label, i);
          break;
        }
    }
  for (guint i = 0; i < s->warnings->len; i++)
    g_assert_nonnull (g_ptr_array_index (s->warnings, i));
}

static void
test_extreme_valid (void)
{
  /* radius ratios 1.00002 and 1000 (common practice: from foil-thin to
   * nearly solid; a wall of 20 µm on a 1 m radius, 18 µm corroded, is
   * just above the 0.01 mm floor), each size kind, every form and end, pressures near
   * zero, ordinary, external only, both and none, with and without a
   * corrosion allowance. */
  static const double ks[] = { 1.00002, 1.01, 2, 1000 };
  static const double loads[][2] = { { 1e-6, 0 }, { 10e6, 0 }, { 0, 10e6 }, { 20e6, 5e6 }, { 0, 0 }, { 1e-6, 1e-6 } };
  static const HlSizeKind kinds[] = {
    HL_SIZE_INNER_DIAMETER, HL_SIZE_OUTER_DIAMETER, HL_SIZE_INNER_RADIUS, HL_SIZE_OUTER_RADIUS
  };
  guint n = 0;

  for (guint f = 0; f < 4; f++)
    for (guint j = 0; j < G_N_ELEMENTS (ks); j++)
      for (guint l = 0; l < G_N_ELEMENTS (loads); l++)
        for (guint kk = 0; kk < G_N_ELEMENTS (kinds); kk++)
          for (int corr = 0; corr <= 1; corr++)
            {
              HlForm form = f == 3 ? HL_FORM_SPHERE : HL_FORM_CYLINDER;
              HlEnds ends = f == 3 ? HL_ENDS_CLOSED : (HlEnds) f;
              gboolean outer = kinds[kk] == HL_SIZE_OUTER_DIAMETER || kinds[kk] == HL_SIZE_OUTER_RADIUS;
              gboolean diameter = kinds[kk] == HL_SIZE_INNER_DIAMETER || kinds[kk] == HL_SIZE_OUTER_DIAMETER;
              /* a = 1 m, b = k m whichever way it is entered */
              double t = ks[j] - 1, size = (outer ? ks[j] : 1.0) * (diameter ? 2 : 1);
              HlShellInputs in = hlt_shell (form, ends, kinds[kk], size, t, loads[l][0], loads[l][1]);
              g_autoptr(HlSolution) s = NULL;
              g_autofree char *label = NULL;

              /* the allowance takes a tenth of the wall; the corroded
               * wall keeps the ratio within the valid range */
              if (corr)
                in.corrosion_allowance = hl_quantity_make (t / 10, "m");
              label = g_strdup_printf ("form %d ends %d k %g pi %g po %g kind %d c %d",
                                       form, ends, ks[j], loads[l][0], loads[l][1], kinds[kk], corr);
              s = hlt_solve (&in, 51);
              if (s == NULL)
                {
                  g_test_message ("%s", label);
                  continue;
                }
              scan_solution (s, label);
              n++;
            }
  g_test_message ("%u solutions scanned", n);
}

static void
test_near_allowable (void)
{
  /* Just below the Lamé maximum pressure nothing warns of the allowable
   * being exceeded; just above, it does (DESIGN.md §3 warnings) — and
   * both give finite results everywhere. */
  static const double ks[] = { 1.00002, 1.5, 1000 };

  for (guint f = 0; f < 4; f++)
    for (guint j = 0; j < G_N_ELEMENTS (ks); j++)
      {
        HlForm form = f == 3 ? HL_FORM_SPHERE : HL_FORM_CYLINDER;
        HlEnds ends = f == 3 ? HL_ENDS_CLOSED : (HlEnds) f;
        HlShellInputs in = hlt_shell (form, ends, HL_SIZE_INNER_RADIUS, 1.0, ks[j] - 1, 1e6, 0);
        g_autoptr(HlSolution) probe = hlt_solve (&in, 11);
        double pmax;

        if (probe == NULL || !hl_result_ok (probe->mawp_lame))
          {
            g_test_fail_printf ("no maximum pressure for k = %g", ks[j]);
            continue;
          }
        pmax = probe->mawp_lame.value;
        for (int above = 0; above <= 1; above++)
          {
            g_autoptr(HlSolution) s = NULL;
            gboolean warned = FALSE;

            in.internal_pressure = hl_quantity_make (pmax * (above ? 1 + 1e-9 : 1 - 1e-9), "Pa");
            s = hlt_solve (&in, 11);
            if (s == NULL)
              continue;
            scan_solution (s, above ? "just above the allowable" : "just below the allowable");
            for (guint i = 0; i < s->warnings->len; i++)
              if (strstr (g_ptr_array_index (s->warnings, i), "allowable stress") != NULL)
                warned = TRUE;
            g_assert_cmpint (warned, ==, above);
          }
      }
}

static void
test_pressure_level (void)
{
  /* Linear elasticity: the thin-wall error and the ratio for the
   * tolerance depend on the pressure ratio, not on its level
   * (REFERENCES.md, ratio_for_tolerance).  1 uPa and 10 MPa must agree. */
  for (guint f = 0; f < 4; f++)
    {
      HlForm form = f == 3 ? HL_FORM_SPHERE : HL_FORM_CYLINDER;
      HlEnds ends = f == 3 ? HL_ENDS_CLOSED : (HlEnds) f;
      HlShellInputs tiny = hlt_shell (form, ends, HL_SIZE_INNER_RADIUS, 1.0, 0.3, 1e-6, 0);
      HlShellInputs big = hlt_shell (form, ends, HL_SIZE_INNER_RADIUS, 1.0, 0.3, 10e6, 0);
      g_autoptr(HlSolution) s1 = hlt_solve (&tiny, 11);
      g_autoptr(HlSolution) s2 = hlt_solve (&big, 11);

      if (s1 == NULL || s2 == NULL)
        return;
      hlt_assert_result (s1->thin_wall_error, s2->thin_wall_error.value, 1e-9, 0);
      hlt_assert_result (s1->thin_wall_error_equivalent, s2->thin_wall_error_equivalent.value, 1e-9, 0);
      hlt_assert_result (s1->ratio_for_tolerance, s2->ratio_for_tolerance.value, 1e-9, 0);
      hlt_assert_result (s1->first_yield_von_mises, s2->first_yield_von_mises.value, 1e-9, 0);
    }
}

int
main (int   argc,
      char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  g_test_set_nonfatal_assertions ();

  g_test_add_func ("/validation/default-valid", test_default_valid);
  for (guint i = 0; i < G_N_ELEMENTS (bad_cases); i++)
    {
      g_autofree char *slug = g_ascii_strdown (bad_cases[i].what, -1);
      g_autofree char *path = NULL;

      g_strdelimit (slug, " =>%", '-');
      path = g_strdup_printf ("/validation/bad/%s", slug);
      g_test_add_data_func (path, &bad_cases[i], test_bad);
    }
  g_test_add_func ("/validation/several-at-once", test_several);
  g_test_add_func ("/validation/valid-edges", test_valid_edges);
  g_test_add_func ("/validation/bounds-named", test_bounds_named);
  g_test_add_func ("/validation/check-quantity", test_check_quantity);
  g_test_add_func ("/validation/extreme-valid", test_extreme_valid);
  g_test_add_func ("/validation/near-allowable", test_near_allowable);
  g_test_add_func ("/validation/pressure-level", test_pressure_level);
  return g_test_run ();
}
