#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Side by side: the headless commands against /bin/true (issue: within 4x).
# Usage: tools/bench-headless.sh [BUILD_DIR]   (a release build is fairest)
# Prints the median and best of 40 runs of each command, in milliseconds.
set -euo pipefail
cd "$(dirname "$0")/.."
build=${1:-_build}
demo=data/examples/demo.hoop
python3 - "$build/src/hoopline" "$demo" <<'PY'
import shlex, subprocess, sys, time
program, demo = sys.argv[1], sys.argv[2]
commands = ["/bin/true", f"{program} --check {demo}", f"{program} --summary {demo}"]
for cmd in commands:
    argv = shlex.split(cmd)
    times = []
    for _ in range(40):
        t = time.perf_counter()
        subprocess.run(argv, stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL)
        times.append(time.perf_counter() - t)
    times.sort()
    print(f"{cmd:70s} median {times[20] * 1e3:6.2f} ms   best {times[0] * 1e3:6.2f} ms")
PY
