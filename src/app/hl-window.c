/* hl-window.c — the main window: sidebar, canvas, results
 *
 * Commands are window actions; update_actions() alone decides which are
 * enabled.  Anything that would drop unsaved work goes through
 * ask_unsaved_then().
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-window"

#include "hl-config.h"
#include "hl-window.h"
#include "hl-application.h"
#include "hl-export.h"
#include "hl-export-dialog.h"
#include "hl-print.h"
#include "hl-properties-dialog.h"
#include "hl-report.h"
#include "hl-shell-list.h"

#include <glib/gi18n.h>

#define MAX_RECENT 8

typedef void (*Continuation) (HlWindow *self,
                              GFile    *file);

struct _HlWindow
{
  GtkApplicationWindow parent_instance;

  GtkLabel       *title_label;
  GtkLabel       *subtitle_label;
  GtkMenuButton  *primary_menu_button;
  GMenu          *recent_section;
  GtkInfoBar     *info_bar;
  GtkLabel       *info_label;
  GtkPaned       *paned;
  GtkPaned       *results_paned;
  HlShellList    *shell_list;
  HlShellEditor  *shell_editor;
  HlCanvas       *canvas;
  GtkLabel       *results_shell_label;
  HlResultsTable *results_table;
  GtkLabel       *caution_label;

  HlDocument     *document;
  GtkWidget      *question;
  GtkNativeDialog *chooser;
  Continuation    pending;       /* runs once unsaved work is dealt with */
  GFile          *pending_file;
  gboolean        close_confirmed;
};

G_DEFINE_FINAL_TYPE (HlWindow, hl_window, GTK_TYPE_APPLICATION_WINDOW)

static void save_as (HlWindow *self);

static void
show_message (HlWindow       *self,
              GtkMessageType  type,
              const char     *text)
{
  gtk_info_bar_set_message_type (self->info_bar, type);
  gtk_label_set_text (self->info_label, text);
  gtk_info_bar_set_revealed (self->info_bar, TRUE);
}

static void
hide_message (HlWindow *self)
{
  gtk_info_bar_set_revealed (self->info_bar, FALSE);
  gtk_label_set_text (self->info_label, "");
}

static void
on_info_bar_response_cb (GtkInfoBar *info_bar,
                         int         response,
                         HlWindow   *self)
{
  hide_message (self);
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
}

/* ---- recent projects ---------------------------------------------- */

static void
rebuild_recent (HlWindow *self)
{
  GtkRecentManager *manager = gtk_recent_manager_get_default ();
  GList *items = gtk_recent_manager_get_items (manager);
  guint n = 0;

  g_menu_remove_all (self->recent_section);
  for (GList *l = items; l != NULL && n < MAX_RECENT; l = l->next)
    {
      GtkRecentInfo *info = l->data;
      const char *uri = gtk_recent_info_get_uri (info);
      g_autoptr(GMenuItem) item = NULL;

      if (!g_str_has_suffix (uri, ".hoop") || !gtk_recent_info_exists (info))
        continue;
      item = g_menu_item_new (gtk_recent_info_get_display_name (info), NULL);
      g_menu_item_set_action_and_target_value (item, "win.open-recent", g_variant_new_string (uri));
      g_menu_append_item (self->recent_section, item);
      n++;
    }
  g_list_free_full (items, (GDestroyNotify) gtk_recent_info_unref);
}

static void
remember_recent (GFile *file)
{
  g_autofree char *uri = g_file_get_uri (file);

  gtk_recent_manager_add_item (gtk_recent_manager_get_default (), uri);
}

/* ---- unsaved work ------------------------------------------------- */

static void
run_pending (HlWindow *self)
{
  Continuation k = self->pending;
  g_autoptr(GFile) file = g_steal_pointer (&self->pending_file);

  self->pending = NULL;
  if (k != NULL)
    k (self, file);
}

