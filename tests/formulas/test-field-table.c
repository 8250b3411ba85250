/* test-field-table.c — the table of fields agrees with the schema, the
 * file and the checks
 *
 * Sources: the project file's RELAX NG schema (data/hoopline-project.rng,
 * ISO/IEC 19757-2) is the outside statement of which elements a shell
 * and a material hold, which are required and which words a choice
 * takes.  The bounds are those DESIGN.md §7 gives their reasons for
 * (hl-field-table.c names each source); here each is checked at the
 * bound and just beyond it, so the table is what the checks do.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-field-table"

#include "hl-field-table.h"
#include "hl-project-file.h"
#include "hl-shell-check.h"

#include <libxml/parser.h>
#include <libxml/tree.h>
#include <math.h>
#include <string.h>

static xmlDocPtr
load_schema (void)
{
  const char *src = g_getenv ("HL_SOURCE_DIR");
  g_autofree char *path = g_build_filename (src != NULL ? src : ".", "data", "hoopline-project.rng", NULL);
  xmlDocPtr doc = xmlReadFile (path, NULL, XML_PARSE_NONET);

  g_assert_nonnull (doc);
  return doc;
}

static gboolean
is_element (xmlNodePtr n,
            const char *name)
{
  return n->type == XML_ELEMENT_NODE && xmlStrEqual (n->name, BAD_CAST name);
}

static char *
prop (xmlNodePtr  n,
      const char *name)
{
  xmlChar *raw = xmlGetProp (n, BAD_CAST name);
  char *s = g_strdup ((const char *) raw);

  xmlFree (raw);
  return s;
}

static xmlNodePtr
find_element (xmlNodePtr  n,
              const char *name)
{
  for (; n != NULL; n = n->next)
    {
      g_autofree char *value = n->type == XML_ELEMENT_NODE ? prop (n, "name") : NULL;
      xmlNodePtr found;

      if (is_element (n, "element") && g_strcmp0 (value, name) == 0)
        return n;
      if ((found = find_element (n->children, name)) != NULL)
        return found;
    }
  return NULL;
}

/* the <element> children of a shell or material definition, with
 * whether each is optional and (for choices) its words */
static void
collect (xmlNodePtr  n,
         gboolean    optional,
         GHashTable *optional_of,
         GHashTable *words_of)
{
  for (; n != NULL; n = n->next)
    {
      if (n->type != XML_ELEMENT_NODE)
        continue;
      if (is_element (n, "element"))
        {
          g_autofree char *name = prop (n, "name");
          GString *words = g_string_new (NULL);

          for (xmlNodePtr c = n->children; c != NULL; c = c->next)
            if (is_element (c, "choice"))
              for (xmlNodePtr v = c->children; v != NULL; v = v->next)
                if (is_element (v, "value"))
                  {
                    xmlChar *text = xmlNodeGetContent (v);

                    g_string_append_printf (words, "%s ", (const char *) text);
                    xmlFree (text);
                  }
          g_hash_table_insert (optional_of, g_strdup (name), GINT_TO_POINTER (optional));
          g_hash_table_insert (words_of, g_strdup (name), g_string_free (words, FALSE));
          continue;
        }
      /* the four sizes are a choice: each is optional on its own */
      collect (n->children, optional || is_element (n, "optional") || is_element (n, "choice"), optional_of,
               words_of);
    }
}

static void
check_owner (xmlDocPtr    doc,
             const char  *element,
             HlFieldOwner owner)
{
  xmlNodePtr def = find_element (xmlDocGetRootElement (doc)->children, element);
  g_autoptr(GHashTable) optional_of = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL);
  g_autoptr(GHashTable) words_of = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, g_free);
  const char *const *names = hl_field_elements (owner);
  GHashTableIter iter;
  gpointer key;

  g_assert_nonnull (def);
  collect (def->children, FALSE, optional_of, words_of);
  /* <origin> marks a built-in copy: the reader's, not an input */
  g_hash_table_remove (optional_of, "origin");

  for (guint i = 0; names[i] != NULL; i++)
    {
      const HlField *f = hl_field_find (owner, names[i]);
      GString *table_words = g_string_new (NULL);
      g_autofree char *joined = NULL;

      g_test_message ("%s: %s", element, names[i]);
      g_assert_true (g_hash_table_contains (optional_of, names[i]));
      g_assert_cmpint (!GPOINTER_TO_INT (g_hash_table_lookup (optional_of, names[i])), ==, f->required);
      for (const HlFieldChoice *c = f->choices; c != NULL && c->word != NULL; c++)
        g_string_append_printf (table_words, "%s ", c->word);
      joined = g_string_free (table_words, FALSE);
      g_assert_cmpstr (joined, ==, g_hash_table_lookup (words_of, names[i]));
    }
  g_hash_table_iter_init (&iter, optional_of);
  while (g_hash_table_iter_next (&iter, &key, NULL))
    {
      g_test_message ("schema: %s/%s", element, (const char *) key);
      g_assert_true (g_strv_contains (names, key));
    }
}

