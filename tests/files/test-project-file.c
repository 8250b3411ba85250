/* test-project-file.c — save and load give back exactly the same project
 *
 * The format is the one of the project-file issue and DESIGN.md §4:
 * numbers in the C locale with a decimal point, quantities kept in the
 * unit the user gave, optional elements taking the defaults of DESIGN.md
 * §3, unknown elements of a newer minor version skipped with a warning.
 * Exactness is checked against the C library itself: a number written
 * as text must read back (strtod) to the same double, and XML 1.0 (W3C)
 * must carry every text character except the few it forbids.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-project-file"

#include "hl-project-file.h"
#include "hl-test-program.h"

#include <glib/gstdio.h>
#include <locale.h>
#include <stdio.h>
#include <string.h>

static char *
source_path (const char *first,
             ...)
{
  g_autoptr(GPtrArray) parts = g_ptr_array_new ();
  va_list ap;

  g_ptr_array_add (parts, (gpointer) g_getenv ("HL_SOURCE_DIR"));
  va_start (ap, first);
  for (const char *p = first; p != NULL; p = va_arg (ap, const char *))
    g_ptr_array_add (parts, (gpointer) p);
  va_end (ap);
  g_ptr_array_add (parts, NULL);
  return g_build_filenamev ((char **) parts->pdata);
}

static HlProject *
load_ok (const char *path)
{
  g_autoptr(GError) error = NULL;
  g_autoptr(GPtrArray) warnings = NULL;
  HlProject *project = hl_project_load (path, &warnings, &error);

  g_assert_no_error (error);
  g_assert_nonnull (project);
  g_assert_cmpuint (warnings->len, ==, 0);
  return project;
}

static HlProject *
load_xml (const char *xml)
{
  g_autoptr(GError) error = NULL;
  HlProject *project = hl_project_load_bytes (xml, strlen (xml), "memory", NULL, &error);

  g_assert_no_error (error);
  g_assert_nonnull (project);
  return project;
}

static GBytes *
read_bytes (const char *path)
{
  GBytes *bytes = hl_test_read_file (path);

  g_assert_nonnull (bytes);
  return bytes;
}

/* save, load, compare; save again and compare the bytes */
static void
check_round_trip (const HlProject *project)
{
  g_autofree char *dir = hl_test_temp_dir ();
  g_autofree char *first = g_build_filename (dir, "first.hoop", NULL);
  g_autofree char *second = g_build_filename (dir, "second.hoop", NULL);
  g_autoptr(GError) error = NULL;
  g_autoptr(HlProject) back = NULL;
  g_autoptr(HlProject) from_text = NULL;
  g_autoptr(GBytes) a = NULL, b = NULL;
  g_autofree char *xml = hl_project_to_xml (project);

  hl_project_save (project, first, &error);
  g_assert_no_error (error);
  back = load_ok (first);
  g_assert_true (hl_project_equal (project, back));
  g_assert_true (hl_project_save (back, second, &error));
  a = read_bytes (first);
  b = read_bytes (second);
  g_assert_true (g_bytes_equal (a, b));
  /* the saved file is exactly hl_project_to_xml() */
  g_assert_cmpmem (g_bytes_get_data (a, NULL), g_bytes_get_size (a), xml, strlen (xml));
  from_text = load_xml (xml);
  g_assert_true (hl_project_equal (project, from_text));

  hl_test_remove_tree (dir);
}

