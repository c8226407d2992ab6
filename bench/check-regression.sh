#!/usr/bin/env bash
# Compares the ratios of the last bench/run.sh (bench/results/summary.json) with bench/baseline.json and exits 1
# when any falls more than the baseline's margin below its committed value. `--run` runs bench/run.sh --short
# first, and on a failure measures once more: the build machine is shared, and one burst of someone else's work
# during one benchmark can sink a ratio. A real regression fails both runs.
set -euo pipefail
cd "$(dirname "$0")/.."
check() { /usr/bin/python3 bench/check_regression.py bench/baseline.json bench/results/summary.json; }
if [[ "${1:-}" != "--run" ]]; then check; exit; fi
bench/run.sh --short
if check; then exit 0; fi
echo "a ratio fell below its floor; measuring once more"
bench/run.sh --short
check
