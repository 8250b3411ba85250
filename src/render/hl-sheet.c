/* hl-sheet.c — the calculation sheet laid out on pages
 *
 * Rows are measured once, then cut into pages; a heading never ends a
 * page and a table row never splits.  Every page carries the caution in
 * its footer and says which page of how many it is.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-sheet"

#include "hl-sheet.h"
#include "hl-sheet-private.h"
#include "hl-figure-format.h"
#include "hl-palette.h"
#include "hl-report.h"

#include <math.h>

typedef struct
{
  HlText          *text;
  const HlPalette *pal;
  GArray          *rows;
  double           width, height;
  double           left, right, top, bottom;   /* content box */
  double           base;
  GArray          *starts;                    /* guint: first row of each page */
} Sheet;

static double
cell_pad (Sheet *s)
{
  return 0.35 * s->base;
}

static HlFontRole
cell_role (const HlSheetRow *r,
           guint             i)
{
  if (r->strong)
    return HL_FONT_HEADING;
  return r->note && i == r->n_cells - 1 ? HL_FONT_SMALL : HL_FONT_BODY;
}

static double
row_height (Sheet      *s,
            HlSheetRow *r)
{
  double w = s->right - s->left, h, h2;

  switch (r->kind)
    {
    case HL_SHEET_TITLE:
      hl_text_measure (s->text, HL_FONT_TITLE, r->cells[0], w, NULL, &h);
      hl_text_measure (s->text, HL_FONT_HEADING, r->cells[1], w, NULL, &h2);
      return 1.3 * h + h2 + 0.8 * s->base;
    case HL_SHEET_HEADING:
      hl_text_measure (s->text, HL_FONT_HEADING, r->cells[0], w, NULL, &h);
      return 1.0 * s->base + h + 0.45 * s->base;
    case HL_SHEET_PARAGRAPH:
      hl_text_measure (s->text, HL_FONT_BODY, r->cells[0], w, NULL, &h);
      return h + 0.35 * s->base;
    case HL_SHEET_BULLET:
      hl_text_measure (s->text, HL_FONT_BODY, r->cells[0], w - 1.4 * s->base, NULL, &h);
      return h + 0.25 * s->base;
    case HL_SHEET_BOX:
      hl_text_measure (s->text, HL_FONT_BODY, r->cells[0], w - 1.6 * s->base, NULL, &h);
      return h + 1.6 * s->base;
    case HL_SHEET_TABLE:
    default:
      h = 0;
      for (guint i = 0; i < r->n_cells; i++)
        {
          hl_text_measure (s->text, cell_role (r, i), r->cells[i], r->cols[i] * w - 2 * cell_pad (s), NULL, &h2);
          h = MAX (h, h2);
        }
      return h + 2 * cell_pad (s);
    }
}

static double
footer_height (Sheet *s)
{
  double h1, h2;

  g_autofree char *caution = hl_figure_caution ();

  hl_text_measure (s->text, HL_FONT_TINY, caution, s->right - s->left, NULL, &h1);
  hl_text_measure (s->text, HL_FONT_TINY, _("Page"), 0, NULL, &h2);
  return h1 + h2 + 0.8 * s->base;
}

