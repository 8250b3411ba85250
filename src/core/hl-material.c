/* hl-material.c — material properties used by a shell
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-material"

#include "hl-material.h"
#include "hl-field-table.h"

#include <string.h>

/* Typical values, rounded (common practice): E of steels about 200 GPa,
 * nu about 0.3; yield is the usual specified minimum of the grade family;
 * the allowable is roughly yield / 1.5 and is only a placeholder for the
 * code's own table value. */
static const HlMaterial builtin[] = {
  { "typical-carbon-steel", "Carbon steel, plate (typical)",
    { 200, "GPa" }, 0.30, { 260, "MPa" }, { 138, "MPa" } },
  { "typical-stainless-304", "Austenitic stainless 304 (typical)",
    { 193, "GPa" }, 0.29, { 205, "MPa" }, { 138, "MPa" } },
  { "typical-alloy-steel-qt", "Alloy steel, quenched and tempered (typical)",
    { 205, "GPa" }, 0.29, { 690, "MPa" }, { 276, "MPa" } },
  { "typical-aluminium-6061", "Aluminium 6061-T6 (typical)",
    { 69, "GPa" }, 0.33, { 240, "MPa" }, { 60, "MPa" } },
  { "typical-copper", "Copper, annealed (typical)",
    { 117, "GPa" }, 0.34, { 70, "MPa" }, { 40, "MPa" } },
};

HlMaterial
hl_material_default (void)
{
  return builtin[0];
}

gboolean
hl_material_equal (const HlMaterial *a,
                   const HlMaterial *b)
{
  if (strcmp (a->id, b->id) != 0)
    return FALSE;
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);

      if (f->owner == HL_FIELD_OF_MATERIAL
          && !hl_field_equal (f, hl_field_material_cslot (f, a), hl_field_material_cslot (f, b)))
        return FALSE;
    }
  return TRUE;
}

guint
hl_material_builtin_count (void)
{
  return G_N_ELEMENTS (builtin);
}

const HlMaterial *
hl_material_builtin (guint index)
{
  g_return_val_if_fail (index < G_N_ELEMENTS (builtin), NULL);
  return &builtin[index];
}

const HlMaterial *
hl_material_builtin_find (const char *id)
{
  for (guint i = 0; i < G_N_ELEMENTS (builtin); i++)
    if (g_strcmp0 (builtin[i].id, id) == 0)
      return &builtin[i];
  return NULL;
}
