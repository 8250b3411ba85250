/* hl-shell-check.c — validation of shell inputs, every problem with its field
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-shell-check"

#include "hl-config.h"
#include "hl-shell-check.h"

#include "hl-field-table.h"
#include "hl-limits.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <string.h>

/* The physical bounds of every input are rows of the field table
 * (hl-field-table.c), each with its reason.  A value outside them is not
 * a real shell but a slip (a unit, a digit, a paste). */

/* the smallest bore and wall the table's rows name, for the checks of
 * the radii together */
#define HL_MIN_BORE_DIAMETER_M 1e-4
#define HL_MIN_WALL_M          1e-5
#define HL_MAX_LENGTH_M        1e5

/* below this t/a the wall is a film: differences of nearly equal radii
 * lose more digits than the results can afford */
#define HL_MIN_THIN_RATIO   1e-8
/* Outer over inner radius: thick-walled high-pressure parts run to k of
 * 3 to 10 (common practice); past 1000 it is a block with a pin hole.
 * Checked on the new wall, whose bore is the smaller. */
#define HL_MAX_RADIUS_RATIO 1000.0

/* without a field's own bounds: the kind's */
#define HL_MAX_STRESS_PA    1e13
#define HL_MIN_MATERIAL_PA  1e3
#define HL_MIN_LENGTH_M     1e-9

void
hl_problem_free (HlProblem *problem)
{
  if (problem == NULL)
    return;
  g_free (problem->message);
  g_free (problem->local);
  g_free (problem);
}

/* A message twice: in English for the command line, the files and the
 * reports, and in the user's language for the window.  The format is
 * marked with N_(); arguments are numbers, units and quoted values. */
typedef struct
{
  char *en;
  char *local;
} Say;

static const Say nothing = { NULL, NULL };

static Say say (const char *format, ...) G_GNUC_PRINTF (1, 2);

static Say
say (const char *format,
     ...)
{
  Say s;
  va_list args, again;

  va_start (args, format);
  va_copy (again, args);
  s.en = g_strdup_vprintf (format, args);
  s.local = g_strdup_vprintf (g_dgettext (GETTEXT_PACKAGE, format), again);
  va_end (again);
  va_end (args);
  return s;
}

/* @format takes two strings: a bound ("0.1 mm") and a reason, itself
 * marked for translation in the field table */
static Say
say_reason (const char *format,
            const char *bound,
            const char *reason)
{
  Say s;

#pragma GCC diagnostic push
#pragma GCC diagnostic ignored "-Wformat-nonliteral"
  s.en = g_strdup_printf (format, bound, reason);
  s.local = g_strdup_printf (g_dgettext (GETTEXT_PACKAGE, format), bound, g_dgettext (GETTEXT_PACKAGE, reason));
#pragma GCC diagnostic pop
  return s;
}

static gboolean
said (Say s)
{
  return s.en != NULL;
}

static char *
english (Say s)
{
  g_free (s.local);
  return s.en;
}

static void
add (GPtrArray  *problems,
     const char *field,
     Say         message)
{
  HlProblem *p;

  if (message.en == NULL)
    return;
  p = g_new0 (HlProblem, 1);
  p->field = field;
  p->message = message.en;
  p->local = message.local;
  g_ptr_array_add (problems, p);
}

/* Limits of a kind, for a field without its own bounds */
static Say
check_kind_limits (double          si,
                   HlQuantityKind  kind,
                   gboolean        zero_allowed)
{
  switch (kind)
    {
    case HL_KIND_LENGTH:
      if (si > HL_MAX_LENGTH_M)
        return say (N_("is unrealistically large (over 100 km)"));
      if (si > 0.0 && si < HL_MIN_LENGTH_M)
        return say (N_("is unrealistically small (under 1 nm)"));
      break;
    case HL_KIND_STRESS:
    case HL_KIND_MODULUS:
      if (si > HL_MAX_STRESS_PA)
        return say (N_("is unrealistically large (over 10 000 GPa)"));
      /* material strengths and moduli (never zero) below a kilopascal are
       * a slip of the unit, not a material */
      if (!zero_allowed && si < HL_MIN_MATERIAL_PA)
        return say (N_("is unrealistically small (under 1 kPa)"));
      break;
    case HL_KIND_PERCENT:
    case HL_KIND_RATIO:
    default:
      break;
    }
  return nothing;
}

