/* hl-banner.h — a notice across the top of the window
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gtk/gtk.h>

G_BEGIN_DECLS

#define HL_TYPE_BANNER (hl_banner_get_type ())
G_DECLARE_FINAL_TYPE (HlBanner, hl_banner, HL, BANNER, GtkWidget)

/* Children added in a .ui file become buttons at the end, after the
 * text; "show-close-button" adds one that hides the banner. */
GtkWidget  *hl_banner_new          (void);
void        hl_banner_show         (HlBanner       *self,
                                    GtkMessageType  type,
                                    const char     *text);
void        hl_banner_hide         (HlBanner       *self);
/* the text while the banner is shown, else NULL */
const char *hl_banner_get_text     (HlBanner       *self);

G_END_DECLS
