#pragma once
// Weighted quantiles of many quantities at once (one column per grid depth, hiatus or rate
// interval), without keeping every draw: each column holds a fixed-width histogram over a range
// found beforehand (a pilot run), with values outside it kept exactly.
//
// Why a histogram and not the P-square algorithm (Jain & Chlamtac 1985): weighted draws need
// weights, which P-square does not take (the age model's Gibbs draws all weigh 1, but the class
// keeps integer weights), and P-square's markers depend on the
// order of arrival, which would tie the result to the thread count. Here weights are integers
// (fixed point), so adding and merging are exact and the result does not depend on the order in
// which draws or threads arrive.
//
// Accuracy: a quantile that falls inside the range is interpolated linearly in its bin, so it is
// off from the exact weighted quantile (the smallest value whose cumulative weight reaches p) by
// less than one bin width, range / bins (0.2 % of the range with the 512 bins the age model
// uses). Outside the range the answer is exact. The mean is exact to 2^-32 of the value's unit.
#include <cstddef>
#include <cstdint>
#include <utility>
#include <vector>

namespace atollog {

struct QuantileRange {
    double lo = 0;
    double hi = 1; ///< > lo
};

class StreamingQuantiles {
  public:
    /// One column per range, `bins` bins each. Throws std::invalid_argument on bins < 1 or a
    /// range that is not finite with hi > lo.
    StreamingQuantiles(std::vector<QuantileRange> ranges, int bins);

    std::size_t columns() const { return ranges_.size(); }
    int bins() const { return bins_; }

    /// Adds a value with an integer weight (0 is ignored). Throws std::invalid_argument on a
    /// non-finite value or |value| >= 2^30 (the fixed-point mean's limit), and when the sum of
    /// weights of the column would reach 2^32 (bins count in 32 bits: half the memory of the
    /// histograms, which the age model's grid columns fill at memory speed); the age model adds
    /// weight 1 per draw, with the number of draws below 2^24.
    void add(std::size_t column, double value, std::uint64_t weight);
    /// Adds values[0], values[stride], ... (count of them) to one column, each with `weight`:
    /// the same result as count calls of add() (the mean up to its last fixed-point unit),
    /// faster (the age model's grid columns).
    void addMany(std::size_t column, const double* values, std::size_t count, std::size_t stride,
                 std::uint64_t weight);
    /// Adds another accumulator with the same ranges and bins (exact: integer sums).
    void merge(const StreamingQuantiles& other);

    std::uint64_t totalWeight(std::size_t column) const { return total_[column]; }
    /// Weighted quantile at p in [0, 1]. Throws std::invalid_argument on p outside [0, 1] or a
    /// column without weight.
    double quantile(std::size_t column, double p) const;
    /// Weighted mean. Throws std::invalid_argument on a column without weight.
    double mean(std::size_t column) const;
    /// Values that fell outside the column's range and are held exactly.
    std::size_t outsideCount(std::size_t column) const;
    /// Smallest and largest value added (quantiles are clamped to them, so a column whose draws
    /// all agree returns that value exactly). Throws std::invalid_argument without weight.
    double minValue(std::size_t column) const;
    double maxValue(std::size_t column) const;

  private:
    double rawQuantile(std::size_t column, double p) const;
    __extension__ typedef __int128 FixedSum;
    std::vector<QuantileRange> ranges_;
    void requireRoom(std::size_t column, std::uint64_t weight, std::size_t count) const;
    int bins_;
    std::vector<std::uint32_t> counts_;  ///< columns x bins weights (column sums < 2^32)
    std::vector<std::uint64_t> total_;   ///< per column
    std::vector<FixedSum> weighted_sum_; ///< per column: sum of weight x round(value x 2^32)
    std::vector<double> min_, max_;      ///< per column, of the values added
    std::vector<std::vector<std::pair<double, std::uint64_t>>> below_; ///< exact, unsorted
    std::vector<std::vector<std::pair<double, std::uint64_t>>> above_;
};

} // namespace atollog
