/* hl-program-setup.c — what both programs do first: locale and catalogues
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline"

#include "hl-config.h"
#include "hl-program-setup.h"

#include <locale.h>
#include <glib/gi18n.h>

gboolean
hl_program_in_build_tree (void)
{
  g_autofree char *self = g_file_read_link ("/proc/self/exe", NULL);

  return self != NULL && g_str_has_prefix (self, HL_BUILD_ROOT G_DIR_SEPARATOR_S);
}

void
hl_program_setup_locale (void)
{
  g_autofree char *build_po = NULL;

  setlocale (LC_ALL, "");
  /* run from the build tree (the README's demo command), the catalogues
   * are the ones just built */
  if (hl_program_in_build_tree ())
    build_po = g_build_filename (HL_BUILD_ROOT, "po", NULL);
  bindtextdomain (GETTEXT_PACKAGE, build_po != NULL ? build_po : HL_LOCALEDIR);
  bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
  textdomain (GETTEXT_PACKAGE);
}
