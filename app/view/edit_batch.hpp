#pragma once
// Several row edits made by one gesture (e.g. one grid cell that lists a taxon in place and
// reworked) as one undo step. They are applied one by one, each its own checked transaction;
// when one is refused, those already applied are undone (their inverses, newest first), so the
// gesture writes all or nothing, and the refusal is thrown as by pushEdit. One command then
// holds the parts: undo undoes them newest first, redo redoes them in order.
#include "view/edit_command.hpp"

#include <memory>
#include <vector>

namespace atollog::view {

class BatchCommand : public QUndoCommand {
  public:
    explicit BatchCommand(const QString &text) : QUndoCommand(text) {}
    void add(std::unique_ptr<EditCommand> part) { parts_.push_back(std::move(part)); }
    void undo() override;
    void redo() override;

  private:
    std::vector<std::unique_ptr<EditCommand>> parts_;
};

/// Applies all `edits` or none and pushes them as one command. Throws what applyEdit throws
/// for the first refused edit (the project then holds what it held before). Returns the
/// warnings the edits brought in.
std::vector<db::EditProblem> pushEdits(QUndoStack &stack, db::ProjectStore &store,
                                       const std::vector<db::RowEdit> &edits, const QString &text,
                                       const EditCallbacks &callbacks);

} // namespace atollog::view
