/* hl-field-table.c — one row per input of a shell and of its material
 *
 * The order of the rows is the order of the report, of the sheet and of
 * the checks (the reader names the first problem), and within each
 * owner the order of the elements the writer puts in a file.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-field-table"

#include "hl-config.h"
#include "hl-field-table.h"
#include "hl-test-pressure.h"

#include <glib/gi18n-lib.h>
#include <stddef.h>
#include <string.h>

/* A bore of 0.1 mm across: capillary tubing, the smallest pressure-
 * carrying bore in use, runs from about 0.1 mm (from memory). */
#define MIN_BORE_DIAMETER_M 1e-4
/* A wall of 0.01 mm: thinner is a foil; bellows plies and diaphragms,
 * the thinnest pressure walls, are about 0.1 mm and 0.025 mm (from
 * memory). */
#define MIN_WALL_M          1e-5
/* The upper bound of lengths stays where it was (100 km): beyond it
 * only overflow downstream is invited. */
#define MAX_LENGTH_M        1e5

#define SHELL(member)    HL_FIELD_OF_SHELL, offsetof (HlShellInputs, member)
#define MATERIAL(member) HL_FIELD_OF_MATERIAL, offsetof (HlMaterial, member)

#define TEXT_SIZE(type, member) .text_size = sizeof (((type *) NULL)->member)

#define SIZE_ROW(elem, kind_, min, min_t, why, lbl, rep) \
  { .element = elem, .kind = HL_FIELD_LENGTH, SHELL (size), .is_size = TRUE, .size_kind = kind_, \
    .bounded = TRUE, .min_si = min, .max_si = MAX_LENGTH_M, .min_text = min_t, .max_text = "100 km", \
    .why_min = why, .default_value = 1000, .default_unit = "mm", .label = lbl, .report = rep, .sheet = rep }

static const HlFieldChoice basis_choices[] = {
  { "inner", HL_BASIS_INNER, N_("Inner radius"), "inner radius", NC_("radius basis", "inner"), "radius basis" },
  { "mean", HL_BASIS_MEAN, N_("Mean radius"), "mean radius", NC_("radius basis", "mean"), "radius basis" },
  { "outer", HL_BASIS_OUTER, N_("Outer radius"), "outer radius", NC_("radius basis", "outer"), "radius basis" },
  { NULL, 0, NULL, NULL, NULL, NULL },
};

static const HlFieldChoice measure_choices[] = {
  { "hoop", HL_MEASURE_HOOP, N_("Hoop stress"), "hoop stress", N_("hoop stress"), NULL },
  { "equivalent", HL_MEASURE_EQUIVALENT, N_("Equivalent stress"), "equivalent (von Mises)",
    N_("von Mises stress"), NULL },
  /* format 1.2: each error within the tolerance */
  { "both", HL_MEASURE_BOTH, N_("Hoop and von Mises stress"), "hoop and von Mises, each",
    N_("hoop and von Mises stress"), NULL },
  { NULL, 0, NULL, NULL, NULL, NULL },
};

/* names of criteria, not translated */
static const HlFieldChoice criterion_choices[] = {
  { "von-mises", HL_CRITERION_VON_MISES, N_("von Mises"), "von Mises", NULL, NULL },
  { "tresca", HL_CRITERION_TRESCA, N_("Tresca"), "Tresca", NULL, NULL },
  { NULL, 0, NULL, NULL, NULL, NULL },
};

/* names of published rules, not translated */
static const HlFieldChoice design_basis_choices[] = {
  { "asme-ug27", HL_DESIGN_BASIS_UG27, "ASME VIII-1 UG-27 and Appendix 1-1", "ASME VIII-1 UG-27 + App. 1-1",
    "ASME VIII-1 UG-27 + App. 1-1", NULL },
  { "en13445", HL_DESIGN_BASIS_EN13445, "EN 13445-3 7.4", "EN 13445-3 7.4", "EN 13445-3 7.4", NULL },
  { "lame", HL_DESIGN_BASIS_LAME, N_("Lamé, elastic, sizing criterion"), "Lame elastic (sizing criterion)",
    N_("Lamé elastic (sizing criterion)"), NULL },
  { "thin-wall", HL_DESIGN_BASIS_THIN, N_("Thin wall (membrane)"), "thin wall (membrane)",
    N_("thin wall (membrane)"), NULL },
  { NULL, 0, NULL, NULL, NULL, NULL },
};

