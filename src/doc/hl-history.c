/* hl-history.c — undo and redo of a project, by what each edit changed
 *
 * An operation holds the state of one thing before and after the edit:
 * a shell or material slot (before NULL: it was inserted; after NULL: it
 * was removed), the material values of a set of shells, the project
 * texts, a revision.  Undo applies a step's operations backwards with
 * their "before" sides, redo forwards with their "after" sides.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-history"

#include "hl-history.h"

#include <string.h>

typedef enum
{
  OP_SHELL,            /* HlShellInputs at index */
  OP_MATERIAL,         /* HlMaterial at index */
  OP_SHELL_MATERIALS,  /* HlMaterial copied into the shells at indices */
  OP_INFO,             /* Info */
  OP_REVISION,         /* HlRevision at index (the last) */
} OpKind;

/* the sign-off names and dates follow the three project texts, a name
 * and a date per HlSignoffRole */
enum { INFO_TITLE, INFO_ENGINEER, INFO_DESCRIPTION, INFO_SIGNOFF, N_INFO_TEXTS = INFO_SIGNOFF + 2 * HL_N_SIGNOFFS };

/* the project texts an edit changed; NULL where it did not */
typedef struct
{
  char        *text[N_INFO_TEXTS];
  gboolean     has_units;
  HlUnitSystem units;
} Info;

typedef struct
{
  OpKind   kind;
  guint    index;
  gpointer before;
  gpointer after;
  GArray  *indices;    /* guint, OP_SHELL_MATERIALS only */
} Op;

typedef struct
{
  GPtrArray *ops;      /* Op *, in the order they were applied */
  guint      selected_before;
  guint      selected_after;
} Step;

struct _HlHistory
{
  GPtrArray *undo;     /* Step *, oldest first */
  GPtrArray *redo;     /* Step *, next to redo last */
  Step      *pending;  /* between begin and end */
  gboolean   merge;    /* the pending edit joins the last step */
  char      *merge_key;
};

static void
info_free (Info *info)
{
  for (guint i = 0; i < N_INFO_TEXTS; i++)
    g_free (info->text[i]);
  g_free (info);
}

static void
revision_free (HlRevision *r)
{
  g_free (r->author);
  g_free (r->text);
  g_free (r);
}

static void
payload_free (OpKind   kind,
              gpointer payload)
{
  if (payload == NULL)
    return;
  if (kind == OP_INFO)
    info_free (payload);
  else if (kind == OP_REVISION)
    revision_free (payload);
  else
    g_free (payload);
}

static void
op_free (gpointer data)
{
  Op *op = data;

  payload_free (op->kind, op->before);
  payload_free (op->kind, op->after);
  g_clear_pointer (&op->indices, g_array_unref);
  g_free (op);
}

static void
step_free (gpointer data)
{
  Step *step = data;

  g_ptr_array_unref (step->ops);
  g_free (step);
}

static gsize
payload_bytes (OpKind   kind,
               gpointer payload)
{
  gsize bytes = 0;

  if (payload == NULL)
    return 0;
  switch (kind)
    {
    case OP_SHELL:
      return sizeof (HlShellInputs);
    case OP_MATERIAL:
    case OP_SHELL_MATERIALS:
      return sizeof (HlMaterial);
    case OP_INFO:
      bytes = sizeof (Info);
      for (guint i = 0; i < N_INFO_TEXTS; i++)
        if (((Info *) payload)->text[i] != NULL)
          bytes += strlen (((Info *) payload)->text[i]) + 1;
      return bytes;
    case OP_REVISION:
      return sizeof (HlRevision) + strlen (((HlRevision *) payload)->author) + 1
             + strlen (((HlRevision *) payload)->text) + 1;
    default:
      g_assert_not_reached ();
    }
}