static Say
check_quantity (const char     *field,
                HlQuantity      q,
                HlQuantityKind  kind,
                gboolean        zero_allowed)
{
  double factor = hl_unit_factor (kind, q.unit);
  const HlField *bound = hl_field_lookup (field);
  double si;

  if (kind != HL_KIND_RATIO && factor <= 0.0)
    {
      g_autofree char *quoted = hl_text_quote (q.unit, 40);

      return say (N_("unknown unit “%s”"), quoted);
    }
  if (!isfinite (q.value))
    return say (N_("is not a finite number"));
  /* a temperature in °C or °F has an offset; its lower bound is near
   * absolute zero, so negative values are the bound's to judge */
  si = kind == HL_KIND_RATIO ? q.value : hl_quantity_si (q, kind);
  if (si < 0.0 && kind != HL_KIND_TEMPERATURE)
    return say (N_("must not be negative"));
  if (si == 0.0 && !zero_allowed)
    return say (N_("must be greater than zero"));
  if (bound == NULL || !bound->bounded || bound->kind == HL_FIELD_RATIO)
    return check_kind_limits (si, kind, zero_allowed);
  if (si > bound->max_si)
    return say (N_("is unrealistically large (over %s)"), bound->max_text);
  if ((si > 0.0 || kind == HL_KIND_TEMPERATURE) && si < bound->min_si)
    return say_reason (zero_allowed ? N_("is unrealistically small (under %s, other than 0: %s)")
                                    : N_("is unrealistically small (under %s: %s)"),
                       bound->min_text, bound->why_min);
  if (bound->max_exclusive && si >= bound->max_si)
    return say (N_("must be less than %s"), bound->max_text);
  return nothing;
}

char *
hl_check_quantity (const char     *field,
                   HlQuantity      q,
                   HlQuantityKind  kind,
                   gboolean        zero_allowed)
{
  return english (check_quantity (field, q, kind, zero_allowed));
}

static char *
mm_text (double metres)
{
  return hl_format_significant (metres * 1e3, 3);
}

/* Checks of the radii together, new wall and corroded wall: each value
 * may be within its bounds and the shell still not be one. */
static void
check_radii (GPtrArray           *problems,
             const HlShellInputs *in)
{
  double t = hl_quantity_si (in->wall_thickness, HL_KIND_LENGTH);
  double c = hl_quantity_si (in->corrosion_allowance, HL_KIND_LENGTH);
  double a, b, a_new, b_new;

  hl_shell_inputs_radii (in, FALSE, &a_new, &b_new);
  hl_shell_inputs_radii (in, TRUE, &a, &b);
  if (a_new <= 0.0)
    add (problems, "wall-thickness",
         say (N_("leaves no bore: the wall is as thick as the outer radius or more")));
  else if (2.0 * a_new < HL_MIN_BORE_DIAMETER_M)
    {
      g_autofree char *bore = mm_text (2.0 * a_new);

      add (problems, "wall-thickness",
           say (N_("leaves a bore of %s mm across; the bore must be at least 0.1 mm"), bore));
    }
  else if (c >= t)
    add (problems, "corrosion-allowance",
         say (N_("must be less than the wall thickness")));
  else if (b - a < HL_MIN_WALL_M)
    {
      g_autofree char *left = mm_text (b - a);

      add (problems, "corrosion-allowance",
           say (N_("leaves a corroded wall of %s mm; the wall after corrosion must be at least 0.01 mm"), left));
    }
  else if ((b - a) / a < HL_MIN_THIN_RATIO)
    add (problems, "wall-thickness",
         say (N_("is too thin to compute reliably (under 1e-8 of the inner radius)")));
  else if (b_new / a_new > HL_MAX_RADIUS_RATIO)
    add (problems, "wall-thickness",
         say (N_("makes the outer radius more than 1000 times the bore radius (new wall): not a shell")));
}

/* What the design check needs besides each value in its bounds: a
 * wall left after corrosion and mill undertolerance.  (A sphere's ends
 * are not refused here: the member means nothing for a sphere, the
 * writer leaves it out and the reader drops it with a warning.) */
