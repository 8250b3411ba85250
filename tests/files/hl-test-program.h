/* hl-test-program.h — run the real hoopline program from a test
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* Seconds a child may run before it is killed and the test fails: far
 * above what any command here needs, low enough that a hang is caught. */
#define HL_TEST_TIMEOUT_S 10

typedef struct
{
  int      status;     /* exit code; -1 when killed or crashed */
  gboolean timed_out;
  char    *out;        /* stdout, NUL-terminated */
  char    *err;        /* stderr */
  double   seconds;
} HlRun;

/* Runs $HL_PROGRAM with @args (NULL-terminated, without the program
 * itself) in @cwd (or the current folder), DISPLAY and WAYLAND_DISPLAY
 * unset, LC_ALL=@locale (C.UTF-8 when NULL). */
HlRun *hl_test_run_in     (const char        *cwd,
                           const char        *locale,
                           const char *const *args);
HlRun *hl_test_run        (const char        *first_arg,
                           ...) G_GNUC_NULL_TERMINATED;
HlRun *hl_test_run_valist (const char        *first_arg,
                           va_list            rest);
void   hl_run_free        (HlRun             *run);

/* The lines of @text without the empty one a final newline leaves. */
GStrv  hl_test_lines      (const char        *text);

/* Whole file, or NULL when it does not exist. */
GBytes *hl_test_read_file (const char        *path);

/* A new empty folder in the temporary folder, and its removal with all
 * it holds. */
char   *hl_test_temp_dir    (void);
void    hl_test_remove_tree (const char      *path);

G_DEFINE_AUTOPTR_CLEANUP_FUNC (HlRun, hl_run_free)

G_END_DECLS
