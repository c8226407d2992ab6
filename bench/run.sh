#!/usr/bin/env bash
# Runs every benchmark (ours through BenchmarkDotNet, RDKit through bench/rdkit_baseline.py) and regenerates
# docs/benchmarks.md and bench/results/summary.json from that one run.
#   bench/run.sh --short   CI-sized: a few seconds per benchmark (default)
#   bench/run.sh --full    more iterations and RDKit repetitions, for a steadier median
# Extra arguments go to BenchmarkDotNet (e.g. --filter '*Text*'); the report needs every benchmark, so a filtered
# run leaves docs/benchmarks.md alone.
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1

mode="--short"
if [[ "${1:-}" == "--short" || "${1:-}" == "--full" ]]; then mode="$1"; shift; fi
repeats=5
[[ "$mode" == "--full" ]] && repeats=10

# Release build of the benchmarks; it also builds the rule plugins into artifacts/plugins.
dotnet build bench/ConsistencyHost.Benchmarks/ConsistencyHost.Benchmarks.csproj -c Release -nologo -v quiet

rm -rf bench/results
mkdir -p bench/results
# RDKit before and after ours, so both sides see the same stretch of machine load; report.py takes the median.
/usr/bin/python3 bench/rdkit_baseline.py --repeats "$repeats" > bench/results/rdkit-1.json
dotnet bench/ConsistencyHost.Benchmarks/bin/Release/net10.0/ConsistencyHost.Benchmarks.dll "$mode" --filter '*' "$@" \
  | tee bench/results/dotnet.log | grep -E '^(\||// \* Summary|Global total)' || true
/usr/bin/python3 bench/rdkit_baseline.py --repeats "$repeats" > bench/results/rdkit-2.json

if (($#)); then
  echo "filtered run: docs/benchmarks.md not regenerated"
else
  /usr/bin/python3 bench/report.py --mode "${mode#--}"
  echo "wrote docs/benchmarks.md and bench/results/summary.json"
fi
