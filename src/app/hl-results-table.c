/* hl-results-table.c — the key numbers of the selected shell, copyable
 *
 * The rows come from hl_result_rows(), the list the summary and the
 * report use, so the window never shows a number they do not.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-results-table"

#include "hl-config.h"
#include "hl-results-table.h"
#include "hl-pressure-unit.h"
#include "hl-document-follower.h"
#include "hl-design-check.h"
#include "hl-result-groups.h"
#include "hl-result-rows.h"

#include <glib/gi18n.h>
#include <math.h>
#include <string.h>

#define DIGITS 4

struct _HlResultsTable
{
  GtkWidget   parent_instance;

  GtkWidget  *scroller;
  GtkWidget  *columns;            /* two columns of groups */
  GtkWidget  *column[2];
  GtkWidget  *groups[HL_N_GROUPS]; /* GtkExpander, or NULL while empty */
  GtkGrid    *grids[HL_N_GROUPS];
  guint       group_rows[HL_N_GROUPS];
  GtkWidget  *empty_label;
  GPtrArray  *keys;               /* the row keys the cells were made for */

  HlDocument *document;
  GSignalGroup  *follower;      /* calls on_document_changed_cb */
  gboolean    follows_settings;   /* rebuilt when the pressure unit changes */
  GString    *text;
  GPtrArray  *names;      /* GtkLabel *, one per row, owned by the grid */
  GPtrArray  *values;
};

G_DEFINE_FINAL_TYPE (HlResultsTable, hl_results_table, GTK_TYPE_WIDGET)

/* The figure and the list above already name the shell */
static gboolean
skip_row (const HlResultRow *row)
{
  return strcmp (row->key, "shell") == 0 || strcmp (row->key, "id") == 0;
}

/* The checks table above the groups shows the design check (verdict,
 * clause, utilisation, available wall, each method): its rows go only
 * into the copied text, so every other row fits 1280 × 800 unscrolled */
static gboolean
in_groups (const HlResultRow *row)
{
  return !skip_row (row) && hl_result_group_of (row->key) != HL_GROUP_DESIGN;
}

static void
row_value (const HlResultRow *row,
           HlUnitSystem       units,
           const char        *pressure_unit,
           char             **number,
           const char       **unit)
{
  /* the core marks its words and reasons with N_() and never
   * translates; shell name and id, user text, are skipped above */
  if (row->kind == HL_ROW_WORD || !hl_result_ok (row->result))
    {
      *number = row->kind == HL_ROW_WORD ? g_strdup (row->word != NULL && row->word[0] ? _(row->word) : "")
                : g_strdup_printf (_("n/a (%s)"), _(row->result.reason != NULL ? row->result.reason
                                                                              : "not computable"));
      *unit = "";
      return;
    }
  if (row->kind == HL_ROW_STRESS && hl_result_is_pressure (row->key))
    {
      /* pressures in the preference's unit, stresses in the system's */
      *number = hl_format_display (row->result.value / hl_unit_factor (HL_KIND_STRESS, pressure_unit), DIGITS);
      *unit = pressure_unit;
      return;
    }
  *number = hl_format_display (hl_row_convert (row->kind, units, row->result.value), DIGITS);
  *unit = hl_row_unit (row->kind, units);
}

static GtkWidget *
cell (const char *text,
      float       xalign,
      const char *css)
{
  GtkWidget *label = gtk_label_new (text);

  gtk_label_set_xalign (GTK_LABEL (label), xalign);
  if (css != NULL)
    gtk_widget_add_css_class (label, css);
  return label;
}

static gboolean
same_keys (HlResultsTable *self,
           GArray         *rows)
{
  guint n = 0;

  for (guint i = 0; i < rows->len; i++)
    {
      const HlResultRow *row = &g_array_index (rows, HlResultRow, i);

      if (!in_groups (row))
        continue;
      if (n >= self->keys->len || strcmp (g_ptr_array_index (self->keys, n), row->key) != 0)
        return FALSE;
      n++;
    }
  return n == self->keys->len;
}

