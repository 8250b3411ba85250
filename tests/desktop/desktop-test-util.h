/* desktop-test-util.h — running the validators and reading the test's
 * environment, shared by the desktop-integration tests
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

const char *dt_env         (const char *name);
char       *dt_source_path (const char *first_element,
                            ...) G_GNUC_NULL_TERMINATED;
int         dt_run         (const char *const *argv,
                            const char        *working_dir,
                            char             **output);
void        dt_assert_runs (const char *const *argv,
                            const char        *working_dir);
char       *dt_make_tmp    (void);
void        dt_remove_tree (const char *path);

G_END_DECLS
