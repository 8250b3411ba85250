/* hl-sheet-content.c — what the calculation sheet says, row by row
 *
 * The numbers come from hl_result_rows(), the list that also feeds the
 * summary and the text report, so the sheet never disagrees with them.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-sheet-content"

#include "hl-sheet-private.h"
#include "hl-figure-format.h"
#include "hl-field-table.h"
#include "hl-design-check.h"
#include "hl-report.h"
#include "hl-result-rows.h"

#include <math.h>
#include <string.h>

static const double cols_pair[] = { 0.34, 0.66 };
static const double cols_input[] = { 0.42, 0.29, 0.29 };
static const double cols_result1[] = { 0.44, 0.24, 0.32 };
static const double cols_result2[] = { 0.37, 0.19, 0.19, 0.25 };
static const double cols_check[] = { 0.31, 0.25, 0.25, 0.19 };

static void
clear_row (gpointer data)
{
  HlSheetRow *r = data;

  for (guint i = 0; i < r->n_cells; i++)
    g_free (r->cells[i]);
}

static void
add (GArray         *rows,
     HlSheetRowKind  kind,
     const double   *cols,
     gboolean        strong,
     guint           n,
     ...)
{
  HlSheetRow r = { kind, { NULL }, n, cols, strong, FALSE, 0 };
  va_list args;

  va_start (args, n);
  for (guint i = 0; i < n && i < HL_SHEET_MAX_CELLS; i++)
    {
      const char *s = va_arg (args, const char *);

      r.cells[i] = g_strdup (s != NULL ? s : "");
    }
  va_end (args);
  /* the results' last column names formula or clause: a note */
  r.note = !strong && (cols == cols_result1 || cols == cols_result2);
  g_array_append_val (rows, r);
}

static void
add_text (GArray         *rows,
          HlSheetRowKind  kind,
          char           *owned)
{
  add (rows, kind, NULL, FALSE, 1, owned);
  g_free (owned);
}

/* the radius basis in three grammatical places: a value on its own,
 * "on the … radius" and "R is the … radius" */
static const char *
basis_on (HlRadiusBasis basis)
{
  return basis == HL_BASIS_INNER ? C_("on the … radius", "inner")
         : basis == HL_BASIS_OUTER ? C_("on the … radius", "outer") : C_("on the … radius", "mean");
}

static const char *
basis_is (HlRadiusBasis basis)
{
  return basis == HL_BASIS_INNER ? C_("R is the … radius", "inner")
         : basis == HL_BASIS_OUTER ? C_("R is the … radius", "outer") : C_("R is the … radius", "mean");
}

static void
header (GArray                *rows,
        const HlFigureContext *ctx)
{
  const HlProject *pr = ctx->project;
  const HlShellInputs *in = &ctx->solution->inputs;
  const HlRevision *rev = pr != NULL ? hl_project_latest_revision (pr) : NULL;
  g_autoptr(GDateTime) now = g_date_time_new_now_local ();
  g_autofree char *today = g_date_time_format (now, "%Y-%m-%d");
  g_autofree char *shell = g_strdup_printf (_("%s (id %s)"), in->name, in->id);
  g_autofree char *revision = rev != NULL ? g_strdup_printf ("%u, %s, %s: %s", rev->number, rev->date,
                                                             rev->author != NULL ? rev->author : "",
                                                             rev->text != NULL ? rev->text : "")
                                          : g_strdup (_("none recorded"));

  add (rows, HL_SHEET_TITLE, NULL, FALSE, 2, _("Calculation sheet"), shell);
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, _("Project"),
       pr != NULL && pr->title != NULL && pr->title[0] ? pr->title : _("(untitled)"));
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, _("Engineer"),
       pr != NULL && pr->engineer != NULL && pr->engineer[0] ? pr->engineer : _("(not given)"));
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, _("Latest revision"), revision);
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, _("Units"), ctx->units == HL_UNIT_SYSTEM_US ? "in, psi" : "mm, MPa");
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, _("Exported"), ctx->export_date != NULL ? ctx->export_date : today);
  add_text (rows, HL_SHEET_BOX, hl_figure_caution ());
}

