/* hl-note-inputs.c — the note's inputs, as entered and where they come
 * from, and the limits of what the note covers
 *
 * The inputs walk the field table (hl-field-table.c), as the reader, the
 * writer and the editor do, so a new input reaches the note by itself.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-note-inputs"

#include "hl-note-private.h"
#include "hl-field-table.h"
#include "hl-report.h"

#include <string.h>

static const double cols_input[] = { 0.30, 0.24, 0.16, 0.30 };

#define KSI 6894757.293168

/* @q in the note's units: lengths and stresses as the results show
 * them, the modulus in GPa or ksi, a temperature in °C or °F */
static char *
converted (const HlNoteCtx *ctx,
           HlQuantity       q,
           HlQuantityKind   kind)
{
  double si = hl_quantity_si (q, kind);
  gboolean us = ctx->units == HL_UNIT_SYSTEM_US;
  g_autofree char *n = NULL;

  switch (kind)
    {
    case HL_KIND_LENGTH:
      return hl_note_quantity (ctx, si, HL_ROW_LENGTH, 6);
    case HL_KIND_PERCENT:
      return hl_note_quantity (ctx, si * 100, HL_ROW_PERCENT, 6);
    case HL_KIND_TEMPERATURE:
      n = hl_note_sig (us ? (si - 273.15) * 9.0 / 5.0 + 32.0 : si - 273.15, 6, ctx->loc);
      return g_strconcat (n, HL_NOTE_NBSP, us ? "°F" : "°C", NULL);
    case HL_KIND_MODULUS:
      n = hl_note_sig (us ? si / KSI : si / 1e9, 5, ctx->loc);
      return g_strconcat (n, HL_NOTE_NBSP, us ? "ksi" : "GPa", NULL);
    case HL_KIND_STRESS:
    case HL_KIND_RATIO:
    default:
      return hl_note_quantity (ctx, si, HL_ROW_STRESS, 6);
    }
}

/* where an input comes from: the material's source for its properties,
 * the allowable stress's source and temperature, the joint efficiency's
 * basis */
static char *
source_of (const HlNoteCtx *ctx,
           const HlField   *f)
{
  const HlShellInputs *in = &ctx->s->inputs;
  g_autofree char *temp = NULL;

  if (strcmp (f->element, "allowable-stress") == 0)
    {
      temp = converted (ctx, in->design_temperature, HL_KIND_TEMPERATURE);
      /* TRANSLATORS: the allowable stress's source, the design temperature */
      return g_strdup_printf (_("%s; at the design temperature %s"),
                              in->allowable_source[0] ? in->allowable_source : _("source not given"), temp);
    }
  if (f->owner == HL_FIELD_OF_MATERIAL && f->kind != HL_FIELD_TEXT)
    return g_strdup_printf (_("material %s; specification %s"), in->material.id,
                            in->material_spec[0] ? in->material_spec : _("not given"));
  if (strcmp (f->element, "joint-efficiency") == 0)
    return g_strdup_printf (_("as entered for the design basis %s"), hl_design_basis_name (in->design_basis));
  if (strcmp (f->element, "design-temperature") == 0)
    return g_strdup (_("the allowable stress is the one at this temperature"));
  return g_strdup ("");
}

/* the note's word for a choice; a name (von Mises) stays as it is */
static const char *
choice_text (const HlFieldChoice *c)
{
  if (c == NULL)
    return "";
  if (c->sheet == NULL)
    return c->report;
  return c->sheet_context != NULL ? g_dpgettext2 (GETTEXT_PACKAGE, c->sheet_context, c->sheet) : _(c->sheet);
}

/* one row of the field table; rows without a report label are not listed */
static void
input_field (GArray          *rows,
             const HlField   *f,
             const HlNoteCtx *ctx)
{
  const HlShellInputs *in = &ctx->s->inputs;
  gconstpointer slot = hl_field_cslot (f, in);
  g_autofree char *source = NULL;
  g_autofree char *typed = NULL;
  g_autofree char *shown = NULL;
  const char *label;

  /* the rows the report lists; the window's label stands in where the
   * sheet has none of its own (design temperature, specification …) */
  if (f->report == NULL || (f->is_size && f->size_kind != in->size_kind))
    return;
  label = f->sheet != NULL ? _(f->sheet) : f->label != NULL ? _(f->label) : f->report;
  source = source_of (ctx, f);
  if (f->kind == HL_FIELD_TEXT && f->owner == HL_FIELD_OF_MATERIAL)
    /* a material row: its name, with its id */
    typed = g_strdup_printf ("%s (%s)", (const char *) slot, in->material.id);
  else if (f->kind == HL_FIELD_TEXT)
    typed = g_strdup (((const char *) slot)[0] ? (const char *) slot : _("(not given)"));
  else if (f->kind == HL_FIELD_RATIO)
    typed = hl_note_sig (*(const double *) slot, 6, ctx->loc);
  else if (f->kind == HL_FIELD_CHOICE)
    typed = g_strdup (choice_text (hl_field_choice_by_value (f, hl_field_choice_get (f, slot))));
  else
    {
      const HlQuantity *q = slot;
      g_autofree char *n = hl_note_sig (q->value, 10, ctx->loc);

      typed = g_strdup_printf ("%s" HL_NOTE_NBSP "%s", n, q->unit);
      shown = converted (ctx, *q, hl_field_quantity_kind (f));
    }
  hl_note_add (rows, HL_NOTE_TABLE, cols_input, FALSE, 4, label, typed, shown, source);
  hl_note_row (rows, rows->len - 1)->note = TRUE;
}

void
hl_note_inputs (GArray          *rows,
                const HlNoteCtx *ctx)
{
  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Inputs"));
  hl_note_add (rows, HL_NOTE_TABLE, cols_input, TRUE, 4, _("Quantity"), _("As entered"), _("In the note's units"),
               _("Source"));
  hl_note_add (rows, HL_NOTE_TABLE, cols_input, FALSE, 4, _("Form"), hl_note_form_text (&ctx->s->inputs), "", "");
  for (guint i = 0; i < hl_field_count (); i++)
    input_field (rows, hl_field_nth (i), ctx);
}

/* What the note does not cover, said, so nobody reads it as more */
void
hl_note_limits (GArray          *rows,
                const HlNoteCtx *ctx)
{
  static const char *const limits[] = {
    N_("Static internal and external pressure only; no cyclic loading or fatigue."),
    N_("No thermal, local, wind, seismic or support loads, and no loads from piping or attachments."),
    N_("Closures (heads, covers), nozzles and openings and their reinforcement are not covered."),
    N_("Buckling under external pressure is not checked."),
    /* the thin-wall formulas take the radial stress as zero (the
     * membrane convention); some texts use −p/2, the mean through the
     * wall: say which, since it shifts the thin von Mises value */
    N_("Radial stress in the thin-wall formulas: taken as 0 (membrane convention), not −p/2 (the mean through "
       "the wall); the Lamé results carry the true radial stress, −p at the bore and 0 at an unloaded surface."),
  };
  g_autofree char *caution = hl_note_caution ();

  (void) ctx;
  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Assumptions and limits"));
  for (guint i = 0; i < G_N_ELEMENTS (limits); i++)
    hl_note_add (rows, HL_NOTE_BULLET, NULL, FALSE, 1, _(limits[i]));
  hl_note_add (rows, HL_NOTE_BULLET, NULL, FALSE, 1, caution);
}