/* names of published rules; the kind of test is a word */
static const HlFieldChoice test_rule_choices[] = {
  { "asme-ug99b", HL_TEST_UG99_HYDROSTATIC, N_("ASME VIII-1 UG-99(b), hydrostatic"),
    "ASME VIII-1 UG-99(b), hydrostatic", N_("ASME VIII-1 UG-99(b), hydrostatic"), NULL },
  { "asme-ug100", HL_TEST_UG100_PNEUMATIC, N_("ASME VIII-1 UG-100, pneumatic"), "ASME VIII-1 UG-100, pneumatic",
    N_("ASME VIII-1 UG-100, pneumatic"), NULL },
  { "en13445-5", HL_TEST_EN13445_HYDROSTATIC, N_("EN 13445-5 / PED, hydrostatic"),
    "EN 13445-5 / PED Annex I 7.4, hydrostatic", N_("EN 13445-5 / PED Annex I 7.4, hydrostatic"), NULL },
  { NULL, 0, NULL, NULL, NULL, NULL },
};

static const HlFieldChoice yes_no_choices[] = {
  { "no", FALSE, N_("No"), "no", N_("no"), NULL },
  { "yes", TRUE, N_("Yes"), "yes", N_("yes"), NULL },
  { NULL, 0, NULL, NULL, NULL, NULL },
};

/* Each bound names its reason; "from memory" marks a figure recalled
 * without the book at hand, "common practice" a fact of the trade.  A
 * value outside them is not a real shell but a slip (a unit, a digit, a
 * paste): 1e-320 as a joint efficiency or a 1 nm bore in a 100 m wall
 * computes, and the answer means nothing. */
