/* fuzz-common.c — checks shared by the fuzz targets
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-fuzz"

#include "fuzz-common.h"
#include "hl-result-rows.h"

#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

int
LLVMFuzzerInitialize (int    *argc,
                      char ***argv)
{
  (void) argc;
  (void) argv;
  /* a g_return_if_fail or g_warning reached from file data is a bug of
   * the core, not a message to print and carry on after */
  g_log_set_always_fatal (G_LOG_LEVEL_CRITICAL | G_LOG_LEVEL_WARNING);
  return 0;
}

void
fuzz_fail (const char *format,
           ...)
{
  va_list args;

  fputs ("fuzz: broken rule: ", stderr);
  va_start (args, format);
  vfprintf (stderr, format, args);
  va_end (args);
  fputc ('\n', stderr);
  fflush (stderr);
  abort ();
}

#define RESULT(field) { #field, G_STRUCT_OFFSET (HlSolution, field) }

/* Every HlResult member of HlSolution (src/core/hl-solution.h).  A result
 * added there and not here is still seen through hl_result_rows() below. */
static const struct
{
  const char *name;
  glong       offset;
} results[] = {
  RESULT (thin_hoop), RESULT (thin_axial),
  RESULT (lame_hoop_inner), RESULT (lame_hoop_outer),
  RESULT (lame_radial_inner), RESULT (lame_radial_outer),
  RESULT (lame_axial),
  RESULT (thin_wall_error), RESULT (thin_wall_error_equivalent),
  RESULT (ratio_for_tolerance),
  RESULT (von_mises_max), RESULT (tresca_max),
  RESULT (displacement_inner), RESULT (displacement_outer),
  RESULT (thin_growth_mean),
  RESULT (volume_strain),
  RESULT (first_yield_von_mises), RESULT (first_yield_tresca),
  RESULT (plastic_collapse),
  RESULT (mawp_thin), RESULT (mawp_lame),
  RESULT (treq_thin), RESULT (treq_lame),
  RESULT (treq_ug27), RESULT (mawp_ug27),
  RESULT (treq_en13445), RESULT (mawp_en13445),
  RESULT (barlow_pressure),
};

static void
check_result (const char *name,
              HlResult    r)
{
  if (r.reason == NULL && !isfinite (r.value))
    fuzz_fail ("result %s is %g with no reason", name, r.value);
  if (r.reason != NULL && (r.reason[0] == '\0' || !g_utf8_validate (r.reason, -1, NULL)))
    fuzz_fail ("result %s has an empty or invalid reason", name);
}

static void
check_finite (const char *name,
              double      value)
{
  if (!isfinite (value))
    fuzz_fail ("%s is %g", name, value);
}

/* Physics any Lamé field obeys, whatever the numbers:
 *  - the radial stress meets the surface pressures, sigma_r(a) = -pi and
 *    sigma_r(b) = -po (Timoshenko, Strength of Materials Part II, thick
 *    cylinders; the same boundary conditions hold for the sphere);
 *  - Tresca >= von Mises >= (sqrt 3 / 2) Tresca for any stress state
 *    (Hill, The Mathematical Theory of Plasticity, 1950; from memory).
 * The tolerance is relative to the largest stress in the wall, which
 * sets the round-off of the differences of nearly equal terms. */
static void
check_physics (const HlSolution *s)
{
  const HlWallPoint *inner = &s->points[0];
  const HlWallPoint *outer = &s->points[s->n_points - 1];
  double scale = fabs (s->pi) + fabs (s->po);

  for (guint i = 0; i < s->n_points; i++)
    scale = MAX (scale, fabs (s->points[i].hoop));
  if (inner->r != s->a || outer->r != s->b)
    fuzz_fail ("the points do not start on a and end on b");
  /* below ~1e-250 Pa the products a^2 b^2 p turn subnormal and lose
   * digits: no pressure anyone enters, and no NaN either */
  if (scale > 1e-250
      && (fabs (inner->radial + s->pi) > 1e-6 * scale || fabs (outer->radial + s->po) > 1e-6 * scale))
    fuzz_fail ("radial stress %.17g at a and %.17g at b for pressures %.17g and %.17g",
               inner->radial, outer->radial, s->pi, s->po);
  for (guint i = 0; i < s->n_points; i++)
    {
      const HlWallPoint *p = &s->points[i];

      /* squares of stresses below ~1e-154 Pa underflow */
      if (p->tresca < 1e-140)
        continue;
      if (p->von_mises > p->tresca * (1 + 1e-12) || p->von_mises < p->tresca * sqrt (3.0) / 2 * (1 - 1e-12))
        fuzz_fail ("point %u: von Mises %.17g outside the Tresca bounds of %.17g", i, p->von_mises, p->tresca);
    }
  /* the summary's surface values are the table's end points */
  if (hl_result_ok (s->lame_hoop_inner) && s->lame_hoop_inner.value != inner->hoop)
    fuzz_fail ("inner hoop stress %.17g in the summary, %.17g in the table", s->lame_hoop_inner.value, inner->hoop);
  if (hl_result_ok (s->lame_hoop_outer) && s->lame_hoop_outer.value != outer->hoop)
    fuzz_fail ("outer hoop stress %.17g in the summary, %.17g in the table", s->lame_hoop_outer.value, outer->hoop);
}