static void
test_demo_round_trip (void)
{
  g_autofree char *path = source_path ("data", "examples", "demo.hoop", NULL);
  g_autoptr(HlProject) demo = load_ok (path);
  const HlShellInputs *barrel, *sphere;

  g_assert_cmpuint (hl_project_n_shells (demo), ==, 3);
  g_assert_cmpuint (hl_project_n_materials (demo), ==, 2);
  g_assert_cmpuint (demo->revisions->len, ==, 2);
  /* values keep the unit the file gives (demo.hoop) */
  barrel = hl_project_find_shell (demo, "press-barrel");
  g_assert_nonnull (barrel);
  g_assert_cmpint (barrel->size_kind, ==, HL_SIZE_INNER_DIAMETER);
  g_assert_cmpfloat (barrel->size.value, ==, 80);
  g_assert_cmpstr (barrel->size.unit, ==, "mm");
  g_assert_cmpfloat (barrel->internal_pressure.value, ==, 400);
  g_assert_cmpstr (barrel->internal_pressure.unit, ==, "bar");
  g_assert_cmpstr (barrel->material.id, ==, "barrel-steel");
  g_assert_cmpfloat (barrel->material.poisson_ratio, ==, 0.29);
  sphere = hl_project_find_shell (demo, "n2-sphere");
  g_assert_nonnull (sphere);
  g_assert_cmpint (sphere->form, ==, HL_FORM_SPHERE);
  g_assert_cmpint (sphere->size_kind, ==, HL_SIZE_OUTER_DIAMETER);
  g_assert_cmpfloat (sphere->size.value, ==, 3.2);
  g_assert_cmpstr (sphere->size.unit, ==, "m");
  g_assert_cmpstr (hl_project_latest_revision (demo)->date, ==, "2026-11-20");
  check_round_trip (demo);
}

static HlMaterial
awkward_material (const char *id,
                  const char *name,
                  double      e_gpa)
{
  HlMaterial m = hl_material_default ();

  g_strlcpy (m.id, id, sizeof m.id);
  g_strlcpy (m.name, name, sizeof m.name);
  m.elastic_modulus = hl_quantity_make (e_gpa, "GPa");
  m.poisson_ratio = 1.0 / 3.0;
  m.yield_strength = hl_quantity_make (123456.789, "kPa");
  m.allowable_stress = hl_quantity_make (0.1, "GPa");
  return m;
}

/* Values that print badly with a fixed format (0.1, 1e-7, 1/3, 123456.789)
 * and texts with every character XML escapes, UTF-8 beyond Latin-1, and
 * line breaks that XML would normalise if written raw. */
static HlProject *
awkward_project (void)
{
  HlProject *p = hl_project_new ();
  HlMaterial m1 = awkward_material ("mat_1", "Stahl “Kessel” & <Blech> 'P265GH'", 210);
  HlMaterial m2 = awkward_material ("mat.2-b", "鋼 — σ ≤ 140 N/mm² ✓", 0.1 + 0.2);
  const char *const *lengths = hl_unit_names (HL_KIND_LENGTH);
  const char *const *stresses = hl_unit_names (HL_KIND_STRESS);
  guint n_lengths = g_strv_length ((char **) lengths);
  guint n_stresses = g_strv_length ((char **) stresses);
  guint n = 0;

  hl_project_set_title (p, "Druckbehälter Ø 1 200 <Entwurf> & \"Prüfung\" 'A'");
  hl_project_set_engineer (p, "Zoë O'Brien-Łukasiewicz");
  hl_project_set_description (p, "Line one: p < 10 bar & t > 3 mm\nLine two ]]> after CDATA end\r\n"
                                 "Tab\there; carriage\rreturn; \"quotes\" and 'apostrophes'; 漢字; 🙂");
  p->display_units = HL_UNIT_SYSTEM_US;
  hl_project_put_material (p, &m1);
  hl_project_put_material (p, &m2);

  /* one shell per length unit and per stress unit, with every choice */
  for (guint i = 0; i < MAX (MAX (n_lengths, n_stresses), 8); i++)
    {
      HlShellInputs s = hl_shell_inputs_default ();
      const char *lu = lengths[i % n_lengths];
      const char *su = stresses[i % n_stresses];
      double factor = hl_unit_factor (HL_KIND_LENGTH, lu);
      const HlMaterial *m = (i % 3 == 2) ? hl_material_builtin (i % hl_material_builtin_count ()) : (i % 2 ? &m2 : &m1);

      g_snprintf (s.id, sizeof s.id, "shell_%u.%s", ++n, i % 2 ? "b" : "a-1");
      g_snprintf (s.name, sizeof s.name, "Mantel %u «%s/%s» & <x>", n, lu, su);
      s.form = i % 4 == 3 ? HL_FORM_SPHERE : HL_FORM_CYLINDER;
      s.ends = (HlEnds) (i % 3);
      s.size_kind = (HlSizeKind) (i % 4);
      s.size = hl_quantity_make (i == 0 ? 123456.789 / 1000 / factor : 1.0 / 3.0 / factor, lu);
      s.wall_thickness = hl_quantity_make (0.0254 / 3 / factor, lu);
      s.corrosion_allowance = hl_quantity_make (1e-7 / factor, lu);
      s.internal_pressure = hl_quantity_make (0.1 * 1e6 / hl_unit_factor (HL_KIND_STRESS, su), su);
      s.external_pressure = hl_quantity_make (i % 2 ? 1.0 / 3.0 : 0, su);
      g_strlcpy (s.material_ref, m->id, sizeof s.material_ref);
      s.material = *m;
      s.joint_efficiency = i % 2 ? 0.85 : 1.0 / 3.0;
      s.thin_basis = (HlRadiusBasis) (i % 3);
      s.thin_tolerance = hl_quantity_make (i % 2 ? 0.1 : 5, "%");
      s.verdict_measure = (HlVerdictMeasure) (i % 2);
      s.sizing_criterion = (HlCriterion) ((i / 2) % 2);
      hl_project_add_shell (p, &s);
    }
  hl_project_add_revision (p, 1, "2026-01-31", "A. & B. <Prüfer>", "Erstausgabe: \"alles\" < 'gut' & fertig");
  /* an author is a one-line text: quotes yes, line breaks no */
  hl_project_add_revision (p, 7, "2028-02-29", "Quote \" and apostrophe ' author", "Text with\nnew lines\r\nand\ttabs");
  hl_project_add_revision (p, 1000000, "9999-12-31", "", "");
  return p;
}

