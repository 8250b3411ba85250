/* hl-shell-check.c — validation of shell inputs, every problem with its field
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-shell-check"

#include "hl-shell-check.h"

#include "hl-limits.h"

#include <math.h>
#include <string.h>

/* Physical bounds of every input, SI.  A value outside them is not a real
 * shell but a slip (a unit, a digit, a paste): 1e-320 as a joint
 * efficiency or a 1 nm bore in a 100 m wall computes, and the answer
 * means nothing.  Each bound names its reason; "from memory" marks a
 * figure recalled without the book at hand, "common practice" a fact of
 * the trade.  The upper bound of lengths stays where it was (100 km):
 * beyond it only overflow downstream is invited; those of pressures and
 * material values come down to what a material can be. */
typedef struct
{
  const char *field;
  double      min_si;     /* smallest value other than zero, inclusive */
  double      max_si;     /* inclusive */
  const char *min_text;   /* the bounds as the messages name them */
  const char *max_text;
  const char *why_min;
} HlBound;

/* A bore of 0.1 mm across: capillary tubing, the smallest pressure-
 * carrying bore in use, runs from about 0.1 mm (from memory). */
#define HL_MIN_BORE_DIAMETER_M 1e-4
/* A wall of 0.01 mm: thinner is a foil; bellows plies and diaphragms,
 * the thinnest pressure walls, are about 0.1 mm and 0.025 mm (from
 * memory).  Checked on the new and on the corroded wall. */
#define HL_MIN_WALL_M          1e-5
#define HL_MAX_LENGTH_M        1e5

static const HlBound bounds[] = {
  { "inner-diameter", HL_MIN_BORE_DIAMETER_M, HL_MAX_LENGTH_M, "0.1 mm", "100 km",
    "a smaller bore than a capillary's is not a pressure shell" },
  { "inner-radius", HL_MIN_BORE_DIAMETER_M / 2, HL_MAX_LENGTH_M, "0.05 mm", "100 km",
    "a smaller bore than a capillary's is not a pressure shell" },
  { "outer-diameter", HL_MIN_BORE_DIAMETER_M, HL_MAX_LENGTH_M, "0.1 mm", "100 km",
    "a smaller shell than a capillary is not a pressure shell" },
  { "outer-radius", HL_MIN_BORE_DIAMETER_M / 2, HL_MAX_LENGTH_M, "0.05 mm", "100 km",
    "a smaller shell than a capillary is not a pressure shell" },
  { "wall-thickness", HL_MIN_WALL_M, HL_MAX_LENGTH_M, "0.01 mm", "100 km",
    "a thinner wall is a foil, not a pressure wall" },
  /* allowances are stated in tenths of a millimetre (common practice),
   * but a small one is harmless; under a nanometre, a few atoms, it is
   * a slip, and zero means none */
  { "corrosion-allowance", 1e-9, HL_MAX_LENGTH_M, "1 nm", "100 km",
    "a few atoms are no allowance; 0 means none" },
  /* the results are linear in the pressure, so a small one loses nothing
   * until the stresses near the subnormal doubles; 1 µPa is far below any
   * gauge and far above them.  10 GPa is above the yield strength of any
   * steel: no shell holds it (the highest-pressure equipment in service,
   * isostatic presses and water-jet intensifiers, works below 1 GPa, from
   * memory) */
  { "internal-pressure", 1e-6, 1e10, "1 µPa", "10 GPa",
    "no gauge reads less; 0 means none" },
  { "external-pressure", 1e-6, 1e10, "1 µPa", "10 GPa",
    "no gauge reads less; 0 means none" },
  /* elastomers, the softest solids a shell is made of, start near 1 MPa;
   * diamond, the stiffest, is about 1 050 to 1 200 GPa (from memory) */
  { "elastic-modulus", 1e6, 2e12, "1 MPa", "2000 GPa",
    "softer than rubber is a slip of the unit" },
  /* lead, about 5 MPa, is among the weakest metals; the strongest steel
   * wires reach 3 to 4 GPa (from memory) */
  { "yield-strength", 1e6, 1e10, "1 MPa", "10 GPa",
    "weaker than lead is a slip of the unit" },
  /* allowables of plastics at temperature go down to about 1 MPa (from
   * memory), a tenth of that leaves room */
  { "allowable-stress", 1e5, 1e10, "0.1 MPa", "10 GPa",
    "lower than any material's allowable is a slip of the unit" },
  /* the thin-wall error is computed to about 1e-12 relative; below
   * 0.001 % the verdict turns on the last digits of the inputs */
  { "thin-tolerance", 1e-5, 1.0, "0.001 %", "100 %",
    "a smaller tolerance than the inputs' own precision decides nothing" },
};

/* Weld joint efficiencies tabulate from 0.45 (single fillet lap joint,
 * ASME VIII-1 Table UW-12, from memory) to 1; ligament efficiencies of
 * drilled shells go lower, to about 0.2 (from memory).  0.1 leaves room
 * for both; 1e-320 is a slip. */
#define HL_MIN_JOINT_EFFICIENCY 0.1
/* below this t/a the wall is a film: differences of nearly equal radii
 * lose more digits than the results can afford */
#define HL_MIN_THIN_RATIO   1e-8
/* Outer over inner radius: thick-walled high-pressure parts run to k of
 * 3 to 10 (common practice); past 1000 it is a block with a pin hole.
 * Checked on the new wall, whose bore is the smaller. */
#define HL_MAX_RADIUS_RATIO 1000.0

