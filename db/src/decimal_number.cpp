#include "decimal_number.hpp"

#include <algorithm>
#include <cctype>
#include <charconv>
#include <cmath>

namespace atollog::db::folder_io {
namespace {

bool isDigit(char c) { return c >= '0' && c <= '9'; }
bool isSpace(char c) { return c == ' ' || c == '\t' || c == '\r' || c == '\n'; }

bool namesNonFinite(std::string_view text) {
    if (!text.empty() && (text.front() == '+' || text.front() == '-')) text.remove_prefix(1);
    std::string lower(text);
    std::transform(lower.begin(), lower.end(), lower.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return lower == "nan" || lower == "inf" || lower == "infinity" || lower == "1.#inf" ||
           lower == "1.#qnan" || lower == "#num!";
}

/// digits * multiplier in decimal, digits being ASCII '0'..'9'.
std::string multiplyDigits(std::string_view digits, std::uint32_t multiplier) {
    if (multiplier == 1) return std::string(digits);
    std::string out(digits.size() + 10, '0');
    std::size_t o = out.size();
    std::uint64_t carry = 0;
    for (std::size_t i = digits.size(); i-- > 0;) {
        const std::uint64_t v = static_cast<std::uint64_t>(digits[i] - '0') * multiplier + carry;
        out[--o] = static_cast<char>('0' + v % 10);
        carry = v / 10;
    }
    while (carry > 0) {
        out[--o] = static_cast<char>('0' + carry % 10);
        carry /= 10;
    }
    return out.substr(o);
}

ParsedNumber parseFiniteDecimal(std::string_view text, DecimalScale scale);

} // namespace

ParsedNumber parseDecimal(std::string_view text, DecimalScale scale) {
    if (!text.empty() && (isSpace(text.front()) || isSpace(text.back())))
        return {0, NumberSyntax::SurroundingSpace};
    ParsedNumber parsed = parseFiniteDecimal(text, scale);
    if (parsed.syntax == NumberSyntax::NotANumber && namesNonFinite(text))
        parsed.syntax = NumberSyntax::NotFinite;
    return parsed;
}

namespace {
ParsedNumber parseFiniteDecimal(std::string_view text, DecimalScale scale) {
    std::size_t i = 0;
    bool negative = false;
    if (i < text.size() && (text[i] == '+' || text[i] == '-')) negative = text[i++] == '-';
    std::string digits;
    long long frac_digits = 0;
    while (i < text.size() && isDigit(text[i])) digits += text[i++];
    if (i < text.size() && text[i] == '.') {
        ++i;
        while (i < text.size() && isDigit(text[i])) {
            digits += text[i++];
            ++frac_digits;
        }
    }
    if (digits.empty()) return {0, NumberSyntax::NotANumber};
    long long exponent = 0;
    if (i < text.size() && (text[i] == 'e' || text[i] == 'E')) {
        ++i;
        const std::size_t exp_start = i;
        if (i < text.size() && (text[i] == '+' || text[i] == '-')) ++i;
        const std::size_t digits_start = i;
        while (i < text.size() && isDigit(text[i])) ++i;
        if (i == digits_start) return {0, NumberSyntax::NotANumber};
        const char* first = text.data() + exp_start + (text[exp_start] == '+' ? 1 : 0);
        const auto [ptr, ec] = std::from_chars(first, text.data() + i, exponent);
        if (ec != std::errc() || ptr != text.data() + i) return {0, NumberSyntax::OutOfRange};
    }
    if (i != text.size()) return {0, NumberSyntax::NotANumber};

    if (scale == kSameUnit) { // the common case: from_chars reads the validated text directly
        const char* first = text.data() + (text.front() == '+' ? 1 : 0);
        double value = 0;
        const auto [ptr, ec] = std::from_chars(first, text.data() + text.size(), value);
        if (ec == std::errc() && ptr == text.data() + text.size() && std::isfinite(value))
            return {value, NumberSyntax::Ok};
    }

    // Normalised form "[-]<digits*multiplier>e<exponent>": one rounding, in from_chars.
    std::string normal;
    if (negative) normal += '-';
    normal += multiplyDigits(digits, scale.multiplier);
    normal += 'e';
    normal += std::to_string(exponent - frac_digits + scale.exp10);
    double value = 0;
    const auto [ptr, ec] = std::from_chars(normal.data(), normal.data() + normal.size(), value);
    if (ec == std::errc::result_out_of_range) {
        // An underflow to zero of an all-zero mantissa is a plain zero, not a range problem.
        if (std::all_of(digits.begin(), digits.end(), [](char c) { return c == '0'; }))
            return {negative ? -0.0 : 0.0, NumberSyntax::Ok};
        return {0, NumberSyntax::OutOfRange};
    }
    if (ec != std::errc() || ptr != normal.data() + normal.size() || !std::isfinite(value))
        return {0, NumberSyntax::OutOfRange};
    return {value, NumberSyntax::Ok};
}
} // namespace

std::optional<std::int64_t> parseWholeCount(std::string_view text) {
    if (text.empty() || !std::all_of(text.begin(), text.end(), isDigit)) return std::nullopt;
    std::int64_t value = 0;
    const auto [ptr, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
    if (ec != std::errc() || ptr != text.data() + text.size()) return std::nullopt;
    return value;
}

std::string formatShortest(double value) {
    char buffer[64];
    const auto [ptr, ec] = std::to_chars(buffer, buffer + sizeof buffer, value);
    (void)ec; // 64 bytes always hold the shortest form of a double
    return std::string(buffer, ptr);
}

std::string formatShortest(std::int64_t value) {
    char buffer[32];
    const auto [ptr, ec] = std::to_chars(buffer, buffer + sizeof buffer, value);
    (void)ec;
    return std::string(buffer, ptr);
}

} // namespace atollog::db::folder_io
