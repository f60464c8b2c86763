#include "atollog/db/csv_reader.hpp"

#include "csv_cursor.hpp"

namespace atollog::db {

void readCsv(std::string_view text, const std::string& file,
             const std::function<void(const CsvRecord&)>& onHeader,
             const std::function<void(const CsvRecord&)>& onRecord) {
    folder_io::CsvCursor cursor(text, file);
    CsvRecord record;
    if (!cursor.next(record)) {
        InputProblem p;
        p.file = file;
        p.problem = "empty file: expected a header row";
        p.fix = "put the column names on the first line";
        throw InputError({std::move(p)});
    }
    const std::size_t header_fields = record.fields.size();
    cursor.setHeader(record.fields);
    onHeader(record);
    while (cursor.next(record)) {
        if (record.fields.size() != header_fields) {
            InputProblem p;
            p.file = file;
            p.line = record.line;
            p.problem = "the record has " + std::to_string(record.fields.size()) +
                        " fields but the header has " + std::to_string(header_fields);
            p.fix = "give every record as many fields as the header; quote a value that "
                    "contains a comma, e.g. \"a, b\"";
            throw InputError({std::move(p)});
        }
        onRecord(record);
    }
}

std::string csvField(std::string_view s) {
    const bool edge_space = !s.empty() && (s.front() == ' ' || s.front() == '\t' ||
                                           s.back() == ' ' || s.back() == '\t');
    // A field starting with U+FEFF is quoted too: unquoted at the start of a file, the reader
    // would take those three bytes for the byte order mark and drop them (found by fuzzing).
    const bool leading_bom = s.substr(0, 3) == "\xEF\xBB\xBF";
    if (!edge_space && !leading_bom && s.find_first_of(",\"\r\n") == std::string_view::npos)
        return std::string(s);
    std::string out;
    out.reserve(s.size() + 2);
    out += '"';
    for (const char c : s) {
        if (c == '"') out += '"'; // RFC 4180 section 2.7: a quote is escaped by doubling it
        out += c;
    }
    out += '"';
    return out;
}

} // namespace atollog::db