static const HlField fields[] = {
  { .element = "name", .kind = HL_FIELD_TEXT, SHELL (name), TEXT_SIZE (HlShellInputs, name),
    .label = N_("Name") },
  { .element = "material-ref", .kind = HL_FIELD_TEXT, SHELL (material_ref),
    TEXT_SIZE (HlShellInputs, material_ref), .required = TRUE },
  SIZE_ROW ("inner-diameter", HL_SIZE_INNER_DIAMETER, MIN_BORE_DIAMETER_M, "0.1 mm",
            N_("a smaller bore than a capillary's is not a pressure shell"), N_("Inner diameter"), N_("Inner diameter")),
  SIZE_ROW ("outer-diameter", HL_SIZE_OUTER_DIAMETER, MIN_BORE_DIAMETER_M, "0.1 mm",
            N_("a smaller shell than a capillary is not a pressure shell"), N_("Outer diameter"), N_("Outer diameter")),
  SIZE_ROW ("inner-radius", HL_SIZE_INNER_RADIUS, MIN_BORE_DIAMETER_M / 2, "0.05 mm",
            N_("a smaller bore than a capillary's is not a pressure shell"), N_("Inner radius"), N_("Inner radius")),
  SIZE_ROW ("outer-radius", HL_SIZE_OUTER_RADIUS, MIN_BORE_DIAMETER_M / 2, "0.05 mm",
            N_("a smaller shell than a capillary is not a pressure shell"), N_("Outer radius"), N_("Outer radius")),
  { .element = "wall-thickness", .kind = HL_FIELD_LENGTH, SHELL (wall_thickness), .required = TRUE,
    .bounded = TRUE, .min_si = MIN_WALL_M, .max_si = MAX_LENGTH_M, .min_text = "0.01 mm", .max_text = "100 km",
    .why_min = N_("a thinner wall is a foil, not a pressure wall"), .default_value = 10, .default_unit = "mm",
    .label = N_("Wall thickness"), .report = N_("Wall thickness (new)"), .sheet = N_("Wall thickness (new)") },
  /* allowances are stated in tenths of a millimetre (common practice),
   * but a small one is harmless; under a nanometre, a few atoms, it is
   * a slip, and zero means none */
  { .element = "corrosion-allowance", .kind = HL_FIELD_LENGTH, SHELL (corrosion_allowance),
    .zero_allowed = TRUE, .bounded = TRUE, .min_si = 1e-9, .max_si = MAX_LENGTH_M, .min_text = "1 nm",
    .max_text = "100 km", .why_min = N_("a few atoms are no allowance; 0 means none"), .default_value = 0,
    .default_unit = "mm", .label = N_("Corrosion allowance"), .report = N_("Corrosion allowance"),
    .sheet = N_("Corrosion allowance") },
  /* Mill undertolerance, format 1.2: as a length or as a percentage of
   * the nominal wall (12.5 % for seamless pipe, common practice), or
   * both when a product standard says "whichever is greater"; the
   * larger takes.  The bounds are the allowance's; half the wall is
   * far beyond any product standard (common practice) and a slip. */
  { .element = "mill-undertolerance", .kind = HL_FIELD_LENGTH, SHELL (mill_tolerance),
    .zero_allowed = TRUE, .bounded = TRUE, .min_si = 1e-9, .max_si = MAX_LENGTH_M, .min_text = "1 nm",
    .max_text = "100 km", .why_min = N_("a few atoms are no tolerance; 0 means none"), .default_value = 0,
    .default_unit = "mm", .label = N_("Mill undertolerance"), .report = "Mill undertolerance (length)",
    .sheet = N_("Mill undertolerance (length)"), .since_minor = 2 },
  { .element = "mill-undertolerance-percent", .kind = HL_FIELD_PERCENT, SHELL (mill_tolerance_percent),
    .zero_allowed = TRUE, .bounded = TRUE, .min_si = 1e-5, .max_si = 0.5, .max_exclusive = TRUE,
    .min_text = "0.001 %", .max_text = "50 %",
    .why_min = N_("a smaller tolerance than the inputs' own precision; 0 means none"),
    .default_value = 0, .default_unit = "%",
    /* a label, never a format: "% o" is not a conversion */
    /* xgettext:no-c-format */
    .label = N_("Mill undertolerance (% of nominal)"),
    .report = "Mill undertolerance (% of nominal)",
    /* xgettext:no-c-format */
    .sheet = N_("Mill undertolerance (% of nominal)"),
    .since_minor = 2 },
  /* the results are linear in the pressure, so a small one loses nothing
   * until the stresses near the subnormal doubles; 1 µPa is far below any
   * gauge and far above them.  10 GPa is above the yield strength of any
   * steel: no shell holds it (the highest-pressure equipment in service,
   * isostatic presses and water-jet intensifiers, works below 1 GPa, from
   * memory).  A new shell shows an example pressure; a file that gives
   * none means zero (hl_reader_shell_default). */
  { .element = "internal-pressure", .kind = HL_FIELD_PRESSURE, SHELL (internal_pressure),
    .zero_allowed = TRUE, .bounded = TRUE, .min_si = 1e-6, .max_si = 1e10, .min_text = "1 µPa",
    .max_text = "10 GPa", .why_min = N_("no gauge reads less; 0 means none"), .default_value = 10,
    .default_unit = "bar", .label = N_("Internal pressure"), .report = N_("Internal pressure (gauge)"),
    .sheet = N_("Internal pressure (gauge)") },
  { .element = "external-pressure", .kind = HL_FIELD_PRESSURE, SHELL (external_pressure),
    .zero_allowed = TRUE, .bounded = TRUE, .min_si = 1e-6, .max_si = 1e10, .min_text = "1 µPa",
    .max_text = "10 GPa", .why_min = N_("no gauge reads less; 0 means none"), .default_value = 0,
    .default_unit = "bar", .label = N_("External pressure"), .report = N_("External pressure (gauge)"),
    .sheet = N_("External pressure (gauge)") },
  /* format 1.2: whether the code formulas may count on the external
   * pressure; off, they take the internal design pressure alone */
  { .element = "external-pressure-coincident", .kind = HL_FIELD_CHOICE, SHELL (external_coincident),
    .default_value = FALSE, .label = N_("External pressure always coincident"),
    .tooltip = N_("Yes only when the outside pressure can never be lost while the inside one acts"),
    .report = "External pressure always acts", .sheet = N_("External pressure always acts"),
    .choices = yes_no_choices, .since_minor = 2 },
  /* recorded, not used: the allowable is entered at this temperature.
   * Liquid helium service starts near 4 K; above 1 500 °C steel melts
   * (from memory); between them lie all metal shells. */
  { .element = "design-temperature", .kind = HL_FIELD_TEMPERATURE, SHELL (design_temperature), .bounded = TRUE,
    .min_si = 1.0, .max_si = 1773.15, .min_text = "1 K", .max_text = "1500 °C",
    .why_min = N_("absolute zero is 0 K (-273.15 °C)"), .default_value = 20, .default_unit = "\xc2\xb0""C",
    .label = N_("Design temperature"), .tooltip = N_("The allowable stress is the one at this temperature"),
    .report = "Design temperature", .since_minor = 2 },
  /* the material's rows; their defaults are those of hl_material_default() */
  { .element = "name", .kind = HL_FIELD_TEXT, MATERIAL (name), TEXT_SIZE (HlMaterial, name), .label = N_("Name"), .report = "Material",
    .sheet = N_("Material") },
  /* elastomers, the softest solids a shell is made of, start near 1 MPa;
   * diamond, the stiffest, is about 1 050 to 1 200 GPa (from memory) */
  { .element = "elastic-modulus", .kind = HL_FIELD_MODULUS, MATERIAL (elastic_modulus), .required = TRUE,
    .bounded = TRUE, .min_si = 1e6, .max_si = 2e12, .min_text = "1 MPa", .max_text = "2000 GPa",
    .why_min = N_("softer than rubber is a slip of the unit"), .default_value = 200, .default_unit = "GPa",
    .label = N_("Elastic modulus"), .report = "Elastic modulus E", .sheet = N_("Elastic modulus E") },
  /* the thermodynamic limits of an isotropic solid (Timoshenko, Theory
   * of Elasticity) */
  { .element = "poisson-ratio", .kind = HL_FIELD_RATIO, MATERIAL (poisson_ratio), .required = TRUE,
    .zero_allowed = TRUE, .bounded = TRUE, .min_si = -1.0, .max_si = 0.5, .min_exclusive = TRUE,
    .max_exclusive = TRUE, .range_message = N_("must lie between -1 and 0.5 (exclusive)"), .default_value = 0.30,
    .label = N_("Poisson’s ratio"), .report = "Poisson's ratio", .sheet = N_("Poisson's ratio ν") },
  /* lead, about 5 MPa, is among the weakest metals; the strongest steel
   * wires reach 3 to 4 GPa (from memory) */
  { .element = "yield-strength", .kind = HL_FIELD_STRESS, MATERIAL (yield_strength), .required = TRUE,
    .bounded = TRUE, .min_si = 1e6, .max_si = 1e10, .min_text = "1 MPa", .max_text = "10 GPa",
    .why_min = N_("weaker than lead is a slip of the unit"), .default_value = 260, .default_unit = "MPa",
    .label = N_("Yield strength"), .report = "Yield strength", .sheet = N_("Yield strength") },
  /* allowables of plastics at temperature go down to about 1 MPa (from
   * memory), a tenth of that leaves room */
  { .element = "allowable-stress", .kind = HL_FIELD_STRESS, MATERIAL (allowable_stress), .required = TRUE,
    .bounded = TRUE, .min_si = 1e5, .max_si = 1e10, .min_text = "0.1 MPa", .max_text = "10 GPa",
    .why_min = N_("lower than any material's allowable is a slip of the unit"), .default_value = 138,
    .default_unit = "MPa", .label = N_("Allowable stress"), .report = "Allowable stress S",
    .sheet = N_("Allowable stress S") },
  /* Weld joint efficiencies tabulate from 0.45 (single fillet lap joint,
   * ASME VIII-1 Table UW-12, from memory) to 1; ligament efficiencies of
   * drilled shells go lower, to about 0.2 (from memory).  0.1 leaves room
   * for both; 1e-320 is a slip. */
  { .element = "joint-efficiency", .kind = HL_FIELD_RATIO, SHELL (joint_efficiency), .bounded = TRUE,
    .min_si = 0.1, .max_si = 1.0,
    .range_message = N_("must be greater than 0 and at most 1, and at least 0.1 "
                        "(weld joint efficiencies tabulate from 0.45 to 1)"),
    .default_value = 1.0, .label = N_("Joint efficiency"), .report = "Joint efficiency Ej",
    .sheet = N_("Weld joint efficiency") },
  /* the texts and the temperature have no sheet label yet: the sheet
   * lists a text row as a material's name and a quantity in its own
   * units, which a temperature is not */
  { .element = "material-specification", .kind = HL_FIELD_TEXT, SHELL (material_spec),
    TEXT_SIZE (HlShellInputs, material_spec), .label = N_("Material specification"),
    .report = "Material specification", .since_minor = 2 },
  { .element = "allowable-stress-source", .kind = HL_FIELD_TEXT, SHELL (allowable_source),
    TEXT_SIZE (HlShellInputs, allowable_source), .label = N_("Source of the allowable stress"),
    .report = "Source of the allowable stress", .since_minor = 2 },
  { .element = "thin-radius-basis", .kind = HL_FIELD_CHOICE, SHELL (thin_basis), .default_value = HL_BASIS_MEAN,
    .report = "Thin-wall radius basis", .sheet = N_("Thin-wall radius basis"), .choices = basis_choices },
  /* the thin-wall error is computed to about 1e-12 relative; below
   * 0.001 % the verdict turns on the last digits of the inputs */
  { .element = "thin-tolerance", .kind = HL_FIELD_PERCENT, SHELL (thin_tolerance), .bounded = TRUE,
    .min_si = 1e-5, .max_si = 1.0, .max_exclusive = TRUE, .min_text = "0.001 %", .max_text = "100 %",
    .why_min = N_("a smaller tolerance than the inputs' own precision decides nothing"), .default_value = 5,
    .default_unit = "%", .label = N_("Tolerance"), .report = "Thin-wall tolerance",
    .sheet = N_("Thin-wall tolerance") },
  { .element = "verdict-measure", .kind = HL_FIELD_CHOICE, SHELL (verdict_measure),
    .default_value = HL_MEASURE_BOTH, .report = "Verdict measure", .sheet = N_("Verdict measure"),
    .choices = measure_choices },
  { .element = "sizing-criterion", .kind = HL_FIELD_CHOICE, SHELL (sizing_criterion),
    .default_value = HL_CRITERION_VON_MISES, .report = "Sizing criterion (Lame-based)",
    .sheet = N_("Sizing criterion"), .choices = criterion_choices },
  { .element = "design-basis", .kind = HL_FIELD_CHOICE, SHELL (design_basis), .default_value = HL_DESIGN_BASIS_UG27,
    .label = N_("Design basis"), .report = "Design basis", .sheet = N_("Design basis"), .choices = design_basis_choices,
    .since_minor = 2 },
  { .element = "code-edition", .kind = HL_FIELD_TEXT, SHELL (code_edition), TEXT_SIZE (HlShellInputs, code_edition),
    .label = N_("Code edition"), .tooltip = N_("Shown on every clause, e.g. the year of the edition"),
    .report = "Code edition", .since_minor = 2 },
  /* the test pressure, format 1.2 (METHODS-NEXT §E) */
  { .element = "test-rule", .kind = HL_FIELD_CHOICE, SHELL (test_rule), .default_value = HL_TEST_UG99_HYDROSTATIC,
    .label = N_("Test rule"), .report = "Test rule", .sheet = N_("Test rule"), .choices = test_rule_choices,
    .since_minor = 2 },
  /* LSR (ASME) or fa/fTd (EN).  A test runs near ambient, where a metal
   * is seldom weaker than at its design temperature (allowables below
   * ambient are the ambient ones, common practice): under half is a
   * slip.  Creep-range allowables fall to about a fifteenth of the
   * room-temperature value at the top of the tables (from memory):
   * past 20 is a slip. */
  { .element = "test-stress-ratio", .kind = HL_FIELD_RATIO, SHELL (test_stress_ratio), .bounded = TRUE,
    .min_si = 0.5, .max_si = 20.0,
    .range_message = N_("must be at least 0.5 and at most 20 (allowable stress at test temperature over the one "
                        "at design temperature)"),
    .default_value = 1.0, .label = N_("Stress ratio for the test"),
    .tooltip = N_("Allowable stress at test temperature over the one at design temperature; the lowest of the "
                  "pressure parts' materials"),
    .report = "Stress ratio at test (LSR, fa/fTd)", .sheet = N_("Stress ratio at test (LSR, fa/fTd)"),
    .since_minor = 2 },
  /* PED PS: the bounds of the pressures; 0: not given */
  { .element = "maximum-allowable-pressure-ps", .kind = HL_FIELD_PRESSURE, SHELL (test_ps),
    .zero_allowed = TRUE, .bounded = TRUE, .min_si = 1e-6, .max_si = 1e10, .min_text = "1 µPa",
    .max_text = "10 GPa", .why_min = N_("no gauge reads less; 0 means the design pressure"), .default_value = 0,
    .default_unit = "bar", .label = N_("Maximum allowable pressure PS"),
    .tooltip = N_("PED 2014/68/EU; 0: the design pressure stands in"),
    .report = "Maximum allowable pressure PS (PED)", .sheet = N_("Maximum allowable pressure PS (PED)"),
    .since_minor = 2 },
};