/* without a field's own bounds: the kind's */
#define HL_MAX_STRESS_PA    1e13
#define HL_MIN_MATERIAL_PA  1e3
#define HL_MIN_LENGTH_M     1e-9

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

static const HlBound *
find_bound (const char *field)
{
  for (guint i = 0; field != NULL && i < G_N_ELEMENTS (bounds); i++)
    if (strcmp (bounds[i].field, field) == 0)
      return &bounds[i];
  return NULL;
}

/* Limits of a kind, for a field without its own bounds */
static char *
check_kind_limits (double          si,
                   HlQuantityKind  kind,
                   gboolean        zero_allowed)
{
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

char *
hl_check_quantity (const char     *field,
                   HlQuantity      q,
                   HlQuantityKind  kind,
                   gboolean        zero_allowed)
{
  double factor = hl_unit_factor (kind, q.unit);
  const HlBound *bound = find_bound (field);
  double si;

  if (kind != HL_KIND_RATIO && factor <= 0.0)
    {
      g_autofree char *quoted = hl_text_quote (q.unit, 40);

      return g_strdup_printf ("unknown unit “%s”", quoted);
    }
  if (!isfinite (q.value))
    return g_strdup ("is not a finite number");
  si = kind == HL_KIND_RATIO ? q.value : q.value * factor;
  if (si < 0.0)
    return g_strdup ("must not be negative");
  if (si == 0.0 && !zero_allowed)
    return g_strdup ("must be greater than zero");
  if (bound == NULL)
    return check_kind_limits (si, kind, zero_allowed);
  if (si > bound->max_si)
    return g_strdup_printf ("is unrealistically large (over %s)", bound->max_text);
  if (si > 0.0 && si < bound->min_si)
    return g_strdup_printf ("is unrealistically small (under %s%s: %s)", bound->min_text,
                            zero_allowed ? ", other than 0" : "", bound->why_min);
  return NULL;
}

static char *
mm_text (double metres)
{
  return hl_format_significant (metres * 1e3, 3);
}

/* Checks of the radii together, new wall and corroded wall: each value
 * may be within its bounds and the shell still not be one. */
static void
check_radii (GPtrArray           *problems,
             const HlShellInputs *in)
{
  double t = hl_quantity_si (in->wall_thickness, HL_KIND_LENGTH);
  double c = hl_quantity_si (in->corrosion_allowance, HL_KIND_LENGTH);
  double a, b, a_new, b_new;

  hl_shell_inputs_radii (in, FALSE, &a_new, &b_new);
  hl_shell_inputs_radii (in, TRUE, &a, &b);
  if (a_new <= 0.0)
    add (problems, "wall-thickness",
         g_strdup ("leaves no bore: the wall is as thick as the outer radius or more"));
  else if (2.0 * a_new < HL_MIN_BORE_DIAMETER_M)
    {
      g_autofree char *bore = mm_text (2.0 * a_new);

      add (problems, "wall-thickness",
           g_strdup_printf ("leaves a bore of %s mm across; the bore must be at least 0.1 mm", bore));
    }
  else if (c >= t)
    add (problems, "corrosion-allowance",
         g_strdup ("must be less than the wall thickness"));
  else if (b - a < HL_MIN_WALL_M)
    {
      g_autofree char *left = mm_text (b - a);

      add (problems, "corrosion-allowance",
           g_strdup_printf ("leaves a corroded wall of %s mm; the wall after corrosion must be at least 0.01 mm",
                            left));
    }
  else if ((b - a) / a < HL_MIN_THIN_RATIO)
    add (problems, "wall-thickness",
         g_strdup ("is too thin to compute reliably (under 1e-8 of the inner radius)"));
  else if (b_new / a_new > HL_MAX_RADIUS_RATIO)
    add (problems, "wall-thickness",
         g_strdup ("makes the outer radius more than 1000 times the bore radius (new wall): not a shell"));
}

/* A name is one line: a line break in it could forge a line of the
 * summary or the report, a tab a column of a table. */
static void
check_name (GPtrArray  *problems,
            const char *name,
            const char *whose)
{
  if (hl_text_has_control (name, FALSE))
    add (problems, "name",
         g_strdup_printf ("holds a control character (a line break, tab or the like): "
                          "the name of %s is one line of text", whose));
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
  check_name (problems, in->name, "a shell");
  size_msg = hl_check_quantity (size_field, in->size, HL_KIND_LENGTH, FALSE);
  t_msg = hl_check_quantity ("wall-thickness", in->wall_thickness, HL_KIND_LENGTH, FALSE);
  c_msg = hl_check_quantity ("corrosion-allowance", in->corrosion_allowance, HL_KIND_LENGTH, TRUE);
  add (problems, size_field, size_msg);
  add (problems, "wall-thickness", t_msg);
  add (problems, "corrosion-allowance", c_msg);

  if (size_msg == NULL && t_msg == NULL && c_msg == NULL)
    check_radii (problems, in);

  add (problems, "internal-pressure",
       hl_check_quantity ("internal-pressure", in->internal_pressure, HL_KIND_STRESS, TRUE));
  add (problems, "external-pressure",
       hl_check_quantity ("external-pressure", in->external_pressure, HL_KIND_STRESS, TRUE));

  check_name (problems, in->material.name, "a material");
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
  else if (in->joint_efficiency < HL_MIN_JOINT_EFFICIENCY || in->joint_efficiency > 1.0)
    add (problems, "joint-efficiency",
         g_strdup ("must be greater than 0 and at most 1, and at least 0.1 "
                   "(weld joint efficiencies tabulate from 0.45 to 1)"));

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