/* A group folds: its heading stays, with the number of rows it holds */
static GtkWidget *
make_group (HlResultsTable *self,
            HlResultGroup   group)
{
  GtkWidget *expander = gtk_expander_new (NULL);
  GtkWidget *title = gtk_label_new (_(hl_result_group_title (group)));
  GtkWidget *grid = gtk_grid_new ();

  gtk_widget_add_css_class (title, "heading");
  /* a long title wraps, or it would set the width of all three columns */
  gtk_label_set_wrap (GTK_LABEL (title), TRUE);
  gtk_label_set_xalign (GTK_LABEL (title), 0);
  gtk_expander_set_label_widget (GTK_EXPANDER (expander), title);
  gtk_expander_set_expanded (GTK_EXPANDER (expander), TRUE);
  gtk_grid_set_column_spacing (GTK_GRID (grid), 12);
  gtk_grid_set_row_spacing (GTK_GRID (grid), 0);
  gtk_widget_set_margin_start (grid, 18);
  gtk_widget_set_margin_top (grid, 2);
  gtk_expander_set_child (GTK_EXPANDER (expander), grid);
  gtk_widget_set_valign (expander, GTK_ALIGN_START);
  self->grids[group] = GTK_GRID (grid);
  self->group_rows[group] = 0;
  return expander;
}

/* Labels are made once per list of rows and then only relabelled:
 * typing a value must not rebuild seventy widgets per key.  A group
 * keeps whether the user folded it. */
static void
ensure_cells (HlResultsTable *self,
              GArray         *rows)
{
  gboolean expanded[HL_N_GROUPS];
  GtkWidget *child;

  if (same_keys (self, rows))
    return;
  for (guint g = 0; g < HL_N_GROUPS; g++)
    {
      expanded[g] = self->groups[g] == NULL || gtk_expander_get_expanded (GTK_EXPANDER (self->groups[g]));
      self->groups[g] = NULL;
      self->grids[g] = NULL;
    }
  for (guint c = 0; c < 2; c++)
    while ((child = gtk_widget_get_first_child (self->column[c])) != NULL)
      gtk_box_remove (GTK_BOX (self->column[c]), child);
  g_ptr_array_set_size (self->names, 0);
  g_ptr_array_set_size (self->values, 0);
  g_ptr_array_set_size (self->keys, 0);
  for (guint i = 0; i < rows->len; i++)
    {
      const HlResultRow *row = &g_array_index (rows, HlResultRow, i);
      HlResultGroup g;
      GtkWidget *name, *value;

      if (!in_groups (row))
        continue;
      g = hl_result_group_of (row->key);
      if (self->groups[g] == NULL)
        self->groups[g] = make_group (self, g);
      name = cell (NULL, 0.0f, NULL);
      /* long labels wrap rather than widen their column */
      gtk_label_set_wrap (GTK_LABEL (name), TRUE);
      gtk_label_set_max_width_chars (GTK_LABEL (name), 44);
      gtk_widget_set_hexpand (name, TRUE);
      value = cell (NULL, 1.0f, "numeric");
      gtk_label_set_ellipsize (GTK_LABEL (value), PANGO_ELLIPSIZE_END);
      gtk_label_set_max_width_chars (GTK_LABEL (value), 18);
      gtk_widget_set_valign (value, GTK_ALIGN_START);
      gtk_grid_attach (self->grids[g], name, 0, (int) self->group_rows[g], 1, 1);
      gtk_grid_attach (self->grids[g], value, 1, (int) self->group_rows[g], 1, 1);
      self->group_rows[g]++;
      g_ptr_array_add (self->names, name);
      g_ptr_array_add (self->values, value);
      g_ptr_array_add (self->keys, g_strdup (row->key));
    }
  for (guint g = 0; g < HL_N_GROUPS; g++)
    if (self->groups[g] != NULL)
      {
        /* the columns come out about as tall as each other */
        gboolean right = g == HL_GROUP_STRESSES || g == HL_GROUP_SIZING;

        gtk_expander_set_expanded (GTK_EXPANDER (self->groups[g]), expanded[g]);
        gtk_box_append (GTK_BOX (self->column[right]), self->groups[g]);
      }
}