static gsize
step_bytes (const Step *step)
{
  gsize bytes = sizeof (Step) + sizeof (GPtrArray) + step->ops->len * sizeof (gpointer);

  for (guint i = 0; i < step->ops->len; i++)
    {
      const Op *op = g_ptr_array_index (step->ops, i);

      bytes += sizeof (Op) + payload_bytes (op->kind, op->before) + payload_bytes (op->kind, op->after);
      if (op->indices != NULL)
        bytes += sizeof (GArray) + op->indices->len * sizeof (guint);
    }
  return bytes;
}

static void
set_info_text (HlProject  *project,
               guint       which,
               const char *text)
{
  if (which == INFO_TITLE)
    hl_project_set_title (project, text);
  else if (which == INFO_ENGINEER)
    hl_project_set_engineer (project, text);
  else if (which == INFO_DESCRIPTION)
    hl_project_set_description (project, text);
  else
    {
      HlSignoffRole role = (which - INFO_SIGNOFF) / 2;
      HlSignoff *so = &project->signoff[role];
      g_autofree char *name = g_strdup (so->name);

      if ((which - INFO_SIGNOFF) % 2 == 0)
        hl_project_set_signoff (project, role, text, so->date);
      else
        hl_project_set_signoff (project, role, name, text);
    }
}

/* puts one side of @op into @project; @forward picks "after" */
static void
op_apply (const Op  *op,
          HlProject *project,
          gboolean   forward)
{
  gconstpointer target = forward ? op->after : op->before;
  gconstpointer other = forward ? op->before : op->after;

  switch (op->kind)
    {
    case OP_SHELL:
      if (target == NULL)
        hl_project_remove_shell (project, op->index);
      else if (other == NULL)
        hl_project_insert_shell (project, op->index, target);
      else
        *hl_project_shell (project, op->index) = *(const HlShellInputs *) target;
      break;
    case OP_MATERIAL:
      if (target == NULL)
        g_array_remove_index (project->materials, op->index);
      else if (other == NULL)
        g_array_insert_vals (project->materials, op->index, target, 1);
      else
        *hl_project_material (project, op->index) = *(const HlMaterial *) target;
      break;
    case OP_SHELL_MATERIALS:
      for (guint i = 0; i < op->indices->len; i++)
        hl_project_shell (project, g_array_index (op->indices, guint, i))->material
          = *(const HlMaterial *) target;
      break;
    case OP_INFO:
      {
        const Info *info = target;

        for (guint i = 0; i < N_INFO_TEXTS; i++)
          if (info->text[i] != NULL)
            set_info_text (project, i, info->text[i]);
        if (info->has_units)
          project->display_units = info->units;
      }
      break;
    case OP_REVISION:
      if (target == NULL)
        g_array_remove_index (project->revisions, op->index);
      else
        {
          const HlRevision *r = target;

          g_assert (op->index == project->revisions->len);
          hl_project_add_revision (project, r->number, r->date, r->author, r->text);
        }
      break;
    default:
      g_assert_not_reached ();
    }
}

/* applies the change at once and keeps it in the pending step */
static void
record (HlHistory *self,
        HlProject *project,
        OpKind     kind,
        guint      index,
        gpointer   before,
        gpointer   after,
        GArray    *indices)
{
  Op *op = g_new0 (Op, 1);

  g_return_if_fail (self->pending != NULL);

  op->kind = kind;
  op->index = index;
  op->before = before;
  op->after = after;
  op->indices = indices;
  op_apply (op, project, TRUE);
  g_ptr_array_add (self->pending->ops, op);
}

HlHistory *
hl_history_new (void)
{
  HlHistory *self = g_new0 (HlHistory, 1);

  self->undo = g_ptr_array_new_with_free_func (step_free);
  self->redo = g_ptr_array_new_with_free_func (step_free);
  return self;
}

void
hl_history_free (HlHistory *self)
{
  if (self == NULL)
    return;
  g_ptr_array_unref (self->undo);
  g_ptr_array_unref (self->redo);
  g_clear_pointer (&self->pending, step_free);
  g_free (self->merge_key);
  g_free (self);
}

void
hl_history_clear (HlHistory *self)
{
  g_ptr_array_set_size (self->undo, 0);
  g_ptr_array_set_size (self->redo, 0);
  hl_history_break_merge (self);
}

