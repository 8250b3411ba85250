/* hl-checks-table.c — does the wall pass: the two verdicts and every method
 *
 * Two badges that never depend on each other: PASS / FAIL from the
 * design check (its utilisation and the governing clause beside it) and
 * THIN / THICK from the thin-wall comparison.  Under them one row per
 * method: required and available wall, allowable and design pressure,
 * utilisation and the result in words.  Everything comes from the
 * document's one solution, so the window says what the summary, the
 * report and the sheet say.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-checks-table"

#include "hl-config.h"
#include "hl-checks-table.h"
#include "hl-pressure-unit.h"
#include "hl-design-check.h"
#include "hl-document-follower.h"
#include "hl-figure-format.h"
#include "hl-number-format.h"
#include "hl-result-rows.h"

/* gettext through hl-figure-format.h (gi18n-lib) */
#include <math.h>

#define N_COLUMNS 7
#define DIGITS 4

struct _HlChecksTable
{
  GtkWidget     parent_instance;

  GtkWidget    *design_badge;
  GtkWidget    *design_text;
  GtkWidget    *thin_badge;
  GtkWidget    *thin_text;
  GtkWidget    *floors_text;   /* yield and burst, in words */
  GtkGrid      *grid;
  GtkWidget    *cells[HL_N_METHODS + 1][N_COLUMNS];

  HlDocument   *document;
  GSignalGroup *follower;
  gboolean      follows_settings;   /* redrawn when the pressure unit changes */
};

G_DEFINE_FINAL_TYPE (HlChecksTable, hl_checks_table, GTK_TYPE_WIDGET)

/* a badge says its verdict in a word; the colour only repeats it */
static void
set_badge (GtkWidget  *badge,
           const char *word,
           const char *kind)
{
  static const char *const kinds[] = { "pass", "fail", "not-applicable" };

  gtk_label_set_text (GTK_LABEL (badge), word);
  for (guint i = 0; i < G_N_ELEMENTS (kinds); i++)
    if (g_strcmp0 (kinds[i], kind) == 0)
      gtk_widget_add_css_class (badge, kinds[i]);
    else
      gtk_widget_remove_css_class (badge, kinds[i]);
}

/* @value (SI) in @unit of @kind: "12.59 mm", "9.531 bar" */
static char *
in_unit (double          value,
         HlQuantityKind  kind,
         const char     *unit)
{
  g_autofree char *n = NULL;

  if (!isfinite (value))
    return g_strdup ("—");
  n = hl_format_display (value / hl_unit_factor (kind, unit), DIGITS);
  return g_strdup_printf ("%s %s", n, unit);
}

static char *
percent (double fraction)
{
  g_autofree char *n = NULL;

  if (!isfinite (fraction))
    return g_strdup ("—");
  n = hl_format_display (100 * fraction, DIGITS);
  return g_strdup_printf ("%s %%", n);
}

static const char *
result_word (HlCheckResult result)
{
  switch (result)
    {
    case HL_CHECK_PASS:
      return _("PASS");
    case HL_CHECK_FAIL:
      return _("FAIL");
    case HL_CHECK_NOT_APPLICABLE:
    default:
      return _("NOT APPLICABLE");
    }
}

static const char *
result_kind (HlCheckResult result)
{
  return result == HL_CHECK_PASS ? "pass" : result == HL_CHECK_FAIL ? "fail" : "not-applicable";
}

static void
set_cell (HlChecksTable *self,
          guint          row,
          guint          column,
          const char    *text,
          const char    *tooltip)
{
  GtkWidget *cell = self->cells[row][column];

  gtk_label_set_text (GTK_LABEL (cell), text);
  gtk_widget_set_tooltip_text (cell, tooltip);
}

