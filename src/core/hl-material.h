/* hl-material.h — material properties used by a shell
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-quantity.h"

G_BEGIN_DECLS

#define HL_ID_MAX   64
#define HL_NAME_MAX 128

typedef struct
{
  char       id[HL_ID_MAX];
  char       name[HL_NAME_MAX];
  HlQuantity elastic_modulus;   /* stress units */
  double     poisson_ratio;
  HlQuantity yield_strength;
  HlQuantity allowable_stress;
} HlMaterial;

HlMaterial         hl_material_default   (void);
gboolean           hl_material_equal     (const HlMaterial *a,
                                          const HlMaterial *b);

/* Generic materials with typical room-temperature properties.  They are
 * starting points, to be checked against the material certificate and the
 * design code's tables; the name says "typical". */
guint              hl_material_builtin_count (void);
const HlMaterial  *hl_material_builtin       (guint       index);
const HlMaterial  *hl_material_builtin_find  (const char *id);

/* The default and the built-in materials stated in @system's units: SI
 * as above (GPa, MPa), US customary in ksi with the round values of US
 * tables (E = 29000 ksi for carbon steel).  For new shells and for a
 * material chosen in a project of those units; a file's shell keeps the
 * values it holds. */
HlMaterial         hl_material_default_in      (HlUnitSystem  system);
const HlMaterial  *hl_material_builtin_find_in (const char   *id,
                                                HlUnitSystem  system);

G_END_DECLS