static void
test_schema (void)
{
  xmlDocPtr doc = load_schema ();

  check_owner (doc, "shell", HL_FIELD_OF_SHELL);
  check_owner (doc, "material", HL_FIELD_OF_MATERIAL);
  xmlFreeDoc (doc);
}

/* a value other than the default, inside the bounds */
static void
change (const HlField *f,
        HlShellInputs *in)
{
  gpointer slot = hl_field_slot (f, in);

  switch (f->kind)
    {
    case HL_FIELD_TEXT:
      g_strlcpy (slot, f->owner == HL_FIELD_OF_MATERIAL ? "Changed material" : "Changed name", f->text_size);
      break;
    case HL_FIELD_RATIO:
      *(double *) slot = f->min_exclusive ? f->max_si - 0.05 : f->max_si - 0.1;
      break;
    case HL_FIELD_CHOICE:
      /* the last choice, or the first when the last is the default
       * ("both" of the verdict measure) */
      hl_field_choice_set (f, slot, f->choices[hl_field_choice_count (f) - 1].value != (int) f->default_value
                                      ? f->choices[hl_field_choice_count (f) - 1].value
                                      : f->choices[0].value);
      break;
    default:
      *(HlQuantity *) slot = hl_quantity_make (f->kind == HL_FIELD_PERCENT ? 2.5 : 3.25,
                                               f->kind == HL_FIELD_PERCENT ? "%"
                                               : f->kind == HL_FIELD_LENGTH ? "mm"
                                               : f->kind == HL_FIELD_PRESSURE ? "bar"
                                               : f->kind == HL_FIELD_MODULUS ? "GPa"
                                               : f->kind == HL_FIELD_TEMPERATURE ? "\xc2\xb0""C" : "ksi");
      break;
    }
}

/* each row changed alone reads back through the writer and the reader */
static void
test_round_trip (void)
{
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);
      g_autoptr(HlProject) project = hl_project_new ();
      g_autoptr(HlProject) back = NULL;
      g_autoptr(GError) error = NULL;
      g_autofree char *xml = NULL;
      HlShellInputs in = hl_shell_inputs_default ();
      const HlShellInputs *got;

      if (strcmp (f->element, "material-ref") == 0)
        continue;  /* names the material; changed with it below */
      g_test_message ("%s", f->element);
      if (f->is_size)
        in.size_kind = f->size_kind;
      if (f->owner == HL_FIELD_OF_MATERIAL)
        {
          /* a project material, so the file holds its values */
          g_strlcpy (in.material.id, "own", sizeof in.material.id);
          g_strlcpy (in.material_ref, "own", sizeof in.material_ref);
        }
      change (f, &in);
      if (f->is_size)
        in.size = hl_quantity_make (800, "mm");
      if (f->owner == HL_FIELD_OF_MATERIAL)
        hl_project_put_material (project, &in.material);
      hl_project_add_shell (project, &in);
      xml = hl_project_to_checked_xml (project, NULL, &error);
      g_assert_no_error (error);
      if (!f->is_size && f->kind != HL_FIELD_TEXT)
        g_assert_nonnull (strstr (xml, f->element));
      back = hl_project_load_bytes (xml, strlen (xml), "round-trip", NULL, &error);
      g_assert_no_error (error);
      got = hl_project_shell (back, 0);
      g_assert_true (hl_field_equal (f, hl_field_cslot (f, got), hl_field_cslot (f, &in)));
      g_assert_true (hl_shell_inputs_equal (got, &in));
    }
}

