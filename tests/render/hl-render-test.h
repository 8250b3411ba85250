/* hl-render-test.h — shared helpers of the render tests
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <cairo.h>

#include "hl-figure-geometry.h"
#include "hl-palette.h"
#include "hl-project.h"
#include "hl-solution.h"

G_BEGIN_DECLS

/* $HL_SOURCE_DIR/data/examples/demo.hoop, loaded (the test fails if not) */
char            *hl_rt_demo_path   (void);
HlProject       *hl_rt_load_demo   (void);

/* closed cylinder of inner diameter @id_mm, wall @t_mm, @bar internal
 * pressure, corrosion allowance @ca_mm, steel E 200 GPa, nu 0.3 */
HlShellInputs    hl_rt_cylinder    (double id_mm,
                                    double t_mm,
                                    double bar,
                                    double ca_mm);
HlSolution      *hl_rt_solve       (const HlShellInputs *in);

/* the figure of @sol in a @width x @height image surface */
cairo_surface_t *hl_rt_render      (const HlProject  *project,
                                    const HlSolution *sol,
                                    int               width,
                                    int               height,
                                    HlFigureStyle     style,
                                    HlFigureGeometry *geometry);

/* the context hl_rt_render() draws with: SI, a fixed date, paper */
HlFigureContext  hl_rt_context     (const HlProject  *project,
                                    const HlSolution *sol,
                                    HlFigureStyle     style);
cairo_surface_t *hl_rt_render_context (const HlFigureContext *ctx,
                                       int                    width,
                                       int                    height,
                                       HlFigureGeometry      *geometry);

/* colour at a pixel, 0..1 */
HlRgb            hl_rt_pixel       (cairo_surface_t  *surface,
                                    int               x,
                                    int               y);
/* largest channel difference from @c, 0..1 */
double           hl_rt_distance    (HlRgb             a,
                                    HlRgb             c);
/* a pixel within @radius of (@x, @y) is within @tol of @c */
gboolean         hl_rt_colour_near (cairo_surface_t  *surface,
                                    double            x,
                                    double            y,
                                    int               radius,
                                    HlRgb             c,
                                    double            tol);

G_END_DECLS