void
hl_history_break_merge (HlHistory *self)
{
  g_clear_pointer (&self->merge_key, g_free);
}

void
hl_history_begin (HlHistory  *self,
                  const char *merge_key,
                  guint       selected)
{
  g_return_if_fail (self->pending == NULL);

  self->pending = g_new0 (Step, 1);
  self->pending->ops = g_ptr_array_new_with_free_func (op_free);
  self->pending->selected_before = selected;
  self->merge = merge_key != NULL && g_strcmp0 (merge_key, self->merge_key) == 0 && self->undo->len > 0;
  g_free (self->merge_key);
  self->merge_key = g_strdup (merge_key);
}

static gboolean
same_target (const Op *a,
             const Op *b)
{
  if (a->kind != b->kind || a->index != b->index)
    return FALSE;
  switch (a->kind)
    {
    case OP_INFO:
      return TRUE;
    case OP_SHELL_MATERIALS:
      return a->indices->len == b->indices->len
             && memcmp (a->indices->data, b->indices->data, a->indices->len * sizeof (guint)) == 0;
    case OP_SHELL:
    case OP_MATERIAL:
      /* a later change of what @a inserted or set; removals stay apart */
      return a->after != NULL && b->before != NULL && b->after != NULL;
    case OP_REVISION:
    default:
      return FALSE;
    }
}

static void
merge_info (Info *a_before,
            Info *a_after,
            Info *b_before,
            Info *b_after)
{
  for (guint i = 0; i < N_INFO_TEXTS; i++)
    {
      if (b_after->text[i] == NULL)
        continue;
      /* a text first changed now keeps its value from before this step */
      if (a_after->text[i] == NULL)
        a_before->text[i] = g_steal_pointer (&b_before->text[i]);
      g_free (a_after->text[i]);
      a_after->text[i] = g_steal_pointer (&b_after->text[i]);
    }
  if (b_after->has_units)
    {
      if (!a_after->has_units)
        {
          a_before->has_units = TRUE;
          a_before->units = b_before->units;
        }
      a_after->has_units = TRUE;
      a_after->units = b_after->units;
    }
}

/* Typing in one field repeats the same operations: the step keeps one
 * before and the latest after of each instead of growing per key. */
static gboolean
coalesce (Step *last,
          Step *pending)
{
  guint n = pending->ops->len;
  guint first;

  if (last->ops->len < n)
    return FALSE;
  first = last->ops->len - n;
  for (guint i = 0; i < n; i++)
    if (!same_target (g_ptr_array_index (last->ops, first + i), g_ptr_array_index (pending->ops, i)))
      return FALSE;
  for (guint i = 0; i < n; i++)
    {
      Op *a = g_ptr_array_index (last->ops, first + i);
      Op *b = g_ptr_array_index (pending->ops, i);

      if (a->kind == OP_INFO)
        merge_info (a->before, a->after, b->before, b->after);
      else
        {
          payload_free (a->kind, a->after);
          a->after = g_steal_pointer (&b->after);
        }
    }
  return TRUE;
}

static void
prune (HlHistory *self)
{
  gsize bytes = 0;
  guint keep_from = 0;

  /* the newest steps count first; what lies past the cap goes */
  for (guint i = self->undo->len; i > 0; i--)
    {
      guint age = self->undo->len - i;

      bytes += step_bytes (g_ptr_array_index (self->undo, i - 1));
      if (age >= HL_HISTORY_KEEP_STEPS && (bytes > HL_HISTORY_CAP_BYTES || age >= HL_HISTORY_MAX_STEPS))
        {
          keep_from = i;
          break;
        }
    }
  if (keep_from > 0)
    g_ptr_array_remove_range (self->undo, 0, keep_from);
}

