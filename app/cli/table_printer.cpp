#include "cli/table_printer.hpp"

#include "atollog/db/csv_reader.hpp"

#include <algorithm>
#include <charconv>
#include <cstdio>
#include <ostream>
#include <stdexcept>

namespace atollog::cli {
namespace {

// Display width in code points, so names with accents line up (UTF-8 continuation bytes skipped).
std::size_t displayWidth(const std::string& s) {
    return static_cast<std::size_t>(
        std::count_if(s.begin(), s.end(), [](char c) { return (static_cast<unsigned char>(c) & 0xC0) != 0x80; }));
}

} // namespace

TablePrinter::TablePrinter(std::vector<Column> columns) : columns_(std::move(columns)) {}

void TablePrinter::addRow(std::vector<std::string> cells) {
    if (cells.size() != columns_.size())
        throw std::logic_error("TablePrinter: row has " + std::to_string(cells.size()) +
                               " cells for " + std::to_string(columns_.size()) + " columns");
    rows_.push_back(std::move(cells));
}

void TablePrinter::printText(std::ostream& out) const {
    std::vector<std::size_t> width(columns_.size());
    for (std::size_t c = 0; c < columns_.size(); ++c) {
        width[c] = displayWidth(columns_[c].name);
        for (const auto& row : rows_) width[c] = std::max(width[c], displayWidth(row[c]));
    }
    auto printRow = [&](const auto& cellAt) {
        std::string line;
        for (std::size_t c = 0; c < columns_.size(); ++c) {
            const std::string& cell = cellAt(c);
            const std::string pad(width[c] - displayWidth(cell), ' ');
            if (c > 0) line += "  ";
            line += columns_[c].align == Align::Right ? pad + cell : cell + pad;
        }
        while (!line.empty() && line.back() == ' ') line.pop_back();
        out << line << '\n';
    };
    printRow([&](std::size_t c) -> const std::string& { return columns_[c].name; });
    for (const auto& row : rows_) printRow([&](std::size_t c) -> const std::string& { return row[c]; });
}

void TablePrinter::printCsv(std::ostream& out) const {
    for (std::size_t c = 0; c < columns_.size(); ++c)
        out << (c ? "," : "") << db::csvField(columns_[c].name);
    out << '\n';
    for (const auto& row : rows_) {
        for (std::size_t c = 0; c < row.size(); ++c) out << (c ? "," : "") << db::csvField(row[c]);
        out << '\n';
    }
}

std::string formatFixed(double value, int decimals) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f", decimals, value);
    std::string s = buf;
    if (s == "-0" || s.rfind("-0.", 0) == 0) { // avoid printing "-0.00" for tiny negatives
        if (s.find_first_not_of("-0.") == std::string::npos) s.erase(0, 1);
    }
    return s;
}

std::string formatNumber(double value, bool csv, int decimals) {
    if (!csv) return formatFixed(value, decimals);
    char buf[64];
    const auto result = std::to_chars(buf, buf + sizeof buf, value);
    return std::string(buf, result.ptr);
}

} // namespace atollog::cli
