/* hl-ui-test-util.h — what the window's tests share: the main loop, the
 * demo project, an application registered without a session bus
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-application.h"
#include "hl-questions.h"
#include "hl-window.h"

G_BEGIN_DECLS

/* runs whatever is ready, without waiting */
void           hl_ui_iterate         (void);
/* runs the main loop for @ms so that layout, drawing and timers happen */
void           hl_ui_run_for         (guint ms);
/* data/examples/demo.hoop in the source tree (HL_SOURCE_DIR) */
char          *hl_ui_demo_path       (void);
/* a new window of @app showing the project at @path, presented */
HlWindow      *hl_ui_open_window     (HlApplication *app,
                                      const char    *path);
/* the demo project in a new window of @app */
HlWindow      *hl_ui_open_demo       (HlApplication *app);
/* closes @window without the unsaved-changes question */
void           hl_ui_discard_window  (HlWindow      *window);
/* answers the AdwMessageDialog @question with @response, which it must
 * offer, as a click on that button would */
void           hl_ui_answer          (GtkWidget     *question,
                                      const char    *response);
/* the heading of the AdwMessageDialog @question */
char          *hl_ui_question_text   (GtkWidget     *question);
/* a registered application (its startup has run), not unique */
HlApplication *hl_ui_application_new (void);

G_END_DECLS
