#!/usr/bin/env python3
"""Mutation check of the core and command-line suites: do the tests notice broken physics?

Each mutant in scripts/mutations.json replaces one exact piece of source text (which must occur
exactly once in its file) by a broken version: a changed constant, a swapped operator, a dropped
term, a squared factor. For every mutant the script edits a scratch copy of the sources (never the
working tree), rebuilds it incrementally, runs `ctest -L 'core|cli'` (benchmarks excluded) and
records the outcome:

  killed    a test failed: the suites notice the fault
  survived  every test passed: no test notices it (exit status 1)
  invalid   the original text was not found exactly once, or the mutant did not compile
            (exit status 2 when nothing survived)

The scratch copy lives in build-mutation/src (the tracked and untracked, not ignored, files of the
working tree, synchronised at every run), its build in build-mutation/build (configured once, GUI
off). Run on demand, never in CI. Standard library only.

    scripts/mutation_check.py --list
    scripts/mutation_check.py --only inlet-mil-coefficient,nozzle-discharge-coefficient
    scripts/mutation_check.py            # every mutant
"""

import argparse
import fcntl
import json
import os
import re
import shutil
import signal
import subprocess
import sys
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
DEFAULT_MUTATIONS = ROOT / "scripts" / "mutations.json"
DEFAULT_SCRATCH = ROOT / "build-mutation"
ID_PATTERN = re.compile(r"^[a-z0-9][a-z0-9-]*$")
SETUP_ERROR = 3


class SetupError(Exception):
    """The check cannot run (bad mutation file, scratch build that fails without any mutant)."""


# ---- the mutation file ---------------------------------------------------------------------------


def load_mutants(path):
    """The mutants of the file, validated: id, file, original, replacement, breaks."""
    try:
        document = json.loads(Path(path).read_text(encoding="utf-8"))
    except (OSError, ValueError) as e:
        raise SetupError(f"{path}: {e}")
    if document.get("format") != "cyclewright-mutations" or document.get("version") != 1:
        raise SetupError(f"{path}: expected format 'cyclewright-mutations', version 1")
    mutants, seen = document.get("mutants", []), set()
    for i, m in enumerate(mutants):
        where = f"{path}: mutant {i + 1}"
        for key in ("id", "file", "original", "replacement", "breaks"):
            if not isinstance(m.get(key), str) or not m[key]:
                raise SetupError(f"{where}: '{key}' must be a non-empty string")
        if not ID_PATTERN.match(m["id"]) or m["id"] in seen:
            raise SetupError(f"{where}: id '{m['id']}' is malformed or repeated")
        if m["original"] == m["replacement"]:
            raise SetupError(f"{where} ({m['id']}): the replacement equals the original")
        seen.add(m["id"])
    return mutants


def select(mutants, only):
    """The mutants named in --only (comma-separated ids), in the file's order."""
    if not only:
        return mutants
    wanted = [w.strip() for w in only.split(",") if w.strip()]
    known = {m["id"] for m in mutants}
    unknown = [w for w in wanted if w not in known]
    if unknown:
        raise SetupError("unknown mutant id(s): " + ", ".join(unknown))
    return [m for m in mutants if m["id"] in wanted]


def occurrences(tree, mutant):
    """How often the mutant's original text occurs in its file under `tree` (0 if no file)."""
    path = tree / mutant["file"]
    if not path.is_file():
        return 0
    return path.read_text(encoding="utf-8").count(mutant["original"])


# ---- the scratch tree ----------------------------------------------------------------------------


def source_files():
    """Tracked and untracked (not ignored) files of the working tree, relative to it."""
    out = subprocess.run(["git", "-C", str(ROOT), "ls-files", "-z", "--cached", "--others",
                          "--exclude-standard"], check=True, capture_output=True).stdout
    files = [Path(p.decode()) for p in out.split(b"\0") if p]
    return [f for f in files if (ROOT / f).is_file()]


