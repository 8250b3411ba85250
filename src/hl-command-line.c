/* hl-command-line.c — the headless commands: --summary, --export, --check
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline"

#include "hl-config.h"
#include "hl-command-line.h"
#include "hl-export.h"
#include "hl-project-file.h"
#include "hl-report.h"

#include <stdio.h>
#include <string.h>

typedef struct
{
  gboolean summary;
  gboolean check;
  gboolean version;
  gboolean figure_only;
  char    *units;
  char    *export_path;
  char    *shell_id;
  char    *size;
  int      points;
  char   **files;
} Options;

static void
options_clear (Options *o)
{
  g_free (o->units);
  g_free (o->export_path);
  g_free (o->shell_id);
  g_free (o->size);
  g_strfreev (o->files);
}

gboolean
hl_command_line_is_headless (int    argc,
                             char **argv)
{
  static const char *const headless[] = {
    "--summary", "--export", "--check", "--help", "-h", "--help-all", "--version", NULL
  };

  for (int i = 1; i < argc; i++)
    for (guint k = 0; headless[k] != NULL; k++)
      {
        gsize len = strlen (headless[k]);

        if (strncmp (argv[i], headless[k], len) == 0 && (argv[i][len] == '\0' || argv[i][len] == '='))
          return TRUE;
      }
  return FALSE;
}

static int
usage_error (GOptionContext *ctx,
             const char     *format,
             ...) G_GNUC_PRINTF (2, 3);

static int
usage_error (GOptionContext *ctx,
             const char     *format,
             ...)
{
  g_autofree char *msg = NULL;
  va_list args;

  va_start (args, format);
  msg = g_strdup_vprintf (format, args);
  va_end (args);
  fprintf (stderr, "hoopline: %s\nTry “hoopline --help”.\n", msg);
  (void) ctx;
  return HL_EXIT_BAD_USAGE;
}

static gboolean
parse_units (const char   *text,
             HlUnitSystem *system)
{
  if (text == NULL || strcmp (text, "si") == 0)
    *system = HL_UNIT_SYSTEM_SI;
  else if (strcmp (text, "us") == 0)
    *system = HL_UNIT_SYSTEM_US;
  else
    return FALSE;
  return TRUE;
}

static GList *
selected_shells (HlProject  *project,
                 const char *id)
{
  GList *list = NULL;

  for (guint i = 0; i < hl_project_n_shells (project); i++)
    {
      HlShellInputs *s = hl_project_shell (project, i);

      /* prepended and reversed once: appending walks the list each time,
       * which made --check of 50,000 shells take seconds */
      if (id == NULL || strcmp (s->id, id) == 0)
        list = g_list_prepend (list, s);
    }
  return g_list_reverse (list);
}

static char *
shell_ids (HlProject *project)
{
  GString *s = g_string_new (NULL);

  for (guint i = 0; i < hl_project_n_shells (project); i++)
    g_string_append_printf (s, "%s%s", i ? ", " : "", hl_project_shell (project, i)->id);
  return g_string_free (s, FALSE);
}

static int
run_summary (HlProject   *project,
             GList       *shells,
             HlUnitSystem system)
{
  GString *out = g_string_new (NULL);

  for (GList *l = shells; l != NULL; l = l->next)
    {
      g_autoptr(GError) error = NULL;
      g_autoptr(HlSolution) sol = hl_solve (l->data, HL_DEFAULT_POINTS, TRUE, &error);
      g_autofree char *block = NULL;

      if (sol == NULL)
        {
          fprintf (stderr, "hoopline: shell %s: %s\n", ((HlShellInputs *) l->data)->id, error->message);
          g_string_free (out, TRUE);
          return HL_EXIT_BAD_INPUT;
        }
      block = hl_report_summary_block (sol, system);
      g_string_append_printf (out, "%s%s", l == shells ? "" : "\n", block);
    }
  fputs (out->str, stdout);
  g_string_free (out, TRUE);
  (void) project;
  return HL_EXIT_OK;
}

static int
run_check (const char *path,
           HlProject  *project)
{
  for (guint i = 0; i < hl_project_n_shells (project); i++)
    {
      g_autoptr(GError) error = NULL;
      g_autoptr(HlSolution) sol = hl_solve (hl_project_shell (project, i), 2, TRUE, &error);

      if (sol == NULL)
        {
          fprintf (stderr, "%s: shell %s: %s\n", path, hl_project_shell (project, i)->id, error->message);
          return HL_EXIT_BAD_INPUT;
        }
    }
  printf ("%s: valid Hoopline project, %u shell%s\n", path, hl_project_n_shells (project),
          hl_project_n_shells (project) == 1 ? "" : "s");
  return HL_EXIT_OK;
}

