/* fuzz-common.h — checks shared by the fuzz targets
 *
 * The rules checked here are DESIGN.md §7 and issue 5: no crash, no
 * NaN or infinity on screen or in a file, a saved project reopens as
 * it was.  A broken rule calls abort() so libFuzzer (or the regression
 * runner) stops on the input that broke it.
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include <stddef.h>
#include <stdint.h>

#include "hl-project-file.h"
#include "hl-report.h"

G_BEGIN_DECLS

int  LLVMFuzzerInitialize   (int      *argc,
                             char   ***argv);
int  LLVMFuzzerTestOneInput (const uint8_t *data,
                             size_t         size);

/* prints "fuzz: broken rule: ..." and aborts */
void fuzz_fail              (const char *format,
                             ...) G_GNUC_PRINTF (1, 2) G_GNUC_NORETURN;

/* Every HlResult of @s is finite or carries a reason; every other number
 * of the solution and every point through the wall is finite. */
void fuzz_check_solution    (const HlSolution *s);

/* No word of @text reads "nan" or "inf" (what printf makes of them).
 * Lines whose key is in @skip_keys (user text such as names) are not
 * looked at; a line's key is what stands before " = ". */
void fuzz_check_no_nonfinite (const char        *what,
                              const char        *text,
                              const char *const *skip_keys);

/* The outputs of one solved shell (summary in both unit systems, CSV)
 * checked for printed NaN/inf. */
void fuzz_check_outputs     (const HlSolution *s);

/* The project's XML reloads without error and equals @project. */
void fuzz_check_round_trip  (const HlProject *project);

G_END_DECLS