/* GtkLabel skips a text equal to its own, a tooltip it does not: the
 * row's source is a fixed text of the core, so the one it shows is
 * known by its address, and the reason of an n/a changes only with it */
static void
set_tooltip (GtkWidget  *label,
             const char *key,
             const char *tooltip)
{
  if (g_object_get_data (G_OBJECT (label), "hl-tooltip") == key)
    return;
  g_object_set_data (G_OBJECT (label), "hl-tooltip", (gpointer) key);
  gtk_widget_set_tooltip_text (label, tooltip);
}

static void
rebuild (HlResultsTable *self)
{
  const HlSolution *solution = hl_document_get_solution (self->document);
  HlUnitSystem units = hl_document_get_project (self->document)->display_units;
  const char *pressure_unit = NULL;
  g_autoptr(GArray) rows = NULL;
  guint n = 0;

  g_string_truncate (self->text, 0);
  gtk_widget_set_visible (self->empty_label, solution == NULL);
  gtk_widget_set_visible (self->scroller, solution != NULL);
  if (solution == NULL)
    return;

  pressure_unit = hl_pressure_unit_shown (NULL, &solution->inputs, units);
  rows = hl_result_rows (solution);
  ensure_cells (self, rows);
  for (guint i = 0; i < rows->len; i++)
    {
      const HlResultRow *row = &g_array_index (rows, HlResultRow, i);
      g_autofree char *number = NULL;
      g_autofree char *shown = NULL;
      const char *unit;
      GtkLabel *name, *value;

      if (skip_row (row))
        continue;
      row_value (row, units, pressure_unit, &number, &unit);
      /* the summary's stable words read better as the names they stand for */
      if (strcmp (row->key, "design_basis") == 0)
        {
          g_free (number);
          number = g_strdup (hl_design_basis_name (solution->check.basis));
        }
      else if (strcmp (row->key, "design_verdict") == 0)
        {
          g_free (number);
          number = g_strdup (solution->check.verdict == HL_CHECK_PASS ? _("PASS") : _("FAIL"));
        }
      /* a long "n/a (why)" would widen the whole column: a dash stands
       * for it, the reason goes to the tooltip and whole into the copy */
      if (row->kind != HL_ROW_WORD && !hl_result_ok (row->result))
        shown = g_strdup ("—");
      else
        shown = unit[0] != '\0' ? g_strdup_printf ("%s %s", number, unit) : g_strdup (number);
      g_string_append_printf (self->text, "%s\t%s\t%s\n", _(row->label), number, unit);
      if (!in_groups (row))
        continue;
      name = g_ptr_array_index (self->names, n);
      value = g_ptr_array_index (self->values, n);
      gtk_label_set_text (name, _(row->label));
      set_tooltip (GTK_WIDGET (name), row->source, row->source);
      gtk_label_set_text (value, shown);
      if (strcmp (shown, number) != 0)
        set_tooltip (GTK_WIDGET (value), row->result.reason != NULL ? row->result.reason : "", number);
      else
        set_tooltip (GTK_WIDGET (value), NULL, NULL);
      n++;
    }
}

static void
on_document_changed_cb (HlDocument     *document,
                        HlResultsTable *self)
{
  rebuild (self);
}

static void
hl_results_table_dispose (GObject *object)
{
  HlResultsTable *self = HL_RESULTS_TABLE (object);

  g_clear_object (&self->follower);
  g_clear_object (&self->document);
  g_clear_pointer (&self->scroller, gtk_widget_unparent);
  g_clear_pointer (&self->empty_label, gtk_widget_unparent);
  G_OBJECT_CLASS (hl_results_table_parent_class)->dispose (object);
}

