#pragma once
// RFC 4180 CSV reading with positions: comma separator, double-quote quoting (with "" escapes),
// \n or \r\n line ends, header row. Validates UTF-8. Streams records so large files stay small.
#include "atollog/db/errors.hpp"

#include <cstddef>
#include <functional>
#include <string>
#include <string_view>
#include <vector>

namespace atollog::db {

struct CsvRecord {
    std::vector<std::string> fields;
    std::size_t line = 0;   ///< 1-based physical line on which the record starts
    std::size_t offset = 0; ///< byte offset of the record's first byte in the text
};

/// Reads `text` (the whole file; `file` is its name for messages). Calls `onHeader` once with the
/// header record, then `onRecord` for each data record. Blank lines at the end are ignored; a
/// record with a different field count than the header is an error. Throws InputError on broken
/// quoting, invalid UTF-8, an empty file (no header), or a wrong field count.
void readCsv(std::string_view text, const std::string& file,
             const std::function<void(const CsvRecord&)>& onHeader,
             const std::function<void(const CsvRecord&)>& onRecord);

/// Quotes a field when needed (comma, quote, CR or LF, leading/trailing space).
std::string csvField(std::string_view s);

} // namespace atollog::db
