/* hl-startup-trace.h — how long the window takes to come up
 *
 * With HL_TRACE_STARTUP set in the environment, each stage of the start
 * prints its time since hl_startup_trace_mark() on stderr; the first
 * frame also prints the CPU time and a real-time stamp, so a script can
 * measure from before exec().  Without the variable nothing is printed.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* the time origin, set once at the start */
void hl_startup_trace_mark        (void);
/* prints how long after the start @stage came */
void hl_startup_trace             (const char *stage);
/* the canvas drew its first frame */
void hl_startup_trace_first_frame (void);

G_END_DECLS
