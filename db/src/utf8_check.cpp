#include "utf8_check.hpp"

#include <cstdint>
#include <cstring>

namespace atollog::db::folder_io {
namespace {

bool isContinuation(unsigned char c) { return (c & 0xC0) == 0x80; }

/// Length of the well-formed sequence at `p` (RFC 3629 section 4, UTF8-2 .. UTF8-4), 0 if none.
std::size_t sequenceLength(const unsigned char* p, std::size_t left) {
    const unsigned char c = p[0];
    if (c >= 0xC2 && c <= 0xDF) return left >= 2 && isContinuation(p[1]) ? 2 : 0;
    if (c >= 0xE0 && c <= 0xEF) {
        if (left < 3 || !isContinuation(p[1]) || !isContinuation(p[2])) return 0;
        if (c == 0xE0 && p[1] < 0xA0) return 0; // overlong
        if (c == 0xED && p[1] > 0x9F) return 0; // UTF-16 surrogates
        return 3;
    }
    if (c >= 0xF0 && c <= 0xF4) {
        if (left < 4 || !isContinuation(p[1]) || !isContinuation(p[2]) || !isContinuation(p[3]))
            return 0;
        if (c == 0xF0 && p[1] < 0x90) return 0; // overlong
        if (c == 0xF4 && p[1] > 0x8F) return 0; // above U+10FFFF
        return 4;
    }
    return 0; // 0x80..0xC1 and 0xF5..0xFF never start a sequence
}

} // namespace

std::size_t firstInvalidUtf8(std::string_view text) {
    const auto* p = reinterpret_cast<const unsigned char*>(text.data());
    const std::size_t n = text.size();
    std::size_t i = 0;
    while (i < n) {
        // Most cells are ASCII: skip 8 bytes at a time while no high bit is set.
        while (i + 8 <= n) {
            std::uint64_t block;
            std::memcpy(&block, p + i, 8);
            if (block & 0x8080808080808080ULL) break;
            i += 8;
        }
        if (i >= n) break;
        if (p[i] < 0x80) {
            ++i;
            continue;
        }
        const std::size_t len = sequenceLength(p + i, n - i);
        if (len == 0) return i;
        i += len;
    }
    return std::string_view::npos;
}

} // namespace atollog::db::folder_io
