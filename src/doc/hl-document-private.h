/* hl-document-private.h — what the document's own files share
 *
 * The document is one GObject in several files, cut along its seams:
 * the edit cycle and file (hl-document.c), the list model of shells and
 * the shell edits (hl-document-shells.c), the material rule
 * (hl-document-materials.c) and the property bookkeeping
 * (hl-document-notify.c).  Nothing outside src/doc includes this.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-document.h"
#include "hl-history.h"

G_BEGIN_DECLS

struct _HlDocument
{
  GObject     parent_instance;

  HlProject  *project;
  HlProject  *saved;          /* as on disk, for the modified flag */
  GFile      *file;
  guint       selected;

  HlHistory  *history;        /* undo and redo, by what each edit changed */

  GHashTable *input_errors;   /* field -> message */
  HlSolution *solution;       /* the corroded wall, what every check uses */
  HlSolution *new_wall;       /* the wall as built, beside it in the sheet */
  GPtrArray  *problems;
  char       *problem_text;

  /* what the properties last said, so each notifies only on a change */
  char       *seen_title;
  GFile      *seen_file;
  guint       seen_selected;
  gboolean    seen_modified, seen_can_undo, seen_can_redo;
  gboolean    primed;         /* the seen_ values hold the first state */

  GListStore *shells;         /* HlShellItem, in step with the project */
};

enum
{
  PROP_0,
  PROP_TITLE,
  PROP_FILE,
  PROP_MODIFIED,
  PROP_SELECTED,
  PROP_SOLUTION,
  PROP_CAN_UNDO,
  PROP_CAN_REDO,
  N_PROPS
};
extern GParamSpec *hl_document_props[N_PROPS];

/* one undoable step: begin, change the project through the history, end */
void hl_document_begin_edit          (HlDocument *self,
                                      const char *merge_key);
void hl_document_end_edit            (HlDocument *self);
/* solves again, emits "changed", then notifies the properties that moved */
void hl_document_emit_changed        (HlDocument *self);

void hl_document_sync_shells         (HlDocument *self);
void hl_document_remember_properties (HlDocument *self);
void hl_document_notify_properties   (HlDocument *self);

G_END_DECLS