guint
hl_field_count (void)
{
  return G_N_ELEMENTS (fields);
}

const HlField *
hl_field_nth (guint index)
{
  g_return_val_if_fail (index < G_N_ELEMENTS (fields), NULL);
  return &fields[index];
}

const HlField *
hl_field_find (HlFieldOwner owner,
               const char  *element)
{
  for (guint i = 0; element != NULL && i < G_N_ELEMENTS (fields); i++)
    if (fields[i].owner == owner && strcmp (fields[i].element, element) == 0)
      return &fields[i];
  return NULL;
}

const HlField *
hl_field_lookup (const char *element)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, element);

  return f != NULL ? f : hl_field_find (HL_FIELD_OF_MATERIAL, element);
}

static const char **
build_elements (HlFieldOwner owner)
{
  const char **names = g_new0 (const char *, G_N_ELEMENTS (fields) + 1);
  guint n = 0;

  for (guint i = 0; i < G_N_ELEMENTS (fields); i++)
    if (fields[i].owner == owner)
      names[n++] = fields[i].element;
  return names;
}

const char *const *
hl_field_elements (HlFieldOwner owner)
{
  static const char **lists[2];

  g_return_val_if_fail (owner <= HL_FIELD_OF_MATERIAL, NULL);
  if (g_once_init_enter (&lists[owner]))
    g_once_init_leave (&lists[owner], build_elements (owner));
  return lists[owner];
}

