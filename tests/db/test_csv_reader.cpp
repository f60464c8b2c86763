// readCsv and csvField against RFC 4180 ("Common Format and MIME Type for Comma-Separated Values
// (CSV) Files", section 2 numbers the rules cited below) and RFC 3629 (UTF-8).
#include "atollog/db/csv_reader.hpp"

#include <catch2/catch.hpp>

#include <chrono>
#include <iostream>

using atollog::db::CsvRecord;
using atollog::db::csvField;
using atollog::db::InputError;
using atollog::db::readCsv;

namespace {

struct Parsed {
    std::vector<std::string> header;
    std::vector<std::vector<std::string>> rows;
    std::vector<std::size_t> lines;
};

Parsed parse(std::string_view text) {
    Parsed p;
    readCsv(
        text, "t.csv", [&](const CsvRecord& r) { p.header = r.fields; },
        [&](const CsvRecord& r) {
            p.rows.push_back(r.fields);
            p.lines.push_back(r.line);
        });
    return p;
}

/// what() of the InputError thrown by parsing `text`.
std::string errorOf(std::string_view text) {
    try {
        parse(text);
    } catch (const InputError& e) {
        return e.what();
    }
    FAIL("no InputError for: " << text);
    return {};
}

using Rows = std::vector<std::vector<std::string>>;

} // namespace

TEST_CASE("RFC 4180 2.1/2.2: records end with CRLF or LF, the last one optionally", "[unit]") {
    const Rows expected{{"aaa", "bbb"}, {"zzz", "yyy"}};
    CHECK(parse("h1,h2\r\naaa,bbb\r\nzzz,yyy\r\n").rows == expected);
    CHECK(parse("h1,h2\naaa,bbb\nzzz,yyy").rows == expected);
    CHECK(parse("h1,h2\r\naaa,bbb\nzzz,yyy\r\n").rows == expected);
}

TEST_CASE("RFC 4180 2.3: the first record is the header", "[unit]") {
    const Parsed p = parse("field_name,field_name2\naaa,bbb\n");
    CHECK(p.header == std::vector<std::string>{"field_name", "field_name2"});
    CHECK(p.rows == Rows{{"aaa", "bbb"}});
}

TEST_CASE("RFC 4180 2.4: spaces are part of a field; empty fields", "[unit]") {
    CHECK(parse("a,b,c\n aaa , b,\n").rows == Rows{{" aaa ", " b", ""}});
    CHECK(parse("a,b\n,\n").rows == Rows{{"", ""}});
}

TEST_CASE("RFC 4180 2.5/2.6: quoted fields hold commas, CRLF and LF", "[unit]") {
    const Parsed p = parse("a,b,c\n\"aaa\",\"b\r\nbb\",\"c,cc\"\nx,\"y\ny\",z\n");
    CHECK(p.rows == Rows{{"aaa", "b\r\nbb", "c,cc"}, {"x", "y\ny", "z"}});
    // Physical lines: the second record starts on line 4 because the first spans lines 2-3.
    CHECK(p.lines == std::vector<std::size_t>{2, 4});
}

TEST_CASE("RFC 4180 2.7: a double quote inside a quoted field is written twice", "[unit]") {
    CHECK(parse("a,b\n\"aaa\",\"b\"\"bb\"\n").rows == Rows{{"aaa", "b\"bb"}});
    CHECK(parse("a\n\"\"\"\"\n").rows == Rows{{"\""}});
    CHECK(parse("a\n\"\"\n").rows == Rows{{""}});
}

TEST_CASE("a UTF-8 byte order mark is skipped and multibyte text kept", "[unit]") {
    const Parsed p = parse("\xEF\xBB\xBFhole,site\nMotu \xC4\x92re,\xF0\x9F\x90\x9A\n");
    CHECK(p.header == std::vector<std::string>{"hole", "site"});
    CHECK(p.rows == Rows{{"Motu \xC4\x92re", "\xF0\x9F\x90\x9A"}});
}

TEST_CASE("blank lines at the end are ignored, inside they are an error", "[unit]") {
    CHECK(parse("a,b\n1,2\n\n\r\n\n").rows == Rows{{"1", "2"}});
    const std::string e = errorOf("a,b\n1,2\n\n3,4\n");
    CHECK_THAT(e, Catch::Contains("t.csv:3") && Catch::Contains("empty line"));
}

TEST_CASE("an empty file or one with only line ends has no header", "[unit]") {
    CHECK_THAT(errorOf(""), Catch::Contains("t.csv") && Catch::Contains("empty file"));
    CHECK_THAT(errorOf("\xEF\xBB\xBF\n\n"), Catch::Contains("empty file"));
}

