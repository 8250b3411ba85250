/* hl-banner.c — a notice across the top of the window
 *
 * GtkInfoBar is deprecated from GTK 4.10 and its successor, AdwBanner,
 * comes with libadwaita 1.3; Debian 12 has 1.2.  So the notice is this
 * small widget: a revealer with a text and buttons, styled like a
 * banner (ui/style.css, .hl-banner).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-banner"

#include "hl-config.h"
#include "hl-banner.h"

#include <glib/gi18n.h>

struct _HlBanner
{
  GtkWidget    parent_instance;

  GtkRevealer *revealer;
  GtkBox      *box;
  GtkLabel    *label;
  GtkWidget   *close_button;
};

enum
{
  PROP_0,
  PROP_SHOW_CLOSE_BUTTON,
  PROP_SELECTABLE,
  N_PROPS
};

static GParamSpec *props[N_PROPS];

static void hl_banner_buildable_init (GtkBuildableIface *iface);

G_DEFINE_FINAL_TYPE_WITH_CODE (HlBanner, hl_banner, GTK_TYPE_WIDGET,
                               G_IMPLEMENT_INTERFACE (GTK_TYPE_BUILDABLE, hl_banner_buildable_init))

static GtkBuildableIface *parent_buildable;

static void
hl_banner_add_child (GtkBuildable *buildable,
                     GtkBuilder   *builder,
                     GObject      *child,
                     const char   *type)
{
  HlBanner *self = HL_BANNER (buildable);

  if (!GTK_IS_WIDGET (child))
    {
      parent_buildable->add_child (buildable, builder, child, type);
      return;
    }
  gtk_widget_set_valign (GTK_WIDGET (child), GTK_ALIGN_CENTER);
  /* the buttons go before the close button, which stays last */
  if (self->close_button != NULL)
    gtk_box_insert_child_after (self->box, GTK_WIDGET (child), gtk_widget_get_prev_sibling (self->close_button));
  else
    gtk_box_append (self->box, GTK_WIDGET (child));
}

static void
hl_banner_buildable_init (GtkBuildableIface *iface)
{
  parent_buildable = g_type_interface_peek_parent (iface);
  iface->add_child = hl_banner_add_child;
}

static void
on_close_clicked_cb (GtkButton *button,
                     HlBanner  *self)
{
  hl_banner_hide (self);
}

static void
set_show_close_button (HlBanner *self,
                       gboolean  show)
{
  if ((self->close_button != NULL) == show)
    return;
  if (show)
    {
      self->close_button = gtk_button_new_from_icon_name ("window-close-symbolic");
      gtk_widget_set_valign (self->close_button, GTK_ALIGN_CENTER);
      gtk_widget_add_css_class (self->close_button, "flat");
      gtk_widget_add_css_class (self->close_button, "circular");
      gtk_widget_set_tooltip_text (self->close_button, _("Close the notice"));
      g_signal_connect (self->close_button, "clicked", G_CALLBACK (on_close_clicked_cb), self);
      gtk_box_append (self->box, self->close_button);
    }
  else
    {
      gtk_box_remove (self->box, self->close_button);
      self->close_button = NULL;
    }
}

static void
hl_banner_get_property (GObject    *object,
                        guint       prop_id,
                        GValue     *value,
                        GParamSpec *pspec)
{
  HlBanner *self = HL_BANNER (object);

  switch (prop_id)
    {
    case PROP_SHOW_CLOSE_BUTTON:
      g_value_set_boolean (value, self->close_button != NULL);
      break;
    case PROP_SELECTABLE:
      g_value_set_boolean (value, gtk_label_get_selectable (self->label));
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
hl_banner_set_property (GObject      *object,
                        guint         prop_id,
                        const GValue *value,
                        GParamSpec   *pspec)
{
  HlBanner *self = HL_BANNER (object);

  switch (prop_id)
    {
    case PROP_SHOW_CLOSE_BUTTON:
      set_show_close_button (self, g_value_get_boolean (value));
      break;
    case PROP_SELECTABLE:
      gtk_label_set_selectable (self->label, g_value_get_boolean (value));
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
hl_banner_dispose (GObject *object)
{
  HlBanner *self = HL_BANNER (object);

  if (self->revealer != NULL)
    {
      gtk_widget_unparent (GTK_WIDGET (self->revealer));
      self->revealer = NULL;
    }
  G_OBJECT_CLASS (hl_banner_parent_class)->dispose (object);
}

static void
hl_banner_class_init (HlBannerClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->get_property = hl_banner_get_property;
  object_class->set_property = hl_banner_set_property;
  object_class->dispose = hl_banner_dispose;

  props[PROP_SHOW_CLOSE_BUTTON] =
    g_param_spec_boolean ("show-close-button", NULL, NULL, FALSE,
                          G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  props[PROP_SELECTABLE] =
    g_param_spec_boolean ("selectable", NULL, NULL, FALSE,
                          G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, props);

  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "hl-banner");
}

static void
hl_banner_init (HlBanner *self)
{
  self->revealer = GTK_REVEALER (gtk_revealer_new ());
  gtk_revealer_set_transition_type (self->revealer, GTK_REVEALER_TRANSITION_TYPE_SLIDE_DOWN);
  gtk_widget_set_parent (GTK_WIDGET (self->revealer), GTK_WIDGET (self));

  self->box = GTK_BOX (gtk_box_new (GTK_ORIENTATION_HORIZONTAL, 12));
  gtk_widget_add_css_class (GTK_WIDGET (self->box), "hl-banner");
  gtk_revealer_set_child (self->revealer, GTK_WIDGET (self->box));

  self->label = GTK_LABEL (gtk_label_new (NULL));
  gtk_label_set_wrap (self->label, TRUE);
  gtk_label_set_xalign (self->label, 0);
  gtk_widget_set_hexpand (GTK_WIDGET (self->label), TRUE);
  gtk_box_append (self->box, GTK_WIDGET (self->label));
}

GtkWidget *
hl_banner_new (void)
{
  return g_object_new (HL_TYPE_BANNER, NULL);
}

void
hl_banner_show (HlBanner       *self,
                GtkMessageType  type,
                const char     *text)
{
  static const char *const kinds[] = { "info", "warning", "error" };
  GtkWidget *box;

  g_return_if_fail (HL_IS_BANNER (self));

  box = GTK_WIDGET (self->box);
  for (guint i = 0; i < G_N_ELEMENTS (kinds); i++)
    gtk_widget_remove_css_class (box, kinds[i]);
  if (type == GTK_MESSAGE_WARNING)
    gtk_widget_add_css_class (box, "warning");
  else if (type == GTK_MESSAGE_ERROR)
    gtk_widget_add_css_class (box, "error");
  else
    gtk_widget_add_css_class (box, "info");
  gtk_label_set_text (self->label, text);
  gtk_revealer_set_reveal_child (self->revealer, TRUE);
}

void
hl_banner_hide (HlBanner *self)
{
  g_return_if_fail (HL_IS_BANNER (self));

  gtk_revealer_set_reveal_child (self->revealer, FALSE);
  gtk_label_set_text (self->label, "");
}

const char *
hl_banner_get_text (HlBanner *self)
{
  g_return_val_if_fail (HL_IS_BANNER (self), NULL);

  if (!gtk_revealer_get_reveal_child (self->revealer))
    return NULL;
  return gtk_label_get_text (self->label);
}
