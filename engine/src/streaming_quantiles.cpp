#include "atollog/engine/streaming_quantiles.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <stdexcept>
#include <string>

namespace atollog {

namespace {

constexpr double kFixedScale = 0x1.0p32;

/// Smallest value whose cumulative weight reaches `target`, walking sorted exact values;
/// returns true and sets `out` when found, else adds their weight to `cum`.
bool walkExact(std::vector<std::pair<double, std::uint64_t>> values, long double target,
               long double& cum, double& out) {
    std::sort(values.begin(), values.end());
    for (const auto& [v, w] : values) {
        cum += static_cast<long double>(w);
        if (cum >= target) {
            out = v;
            return true;
        }
    }
    return false;
}

} // namespace

StreamingQuantiles::StreamingQuantiles(std::vector<QuantileRange> ranges, int bins)
    : ranges_(std::move(ranges)), bins_(bins) {
    if (bins_ < 1)
        throw std::invalid_argument("StreamingQuantiles: bins must be at least 1, got " +
                                    std::to_string(bins_));
    for (std::size_t c = 0; c < ranges_.size(); ++c) {
        const QuantileRange& r = ranges_[c];
        if (!std::isfinite(r.lo) || !std::isfinite(r.hi) || !(r.hi > r.lo))
            throw std::invalid_argument("StreamingQuantiles: column " + std::to_string(c) +
                                        " needs a finite range with hi > lo");
    }
    counts_.assign(ranges_.size() * static_cast<std::size_t>(bins_), 0);
    total_.assign(ranges_.size(), 0);
    weighted_sum_.assign(ranges_.size(), 0);
    min_.assign(ranges_.size(), std::numeric_limits<double>::infinity());
    max_.assign(ranges_.size(), -std::numeric_limits<double>::infinity());
    below_.resize(ranges_.size());
    above_.resize(ranges_.size());
}

void StreamingQuantiles::requireRoom(std::size_t column, std::uint64_t weight,
                                     std::size_t count) const {
    constexpr std::uint64_t kLimit = std::uint64_t{1} << 32;
    if (weight >= kLimit || count >= kLimit || weight * count >= kLimit - total_[column])
        throw std::invalid_argument("StreamingQuantiles: the weights of column " +
                                    std::to_string(column) + " would reach 2^32 (" +
                                    std::to_string(total_[column]) + " held, adding " +
                                    std::to_string(count) + " x " + std::to_string(weight) + ")");
}

void StreamingQuantiles::add(std::size_t column, double value, std::uint64_t weight) {
    if (!std::isfinite(value) || std::fabs(value) >= 0x1.0p30)
        throw std::invalid_argument("StreamingQuantiles::add: value must be finite and below "
                                    "2^30 in magnitude, got " + std::to_string(value));
    if (weight == 0)
        return;
    requireRoom(column, weight, 1);
    const QuantileRange& r = ranges_[column];
    const double pos = (value - r.lo) / (r.hi - r.lo) * bins_;
    if (pos < 0)
        below_[column].emplace_back(value, weight);
    else if (pos >= bins_)
        above_[column].emplace_back(value, weight);
    else
        counts_[column * static_cast<std::size_t>(bins_) + static_cast<std::size_t>(pos)] +=
            weight;
    total_[column] += weight;
    min_[column] = std::min(min_[column], value);
    max_[column] = std::max(max_[column], value);
    // Rounded half away from zero, as llround does, without the library call.
    const double scaled = value * kFixedScale;
    weighted_sum_[column] +=
        static_cast<FixedSum>(weight) *
        static_cast<FixedSum>(static_cast<std::int64_t>(scaled + (scaled >= 0 ? 0.5 : -0.5)));
}

void StreamingQuantiles::addMany(std::size_t column, const double* values, std::size_t count,
                                 std::size_t stride, std::uint64_t weight) {
    if (weight == 0 || count == 0)
        return;
    requireRoom(column, weight, count);
    // Check every value first (a loop the compiler vectorises), so the counting loop needs no
    // branch for it; a bad value throws with add()'s message before anything is counted.
    bool all_usable = true;
    for (std::size_t j = 0; j < count; ++j)
        all_usable &= std::fabs(values[j * stride]) < 0x1.0p30; // false for NaN
    if (!all_usable)
        for (std::size_t j = 0; j < count; ++j)
            if (!(std::fabs(values[j * stride]) < 0x1.0p30))
                add(column, values[j * stride], weight); // throws
    const QuantileRange& r = ranges_[column];
    const double lo = r.lo, width = r.hi - r.lo, bins = bins_;
    std::uint32_t* counts = &counts_[column * static_cast<std::size_t>(bins_)];
    double mn = min_[column], mx = max_[column];
    FixedSum sum = 0;
    for (std::size_t j = 0; j < count; ++j) {
        const double value = values[j * stride];
        const double pos = (value - lo) / width * bins;
        if (pos < 0)
            below_[column].emplace_back(value, weight);
        else if (pos >= bins)
            above_[column].emplace_back(value, weight);
        else
            counts[static_cast<std::size_t>(pos)] += weight;
        mn = std::min(mn, value);
        mx = std::max(mx, value);
        // Rounded half away from zero, as add() does.
        const double scaled = value * kFixedScale;
        sum += static_cast<FixedSum>(
            static_cast<std::int64_t>(scaled + (scaled >= 0 ? 0.5 : -0.5)));
    }
    total_[column] += weight * count;
    min_[column] = mn;
    max_[column] = mx;
    weighted_sum_[column] += static_cast<FixedSum>(weight) * sum;
}

void StreamingQuantiles::merge(const StreamingQuantiles& other) {
    if (other.ranges_.size() != ranges_.size() || other.bins_ != bins_)
        throw std::invalid_argument("StreamingQuantiles::merge: different columns or bins");
    for (std::size_t c = 0; c < ranges_.size(); ++c)
        if (total_[c] + other.total_[c] >= (std::uint64_t{1} << 32))
            throw std::invalid_argument("StreamingQuantiles::merge: the weights of column " +
                                        std::to_string(c) + " would reach 2^32");
    for (std::size_t i = 0; i < counts_.size(); ++i)
        counts_[i] += other.counts_[i];
    for (std::size_t c = 0; c < ranges_.size(); ++c) {
        total_[c] += other.total_[c];
        min_[c] = std::min(min_[c], other.min_[c]);
        max_[c] = std::max(max_[c], other.max_[c]);
        weighted_sum_[c] += other.weighted_sum_[c];
        below_[c].insert(below_[c].end(), other.below_[c].begin(), other.below_[c].end());
        above_[c].insert(above_[c].end(), other.above_[c].begin(), other.above_[c].end());
    }
}

double StreamingQuantiles::quantile(std::size_t column, double p) const {
    return std::clamp(rawQuantile(column, p), min_[column], max_[column]);
}

double StreamingQuantiles::rawQuantile(std::size_t column, double p) const {
    if (!(p >= 0 && p <= 1))
        throw std::invalid_argument("StreamingQuantiles::quantile: p must be in [0, 1], got " +
                                    std::to_string(p));
    if (total_[column] == 0)
        throw std::invalid_argument("StreamingQuantiles::quantile: column " +
                                    std::to_string(column) + " has no weight");
    // At least one unit of weight, so p = 0 gives the smallest value held.
    const long double target =
        std::max(1.0L, static_cast<long double>(p) * static_cast<long double>(total_[column]));
    long double cum = 0;
    double out = 0;
    if (walkExact(below_[column], target, cum, out))
        return out;
    const QuantileRange& r = ranges_[column];
    const double width = (r.hi - r.lo) / bins_;
    const std::uint32_t* row = &counts_[column * static_cast<std::size_t>(bins_)];
    for (int b = 0; b < bins_; ++b) {
        if (row[b] == 0)
            continue;
        const long double w = static_cast<long double>(row[b]);
        if (cum + w >= target) {
            // Values spread evenly over the bin: the error is below one bin width.
            const double frac = static_cast<double>((target - cum) / w);
            return r.lo + (b + frac) * width;
        }
        cum += w;
    }
    if (walkExact(above_[column], target, cum, out))
        return out;
    // Rounding of long double sums only: the largest value held.
    if (!above_[column].empty())
        return std::max_element(above_[column].begin(), above_[column].end())->first;
    for (int b = bins_ - 1; b >= 0; --b)
        if (row[b] != 0)
            return r.lo + (b + 1) * width;
    return std::max_element(below_[column].begin(), below_[column].end())->first;
}

double StreamingQuantiles::mean(std::size_t column) const {
    if (total_[column] == 0)
        throw std::invalid_argument("StreamingQuantiles::mean: column " +
                                    std::to_string(column) + " has no weight");
    const long double m = static_cast<long double>(weighted_sum_[column]) /
                          static_cast<long double>(total_[column]);
    return static_cast<double>(m / static_cast<long double>(kFixedScale));
}

std::size_t StreamingQuantiles::outsideCount(std::size_t column) const {
    return below_[column].size() + above_[column].size();
}

} // namespace atollog

namespace atollog {

double StreamingQuantiles::minValue(std::size_t column) const {
    if (total_[column] == 0)
        throw std::invalid_argument("StreamingQuantiles::minValue: column has no weight");
    return min_[column];
}

double StreamingQuantiles::maxValue(std::size_t column) const {
    if (total_[column] == 0)
        throw std::invalid_argument("StreamingQuantiles::maxValue: column has no weight");
    return max_[column];
}

} // namespace atollog