void
hl_history_end (HlHistory *self,
                guint      selected)
{
  Step *step;

  g_return_if_fail (self->pending != NULL);

  step = g_steal_pointer (&self->pending);
  step->selected_after = selected;
  if (step->ops->len == 0)
    {
      step_free (step);
      return;
    }
  g_ptr_array_set_size (self->redo, 0);
  if (self->merge)
    {
      Step *last = g_ptr_array_index (self->undo, self->undo->len - 1);

      if (!coalesce (last, step))
        {
          /* a different pattern of changes: keep them all, in order */
          while (step->ops->len > 0)
            g_ptr_array_add (last->ops, g_ptr_array_steal_index (step->ops, 0));
        }
      last->selected_after = selected;
      step_free (step);
      return;
    }
  g_ptr_array_add (self->undo, step);
  prune (self);
}

void
hl_history_set_shell (HlHistory           *self,
                      HlProject           *project,
                      guint                index,
                      const HlShellInputs *shell)
{
  const HlShellInputs *old = hl_project_shell (project, index);

  g_return_if_fail (old != NULL);
  if (hl_shell_inputs_equal (old, shell))
    return;
  record (self, project, OP_SHELL, index, g_memdup2 (old, sizeof *old),
          g_memdup2 (shell, sizeof *shell), NULL);
}

void
hl_history_insert_shell (HlHistory           *self,
                         HlProject           *project,
                         guint                index,
                         const HlShellInputs *shell)
{
  g_return_if_fail (index <= hl_project_n_shells (project));
  record (self, project, OP_SHELL, index, NULL, g_memdup2 (shell, sizeof *shell), NULL);
}

void
hl_history_remove_shell (HlHistory *self,
                         HlProject *project,
                         guint      index)
{
  const HlShellInputs *old = hl_project_shell (project, index);

  g_return_if_fail (old != NULL);
  record (self, project, OP_SHELL, index, g_memdup2 (old, sizeof *old), NULL, NULL);
}

void
hl_history_put_material (HlHistory        *self,
                         HlProject        *project,
                         const HlMaterial *material)
{
  HlMaterial *slot = hl_project_find_material (project, material->id);
  HlMaterial *before = slot != NULL ? g_memdup2 (slot, sizeof *slot) : NULL;
  guint index = slot != NULL ? (guint) (slot - (HlMaterial *) project->materials->data)
                             : project->materials->len;
  GArray *indices = g_array_new (FALSE, FALSE, sizeof (guint));

  if (before == NULL || !hl_material_equal (before, material))
    record (self, project, OP_MATERIAL, index, before != NULL ? g_memdup2 (before, sizeof *before) : NULL,
            g_memdup2 (material, sizeof *material), NULL);

  /* Shells that held the old values need only their index; one whose
   * values differed keeps its own copy, so undo gives it back exactly. */
  for (guint i = 0; i < hl_project_n_shells (project); i++)
    {
      HlShellInputs *s = hl_project_shell (project, i);

      if (strcmp (s->material_ref, material->id) != 0 || hl_material_equal (&s->material, material))
        continue;
      if (before != NULL && hl_material_equal (&s->material, before))
        g_array_append_val (indices, i);
      else
        {
          HlShellInputs after = *s;

          after.material = *material;
          record (self, project, OP_SHELL, i, g_memdup2 (s, sizeof *s), g_memdup2 (&after, sizeof after), NULL);
        }
    }
  if (indices->len > 0)
    record (self, project, OP_SHELL_MATERIALS, 0, g_steal_pointer (&before),
            g_memdup2 (material, sizeof *material), g_steal_pointer (&indices));
  g_clear_pointer (&indices, g_array_unref);
  g_free (before);
}

/* Records the project texts that change: @next[i] NULL leaves text i
 * alone; @units is looked at when @set_units. */
