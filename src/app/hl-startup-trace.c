/* hl-startup-trace.c — how long the window takes to come up
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-startup-trace"

#include "hl-startup-trace.h"

#include <stdio.h>
#include <time.h>

static gint64 start_time;

static gboolean
tracing (void)
{
  return start_time != 0 && g_getenv ("HL_TRACE_STARTUP") != NULL;
}

void
hl_startup_trace_mark (void)
{
  if (start_time == 0)
    start_time = g_get_monotonic_time ();
}

void
hl_startup_trace (const char *stage)
{
  if (tracing ())
    fprintf (stderr, "hoopline: %s %.1f ms after start\n", stage,
             (g_get_monotonic_time () - start_time) / 1000.0);
}

void
hl_startup_trace_first_frame (void)
{
  if (tracing ())
    fprintf (stderr, "hoopline: first frame drawn %.1f ms after start, %.1f ms CPU, at %" G_GINT64_FORMAT " us\n",
             (g_get_monotonic_time () - start_time) / 1000.0, clock () * 1000.0 / CLOCKS_PER_SEC,
             g_get_real_time ());
}
