/* hl-document-notify.c — each property notifies only when its value changes
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-document"

#include "hl-config.h"
#include "hl-document-private.h"

void
hl_document_remember_properties (HlDocument *self)
{
  self->primed = TRUE;
  g_free (self->seen_title);
  self->seen_title = g_strdup (hl_document_get_title (self));
  g_set_object (&self->seen_file, self->file);
  self->seen_selected = self->selected;
  self->seen_modified = hl_document_get_modified (self);
  self->seen_can_undo = hl_document_can_undo (self);
  self->seen_can_redo = hl_document_can_redo (self);
}

/* Every change passes here, so the properties are compared in one
 * place: a view bound to "modified" hears of it only when it flips. */
void
hl_document_notify_properties (HlDocument *self)
{
  const char *title = hl_document_get_title (self);
  gboolean modified = hl_document_get_modified (self);
  gboolean can_undo = hl_document_can_undo (self);
  gboolean can_redo = hl_document_can_redo (self);
  GObject *object = G_OBJECT (self);

  g_object_freeze_notify (object);
  if (g_strcmp0 (title, self->seen_title) != 0)
    {
      g_free (self->seen_title);
      self->seen_title = g_strdup (title);
      g_object_notify_by_pspec (object, hl_document_props[PROP_TITLE]);
    }
  if (self->file != self->seen_file
      && (self->file == NULL || self->seen_file == NULL || !g_file_equal (self->file, self->seen_file)))
    {
      g_set_object (&self->seen_file, self->file);
      g_object_notify_by_pspec (object, hl_document_props[PROP_FILE]);
    }
  else
    g_set_object (&self->seen_file, self->file);
  if (modified != self->seen_modified)
    {
      self->seen_modified = modified;
      g_object_notify_by_pspec (object, hl_document_props[PROP_MODIFIED]);
    }
  if (self->selected != self->seen_selected)
    {
      self->seen_selected = self->selected;
      g_object_notify_by_pspec (object, hl_document_props[PROP_SELECTED]);
    }
  if (can_undo != self->seen_can_undo)
    {
      self->seen_can_undo = can_undo;
      g_object_notify_by_pspec (object, hl_document_props[PROP_CAN_UNDO]);
    }
  if (can_redo != self->seen_can_redo)
    {
      self->seen_can_redo = can_redo;
      g_object_notify_by_pspec (object, hl_document_props[PROP_CAN_REDO]);
    }
  /* solved anew on every change: a new solution each time */
  g_object_notify_by_pspec (object, hl_document_props[PROP_SOLUTION]);
  g_object_thaw_notify (object);
}