static void
input_row (GArray                *rows,
           const HlFigureContext *ctx,
           const char            *label,
           HlQuantity             q,
           HlQuantityKind         kind)
{
  g_autofree char *typed_n = hl_figure_format_sig (q.value, 10, ctx->locale_numbers);
  g_autofree char *typed = g_strdup_printf ("%s %s", typed_n, q.unit);
  double si = hl_quantity_si (q, kind);
  g_autofree char *shown = NULL;

  switch (kind)
    {
    case HL_KIND_LENGTH:
      shown = hl_figure_format_quantity (si, HL_ROW_LENGTH, ctx->units, 6, ctx->locale_numbers);
      break;
    case HL_KIND_PERCENT:
      shown = hl_figure_format_quantity (si * 100, HL_ROW_PERCENT, ctx->units, 6, ctx->locale_numbers);
      break;
    case HL_KIND_STRESS:
    case HL_KIND_MODULUS:
    case HL_KIND_RATIO:
    default:
      shown = hl_figure_format_quantity (si, HL_ROW_STRESS, ctx->units, 6, ctx->locale_numbers);
      break;
    }
  add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, label, typed, shown);
}

/* the sheet's word for a choice; a name (von Mises) stays as it is */
static const char *
choice_text (const HlFieldChoice *c)
{
  if (c == NULL)
    return "";
  if (c->sheet == NULL)
    return c->report;
  return c->sheet_context != NULL ? g_dpgettext2 (GETTEXT_PACKAGE, c->sheet_context, c->sheet) : _(c->sheet);
}

/* one row of the field table; rows without a sheet label are not listed */
static void
input_field (GArray                *rows,
             const HlField         *f,
             const HlFigureContext *ctx)
{
  const HlShellInputs *in = &ctx->solution->inputs;
  gconstpointer slot = hl_field_cslot (f, in);

  if (f->sheet == NULL || (f->is_size && f->size_kind != in->size_kind))
    return;
  if (f->kind == HL_FIELD_TEXT)
    {
      /* a material row: its name, with its id */
      g_autofree char *text = g_strdup_printf ("%s (%s)", (const char *) slot, in->material.id);

      add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, _(f->sheet), text, "");
    }
  else if (f->kind == HL_FIELD_RATIO)
    {
      g_autofree char *v = hl_figure_format_sig (*(const double *) slot, 6, ctx->locale_numbers);

      add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, _(f->sheet), v, "");
    }
  else if (f->kind == HL_FIELD_CHOICE)
    add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, _(f->sheet),
         choice_text (hl_field_choice_by_value (f, hl_field_choice_get (f, slot))), "");
  else
    input_row (rows, ctx, _(f->sheet), *(const HlQuantity *) slot, hl_field_quantity_kind (f));
}

static void
inputs (GArray                *rows,
        const HlFigureContext *ctx)
{
  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, _("Inputs"));
  add (rows, HL_SHEET_TABLE, cols_input, TRUE, 3, _("Quantity"), _("As entered"), _("In the sheet's units"));
  add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, _("Form"), hl_figure_form_text (&ctx->solution->inputs), "");
  for (guint i = 0; i < hl_field_count (); i++)
    input_field (rows, hl_field_nth (i), ctx);
}

static char *
value_text (const HlResultRow     *row,
            const HlFigureContext *ctx)
{
  if (row->kind == HL_ROW_WORD)
    return g_strdup (row->word != NULL ? hl_figure_core_text (row->word) : "");
  if (!hl_result_ok (row->result))
    return g_strdup (_("n/a"));
  /* a stress below a micropascal is rounding left in a difference of
   * large terms (the outer radial stress A - B/b^2): show it as zero */
  if (row->kind == HL_ROW_STRESS && fabs (row->result.value) < 1e-6)
    return hl_figure_format_quantity (0.0, row->kind, ctx->units, 6, ctx->locale_numbers);
  return hl_figure_format_quantity (row->result.value, row->kind, ctx->units, 6, ctx->locale_numbers);
}

static char *
source_text (const HlResultRow *row)
{
  if (row->kind != HL_ROW_WORD && !hl_result_ok (row->result) && row->result.reason != NULL)
    return row->source != NULL ? g_strdup_printf (_("%s; n/a: %s"), row->source,
                                                  hl_figure_core_text (row->result.reason))
                               : g_strdup_printf (_("n/a: %s"), hl_figure_core_text (row->result.reason));
  return g_strdup (row->source != NULL ? row->source : "");
}

