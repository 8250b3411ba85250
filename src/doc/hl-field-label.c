/* hl-field-label.c — the user's name of an input field
 *
 * GLib only: the document's messages and the window's rows both name
 * fields, so the names live below the toolkit.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-field-label"

#include "hl-config.h"
#include "hl-field-label.h"
#include "hl-field-table.h"

#include <glib/gi18n.h>

/* names the field table does not hold */
static const struct
{
  const char *field;
  const char *label;
} others[] = {
  { "id", N_("Id") },
  { "size", N_("Size") },
};

const char *
hl_field_label (const char *field)
{
  const HlField *row = hl_field_lookup (field);

  if (row != NULL && row->label != NULL)
    return _(row->label);
  for (guint i = 0; i < G_N_ELEMENTS (others); i++)
    if (g_strcmp0 (others[i].field, field) == 0)
      return _(others[i].label);
  return field;
}
