/* hl-pressure-unit.c — the unit the window shows pressure results in
 *
 * A design pressure typed as 10 bar is compared with an allowable
 * pressure in bar, not in MPa: nobody should set 0.9543 MPa beside
 * 10 bar and convert by hand.  Stresses keep the unit system's unit.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-pressure-unit"

#include "hl-config.h"
#include "hl-pressure-unit.h"
#include "hl-application.h"
#include "hl-result-rows.h"

#include <string.h>

GSettings *
hl_pressure_unit_settings (void)
{
  GApplication *app = g_application_get_default ();

  return app != NULL && HL_IS_APPLICATION (app) ? hl_application_get_settings (HL_APPLICATION (app)) : NULL;
}

const char *
hl_pressure_unit_shown (GSettings           *settings,
                        const HlShellInputs *shell,
                        HlUnitSystem         units)
{
  g_autofree char *choice = NULL;
  const char *unit;

  if (settings == NULL)
    settings = hl_pressure_unit_settings ();
  choice = settings != NULL ? g_settings_get_string (settings, "result-pressure-unit") : g_strdup ("typed");
  if (strcmp (choice, "system") == 0)
    return hl_row_unit (HL_ROW_STRESS, units);
  if (strcmp (choice, "typed") != 0)
    {
      unit = hl_unit_canonical (HL_KIND_STRESS, choice);
      return unit != NULL ? unit : hl_row_unit (HL_ROW_STRESS, units);
    }
  unit = shell != NULL ? hl_unit_canonical (HL_KIND_STRESS, shell->internal_pressure.unit) : NULL;
  return unit != NULL ? unit : hl_row_unit (HL_ROW_STRESS, units);
}

gboolean
hl_result_is_pressure (const char *key)
{
  /* the summary keys name every pressure so: max_allowable_pressure_*,
   * first_yield_pressure_*, plastic_collapse_pressure*, test_pressure_*,
   * inspection_pressure */
  return key != NULL && strstr (key, "pressure") != NULL;
}