static void
test_awkward_round_trip (void)
{
  g_autoptr(HlProject) p = awkward_project ();
  g_autofree char *xml = hl_project_to_xml (p);

  g_assert_cmpuint (hl_project_n_shells (p), >=, 8);
  /* shortest exact text, C locale (C99 strtod reads it back exactly) */
  g_assert_nonnull (strstr (xml, ">0.1<"));
  g_assert_nonnull (strstr (xml, ">123456.789<"));
  g_assert_nonnull (strstr (xml, ">0.3333333333333333<"));
  g_assert_nonnull (strstr (xml, ">0.30000000000000004<"));
  g_assert_nonnull (strstr (xml, "&amp; &lt;Blech&gt;"));
  g_assert_null (strstr (xml, "\r"));  /* written as &#13;, so it survives */
  check_round_trip (p);
}

/* Control characters other than tab, newline and carriage return cannot
 * appear in XML 1.0 at all (not even as references, §2.2): they are
 * dropped, and the file still loads. */
static void
test_control_characters (void)
{
  g_autoptr(HlProject) p = awkward_project ();
  g_autoptr(HlProject) back = NULL;
  g_autofree char *xml = NULL;

  hl_project_set_title (p, "Bell\a escape\x1b form\x0c feed");
  g_strlcpy (hl_project_shell (p, 0)->name, "Shell\x01 one", HL_NAME_MAX);
  xml = hl_project_to_xml (p);
  back = load_xml (xml);
  g_assert_cmpstr (back->title, ==, "Bell escape form feed");
  g_assert_cmpstr (hl_project_shell (back, 0)->name, ==, "Shell one");
  g_assert_cmpstr (back->description, ==, p->description);
}

/* DESIGN.md §3: closed ends, mean radius basis, 5 % tolerance, Ej = 1,
 * "both" verdict measure (issue 10), von Mises sizing, no corrosion, no
 * external pressure. */
