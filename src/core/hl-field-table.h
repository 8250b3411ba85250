/* hl-field-table.h — one row per input of a shell and of its material
 *
 * The reader, the writer, the checks, the explanations of refused
 * files, the report, the sheet and the window's rows all walk this
 * table, so an input is added in one place (DEVELOPERS.md, "Adding an
 * input").
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-shell.h"

G_BEGIN_DECLS

typedef enum
{
  HL_FIELD_LENGTH,
  HL_FIELD_PRESSURE,
  HL_FIELD_STRESS,
  HL_FIELD_MODULUS,
  HL_FIELD_RATIO,    /* a bare number: double, no unit */
  HL_FIELD_PERCENT,  /* a quantity in %, unit optional in the file */
  HL_FIELD_CHOICE,   /* an enum, one of the row's words */
  HL_FIELD_TEXT,     /* char[] */
  HL_FIELD_TEMPERATURE, /* a quantity in °C, K or °F (SI kelvin) */
} HlFieldKind;

typedef enum { HL_FIELD_OF_SHELL, HL_FIELD_OF_MATERIAL } HlFieldOwner;

typedef struct
{
  const char *word;    /* as in the file */
  int         value;   /* the enum value */
  const char *label;   /* drop-down item, N_() */
  const char *report;  /* the text report's word (English) */
  const char *sheet;   /* the sheet's word, NC_() */
  const char *sheet_context;
} HlFieldChoice;

typedef struct
{
  const char          *element;      /* as in the file */
  HlFieldKind          kind;
  HlFieldOwner         owner;
  gsize                offset;       /* into HlShellInputs or HlMaterial */
  gsize                text_size;    /* text rows: the member's bytes */
  gboolean             required;     /* the schema requires it */
  gboolean             is_size;      /* one of the four ways to give the size */
  HlSizeKind           size_kind;
  /* numbers: bounds in SI, inclusive unless said; 0 = no own bound */
  gboolean             zero_allowed;
  gboolean             bounded;
  double               min_si;       /* smallest value other than zero */
  double               max_si;
  gboolean             min_exclusive;
  gboolean             max_exclusive;
  const char          *min_text;     /* the bounds as messages name them */
  const char          *max_text;
  const char          *why_min;
  const char          *range_message; /* ratio rows: the one message */
  double               default_value;
  const char          *default_unit;
  const char          *label;        /* the window's label, N_() */
  const char          *tooltip;      /* N_() */
  const char          *report;       /* the text report's label (English) */
  const char          *sheet;        /* the sheet's label, N_() */
  const HlFieldChoice *choices;      /* ends with a NULL word */
  guint                since_minor;  /* the minor format version that added it (0: 1.0) */
} HlField;

guint           hl_field_count         (void);
const HlField  *hl_field_nth           (guint        index);
const HlField  *hl_field_find          (HlFieldOwner owner,
                                        const char  *element);
/* either owner; a shell row first */
const HlField  *hl_field_lookup        (const char  *element);
/* the element names of @owner, NULL-terminated, in table order */
const char *const *hl_field_elements   (HlFieldOwner owner);

HlQuantityKind  hl_field_quantity_kind (const HlField *field);
gboolean        hl_field_is_number     (const HlField *field);
gboolean        hl_field_unit_optional (const HlField *field);

/* the row's member in a shell (a material row: in the shell's material) */
gpointer        hl_field_slot          (const HlField *field,
                                        HlShellInputs *shell);
gconstpointer   hl_field_cslot         (const HlField       *field,
                                        const HlShellInputs *shell);
gpointer        hl_field_material_slot (const HlField *field,
                                        HlMaterial    *material);
gconstpointer   hl_field_material_cslot (const HlField    *field,
                                         const HlMaterial *material);
gboolean        hl_field_equal         (const HlField *field,
                                        gconstpointer  a,
                                        gconstpointer  b);

const HlFieldChoice *hl_field_choice_by_word  (const HlField *field,
                                               const char    *word);
const HlFieldChoice *hl_field_choice_by_value (const HlField *field,
                                               int            value);
guint           hl_field_choice_count  (const HlField *field);
/* position of @value in the row's list (a drop-down's position) */
guint           hl_field_choice_position (const HlField *field,
                                          int            value);
int             hl_field_choice_get    (const HlField *field,
                                        gconstpointer  slot);
void            hl_field_choice_set    (const HlField *field,
                                        gpointer       slot,
                                        int            value);

/* The table's defaults into the shell rows of @shell (sizes: the
 * inner diameter's) */
void            hl_field_apply_defaults (HlShellInputs *shell);

G_END_DECLS
