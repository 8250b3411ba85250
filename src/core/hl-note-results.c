/* hl-note-results.c — the note's results table and its test pressure
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-note-results"

#include "hl-note-private.h"
#include "hl-field-table.h"
#include "hl-report.h"
#include "hl-test-pressure.h"

#include <math.h>

static const double cols_result1[] = { 0.44, 0.24, 0.32 };
static const double cols_result2[] = { 0.37, 0.19, 0.19, 0.25 };

static char *
value_text (const HlNoteCtx   *ctx,
            const HlResultRow *row)
{
  if (row->kind == HL_ROW_WORD)
    return g_strdup (row->word != NULL ? hl_note_core_text (row->word) : "");
  if (!hl_result_ok (row->result))
    return g_strdup (_("n/a"));
  /* a stress below a micropascal is rounding left in a difference of
   * large terms (the outer radial stress A - B/b^2): show it as zero */
  if (row->kind == HL_ROW_STRESS && fabs (row->result.value) < 1e-6)
    return hl_note_quantity (ctx, 0.0, row->kind, 6);
  return hl_note_quantity (ctx, row->result.value, row->kind, 6);
}

static char *
source_text (const HlResultRow *row)
{
  if (row->kind != HL_ROW_WORD && !hl_result_ok (row->result) && row->result.reason != NULL)
    return row->source != NULL ? g_strdup_printf (_("%s; n/a: %s"), row->source,
                                                  hl_note_core_text (row->result.reason))
                               : g_strdup_printf (_("n/a: %s"), hl_note_core_text (row->result.reason));
  return g_strdup (row->source != NULL ? row->source : "");
}

void
hl_note_results (GArray          *rows,
                 const HlNoteCtx *ctx)
{
  g_autoptr(GArray) cor = hl_result_rows (ctx->s);
  g_autoptr(GArray) nw = ctx->new_wall != NULL ? hl_result_rows (ctx->new_wall) : NULL;

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Results"));
  if (nw != NULL)
    hl_note_add (rows, HL_NOTE_TABLE, cols_result2, TRUE, 4, _("Result"), _("New wall (no corrosion allowance)"),
                 _("Corroded wall"), _("Formula or source"));
  else
    hl_note_add (rows, HL_NOTE_TABLE, cols_result1, TRUE, 3, _("Result"), _("Value"), _("Formula or source"));
  for (guint i = 0; i < cor->len; i++)
    {
      const HlResultRow *rc = &g_array_index (cor, HlResultRow, i);
      g_autofree char *vc = NULL, *src = NULL;

      /* name, id and form are in the heading and the inputs already */
      if (rc->kind == HL_ROW_WORD && i < 4)
        continue;
      vc = value_text (ctx, rc);
      /* the core words the undertolerance in mm: the note says it in its units */
      if (g_strcmp0 (rc->key, "available_thickness") == 0)
        {
          g_autofree char *mill = hl_note_quantity (ctx, ctx->s->check.mill, HL_ROW_LENGTH, 4);

          src = g_strdup_printf (_("mill undertolerance %s"), mill);
        }
      else
        src = source_text (rc);
      if (nw != NULL)
        {
          g_autofree char *vn = value_text (ctx, &g_array_index (nw, HlResultRow, i));

          hl_note_add (rows, HL_NOTE_TABLE, cols_result2, FALSE, 4, hl_note_core_text (rc->label), vn, vc, src);
        }
      else
        hl_note_add (rows, HL_NOTE_TABLE, cols_result1, FALSE, 3, hl_note_core_text (rc->label), vc, src);
      hl_note_row (rows, rows->len - 1)->note = TRUE;
    }
}

/* "1.52034 MPa", or the reason there is none */
static char *
test_value (const HlNoteCtx *ctx,
            HlResult         r)
{
  if (!hl_result_ok (r))
    return g_strdup (hl_note_core_text (r.reason != NULL ? r.reason : N_("not computable")));
  return hl_note_quantity (ctx, r.value, HL_ROW_STRESS, 6);
}

static void
test_stress (GArray             *rows,
             const HlNoteCtx    *ctx,
             const HlTestStress *st)
{
  g_autofree char *sv = test_value (ctx, st->stress);
  GString *line = g_string_new (NULL);

  g_string_append_printf (line, "%s: %s", hl_note_core_text (st->basis), sv);
  if (hl_result_ok (st->of_yield))
    g_string_append_printf (line, _(" = %.1f %% of yield"), 100 * st->of_yield.value);
  if (hl_result_ok (st->utilisation))
    g_string_append_printf (line, _(", %.1f %% of the limit"), 100 * st->utilisation.value);
  g_string_append_printf (line, ": %s", hl_note_core_text (hl_test_verdict_word (st->verdict)));
  hl_note_add_owned (rows, HL_NOTE_BULLET, FALSE, g_string_free (line, FALSE));
}