static void
check_design_wall (GPtrArray           *problems,
                   const HlShellInputs *in)
{
  double t = hl_quantity_si (in->wall_thickness, HL_KIND_LENGTH);
  double c = hl_quantity_si (in->corrosion_allowance, HL_KIND_LENGTH);
  double ml = hl_quantity_si (in->mill_tolerance, HL_KIND_LENGTH);
  double mp = hl_quantity_si (in->mill_tolerance_percent, HL_KIND_PERCENT) * t;
  double m = MAX (ml, mp);

  if (m > 0.0 && t - c - m < HL_MIN_WALL_M)
    add (problems, mp > ml ? "mill-undertolerance-percent" : "mill-undertolerance",
         say (N_("with the corrosion allowance leaves less than 0.01 mm of wall")));
}

/* A name is one line: a line break in it could forge a line of the
 * summary or the report, a tab a column of a table. */
static void
check_name (GPtrArray  *problems,
            const char *name,
            gboolean    material)
{
  if (hl_text_has_control (name, FALSE))
    add (problems, "name",
         material ? say (N_("holds a control character (a line break, tab or the like): "
                            "the name of a material is one line of text"))
                  : say (N_("holds a control character (a line break, tab or the like): "
                            "the name of a shell is one line of text")));
}

/* A bare number: one message names its whole range */
static Say
check_ratio (const HlField *f,
             double         v)
{
  if (!isfinite (v))
    return say (N_("is not a finite number"));
  if ((f->min_exclusive ? v <= f->min_si : v < f->min_si)
      || (f->max_exclusive ? v >= f->max_si : v > f->max_si))
    {
      Say range = { g_strdup (f->range_message), g_strdup (g_dgettext (GETTEXT_PACKAGE, f->range_message)) };

      return range;
    }
  return nothing;
}

static Say
field_check (const HlField *f,
             gconstpointer  slot)
{
  switch (f->kind)
    {
    case HL_FIELD_TEXT:
    case HL_FIELD_CHOICE:
      return nothing;
    case HL_FIELD_RATIO:
      return check_ratio (f, *(const double *) slot);
    default:  /* the quantities */
      return check_quantity (f->element, *(const HlQuantity *) slot, hl_field_quantity_kind (f), f->zero_allowed);
    }
}

char *
hl_field_check (const HlField *f,
                gconstpointer  slot)
{
  g_return_val_if_fail (f != NULL && slot != NULL, NULL);
  return english (field_check (f, slot));
}

GPtrArray *
hl_shell_inputs_check (const HlShellInputs *in)
{
  GPtrArray *problems = g_ptr_array_new_with_free_func ((GDestroyNotify) hl_problem_free);
  gboolean lengths_ok = TRUE, radii_done = FALSE;

  g_return_val_if_fail (in != NULL, problems);

  if (in->id[0] == '\0')
    add (problems, "id", say (N_("the shell needs an id")));
  /* in the table's order, which the reader's first problem follows */
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);
      Say msg;

      if (f->is_size && f->size_kind != in->size_kind)
        continue;
      /* the radii together, once every length is in its bounds */
      if (!radii_done && f->kind != HL_FIELD_LENGTH && f->kind != HL_FIELD_TEXT)
        {
          radii_done = TRUE;
          if (lengths_ok)
            check_radii (problems, in);
        }
      if (f->kind == HL_FIELD_TEXT)
        {
          if (strcmp (f->element, "name") == 0)
            check_name (problems, hl_field_cslot (f, in), f->owner == HL_FIELD_OF_MATERIAL);
          else if (f->owner == HL_FIELD_OF_SHELL && strcmp (f->element, "material-ref") != 0
                   && hl_text_has_control (hl_field_cslot (f, in), FALSE))
            add (problems, f->element,
                 say (N_("holds a control character (a line break, tab or the like): it is one line of text")));
          continue;
        }
      msg = field_check (f, hl_field_cslot (f, in));
      if (said (msg) && f->kind == HL_FIELD_LENGTH)
        lengths_ok = FALSE;
      add (problems, f->element, msg);
    }
  if (problems->len == 0)
    check_design_wall (problems, in);
  return problems;
}

char *
hl_problems_join (GPtrArray *problems)
{
  GString *s = g_string_new (NULL);

  for (guint i = 0; i < problems->len; i++)
    {
      HlProblem *p = g_ptr_array_index (problems, i);

      if (i > 0)
        g_string_append (s, "; ");
      g_string_append_printf (s, "%s %s", p->field, p->message);
    }
  return g_string_free (s, FALSE);
}