static void
test_defaults (void)
{
  static const char xml[] =
    "<hoopline-project format=\"1\">\n"
    "  <shell id=\"only\">\n"
    "    <material-ref>typical-carbon-steel</material-ref>\n"
    "    <inner-diameter unit=\"mm\">1000</inner-diameter>\n"
    "    <wall-thickness unit=\"mm\">10</wall-thickness>\n"
    "    <internal-pressure unit=\"bar\">10</internal-pressure>\n"
    "  </shell>\n"
    "</hoopline-project>\n";
  g_autoptr(HlProject) p = load_xml (xml);
  const HlShellInputs *s = hl_project_shell (p, 0);

  g_assert_cmpint (p->display_units, ==, HL_UNIT_SYSTEM_SI);
  g_assert_cmpstr (p->title, ==, "");
  g_assert_cmpint (s->form, ==, HL_FORM_CYLINDER);
  g_assert_cmpint (s->ends, ==, HL_ENDS_CLOSED);
  g_assert_cmpint (s->thin_basis, ==, HL_BASIS_MEAN);
  g_assert_cmpfloat (s->thin_tolerance.value, ==, 5);
  g_assert_cmpstr (s->thin_tolerance.unit, ==, "%");
  g_assert_cmpfloat (s->joint_efficiency, ==, 1);
  /* format 1.2: "both" (hoop and von Mises error each within the
   * tolerance) replaced the hoop-only default, also for older files */
  g_assert_cmpint (s->verdict_measure, ==, HL_MEASURE_BOTH);
  g_assert_cmpint (s->sizing_criterion, ==, HL_CRITERION_VON_MISES);
  g_assert_cmpfloat (hl_quantity_si (s->corrosion_allowance, HL_KIND_LENGTH), ==, 0);
  g_assert_cmpfloat (hl_quantity_si (s->external_pressure, HL_KIND_STRESS), ==, 0);
  g_assert_cmpstr (s->name, ==, "only");  /* a shell without a name shows its id */
  g_assert_true (hl_material_equal (&s->material, hl_material_builtin_find ("typical-carbon-steel")));
}

/* The optional thin-tolerance unit is percent. */
static void
test_tolerance_without_unit (void)
{
  static const char xml[] =
    "<hoopline-project format=\"1\"><shell id=\"s\"><material-ref>typical-copper</material-ref>"
    "<outer-radius unit=\"in\">2</outer-radius><wall-thickness unit=\"in\">0.25</wall-thickness>"
    "<thin-tolerance>2.5</thin-tolerance></shell></hoopline-project>";
  g_autoptr(HlProject) p = load_xml (xml);
  const HlShellInputs *s = hl_project_shell (p, 0);

  g_assert_cmpfloat (s->thin_tolerance.value, ==, 2.5);
  g_assert_cmpstr (s->thin_tolerance.unit, ==, "%");
  g_assert_cmpint (s->size_kind, ==, HL_SIZE_OUTER_RADIUS);
  g_assert_cmpstr (s->size.unit, ==, "in");
  /* DESIGN.md §3: a load the file does not give is zero (gauge) */
  g_assert_cmpfloat (hl_quantity_si (s->internal_pressure, HL_KIND_STRESS), ==, 0);
}

static void
test_newer_minor_version (void)
{
  g_autofree char *newer = source_path ("tests", "data", "good", "format-1.1-unknown.hoop", NULL);
  g_autofree char *minimal = source_path ("tests", "data", "good", "minimal.hoop", NULL);
  g_autofree char *text = NULL;
  g_autoptr(GError) error = NULL;
  g_autoptr(GPtrArray) warnings = NULL;
  g_autoptr(HlProject) p = hl_project_load (newer, &warnings, &error);
  g_autoptr(HlProject) plain = load_ok (minimal);
  g_autofree char *w0 = g_strdup_printf ("%s:17: paint-colour: ", newer);
  g_autofree char *w1 = g_strdup_printf ("%s:19: site-notes: ", newer);
  g_autofree char *as_1 = NULL;
  g_autofree char *as_2 = NULL;
  HlProject *refused;

  /* format 1.1: the unknown elements are skipped, each with a warning */
  g_assert_no_error (error);
  g_assert_nonnull (p);
  g_assert_cmpuint (warnings->len, ==, 2);
  g_assert_true (g_str_has_prefix (g_ptr_array_index (warnings, 0), w0));
  g_assert_true (g_str_has_prefix (g_ptr_array_index (warnings, 1), w1));
  g_assert_true (hl_project_equal (p, plain));

  /* the same file claiming format 1 is refused, and format 2 too */
  g_assert_true (g_file_get_contents (newer, &text, NULL, NULL));
  for (guint v = 1; v <= 2; v++)
    {
      g_autoptr(GString) s = g_string_new (text);
      g_autoptr(GError) e = NULL;

      g_string_replace (s, "format=\"1.1\"", v == 1 ? "format=\"1\"" : "format=\"2\"", 1);
      refused = hl_project_load_bytes (s->str, s->len, "x.hoop", NULL, &e);
      g_assert_null (refused);
      g_assert_error (e, HL_PROJECT_FILE_ERROR, HL_PROJECT_FILE_ERROR_SCHEMA);
      if (v == 1)
        as_1 = g_strdup (e->message);
      else
        as_2 = g_strdup (e->message);
    }
  g_assert_cmpstr (as_1, ==, "x.hoop:19: site-notes: is not an element of <hoopline-project> in format 1");
  g_assert_true (g_str_has_prefix (as_2, "x.hoop:2: hoopline-project: format “2” is not supported"));
}

