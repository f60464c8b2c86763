#pragma once
// Row edits of a project: add, update or remove one row of holes, runs, intervals, samples,
// occurrences, events, dates or zones, each in its own write transaction, checked with the
// engine's rules before it commits, and answered with the inverse edit (for undo).
//
// A row is named by its whole value as it was read (`before`): the edit finds the first stored
// row equal to it. A row another writer changed meanwhile is then not found and the edit is
// refused rather than overwriting that change.
#include "atollog/db/edit_refused.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <cstdint>
#include <optional>
#include <variant>
#include <vector>

namespace atollog::db {

class ProjectStore;

/// One row of an editable table.
using EditableRow = std::variant<Hole, CoreRun, LithInterval, Sample, Occurrence,
                                 TimeScaleEvent, NumericalDate, Zone>;

/// The dataset table a row belongs to.
Table tableOf(const EditableRow& row);

enum class EditKind { Add, Update, Remove };

struct RowEdit {
    EditKind kind = EditKind::Add;
    std::optional<EditableRow> before; ///< Update, Remove: the row as read (names the row)
    std::optional<EditableRow> after;  ///< Add, Update: the row as it shall be
    /// Add only: the stored row id to insert at, so that undoing a removal puts the row back
    /// in its place (row order is stored id order). Empty: after the last row. When the id has
    /// been taken meanwhile, the row goes after the last one.
    std::optional<std::int64_t> position;

    static RowEdit add(EditableRow row) { return {EditKind::Add, std::nullopt, std::move(row), {}}; }
    static RowEdit update(EditableRow from, EditableRow to) {
        return {EditKind::Update, std::move(from), std::move(to), {}};
    }
    static RowEdit remove(EditableRow row) { return {EditKind::Remove, std::move(row), {}, {}}; }
    bool operator==(const RowEdit&) const = default;
};

struct EditOutcome {
    RowEdit inverse;  ///< applying it undoes the edit; the inverse of the inverse redoes it
    /// Warnings the edit brought in (e.g. over 100 % recovery): shown, not refused. Same form
    /// as a refusal's problems (the row by its key, the engine's words).
    std::vector<EditProblem> warnings;
};

/// Applies `edit` in one write transaction (BEGIN IMMEDIATE with the project's busy timeout
/// and retries, so a second writer waits). Refused with EditRefused, the project unchanged,
/// when the edit would bring in an error of validateDataset (one that was not there before,
/// checked over the edited row's scope), when it names a row that is not stored, or when a
/// removal would leave rows referring to nothing (remove those first). SQLite failures
/// (e.g. "database is locked" after the timeout) throw ProjectError.
EditOutcome applyEdit(ProjectStore& store, const RowEdit& edit);

} // namespace atollog::db