void
fuzz_check_solution (const HlSolution *s)
{
  g_autoptr(GArray) rows = NULL;

  for (guint i = 0; i < G_N_ELEMENTS (results); i++)
    check_result (results[i].name, G_STRUCT_MEMBER (HlResult, s, results[i].offset));

  check_finite ("a", s->a);
  check_finite ("b", s->b);
  check_finite ("t", s->t);
  check_finite ("k", s->k);
  check_finite ("mean_ratio", s->mean_ratio);
  check_finite ("pi", s->pi);
  check_finite ("po", s->po);
  check_finite ("allowable", s->allowable);
  check_finite ("yield", s->yield);
  check_finite ("tolerance", s->tolerance);
  check_finite ("lame.A", s->lame.A);
  check_finite ("lame.B", s->lame.B);
  if (!(s->a > 0.0 && s->b > s->a && s->t > 0.0))
    fuzz_fail ("analysis wall a=%g b=%g t=%g is not a wall", s->a, s->b, s->t);

  if (s->n_points < 2 || s->points == NULL)
    fuzz_fail ("%u points through the wall", s->n_points);
  for (guint i = 0; i < s->n_points; i++)
    {
      const HlWallPoint *p = &s->points[i];

      if (!isfinite (p->r) || !isfinite (p->hoop) || !isfinite (p->radial) || !isfinite (p->axial)
          || !isfinite (p->von_mises) || !isfinite (p->tresca)
          || !isfinite (p->thin_hoop) || !isfinite (p->thin_axial))
        fuzz_fail ("point %u (r=%g): hoop=%g radial=%g axial=%g vm=%g tresca=%g thin=%g/%g",
                   i, p->r, p->hoop, p->radial, p->axial, p->von_mises, p->tresca,
                   p->thin_hoop, p->thin_axial);
      /* the points run from the inner to the outer surface */
      if (p->r < s->a || p->r > s->b || (i > 0 && p->r < s->points[i - 1].r))
        fuzz_fail ("point %u at r=%.17g outside [%.17g, %.17g] or out of order", i, p->r, s->a, s->b);
    }

  check_physics (s);

  rows = hl_result_rows (s);
  for (guint i = 0; i < rows->len; i++)
    {
      const HlResultRow *row = &g_array_index (rows, HlResultRow, i);

      if (row->kind != HL_ROW_WORD)
        check_result (row->key, row->result);
    }

  for (guint i = 0; i < s->warnings->len; i++)
    if (!g_utf8_validate (g_ptr_array_index (s->warnings, i), -1, NULL))
      fuzz_fail ("warning %u is not UTF-8", i);
}

static gboolean
is_nonfinite_word (const char *word,
                   gsize       len)
{
  static const char *const bad[] = { "nan", "inf", "infinity" };

  for (guint i = 0; i < G_N_ELEMENTS (bad); i++)
    if (len == strlen (bad[i]) && g_ascii_strncasecmp (word, bad[i], len) == 0)
      return TRUE;
  return FALSE;
}

void
fuzz_check_no_nonfinite (const char        *what,
                         const char        *text,
                         const char *const *skip_keys)
{
  g_auto(GStrv) lines = g_strsplit (text, "\n", -1);

  if (!g_utf8_validate (text, -1, NULL))
    fuzz_fail ("%s is not UTF-8", what);
  for (guint l = 0; lines[l] != NULL; l++)
    {
      const char *line = lines[l];
      const char *eq = strstr (line, " = ");
      const char *p;

      if (eq != NULL && skip_keys != NULL)
        {
          g_autofree char *key = g_strndup (line, eq - line);

          if (g_strv_contains (skip_keys, key))
            continue;
        }
      /* words are runs of letters: "-nan" and "inf," are caught,
       * "infinite" and "banana" are not */
      p = line;
      while (*p != '\0')
        {
          const char *start;

          while (*p != '\0' && !g_ascii_isalpha (*p))
            p++;
          start = p;
          while (g_ascii_isalpha (*p))
            p++;
          if (p > start && is_nonfinite_word (start, p - start))
            fuzz_fail ("%s prints a non-finite number in line %u: %s", what, l + 1, line);
        }
    }
}

void
fuzz_check_outputs (const HlSolution *s)
{
  /* the shell's own name and id are what the user typed */
  static const char *const user_keys[] = { "shell", "id", NULL };
  static const HlUnitSystem systems[] = { HL_UNIT_SYSTEM_SI, HL_UNIT_SYSTEM_US };

  for (guint i = 0; i < G_N_ELEMENTS (systems); i++)
    {
      g_autofree char *summary = hl_report_summary_block (s, systems[i]);
      g_autofree char *csv = hl_report_csv (s, systems[i]);
      guint newlines = 0;

      fuzz_check_no_nonfinite ("summary", summary, user_keys);
      fuzz_check_no_nonfinite ("CSV", csv, NULL);
      /* the verdicts' comment lines, the header, one line per point */
      for (const char *c = csv; *c != '\0'; c++)
        newlines += *c == '\n';
      if (newlines != HL_CSV_PREAMBLE_LINES + s->n_points + 1)
        fuzz_fail ("CSV has %u lines for %u points", newlines, s->n_points);
    }
}

void
fuzz_check_round_trip (const HlProject *project)
{
  g_autofree char *xml = hl_project_to_xml (project);
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) again = NULL;
  g_autofree char *xml_again = NULL;

  if (!g_utf8_validate (xml, -1, NULL))
    fuzz_fail ("the saved project is not UTF-8:\n%s", xml);
  again = hl_project_load_bytes (xml, strlen (xml), "saved", NULL, &error);
  if (again == NULL)
    fuzz_fail ("the saved project does not reopen: %s\n%s", error->message, xml);
  if (!hl_project_equal (project, again))
    fuzz_fail ("the saved project reopens different from what was saved:\n%s", xml);
  /* and saving it again writes the same bytes */
  xml_again = hl_project_to_xml (again);
  if (strcmp (xml, xml_again) != 0)
    fuzz_fail ("saving the reopened project writes different text:\n%s\n---\n%s", xml, xml_again);
}
