/* hl-application.h — the application: windows, settings, app actions
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <adwaita.h>

#include "hl-shell.h"

G_BEGIN_DECLS

#define HL_APPLICATION_ID "org.hoopline.Hoopline"

#define HL_TYPE_APPLICATION (hl_application_get_type ())
G_DECLARE_FINAL_TYPE (HlApplication, hl_application, HL, APPLICATION, AdwApplication)

/* @extra_flags: tests add G_APPLICATION_NON_UNIQUE */
HlApplication *hl_application_new           (GApplicationFlags extra_flags);
GSettings     *hl_application_get_settings  (HlApplication *self);
/* a new shell as the preferences ask for: units, tolerance, measure */
/* A new shell in @system's units: a US project's starts in inches, psi
 * and ksi */
HlShellInputs  hl_application_default_shell (HlApplication *self,
                                             HlUnitSystem   system);
HlUnitSystem   hl_application_unit_system   (HlApplication *self);

/* The window part of main(): returns the exit status. */
int            hl_application_main          (int    argc,
                                             char **argv);

G_END_DECLS
