/* hl-program-setup.h — what both programs do first: locale and catalogues
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* The user's locale, and the message catalogues: under the prefix when
 * installed, the ones just built when run from the build tree. */
void         hl_program_setup_locale (void);

/* TRUE when this program runs from the build tree (HL_BUILD_ROOT) */
gboolean     hl_program_in_build_tree (void);

G_END_DECLS
