/* hl-text.c — Pango text for the figure: measure, place, remember
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hl-text"

#include "hl-text.h"

#include <math.h>
#include <string.h>

static const struct
{
  double      scale;
  PangoWeight weight;
} roles[HL_N_FONTS] = {
  [HL_FONT_BODY] = { 1.0, PANGO_WEIGHT_NORMAL },
  [HL_FONT_SMALL] = { 0.88, PANGO_WEIGHT_NORMAL },
  [HL_FONT_TINY] = { 0.78, PANGO_WEIGHT_NORMAL },
  [HL_FONT_HEADING] = { 1.0, PANGO_WEIGHT_BOLD },
  [HL_FONT_TITLE] = { 1.2, PANGO_WEIGHT_BOLD },
  [HL_FONT_VALUE] = { 1.0, PANGO_WEIGHT_SEMIBOLD },
};

/* bounded: a window resized through many sizes would otherwise keep
 * every size of every string */
#define CACHE_MAX 4096

typedef struct
{
  PangoContext *context;
  GHashTable   *layouts;
} Cache;

static void
cache_free (gpointer data)
{
  Cache *c = data;

  g_hash_table_unref (c->layouts);
  g_object_unref (c->context);
  g_free (c);
}

static GPrivate cache_key = G_PRIVATE_INIT (cache_free);

static Cache *
cache_get (void)
{
  Cache *c = g_private_get (&cache_key);

  if (c == NULL)
    {
      cairo_font_options_t *options = cairo_font_options_create ();

      c = g_new0 (Cache, 1);
      c->context = pango_font_map_create_context (pango_cairo_font_map_get_default ());
      /* unhinted metrics: the same widths on every surface and scale, so
       * a layout that fits on screen fits in the PDF too */
      cairo_font_options_set_hint_metrics (options, CAIRO_HINT_METRICS_OFF);
      cairo_font_options_set_hint_style (options, CAIRO_HINT_STYLE_NONE);
      pango_cairo_context_set_font_options (c->context, options);
      cairo_font_options_destroy (options);
      c->layouts = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, g_object_unref);
      g_private_set (&cache_key, c);
    }
  return c;
}

void
hl_text_cache_clear (void)
{
  g_hash_table_remove_all (cache_get ()->layouts);
}

HlText *
hl_text_new (cairo_t *cr,
             double   base_size)
{
  HlText *t = g_new0 (HlText, 1);

  t->cr = cr;
  for (int i = 0; i < HL_N_FONTS; i++)
    {
      t->fonts[i] = pango_font_description_from_string ("Sans");
      pango_font_description_set_weight (t->fonts[i], roles[i].weight);
    }
  hl_text_set_base (t, base_size);
  return t;
}

void
hl_text_free (HlText *t)
{
  if (t == NULL)
    return;
  for (int i = 0; i < HL_N_FONTS; i++)
    pango_font_description_free (t->fonts[i]);
  if (t->boxes != NULL)
    g_array_unref (t->boxes);
  if (t->wrapped != NULL)
    g_ptr_array_unref (t->wrapped);
  g_free (t);
}

void
hl_text_set_base (HlText *t,
                  double  base_size)
{
  t->base = base_size;
  for (int i = 0; i < HL_N_FONTS; i++)
    pango_font_description_set_absolute_size (t->fonts[i], base_size * roles[i].scale * PANGO_SCALE);
}

double
hl_text_size (HlText     *t,
              HlFontRole  role)
{
  return t->base * roles[role].scale;
}

static gboolean
overflows (PangoLayout *l,
           double       wrap)
{
  for (GSList *it = pango_layout_get_lines_readonly (l); it != NULL; it = it->next)
    {
      PangoRectangle logical;

      pango_layout_line_get_extents (it->data, NULL, &logical);
      if ((double) logical.width / PANGO_SCALE > wrap + 0.01)
        return TRUE;
    }
  return FALSE;
}

