#pragma once
// Locale-free decimal numbers for the core data folder: '.' as decimal mark, NaN/Inf refused,
// unit conversion done on the decimal digits so that 100 ft is exactly the double nearest 30.48.
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

namespace atollog::db::folder_io {

/// A unit conversion as value * multiplier * 10^exp10, applied to the decimal text before the
/// single rounding to double (so a conversion adds no rounding of its own).
struct DecimalScale {
    std::uint32_t multiplier = 1;
    int exp10 = 0;
    bool operator==(const DecimalScale&) const = default;
};
inline constexpr DecimalScale kSameUnit{1, 0};
inline constexpr DecimalScale kFeetToMetres{3048, -4}; // 1 ft = 0.3048 m exactly
inline constexpr DecimalScale kKaToMa{1, -3};
inline constexpr DecimalScale kYrToMa{1, -6};

enum class NumberSyntax { Ok, NotANumber, NotFinite, OutOfRange, SurroundingSpace };

struct ParsedNumber {
    double value = 0;
    NumberSyntax syntax = NumberSyntax::Ok;
};

/// Parses a non-empty cell: [+|-]digits[.digits][(e|E)[+|-]digits], then scales it.
ParsedNumber parseDecimal(std::string_view text, DecimalScale scale = kSameUnit);

/// A whole non-negative number (a count); nullopt when the text is anything else.
std::optional<std::int64_t> parseWholeCount(std::string_view text);

/// Shortest text that reads back as exactly `value` (std::to_chars without precision).
std::string formatShortest(double value);
std::string formatShortest(std::int64_t value);

} // namespace atollog::db::folder_io