static void
results (GArray                *rows,
         const HlFigureContext *ctx,
         const HlSolution      *new_wall)
{
  g_autoptr(GArray) cor = hl_result_rows (ctx->solution);
  g_autoptr(GArray) nw = new_wall != NULL ? hl_result_rows (new_wall) : NULL;

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, _("Results"));
  if (nw != NULL)
    add (rows, HL_SHEET_TABLE, cols_result2, TRUE, 4, _("Result"), _("New wall"), _("Corroded wall"),
         _("Formula or source"));
  else
    add (rows, HL_SHEET_TABLE, cols_result1, TRUE, 3, _("Result"), _("Value"), _("Formula or source"));
  for (guint i = 0; i < cor->len; i++)
    {
      const HlResultRow *rc = &g_array_index (cor, HlResultRow, i);
      g_autofree char *vc = NULL, *src = NULL;

      /* name, id and form are in the heading and the inputs already */
      if (rc->kind == HL_ROW_WORD && i < 4)
        continue;
      vc = value_text (rc, ctx);
      src = source_text (rc);
      if (nw != NULL)
        {
          g_autofree char *vn = value_text (&g_array_index (nw, HlResultRow, i), ctx);

          add (rows, HL_SHEET_TABLE, cols_result2, FALSE, 4, hl_figure_core_text (rc->label), vn, vc, src);
        }
      else
        add (rows, HL_SHEET_TABLE, cols_result1, FALSE, 3, hl_figure_core_text (rc->label), vc, src);
    }
}

static char *
quantity_text (double                 value,
               HlRowKind              kind,
               const HlFigureContext *ctx)
{
  if (!isfinite (value))
    return g_strdup ("—");
  return hl_figure_format_quantity (value, kind, ctx->units, 4, ctx->locale_numbers);
}

static char *
percent_text (double                 fraction,
              const HlFigureContext *ctx)
{
  g_autofree char *n = NULL;

  if (!isfinite (fraction))
    return g_strdup ("—");
  n = hl_figure_format_sig (100 * fraction, 4, ctx->locale_numbers);
  return g_strdup_printf ("%s %%", n);
}

static const char *
check_word (HlCheckResult result)
{
  return result == HL_CHECK_PASS ? _("PASS") : result == HL_CHECK_FAIL ? _("FAIL") : _("NOT APPLICABLE");
}

