// libFuzzer target: atollog::db::readCsv on arbitrary bytes. InputError is the expected answer to
// bad input; any other exception, a crash or a sanitizer report is a finding. When the bytes do
// parse, the records written back with csvField and read again must give the same fields: the
// canonical writer relies on csvField quoting whatever readCsv would otherwise split or change.
#include "atollog/db/csv_reader.hpp"
#include "atollog/db/errors.hpp"

#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <string_view>
#include <vector>

namespace {

using Records = std::vector<std::vector<std::string>>;

Records readAll(std::string_view text) {
    Records records;
    const auto keep = [&records](const atollog::db::CsvRecord& r) { records.push_back(r.fields); };
    atollog::db::readCsv(text, "fuzz.csv", keep, keep);
    return records;
}

std::string writeAll(const Records& records) {
    std::string text;
    for (const auto& fields : records) {
        // A record of one empty field would be a blank line, which RFC 4180 leaves ambiguous
        // and readCsv skips at the end of a file; quoted, it is unambiguous. The folder writer
        // never meets this: every table has several columns.
        if (fields.size() == 1 && fields[0].empty()) {
            text += "\"\"\n";
            continue;
        }
        for (std::size_t i = 0; i < fields.size(); ++i) {
            if (i > 0) text += ',';
            text += atollog::db::csvField(fields[i]);
        }
        text += '\n';
    }
    return text;
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    Records first;
    try {
        first = readAll(text);
    } catch (const atollog::db::InputError& e) {
        if (e.problems().empty()) {
            std::fprintf(stderr, "InputError without a problem\n");
            std::abort();
        }
        return 0;
    }
    const std::string rewritten = writeAll(first);
    Records second;
    try {
        second = readAll(rewritten);
    } catch (const atollog::db::InputError& e) {
        std::fprintf(stderr, "csvField output does not read back: %s\n", e.what());
        std::abort();
    }
    if (second != first) {
        std::fprintf(stderr, "csvField round trip changed the records (%zu -> %zu records)\n",
                     first.size(), second.size());
        std::abort();
    }
    return 0;
}
