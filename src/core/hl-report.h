/* hl-report.h — text outputs: summary lines, CSV table, calculation report
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-project.h"
#include "hl-solution.h"

G_BEGIN_DECLS

/* The caution every output carries. */
#define HL_CAUTION \
  "Preliminary checking only. Pressure equipment can kill: design and " \
  "approval follow the applicable code, local rules and a qualified, " \
  "licensed engineer."

/* "key = value unit" block for one solution, warnings last. */
char *hl_report_summary_block (const HlSolution *solution,
                               HlUnitSystem      system);

/* Through-thickness table, inner to outer surface inclusive. */
char *hl_report_csv           (const HlSolution *solution,
                               HlUnitSystem      system);

/* Calculation report a reviewer can follow.  @new_wall and @corroded are
 * the same shell solved without and with the corrosion allowance. */
char *hl_report_text          (const HlProject  *project,
                               const HlSolution *new_wall,
                               const HlSolution *corroded,
                               HlUnitSystem      system);

G_END_DECLS
