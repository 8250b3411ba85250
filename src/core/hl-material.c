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

/* The same materials as US tables state them, in ksi and rounded as
 * they print them (common practice: E = 29,000 ksi for carbon steel,
 * 28,000 ksi for austenitic stainless, 10,000 ksi for aluminium; a
 * carbon steel plate's specified minimum yield 38 ksi, 304's 30 ksi).
 * Same ids and names: a shell of a US project takes these, so its
 * fields read "29000 ksi" rather than 200 GPa converted to 29007.5 ksi;
 * the SI and US rows differ by the rounding only (below 0.5 %, 1.5 %
 * for copper's yield: 10 ksi against 70 MPa). */
static const HlMaterial builtin_us[] = {
  { "typical-carbon-steel", "Carbon steel, plate (typical)",
    { 29000, "ksi" }, 0.30, { 38, "ksi" }, { 20, "ksi" } },
  { "typical-stainless-304", "Austenitic stainless 304 (typical)",
    { 28000, "ksi" }, 0.29, { 30, "ksi" }, { 20, "ksi" } },
  { "typical-alloy-steel-qt", "Alloy steel, quenched and tempered (typical)",
    { 29700, "ksi" }, 0.29, { 100, "ksi" }, { 40, "ksi" } },
  { "typical-aluminium-6061", "Aluminium 6061-T6 (typical)",
    { 10000, "ksi" }, 0.33, { 35, "ksi" }, { 8.7, "ksi" } },
  { "typical-copper", "Copper, annealed (typical)",
    { 17000, "ksi" }, 0.34, { 10, "ksi" }, { 5.8, "ksi" } },
};

G_STATIC_ASSERT (G_N_ELEMENTS (builtin_us) == G_N_ELEMENTS (builtin));

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

HlMaterial
hl_material_default_in (HlUnitSystem system)
{
  return system == HL_UNIT_SYSTEM_US ? builtin_us[0] : builtin[0];
}

const HlMaterial *
hl_material_builtin_find_in (const char   *id,
                             HlUnitSystem  system)
{
  const HlMaterial *rows = system == HL_UNIT_SYSTEM_US ? builtin_us : builtin;

  for (guint i = 0; i < G_N_ELEMENTS (builtin); i++)
    if (g_strcmp0 (rows[i].id, id) == 0)
      return &rows[i];
  return NULL;
}
