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
#include "hl-report.h"
#include "hl-result-rows.h"

#include <math.h>
#include <string.h>

static const double cols_pair[] = { 0.34, 0.66 };
static const double cols_input[] = { 0.42, 0.29, 0.29 };
static const double cols_result1[] = { 0.44, 0.24, 0.32 };
static const double cols_result2[] = { 0.37, 0.19, 0.19, 0.25 };

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

static void
header (GArray                *rows,
        const HlFigureContext *ctx)
{
  const HlProject *pr = ctx->project;
  const HlShellInputs *in = &ctx->solution->inputs;
  const HlRevision *rev = pr != NULL ? hl_project_latest_revision (pr) : NULL;
  g_autoptr(GDateTime) now = g_date_time_new_now_local ();
  g_autofree char *today = g_date_time_format (now, "%Y-%m-%d");
  g_autofree char *shell = g_strdup_printf ("%s (id %s)", in->name, in->id);
  g_autofree char *revision = rev != NULL ? g_strdup_printf ("%u, %s, %s: %s", rev->number, rev->date,
                                                             rev->author != NULL ? rev->author : "",
                                                             rev->text != NULL ? rev->text : "")
                                          : g_strdup ("none recorded");

  add (rows, HL_SHEET_TITLE, NULL, FALSE, 2, "Calculation sheet", shell);
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, "Project",
       pr != NULL && pr->title != NULL && pr->title[0] ? pr->title : "(untitled)");
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, "Engineer",
       pr != NULL && pr->engineer != NULL && pr->engineer[0] ? pr->engineer : "(not given)");
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, "Latest revision", revision);
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, "Units", ctx->units == HL_UNIT_SYSTEM_US ? "in, psi" : "mm, MPa");
  add (rows, HL_SHEET_TABLE, cols_pair, FALSE, 2, "Exported", ctx->export_date != NULL ? ctx->export_date : today);
  add (rows, HL_SHEET_BOX, NULL, FALSE, 1, "Caution: " HL_CAUTION);
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

static void
inputs (GArray                *rows,
        const HlFigureContext *ctx)
{
  static const char *const size_labels[] = {
    "Inner diameter", "Outer diameter", "Inner radius", "Outer radius"
  };
  const HlShellInputs *in = &ctx->solution->inputs;
  g_autofree char *form = in->form == HL_FORM_SPHERE ? g_strdup ("sphere")
                                                     : g_strdup_printf ("cylinder, %s ends", hl_ends_to_string (in->ends));
  g_autofree char *nu = hl_figure_format_sig (in->material.poisson_ratio, 6, ctx->locale_numbers);
  g_autofree char *je = hl_figure_format_sig (in->joint_efficiency, 6, ctx->locale_numbers);
  g_autofree char *mat = g_strdup_printf ("%s (%s)", in->material.name, in->material.id);

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, "Inputs");
  add (rows, HL_SHEET_TABLE, cols_input, TRUE, 3, "Quantity", "As entered", "In the sheet's units");
  add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, "Form", form, "");
  input_row (rows, ctx, size_labels[in->size_kind], in->size, HL_KIND_LENGTH);
  input_row (rows, ctx, "Wall thickness (new)", in->wall_thickness, HL_KIND_LENGTH);
  input_row (rows, ctx, "Corrosion allowance", in->corrosion_allowance, HL_KIND_LENGTH);
  input_row (rows, ctx, "Internal pressure (gauge)", in->internal_pressure, HL_KIND_STRESS);
  input_row (rows, ctx, "External pressure (gauge)", in->external_pressure, HL_KIND_STRESS);
  add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, "Material", mat, "");
  input_row (rows, ctx, "Elastic modulus E", in->material.elastic_modulus, HL_KIND_MODULUS);
  add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, "Poisson's ratio ν", nu, "");
  input_row (rows, ctx, "Yield strength", in->material.yield_strength, HL_KIND_STRESS);
  input_row (rows, ctx, "Allowable stress S", in->material.allowable_stress, HL_KIND_STRESS);
  add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, "Weld joint efficiency", je, "");
  add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, "Thin-wall radius basis", hl_basis_to_string (in->thin_basis), "");
  input_row (rows, ctx, "Thin-wall tolerance", in->thin_tolerance, HL_KIND_PERCENT);
  add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, "Verdict measure",
       in->verdict_measure == HL_MEASURE_EQUIVALENT ? "von Mises stress" : "hoop stress", "");
  add (rows, HL_SHEET_TABLE, cols_input, FALSE, 3, "Sizing criterion",
       in->sizing_criterion == HL_CRITERION_TRESCA ? "Tresca" : "von Mises", "");
}

