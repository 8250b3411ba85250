/* hl-shell.h — the inputs of one pressurised shell
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-material.h"

G_BEGIN_DECLS

typedef enum { HL_FORM_CYLINDER, HL_FORM_SPHERE } HlForm;

typedef enum
{
  HL_ENDS_CLOSED,
  HL_ENDS_OPEN,
  HL_ENDS_PLANE_STRAIN,
} HlEnds;

typedef enum
{
  HL_SIZE_INNER_DIAMETER,
  HL_SIZE_OUTER_DIAMETER,
  HL_SIZE_INNER_RADIUS,
  HL_SIZE_OUTER_RADIUS,
} HlSizeKind;

typedef enum
{
  HL_BASIS_INNER,
  HL_BASIS_MEAN,
  HL_BASIS_OUTER,
} HlRadiusBasis;

/* BOTH: thin when the hoop and the von Mises errors are each within the
 * tolerance */
typedef enum { HL_MEASURE_HOOP, HL_MEASURE_EQUIVALENT, HL_MEASURE_BOTH } HlVerdictMeasure;

/* The rule that decides PASS or FAIL (hl-design-check.h) */
typedef enum
{
  HL_DESIGN_BASIS_UG27,      /* ASME VIII-1 UG-27 with Appendix 1-1 */
  HL_DESIGN_BASIS_EN13445,   /* EN 13445-3 7.4 */
  HL_DESIGN_BASIS_LAME,      /* Lamé peak equivalent stress = S Ej */
  HL_DESIGN_BASIS_THIN,      /* thin-wall membrane stress = S Ej */
} HlDesignBasis;

typedef enum { HL_CRITERION_VON_MISES, HL_CRITERION_TRESCA } HlCriterion;

/* Plain struct, copies by assignment (undo, comparison, threads).
 * The material is held by value; material_ref names the project material
 * it came from so the file can keep the reference. */
typedef struct
{
  char             id[HL_ID_MAX];
  char             name[HL_NAME_MAX];
  HlForm           form;
  HlEnds           ends;
  HlSizeKind       size_kind;
  HlQuantity       size;
  HlQuantity       wall_thickness;
  HlQuantity       corrosion_allowance;
  HlQuantity       internal_pressure;
  HlQuantity       external_pressure;
  char             material_ref[HL_ID_MAX];
  HlMaterial       material;
  double           joint_efficiency;
  HlRadiusBasis    thin_basis;
  HlQuantity       thin_tolerance;      /* percent */
  HlVerdictMeasure verdict_measure;
  HlCriterion      sizing_criterion;
  /* the design check (format 1.2) */
  HlDesignBasis    design_basis;
  HlQuantity       design_temperature;  /* recorded: S is entered at it */
  char             material_spec[HL_NAME_MAX];
  char             allowable_source[HL_NAME_MAX];
  /* mill undertolerance as typed, either or both: the larger governs */
  HlQuantity       mill_tolerance;          /* a length */
  HlQuantity       mill_tolerance_percent;  /* of the nominal wall */
  char             code_edition[HL_NAME_MAX];
  gboolean         external_coincident; /* external pressure always acts with the internal */
  /* the test pressure (format 1.2) */
  int              test_rule;           /* an HlTestRule (hl-test-pressure.h) */
  double           test_stress_ratio;   /* allowable at test / at design temperature, the lowest part's */
  HlQuantity       test_ps;             /* PS (PED); 0: not given, the design pressure stands in */
} HlShellInputs;

/* Defaults of DESIGN.md §3: closed cylinder, no corrosion, no external
 * pressure, Ej = 1, mean radius basis, 5 % tolerance, hoop measure,
 * von Mises sizing. */
HlShellInputs hl_shell_inputs_default (void);
gboolean      hl_shell_inputs_equal   (const HlShellInputs *a,
                                       const HlShellInputs *b);

/* The wall an analysis uses, in metres: inner radius a, outer radius b.
 * With @corroded the allowance is removed from the inside. */
void          hl_shell_inputs_radii   (const HlShellInputs *in,
                                       gboolean             corroded,
                                       double              *a,
                                       double              *b);

const char   *hl_form_to_string       (HlForm form);
gboolean      hl_form_from_string     (const char *s, HlForm *out);
const char   *hl_ends_to_string       (HlEnds ends);
gboolean      hl_ends_from_string     (const char *s, HlEnds *out);
const char   *hl_size_kind_to_element (HlSizeKind kind);
gboolean      hl_size_kind_from_element (const char *s, HlSizeKind *out);
const char   *hl_basis_to_string      (HlRadiusBasis basis);
gboolean      hl_basis_from_string    (const char *s, HlRadiusBasis *out);
const char   *hl_measure_to_string    (HlVerdictMeasure m);
gboolean      hl_measure_from_string  (const char *s, HlVerdictMeasure *out);
const char   *hl_criterion_to_string  (HlCriterion c);
gboolean      hl_criterion_from_string (const char *s, HlCriterion *out);
const char   *hl_design_basis_to_string (HlDesignBasis b);
gboolean      hl_design_basis_from_string (const char *s, HlDesignBasis *out);

G_END_DECLS
