/* hl-sheet.c — the calculation sheet laid out on pages
 *
 * Rows are measured once, then cut into pages: a heading goes with the
 * rows after it, a table row never splits, and the last page never holds
 * a lone row (rows move over from the page before).  Every page carries
 * a header naming project, item, design basis and revision with "page N
 * of M" over the whole document, and the caution in its footer.
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

/* the fewest rows the last page holds when the rows before allow */
#define LAST_PAGE_MIN_ROWS 3
/* rows a heading takes along to the next page */
#define HEADING_KEEPS 2
/* the most rows a check's title keeps with it (its worked-out table) */
#define STEP_ROWS 8

typedef struct
{
  char *left1, *right1, *left2;   /* header lines; page N of M is added */
  char *footer;
} Header;

typedef struct
{
  HlText          *text;
  const HlPalette *pal;
  GArray          *rows;
  double          *heights;
  double           width, height;
  double           left, right, top, bottom;   /* content box */
  double           head_top;
  double           base;
  GArray          *starts;                    /* guint: first row of each page */
  Header           head;
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
      hl_text_measure (s->text, r->strong ? HL_FONT_HEADING : HL_FONT_BODY, r->cells[0], w, NULL, &h);
      return h + (r->strong ? 0.5 : 0.35) * s->base;
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
      /* a box to sign in has room for a signature */
      return MAX (h + 2 * cell_pad (s), r->boxed ? 2.6 * s->base : 0);
    }
}

static double
footer_height (Sheet *s)
{
  double h1;

  hl_text_measure (s->text, HL_FONT_TINY, s->head.footer, s->right - s->left, NULL, &h1);
  return h1 + 0.8 * s->base;
}

static double
header_height (Sheet *s)
{
  double h1;

  hl_text_measure (s->text, HL_FONT_TINY, "Ag", 0, NULL, &h1);
  return 2 * h1 + 1.2 * s->base;
}

/* the row keeps with the one after it: a heading, a table's header row,
 * a check's title */
static gboolean
keeps_with_next (const HlSheetRow *r)
{
  return r->kind == HL_SHEET_HEADING || r->kind == HL_SHEET_TITLE || r->strong;
}

static gboolean
same_table (Sheet *s,
            guint  a,
            guint  b)
{
  const HlSheetRow *ra = hl_note_row (s->rows, a), *rb = hl_note_row (s->rows, b);

  return ra->kind == HL_SHEET_TABLE && rb->kind == HL_SHEET_TABLE && ra->cols == rb->cols;
}

/* the height from row @i that must stand on one page */
static double
block_height (Sheet *s,
              guint  i)
{
  guint n = s->rows->len, end = i, extra = 0;
  double need = s->heights[i];

  /* the boxes of the sign-off block stand together: a checker signs
   * one block, not two halves on two pages */
  while (end + 1 < n && (keeps_with_next (hl_note_row (s->rows, end))
                         || (hl_note_row (s->rows, end)->boxed && hl_note_row (s->rows, end + 1)->boxed)))
    {
      end++;
      need += s->heights[end];
    }
  /* a check's title takes its whole short table along: the formula, the
   * numbers, the result and the outcome on one page */
  if (hl_note_row (s->rows, i)->kind == HL_SHEET_PARAGRAPH && hl_note_row (s->rows, i)->strong)
    for (guint k = 0; k < STEP_ROWS && end + 1 < n && same_table (s, end, end + 1); k++)
      need += s->heights[++end];
  /* a table's last row does not stand alone at the top of a page */
  if (end + 2 < n && same_table (s, end, end + 1) && !same_table (s, end + 1, end + 2))
    need += s->heights[++end];
  else if (end + 2 == n && same_table (s, end, end + 1))
    need += s->heights[++end];
  /* a heading takes more than one row of its section along */
  if (hl_note_row (s->rows, i)->kind == HL_SHEET_HEADING)
    for (extra = 1; extra < HEADING_KEEPS && end + 1 < n && hl_note_row (s->rows, end + 1)->kind != HL_SHEET_HEADING;
         extra++)
      need += s->heights[++end];
  return need;
}

static double
rows_height (Sheet *s,
             guint  first,
             guint  last)
{
  double h = 0;

  for (guint i = first; i < last; i++)
    h += s->heights[i];
  return h;
}

