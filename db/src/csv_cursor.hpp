#pragma once
// The RFC 4180 record parser behind readCsv: reads one record at a time from a whole-file text.
// The core data folder reader also uses it to re-read a single record (by offset) when a
// dataset check points at one of its cells.
#include "atollog/db/csv_reader.hpp"

#include <string>
#include <string_view>
#include <vector>

namespace atollog::db::folder_io {

class CsvCursor {
  public:
    /// Starts at `offset` (which must be a record start) on physical line `line`. A UTF-8 byte
    /// order mark at offset 0 is skipped. With `check_utf8`, invalid UTF-8 is an error.
    CsvCursor(std::string_view text, std::string file, std::size_t offset = 0,
              std::size_t line = 1, bool check_utf8 = true);

    /// Reads the next record into `record` (reusing its strings). Returns false at the end of
    /// the text; blank lines at the end are skipped. Throws InputError on malformed input.
    bool next(CsvRecord& record);

    /// Header names, used only to name the column in messages.
    void setHeader(std::vector<std::string> header) { header_ = std::move(header); }

  private:
    void readQuoted(std::string& field, std::size_t field_number);
    void readUnquoted(std::string& field, std::size_t field_number);
    [[noreturn]] void checkUtf8Before(std::size_t record_line, std::size_t record_offset,
                                      std::size_t field_number) const;
    bool onlyLineEndsFrom(std::size_t pos) const;
    std::size_t byteInLine(std::size_t pos) const { return pos - line_start_ + 1; }
    [[noreturn]] void fail(std::size_t line, std::size_t field_number, std::string value,
                           std::string problem, std::string fix) const;

    std::string_view text_;
    std::string file_;
    std::size_t pos_ = 0;
    std::size_t line_ = 1;
    std::size_t line_start_ = 0;
    std::size_t first_bad_utf8_;
    std::vector<std::string> header_;
};

} // namespace atollog::db::folder_io
