#pragma once
// UTF-8 validation of whole input files (RFC 3629, section 4), kept apart from CSV parsing so
// the CSV loop stays byte-simple and fast.
#include <cstddef>
#include <string_view>

namespace atollog::db::folder_io {

/// Offset of the first byte that is not part of a well-formed UTF-8 sequence (RFC 3629: no
/// overlong forms, no surrogates, nothing above U+10FFFF), or std::string_view::npos.
std::size_t firstInvalidUtf8(std::string_view text);

} // namespace atollog::db::folder_io
