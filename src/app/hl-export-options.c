/* hl-export-options.c — what an export holds: shells, panels, size, paper
 *
 * Shown once the name is chosen, so that only the choices that mean
 * something for its format can be changed, and the names of the files
 * to be written can be said before anything is written.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-export-options"

#include "hl-config.h"
#include "hl-export-options.h"
#include "hl-export.h"

#include <adwaita.h>
#include <glib/gi18n.h>
#include <string.h>

/* the size row's items, in its order */
static const char *const size_presets[] = { "a4-landscape", "a4-portrait", "letter-landscape", "1920x1080", "custom" };
#define SIZE_CUSTOM 4

struct _HlExportOptions
{
  GtkWindow           parent_instance;

  AdwComboRow        *scope_row;
  AdwActionRow       *figure_only_row;
  GtkSwitch          *figure_only_switch;
  AdwActionRow       *panels_row;
  GtkCheckButton     *section_check;
  GtkCheckButton     *detail_check;
  GtkCheckButton     *plot_check;
  GtkCheckButton     *chart_check;
  AdwComboRow        *size_row;
  AdwActionRow       *custom_row;
  GtkSpinButton      *width_spin;
  GtkSpinButton      *height_spin;
  GtkLabel           *size_unit_label;
  AdwComboRow        *paper_row;
  GtkLabel           *files_label;
  GtkButton          *export_button;

  HlDocument         *document;
  GSettings          *settings;
  char               *path;
  HlExportChosenFunc  done;
  gpointer            user_data;
};

G_DEFINE_FINAL_TYPE (HlExportOptions, hl_export_options, GTK_TYPE_WINDOW)

static guint
panels_chosen (HlExportOptions *self)
{
  guint panels = 0;

  if (gtk_check_button_get_active (self->section_check))
    panels |= HL_PANEL_SECTION;
  if (gtk_check_button_get_active (self->detail_check))
    panels |= HL_PANEL_DETAIL;
  if (gtk_check_button_get_active (self->plot_check))
    panels |= HL_PANEL_PLOT;
  if (gtk_check_button_get_active (self->chart_check))
    panels |= HL_PANEL_CHART;
  return panels;
}

static void
read_choices (HlExportOptions *self,
              HlExportChoices *choices)
{
  guint size = adw_combo_row_get_selected (self->size_row);
  guint panels = panels_chosen (self);

  memset (choices, 0, sizeof *choices);
  choices->scope = adw_combo_row_get_selected (self->scope_row) == 1 ? HL_EXPORT_SCOPE_ALL : HL_EXPORT_SCOPE_SHELL;
  choices->figure_only = gtk_switch_get_active (self->figure_only_switch);
  choices->paper = adw_combo_row_get_selected (self->paper_row) == 1 ? HL_PAPER_LETTER : HL_PAPER_A4;
  choices->panels = panels == HL_PANELS_ALL ? 0 : panels;
  if (size == SIZE_CUSTOM)
    g_snprintf (choices->size, sizeof choices->size, "%dx%d", gtk_spin_button_get_value_as_int (self->width_spin),
                gtk_spin_button_get_value_as_int (self->height_spin));
  else if (size < G_N_ELEMENTS (size_presets))
    {
      g_autofree char *wxh = hl_export_preset_size (size_presets[size], self->path);

      g_strlcpy (choices->size, wxh != NULL ? wxh : "", sizeof choices->size);
    }
}

