/* hl-pressure-unit.h — the unit the window shows pressure results in
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gio/gio.h>

#include "hl-shell.h"

G_BEGIN_DECLS

/* The unit of pressure results (MAWP, design, first yield, collapse,
 * test pressures) for @shell, by the preference result-pressure-unit of
 * @settings: "typed" the unit its internal pressure was typed in,
 * "system" @units' (MPa or psi), or "bar", "MPa", "kPa", "psi".  NULL
 * @settings: the default application's, else "typed". */
const char *hl_pressure_unit_shown  (GSettings           *settings,
                                     const HlShellInputs *shell,
                                     HlUnitSystem         units);

/* The settings the tables follow: the default application's, or NULL. */
GSettings  *hl_pressure_unit_settings (void);

/* Whether the result row @key is a pressure rather than a stress. */
gboolean    hl_result_is_pressure   (const char *key);

G_END_DECLS
