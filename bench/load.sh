#!/usr/bin/env bash
# Load tests against real host processes: Echo against CheckEntry (compare), a fixed-rate soak with the host's
# memory sampled, and 1/2/3 replicas behind client-side round-robin. Writes bench/results/load/*.json and
# regenerates docs/load.md from that one run.
#   bench/load.sh --short   CI-sized, about a minute after the build: 20 s compare, 20 s soak, 3-replica run
#   bench/load.sh --full    30 s compare, 10-minute soak, more entries per replica run
# Exits 1 when any load-generator mode reported a failed or lost call or a host died.
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1

mode="${1:---short}"
case "$mode" in
  --short) compare=20s phases=4 warmup=2s soak=20s sample=2s entries=600 ;;
  --full) compare=30s phases=6 warmup=3s soak=10m sample=5s entries=3000 ;;
  *) echo "usage: bench/load.sh [--short|--full]" >&2; exit 2 ;;
esac
concurrency=8

dotnet build src/ConsistencyHost.Cli/ConsistencyHost.Cli.csproj -c Release -nologo -v quiet
dotnet build bench/ConsistencyHost.LoadGenerator/ConsistencyHost.LoadGenerator.csproj -c Release -nologo -v quiet
host_dll=src/ConsistencyHost.Cli/bin/Release/net10.0/consistencyhost.dll
loadgen=(dotnet bench/ConsistencyHost.LoadGenerator/bin/Release/net10.0/ConsistencyHost.LoadGenerator.dll)

out=bench/results/load
rm -rf "$out"
mkdir -p "$out"
logs="$(mktemp -d)"
pids=()
stop_hosts() {
  for pid in "${pids[@]}"; do kill -TERM "$pid" 2>/dev/null || true; done
  for pid in "${pids[@]}"; do wait "$pid" 2>/dev/null || true; done
  pids=()
}
trap 'stop_hosts; rm -rf "$logs"' EXIT

# Starts a host on free ports with the echo on; sets $pid and $address. `dotnet app.dll` runs the app in the
# dotnet process itself, so $pid is the host's own process (its memory and CPU are what we read).
start_host() {
  local log="$logs/host-$1.log"
  dotnet "$host_dll" serve --port 0 --http-port 0 --echo >"$log" 2>&1 &
  pid=$!
  pids+=("$pid")
  for _ in $(seq 1 600); do
    address=$(grep -oP '^listening on \K\S+' "$log" || true)
    [[ -n "$address" ]] && return 0
    kill -0 "$pid" 2>/dev/null || { echo "host $1 exited during start-up:" >&2; cat "$log" >&2; exit 1; }
    sleep 0.1
  done
  echo "host $1 did not report its address within 60 s" >&2
  exit 1
}

status=0
start_host compare
"${loadgen[@]}" compare --target "$address" --concurrency "$concurrency" --duration "$compare" --phases "$phases" \
  --warmup "$warmup" --server-pid "$pid" --out "$out/compare.json" >/dev/null || status=1
/usr/bin/python3 bench/load_host_log.py "$logs/host-compare.log" > "$out/host-timings.json"
stop_hosts

# The soak runs at a quarter of the slowest check phase of the comparison, on a fresh host, so the curve starts
# at start-up. A soak shows whether memory stays flat under steady work, not the host's capacity: at half (used
# before) a few seconds of someone else's work on the shared 2 cores built a backlog past the generator's
# 1,000 calls in flight, and the calls it then could not send count as lost.
rate=$(/usr/bin/python3 -c 'import json,sys; print(max(10, round(min(p["figures"]["callsPerSecond"] for p in json.load(open(sys.argv[1]))["phases"] if p["kind"] == "check") / 4)))' "$out/compare.json")
start_host soak
"${loadgen[@]}" soak --target "$address" --rate "$rate" --duration "$soak" --server-pid "$pid" --sample-every "$sample" \
  --out "$out/soak.json" --csv "$out/soak-memory.csv" >/dev/null || status=1
stop_hosts

targets=() replica_pids=()
for i in 1 2 3; do
  start_host "replica-$i"
  targets+=("$address") replica_pids+=("$pid")
done
"${loadgen[@]}" replicas --targets "$(IFS=,; echo "${targets[*]}")" --server-pids "$(IFS=,; echo "${replica_pids[*]}")" \
  --concurrency "$concurrency" --entries "$entries" --out "$out/replicas.json" >/dev/null || status=1
stop_hosts

/usr/bin/python3 bench/load_report.py --mode "${mode#--}" --results "$out" --page docs/load.md
echo "wrote docs/load.md and $out/*.json (load-generator status: $status)"
exit "$status"
