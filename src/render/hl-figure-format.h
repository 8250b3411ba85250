/* hl-figure-format.h — numbers and quantities as the figure shows them
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-config.h"
#include "hl-design-check.h"
#include "hl-result-rows.h"

/* gettext is libc/GLib, not GTK: the words drawn follow the user's
 * language; numbers follow HlFigureContext.locale_numbers only */
#include <glib/gi18n-lib.h>

G_BEGIN_DECLS

/* No-break space between a number and its unit, so a wrap never
 * separates them. */
#define HL_NBSP "\xc2\xa0"

/* @decimals after the point; a true minus sign (U+2212); C locale
 * unless @locale. */
char *hl_figure_format_fixed    (double       value,
                                 int          decimals,
                                 gboolean     locale);
/* @digits significant, as hl_format_significant, with a true minus */
char *hl_figure_format_sig      (double       value,
                                 int          digits,
                                 gboolean     locale);
/* SI @si shown in the row unit of @kind for @system: "66.3 MPa" */
char *hl_figure_format_quantity (double       si,
                                 HlRowKind    kind,
                                 HlUnitSystem system,
                                 int          digits,
                                 gboolean     locale);

/* An input's SI @si in @system's unit for its @kind, as a listing of
 * inputs shows it beside the value as typed: "29007.5 ksi" for a
 * modulus in US customary units, "2.5 mm", "65 °C" (hl_unit_to_system) */
char *hl_figure_format_input    (double         si,
                                 HlQuantityKind kind,
                                 HlUnitSystem   system,
                                 int            digits,
                                 gboolean       locale);

/* Why a method of the design check fails or does not apply, in the
 * user's language and units: "needs 12.59 mm nominal, has 12 mm; …";
 * NULL when it passes */
char       *hl_figure_check_reason  (const HlMethodCheck *check,
                                     HlUnitSystem         system,
                                     gboolean             locale);

/* "Caution: " and HL_CAUTION in the user's language */
char       *hl_figure_caution       (void);
/* "sphere", "cylinder, closed ends", ... in the user's language */
const char *hl_figure_form_text     (const HlShellInputs *inputs);
/* the core's untranslated text (row label, word, reason, warning) in
 * the user's language; the core only marks it with N_() */
const char *hl_figure_core_text     (const char *text);

G_END_DECLS
