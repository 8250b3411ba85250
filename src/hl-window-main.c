/* hl-window-main.c — hoopline-window: the GNOME application
 *
 * Started by hoopline for anything that is not a headless command.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline"

#include "hl-config.h"
#include "hl-application.h"
#include "hl-program-setup.h"

int
main (int    argc,
      char **argv)
{
  hl_program_setup_locale ();
  /* the launcher, the window class and the messages say "hoopline", the
   * program the user ran */
  g_set_prgname ("hoopline");
  return hl_application_main (argc, argv);
}
