/* hl-export-shells.c — the exports of several shells: one CSV of them
 * all, and one SVG or PNG figure per shell
 *
 * A CSV holds one table per shell, each after its own comment lines, so
 * one file carries the whole project.  An SVG or PNG is one picture, so
 * a scope of several shells gives one file per shell, named after the
 * shell: "receiver.svg" becomes "receiver-shell-1.svg", "receiver-
 * shell-2.svg".  Every file is written to a temporary name first and
 * only when all are complete do they take their names, so a failure
 * leaves none of them behind.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-export-shells"

#include "hl-export.h"
#include "hl-export-private.h"
#include "hl-atomic-file.h"
#include "hl-report.h"
#include "hl-solution.h"

#include <gio/gio.h>
#include <string.h>

/* "name-ID.ext" beside @path; an id holds only letters, digits, "_",
 * "." and "-" (the file's rule), anything else becomes "_" all the same */
static char *
path_for_shell (const char *path,
                const char *id)
{
  const char *dot = strrchr (path, '.');
  const char *slash = strrchr (path, G_DIR_SEPARATOR);
  g_autofree char *safe = g_strdup (id);
  gsize stem;

  if (dot == NULL || (slash != NULL && dot < slash))
    dot = path + strlen (path);
  stem = (gsize) (dot - path);
  for (char *p = safe; *p != '\0'; p++)
    if (!g_ascii_isalnum (*p) && *p != '_' && *p != '.' && *p != '-')
      *p = '_';
  return g_strdup_printf ("%.*s-%s%s", (int) stem, path, safe, dot);
}

gboolean
hl_export_one_file_per_shell (const HlExportRequest *req)
{
  HlExportFormat format = hl_export_format_for_path (req->path);

  return (format == HL_EXPORT_SVG || format == HL_EXPORT_PNG) && req->shells != NULL && req->shells->next != NULL;
}

GPtrArray *
hl_export_output_paths (const HlExportRequest *req)
{
  GPtrArray *paths = g_ptr_array_new_with_free_func (g_free);

  g_return_val_if_fail (req != NULL && req->path != NULL, paths);

  if (!hl_export_one_file_per_shell (req))
    g_ptr_array_add (paths, g_strdup (req->path));
  else
    for (GList *l = req->shells; l != NULL; l = l->next)
      g_ptr_array_add (paths, path_for_shell (req->path, ((const HlShellInputs *) l->data)->id));
  return paths;
}

static void
set_shell_error (GError              **error,
                 const HlShellInputs  *shell,
                 const GError         *local)
{
  g_set_error (error, local->domain, local->code, "shell %s: %s", shell->id, local->message);
}

gboolean
hl_export_csv_shells (const HlExportRequest *req,
                      GError               **error)
{
  g_autoptr(GString) out = g_string_new (NULL);

  for (GList *l = req->shells; l != NULL; l = l->next)
    {
      g_autoptr(GError) local = NULL;
      g_autoptr(HlSolution) sol = hl_solve (l->data, req->points, TRUE, &local);
      g_autofree char *csv = NULL;

      if (sol == NULL)
        {
          set_shell_error (error, l->data, local);
          return FALSE;
        }
      csv = hl_report_csv (sol, req->units);
      g_string_append (out, csv);
    }
  return hl_atomic_write (req->path, out->str, out->len, error);
}

/* one shell's figure, to @target */
static gboolean
write_figure (const HlExportRequest *req,
              const HlShellInputs   *shell,
              HlExportFormat         format,
              guint                  width,
              guint                  height,
              const char            *target,
              GError               **error)
{
  g_autoptr(GPtrArray) keep = g_ptr_array_new_with_free_func ((GDestroyNotify) hl_solution_free);
  HlFigureContext ctx = { 0 };

  if (!hl_export_shell_context (req, shell, keep, &ctx, error))
    return FALSE;
  return hl_export_figure_file (target, format, width, height, &ctx, TRUE, error);
}

gboolean
hl_export_figure_shells (const HlExportRequest *req,
                         HlExportFormat         format,
                         GError               **error)
{
  g_autoptr(GPtrArray) paths = hl_export_output_paths (req);
  g_autoptr(GPtrArray) staged = g_ptr_array_new_with_free_func (g_free);
  g_autoptr(GError) local = NULL;
  guint width, height, i;
  GList *l;

  if (!hl_export_parse_size (req->size, format, &width, &height, &local))
    {
      g_set_error_literal (error, HL_EXPORT_ERROR, HL_EXPORT_ERROR_BAD_REQUEST, local->message);
      return FALSE;
    }
  if (paths->len == 1)
    return hl_atomic_check_target (req->path, error)
           && write_figure (req, req->shells->data, format, width, height, req->path, error);
  /* what a rename would refuse is found before anything is written, so
   * that the renames at the end do not stop half-way */
  for (i = 0; i < paths->len; i++)
    if (!hl_atomic_check_replace (g_ptr_array_index (paths, i), error))
      return FALSE;

  /* every figure complete under a temporary name before any takes its own */
  for (l = req->shells, i = 0; l != NULL; l = l->next, i++)
    {
      char *temp = hl_atomic_temp_name (g_ptr_array_index (paths, i));

      g_ptr_array_add (staged, temp);
      if (!write_figure (req, l->data, format, width, height, temp, error))
        goto fail;
    }
  for (i = 0; i < paths->len; i++)
    if (!hl_atomic_commit (g_ptr_array_index (staged, i), g_ptr_array_index (paths, i), error))
      {
        /* the ones already renamed are complete files of this export;
         * what is left of the others goes */
        for (guint k = i + 1; k < staged->len; k++)
          hl_atomic_abandon (g_ptr_array_index (staged, k));
        return FALSE;
      }
  return TRUE;

fail:
  for (i = 0; i < staged->len; i++)
    hl_atomic_abandon (g_ptr_array_index (staged, i));
  return FALSE;
}
