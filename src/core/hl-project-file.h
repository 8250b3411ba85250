/* hl-project-file.h — reading and writing .hoop project files
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-project.h"

G_BEGIN_DECLS

#define HL_PROJECT_FILE_ERROR (hl_project_file_error_quark ())

typedef enum
{
  HL_PROJECT_FILE_ERROR_IO,
  HL_PROJECT_FILE_ERROR_TOO_LARGE,
  HL_PROJECT_FILE_ERROR_UNSAFE,     /* DTD, entities, too deep */
  HL_PROJECT_FILE_ERROR_SYNTAX,     /* not well-formed XML */
  HL_PROJECT_FILE_ERROR_SCHEMA,     /* well-formed, but not our format */
  HL_PROJECT_FILE_ERROR_VALUE,      /* valid shape, bad numbers or refs */
} HlProjectFileError;

/* Files larger than this are refused before they are read. */
#define HL_PROJECT_FILE_MAX_BYTES (16 * 1024 * 1024)
#define HL_PROJECT_FILE_MAX_DEPTH 8

GQuark     hl_project_file_error_quark (void);

/* Error messages read "NAME:LINE: element: reason".  @warnings, if not
 * NULL, receives a new array of char * (unknown elements of a newer
 * minor format version, which are skipped). */
HlProject *hl_project_load        (const char  *path,
                                   GPtrArray  **warnings,
                                   GError     **error);
HlProject *hl_project_load_bytes  (const char  *data,
                                   gsize        length,
                                   const char  *display_name,
                                   GPtrArray  **warnings,
                                   GError     **error);

/* The file text, numbers in the C locale whatever the user's locale. */
char      *hl_project_to_xml      (const HlProject *project);

/* The file text, checked with the reader's own rules before anyone
 * writes it: the bytes are parsed and validated as a file would be, and
 * the project they give must equal @project.  A project that would not
 * reopen (or would reopen changed) gives NULL and a message that names
 * the field to fix ("Cannot save: title: is too long …"). */
char      *hl_project_to_checked_xml (const HlProject *project,
                                      gsize           *length,
                                      GError         **error);

/* The writer's rule for "can this project be written", without writing:
 * every field within the reader's limits and every shell's values valid.
 * The message names the field to fix. */
gboolean   hl_project_check_writable (const HlProject *project,
                                      GError         **error);

/* Atomic: writes a temporary file beside @path and renames it over, so a
 * failed save leaves the old file as it was.  Only checked bytes
 * (hl_project_to_checked_xml) are written. */
gboolean   hl_project_save        (const HlProject *project,
                                   const char      *path,
                                   GError         **error);

G_END_DECLS
