/* hl-note-project.c — the first page of a whole-project note: every
 * shell on one line
 *
 * The values are those of `hoopline --summary` (hl_result_rows() and
 * hl_row_format() with the summary's digits), so a checker can hold the
 * two side by side.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-note-project"

#include "hl-note-private.h"
#include "hl-report.h"

#include <string.h>

/* the digits of `hoopline --summary` (hl-report-summary.c) */
#define SUMMARY_DIGITS 9

static const double cols_pair[] = { 0.30, 0.70 };
static const double cols_shells[] = { 0.17, 0.12, 0.15, 0.12, 0.13, 0.12, 0.09, 0.10 };

static char *
row_text (GArray       *rows,
          const char   *key,
          HlUnitSystem  units,
          gboolean      loc)
{
  const HlResultRow *r = hl_result_rows_find (rows, key);

  return r != NULL ? hl_row_format (r, units, SUMMARY_DIGITS, !loc) : g_strdup ("—");
}

static char *
size_text (const HlShellInputs *in,
           gboolean             loc)
{
  static const char *const symbols[] = { "Di", "Do", "Ri", "Ro" };
  g_autofree char *size = hl_note_sig (in->size.value, 10, loc);
  g_autofree char *wall = hl_note_sig (in->wall_thickness.value, 10, loc);
  const char *symbol = (guint) in->size_kind < G_N_ELEMENTS (symbols) ? symbols[in->size_kind] : "";

  /* as entered: the size in the unit the user typed */
  return g_strdup_printf ("%s %s" HL_NOTE_NBSP "%s, t %s" HL_NOTE_NBSP "%s", symbol, size, in->size.unit, wall,
                          in->wall_thickness.unit);
}

static void
shell_line (GArray           *rows,
            const HlSolution *s,
            HlUnitSystem      units,
            gboolean          loc)
{
  g_autoptr(GArray) results = hl_result_rows (s);
  const HlDesignCheck *c = &s->check;
  HlResultRow design = { "design_pressure", "", HL_ROW_STRESS, { c->methods[c->basis].design_pressure, NULL }, NULL, NULL };
  g_autofree char *shell = g_strdup_printf ("%s (%s)", s->inputs.name, s->inputs.id);
  g_autofree char *size = size_text (&s->inputs, loc);
  g_autofree char *p = hl_row_format (&design, units, SUMMARY_DIGITS, !loc);
  g_autofree char *mawp_key = g_strdup_printf ("max_allowable_pressure_%s", c->methods[c->basis].key);
  g_autofree char *mawp = row_text (results, mawp_key, units, loc);
  g_autofree char *u = row_text (results, "utilisation", units, loc);
  g_autofree char *verdict = g_ascii_strup (hl_result_rows_find (results, "design_verdict")->word, -1);
  g_autofree char *thin = g_ascii_strup (hl_result_rows_find (results, "thin_wall_verdict")->word, -1);

  /* the verdicts in words, upper case, as the summary's words */
  hl_note_add (rows, HL_NOTE_TABLE, cols_shells, FALSE, HL_NOTE_SUMMARY_N_COLUMNS, shell,
               hl_note_form_text (&s->inputs), size, p, mawp, u, verdict, thin);
}

GArray *
hl_note_project_summary (const HlProject *project,
                         GPtrArray       *solutions,
                         HlUnitSystem     units,
                         gboolean         locale_numbers,
                         const char      *export_date)
{
  GArray *rows = hl_note_new ();
  g_autofree char *today = NULL;
  g_autofree char *revision = hl_note_revision_label (project);
  g_autofree char *caution = hl_note_caution ();
  g_autofree char *count = NULL;

  g_return_val_if_fail (solutions != NULL, rows);
  if (export_date == NULL)
    {
      g_autoptr(GDateTime) now = g_date_time_new_now_local ();

      export_date = today = g_date_time_format (now, "%Y-%m-%d");
    }
  count = g_strdup_printf (g_dngettext (GETTEXT_PACKAGE, "%u shell", "%u shells", solutions->len), solutions->len);
  hl_note_add (rows, HL_NOTE_TITLE, NULL, FALSE, 2, _("Design note"),
               project != NULL && project->title != NULL && project->title[0] ? project->title : _("(untitled)"));
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Engineer"),
               project != NULL && project->engineer != NULL && project->engineer[0] ? project->engineer
                                                                                   : _("(not given)"));
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Revision"), revision);
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Shells"), count);
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Units"),
               _(hl_unit_system_words (units)));
  hl_note_add (rows, HL_NOTE_TABLE, cols_pair, FALSE, 2, _("Exported"), export_date);
  if (project != NULL && project->description != NULL && project->description[0])
    hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, FALSE, 1, project->description);
  hl_note_add (rows, HL_NOTE_BOX, NULL, FALSE, 1, caution);
  hl_note_add (rows, HL_NOTE_HEADING, NULL, FALSE, 1, _("Project summary"));
  hl_note_add (rows, HL_NOTE_TABLE, cols_shells, TRUE, HL_NOTE_SUMMARY_N_COLUMNS, _("Shell (id)"), _("Form"),
               _("Size as entered"), _("Design P"), _("MAWP (design basis)"), _("Utilisation"),
               _("Design verdict"), _("Thin / thick"));
  for (guint i = 0; i < solutions->len; i++)
    shell_line (rows, g_ptr_array_index (solutions, i), units, locale_numbers);
  hl_note_add (rows, HL_NOTE_PARAGRAPH, NULL, FALSE, 1,
               _("Each shell's calculation sheet follows, in this order (in the PDF after the shell's figure). MAWP and utilisation are those of "
                 "the shell's design basis, on the corroded wall; the verdicts are the design check's and the "
                 "thin-wall check's."));
  return rows;
}
