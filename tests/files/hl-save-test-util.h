/* hl-save-test-util.h — what the save tests of the core and of the window
 * share: folders that take no new files, and a save killed half-way
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>
#include <glib/gstdio.h>
#include <sys/types.h>

G_BEGIN_DECLS

/* Linux chattr(1)'s +i / -i on @path; FALSE where the flag is refused. */
gboolean hl_save_test_set_immutable      (const char *path,
                                          gboolean    on);

/* Makes @dir take no new files while the files in it stay writable: as
 * a user no write permission on it, as root (whom the bits do not stop)
 * the immutable flag.  *@immutable tells which, for the undo.  FALSE
 * (and the test skipped) where neither works. */
gboolean hl_save_test_close_folder       (const char *dir,
                                          gboolean   *immutable);
void     hl_save_test_open_folder        (const char *dir,
                                          gboolean    immutable);

/* A child process saves 64 KiB to @path while it may write only 1 KiB
 * (RLIMIT_FSIZE), so the kernel kills it with SIGXFSZ in the middle of
 * the save (setrlimit(2)).  Returns its pid, gone by then. */
pid_t    hl_save_test_killed_save        (const char *path);

guint    hl_save_test_count_entries      (const char *dir);
/* stat(2) of @path, which must exist */
GStatBuf hl_save_test_stat               (const char *path);

G_END_DECLS
