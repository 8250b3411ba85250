/* hl-design-check.h — does the wall pass: every method against the
 * design pressure, the design basis deciding
 *
 * SPDX-License-Identifier: GPL-3.0-or-later
 */
#pragma once

#include "hl-shell.h"

G_BEGIN_DECLS

typedef enum
{
  HL_CHECK_PASS,
  HL_CHECK_FAIL,
  HL_CHECK_NOT_APPLICABLE,
} HlCheckResult;

/* The methods, in the order of the checks table; each is the rule of
 * the design basis of the same position (HlDesignBasis). */
typedef enum
{
  HL_METHOD_UG27,
  HL_METHOD_EN13445,
  HL_METHOD_LAME,
  HL_METHOD_THIN,
  HL_N_METHODS,
} HlCheckMethod;

/* What one method gives for the available wall.  Lengths in m,
 * pressures in Pa; NaN where the method has no value. */
typedef struct
{
  double      required;         /* nominal thickness needed, allowances included */
  const char *required_reason;  /* why there is none, or NULL */
  double      mawp;             /* of the available wall, as the internal pressure */
  const char *mawp_reason;
  const char *clause;           /* the governing clause, or NULL */
} HlMethodInput;

typedef struct
{
  HlDesignBasis basis;
  double        nominal;        /* wall thickness as bought */
  double        corrosion;      /* allowance */
  double        mill;           /* undertolerance, the larger of its two forms */
  double        mill_percent;   /* fraction of the nominal wall, as given */
  double        mill_length;    /* as given */
  double        design_pressure; /* internal, gauge */
  HlMethodInput methods[HL_N_METHODS];
  /* the floors */
  double        peak_equivalent; /* of the sizing criterion, at the design load */
  double        yield;
  double        collapse;        /* NaN when there is no closed form */
} HlDesignCheckInputs;

typedef struct
{
  const char   *key;            /* "ug27": summary keys check_ug27, utilisation_ug27 */
  const char   *name;           /* "ASME VIII-1 UG-27" */
  const char   *clause;         /* the governing clause, or the name */
  double        required;       /* nominal needed, allowances included; NaN: none */
  double        nominal;
  double        available;
  double        mawp;           /* NaN: none */
  double        design_pressure;
  double        utilisation_pressure;   /* design P / MAWP, fraction; NaN: none */
  double        utilisation_thickness;  /* (required - allowances) / available */
  HlCheckResult result;
  char          reason[200];    /* why FAIL or NOT APPLICABLE; empty on PASS */
} HlMethodCheck;

typedef struct
{
  HlDesignBasis basis;
  /* available = nominal - corrosion - mill, with its build-up */
  double        nominal, corrosion, mill, available;
  char          mill_text[80];  /* how the undertolerance was taken */
  HlMethodCheck methods[HL_N_METHODS];
  HlCheckResult verdict;        /* PASS or FAIL, never NOT APPLICABLE */
  char          governing[120]; /* the check that decides */
  double        utilisation;    /* of the basis method, fraction; NaN: none */
  gboolean      yields;         /* floor: peak equivalent above yield */
  gboolean      bursts;         /* floor: above the plastic collapse pressure */
  char          verdict_text[320]; /* the verdict in words */
} HlDesignCheck;

void          hl_design_check_run        (const HlDesignCheckInputs *in,
                                          HlDesignCheck             *check);

/* "pass", "fail", "n/a": the summary's words */
const char   *hl_check_result_to_string  (HlCheckResult result);
/* "PASS", "FAIL", "NOT APPLICABLE": the report's */
const char   *hl_check_result_word       (HlCheckResult result);
const char   *hl_design_basis_name       (HlDesignBasis basis);

G_END_DECLS
