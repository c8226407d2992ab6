#!/usr/bin/env bash
# Installs the Debian packages some tests call, when missing: the Python gRPC client and tools (interop test),
# RDKit with its data sets (chemistry oracle tests), headless Chromium (the batch report is screenshotted),
# AFL++ (the short fuzzing run of .ci/proofs), curl, and kubectl (Debian's kubernetes-client; the deployment
# tests read the Kubernetes manifests offline). `dotnet test` runs this before each test project (see
# tests/Directory.Build.targets), so the README's test command works on a machine with only the .NET SDK and apt.
# Idempotent and quick when everything is present; serialised with a lock because test projects run in parallel.
# Without root or password-less sudo it stops with the command to run, rather than letting tests fail obscurely.
set -euo pipefail

packages=(python3-grpcio python3-grpc-tools python3-rdkit rdkit-data chromium afl++ curl)

missing_packages() {
  local missing=()
  for package in "${packages[@]}"; do
    dpkg-query -W -f='${Status}' "$package" 2>/dev/null | grep -q "install ok installed" || missing+=("$package")
  done
  command -v kubectl >/dev/null || missing+=(kubernetes-client)
  echo "${missing[*]}"
}

command -v dpkg-query >/dev/null || { echo "debian-packages.sh: not a Debian system; install the packages listed in tests/setup/debian-packages.sh by hand" >&2; exit 0; }
[[ -z "$(missing_packages)" ]] && exit 0

exec 9>"${TMPDIR:-/tmp}/consistencyhost-debian-packages.lock"
flock 9
missing="$(missing_packages)"   # another test project may have installed them while this one waited
[[ -z "$missing" ]] && exit 0

if [[ "$(id -u)" -eq 0 ]]; then
  run=()
elif sudo -n true 2>/dev/null; then
  run=(sudo -n)
else
  echo "debian-packages.sh: the tests need these Debian packages: $missing" >&2
  echo "  install them once with: sudo apt-get install -y $missing" >&2
  exit 1
fi

echo "debian-packages.sh: installing $missing" >&2
"${run[@]}" apt-get update -qq
# shellcheck disable=SC2086
DEBIAN_FRONTEND=noninteractive "${run[@]}" apt-get install -y -qq $missing >/dev/null
