#!/usr/bin/env bash
# One script for a fresh Debian 12 machine: installs what is missing, builds, and then
#   ./setup.sh run    prepares the demo club, shows its debrief, and opens the desktop app on it
#   ./setup.sh test   runs every test
set -euo pipefail
cd "$(dirname "$0")"

mode=${1:-run}
build_dir=${PITCHLOOP_BUILD_DIR:-build}

packages=(
  build-essential cmake ninja-build pkg-config
  libsqlitecpp-dev libsqlite3-dev nlohmann-json3-dev catch2
  libboost-dev libcli11-dev libglpk-dev
  qt6-base-dev qt6-declarative-dev
  qml6-module-qtqml qml6-module-qtqml-models qml6-module-qtqml-workerscript
  qml6-module-qtquick qml6-module-qtquick-controls qml6-module-qtquick-layouts
  qml6-module-qtquick-window qml6-module-qtquick-templates qml6-module-qtquick-shapes
  qml6-module-qtquick-dialogs qml6-module-qt-labs-folderlistmodel qml6-module-qt-labs-settings
  qml6-module-qttest xvfb xauth fonts-dejavu-core poppler-utils
  python3 python3-numpy python3-scipy python3-jsonschema python3-pandas python3-statsmodels
  python3-icalendar python3-colorspacious
)

install_missing() {
  local missing=()
  for p in "${packages[@]}"; do
    dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing+=("$p")
  done
  [ ${#missing[@]} -eq 0 ] && return 0
  echo "setup: installing ${missing[*]}" >&2
  local sudo=""
  [ "$(id -u)" -ne 0 ] && sudo=sudo
  $sudo apt-get update -q
  DEBIAN_FRONTEND=noninteractive $sudo apt-get -o DPkg::Lock::Timeout=600 install -y -q \
    --no-install-recommends "${missing[@]}"
}

build() {
  cmake -S . -B "$build_dir" -G Ninja -DCMAKE_BUILD_TYPE=RelWithDebInfo
  cmake --build "$build_dir" -j"$(nproc)"
}

prepare_demo() {
  # Idempotent (sample-club/prepare.cmake): the demo club is never rebuilt over edits made in it.
  cmake -DCLI="$build_dir"/app/cli/pitchloop -DCLUB=sample-club/club.sqlite -P sample-club/prepare.cmake
}

case "$mode" in
  run)
    install_missing
    build
    prepare_demo
    "$build_dir"/app/cli/pitchloop --db sample-club/club.sqlite matches
    echo
    "$build_dir"/app/cli/pitchloop --db sample-club/club.sqlite debrief KB-2026-08
    echo
    # The desktop app opens only once its QML self-test passes on the demo club (offscreen).
    "$build_dir"/app/desktop/pitchloop-app --self-test --db sample-club/club.sqlite
    if [ -z "${DISPLAY:-}" ] && [ -z "${WAYLAND_DISPLAY:-}" ]; then
      echo "setup: no display, so the app is not opened; on a desktop run:" >&2
      echo "  $build_dir/app/desktop/pitchloop-app --db sample-club/club.sqlite" >&2
      exit 0
    fi
    exec "$build_dir"/app/desktop/pitchloop-app --db sample-club/club.sqlite
    ;;
  test)
    install_missing
    build
    prepare_demo
    ctest --test-dir "$build_dir" --output-on-failure -j"$(nproc)"
    ;;
  *)
    echo "usage: $0 [run|test]" >&2
    exit 2
    ;;
esac
