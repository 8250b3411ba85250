/* hl-properties-dialog.c — title, engineer, description, revision notes, sign-off
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-properties-dialog"

#include "hl-config.h"
#include "hl-properties-dialog.h"
#include "hl-date.h"
#include "hl-fields.h"
#include "hl-limits.h"
#include "hl-signoff-page.h"

#include <glib/gi18n.h>
#include <string.h>

struct _HlPropertiesDialog
{
  GtkWindow    parent_instance;

  GtkNotebook *notebook;
  GtkEntry    *title_entry;
  GtkEntry    *engineer_entry;
  GtkDropDown *units_dropdown;
  GtkTextView *description_view;
  GtkListBox  *revisions_list;
  GtkEntry    *revision_date_entry;
  GtkEntry    *revision_author_entry;
  GtkEntry    *revision_text_entry;
  GtkLabel    *revision_error_label;
  GtkWidget   *signoff_page;

  HlDocument  *document;
  guint        updating;
};

G_DEFINE_FINAL_TYPE (HlPropertiesDialog, hl_properties_dialog, GTK_TYPE_WINDOW)

/* The file keeps no space at either end of a text, so neither does the
 * project; a field being typed keeps its own (the space before the next
 * word) as long as the rest agrees. */
static char *
stripped (const char *text)
{
  return g_strstrip (g_strdup (text != NULL ? text : ""));
}

static void
set_entry (HlPropertiesDialog *self,
           GtkEntry           *entry,
           const char         *text)
{
  g_autofree char *shown = stripped (gtk_editable_get_text (GTK_EDITABLE (entry)));

  if (g_strcmp0 (shown, text != NULL ? text : "") == 0)
    return;
  gtk_editable_set_text (GTK_EDITABLE (entry), text != NULL ? text : "");
}

static void
reload_revisions (HlPropertiesDialog *self)
{
  const HlProject *project = hl_document_get_project (self->document);
  GtkWidget *child;

  while ((child = gtk_widget_get_first_child (GTK_WIDGET (self->revisions_list))) != NULL)
    gtk_list_box_remove (self->revisions_list, child);
  for (guint i = 0; i < project->revisions->len; i++)
    {
      const HlRevision *r = &g_array_index (project->revisions, HlRevision, i);
      /* TRANSLATORS: revision heading: number, date, author */
      g_autofree char *head = g_strdup_printf (_("Revision %u — %s — %s"), r->number, r->date, r->author);
      GtkWidget *box = gtk_box_new (GTK_ORIENTATION_VERTICAL, 2);
      GtkWidget *title = gtk_label_new (head);
      GtkWidget *text = gtk_label_new (r->text);

      gtk_label_set_xalign (GTK_LABEL (title), 0);
      /* a long author name must not widen the dialog */
      gtk_label_set_ellipsize (GTK_LABEL (title), PANGO_ELLIPSIZE_END);
      gtk_widget_add_css_class (title, "heading");
      gtk_label_set_xalign (GTK_LABEL (text), 0);
      gtk_label_set_wrap (GTK_LABEL (text), TRUE);
      gtk_box_append (GTK_BOX (box), title);
      gtk_box_append (GTK_BOX (box), text);
      g_object_set (box, "margin-start", 8, "margin-end", 8, "margin-top", 6, "margin-bottom", 6, NULL);
      gtk_list_box_append (self->revisions_list, box);
    }
  if (project->revisions->len == 0)
    {
      GtkWidget *none = gtk_label_new (_("No revision notes yet."));

      gtk_widget_add_css_class (none, "dim-label");
      g_object_set (none, "margin-top", 12, "margin-bottom", 12, NULL);
      gtk_list_box_append (self->revisions_list, none);
    }
}

static void
reload (HlPropertiesDialog *self)
{
  const HlProject *project = hl_document_get_project (self->document);
  GtkTextBuffer *buffer = gtk_text_view_get_buffer (self->description_view);
  g_autofree char *description = NULL;
  GtkTextIter start, end;

  self->updating++;
  set_entry (self, self->title_entry, project->title);
  set_entry (self, self->engineer_entry, project->engineer);
  gtk_drop_down_set_selected (self->units_dropdown, project->display_units);
  gtk_text_buffer_get_bounds (buffer, &start, &end);
  description = g_strstrip (gtk_text_buffer_get_text (buffer, &start, &end, FALSE));
  if (g_strcmp0 (description, project->description != NULL ? project->description : "") != 0)
    gtk_text_buffer_set_text (buffer, project->description != NULL ? project->description : "", -1);
  reload_revisions (self);
  self->updating--;
}

static void
on_document_changed_cb (HlDocument         *document,
                        HlPropertiesDialog *self)
{
  reload (self);
}

