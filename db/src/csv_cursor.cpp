#include "csv_cursor.hpp"

#include "utf8_check.hpp"

#include <algorithm>
#include <array>
#include <cstring>

namespace atollog::db::folder_io {
namespace {

constexpr std::string_view kUtf8Bom = "\xEF\xBB\xBF";

// Bytes that end an unquoted field or make it invalid; everything else is field content.
constexpr std::array<bool, 256> makeUnquotedStops() {
    std::array<bool, 256> stops{};
    stops[static_cast<unsigned char>(',')] = true;
    stops[static_cast<unsigned char>('\n')] = true;
    stops[static_cast<unsigned char>('\r')] = true;
    stops[static_cast<unsigned char>('"')] = true;
    return stops;
}
constexpr std::array<bool, 256> kUnquotedStops = makeUnquotedStops();

constexpr std::string_view kQuotingFix =
    "a field that contains a quote must be quoted as a whole, with each quote inside doubled, "
    "e.g. \"3 \"\"inch\"\" core\" (RFC 4180)";

std::string restOfLine(std::string_view text, std::size_t from) {
    const std::size_t end = text.find_first_of("\r\n", from);
    return std::string(text.substr(from, end == std::string_view::npos ? end : end - from));
}

} // namespace

CsvCursor::CsvCursor(std::string_view text, std::string file, std::size_t offset,
                     std::size_t line, bool check_utf8)
    : text_(text), file_(std::move(file)), pos_(offset), line_(line), line_start_(offset),
      first_bad_utf8_(std::string_view::npos) {
    if (offset == 0 && text_.substr(0, kUtf8Bom.size()) == kUtf8Bom) {
        pos_ = kUtf8Bom.size();
        line_start_ = pos_;
    }
    if (check_utf8) first_bad_utf8_ = firstInvalidUtf8(text_);
}

void CsvCursor::fail(std::size_t line, std::size_t field_number, std::string value,
                     std::string problem, std::string fix) const {
    InputProblem p;
    p.file = file_;
    p.line = line;
    p.column_number = field_number;
    if (field_number > 0 && field_number <= header_.size()) p.column = header_[field_number - 1];
    p.value = std::move(value);
    p.problem = std::move(problem);
    p.fix = std::move(fix);
    throw InputError({std::move(p)});
}

bool CsvCursor::onlyLineEndsFrom(std::size_t pos) const {
    return std::all_of(text_.begin() + static_cast<std::ptrdiff_t>(pos), text_.end(),
                       [](char c) { return c == '\n' || c == '\r'; });
}

bool CsvCursor::next(CsvRecord& record) {
    if (pos_ >= text_.size()) return false;
    const char first = text_[pos_];
    if (first == '\n' || first == '\r') {
        if (onlyLineEndsFrom(pos_)) {
            pos_ = text_.size();
            return false;
        }
        if (first == '\n' || (pos_ + 1 < text_.size() && text_[pos_ + 1] == '\n'))
            fail(line_, 0, "", "empty line inside the table",
                 "remove the empty line (only empty lines at the end of a file are ignored)");
    }
    record.line = line_;
    record.offset = pos_;
    std::size_t count = 0;
    for (;;) {
        if (count == record.fields.size()) record.fields.emplace_back();
        std::string& field = record.fields[count];
        ++count;
        if (pos_ < text_.size() && text_[pos_] == '"')
            readQuoted(field, count);
        else
            readUnquoted(field, count);
        if (first_bad_utf8_ < pos_) checkUtf8Before(record.line, record.offset, count);
        if (pos_ >= text_.size()) break;
        const char c = text_[pos_];
        if (c == ',') {
            ++pos_;
            continue;
        }
        if (c == '\n') {
            ++pos_;
        } else if (pos_ + 1 < text_.size() && text_[pos_ + 1] == '\n') { // c == '\r'
            pos_ += 2;
        } else {
            fail(line_, count, "", "carriage return (CR) without a line feed at byte " +
                                       std::to_string(byteInLine(pos_)) + " of the line",
                 "save the file with \\n or \\r\\n line ends");
        }
        ++line_;
        line_start_ = pos_;
        break;
    }
    record.fields.resize(count);
    return true;
}

void CsvCursor::readUnquoted(std::string& field, std::size_t field_number) {
    const std::size_t start = pos_;
    const char* data = text_.data();
    std::size_t i = pos_;
    const std::size_t n = text_.size();
    while (i < n && !kUnquotedStops[static_cast<unsigned char>(data[i])]) ++i;
    if (i < n && data[i] == '"') {
        const std::size_t end = text_.find_first_of(",\r\n", i);
        fail(line_, field_number,
             std::string(text_.substr(start, end == std::string_view::npos ? end : end - start)),
             "quote character at byte " + std::to_string(byteInLine(i)) +
                 " of the line inside a field that does not start with a quote",
             std::string(kQuotingFix));
    }
    field.assign(data + start, i - start);
    pos_ = i;
}

void CsvCursor::readQuoted(std::string& field, std::size_t field_number) {
    const std::size_t start_line = line_;
    const std::size_t quote_pos = pos_;
    field.clear();
    ++pos_;
    const char* data = text_.data();
    const std::size_t n = text_.size();
    for (;;) {
        const void* hit = std::memchr(data + pos_, '"', n - pos_);
        if (hit == nullptr)
            fail(start_line, field_number, restOfLine(text_, quote_pos),
                 "the quoted field that starts on line " + std::to_string(start_line) +
                     " is never closed",
                 "add the closing quote, or double each quote inside the field (\"\")");
        const std::size_t q = static_cast<std::size_t>(static_cast<const char*>(hit) - data);
        // Line breaks inside quotes belong to the value but still advance the physical line.
        for (std::size_t k = pos_; k < q; ++k) {
            if (data[k] == '\n') {
                ++line_;
                line_start_ = k + 1;
            }
        }
        field.append(data + pos_, q - pos_);
        pos_ = q + 1;
        if (pos_ < n && data[pos_] == '"') { // "" is an escaped quote (RFC 4180 section 2.7)
            field += '"';
            ++pos_;
            continue;
        }
        break;
    }
    if (pos_ < n && data[pos_] != ',' && data[pos_] != '\n' && data[pos_] != '\r')
        fail(line_, field_number, restOfLine(text_, quote_pos),
             "text after the closing quote at byte " + std::to_string(byteInLine(pos_)) +
                 " of the line",
             std::string(kQuotingFix));
}

void CsvCursor::checkUtf8Before(std::size_t record_line, std::size_t record_offset,
                                std::size_t field_number) const {
    // The bad byte lies in the field just read; place it by line and byte within that line.
    std::size_t line = record_line;
    std::size_t line_start = record_offset;
    for (std::size_t k = record_offset; k < first_bad_utf8_; ++k) {
        if (text_[k] == '\n') {
            ++line;
            line_start = k + 1;
        }
    }
    const std::size_t comma = text_.rfind(',', first_bad_utf8_);
    const std::size_t from =
        comma == std::string_view::npos || comma < line_start ? line_start : comma + 1;
    const std::size_t to = std::min(text_.find_first_of(",\r\n", first_bad_utf8_), text_.size());
    std::string value(text_.substr(from, to - from));
    fail(line, field_number, value,
         "invalid UTF-8 at byte " + std::to_string(first_bad_utf8_ - line_start + 1) +
             " of line " + std::to_string(line) + " (field " + std::to_string(field_number) + ")",
         "save the file as UTF-8");
}

} // namespace atollog::db::folder_io
