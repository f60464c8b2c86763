#include "atollog/engine/isochrons.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace atollog {

namespace {

/// The age quantile of a grid row that a depth quantile reads (see isochrons.hpp).
using AgeQuantile = double AgeGridRow::*;

/// Where one age-quantile profile first reaches `age_ma` going down: the row index of the
/// crossing (the first row at least as old) and the depth, or nullopt outside the grid.
struct Crossing {
    std::size_t row = 0;
    double depth_m = 0;
};

std::optional<Crossing> firstCrossing(const std::vector<AgeGridRow>& g, AgeQuantile q,
                                      double age_ma) {
    // The estimated quantiles come from histograms and may wobble by a bin where the true
    // profile is flat; taking the first crossing keeps the answer the shallowest depth at
    // which the profile reaches A.
    const auto it =
        std::find_if(g.begin(), g.end(), [&](const AgeGridRow& r) { return r.*q >= age_ma; });
    if (it == g.end())
        return std::nullopt; // still younger at the base: below the model
    const std::size_t k = static_cast<std::size_t>(it - g.begin());
    if (k == 0)
        // Already at least A at the top: exactly A there is the top; older, above the model.
        return g[0].*q == age_ma ? std::optional<Crossing>{Crossing{0, g[0].depth_m}}
                                 : std::nullopt;
    const AgeGridRow& above = g[k - 1];
    const AgeGridRow& below = g[k];
    const double a0 = above.*q, a1 = below.*q;
    // a0 < age_ma <= a1, so a1 > a0 and the fraction lies in (0, 1]. At a surface the two rows
    // share a depth and the crossing is that depth.
    const double f = (age_ma - a0) / (a1 - a0);
    return Crossing{k, above.depth_m + f * (below.depth_m - above.depth_m)};
}

} // namespace

IsochronDepth isochronDepth(const AgeModel& model, double age_ma) {
    if (!std::isfinite(age_ma))
        throw std::invalid_argument("isochron: age " + numberText(age_ma) + " Ma in hole '" +
                                    model.hole + "'; give a finite age");
    if (model.grid.empty())
        throw std::invalid_argument("isochron: the age model of hole '" + model.hole +
                                    "' has no grid rows");
    IsochronDepth out;
    out.hole = model.hole;
    out.age_ma = age_ma;
    const auto& g = model.grid;
    if (const auto c = firstCrossing(g, &AgeGridRow::age_q975_ma, age_ma))
        out.depth_q025_m = c->depth_m;
    if (const auto c = firstCrossing(g, &AgeGridRow::age_q025_ma, age_ma))
        out.depth_q975_m = c->depth_m;
    const auto median = firstCrossing(g, &AgeGridRow::age_q500_ma, age_ma);
    if (median) {
        out.depth_q500_m = median->depth_m;
        const AgeGridRow& below = g[median->row];
        if (median->row > 0) {
            const AgeGridRow& above = g[median->row - 1];
            out.in_hiatus = above.above_surface && above.depth_m == below.depth_m &&
                            age_ma > above.age_q500_ma && age_ma < below.age_q500_ma;
        }
    } else {
        out.outside_model = true;
    }
    return out;
}

std::vector<EventTie> eventTieLine(const CorrelationData& data, std::size_t event) {
    validateCorrelationData(data);
    if (event >= data.events.size())
        throw std::invalid_argument("tie line: event index " + std::to_string(event) +
                                    " is beyond the " + std::to_string(data.events.size()) +
                                    " events");
    std::vector<EventTie> out;
    for (const EventLevel& l : data.levels)
        if (l.event == event)
            out.push_back({l.hole, l.shallow_m, l.deep_m, l.level_m});
    std::sort(out.begin(), out.end(),
              [](const EventTie& a, const EventTie& b) { return a.hole < b.hole; });
    return out;
}

} // namespace atollog
