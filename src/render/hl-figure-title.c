/* hl-figure-title.c — verdict line, title block, and the problem box
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-figure-title"

#include "hl-figure-private.h"
#include "hl-design-check.h"
#include "hl-report.h"

#include <math.h>

static char *
verdict_text (HlFigure *f)
{
  const HlSolution *sol = f->sol;
  /* the measure that decided, when both are checked */
  gboolean eq = sol->thin_governing == HL_MEASURE_EQUIVALENT;
  HlResult err = eq ? sol->thin_wall_error_equivalent : sol->thin_wall_error;

  g_autofree char *tol = hl_figure_format_sig (sol->tolerance, 3, f->locale);
  g_autofree char *e = NULL, *e_pct = NULL, *tol_pct = NULL;

  if (!hl_result_ok (err))
    return g_strdup_printf (_("The thin-wall error cannot be formed: %s."), hl_figure_core_text (err.reason));
  e = hl_figure_format_sig (fabs (err.value), 2, f->locale);
  e_pct = g_strdup_printf ("%s" HL_NBSP "%%", e);
  tol_pct = g_strdup_printf ("%s" HL_NBSP "%%", tol);
  /* whole sentences, so that a translation can order its words */
  if (sol->is_thin)
    return g_strdup_printf (eq ? _("Thin-wall von Mises stress within %s of Lamé (tolerance %s)")
                               : _("Thin-wall formulas within %s of Lamé (tolerance %s)"),
                            e_pct, tol_pct);
  if (err.value < 0)
    return g_strdup_printf (eq ? _("Thin-wall von Mises stress %s below Lamé: outside the %s tolerance; use the "
                                   "Lamé (thick-wall) results")
                               : _("Thin-wall formulas %s below Lamé: outside the %s tolerance; use the Lamé "
                                   "(thick-wall) results"),
                            e_pct, tol_pct);
  return g_strdup_printf (eq ? _("Thin-wall von Mises stress %s above Lamé: outside the %s tolerance; use the "
                                 "Lamé (thick-wall) results")
                             : _("Thin-wall formulas %s above Lamé: outside the %s tolerance; use the Lamé "
                                 "(thick-wall) results"),
                          e_pct, tol_pct);
}

/* Does the wall pass: the design check's verdict in words */
static char *
design_text (HlFigure *f)
{
  const HlDesignCheck *c = &f->sol->check;
  const HlMethodCheck *b = &c->methods[c->basis];
  g_autofree char *u = NULL, *u_pct = NULL;

  if (c->bursts)
    return g_strdup (_("The wall would burst: the design pressure is above the plastic collapse pressure"));
  if (c->yields)
    return g_strdup (_("The wall yields at the bore: the peak equivalent stress is above the yield strength"));
  if (b->result == HL_CHECK_NOT_APPLICABLE)
    /* TRANSLATORS: %s is the design basis ("ASME VIII-1 UG-27") */
    return g_strdup_printf (_("Not shown to pass: the design basis %s does not apply"), b->name);
  u = hl_figure_format_sig (100 * c->utilisation, 4, f->locale);
  u_pct = g_strdup_printf ("%s" HL_NBSP "%%", u);
  /* TRANSLATORS: utilisation in percent, the governing clause, the design basis */
  return g_strdup_printf (_("Utilisation %s by %s (design basis %s)"), u_pct, c->governing, b->name);
}

static char *
warnings_text (HlFigure *f)
{
  GPtrArray *w = f->sol->warnings;
  GString *s;

  if (w == NULL || w->len == 0)
    return NULL;
  s = g_string_new (NULL);
  for (guint i = 0; i < w->len; i++)
    g_string_append_printf (s, "%s⚠ %s", i ? "    " : "",
                            hl_figure_core_text (g_ptr_array_index (w, i)));
  return g_string_free (s, FALSE);
}

static gboolean
verdict_formed (HlFigure *f)
{
  const HlSolution *sol = f->sol;

  return hl_result_ok (sol->thin_governing == HL_MEASURE_EQUIVALENT ? sol->thin_wall_error_equivalent
                                                                    : sol->thin_wall_error);
}

static const char *
tag_text (HlFigure *f)
{
  if (!verdict_formed (f))
    return _("N/A");
  return f->sol->is_thin ? _("THIN") : _("THICK");
}

