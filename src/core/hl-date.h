/* hl-date.h — the one rule for dates in a project
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* A calendar date written YYYY-MM-DD (ISO 8601 extended calendar form),
 * year 1 to 9999, a day that exists.  Week dates (2026-W48-3), ordinal
 * dates (2026-332), times and zones are refused: the file holds this
 * form only.  The revisions dialog, the reader and the writer ask here. */
gboolean hl_date_valid (const char *date);

G_END_DECLS