static gboolean
save_now (HlWindow *self,
          GFile    *file)
{
  g_autoptr(GError) error = NULL;

  if (!hl_document_save (self->document, file, &error))
    {
      GtkWidget *dialog = gtk_message_dialog_new (GTK_WINDOW (self), GTK_DIALOG_MODAL | GTK_DIALOG_DESTROY_WITH_PARENT,
                                                  GTK_MESSAGE_ERROR, GTK_BUTTONS_CLOSE,
                                                  "%s", _("The project was not saved"));

      gtk_message_dialog_format_secondary_text (GTK_MESSAGE_DIALOG (dialog), "%s", error->message);
      g_signal_connect (dialog, "response", G_CALLBACK (gtk_window_destroy), NULL);
      gtk_window_present (GTK_WINDOW (dialog));
      /* a failed save never continues into close or open */
      self->pending = NULL;
      g_clear_object (&self->pending_file);
      return FALSE;
    }
  remember_recent (hl_document_get_file (self->document));
  return TRUE;
}

static void
on_question_response_cb (GtkDialog *dialog,
                         int        response,
                         HlWindow  *self)
{
  gtk_window_destroy (GTK_WINDOW (dialog));
  self->question = NULL;

  switch (response)
    {
    case GTK_RESPONSE_ACCEPT:
      if (hl_document_get_file (self->document) == NULL)
        save_as (self);              /* continues after the save */
      else if (save_now (self, NULL))
        run_pending (self);
      break;
    case GTK_RESPONSE_REJECT:
      run_pending (self);
      break;
    default:
      self->pending = NULL;
      g_clear_object (&self->pending_file);
      break;
    }
}

/* Runs @k at once when nothing would be lost, else after the user has
 * chosen to save or to discard. */
static void
ask_unsaved_then (HlWindow     *self,
                  Continuation  k,
                  GFile        *file)
{
  GtkWidget *dialog, *discard;

  /* one question at a time: it answers for the command that raised it */
  if (self->question != NULL)
    {
      gtk_window_present (GTK_WINDOW (self->question));
      return;
    }
  self->pending = k;
  g_set_object (&self->pending_file, file);
  if (!hl_document_get_modified (self->document))
    {
      run_pending (self);
      return;
    }
  dialog = gtk_message_dialog_new (GTK_WINDOW (self), GTK_DIALOG_MODAL | GTK_DIALOG_DESTROY_WITH_PARENT,
                                   GTK_MESSAGE_QUESTION, GTK_BUTTONS_NONE,
                                   _("Save changes to “%s”?"), hl_document_get_title (self->document));
  gtk_message_dialog_format_secondary_text (GTK_MESSAGE_DIALOG (dialog), "%s",
                                            _("Changes that are not saved will be lost."));
  gtk_dialog_add_button (GTK_DIALOG (dialog), _("_Cancel"), GTK_RESPONSE_CANCEL);
  discard = gtk_dialog_add_button (GTK_DIALOG (dialog), _("_Discard"), GTK_RESPONSE_REJECT);
  gtk_widget_add_css_class (discard, "destructive-action");
  gtk_widget_add_css_class (gtk_dialog_add_button (GTK_DIALOG (dialog), _("_Save"), GTK_RESPONSE_ACCEPT),
                            "suggested-action");
  gtk_dialog_set_default_response (GTK_DIALOG (dialog), GTK_RESPONSE_ACCEPT);
  g_signal_connect (dialog, "response", G_CALLBACK (on_question_response_cb), self);
  self->question = dialog;
  gtk_window_present (GTK_WINDOW (dialog));
}

/* ---- file commands ------------------------------------------------ */