HlQuantityKind
hl_field_quantity_kind (const HlField *field)
{
  switch (field->kind)
    {
    case HL_FIELD_LENGTH:
      return HL_KIND_LENGTH;
    case HL_FIELD_PRESSURE:
    case HL_FIELD_STRESS:
      return HL_KIND_STRESS;
    case HL_FIELD_MODULUS:
      return HL_KIND_MODULUS;
    case HL_FIELD_PERCENT:
      return HL_KIND_PERCENT;
    case HL_FIELD_TEMPERATURE:
      return HL_KIND_TEMPERATURE;
    case HL_FIELD_RATIO:
    case HL_FIELD_CHOICE:
    case HL_FIELD_TEXT:
    default:
      return HL_KIND_RATIO;
    }
}

gboolean
hl_field_is_number (const HlField *field)
{
  return field->kind != HL_FIELD_CHOICE && field->kind != HL_FIELD_TEXT;
}

gboolean
hl_field_unit_optional (const HlField *field)
{
  return field->kind == HL_FIELD_RATIO || field->kind == HL_FIELD_PERCENT;
}

gpointer
hl_field_slot (const HlField *field,
               HlShellInputs *shell)
{
  if (field->owner == HL_FIELD_OF_MATERIAL)
    return hl_field_material_slot (field, &shell->material);
  return (char *) shell + field->offset;
}

