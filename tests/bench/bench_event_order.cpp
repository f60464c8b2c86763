// Benchmark of the event-order graph: 100 holes x 500 taxa (1,000 events: a base and a top
// each), generated here (invented, deterministic): a true order of ages, each hole at its own
// accumulation rate seeing about 60 % of the events, picks scattered around their true depth
// within sample-spaced brackets, and a few planted contradictions (tops moved far down, as
// caved finds would be). Prints the time to build the graph with its components, composite and
// conflicts (target under 0.2 s), and the counts of edges and conflicts.
#include "atollog/engine/event_order_graph.hpp"

#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdint>
#include <iostream>
#include <random>
#include <string>
#include <vector>

using namespace atollog;

namespace {

constexpr int kHoles = 100;
constexpr int kTaxa = 500;
constexpr int kPlanted = 8; // contradictions planted on purpose
constexpr int kRuns = 5;

/// Uniform in [0, 1) from the top 53 bits (the standard distributions differ between libraries).
double uniform01(std::mt19937_64& rng) { return static_cast<double>(rng() >> 11) * 0x1.0p-53; }

CorrelationData makeBenchData() {
    std::mt19937_64 rng(20240917); // fixed seed: the same data every run
    CorrelationData d;
    std::vector<double> true_age_ma;
    for (int t = 0; t < kTaxa; ++t) {
        const std::string taxon = "TX" + std::to_string(t);
        const double base_ma = 1 + 39 * uniform01(rng);
        const double top_ma = std::max(0.05, base_ma - (0.5 + 7.5 * uniform01(rng)));
        for (const bool is_base : {true, false}) {
            SequenceEvent e;
            e.id = (is_base ? "B " : "T ") + taxon;
            e.kind = is_base ? SequenceEventKind::Base : SequenceEventKind::Top;
            e.taxon = taxon;
            d.events.push_back(e);
            true_age_ma.push_back(is_base ? base_ma : top_ma);
        }
    }
    for (int h = 0; h < kHoles; ++h) {
        d.holes.push_back("BH" + std::to_string(h));
        d.surfaces_m.emplace_back();
        const double rate_m_per_myr = 20 + 40 * uniform01(rng);
        // Sample spacing of this hole, whole centimetres, so the brackets print as logged.
        const long step_cm = 100 + static_cast<long>(rng() % 201);
        std::vector<double> samples;
        for (long z = step_cm; z < static_cast<long>(45 * 100 * rate_m_per_myr); z += step_cm)
            samples.push_back(static_cast<double>(z) / 100);
        d.sampled_levels_m.push_back(samples);
        for (std::size_t e = 0; e < d.events.size(); ++e) {
            if (uniform01(rng) > 0.6)
                continue;
            // Pick error: about +/- 1.5 m (a sum of three uniforms), then the sample holding it.
            const double noise_m = (uniform01(rng) + uniform01(rng) + uniform01(rng) - 1.5);
            const double depth_cm = 100 * (true_age_ma[e] * rate_m_per_myr + noise_m);
            const long level_cm = std::max(step_cm, static_cast<long>(depth_cm) / step_cm * step_cm);
            const bool is_base = d.events[e].kind == SequenceEventKind::Base;
            // A base lies between its lowest find and the next sample below; a top between the
            // next sample above and its highest find.
            const long shallow_cm = is_base ? level_cm : level_cm - step_cm;
            EventLevel l{static_cast<std::size_t>(h), e, static_cast<double>(shallow_cm) / 100,
                         static_cast<double>(shallow_cm + step_cm) / 100,
                         static_cast<double>(level_cm) / 100};
            d.levels.push_back(l);
        }
    }
    // Planted: a top found 80 m too deep in a few holes.
    for (int planted = 0; planted < kPlanted;) {
        EventLevel& l = d.levels[static_cast<std::size_t>(rng() % d.levels.size())];
        if (d.events[l.event].kind != SequenceEventKind::Top)
            continue;
        ++planted;
        l.shallow_m += 80;
        l.deep_m += 80;
        l.level_m += 80;
    }
    return d;
}

/// Ordered pairs that the holes show (every pair, not only covering ones), for comparison.
std::uint64_t allPairsShown(const CorrelationData& d) {
    std::vector<std::vector<double>> deep(d.holes.size());
    for (const EventLevel& l : d.levels)
        deep[l.hole].push_back(l.deep_m);
    for (auto& v : deep)
        std::sort(v.begin(), v.end());
    std::uint64_t pairs = 0;
    for (const EventLevel& l : d.levels) {
        const auto& v = deep[l.hole];
        pairs += static_cast<std::uint64_t>(std::lower_bound(v.begin(), v.end(), l.shallow_m) -
                                            v.begin());
    }
    return pairs;
}

} // namespace

int main() {
    const CorrelationData data = makeBenchData();
    std::cout << "event-order graph: " << data.holes.size() << " holes, " << data.events.size()
              << " events, " << data.levels.size() << " levels\n";

    double best_s = 1e300;
    EventOrderGraph g;
    for (int run = 0; run < kRuns; ++run) {
        const auto start = std::chrono::steady_clock::now();
        g = buildEventOrderGraph(data);
        const double s =
            std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
        best_s = std::min(best_s, s);
        std::cout << "  run " << run + 1 << ": " << s << " s\n";
    }

    std::size_t supports = 0, rule_edges = 0;
    for (const OrderEdge& e : g.edges) {
        supports += e.holes.size();
        rule_edges += e.rule.empty() ? 0 : 1;
    }
    std::vector<std::size_t> sizes(data.events.size(), 0);
    for (int c : g.component)
        ++sizes[static_cast<std::size_t>(c)];
    const std::size_t components = static_cast<std::size_t>(
        std::count_if(sizes.begin(), sizes.end(), [](std::size_t s) { return s > 0; }));
    std::size_t longest_cycle = 0;
    for (const OrderConflict& k : g.conflicts)
        longest_cycle = std::max(longest_cycle, k.cycle.size());

    std::cout << "best of " << kRuns << ": " << best_s << " s (target < 0.2 s)\n"
              << "edges: " << g.edges.size() << " (" << rule_edges << " with a rule), "
              << supports << " hole supports kept of " << allPairsShown(data)
              << " ordered pairs the holes show\n"
              << "components: " << components << ", largest "
              << *std::max_element(sizes.begin(), sizes.end()) << " events\n"
              << "conflicts: " << g.conflicts.size() << ", longest cycle shown " << longest_cycle
              << " events\n";
    if (!g.conflicts.empty())
        std::cout << "first conflict: " << g.conflicts.front().message << "\n";
    return 0;
}
