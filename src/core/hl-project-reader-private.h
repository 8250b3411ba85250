/* hl-project-reader-private.h — shared by the project reader's files
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-project-file.h"

#include <libxml/parser.h>
#include <libxml/tree.h>
#include <libxml/xmlerror.h>

G_BEGIN_DECLS

typedef struct
{
  const char *name;         /* file name for messages */
  GPtrArray  *warnings;
  GError     *error;        /* first error only */
  GHashTable *shell_ids;    /* seen so far: a linear search made big files quadratic */
  GHashTable *material_ids; /* id -> index + 1 in the project's materials, likewise */
  GHashTable *copies;       /* id -> HlMaterial: built-in materials as the file holds them */
  int         parse_depth;  /* elements open while parsing */
} HlReader;

/* Records the first error only: "NAME:LINE: element: message". */
void        hl_reader_fail                (HlReader   *rd,
                                           int         code,
                                           long        line,
                                           const char *element,
                                           const char *format,
                                           ...) G_GNUC_PRINTF (5, 6);

/* What a shell with the id @id holds before its element is read: the
 * defaults of DESIGN.md §3, the id as name, no internal pressure.  The
 * writer leaves out what equals them. */
HlShellInputs hl_reader_shell_default     (const char *id);

/* libxml2's structured error handler; @user_data is the HlReader */
void        hl_reader_on_structured_error (void        *user_data,
                                           xmlErrorPtr  err);

char       *hl_reader_text                (xmlNodePtr  n);
xmlNodePtr  hl_reader_child               (xmlNodePtr  parent,
                                           const char *name);
char       *hl_reader_prop                (xmlNodePtr  n,
                                           const char *name);
gboolean    hl_reader_valid_id            (const char *id);

extern const char *const hl_reader_known_project[];
/* the field table's elements; a material also holds <origin> */
const char *const *hl_reader_known_material (void);
const char *const *hl_reader_known_shell    (void);

/* hl-project-guard.c */
gboolean    hl_reader_refuse_declarations (HlReader   *rd,
                                           const char *data,
                                           gsize       length);
/* installs the depth cap on @ctxt, whose _private must be the HlReader */
void        hl_reader_cap_depth_while_parsing (xmlParserCtxtPtr ctxt);
gboolean    hl_reader_check_depth         (HlReader   *rd,
                                           xmlNodePtr  node,
                                           int         depth);

/* hl-project-schema.c */
gboolean    hl_reader_validate            (HlReader   *rd,
                                           xmlDocPtr   doc);

/* hl-project-explain.c */
void        hl_reader_explain_invalid     (HlReader   *rd,
                                           xmlNodePtr  root);

G_END_DECLS
