#pragma once
// A table of text cells printed either aligned for people or as RFC 4180 CSV for programs.
// Column names carry their unit suffix (cored_m, recovery_pct) in both forms.
#include <iosfwd>
#include <string>
#include <vector>

namespace atollog::cli {

class TablePrinter {
  public:
    enum class Align { Left, Right };
    struct Column {
        std::string name;
        Align align = Align::Left;
    };

    explicit TablePrinter(std::vector<Column> columns);
    void addRow(std::vector<std::string> cells);
    std::size_t rowCount() const { return rows_.size(); }
    /// The columns and the cells as added (for a view that shows the same table).
    const std::vector<Column>& columns() const { return columns_; }
    const std::vector<std::vector<std::string>>& rows() const { return rows_; }
    void printText(std::ostream& out) const;
    void printCsv(std::ostream& out) const;
    void print(std::ostream& out, bool csv) const { csv ? printCsv(out) : printText(out); }

  private:
    std::vector<Column> columns_;
    std::vector<std::vector<std::string>> rows_;
};

/// Fixed-point text for tables: formatFixed(12.345, 2) == "12.35".
std::string formatFixed(double value, int decimals);

/// A number for a table cell: shortest round-trip form in CSV (programs read it back exactly),
/// fixed `decimals` in the aligned text form (people read it).
std::string formatNumber(double value, bool csv, int decimals);

} // namespace atollog::cli
