// validateDataset: runs every check of the core data folder contract and returns all issues.
// The checks live in validate_*.cpp, one concern each; they skip values another check already
// reports (a NaN depth is reported once as non-finite, not again as "base above top").
#include "atollog/engine/validation.hpp"

#include "atollog/engine/validation_detail.hpp"

#include <algorithm>

namespace atollog {
namespace detail {

std::vector<DataIssue> IssueList::sorted() && {
    std::stable_sort(issues_.begin(), issues_.end(), [](const DataIssue &a, const DataIssue &b) {
        if (a.table != b.table)
            return a.table < b.table;
        // Table-wide issues (no row) first.
        if (a.row.has_value() != b.row.has_value())
            return !a.row.has_value();
        return a.row.value_or(0) < b.row.value_or(0);
    });
    return std::move(issues_);
}

namespace {
// The first row with each id wins; later duplicates are reported by validateIdentifiers.
template <class Rows, class IdOf> IdIndex indexOf(const Rows &rows, IdOf id_of) {
    IdIndex index;
    index.reserve(rows.size());
    for (std::size_t i = 0; i < rows.size(); ++i)
        index.try_emplace(id_of(rows[i]), i);
    return index;
}
} // namespace

DatasetIndex::DatasetIndex(const CoreDataset &data)
    : holes(indexOf(data.holes, [](const Hole &h) -> std::string_view { return h.hole; })),
      samples(indexOf(data.samples, [](const Sample &s) -> std::string_view { return s.sample; })),
      taxa(indexOf(data.taxa, [](const Taxon &t) -> std::string_view { return t.taxon; })),
      events(indexOf(data.events,
                     [](const TimeScaleEvent &e) -> std::string_view { return e.event; })) {}

} // namespace detail

std::vector<DataIssue> validateDataset(const CoreDataset &data) {
    detail::IssueList issues;
    const detail::DatasetIndex index(data);
    detail::validateFiniteNumbers(data, issues);
    detail::validateIdentifiers(data, issues);
    detail::validateReferences(data, index, issues);
    detail::validateRunsAndCoverage(data, issues);
    detail::validateValueRanges(data, issues);
    detail::validateTextures(data, issues);
    detail::validateDateForms(data, issues);
    detail::validateOccurrences(data, issues);
    detail::validateZones(data, issues);
    detail::validateCurve(data, issues);
    return std::move(issues).sorted();
}

} // namespace atollog