gboolean
hl_window_load_file (HlWindow *self,
                     GFile    *file)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GPtrArray) warnings = NULL;

  g_return_val_if_fail (HL_IS_WINDOW (self), FALSE);
  g_return_val_if_fail (G_IS_FILE (file), FALSE);

  if (!hl_document_load (self->document, file, &warnings, &error))
    {
      /* TRANSLATORS: %s is the loader's message, with file and line */
      g_autofree char *text = g_strdup_printf (_("The project could not be opened. %s"), error->message);

      show_message (self, GTK_MESSAGE_ERROR, text);
      return FALSE;
    }
  hide_message (self);
  if (warnings != NULL && warnings->len > 0)
    {
      g_ptr_array_add (warnings, NULL);
      {
        g_autofree char *joined = g_strjoinv ("\n", (char **) warnings->pdata);

        show_message (self, GTK_MESSAGE_WARNING, joined);
      }
    }
  remember_recent (file);
  return TRUE;
}

static void
load_continuation (HlWindow *self,
                   GFile    *file)
{
  if (file != NULL)
    hl_window_load_file (self, file);
}

static void
set_document (HlWindow   *self,
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
  hide_message (self);
  on_document_changed_cb (document, self);
}

static HlDocument *
new_document (HlWindow *self)
{
  HlApplication *app = HL_APPLICATION (gtk_window_get_application (GTK_WINDOW (self)));
  HlShellInputs shell = hl_application_default_shell (app);

  return hl_document_new (&shell, hl_application_unit_system (app));
}

static void
new_continuation (HlWindow *self,
                  GFile    *file)
{
  g_autoptr(HlDocument) document = new_document (self);

  set_document (self, document);
}

static void
close_continuation (HlWindow *self,
                    GFile    *file)
{
  self->close_confirmed = TRUE;
  gtk_window_close (GTK_WINDOW (self));
}

static GtkFileFilter *
project_filter (void)
{
  GtkFileFilter *filter = gtk_file_filter_new ();

  gtk_file_filter_set_name (filter, _("Hoopline projects"));
  gtk_file_filter_add_mime_type (filter, "application/x-hoopline-project");
  gtk_file_filter_add_pattern (filter, "*.hoop");
  return filter;
}

static void
on_open_chooser_response_cb (GtkNativeDialog *chooser,
                             int              response,
                             HlWindow        *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr(GFile) file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (chooser));

      hl_window_load_file (self, file);
    }
  g_clear_object (&self->chooser);
}

static void
open_chooser_continuation (HlWindow *self,
                           GFile    *file)
{
  GtkFileChooserNative *chooser;
  g_autoptr(GtkFileFilter) filter = project_filter ();

  chooser = gtk_file_chooser_native_new (_("Open Project"), GTK_WINDOW (self),
                                         GTK_FILE_CHOOSER_ACTION_OPEN, _("_Open"), _("_Cancel"));
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (chooser), filter);
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (chooser), TRUE);
  g_signal_connect (chooser, "response", G_CALLBACK (on_open_chooser_response_cb), self);
  g_clear_object (&self->chooser);
  self->chooser = GTK_NATIVE_DIALOG (chooser);
  gtk_native_dialog_show (self->chooser);
}

static void
on_save_chooser_response_cb (GtkNativeDialog *chooser,
                             int              response,
                             HlWindow        *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr(GFile) file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (chooser));
      g_autofree char *path = g_file_get_path (file);

      /* the file type is known by its extension */
      if (path != NULL && !g_str_has_suffix (path, ".hoop"))
        {
          g_autofree char *with = g_strconcat (path, ".hoop", NULL);

          g_object_unref (file);
          file = g_file_new_for_path (with);
        }
      if (save_now (self, file))
        run_pending (self);
    }
  else
    {
      self->pending = NULL;
      g_clear_object (&self->pending_file);
    }
  g_clear_object (&self->chooser);
}

