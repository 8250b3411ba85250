/* hl-application.c — the application: windows, settings, app actions
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-application"

#include "hl-config.h"
#include "hl-application.h"
#include "hl-app-resources.h"
#include "hl-canvas.h"
#include "hl-startup-trace.h"
#include "hl-preferences.h"
#include "hl-recovery.h"
#include "hl-report.h"
#include "hl-window.h"

#include <glib/gi18n.h>
#include <glib-unix.h>
#include <signal.h>
#include <stdio.h>

struct _HlApplication
{
  AdwApplication parent_instance;

  GSettings     *settings;
  guint          signal_sources[2];
};

G_DEFINE_FINAL_TYPE (HlApplication, hl_application, ADW_TYPE_APPLICATION)

/* Off, the desktop's own light or dark preference decides; on, dark
 * whatever the desktop says.  The style manager reads the desktop's
 * preference itself, where the theme name was only a guess. */
static void
apply_dark_style (HlApplication *self)
{
  adw_style_manager_set_color_scheme (adw_style_manager_get_default (),
                                      g_settings_get_boolean (self->settings, "dark-style")
                                      ? ADW_COLOR_SCHEME_FORCE_DARK : ADW_COLOR_SCHEME_PREFER_LIGHT);
}

static void
on_dark_style_changed_cb (GSettings     *settings,
                          const char    *key,
                          HlApplication *self)
{
  apply_dark_style (self);
}

static void
quit_activated (GSimpleAction *action,
                GVariant      *param,
                gpointer       user_data)
{
  GList *windows = g_list_copy (gtk_application_get_windows (GTK_APPLICATION (user_data)));

  /* each window with unsaved work asks before it goes */
  for (GList *l = windows; l != NULL; l = l->next)
    gtk_window_close (GTK_WINDOW (l->data));
  g_list_free (windows);
}

/* SIGTERM (logout, shutdown, kill) and SIGINT (Ctrl+C in a terminal)
 * leave no time for questions: each window keeps its unsaved work as a
 * crash-recovery copy, offered at the next start, and goes. */
static gboolean
on_quit_signal_cb (gpointer user_data)
{
  GApplication *application = G_APPLICATION (user_data);
  GList *windows = g_list_copy (gtk_application_get_windows (GTK_APPLICATION (application)));

  for (GList *l = windows; l != NULL; l = l->next)
    if (HL_IS_WINDOW (l->data))
      hl_window_end_session (HL_WINDOW (l->data));
  g_list_free (windows);
  g_application_quit (application);
  return G_SOURCE_CONTINUE;
}

static void
preferences_activated (GSimpleAction *action,
                       GVariant      *param,
                       gpointer       user_data)
{
  HlApplication *self = HL_APPLICATION (user_data);
  GtkWindow *parent = gtk_application_get_active_window (GTK_APPLICATION (self));

  gtk_window_present (GTK_WINDOW (hl_preferences_new (parent, self->settings)));
}

static void
about_activated (GSimpleAction *action,
                 GVariant      *param,
                 gpointer       user_data)
{
  GtkWindow *parent = gtk_application_get_active_window (GTK_APPLICATION (user_data));
  g_autofree char *comments = g_strdup_printf ("%s\n\n%s",
                                               _("Checks pressurised shells: thin-wall and thick-wall "
                                                 "(Lamé) stresses, allowable pressure and required thickness."),
                                               _(HL_CAUTION));
  const char *authors[] = { _("The Hoopline developers"), NULL };

  GtkWidget *about = adw_about_window_new ();

  g_object_set (about,
                "transient-for", parent,
                "modal", TRUE,
                "application-name", "Hoopline",
                "application-icon", HL_APPLICATION_ID,
                "version", HL_VERSION,
                "comments", comments,
                "license-type", GTK_LICENSE_GPL_3_0,
                "developers", authors,
                /* TRANSLATORS: your name, one line per translator */
                "translator-credits", _("translator-credits"),
                NULL);
  gtk_window_present (GTK_WINDOW (about));
}

static const GActionEntry app_entries[] = {
  { "quit", quit_activated },
  { "preferences", preferences_activated },
  { "about", about_activated },
};

