/* hl-note-content.c — what the design note of one shell says, row by row
 *
 * The order a checking engineer reads: who and what, the verdict and a
 * summary of all checks, the signatures and the revisions, then the
 * inputs and each check worked out, the results, the limits of the
 * method and the warnings.  The numbers come from the solution and
 * hl_result_rows(), the list that also feeds the summary, so the note
 * never disagrees with the other outputs.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-note-content"

#include "hl-note-private.h"
#include "hl-field-table.h"
#include "hl-report.h"

#include <math.h>
#include <string.h>

static const double cols_pair[] = { 0.30, 0.70 };
static const double cols_signoff[] = { 0.22, 0.50, 0.28 };
static const double cols_revision[] = { 0.10, 0.18, 0.22, 0.50 };

static const char *
given (const char *text)
{
  return text != NULL && text[0] != '\0' ? text : _("(not given)");
}

/* "ASME VIII-1 UG-27, edition 2021": the basis with its edition */
static char *
basis_text (const HlShellInputs *in)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, "design-basis");
  const HlFieldChoice *c = hl_field_choice_by_value (f, in->design_basis);
  const char *name = c != NULL && c->sheet != NULL ? _(c->sheet) : hl_design_basis_name (in->design_basis);

  if (in->code_edition[0] == '\0')
    return g_strdup_printf (_("%s (edition not given)"), name);
  /* TRANSLATORS: design basis, code edition */
  return g_strdup_printf (_("%s, edition %s"), name, in->code_edition);
}

static void
header (GArray          *rows,
        const HlNoteCtx *ctx)
{
  const HlProject *pr = ctx->project;
  const HlShellInputs *in = &ctx->s->inputs;
  const HlRevision *rev = pr != NULL ? hl_project_latest_revision (pr) : NULL;
  g_autofree char *shell = g_strdup_printf (_("%s (id %s)"), in->name, in->id);
  g_autofree char *basis = basis_text (in);
  g_autofree char *revision = rev != NULL ? g_strdup_printf (_("Rev. %u, %s"), rev->number, rev->date)
                                          : g_strdup (_("no revision recorded"));
  g_autofree char *caution = hl_note_caution ();

  hl_note_add (rows, HL_NOTE_TITLE, NULL, FALSE, 2, _("Calculation sheet"), shell);
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Project"),
               pr != NULL && pr->title != NULL && pr->title[0] ? pr->title : _("(untitled)"));
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Engineer"), given (pr != NULL ? pr->engineer : NULL));
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Item"), shell);
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Design basis"), basis);
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Revision"), revision);
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Units"),
               _(hl_unit_system_words (ctx->units)));
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Exported"), ctx->date);
  hl_note_add (rows, HL_NOTE_BOX, NULL, FALSE, 1, caution);
}

/* prepared / checked / approved: boxes to sign even when empty */
static void
signoff (GArray          *rows,
         const HlNoteCtx *ctx)
{
  static const char *const roles[HL_N_SIGNOFFS] = { N_("Prepared"), N_("Checked"), N_("Approved") };

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Sign-off"));
  hl_note_add (rows, HL_NOTE_TABLE, cols_signoff, TRUE, 3, _("Role"), _("Name"), _("Date"));
  for (guint i = 0; i < HL_N_SIGNOFFS; i++)
    {
      const HlSignoff *so = ctx->project != NULL ? &ctx->project->signoff[i] : NULL;

      hl_note_add (rows, HL_NOTE_TABLE, cols_signoff, FALSE, 3, _(roles[i]), so != NULL ? so->name : "",
                   so != NULL ? so->date : "");
      hl_note_row (rows, rows->len - 1)->boxed = TRUE;
    }
}

static void
revisions (GArray          *rows,
           const HlNoteCtx *ctx)
{
  GArray *revs = ctx->project != NULL ? ctx->project->revisions : NULL;

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Revision history"));
  if (revs == NULL || revs->len == 0)
    {
      hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, FALSE, 1, _("No revision recorded."));
      return;
    }
  hl_note_add (rows, HL_NOTE_TABLE, cols_revision, TRUE, 4, _("Rev."), _("Date"), _("Author"), _("Description"));
  for (guint i = 0; i < revs->len; i++)
    {
      const HlRevision *r = &g_array_index (revs, HlRevision, i);
      g_autofree char *n = g_strdup_printf ("%u", r->number);

      hl_note_add (rows, HL_NOTE_TABLE, cols_revision, FALSE, 4, n, r->date, r->author, r->text);
    }
}

/* the radius basis as "R is the … radius" */
static const char *
basis_is (HlRadiusBasis basis)
{
  return basis == HL_BASIS_INNER ? C_("R is the … radius", "inner")
         : basis == HL_BASIS_OUTER ? C_("R is the … radius", "outer") : C_("R is the … radius", "mean");
}

