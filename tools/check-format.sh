#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Checks the layout rules of DEVELOPERS.md (tools/check-format.py says
# which and why); run by the test suite as the test "format".
exec python3 "$(dirname "$0")/check-format.py" "$@"
