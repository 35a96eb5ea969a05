#!/usr/bin/env bash
# Cyclewright set-up: makes a fresh Debian 12 machine ready to build and test.
#
#  1. installs the Debian packages the build and the tests need, only those missing;
#  2. builds Qwt 6.3 for Qt 6 into our own prefix when no Qwt for Qt 6 is found.
#
# Idempotent: a second run finds everything in place and says so.
# With --fuzz it also installs clang and libFuzzer for the fuzz preset (scripts/fuzz.sh).
# Works as root or through sudo. Stops with a message naming the failed step.
set -euo pipefail

QWT_VERSION=6.3.0
QWT_PREFIX=${CYCLEWRIGHT_QWT_PREFIX:-/opt/cyclewright/qwt-${QWT_VERSION}-qt6}

PACKAGES=(
  cmake ninja-build g++ pkg-config bzip2 ca-certificates
  qt6-base-dev qt6-base-dev-tools qmake6 qt6-svg-dev
  qt6-tools-dev qt6-tools-dev-tools qt6-l10n-tools libgl-dev
  libeigen3-dev nlohmann-json3-dev
  xvfb xauth fonts-dejavu-core binutils
)
if [ "${1:-}" = "--fuzz" ]; then
  PACKAGES+=(clang libclang-rt-14-dev llvm)  # clang++, libFuzzer and the sanitizers, llvm-symbolizer
elif [ $# -gt 0 ]; then
  echo "usage: scripts/setup.sh [--fuzz]" >&2
  exit 2
fi

step="start"
fail() { echo "setup: FAILED at step '${step}'" >&2; exit 1; }
trap fail ERR

say() { echo "setup: $*"; }

if [ "$(id -u)" -eq 0 ]; then
  SUDO=()
elif command -v sudo >/dev/null 2>&1; then
  SUDO=(sudo)
else
  echo "setup: not root and no sudo; run as root or install sudo" >&2
  exit 1
fi

# --- step 1: Debian packages -------------------------------------------------
step="check Debian packages"
missing=()
for p in "${PACKAGES[@]}"; do
  if ! dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed"; then
    missing+=("$p")
  fi
done
if [ ${#missing[@]} -eq 0 ]; then
  say "Debian packages: all ${#PACKAGES[@]} present, nothing to install"
else
  step="apt-get update"
  say "installing missing Debian packages: ${missing[*]}"
  "${SUDO[@]}" apt-get update -q
  step="apt-get install ${missing[*]}"
  "${SUDO[@]}" env DEBIAN_FRONTEND=noninteractive apt-get install -y -q --no-install-recommends "${missing[@]}"
fi

# --- step 2: Qwt for Qt 6 ----------------------------------------------------
step="look for Qwt for Qt 6"
qwt_found=""
for d in "$QWT_PREFIX" /usr /usr/local; do
  for lib in "$d"/lib/libqwt-qt6.so "$d"/lib64/libqwt-qt6.so "$d"/lib/*/libqwt-qt6.so \
             "$d"/lib/libqwt.so; do
    [ -e "$lib" ] || continue
    # A plain libqwt.so counts only when it links Qt 6.
    if objdump -p "$lib" 2>/dev/null | grep -q 'NEEDED.*libQt6Core'; then
      qwt_found="$lib"; break 2
    fi
  done
done
if [ -n "$qwt_found" ]; then
  say "Qwt for Qt 6: found $qwt_found, nothing to build"
  exit 0
fi

work=$(mktemp -d /tmp/cyclewright-qwt.XXXXXX)
trap 'rm -rf "$work"' EXIT

step="fetch qwt_${QWT_VERSION}.orig.tar.bz2 from Debian's source archive"
say "Qwt for Qt 6 not found: fetching its source from Debian unstable"
mkdir -p "$work/apt/lists/partial" "$work/apt/parts.d"
echo "deb-src http://deb.debian.org/debian unstable main" > "$work/apt/sources.list"
apt_opts=(-o "Dir::Etc::SourceList=$work/apt/sources.list"
          -o "Dir::Etc::SourceParts=$work/apt/parts.d"
          -o "Dir::State::Lists=$work/apt/lists"
          -o "APT::Sandbox::User=root")
"${SUDO[@]}" apt-get "${apt_opts[@]}" update -q >/dev/null
# The .dsc and debian tarball may answer 404; only the orig tarball is needed.
(cd "$work" && "${SUDO[@]}" apt-get "${apt_opts[@]}" source --download-only qwt >/dev/null 2>&1) || true
tarball="$work/qwt_${QWT_VERSION}.orig.tar.bz2"
[ -f "$tarball" ] || { echo "setup: $tarball was not downloaded" >&2; false; }

step="unpack Qwt"
tar -xjf "$tarball" -C "$work"
src=$(find "$work" -maxdepth 1 -type d -name "qwt-*" | head -n 1)
[ -n "$src" ]

step="configure Qwt (qmake6)"
cfg="$src/qwtconfig.pri"
sed -i \
  -e "s|^\(\s*QWT_INSTALL_PREFIX\s*=\).*|\1 ${QWT_PREFIX}|" \
  -e 's|^\(\s*QWT_CONFIG\s*+=\s*QwtDesigner\)|#\1|' \
  -e 's|^\(\s*QWT_CONFIG\s*+=\s*QwtExamples\)|#\1|' \
  -e 's|^\(\s*QWT_CONFIG\s*+=\s*QwtPlayground\)|#\1|' \
  -e 's|^\(\s*QWT_CONFIG\s*+=\s*QwtTests\)|#\1|' \
  -e 's|^\(\s*QWT_CONFIG\s*+=\s*QwtOpenGL\)|#\1|' \
  "$cfg"
grep -q "QWT_INSTALL_PREFIX *= *${QWT_PREFIX}" "$cfg"
(cd "$src" && qmake6 qwt.pro >/dev/null)

step="build Qwt"
say "building Qwt ${QWT_VERSION} for Qt 6 (about 2 minutes on 2 cores)"
make -C "$src" -j"$(nproc)" -s >/dev/null 2>"$work/build.log" || { tail -n 30 "$work/build.log" >&2; false; }

step="install Qwt into ${QWT_PREFIX}"
"${SUDO[@]}" make -C "$src" -s install >/dev/null
# Qwt names its library libqwt.so; give it an unambiguous name for Qt 6 as well.
"${SUDO[@]}" ln -sf libqwt.so "${QWT_PREFIX}/lib/libqwt-qt6.so"
say "Qwt for Qt 6 installed in ${QWT_PREFIX}"
