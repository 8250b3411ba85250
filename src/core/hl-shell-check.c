/* hl-shell-check.c — validation of shell inputs, every problem with its field
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-shell-check"

#include "hl-shell-check.h"

#include <math.h>

/* Beyond these the numbers stop meaning a real shell (a 100 km radius, a
 * pressure of 10 000 GPa) and only invite overflow downstream. */
#define HL_MAX_LENGTH_M     1e5
#define HL_MIN_LENGTH_M     1e-9
#define HL_MAX_STRESS_PA    1e13
#define HL_MIN_MATERIAL_PA  1e3
/* below this t/a the wall is a film: differences of nearly equal radii
 * lose more digits than the results can afford */
#define HL_MIN_THIN_RATIO   1e-8
#define HL_MAX_RADIUS_RATIO 1e6

void
hl_problem_free (HlProblem *problem)
{
  if (problem == NULL)
    return;
  g_free (problem->message);
  g_free (problem);
}

static void
add (GPtrArray  *problems,
     const char *field,
     char       *message)
{
  HlProblem *p;

  if (message == NULL)
    return;
  p = g_new0 (HlProblem, 1);
  p->field = field;
  p->message = message;
  g_ptr_array_add (problems, p);
}

char *
hl_check_quantity (const char     *field,
                   HlQuantity      q,
                   HlQuantityKind  kind,
                   gboolean        zero_allowed)
{
  double factor = hl_unit_factor (kind, q.unit);
  double si;

  (void) field;
  if (kind != HL_KIND_RATIO && factor <= 0.0)
    return g_strdup_printf ("unknown unit “%s”", q.unit);
  if (!isfinite (q.value))
    return g_strdup ("is not a finite number");
  si = kind == HL_KIND_RATIO ? q.value : q.value * factor;
  if (si < 0.0)
    return g_strdup ("must not be negative");
  if (si == 0.0 && !zero_allowed)
    return g_strdup ("must be greater than zero");
  switch (kind)
    {
    case HL_KIND_LENGTH:
      if (si > HL_MAX_LENGTH_M)
        return g_strdup ("is unrealistically large (over 100 km)");
      if (si > 0.0 && si < HL_MIN_LENGTH_M)
        return g_strdup ("is unrealistically small (under 1 nm)");
      break;
    case HL_KIND_STRESS:
    case HL_KIND_MODULUS:
      if (si > HL_MAX_STRESS_PA)
        return g_strdup ("is unrealistically large (over 10 000 GPa)");
      /* material strengths and moduli (never zero) below a kilopascal are
       * a slip of the unit, not a material */
      if (!zero_allowed && si < HL_MIN_MATERIAL_PA)
        return g_strdup ("is unrealistically small (under 1 kPa)");
      break;
    case HL_KIND_PERCENT:
    case HL_KIND_RATIO:
    default:
      break;
    }
  return NULL;
}

GPtrArray *
hl_shell_inputs_check (const HlShellInputs *in)
{
  GPtrArray *problems = g_ptr_array_new_with_free_func ((GDestroyNotify) hl_problem_free);
  const char *size_field = hl_size_kind_to_element (in->size_kind);
  char *size_msg, *t_msg, *c_msg;

  g_return_val_if_fail (in != NULL, problems);

  if (in->id[0] == '\0')
    add (problems, "id", g_strdup ("the shell needs an id"));
  size_msg = hl_check_quantity (size_field, in->size, HL_KIND_LENGTH, FALSE);
  t_msg = hl_check_quantity ("wall-thickness", in->wall_thickness, HL_KIND_LENGTH, FALSE);
  c_msg = hl_check_quantity ("corrosion-allowance", in->corrosion_allowance, HL_KIND_LENGTH, TRUE);
  add (problems, size_field, size_msg);
  add (problems, "wall-thickness", t_msg);
  add (problems, "corrosion-allowance", c_msg);

  if (size_msg == NULL && t_msg == NULL && c_msg == NULL)
    {
      double t = hl_quantity_si (in->wall_thickness, HL_KIND_LENGTH);
      double c = hl_quantity_si (in->corrosion_allowance, HL_KIND_LENGTH);
      double a, b, a_new, b_new;

      hl_shell_inputs_radii (in, FALSE, &a_new, &b_new);
      hl_shell_inputs_radii (in, TRUE, &a, &b);
      if (a_new <= 0.0)
        add (problems, "wall-thickness",
             g_strdup ("leaves no bore: the wall is as thick as the outer radius or more"));
      else if (c >= t)
        add (problems, "corrosion-allowance",
             g_strdup ("must be less than the wall thickness"));
      else if ((b - a) / a < HL_MIN_THIN_RATIO)
        add (problems, "wall-thickness",
             g_strdup ("is too thin to compute reliably (under 1e-8 of the inner radius)"));
      else if (b / a > HL_MAX_RADIUS_RATIO)
        add (problems, "wall-thickness",
             g_strdup ("is over a million times the inner radius: not a shell"));
    }

  add (problems, "internal-pressure",
       hl_check_quantity ("internal-pressure", in->internal_pressure, HL_KIND_STRESS, TRUE));
  add (problems, "external-pressure",
       hl_check_quantity ("external-pressure", in->external_pressure, HL_KIND_STRESS, TRUE));

  add (problems, "elastic-modulus",
       hl_check_quantity ("elastic-modulus", in->material.elastic_modulus, HL_KIND_MODULUS, FALSE));
  if (!isfinite (in->material.poisson_ratio))
    add (problems, "poisson-ratio", g_strdup ("is not a finite number"));
  else if (in->material.poisson_ratio <= -1.0 || in->material.poisson_ratio >= 0.5)
    add (problems, "poisson-ratio", g_strdup ("must lie between -1 and 0.5 (exclusive)"));
  add (problems, "yield-strength",
       hl_check_quantity ("yield-strength", in->material.yield_strength, HL_KIND_STRESS, FALSE));
  add (problems, "allowable-stress",
       hl_check_quantity ("allowable-stress", in->material.allowable_stress, HL_KIND_STRESS, FALSE));

  if (!isfinite (in->joint_efficiency))
    add (problems, "joint-efficiency", g_strdup ("is not a finite number"));
  else if (in->joint_efficiency <= 0.0 || in->joint_efficiency > 1.0)
    add (problems, "joint-efficiency", g_strdup ("must be greater than 0 and at most 1"));

  {
    char *msg = hl_check_quantity ("thin-tolerance", in->thin_tolerance, HL_KIND_PERCENT, FALSE);

    if (msg == NULL && hl_quantity_si (in->thin_tolerance, HL_KIND_PERCENT) >= 1.0)
      msg = g_strdup ("must be less than 100 %");
    add (problems, "thin-tolerance", msg);
  }
  return problems;
}

char *
hl_problems_join (GPtrArray *problems)
{
  GString *s = g_string_new (NULL);

  for (guint i = 0; i < problems->len; i++)
    {
      HlProblem *p = g_ptr_array_index (problems, i);

      if (i > 0)
        g_string_append (s, "; ");
      g_string_append_printf (s, "%s %s", p->field, p->message);
    }
  return g_string_free (s, FALSE);
}