static void
save_as (HlWindow *self)
{
  GtkFileChooserNative *chooser;
  g_autoptr(GtkFileFilter) filter = project_filter ();
  GFile *file = hl_document_get_file (self->document);

  chooser = gtk_file_chooser_native_new (_("Save Project"), GTK_WINDOW (self),
                                         GTK_FILE_CHOOSER_ACTION_SAVE, _("_Save"), _("_Cancel"));
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (chooser), filter);
  if (file != NULL)
    gtk_file_chooser_set_file (GTK_FILE_CHOOSER (chooser), file, NULL);
  else
    {
      g_autofree char *name = g_strdup_printf ("%s.hoop", hl_document_get_title (self->document));

      gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (chooser), name);
    }
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (chooser), TRUE);
  g_signal_connect (chooser, "response", G_CALLBACK (on_save_chooser_response_cb), self);
  g_clear_object (&self->chooser);
  self->chooser = GTK_NATIVE_DIALOG (chooser);
  gtk_native_dialog_show (self->chooser);
}

/* ---- actions ------------------------------------------------------ */

static void
new_activated (GSimpleAction *action,
               GVariant      *param,
               gpointer       user_data)
{
  ask_unsaved_then (HL_WINDOW (user_data), new_continuation, NULL);
}

static void
open_activated (GSimpleAction *action,
                GVariant      *param,
                gpointer       user_data)
{
  ask_unsaved_then (HL_WINDOW (user_data), open_chooser_continuation, NULL);
}

static void
open_recent_activated (GSimpleAction *action,
                       GVariant      *param,
                       gpointer       user_data)
{
  g_autoptr(GFile) file = g_file_new_for_uri (g_variant_get_string (param, NULL));

  ask_unsaved_then (HL_WINDOW (user_data), load_continuation, file);
}

/* "open-file" with a path: the same as dropping the file on the window */
static void
open_file_activated (GSimpleAction *action,
                     GVariant      *param,
                     gpointer       user_data)
{
  g_autoptr(GFile) file = g_file_new_for_commandline_arg (g_variant_get_string (param, NULL));

  ask_unsaved_then (HL_WINDOW (user_data), load_continuation, file);
}

static void
save_activated (GSimpleAction *action,
                GVariant      *param,
                gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);

  if (hl_document_get_file (self->document) == NULL)
    save_as (self);
  else
    save_now (self, NULL);
}

/* "save-to" with a path: saving without the chooser (tests, scripts) */
static void
save_to_activated (GSimpleAction *action,
                   GVariant      *param,
                   gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  g_autoptr(GFile) file = g_file_new_for_commandline_arg (g_variant_get_string (param, NULL));

  save_now (self, file);
}

static void
save_as_activated (GSimpleAction *action,
                   GVariant      *param,
                   gpointer       user_data)
{
  save_as (HL_WINDOW (user_data));
}

static void
export_to (HlWindow   *self,
           const char *path,
           const char *size)
{
  const HlProject *project = hl_document_get_project (self->document);
  HlShellInputs *shell = (HlShellInputs *) hl_document_get_shell (self->document);
  g_autoptr(GError) error = NULL;
  GList *shells = NULL;
  HlExportRequest req = { 0 };
  HlExportFormat format = hl_export_format_for_path (path);

  /* the report covers the whole project, a figure or table the shell shown */
  if (format == HL_EXPORT_TXT)
    for (guint i = hl_project_n_shells (project); i > 0; i--)
      shells = g_list_prepend (shells, hl_project_shell (project, i - 1));
  else if (shell != NULL)
    shells = g_list_prepend (shells, shell);
  if (shells == NULL)
    return;

  req.project = (HlProject *) project;
  req.shells = shells;
  req.path = path;
  req.units = project->display_units;
  req.points = HL_DEFAULT_POINTS;
  req.size = size != NULL && size[0] != '\0' ? size : NULL;
  req.figure_only = FALSE;
  req.shell_given = format != HL_EXPORT_TXT;
  if (hl_export_run (&req, &error) != 0)
    {
      g_autofree char *text = g_strdup_printf (_("Nothing was exported. %s"), error->message);

      show_message (self, GTK_MESSAGE_ERROR, text);
    }
  else
    {
      g_autofree char *name = g_path_get_basename (path);
      g_autofree char *text = g_strdup_printf (_("Exported “%s”."), name);

      show_message (self, GTK_MESSAGE_INFO, text);
    }
  g_list_free (shells);
}