gconstpointer
hl_field_cslot (const HlField       *field,
                const HlShellInputs *shell)
{
  return hl_field_slot (field, (HlShellInputs *) shell);
}

gpointer
hl_field_material_slot (const HlField *field,
                        HlMaterial    *material)
{
  g_return_val_if_fail (field->owner == HL_FIELD_OF_MATERIAL, NULL);
  return (char *) material + field->offset;
}

gconstpointer
hl_field_material_cslot (const HlField    *field,
                         const HlMaterial *material)
{
  return hl_field_material_slot (field, (HlMaterial *) material);
}

int
hl_field_choice_get (const HlField *field,
                     gconstpointer  slot)
{
  g_return_val_if_fail (field->kind == HL_FIELD_CHOICE, 0);
  /* the enums of hl-shell.h are int-sized */
  return *(const int *) slot;
}

void
hl_field_choice_set (const HlField *field,
                     gpointer       slot,
                     int            value)
{
  g_return_if_fail (field->kind == HL_FIELD_CHOICE);
  *(int *) slot = value;
}

gboolean
hl_field_equal (const HlField *field,
                gconstpointer  a,
                gconstpointer  b)
{
  switch (field->kind)
    {
    case HL_FIELD_TEXT:
      return strcmp (a, b) == 0;
    case HL_FIELD_RATIO:
      return *(const double *) a == *(const double *) b;
    case HL_FIELD_CHOICE:
      return hl_field_choice_get (field, a) == hl_field_choice_get (field, b);
    default:  /* the quantities */
      return hl_quantity_equal (*(const HlQuantity *) a, *(const HlQuantity *) b);
    }
}