static void
test_rule (GArray                   *rows,
           const HlNoteCtx          *ctx,
           const HlTestRulePressure *r,
           const char               *source)
{
  g_autofree char *pt = test_value (ctx, r->pressure);
  GString *line = g_string_new (NULL);

  /* the rule and its formula, then what it gives */
  hl_note_add (rows, HL_NOTE_BULLET, NULL, FALSE, 1, source);
  g_string_append_printf (line, "PT = %s", pt);
  if (hl_result_ok (r->pressure))
    {
      if (r->data->ps_factor > 0)
        {
          g_autofree char *a = test_value (ctx, r->terms[0]);
          g_autofree char *b = test_value (ctx, r->terms[1]);

          g_string_append_printf (line, " = max(%s, %s)", a, b);
        }
      if (r->data->inspection_divisor > 0)
        {
          g_autofree char *insp = test_value (ctx, r->inspection);
          g_autofree char *div = hl_note_sig (r->data->inspection_divisor, 3, ctx->loc);

          g_string_append_printf (line, _("; inspection pressure %s (%s: PT / %s)"), insp, r->data->inspection_clause,
                                  div);
        }
      else
        g_string_append_printf (line, "; %s", hl_note_core_text (r->data->no_inspection));
    }
  hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE, g_string_free (line, FALSE));
}

void
hl_note_test_pressure (GArray          *rows,
                       const HlNoteCtx *ctx)
{
  const HlSolution *s = ctx->s;
  const HlTestPressure *t = s->test;
  const HlField *rule_field = hl_field_find (HL_FIELD_OF_SHELL, "test-rule");
  const HlFieldChoice *chosen = hl_field_choice_by_value (rule_field, t->checked_rule);
  HlResult mawp = { s->test_mawp, NULL }, ps = { s->test_ps, NULL };
  g_autofree char *lsr = hl_note_sig (s->inputs.test_stress_ratio, 6, ctx->loc);
  g_autofree char *mawp_text = test_value (ctx, mawp);
  g_autofree char *ps_text = test_value (ctx, ps);
  g_autofree char *limit = test_value (ctx, t->limit);
  g_autofree char *yield = hl_note_quantity (ctx, s->yield, HL_ROW_STRESS, 6);

  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1,
               s->corroded ? _("Test pressure (corroded wall)") : _("Test pressure"));
  hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                     g_strdup_printf (_("Chosen rule: %s"), chosen != NULL ? _(chosen->sheet) : ""));
  hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                     g_strdup_printf (_("Stress ratio LSR (fa/fTd in EN words) = %s: allowable stress at test "
                                        "temperature over the one at design temperature, the lowest of the pressure "
                                        "parts' materials."), lsr));
  hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                     g_strdup_printf (_("MAWP the ASME rules multiply: %s%s"), mawp_text,
                                      s->test_mawp_is_design_pressure
                                        ? _(" (the design pressure in its place, UG-99(b) footnote)") : ""));
  hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                     g_strdup_printf (_("PS (PED) = %s%s"), ps_text,
                                      hl_quantity_si (s->inputs.test_ps, HL_KIND_STRESS) > 0
                                        ? "" : _(" (not given: the design pressure)")));
  for (int i = 0; i < HL_TEST_N_RULES; i++)
    test_rule (rows, ctx, &t->rules[i], s->test_sources[i]);
  hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, FALSE,
                     g_strdup_printf (_("Stress at the test pressure of the chosen rule, against %s = %s (yield "
                                        "strength as entered, %s, taken for the test temperature):"),
                                      hl_note_core_text (t->limit_words), limit, yield));
  test_stress (rows, ctx, &t->membrane);
  test_stress (rows, ctx, &t->peak);
  if (s->test_check == HL_CHECK_FAIL)
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, TRUE, 1,
                 _("Result: FAIL: the stress at the test pressure exceeds the limit; lower the test pressure (where "
                   "the rule allows) or thicken the wall."));
  else if (s->test_check == HL_CHECK_PASS)
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, TRUE, 1,
                 _("Result: PASS: the stress at the test pressure is within the limit."));
  else
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, TRUE, 1,
                 _("Result: NOT APPLICABLE: the stress at test could not be checked."));
  if (hl_result_ok (t->membrane.of_yield) && t->membrane.of_yield.value > 1.0)
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, TRUE, 1,
                 _("DANGER: at the test pressure the general membrane stress is above yield: the wall would deform "
                   "permanently in the test."));
  if (t->checked_rule == HL_TEST_UG100_PNEUMATIC)
    {
      g_autofree char *kj = hl_note_sig (t->stored_energy.value / 1e3, 4, ctx->loc);
      g_autofree char *energy = NULL;

      energy = hl_result_ok (t->stored_energy) ? g_strdup_printf ("%s" HL_NOTE_NBSP "kJ", kj)
                                               : g_strdup (hl_note_core_text (t->stored_energy.reason));

      hl_note_add_owned (rows, HL_NOTE_PARAGRAPH, TRUE,
                         g_strdup_printf (_("HAZARD: a pneumatic test stores far more energy than a hydrostatic one; "
                                            "a rupture throws fragments. Keep people clear; test with water where the "
                                            "vessel allows. Stored energy (ASME PCC-2, adiabatic): %s."), energy));
    }
  hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, FALSE, 1, _("UG-99(c), the calculated test pressure, is not covered."));
}
