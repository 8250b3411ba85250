/* hl-signoff-page.c — who prepared, checked and approved the design note
 *
 * The sheet prints these three in its sign-off block, with empty boxes
 * for what is not given, so a checker can sign a printed copy by hand.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-signoff-page"

#include "hl-config.h"
#include "hl-signoff-page.h"
#include "hl-date.h"
#include "hl-fields.h"
#include "hl-limits.h"

#include <glib/gi18n.h>

struct _HlSignoffPage
{
  GtkBox      parent_instance;

  HlDocument *document;
  GtkEntry   *name[HL_N_SIGNOFFS];
  GtkEntry   *date[HL_N_SIGNOFFS];
  GtkLabel   *error;
};

G_DEFINE_FINAL_TYPE (HlSignoffPage, hl_signoff_page, GTK_TYPE_BOX)

static void on_entry_changed_cb (GtkEditable *editable, HlSignoffPage *self);

static char *
stripped (GtkEntry *entry)
{
  return g_strstrip (g_strdup (gtk_editable_get_text (GTK_EDITABLE (entry))));
}

/* shows @text unless the entry already says it (give or take the space
 * being typed); held from "changed" because set_text first empties it */
static void
show_text (HlSignoffPage *self,
           GtkEntry      *entry,
           const char    *text)
{
  g_autofree char *shown = stripped (entry);

  if (g_strcmp0 (shown, text) == 0)
    return;
  g_signal_handlers_block_by_func (entry, on_entry_changed_cb, self);
  gtk_editable_set_text (GTK_EDITABLE (entry), text);
  g_signal_handlers_unblock_by_func (entry, on_entry_changed_cb, self);
}

static void
on_document_changed_cb (HlDocument    *document,
                        HlSignoffPage *self)
{
  const HlProject *project = hl_document_get_project (document);

  for (int r = 0; r < HL_N_SIGNOFFS; r++)
    {
      g_autofree char *typed = stripped (self->date[r]);

      show_text (self, self->name[r], project->signoff[r].name);
      /* a date being typed and not yet valid stays as typed */
      if (typed[0] == '\0' || hl_date_valid (typed))
        show_text (self, self->date[r], project->signoff[r].date);
    }
}

static void
on_entry_changed_cb (GtkEditable   *editable,
                     HlSignoffPage *self)
{
  const HlProject *project = hl_document_get_project (self->document);
  gboolean any_bad = FALSE;

  for (int r = 0; r < HL_N_SIGNOFFS; r++)
    {
      g_autofree char *name = stripped (self->name[r]);
      g_autofree char *date = stripped (self->date[r]);
      gboolean bad = date[0] != '\0' && !hl_date_valid (date);

      if (bad)
        gtk_widget_add_css_class (GTK_WIDGET (self->date[r]), "error");
      else
        gtk_widget_remove_css_class (GTK_WIDGET (self->date[r]), "error");
      any_bad |= bad;
      hl_document_set_signoff (self->document, r, name, bad ? project->signoff[r].date : date);
    }
  gtk_label_set_text (self->error, any_bad ? _("A date must read YYYY-MM-DD, or stay empty.") : "");
}

static void
hl_signoff_page_dispose (GObject *object)
{
  HlSignoffPage *self = HL_SIGNOFF_PAGE (object);

  if (self->document != NULL)
    g_signal_handlers_disconnect_by_data (self->document, self);
  g_clear_object (&self->document);
  G_OBJECT_CLASS (hl_signoff_page_parent_class)->dispose (object);
}

static void
hl_signoff_page_class_init (HlSignoffPageClass *klass)
{
  G_OBJECT_CLASS (klass)->dispose = hl_signoff_page_dispose;
}

static GtkWidget *
heading (const char *text)
{
  GtkWidget *label = gtk_label_new (text);

  gtk_label_set_xalign (GTK_LABEL (label), 0);
  gtk_widget_add_css_class (label, "heading");
  return label;
}