static char *
check_at (const HlField *f,
          double         si)
{
  HlShellInputs in = hl_shell_inputs_default ();
  gpointer slot = hl_field_slot (f, &in);

  if (f->kind == HL_FIELD_RATIO)
    *(double *) slot = si;
  else
    {
      HlQuantityKind kind = hl_field_quantity_kind (f);

      const char *unit = hl_unit_default (kind, HL_UNIT_SYSTEM_SI);

      /* a temperature in °C: T/K = t/°C + 273.15 (NIST SP 811 B.9) */
      *(HlQuantity *) slot = hl_quantity_make ((si - hl_unit_offset (kind, unit)) / hl_unit_factor (kind, unit), unit);
    }
  return hl_field_check (f, slot);
}

/* at the bound the value passes (or fails, when the bound is exclusive);
 * one part in a million beyond it fails */
static void
test_bounds (void)
{
  guint checked = 0;

  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);
      double low, high;

      /* every number has bounds with a reason (DESIGN.md §7) */
      g_assert_true (f->bounded == hl_field_is_number (f));
      if (!f->bounded)
        continue;
      g_test_message ("%s", f->element);
      low = f->min_si - fabs (f->min_si) * 1e-6;
      high = f->max_si + fabs (f->max_si) * 1e-6;
      {
        g_autofree char *at_min = check_at (f, f->min_si);
        g_autofree char *at_max = check_at (f, f->max_si);
        g_autofree char *below = check_at (f, low);
        g_autofree char *above = check_at (f, high);
        g_autofree char *zero = check_at (f, 0.0);

        g_assert_true ((at_min == NULL) == !f->min_exclusive);
        g_assert_true ((at_max == NULL) == !f->max_exclusive);
        g_assert_nonnull (below);
        g_assert_nonnull (above);
        /* zero inside a ratio's range is simply a value */
        if (f->kind != HL_FIELD_RATIO)
          g_assert_true ((zero == NULL) == f->zero_allowed);
      }
      checked++;
    }
  /* lengths, pressures, material values, ratios, tolerance */
  g_assert_cmpuint (checked, >=, 14);
}

/* the defaults of a new shell are the table's, and the default material
 * is what the material rows give */
static void
test_defaults (void)
{
  HlShellInputs in = hl_shell_inputs_default ();
  g_autoptr(GPtrArray) problems = hl_shell_inputs_check (&in);

  g_assert_cmpuint (problems->len, ==, 0);
  for (guint i = 0; i < hl_field_count (); i++)
    {
      const HlField *f = hl_field_nth (i);
      gconstpointer slot = hl_field_cslot (f, &in);

      if (f->kind == HL_FIELD_TEXT || (f->is_size && f->size_kind != in.size_kind))
        continue;
      g_test_message ("%s", f->element);
      if (f->kind == HL_FIELD_CHOICE)
        g_assert_cmpint (hl_field_choice_get (f, slot), ==, (int) f->default_value);
      else if (f->kind == HL_FIELD_RATIO)
        g_assert_cmpfloat (*(const double *) slot, ==, f->default_value);
      else
        g_assert_true (hl_quantity_equal (*(const HlQuantity *) slot,
                                          hl_quantity_make (f->default_value, f->default_unit)));
    }
}

/* drop-down positions follow the table, not the enum's order */
static void
test_choice_positions (void)
{
  const HlField *f = hl_field_find (HL_FIELD_OF_SHELL, "thin-radius-basis");

  g_assert_cmpuint (hl_field_choice_count (f), ==, 3);
  for (guint i = 0; i < hl_field_choice_count (f); i++)
    {
      g_assert_cmpuint (hl_field_choice_position (f, f->choices[i].value), ==, i);
      g_assert_true (hl_field_choice_by_word (f, f->choices[i].word) == &f->choices[i]);
    }
  g_assert_cmpuint (hl_field_choice_position (f, 99), ==, G_MAXUINT);
  g_assert_null (hl_field_choice_by_word (f, "median"));
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/field-table/schema", test_schema);
  g_test_add_func ("/field-table/round-trip", test_round_trip);
  g_test_add_func ("/field-table/bounds", test_bounds);
  g_test_add_func ("/field-table/defaults", test_defaults);
  g_test_add_func ("/field-table/choice-positions", test_choice_positions);
  return g_test_run ();
}