/* A word wider than the line sticks out of it with PANGO_WRAP_WORD: the
 * string is set a step smaller until its longest word fits (a long
 * German compound in a narrow key); past the last step one line cut
 * with an ellipsis, never a word broken inside. */
static void
fit_words (PangoLayout                *l,
           const PangoFontDescription *font,
           double                      wrap)
{
  g_autoptr(PangoFontDescription) smaller = NULL;
  double size = (double) pango_font_description_get_size (font);

  if (!overflows (l, wrap))
    return;
  smaller = pango_font_description_copy (font);
  for (int step = 1; step <= 5; step++)
    {
      pango_font_description_set_absolute_size (smaller, size * pow (0.9, step));
      pango_layout_set_font_description (l, smaller);
      if (!overflows (l, wrap))
        return;
    }
  pango_layout_set_font_description (l, font);
  pango_layout_set_ellipsize (l, PANGO_ELLIPSIZE_END);
}

/* Unicode lets a line break after a slash: "R/" and "t" would stand on
 * two lines.  A word joiner (U+2060, no width) after each slash keeps
 * "R/t" and "e/De" whole. */
static char *
join_slashes (const char *str)
{
  GString *s = g_string_new (NULL);

  for (const char *p = str; *p != '\0'; p++)
    {
      g_string_append_c (s, *p);
      if (*p == '/' && p[1] != '\0' && p[1] != ' ')
        g_string_append (s, "\u2060");
    }
  return g_string_free (s, FALSE);
}

/* the laid-out string: from the cache, or made and kept */
static PangoLayout *
prepare (HlText     *t,
         HlFontRole  role,
         const char *str,
         double      wrap,
         double      ax,
         double      ellipsize_width)
{
  /* alignment only matters to wrapped lines: one key for the rest */
  PangoAlignment align = wrap <= 0 ? PANGO_ALIGN_LEFT : ax > 0.75 ? PANGO_ALIGN_RIGHT
                         : ax > 0.25 ? PANGO_ALIGN_CENTER : PANGO_ALIGN_LEFT;
  Cache *c = cache_get ();
  g_autofree char *key = g_strdup_printf ("%d %d %d %d %d %s", role, (int) lround (t->base * 256),
                                          (int) lround (wrap * 64), align, (int) lround (ellipsize_width * 64), str);
  PangoLayout *l = g_hash_table_lookup (c->layouts, key);

  if (l != NULL)
    return l;
  if (g_hash_table_size (c->layouts) >= CACHE_MAX)
    g_hash_table_remove_all (c->layouts);
  l = pango_layout_new (c->context);
  pango_layout_set_font_description (l, t->fonts[role]);
  if (ellipsize_width > 0)
    {
      pango_layout_set_width (l, (int) (ellipsize_width * PANGO_SCALE));
      pango_layout_set_ellipsize (l, PANGO_ELLIPSIZE_END);
    }
  else if (wrap > 0)
    {
      pango_layout_set_width (l, (int) (wrap * PANGO_SCALE));
      /* words only: a break between letters needs a hyphen at a point
       * the language allows, which Pango cannot know (it would write
       * "Korrosionszuschl-ag") */
      pango_layout_set_wrap (l, PANGO_WRAP_WORD);
    }
  pango_layout_set_alignment (l, align);
  if (wrap > 0 && strchr (str, '/') != NULL)
    {
      g_autofree char *joined = join_slashes (str);

      pango_layout_set_text (l, joined, -1);
    }
  else
    pango_layout_set_text (l, str, -1);
  if (ellipsize_width <= 0 && wrap > 0)
    fit_words (l, t->fonts[role], wrap);
  g_hash_table_insert (c->layouts, g_steal_pointer (&key), l);
  return l;
}

void
hl_text_measure (HlText     *t,
                 HlFontRole  role,
                 const char *str,
                 double      wrap,
                 double     *width,
                 double     *height)
{
  PangoRectangle logical;

  pango_layout_get_extents (prepare (t, role, str, wrap, 0, 0), NULL, &logical);
  if (width != NULL)
    *width = (double) logical.width / PANGO_SCALE;
  if (height != NULL)
    *height = (double) logical.height / PANGO_SCALE;
}

