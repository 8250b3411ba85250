/* test-png.c — the PNG writer loses nothing
 *
 * PNG is lossless (ISO/IEC 15948, the PNG specification): a file read
 * back by another decoder — cairo's own PNG reader — must give every
 * pixel as written.  Opaque images are stored as RGB, others as RGBA
 * (PNG colour types 2 and 6, read from the IHDR chunk).
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#define G_LOG_DOMAIN "test-png"

#include "hl-png.h"

#include <glib/gstdio.h>
#include <string.h>

/* a figure-like image: flat paper, lines, a gradient, text-like noise */
static cairo_surface_t *
sample (gboolean transparent)
{
  cairo_surface_t *s = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 301, 127);
  cairo_t *cr = cairo_create (s);
  cairo_pattern_t *grad = cairo_pattern_create_linear (0, 0, 301, 0);

  if (transparent)
    cairo_set_operator (cr, CAIRO_OPERATOR_SOURCE);
  cairo_set_source_rgba (cr, 1, 1, 0.98, transparent ? 0.5 : 1.0);
  cairo_paint (cr);
  cairo_pattern_add_color_stop_rgb (grad, 0, 0.1, 0.0, 0.4);
  cairo_pattern_add_color_stop_rgb (grad, 1, 0.9, 0.9, 0.1);
  cairo_set_source (cr, grad);
  cairo_rectangle (cr, 20, 20, 200, 40);
  cairo_fill (cr);
  cairo_set_source_rgba (cr, 0.2, 0.4, 0.8, transparent ? 0.3 : 1.0);
  cairo_set_line_width (cr, 1.3);
  for (int i = 0; i < 20; i++)
    {
      cairo_move_to (cr, 5 + 14 * i, 120);
      cairo_line_to (cr, 290 - 9 * i, 70);
    }
  cairo_stroke (cr);
  cairo_pattern_destroy (grad);
  cairo_destroy (cr);
  cairo_surface_flush (s);
  return s;
}

static guint8
colour_type (const char *path)
{
  g_autofree char *bytes = NULL;
  gsize len = 0;

  g_assert_true (g_file_get_contents (path, &bytes, &len, NULL));
  /* signature 8 bytes, IHDR length and type 8, width 4, height 4, depth 1 */
  g_assert_cmpuint (len, >, 26);
  g_assert_cmpint (memcmp (bytes + 12, "IHDR", 4), ==, 0);
  return (guint8) bytes[25];
}

static void
check_round_trip (gboolean transparent,
                  guint8   expected_type)
{
  g_autofree char *dir = g_dir_make_tmp ("hl-png-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "sample.png", NULL);
  cairo_surface_t *written = sample (transparent);
  cairo_surface_t *read;
  g_autoptr(GError) error = NULL;
  int w, h, stride_w, stride_r;
  const guchar *a, *b;

  g_assert_true (hl_png_write (written, path, &error));
  g_assert_no_error (error);
  g_assert_cmpuint (colour_type (path), ==, expected_type);
  read = cairo_image_surface_create_from_png (path);
  g_assert_cmpint (cairo_surface_status (read), ==, CAIRO_STATUS_SUCCESS);
  w = cairo_image_surface_get_width (written);
  h = cairo_image_surface_get_height (written);
  g_assert_cmpint (cairo_image_surface_get_width (read), ==, w);
  g_assert_cmpint (cairo_image_surface_get_height (read), ==, h);
  a = cairo_image_surface_get_data (written);
  b = cairo_image_surface_get_data (read);
  stride_w = cairo_image_surface_get_stride (written);
  stride_r = cairo_image_surface_get_stride (read);
  for (int y = 0; y < h; y++)
    {
      const guint32 *ra = (const guint32 *) (a + y * stride_w), *rb = (const guint32 *) (b + y * stride_r);

      for (int x = 0; x < w; x++)
        {
          guint32 pa = ra[x], pb = rb[x];

          if (!transparent)
            {
              /* an RGB file reads back opaque: exactly */
              if (pa != pb)
                g_error ("pixel %d,%d: wrote %08x, read %08x", x, y, pa, pb);
              continue;
            }
          /* premultiplied alpha round-trips through straight alpha with
           * at most one step of rounding per channel */
          for (int c = 0; c < 32; c += 8)
            if (ABS ((int) ((pa >> c) & 0xff) - (int) ((pb >> c) & 0xff)) > 1)
              g_error ("pixel %d,%d: wrote %08x, read %08x", x, y, pa, pb);
        }
    }
  cairo_surface_destroy (read);
  cairo_surface_destroy (written);
  g_unlink (path);
  g_rmdir (dir);
}

static void
test_opaque (void)
{
  check_round_trip (FALSE, 2);   /* truecolour */
}

static void
test_transparent (void)
{
  check_round_trip (TRUE, 6);    /* truecolour with alpha */
}

/* an unwritable place gives a reason, not a file */
static void
test_unwritable (void)
{
  cairo_surface_t *s = sample (FALSE);
  g_autoptr(GError) error = NULL;

  g_assert_false (hl_png_write (s, "/nonexistent-folder/x.png", &error));
  g_assert_error (error, G_FILE_ERROR, G_FILE_ERROR_NOENT);
  cairo_surface_destroy (s);
}

int
main (int    argc,
      char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/png/opaque", test_opaque);
  g_test_add_func ("/png/transparent", test_transparent);
  g_test_add_func ("/png/unwritable", test_unwritable);
  return g_test_run ();
}
