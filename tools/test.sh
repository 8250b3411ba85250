#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Installs what is missing, builds Hoopline and runs every test (the GUI
# tests under a virtual X display).  Safe to run again and again.
set -uo pipefail
cd "$(dirname "$0")/.."
bash tools/deps.sh || exit 1
if [ -d _build ]; then
  meson setup --reconfigure _build -Dwerror=true >/dev/null || exit 1
else
  meson setup _build --buildtype=debugoptimized -Dwerror=true >/dev/null || exit 1
fi
meson compile -C _build || exit 1
export GSETTINGS_BACKEND=memory
xvfb-run -a -s "-screen 0 1280x800x24" meson test -C _build --print-errorlogs --num-processes 2
