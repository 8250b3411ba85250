/* fuzz-units.c — any text as a typed value
 *
 * Every parse that succeeds gives a finite number that the file writer's
 * hl_format_exact() prints so that the file reader's hl_parse_number()
 * reads back the same double (IEEE 754 round trip, needed for the
 * bitwise-equal reload of hl_quantity_equal), and that the display
 * formatting never shows as NaN or infinity (DESIGN.md §7).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-fuzz"

#include "fuzz-common.h"

#include <math.h>
#include <string.h>

static const HlQuantityKind kinds[] = {
  HL_KIND_LENGTH, HL_KIND_STRESS, HL_KIND_PERCENT, HL_KIND_RATIO, HL_KIND_MODULUS,
};

static void
check_formatting (const char *input,
                  double      value)
{
  g_autofree char *exact = hl_format_exact (value);
  g_autoptr(GError) error = NULL;
  double back = NAN;

  if (!isfinite (value))
    fuzz_fail ("“%s” parsed to %g", input, value);
  if (value == 0.0 && signbit (value))
    fuzz_fail ("“%s” parsed to negative zero", input);
  if (g_ascii_strtod (exact, NULL) != value)
    fuzz_fail ("hl_format_exact (%.17g) = “%s” reads back as %.17g", value, exact,
               g_ascii_strtod (exact, NULL));
  if (!hl_parse_number (exact, &back, &error))
    fuzz_fail ("hl_format_exact (%.17g) = “%s” is refused by hl_parse_number: %s", value, exact,
               error->message);
  if (back != value)
    fuzz_fail ("hl_format_exact (%.17g) = “%s” is read by hl_parse_number as %.17g", value, exact, back);

  for (int digits = -1; digits <= 18; digits++)
    {
      g_autofree char *sig = hl_format_significant (value, digits);
      g_autofree char *shown = hl_format_display (value, digits);
      double parsed;

      fuzz_check_no_nonfinite ("hl_format_significant", sig, NULL);
      fuzz_check_no_nonfinite ("hl_format_display", shown, NULL);
      /* the C-locale text is a number the file reader accepts, within
       * half a unit of the last digit shown; digits are clamped to 1..17
       * and a value near a power of ten may lose one digit to log10
       * rounding, hence the margin of one digit */
      if (!hl_parse_number (sig, &parsed, NULL))
        {
          /* rounding the largest doubles up leaves the double range */
          if (fabs (value) >= 1e307)
            continue;
          fuzz_fail ("hl_format_significant (%.17g, %d) = “%s” is not a plain number",
                     value, digits, sig);
        }
      if (fabs (parsed - value) > fabs (value) * 5.0 * pow (10.0, -CLAMP (digits, 1, 17) + 1))
        fuzz_fail ("hl_format_significant (%.17g, %d) = “%s” is too far from the value", value, digits, sig);
    }
}

int
LLVMFuzzerTestOneInput (const uint8_t *data,
                        size_t         size)
{
  g_autofree char *text = NULL;
  double value;

  /* typed text is a C string: a NUL ends it */
  if (size > 256 || memchr (data, '\0', size) != NULL)
    return 0;
  text = g_strndup ((const char *) data, size);

  for (guint k = 0; k < G_N_ELEMENTS (kinds); k++)
    for (int comma = 0; comma <= 1; comma++)
      for (int fallback = 0; fallback <= 1; fallback++)
        {
          const char *unit = NULL;
          const char *fallback_unit = fallback ? hl_unit_default (kinds[k], HL_UNIT_SYSTEM_US) : NULL;
          g_autoptr(GError) error = NULL;

          if (!hl_units_parse (text, kinds[k], fallback_unit, comma, &value, &unit, &error))
            {
              if (error == NULL || error->domain != HL_UNITS_ERROR)
                fuzz_fail ("hl_units_parse refused “%s” without a units error", text);
              if (!g_utf8_validate (error->message, -1, NULL) && g_utf8_validate (text, -1, NULL))
                fuzz_fail ("the error for “%s” is not UTF-8", text);
              continue;
            }
          if (error != NULL)
            fuzz_fail ("hl_units_parse accepted “%s” and set an error", text);
          /* the unit given back is one of the kind's canonical names */
          if (unit == NULL || g_strcmp0 (hl_unit_canonical (kinds[k], unit), unit) != 0
              || hl_unit_factor (kinds[k], unit) <= 0.0)
            fuzz_fail ("hl_units_parse (“%s”) gave unit “%s”", text, unit != NULL ? unit : "(null)");
          check_formatting (text, value);
        }

  if (hl_parse_number (text, &value, NULL))
    check_formatting (text, value);
  return 0;
}
