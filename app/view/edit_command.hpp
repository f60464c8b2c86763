#pragma once
// One row edit of the project on the undo stack. The edit is applied *before* it is pushed
// (pushEdit), so a refused edit never enters the stack; the command's first redo, which
// QUndoStack::push calls, is then a no-op. Undo applies the inverse edit applyEdit returned,
// redo applies the inverse of that inverse: every step is one write transaction checked by the
// engine's rules, like the edit itself.
//
// An undo or redo can still be refused (another writer changed the row meanwhile) or fail
// (the file is locked). The command then marks itself obsolete, so QUndoStack drops it and the
// stack stays true to the file, and the message goes to the `failed` callback: never a crash.
#include "atollog/db/project_edits.hpp"

#include <QString>
#include <QUndoCommand>

#include <functional>

class QUndoStack;

namespace atollog::view {

/// Called after every write the stack makes (first apply, undo, redo) with the warnings it
/// brought in, formatted; and with a message when an undo or redo could not be made.
struct EditCallbacks {
    std::function<void(const QStringList &warnings)> applied;
    std::function<void(const QString &message)> failed;
};

class EditCommand : public QUndoCommand {
  public:
    /// `undo_edit` is the inverse of `done`, which is already in the project.
    EditCommand(db::ProjectStore &store, db::RowEdit done, db::RowEdit undo_edit,
                const QString &text, EditCallbacks callbacks);

    void undo() override;
    void redo() override;

    const db::RowEdit &doneEdit() const { return done_; }

  private:
    /// Applies `edit`; on success `opposite` becomes its inverse. False after a failure.
    bool apply(const db::RowEdit &edit, db::RowEdit &opposite);

    db::ProjectStore &store_;
    db::RowEdit done_;      ///< redo applies this
    db::RowEdit undo_edit_; ///< undo applies this
    EditCallbacks callbacks_;
    bool first_redo_ = true; ///< the edit was applied before the push
};

/// Applies `edit` to the project and, when it is accepted, pushes its command onto `stack`.
/// Throws what applyEdit throws (EditRefused, ProjectError): then nothing was pushed and the
/// project is unchanged. Returns the warnings the edit brought in.
std::vector<db::EditProblem> pushEdit(QUndoStack &stack, db::ProjectStore &store,
                                      const db::RowEdit &edit, const QString &text,
                                      const EditCallbacks &callbacks);

/// Every problem of a refusal, one per line, each naming table, row, field, value and fix.
QString refusalText(const db::EditRefused &refused);
/// Problems (refusal or warnings) one per line.
QStringList problemLines(const std::vector<db::EditProblem> &problems);

} // namespace atollog::view
