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
  /* a sphere has no ends: the member is not part of its inputs */
  if (strcmp (a->id, b->id) != 0 || a->form != b->form
      || (a->form != HL_FORM_SPHERE && a->ends != b->ends) || a->size_kind != b->size_kind
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

/* the words of the choices are the field table's */
static const char *
choice_word (const char *element,
             int         value)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, element);
  const HlFieldChoice *c = hl_field_choice_by_value (f, value);

  return c != NULL ? c->word : f->choices[0].word;
}

static gboolean
choice_value (const char *element,
              const char *word,
              int        *out)
{
  const HlFieldChoice *c = hl_field_choice_by_word (hl_field_find (HL_FIELD_OF_SHELL, element), word);

  if (c == NULL)
    return FALSE;
  *out = c->value;
  return TRUE;
}

/* prefix_to_string() and prefix_from_string() over @table, looked up
 * with @word_of and @value_of */
#define HL_DEFINE_WORDS(prefix, Type, word_of, value_of, table)       \
  const char *prefix##_to_string (Type v) { return word_of (table, (int) v); } \
  gboolean prefix##_from_string (const char *s, Type *out)              \
  {                                                                     \
    int v;                                                              \
    if (!value_of (table, s, &v))                                       \
      return FALSE;                                                     \
    *out = (Type) v;                                                    \
    return TRUE;                                                        \
  }

/* form and ends are attributes, outside the field table; the others
 * are choice rows of it */
HL_DEFINE_WORDS (hl_form, HlForm, name_of, value_of, form_names)
HL_DEFINE_WORDS (hl_ends, HlEnds, name_of, value_of, ends_names)
HL_DEFINE_WORDS (hl_basis, HlRadiusBasis, choice_word, choice_value, "thin-radius-basis")
HL_DEFINE_WORDS (hl_measure, HlVerdictMeasure, choice_word, choice_value, "verdict-measure")
HL_DEFINE_WORDS (hl_criterion, HlCriterion, choice_word, choice_value, "sizing-criterion")
HL_DEFINE_WORDS (hl_design_basis, HlDesignBasis, choice_word, choice_value, "design-basis")

/* the four size elements are rows of the field table */
const char *
hl_size_kind_to_element (HlSizeKind kind)
{
  const char *first = NULL;

  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (!f->is_size)
        continue;
      if (f->size_kind == kind)
        return f->element;
      if (first == NULL)
        first = f->element;
    }
  return first;
}

gboolean
hl_size_kind_from_element (const char *s,
                           HlSizeKind *out)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, s);

  if (f == NULL || !f->is_size)
    return FALSE;
  *out = f->size_kind;
  return TRUE;
}
