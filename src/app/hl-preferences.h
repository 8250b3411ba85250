/* hl-preferences.h — the preferences window, stored with GSettings
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <adwaita.h>

G_BEGIN_DECLS

#define HL_TYPE_PREFERENCES (hl_preferences_get_type ())
G_DECLARE_FINAL_TYPE (HlPreferences, hl_preferences, HL, PREFERENCES, AdwPreferencesWindow)

HlPreferences *hl_preferences_new (GtkWindow *parent,
                                   GSettings *settings);

G_END_DECLS