/* Valid oddities in tests/data/good/ load, with what XML 1.0 says they
 * hold: comments and processing instructions are not content, CDATA is
 * text, a UTF-8 byte-order mark is not part of the document. */
static void
test_good_files (void)
{
  static const char *const same_as_minimal[] = {
    "utf8-bom.hoop", "no-xml-declaration.hoop", "format-1.1-unknown.hoop",
  };
  g_autofree char *minimal_path = source_path ("tests", "data", "good", "minimal.hoop", NULL);
  g_autoptr(HlProject) minimal = load_ok (minimal_path);
  g_autofree char *dir_path = source_path ("tests", "data", "good", NULL);
  g_autoptr(GDir) dir = g_dir_open (dir_path, 0, NULL);
  const char *name;
  guint count = 0;

  while ((name = g_dir_read_name (dir)) != NULL)
    {
      g_autofree char *path = g_build_filename (dir_path, name, NULL);
      g_autoptr(GError) error = NULL;
      g_autoptr(HlProject) p = hl_project_load (path, NULL, &error);
      const HlShellInputs *s;

      g_test_message ("%s", name);
      g_assert_no_error (error);
      g_assert_nonnull (p);
      count++;
      s = hl_project_shell (p, 0);
      for (guint i = 0; i < G_N_ELEMENTS (same_as_minimal); i++)
        if (strcmp (name, same_as_minimal[i]) == 0)
          g_assert_true (hl_project_equal (p, minimal));
      if (strcmp (name, "comments-everywhere.hoop") == 0)
        {
          g_assert_cmpstr (p->title, ==, "Probe title");
          g_assert_cmpfloat (s->wall_thickness.value, ==, 10);
          g_assert_cmpfloat (s->material.poisson_ratio, ==, 0.3);
        }
      else if (strcmp (name, "processing-instructions.hoop") == 0)
        g_assert_cmpstr (s->name, ==, "Probe shell");
      else if (strcmp (name, "cdata-text.hoop") == 0)
        {
          g_assert_cmpstr (p->title, ==, "Probe & <co> \"quoted\"");
          g_assert_cmpfloat (s->wall_thickness.value, ==, 10);
        }
      else if (strcmp (name, "builtin-material.hoop") == 0)
        {
          g_assert_cmpuint (hl_project_n_materials (p), ==, 0);
          g_assert_true (hl_material_equal (&s->material, hl_material_builtin_find ("typical-carbon-steel")));
        }
    }
  g_assert_cmpuint (count, ==, 8);
}

/* Under a decimal-comma locale the file still has decimal points and
 * reads back the same numbers. */
static void
test_decimal_comma_locale (void)
{
  g_autofree char *old = g_strdup (setlocale (LC_ALL, NULL));
  g_autoptr(HlProject) p = awkward_project ();
  g_autoptr(HlProject) back = NULL;
  g_autofree char *xml = NULL;
  g_autofree char *demo_path = source_path ("data", "examples", "demo.hoop", NULL);
  g_autoptr(HlProject) demo = NULL;
  char probe[16];

  if (setlocale (LC_ALL, "de_DE.UTF-8") == NULL)
    {
      g_test_skip ("the de_DE.UTF-8 locale is not installed (locale-gen de_DE.UTF-8)");
      return;
    }
  g_snprintf (probe, sizeof probe, "%.1f", 0.5);
  if (strcmp (probe, "0,5") != 0)
    {
      setlocale (LC_ALL, old);
      g_test_skip ("de_DE.UTF-8 does not use a decimal comma here");
      return;
    }
  xml = hl_project_to_xml (p);
  g_assert_nonnull (strstr (xml, ">0.1<"));
  g_assert_null (strstr (xml, ">0,1<"));
  g_assert_null (strstr (xml, ">123456,789<"));
  back = load_xml (xml);
  g_assert_true (hl_project_equal (p, back));
  check_round_trip (p);
  demo = load_ok (demo_path);
  g_assert_cmpfloat (hl_project_find_shell (demo, "air-receiver")->corrosion_allowance.value, ==, 1.5);
  g_assert_cmpfloat (hl_project_find_shell (demo, "air-receiver")->joint_efficiency, ==, 0.85);
  setlocale (LC_ALL, old);
}

