#!/usr/bin/env python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Checks the layout rules of DEVELOPERS.md that a program can check.

clang-format 14 (Debian 12) cannot describe the GNU/GTK layout the code is
written in: parameter lists one per line with aligned names, and no space
in g_autoptr(T) and _("…").  Reformatting would have rewritten about 3,300
places the code had written on purpose, so the project has no
.clang-format; this check holds what can be checked without one:
  - UTF-8, LF line ends, a final newline, no trailing white space;
  - spaces, never tabs, for indentation in C, meson and .ui files;
  - lines of at most 120 characters, except where a string literal makes
    them longer (messages are not split, so they can be found by grep);
  - an SPDX-License-Identifier near the top of every C, meson and shell
    file;
  - a G_LOG_DOMAIN in every C file of src/ (messages say where they come
    from).
Prints one line per problem, FILE:LINE: reason, and exits 1 if there is
any.  Run from anywhere: it checks the files git tracks.
"""
import os
import re
import subprocess
import sys

top = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
MAX = 120
files = subprocess.run(["git", "-C", top, "ls-files", "-z"], capture_output=True,
                       check=True).stdout.decode().split("\0")
problems = []


def say(path, line, reason):
    problems.append(f"{path}:{line}: {reason}")


for path in files:
    if not path:
        continue
    name = os.path.basename(path)
    is_c = path.endswith((".c", ".h"))
    is_meson = name in ("meson.build", "meson_options.txt")
    is_ui = path.endswith(".ui")
    is_shell = path.endswith((".sh", ".py")) or path == ".ci/run"
    if not (is_c or is_meson or is_ui or is_shell):
        continue
    full = os.path.join(top, path)
    if not os.path.isfile(full):
        continue
    data = open(full, "rb").read()
    try:
        text = data.decode("utf-8")
    except UnicodeDecodeError:
        say(path, 1, "not UTF-8")
        continue
    if b"\r" in data:
        say(path, text[: text.index("\r")].count("\n") + 1, "carriage return (line ends are LF)")
    if data and not data.endswith(b"\n"):
        say(path, text.count("\n") + 1, "no newline at the end of the file")
    lines = text.split("\n")
    for number, line in enumerate(lines, 1):
        if line != line.rstrip(" \t"):
            say(path, number, "trailing white space")
        if (is_c or is_meson or is_ui) and "\t" in line[: len(line) - len(line.lstrip())]:
            say(path, number, "a tab in the indentation (indent with spaces)")
        if is_c and len(line) > MAX and '"' not in line:
            say(path, number, f"{len(line)} characters (at most {MAX} unless a string literal needs more)")
    head = "\n".join(lines[:40])
    if (is_c or is_meson or is_shell) and "SPDX-License-Identifier:" not in head:
        say(path, 1, "no SPDX-License-Identifier in the first 40 lines")
    if is_c and path.startswith("src/") and path.endswith(".c") and "#define G_LOG_DOMAIN" not in text:
        say(path, 1, "no G_LOG_DOMAIN")

for p in problems:
    print(p)
print(f"check-format: {len(problems)} problem(s) in the tracked sources")
sys.exit(1 if problems else 0)
