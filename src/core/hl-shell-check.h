/* hl-shell-check.h — validation of shell inputs, every problem with its field
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-field-table.h"

G_BEGIN_DECLS

/* One problem: the field is the project-file element name of the value
 * ("wall-thickness", "poisson-ratio", ...), so the window, the loader and
 * the command line all point at the same thing. */
typedef struct
{
  const char *field;
  char       *message;  /* English: the command line, files, reports */
  char       *local;    /* the same in the user's language: the window */
} HlProblem;

void       hl_problem_free        (HlProblem *problem);

/* All problems of @in, in field order; an empty array when it is valid.
 * Every quantity has physical bounds (hl-shell-check.c names each and its
 * reason), the radii are checked for the new and the corroded wall, and
 * the shell's and the material's names (field "name") refuse control
 * characters: a name is one line of text. */
GPtrArray *hl_shell_inputs_check  (const HlShellInputs *in);

/* Checks @q alone as the value of @field (used by the window per field):
 * the field's own bounds, or the kind's for a field without them. */
char      *hl_check_quantity      (const char     *field,
                                   HlQuantity      q,
                                   HlQuantityKind  kind,
                                   gboolean        zero_allowed);

/* Checks the value at @slot as the table's row @field says */
char      *hl_field_check         (const HlField *field,
                                   gconstpointer  slot);

/* "field: message; field: message" — for GError texts */
char      *hl_problems_join       (GPtrArray *problems);

G_DEFINE_AUTOPTR_CLEANUP_FUNC (HlProblem, hl_problem_free)

G_END_DECLS
