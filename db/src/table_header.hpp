#pragma once
// Resolution of a table's header row against its column specs: which field holds which column,
// in which unit, and which fields are free x_ columns. Reports unknown, duplicate and missing
// columns and mixed units.
#include "atollog/db/csv_reader.hpp"
#include "decimal_number.hpp"
#include "folder_tables.hpp"
#include "problem_list.hpp"

#include <string>
#include <vector>

namespace atollog::db::folder_io {

class TableHeader {
  public:
    /// Checks `header` (the first record of `file`) and reports its problems to `problems`.
    TableHeader(const TableSpec& spec, const CsvRecord& header, std::string file,
                ProblemList& problems);

    /// False when the header has an error: the rows are then not read.
    bool usable() const { return usable_; }
    const TableSpec& spec() const { return *spec_; }
    const std::string& file() const { return file_; }

    /// 0-based field index of a spec column, or -1 when the file does not have it.
    int fieldOf(int column) const { return field_of_column_[static_cast<std::size_t>(column)]; }
    /// Scale from the written unit to metres or Ma.
    DecimalScale scaleOf(int column) const {
        return scale_of_column_[static_cast<std::size_t>(column)];
    }
    /// The name as written in the file (top_ft), or the canonical one when the file lacks it.
    std::string writtenName(int column) const;
    /// Column of a canonical name ("top_m"), or -1.
    int columnNamed(std::string_view canonical) const;
    /// Fields of the x_ columns, in header order, and their names.
    const std::vector<std::size_t>& freeFields() const { return free_fields_; }
    const std::string& fieldName(std::size_t field) const { return names_[field]; }

  private:
    void resolve(ProblemList& problems, std::size_t line);
    void checkUnits(ProblemList& problems, std::size_t line);

    const TableSpec* spec_;
    std::string file_;
    std::vector<std::string> names_;
    std::vector<int> field_of_column_;
    std::vector<DecimalScale> scale_of_column_;
    std::vector<std::string_view> unit_of_column_; // suffix as written: "_m", "_ft", "_ka" ...
    std::vector<std::size_t> free_fields_;
    bool usable_ = true;
};

} // namespace atollog::db::folder_io