static void
sheet_layout (Sheet                 *s,
              cairo_t               *cr,
              double                 width,
              double                 height,
              const HlFigureContext *ctx)
{
  double y;

  s->width = width;
  s->height = height;
  s->base = CLAMP (width / 69.0, 6.0, 14.0);
  s->text = hl_text_new (cr, s->base);
  s->pal = hl_palette_get (HL_FIGURE_STYLE_LIGHT);
  s->left = 0.085 * width;
  s->right = width - 0.085 * width;
  s->top = 0.06 * height;
  s->bottom = height - 0.05 * height - footer_height (s);
  s->rows = hl_sheet_rows (ctx);
  s->starts = g_array_new (FALSE, FALSE, sizeof (guint));
  for (guint i = 0; i < s->rows->len; i++)
    g_array_index (s->rows, HlSheetRow, i).height = row_height (s, &g_array_index (s->rows, HlSheetRow, i));

  y = s->bottom;   /* forces a first page */
  for (guint i = 0; i < s->rows->len; i++)
    {
      HlSheetRow *r = &g_array_index (s->rows, HlSheetRow, i);
      double need = r->height;

      /* a heading, or a table's header row, goes with the row after it */
      if ((r->kind == HL_SHEET_HEADING || r->strong) && i + 1 < s->rows->len)
        need += g_array_index (s->rows, HlSheetRow, i + 1).height;
      if (y + need > s->bottom && (s->starts->len == 0 || y > s->top))
        {
          g_array_append_val (s->starts, i);
          y = s->top;
        }
      y += r->height;
    }
}

static void
sheet_clear (Sheet *s)
{
  hl_text_free (s->text);
  g_array_unref (s->rows);
  g_array_unref (s->starts);
}

static void
draw_row (Sheet      *s,
          cairo_t    *cr,
          HlSheetRow *r,
          double      y)
{
  double w = s->right - s->left;
  HlRect t;

  switch (r->kind)
    {
    case HL_SHEET_TITLE:
      t = hl_text_draw (s->text, HL_FONT_TITLE, r->cells[0], s->left, y, 0, 0, w, s->pal->ink);
      hl_text_draw (s->text, HL_FONT_HEADING, r->cells[1], s->left, y + 1.3 * t.height, 0, 0, w, s->pal->ink);
      break;
    case HL_SHEET_HEADING:
      t = hl_text_draw (s->text, HL_FONT_HEADING, r->cells[0], s->left, y + 1.0 * s->base, 0, 0, w, s->pal->ink);
      cairo_save (cr);
      hl_palette_set_source (cr, s->pal->ink);
      cairo_set_line_width (cr, 0.7);
      cairo_move_to (cr, s->left, t.y + t.height + 0.15 * s->base);
      cairo_line_to (cr, s->right, t.y + t.height + 0.15 * s->base);
      cairo_stroke (cr);
      cairo_restore (cr);
      break;
    case HL_SHEET_PARAGRAPH:
      hl_text_draw (s->text, HL_FONT_BODY, r->cells[0], s->left, y, 0, 0, w, s->pal->ink);
      break;
    case HL_SHEET_BULLET:
      hl_text_draw (s->text, HL_FONT_BODY, "•", s->left + 0.4 * s->base, y, 0, 0, 0, s->pal->ink);
      hl_text_draw (s->text, HL_FONT_BODY, r->cells[0], s->left + 1.4 * s->base, y, 0, 0, w - 1.4 * s->base,
                    s->pal->ink);
      break;
    case HL_SHEET_BOX:
      cairo_save (cr);
      cairo_rectangle (cr, s->left, y + 0.3 * s->base, w, r->height - 0.6 * s->base);
      hl_palette_set_source (cr, s->pal->problem_fill);
      cairo_fill_preserve (cr);
      hl_palette_set_source (cr, s->pal->ink);
      cairo_set_line_width (cr, 0.8);
      cairo_stroke (cr);
      cairo_restore (cr);
      hl_text_draw (s->text, HL_FONT_BODY, r->cells[0], s->left + 0.8 * s->base, y + 0.8 * s->base, 0, 0,
                    w - 1.6 * s->base, s->pal->ink);
      break;
    case HL_SHEET_TABLE:
    default:
      {
        double x = s->left;

        for (guint i = 0; i < r->n_cells; i++)
          {
            hl_text_draw (s->text, cell_role (r, i), r->cells[i], x + cell_pad (s), y + cell_pad (s), 0, 0,
                          r->cols[i] * w - 2 * cell_pad (s),
                          r->note && i == r->n_cells - 1 ? s->pal->muted : s->pal->ink);
            x += r->cols[i] * w;
          }
        cairo_save (cr);
        hl_palette_set_source (cr, r->strong ? s->pal->ink : s->pal->grid);
        cairo_set_line_width (cr, r->strong ? 0.7 : 0.5);
        cairo_move_to (cr, s->left, y + r->height);
        cairo_line_to (cr, s->right, y + r->height);
        cairo_stroke (cr);
        cairo_restore (cr);
      }
      break;
    }
}

