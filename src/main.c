/* main.c — hoopline: the headless commands, or the window program
 *
 * The commands (--check, --summary, --export, --help, --version) need
 * no display and link no GTK: loading and relocating the toolkit cost
 * them most of their time.  Anything else is the window's, so this
 * program replaces itself with hoopline-window (execv: the same process
 * and PID, so a desktop launcher, a signal or a test that waits on it
 * reaches the window).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline"

#include "hl-config.h"
#include "hl-command-line.h"
#include "hl-program-setup.h"

#include <errno.h>
#include <stdio.h>
#include <string.h>
#include <unistd.h>
#include <glib/gi18n.h>

/* installed in the libexec folder; beside this one in the build tree */
static char *
window_program (void)
{
  if (hl_program_in_build_tree ())
    return g_build_filename (HL_BUILD_ROOT, "src", HL_WINDOW_PROGRAM, NULL);
  return g_build_filename (HL_LIBEXECDIR, HL_WINDOW_PROGRAM, NULL);
}

int
main (int    argc,
      char **argv)
{
  g_autofree char *window = NULL;

  hl_program_setup_locale ();
  if (hl_command_line_is_headless (argc, argv))
    return hl_command_line_run (argc, argv);

  window = window_program ();
  execv (window, argv);
  /* TRANSLATORS: the window program's path, then the system's reason */
  fprintf (stderr, _("hoopline: cannot start the window (%s): %s\n"), window, g_strerror (errno));
  return 2;
}
