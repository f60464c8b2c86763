// Which issues of validateDataset an edit brings in: the issues after the edit that were not
// there before. Issues are matched by content, not by row index, because an added or removed
// row shifts the rows after it.
#include "project_edit_detail.hpp"

#include "atollog/engine/validation.hpp"

#include <SQLiteCpp/Statement.h>

#include <map>
#include <tuple>

namespace atollog::db::detail {
namespace {

// "... in data row 12 of ...": a row number inside a message shifts with an added or removed
// row too, so it is left out of the comparison.
std::string withoutRowNumbers(const std::string& text) {
    static const std::string marker = "data row ";
    std::string out;
    std::size_t from = 0;
    while (true) {
        const std::size_t at = text.find(marker, from);
        if (at == std::string::npos) break;
        std::size_t end = at + marker.size();
        while (end < text.size() && text[end] >= '0' && text[end] <= '9') ++end;
        out.append(text, from, at - from).append(marker).append("#");
        from = end;
    }
    return out.append(text, from);
}

const std::vector<std::int64_t>& idsOf(const DatasetRowIds& ids, Table t) {
    static const std::vector<std::int64_t> none;
    switch (t) {
    case Table::Holes: return ids.holes;
    case Table::Runs: return ids.runs;
    case Table::Intervals: return ids.intervals;
    case Table::Samples: return ids.samples;
    case Table::Taxa: return ids.taxa;
    case Table::Occurrences: return ids.occurrences;
    case Table::Events: return ids.events;
    case Table::Dates: return ids.dates;
    case Table::Zones: return ids.zones;
    default: return none;
    }
}

// The engine numbers rows within the dataset it was given; occurrences are only partly in the
// scope, so "data row N" of an issue is rewritten to the row's place in the stored table (the
// engine's messages name the issue's own table when they give a row number).
std::string withStoredRowNumbers(SQLite::Database& db, const DatasetRowIds& ids, Table table,
                                 const std::string& text) {
    static const std::string marker = "data row ";
    const auto& row_ids = idsOf(ids, table);
    std::string out;
    std::size_t from = 0;
    while (true) {
        const std::size_t at = text.find(marker, from);
        if (at == std::string::npos) break;
        std::size_t end = at + marker.size();
        std::size_t number = 0;
        while (end < text.size() && text[end] >= '0' && text[end] <= '9')
            number = number * 10 + static_cast<std::size_t>(text[end++] - '0');
        out.append(text, from, end - from);
        if (number >= 1 && number <= row_ids.size()) {
            // The table name comes from our own switch, never from input.
            SQLite::Statement place(db, "SELECT count(*) FROM " +
                                            std::string(sqlTableName(table)) + " WHERE id < ?");
            place.bind(1, row_ids[number - 1]);
            place.executeStep();
            out.resize(out.size() - (end - at - marker.size()));
            out += std::to_string(place.getColumn(0).getInt64() + 1);
        }
        from = end;
    }
    return out.append(text, from);
}

using IssueKey = std::tuple<Severity, Table, bool, std::string, std::string, std::string,
                            std::string>;

IssueKey keyOf(const DataIssue& issue, Table edited_table, std::optional<std::size_t> edited_row) {
    const bool on_edited = issue.table == edited_table && issue.row && edited_row &&
                           *issue.row == *edited_row;
    return {issue.severity, issue.table, on_edited, issue.column, issue.value,
            withoutRowNumbers(issue.problem), issue.fix};
}

} // namespace

EditCheck checkEdit(SQLite::Database& db, const CoreDataset& before,
                    std::optional<std::size_t> edited_before, const CoreDataset& after,
                    const DatasetRowIds& after_ids, std::optional<std::size_t> edited_after,
                    Table table) {
    std::map<IssueKey, int> there_before;
    for (const DataIssue& issue : validateDataset(before)) {
        ++there_before[keyOf(issue, table, edited_before)];
    }
    EditCheck check;
    for (const DataIssue& issue : validateDataset(after)) {
        auto it = there_before.find(keyOf(issue, table, edited_after));
        if (it != there_before.end() && it->second > 0) {
            --it->second;
            continue;
        }
        EditProblem problem{
            std::string(tableName(issue.table)),
            issue.row ? rowKey(after, issue.table, *issue.row) : std::string("the whole table"),
            issue.column, issue.value,
            withStoredRowNumbers(db, after_ids, issue.table, issue.problem), issue.fix};
        (issue.severity == Severity::Warning ? check.warnings : check.refusals)
            .push_back(std::move(problem));
    }
    return check;
}

} // namespace atollog::db::detail
