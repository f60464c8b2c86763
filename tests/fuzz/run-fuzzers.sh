#!/usr/bin/env bash
# Builds the libFuzzer targets with clang in build-fuzz/ and runs each for SECONDS (default 60),
# starting from the seed corpus in tests/fuzz/corpus/<target>/. Prints, per target, the inputs
# run and the size of the corpus it grew; exits non-zero when any target found a crash, a
# sanitizer report, a leak or a timeout (the input is kept in build-fuzz/fuzz-runs/<target>/).
# Usage: tests/fuzz/run-fuzzers.sh [SECONDS]   env: ATOLLOG_FUZZ_SEED (libFuzzer -seed),
#        ATOLLOG_FUZZ_JOBS (build jobs, default 2)
set -euo pipefail
cd "$(dirname "$0")/../.."

seconds=${1:-60}
seed=${ATOLLOG_FUZZ_SEED:-20310117}
jobs=${ATOLLOG_FUZZ_JOBS:-2}
targets=(fuzz_csv_reader fuzz_core_folder fuzz_project_open)

CC=clang CXX=clang++ cmake -S . -B build-fuzz -DATOLLOG_FUZZ=ON -DATOLLOG_BUILD_BENCH=OFF \
    -DCMAKE_BUILD_TYPE=RelWithDebInfo >/dev/null
cmake --build build-fuzz -j "$jobs" --target fuzzers

runs="$PWD/build-fuzz/fuzz-runs"
failed=()
for target in "${targets[@]}"; do
    dir="$runs/$target"
    mkdir -p "$dir/corpus"
    rm -f "$dir"/crash-* "$dir"/leak-* "$dir"/timeout-* "$dir"/oom-*
    # The first corpus folder receives new inputs; the checked-in seeds are only read.
    status=0
    UBSAN_OPTIONS=print_stacktrace=1 \
        "build-fuzz/tests/fuzz/$target" -max_total_time="$seconds" -seed="$seed" -timeout=30 \
        -print_final_stats=1 -artifact_prefix="$dir/" \
        "$dir/corpus" "tests/fuzz/corpus/$target" >"$dir/log.txt" 2>&1 || status=$?
    executions=$(sed -n 's/^stat::number_of_executed_units: *//p' "$dir/log.txt" | tail -1)
    corpus_files=$(find "$dir/corpus" "tests/fuzz/corpus/$target" -type f | wc -l)
    corpus_kb=$(du -sk "$dir/corpus" | cut -f1)
    findings=$(find "$dir" -maxdepth 1 -name 'crash-*' -o -maxdepth 1 -name 'leak-*' \
        -o -maxdepth 1 -name 'timeout-*' -o -maxdepth 1 -name 'oom-*' | wc -l)
    printf '%-18s %4ss  seed %s  %10s executions  corpus %5d files (%d KiB grown)  findings %d  exit %d\n' \
        "$target" "$seconds" "$seed" "${executions:-?}" "$corpus_files" "$corpus_kb" "$findings" "$status"
    if [ "$status" -ne 0 ] || [ "$findings" -ne 0 ]; then
        failed+=("$target")
        grep -m 20 -E 'ERROR|runtime error|terminate|what\(\)|SUMMARY|Test unit written' \
            "$dir/log.txt" || true
        echo "  full log: $dir/log.txt (seed $seed)"
    fi
done

if [ ${#failed[@]} -ne 0 ]; then
    echo "run-fuzzers: findings in ${failed[*]}" >&2
    exit 1
fi
echo "run-fuzzers: no findings"