static double
tag_width (HlFigure *f)
{
  const char *words[] = { _("THIN"), _("THICK"), _("PASS"), _("FAIL"), _("N/A") };
  double w = 0, wi;

  for (guint i = 0; i < G_N_ELEMENTS (words); i++)
    {
      hl_text_measure (f->text, HL_FONT_HEADING, words[i], 0, &wi, NULL);
      w = MAX (w, wi);
    }
  return w + 1.2 * f->text->base;
}

double
hl_verdict_height (HlFigure *f,
                   double    width)
{
  g_autofree char *d = design_text (f);
  g_autofree char *v = verdict_text (f);
  g_autofree char *w = warnings_text (f);
  double text_w = width - tag_width (f) - f->gap;
  double h0, h1, h2 = 0;

  hl_text_measure (f->text, HL_FONT_TITLE, d, text_w, NULL, &h0);
  hl_text_measure (f->text, HL_FONT_TITLE, v, text_w, NULL, &h1);
  if (w != NULL)
    hl_text_measure (f->text, HL_FONT_SMALL, w, text_w, NULL, &h2);
  return h0 + h1 + h2 + f->gap;
}

/* One verdict: the tag says it in a word, on its own colour for a quick
 * read; the sentence beside it says why.  Returns the bottom. */
static double
verdict_line (HlFigure   *f,
              double      x0,
              double      y,
              double      width,
              const char *tag,
              HlRgb       colour,
              const char *text)
{
  cairo_t *cr = f->cr;
  double tw = tag_width (f), th;
  double x = x0 + tw + f->gap;
  HlRect r;

  hl_text_measure (f->text, HL_FONT_TITLE, "T", 0, NULL, &th);
  cairo_save (cr);
  cairo_rectangle (cr, x0, y + 0.08 * th, tw, 0.84 * th);
  hl_palette_set_source (cr, colour);
  cairo_fill (cr);
  cairo_restore (cr);
  hl_text_draw (f->text, HL_FONT_HEADING, tag, x0 + tw / 2, y + th / 2, 0.5, 0.5, 0, f->pal->paper);
  r = hl_text_draw (f->text, HL_FONT_TITLE, text, x, y, 0, 0, x0 + width - x, f->pal->ink);
  return r.y + r.height;
}

void
hl_verdict_draw (HlFigure     *f,
                 const HlRect *area)
{
  g_autofree char *d = design_text (f);
  g_autofree char *v = verdict_text (f);
  g_autofree char *w = warnings_text (f);
  gboolean pass = f->sol->check.verdict == HL_CHECK_PASS;
  double x = area->x + tag_width (f) + f->gap;
  double y;

  /* two verdicts, each on its own: a thin wall can fail, a thick one pass */
  y = verdict_line (f, area->x, area->y, area->width, pass ? _("PASS") : _("FAIL"),
                    pass ? f->pal->pass : f->pal->fail, d);
  y = verdict_line (f, area->x, y, area->width, tag_text (f),
                    !verdict_formed (f) ? f->pal->muted : f->sol->is_thin ? f->pal->pass : f->pal->fail, v);
  if (w != NULL)
    hl_text_draw (f->text, HL_FONT_SMALL, w, x, y, 0, 0, area->x + area->width - x, f->pal->fail);
}

typedef struct
{
  const char *label;
  char       *value;
} Cell;

#define N_CELLS 9

