/* hl-recovery.h — offering the copies a crashed run left behind
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

G_BEGIN_DECLS

/* the question's answers */
#define HL_RECOVERY_RESPONSE_RECOVER GTK_RESPONSE_ACCEPT
#define HL_RECOVERY_RESPONSE_DISCARD GTK_RESPONSE_REJECT
/* keeps the copy for the next start */
#define HL_RECOVERY_RESPONSE_LATER   GTK_RESPONSE_CANCEL

/* Asks about each copy whose writer is gone, newest first, one question
 * at a time over @parent.  Recover opens the project in @parent when
 * that window is untouched, else in a new window. */
void       hl_recovery_offer        (GtkApplication *application,
                                     GtkWindow      *parent);
/* For tests: the open question, or NULL */
GtkWidget *hl_recovery_get_question (GtkApplication *application);

G_END_DECLS
