#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Installs what is missing, builds Hoopline and opens the demo project.
set -euo pipefail
cd "$(dirname "$0")/.."
bash tools/deps.sh
[ -d _build ] || meson setup _build --buildtype=debugoptimized >/dev/null
meson compile -C _build >/dev/null
exec ./_build/src/hoopline data/examples/demo.hoop
