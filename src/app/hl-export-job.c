/* hl-export-job.c — exporting the open document, as the command line would
 *
 * The dialog only chooses the name and the size; what is written and how
 * is decided here and in the render layer's hl_export_run().
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-export-job"

#include "hl-config.h"
#include "hl-export-job.h"
#include "hl-export.h"

#include <glib/gi18n.h>

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
  if (g_strcmp0 (preset, "1920x1080") == 0)
    return g_strdup ("1920x1080");
  return NULL;
}

gboolean
hl_export_document (HlDocument  *document,
                    const char  *path,
                    const char  *size,
                    GError     **error)
{
  const HlProject *project = hl_document_get_project (document);
  HlShellInputs *shell = (HlShellInputs *) hl_document_get_shell (document);
  HlExportFormat format = hl_export_format_for_path (path);
  HlExportRequest req = { 0 };
  GList *shells = NULL;
  gboolean ok;

  g_return_val_if_fail (HL_IS_DOCUMENT (document), FALSE);
  g_return_val_if_fail (path != NULL, FALSE);

  /* the report covers the whole project, a figure or table the shell shown */
  if (format == HL_EXPORT_TXT)
    for (guint i = hl_project_n_shells (project); i > 0; i--)
      shells = g_list_prepend (shells, hl_project_shell (project, i - 1));
  else if (shell != NULL)
    shells = g_list_prepend (shells, shell);
  if (shells == NULL)
    {
      g_set_error_literal (error, G_IO_ERROR, G_IO_ERROR_INVALID_ARGUMENT, _("The project has no shells. Add one to see results."));
      return FALSE;
    }
  req.project = (HlProject *) project;
  req.shells = shells;
  req.path = path;
  req.units = project->display_units;
  req.points = HL_DEFAULT_POINTS;
  req.size = size != NULL && size[0] != '\0' ? size : NULL;
  req.figure_only = FALSE;
  req.shell_given = format != HL_EXPORT_TXT;
  ok = hl_export_run (&req, error);
  g_list_free (shells);
  return ok;
}
