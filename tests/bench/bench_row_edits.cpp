// Row-edit benchmark: the time of one applyEdit (write transaction, scoped load, the engine's
// validateDataset before and after, write, commit) on the demo archipelago and on a project of
// the import benchmark's size (20 holes, 50,000 samples, 1,000,000 occurrences), side by side
// with what checking the whole project once costs (loadDataset + validateDataset), which an
// edit would pay twice without the scope. Medians of N edits.
//
// Usage: bench_row_edits [WORK_DIR] [--samples N] [--per-sample K] [--repeats N]
#include "atollog/db/importer.hpp"
#include "atollog/db/project_edits.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/engine/validation.hpp"

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <functional>
#include <string>
#include <vector>

namespace fs = std::filesystem;
using namespace atollog;
using atollog::db::RowEdit;
using Clock = std::chrono::steady_clock;

namespace {

double medianMs(int repeats, const std::function<void(int)>& work) {
    std::vector<double> ms;
    for (int i = 0; i < repeats; ++i) {
        const auto start = Clock::now();
        work(i);
        ms.push_back(std::chrono::duration<double, std::milli>(Clock::now() - start).count());
    }
    std::sort(ms.begin(), ms.end());
    return ms[ms.size() / 2];
}

// The layout of bench_import's folder, built in memory.
CoreDataset benchDataset(int samples, int per_sample) {
    CoreDataset d;
    const int holes = 20, taxa = 500;
    const int per_hole = samples / holes;
    const double run_m = 3.0, step_m = 1.2;
    const int runs = static_cast<int>(per_hole * step_m / run_m) + 2;
    static const AbundanceClass classes[] = {AbundanceClass::Rare, AbundanceClass::Few,
                                             AbundanceClass::Common, AbundanceClass::Abundant};
    for (int k = 0; k < taxa; ++k) {
        char id[16];
        std::snprintf(id, sizeof id, "T%03d", k);
        d.taxa.push_back({id, "Benchia numera" + std::to_string(k), TaxonGroup::BenthicForam, {}});
    }
    for (int h = 0; h < holes; ++h) {
        char hole[16];
        std::snprintf(hole, sizeof hole, "BH%02d", h);
        d.holes.push_back({hole, "Bench site " + std::to_string(h), {}, {}, {}, h * 25.0,
                           HoleKind::Core, {}});
        for (int r = 0; r < runs; ++r) {
            char run[24];
            std::snprintf(run, sizeof run, "%s-R%04d", hole, r);
            d.runs.push_back({hole, run, r * run_m, (r + 1) * run_m, run_m, {}});
        }
        for (int i = 0; i < per_hole; ++i) {
            char sample[24];
            std::snprintf(sample, sizeof sample, "%s-S%05d", hole, i);
            const double top_m = 0.1 + i * step_m;
            d.samples.push_back({hole, sample, top_m, top_m, "", {}});
            for (int k = 0; k < per_sample; ++k) {
                d.occurrences.push_back({sample, d.taxa[static_cast<std::size_t>((i * 7 + k * 25) % taxa)].taxon,
                                         classes[(i + k) % 4],
                                         k % 50 == 49 ? OccurrenceStatus::Reworked
                                                      : OccurrenceStatus::InPlace,
                                         {}});
            }
        }
    }
    return d;
}

struct Figures {
    double run_update_ms, occurrence_update_ms, sample_add_ms, sample_remove_ms, whole_check_ms;
};

Figures measure(db::ProjectStore& store, int repeats) {
    const CoreDataset data = store.loadDataset();
    Figures f{};
    const CoreRun run = data.runs.at(data.runs.size() / 2);
    CoreRun changed = run;
    changed.recovered_m = run.recovered_m * 0.5;
    f.run_update_ms = medianMs(repeats, [&](int i) {
        db::applyEdit(store, i % 2 ? RowEdit::update(changed, run) : RowEdit::update(run, changed));
    });
    const Occurrence occurrence = data.occurrences.at(data.occurrences.size() / 2);
    Occurrence recounted = occurrence;
    recounted.abundance = std::int64_t{42};
    f.occurrence_update_ms = medianMs(repeats, [&](int i) {
        db::applyEdit(store, i % 2 ? RowEdit::update(recounted, occurrence)
                                   : RowEdit::update(occurrence, recounted));
    });
    Sample added = data.samples.at(data.samples.size() / 2);
    added.sample += "-bench";
    std::vector<RowEdit> undo;
    f.sample_add_ms = medianMs(repeats, [&](int) {
        undo.push_back(db::applyEdit(store, RowEdit::add(added)).inverse);
        added.sample += "x";
    });
    f.sample_remove_ms = medianMs(repeats, [&](int i) { db::applyEdit(store, undo.at(static_cast<std::size_t>(i))); });
    f.whole_check_ms = medianMs(std::max(3, repeats / 4), [&](int) {
        const CoreDataset all = store.loadDataset();
        if (validateDataset(all).size() == static_cast<std::size_t>(-1)) std::abort();
    });
    return f;
}

void print(const char* name, const Figures& f) {
    std::printf("%-22s %10.2f %10.2f %10.2f %10.2f %14.1f %8.1f\n", name, f.run_update_ms,
                f.occurrence_update_ms, f.sample_add_ms, f.sample_remove_ms, f.whole_check_ms,
                f.whole_check_ms / f.run_update_ms);
}

} // namespace

int main(int argc, char** argv) {
    fs::path work = fs::temp_directory_path() / "atollog-bench-edits";
    int samples = 50000, per_sample = 20, repeats = 21;
    for (int i = 1; i < argc; ++i) {
        const std::string a = argv[i];
        if (a == "--samples" && i + 1 < argc) samples = std::atoi(argv[++i]);
        else if (a == "--per-sample" && i + 1 < argc) per_sample = std::atoi(argv[++i]);
        else if (a == "--repeats" && i + 1 < argc) repeats = std::atoi(argv[++i]);
        else work = a;
    }
    fs::create_directories(work);
    const fs::path demo_project = work / "demo.atollog";
    const fs::path bench_project = work / "bench.atollog";
    for (const fs::path& p : {demo_project, bench_project})
        for (const char* suffix : {"", "-wal", "-shm"}) fs::remove(p.string() + suffix);

    std::printf("atollog row-edit benchmark: median of %d edits, ms\n\n", repeats);
    auto demo = db::ProjectStore::create(demo_project);
    db::importCoreFolder(demo, ATOLLOG_DEMO_DIR);
    auto bench = db::ProjectStore::create(bench_project);
    bench.replaceDataset(benchDataset(samples, per_sample));

    std::printf("%-22s %10s %10s %10s %10s %14s %8s\n", "project", "run upd", "occ upd",
                "sample add", "sample rm", "whole check", "ratio");
    print("demo archipelago", measure(demo, repeats));
    char name[64];
    std::snprintf(name, sizeof name, "%dk samples, %dk occ", samples / 1000,
                  samples * per_sample / 1000);
    print(name, measure(bench, repeats));
    std::printf("\nwhole check = loadDataset + validateDataset once; ratio = whole check / run "
                "update\n");
    return 0;
}
