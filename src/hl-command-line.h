/* hl-command-line.h — the headless commands: --summary, --export, --check
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

enum
{
  HL_EXIT_OK = 0,
  HL_EXIT_BAD_INPUT = 1,    /* bad file or values */
  HL_EXIT_BAD_USAGE = 2,    /* bad command line */
};

/* TRUE when @argv asks for a headless command (or help/version), which
 * must run without a display. */
gboolean hl_command_line_is_headless (int    argc,
                                      char **argv);

/* Runs the command; returns the process exit status. */
int      hl_command_line_run         (int    argc,
                                      char **argv);

G_END_DECLS
