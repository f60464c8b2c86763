// Recovered core is placed at the top of its cored interval (ocean-drilling convention, see the
// explanatory notes of the drilling programmes): in a run [top, base] with recovered length r,
// the recovered part is [top, top + min(r, cored)] and the rest of the run is unrecovered.
#include "atollog/engine/depth_model.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace atollog {
namespace {

std::string runLabel(const CoreRun &r) {
    return "run '" + r.run + "' of hole '" + r.hole + "' (" + numberText(r.top_m) + "-" +
           numberText(r.base_m) + " m)";
}

void requireUsable(const CoreRun &r) {
    if (!std::isfinite(r.top_m) || !std::isfinite(r.base_m) || !std::isfinite(r.recovered_m))
        throw std::invalid_argument("DepthModel: " + runLabel(r) +
                                    " has a non-finite top_m, "
                                    "base_m or recovered_m (recovered " +
                                    numberText(r.recovered_m) + " m); give finite numbers");
    if (!(r.base_m > r.top_m))
        throw std::invalid_argument("DepthModel: " + runLabel(r) +
                                    ": base_m must be deeper (larger) than top_m");
    // Finite ends can still be so far apart that the length overflows to infinity, which would
    // make every recovery figure of the hole infinite or zero.
    if (!std::isfinite(r.cored_m()))
        throw std::invalid_argument("DepthModel: " + runLabel(r) +
                                    ": the cored length is too large to compute; check the depths");
    if (r.recovered_m < 0.0)
        throw std::invalid_argument("DepthModel: " + runLabel(r) + ": recovered_m " +
                                    numberText(r.recovered_m) + " is negative; give 0 or more");
}

// Over 100 % recovery (core expansion) still fills only the cored length.
double recoveredWithinRun(const CoreRun &r) {
    return std::min(r.recovered_m, r.cored_m());
}

void requireFinite(double depth_m, const char *what) {
    if (!std::isfinite(depth_m))
        throw std::invalid_argument(std::string("DepthModel::") + what + ": depth " +
                                    numberText(depth_m) + " m is not a finite number");
}

} // namespace

DepthModel::DepthModel(std::vector<CoreRun> runs) : runs_(std::move(runs)) {
    for (const CoreRun &r : runs_)
        requireUsable(r);
    std::sort(runs_.begin(), runs_.end(), [](const CoreRun &a, const CoreRun &b) {
        return a.top_m < b.top_m || (a.top_m == b.top_m && a.base_m < b.base_m);
    });
    // Touching runs (base of one == top of the next) are the normal case; any overlap is not.
    for (std::size_t i = 1; i < runs_.size(); ++i)
        if (runs_[i].top_m < runs_[i - 1].base_m)
            throw std::invalid_argument("DepthModel: " + runLabel(runs_[i]) + " overlaps " +
                                        runLabel(runs_[i - 1]) +
                                        "; runs of one hole must not overlap");
}

// Runs are closed intervals [top, base]. A depth on the boundary between two touching runs
// belongs to the run that starts there (the deeper one); the base of a run that no other run
// continues still belongs to that run, so a sample at the very bottom of the core is cored.
DepthLocation DepthModel::locate(double depth_m) const {
    requireFinite(depth_m, "locate");
    // Last run whose top is at or above the depth.
    auto after = std::upper_bound(runs_.begin(), runs_.end(), depth_m,
                                  [](double d, const CoreRun &r) { return d < r.top_m; });
    if (after == runs_.begin())
        return {DepthPart::Uncored, std::nullopt};
    const auto index = static_cast<std::size_t>(std::distance(runs_.begin(), after) - 1);
    const CoreRun &run = runs_[index];
    if (depth_m > run.base_m)
        return {DepthPart::Uncored, std::nullopt};
    const double recovered = recoveredWithinRun(run);
    // With nothing recovered even the run top is unrecovered.
    const bool in_recovered = recovered > 0.0 && depth_m <= run.top_m + recovered;
    return {in_recovered ? DepthPart::Recovered : DepthPart::Unrecovered, index};
}

// A piece logged at d in the recovered part may have come from as deep as d plus the unrecovered
// length (the gap may have been anywhere above it), clipped to the run base. A depth logged in the
// unrecovered part has no core behind it; we take it as standing for anything from d down to the
// run base, the only bound the run itself gives.
DepthRange DepthModel::trueDepthRange(double depth_m) const {
    requireFinite(depth_m, "trueDepthRange");
    const DepthLocation loc = locate(depth_m);
    if (!loc.run_index)
        return {depth_m, depth_m};
    const CoreRun &run = runs_[*loc.run_index];
    if (loc.part == DepthPart::Unrecovered)
        return {depth_m, run.base_m};
    const double unrecovered = run.cored_m() - recoveredWithinRun(run);
    return {depth_m, std::min(run.base_m, depth_m + unrecovered)};
}

double DepthModel::cored_m() const {
    double sum = 0;
    for (const CoreRun &r : runs_)
        sum += r.cored_m();
    return sum;
}

double DepthModel::recovered_m() const {
    double sum = 0;
    for (const CoreRun &r : runs_)
        sum += recoveredWithinRun(r);
    return sum;
}

double DepthModel::recovery_fraction() const {
    const double cored = cored_m();
    return cored > 0.0 ? recovered_m() / cored : 0.0;
}

} // namespace atollog
