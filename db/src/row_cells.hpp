#pragma once
// Typed access to the cells of one data record, reporting each bad cell (file, line, column as
// written, value, problem, fix) and remembering whether the record was clean.
#include "atollog/engine/core_records.hpp"
#include "table_header.hpp"

#include <optional>
#include <string>
#include <string_view>

namespace atollog::db::folder_io {

class RowCells {
  public:
    RowCells(const TableHeader& header, ProblemList& problems)
        : header_(header), problems_(problems) {}

    void start(const CsvRecord& record) {
        record_ = &record;
        clean_ = true;
    }
    /// True when no cell of the current record had a problem.
    bool clean() const { return clean_; }

    /// Cell text, "" when the file lacks the column.
    std::string_view cell(int column) const;
    bool given(int column) const { return !cell(column).empty(); }

    /// Free text, verbatim (may be empty).
    std::string text(int column) const { return std::string(cell(column)); }
    std::string requiredText(int column);
    /// An id: no leading or trailing spaces; required ones must not be empty.
    std::string requiredId(int column);
    std::optional<std::string> optionalId(int column);

    /// A number in the column's canonical unit (metres, Ma); nullopt when empty or bad.
    std::optional<double> number(int column);
    double requiredNumber(int column);

    /// A word of a closed vocabulary; nullopt when empty or unknown (unknown is reported).
    template <class Enum>
    std::optional<Enum> word(int column, std::optional<Enum> (*parse)(std::string_view),
                             bool required = false);
    std::optional<bool> yesNo(int column);
    std::optional<Abundance> abundance(int column);

    FreeAttributes freeAttributes() const;

    /// Reports a problem with a cell of the current record (the file may lack the column).
    void report(int column, std::string problem, std::string fix);

  private:
    bool requirePresent(int column);
    void checkIdSpaces(int column);

    const TableHeader& header_;
    ProblemList& problems_;
    const CsvRecord* record_ = nullptr;
    bool clean_ = true;
};

namespace row_cells_detail {
std::string lowerTrimmed(std::string_view s);
}

template <class Enum>
std::optional<Enum> RowCells::word(int column, std::optional<Enum> (*parse)(std::string_view),
                                   bool required) {
    if (required && !requirePresent(column)) return std::nullopt;
    const std::string_view value = cell(column);
    if (value.empty()) return std::nullopt;
    if (auto v = parse(value)) return v;
    std::string fix = "expected one of: " + allowedWords<Enum>();
    if (const std::string near = row_cells_detail::lowerTrimmed(value);
        near != value && parse(near))
        fix = "write it exactly as " + near + " (lower case, no spaces); " + fix;
    report(column, "unknown word for " + header_.writtenName(column), std::move(fix));
    return std::nullopt;
}

} // namespace atollog::db::folder_io
