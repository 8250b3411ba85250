/* hl-preferences.c — the preferences window, stored with GSettings
 *
 * Every control is bound to its key, so a change is stored at once and
 * other windows follow it.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-preferences"

#include "hl-config.h"
#include "hl-preferences.h"

struct _HlPreferences
{
  AdwPreferencesWindow parent_instance;

  AdwComboRow   *unit_system_dropdown;
  GtkSpinButton *tolerance_spin;
  AdwComboRow   *measure_dropdown;
  AdwComboRow   *basis_dropdown;
  AdwComboRow   *pressure_unit_dropdown;
  GtkSwitch     *dark_switch;
};

G_DEFINE_FINAL_TYPE (HlPreferences, hl_preferences, ADW_TYPE_PREFERENCES_WINDOW)

/* enum keys hold nicks; the combo rows list them in schema order */
static gboolean
nick_to_index (GValue   *value,
               GVariant *variant,
               gpointer  user_data)
{
  const char *const *nicks = user_data;
  const char *nick = g_variant_get_string (variant, NULL);

  for (guint i = 0; nicks[i] != NULL; i++)
    if (g_strcmp0 (nicks[i], nick) == 0)
      {
        g_value_set_uint (value, i);
        return TRUE;
      }
  return FALSE;
}

static GVariant *
index_to_nick (const GValue       *value,
               const GVariantType *type,
               gpointer            user_data)
{
  const char *const *nicks = user_data;
  guint i = g_value_get_uint (value);

  if (i >= g_strv_length ((char **) nicks))
    return NULL;
  return g_variant_new_string (nicks[i]);
}

static void
hl_preferences_class_init (HlPreferencesClass *klass)
{
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-preferences.ui");
  gtk_widget_class_bind_template_child (widget_class, HlPreferences, unit_system_dropdown);
  gtk_widget_class_bind_template_child (widget_class, HlPreferences, tolerance_spin);
  gtk_widget_class_bind_template_child (widget_class, HlPreferences, measure_dropdown);
  gtk_widget_class_bind_template_child (widget_class, HlPreferences, basis_dropdown);
  gtk_widget_class_bind_template_child (widget_class, HlPreferences, pressure_unit_dropdown);
  gtk_widget_class_bind_template_child (widget_class, HlPreferences, dark_switch);
}

static void
hl_preferences_init (HlPreferences *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
}

HlPreferences *
hl_preferences_new (GtkWindow *parent,
                    GSettings *settings)
{
  static const char *const systems[] = { "si", "us", NULL };
  static const char *const measures[] = { "hoop", "equivalent", "both", NULL };
  static const char *const bases[] = { "asme-ug27", "en13445", "lame", "thin-wall", NULL };
  static const char *const pressure_units[] = { "typed", "system", "bar", "MPa", "kPa", "psi", NULL };
  HlPreferences *self = g_object_new (HL_TYPE_PREFERENCES, "transient-for", parent, NULL);

  g_settings_bind_with_mapping (settings, "unit-system", self->unit_system_dropdown, "selected",
                                G_SETTINGS_BIND_DEFAULT, nick_to_index, index_to_nick,
                                (gpointer) systems, NULL);
  g_settings_bind_with_mapping (settings, "default-verdict-measure", self->measure_dropdown, "selected",
                                G_SETTINGS_BIND_DEFAULT, nick_to_index, index_to_nick,
                                (gpointer) measures, NULL);
  g_settings_bind_with_mapping (settings, "default-design-basis", self->basis_dropdown, "selected",
                                G_SETTINGS_BIND_DEFAULT, nick_to_index, index_to_nick,
                                (gpointer) bases, NULL);
  g_settings_bind_with_mapping (settings, "result-pressure-unit", self->pressure_unit_dropdown, "selected",
                                G_SETTINGS_BIND_DEFAULT, nick_to_index, index_to_nick,
                                (gpointer) pressure_units, NULL);
  g_settings_bind (settings, "default-tolerance", self->tolerance_spin, "value", G_SETTINGS_BIND_DEFAULT);
  g_settings_bind (settings, "dark-style", self->dark_switch, "active", G_SETTINGS_BIND_DEFAULT);
  return self;
}
