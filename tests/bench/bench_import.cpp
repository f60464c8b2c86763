// Import benchmark: a generated core data folder with 50,000 samples and 1,000,000 occurrences,
// imported into a fresh project; compared side by side with the sqlite3 shell loading the same
// occurrences.csv into a bare table. Each side runs in a child process so that its peak resident
// memory (ru_maxrss from wait4) is its own.
//
// Usage: bench_import [WORK_DIR] [--samples N] [--per-sample K]
#include "atollog/db/importer.hpp"
#include "atollog/db/project_store.hpp"

#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <functional>
#include <stdexcept>
#include <string>
#include <sys/resource.h>
#include <sys/wait.h>
#include <unistd.h>

namespace fs = std::filesystem;

namespace {

struct Measured {
    double seconds = 0;
    long peak_kib = 0;
};

// Runs `work` in a forked child; returns its wall time and peak RSS. Throws if the child failed.
Measured inChild(const std::function<int()>& work) {
    std::fflush(nullptr); // the child must not inherit (and print again) buffered output
    const auto start = std::chrono::steady_clock::now();
    const pid_t pid = fork();
    if (pid < 0) throw std::runtime_error("fork failed");
    if (pid == 0) {
        int rc = 1;
        try {
            rc = work();
        } catch (const std::exception& e) {
            std::fprintf(stderr, "child failed: %s\n", e.what());
        }
        std::fflush(nullptr);
        _exit(rc);
    }
    int status = 0;
    rusage usage{};
    if (wait4(pid, &status, 0, &usage) != pid) throw std::runtime_error("wait4 failed");
    const double seconds =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    if (!WIFEXITED(status) || WEXITSTATUS(status) != 0)
        throw std::runtime_error("benchmark child exited with failure");
    return {seconds, usage.ru_maxrss};
}

// Writes the folder streaming, so the generator itself stays small.
void writeFolder(const fs::path& dir, int samples, int perSample) {
    fs::remove_all(dir);
    fs::create_directories(dir);
    const int holes = 20, taxa = 500;
    const int samplesPerHole = samples / holes;
    const double runLength_m = 3.0, sampleStep_m = 1.2;
    const int runsPerHole = static_cast<int>(samplesPerHole * sampleStep_m / runLength_m) + 2;

    FILE* h = std::fopen((dir / "holes.csv").c_str(), "w");
    FILE* r = std::fopen((dir / "runs.csv").c_str(), "w");
    FILE* s = std::fopen((dir / "samples.csv").c_str(), "w");
    FILE* t = std::fopen((dir / "taxa.csv").c_str(), "w");
    FILE* o = std::fopen((dir / "occurrences.csv").c_str(), "w");
    if (!h || !r || !s || !t || !o) throw std::runtime_error("cannot write benchmark folder");
    std::fputs("hole,site,chain_km\n", h);
    std::fputs("hole,run,top_m,base_m,recovered_m\n", r);
    std::fputs("hole,sample,top_m\n", s);
    std::fputs("taxon,name,group\n", t);
    std::fputs("sample,taxon,abundance,status\n", o);
    for (int k = 0; k < taxa; ++k) std::fprintf(t, "T%03d,Benchia numera%d,benthic_foram\n", k, k);
    static const char* abundance[] = {"rare", "few", "common", "abundant", "7", "12"};
    for (int hole = 0; hole < holes; ++hole) {
        std::fprintf(h, "BH%02d,Bench site %d,%d\n", hole, hole, hole * 25);
        for (int run = 0; run < runsPerHole; ++run)
            std::fprintf(r, "BH%02d,BH%02d-R%04d,%.1f,%.1f,%.1f\n", hole, hole, run,
                         run * runLength_m, (run + 1) * runLength_m, runLength_m);
        for (int i = 0; i < samplesPerHole; ++i) {
            std::fprintf(s, "BH%02d,BH%02d-S%05d,%.2f\n", hole, hole, i, 0.1 + i * sampleStep_m);
            for (int k = 0; k < perSample; ++k) // distinct taxa per sample: k * 25 < 500
                std::fprintf(o, "BH%02d-S%05d,T%03d,%s,%s\n", hole, i, (i * 7 + k * 25) % taxa,
                             abundance[(i + k) % 6], (k % 50 == 49) ? "reworked" : "in_place");
        }
    }
    for (FILE* f : {h, r, s, t, o}) std::fclose(f);
}

} // namespace

int main(int argc, char** argv) {
    fs::path work = fs::temp_directory_path() / "atollog-bench-import";
    int samples = 50000, perSample = 20;
    for (int i = 1; i < argc; ++i) {
        const std::string a = argv[i];
        if (a == "--samples" && i + 1 < argc) samples = std::atoi(argv[++i]);
        else if (a == "--per-sample" && i + 1 < argc) perSample = std::atoi(argv[++i]);
        else work = a;
    }
    const fs::path folder = work / "folder";
    const fs::path project = work / "bench.atollog";
    const fs::path shellDb = work / "shell.sqlite";
    const long occurrences = static_cast<long>(samples) * perSample;

    std::printf("atollog import benchmark: %d samples, %ld occurrences\n", samples, occurrences);
    writeFolder(folder, samples, perSample);
    std::printf("folder: %.1f MB of CSV in %s\n",
                static_cast<double>(fs::file_size(folder / "occurrences.csv") +
                                    fs::file_size(folder / "samples.csv")) / 1e6,
                folder.c_str());

    // The sqlite3 shell loading the same occurrences.csv into a bare table (no checks, no
    // indexes): the floor for getting these rows into SQLite.
    fs::remove(shellDb);
    const std::string shellCmd = "sqlite3 '" + shellDb.string() +
                                 "' -cmd '.mode csv' '.import " +
                                 (folder / "occurrences.csv").string() + " occurrence'";
    const Measured shell = inChild([&] {
        execl("/bin/sh", "sh", "-c", shellCmd.c_str(), static_cast<char*>(nullptr));
        return 127;
    });

    for (const char* suffix : {"", "-wal", "-shm"}) fs::remove(project.string() + suffix);
    const Measured ours = inChild([&] {
        auto store = atollog::db::ProjectStore::create(project);
        const auto result = atollog::db::importCoreFolder(store, folder);
        return result.row_count > 0 ? 0 : 1;
    });

    const double rowsPerSecond = static_cast<double>(occurrences + samples) / ours.seconds;
    std::printf("\n%-34s %10s %12s\n", "", "seconds", "peak_MiB");
    std::printf("%-34s %10.3f %12.1f\n", "sqlite3 shell .import (bare table)", shell.seconds,
                static_cast<double>(shell.peak_kib) / 1024.0);
    std::printf("%-34s %10.3f %12.1f\n", "atollog import (checked, indexed)", ours.seconds,
                static_cast<double>(ours.peak_kib) / 1024.0);
    std::printf("\nrows per second (occurrences + samples): %.0f\n", rowsPerSecond);
    std::printf("time ratio atollog / sqlite3 shell: %.2f (target <= 2.0)\n",
                ours.seconds / shell.seconds);
    std::printf("peak memory: %.1f MiB (target < 300 MiB)\n",
                static_cast<double>(ours.peak_kib) / 1024.0);
    return 0;
}