double
hl_text_longest_word (HlText     *t,
                      HlFontRole  role,
                      const char *str)
{
  g_auto(GStrv) words = g_strsplit_set (str, " \n", -1);
  double widest = 0, w;

  for (guint i = 0; words[i] != NULL; i++)
    if (words[i][0] != '\0')
      {
        hl_text_measure (t, role, words[i], 0, &w, NULL);
        widest = MAX (widest, w);
      }
  return widest;
}

static HlRect
show (HlText      *t,
      PangoLayout *layout,
      double       x,
      double       y,
      double       ax,
      double       ay,
      HlRgb        colour)
{
  PangoRectangle logical;
  HlRect box;

  pango_layout_get_extents (layout, NULL, &logical);
  box.width = (double) logical.width / PANGO_SCALE;
  box.height = (double) logical.height / PANGO_SCALE;
  box.x = x - ax * box.width;
  box.y = y - ay * box.height;
  cairo_save (t->cr);
  hl_palette_set_source (t->cr, colour);
  /* wrapped layouts are as wide as the wrap width; logical.x shifts the
   * ink to the aligned side */
  cairo_move_to (t->cr, box.x - (double) logical.x / PANGO_SCALE, box.y - (double) logical.y / PANGO_SCALE);
  pango_cairo_show_layout (t->cr, layout);
  cairo_restore (t->cr);
  if (t->boxes != NULL)
    g_array_append_val (t->boxes, box);
  return box;
}

HlRect
hl_text_draw (HlText     *t,
              HlFontRole  role,
              const char *str,
              double      x,
              double      y,
              double      ax,
              double      ay,
              double      wrap,
              HlRgb       colour)
{
  PangoLayout *layout = prepare (t, role, str, wrap, ax, 0);

  if (wrap > 0 && t->wrapped != NULL)
    g_ptr_array_add (t->wrapped, g_object_ref (layout));
  return show (t, layout, x, y, ax, ay, colour);
}

HlRect
hl_text_draw_line (HlText     *t,
                   HlFontRole  role,
                   const char *str,
                   double      x,
                   double      y,
                   double      width,
                   HlRgb       colour)
{
  return show (t, prepare (t, role, str, 0, 0, MAX (width, 1)), x, y, 0, 0, colour);
}

HlRect
hl_text_draw_up (HlText     *t,
                 HlFontRole  role,
                 const char *str,
                 double      x,
                 double      y,
                 HlRgb       colour)
{
  PangoLayout *layout = prepare (t, role, str, 0, 0, 0);
  PangoRectangle logical;
  HlRect box;
  double w, h;

  pango_layout_get_extents (layout, NULL, &logical);
  w = (double) logical.width / PANGO_SCALE;
  h = (double) logical.height / PANGO_SCALE;
  cairo_save (t->cr);
  hl_palette_set_source (t->cr, colour);
  cairo_translate (t->cr, x, y);
  cairo_rotate (t->cr, -G_PI / 2);
  cairo_move_to (t->cr, -w / 2, -h / 2);
  /* unhinted metrics do not change with the rotation: the layout made
   * for the upright context draws turned as it is */
  pango_cairo_show_layout (t->cr, layout);
  cairo_restore (t->cr);
  box.x = x - h / 2;
  box.y = y - w / 2;
  box.width = h;
  box.height = w;
  if (t->boxes != NULL)
    g_array_append_val (t->boxes, box);
  return box;
}

gboolean
hl_rect_overlaps (const HlRect *a,
                  const HlRect *b)
{
  /* touching boxes (stacked lines) do not count */
  const double eps = 0.25;

  return a->x + eps < b->x + b->width && b->x + eps < a->x + a->width
         && a->y + eps < b->y + b->height && b->y + eps < a->y + a->height;
}
