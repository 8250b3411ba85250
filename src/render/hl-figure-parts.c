/* hl-figure-parts.c — drawing pieces several panels use
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-parts"

#include "hl-figure-private.h"

#include <math.h>

double
hl_panel_heading_height (HlFigure   *f,
                         double      width,
                         const char *title,
                         const char *subtitle)
{
  double h1 = 0, h2 = 0;

  hl_text_measure (f->text, HL_FONT_HEADING, title, width, NULL, &h1);
  if (subtitle != NULL && subtitle[0] != '\0')
    hl_text_measure (f->text, HL_FONT_SMALL, subtitle, width, NULL, &h2);
  return h1 + h2 + f->gap;
}

double
hl_panel_heading (HlFigure     *f,
                  const HlRect *area,
                  const char   *title,
                  const char   *subtitle)
{
  HlRect r = hl_text_draw (f->text, HL_FONT_HEADING, title, area->x, area->y, 0, 0, area->width, f->pal->ink);
  double h = r.height;

  if (subtitle != NULL && subtitle[0] != '\0')
    h += hl_text_draw (f->text, HL_FONT_SMALL, subtitle, area->x, area->y + h, 0, 0, area->width,
                       f->pal->muted).height;
  return h + f->gap;
}

double
hl_arrow_head_length (HlFigure *f)
{
  return MAX (4.0, 0.62 * f->text->base);
}

void
hl_arrow_head (HlFigure *f,
               double    x,
               double    y,
               double    dx,
               double    dy)
{
  double len = hl_arrow_head_length (f);
  double n = hypot (dx, dy);
  double ux, uy;

  if (n == 0)
    return;
  ux = dx / n;
  uy = dy / n;
  /* tip at (x, y), pointing along (dx, dy); a slim 1:3 head */
  cairo_move_to (f->cr, x, y);
  cairo_line_to (f->cr, x - len * ux - len / 3 * uy, y - len * uy + len / 3 * ux);
  cairo_line_to (f->cr, x - len * ux + len / 3 * uy, y - len * uy - len / 3 * ux);
  cairo_close_path (f->cr);
  cairo_fill (f->cr);
}

void
hl_dimension (HlFigure *f,
              double    x0,
              double    y0,
              double    x1,
              double    y1)
{
  double len = MAX (4.0, 0.62 * f->text->base);
  double d = hypot (x1 - x0, y1 - y0);
  double ux, uy;

  if (d == 0)
    return;
  ux = (x1 - x0) / d;
  uy = (y1 - y0) / d;
  cairo_save (f->cr);
  cairo_set_line_width (f->cr, 0.8 * f->lw);
  hl_palette_set_source (f->cr, f->pal->ink);
  if (d >= 2.6 * len)
    {
      /* arrows inside, pointing out to the two surfaces */
      cairo_move_to (f->cr, x0 + ux * len * 0.5, y0 + uy * len * 0.5);
      cairo_line_to (f->cr, x1 - ux * len * 0.5, y1 - uy * len * 0.5);
      cairo_stroke (f->cr);
      hl_arrow_head (f, x0, y0, -ux, -uy);
      hl_arrow_head (f, x1, y1, ux, uy);
    }
  else
    {
      /* too short: arrows outside, pointing in, joined through the gap */
      cairo_move_to (f->cr, x0 - ux * 2.2 * len, y0 - uy * 2.2 * len);
      cairo_line_to (f->cr, x1 + ux * 2.2 * len, y1 + uy * 2.2 * len);
      cairo_stroke (f->cr);
      hl_arrow_head (f, x0, y0, ux, uy);
      hl_arrow_head (f, x1, y1, -ux, -uy);
    }
  cairo_restore (f->cr);
}

void
hl_marker (HlFigure *f,
           double    x,
           double    y,
           double    size)
{
  cairo_save (f->cr);
  cairo_new_sub_path (f->cr);
  cairo_arc (f->cr, x, y, size / 2, 0, 2 * G_PI);
  hl_palette_set_source (f->cr, f->pal->marker);
  cairo_fill_preserve (f->cr);
  cairo_set_line_width (f->cr, 0.9 * f->lw);
  hl_palette_set_source (f->cr, f->pal->marker_edge);
  cairo_stroke (f->cr);
  cairo_restore (f->cr);
}

const char *
hl_stress_unit (HlFigure *f)
{
  return hl_row_unit (HL_ROW_STRESS, f->units);
}

const char *
hl_length_unit (HlFigure *f)
{
  return hl_row_unit (HL_ROW_LENGTH, f->units);
}

double
hl_stress_value (HlFigure *f,
                 double    si)
{
  return hl_row_convert (HL_ROW_STRESS, f->units, si);
}

double
hl_length_value (HlFigure *f,
                 double    si)
{
  return hl_row_convert (HL_ROW_LENGTH, f->units, si);
}

char *
hl_stress_text (HlFigure *f,
                double    si,
                int       digits)
{
  return hl_figure_format_quantity (si, HL_ROW_STRESS, f->units, digits, f->locale);
}

char *
hl_length_text (HlFigure *f,
                double    si,
                int       digits)
{
  return hl_figure_format_quantity (si, HL_ROW_LENGTH, f->units, digits, f->locale);
}