def sync_scratch(src):
    """Makes `src` a copy of the working tree's sources. Changed files get a fresh time stamp
    (shutil.copyfile), so that the incremental build sees them; unchanged files keep theirs."""
    files = source_files()
    for rel in files:
        source, target = ROOT / rel, src / rel
        if target.is_file() and target.read_bytes() == source.read_bytes():
            continue
        target.parent.mkdir(parents=True, exist_ok=True)
        shutil.copyfile(source, target)
        shutil.copymode(source, target)
    keep = {src / rel for rel in files}
    for path in sorted(src.rglob("*"), reverse=True):
        if path.is_file() and path not in keep:
            path.unlink()
        elif path.is_dir() and not any(path.iterdir()):
            path.rmdir()


def run(command, cwd=None, timeout=None):
    """Runs a command, output captured; returns (status, output)."""
    done = subprocess.run(command, cwd=cwd, capture_output=True, text=True, timeout=timeout)
    return done.returncode, done.stdout + done.stderr


def configure(src, build):
    if (build / "CMakeCache.txt").is_file():
        return
    print(f"configuring {build} (once; GUI off)...", flush=True)
    status, output = run(["cmake", "-S", str(src), "-B", str(build), "-G", "Ninja",
                          "-DCMAKE_BUILD_TYPE=RelWithDebInfo", "-DCYCLEWRIGHT_BUILD_GUI=OFF"])
    if status != 0:
        raise SetupError("configuring the scratch build failed:\n" + tail(output))


def build_tree(build, jobs):
    return run(["cmake", "--build", str(build), "-j", str(jobs)])


def run_suites(build, jobs, timeout):
    """ctest on the core and cli labels (benchmarks carry their own label and are left out);
    stops at the first failure, since one is enough to kill a mutant."""
    return run(["ctest", "--test-dir", str(build), "-L", "core|cli", "-j", str(jobs), "--timeout",
                str(timeout), "--stop-on-failure", "--output-on-failure"])


def tail(text, lines=15):
    return "\n".join(text.strip().splitlines()[-lines:])


def first_error(output):
    for line in output.splitlines():
        if "error" in line.lower():
            return line.strip()[:160]
    return tail(output, 1)[:160]


def failed_tests(output):
    """Names of the failed tests in ctest's summary."""
    names = re.findall(r"^\s*\d+ - (\S+) \(", output, re.MULTILINE)
    return ", ".join(names) if names else "a test failed"


# ---- one mutant ----------------------------------------------------------------------------------


def check_mutant(mutant, src, build, args):
    """Applies the mutant to the scratch copy, builds, runs the suites, restores the file."""
    path = src / mutant["file"]
    count = occurrences(src, mutant)
    if count != 1:
        found = "not found" if count == 0 else f"found {count} times"
        return "invalid", f"original text {found} in {mutant['file']}"
    original = path.read_text(encoding="utf-8")
    try:
        path.write_text(original.replace(mutant["original"], mutant["replacement"], 1), encoding="utf-8")
        status, output = build_tree(build, args.jobs)
        if status != 0:
            return "invalid", "did not compile: " + first_error(output)
        status, output = run_suites(build, args.jobs, args.timeout)
        return ("survived", "every core and cli test passed") if status == 0 else (
            "killed", failed_tests(output))
    finally:
        path.write_text(original, encoding="utf-8")


def baseline(build, args):
    """The unmutated scratch tree must build and pass, or no outcome means anything."""
    print("building and testing the unmutated copy...", flush=True)
    status, output = build_tree(build, args.jobs)
    if status != 0:
        raise SetupError("the unmutated scratch copy does not build:\n" + tail(output))
    status, output = run_suites(build, args.jobs, args.timeout)
    if status != 0:
        raise SetupError("the unmutated scratch copy fails its tests:\n" + tail(output))


# ---- reporting -----------------------------------------------------------------------------------


def print_table(rows):
    width = max([len(r[0]) for r in rows] + [6])
    print(f"\n{'mutant':<{width}}  {'result':<8}  {'time':>6}  detail")
    for mutant_id, result, seconds, detail in rows:
        mark = "  <-- " if result != "killed" else ""
        print(f"{mutant_id:<{width}}  {result:<8}  {seconds:5.0f}s  {detail}{mark}")


def summary(rows, total):
    counts = {k: sum(1 for r in rows if r[1] == k) for k in ("killed", "survived", "invalid")}
    scored = counts["killed"] + counts["survived"]
    killed_share = counts["killed"] / scored if scored else 0.0
    score = f"{killed_share:.0%} killed of the valid ones" if scored else "none valid"
    line = (f"{len(rows)} of {total} mutants run: {counts['killed']} killed, {counts['survived']} survived, "
            f"{counts['invalid']} invalid ({score})")
    if counts["invalid"]:
        line += "\nINVALID MUTANTS: fix their 'original' text in the mutation file (the code has moved on?)"
    return line, counts


