#!/usr/bin/env bash
# The README's main-job command: install what is missing, build, load the demo archipelago into a
# project file and print every analysis atollog has so far.
set -euo pipefail
cd "$(dirname "$0")/.."

bash .ci/install-deps
cmake --preset default >/dev/null
cmake --build --preset default -j "$(nproc)" --target atollog

atollog=build/app/atollog
project=build/demo.atollog
rm -f "$project" "$project-wal" "$project-shm"

run() { echo; echo "\$ atollog $*"; "$atollog" "$@"; }

run import "$project" cores-demo/archipelago
# check exits 1 when it reports anything; the demo carries a few deliberate warnings.
run check "$project" || [ $? -eq 1 ]
run show "$project"
run history "$project"