static guint
title_cells (HlFigure *f,
             Cell     *cells)
{
  const HlProject *pr = f->ctx->project;
  const HlShellInputs *sh = f->sol != NULL ? &f->sol->inputs : f->ctx->shell;
  const HlRevision *rev = pr != NULL ? hl_project_latest_revision (pr) : NULL;
  g_autoptr(GDateTime) now = g_date_time_new_now_local ();

  cells[0] = (Cell) { _("Project"), g_strdup (pr != NULL && pr->title != NULL && pr->title[0] ? pr->title : _("(untitled)")) };
  cells[1] = (Cell) { _("Engineer"), g_strdup (pr != NULL && pr->engineer != NULL && pr->engineer[0] ? pr->engineer
                                                                                                      : _("(not given)")) };
  cells[2] = (Cell) { _("Revision"), rev != NULL ? g_strdup_printf ("%u, %s", rev->number, rev->date) : g_strdup (_("none")) };
  cells[3] = (Cell) { _("Shell"), sh != NULL ? g_strdup_printf (_("%s (id %s)"), sh->name, sh->id) : g_strdup ("—") };
  cells[4] = (Cell) { _("Units"), g_strdup (_(hl_unit_system_words (f->units))) };
  cells[5] = (Cell) { _("Exported"), f->ctx->export_date != NULL ? g_strdup (f->ctx->export_date)
                                                              : g_date_time_format (now, "%Y-%m-%d") };
  cells[6] = (Cell) { _("Design basis"), g_strdup ("—") };
  cells[7] = (Cell) { _("Design load"), g_strdup ("—") };
  /* what the allowable belongs to: the specification when given */
  cells[8] = (Cell) { _("Material"), sh == NULL ? g_strdup ("—")
                                     : sh->material_spec[0] != '\0' ? g_strdup_printf ("%s, %s", sh->material.name,
                                                                                     sh->material_spec)
                                                                   : g_strdup (sh->material.name) };
  if (f->sol != NULL)
    {
      g_autofree char *pi = hl_stress_text (f, f->sol->pi, 4);
      g_autofree char *po = hl_stress_text (f, f->sol->po, 4);
      /* in the figure's unit system, as every other number of it */
      g_autofree char *temp = hl_figure_format_input (hl_quantity_si (sh->design_temperature, HL_KIND_TEMPERATURE),
                                                      HL_KIND_TEMPERATURE, f->units, 4, f->locale);

      g_free (cells[6].value);
      g_free (cells[7].value);
      /* the edition is the user's label, named beside the clause */
      cells[6].value = sh->code_edition[0] != '\0'
                         ? g_strdup_printf ("%s, %s", hl_design_basis_name (sh->design_basis), sh->code_edition)
                         : g_strdup (hl_design_basis_name (sh->design_basis));
      /* TRANSLATORS: internal and external design pressure, design temperature with its unit */
      cells[7].value = g_strdup_printf (_("%s inside, %s outside, at %s"), pi, po, temp);
    }
  return N_CELLS;
}

static double
first_column (guint  cols,
              double width)
{
  /* the names need the room: the first column is the wider */
  return cols == 3 ? 0.5 * width : 0.58 * width;
}

/* three columns when every value fits its cell, else two (and the
 * longest values end in an ellipsis) */
static guint
title_columns (HlFigure *f,
               double    width)
{
  static const guint column3[N_CELLS] = { 0, 1, 2, 0, 1, 2, 0, 1, 2 };
  Cell cells[N_CELLS];
  guint n = title_cells (f, cells);
  gboolean fit = TRUE;
  double w0 = first_column (3, width), wi = (width - w0) / 2, pad = 0.5 * f->text->base;

  for (guint k = 0; k < n; k++)
    {
      double w;

      hl_text_measure (f->text, HL_FONT_VALUE, cells[k].value, 0, &w, NULL);
      fit = fit && w + 2 * pad <= (column3[k] == 0 ? w0 : wi);
      g_free (cells[k].value);
    }
  return fit ? 3 : 2;
}

static double
cell_height (HlFigure *f)
{
  double h1, h2;

  hl_text_measure (f->text, HL_FONT_TINY, _("Project"), 0, NULL, &h1);
  hl_text_measure (f->text, HL_FONT_VALUE, _("Project"), 0, NULL, &h2);
  return h1 + h2 + 0.5 * f->text->base;
}

static char *
caution_text (void)
{
  return hl_figure_caution ();
}

/* three columns: three full rows; two columns: the last two cells
 * (units and date, both short) share the right-hand cell of the fourth
 * row, so the material costs no fifth */
static guint
title_rows (guint cols)
{
  return (N_CELLS + cols - 2) / cols;
}

static void
cell_place (guint   k,
            guint   cols,
            double  w0,
            double  wi,
            guint  *row,
            double *x,
            double *width)
{
  guint c = k % cols;

  *row = k / cols;
  *x = c == 0 ? 0 : w0 + (c - 1) * wi;
  *width = c == 0 ? w0 : wi;
  if (cols == 2 && k >= N_CELLS - 2)
    {
      *row = title_rows (cols) - 1;
      *width = wi / 2;
      *x = w0 + (k == N_CELLS - 1 ? wi / 2 : 0);
    }
}

double
hl_title_block_height (HlFigure *f,
                       double    width)
{
  g_autofree char *c = caution_text ();
  guint cols = title_columns (f, width);
  double ch;

  hl_text_measure (f->text, HL_FONT_SMALL, c, width - f->text->base, NULL, &ch);
  return title_rows (cols) * cell_height (f) + ch + 0.6 * f->text->base;
}

