/* hl-quantity-row.c — one input value: label, number, unit, reason if bad
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-quantity-row"

#include "hl-config.h"
#include "hl-quantity-row.h"
#include "hl-fields.h"
#include "hl-limits.h"

#include <glib/gi18n.h>
#include <stdio.h>
#include <string.h>

struct _HlQuantityRow
{
  GtkBox          parent_instance;

  GtkLabel       *label;
  GtkEntry       *entry;
  GtkDropDown    *unit_dropdown;
  GtkLabel       *unit_label;
  GtkLabel       *error_label;

  char           *field;
  HlQuantityKind  kind;
  HlQuantity      shown;      /* last value shown or read, for conversion */
  gboolean        has_shown;
  guint           updating;   /* programmatic changes emit nothing */
};

G_DEFINE_FINAL_TYPE (HlQuantityRow, hl_quantity_row, GTK_TYPE_BOX)

enum { PROP_0, PROP_FIELD, PROP_LABEL, PROP_KIND, N_PROPS };
static GParamSpec *properties[N_PROPS];

enum { EDITED, N_SIGNALS };
static guint signals[N_SIGNALS];

/* in the order of HlQuantityKind */
static const char *const kind_names[] = { "length", "stress", "percent", "ratio", "modulus", "temperature" };

/* A value with its unit is a few dozen characters; anything much longer
 * is a paste gone wrong.  The field holds somewhat more than it reads, so
 * that a long paste is refused in words rather than cut into a number
 * that was never typed. */
#define VALUE_TEXT_CHARS  64
#define FIELD_TEXT_CHARS  256
/* what a message under a field may hold */
#define MESSAGE_CHARS     160

static const char *
current_unit (HlQuantityRow *self)
{
  const char *const *names = hl_unit_names (self->kind);
  guint i = gtk_drop_down_get_selected (self->unit_dropdown);

  if (names == NULL || names[0] == NULL)
    return "";
  if (i == GTK_INVALID_LIST_POSITION || i >= g_strv_length ((char **) names))
    i = 0;
  return names[i];
}

static void
select_unit (HlQuantityRow *self,
             const char    *unit)
{
  const char *const *names = hl_unit_names (self->kind);
  const char *canonical = hl_unit_canonical (self->kind, unit);

  for (guint i = 0; names != NULL && names[i] != NULL; i++)
    if (g_strcmp0 (names[i], canonical) == 0)
      {
        self->updating++;
        gtk_drop_down_set_selected (self->unit_dropdown, i);
        self->updating--;
        return;
      }
}

static void
set_text_number (HlQuantityRow *self,
                 double         value)
{
  g_autofree char *text = hl_format_field_number (value);

  self->updating++;
  gtk_editable_set_text (GTK_EDITABLE (self->entry), text);
  self->updating--;
}

static void
on_entry_changed_cb (GtkEntry      *entry,
                     HlQuantityRow *self)
{
  HlQuantity q;

  if (self->updating > 0)
    return;
  /* "12 bar" typed into the number switches the unit shown beside it */
  if (hl_quantity_row_parse (self, &q, NULL))
    select_unit (self, q.unit);
  g_signal_emit (self, signals[EDITED], 0);
}

static void
on_entry_activate_cb (GtkEntry      *entry,
                      HlQuantityRow *self)
{
  HlQuantity q;

  /* tidy "12 bar" to "12" once the unit sits in its own box */
  if (hl_quantity_row_parse (self, &q, NULL))
    set_text_number (self, q.value);
}

static void
on_focus_leave_cb (GtkEventControllerFocus *controller,
                   HlQuantityRow           *self)
{
  on_entry_activate_cb (self->entry, self);
}

static void
on_unit_dropdown_selected_cb (GObject       *dropdown,
                              GParamSpec    *pspec,
                              HlQuantityRow *self)
{
  const char *unit;

  if (self->updating > 0)
    return;
  unit = current_unit (self);
  /* a new unit keeps the quantity: the number is converted */
  if (self->has_shown && hl_unit_factor (self->kind, self->shown.unit) > 0.0)
    {
      HlQuantity converted = hl_quantity_convert (self->shown, self->kind, unit);
      char buf[G_ASCII_DTOSTR_BUF_SIZE];

      /* ten digits hide the binary noise of the factor (0.3937007874 in) */
      g_ascii_formatd (buf, sizeof buf, "%.10g", converted.value);
      converted.value = g_ascii_strtod (buf, NULL);
      set_text_number (self, converted.value);
    }
  g_signal_emit (self, signals[EDITED], 0);
}

static void
apply_kind (HlQuantityRow  *self,
            HlQuantityKind  kind)
{
  const char *const *names = hl_unit_names (kind);
  g_autoptr(GtkStringList) units = gtk_string_list_new ((const char *const *) names);
  gboolean choice = g_strv_length ((char **) names) > 1;

  self->kind = kind;
  self->updating++;
  gtk_drop_down_set_model (self->unit_dropdown, G_LIST_MODEL (units));
  self->updating--;
  /* one possible unit needs no choice */
  gtk_widget_set_visible (GTK_WIDGET (self->unit_dropdown), choice);
  gtk_widget_set_visible (GTK_WIDGET (self->unit_label), !choice);
  gtk_label_set_text (self->unit_label, names[0] != NULL ? names[0] : "");
}

