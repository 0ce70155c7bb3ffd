#!/usr/bin/env bash
# Benchmark of the whole design job as a user runs it (JVM start, rules, model, checks, kit, every file
# written), through the ./shearstack launcher, with hyperfine. Not part of the test suite.
#
#   bench/design-bench.sh [SPEC] [RUNS]      (defaults: examples/classroom-demo.yaml, 5)
#
# Prints the load average before and after: other work on the machine inflates wall time, so compare the
# User + System figures (CPU seconds) between runs made under different load.
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
spec="${1:-examples/classroom-demo.yaml}"
runs="${2:-5}"
out="$(mktemp -d)"
trap 'rm -rf "$out"' EXIT
command -v hyperfine >/dev/null || { echo "design-bench: hyperfine is not installed (apt-get install hyperfine)" >&2; exit 2; }
cd "$root"
./shearstack --version >/dev/null   # builds the jar first if sources changed (not timed)
echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg)"
# the exit code is 3 when a check fails: still a complete run
hyperfine -i --warmup 1 --runs "$runs" "./shearstack design $spec -o $out/kit"
echo "load average after:  $(cut -d' ' -f1-3 /proc/loadavg)"
