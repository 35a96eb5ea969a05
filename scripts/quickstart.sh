#!/usr/bin/env bash
# One command from a fresh Debian 12 machine to a running Cyclewright:
#   scripts/quickstart.sh demo   set up what is missing, build, open the app on the demo case
#   scripts/quickstart.sh test   set up what is missing, build, run the whole test suite
# Extra arguments after "test" go to ctest (e.g. -L core).
set -euo pipefail

here=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
cd "$here"

what=${1:-}
[ $# -gt 0 ] && shift
case "$what" in
  demo|test) ;;
  *) echo "usage: scripts/quickstart.sh demo|test [ctest arguments]" >&2; exit 2 ;;
esac

step() { echo; echo "== $* =="; }
fail() { echo "quickstart: FAILED at step '$1'" >&2; exit 1; }

step "set-up (scripts/setup.sh)"
start=$SECONDS
bash scripts/setup.sh || fail "set-up"
echo "set-up took $((SECONDS - start)) s"

step "configure and build (preset default)"
start=$SECONDS
cmake --preset default >/dev/null || fail "configure (cmake --preset default)"
cmake --build --preset default || fail "build (cmake --build --preset default)"
echo "build took $((SECONDS - start)) s"

if [ "$what" = test ]; then
  step "tests (ctest --preset default)"
  start=$SECONDS
  status=0
  ctest --preset default "$@" || status=$?
  echo "tests took $((SECONDS - start)) s"
  exit $status
fi

step "open the app on the demo case"
if [ -z "${DISPLAY:-}" ] && [ -z "${WAYLAND_DISPLAY:-}" ]; then
  echo "No display (DISPLAY and WAYLAND_DISPLAY unset): writing a picture of the window instead."
  build/bin/cyclewright --screenshot build/demo-window.png
  echo "Wrote build/demo-window.png. Run build/bin/cyclewright on a desktop to open the window."
  exit 0
fi
exec build/bin/cyclewright
