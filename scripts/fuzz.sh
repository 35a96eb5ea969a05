#!/usr/bin/env bash
# Fuzzes the case reader with libFuzzer (tests/fuzz/fuzz_case_reader.cpp):
#   scripts/fuzz.sh [SECONDS] [libFuzzer options...]     default 60 s, e.g. scripts/fuzz.sh 3600 -jobs=2 -workers=2
# Sets up clang and libFuzzer if missing (scripts/setup.sh --fuzz), builds the fuzz preset
# (clang, AddressSanitizer + UBSan) into build-fuzz/, seeds build-fuzz/corpus from resources/ and
# tests/fuzz/seeds/, writes a dictionary of the case format's keys and choices, and runs. A crash,
# leak or sanitizer report stops the run with a non-zero status and leaves the input that caused
# it as build-fuzz/crash-* (rerun it: build-fuzz/bin/fuzz_case_reader build-fuzz/crash-...); with
# -jobs=N each job's log is build-fuzz/fuzz-<job>.log.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."

seconds=${1:-60}
[ $# -gt 0 ] && shift
case "$seconds" in ''|*[!0-9]*) echo "usage: scripts/fuzz.sh [SECONDS] [libFuzzer options...]" >&2; exit 2 ;; esac

bash scripts/setup.sh --fuzz
cmake --preset fuzz >/dev/null
cmake --build --preset fuzz

corpus=build-fuzz/corpus
mkdir -p "$corpus"
cp resources/demo/*.json resources/examples/*.json tests/fuzz/seeds/* "$corpus/"

# Dictionary: every key and choice of the case format, from its schema (docs/case-schema.json).
python3 - docs/case-schema.json build-fuzz/case.dict <<'PY'
import json, sys
schema = json.load(open(sys.argv[1]))
words = set()
def walk(node):
    if isinstance(node, dict):
        for key, value in node.get("properties", {}).items():
            words.add(key)
        for value in node.get("enum", []):
            if isinstance(value, str): words.add(value)
        for value in node.values(): walk(value)
    elif isinstance(node, list):
        for value in node: walk(value)
walk(schema)
with open(sys.argv[2], "w") as out:
    for i, word in enumerate(sorted(words)):
        out.write('w%d="\\"%s\\""\n' % (i, word))
PY

# -rss_limit_mb bounds memory; -max_len keeps inputs near the size of case files.
export ASAN_OPTIONS=${ASAN_OPTIONS:-detect_leaks=1}
export UBSAN_OPTIONS=${UBSAN_OPTIONS:-print_stacktrace=1:halt_on_error=1}
# From build-fuzz/, so that the logs of -jobs (fuzz-N.log) land there too.
cd build-fuzz
bin/fuzz_case_reader -max_total_time="$seconds" -max_len=16384 -rss_limit_mb=2048 \
  -dict=case.dict -artifact_prefix=./ -print_final_stats=1 "$@" corpus
