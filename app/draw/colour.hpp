#pragma once

#include <cstdint>

namespace atollog::draw {

/// An sRGB colour with alpha, kept free of Qt so layouts stay plain data.
struct Colour {
    std::uint8_t r = 0;
    std::uint8_t g = 0;
    std::uint8_t b = 0;
    std::uint8_t a = 255;

    friend bool operator==(const Colour &, const Colour &) = default;
};

/// From 0xRRGGBB, the way published palettes print their values.
constexpr Colour colourFromHex(std::uint32_t rgb) {
    return Colour{static_cast<std::uint8_t>((rgb >> 16) & 0xFFu),
                  static_cast<std::uint8_t>((rgb >> 8) & 0xFFu),
                  static_cast<std::uint8_t>(rgb & 0xFFu), 255};
}

} // namespace atollog::draw
