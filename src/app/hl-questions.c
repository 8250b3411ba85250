/* hl-questions.c — the questions asked before project work is lost
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-questions"

#include "hl-config.h"
#include "hl-questions.h"

#include <glib/gi18n.h>

static AdwMessageDialog *
question_new (GtkWindow  *parent,
              const char *heading,
              const char *body)
{
  AdwMessageDialog *dialog = ADW_MESSAGE_DIALOG (adw_message_dialog_new (parent, heading, body));

  /* the window waits for the answer, and takes its question along */
  gtk_window_set_modal (GTK_WINDOW (dialog), TRUE);
  gtk_window_set_destroy_with_parent (GTK_WINDOW (dialog), TRUE);
  return dialog;
}

GtkWidget *
hl_save_question_new (GtkWindow  *parent,
                      const char *question,
                      const char *detail,
                      const char *accept_label)
{
  AdwMessageDialog *dialog = question_new (parent, question, detail);

  adw_message_dialog_add_responses (dialog,
                                    HL_QUESTION_CANCEL, _("_Cancel"),
                                    HL_QUESTION_ACCEPT, accept_label,
                                    NULL);
  adw_message_dialog_set_response_appearance (dialog, HL_QUESTION_ACCEPT, ADW_RESPONSE_DESTRUCTIVE);
  /* Enter must not overwrite anything: the safe answer is the default */
  adw_message_dialog_set_default_response (dialog, HL_QUESTION_CANCEL);
  adw_message_dialog_set_close_response (dialog, HL_QUESTION_CANCEL);
  return GTK_WIDGET (dialog);
}

GtkWidget *
hl_unsaved_question_new (GtkWindow  *parent,
                         const char *title)
{
  AdwMessageDialog *dialog = question_new (parent, NULL, _("Changes that are not saved will be lost."));

  adw_message_dialog_format_heading (dialog, _("Save changes to “%s”?"), title);
  adw_message_dialog_add_responses (dialog,
                                    HL_QUESTION_CANCEL, _("_Cancel"),
                                    HL_QUESTION_DISCARD, _("_Discard"),
                                    HL_QUESTION_SAVE, _("_Save"),
                                    NULL);
  adw_message_dialog_set_response_appearance (dialog, HL_QUESTION_DISCARD, ADW_RESPONSE_DESTRUCTIVE);
  adw_message_dialog_set_response_appearance (dialog, HL_QUESTION_SAVE, ADW_RESPONSE_SUGGESTED);
  adw_message_dialog_set_default_response (dialog, HL_QUESTION_SAVE);
  adw_message_dialog_set_close_response (dialog, HL_QUESTION_CANCEL);
  return GTK_WIDGET (dialog);
}

GtkWidget *
hl_failure_notice_new (GtkWindow  *parent,
                       const char *heading,
                       const char *detail)
{
  AdwMessageDialog *dialog = question_new (parent, heading, detail);

  adw_message_dialog_add_response (dialog, "close", _("_Close"));
  adw_message_dialog_set_default_response (dialog, "close");
  adw_message_dialog_set_close_response (dialog, "close");
  return GTK_WIDGET (dialog);
}
