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
  char    *paper;
  char    *panels;
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
  g_free (o->paper);
  g_free (o->panels);
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

/* --paper: a4 or letter; without it the project's units decide */
static gboolean
parse_paper (const char   *text,
             HlUnitSystem  project_units,
             HlPaper      *paper)
{
  if (text == NULL)
    *paper = project_units == HL_UNIT_SYSTEM_US ? HL_PAPER_LETTER : HL_PAPER_A4;
  else if (g_ascii_strcasecmp (text, "a4") == 0)
    *paper = HL_PAPER_A4;
  else if (g_ascii_strcasecmp (text, "letter") == 0)
    *paper = HL_PAPER_LETTER;
  else
    return FALSE;
  return TRUE;
}

/* --panels: a comma list of section, detail, plot, chart; each once */
static gboolean
parse_panels (const char *text,
              guint      *panels,
              char      **bad)
{
  static const struct { const char *word; HlFigurePanels bit; } words[] = {
    { "section", HL_PANEL_SECTION }, { "detail", HL_PANEL_DETAIL }, { "plot", HL_PANEL_PLOT },
    { "chart", HL_PANEL_CHART },
  };
  g_auto(GStrv) parts = NULL;

  *panels = 0;
  if (text == NULL)
    return TRUE;
  parts = g_strsplit (text, ",", -1);
  for (guint i = 0; parts[i] != NULL; i++)
    {
      char *word = g_strstrip (parts[i]);
      guint k;

      for (k = 0; k < G_N_ELEMENTS (words); k++)
        if (strcmp (word, words[k].word) == 0 && (*panels & words[k].bit) == 0)
          break;
      if (k == G_N_ELEMENTS (words))
        {
          *bad = g_strdup (word);
          return FALSE;
        }
      *panels |= words[k].bit;
    }
  return *panels != 0 || (*bad = g_strdup ("")) == NULL;
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
    { "units", 0, 0, G_OPTION_ARG_STRING, &o->units,
      "Units of --summary and exports: si = SI (mm, MPa), us = US customary (in, psi); "
      "default: the project's", "si|us" },
    { "export", 0, 0, G_OPTION_ARG_FILENAME, &o->export_path,
      "Write OUT: .svg .pdf .png figure, .csv through-thickness table, .txt calculation report; "
      "of every shell unless --shell is given (see below)", "OUT" },
    { "shell", 0, 0, G_OPTION_ARG_STRING, &o->shell_id, "Only the shell with this id", "ID" },
    { "points", 0, 0, G_OPTION_ARG_INT, &o->points, "Points through the wall for .csv (default 101)", "N" },
    { "size", 0, 0, G_OPTION_ARG_STRING, &o->size, "Figure size: pixels for PNG, points for SVG/PDF", "WxH" },
    { "paper", 0, 0, G_OPTION_ARG_STRING, &o->paper,
      "PDF sheet paper: a4 or letter; default A4, Letter when the project's units are US customary", "a4|letter" },
    { "panels", 0, 0, G_OPTION_ARG_STRING, &o->panels,
      "Figure panels to draw, comma-separated: section, detail, plot, chart; default all that fit", "LIST" },
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
  g_option_context_set_description (ctx,
                                    "Scope of --export: without --shell, a .pdf, .txt or .csv holds every shell of\n"
                                    "the project (a .csv one table per shell, each after its \"# shell = ID\" lines);\n"
                                    "an .svg or .png is one figure, so a project of several shells gives one file per\n"
                                    "shell, OUT's name with \"-ID\" before the extension (plan.svg: plan-shell-1.svg,\n"
                                    "plan-shell-2.svg ...). With --shell=ID every format holds that shell, in OUT.\n"
                                    "\n"
                                    "Numbers: .svg, .pdf, .png and .txt are written with the decimal mark of the\n"
                                    "locale, as the window shows them (LC_ALL=de_DE.UTF-8: 12,5; LC_NUMERIC=C for\n"
                                    "12.5); .csv and --summary use the C locale: a decimal point, and in a .csv\n"
                                    "fields separated by commas (RFC 4180).\n"
                                    "\n"
                                    "Caution: " HL_CAUTION);
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
  g_autofree char *bad_panel = NULL;
  HlUnitSystem system;
  HlPaper paper;
  guint panels;
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

  if (!parse_paper (o.paper, project->display_units, &paper))
    {
      status = usage_error (ctx, "--paper must be a4 or letter, not “%s”", o.paper);
      goto out;
    }
  if (!parse_panels (o.panels, &panels, &bad_panel))
    {
      status = usage_error (ctx, "--panels=%s: “%s” is not one of section, detail, plot, chart "
                            "(each at most once, comma-separated)", o.panels, bad_panel);
      goto out;
    }

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

      req.paper = paper;
      req.panels = panels;
      /* as the window: the figure, sheet and report in the locale's
       * numbers; the CSV stays C locale in the writer */
      req.locale_numbers = hl_format_locale_decimal_comma ();

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
