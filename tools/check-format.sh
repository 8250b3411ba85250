#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Checks that the C sources follow .clang-format: lists each difference
# and fails if there is any.  Changes nothing; to apply the layout, run
#   clang-format -i <files>
# Not yet part of .ci/run: the sources are reformatted in one change first.
set -euo pipefail
cd "$(dirname "$0")/.."

if ! command -v clang-format >/dev/null; then
  echo "clang-format is missing: install it (Debian: apt-get install clang-format)" >&2
  exit 2
fi

mapfile -t files < <(git ls-files 'src/*.c' 'src/*.h' 'tests/*.c' 'tests/*.h')
if [ ${#files[@]} -eq 0 ]; then
  echo "no C sources found" >&2
  exit 2
fi
clang-format --dry-run --Werror "${files[@]}"