static void
methods (GArray          *rows,
         const HlNoteCtx *ctx)
{
  const HlSolution *s = ctx->s;

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Methods and sources"));
  hl_note_add_owned (rows, HL_NOTE_BULLET, FALSE,
                     g_strdup_printf (_("Thin wall (membrane), radial stress taken as zero: cylinder hoop σθ = p R / t, "
                                        "axial σz = p R / 2t (closed ends), 0 (open ends), ν σθ (plane strain); sphere "
                                        "σ = p R / 2t. R is the %s radius, p the net pressure."),
                                      basis_is (s->inputs.thin_basis)));
  hl_note_add (rows, HL_NOTE_BULLET, NULL, FALSE, 1,
               _("Lamé thick wall: cylinder σr = A − B/r², σθ = A + B/r² (Timoshenko, Strength of Materials, Part II; "
                 "Lai, Rubin & Krempl, Introduction to Continuum Mechanics, §5.18); sphere σr = C − D/r³, "
                 "σθ = C + D/2r³ (§5.21)."));
  hl_note_add (rows, HL_NOTE_BULLET, NULL, FALSE, 1,
               _("Equivalent stresses: von Mises and Tresca of the Lamé principal stresses; the peak is on a surface."));
  hl_note_add (rows, HL_NOTE_BULLET, NULL, FALSE, 1,
               _("Thin-wall error = 100 (thin − Lamé peak) / |Lamé peak|; the verdict compares it with the tolerance."));
  hl_note_add (rows, HL_NOTE_BULLET, NULL, FALSE, 1,
               _("First yield, plastic collapse and allowable pressure on one load path: the internal pressure raised, "
                 "the external held. Plastic collapse: Hill, The Mathematical Theory of Plasticity (1950), perfectly "
                 "plastic, von Mises."));
  hl_note_add_owned (rows, HL_NOTE_BULLET, FALSE,
                     g_strdup_printf (_("Allowable pressure and required thickness (corrosion allowance and mill "
                                        "undertolerance included): thin wall (σθ = S Ej), Lamé (peak equivalent "
                                        "stress = S Ej), ASME BPVC Section VIII Division 1 %s, %s, Barlow "
                                        "P = 2 S Ej t / D for pipe; Ej is the joint efficiency (z in EN 13445). Code "
                                        "formulas are used inside their stated ranges only, on the internal design "
                                        "pressure unless the external pressure always acts."),
                                      s->ug27_clause != NULL ? s->ug27_clause : "UG-27",
                                      s->en13445_clause != NULL ? s->en13445_clause : "EN 13445-3 7.4"));
  hl_note_add (rows, HL_NOTE_BULLET, NULL, FALSE, 1,
               _("The analysis wall has the corrosion allowance and the mill undertolerance removed from the inside: "
                 "the inner radius grows and the wall thins; the allowable stress is the one at the design "
                 "temperature, as entered."));
}

static void
warnings (GArray          *rows,
          const HlNoteCtx *ctx)
{
  GPtrArray *w = ctx->s->warnings;

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Warnings"));
  if (w == NULL || w->len == 0)
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, FALSE, 1, _("None for this shell."));
  for (guint i = 0; w != NULL && i < w->len; i++)
    hl_note_add (rows, HL_NOTE_BULLET, NULL, FALSE, 1, hl_note_core_text (g_ptr_array_index (w, i)));
}

GArray *
hl_note_content (const HlProject  *project,
                 const HlSolution *corroded,
                 const HlSolution *new_wall,
                 HlUnitSystem      units,
                 gboolean          locale_numbers,
                 const char       *export_date)
{
  GArray *rows;
  g_autofree char *today = NULL;
  HlNoteCtx ctx = { project, corroded, new_wall, units, locale_numbers, export_date };

  g_return_val_if_fail (corroded != NULL, NULL);
  if (export_date == NULL)
    {
      g_autoptr(GDateTime) now = g_date_time_new_now_local ();

      ctx.date = today = g_date_time_format (now, "%Y-%m-%d");
    }
  rows = hl_note_new ();
  header (rows, &ctx);
  hl_note_design_check (rows, &ctx);
  hl_note_checks_summary (rows, &ctx);
  signoff (rows, &ctx);
  revisions (rows, &ctx);
  hl_note_inputs (rows, &ctx);
  hl_note_check_steps (rows, &ctx);
  hl_note_test_pressure (rows, &ctx);
  hl_note_results (rows, &ctx);
  hl_note_verdict (rows, &ctx);
  methods (rows, &ctx);
  hl_note_limits (rows, &ctx);
  warnings (rows, &ctx);
  return rows;
}
