#include "sampling.hpp"

#include "core_logging.hpp"
#include "rounding.hpp"

#include <cstdio>

namespace atollog::demo {
namespace {

std::string sampleId(const std::string& prefix, std::size_t number) {
    char digits[8];
    std::snprintf(digits, sizeof digits, "%03zu", number);
    return prefix + "-" + digits;
}

} // namespace

std::vector<Sample> takeSamples(const IslandPlan& plan, const std::vector<CoreRun>& runs,
                                DemoRng& rng) {
    std::vector<Sample> samples;
    double next_m = rng.uniform(0.1, 1.0);
    for (const auto& run : runs) {
        const double logged_top_m = run.top_m;
        const double logged_base_m = loggedBaseM(run);
        // Where the planned spacing falls in lost core, the next sample is taken from the top
        // of the next recovered piece instead.
        if (next_m < logged_top_m) next_m = logged_top_m + rng.uniform(0.05, 0.3);
        while (next_m < logged_base_m - 0.03) {
            Sample s;
            s.hole = plan.history.hole;
            s.sample = sampleId(plan.sample_prefix, samples.size() + 1);
            s.top_m = roundDp(next_m, 2);
            s.base_m = s.top_m;
            s.kind = "core";
            samples.push_back(s);
            next_m += rng.uniform(1.0, 2.2);
        }
    }
    return samples;
}

const LithInterval* intervalAt(const std::vector<LithInterval>& intervals, const std::string& hole,
                               double depth_m) {
    for (const auto& iv : intervals)
        if (iv.hole == hole && depth_m >= iv.top_m && depth_m < iv.base_m) return &iv;
    return nullptr;
}

} // namespace atollog::demo
