#pragma once
// A problem found in a dataset: where it is (table, row, column), what value, what is wrong and
// how to fix it. Validation returns every issue, not only the first.
#include "atollog/engine/core_dataset.hpp"

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace atollog {

enum class Severity { Warning, Error };
std::string_view toString(Severity s);

struct DataIssue {
    Severity severity = Severity::Error;
    Table table = Table::Holes;
    std::optional<std::size_t> row; ///< 0-based index into the table's vector; nullopt = table-wide
    std::string column;             ///< folder column name (metric spelling, e.g. "top_m"); may be empty
    std::string value;              ///< the offending value as text; may be empty
    std::string problem;            ///< what is wrong, e.g. "base_m 12.0 is above top_m 14.5"
    std::string fix;                ///< what to do, e.g. "swap top_m and base_m"
    bool operator==(const DataIssue&) const = default;
};

bool hasErrors(const std::vector<DataIssue>& issues);

} // namespace atollog
