#pragma once
// Numbers as text for messages: the shortest form that reads back to the same double, so a
// message quotes the value the user typed ("12.3", not "12.300000").
#include <charconv>
#include <cmath>
#include <string>

namespace atollog {

inline std::string numberText(double v) {
    char buf[32];
    const auto res = std::to_chars(buf, buf + sizeof buf, v);
    return std::string(buf, res.ptr);
}

/// A computed value (10.0 + 1.8, 12.8 - 10.0) for messages, rounded to a micrometre so that
/// binary rounding noise ("2.8000000000000043") does not reach the user.
inline std::string derivedNumberText(double v) {
    return numberText(std::isfinite(v) ? std::round(v * 1e6) / 1e6 : v);
}

} // namespace atollog
