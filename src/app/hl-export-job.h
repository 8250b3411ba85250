/* hl-export-job.h — exporting the open document, as the command line would
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gio/gio.h>

#include "hl-document.h"
#include "hl-paper.h"

G_BEGIN_DECLS

typedef enum
{
  HL_EXPORT_SCOPE_SHELL,   /* the shell shown */
  HL_EXPORT_SCOPE_ALL,     /* every shell of the project */
} HlExportScope;

/* What the Export dialog chooses besides the name. */
typedef struct
{
  char          size[32];      /* "WxH", or "" for the format's default */
  HlExportScope scope;
  gboolean      figure_only;   /* PDF without the calculation sheet */
  HlPaper       paper;
  guint         panels;        /* HlFigurePanels; 0: all that fit */
} HlExportChoices;

/* The "WxH" of a size preset for the format of @path, or NULL for
 * "custom".  Presets: "a4-landscape", "a4-portrait", "letter-landscape",
 * "1920x1080". */
char *hl_export_preset_size    (const char *preset,
                                const char *path);

/* The choices remembered in @settings (the keys export-scope,
 * export-figure-only, export-paper, export-panels; the size is left
 * ""); @settings NULL gives the defaults.  A paper of "auto" is A4, or
 * Letter for a project in US customary @units. */
void  hl_export_choices_load   (HlExportChoices *choices,
                                GSettings       *settings,
                                HlUnitSystem     units);
void  hl_export_choices_save   (const HlExportChoices *choices,
                                GSettings             *settings);

/* The files hl_export_document() writes for @path with @choices: @path,
 * or one per shell for an SVG or PNG of all shells.  Basenames. */
GPtrArray *hl_export_document_names (HlDocument            *document,
                                     const char            *path,
                                     const HlExportChoices *choices);

/* “a.svg”, “b.svg” and “c.svg”: @names quoted, in the user's language */
char      *hl_export_list_names     (GPtrArray *names);

/* Writes @path from the document as the command line would: with a
 * scope of all shells, a PDF, TXT or CSV of every shell and an SVG or
 * PNG per shell; else of the selected shell. */
gboolean hl_export_document    (HlDocument            *document,
                                const char            *path,
                                const HlExportChoices *choices,
                                GError               **error);

G_END_DECLS
