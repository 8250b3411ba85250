/* hl-export-job.c — exporting the open document, as the command line would
 *
 * The dialog only chooses the name and the options; what is written and
 * how is decided here and in the render layer's hl_export_run().
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-export-job"

#include "hl-config.h"
#include "hl-export-job.h"
#include "hl-export.h"
#include "hl-fields.h"

#include <glib/gi18n.h>
#include <string.h>

char *
hl_export_preset_size (const char *preset,
                       const char *path)
{
  /* vector sizes are points, so A4 is the paper itself; PNG pixels are
   * twice that, as the command line's default, so it prints sharp */
  guint scale = hl_export_format_for_path (path) == HL_EXPORT_PNG ? HL_EXPORT_PNG_SCALE : 1;
  guint w = HL_EXPORT_DEFAULT_WIDTH * scale, h = HL_EXPORT_DEFAULT_HEIGHT * scale;

  if (g_strcmp0 (preset, "a4-landscape") == 0)
    return g_strdup_printf ("%ux%u", w, h);
  if (g_strcmp0 (preset, "a4-portrait") == 0)
    return g_strdup_printf ("%ux%u", h, w);
  if (g_strcmp0 (preset, "letter-landscape") == 0)
    return g_strdup_printf ("%ux%u", (guint) HL_PAPER_LETTER_HEIGHT * scale, (guint) HL_PAPER_LETTER_WIDTH * scale);
  if (g_strcmp0 (preset, "1920x1080") == 0)
    return g_strdup ("1920x1080");
  return NULL;
}

static const struct
{
  const char     *word;
  HlFigurePanels  bit;
} panel_words[] = {
  { "section", HL_PANEL_SECTION }, { "detail", HL_PANEL_DETAIL }, { "plot", HL_PANEL_PLOT },
  { "chart", HL_PANEL_CHART },
};

void
hl_export_choices_load (HlExportChoices *choices,
                        GSettings       *settings,
                        HlUnitSystem     units)
{
  g_autofree char *paper = NULL;
  g_auto(GStrv) panels = NULL;

  g_return_if_fail (choices != NULL);

  memset (choices, 0, sizeof *choices);
  choices->paper = units == HL_UNIT_SYSTEM_US ? HL_PAPER_LETTER : HL_PAPER_A4;
  if (settings == NULL)
    return;
  choices->scope = g_settings_get_enum (settings, "export-scope") == 1 ? HL_EXPORT_SCOPE_ALL : HL_EXPORT_SCOPE_SHELL;
  choices->figure_only = g_settings_get_boolean (settings, "export-figure-only");
  paper = g_settings_get_string (settings, "export-paper");
  if (g_strcmp0 (paper, "a4") == 0)
    choices->paper = HL_PAPER_A4;
  else if (g_strcmp0 (paper, "letter") == 0)
    choices->paper = HL_PAPER_LETTER;
  panels = g_settings_get_strv (settings, "export-panels");
  for (guint i = 0; panels[i] != NULL; i++)
    for (guint k = 0; k < G_N_ELEMENTS (panel_words); k++)
      if (strcmp (panels[i], panel_words[k].word) == 0)
        choices->panels |= panel_words[k].bit;
  /* all four is the figure as it always was: every panel that fits */
  if (choices->panels == HL_PANELS_ALL)
    choices->panels = 0;
}

void
hl_export_choices_save (const HlExportChoices *choices,
                        GSettings             *settings)
{
  g_autoptr(GPtrArray) panels = g_ptr_array_new ();

  g_return_if_fail (choices != NULL && G_IS_SETTINGS (settings));

  for (guint k = 0; k < G_N_ELEMENTS (panel_words); k++)
    if (choices->panels == 0 || (choices->panels & panel_words[k].bit) != 0)
      g_ptr_array_add (panels, (gpointer) panel_words[k].word);
  g_ptr_array_add (panels, NULL);
  g_settings_set_enum (settings, "export-scope", choices->scope == HL_EXPORT_SCOPE_ALL ? 1 : 0);
  g_settings_set_boolean (settings, "export-figure-only", choices->figure_only);
  g_settings_set_string (settings, "export-paper", choices->paper == HL_PAPER_LETTER ? "letter" : "a4");
  g_settings_set_strv (settings, "export-panels", (const char *const *) panels->pdata);
}

/* the shells of @choices' scope, in the project's order */
static GList *
scope_shells (HlDocument            *document,
              const HlExportChoices *choices)
{
  const HlProject *project = hl_document_get_project (document);
  HlShellInputs *shell = (HlShellInputs *) hl_document_get_shell (document);
  GList *shells = NULL;

  if (choices->scope == HL_EXPORT_SCOPE_ALL)
    for (guint i = hl_project_n_shells (project); i > 0; i--)
      shells = g_list_prepend (shells, hl_project_shell (project, i - 1));
  else if (shell != NULL)
    shells = g_list_prepend (shells, shell);
  return shells;
}

static void
fill_request (HlExportRequest       *req,
              HlDocument            *document,
              const char            *path,
              const HlExportChoices *choices,
              GList                 *shells)
{
  const HlProject *project = hl_document_get_project (document);

  *req = (HlExportRequest) { 0 };
  req->project = (HlProject *) project;
  req->shells = shells;
  req->path = path;
  req->units = project->display_units;
  req->points = HL_DEFAULT_POINTS;
  req->size = choices->size[0] != '\0' ? choices->size : NULL;
  req->figure_only = choices->figure_only;
  req->shell_given = choices->scope == HL_EXPORT_SCOPE_SHELL;
  req->paper = choices->paper;
  req->panels = choices->panels;
  /* a German window exports German numbers; the CSV stays C locale */
  req->locale_numbers = hl_locale_decimal_comma ();
}

char *
hl_export_list_names (GPtrArray *names)
{
  GString *s = g_string_new (NULL);

  for (guint i = 0; i < names->len; i++)
    {
      if (i > 0)
        /* TRANSLATORS: separators of a list of file names */
        g_string_append (s, i + 1 == names->len ? _(" and ") : _(", "));
      g_string_append_printf (s, "“%s”", (const char *) g_ptr_array_index (names, i));
    }
  return g_string_free (s, FALSE);
}

GPtrArray *
hl_export_document_names (HlDocument            *document,
                          const char            *path,
                          const HlExportChoices *choices)
{
  GList *shells = scope_shells (document, choices);
  GPtrArray *names = g_ptr_array_new_with_free_func (g_free);
  g_autoptr(GPtrArray) paths = NULL;
  HlExportRequest req;

  fill_request (&req, document, path, choices, shells);
  paths = hl_export_output_paths (&req);
  for (guint i = 0; i < paths->len; i++)
    g_ptr_array_add (names, g_path_get_basename (g_ptr_array_index (paths, i)));
  g_list_free (shells);
  return names;
}

gboolean
hl_export_document (HlDocument            *document,
                    const char            *path,
                    const HlExportChoices *choices,
                    GError               **error)
{
  GList *shells;
  HlExportRequest req;
  gboolean ok;

  g_return_val_if_fail (HL_IS_DOCUMENT (document), FALSE);
  g_return_val_if_fail (path != NULL && choices != NULL, FALSE);

  shells = scope_shells (document, choices);
  if (shells == NULL)
    {
      g_set_error_literal (error, G_IO_ERROR, G_IO_ERROR_INVALID_ARGUMENT,
                           _("The project has no shells. Add one to see results."));
      return FALSE;
    }
  fill_request (&req, document, path, choices, shells);
  ok = hl_export_run (&req, error);
  g_list_free (shells);
  return ok;
}