static void
update (HlExportOptions *self)
{
  HlExportFormat format = hl_export_format_for_path (self->path);
  gboolean figure = format == HL_EXPORT_SVG || format == HL_EXPORT_PDF || format == HL_EXPORT_PNG;
  HlExportChoices choices;
  g_autoptr(GPtrArray) names = NULL;
  g_autofree char *list = NULL;
  g_autofree char *folder = g_path_get_dirname (self->path);
  g_autofree char *folder_name = g_filename_display_basename (folder);
  g_autofree char *text = NULL;

  read_choices (self, &choices);
  gtk_widget_set_sensitive (GTK_WIDGET (self->figure_only_row), format == HL_EXPORT_PDF);
  gtk_widget_set_sensitive (GTK_WIDGET (self->paper_row), format == HL_EXPORT_PDF);
  gtk_widget_set_sensitive (GTK_WIDGET (self->panels_row), figure);
  gtk_widget_set_sensitive (GTK_WIDGET (self->size_row), figure);
  gtk_widget_set_visible (GTK_WIDGET (self->custom_row), figure && adw_combo_row_get_selected (self->size_row)
                                                                       == SIZE_CUSTOM);
  gtk_label_set_text (self->size_unit_label, format == HL_EXPORT_PNG ? _("pixels") : _("points"));

  if (figure && panels_chosen (self) == 0)
    {
      gtk_label_set_text (self->files_label, _("Choose at least one panel."));
      gtk_widget_set_sensitive (GTK_WIDGET (self->export_button), FALSE);
      return;
    }
  gtk_widget_set_sensitive (GTK_WIDGET (self->export_button), TRUE);
  names = hl_export_document_names (self->document, self->path, &choices);
  list = hl_export_list_names (names);
  if (names->len == 1)
    text = g_strdup_printf (_("Writes %s into “%s”."), list, folder_name);
  else
    /* TRANSLATORS: %u files (more than one), their names, the folder */
    text = g_strdup_printf (_("An SVG or PNG file holds one figure: writes %u files, one per shell, %s, into “%s”."),
                            names->len, list, folder_name);
  gtk_label_set_text (self->files_label, text);
}

static void
on_choice_changed_cb (HlExportOptions *self)
{
  if (self->path != NULL)
    update (self);
}

static void
on_cancel_button_clicked_cb (GtkButton       *button,
                             HlExportOptions *self)
{
  gtk_window_destroy (GTK_WINDOW (self));
}

static void
on_export_button_clicked_cb (GtkButton       *button,
                             HlExportOptions *self)
{
  HlExportChoices choices;
  g_autofree char *path = g_strdup (self->path);
  HlExportChosenFunc done = self->done;
  gpointer user_data = self->user_data;

  read_choices (self, &choices);
  if (self->settings != NULL)
    {
      guint size = adw_combo_row_get_selected (self->size_row);

      hl_export_choices_save (&choices, self->settings);
      if (size < G_N_ELEMENTS (size_presets) && hl_export_format_for_path (path) != HL_EXPORT_CSV
          && hl_export_format_for_path (path) != HL_EXPORT_TXT)
        g_settings_set_string (self->settings, "export-size", size_presets[size]);
    }
  /* gone before the export: its message is the window's */
  gtk_window_destroy (GTK_WINDOW (self));
  done (path, &choices, user_data);
}

static void
hl_export_options_dispose (GObject *object)
{
  HlExportOptions *self = HL_EXPORT_OPTIONS (object);

  g_clear_object (&self->document);
  g_clear_object (&self->settings);
  gtk_widget_dispose_template (GTK_WIDGET (self), HL_TYPE_EXPORT_OPTIONS);
  G_OBJECT_CLASS (hl_export_options_parent_class)->dispose (object);
}

static void
hl_export_options_finalize (GObject *object)
{
  HlExportOptions *self = HL_EXPORT_OPTIONS (object);

  g_free (self->path);
  G_OBJECT_CLASS (hl_export_options_parent_class)->finalize (object);
}

static void
hl_export_options_class_init (HlExportOptionsClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = hl_export_options_dispose;
  object_class->finalize = hl_export_options_finalize;
  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-export-options.ui");
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, scope_row);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, figure_only_row);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, figure_only_switch);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, panels_row);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, section_check);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, detail_check);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, plot_check);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, chart_check);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, size_row);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, custom_row);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, width_spin);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, height_spin);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, size_unit_label);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, paper_row);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, files_label);
  gtk_widget_class_bind_template_child (widget_class, HlExportOptions, export_button);
  gtk_widget_class_bind_template_callback (widget_class, on_choice_changed_cb);
  gtk_widget_class_bind_template_callback (widget_class, on_cancel_button_clicked_cb);
  gtk_widget_class_bind_template_callback (widget_class, on_export_button_clicked_cb);
}