static void
hl_quantity_row_set_property (GObject      *object,
                              guint         prop_id,
                              const GValue *value,
                              GParamSpec   *pspec)
{
  HlQuantityRow *self = HL_QUANTITY_ROW (object);

  switch (prop_id)
    {
    case PROP_FIELD:
      hl_quantity_row_set_field (self, g_value_get_string (value));
      break;
    case PROP_LABEL:
      hl_quantity_row_set_label (self, g_value_get_string (value));
      break;
    case PROP_KIND:
      for (guint i = 0; i < G_N_ELEMENTS (kind_names); i++)
        if (g_strcmp0 (kind_names[i], g_value_get_string (value)) == 0)
          apply_kind (self, (HlQuantityKind) i);
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
hl_quantity_row_get_property (GObject    *object,
                              guint       prop_id,
                              GValue     *value,
                              GParamSpec *pspec)
{
  HlQuantityRow *self = HL_QUANTITY_ROW (object);

  switch (prop_id)
    {
    case PROP_FIELD:
      g_value_set_string (value, self->field);
      break;
    case PROP_LABEL:
      g_value_set_string (value, gtk_label_get_label (self->label));
      break;
    case PROP_KIND:
      g_value_set_string (value, kind_names[self->kind]);
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
hl_quantity_row_finalize (GObject *object)
{
  HlQuantityRow *self = HL_QUANTITY_ROW (object);

  g_clear_pointer (&self->field, g_free);
  G_OBJECT_CLASS (hl_quantity_row_parent_class)->finalize (object);
}

static void
hl_quantity_row_class_init (HlQuantityRowClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->set_property = hl_quantity_row_set_property;
  object_class->get_property = hl_quantity_row_get_property;
  object_class->finalize = hl_quantity_row_finalize;

  properties[PROP_FIELD] = g_param_spec_string ("field", NULL, NULL, NULL,
                                                G_PARAM_READWRITE | G_PARAM_STATIC_STRINGS);
  properties[PROP_LABEL] = g_param_spec_string ("label", NULL, NULL, NULL,
                                                G_PARAM_READWRITE | G_PARAM_STATIC_STRINGS);
  properties[PROP_KIND] = g_param_spec_string ("kind", NULL, NULL, "length",
                                               G_PARAM_READWRITE | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);

  /* the text or the unit changed by the user */
  signals[EDITED] = g_signal_new ("edited", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST,
                                  0, NULL, NULL, NULL, G_TYPE_NONE, 0);

  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-quantity-row.ui");
  gtk_widget_class_bind_template_child (widget_class, HlQuantityRow, label);
  gtk_widget_class_bind_template_child (widget_class, HlQuantityRow, entry);
  gtk_widget_class_bind_template_child (widget_class, HlQuantityRow, unit_dropdown);
  gtk_widget_class_bind_template_child (widget_class, HlQuantityRow, unit_label);
  gtk_widget_class_bind_template_child (widget_class, HlQuantityRow, error_label);
  gtk_widget_class_bind_template_callback (widget_class, on_entry_changed_cb);
  gtk_widget_class_bind_template_callback (widget_class, on_entry_activate_cb);
  gtk_widget_class_bind_template_callback (widget_class, on_unit_dropdown_selected_cb);
}

static void
hl_quantity_row_init (HlQuantityRow *self)
{
  GtkEventController *focus;

  gtk_widget_init_template (GTK_WIDGET (self));
  apply_kind (self, HL_KIND_LENGTH);
  /* Ctrl+Z belongs to the document's undo, which covers every field */
  gtk_editable_set_enable_undo (GTK_EDITABLE (self->entry), FALSE);
  hl_fields_limit_editable (GTK_EDITABLE (self->entry), FIELD_TEXT_CHARS, 0, TRUE);
  focus = gtk_event_controller_focus_new ();
  g_signal_connect (focus, "leave", G_CALLBACK (on_focus_leave_cb), self);
  gtk_widget_add_controller (GTK_WIDGET (self->entry), focus);
}

const char *
hl_quantity_row_get_field (HlQuantityRow *self)
{
  g_return_val_if_fail (HL_IS_QUANTITY_ROW (self), NULL);
  return self->field;
}

void
hl_quantity_row_set_field (HlQuantityRow *self,
                           const char    *field)
{
  g_return_if_fail (HL_IS_QUANTITY_ROW (self));
  if (g_strcmp0 (self->field, field) == 0)
    return;
  g_free (self->field);
  self->field = g_strdup (field);
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_FIELD]);
}

HlQuantityKind
hl_quantity_row_get_kind (HlQuantityRow *self)
{
  g_return_val_if_fail (HL_IS_QUANTITY_ROW (self), HL_KIND_LENGTH);
  return self->kind;
}

void
hl_quantity_row_set_label (HlQuantityRow *self,
                           const char    *label)
{
  g_autofree char *plain = NULL;
  g_autofree char *unit_name = NULL;

  g_return_if_fail (HL_IS_QUANTITY_ROW (self));

  gtk_label_set_text_with_mnemonic (self->label, label != NULL ? label : "");
  plain = g_strdup (gtk_label_get_text (self->label));
  gtk_accessible_update_property (GTK_ACCESSIBLE (self->entry),
                                  GTK_ACCESSIBLE_PROPERTY_LABEL, plain, -1);
  /* TRANSLATORS: accessible name of the unit chooser beside a value */
  unit_name = g_strdup_printf (_("Unit of %s"), plain);
  gtk_accessible_update_property (GTK_ACCESSIBLE (self->unit_dropdown),
                                  GTK_ACCESSIBLE_PROPERTY_LABEL, unit_name, -1);
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_LABEL]);
}

