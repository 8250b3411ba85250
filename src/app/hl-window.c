/* hl-window.c — the main window: sidebar, canvas, results
 *
 * Commands are window actions; update_actions() alone decides which are
 * enabled.  The file commands live in hl-window-files.c.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-window"

#include "hl-config.h"
#include "hl-window.h"
#include "hl-window-private.h"
#include "hl-recent-menu.h"
#include "hl-application.h"
#include "hl-export-dialog.h"
#include "hl-print.h"
#include "hl-properties-dialog.h"
#include "hl-report.h"
#include "hl-shell-list.h"

#include <glib/gi18n.h>

G_DEFINE_FINAL_TYPE (HlWindow, hl_window, GTK_TYPE_APPLICATION_WINDOW)

void
hl_window_show_message (HlWindow       *self,
                        GtkMessageType  type,
                        const char     *text)
{
  hl_banner_show (self->info_bar, type, text);
}

void
hl_window_hide_message (HlWindow *self)
{
  hl_banner_hide (self->info_bar);
}

static void
on_toast_dismissed_cb (AdwToast *toast,
                       HlWindow *self)
{
  if (self->toast == toast)
    self->toast = NULL;
}

void
hl_window_show_toast (HlWindow   *self,
                      const char *text)
{
  AdwToast *toast = adw_toast_new (text);

  /* the newest notice is the one that counts: it replaces an older one */
  adw_toast_set_priority (toast, ADW_TOAST_PRIORITY_HIGH);
  g_signal_connect_object (toast, "dismissed", G_CALLBACK (on_toast_dismissed_cb), self, 0);
  self->toast = toast;
  adw_toast_overlay_add_toast (self->toast_overlay, toast);
}

static void
set_enabled (HlWindow   *self,
             const char *name,
             gboolean    enabled)
{
  GAction *action = g_action_map_lookup_action (G_ACTION_MAP (self), name);

  g_simple_action_set_enabled (G_SIMPLE_ACTION (action), enabled);
}

/* The one place that decides what can be done now. */
static void
update_actions (HlWindow *self)
{
  const HlProject *project = hl_document_get_project (self->document);
  guint n = hl_project_n_shells (project);
  guint selected = hl_document_get_selected (self->document);
  gboolean has_shell = hl_document_get_shell (self->document) != NULL;
  gboolean solved = hl_document_get_solution (self->document) != NULL;

  set_enabled (self, "undo", hl_document_can_undo (self->document));
  set_enabled (self, "redo", hl_document_can_redo (self->document));
  set_enabled (self, "export", solved);
  set_enabled (self, "export-to", solved);
  set_enabled (self, "export-options", solved);
  set_enabled (self, "print", solved);
  set_enabled (self, "print-to", solved);
  set_enabled (self, "copy-results", solved);
  set_enabled (self, "shell-duplicate", has_shell);
  set_enabled (self, "shell-rename", has_shell);
  /* a project keeps at least one shell, so there is always a figure */
  set_enabled (self, "shell-remove", n > 1);
  set_enabled (self, "shell-up", has_shell && selected > 0);
  set_enabled (self, "shell-down", has_shell && selected + 1 < n);
}

static void
update_title (HlWindow *self)
{
  GFile *file = hl_document_get_file (self->document);
  gboolean modified = hl_document_get_modified (self->document);
  const char *title = hl_document_get_title (self->document);
  g_autofree char *name = file != NULL ? g_file_get_basename (file) : g_strdup (_("Not saved"));
  g_autofree char *subtitle = modified ? g_strdup_printf ("• %s", name) : g_strdup (name);
  g_autofree char *window_title = NULL;

  gtk_label_set_text (self->title_label, title);
  gtk_label_set_text (self->subtitle_label, subtitle);
  /* TRANSLATORS: window title: modified mark, project title, file name */
  window_title = g_strdup_printf (_("%s%s — %s"), modified ? "• " : "", title, name);
  gtk_window_set_title (GTK_WINDOW (self), window_title);
  if (file != NULL)
    {
      g_autofree char *path = g_file_peek_path (file) != NULL ? g_strdup (g_file_peek_path (file)) : NULL;

      gtk_widget_set_tooltip_text (GTK_WIDGET (self->subtitle_label), path);
    }
}