def list_mutants(mutants):
    """--list: every mutant and whether its original text is still in the working tree, once."""
    width = max(len(m["id"]) for m in mutants)
    for m in mutants:
        count = occurrences(ROOT, m)
        state = "ok" if count == 1 else ("NOT FOUND" if count == 0 else f"FOUND {count} TIMES")
        print(f"{m['id']:<{width}}  {state:<9}  {m['file']}: {m['breaks']}")
    bad = sum(1 for m in mutants if occurrences(ROOT, m) != 1)
    print(f"\n{len(mutants)} mutants, {bad} whose original text is not found exactly once")
    return 2 if bad else 0


# ---- main ----------------------------------------------------------------------------------------


def parse_arguments():
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("--list", action="store_true", help="list the mutants and check their text; build nothing")
    parser.add_argument("--only", metavar="ID[,ID]", help="run only these mutants")
    parser.add_argument("--mutations", default=str(DEFAULT_MUTATIONS), help="mutation file (JSON)")
    parser.add_argument("--scratch", default=str(DEFAULT_SCRATCH), help="scratch folder (default build-mutation/)")
    parser.add_argument("--jobs", type=int, default=2, help="parallel build and test jobs (default 2)")
    parser.add_argument("--timeout", type=int, default=300, help="seconds per test before it counts as failed")
    return parser.parse_args()


def terminate(signum, frame):
    raise KeyboardInterrupt


MARKER = ".cyclewright-mutation-scratch"


def prepare_scratch(scratch):
    """The scratch folder, made on first use and marked as such; a folder that is neither empty nor
    marked (a typo in --scratch) is refused, since sync_scratch deletes what it does not expect."""
    if scratch == ROOT or ROOT.is_relative_to(scratch):
        raise SetupError(f"the scratch folder {scratch} holds the working tree")
    if scratch.exists() and any(scratch.iterdir()) and not (scratch / MARKER).is_file():
        raise SetupError(f"{scratch} is not empty and not a mutation scratch folder")
    (scratch / "src").mkdir(parents=True, exist_ok=True)
    (scratch / MARKER).touch()
    return scratch / "src", scratch / "build"


def run_all(mutants, total, args):
    scratch = Path(args.scratch).resolve()
    src, build = prepare_scratch(scratch)
    with open(scratch / "lock", "w") as lock:
        try:
            fcntl.flock(lock, fcntl.LOCK_EX | fcntl.LOCK_NB)
        except OSError:
            raise SetupError(f"another mutation check is running in {scratch}")
        print(f"synchronising {src} with the working tree...", flush=True)
        sync_scratch(src)
        configure(src, build)
        baseline(build, args)
        rows = []
        try:
            for i, mutant in enumerate(mutants, 1):
                print(f"[{i}/{len(mutants)}] {mutant['id']}: {mutant['breaks']}", flush=True)
                start = time.monotonic()
                result, detail = check_mutant(mutant, src, build, args)
                rows.append((mutant["id"], result, time.monotonic() - start, detail))
                print(f"    {result}: {detail}", flush=True)
        except KeyboardInterrupt:
            print("\ninterrupted: the scratch file was restored; results so far:", flush=True)
            print_table(rows)
            print(summary(rows, total)[0])
            return 130
    print_table(rows)
    line, counts = summary(rows, total)
    print("\n" + line)
    if counts["survived"]:
        return 1
    return 2 if counts["invalid"] else 0


def main():
    args = parse_arguments()
    signal.signal(signal.SIGTERM, terminate)
    try:
        mutants = load_mutants(args.mutations)
        if args.list:
            return list_mutants(select(mutants, args.only))
        return run_all(select(mutants, args.only), len(mutants), args)
    except SetupError as e:
        print(f"mutation check: {e}", file=sys.stderr)
        return SETUP_ERROR
    except KeyboardInterrupt:
        print("\ninterrupted", file=sys.stderr)
        return 130


if __name__ == "__main__":
    sys.exit(main())
