// applyEdit: one row edit in one write transaction. Inside it, in this order: read the edit's
// scope, find the row, apply the edit in memory, compare the engine's issues before and after,
// refuse or write, commit. The check runs under the write lock, so it judges exactly the data
// the edit is written onto, even with another process writing to the same project.
#include "atollog/db/project_edits.hpp"

#include "atollog/db/errors.hpp"
#include "atollog/db/project_store.hpp"
#include "project_edit_detail.hpp"
#include "write_transaction.hpp"

#include <SQLiteCpp/Exception.h>

#include <stdexcept>

namespace atollog::db {
namespace {

void requireShape(const RowEdit& edit) {
    const bool before = edit.before.has_value(), after = edit.after.has_value();
    const bool ok = (edit.kind == EditKind::Add && !before && after) ||
                    (edit.kind == EditKind::Remove && before && !after) ||
                    (edit.kind == EditKind::Update && before && after &&
                     edit.before->index() == edit.after->index());
    if (!ok) {
        throw std::invalid_argument("a row edit needs `after` to add, `before` to remove, and "
                                    "both, of one table, to update");
    }
}

// Free columns are the folder's x_ columns; the schema refuses other names.
void requireFreeColumnNames(const EditableRow& row) {
    const auto& extra = std::visit([](const auto& r) -> const FreeAttributes& { return r.extra; }, row);
    for (const auto& [column, value] : extra) {
        if (column.rfind("x_", 0) == 0) continue;
        throw EditRefused({{std::string(tableName(tableOf(row))), detail::rowKey(row), column,
                            value, "free column '" + column + "' does not start with x_",
                            "name extra columns x_something"}});
    }
}

RowEdit inverseOf(const RowEdit& edit, std::int64_t stored_id) {
    switch (edit.kind) {
    case EditKind::Add: return RowEdit::remove(*edit.after);
    case EditKind::Update: return RowEdit::update(*edit.after, *edit.before);
    case EditKind::Remove: {
        RowEdit add = RowEdit::add(*edit.before);
        add.position = stored_id;
        return add;
    }
    }
    throw std::logic_error("unknown edit kind");
}

} // namespace

Table tableOf(const EditableRow& row) {
    return std::visit(
        [](const auto& r) { return detail::RowTable<std::decay_t<decltype(r)>>::table; }, row);
}

EditOutcome applyEdit(ProjectStore& store, const RowEdit& edit) {
    requireShape(edit);
    if (edit.after) requireFreeColumnNames(*edit.after);
    SQLite::Database& db = store.database();
    const EditableRow& row = edit.after ? *edit.after : *edit.before;
    const Table table = tableOf(row);
    try {
        detail::WriteTransaction transaction(db);
        const detail::EditScope scope = detail::loadEditScope(db, edit);

        std::optional<detail::RowPlace> place;
        if (edit.before) {
            place = detail::findRow(scope, *edit.before);
            if (!place) {
                throw EditRefused({{std::string(tableName(table)), detail::rowKey(*edit.before),
                                    "", "",
                                    detail::rowKey(*edit.before) +
                                        " is not in the project as it was read (changed or "
                                        "removed meanwhile)",
                                    "read the project again and repeat the edit"}});
            }
        }
        const std::int64_t stored_id = edit.kind == EditKind::Add
                                           ? detail::idForAddedRow(db, table, edit.position)
                                           : place->id;

        CoreDataset after = scope.data;
        detail::DatasetRowIds after_ids = scope.ids;
        const std::optional<std::size_t> edited_after =
            detail::applyInMemory(after, after_ids, edit, place, stored_id);
        const std::optional<std::size_t> edited_before =
            place ? std::optional(place->index) : std::nullopt;
        detail::EditCheck check =
            detail::checkEdit(db, scope.data, edited_before, after, after_ids, edited_after, table);
        if (edit.kind == EditKind::Remove) {
            if (auto orphans = detail::rowsReferringTo(db, stored_id, *edit.before)) {
                check.refusals.insert(check.refusals.begin(), *orphans);
            }
        }
        if (!check.refusals.empty()) throw EditRefused(std::move(check.refusals));

        switch (edit.kind) {
        case EditKind::Add: detail::insertRow(db, stored_id, *edit.after); break;
        case EditKind::Update: detail::updateRow(db, stored_id, *edit.after); break;
        case EditKind::Remove: detail::deleteRow(db, stored_id, *edit.before); break;
        }
        transaction.commit();
        return {inverseOf(edit, stored_id), std::move(check.warnings)};
    } catch (const SQLite::Exception& e) {
        throw ProjectError("cannot edit " + std::string(tableName(table)) + " of " +
                           store.path().string() + ": " + e.what() + "; the project is unchanged");
    } catch (const ProjectError& e) {
        throw ProjectError("cannot edit " + std::string(tableName(table)) + " of " +
                           store.path().string() + ": " + e.what() + "; the project is unchanged");
    }
}

} // namespace atollog::db
