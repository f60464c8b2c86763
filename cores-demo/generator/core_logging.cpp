#include "core_logging.hpp"

#include "reef_facies.hpp"
#include "rounding.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::demo {
namespace {

/// Depths where a logged interval must end so the surface there is seen: the hiatuses, the
/// hardgrounds and the top of the basalt.
std::vector<double> plannedSurfacesM(const TrueHoleHistory& h) {
    std::vector<double> depths;
    for (std::size_t i = 1; i < h.reef_segments.size(); ++i)
        depths.push_back(h.reef_segments[i].top_m);
    depths.insert(depths.end(), h.hardground_depths_m.begin(), h.hardground_depths_m.end());
    depths.push_back(h.basalt_top_m);
    std::sort(depths.begin(), depths.end());
    return depths;
}

/// Recovery in reef rock is poor and erratic: mostly 30-90 %, some runs that lose almost all
/// core in cavities and rubble, a few nearly complete ones in massive coral. Basalt recovers well.
double drawRecoveryFraction(bool in_basalt, DemoRng& rng) {
    if (in_basalt) return rng.uniform(0.80, 1.0);
    const double kind = rng.uniform01();
    if (kind < 0.14) return rng.uniform(0.08, 0.20);
    if (kind < 0.88) return rng.uniform(0.30, 0.90);
    return rng.uniform(0.92, 1.0);
}

} // namespace

double loggedBaseM(const CoreRun& run) { return std::min(run.base_m, run.top_m + run.recovered_m); }

std::vector<CoreRun> drillRuns(const IslandPlan& plan, DemoRng& rng) {
    const TrueHoleHistory& h = plan.history;
    const std::vector<double> surfaces = plannedSurfacesM(h);
    std::vector<CoreRun> runs;
    bool expanded_done = !plan.expanded_run_near_m.has_value();
    double top_m = 0;
    while (top_m < h.total_depth_m - 1e-9) {
        double base_m = roundDp(top_m + rng.uniform(1.5, 3.0), 1);
        // A run boundary right at a surface would hide it in the unrecovered gap below the
        // previous run, so such runs are drilled a little longer.
        for (double s : surfaces)
            if (std::abs(base_m - s) < 0.25) base_m = roundDp(s + 0.4, 1);
        base_m = std::min(base_m, h.total_depth_m);
        CoreRun run;
        run.hole = h.hole;
        run.run = h.hole + "-R" + (runs.size() + 1 < 10 ? "0" : "") + std::to_string(runs.size() + 1);
        run.top_m = top_m;
        run.base_m = base_m;
        const double cored_m = base_m - top_m;
        double recovered_m = cored_m * drawRecoveryFraction(top_m >= h.basalt_top_m, rng);
        bool has_surface = false;
        for (double s : surfaces)
            if (s > top_m && s < base_m) {
                // Recover at least 15 cm below the surface so it lies in logged core.
                recovered_m = std::max(recovered_m, std::min(cored_m, s - top_m + 0.15));
                has_surface = true;
            }
        if (!expanded_done && !has_surface && top_m >= *plan.expanded_run_near_m) {
            recovered_m = cored_m * 1.04; // core expansion: the one deliberate over-100 % run
            expanded_done = true;
        }
        run.recovered_m = roundDp(recovered_m, 2);
        runs.push_back(run);
        top_m = base_m;
    }
    return runs;
}

std::vector<double> drawCoreOffsets(const IslandPlan& plan, const std::vector<CoreRun>& runs,
                                    DemoRng& position_rng) {
    const std::vector<double> surfaces = plannedSurfacesM(plan.history);
    std::vector<double> offsets;
    for (const auto& run : runs) {
        bool cuts_surface = false;
        for (double s : surfaces) cuts_surface = cuts_surface || (s > run.top_m && s < run.base_m);
        const double lost_m = std::max(0.0, run.cored_m() - run.recovered_m);
        // Always draw, so one run's surface does not shift the offsets of the runs after it.
        const double offset_m = position_rng.uniform(0.0, 1.0) * lost_m;
        offsets.push_back(cuts_surface ? 0.0 : offset_m);
    }
    return offsets;
}

double trueDepthOfLoggedM(const std::vector<CoreRun>& runs, const std::vector<double>& offsets_m,
                          double logged_m) {
    for (std::size_t i = 0; i < runs.size(); ++i)
        if (logged_m >= runs[i].top_m && logged_m <= loggedBaseM(runs[i]))
            return logged_m + offsets_m[i];
    return logged_m; // not in logged core (a mislabelled depth): taken as read
}

std::vector<LithInterval> logIntervals(const IslandPlan& plan, const std::vector<CoreRun>& runs,
                                       const std::vector<double>& offsets_m, DemoRng& rng) {
    const TrueHoleHistory& h = plan.history;
    const std::vector<double> surfaces = plannedSurfacesM(h);
    std::vector<LithInterval> intervals;
    for (std::size_t r = 0; r < runs.size(); ++r) {
        const CoreRun& run = runs[r];
        const double offset_m = offsets_m[r];
        const double top_m = run.top_m;
        const double base_m = roundDp(loggedBaseM(run), 2);
        if (base_m - top_m < 0.05) continue; // a few centimetres of rubble are not logged
        std::vector<double> cuts;
        for (double s : surfaces)
            if (s > top_m && s < base_m) cuts.push_back(s);
        // Besides the surfaces, the logger splits longer core where the rock changes.
        const int extra_cuts = std::min(2, static_cast<int>((base_m - top_m) / 0.9));
        for (int i = 0; i < extra_cuts; ++i) {
            const double c = roundDp(rng.uniform(top_m + 0.1, base_m - 0.1), 2);
            bool clear = true;
            for (double other : cuts) clear = clear && std::abs(other - c) >= 0.1;
            if (clear) cuts.push_back(c);
        }
        cuts.push_back(base_m);
        std::sort(cuts.begin(), cuts.end());
        double piece_top_m = top_m;
        for (double piece_base_m : cuts) {
            LithInterval iv =
                describeInterval(h, piece_top_m + offset_m, piece_base_m + offset_m, rng);
            iv.top_m = piece_top_m; // logged where the core was laid out
            iv.base_m = piece_base_m;
            intervals.push_back(std::move(iv));
            piece_top_m = piece_base_m;
        }
    }
    return intervals;
}

} // namespace atollog::demo
