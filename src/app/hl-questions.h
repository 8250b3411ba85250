/* hl-questions.h — the questions asked before project work is lost
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <adwaita.h>

G_BEGIN_DECLS

/* the answers, as AdwMessageDialog response ids */
#define HL_QUESTION_CANCEL  "cancel"
#define HL_QUESTION_ACCEPT  "accept"
#define HL_QUESTION_DISCARD "discard"
#define HL_QUESTION_SAVE    "save"

/* A question before a save writes over something: @question as the
 * heading, @detail below, Cancel (HL_QUESTION_CANCEL, the default and
 * the answer of Escape) and @accept_label (HL_QUESTION_ACCEPT). */
GtkWidget *hl_save_question_new    (GtkWindow  *parent,
                                    const char *question,
                                    const char *detail,
                                    const char *accept_label);

/* "Save changes to “@title”?" with Cancel (also Escape), Discard
 * (HL_QUESTION_DISCARD) and Save (HL_QUESTION_SAVE, the default). */
GtkWidget *hl_unsaved_question_new (GtkWindow  *parent,
                                    const char *title);

/* Tells that something failed: @heading, @detail and Close. */
GtkWidget *hl_failure_notice_new   (GtkWindow  *parent,
                                    const char *heading,
                                    const char *detail);

G_END_DECLS
