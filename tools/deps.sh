#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Installs the Debian 12 packages Hoopline needs to build, run and test,
# only those that are missing.  Safe to run again and again.
set -euo pipefail

packages=(
  # build
  meson ninja-build pkg-config gcc clang gettext
  libglib2.0-dev libglib2.0-bin libxml2-dev libxml2-utils
  libgtk-4-dev libadwaita-1-dev libcairo2-dev libpango1.0-dev libgsl-dev libpng-dev zlib1g-dev
  # tests: virtual display, validators, locales, figure checks
  xvfb xauth desktop-file-utils appstream locales poppler-utils
  imagemagick librsvg2-bin librsvg2-common shared-mime-info valgrind libclang-rt-14-dev
  fonts-dejavu-core
  # tools/check-format.py (the test "format") and .ci/run's count
  python3 git
)

missing=()
for p in "${packages[@]}"; do
  dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing+=("$p")
done
if [ ${#missing[@]} -gt 0 ]; then
  if [ "$(id -u)" -ne 0 ]; then
    echo "Installing ${missing[*]} needs root: run this as root (or with sudo)." >&2
    exit 1
  fi
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
fi

# the German locale for the translation and decimal-comma tests
if ! locale -a 2>/dev/null | grep -qi '^de_DE\.utf-\?8$'; then
  if [ "$(id -u)" -eq 0 ]; then
    grep -q '^de_DE.UTF-8 UTF-8' /etc/locale.gen 2>/dev/null || echo 'de_DE.UTF-8 UTF-8' >> /etc/locale.gen
    locale-gen >/dev/null
  fi
fi