/* Does the wall pass: the verdict in words first, then every method */
static void
design_check (GArray                *rows,
              const HlFigureContext *ctx)
{
  const HlDesignCheck *c = &ctx->solution->check;
  const HlMethodCheck *b = &c->methods[c->basis];
  g_autofree char *u = percent_text (c->utilisation, ctx);
  g_autofree char *nominal = quantity_text (c->nominal, HL_ROW_LENGTH, ctx);
  g_autofree char *corrosion = quantity_text (c->corrosion, HL_ROW_LENGTH, ctx);
  g_autofree char *mill = quantity_text (c->mill, HL_ROW_LENGTH, ctx);
  g_autofree char *available = quantity_text (c->available, HL_ROW_LENGTH, ctx);
  g_autofree char *why = hl_figure_check_reason (b, ctx->units, ctx->locale_numbers);

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, _("Design check"));
  if (c->bursts)
    add (rows, HL_SHEET_PARAGRAPH, NULL, TRUE, 1,
         _("FAIL — DANGER: the wall would burst: the design pressure is above the plastic collapse pressure."));
  else if (c->yields)
    add (rows, HL_SHEET_PARAGRAPH, NULL, TRUE, 1,
         _("FAIL — DANGER: the wall yields at the bore: the peak equivalent stress is above the yield strength."));
  else if (b->result == HL_CHECK_NOT_APPLICABLE)
    add_text (rows, HL_SHEET_PARAGRAPH,
              g_strdup_printf (_("FAIL — not shown to pass: the design basis %s does not apply: %s"), b->name, why));
  else
    /* TRANSLATORS: PASS or FAIL, the utilisation, the governing clause, the design basis */
    add_text (rows, HL_SHEET_PARAGRAPH,
              g_strdup_printf (_("%s — utilisation %s by %s (design basis %s)%s%s"), check_word (c->verdict), u,
                               c->governing, b->name, why != NULL ? ": " : "", why != NULL ? why : ""));
  /* TRANSLATORS: nominal − corrosion allowance − mill undertolerance = available */
  add_text (rows, HL_SHEET_PARAGRAPH,
            g_strdup_printf (_("Available wall: %s nominal − %s corrosion allowance − %s mill undertolerance = %s."),
                             nominal, corrosion, mill, available));
  add (rows, HL_SHEET_TABLE, cols_check, TRUE, 4, _("Method"), _("Required / available t"),
       _("Allowable / design P"), _("Utilisation, result"));
  for (guint m = 0; m < HL_N_METHODS; m++)
    {
      const HlMethodCheck *mc = &c->methods[m];
      g_autofree char *req = quantity_text (mc->required, HL_ROW_LENGTH, ctx);
      g_autofree char *avail = quantity_text (mc->available, HL_ROW_LENGTH, ctx);
      g_autofree char *mawp = quantity_text (mc->mawp, HL_ROW_STRESS, ctx);
      g_autofree char *design = quantity_text (mc->design_pressure, HL_ROW_STRESS, ctx);
      g_autofree char *um = percent_text (mc->utilisation_pressure, ctx);
      g_autofree char *name = m == (guint) c->basis ? g_strdup_printf (_("%s (design basis), %s"), mc->name, mc->clause)
                                                    : g_strdup_printf ("%s, %s", mc->name, mc->clause);
      g_autofree char *t = g_strdup_printf ("%s / %s", req, avail);
      g_autofree char *p = g_strdup_printf ("%s / %s", mawp, design);
      g_autofree char *r = g_strdup_printf ("%s, %s", um, check_word (mc->result));

      add (rows, HL_SHEET_TABLE, cols_check, m == (guint) c->basis, 4, name, t, p, r);
    }
}

static void
verdict (GArray                *rows,
         const HlFigureContext *ctx)
{
  const HlSolution *s = ctx->solution;
  /* the measure that decided, when both are checked */
  gboolean eq = s->thin_governing == HL_MEASURE_EQUIVALENT;
  HlResult err = eq ? s->thin_wall_error_equivalent : s->thin_wall_error;
  gboolean loc = ctx->locale_numbers;
  g_autofree char *tol = hl_figure_format_sig (s->tolerance, 3, loc);
  g_autofree char *mr = hl_figure_format_sig (s->mean_ratio, 4, loc);

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, _("Thin-wall verdict"));
  if (!hl_result_ok (err))
    add_text (rows, HL_SHEET_PARAGRAPH, g_strdup_printf (_("The thin-wall error cannot be formed: %s."),
                                                        hl_figure_core_text (err.reason)));
  else
    {
      g_autofree char *e = hl_figure_format_sig (err.value, 3, loc);
      /* whole sentences, so that a translation can order its words */
      g_autofree char *gap = g_strdup_printf (eq ? _("On the %s radius, the thin-wall von Mises stress is %s %% "
                                                     "from the Lamé peak")
                                                 : _("On the %s radius, the thin-wall hoop stress is %s %% from "
                                                     "the Lamé peak"),
                                              basis_on (s->inputs.thin_basis), e);
      g_autofree char *fit = g_strdup_printf (s->is_thin ? _("With a tolerance of %s %% the thin-wall formulas are "
                                                             "adequate for this wall.")
                                                         : _("With a tolerance of %s %% the thin-wall formulas are "
                                                             "not adequate for this wall; use the Lamé (thick-wall) "
                                                             "results."),
                                              tol);

      add_text (rows, HL_SHEET_PARAGRAPH,
                g_strdup_printf ("%s %s %s", gap, err.value < 0 ? _("(below it: unconservative).")
                                                                 : _("(above it: conservative)."), fit));
    }
  add_text (rows, HL_SHEET_PARAGRAPH,
            g_strdup_printf (_("Mean radius / thickness R/t = %s; the common rule of thumb (R/t ≥ 10) is %s."), mr,
                             s->rule_of_thumb ? _("met") : _("not met")));
  if (hl_result_ok (s->ratio_for_tolerance))
    {
      g_autofree char *rt = hl_figure_format_sig (s->ratio_for_tolerance.value, 4, loc);

      add_text (rows, HL_SHEET_PARAGRAPH,
                g_strdup_printf (_("The error equals the tolerance at R/t = %s; every wall with a larger R/t is "
                                   "within it."), rt));
    }
}

