/* hl-date.c — the one rule for dates in a project
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-date"

#include "hl-date.h"

#include <string.h>

gboolean
hl_date_valid (const char *date)
{
  guint64 y, m, d;

  if (date == NULL || strlen (date) != 10 || date[4] != '-' || date[7] != '-')
    return FALSE;
  for (guint i = 0; i < 10; i++)
    if (i != 4 && i != 7 && !g_ascii_isdigit (date[i]))
      return FALSE;
  y = g_ascii_strtoull (date, NULL, 10);
  m = g_ascii_strtoull (date + 5, NULL, 10);
  d = g_ascii_strtoull (date + 8, NULL, 10);
  return y >= 1 && g_date_valid_dmy ((GDateDay) d, (GDateMonth) m, (GDateYear) y);
}