static void
on_document_changed_cb (HlDocument *document,
                        HlWindow   *self)
{
  const HlShellInputs *shell = hl_document_get_shell (document);

  update_title (self);
  update_actions (self);
  gtk_label_set_text (self->results_shell_label, shell != NULL ? shell->name : "");
  hl_window_autosave_update (self);
}

void
hl_window_set_document (HlWindow   *self,
              HlDocument *document)
{
  if (self->document != NULL)
    g_signal_handlers_disconnect_by_data (self->document, self);
  g_set_object (&self->document, document);
  g_signal_connect (document, "changed", G_CALLBACK (on_document_changed_cb), self);
  hl_shell_list_set_document (self->shell_list, document);
  hl_shell_editor_set_document (self->shell_editor, document);
  hl_canvas_set_document (self->canvas, document);
  hl_results_table_set_document (self->results_table, document);
  hl_checks_table_set_document (self->figure_checks, document);
  hl_checks_table_set_document (self->results_checks, document);
  hl_window_hide_message (self);
  /* a recovered project may be bound for a file */
  hl_window_watch_file (self, NULL);
  on_document_changed_cb (document, self);
}

HlDocument *
hl_window_new_document (HlWindow *self)
{
  HlApplication *app = HL_APPLICATION (gtk_window_get_application (GTK_WINDOW (self)));
  HlUnitSystem units = hl_application_unit_system (app);
  HlShellInputs shell = hl_application_default_shell (app, units);

  return hl_document_new (&shell, units);
}

static GSettings *
window_settings (HlWindow *self)
{
  GtkApplication *app = gtk_window_get_application (GTK_WINDOW (self));

  return app != NULL ? hl_application_get_settings (HL_APPLICATION (app)) : NULL;
}

static void
export_to (HlWindow              *self,
           const char            *path,
           const HlExportChoices *choices)
{
  g_autoptr(GError) error = NULL;

  if (!hl_export_document (self->document, path, choices, &error))
    {
      g_autofree char *text = g_strdup_printf (_("Nothing was exported. %s"), error->message);

      hl_window_show_message (self, GTK_MESSAGE_ERROR, text);
    }
  else
    {
      g_autoptr(GPtrArray) names = hl_export_document_names (self->document, path, choices);
      g_autofree char *list = hl_export_list_names (names);
      g_autofree char *folder = g_path_get_dirname (path);
      g_autofree char *folder_name = g_filename_display_basename (folder);
      g_autofree char *text = NULL;

      if (names->len == 1)
        text = g_strdup_printf (_("Exported “%s”."), (const char *) g_ptr_array_index (names, 0));
      else
        /* TRANSLATORS: one figure file per shell: the count, the names, the folder */
        text = g_strdup_printf (_("Exported %u files, one per shell, into “%s”: %s."), names->len, folder_name, list);
      /* a success needs no answer: it goes by itself, and an older
       * problem notice goes with it */
      hl_window_hide_message (self);
      hl_window_show_toast (self, text);
    }
}

static void
on_export_chosen (const char            *path,
                  const HlExportChoices *choices,
                  gpointer               user_data)
{
  export_to (HL_WINDOW (user_data), path, choices);
}

static void
export_activated (GSimpleAction *action,
                  GVariant      *param,
                  gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  const HlShellInputs *shell = hl_document_get_shell (self->document);

  hl_export_dialog_present (GTK_WINDOW (self), self->document, window_settings (self),
                            shell != NULL ? shell->id : "figure", on_export_chosen, self);
}

/* "export-to" with (path, size): the export without the dialogs, with
 * the options last chosen in them */
static void
export_to_activated (GSimpleAction *action,
                     GVariant      *param,
                     gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  const char *path, *size;
  HlExportChoices choices;

  g_variant_get (param, "(&s&s)", &path, &size);
  hl_export_choices_load (&choices, window_settings (self), hl_document_get_project (self->document)->display_units);
  g_strlcpy (choices.size, size, sizeof choices.size);
  export_to (self, path, &choices);
}

