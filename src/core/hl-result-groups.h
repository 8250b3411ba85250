/* hl-result-groups.h — which group of the results a row belongs to
 *
 * The window folds its results by group; the summary keeps its flat
 * order.  A row's group follows from its stable summary key, so a new
 * result lands in a group without a second list to keep.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

typedef enum
{
  HL_GROUP_DESIGN,      /* the design check: verdict, utilisation, available wall */
  HL_GROUP_THINNESS,    /* geometry of the analysis wall, thin or thick */
  HL_GROUP_STRESSES,    /* stresses and displacements through the wall */
  HL_GROUP_LIMITS,      /* first yield and plastic collapse */
  HL_GROUP_SIZING,      /* required thickness and allowable pressure */
  HL_GROUP_TEST,        /* test pressure and the stress at test */
  HL_N_GROUPS
} HlResultGroup;

HlResultGroup hl_result_group_of    (const char   *key);
/* English, marked N_(): the caller translates */
const char   *hl_result_group_title (HlResultGroup group);

G_END_DECLS
