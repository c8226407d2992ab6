#!/usr/bin/env bash
# Fuzzes one reader with AFL++ for a number of seconds: fuzz/run.sh <smiles|molfile|sdf|reported|jcamp|nmredata> <seconds>
# Exits 1 when AFL saved a crash or a hang, and prints each such input as base64 with the harness's own account of it.
# FUZZ_SKIP_BUILD=1 reuses $FUZZ_OUT/bin; FUZZ_OUT (default artifacts/fuzz) holds the build and findings/<reader>.
set -euo pipefail
root="$(cd "$(dirname "$0")/.." && pwd)"
out="${FUZZ_OUT:-$root/artifacts/fuzz}"
reader="${1:?usage: fuzz/run.sh <reader> <seconds>}"
seconds="${2:?usage: fuzz/run.sh <reader> <seconds>}"
[ -d "$root/fuzz/corpus/$reader" ] || { echo "no corpus for reader '$reader'" >&2; exit 2; }
command -v afl-fuzz >/dev/null || { echo "afl-fuzz not found: apt-get install -y afl++" >&2; exit 2; }
[ "${FUZZ_SKIP_BUILD:-0}" = 1 ] || "$root/fuzz/build.sh"

findings="$out/findings/$reader"
rm -rf "$findings" && mkdir -p "$out/findings"
# SharpFuzz targets are not AFL-compiled binaries, and core dumps are not routed to a file here.
export AFL_SKIP_BIN_CHECK=1 AFL_NO_UI=1 AFL_SKIP_CPUFREQ=1 AFL_I_DONT_CARE_ABOUT_MISSING_CRASHES=1 AFL_NO_AFFINITY=1
# 5 s per input: far above any reader's time on these small inputs, well below "never returns".
# No core files (a .NET core is hundreds of MB, and AFL saves the input anyway); only the log's tail is kept.
ulimit -c 0
afl-fuzz -i "$root/fuzz/corpus/$reader" -o "$findings" -x "$root/fuzz/dict/$reader.dict" -t 5000 -m none -V "$seconds" \
  -- "$(command -v dotnet)" "$out/bin/ConsistencyHost.Fuzzing.dll" "$reader" 2>&1 | tail -n 200 > "$out/afl-$reader.log"
[ "${PIPESTATUS[0]}" = 0 ] || {
  echo "afl-fuzz failed for $reader; last lines of $out/afl-$reader.log:" >&2; tail -20 "$out/afl-$reader.log" >&2; exit 2; }

stat() { awk -F' *: *' -v k="$1" '$1 == k { print $2 }' "$findings/default/fuzzer_stats"; }
echo "$reader: $(stat execs_done) executions in $(stat run_time) s, $(stat corpus_count) corpus entries, $(stat saved_crashes) crashes, $(stat saved_hangs) hangs"
found=0
for file in "$findings"/default/crashes/id:* "$findings"/default/hangs/id:*; do
  [ -e "$file" ] || continue
  found=1
  echo "--- $reader ${file#"$findings"/default/} (base64):"
  base64 -w 0 "$file"; echo
  # The uninstrumented build: instrumented code writes to a coverage map only afl-fuzz sets up.
  timeout 60 dotnet "$out/build/ConsistencyHost.Fuzzing.dll" "$reader" --replay "$file" | head -30 || true
done
exit "$found"
