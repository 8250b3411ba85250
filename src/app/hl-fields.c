/* hl-fields.c — human names of the input fields
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-fields"

#include "hl-config.h"
#include "hl-fields.h"
#include "hl-field-table.h"
#include "hl-limits.h"
#include "hl-units.h"

#include <glib/gi18n.h>
#include <locale.h>
#include <math.h>
#include <string.h>

gboolean
hl_locale_decimal_comma (void)
{
  return hl_format_locale_decimal_comma ();
}

char *
hl_format_field_number (double value)
{
  return hl_format_shortest (value, hl_locale_decimal_comma ());
}

typedef struct
{
  glong    max_chars;
  gsize    max_bytes;
  gboolean one_line;
} Limit;

/* @text (@length bytes) made valid, its control characters spaces (a
 * multi-line text keeps its line breaks and tabs): the file refuses
 * them, so a paste must not bring them in */
static GString *
clean_text (const char *text,
            gsize       length,
            gboolean    one_line)
{
  g_autofree char *valid = g_utf8_make_valid (text, (gssize) length);
  GString *out = g_string_sized_new (strlen (valid));

  for (const char *p = valid; *p != '\0'; p = g_utf8_next_char (p))
    {
      gunichar c = g_utf8_get_char (p);

      gboolean control = g_unichar_iscntrl (c) || c == 0x2028 || c == 0x2029;

      if (control && (one_line || (c != '\n' && c != '\t' && c != '\r')))
        g_string_append_c (out, ' ');
      else
        g_string_append_len (out, p, g_utf8_next_char (p) - p);
    }
  return out;
}

static void
on_limited_insert_text_cb (GtkEditable *editable,
                           const char  *text,
                           int          length,
                           int         *position,
                           Limit       *limit)
{
  const char *current = gtk_editable_get_text (editable);
  gsize bytes = length < 0 ? strlen (text) : (gsize) length;
  g_autoptr(GString) clean = clean_text (text, bytes, limit->one_line);
  gsize fit = clean->len;

  if (limit->max_bytes > 0)
    {
      gsize used = strlen (current);
      gsize room = used < limit->max_bytes ? limit->max_bytes - used : 0;

      fit = hl_utf8_fit_bytes (clean->str, room);
    }
  if (limit->max_chars > 0)
    {
      glong used = g_utf8_strlen (current, -1);
      glong room = MAX (0, limit->max_chars - used);

      if (g_utf8_strlen (clean->str, (gssize) fit) > room)
        fit = (gsize) (g_utf8_offset_to_pointer (clean->str, room) - clean->str);
    }
  if (fit == bytes && memcmp (clean->str, text, bytes) == 0)
    return;

  /* insert what fits instead of what came */
  g_signal_stop_emission_by_name (editable, "insert-text");
  if (fit > 0)
    {
      g_signal_handlers_block_by_func (editable, on_limited_insert_text_cb, limit);
      gtk_editable_insert_text (editable, clean->str, (int) fit, position);
      g_signal_handlers_unblock_by_func (editable, on_limited_insert_text_cb, limit);
    }
  if (fit < clean->len)
    gtk_widget_error_bell (GTK_WIDGET (editable));
}

void
hl_fields_limit_editable (GtkEditable *editable,
                          glong        max_chars,
                          gsize        max_bytes,
                          gboolean     one_line)
{
  GtkEditable *target;
  Limit *limit;

  g_return_if_fail (GTK_IS_EDITABLE (editable));

  /* an entry hands its text to the GtkText inside; that one inserts */
  target = gtk_editable_get_delegate (editable);
  if (target == NULL)
    target = editable;
  /* one limit a field: a second would free the first under its handler */
  g_return_if_fail (g_object_get_data (G_OBJECT (target), "hl-limit") == NULL);
  limit = g_new0 (Limit, 1);
  limit->max_chars = max_chars;
  limit->max_bytes = max_bytes;
  limit->one_line = one_line;
  g_object_set_data_full (G_OBJECT (target), "hl-limit", limit, g_free);
  g_signal_connect (target, "insert-text", G_CALLBACK (on_limited_insert_text_cb), limit);
}

static void
on_limited_buffer_insert_text_cb (GtkTextBuffer *buffer,
                                  GtkTextIter   *location,
                                  const char    *text,
                                  int            length,
                                  gpointer       data)
{
  glong max_chars = GPOINTER_TO_SIZE (data);
  glong used = gtk_text_buffer_get_char_count (buffer);
  glong room = MAX (0, max_chars - used);
  gsize bytes = length < 0 ? strlen (text) : (gsize) length;
  g_autoptr(GString) clean = clean_text (text, bytes, FALSE);
  gsize fit = clean->len;

  if (g_utf8_strlen (clean->str, -1) > room)
    fit = (gsize) (g_utf8_offset_to_pointer (clean->str, room) - clean->str);
  if (fit == bytes && memcmp (clean->str, text, bytes) == 0)
    return;
  g_signal_stop_emission_by_name (buffer, "insert-text");
  if (fit > 0)
    {
      g_signal_handlers_block_by_func (buffer, on_limited_buffer_insert_text_cb, data);
      /* revalidates @location as the default handler would */
      gtk_text_buffer_insert (buffer, location, clean->str, (int) fit);
      g_signal_handlers_unblock_by_func (buffer, on_limited_buffer_insert_text_cb, data);
    }
}

void
hl_fields_limit_text_buffer (GtkTextBuffer *buffer,
                             glong          max_chars)
{
  g_return_if_fail (GTK_IS_TEXT_BUFFER (buffer));
  g_return_if_fail (max_chars > 0);

  g_signal_connect (buffer, "insert-text", G_CALLBACK (on_limited_buffer_insert_text_cb),
                    GSIZE_TO_POINTER ((gsize) max_chars));
}

static void
on_ellipsized_item_setup_cb (GtkSignalListItemFactory *factory,
                           GtkListItem              *item,
                           gpointer                  user_data)
{
  GtkWidget *label = gtk_label_new (NULL);

  gtk_label_set_ellipsize (GTK_LABEL (label), PANGO_ELLIPSIZE_END);
  gtk_label_set_xalign (GTK_LABEL (label), 0);
  gtk_list_item_set_child (item, label);
}

static void
on_ellipsized_item_bind_cb (GtkSignalListItemFactory *factory,
                          GtkListItem              *item,
                          gpointer                  user_data)
{
  GtkStringObject *name = gtk_list_item_get_item (item);
  GtkWidget *label = gtk_list_item_get_child (item);

  gtk_label_set_text (GTK_LABEL (label), gtk_string_object_get_string (name));
  gtk_widget_set_tooltip_text (label, gtk_string_object_get_string (name));
}

/* Long items (material names, clause names) ellipsized leave the sidebar
 * its width, in every language; the open list and the tooltip show them
 * whole. */
void
hl_fields_ellipsize_dropdown (GtkDropDown *dropdown)
{
  g_autoptr(GtkListItemFactory) factory = gtk_signal_list_item_factory_new ();

  g_signal_connect (factory, "setup", G_CALLBACK (on_ellipsized_item_setup_cb), NULL);
  g_signal_connect (factory, "bind", G_CALLBACK (on_ellipsized_item_bind_cb), NULL);
  gtk_drop_down_set_factory (dropdown, factory);
}
