/* hl-figure.h — the figure of one shell, drawn into any cairo context
 *
 * The same code draws the window's canvas, the PNG/SVG/PDF exports and
 * the printout.  It reads one HlSolution and never recomputes formulas.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <cairo.h>

#include "hl-project.h"
#include "hl-solution.h"

G_BEGIN_DECLS

typedef enum
{
  HL_FIGURE_STYLE_LIGHT,
  HL_FIGURE_STYLE_DARK,
} HlFigureStyle;

/* The panels of a figure an export may leave out (0: all that fit). */
typedef enum
{
  HL_PANEL_SECTION = 1 << 0,   /* the ring or sphere section to scale */
  HL_PANEL_DETAIL  = 1 << 1,   /* the magnified wall */
  HL_PANEL_PLOT    = 1 << 2,   /* stresses through the wall */
  HL_PANEL_CHART   = 1 << 3,   /* thinness chart */
  HL_PANELS_ALL    = 0xf,
} HlFigurePanels;

typedef struct
{
  const HlProject  *project;      /* title block; may be NULL */
  const HlSolution *solution;     /* NULL when the inputs are invalid */
  const char       *problem_text; /* with no solution: what to fix */
  HlUnitSystem      units;
  HlFigureStyle     style;
  const char       *export_date;  /* "YYYY-MM-DD", or NULL for today */
  /* Fields added after the first version: zero is the safe default. */
  gboolean          locale_numbers; /* TRUE: user's decimal separator (the
                                     * window); FALSE: C locale (exports) */
  const HlShellInputs *shell;     /* optional: names the shell in the title
                                   * block when there is no solution */
  const HlSolution *new_wall;     /* optional: the uncorroded wall beside a
                                   * corroded @solution, for the sheet; the
                                   * sheet solves it itself when NULL */
  guint             panels;       /* HlFigurePanels to draw; 0: all */
  gboolean          screen;       /* the window's canvas: no title block
                                   * or caution (the window shows both),
                                   * the plots get the room */
} HlFigureContext;

typedef enum
{
  HL_FIGURE_TARGET_SCREEN,  /* the window: the user's decimal separator */
  HL_FIGURE_TARGET_PAPER,   /* print and export: C locale, light style */
} HlFigureTarget;

/* The one way every output fills a context, so the canvas, the printout
 * and the exports show the same title block: the shell is named even when
 * its values are bad and there is no @solution.  Units are the project's
 * display units (an export may then choose others); the style is light
 * (the canvas may then choose dark); the date is today's. */
void hl_figure_context_init (HlFigureContext     *ctx,
                             const HlProject     *project,
                             const HlShellInputs *shell,
                             const HlSolution    *solution,
                             const HlSolution    *new_wall,
                             const char          *problem_text,
                             HlFigureTarget       target);

/* Draws the whole figure (section, wall detail, through-thickness plot,
 * thinness chart, verdict, title block, caution) to fill @width x @height
 * user units of @cr. */
void hl_figure_draw (cairo_t               *cr,
                     double                 width,
                     double                 height,
                     const HlFigureContext *ctx);

G_END_DECLS
