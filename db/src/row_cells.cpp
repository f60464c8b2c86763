#include "row_cells.hpp"

#include "decimal_number.hpp"

#include <algorithm>
#include <cctype>

namespace atollog::db::folder_io {
namespace row_cells_detail {
std::string lowerTrimmed(std::string_view s) {
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.front()))) s.remove_prefix(1);
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.back()))) s.remove_suffix(1);
    std::string out(s);
    std::transform(out.begin(), out.end(), out.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return out;
}
} // namespace row_cells_detail

namespace {
bool isSpace(char c) { return c == ' ' || c == '\t' || c == '\r' || c == '\n'; }
} // namespace

std::string_view RowCells::cell(int column) const {
    const int field = header_.fieldOf(column);
    if (field < 0) return {};
    return record_->fields[static_cast<std::size_t>(field)];
}

void RowCells::report(int column, std::string problem, std::string fix) {
    InputProblem p;
    p.file = header_.file();
    p.line = record_->line;
    p.column = header_.writtenName(column);
    const int field = header_.fieldOf(column);
    p.column_number = field < 0 ? 0 : static_cast<std::size_t>(field) + 1;
    p.value = std::string(cell(column));
    p.problem = std::move(problem);
    p.fix = std::move(fix);
    problems_.add(std::move(p));
    clean_ = false;
}

bool RowCells::requirePresent(int column) {
    if (given(column)) return true;
    report(column, "empty cell in the required column " + header_.writtenName(column),
           "fill in a value (every row of " + header_.file() + " needs one) or delete the row");
    return false;
}

void RowCells::checkIdSpaces(int column) {
    const std::string_view id = cell(column);
    if (id.empty() || (!isSpace(id.front()) && !isSpace(id.back()))) return;
    std::string_view t = id;
    while (!t.empty() && isSpace(t.front())) t.remove_prefix(1);
    while (!t.empty() && isSpace(t.back())) t.remove_suffix(1);
    report(column, "the id has leading or trailing spaces",
           "remove the spaces: write '" + std::string(t) + "' (ids are matched exactly)");
}

std::string RowCells::requiredText(int column) {
    requirePresent(column);
    return text(column);
}

std::string RowCells::requiredId(int column) {
    if (requirePresent(column)) checkIdSpaces(column);
    return text(column);
}

std::optional<std::string> RowCells::optionalId(int column) {
    if (!given(column)) return std::nullopt;
    checkIdSpaces(column);
    return text(column);
}

std::optional<double> RowCells::number(int column) {
    const std::string_view value = cell(column);
    if (value.empty()) return std::nullopt;
    const ParsedNumber n = parseDecimal(value, header_.scaleOf(column));
    switch (n.syntax) {
    case NumberSyntax::Ok: return n.value;
    case NumberSyntax::NotANumber:
        report(column, "not a number",
               "expected a decimal number like 10.5 with '.' as decimal mark");
        break;
    case NumberSyntax::NotFinite:
        report(column, "NaN and infinity are not allowed",
               "give a finite decimal number like 10.5, or leave the cell empty when the "
               "value is not known and the column is optional");
        break;
    case NumberSyntax::OutOfRange:
        report(column, "the number is out of the range of double precision",
               "check the value and its unit");
        break;
    case NumberSyntax::SurroundingSpace:
        report(column, "spaces around the number", "remove the spaces");
        break;
    }
    return std::nullopt;
}

double RowCells::requiredNumber(int column) {
    if (!requirePresent(column)) return 0;
    return number(column).value_or(0);
}

std::optional<bool> RowCells::yesNo(int column) {
    const std::string_view value = cell(column);
    if (value.empty()) return std::nullopt;
    if (value == "yes") return true;
    if (value == "no") return false;
    report(column, "not yes or no", "expected one of: yes, no (lower case), or an empty cell");
    return std::nullopt;
}

std::optional<Abundance> RowCells::abundance(int column) {
    const std::string_view value = cell(column);
    if (value.empty()) return std::nullopt;
    if (const auto word = parseAbundanceClass(value)) return Abundance{*word};
    if (const auto count = parseWholeCount(value)) return Abundance{*count};
    report(column, "neither an abundance word nor a whole count",
           "expected one of: " + allowedWords<AbundanceClass>() +
               ", or a whole count of 0 or more like 12");
    return std::nullopt;
}

FreeAttributes RowCells::freeAttributes() const {
    FreeAttributes out;
    for (const std::size_t field : header_.freeFields()) {
        const std::string& value = record_->fields[field];
        if (!value.empty()) out.emplace_back(header_.fieldName(field), value);
    }
    return out;
}

} // namespace atollog::db::folder_io
