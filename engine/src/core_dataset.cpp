#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/data_issue.hpp"

#include <algorithm>

namespace atollog {

std::string_view tableName(Table t) {
    switch (t) {
    case Table::Holes: return "holes";
    case Table::Runs: return "runs";
    case Table::Intervals: return "intervals";
    case Table::Samples: return "samples";
    case Table::Taxa: return "taxa";
    case Table::Occurrences: return "occurrences";
    case Table::Events: return "events";
    case Table::Dates: return "dates";
    case Table::Zones: return "zones";
    case Table::SeaLevel: return "sealevel";
    case Table::Curve: return "curve";
    }
    return "?";
}

std::string_view tableFileName(Table t) {
    switch (t) {
    case Table::Holes: return "holes.csv";
    case Table::Runs: return "runs.csv";
    case Table::Intervals: return "intervals.csv";
    case Table::Samples: return "samples.csv";
    case Table::Taxa: return "taxa.csv";
    case Table::Occurrences: return "occurrences.csv";
    case Table::Events: return "events.csv";
    case Table::Dates: return "dates.csv";
    case Table::Zones: return "zones.csv";
    case Table::SeaLevel: return "sealevel.csv";
    case Table::Curve: return "curve.csv";
    }
    return "?";
}

std::string_view toString(Severity s) { return s == Severity::Error ? "error" : "warning"; }

bool hasErrors(const std::vector<DataIssue>& issues) {
    return std::any_of(issues.begin(), issues.end(),
                       [](const DataIssue& i) { return i.severity == Severity::Error; });
}

} // namespace atollog
