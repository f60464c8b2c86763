#include "view/next_interval.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <vector>

namespace atollog::view {

namespace {

// Depths are typed to the mm; anything closer counts as the same depth.
constexpr double kSameDepth_m = 1e-6;

/// A computed depth rounded to the micrometre: 36.8 + 1.08 is 37.879999999999995 in binary,
/// and the logger typed 37.88; noise like that must not reach the file.
double roundedDepth_m(double depth_m) { return std::round(depth_m * 1e6) / 1e6; }

double recoveredBase_m(const CoreRun &r) {
    return r.top_m + std::clamp(r.recovered_m, 0.0, std::max(0.0, r.cored_m()));
}

} // namespace

NextInterval nextInterval(const CoreDataset &data, const std::string &hole) {
    std::vector<CoreRun> runs;
    for (const CoreRun &r : data.runs) {
        if (r.hole == hole && std::isfinite(r.top_m) && std::isfinite(r.base_m) &&
            r.base_m > r.top_m) {
            runs.push_back(r);
        }
    }
    if (runs.empty()) {
        return {std::nullopt, "hole '" + hole + "' has no runs; log the run that cored it first"};
    }
    std::sort(runs.begin(), runs.end(),
              [](const CoreRun &a, const CoreRun &b) { return a.top_m < b.top_m; });

    std::optional<double> last_base_m;
    for (const LithInterval &v : data.intervals) {
        if (v.hole == hole && std::isfinite(v.base_m)) {
            last_base_m = std::max(last_base_m.value_or(v.base_m), v.base_m);
        }
    }
    double top_m = last_base_m.value_or(runs.front().top_m);
    const double drilled_m = std::max_element(runs.begin(), runs.end(), [](auto &a, auto &b) {
                                 return a.base_m < b.base_m;
                             })->base_m;
    if (top_m >= drilled_m - kSameDepth_m) {
        return {std::nullopt, "the intervals of hole '" + hole + "' reach its drilled depth (" +
                                  numberText(drilled_m) + " m); add the next run first"};
    }

    for (std::size_t i = 0; i < runs.size(); ++i) {
        const CoreRun &run = runs[i];
        if (top_m >= run.base_m - kSameDepth_m) {
            continue; // the run lies wholly above
        }
        top_m = std::max(top_m, run.top_m); // in a gap between runs: the next run's top
        const double recovered_base_m = recoveredBase_m(run);
        const bool last_run = i + 1 == runs.size();
        double base_m = 0;
        if (top_m < recovered_base_m - kSameDepth_m) {
            base_m = std::min(top_m + kDefaultIntervalThickness_m, recovered_base_m);
        } else if (last_run) {
            base_m = std::min(top_m + kDefaultIntervalThickness_m, run.base_m);
        } else {
            continue; // this run's recovered core is logged: go on at the next run's top
        }
        LithInterval v;
        v.hole = hole;
        v.top_m = top_m;
        v.base_m = roundedDepth_m(base_m);
        return {v, {}};
    }
    return {std::nullopt, "the intervals of hole '" + hole + "' reach its drilled depth (" +
                              numberText(drilled_m) + " m); add the next run first"};
}

} // namespace atollog::view