static void
record_info (HlHistory    *self,
             HlProject    *project,
             const char  **next,
             gboolean      set_units,
             HlUnitSystem  units)
{
  const char *now[N_INFO_TEXTS] = { project->title, project->engineer, project->description };
  Info *before = g_new0 (Info, 1);
  Info *after = g_new0 (Info, 1);
  gboolean changed = FALSE;

  for (int r = 0; r < HL_N_SIGNOFFS; r++)
    {
      now[INFO_SIGNOFF + 2 * r] = project->signoff[r].name;
      now[INFO_SIGNOFF + 2 * r + 1] = project->signoff[r].date;
    }
  for (guint i = 0; i < N_INFO_TEXTS; i++)
    if (next[i] != NULL && g_strcmp0 (now[i] != NULL ? now[i] : "", next[i]) != 0)
      {
        before->text[i] = g_strdup (now[i] != NULL ? now[i] : "");
        after->text[i] = g_strdup (next[i]);
        changed = TRUE;
      }
  if (set_units && project->display_units != units)
    {
      before->has_units = after->has_units = TRUE;
      before->units = project->display_units;
      after->units = units;
      changed = TRUE;
    }
  if (!changed)
    {
      info_free (before);
      info_free (after);
      return;
    }
  record (self, project, OP_INFO, 0, before, after, NULL);
}

void
hl_history_set_info (HlHistory    *self,
                     HlProject    *project,
                     const char   *title,
                     const char   *engineer,
                     const char   *description,
                     HlUnitSystem  units)
{
  const char *next[N_INFO_TEXTS] = { title != NULL ? title : "", engineer != NULL ? engineer : "",
                                     description != NULL ? description : "" };

  record_info (self, project, next, TRUE, units);
}

void
hl_history_set_signoff (HlHistory     *self,
                        HlProject     *project,
                        HlSignoffRole  role,
                        const char    *name,
                        const char    *date)
{
  const char *next[N_INFO_TEXTS] = { NULL };

  next[INFO_SIGNOFF + 2 * role] = name != NULL ? name : "";
  next[INFO_SIGNOFF + 2 * role + 1] = date != NULL ? date : "";
  record_info (self, project, next, FALSE, 0);
}

void
hl_history_add_revision (HlHistory  *self,
                         HlProject  *project,
                         guint       number,
                         const char *date,
                         const char *author,
                         const char *text)
{
  HlRevision *r = g_new0 (HlRevision, 1);

  r->number = number;
  g_strlcpy (r->date, date != NULL ? date : "", sizeof r->date);
  r->author = g_strdup (author != NULL ? author : "");
  r->text = g_strdup (text != NULL ? text : "");
  record (self, project, OP_REVISION, project->revisions->len, NULL, r, NULL);
}

gboolean
hl_history_can_undo (HlHistory *self)
{
  return self->undo->len > 0;
}

gboolean
hl_history_can_redo (HlHistory *self)
{
  return self->redo->len > 0;
}

gboolean
hl_history_undo (HlHistory *self,
                 HlProject *project,
                 guint     *selected)
{
  Step *step;

  if (self->undo->len == 0)
    return FALSE;
  step = g_ptr_array_steal_index (self->undo, self->undo->len - 1);
  for (guint i = step->ops->len; i > 0; i--)
    op_apply (g_ptr_array_index (step->ops, i - 1), project, FALSE);
  *selected = step->selected_before;
  g_ptr_array_add (self->redo, step);
  hl_history_break_merge (self);
  return TRUE;
}

gboolean
hl_history_redo (HlHistory *self,
                 HlProject *project,
                 guint     *selected)
{
  Step *step;

  if (self->redo->len == 0)
    return FALSE;
  step = g_ptr_array_steal_index (self->redo, self->redo->len - 1);
  for (guint i = 0; i < step->ops->len; i++)
    op_apply (g_ptr_array_index (step->ops, i), project, TRUE);
  *selected = step->selected_after;
  g_ptr_array_add (self->undo, step);
  hl_history_break_merge (self);
  return TRUE;
}

gsize
hl_history_bytes (HlHistory *self)
{
  gsize bytes = sizeof *self;

  for (guint i = 0; i < self->undo->len; i++)
    bytes += step_bytes (g_ptr_array_index (self->undo, i));
  for (guint i = 0; i < self->redo->len; i++)
    bytes += step_bytes (g_ptr_array_index (self->redo, i));
  return bytes;
}

guint
hl_history_n_undo (HlHistory *self)
{
  return self->undo->len;
}