/* "export-options" with a path: the options for a name already chosen
 * (what the chooser leads to) */
static void
export_options_activated (GSimpleAction *action,
                          GVariant      *param,
                          gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  HlExportOptions *options = hl_export_options_new (GTK_WINDOW (self), self->document, window_settings (self),
                                                    g_variant_get_string (param, NULL), on_export_chosen, self);

  gtk_window_present (GTK_WINDOW (options));
}

/* "print" shows the dialog; "print-to" with a path writes the PDF the
 * printer would get (tests, and a quick look without a printer) */
static void
print_activated (GSimpleAction *action,
                 GVariant      *param,
                 gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  g_autoptr(GError) error = NULL;
  const char *path = param != NULL ? g_variant_get_string (param, NULL) : NULL;

  if (!hl_print_run (GTK_WINDOW (self), self->document, path, &error))
    {
      g_autofree char *text = g_strdup_printf (_("Printing failed. %s"), error->message);

      hl_window_show_message (self, GTK_MESSAGE_ERROR, text);
    }
}

static void
copy_results_activated (GSimpleAction *action,
                        GVariant      *param,
                        gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  g_autofree char *text = hl_results_table_get_text (self->results_table);

  gdk_clipboard_set_text (gtk_widget_get_clipboard (GTK_WIDGET (self)), text);
}

static void
properties_activated (GSimpleAction *action,
                      GVariant      *param,
                      gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);

  gtk_window_present (GTK_WINDOW (hl_properties_dialog_new (GTK_WINDOW (self), self->document, FALSE)));
}

static void
revisions_activated (GSimpleAction *action,
                     GVariant      *param,
                     gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);

  gtk_window_present (GTK_WINDOW (hl_properties_dialog_new (GTK_WINDOW (self), self->document, TRUE)));
}

static void
undo_activated (GSimpleAction *action,
                GVariant      *param,
                gpointer       user_data)
{
  hl_document_undo (HL_WINDOW (user_data)->document);
}

static void
redo_activated (GSimpleAction *action,
                GVariant      *param,
                gpointer       user_data)
{
  hl_document_redo (HL_WINDOW (user_data)->document);
}

static void
shell_add_activated (GSimpleAction *action,
                     GVariant      *param,
                     gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  HlApplication *app = HL_APPLICATION (gtk_window_get_application (GTK_WINDOW (self)));
  /* in the project's units, whatever the preference for new projects */
  HlShellInputs shell = hl_application_default_shell (app, hl_document_get_project (self->document)->display_units);

  hl_document_add_shell (self->document, &shell);
  hl_shell_editor_focus_name (self->shell_editor);
}

static void
shell_duplicate_activated (GSimpleAction *action,
                           GVariant      *param,
                           gpointer       user_data)
{
  hl_document_duplicate_shell (HL_WINDOW (user_data)->document);
}

static void
shell_rename_activated (GSimpleAction *action,
                        GVariant      *param,
                        gpointer       user_data)
{
  hl_shell_editor_focus_name (HL_WINDOW (user_data)->shell_editor);
}

static void
shell_remove_activated (GSimpleAction *action,
                        GVariant      *param,
                        gpointer       user_data)
{
  hl_document_remove_shell (HL_WINDOW (user_data)->document);
}

static void
shell_up_activated (GSimpleAction *action,
                    GVariant      *param,
                    gpointer       user_data)
{
  hl_document_move_shell (HL_WINDOW (user_data)->document, -1);
}

static void
shell_down_activated (GSimpleAction *action,
                      GVariant      *param,
                      gpointer       user_data)
{
  hl_document_move_shell (HL_WINDOW (user_data)->document, +1);
}

/* "figure" or "results": the page of the view switcher */
static void
show_page_activated (GSimpleAction *action,
                     GVariant      *parameter,
                     gpointer       user_data)
{
  adw_view_stack_set_visible_child_name (HL_WINDOW (user_data)->view_stack, g_variant_get_string (parameter, NULL));
}

