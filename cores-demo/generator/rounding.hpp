#pragma once
// Values are rounded to the resolution a logger or laboratory would report, so the CSV files stay
// short; the rounded value is the one stored everywhere (dataset and truth alike).
// Dividing two whole numbers gives the double nearest the decimal (12.35, not 12.350000000000001),
// which multiplying by 0.01 would not.
#include <cmath>

namespace atollog::demo {

inline double decimalScale(int decimals) { return std::pow(10.0, decimals); }
inline double roundDp(double value, int decimals) {
    return std::round(value * decimalScale(decimals)) / decimalScale(decimals);
}
inline double floorDp(double value, int decimals) {
    return std::floor(value * decimalScale(decimals)) / decimalScale(decimals);
}
inline double ceilDp(double value, int decimals) {
    return std::ceil(value * decimalScale(decimals)) / decimalScale(decimals);
}

} // namespace atollog::demo