static void
show_method (HlChecksTable      *self,
             const HlSolution   *sol,
             guint               m,
             HlUnitSystem        units)
{
  const HlMethodCheck *mc = &sol->check.methods[m];
  guint row = m + 1;
  const char *l_unit = hl_row_unit (HL_ROW_LENGTH, units);
  g_autofree char *required = in_unit (mc->required, HL_KIND_LENGTH, l_unit);
  g_autofree char *available = in_unit (mc->available, HL_KIND_LENGTH, l_unit);
  const char *p_unit = hl_pressure_unit_shown (NULL, &sol->inputs, units);
  /* pressures in the preference's unit (hl-pressure-unit.h) */
  g_autofree char *mawp = in_unit (mc->mawp, HL_KIND_STRESS, p_unit);
  g_autofree char *design = in_unit (mc->design_pressure, HL_KIND_STRESS, p_unit);
  g_autofree char *u_p = percent (mc->utilisation_pressure);
  g_autofree char *u_t = percent (mc->utilisation_thickness);
  /* TRANSLATORS: utilisation by pressure, then by thickness */
  g_autofree char *u = g_strdup_printf (_("%s · %s"), u_p, u_t);
  g_autofree char *name = NULL;
  g_autofree char *reason = hl_figure_check_reason (mc, units, TRUE);

  /* the design basis is the method that decides */
  name = m == (guint) sol->check.basis ? g_strdup_printf (_("%s (design basis)"), _(mc->name)) : g_strdup (_(mc->name));
  set_cell (self, row, 0, name, mc->clause);
  set_cell (self, row, 1, required, _("nominal thickness needed, corrosion allowance and mill undertolerance included"));
  set_cell (self, row, 2, available, sol->check.mill_text[0] != '\0' ? sol->check.mill_text : NULL);
  set_cell (self, row, 3, mawp, _("of the available wall, internal pressure raised, external held"));
  set_cell (self, row, 4, design, NULL);
  set_cell (self, row, 5, u, _("design pressure / allowable pressure · required / available thickness"));
  set_cell (self, row, 6, result_word (mc->result), reason);
  for (guint c = 0; c < N_COLUMNS; c++)
    {
      gtk_widget_remove_css_class (self->cells[row][c], "hl-basis");
      if (m == (guint) sol->check.basis)
        gtk_widget_add_css_class (self->cells[row][c], "hl-basis");
    }
  set_badge (self->cells[row][6], result_word (mc->result), result_kind (mc->result));
}

/* how the thin-wall value compares with the Lamé peak, in words */
static char *
thin_words (const HlSolution *sol)
{
  g_autofree char *by = hl_format_display (sol->thin_wording_by, 3);

  switch (sol->thin_wording)
    {
    case HL_THIN_WORDING_OPPOSITE_SIGN:
      return g_strdup (_("has the opposite sign of the Lamé peak (unconservative)"));
    case HL_THIN_WORDING_UNDER:
      return g_strdup_printf (_("underestimates the peak by %s %% (unconservative)"), by);
    case HL_THIN_WORDING_OVER:
      return g_strdup_printf (_("overestimates the peak by %s %% (conservative)"), by);
    case HL_THIN_WORDING_EQUAL:
      return g_strdup (_("equals the peak"));
    case HL_THIN_WORDING_NOT_COMPARABLE:
    default:
      return g_strdup (_("cannot be compared with the Lamé peak"));
    }
}

static void
show_verdicts (HlChecksTable    *self,
               const HlSolution *sol,
               HlUnitSystem      units)
{
  const HlDesignCheck *c = &sol->check;
  const HlMethodCheck *b = &c->methods[c->basis];
  g_autofree char *u = percent (c->utilisation);
  g_autofree char *design = NULL;
  g_autofree char *floors = NULL;
  g_autofree char *why = hl_figure_check_reason (b, units, TRUE);

  set_badge (self->design_badge, result_word (c->verdict), result_kind (c->verdict));
  if (c->bursts || c->yields)
    /* TRANSLATORS: %s is the design basis ("ASME VIII-1 UG-27") */
    design = g_strdup_printf (_("Fails whatever the basis (%s): see below"), _(b->name));
  else if (b->result == HL_CHECK_NOT_APPLICABLE)
    /* TRANSLATORS: %s is the design basis ("ASME VIII-1 UG-27") */
    design = g_strdup_printf (_("Not shown to pass: the design basis %s does not apply"), _(b->name));
  else
    /* TRANSLATORS: utilisation in percent, the governing clause, the design basis */
    design = g_strdup_printf (_("Utilisation %s by %s (design basis %s)"), u, c->governing, _(b->name));
  gtk_label_set_text (GTK_LABEL (self->design_text), design);

  if (c->bursts)
    floors = g_strdup (_("DANGER: the wall would burst: the design pressure is above the plastic collapse pressure."));
  else if (c->yields)
    floors = g_strdup (_("DANGER: the wall yields at the bore: the peak equivalent stress is above the yield strength."));
  else if (b->result == HL_CHECK_NOT_APPLICABLE)
    /* TRANSLATORS: %s is the reason the design basis does not apply */
    floors = g_strdup_printf (_("Not shown to pass: the design basis does not apply: %s"), why);
  else if (b->result == HL_CHECK_FAIL)
    floors = g_strdup_printf (_("Fails: %s"), why);
  gtk_widget_set_visible (self->floors_text, floors != NULL);
  gtk_label_set_text (GTK_LABEL (self->floors_text), floors != NULL ? floors : "");

  if (!isfinite (sol->thin_wall_error.value) && !isfinite (sol->thin_wall_error_equivalent.value))
    set_badge (self->thin_badge, _("N/A"), "not-applicable");
  else
    set_badge (self->thin_badge, sol->is_thin ? _("THIN") : _("THICK"), sol->is_thin ? "pass" : "fail");
  {
    g_autofree char *words = thin_words (sol);
    g_autofree char *text = sol->thin_governing == HL_MEASURE_EQUIVALENT
                              /* TRANSLATORS: "underestimates the peak by 30.6 % (unconservative)" */
                              ? g_strdup_printf (_("Thin-wall von Mises stress %s"), words)
                              : g_strdup_printf (_("Thin-wall hoop stress %s"), words);

    gtk_label_set_text (GTK_LABEL (self->thin_text), text);
  }
}