static void
draw_footer (Sheet                 *s,
             cairo_t               *cr,
             guint                  page,
             const HlFigureContext *ctx)
{
  const HlShellInputs *in = &ctx->solution->inputs;
  const HlProject *pr = ctx->project;
  double y = s->bottom + 0.6 * s->base;
  g_autofree char *left = g_strdup_printf (_("Hoopline calculation sheet · %s · shell %s"),
                                           pr != NULL && pr->title != NULL && pr->title[0] ? pr->title : _("(untitled)"),
                                           in->id);
  g_autofree char *right = g_strdup_printf (_("page %u of %u"), page + 1, s->starts->len);
  g_autofree char *caution = hl_figure_caution ();
  double rw;
  HlRect r;

  cairo_save (cr);
  hl_palette_set_source (cr, s->pal->frame);
  cairo_set_line_width (cr, 0.5);
  cairo_move_to (cr, s->left, y - 0.3 * s->base);
  cairo_line_to (cr, s->right, y - 0.3 * s->base);
  cairo_stroke (cr);
  cairo_restore (cr);
  hl_text_measure (s->text, HL_FONT_TINY, right, 0, &rw, NULL);
  r = hl_text_draw_line (s->text, HL_FONT_TINY, left, s->left, y, s->right - s->left - rw - s->base, s->pal->muted);
  hl_text_draw (s->text, HL_FONT_TINY, right, s->right, y, 1, 0, 0, s->pal->muted);
  hl_text_draw (s->text, HL_FONT_TINY, caution, s->left, r.y + r.height, 0, 0, s->right - s->left, s->pal->ink);
}

guint
hl_sheet_page_count (double                 width,
                     double                 height,
                     const HlFigureContext *ctx)
{
  cairo_surface_t *surface;
  cairo_t *cr;
  Sheet s = { 0 };
  guint n;

  g_return_val_if_fail (ctx != NULL, 0);
  if (ctx->solution == NULL)
    return 0;
  /* unhinted metrics do not depend on the surface, so a scratch one
   * measures what the real page will draw */
  surface = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 1, 1);
  cr = cairo_create (surface);
  sheet_layout (&s, cr, width, height, ctx);
  n = s.starts->len;
  sheet_clear (&s);
  cairo_destroy (cr);
  cairo_surface_destroy (surface);
  return n;
}

void
hl_sheet_draw_page (cairo_t               *cr,
                    double                 width,
                    double                 height,
                    guint                  page,
                    const HlFigureContext *ctx)
{
  Sheet s = { 0 };
  guint first, last;
  double y;

  g_return_if_fail (cr != NULL && ctx != NULL);
  if (ctx->solution == NULL)
    return;
  sheet_layout (&s, cr, width, height, ctx);
  cairo_save (cr);
  cairo_rectangle (cr, 0, 0, width, height);
  hl_palette_set_source (cr, s.pal->paper);
  cairo_fill (cr);
  if (page < s.starts->len)
    {
      first = g_array_index (s.starts, guint, page);
      last = page + 1 < s.starts->len ? g_array_index (s.starts, guint, page + 1) : s.rows->len;
      y = s.top;
      for (guint i = first; i < last; i++)
        {
          HlSheetRow *r = &g_array_index (s.rows, HlSheetRow, i);

          draw_row (&s, cr, r, y);
          y += r->height;
        }
      draw_footer (&s, cr, page, ctx);
    }
  cairo_restore (cr);
  sheet_clear (&s);
}