static void
hl_application_startup (GApplication *application)
{
  HlApplication *self = HL_APPLICATION (application);
  static const struct { const char *action; const char *accels[4]; } accels[] = {
    { "app.quit", { "<Control>q", NULL } },
    { "app.preferences", { "<Control>comma", NULL } },
    { "win.new", { "<Control>n", NULL } },
    { "win.open", { "<Control>o", NULL } },
    { "win.save", { "<Control>s", NULL } },
    { "win.save-as", { "<Control><Shift>s", NULL } },
    { "win.export", { "<Control>e", NULL } },
    { "win.print", { "<Control>p", NULL } },
    { "win.undo", { "<Control>z", NULL } },
    { "win.redo", { "<Control><Shift>z", "<Control>y", NULL } },
    { "win.copy-results", { "<Control><Shift>c", NULL } },
    { "win.show-page::figure", { "<Alt>1", NULL } },
    { "win.show-page::results", { "<Alt>2", NULL } },
    { "win.properties", { "<Alt>Return", NULL } },
    { "win.shell-add", { "<Control><Shift>n", NULL } },
    { "win.shell-rename", { "F2", NULL } },
    { "window.close", { "<Control>w", NULL } },
    { "win.zoom-in", { "<Control>plus", "<Control>equal", "<Control>KP_Add" } },
    { "win.zoom-out", { "<Control>minus", "<Control>KP_Subtract", NULL } },
    { "win.zoom-fit", { "<Control>0", "<Control>KP_0", NULL } },
  };

  G_APPLICATION_CLASS (hl_application_parent_class)->startup (application);
  hl_startup_trace ("toolkit started");

  g_action_map_add_action_entries (G_ACTION_MAP (self), app_entries, G_N_ELEMENTS (app_entries), self);
  self->signal_sources[0] = g_unix_signal_add (SIGTERM, on_quit_signal_cb, self);
  self->signal_sources[1] = g_unix_signal_add (SIGINT, on_quit_signal_cb, self);
  for (guint i = 0; i < G_N_ELEMENTS (accels); i++)
    gtk_application_set_accels_for_action (GTK_APPLICATION (self), accels[i].action, accels[i].accels);

  /* AdwApplication loads style.css from the resource base path itself
   * (GtkStyleContext, which adding it by hand takes, goes in GTK 4.10) */
  g_signal_connect (self->settings, "changed::dark-style", G_CALLBACK (on_dark_style_changed_cb), self);
  apply_dark_style (self);
}

static void
hl_application_activate (GApplication *application)
{
  GtkWindow *window = gtk_application_get_active_window (GTK_APPLICATION (application));

  if (window == NULL)
    window = GTK_WINDOW (hl_window_new (GTK_APPLICATION (application)));
  gtk_window_present (window);
  hl_recovery_offer (GTK_APPLICATION (application), window);
}

/* HL_TEST_EDIT with HL_TEST_HOOKS=1: an edit right after loading, so a
 * test can crash a run that has unsaved work */
static void
apply_test_edit (GtkWindow *window)
{
  const char *title = g_getenv ("HL_TEST_EDIT");
  HlDocument *document;
  const HlProject *p;

  if (g_strcmp0 (g_getenv ("HL_TEST_HOOKS"), "1") != 0 || title == NULL || !HL_IS_WINDOW (window))
    return;
  document = hl_window_get_document (HL_WINDOW (window));
  p = hl_document_get_project (document);
  hl_document_set_info (document, title, p->engineer, p->description, p->display_units);
  /* a test waits for this line before it signals the run */
  printf ("hoopline: test edit applied\n");
  fflush (stdout);
}

/* A file already open is shown again; otherwise it opens in an untouched
 * window or a new one, never over someone's work. */
static void
hl_application_open (GApplication  *application,
                     GFile        **files,
                     int            n_files,
                     const char    *hint)
{
  for (int i = 0; i < n_files; i++)
    {
      GtkWindow *target = NULL;

      for (GList *l = gtk_application_get_windows (GTK_APPLICATION (application)); l != NULL; l = l->next)
        if (HL_IS_WINDOW (l->data) && hl_window_shows_file (l->data, files[i]))
          target = l->data;
      if (target == NULL)
        {
          GtkWindow *active = gtk_application_get_active_window (GTK_APPLICATION (application));

          if (HL_IS_WINDOW (active) && hl_window_is_pristine (HL_WINDOW (active)))
            target = active;
          else
            target = GTK_WINDOW (hl_window_new (GTK_APPLICATION (application)));
          hl_startup_trace ("window built");
          if (hl_window_load_file (HL_WINDOW (target), files[i]))
            apply_test_edit (target);
          hl_startup_trace ("project loaded");
        }
      gtk_window_present (target);
    }
  hl_recovery_offer (GTK_APPLICATION (application),
                     gtk_application_get_active_window (GTK_APPLICATION (application)));
}