static void
on_document_changed_cb (HlDocument    *document,
                        HlChecksTable *self)
{
  const HlSolution *sol = hl_document_get_solution (document);
  HlUnitSystem units = hl_document_get_project (document)->display_units;

  gtk_widget_set_visible (GTK_WIDGET (self), sol != NULL);
  if (sol == NULL)
    return;
  show_verdicts (self, sol, units);
  for (guint m = 0; m < HL_N_METHODS; m++)
    show_method (self, sol, m, units);
}

static void
on_pressure_unit_changed_cb (GSettings     *settings,
                             const char    *key,
                             HlChecksTable *self)
{
  if (self->document != NULL)
    on_document_changed_cb (self->document, self);
}

static GtkWidget *
label (const char *text,
       float       xalign,
       const char *css)
{
  GtkWidget *l = gtk_label_new (text);

  gtk_label_set_xalign (GTK_LABEL (l), xalign);
  if (css != NULL)
    gtk_widget_add_css_class (l, css);
  return l;
}

static GtkWidget *
verdict_line (GtkWidget **badge,
              GtkWidget **text)
{
  GtkWidget *box = gtk_box_new (GTK_ORIENTATION_HORIZONTAL, 8);

  *badge = label (NULL, 0.5f, "hl-badge");
  gtk_label_set_width_chars (GTK_LABEL (*badge), 7);
  *text = label (NULL, 0.0f, NULL);
  gtk_label_set_wrap (GTK_LABEL (*text), TRUE);
  gtk_widget_set_hexpand (*text, TRUE);
  gtk_box_append (GTK_BOX (box), *badge);
  gtk_box_append (GTK_BOX (box), *text);
  return box;
}

static void
build (HlChecksTable *self)
{
  static const char *const headings[N_COLUMNS] = {
    N_("Method"), N_("Required t"), N_("Available t"), N_("Allowable P"), N_("Design P"),
    N_("Utilisation P · t"), N_("Result"),
  };
  GtkWidget *box = gtk_box_new (GTK_ORIENTATION_VERTICAL, 4);
  GtkWidget *line;

  gtk_widget_set_margin_start (box, 12);
  gtk_widget_set_margin_end (box, 12);
  gtk_widget_set_margin_top (box, 6);
  gtk_widget_set_margin_bottom (box, 6);
  line = verdict_line (&self->design_badge, &self->design_text);
  gtk_box_append (GTK_BOX (box), line);
  line = verdict_line (&self->thin_badge, &self->thin_text);
  gtk_box_append (GTK_BOX (box), line);
  self->floors_text = label (NULL, 0.0f, "error");
  gtk_label_set_wrap (GTK_LABEL (self->floors_text), TRUE);
  gtk_box_append (GTK_BOX (box), self->floors_text);

  self->grid = GTK_GRID (gtk_grid_new ());
  gtk_grid_set_column_spacing (self->grid, 12);
  gtk_grid_set_row_spacing (self->grid, 2);
  gtk_widget_set_margin_top (GTK_WIDGET (self->grid), 4);
  for (guint c = 0; c < N_COLUMNS; c++)
    {
      self->cells[0][c] = label (_(headings[c]), c == 0 ? 0.0f : 1.0f, "dim-label");
      gtk_grid_attach (self->grid, self->cells[0][c], (int) c, 0, 1, 1);
      for (guint r = 1; r <= HL_N_METHODS; r++)
        {
          self->cells[r][c] = label (NULL, c == 0 ? 0.0f : c == N_COLUMNS - 1 ? 0.5f : 1.0f,
                                     c == 0 || c == N_COLUMNS - 1 ? NULL : "numeric");
          gtk_grid_attach (self->grid, self->cells[r][c], (int) c, (int) r, 1, 1);
        }
    }
  for (guint r = 1; r <= HL_N_METHODS; r++)
    gtk_widget_add_css_class (self->cells[r][N_COLUMNS - 1], "hl-badge");
  /* the method's name gives way first, then the headings, so the table
   * never widens the window past the figure (German headings are long) */
  for (guint r = 0; r <= HL_N_METHODS; r++)
    {
      gtk_label_set_ellipsize (GTK_LABEL (self->cells[r][0]), PANGO_ELLIPSIZE_END);
      gtk_widget_set_hexpand (self->cells[r][0], TRUE);
    }
  for (guint c = 1; c < N_COLUMNS; c++)
    gtk_label_set_ellipsize (GTK_LABEL (self->cells[0][c]), PANGO_ELLIPSIZE_END);
  gtk_box_append (GTK_BOX (box), GTK_WIDGET (self->grid));
  gtk_widget_set_parent (box, GTK_WIDGET (self));
}

