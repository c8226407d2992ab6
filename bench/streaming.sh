#!/usr/bin/env bash
# Streaming batches in bounded memory (docs/streaming.md). Generates entries from real structures with invented
# peak lists (load only), streams them and records peak working sets (VmHWM) at checkpoints.
#   bench/streaming.sh --short   CI-sized: 10k entries through one CheckEntries call; fails when the
#                                host's peak after 10k exceeds its peak after 5k by more than the margin
#   bench/streaming.sh --full    100k entries: the call (host), `batch` embedded (CLI) and `batch --server`
#                                (CLI and host); peaks at 10k and at 100k; regenerates docs/streaming.md
# Results: bench/results/streaming/*.json. Needs Linux (/proc) and /usr/bin/time.
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1

mode="${1:---short}"
case "$mode" in
  --short) entries=10000 ;;
  --full) entries=100000 ;;
  *) echo "usage: bench/streaming.sh [--short|--full] [--entries N]" >&2; exit 2 ;;
esac
# --entries N: a smaller run to try the script out; no ratio is checked and the docs page is left alone.
smoke=""
if [[ "${2:-}" == "--entries" ]]; then entries="$3"; smoke=1; fi

dotnet build src/ConsistencyHost.Cli/ConsistencyHost.Cli.csproj -c Release -nologo -v quiet
dotnet build bench/ConsistencyHost.StreamBench/ConsistencyHost.StreamBench.csproj -c Release -nologo -v quiet
cli=src/ConsistencyHost.Cli/bin/Release/net10.0/consistencyhost
bench=(dotnet bench/ConsistencyHost.StreamBench/bin/Release/net10.0/ConsistencyHost.StreamBench.dll)
results=bench/results/streaming
work=$(mktemp -d)
host_pid=""
cleanup() { [[ -n "$host_pid" ]] && kill "$host_pid" 2>/dev/null; rm -rf "$work"; }
trap cleanup EXIT
mkdir -p "$results"
rm -f "$results"/*.json

free_port() { /usr/bin/python3 -c 'import socket; s = socket.socket(); s.bind(("127.0.0.1", 0)); print(s.getsockname()[1])'; }

# A fresh host per run, so its peak belongs to that run. Its log (two lines per entry) goes to a file.
start_host() {
  local port http
  port=$(free_port); http=$(free_port)
  "$cli" serve --port "$port" --http-port "$http" > "$work/host-$1.log" 2>&1 &
  host_pid=$!
  for _ in $(seq 1 120); do
    grep -q "Now listening on: http://127.0.0.1:$port" "$work/host-$1.log" 2>/dev/null && { host_url="http://127.0.0.1:$port"; return; }
    sleep 0.5
  done
  echo "host did not start; its log:" >&2; cat "$work/host-$1.log" >&2; exit 1
}

stop_host() { kill "$host_pid"; wait "$host_pid" 2>/dev/null || true; host_pid=""; }

# batch under /usr/bin/time (whole-run peak) while the watcher samples it (and the host) at checkpoints.
watched_batch() {
  local name="$1"; shift
  local server_args=()
  [[ -n "$host_pid" ]] && server_args=(--server-pid "$host_pid")
  /usr/bin/time -v -o "$work/$name.time" "$cli" batch "$work/entries.sdf" --out "$work/$name" "$@" > "$work/$name.stdout" 2> "$work/$name.stderr" &
  local timer=$! batch_pid=""
  for _ in $(seq 1 100); do batch_pid=$(pgrep -P "$timer" || true); [[ -n "$batch_pid" ]] && break; sleep 0.1; done
  "${bench[@]}" watch --pid "$batch_pid" --progress "$work/$name/reports.jsonl" --entries "$entries" "${server_args[@]}" --out "$results/$name.json" > /dev/null
  wait "$timer"
  /usr/bin/python3 bench/streaming_report.py --attach-time "$results/$name.json" "$work/$name.time" "$work/$name"
}

echo "streaming: $entries entries through one CheckEntries call"
start_host call
"${bench[@]}" grpc --target "$host_url" --entries "$entries" --server-pid "$host_pid" --out "$results/call.json" > /dev/null
stop_host

if [[ "$mode" == "--full" ]]; then
  "${bench[@]}" generate --entries "$entries" --out "$work/entries.sdf"
  echo "streaming: consistencyhost batch, embedded engine"
  watched_batch batch-embedded
  echo "streaming: consistencyhost batch --server"
  start_host batch
  watched_batch batch-server --server "$host_url"
  stop_host
fi

if [[ -n "$smoke" ]]; then echo "streaming: smoke run of $entries entries; results in $results, docs left alone"; exit 0; fi
/usr/bin/python3 bench/streaming_report.py --mode "${mode#--}"