static GOptionContext *
make_context (Options *o)
{
  GOptionEntry entries[] = {
    { "summary", 0, 0, G_OPTION_ARG_NONE, &o->summary, "Print key = value lines for every shell", NULL },
    { "units", 0, 0, G_OPTION_ARG_STRING, &o->units, "Units of --summary and exports: si (mm, MPa) or us (in, psi)", "si|us" },
    { "export", 0, 0, G_OPTION_ARG_FILENAME, &o->export_path,
      "Write OUT: .svg .pdf .png figure, .csv through-thickness table, .txt calculation report", "OUT" },
    { "shell", 0, 0, G_OPTION_ARG_STRING, &o->shell_id, "Only the shell with this id", "ID" },
    { "points", 0, 0, G_OPTION_ARG_INT, &o->points, "Points through the wall for .csv (default 101)", "N" },
    { "size", 0, 0, G_OPTION_ARG_STRING, &o->size, "Figure size: pixels for PNG, points for SVG/PDF", "WxH" },
    { "figure-only", 0, 0, G_OPTION_ARG_NONE, &o->figure_only, "PDF: leave out the calculation sheet", NULL },
    { "check", 0, 0, G_OPTION_ARG_NONE, &o->check, "Validate FILE; exit 1 with file:line: message", NULL },
    { "version", 0, 0, G_OPTION_ARG_NONE, &o->version, "Print the version", NULL },
    { G_OPTION_REMAINING, 0, 0, G_OPTION_ARG_FILENAME_ARRAY, &o->files, NULL, "FILE" },
    { NULL }
  };
  GOptionContext *ctx = g_option_context_new ("[FILE] — check thin and thick pressurised shells");

  g_option_context_add_main_entries (ctx, entries, NULL);
  g_option_context_set_summary (ctx,
                                "Without an option, opens FILE in the window.\n"
                                "Exit status: 0 done, 1 bad file or values, 2 bad command line.");
  g_option_context_set_description (ctx, "Caution: " HL_CAUTION);
  return ctx;
}

int
hl_command_line_run (int    argc,
                     char **argv)
{
  Options o = { 0 };
  g_autoptr(GOptionContext) ctx = NULL;
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) project = NULL;
  g_autoptr(GPtrArray) warnings = NULL;
  g_autoptr(GList) shells = NULL;
  HlUnitSystem system;
  int actions, status;

  o.points = HL_DEFAULT_POINTS;
  ctx = make_context (&o);
  if (!g_option_context_parse (ctx, &argc, &argv, &error))
    {
      status = usage_error (ctx, "%s", error->message);
      goto out;
    }
  if (o.version)
    {
      printf ("hoopline %s\n", HL_VERSION);
      status = HL_EXIT_OK;
      goto out;
    }
  actions = (o.summary ? 1 : 0) + (o.check ? 1 : 0) + (o.export_path != NULL ? 1 : 0);
  if (actions != 1)
    {
      status = usage_error (ctx, "give exactly one of --summary, --export=OUT and --check");
      goto out;
    }
  if (o.files == NULL || o.files[0] == NULL || o.files[1] != NULL)
    {
      status = usage_error (ctx, "give exactly one project FILE");
      goto out;
    }
  if (!parse_units (o.units, &system))
    {
      status = usage_error (ctx, "--units must be si or us, not “%s”", o.units);
      goto out;
    }
  if (o.points < 2 || o.points > HL_MAX_POINTS)
    {
      status = usage_error (ctx, "--points must be a whole number from 2 to %d", HL_MAX_POINTS);
      goto out;
    }

  project = hl_project_load (o.files[0], &warnings, &error);
  if (project == NULL)
    {
      fprintf (stderr, "%s\n", error->message);
      status = HL_EXIT_BAD_INPUT;
      goto out;
    }
  for (guint i = 0; i < warnings->len; i++)
    fprintf (stderr, "warning: %s\n", (const char *) g_ptr_array_index (warnings, i));
  if (o.units == NULL)
    system = project->display_units;

  shells = selected_shells (project, o.shell_id);
  if (shells == NULL)
    {
      g_autofree char *ids = shell_ids (project);

      status = usage_error (ctx, "no shell with id “%s” in %s (it has: %s)", o.shell_id, o.files[0], ids);
      goto out;
    }

  if (o.check)
    status = run_check (o.files[0], project);
  else if (o.summary)
    status = run_summary (project, shells, system);
  else
    {
      HlExportRequest req = { project, shells, o.export_path, system, (guint) o.points,
                              o.size, o.figure_only, o.shell_id != NULL };

      /* the exit code is ours to choose: a bad request (extension,
       * size) is a command-line mistake, anything else bad input */
      if (hl_export_run (&req, &error))
        status = HL_EXIT_OK;
      else
        {
          status = g_error_matches (error, HL_EXPORT_ERROR, HL_EXPORT_ERROR_BAD_REQUEST) ? HL_EXIT_BAD_USAGE
                                                                                          : HL_EXIT_BAD_INPUT;
          fprintf (stderr, "hoopline: %s\n", error->message);
        }
    }

out:
  options_clear (&o);
  return status;
}