static const GActionEntry win_entries[] = {
  { "show-page", show_page_activated, "s" },
  { "export", export_activated },
  { "export-to", export_to_activated, "(ss)" },
  { "export-options", export_options_activated, "s" },
  { "print", print_activated },
  { "print-to", print_activated, "s" },
  { "copy-results", copy_results_activated },
  { "properties", properties_activated },
  { "revisions", revisions_activated },
  { "undo", undo_activated },
  { "redo", redo_activated },
  { "shell-add", shell_add_activated },
  { "shell-duplicate", shell_duplicate_activated },
  { "shell-rename", shell_rename_activated },
  { "shell-remove", shell_remove_activated },
  { "shell-up", shell_up_activated },
  { "shell-down", shell_down_activated },
};

/* ---- window ------------------------------------------------------- */

static gboolean
on_drop_cb (GtkDropTarget *target,
            const GValue  *value,
            double         x,
            double         y,
            HlWindow      *self)
{
  GSList *files;

  if (!G_VALUE_HOLDS (value, GDK_TYPE_FILE_LIST))
    return FALSE;
  files = gdk_file_list_get_files (g_value_get_boxed (value));
  if (files == NULL)
    return FALSE;
  hl_window_open_when_safe (self, files->data);
  g_slist_free (files);
  return TRUE;
}

static void
save_window_state (HlWindow *self)
{
  HlApplication *app = HL_APPLICATION (gtk_window_get_application (GTK_WINDOW (self)));
  GSettings *settings = app != NULL ? hl_application_get_settings (app) : NULL;
  int width, height;

  if (settings == NULL)
    return;
  gtk_window_get_default_size (GTK_WINDOW (self), &width, &height);
  g_settings_set_boolean (settings, "window-maximized", gtk_window_is_maximized (GTK_WINDOW (self)));
  if (!gtk_window_is_maximized (GTK_WINDOW (self)))
    {
      g_settings_set_int (settings, "window-width", width);
      g_settings_set_int (settings, "window-height", height);
    }
}

static gboolean
hl_window_close_request (GtkWindow *window)
{
  HlWindow *self = HL_WINDOW (window);

  if (hl_window_ask_before_close (self))
    return TRUE;
  save_window_state (self);
  return GTK_WINDOW_CLASS (hl_window_parent_class)->close_request (window);
}

static void
hl_window_dispose (GObject *object)
{
  HlWindow *self = HL_WINDOW (object);

  hl_window_autosave_finish (self);
  hl_window_unwatch_file (self);
  g_clear_object (&self->save_file);
  if (self->document != NULL)
    g_signal_handlers_disconnect_by_data (self->document, self);
  g_clear_object (&self->document);
  g_clear_object (&self->chooser);
  g_clear_object (&self->pending_file);
  if (self->question != NULL)
    gtk_window_destroy (GTK_WINDOW (g_steal_pointer (&self->question)));
  gtk_widget_dispose_template (GTK_WIDGET (self), HL_TYPE_WINDOW);
  G_OBJECT_CLASS (hl_window_parent_class)->dispose (object);
}

static void
hl_window_class_init (HlWindowClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);
  GtkWindowClass *window_class = GTK_WINDOW_CLASS (klass);

  object_class->dispose = hl_window_dispose;
  window_class->close_request = hl_window_close_request;

  g_type_ensure (HL_TYPE_BANNER);
  g_type_ensure (HL_TYPE_SHELL_LIST);
  g_type_ensure (HL_TYPE_SHELL_EDITOR);
  g_type_ensure (HL_TYPE_CANVAS);
  g_type_ensure (HL_TYPE_RESULTS_TABLE);
  g_type_ensure (HL_TYPE_CHECKS_TABLE);
  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-window.ui");
