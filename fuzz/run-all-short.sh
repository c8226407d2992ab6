#!/usr/bin/env bash
# Fuzzes each of the six readers for FUZZ_SECONDS (default 30) one after another: about 3.5 minutes with the build.
# Exits 1 when any reader's run found a crash or a hang (each printed as base64 by fuzz/run.sh), 2 on a tool failure.
set -uo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
"$here/build.sh" || exit 2
status=0
for reader in smiles molfile sdf reported jcamp nmredata; do
  FUZZ_SKIP_BUILD=1 "$here/run.sh" "$reader" "${FUZZ_SECONDS:-30}"
  code=$?
  [ "$code" -gt "$status" ] && status=$code
done
exit "$status"
