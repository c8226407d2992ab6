#!/usr/bin/env bash
# Compares the ratios of the last bench/run.sh (bench/results/summary.json) with bench/baseline.json and exits 1
# when any falls more than the baseline's margin below its committed value. `--run` runs bench/run.sh --short first.
set -euo pipefail
cd "$(dirname "$0")/.."
if [[ "${1:-}" == "--run" ]]; then bench/run.sh --short; fi
exec /usr/bin/python3 bench/check_regression.py bench/baseline.json bench/results/summary.json
