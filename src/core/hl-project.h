/* hl-project.h — a project: shells, materials, revision notes
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-shell.h"

G_BEGIN_DECLS

typedef struct
{
  guint number;
  char  date[11];          /* YYYY-MM-DD */
  char *author;
  char *text;
} HlRevision;

/* The three signatures of a design note, in the order a sheet shows them. */
typedef enum
{
  HL_SIGNOFF_PREPARED,
  HL_SIGNOFF_CHECKED,
  HL_SIGNOFF_APPROVED,
  HL_N_SIGNOFFS,
} HlSignoffRole;

/* One signature: a name (may be empty) and a date, "YYYY-MM-DD" or
 * empty when not given. */
typedef struct
{
  char *name;
  char  date[11];
} HlSignoff;

typedef struct
{
  char        *title;
  char        *engineer;
  char        *description;
  HlUnitSystem display_units;
  GArray      *materials;   /* HlMaterial */
  GArray      *shells;      /* HlShellInputs */
  GArray      *revisions;   /* HlRevision, in file order */
  HlSignoff    signoff[HL_N_SIGNOFFS];
} HlProject;

HlProject           *hl_project_new           (void);
HlProject           *hl_project_copy          (const HlProject *project);
void                 hl_project_free          (HlProject       *project);
gboolean             hl_project_equal         (const HlProject *a,
                                               const HlProject *b);

/* The reader strips the outer white space of every text it reads; this
 * does the same to @project, so what a save writes reads back equal.
 * The setters keep texts as typed: a field being edited must keep the
 * space typed before the next word. */
void                 hl_project_strip_texts   (HlProject       *project);
/* NULL when @a and @b are equal, else the first place they differ, as
 * the file names it: "title", "shell “s1”: wall-thickness",
 * "shell “s1”: material yield-strength", "revision 3: text". */
char                *hl_project_first_difference (const HlProject *a,
                                                  const HlProject *b);

void                 hl_project_set_title       (HlProject *project, const char *title);
void                 hl_project_set_engineer    (HlProject *project, const char *engineer);
void                 hl_project_set_description (HlProject *project, const char *description);
/* @date "YYYY-MM-DD" or "" (hl_date_valid() decides; the caller checks) */
void                 hl_project_set_signoff     (HlProject     *project,
                                                 HlSignoffRole  role,
                                                 const char    *name,
                                                 const char    *date);
/* "prepared", "checked", "approved": the file's words */
const char          *hl_signoff_role_to_string  (HlSignoffRole  role);

guint                hl_project_n_shells      (const HlProject *project);
HlShellInputs       *hl_project_shell         (const HlProject *project,
                                               guint            index);
const HlShellInputs *hl_project_find_shell    (const HlProject *project,
                                               const char      *id);
void                 hl_project_add_shell     (HlProject           *project,
                                               const HlShellInputs *shell);
void                 hl_project_insert_shell  (HlProject           *project,
                                               guint                index,
                                               const HlShellInputs *shell);
void                 hl_project_remove_shell  (HlProject *project,
                                               guint      index);
/* an id of the form "<stem>-N" that no shell uses yet */
char                *hl_project_unique_shell_id (const HlProject *project,
                                                 const char      *stem);

guint                hl_project_n_materials   (const HlProject *project);
HlMaterial          *hl_project_material      (const HlProject *project,
                                               guint            index);
HlMaterial          *hl_project_find_material (const HlProject *project,
                                               const char      *id);
/* adds or replaces by id, and copies the new values into every shell
 * that refers to it */
void                 hl_project_put_material  (HlProject        *project,
                                               const HlMaterial *material);

void                 hl_project_add_revision  (HlProject  *project,
                                               guint       number,
                                               const char *date,
                                               const char *author,
                                               const char *text);
/* highest-numbered revision, or NULL */
const HlRevision    *hl_project_latest_revision (const HlProject *project);

G_DEFINE_AUTOPTR_CLEANUP_FUNC (HlProject, hl_project_free)

G_END_DECLS