const HlFieldChoice *
hl_field_choice_by_word (const HlField *field,
                         const char    *word)
{
  for (const HlFieldChoice *c = field->choices; c != NULL && c->word != NULL; c++)
    if (g_strcmp0 (c->word, word) == 0)
      return c;
  return NULL;
}

guint
hl_field_choice_count (const HlField *field)
{
  guint n = 0;

  while (field->choices != NULL && field->choices[n].word != NULL)
    n++;
  return n;
}

guint
hl_field_choice_position (const HlField *field,
                          int            value)
{
  guint i = 0;

  for (const HlFieldChoice *c = field->choices; c != NULL && c->word != NULL; c++, i++)
    if (c->value == value)
      return i;
  return G_MAXUINT;
}

const HlFieldChoice *
hl_field_choice_by_value (const HlField *field,
                          int            value)
{
  guint i = hl_field_choice_position (field, value);

  return i != G_MAXUINT ? &field->choices[i] : NULL;
}

void
hl_field_apply_defaults (HlShellInputs *shell)
{
  for (guint i = 0; i < G_N_ELEMENTS (fields); i++)
    {
      const HlField *f = &fields[i];
      gpointer slot;

      if (f->owner != HL_FIELD_OF_SHELL || f->kind == HL_FIELD_TEXT
          || (f->is_size && f->size_kind != HL_SIZE_INNER_DIAMETER))
        continue;
      slot = hl_field_slot (f, shell);
      if (f->kind == HL_FIELD_CHOICE)
        hl_field_choice_set (f, slot, (int) f->default_value);
      else if (f->kind == HL_FIELD_RATIO)
        *(double *) slot = f->default_value;
      else
        *(HlQuantity *) slot = hl_quantity_make (f->default_value, f->default_unit);
    }
}