static char *
value_text (const HlResultRow     *row,
            const HlFigureContext *ctx)
{
  if (row->kind == HL_ROW_WORD)
    return g_strdup (row->word != NULL ? row->word : "");
  if (!hl_result_ok (row->result))
    return g_strdup ("n/a");
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
    return row->source != NULL ? g_strdup_printf ("%s; n/a: %s", row->source, row->result.reason)
                               : g_strdup_printf ("n/a: %s", row->result.reason);
  return g_strdup (row->source != NULL ? row->source : "");
}

static void
results (GArray                *rows,
         const HlFigureContext *ctx,
         const HlSolution      *new_wall)
{
  g_autoptr(GArray) cor = hl_result_rows (ctx->solution);
  g_autoptr(GArray) nw = new_wall != NULL ? hl_result_rows (new_wall) : NULL;

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, "Results");
  if (nw != NULL)
    add (rows, HL_SHEET_TABLE, cols_result2, TRUE, 4, "Result", "New wall", "Corroded wall", "Formula or source");
  else
    add (rows, HL_SHEET_TABLE, cols_result1, TRUE, 3, "Result", "Value", "Formula or source");
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

          add (rows, HL_SHEET_TABLE, cols_result2, FALSE, 4, rc->label, vn, vc, src);
        }
      else
        add (rows, HL_SHEET_TABLE, cols_result1, FALSE, 3, rc->label, vc, src);
    }
}

static void
verdict (GArray                *rows,
         const HlFigureContext *ctx)
{
  const HlSolution *s = ctx->solution;
  gboolean eq = s->inputs.verdict_measure == HL_MEASURE_EQUIVALENT;
  HlResult err = eq ? s->thin_wall_error_equivalent : s->thin_wall_error;
  gboolean loc = ctx->locale_numbers;
  g_autofree char *tol = hl_figure_format_sig (s->tolerance, 3, loc);
  g_autofree char *mr = hl_figure_format_sig (s->mean_ratio, 4, loc);

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, "Thin-wall verdict");
  if (!hl_result_ok (err))
    add_text (rows, HL_SHEET_PARAGRAPH, g_strdup_printf ("The thin-wall error cannot be formed: %s.", err.reason));
  else
    {
      g_autofree char *e = hl_figure_format_sig (err.value, 3, loc);

      add_text (rows, HL_SHEET_PARAGRAPH,
                g_strdup_printf ("On the %s radius, the thin-wall %s stress is %s %% from the Lamé peak "
                                 "(%s). With a tolerance of %s %% the thin-wall formulas are %s for this wall%s",
                                 hl_basis_to_string (s->inputs.thin_basis), eq ? "von Mises" : "hoop", e,
                                 err.value < 0 ? "below it: unconservative" : "above it: conservative", tol,
                                 s->is_thin ? "adequate" : "not adequate",
                                 s->is_thin ? "." : "; use the Lamé (thick-wall) results."));
    }
  add_text (rows, HL_SHEET_PARAGRAPH,
            g_strdup_printf ("Mean radius / thickness R/t = %s; the common rule of thumb (R/t ≥ 10) is %s.", mr,
                             s->rule_of_thumb ? "met" : "not met"));
  if (hl_result_ok (s->ratio_for_tolerance))
    {
      g_autofree char *rt = hl_figure_format_sig (s->ratio_for_tolerance.value, 4, loc);

      add_text (rows, HL_SHEET_PARAGRAPH,
                g_strdup_printf ("The error equals the tolerance at R/t = %s; every wall with a larger R/t is within it.", rt));
    }
}

