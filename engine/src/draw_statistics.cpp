#include "draw_statistics.hpp"

#include <cmath>
#include <cstddef>

namespace atollog::draw_stats {

double quantileOfSorted(std::span<const double> sorted, double p) {
    const double h = (static_cast<double>(sorted.size()) - 1.0) * p;
    const auto lo = static_cast<std::size_t>(std::floor(h));
    if (lo + 1 >= sorted.size())
        return sorted.back();
    return sorted[lo] + (h - static_cast<double>(lo)) * (sorted[lo + 1] - sorted[lo]);
}

double meanOf(std::span<const double> values) {
    double sum = 0;
    for (double v : values)
        sum += v;
    return sum / static_cast<double>(values.size());
}

double sdOf(std::span<const double> values, double mean) {
    if (values.size() < 2)
        return 0;
    double ss = 0;
    for (double v : values)
        ss += (v - mean) * (v - mean);
    return std::sqrt(ss / static_cast<double>(values.size() - 1));
}

} // namespace atollog::draw_stats