#define CHILD(name) gtk_widget_class_bind_template_child (widget_class, HlWindow, name)
  CHILD (title_label);
  CHILD (subtitle_label);
  CHILD (primary_menu_button);
  CHILD (recent_section);
  CHILD (info_bar);
  CHILD (disk_bar);
  CHILD (paned);
  CHILD (results_paned);
  CHILD (shell_list);
  CHILD (shell_editor);
  CHILD (canvas);
  CHILD (results_shell_label);
  CHILD (results_table);
  CHILD (figure_checks);
  CHILD (results_checks);
  CHILD (view_stack);
  CHILD (caution_label);
#undef CHILD
}

static void
hl_window_init (HlWindow *self)
{
  GtkDropTarget *drop;

  gtk_widget_init_template (GTK_WIDGET (self));
  /* the window's own child: bound as a template child, it would be
   * freed twice when the window goes */
  self->toast_overlay = ADW_TOAST_OVERLAY (gtk_window_get_child (GTK_WINDOW (self)));
  hl_window_autosave_init (self);
  g_action_map_add_action_entries (G_ACTION_MAP (self), win_entries, G_N_ELEMENTS (win_entries), self);
  hl_window_add_file_actions (self);
  hl_window_add_zoom_actions (self);
  gtk_label_set_text (self->caution_label, _(HL_CAUTION));

  drop = gtk_drop_target_new (GDK_TYPE_FILE_LIST, GDK_ACTION_COPY);
  g_signal_connect (drop, "drop", G_CALLBACK (on_drop_cb), self);
  gtk_widget_add_controller (GTK_WIDGET (self), GTK_EVENT_CONTROLLER (drop));

  hl_recent_menu_bind (self->recent_section, self);
}

HlWindow *
hl_window_new (GtkApplication *application)
{
  HlWindow *self = g_object_new (HL_TYPE_WINDOW, "application", application, NULL);
  GSettings *settings = hl_application_get_settings (HL_APPLICATION (application));

  gtk_window_set_default_size (GTK_WINDOW (self), g_settings_get_int (settings, "window-width"),
                               g_settings_get_int (settings, "window-height"));
  if (g_settings_get_boolean (settings, "window-maximized"))
    gtk_window_maximize (GTK_WINDOW (self));
  {
    g_autoptr(HlDocument) document = hl_window_new_document (self);

    hl_window_set_document (self, document);
  }
  return self;
}

void
hl_window_end_session (HlWindow *self)
{
  g_return_if_fail (HL_IS_WINDOW (self));

  hl_window_autosave_keep (self);
  self->close_confirmed = TRUE;
  gtk_window_destroy (GTK_WINDOW (self));
}

HlDocument *
hl_window_get_document (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), NULL);
  return self->document;
}

gboolean
hl_window_is_pristine (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), FALSE);
  return hl_document_get_file (self->document) == NULL && !hl_document_get_modified (self->document)
         && !hl_document_can_undo (self->document);
}

gboolean
hl_window_shows_file (HlWindow *self,
                      GFile    *file)
{
  GFile *mine;

  g_return_val_if_fail (HL_IS_WINDOW (self), FALSE);
  mine = hl_document_get_file (self->document);
  return mine != NULL && file != NULL && g_file_equal (mine, file);
}

HlShellEditor *
hl_window_get_shell_editor (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), NULL);
  return self->shell_editor;
}

HlChecksTable *
hl_window_get_checks_table (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), NULL);
  return self->figure_checks;
}

HlResultsTable *
hl_window_get_results_table (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), NULL);
  return self->results_table;
}

HlCanvas *
hl_window_get_canvas (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), NULL);
  return self->canvas;
}

GtkWidget *
hl_window_get_question (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), NULL);
  return self->question;
}

const char *
hl_window_get_message (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), NULL);
  return hl_banner_get_text (self->info_bar);
}

const char *
hl_window_get_disk_notice (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), NULL);
  return hl_banner_get_text (self->disk_bar);
}

const char *
hl_window_get_toast (HlWindow *self)
{
  g_return_val_if_fail (HL_IS_WINDOW (self), NULL);
  return self->toast != NULL ? adw_toast_get_title (self->toast) : NULL;
}
