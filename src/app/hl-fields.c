/* hl-fields.c — human names of the input fields
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-fields"

#include "hl-config.h"
#include "hl-fields.h"
#include "hl-units.h"

#include <glib/gi18n.h>
#include <locale.h>
#include <math.h>
#include <string.h>

static const struct
{
  const char *field;
  const char *label;
} fields[] = {
  { "id", N_("Id") },
  { "name", N_("Name") },
  { "inner-diameter", N_("Inner diameter") },
  { "outer-diameter", N_("Outer diameter") },
  { "inner-radius", N_("Inner radius") },
  { "outer-radius", N_("Outer radius") },
  { "size", N_("Size") },
  { "wall-thickness", N_("Wall thickness") },
  { "corrosion-allowance", N_("Corrosion allowance") },
  { "internal-pressure", N_("Internal pressure") },
  { "external-pressure", N_("External pressure") },
  { "elastic-modulus", N_("Elastic modulus") },
  { "poisson-ratio", N_("Poisson’s ratio") },
  { "yield-strength", N_("Yield strength") },
  { "allowable-stress", N_("Allowable stress") },
  { "joint-efficiency", N_("Joint efficiency") },
  { "thin-tolerance", N_("Tolerance") },
};

const char *
hl_field_label (const char *field)
{
  for (guint i = 0; i < G_N_ELEMENTS (fields); i++)
    if (g_strcmp0 (fields[i].field, field) == 0)
      return _(fields[i].label);
  return field;
}

gboolean
hl_locale_decimal_comma (void)
{
  const struct lconv *lc = localeconv ();

  return lc != NULL && lc->decimal_point != NULL && lc->decimal_point[0] == ',';
}

char *
hl_format_field_number (double value)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];
  int digits;
  char *text;

  if (!isfinite (value))
    return g_strdup ("");
  /* shortest text that reads back exactly, so showing a value and
   * reading it again never changes it */
  for (digits = 1; digits <= 17; digits++)
    {
      g_ascii_formatd (buf, sizeof buf, (const char *[]) { "%.1g", "%.2g", "%.3g", "%.4g", "%.5g", "%.6g",
                                                           "%.7g", "%.8g", "%.9g", "%.10g", "%.11g",
                                                           "%.12g", "%.13g", "%.14g", "%.15g", "%.16g",
                                                           "%.17g" }[digits - 1], value);
      if (g_ascii_strtod (buf, NULL) == value)
        break;
    }
  /* people type 10 and 0.0015, not 1e+01 and 1.5e-03 */
  if (strchr (buf, 'e') != NULL && value != 0.0 && fabs (value) >= 1e-6 && fabs (value) < 1e15)
    {
      int decimals = MAX (0, digits - 1 - (int) floor (log10 (fabs (value))));
      char fmt[16];

      g_snprintf (fmt, sizeof fmt, "%%.%df", decimals);
      g_ascii_formatd (buf, sizeof buf, fmt, value);
    }
  text = g_strdup (buf);
  if (hl_locale_decimal_comma ())
    g_strdelimit (text, ".", ',');
  return text;
}