/* the last page takes rows from the page before until it holds a few:
 * never a lone row, never a page that ends with a heading */
static void
balance_last_page (Sheet *s)
{
  guint n = s->rows->len, pages = s->starts->len;
  guint *last, prev;

  if (pages < 2)
    return;
  last = &g_array_index (s->starts, guint, pages - 1);
  prev = g_array_index (s->starts, guint, pages - 2);
  while (n - *last < LAST_PAGE_MIN_ROWS && *last - prev > LAST_PAGE_MIN_ROWS)
    {
      guint move = *last - 1;

      while (move > prev + 1 && keeps_with_next (hl_note_row (s->rows, move - 1)))
        move--;
      if (rows_height (s, move, n) > s->bottom - s->top)
        break;
      *last = move;
    }
}

static void
paginate (Sheet *s)
{
  double y = s->bottom;   /* forces a first page */

  for (guint i = 0; i < s->rows->len; i++)
    {
      if (y + block_height (s, i) > s->bottom && (s->starts->len == 0 || y > s->top))
        {
          g_array_append_val (s->starts, i);
          y = s->top;
        }
      y += s->heights[i];
    }
  balance_last_page (s);
}

static char *
item_text (const HlFigureContext *ctx)
{
  const HlShellInputs *in = &ctx->solution->inputs;

  return g_strdup_printf (_("Item: %s (id %s)"), in->name, in->id);
}

static char *
basis_text (const HlShellInputs *in)
{
  const char *name = hl_design_basis_name (in->design_basis);

  return in->code_edition[0] ? g_strdup_printf (_("Design basis: %s, edition %s"), name, in->code_edition)
                             : g_strdup_printf (_("Design basis: %s (edition not given)"), name);
}

/* takes @item and @basis */
static void
header_init (Header          *h,
             const HlProject *pr,
             char            *item,
             char            *basis)
{
  g_autofree char *caution = hl_figure_caution ();
  const char *title = pr != NULL && pr->title != NULL && pr->title[0] ? pr->title : _("(untitled)");

  h->left1 = g_strdup_printf (_("Hoopline design note · %s · %s"), title, item);
  h->right1 = hl_note_revision_label (pr);
  h->left2 = basis;
  h->footer = g_steal_pointer (&caution);
  g_free (item);
}

/* takes @rows */
static void
sheet_layout (Sheet   *s,
              cairo_t *cr,
              double   width,
              double   height,
              GArray  *rows)
{
  s->width = width;
  s->height = height;
  s->base = CLAMP (width / 69.0, 6.0, 14.0);
  s->text = hl_text_new (cr, s->base);
  s->pal = hl_palette_get (HL_FIGURE_STYLE_LIGHT);
  s->left = 0.085 * width;
  s->right = width - 0.085 * width;
  s->head_top = 0.04 * height;
  s->top = s->head_top + header_height (s);
  s->bottom = height - 0.04 * height - footer_height (s);
  s->rows = rows;
  s->heights = g_new0 (double, MAX (rows->len, 1));
  s->starts = g_array_new (FALSE, FALSE, sizeof (guint));
  for (guint i = 0; i < s->rows->len; i++)
    s->heights[i] = row_height (s, hl_note_row (s->rows, i));
  paginate (s);
}

static void
sheet_layout_shell (Sheet                 *s,
                    cairo_t               *cr,
                    double                 width,
                    double                 height,
                    const HlFigureContext *ctx)
{
  header_init (&s->head, ctx->project, item_text (ctx), basis_text (&ctx->solution->inputs));
  sheet_layout (s, cr, width, height, hl_sheet_rows (ctx));
}

static void
sheet_clear (Sheet *s)
{
  hl_text_free (s->text);
  g_array_unref (s->rows);
  g_array_unref (s->starts);
  g_free (s->heights);
  g_free (s->head.left1);
  g_free (s->head.right1);
  g_free (s->head.left2);
  g_free (s->head.footer);
}

static void
rule_line (cairo_t *cr,
           HlRgb    color,
           double   width,
           double   x0,
           double   x1,
           double   y)
{
  cairo_save (cr);
  hl_palette_set_source (cr, color);
  cairo_set_line_width (cr, width);
  cairo_move_to (cr, x0, y);
  cairo_line_to (cr, x1, y);
  cairo_stroke (cr);
  cairo_restore (cr);
}

