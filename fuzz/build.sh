#!/usr/bin/env bash
# Builds the fuzzing harness and instruments the reader assemblies for AFL++ (SharpFuzz).
# Output: $FUZZ_OUT/bin (default artifacts/fuzz/bin). Needs the .NET SDK and the local tool manifest (.config/).
set -euo pipefail
root="$(cd "$(dirname "$0")/.." && pwd)"
out="${FUZZ_OUT:-$root/artifacts/fuzz}"
cd "$root"
dotnet tool restore >/dev/null
dotnet build fuzz/ConsistencyHost.Fuzzing/ConsistencyHost.Fuzzing.csproj -c Release -o "$out/build" -nologo -v quiet
# Instrument a fresh copy: an incremental build may leave an already instrumented assembly in place otherwise.
rm -rf "$out/bin" && cp -r "$out/build" "$out/bin"
for assembly in ConsistencyHost.Chemistry ConsistencyHost.Spectra; do
  dotnet sharpfuzz "$out/bin/$assembly.dll"
done