static void
hl_checks_table_dispose (GObject *object)
{
  HlChecksTable *self = HL_CHECKS_TABLE (object);
  GtkWidget *child;

  g_clear_object (&self->follower);
  g_clear_object (&self->document);
  while ((child = gtk_widget_get_first_child (GTK_WIDGET (self))) != NULL)
    gtk_widget_unparent (child);
  G_OBJECT_CLASS (hl_checks_table_parent_class)->dispose (object);
}

static void
hl_checks_table_class_init (HlChecksTableClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = hl_checks_table_dispose;
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "hl-checks");
  gtk_widget_class_set_accessible_role (widget_class, GTK_ACCESSIBLE_ROLE_GROUP);
}

static void
hl_checks_table_init (HlChecksTable *self)
{
  build (self);
  gtk_accessible_update_property (GTK_ACCESSIBLE (self), GTK_ACCESSIBLE_PROPERTY_LABEL, _("Design check"), -1);
  self->follower = hl_document_follower_new ((HlDocumentRefresh) on_document_changed_cb, self);
}

void
hl_checks_table_set_document (HlChecksTable *self,
                              HlDocument    *document)
{
  g_return_if_fail (HL_IS_CHECKS_TABLE (self));

  g_set_object (&self->document, document);
  g_signal_group_set_target (self->follower, document);
  /* the preference of the pressure unit applies at once */
  if (!self->follows_settings && hl_pressure_unit_settings () != NULL)
    {
      g_signal_connect_object (hl_pressure_unit_settings (), "changed::result-pressure-unit",
                               G_CALLBACK (on_pressure_unit_changed_cb), self, 0);
      self->follows_settings = TRUE;
    }
}

const char *
hl_checks_table_get_design_word (HlChecksTable *self)
{
  g_return_val_if_fail (HL_IS_CHECKS_TABLE (self), NULL);
  return gtk_label_get_text (GTK_LABEL (self->design_badge));
}

const char *
hl_checks_table_get_thin_word (HlChecksTable *self)
{
  g_return_val_if_fail (HL_IS_CHECKS_TABLE (self), NULL);
  return gtk_label_get_text (GTK_LABEL (self->thin_badge));
}

const char *
hl_checks_table_get_verdict_text (HlChecksTable *self)
{
  g_return_val_if_fail (HL_IS_CHECKS_TABLE (self), NULL);
  return gtk_label_get_text (GTK_LABEL (self->design_text));
}

const char *
hl_checks_table_get_cell (HlChecksTable *self,
                          guint          row,
                          guint          column)
{
  g_return_val_if_fail (HL_IS_CHECKS_TABLE (self), NULL);
  if (row > HL_N_METHODS || column >= N_COLUMNS)
    return NULL;
  return gtk_label_get_text (GTK_LABEL (self->cells[row][column]));
}

const char *
hl_checks_table_get_reason_text (HlChecksTable *self)
{
  g_return_val_if_fail (HL_IS_CHECKS_TABLE (self), NULL);
  if (!gtk_widget_get_visible (self->floors_text))
    return NULL;
  return gtk_label_get_text (GTK_LABEL (self->floors_text));
}

const char *
hl_checks_table_get_thin_text (HlChecksTable *self)
{
  g_return_val_if_fail (HL_IS_CHECKS_TABLE (self), NULL);
  return gtk_label_get_text (GTK_LABEL (self->thin_text));
}
