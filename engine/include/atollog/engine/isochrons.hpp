#pragma once
// Isochrons: where a level of one age lies in each hole (from its age model), and where one
// event was observed in each hole (its tie line). The viewer draws both between hole columns.
//
// Depth of an age. In every draw of an age model the age never decreases downward, so the
// level of age A lies at or above depth z exactly when the age at z is at least A:
// P(depth(A) <= z) = P(age(z) >= A). The depth p-quantile is therefore the depth at which the
// age (1 - p)-quantile reaches A (quantiles commute with a monotone transformation): the
// shallow end of the depth band (p = 0.025) comes from the old end of the age band (q975),
// the median from the median, the deep end from q025. Each is found on the model's grid as the
// shallowest row whose quantile is at least A, interpolated linearly from the row above it
// (the same linear interpolation AgeModel::ageAt uses). A quantile already older than A at the
// top row, or still younger than A at the base, leaves that depth unset: it lies outside the
// model, and the model says nothing there.
#include "atollog/engine/age_model.hpp"
#include "atollog/engine/correlation_data.hpp"

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace atollog {

struct IsochronDepth {
    std::string hole;
    double age_ma = 0;
    std::optional<double> depth_q025_m, depth_q500_m, depth_q975_m; ///< shallow to deep
    /// A falls inside a jump of the median age profile at a logged surface (strictly between
    /// the age just above and the age at the surface): no rock of that age was kept there, and
    /// the median depth is the surface itself.
    bool in_hiatus = false;
    /// A is younger than the median age at the top of the model or older than the median at
    /// its base: the median depth is unset.
    bool outside_model = false;
};

/// Depth quantiles of the level of age `age_ma` in the model's hole (see the header comment).
/// Throws std::invalid_argument on a non-finite age or a model without grid rows.
IsochronDepth isochronDepth(const AgeModel& model, double age_ma);

struct EventTie {
    std::size_t hole = 0; ///< index into CorrelationData::holes
    double shallow_m = 0, deep_m = 0, level_m = 0;
};

/// One event's observed bracket in every hole that has it, in hole order (the tie line the
/// viewer draws between columns). Throws std::invalid_argument on invalid data
/// (validateCorrelationData) or an event index out of range.
std::vector<EventTie> eventTieLine(const CorrelationData& data, std::size_t event);

} // namespace atollog
