// Benchmark of datum picks: 2,000 taxa, 20,000 samples, 200,000 occurrences, generated here
// (invented, deterministic), picked by pickDatums and, side by side in the same run, by a plain
// all-pairs scan written below (for each event: every sample x every occurrence). Prints the
// times and their ratio; the target is all picks in under 1 s.
#include "atollog/engine/datum_picks.hpp"

#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdint>
#include <iostream>
#include <limits>
#include <random>
#include <string>
#include <vector>

using namespace atollog;

namespace {

constexpr int kTaxa = 2000;
constexpr int kHoles = 20;
constexpr int kSamplesPerHole = 1000; // 20,000 samples
constexpr int kOccurrences = 200000;

CoreDataset makeBenchDataset() {
    std::mt19937_64 rng(20240611); // fixed seed: the same data every run
    CoreDataset d;
    for (int h = 0; h < kHoles; ++h) {
        Hole hole;
        hole.hole = "BH" + std::to_string(h);
        d.holes.push_back(hole);
        for (int i = 0; i < kSamplesPerHole; ++i) {
            Sample s;
            s.hole = hole.hole;
            s.sample = hole.hole + "-" + std::to_string(i);
            s.top_m = s.base_m = 0.5 * i;
            d.samples.push_back(s);
        }
    }
    // Each taxon lives over a window of sample levels; occurrences fall inside it.
    std::vector<int> first(kTaxa), span(kTaxa);
    for (int t = 0; t < kTaxa; ++t) {
        first[t] = static_cast<int>(rng() % (kSamplesPerHole - 100));
        span[t] = 20 + static_cast<int>(rng() % 80);
    }
    d.occurrences.reserve(kOccurrences);
    for (int k = 0; k < kOccurrences; ++k) {
        const int t = static_cast<int>(rng() % kTaxa);
        const int h = static_cast<int>(rng() % kHoles);
        const int level = first[t] + static_cast<int>(rng() % span[t]);
        Occurrence o;
        o.sample = d.samples[static_cast<std::size_t>(h * kSamplesPerHole + level)].sample;
        o.taxon = "TX" + std::to_string(t);
        const auto roll = rng() % 100;
        o.status = roll < 3 ? OccurrenceStatus::Reworked
                            : roll < 6 ? OccurrenceStatus::Caved : OccurrenceStatus::InPlace;
        d.occurrences.push_back(std::move(o));
    }
    for (int t = 0; t < kTaxa; ++t)
        for (EventKind kind : {EventKind::Base, EventKind::Top}) {
            TimeScaleEvent e;
            e.taxon = "TX" + std::to_string(t);
            e.event = (kind == EventKind::Base ? "B " : "T ") + e.taxon;
            e.kind = kind;
            e.age_ma = 1.0 + 0.001 * t;
            e.age_sd_ma = 0.01;
            d.events.push_back(e);
        }
    return d;
}

/// The naive reference: for each event and hole, every sample, and for each sample every
/// occurrence, to find the extreme sample with the taxon and the examined neighbour beyond it.
/// Returns a checksum of the quoted midpoints so both methods can be compared.
double allPairsScan(const CoreDataset& d, std::size_t event_limit) {
    double checksum = 0;
    for (std::size_t ei = 0; ei < event_limit; ++ei) {
        const TimeScaleEvent& e = d.events[ei];
        for (const Hole& h : d.holes) {
            const Sample* found = nullptr;
            for (const Sample& s : d.samples) {
                if (s.hole != h.hole)
                    continue;
                for (const Occurrence& o : d.occurrences)
                    if (o.sample == s.sample && o.taxon == e.taxon &&
                        o.status == OccurrenceStatus::InPlace &&
                        (!found || (e.kind == EventKind::Top ? s.top_m < found->top_m
                                                             : s.top_m > found->top_m)))
                        found = &s;
            }
            if (!found)
                continue;
            const Sample* beyond = nullptr;
            for (const Sample& s : d.samples) {
                if (s.hole != h.hole)
                    continue;
                const bool farther = e.kind == EventKind::Top ? s.top_m < found->top_m
                                                              : s.top_m > found->top_m;
                const bool nearer = !beyond || (e.kind == EventKind::Top ? s.top_m > beyond->top_m
                                                                         : s.top_m < beyond->top_m);
                if (!farther || !nearer)
                    continue;
                bool examined = s.kind == "barren";
                for (const Occurrence& o : d.occurrences)
                    examined = examined || o.sample == s.sample;
                if (examined)
                    beyond = &s;
            }
            if (beyond)
                checksum += 0.5 * (found->top_m + beyond->top_m);
        }
    }
    return checksum;
}

double secondsSince(std::chrono::steady_clock::time_point t0) {
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
}

} // namespace

int main() {
    const CoreDataset d = makeBenchDataset();
    std::cout << "bench_picks: " << kTaxa << " taxa, " << d.samples.size() << " samples, "
              << d.occurrences.size() << " occurrences, " << d.events.size() << " events, "
              << d.holes.size() << " holes\n";

    // Best of three, to keep one-off noise (page faults, frequency changes) out of the figure.
    double best_s = std::numeric_limits<double>::infinity();
    std::vector<DatumPick> picks;
    for (int rep = 0; rep < 3; ++rep) {
        const auto t0 = std::chrono::steady_clock::now();
        picks = pickDatums(d, BiostratSettings{});
        best_s = std::min(best_s, secondsSince(t0));
    }
    std::size_t found = 0;
    for (const DatumPick& p : picks)
        found += p.found ? 1 : 0;
    std::cout << "pickDatums: " << picks.size() << " picks (" << found << " found) in "
              << best_s * 1000.0 << " ms (target < 1000 ms: " << (best_s < 1.0 ? "met" : "MISSED")
              << ")\n";

    // The naive scan is far too slow for all 4,000 events; time a few and scale linearly (its
    // cost is the same for every event: holes x samples x occurrences).
    const std::size_t naive_events = 2;
    const auto t0 = std::chrono::steady_clock::now();
    const double naive_checksum = allPairsScan(d, naive_events);
    const double naive_s = secondsSince(t0);
    const double naive_all_s = naive_s * static_cast<double>(d.events.size()) / naive_events;

    double indexed_checksum = 0;
    for (const DatumPick& p : picks)
        if (p.found && !p.open_ended &&
            (p.event == d.events[0].event || p.event == d.events[1].event))
            indexed_checksum += p.depth_m;
    std::cout << "all-pairs scan: " << naive_events << " events in " << naive_s * 1000.0
              << " ms -> " << naive_all_s << " s for all " << d.events.size()
              << " events (scaled)\n"
              << "ratio all-pairs / pickDatums: " << naive_all_s / best_s << "\n"
              << "checksum of the same midpoints: indexed " << indexed_checksum << ", all-pairs "
              << naive_checksum << (std::abs(indexed_checksum - naive_checksum) < 1e-6
                                        ? " (agree)\n"
                                        : " (DISAGREE)\n");
    return 0;
}