static void
methods (GArray                *rows,
         const HlFigureContext *ctx)
{
  const HlSolution *s = ctx->solution;

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, "Methods and sources");
  add_text (rows, HL_SHEET_BULLET,
            g_strdup_printf ("Thin wall (membrane), radial stress taken as zero: cylinder hoop σθ = p R / t, axial "
                             "σz = p R / 2t (closed ends), 0 (open ends), ν σθ (plane strain); sphere σ = p R / 2t. "
                             "R is the %s radius, p the net pressure.", hl_basis_to_string (s->inputs.thin_basis)));
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       "Lamé thick wall: cylinder σr = A − B/r², σθ = A + B/r² (Timoshenko, Strength of Materials, Part II; "
       "Lai, Rubin & Krempl, Introduction to Continuum Mechanics, §5.18); sphere σr = C − D/r³, "
       "σθ = C + D/2r³ (§5.21).");
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       "Equivalent stresses: von Mises and Tresca of the Lamé principal stresses; the peak is on a surface.");
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       "Thin-wall error = 100 (thin − Lamé peak) / |Lamé peak|; the verdict compares it with the tolerance.");
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       "First yield: all pressures scaled together until the peak equivalent stress reaches the yield strength. "
       "Plastic collapse: Hill, The Mathematical Theory of Plasticity (1950), perfectly plastic, von Mises.");
  add_text (rows, HL_SHEET_BULLET,
            g_strdup_printf ("Allowable pressure and required thickness: thin wall (σθ = S E), Lamé (peak equivalent "
                             "stress = S E), ASME BPVC Section VIII Division 1 %s, %s, Barlow P = 2 S t / D "
                             "for pipe. Code formulas are used inside their stated ranges only.",
                             s->ug27_clause != NULL ? s->ug27_clause : "UG-27",
                             s->en13445_clause != NULL ? s->en13445_clause : "EN 13445-3 7.4"));
  add (rows, HL_SHEET_BULLET, NULL, FALSE, 1,
       "The analysis wall has the corrosion allowance removed from the inside: the inner radius grows and the wall "
       "thins by the allowance.");
}

static void
warnings (GArray                *rows,
          const HlFigureContext *ctx)
{
  GPtrArray *w = ctx->solution->warnings;

  add (rows, HL_SHEET_HEADING, NULL, FALSE, 1, "Warnings");
  if (w == NULL || w->len == 0)
    add (rows, HL_SHEET_PARAGRAPH, NULL, FALSE, 1, "None for this shell.");
  for (guint i = 0; w != NULL && i < w->len; i++)
    add (rows, HL_SHEET_BULLET, NULL, FALSE, 1, (const char *) g_ptr_array_index (w, i));
}

GArray *
hl_sheet_rows (const HlFigureContext *ctx)
{
  GArray *rows = g_array_new (FALSE, TRUE, sizeof (HlSheetRow));
  const HlSolution *s = ctx->solution;
  g_autoptr(HlSolution) new_wall = NULL;
  double c = hl_quantity_si (s->inputs.corrosion_allowance, HL_KIND_LENGTH);

  g_array_set_clear_func (rows, clear_row);
  /* with an allowance the sheet shows the new wall beside the corroded
   * one, as the text report does; the engine solves both */
  if (s->corroded && c > 0)
    new_wall = hl_solve (&s->inputs, HL_DEFAULT_POINTS, FALSE, NULL);
  header (rows, ctx);
  inputs (rows, ctx);
  results (rows, ctx, new_wall);
  verdict (rows, ctx);
  methods (rows, ctx);
  warnings (rows, ctx);
  /* the caution stands boxed under the header and in every page's
   * footer; a closing copy would only push a page of its own */
  return rows;
}
