/* hl-recovery.h — offering the copies a crashed run left behind
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <adwaita.h>

G_BEGIN_DECLS

/* the question's answers, as AdwMessageDialog response ids */
#define HL_RECOVERY_RESPONSE_RECOVER "recover"
#define HL_RECOVERY_RESPONSE_DISCARD "discard"
/* keeps the copy for the next start; Escape answers this too */
#define HL_RECOVERY_RESPONSE_LATER   "later"

/* Asks about each copy whose writer is gone, newest first, one question
 * at a time over @parent.  Recover opens the project in @parent when
 * that window is untouched, else in a new window. */
void       hl_recovery_offer        (GtkApplication *application,
                                     GtkWindow      *parent);
/* For tests: the open question, or NULL */
GtkWidget *hl_recovery_get_question (GtkApplication *application);

G_END_DECLS