static void
methods (GArray                *rows,
         const HlFigureContext *ctx)
{
  const HlSolution *s = ctx->solution;

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, _("Methods and sources"));
  add_text (rows, HL_SHEET_BULLET,
            g_strdup_printf (_("Thin wall (membrane), radial stress taken as zero: cylinder hoop σθ = p R / t, "
                               "axial σz = p R / 2t (closed ends), 0 (open ends), ν σθ (plane strain); sphere "
                               "σ = p R / 2t. R is the %s radius, p the net pressure."),
                             basis_is (s->inputs.thin_basis)));
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       _("Lamé thick wall: cylinder σr = A − B/r², σθ = A + B/r² (Timoshenko, Strength of Materials, Part II; "
         "Lai, Rubin & Krempl, Introduction to Continuum Mechanics, §5.18); sphere σr = C − D/r³, "
         "σθ = C + D/2r³ (§5.21)."));
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       _("Equivalent stresses: von Mises and Tresca of the Lamé principal stresses; the peak is on a surface."));
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       _("Thin-wall error = 100 (thin − Lamé peak) / |Lamé peak|; the verdict compares it with the tolerance."));
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       _("First yield, plastic collapse and allowable pressure on one load path: the internal pressure raised, the "
         "external held. Plastic collapse: Hill, The Mathematical Theory of Plasticity (1950), perfectly plastic, "
         "von Mises."));
  add_text (rows, HL_SHEET_BULLET,
            g_strdup_printf (_("Allowable pressure and required thickness (corrosion allowance and mill "
                               "undertolerance included): thin wall (σθ = S Ej), Lamé (peak equivalent stress = "
                               "S Ej), ASME BPVC Section VIII Division 1 %s, %s, Barlow P = 2 S Ej t / D for pipe; "
                               "Ej is the joint efficiency (z in EN 13445). Code formulas are used inside their "
                               "stated ranges only, on the internal design pressure unless the external pressure "
                               "always acts."),
                             s->ug27_clause != NULL ? s->ug27_clause : "UG-27",
                             s->en13445_clause != NULL ? s->en13445_clause : "EN 13445-3 7.4"));
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       _("The analysis wall has the corrosion allowance removed from the inside: the inner radius grows and the "
         "wall thins by the allowance."));
}

static void
warnings (GArray                *rows,
          const HlFigureContext *ctx)
{
  GPtrArray *w = ctx->solution->warnings;

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, _("Warnings"));
  if (w == NULL || w->len == 0)
    add (rows, HL_SHEET_PARAGRAPH, NULL, FALSE, 1, _("None for this shell."));
  for (guint i = 0; w != NULL && i < w->len; i++)
    add (rows, HL_SHEET_BULLET, NULL, FALSE, 1, hl_figure_core_text (g_ptr_array_index (w, i)));
}

GArray *
hl_sheet_rows (const HlFigureContext *ctx)
{
  GArray *rows = g_array_new (FALSE, TRUE, sizeof (HlSheetRow));
  const HlSolution *s = ctx->solution;
  g_autoptr(HlSolution) solved_here = NULL;
  const HlSolution *new_wall = NULL;
  double c = hl_quantity_si (s->inputs.corrosion_allowance, HL_KIND_LENGTH);

  g_array_set_clear_func (rows, clear_row);
  /* with an allowance the sheet shows the new wall beside the corroded
   * one, as the text report does: the caller's analysis, when it has one */
  if (s->corroded && c > 0)
    new_wall = ctx->new_wall != NULL ? ctx->new_wall
                                     : (solved_here = hl_solve (&s->inputs, HL_DEFAULT_POINTS, FALSE, NULL));
  header (rows, ctx);
  design_check (rows, ctx);
  inputs (rows, ctx);
  results (rows, ctx, new_wall);
  verdict (rows, ctx);
  methods (rows, ctx);
  warnings (rows, ctx);
  /* the caution stands boxed under the header and in every page's
   * footer; a closing copy would only push a page of its own */
  return rows;
}
