/* hl-history.h — undo and redo of a project, by what each edit changed
 *
 * A step keeps only what the edit touched (one shell's old and new
 * inputs, a material and the shells that follow it, the project texts,
 * a revision), not a copy of the project: a copy of a 10,000-shell
 * project costs megabytes per keystroke.  Every change to the project
 * goes through a record call here, which applies it too, so a step can
 * never disagree with the edit that made it.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-project.h"

G_BEGIN_DECLS

/* at least this many of the latest steps are always kept */
#define HL_HISTORY_KEEP_STEPS 100
/* older steps are dropped beyond this many bytes or this many steps */
#define HL_HISTORY_CAP_BYTES  (32 * 1024 * 1024)
#define HL_HISTORY_MAX_STEPS  1000

typedef struct _HlHistory HlHistory;

HlHistory *hl_history_new            (void);
void       hl_history_free           (HlHistory *history);
void       hl_history_clear          (HlHistory *history);
/* the next edit starts a new step even with the same merge key */
void       hl_history_break_merge    (HlHistory *history);

/* An edit: begin, record its changes (each is applied to @project at
 * once), end.  Successive edits with the same non-NULL @merge_key make
 * one step (typing in one field).  An edit that records nothing leaves
 * the history as it was. */
void       hl_history_begin          (HlHistory  *history,
                                      const char *merge_key,
                                      guint       selected);
void       hl_history_end            (HlHistory  *history,
                                      guint       selected);

void       hl_history_set_shell      (HlHistory           *history,
                                      HlProject           *project,
                                      guint                index,
                                      const HlShellInputs *shell);
void       hl_history_insert_shell   (HlHistory           *history,
                                      HlProject           *project,
                                      guint                index,
                                      const HlShellInputs *shell);
void       hl_history_remove_shell   (HlHistory           *history,
                                      HlProject           *project,
                                      guint                index);
/* adds or replaces by id, and copies the values into every shell that
 * refers to it, as hl_project_put_material() does */
void       hl_history_put_material   (HlHistory           *history,
                                      HlProject           *project,
                                      const HlMaterial    *material);
void       hl_history_set_info       (HlHistory           *history,
                                      HlProject           *project,
                                      const char          *title,
                                      const char          *engineer,
                                      const char          *description,
                                      HlUnitSystem         units);
/* one sign-off of the design note; @date "YYYY-MM-DD" or "" */
void       hl_history_set_signoff    (HlHistory           *history,
                                      HlProject           *project,
                                      HlSignoffRole        role,
                                      const char          *name,
                                      const char          *date);
void       hl_history_add_revision   (HlHistory           *history,
                                      HlProject           *project,
                                      guint                number,
                                      const char          *date,
                                      const char          *author,
                                      const char          *text);

gboolean   hl_history_can_undo       (HlHistory *history);
gboolean   hl_history_can_redo       (HlHistory *history);
/* Take @project back (or forward) one step; @selected receives the
 * selection the step had.  FALSE when there is nothing to undo/redo. */
gboolean   hl_history_undo           (HlHistory *history,
                                      HlProject *project,
                                      guint     *selected);
gboolean   hl_history_redo           (HlHistory *history,
                                      HlProject *project,
                                      guint     *selected);

/* bytes of memory the undo and redo steps hold */
gsize      hl_history_bytes          (HlHistory *history);
guint      hl_history_n_undo         (HlHistory *history);

G_END_DECLS
