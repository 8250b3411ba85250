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

int
main (int    argc,
      char **argv)
{
  setlocale (LC_ALL, "");
  bindtextdomain (GETTEXT_PACKAGE, HL_LOCALEDIR);
  bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
  textdomain (GETTEXT_PACKAGE);

  if (hl_command_line_is_headless (argc, argv))
    return hl_command_line_run (argc, argv);

  /* GTK is touched only from here on, so headless commands need no display */
  return hl_application_main (argc, argv);
}