static void
draw_table (Sheet      *s,
            cairo_t    *cr,
            HlSheetRow *r,
            double      y,
            double      height)
{
  double w = s->right - s->left, x = s->left;

  for (guint i = 0; i < r->n_cells; i++)
    {
      if (r->boxed)
        {
          /* a box to fill in, drawn empty when nobody has signed */
          cairo_save (cr);
          hl_palette_set_source (cr, s->pal->ink);
          cairo_set_line_width (cr, 0.6);
          cairo_rectangle (cr, x, y, r->cols[i] * w, height);
          cairo_stroke (cr);
          cairo_restore (cr);
        }
      hl_text_draw (s->text, cell_role (r, i), r->cells[i], x + cell_pad (s), y + cell_pad (s), 0, 0,
                    r->cols[i] * w - 2 * cell_pad (s), r->note && i == r->n_cells - 1 ? s->pal->muted : s->pal->ink);
      x += r->cols[i] * w;
    }
  if (!r->boxed)
    rule_line (cr, r->strong ? s->pal->ink : s->pal->grid, r->strong ? 0.7 : 0.5, s->left, s->right,
               y + height);
}

static void
draw_row (Sheet      *s,
          cairo_t    *cr,
          HlSheetRow *r,
          double      y,
          double      height)
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
      rule_line (cr, s->pal->ink, 0.7, s->left, s->right, t.y + t.height + 0.15 * s->base);
      break;
    case HL_SHEET_PARAGRAPH:
      hl_text_draw (s->text, r->strong ? HL_FONT_HEADING : HL_FONT_BODY, r->cells[0], s->left,
                    y + (r->strong ? 0.25 * s->base : 0), 0, 0, w, s->pal->ink);
      break;
    case HL_SHEET_BULLET:
      hl_text_draw (s->text, HL_FONT_BODY, "•", s->left + 0.4 * s->base, y, 0, 0, 0, s->pal->ink);
      hl_text_draw (s->text, HL_FONT_BODY, r->cells[0], s->left + 1.4 * s->base, y, 0, 0, w - 1.4 * s->base,
                    s->pal->ink);
      break;
    case HL_SHEET_BOX:
      cairo_save (cr);
      cairo_rectangle (cr, s->left, y + 0.3 * s->base, w, height - 0.6 * s->base);
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
      draw_table (s, cr, r, y, height);
      break;
    }
}

static void
draw_header_footer (Sheet                  *s,
                    cairo_t                *cr,
                    guint                   page,
                    const HlSheetNumbering *num)
{
  double y = s->head_top, rw, lh;
  g_autofree char *of = g_strdup_printf (_("page %u of %u"), num->first + page + 1, num->total);
  HlRect r;

  hl_text_measure (s->text, HL_FONT_TINY, s->head.right1, 0, &rw, NULL);
  r = hl_text_draw_line (s->text, HL_FONT_TINY, s->head.left1, s->left, y, s->right - s->left - rw - s->base,
                         s->pal->ink);
  hl_text_draw (s->text, HL_FONT_TINY, s->head.right1, s->right, y, 1, 0, 0, s->pal->ink);
  lh = r.height;
  hl_text_measure (s->text, HL_FONT_TINY, of, 0, &rw, NULL);
  hl_text_draw_line (s->text, HL_FONT_TINY, s->head.left2, s->left, y + lh, s->right - s->left - rw - s->base,
                     s->pal->muted);
  hl_text_draw (s->text, HL_FONT_TINY, of, s->right, y + lh, 1, 0, 0, s->pal->ink);
  rule_line (cr, s->pal->frame, 0.5, s->left, s->right, y + 2 * lh + 0.3 * s->base);

  y = s->bottom + 0.5 * s->base;
  rule_line (cr, s->pal->frame, 0.5, s->left, s->right, y - 0.2 * s->base);
  hl_text_draw (s->text, HL_FONT_TINY, s->head.footer, s->left, y, 0, 0, s->right - s->left, s->pal->ink);
}