void
hl_title_block_draw (HlFigure     *f,
                     const HlRect *area)
{
  cairo_t *cr = f->cr;
  Cell cells[N_CELLS];
  guint n = title_cells (f, cells), cols = title_columns (f, area->width), rows = title_rows (cols);
  double w0 = first_column (cols, area->width);
  double wi = (area->width - w0) / (cols - 1);
  double chh = cell_height (f), pad = 0.5 * f->text->base;
  g_autofree char *caution = caution_text ();
  /* reading order in each layout: names first, then who and when */
  static const guint order3[N_CELLS] = { 0, 1, 2, 3, 4, 5, 6, 7, 8 };
  static const guint order2[N_CELLS] = { 0, 1, 3, 2, 6, 7, 8, 4, 5 };

  cairo_save (cr);
  hl_palette_set_source (cr, f->pal->ink);
  cairo_set_line_width (cr, 0.8 * f->lw);
  cairo_rectangle (cr, area->x, area->y, area->width, area->height);
  cairo_stroke (cr);
  cairo_set_line_width (cr, 0.5 * f->lw);
  for (guint r = 1; r <= rows; r++)
    {
      cairo_move_to (cr, area->x, area->y + r * chh);
      cairo_line_to (cr, area->x + area->width, area->y + r * chh);
    }
  for (guint c = 1; c < cols; c++)
    {
      double x = area->x + w0 + (c - 1) * wi;

      cairo_move_to (cr, x, area->y);
      cairo_line_to (cr, x, area->y + rows * chh);
    }
  if (cols == 2)
    {
      cairo_move_to (cr, area->x + w0 + wi / 2, area->y + (rows - 1) * chh);
      cairo_line_to (cr, area->x + w0 + wi / 2, area->y + rows * chh);
    }
  cairo_stroke (cr);
  cairo_restore (cr);

  for (guint k = 0; k < n; k++)
    {
      const Cell *cell = &cells[cols == 3 ? order3[k] : order2[k]];
      guint r;
      double x, cw;
      HlRect lab;

      cell_place (k, cols, w0, wi, &r, &x, &cw);
      x += area->x + pad;
      cw -= 2 * pad;
      lab = hl_text_draw_line (f->text, HL_FONT_TINY, cell->label, x, area->y + r * chh + 0.25 * f->text->base, cw,
                               f->pal->muted);

      hl_text_draw_line (f->text, HL_FONT_VALUE, cell->value, x, lab.y + lab.height, cw, f->pal->ink);
    }
  for (guint k = 0; k < n; k++)
    g_free (cells[k].value);
  hl_text_draw (f->text, HL_FONT_SMALL, caution, area->x + pad, area->y + rows * chh + 0.3 * f->text->base, 0, 0,
                area->width - 2 * pad, f->pal->ink);
}

void
hl_problem_draw (HlFigure     *f,
                 const HlRect *area)
{
  cairo_t *cr = f->cr;
  const char *problem = f->ctx->problem_text != NULL && f->ctx->problem_text[0] ? f->ctx->problem_text
                                                                                : _("Some inputs are missing or invalid.");
  const char *head = _("These inputs cannot be solved yet");
  const char *foot = _("No results are shown until every value is valid.");
  double w = MIN (area->width - 2 * f->gap, 42 * f->text->base);
  double pad = f->text->base, inner = w - 2 * pad;
  double h1, h2, h3, h, x, y;
  HlRect r;

  hl_text_measure (f->text, HL_FONT_TITLE, head, inner, NULL, &h1);
  hl_text_measure (f->text, HL_FONT_BODY, problem, inner, NULL, &h2);
  hl_text_measure (f->text, HL_FONT_SMALL, foot, inner, NULL, &h3);
  h = MIN (h1 + h2 + h3 + 2 * f->gap + 2 * pad, area->height);
  x = area->x + (area->width - w) / 2;
  y = area->y + (area->height - h) / 2;

  cairo_save (cr);
  cairo_rectangle (cr, x, y, w, h);
  hl_palette_set_source (cr, f->pal->problem_fill);
  cairo_fill_preserve (cr);
  hl_palette_set_source (cr, f->pal->problem_edge);
  cairo_set_line_width (cr, f->lw);
  cairo_stroke_preserve (cr);
  cairo_clip (cr);
  r = hl_text_draw (f->text, HL_FONT_TITLE, head, x + pad, y + pad, 0, 0, inner, f->pal->ink);
  r = hl_text_draw (f->text, HL_FONT_BODY, problem, x + pad, r.y + r.height + f->gap, 0, 0, inner, f->pal->ink);
  hl_text_draw (f->text, HL_FONT_SMALL, foot, x + pad, r.y + r.height + f->gap, 0, 0, inner, f->pal->muted);
  cairo_restore (cr);
}
