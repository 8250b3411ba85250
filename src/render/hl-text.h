/* hl-text.h — Pango text for the figure: measure, place, remember
 *
 * A figure measures most strings before it draws them, and the window
 * redraws the same figure often: each string is laid out once per font
 * size and kept in a cache of the calling thread.  Metrics are unhinted,
 * so a figure lays out the same on screen, in PDF and in PNG, and one
 * layout serves every surface.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <cairo.h>
#include <pango/pangocairo.h>

#include "hl-palette.h"

G_BEGIN_DECLS

typedef enum
{
  HL_FONT_BODY,
  HL_FONT_SMALL,
  HL_FONT_TINY,
  HL_FONT_HEADING,
  HL_FONT_TITLE,
  HL_FONT_VALUE,      /* body size, bold: title block values */
  HL_N_FONTS,
} HlFontRole;

typedef struct
{
  double x, y, width, height;
} HlRect;

typedef struct
{
  cairo_t              *cr;
  PangoFontDescription *fonts[HL_N_FONTS];
  double                base;
  GArray               *boxes;   /* HlRect of every string drawn, or NULL */
  GPtrArray            *wrapped; /* with @boxes: the layouts of wrapped strings */
} HlText;

HlText *hl_text_new      (cairo_t    *cr,
                          double      base_size);
void    hl_text_free     (HlText     *text);
void    hl_text_set_base (HlText     *text,
                          double      base_size);
double  hl_text_size     (HlText     *text,
                          HlFontRole  role);

/* Size of @str in @role; @wrap > 0 wraps at that width. */
void    hl_text_measure  (HlText     *text,
                          HlFontRole  role,
                          const char *str,
                          double      wrap,
                          double     *width,
                          double     *height);

/* width of the widest word of @str in @role: the narrowest wrap that
 * keeps every word whole at this size */
double  hl_text_longest_word (HlText     *text,
                              HlFontRole  role,
                              const char *str);

/* Draws @str with its box anchored at (@x, @y): @ax, @ay in [0, 1] pick
 * the anchor inside the box (0, 0 top left; 0.5, 0.5 centre).  Wrapped
 * lines align to the same side as the anchor.  Returns the box. */
HlRect  hl_text_draw     (HlText     *text,
                          HlFontRole  role,
                          const char *str,
                          double      x,
                          double      y,
                          double      ax,
                          double      ay,
                          double      wrap,
                          HlRgb       colour);
/* one line cut to @width with an ellipsis if it is longer */
HlRect  hl_text_draw_line (HlText    *text,
                          HlFontRole  role,
                          const char *str,
                          double      x,
                          double      y,
                          double      width,
                          HlRgb       colour);
/* turned a quarter left, reading upwards, centred on (@x, @y) */
HlRect  hl_text_draw_up  (HlText     *text,
                          HlFontRole  role,
                          const char *str,
                          double      x,
                          double      y,
                          HlRgb       colour);

/* empties the calling thread's cache of laid-out strings */
void     hl_text_cache_clear (void);

gboolean hl_rect_overlaps (const HlRect *a,
                           const HlRect *b);

G_END_DECLS
