/* hl-note-checks.c — the note's design check: the verdict, a summary of
 * all checks, each check worked out with its numbers, and the thin-wall
 * verdict
 *
 * The worked checks come from hl_check_steps(), the one list of what each
 * check computed; the note only sets them out.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-note-checks"

#include "hl-note-private.h"
#include "hl-check-steps.h"
#include "hl-report.h"

#include <math.h>

static const double cols_check[] = { 0.31, 0.25, 0.25, 0.19 };
static const double cols_summary[] = { 0.58, 0.16, 0.13, 0.13 };

/* The method and its governing clause without saying a word twice:
 * "Lamé, von Mises = S Ej" (not "Lamé elastic, Lamé, …"), "ASME VIII-1
 * UG-27(c)(1)" (not "ASME VIII-1 UG-27, UG-27(c)(1)"). */
static char *
method_label (const char *name,
              const char *clause)
{
  const char *last = strrchr (name, ' ');
  g_autofree char *first = g_strndup (name, strcspn (name, " "));

  if (clause == NULL || strcmp (clause, name) == 0)
    return g_strdup (name);
  if (g_str_has_prefix (clause, first))
    return g_strdup (clause);
  if (last != NULL && g_str_has_prefix (clause, last + 1))
    return g_strdup_printf ("%.*s %s", (int) (last - name), name, clause);
  return g_strdup_printf ("%s, %s", name, clause);
}

static const double cols_step[] = { 0.26, 0.74 };

/* Does the wall pass: the verdict in words first, then every method */
void
hl_note_design_check (GArray          *rows,
                      const HlNoteCtx *ctx)
{
  const HlDesignCheck *c = &ctx->s->check;
  const HlMethodCheck *b = &c->methods[c->basis];
  g_autofree char *u = hl_note_percent (ctx, c->utilisation);
  g_autofree char *nominal = hl_note_quantity (ctx, c->nominal, HL_ROW_LENGTH, 4);
  g_autofree char *corrosion = hl_note_quantity (ctx, c->corrosion, HL_ROW_LENGTH, 4);
  g_autofree char *mill = hl_note_quantity (ctx, c->mill, HL_ROW_LENGTH, 4);
  g_autofree char *available = hl_note_quantity (ctx, c->available, HL_ROW_LENGTH, 4);
  g_autofree char *why = hl_note_check_reason (ctx, b);

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1,
               ctx->s->corroded ? _("Design check (corroded wall)") : _("Design check"));
  if (c->bursts)
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, TRUE, 1,
                 _("FAIL — DANGER: the wall would burst: the design pressure is above the plastic collapse "
                   "pressure."));
  else if (c->yields)
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, TRUE, 1,
                 _("FAIL — DANGER: the wall yields at the bore: the peak equivalent stress is above the yield "
                   "strength."));
  else if (b->result == HL_CHECK_NOT_APPLICABLE)
    hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, TRUE,
                       g_strdup_printf (_("FAIL — not shown to pass: the design basis %s does not apply: %s"),
                                        b->name, why));
  else
    /* TRANSLATORS: PASS or FAIL, the utilisation, the governing clause, the design basis */
    hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, TRUE,
                       g_strdup_printf (_("%s — utilisation %s by %s (design basis %s)%s%s"),
                                        hl_note_check_word (c->verdict), u, c->governing, b->name,
                                        why != NULL ? ": " : "", why != NULL ? why : ""));
  /* TRANSLATORS: nominal − corrosion allowance − mill undertolerance = available */
  hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                     g_strdup_printf (_("Available wall: %s nominal − %s corrosion allowance − %s mill "
                                        "undertolerance = %s."),
                                      nominal, corrosion, mill, available));
  hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, FALSE, 1,
               ctx->s->code_coincident
                 ? _("Pressure in the code formulas: internal − external (external always coincident).")
                 : _("Pressure in the code formulas: internal design pressure alone."));
  hl_note_add (rows, HL_NOTE_TABLE, cols_check, TRUE, 4, _("Method"), _("Required / available t"),
               _("Allowable / design P"), _("Utilisation, result"));
  for (guint m = 0; m < HL_N_METHODS; m++)
    {
      const HlMethodCheck *mc = &c->methods[m];
      g_autofree char *req = hl_note_quantity (ctx, mc->required, HL_ROW_LENGTH, 4);
      g_autofree char *avail = hl_note_quantity (ctx, mc->available, HL_ROW_LENGTH, 4);
      g_autofree char *mawp = hl_note_quantity (ctx, mc->mawp, HL_ROW_STRESS, 4);
      g_autofree char *design = hl_note_quantity (ctx, mc->design_pressure, HL_ROW_STRESS, 4);
      g_autofree char *um = hl_note_percent (ctx, mc->utilisation_pressure);
      g_autofree char *label = method_label (mc->name, mc->clause);
      g_autofree char *name = m == (guint) c->basis ? g_strdup_printf (_("%s (design basis)"), label)
                                                    : g_strdup (label);
      g_autofree char *t = g_strdup_printf ("%s / %s", req, avail);
      g_autofree char *p = g_strdup_printf ("%s / %s", mawp, design);
      g_autofree char *r = g_strdup_printf ("%s, %s", um, hl_note_check_word (mc->result));

      hl_note_add (rows, HL_NOTE_TABLE, cols_check, m == (guint) c->basis, 4, name, t, p, r);
    }
  if (c->bursts || c->yields)
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, TRUE, 1,
                 c->bursts ? _("DANGER: the wall would burst.") : _("DANGER: the wall yields at the bore."));
}