static void
hl_application_dispose (GObject *object)
{
  HlApplication *self = HL_APPLICATION (object);

  for (guint i = 0; i < G_N_ELEMENTS (self->signal_sources); i++)
    g_clear_handle_id (&self->signal_sources[i], g_source_remove);
  g_clear_object (&self->settings);
  G_OBJECT_CLASS (hl_application_parent_class)->dispose (object);
}

static void
hl_application_class_init (HlApplicationClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GApplicationClass *app_class = G_APPLICATION_CLASS (klass);

  object_class->dispose = hl_application_dispose;
  app_class->startup = hl_application_startup;
  app_class->activate = hl_application_activate;
  app_class->open = hl_application_open;

  /* templates are looked up when the first widget is made */
  hl_app_register_resource ();
}

/* An installed program finds its schema; one run from the build tree
 * finds it compiled beside the build's data instead. */
static GSettings *
open_settings (void)
{
  GSettingsSchemaSource *source = g_settings_schema_source_get_default ();
  g_autoptr(GSettingsSchema) schema = NULL;

  if (source != NULL)
    schema = g_settings_schema_source_lookup (source, HL_APPLICATION_ID, TRUE);
  if (schema == NULL)
    {
      g_autoptr(GSettingsSchemaSource) local =
        g_settings_schema_source_new_from_directory (HL_SCHEMA_BUILD_DIR, source, FALSE, NULL);

      if (local != NULL)
        schema = g_settings_schema_source_lookup (local, HL_APPLICATION_ID, FALSE);
    }
  if (schema == NULL)
    g_error ("the settings schema %s is not installed", HL_APPLICATION_ID);
  return g_settings_new_full (schema, NULL, NULL);
}

static void
hl_application_init (HlApplication *self)
{
  self->settings = open_settings ();
}

HlApplication *
hl_application_new (GApplicationFlags extra_flags)
{
  return g_object_new (HL_TYPE_APPLICATION,
                       "application-id", HL_APPLICATION_ID,
                       "flags", G_APPLICATION_HANDLES_OPEN | extra_flags,
                       "resource-base-path", "/org/hoopline/Hoopline",
                       NULL);
}

GSettings *
hl_application_get_settings (HlApplication *self)
{
  g_return_val_if_fail (HL_IS_APPLICATION (self), NULL);
  return self->settings;
}

HlUnitSystem
hl_application_unit_system (HlApplication *self)
{
  g_return_val_if_fail (HL_IS_APPLICATION (self), HL_UNIT_SYSTEM_SI);
  return g_settings_get_enum (self->settings, "unit-system") == 1 ? HL_UNIT_SYSTEM_US : HL_UNIT_SYSTEM_SI;
}

HlShellInputs
hl_application_default_shell (HlApplication *self,
                              HlUnitSystem   system)
{
  HlShellInputs shell = hl_shell_inputs_default ();

  g_return_val_if_fail (HL_IS_APPLICATION (self), shell);

  if (system == HL_UNIT_SYSTEM_US)
    {
      /* round US sizes rather than converted SI ones (39.37 in), and the
       * material as US tables state it (29000 ksi, not 200 GPa) */
      shell.size = hl_quantity_make (40, "in");
      shell.wall_thickness = hl_quantity_make (0.375, "in");
      shell.corrosion_allowance = hl_quantity_make (0, "in");
      shell.internal_pressure = hl_quantity_make (150, "psi");
      shell.external_pressure = hl_quantity_make (0, "psi");
      shell.material = hl_material_default_in (HL_UNIT_SYSTEM_US);
    }
  shell.thin_tolerance = hl_quantity_make (g_settings_get_double (self->settings, "default-tolerance"), "%");
  switch (g_settings_get_enum (self->settings, "default-verdict-measure"))
    {
    case 0:
      shell.verdict_measure = HL_MEASURE_HOOP;
      break;
    case 1:
      shell.verdict_measure = HL_MEASURE_EQUIVALENT;
      break;
    default:
      shell.verdict_measure = HL_MEASURE_BOTH;
    }
  /* the schema's values follow HlDesignBasis */
  shell.design_basis = (HlDesignBasis) CLAMP (g_settings_get_enum (self->settings, "default-design-basis"),
                                              HL_DESIGN_BASIS_UG27, HL_DESIGN_BASIS_THIN);
  return shell;
}

int
hl_application_main (int    argc,
                     char **argv)
{
  g_autoptr(HlApplication) app = NULL;

  hl_startup_trace_mark ();
  app = hl_application_new (G_APPLICATION_DEFAULT_FLAGS);
  return g_application_run (G_APPLICATION (app), argc, argv);
}