static void
hl_signoff_page_init (HlSignoffPage *self)
{
  const char *roles[HL_N_SIGNOFFS] = { N_("_Prepared by"), N_("_Checked by"), N_("_Approved by") };
  GtkWidget *intro = gtk_label_new (_("The design note's sign-off block prints these; boxes left empty stay empty "
                                      "on the sheet, to be signed by hand."));
  GtkGrid *grid = GTK_GRID (gtk_grid_new ());

  gtk_orientable_set_orientation (GTK_ORIENTABLE (self), GTK_ORIENTATION_VERTICAL);
  gtk_box_set_spacing (GTK_BOX (self), 12);
  g_object_set (self, "margin-start", 18, "margin-end", 18, "margin-top", 18, "margin-bottom", 18, NULL);
  gtk_label_set_wrap (GTK_LABEL (intro), TRUE);
  gtk_label_set_xalign (GTK_LABEL (intro), 0);
  gtk_widget_add_css_class (intro, "dim-label");
  gtk_box_append (GTK_BOX (self), intro);

  gtk_grid_set_row_spacing (grid, 8);
  gtk_grid_set_column_spacing (grid, 12);
  gtk_grid_attach (grid, heading (_("Name")), 1, 0, 1, 1);
  gtk_grid_attach (grid, heading (_("Date (YYYY-MM-DD)")), 2, 0, 1, 1);
  for (int r = 0; r < HL_N_SIGNOFFS; r++)
    {
      GtkWidget *label = gtk_label_new_with_mnemonic (_(roles[r]));
      g_autofree char *date_name = g_strdup_printf (_("%s: date"), gtk_label_get_text (GTK_LABEL (label)));

      self->name[r] = GTK_ENTRY (gtk_entry_new ());
      self->date[r] = GTK_ENTRY (gtk_entry_new ());
      gtk_label_set_xalign (GTK_LABEL (label), 0);
      gtk_label_set_mnemonic_widget (GTK_LABEL (label), GTK_WIDGET (self->name[r]));
      gtk_widget_set_hexpand (GTK_WIDGET (self->name[r]), TRUE);
      gtk_editable_set_width_chars (GTK_EDITABLE (self->date[r]), 11);
      gtk_editable_set_max_width_chars (GTK_EDITABLE (self->date[r]), 11);
      gtk_entry_set_placeholder_text (self->date[r], "YYYY-MM-DD");
      gtk_accessible_update_property (GTK_ACCESSIBLE (self->date[r]), GTK_ACCESSIBLE_PROPERTY_LABEL, date_name, -1);
      /* the reader's limits, kept while typing */
      hl_fields_limit_editable (GTK_EDITABLE (self->name[r]), HL_LIMIT_SHORT_TEXT_CHARS, 0, TRUE);
      hl_fields_limit_editable (GTK_EDITABLE (self->date[r]), 10, 0, TRUE);
      gtk_grid_attach (grid, label, 0, r + 1, 1, 1);
      gtk_grid_attach (grid, GTK_WIDGET (self->name[r]), 1, r + 1, 1, 1);
      gtk_grid_attach (grid, GTK_WIDGET (self->date[r]), 2, r + 1, 1, 1);
      g_signal_connect (self->name[r], "changed", G_CALLBACK (on_entry_changed_cb), self);
      g_signal_connect (self->date[r], "changed", G_CALLBACK (on_entry_changed_cb), self);
    }
  gtk_box_append (GTK_BOX (self), GTK_WIDGET (grid));
  self->error = GTK_LABEL (gtk_label_new (""));
  gtk_label_set_xalign (self->error, 0);
  gtk_widget_add_css_class (GTK_WIDGET (self->error), "error");
  gtk_box_append (GTK_BOX (self), GTK_WIDGET (self->error));
}

GtkWidget *
hl_signoff_page_new (HlDocument *document)
{
  HlSignoffPage *self = g_object_new (HL_TYPE_SIGNOFF_PAGE, NULL);

  g_return_val_if_fail (HL_IS_DOCUMENT (document), GTK_WIDGET (self));

  self->document = g_object_ref (document);
  g_signal_connect (document, "changed", G_CALLBACK (on_document_changed_cb), self);
  on_document_changed_cb (document, self);
  return GTK_WIDGET (self);
}

GtkEditable *
hl_signoff_page_get_name (HlSignoffPage *self,
                          HlSignoffRole  role)
{
  g_return_val_if_fail (HL_IS_SIGNOFF_PAGE (self) && role < HL_N_SIGNOFFS, NULL);
  return GTK_EDITABLE (self->name[role]);
}

GtkEditable *
hl_signoff_page_get_date (HlSignoffPage *self,
                          HlSignoffRole  role)
{
  g_return_val_if_fail (HL_IS_SIGNOFF_PAGE (self) && role < HL_N_SIGNOFFS, NULL);
  return GTK_EDITABLE (self->date[role]);
}

const char *
hl_signoff_page_get_error (HlSignoffPage *self)
{
  g_return_val_if_fail (HL_IS_SIGNOFF_PAGE (self), NULL);
  return gtk_label_get_text (self->error);
}