/* one line per check, the governing one marked: what a checker reads first */
void
hl_note_checks_summary (GArray          *rows,
                        const HlNoteCtx *ctx)
{
  g_autoptr(GPtrArray) steps = hl_check_steps (ctx->s, ctx->units, ctx->loc);

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Summary of checks"));
  hl_note_add (rows, HL_NOTE_TABLE, cols_summary, TRUE, 4, _("Check"), _("Result"), _("Utilisation"),
               _("Governing"));
  for (guint i = 0; i < steps->len; i++)
    {
      const HlCheckStep *st = g_ptr_array_index (steps, i);
      g_autofree char *u = hl_note_percent (ctx, st->utilisation);

      hl_note_add (rows, HL_NOTE_TABLE, cols_summary, st->governing, 4, st->title, hl_check_step_word (st->verdict), u,
                   st->governing ? _("governing") : "");
    }
}

static void
step_line (GArray     *rows,
           const char *label,
           const char *text)
{
  if (text != NULL && text[0] != '\0')
    hl_note_add (rows, HL_NOTE_TABLE, cols_step, FALSE, 2, label, text);
}

/* each check as a checker redoes it: the clause's formula, the same with
 * the numbers put in, the result against the criterion */
void
hl_note_check_steps (GArray          *rows,
                     const HlNoteCtx *ctx)
{
  g_autoptr(GPtrArray) steps = hl_check_steps (ctx->s, ctx->units, ctx->loc);
  const HlCheckStep *governing = NULL;

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Checks worked out"));
  for (guint i = 0; i < steps->len; i++)
    {
      const HlCheckStep *st = g_ptr_array_index (steps, i);
      g_autofree char *u = hl_note_percent (ctx, st->utilisation);
      g_autofree char *outcome = st->reason != NULL && st->reason[0] != '\0'
                                   ? g_strdup_printf ("%s: %s", hl_check_step_word (st->verdict),
                                                      hl_note_core_text (st->reason))
                                   : g_strdup (hl_check_step_word (st->verdict));
      g_autofree char *title = st->governing ? g_strdup_printf (_("%s (governing)"), st->title)
                                             : g_strdup (st->title);

      if (st->governing && governing == NULL)
        governing = st;
      hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, TRUE, 1, title);
      step_line (rows, _("Formula (as in the clause)"), st->formula);
      step_line (rows, _("With the numbers"), st->substituted);
      step_line (rows, _("Result"), st->result);
      step_line (rows, _("Criterion"), st->criterion);
      if (isfinite (st->utilisation))
        step_line (rows, _("Utilisation"), u);
      step_line (rows, _("Outcome"), outcome);
    }
  if (governing != NULL)
    hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, TRUE,
                       g_strdup_printf (_("Governing check: %s — %s."), governing->title,
                                        hl_check_step_word (governing->verdict)));
  else
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, TRUE, 1, _("No check governs: none applies to this shell."));
}

/* the radius basis as "on the … radius" */
static const char *
basis_on (HlRadiusBasis basis)
{
  return basis == HL_BASIS_INNER ? C_("on the … radius", "inner")
         : basis == HL_BASIS_OUTER ? C_("on the … radius", "outer") : C_("on the … radius", "mean");
}

void
hl_note_verdict (GArray          *rows,
                 const HlNoteCtx *ctx)
{
  const HlSolution *s = ctx->s;
  /* the measure that decided, when both are checked */
  gboolean eq = s->thin_governing == HL_MEASURE_EQUIVALENT;
  HlResult err = eq ? s->thin_wall_error_equivalent : s->thin_wall_error;
  gboolean loc = ctx->loc;
  g_autofree char *tol = hl_note_sig (s->tolerance, 3, loc);
  g_autofree char *mr = hl_note_sig (s->mean_ratio, 4, loc);

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Thin-wall verdict"));
  if (!hl_result_ok (err))
    hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                       g_strdup_printf (_("The thin-wall error cannot be formed: %s."),
                                        hl_note_core_text (err.reason)));
  else
    {
      g_autofree char *e = hl_note_sig (err.value, 3, loc);
      /* whole sentences, so that a translation can order its words */
      g_autofree char *gap = g_strdup_printf (eq ? _("On the %s radius, the thin-wall von Mises stress is %s %% "
                                                     "from the Lamé peak")
                                                 : _("On the %s radius, the thin-wall hoop stress is %s %% from "
                                                     "the Lamé peak"),
                                              basis_on (s->inputs.thin_basis), e);
      /* "adequate" says the formulas describe the stress, never that
       * the wall holds: beside a failed design check it is not used */
      g_autofree char *fit = g_strdup_printf (!s->is_thin ? _("With a tolerance of %s %% the thin-wall formulas are "
                                                              "not adequate for this wall; use the Lamé (thick-wall) "
                                                              "results.")
                                              : s->check.verdict != HL_CHECK_PASS
                                                ? _("With a tolerance of %s %% the thin-wall formulas describe the "
                                                    "stresses of this wall, but the wall FAILS the design check.")
                                                : _("With a tolerance of %s %% the thin-wall formulas are adequate "
                                                    "for this wall."),
                                              tol);

      hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                         g_strdup_printf ("%s %s %s", gap, err.value < 0 ? _("(below it: unconservative).")
                                                                          : _("(above it: conservative)."), fit));
    }
  hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                     g_strdup_printf (_("Mean radius / thickness R/t = %s; the common rule of thumb (R/t ≥ 10) is %s."),
                                      mr, s->rule_of_thumb ? _("met") : _("not met")));
  if (hl_result_ok (s->ratio_for_tolerance))
    {
      g_autofree char *rt = hl_note_sig (s->ratio_for_tolerance.value, 4, loc);

      hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                         g_strdup_printf (_("The error equals the tolerance at R/t = %s; every wall with a larger R/t "
                                            "is within it."), rt));
    }
}
