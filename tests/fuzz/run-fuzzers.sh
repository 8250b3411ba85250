#!/bin/bash
# SPDX-License-Identifier: GPL-3.0-or-later
#
# run-fuzzers.sh SECONDS [BUILD_DIR] — builds the libFuzzer targets with
# clang and runs each for SECONDS, one process at a time.
#
# Needs the Debian packages clang and libclang-rt-14-dev (the libFuzzer,
# ASan and UBSan runtimes).  The committed corpus and crash inputs seed a
# working corpus inside BUILD_DIR (default: _build-fuzzers in the source
# tree), so the committed files are never rewritten.  A finding is kept
# in BUILD_DIR/fuzz-findings/TARGET/ and makes the script exit 1; replay
# one with   BUILD_DIR/tests/fuzz/fuzz-TARGET FILE
set -u

usage () {
  echo "usage: $0 SECONDS [BUILD_DIR]" >&2
  exit 2
}

if [ $# -lt 1 ] || [ $# -gt 2 ]; then usage; fi
seconds=$1
case "$seconds" in
  ''|*[!0-9]*) usage ;;
esac

here=$(cd "$(dirname "$0")" && pwd)
src=$(cd "$here/../.." && pwd)
build=${2:-$src/_build-fuzzers}
targets="project-load units solve"

if ! command -v clang > /dev/null; then
  echo "run-fuzzers: clang is missing (apt-get install clang libclang-rt-14-dev)" >&2
  exit 2
fi

if [ -f "$build/build.ninja" ]; then
  meson configure "$build" -Dfuzzing=true > /dev/null || exit 2
else
  CC=clang meson setup "$build" "$src" -Dfuzzing=true > "$build.setup.log" 2>&1 \
    || { cat "$build.setup.log" >&2; exit 2; }
  rm -f "$build.setup.log"
fi
ninja_targets=""
for t in $targets; do
  ninja_targets="$ninja_targets tests/fuzz/fuzz-$t"
done
# shellcheck disable=SC2086 # one word per target
ninja -C "$build" $ninja_targets || exit 2

failed=0
passed=0
for t in $targets; do
  corpus="$build/fuzz-corpus/$t"
  findings="$build/fuzz-findings/$t"
  log="$build/fuzz-$t.log"
  mkdir -p "$corpus" "$findings"
  cp "$here/corpus/$t/"* "$corpus/" 2> /dev/null
  cp "$here/crashes/$t/"* "$corpus/" 2> /dev/null
  rm -f "$corpus/README"
  dict=()
  [ -f "$here/$t.dict" ] && dict=("-dict=$here/$t.dict")

  stamp="$build/fuzz-$t.stamp"
  touch "$stamp"
  before=$(find "$findings" -type f | wc -l)
  "$build/tests/fuzz/fuzz-$t" -max_total_time="$seconds" -rss_limit_mb=2048 -timeout=10 \
    -print_final_stats=1 "${dict[@]}" -artifact_prefix="$findings/" "$corpus" > "$log" 2>&1
  rc=$?
  after=$(find "$findings" -type f | wc -l)
  execs=$(sed -n 's/^stat::number_of_executed_units: *//p' "$log" | tail -n 1)
  if [ -z "$execs" ]; then
    # a crash ends the run before the final stats: take the last status line
    execs=$(sed -n 's/^#\([0-9]*\).*/\1/p' "$log" | tail -n 1)
  fi
  new=$((after - before))
  echo "fuzz-$t: ${execs:-0} executions in about $seconds s, $new new finding(s), exit $rc"
  if [ "$rc" -ne 0 ] || [ "$new" -gt 0 ]; then
    failed=$((failed + 1))
    grep -E '^(fuzz: broken rule|==[0-9]+==ERROR|SUMMARY|artifact_prefix|Test unit written)' "$log" | head -n 20
    find "$findings" -type f -newer "$stamp" | sed 's/^/  finding: /'
    echo "  full log: $log"
  else
    passed=$((passed + 1))
  fi
done

echo "fuzz: $passed passed, $failed failed"
[ "$failed" -eq 0 ]
