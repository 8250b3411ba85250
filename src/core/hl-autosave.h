/* hl-autosave.h — crash-recovery copies of unsaved edits
 *
 * The window writes the open project here a few seconds after each change
 * and deletes the copy when the document is saved or closed cleanly.  A
 * copy whose writer process is gone was left by a crash and is offered
 * for restoring on the next start.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-project.h"

G_BEGIN_DECLS

typedef struct _HlAutosave HlAutosave;

typedef struct
{
  char      *copy_path;      /* the autosaved project */
  char      *info_path;      /* its key file */
  char      *original_path;  /* the document's own file, or NULL if never saved */
  char      *title;
  GDateTime *saved_at;
} HlAutosaveEntry;

/* $XDG_STATE_HOME/hoopline/autosave (created on first write) */
char            *hl_autosave_dir          (void);

/* One slot per open document.  @original_path may be NULL (untitled). */
HlAutosave      *hl_autosave_new          (const char       *original_path);
void             hl_autosave_free         (HlAutosave       *autosave);
/* after "save as": later copies name the new file */
void             hl_autosave_set_original (HlAutosave       *autosave,
                                           const char       *original_path);
gboolean         hl_autosave_write        (HlAutosave       *autosave,
                                           const HlProject  *project,
                                           GError          **error);
/* the document was saved or closed on purpose: no copy is needed */
void             hl_autosave_discard      (HlAutosave       *autosave);

/* Copies left behind by processes that no longer run, newest first. */
GPtrArray       *hl_autosave_find_orphans (void);
HlProject       *hl_autosave_entry_load   (const HlAutosaveEntry *entry,
                                           GError               **error);
void             hl_autosave_entry_delete (const HlAutosaveEntry *entry);
void             hl_autosave_entry_free   (HlAutosaveEntry       *entry);

G_DEFINE_AUTOPTR_CLEANUP_FUNC (HlAutosave, hl_autosave_free)
G_DEFINE_AUTOPTR_CLEANUP_FUNC (HlAutosaveEntry, hl_autosave_entry_free)

G_END_DECLS
