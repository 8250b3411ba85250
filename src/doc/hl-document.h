/* hl-document.h — the open project: file, modified flag, undo, selection
 *
 * Every edit goes through here so that undo, the modified mark and the
 * one solve per change stay in step.  GLib only (src/doc): tested
 * without a display in tests/doc.  Views listen to "changed", or bind to
 * the read-only properties (title, file, modified, selected, solution,
 * can-undo, can-redo), which notify only when their value changes.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <gio/gio.h>

#include "hl-project.h"
#include "hl-solution.h"

G_BEGIN_DECLS

#define HL_TYPE_DOCUMENT (hl_document_get_type ())
G_DECLARE_FINAL_TYPE (HlDocument, hl_document, HL, DOCUMENT, GObject)

/* An unsaved project holding one shell, a copy of @first_shell. */
HlDocument          *hl_document_new             (const HlShellInputs *first_shell,
                                                  HlUnitSystem         units);

/* A project brought back from a crash-recovery copy: takes @project; it
 * counts as modified against @file's content (or as never saved), and
 * saving writes to @file (nullable). */
HlDocument          *hl_document_new_restored    (HlProject           *project,
                                                  GFile               *file);

/* Replaces the content with the file's; on failure nothing changes.
 * @warnings (nullable) receives the loader's warnings. */
gboolean             hl_document_load            (HlDocument  *self,
                                                  GFile       *file,
                                                  GPtrArray  **warnings,
                                                  GError     **error);
/* The one rule for "can this project be written now" (save, save as,
 * the crash-recovery copy): no field whose text cannot be read, every
 * shell's values valid, every field within the file's limits. */
gboolean             hl_document_check_writable  (HlDocument  *self,
                                                  GError     **error);
/* Saves to @file, or to the current file when @file is NULL.  On failure
 * the document stays modified and keeps its file. */
gboolean             hl_document_save            (HlDocument  *self,
                                                  GFile       *file,
                                                  GError     **error);

const HlProject     *hl_document_get_project     (HlDocument *self);
GFile               *hl_document_get_file        (HlDocument *self);
gboolean             hl_document_get_modified    (HlDocument *self);
/* "Untitled project" or the project title */
const char          *hl_document_get_title       (HlDocument *self);

guint                hl_document_get_selected    (HlDocument *self);
void                 hl_document_set_selected    (HlDocument *self,
                                                  guint       index);
const HlShellInputs *hl_document_get_shell       (HlDocument *self);
/* The shells as a list model of HlShellItem (owned by the document):
 * items-changed only where shells were added, removed or moved; an edited
 * shell's item stays and notifies "name"/"form" when those change. */
GListModel          *hl_document_get_shells      (HlDocument *self);

/* The solution of the selected shell, or NULL while any value is bad;
 * then the problem text says what to fix. */
const HlSolution    *hl_document_get_solution    (HlDocument *self);
const char          *hl_document_get_problem_text (HlDocument *self);
/* The same shell's wall as built (no corrosion), solved in the same
 * change; NULL whenever hl_document_get_solution() is. */
const HlSolution    *hl_document_get_new_wall_solution (HlDocument *self);
/* problems of the selected shell's stored values (HlProblem *) */
GPtrArray           *hl_document_get_problems    (HlDocument *self);

/* A field whose text cannot be read: the document keeps no value for it
 * but must not show results.  @message NULL clears it. */
void                 hl_document_set_input_error (HlDocument *self,
                                                  const char *field,
                                                  const char *message);
void                 hl_document_clear_input_errors (HlDocument *self);
const char          *hl_document_get_input_error (HlDocument *self,
                                                  const char *field);

/* Edits.  Successive edits with the same non-NULL @merge_key make one
 * undo step (typing in one field). */
void                 hl_document_edit_shell      (HlDocument          *self,
                                                  const HlShellInputs *shell,
                                                  const char          *merge_key);
void                 hl_document_add_shell       (HlDocument          *self,
                                                  const HlShellInputs *template_shell);
void                 hl_document_duplicate_shell (HlDocument *self);
void                 hl_document_remove_shell    (HlDocument *self);
void                 hl_document_move_shell      (HlDocument *self,
                                                  int         delta);
void                 hl_document_put_material    (HlDocument       *self,
                                                  const HlMaterial *material,
                                                  const char       *merge_key);
typedef enum
{
  HL_MATERIAL_SCOPE_ALL_USERS,   /* every shell using the material */
  HL_MATERIAL_SCOPE_THIS_SHELL,  /* a copy for the selected shell */
} HlMaterialScope;

/* An edit of the selected shell's material, @field the element edited.
 * A built-in material is never changed: the edit makes a project
 * material ("NAME, edited").  A project material several shells use is
 * copied ("NAME (copy)") when @scope is this shell.  A typed name stays
 * as typed.  Returns the id the shell now uses (owned by the document). */
const char          *hl_document_edit_material   (HlDocument       *self,
                                                  const HlMaterial *material,
                                                  HlMaterialScope   scope,
                                                  const char       *field);
void                 hl_document_set_info        (HlDocument  *self,
                                                  const char  *title,
                                                  const char  *engineer,
                                                  const char  *description,
                                                  HlUnitSystem units);
/* One sign-off of the design note.  @date is "YYYY-MM-DD" or "": the
 * caller checks it (hl_date_valid()); a save refuses a bad one. */
void                 hl_document_set_signoff     (HlDocument    *self,
                                                  HlSignoffRole  role,
                                                  const char    *name,
                                                  const char    *date);
/* The next number after the latest; FALSE (and nothing added) when it
 * or a text would pass the limits the project file reader keeps. */
gboolean             hl_document_add_revision    (HlDocument *self,
                                                  const char *date,
                                                  const char *author,
                                                  const char *text);

gboolean             hl_document_can_undo        (HlDocument *self);
gboolean             hl_document_can_redo        (HlDocument *self);
void                 hl_document_undo            (HlDocument *self);
void                 hl_document_redo            (HlDocument *self);
/* bytes of memory the undo and redo history holds */
gsize                hl_document_get_history_bytes (HlDocument *self);

/* how many shells refer to the project material @material_id */
guint                hl_document_count_material_users (HlDocument *self,
                                                       const char *material_id);

G_END_DECLS