void
hl_quantity_row_set_quantity (HlQuantityRow *self,
                              HlQuantity     q)
{
  g_return_if_fail (HL_IS_QUANTITY_ROW (self));

  self->shown = q;
  self->has_shown = TRUE;
  select_unit (self, q.unit);
  set_text_number (self, q.value);
}

gboolean
hl_quantity_row_parse (HlQuantityRow *self,
                       HlQuantity    *q,
                       GError       **error)
{
  const char *unit = NULL;
  double value = 0.0;
  const char *text;

  g_return_val_if_fail (HL_IS_QUANTITY_ROW (self), FALSE);

  text = gtk_editable_get_text (GTK_EDITABLE (self->entry));
  if (g_utf8_strlen (text, -1) > VALUE_TEXT_CHARS)
    {
      g_set_error (error, G_IO_ERROR, G_IO_ERROR_INVALID_DATA,
                   /* TRANSLATORS: %ld is the length of the text in the field, %d the most a value takes */
                   _("too long for a value: %ld characters (at most %d)"),
                   g_utf8_strlen (text, -1), VALUE_TEXT_CHARS);
      return FALSE;
    }
  if (!hl_units_parse (text, self->kind, current_unit (self), hl_locale_decimal_comma (),
                       &value, &unit, error))
    return FALSE;
  *q = hl_quantity_make (value, unit != NULL ? unit : "");
  self->shown = *q;
  self->has_shown = TRUE;
  return TRUE;
}

void
hl_quantity_row_set_error (HlQuantityRow *self,
                           const char    *message)
{
  GtkWidget *entry;
  g_autofree char *shown = NULL;

  g_return_if_fail (HL_IS_QUANTITY_ROW (self));

  entry = GTK_WIDGET (self->entry);
  /* a message that quotes a pasted page must not become one */
  shown = message != NULL ? hl_text_quote (message, MESSAGE_CHARS) : NULL;
  message = shown;
  if (message != NULL)
    {
      gtk_widget_add_css_class (entry, "error");
      gtk_label_set_text (self->error_label, message);
      gtk_widget_set_tooltip_text (entry, message);
      gtk_accessible_update_property (GTK_ACCESSIBLE (entry), GTK_ACCESSIBLE_PROPERTY_DESCRIPTION,
                                      message, -1);
      gtk_accessible_update_state (GTK_ACCESSIBLE (entry), GTK_ACCESSIBLE_STATE_INVALID,
                                   GTK_ACCESSIBLE_INVALID_TRUE, -1);
    }
  else
    {
      gtk_widget_remove_css_class (entry, "error");
      gtk_widget_set_tooltip_text (entry, NULL);
      gtk_accessible_reset_property (GTK_ACCESSIBLE (entry), GTK_ACCESSIBLE_PROPERTY_DESCRIPTION);
      gtk_accessible_reset_state (GTK_ACCESSIBLE (entry), GTK_ACCESSIBLE_STATE_INVALID);
    }
  gtk_widget_set_visible (GTK_WIDGET (self->error_label), message != NULL);
}

gboolean
hl_quantity_row_has_error (HlQuantityRow *self)
{
  g_return_val_if_fail (HL_IS_QUANTITY_ROW (self), FALSE);
  return gtk_widget_has_css_class (GTK_WIDGET (self->entry), "error");
}

GtkEditable *
hl_quantity_row_get_entry (HlQuantityRow *self)
{
  g_return_val_if_fail (HL_IS_QUANTITY_ROW (self), NULL);
  return GTK_EDITABLE (self->entry);
}

GtkDropDown *
hl_quantity_row_get_unit_dropdown (HlQuantityRow *self)
{
  g_return_val_if_fail (HL_IS_QUANTITY_ROW (self), NULL);
  return self->unit_dropdown;
}

const char *
hl_quantity_row_get_error (HlQuantityRow *self)
{
  g_return_val_if_fail (HL_IS_QUANTITY_ROW (self), NULL);
  if (!hl_quantity_row_has_error (self))
    return NULL;
  return gtk_label_get_text (self->error_label);
}
