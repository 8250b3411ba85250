/* hl-shell-item.c — one shell of the open document, as a list item
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-shell-item"

#include "hl-shell-item.h"

#include <string.h>

struct _HlShellItem
{
  GObject parent_instance;
  char    id[HL_ID_MAX];
  char    name[HL_NAME_MAX];
  HlForm  form;
};

G_DEFINE_FINAL_TYPE (HlShellItem, hl_shell_item, G_TYPE_OBJECT)

enum { PROP_0, PROP_ID, PROP_NAME, PROP_FORM, N_PROPS };
static GParamSpec *props[N_PROPS];

static void
hl_shell_item_get_property (GObject    *object,
                            guint       prop_id,
                            GValue     *value,
                            GParamSpec *pspec)
{
  HlShellItem *self = HL_SHELL_ITEM (object);

  switch (prop_id)
    {
    case PROP_ID:
      g_value_set_string (value, self->id);
      break;
    case PROP_NAME:
      /* a shell without a name is listed by its id */
      g_value_set_string (value, hl_shell_item_get_name (self));
      break;
    case PROP_FORM:
      g_value_set_uint (value, self->form);
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
hl_shell_item_class_init (HlShellItemClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);

  object_class->get_property = hl_shell_item_get_property;
  props[PROP_ID] = g_param_spec_string ("id", NULL, "the shell's id", NULL,
                                        G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  props[PROP_NAME] = g_param_spec_string ("name", NULL, "the shell's name, or its id", NULL,
                                          G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  props[PROP_FORM] = g_param_spec_uint ("form", NULL, "HlForm of the shell", 0, G_MAXUINT, 0,
                                        G_PARAM_READABLE | G_PARAM_STATIC_STRINGS | G_PARAM_EXPLICIT_NOTIFY);
  g_object_class_install_properties (object_class, N_PROPS, props);
}

static void
hl_shell_item_init (HlShellItem *self)
{
}

HlShellItem *
hl_shell_item_new (const HlShellInputs *shell)
{
  HlShellItem *self = g_object_new (HL_TYPE_SHELL_ITEM, NULL);

  g_return_val_if_fail (shell != NULL, self);

  memcpy (self->id, shell->id, sizeof self->id);
  memcpy (self->name, shell->name, sizeof self->name);
  self->form = shell->form;
  return self;
}

const char *
hl_shell_item_get_id (HlShellItem *self)
{
  g_return_val_if_fail (HL_IS_SHELL_ITEM (self), NULL);
  return self->id;
}

const char *
hl_shell_item_get_name (HlShellItem *self)
{
  g_return_val_if_fail (HL_IS_SHELL_ITEM (self), NULL);
  return self->name[0] != '\0' ? self->name : self->id;
}

HlForm
hl_shell_item_get_form (HlShellItem *self)
{
  g_return_val_if_fail (HL_IS_SHELL_ITEM (self), HL_FORM_CYLINDER);
  return self->form;
}

void
hl_shell_item_update (HlShellItem         *self,
                      const HlShellInputs *shell)
{
  g_return_if_fail (HL_IS_SHELL_ITEM (self) && shell != NULL);

  g_object_freeze_notify (G_OBJECT (self));
  if (strcmp (self->id, shell->id) != 0)
    {
      memcpy (self->id, shell->id, sizeof self->id);
      g_object_notify_by_pspec (G_OBJECT (self), props[PROP_ID]);
    }
  if (strcmp (self->name, shell->name) != 0)
    {
      memcpy (self->name, shell->name, sizeof self->name);
      g_object_notify_by_pspec (G_OBJECT (self), props[PROP_NAME]);
    }
  if (self->form != shell->form)
    {
      self->form = shell->form;
      g_object_notify_by_pspec (G_OBJECT (self), props[PROP_FORM]);
    }
  g_object_thaw_notify (G_OBJECT (self));
}