static void
hl_export_options_init (HlExportOptions *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
}

static void
set_scope_model (HlExportOptions *self)
{
  const HlShellInputs *shell = hl_document_get_shell (self->document);
  guint n = hl_project_n_shells (hl_document_get_project (self->document));
  /* TRANSLATORS: export scope; %s is the shell's name */
  g_autofree char *this_shell = g_strdup_printf (_("This shell (%s)"), shell != NULL ? shell->name : "");
  /* TRANSLATORS: export scope; %u is the number of shells */
  g_autofree char *all = g_strdup_printf (ngettext ("All shells (%u)", "All shells (%u)", n), n);
  const char *const items[] = { this_shell, all, NULL };
  g_autoptr(GtkStringList) model = gtk_string_list_new (items);

  adw_combo_row_set_model (self->scope_row, G_LIST_MODEL (model));
}

HlExportOptions *
hl_export_options_new (GtkWindow          *parent,
                       HlDocument         *document,
                       GSettings          *settings,
                       const char         *path,
                       HlExportChosenFunc  done,
                       gpointer            user_data)
{
  HlExportOptions *self;
  HlExportChoices choices;
  g_autofree char *preset = NULL;
  g_autofree char *title = NULL;
  g_autofree char *base = NULL;
  guint size = 0;

  g_return_val_if_fail (HL_IS_DOCUMENT (document), NULL);
  g_return_val_if_fail (path != NULL && done != NULL, NULL);

  self = g_object_new (HL_TYPE_EXPORT_OPTIONS, "transient-for", parent, NULL);
  self->document = g_object_ref (document);
  self->settings = settings != NULL ? g_object_ref (settings) : NULL;
  self->done = done;
  self->user_data = user_data;
  set_scope_model (self);

  hl_export_choices_load (&choices, settings, hl_document_get_project (document)->display_units);
  adw_combo_row_set_selected (self->scope_row, choices.scope == HL_EXPORT_SCOPE_ALL ? 1 : 0);
  gtk_switch_set_active (self->figure_only_switch, choices.figure_only);
  adw_combo_row_set_selected (self->paper_row, choices.paper == HL_PAPER_LETTER ? 1 : 0);
  gtk_check_button_set_active (self->section_check, choices.panels == 0 || (choices.panels & HL_PANEL_SECTION));
  gtk_check_button_set_active (self->detail_check, choices.panels == 0 || (choices.panels & HL_PANEL_DETAIL));
  gtk_check_button_set_active (self->plot_check, choices.panels == 0 || (choices.panels & HL_PANEL_PLOT));
  gtk_check_button_set_active (self->chart_check, choices.panels == 0 || (choices.panels & HL_PANEL_CHART));
  preset = settings != NULL ? g_settings_get_string (settings, "export-size") : g_strdup (size_presets[0]);
  for (guint i = 0; i < G_N_ELEMENTS (size_presets); i++)
    if (g_strcmp0 (preset, size_presets[i]) == 0)
      size = i;
  adw_combo_row_set_selected (self->size_row, size);
  if (hl_export_format_for_path (path) == HL_EXPORT_PNG)
    {
      gtk_spin_button_set_value (self->width_spin, HL_EXPORT_DEFAULT_WIDTH * HL_EXPORT_PNG_SCALE);
      gtk_spin_button_set_value (self->height_spin, HL_EXPORT_DEFAULT_HEIGHT * HL_EXPORT_PNG_SCALE);
    }
  base = g_filename_display_basename (path);
  /* TRANSLATORS: title of the export options; %s is the file name */
  title = g_strdup_printf (_("Export “%s”"), base);
  gtk_window_set_title (GTK_WINDOW (self), title);
  self->path = g_strdup (path);
  update (self);
  gtk_window_set_default_widget (GTK_WINDOW (self), GTK_WIDGET (self->export_button));
  return self;
}
