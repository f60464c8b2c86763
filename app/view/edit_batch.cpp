#include "view/edit_batch.hpp"

#include <QUndoStack>

namespace atollog::view {

void BatchCommand::undo() {
    for (auto part = parts_.rbegin(); part != parts_.rend(); ++part) {
        (*part)->undo();
        if ((*part)->isObsolete()) {
            setObsolete(true); // the file no longer holds what the stack would claim
            return;
        }
    }
}

void BatchCommand::redo() {
    for (auto &part : parts_) {
        part->redo();
        if (part->isObsolete()) {
            setObsolete(true);
            return;
        }
    }
}

std::vector<db::EditProblem> pushEdits(QUndoStack &stack, db::ProjectStore &store,
                                       const std::vector<db::RowEdit> &edits, const QString &text,
                                       const EditCallbacks &callbacks) {
    std::vector<db::EditOutcome> done;
    try {
        for (const db::RowEdit &edit : edits) {
            done.push_back(db::applyEdit(store, edit));
        }
    } catch (...) {
        // All or nothing: take back what this gesture wrote, newest first.
        for (auto d = done.rbegin(); d != done.rend(); ++d) {
            db::applyEdit(store, d->inverse);
        }
        throw;
    }
    auto command = std::make_unique<BatchCommand>(text);
    std::vector<db::EditProblem> warnings;
    for (std::size_t i = 0; i < edits.size(); ++i) {
        command->add(std::make_unique<EditCommand>(store, edits[i], std::move(done[i].inverse),
                                                   text, callbacks));
        warnings.insert(warnings.end(), done[i].warnings.begin(), done[i].warnings.end());
    }
    stack.push(command.release()); // its first redo is each part's no-op first redo
    return warnings;
}

} // namespace atollog::view
