/* hl-atomic-file.h — write a file so that it is complete or not there at all
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* Checks that @path can be the target of a save: not a folder, parent
 * folder exists.  Gives a message naming the path. */
gboolean hl_atomic_check_target (const char *path,
                                 GError    **error);

/* Whole-buffer write through a temporary file renamed over @path. */
gboolean hl_atomic_write        (const char *path,
                                 const char *data,
                                 gssize      length,
                                 GError    **error);

/* For writers that need a file name (cairo surfaces): a fresh temporary
 * name beside @path; then commit (rename over) or abandon (delete). */
char    *hl_atomic_temp_name    (const char *path);
gboolean hl_atomic_commit       (const char *temp,
                                 const char *path,
                                 GError    **error);
void     hl_atomic_abandon      (const char *temp);

G_END_DECLS