/* The sign-off block of a design note (format 1.3): prepared, checked,
 * approved, each a name and an ISO 8601 date (common practice for a
 * calculation sheet); a file without it is still 1.2 and loads. */
static void
test_signoff (void)
{
  g_autoptr(HlProject) p = awkward_project ();
  g_autofree char *before = hl_project_to_xml (p);
  g_autofree char *xml = NULL;
  g_autoptr(HlProject) back = NULL;
  g_autoptr(GError) error = NULL;
  const char *bad[] = {
    "role=\"drawn\"", "role=\"checked\" date=\"2026-13-01\"",
  };

  g_assert_null (strstr (before, "<sign-off"));
  g_assert_null (strstr (before, "format=\"1.3\""));
  hl_project_set_signoff (p, HL_SIGNOFF_PREPARED, "A. Author & Co", "2026-11-30");
  hl_project_set_signoff (p, HL_SIGNOFF_CHECKED, "", "2026-12-01");
  xml = hl_project_to_xml (p);
  g_assert_nonnull (strstr (xml, "format=\"1.3\""));
  g_assert_nonnull (strstr (xml, "<sign-off role=\"prepared\" date=\"2026-11-30\">A. Author &amp; Co</sign-off>"));
  g_assert_null (strstr (xml, "role=\"approved\""));   /* empty: not written */
  back = load_xml (xml);
  g_assert_cmpstr (back->signoff[HL_SIGNOFF_PREPARED].name, ==, "A. Author & Co");
  g_assert_cmpstr (back->signoff[HL_SIGNOFF_CHECKED].date, ==, "2026-12-01");
  g_assert_cmpstr (back->signoff[HL_SIGNOFF_APPROVED].name, ==, "");
  check_round_trip (p);

  /* a role the format does not know, a bad date, a role twice: refused
   * with the element named */
  for (guint i = 0; i <= G_N_ELEMENTS (bad); i++)
    {
      g_autoptr(GString) t = g_string_new (xml);
      HlProject *refused;

      if (i < G_N_ELEMENTS (bad))
        g_string_replace (t, "role=\"prepared\" date=\"2026-11-30\"", bad[i], 1);
      else
        g_string_replace (t, "role=\"checked\"", "role=\"prepared\"", 1);
      refused = hl_project_load_bytes (t->str, t->len, "memory", NULL, &error);
      g_assert_null (refused);
      g_assert_nonnull (error);
      g_assert_nonnull (strstr (error->message, "sign-off"));
      g_clear_error (&error);
    }

  /* the writer refuses what the reader would (a bad date set by code) */
  hl_project_set_signoff (p, HL_SIGNOFF_APPROVED, "B. Boss", "2026-02-30");
  g_assert_false (hl_project_check_writable (p, &error));
  g_assert_nonnull (strstr (error->message, "approved"));
}

int
main (int    argc,
      char **argv)
{
  setlocale (LC_ALL, "C.UTF-8");
  g_test_init (&argc, &argv, NULL);

  g_test_add_func ("/files/project/demo-round-trip", test_demo_round_trip);
  g_test_add_func ("/files/project/awkward-round-trip", test_awkward_round_trip);
  g_test_add_func ("/files/project/control-characters", test_control_characters);
  g_test_add_func ("/files/project/defaults", test_defaults);
  g_test_add_func ("/files/project/tolerance-without-unit", test_tolerance_without_unit);
  g_test_add_func ("/files/project/newer-minor-version", test_newer_minor_version);
  g_test_add_func ("/files/project/sign-off", test_signoff);
  g_test_add_func ("/files/project/good-files", test_good_files);
  g_test_add_func ("/files/project/decimal-comma-locale", test_decimal_comma_locale);
  return g_test_run ();
}
