/* fuzz-solve.c — the solver over any shell the checks let through
 *
 * The bytes pick every input of one shell: raw doubles (NaN, inf,
 * subnormals, negatives), hostile specials, or values spread over many
 * decades in a unit of the kind.  Rules (DESIGN.md §7 and issue 5):
 * a shell that hl_shell_inputs_check() passes is solved, and nothing it
 * computes is NaN or infinite without a reason; a shell it refuses is
 * refused by hl_solve() too; a valid shell saves and reopens unchanged.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-fuzz"

#include "fuzz-common.h"
#include "hl-shell-check.h"

#include <float.h>
#include <math.h>
#include <string.h>

typedef struct
{
  const uint8_t *p;
  size_t         n;
} Bytes;

static guint8
take_byte (Bytes *b)
{
  guint8 v = 0;

  if (b->n > 0)
    {
      v = *b->p++;
      b->n--;
    }
  return v;
}

static guint
take_pick (Bytes *b,
           guint  count)
{
  return take_byte (b) % count;
}

static double
take_raw_double (Bytes *b)
{
  guint8 raw[sizeof (double)] = { 0 };
  double v;

  for (guint i = 0; i < sizeof raw; i++)
    raw[i] = take_byte (b);
  memcpy (&v, raw, sizeof v);
  return v;
}

/* Values in the decades [lo_exp, hi_exp]: most fall where a real shell
 * would and some beyond, so the checks' limits are crossed both ways. */
static double
take_value (Bytes *b,
            int    lo_exp,
            int    hi_exp)
{
  static const double specials[] = {
    0.0, -0.0, 1.0, -1.0, 0.5, 1e-9, 1e5, 1e13, 1e-300, 1e300,
    DBL_MIN, DBL_MAX, DBL_EPSILON, 5e-324, NAN, INFINITY, -INFINITY,
  };
  guint8 mode = take_byte (b);
  guint high, low;
  double mantissa;
  int exponent;

  switch (mode % 16)
    {
    case 0:
      return take_raw_double (b);
    case 1:
      return specials[take_pick (b, G_N_ELEMENTS (specials))];
    default:
      /* two statements: the order of calls within one expression is
       * unspecified, and the corpus must decode the same everywhere */
      high = take_byte (b);
      low = take_byte (b);
      mantissa = (high << 8 | low) / 6553.6;  /* 0 .. 10 */
      exponent = lo_exp + (int) take_pick (b, hi_exp - lo_exp + 1);
      return (mode % 16 == 2 ? -mantissa : mantissa) * pow (10.0, exponent);
    }
}

static void
take_quantity (Bytes          *b,
               HlQuantity     *q,
               HlQuantityKind  kind,
               int             lo_exp,
               int             hi_exp)
{
  const char * const *names = hl_unit_names (kind);
  guint n = g_strv_length ((char **) names);
  guint pick = take_pick (b, n + 1);

  /* one pick past the list is a unit no table knows */
  *q = hl_quantity_make (take_value (b, lo_exp, hi_exp), pick < n ? names[pick] : "furlong");
}

static HlShellInputs
take_shell (Bytes *b)
{
  HlShellInputs in = hl_shell_inputs_default ();

  in.form = take_pick (b, 2);
  in.ends = take_pick (b, 3);
  in.size_kind = take_pick (b, 4);
  in.thin_basis = take_pick (b, 3);
  in.verdict_measure = take_pick (b, 2);
  in.sizing_criterion = take_pick (b, 2);
  take_quantity (b, &in.size, HL_KIND_LENGTH, -12, 9);
  take_quantity (b, &in.wall_thickness, HL_KIND_LENGTH, -12, 9);
  take_quantity (b, &in.corrosion_allowance, HL_KIND_LENGTH, -12, 9);
  take_quantity (b, &in.internal_pressure, HL_KIND_STRESS, -6, 14);
  take_quantity (b, &in.external_pressure, HL_KIND_STRESS, -6, 14);
  take_quantity (b, &in.material.elastic_modulus, HL_KIND_MODULUS, -6, 14);
  take_quantity (b, &in.material.yield_strength, HL_KIND_STRESS, -6, 14);
  take_quantity (b, &in.material.allowable_stress, HL_KIND_STRESS, -6, 14);
  in.material.poisson_ratio = take_value (b, -3, 0);
  in.joint_efficiency = take_value (b, -3, 0);
  take_quantity (b, &in.thin_tolerance, HL_KIND_PERCENT, -6, 2);
  /* the design check's inputs (format 1.2), taken last so that the
   * corpus keeps its meaning for the fields above */
  if (take_pick (b, 2) == 1)
    in.verdict_measure = HL_MEASURE_BOTH;
  in.design_basis = take_pick (b, 4);
  in.external_coincident = take_pick (b, 2);
  take_quantity (b, &in.mill_tolerance, HL_KIND_LENGTH, -12, 9);
  take_quantity (b, &in.mill_tolerance_percent, HL_KIND_PERCENT, -6, 2);
  take_quantity (b, &in.design_temperature, HL_KIND_TEMPERATURE, -3, 4);
  return in;
}

/* a project holding the shell and its material, as the window saves it */
static void
check_saves (const HlShellInputs *in)
{
  g_autoptr(HlProject) project = hl_project_new ();

  hl_project_put_material (project, &in->material);
  hl_project_add_shell (project, in);
  fuzz_check_round_trip (project);
}

int
LLVMFuzzerTestOneInput (const uint8_t *data,
                        size_t         size)
{
  Bytes b = { data, size };
  HlShellInputs in = take_shell (&b);
  guint8 points_pick = take_byte (&b);
  guint n_points = points_pick % 2 == 0 ? HL_DEFAULT_POINTS : 2 + points_pick / 2;
  gboolean corroded = take_byte (&b) % 4 != 0;
  g_autoptr(GPtrArray) problems = hl_shell_inputs_check (&in);
  g_autoptr(HlSolution) s = NULL;
  g_autoptr(GError) error = NULL;

  s = hl_solve (&in, n_points, corroded, &error);
  if (problems->len > 0)
    {
      if (s != NULL || error == NULL)
        fuzz_fail ("hl_solve accepted a shell the checks refuse");
      return 0;
    }
  if (s == NULL)
    fuzz_fail ("a shell that passes the checks does not solve: %s", error->message);
  if (s->n_points != n_points)
    fuzz_fail ("asked for %u points, got %u", n_points, s->n_points);

  fuzz_check_solution (s);
  fuzz_check_outputs (s);
  {
    g_autoptr(HlProject) project = hl_project_new ();
    g_autoptr(HlSolution) new_wall = hl_solve (&in, n_points, FALSE, NULL);
    g_autofree char *report = NULL;

    if (new_wall == NULL)
      fuzz_fail ("the shell solves corroded but not new");
    fuzz_check_solution (new_wall);
    report = hl_report_text (project, new_wall, s, HL_UNIT_SYSTEM_SI);
    /* nothing in this report is user text: every word is checked */
    fuzz_check_no_nonfinite ("report", report, NULL);
  }
  check_saves (&in);
  return 0;
}