static void
apply (HlPropertiesDialog *self)
{
  GtkTextBuffer *buffer = gtk_text_view_get_buffer (self->description_view);
  g_autofree char *description = NULL;
  g_autofree char *title = NULL;
  g_autofree char *engineer = NULL;
  GtkTextIter start, end;

  if (self->updating > 0)
    return;
  gtk_text_buffer_get_bounds (buffer, &start, &end);
  description = g_strstrip (gtk_text_buffer_get_text (buffer, &start, &end, FALSE));
  title = stripped (gtk_editable_get_text (GTK_EDITABLE (self->title_entry)));
  engineer = stripped (gtk_editable_get_text (GTK_EDITABLE (self->engineer_entry)));
  hl_document_set_info (self->document, title, engineer, description,
                        (HlUnitSystem) gtk_drop_down_get_selected (self->units_dropdown));
}

static void
on_title_entry_changed_cb (GtkEntry           *entry,
                           HlPropertiesDialog *self)
{
  apply (self);
}

static void
on_engineer_entry_changed_cb (GtkEntry           *entry,
                              HlPropertiesDialog *self)
{
  apply (self);
}

static void
on_units_dropdown_selected_cb (GObject            *dropdown,
                               GParamSpec         *pspec,
                               HlPropertiesDialog *self)
{
  apply (self);
}

static void
on_description_changed_cb (GtkTextBuffer      *buffer,
                           HlPropertiesDialog *self)
{
  apply (self);
}

static void
on_add_revision_button_clicked_cb (HlPropertiesDialog *self)
{
  g_autofree char *date = stripped (gtk_editable_get_text (GTK_EDITABLE (self->revision_date_entry)));
  g_autofree char *author = stripped (gtk_editable_get_text (GTK_EDITABLE (self->revision_author_entry)));
  g_autofree char *text = stripped (gtk_editable_get_text (GTK_EDITABLE (self->revision_text_entry)));
  const HlRevision *latest = hl_project_latest_revision (hl_document_get_project (self->document));

  if (latest != NULL && latest->number >= HL_LIMIT_REVISION_NUMBER)
    {
      g_autofree char *message =
        /* TRANSLATORS: %d is the highest revision number a project file takes */
        g_strdup_printf (_("Revision numbers end at %d: no further revision can be added."),
                         HL_LIMIT_REVISION_NUMBER);

      gtk_label_set_text (self->revision_error_label, message);
      return;
    }
  if (!hl_date_valid (date))
    {
      gtk_label_set_text (self->revision_error_label, _("The date must read YYYY-MM-DD."));
      gtk_widget_grab_focus (GTK_WIDGET (self->revision_date_entry));
      return;
    }
  if (text[0] == '\0')
    {
      gtk_label_set_text (self->revision_error_label, _("Say what changed in this revision."));
      gtk_widget_grab_focus (GTK_WIDGET (self->revision_text_entry));
      return;
    }
  gtk_label_set_text (self->revision_error_label, "");
  /* the fields keep to the limits, so the document takes the note */
  if (hl_document_add_revision (self->document, date, author, text))
    gtk_editable_set_text (GTK_EDITABLE (self->revision_text_entry), "");
}

static void
hl_properties_dialog_dispose (GObject *object)
{
  HlPropertiesDialog *self = HL_PROPERTIES_DIALOG (object);

  if (self->document != NULL)
    g_signal_handlers_disconnect_by_data (self->document, self);
  g_clear_object (&self->document);
  /* the window lets its child go first, or the template would unparent
   * it behind the window's back */
  gtk_window_set_child (GTK_WINDOW (self), NULL);
  gtk_widget_dispose_template (GTK_WIDGET (self), HL_TYPE_PROPERTIES_DIALOG);
  G_OBJECT_CLASS (hl_properties_dialog_parent_class)->dispose (object);
}

static void
hl_properties_dialog_class_init (HlPropertiesDialogClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = hl_properties_dialog_dispose;
  gtk_widget_class_set_template_from_resource (widget_class, "/org/hoopline/Hoopline/hl-properties-dialog.ui");
#define CHILD(name) gtk_widget_class_bind_template_child (widget_class, HlPropertiesDialog, name)
  CHILD (notebook);
  CHILD (title_entry);
  CHILD (engineer_entry);
  CHILD (units_dropdown);
  CHILD (description_view);
  CHILD (revisions_list);
  CHILD (revision_date_entry);
  CHILD (revision_author_entry);
  CHILD (revision_text_entry);
  CHILD (revision_error_label);
#undef CHILD
  gtk_widget_class_bind_template_callback (widget_class, on_title_entry_changed_cb);
  gtk_widget_class_bind_template_callback (widget_class, on_engineer_entry_changed_cb);
  gtk_widget_class_bind_template_callback (widget_class, on_units_dropdown_selected_cb);
  gtk_widget_class_bind_template_callback (widget_class, on_add_revision_button_clicked_cb);
}