static void
hl_results_table_finalize (GObject *object)
{
  HlResultsTable *self = HL_RESULTS_TABLE (object);

  g_string_free (self->text, TRUE);
  g_ptr_array_unref (self->names);
  g_ptr_array_unref (self->values);
  g_ptr_array_unref (self->keys);
  G_OBJECT_CLASS (hl_results_table_parent_class)->finalize (object);
}

static void
hl_results_table_class_init (HlResultsTableClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = hl_results_table_dispose;
  object_class->finalize = hl_results_table_finalize;
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BOX_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "hl-results");
  gtk_widget_class_set_accessible_role (widget_class, GTK_ACCESSIBLE_ROLE_GROUP);
}

static void
hl_results_table_init (HlResultsTable *self)
{
  GtkLayoutManager *layout = gtk_widget_get_layout_manager (GTK_WIDGET (self));

  gtk_orientable_set_orientation (GTK_ORIENTABLE (layout), GTK_ORIENTATION_VERTICAL);
  self->text = g_string_new (NULL);
  self->names = g_ptr_array_new ();
  self->values = g_ptr_array_new ();

  self->keys = g_ptr_array_new_with_free_func (g_free);
  self->columns = gtk_box_new (GTK_ORIENTATION_HORIZONTAL, 24);
  gtk_box_set_homogeneous (GTK_BOX (self->columns), TRUE);
  for (guint c = 0; c < 2; c++)
    {
      self->column[c] = gtk_box_new (GTK_ORIENTATION_VERTICAL, 6);
      gtk_box_append (GTK_BOX (self->columns), self->column[c]);
    }
  gtk_widget_set_margin_start (self->columns, 12);
  gtk_widget_set_margin_end (self->columns, 12);
  gtk_widget_set_margin_top (self->columns, 4);
  gtk_widget_set_margin_bottom (self->columns, 4);
  self->scroller = gtk_scrolled_window_new ();
  gtk_scrolled_window_set_policy (GTK_SCROLLED_WINDOW (self->scroller), GTK_POLICY_NEVER,
                                  GTK_POLICY_AUTOMATIC);
  gtk_scrolled_window_set_child (GTK_SCROLLED_WINDOW (self->scroller), self->columns);
  gtk_widget_set_vexpand (self->scroller, TRUE);
  gtk_widget_set_parent (self->scroller, GTK_WIDGET (self));

  self->empty_label = gtk_label_new (_("No results while a value is missing or wrong."));
  gtk_widget_add_css_class (self->empty_label, "dim-label");
  gtk_widget_set_vexpand (self->empty_label, TRUE);
  gtk_widget_set_parent (self->empty_label, GTK_WIDGET (self));
  gtk_accessible_update_property (GTK_ACCESSIBLE (self), GTK_ACCESSIBLE_PROPERTY_LABEL,
                                  _("Results"), -1);
  self->follower = hl_document_follower_new ((HlDocumentRefresh) on_document_changed_cb, self);
}

void
hl_results_table_set_document (HlResultsTable *self,
                               HlDocument     *document)
{
  g_return_if_fail (HL_IS_RESULTS_TABLE (self));

  g_set_object (&self->document, document);
  g_signal_group_set_target (self->follower, document);
  /* the preference of the pressure unit applies at once */
  if (!self->follows_settings && hl_pressure_unit_settings () != NULL)
    {
      g_signal_connect_object (hl_pressure_unit_settings (), "changed::result-pressure-unit", G_CALLBACK (rebuild),
                               self, G_CONNECT_SWAPPED);
      self->follows_settings = TRUE;
    }
}

char *
hl_results_table_get_text (HlResultsTable *self)
{
  g_return_val_if_fail (HL_IS_RESULTS_TABLE (self), NULL);
  return g_strdup (self->text->str);
}
