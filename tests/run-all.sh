#!/usr/bin/env bash
# The test command of the README: install what is missing; build with warnings as errors and run
# every test; build the libFuzzer targets with clang and run each for 60 seconds; last, build the
# tests with AddressSanitizer + UBSan and run them again (see DEVELOPERS.md, "Hardening").
set -euo pipefail
cd "$(dirname "$0")/.."

bash .ci/install-deps
jobs=$(nproc)

cmake --preset ci
cmake --build --preset ci -j "$jobs"
ctest --preset ci -j "$jobs"

ATOLLOG_FUZZ_JOBS="$jobs" bash tests/fuzz/run-fuzzers.sh 60

cmake --preset ci-sanitize
cmake --build --preset ci-sanitize -j "$jobs"
ASAN_OPTIONS=detect_leaks=1 LSAN_OPTIONS=suppressions="$PWD/tests/lsan-suppressions.txt" \
    UBSAN_OPTIONS=print_stacktrace=1 ctest --preset ci-sanitize -j "$jobs"