TEST_CASE("a wrong field count names the line and both counts", "[unit]") {
    const std::string e = errorOf("a,b,c\n1,2,3\n1,2\n");
    CHECK_THAT(e, Catch::Contains("t.csv:3") && Catch::Contains("2 fields") &&
                      Catch::Contains("header has 3"));
    CHECK_THAT(errorOf("a,b\n1,2,3\n"), Catch::Contains("3 fields"));
}

TEST_CASE("an unterminated quote names the line where the field started", "[unit]") {
    const std::string e = errorOf("a,b\n1,2\n3,\"never\nclosed,4\n5,6\n");
    CHECK_THAT(e, Catch::Contains("t.csv:3") && Catch::Contains("column b (2)") &&
                      Catch::Contains("starts on line 3") && Catch::Contains("never closed"));
}

TEST_CASE("a quote inside an unquoted field names line and column", "[unit]") {
    // RFC 4180 2.5: "If fields are not enclosed with double quotes, then double quotes may not
    // appear inside the fields."
    const std::string e = errorOf("a,b\n1,2\nxy,3 \"inch\"\n");
    CHECK_THAT(e, Catch::Contains("t.csv:3") && Catch::Contains("column b (2)") &&
                      Catch::Contains("byte 6 of the line") && Catch::Contains("3 \"inch\""));
}

TEST_CASE("text after a closing quote is an error", "[unit]") {
    CHECK_THAT(errorOf("a,b\n\"x\"y,2\n"),
               Catch::Contains("t.csv:2") && Catch::Contains("after the closing quote"));
}

TEST_CASE("a lone carriage return is an error", "[unit]") {
    CHECK_THAT(errorOf("a,b\n1,2\r3,4\n"), Catch::Contains("carriage return"));
}

TEST_CASE("invalid UTF-8 names line, byte, field and the fix", "[unit]") {
    // RFC 3629 section 3/4: C0 80 is an overlong form, ED A0 80 a surrogate, a lone 80 a stray
    // continuation byte, F4 90 80 80 lies above U+10FFFF; E2 82 is truncated.
    for (const std::string bad : {"\xC0\x80", "\xED\xA0\x80", "\x80", "\xF4\x90\x80\x80", "\xE2\x82"}) {
        const std::string e = errorOf("a,b\n1,2\nok,x" + bad + "\n");
        CHECK_THAT(e, Catch::Contains("t.csv:3") && Catch::Contains("column b (2)") &&
                          Catch::Contains("invalid UTF-8 at byte 5 of line 3 (field 2)") &&
                          Catch::Contains("save the file as UTF-8"));
    }
    // Inside a quoted field spanning lines, the line of the bad byte is given.
    CHECK_THAT(errorOf("a,b\n1,\"x\n\xFFy\"\n"),
               Catch::Contains("invalid UTF-8 at byte 1 of line 3 (field 2)"));
}

TEST_CASE("csvField quotes only what needs quoting", "[unit]") {
    CHECK(csvField("plain") == "plain");
    CHECK(csvField("") == "");
    CHECK(csvField("a,b") == "\"a,b\"");
    CHECK(csvField("say \"hi\"") == "\"say \"\"hi\"\"\""); // RFC 4180 2.7
    CHECK(csvField("two\nlines") == "\"two\nlines\"");
    CHECK(csvField("cr\rlf") == "\"cr\rlf\"");
    CHECK(csvField(" edge") == "\" edge\"");
    CHECK(csvField("\xC5\x8Cpiri") == "\xC5\x8Cpiri");
}

TEST_CASE("csvField output reads back unchanged", "[unit]") {
    const std::vector<std::string> values{"a,b", "\"", "x\r\ny", " s ", "", "\xF0\x9F\x90\x9A,\"\n"};
    std::string text = "v,w\n";
    for (const auto& v : values) text += csvField(v) + "," + csvField(v) + "\n";
    Rows expected;
    for (const auto& v : values) expected.push_back({v, v});
    CHECK(parse(text).rows == expected);
}

// Throughput on a 1,000,000-row occurrences.csv-like file; run by hand: db_tests "[.bench]".
TEST_CASE("readCsv throughput on a million rows", "[.bench]") {
    std::string text = "sample,taxon,abundance,status\n";
    for (int i = 0; i < 1'000'000; ++i)
        text += "S-" + std::to_string(i / 20) + ",T-" + std::to_string(i % 97) + "," +
                std::to_string(i % 500) + (i % 7 == 0 ? ",reworked\n" : ",in_place\n");
    std::size_t fields = 0;
    const auto start = std::chrono::steady_clock::now();
    readCsv(text, "occurrences.csv", [](const CsvRecord&) {},
            [&](const CsvRecord& r) { fields += r.fields.size(); });
    const std::chrono::duration<double> took = std::chrono::steady_clock::now() - start;
    std::cout << "readCsv: " << fields << " fields, " << text.size() / 1e6 << " MB in "
              << took.count() << " s = " << fields / took.count() / 1e6 << " million fields/s\n";
    CHECK(fields == 4'000'000);
}
