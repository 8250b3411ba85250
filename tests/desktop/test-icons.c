/* test-icons.c — the application icons load, fill a sensible part of
 * their canvas and keep to the freedesktop / GNOME icon rules
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "hoopline-test"

#include "desktop-test-util.h"

#include <gdk-pixbuf/gdk-pixbuf.h>

typedef struct
{
  double coverage;   /* share of pixels that are not fully transparent */
  guint  colours;    /* distinct opaque colours (counted up to 64) */
} IconStats;

static GdkPixbuf *
load_icon (const char *relative,
           int         size)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *path = dt_source_path ("icons", "hicolor", relative, NULL);
  GdkPixbuf *pixbuf = gdk_pixbuf_new_from_file_at_size (path, size, size, &error);

  g_assert_no_error (error);
  g_assert_cmpint (gdk_pixbuf_get_width (pixbuf), ==, size);
  g_assert_cmpint (gdk_pixbuf_get_height (pixbuf), ==, size);
  g_assert_true (gdk_pixbuf_get_has_alpha (pixbuf));
  return pixbuf;
}

static IconStats
measure (GdkPixbuf *pixbuf)
{
  IconStats stats = { 0 };
  int w = gdk_pixbuf_get_width (pixbuf), h = gdk_pixbuf_get_height (pixbuf);
  int stride = gdk_pixbuf_get_rowstride (pixbuf);
  const guchar *pixels = gdk_pixbuf_read_pixels (pixbuf);
  g_autoptr (GHashTable) seen = g_hash_table_new (NULL, NULL);
  int covered = 0;

  for (int y = 0; y < h; y++)
    for (int x = 0; x < w; x++)
      {
        const guchar *p = pixels + y * stride + x * 4;

        if (p[3] == 0)
          continue;
        covered++;
        /* edge pixels blend with the background; only fully opaque ones
         * tell the drawing's own colours */
        if (p[3] == 255 && g_hash_table_size (seen) < 64)
          g_hash_table_add (seen, GUINT_TO_POINTER ((p[0] << 16) | (p[1] << 8) | p[2]));
      }
  stats.coverage = (double) covered / (w * h);
  stats.colours = g_hash_table_size (seen);
  return stats;
}

/* Loads the icon at each size and checks that it fills a good part of the
 * canvas without being a full square (bounds: common practice), in the
 * expected number of colours. */
static void
check_icon (const char *relative,
            int         canvas,
            const int  *sizes,
            gsize       n_sizes,
            guint       min_colours,
            guint       max_colours)
{
  g_autofree char *path = dt_source_path ("icons", "hicolor", relative, NULL);
  int width = 0, height = 0;

  g_assert_nonnull (gdk_pixbuf_get_file_info (path, &width, &height));
  g_assert_cmpint (width, ==, canvas);
  g_assert_cmpint (height, ==, canvas);

  for (gsize i = 0; i < n_sizes; i++)
    {
      g_autoptr (GdkPixbuf) pixbuf = load_icon (relative, sizes[i]);
      IconStats stats = measure (pixbuf);

      g_test_message ("%s at %d px: coverage %.2f, %u colours", relative, sizes[i], stats.coverage, stats.colours);
      g_assert_cmpfloat (stats.coverage, >, 0.20);
      g_assert_cmpfloat (stats.coverage, <, 0.90);
      g_assert_cmpuint (stats.colours, >=, min_colours);
      g_assert_cmpuint (stats.colours, <=, max_colours);
    }
}

/* GNOME app icons are drawn on a 128 px canvas (GNOME HIG, app icons —
 * common practice) and scale to any size; a full-colour icon has several
 * colours, a single one would belong to the symbolic icon. */
static void
test_app_icon (void)
{
  const int sizes[] = { 16, 32, 48, 64, 128, 256 };

  check_icon ("scalable/apps/org.hoopline.Hoopline.svg", 128, sizes, G_N_ELEMENTS (sizes), 3, G_MAXUINT);
}

/* Symbolic icons: 16 x 16 px, one colour that GTK recolours to the theme
 * (GNOME HIG, symbolic icons; GTK's symbolic loader — common practice). */
static void
test_symbolic_icon (void)
{
  const int sizes[] = { 16, 32, 64 };

  check_icon ("symbolic/apps/org.hoopline.Hoopline-symbolic.svg", 16, sizes, G_N_ELEMENTS (sizes), 1, 1);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);

  g_test_add_func ("/desktop/icons/app", test_app_icon);
  g_test_add_func ("/desktop/icons/symbolic", test_symbolic_icon);

  return g_test_run ();
}
