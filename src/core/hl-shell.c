/* hl-shell.c — the inputs of one pressurised shell
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-shell"

#include "hl-shell.h"
#include "hl-field-table.h"

#include <string.h>

HlShellInputs
hl_shell_inputs_default (void)
{
  HlShellInputs in;

  memset (&in, 0, sizeof in);
  g_strlcpy (in.id, "shell-1", sizeof in.id);
  g_strlcpy (in.name, "Shell 1", sizeof in.name);
  in.form = HL_FORM_CYLINDER;
  in.ends = HL_ENDS_CLOSED;
  in.size_kind = HL_SIZE_INNER_DIAMETER;
  hl_field_apply_defaults (&in);
  in.material = hl_material_default ();
  g_strlcpy (in.material_ref, in.material.id, sizeof in.material_ref);
  return in;
}

gboolean
hl_shell_inputs_equal (const HlShellInputs *a,
                       const HlShellInputs *b)
{
  if (strcmp (a->id, b->id) != 0 || a->form != b->form || a->ends != b->ends || a->size_kind != b->size_kind
      || !hl_material_equal (&a->material, &b->material))
    return FALSE;
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (f->owner == HL_FIELD_OF_SHELL && !hl_field_equal (f, hl_field_cslot (f, a), hl_field_cslot (f, b)))
        return FALSE;
    }
  return TRUE;
}

void
hl_shell_inputs_radii (const HlShellInputs *in,
                       gboolean             corroded,
                       double              *a,
                       double              *b)
{
  double size = hl_quantity_si (in->size, HL_KIND_LENGTH);
  double t = hl_quantity_si (in->wall_thickness, HL_KIND_LENGTH);
  double c = corroded ? hl_quantity_si (in->corrosion_allowance, HL_KIND_LENGTH) : 0.0;
  double inner, outer;

  switch (in->size_kind)
    {
    case HL_SIZE_INNER_DIAMETER:
      inner = size / 2.0;
      outer = inner + t;
      break;
    case HL_SIZE_OUTER_DIAMETER:
      outer = size / 2.0;
      inner = outer - t;
      break;
    case HL_SIZE_INNER_RADIUS:
      inner = size;
      outer = inner + t;
      break;
    case HL_SIZE_OUTER_RADIUS:
    default:
      outer = size;
      inner = outer - t;
      break;
    }
  /* corrosion eats the inside: the bore grows, the outside stays */
  *a = inner + c;
  *b = outer;
}

typedef struct
{
  int         value;
  const char *name;
} HlName;

static const HlName form_names[] = { { HL_FORM_CYLINDER, "cylinder" }, { HL_FORM_SPHERE, "sphere" }, { 0, NULL } };
static const HlName ends_names[] = { { HL_ENDS_CLOSED, "closed" }, { HL_ENDS_OPEN, "open" }, { HL_ENDS_PLANE_STRAIN, "plane-strain" }, { 0, NULL } };
static const HlName size_names[] = {
  { HL_SIZE_INNER_DIAMETER, "inner-diameter" }, { HL_SIZE_OUTER_DIAMETER, "outer-diameter" },
  { HL_SIZE_INNER_RADIUS, "inner-radius" }, { HL_SIZE_OUTER_RADIUS, "outer-radius" }, { 0, NULL }
};
static const HlName basis_names[] = { { HL_BASIS_INNER, "inner" }, { HL_BASIS_MEAN, "mean" }, { HL_BASIS_OUTER, "outer" }, { 0, NULL } };
static const HlName measure_names[] = { { HL_MEASURE_HOOP, "hoop" }, { HL_MEASURE_EQUIVALENT, "equivalent" }, { 0, NULL } };
static const HlName criterion_names[] = { { HL_CRITERION_VON_MISES, "von-mises" }, { HL_CRITERION_TRESCA, "tresca" }, { 0, NULL } };

static const char *
name_of (const HlName *table,
         int           value)
{
  for (guint i = 0; table[i].name != NULL; i++)
    if (table[i].value == value)
      return table[i].name;
  return table[0].name;
}

static gboolean
value_of (const HlName *table,
          const char   *name,
          int          *out)
{
  for (guint i = 0; table[i].name != NULL && name != NULL; i++)
    if (strcmp (table[i].name, name) == 0)
      {
        *out = table[i].value;
        return TRUE;
      }
  return FALSE;
}

#define HL_DEFINE_NAMES(prefix, Type, table)                            \
  const char *prefix##_to_string (Type v) { return name_of (table, (int) v); } \
  gboolean prefix##_from_string (const char *s, Type *out)              \
  {                                                                     \
    int v;                                                              \
    if (!value_of (table, s, &v))                                       \
      return FALSE;                                                     \
    *out = (Type) v;                                                    \
    return TRUE;                                                        \
  }

HL_DEFINE_NAMES (hl_form, HlForm, form_names)
HL_DEFINE_NAMES (hl_ends, HlEnds, ends_names)
HL_DEFINE_NAMES (hl_basis, HlRadiusBasis, basis_names)
HL_DEFINE_NAMES (hl_measure, HlVerdictMeasure, measure_names)
HL_DEFINE_NAMES (hl_criterion, HlCriterion, criterion_names)

const char *
hl_size_kind_to_element (HlSizeKind kind)
{
  return name_of (size_names, (int) kind);
}

gboolean
hl_size_kind_from_element (const char *s,
                           HlSizeKind *out)
{
  int v;

  if (!value_of (size_names, s, &v))
    return FALSE;
  *out = (HlSizeKind) v;
  return TRUE;
}
