/* main.c — decides: headless command (no display needed) or the window
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline"

#include "hl-config.h"
#include "hl-command-line.h"
#include "hl-application.h"

#include <locale.h>
#include <glib/gi18n.h>

/* Installed, the catalogues are under the prefix; run from the build
 * tree (the README's demo command), they are the ones just built. */
static const char *
locale_dir (void)
{
  g_autofree char *self = g_file_read_link ("/proc/self/exe", NULL);
  static char *build_po;

  if (self != NULL && g_str_has_prefix (self, HL_BUILD_ROOT G_DIR_SEPARATOR_S))
    {
      if (build_po == NULL)
        build_po = g_build_filename (HL_BUILD_ROOT, "po", NULL);
      return build_po;
    }
  return HL_LOCALEDIR;
}

int
main (int    argc,
      char **argv)
{
  setlocale (LC_ALL, "");
  bindtextdomain (GETTEXT_PACKAGE, locale_dir ());
  bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
  textdomain (GETTEXT_PACKAGE);

  if (hl_command_line_is_headless (argc, argv))
    return hl_command_line_run (argc, argv);

  /* GTK is touched only from here on, so headless commands need no display */
  return hl_application_main (argc, argv);
}
