#pragma once
// Internals of validateDataset shared by its validate_*.cpp files (one concern each): the list
// issues are collected in, the id indexes built once per dataset, and the checks themselves.
// Not part of the engine's public interface; tests use validateDataset.
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/data_issue.hpp"

#include <cstddef>
#include <string>
#include <string_view>
#include <unordered_map>
#include <vector>

namespace atollog::detail {

class IssueList {
  public:
    void error(Table table, std::size_t row, std::string column, std::string value,
               std::string problem, std::string fix) {
        add(Severity::Error, table, row, std::move(column), std::move(value), std::move(problem),
            std::move(fix));
    }
    void warning(Table table, std::size_t row, std::string column, std::string value,
                 std::string problem, std::string fix) {
        add(Severity::Warning, table, row, std::move(column), std::move(value), std::move(problem),
            std::move(fix));
    }
    /// Issues in table order, then row order; checks of one row keep the order they ran in.
    std::vector<DataIssue> sorted() &&;

  private:
    void add(Severity s, Table table, std::size_t row, std::string column, std::string value,
             std::string problem, std::string fix) {
        issues_.push_back({s, table, row, std::move(column), std::move(value), std::move(problem),
                           std::move(fix)});
    }
    std::vector<DataIssue> issues_;
};

/// Row of the first record with each id. Views point into the dataset, which must outlive it.
using IdIndex = std::unordered_map<std::string_view, std::size_t>;

struct DatasetIndex {
    IdIndex holes;
    IdIndex samples;
    IdIndex taxa;
    IdIndex events;
    explicit DatasetIndex(const CoreDataset &data);
};

/// "'H1'" for messages.
inline std::string quoted(std::string_view id) {
    return "'" + std::string(id) + "'";
}

void validateFiniteNumbers(const CoreDataset &data, IssueList &out);
void validateIdentifiers(const CoreDataset &data, IssueList &out);
void validateReferences(const CoreDataset &data, const DatasetIndex &index, IssueList &out);
void validateRunsAndCoverage(const CoreDataset &data, IssueList &out);
void validateValueRanges(const CoreDataset &data, IssueList &out);
void validateTextures(const CoreDataset &data, IssueList &out);
void validateDateForms(const CoreDataset &data, IssueList &out);
void validateOccurrences(const CoreDataset &data, IssueList &out);
void validateZones(const CoreDataset &data, IssueList &out);
void validateCurve(const CoreDataset &data, IssueList &out);

} // namespace atollog::detail
