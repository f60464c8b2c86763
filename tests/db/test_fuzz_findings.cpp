// Regression tests for what the fuzzers in tests/fuzz found, one TEST_CASE per finding, each
// named after the input that showed it (also kept as a seed: tests/fuzz/corpus/*/regression-*).
#include "atollog/db/csv_reader.hpp"

#include <catch2/catch.hpp>

#include <string>
#include <vector>

using atollog::db::csvField;
using atollog::db::CsvRecord;

namespace {

std::vector<std::vector<std::string>> readAll(const std::string& text) {
    std::vector<std::vector<std::string>> records;
    const auto keep = [&records](const CsvRecord& r) { records.push_back(r.fields); };
    atollog::db::readCsv(text, "finding.csv", keep, keep);
    return records;
}

} // namespace

TEST_CASE("fuzz_csv_reader: a first field starting with U+FEFF survives csvField and readCsv",
          "[unit]") {
    // Unquoted at the start of a file, the three bytes EF BB BF are the UTF-8 byte order mark,
    // which readCsv skips (RFC 3629 section 6); a field that starts with them must be quoted.
    const std::string bom = "\xEF\xBB\xBF";
    const std::string field = bom + "x_note";
    CHECK(csvField(field) == "\"" + field + "\"");
    const std::string text = csvField(field) + ",b\n" + csvField(bom) + ",c\n";
    const auto records = readAll(text);
    REQUIRE(records.size() == 2);
    CHECK(records[0] == std::vector<std::string>{field, "b"});
    CHECK(records[1] == std::vector<std::string>{bom, "c"});
    // A real byte order mark before a plain header is still skipped.
    CHECK(readAll(bom + "a,b\n1,2\n")[0] == std::vector<std::string>{"a", "b"});
}
