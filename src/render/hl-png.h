/* hl-png.h — an image surface as a PNG file, written for speed
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <cairo.h>
#include <glib.h>

G_BEGIN_DECLS

/* Writes @surface (CAIRO_FORMAT_ARGB32 or RGB24) to @path as an 8-bit
 * PNG: RGB when every pixel is opaque (a figure on its paper), RGBA
 * otherwise.  FALSE with the reason (no file name) in @error when it
 * cannot. */
gboolean hl_png_write (cairo_surface_t *surface,
                       const char      *path,
                       GError         **error);

G_END_DECLS