static void
draw_sheet_page (Sheet                  *s,
                 cairo_t                *cr,
                 guint                   page,
                 const HlSheetNumbering *num)
{
  cairo_save (cr);
  cairo_rectangle (cr, 0, 0, s->width, s->height);
  hl_palette_set_source (cr, s->pal->paper);
  cairo_fill (cr);
  if (page < s->starts->len)
    {
      guint first = g_array_index (s->starts, guint, page);
      guint last = page + 1 < s->starts->len ? g_array_index (s->starts, guint, page + 1) : s->rows->len;
      double y = s->top;

      for (guint i = first; i < last; i++)
        {
          draw_row (s, cr, hl_note_row (s->rows, i), y, s->heights[i]);
          y += s->heights[i];
        }
      draw_header_footer (s, cr, page, num);
    }
  cairo_restore (cr);
}

/* unhinted metrics do not depend on the surface, so a scratch one
 * measures what the real page will draw */
static cairo_t *
scratch_context (void)
{
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 1, 1);
  cairo_t *cr = cairo_create (surface);

  cairo_surface_destroy (surface);
  return cr;
}

guint
hl_sheet_page_count (double                 width,
                     double                 height,
                     const HlFigureContext *ctx)
{
  cairo_t *cr;
  Sheet s = { 0 };
  guint n;

  g_return_val_if_fail (ctx != NULL, 0);
  if (ctx->solution == NULL)
    return 0;
  cr = scratch_context ();
  sheet_layout_shell (&s, cr, width, height, ctx);
  n = s.starts->len;
  sheet_clear (&s);
  cairo_destroy (cr);
  return n;
}

void
hl_sheet_draw_page_numbered (cairo_t                *cr,
                             double                  width,
                             double                  height,
                             guint                   page,
                             const HlFigureContext  *ctx,
                             const HlSheetNumbering *numbering)
{
  Sheet s = { 0 };

  g_return_if_fail (cr != NULL && ctx != NULL && numbering != NULL);
  if (ctx->solution == NULL)
    return;
  sheet_layout_shell (&s, cr, width, height, ctx);
  draw_sheet_page (&s, cr, page, numbering);
  sheet_clear (&s);
}

void
hl_sheet_draw_page (cairo_t               *cr,
                    double                 width,
                    double                 height,
                    guint                  page,
                    const HlFigureContext *ctx)
{
  HlSheetNumbering num = { 1, 1 };

  g_return_if_fail (cr != NULL && ctx != NULL);
  if (ctx->solution == NULL)
    return;
  num.total = 1 + hl_sheet_page_count (width, height, ctx);
  hl_sheet_draw_page_numbered (cr, width, height, page, ctx, &num);
}

static void
sheet_layout_summary (Sheet     *s,
                      cairo_t   *cr,
                      double     width,
                      double     height,
                      GPtrArray *contexts)
{
  const HlFigureContext *first = g_ptr_array_index (contexts, 0);
  g_autoptr(GPtrArray) solutions = g_ptr_array_new ();
  g_autofree char *count = NULL;

  for (guint i = 0; i < contexts->len; i++)
    g_ptr_array_add (solutions, (gpointer) ((const HlFigureContext *) g_ptr_array_index (contexts, i))->solution);
  count = g_strdup_printf (g_dngettext (GETTEXT_PACKAGE, "whole project, %u shell", "whole project, %u shells",
                                        contexts->len), contexts->len);
  header_init (&s->head, first->project, g_strdup_printf (_("Item: %s"), count),
               g_strdup (_("Design basis: per shell, on its sheet")));
  sheet_layout (s, cr, width, height,
                hl_note_project_summary (first->project, solutions, first->units, first->locale_numbers,
                                         first->export_date));
}

guint
hl_sheet_summary_page_count (double     width,
                             double     height,
                             GPtrArray *contexts)
{
  cairo_t *cr;
  Sheet s = { 0 };
  guint n;

  g_return_val_if_fail (contexts != NULL && contexts->len > 0, 0);
  cr = scratch_context ();
  sheet_layout_summary (&s, cr, width, height, contexts);
  n = s.starts->len;
  sheet_clear (&s);
  cairo_destroy (cr);
  return n;
}

void
hl_sheet_summary_draw_page (cairo_t                *cr,
                            double                  width,
                            double                  height,
                            guint                   page,
                            GPtrArray              *contexts,
                            const HlSheetNumbering *numbering)
{
  Sheet s = { 0 };

  g_return_if_fail (cr != NULL && contexts != NULL && contexts->len > 0 && numbering != NULL);
  sheet_layout_summary (&s, cr, width, height, contexts);
  draw_sheet_page (&s, cr, page, numbering);
  sheet_clear (&s);
}
