#pragma once
// A depth for an input-check message: three decimals and the unit ("12.345 m").
#include <cstdio>
#include <string>

namespace atollog::draw {

inline std::string metresText(double v) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.3f m", v);
    return buf;
}

} // namespace atollog::draw
