/* hl-atomic-file.h — write a file so that it is complete or not there at all
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

#define HL_ATOMIC_ERROR (hl_atomic_error_quark ())

/* Why a file was not replaced although its folder and name are fine.
 * NO_TEMP and HARD_LINKS can still be written in place, which is not
 * atomic: only after the user agreed (hl_atomic_permit_in_place). */
typedef enum
{
  HL_ATOMIC_ERROR_READ_ONLY,   /* the file is write-protected (see below) */
  HL_ATOMIC_ERROR_NO_TEMP,     /* no temporary file can be made beside it */
  HL_ATOMIC_ERROR_HARD_LINKS,  /* other names share the file: a new file
                                * would leave them with the old content */
} HlAtomicError;

GQuark   hl_atomic_error_quark  (void);

/* Checks that @path can be the target of a save: not a folder, parent
 * folder exists.  Gives a message naming the path. */
gboolean hl_atomic_check_target (const char *path,
                                 GError    **error);

/* What hl_atomic_write would refuse, without writing anything: the
 * target check, then HL_ATOMIC_ERROR_READ_ONLY, _HARD_LINKS or _NO_TEMP.
 * A window asks before a save with it. */
gboolean hl_atomic_check_replace (const char *path,
                                  GError    **error);

/* Whole-buffer write through a temporary file renamed over @path.  An
 * existing file keeps its mode, and its owner and group where the system
 * allows it; a new one gets 0666 less the umask.  A symbolic link keeps
 * pointing at the file it names, which is the one written.
 *
 * Refused with HL_ATOMIC_ERROR_READ_ONLY when we may not write the file:
 * the system says so (permission bits, the immutable flag, a read-only
 * mount) or, for root whom the bits do not stop, when the file has no
 * write bit at all — as rm(1) asks about a "write-protected" file. */
gboolean hl_atomic_write        (const char *path,
                                 const char *data,
                                 gssize      length,
                                 GError    **error);

/* Overwrites the existing file @path itself (same inode, so every hard
 * link sees it; works in a folder that takes no new files).  Not atomic:
 * a crash in the middle leaves a cut file.  Read-only files are refused
 * as by hl_atomic_write. */
gboolean hl_atomic_write_in_place (const char *path,
                                   const char *data,
                                   gssize      length,
                                   GError    **error);

/* The user agreed that saves to @path may be written in place when
 * replacing it cannot work (NO_TEMP, HARD_LINKS); NULL takes it back.
 * One path at a time: the agreement answers one question. */
void     hl_atomic_permit_in_place (const char *path);

/* For writers that need a file name (cairo surfaces): a fresh temporary
 * name beside @path; then commit (rename over) or abandon (delete).  The
 * commit keeps owner, group and mode like hl_atomic_write and refuses a
 * read-only or hard-linked target the same way (there is no writing in
 * place here: the data is in the temporary). */
char    *hl_atomic_temp_name    (const char *path);
gboolean hl_atomic_commit       (const char *temp,
                                 const char *path,
                                 GError    **error);
void     hl_atomic_abandon      (const char *temp);

/* Deletes the temporary files that saves of @path by this program left
 * behind when they were killed: only names of our own pattern
 * (".NAME.hoopline-save-PID-XXXXXX"), regular files of this user, whose
 * writer no longer runs or that are older than a save can take.
 * Returns how many went. */
guint    hl_atomic_clean_leftovers (const char *path);

G_END_DECLS