static void
on_export_chosen (const char *path,
                  const char *size,
                  gpointer    user_data)
{
  export_to (HL_WINDOW (user_data), path, size);
}

static void
export_activated (GSimpleAction *action,
                  GVariant      *param,
                  gpointer       user_data)
{
  HlWindow *self = HL_WINDOW (user_data);
  const HlShellInputs *shell = hl_document_get_shell (self->document);

  hl_export_dialog_present (GTK_WINDOW (self), shell != NULL ? shell->id : "figure",
                            on_export_chosen, self);
}

/* "export-to" with (path, size): the export without the chooser */
static void
export_to_activated (GSimpleAction *action,
                     GVariant      *param,
                     gpointer       user_data)
{
  const char *path, *size;

  g_variant_get (param, "(&s&s)", &path, &size);
  export_to (HL_WINDOW (user_data), path, size);
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

      show_message (self, GTK_MESSAGE_ERROR, text);
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
  HlShellInputs shell = hl_application_default_shell (app);

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

static const GActionEntry win_entries[] = {
  { "new", new_activated },
  { "open", open_activated },
  { "open-recent", open_recent_activated, "s" },
  { "open-file", open_file_activated, "s" },
  { "save", save_activated },
  { "save-to", save_to_activated, "s" },
  { "save-as", save_as_activated },
  { "export", export_activated },
  { "export-to", export_to_activated, "(ss)" },
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
  ask_unsaved_then (self, load_continuation, files->data);
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

  if (!self->close_confirmed && hl_document_get_modified (self->document))
    {
      ask_unsaved_then (self, close_continuation, NULL);
      return TRUE;
    }
  save_window_state (self);
  return GTK_WINDOW_CLASS (hl_window_parent_class)->close_request (window);
}

static void
hl_window_dispose (GObject *object)
{
  HlWindow *self = HL_WINDOW (object);

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

  g_type_ensure (HL_TYPE_SHELL_LIST);
  g_type_ensure (HL_TYPE_SHELL_EDITOR);
  g_type_ensure (HL_TYPE_CANVAS);
  g_type_ensure (HL_TYPE_RESULTS_TABLE);
  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-window.ui");
#define CHILD(name) gtk_widget_class_bind_template_child (widget_class, HlWindow, name)
  CHILD (title_label);
  CHILD (subtitle_label);
  CHILD (primary_menu_button);
  CHILD (recent_section);
  CHILD (info_bar);
  CHILD (info_label);
  CHILD (paned);
  CHILD (results_paned);
  CHILD (shell_list);
  CHILD (shell_editor);
  CHILD (canvas);
  CHILD (results_shell_label);
  CHILD (results_table);
  CHILD (caution_label);
#undef CHILD
  gtk_widget_class_bind_template_callback (widget_class, on_info_bar_response_cb);
}

static void
hl_window_init (HlWindow *self)
{
  GtkDropTarget *drop;

  gtk_widget_init_template (GTK_WIDGET (self));
  g_action_map_add_action_entries (G_ACTION_MAP (self), win_entries, G_N_ELEMENTS (win_entries), self);
  gtk_label_set_text (self->caution_label, _(HL_CAUTION));

  drop = gtk_drop_target_new (GDK_TYPE_FILE_LIST, GDK_ACTION_COPY);
  g_signal_connect (drop, "drop", G_CALLBACK (on_drop_cb), self);
  gtk_widget_add_controller (GTK_WIDGET (self), GTK_EVENT_CONTROLLER (drop));

  g_signal_connect_object (gtk_recent_manager_get_default (), "changed",
                           G_CALLBACK (rebuild_recent), self, G_CONNECT_SWAPPED);
  rebuild_recent (self);
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
    g_autoptr(HlDocument) document = new_document (self);

    set_document (self, document);
  }
  return self;
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
  if (!gtk_info_bar_get_revealed (self->info_bar))
    return NULL;
  return gtk_label_get_text (self->info_label);
}