static void
hl_properties_dialog_init (HlPropertiesDialog *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
  /* the limits the project file reader keeps (hl-limits.h), enforced
   * while typing so a save never meets a text it cannot write */
  hl_fields_limit_editable (GTK_EDITABLE (self->title_entry), HL_LIMIT_SHORT_TEXT_CHARS, 0, TRUE);
  hl_fields_limit_editable (GTK_EDITABLE (self->engineer_entry), HL_LIMIT_SHORT_TEXT_CHARS, 0, TRUE);
  hl_fields_limit_editable (GTK_EDITABLE (self->revision_author_entry), HL_LIMIT_SHORT_TEXT_CHARS, 0, TRUE);
  hl_fields_limit_editable (GTK_EDITABLE (self->revision_text_entry), HL_LIMIT_LONG_TEXT_CHARS, 0, TRUE);
  hl_fields_limit_text_buffer (gtk_text_view_get_buffer (self->description_view), HL_LIMIT_LONG_TEXT_CHARS);
  g_signal_connect (gtk_text_view_get_buffer (self->description_view), "changed",
                    G_CALLBACK (on_description_changed_cb), self);
}

HlPropertiesDialog *
hl_properties_dialog_new (GtkWindow  *parent,
                          HlDocument *document,
                          gboolean    revisions)
{
  HlPropertiesDialog *self = g_object_new (HL_TYPE_PROPERTIES_DIALOG, "transient-for", parent, NULL);
  g_autoptr(GDateTime) now = g_date_time_new_now_local ();
  g_autofree char *today = g_date_time_format (now, "%Y-%m-%d");
  const HlProject *project = hl_document_get_project (document);

  self->document = g_object_ref (document);
  g_signal_connect (document, "changed", G_CALLBACK (on_document_changed_cb), self);
  self->signoff_page = hl_signoff_page_new (document);
  gtk_notebook_append_page (self->notebook, self->signoff_page, gtk_label_new_with_mnemonic (_("_Sign-off")));
  reload (self);
  gtk_editable_set_text (GTK_EDITABLE (self->revision_date_entry), today);
  gtk_editable_set_text (GTK_EDITABLE (self->revision_author_entry),
                         project->engineer != NULL ? project->engineer : "");
  if (revisions)
    {
      gtk_notebook_set_current_page (self->notebook, 1);
      gtk_widget_grab_focus (GTK_WIDGET (self->revision_text_entry));
    }
  return self;
}

HlSignoffPage *
hl_properties_dialog_get_signoff_page (HlPropertiesDialog *self)
{
  g_return_val_if_fail (HL_IS_PROPERTIES_DIALOG (self), NULL);
  return HL_SIGNOFF_PAGE (self->signoff_page);
}

GtkEditable *
hl_properties_dialog_get_title_entry (HlPropertiesDialog *self)
{
  g_return_val_if_fail (HL_IS_PROPERTIES_DIALOG (self), NULL);
  return GTK_EDITABLE (self->title_entry);
}

GtkEditable *
hl_properties_dialog_get_engineer_entry (HlPropertiesDialog *self)
{
  g_return_val_if_fail (HL_IS_PROPERTIES_DIALOG (self), NULL);
  return GTK_EDITABLE (self->engineer_entry);
}

GtkEditable *
hl_properties_dialog_get_revision_date_entry (HlPropertiesDialog *self)
{
  g_return_val_if_fail (HL_IS_PROPERTIES_DIALOG (self), NULL);
  return GTK_EDITABLE (self->revision_date_entry);
}

GtkEditable *
hl_properties_dialog_get_revision_author_entry (HlPropertiesDialog *self)
{
  g_return_val_if_fail (HL_IS_PROPERTIES_DIALOG (self), NULL);
  return GTK_EDITABLE (self->revision_author_entry);
}

GtkEditable *
hl_properties_dialog_get_revision_text_entry (HlPropertiesDialog *self)
{
  g_return_val_if_fail (HL_IS_PROPERTIES_DIALOG (self), NULL);
  return GTK_EDITABLE (self->revision_text_entry);
}

GtkTextView *
hl_properties_dialog_get_description_view (HlPropertiesDialog *self)
{
  g_return_val_if_fail (HL_IS_PROPERTIES_DIALOG (self), NULL);
  return self->description_view;
}

const char *
hl_properties_dialog_get_revision_error (HlPropertiesDialog *self)
{
  g_return_val_if_fail (HL_IS_PROPERTIES_DIALOG (self), NULL);
  return gtk_label_get_text (self->revision_error_label);
}
