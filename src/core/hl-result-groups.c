/* hl-result-groups.c — which group of the results a row belongs to
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-result-groups"

#include "hl-config.h"
#include "hl-result-groups.h"

#include <glib/gi18n.h>
#include <string.h>

/* First match wins: a key that starts with one of these */
static const struct
{
  const char   *prefix;
  HlResultGroup group;
} prefixes[] = {
  { "check_test", HL_GROUP_TEST },
  { "test_", HL_GROUP_TEST },
  { "membrane_stress_at_test", HL_GROUP_TEST },
  { "peak_stress_at_test", HL_GROUP_TEST },
  { "inspection_", HL_GROUP_TEST },
  { "design_", HL_GROUP_DESIGN },
  { "governing_", HL_GROUP_DESIGN },
  { "utilisation", HL_GROUP_DESIGN },
  { "available_", HL_GROUP_DESIGN },
  { "check_", HL_GROUP_DESIGN },
  { "required_", HL_GROUP_SIZING },
  { "max_allowable_", HL_GROUP_SIZING },
  { "first_yield_", HL_GROUP_LIMITS },
  { "plastic_collapse_", HL_GROUP_LIMITS },
  { "form", HL_GROUP_THINNESS },
  { "ends", HL_GROUP_THINNESS },
  { "analysis_", HL_GROUP_THINNESS },
  { "mean_radius_", HL_GROUP_THINNESS },
  { "thin_wall_", HL_GROUP_THINNESS },
  { "rule_of_thumb", HL_GROUP_THINNESS },
  { "ratio_for_", HL_GROUP_THINNESS },
};

HlResultGroup
hl_result_group_of (const char *key)
{
  g_return_val_if_fail (key != NULL, HL_GROUP_STRESSES);

  for (guint i = 0; i < G_N_ELEMENTS (prefixes); i++)
    if (g_str_has_prefix (key, prefixes[i].prefix))
      return prefixes[i].group;
  /* the rest are the stresses and displacements through the wall */
  return HL_GROUP_STRESSES;
}

const char *
hl_result_group_title (HlResultGroup group)
{
  static const char *const titles[HL_N_GROUPS] = {
    N_("Design check"), N_("Wall and thinness"), N_("Stresses and displacements"),
    N_("Yield and collapse"), N_("Required thickness and allowable pressure"), N_("Test pressure"),
  };

  g_return_val_if_fail (group < HL_N_GROUPS, "");
  return titles[group];
}
