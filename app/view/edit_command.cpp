#include "view/edit_command.hpp"

#include <QStringList>
#include <QUndoStack>

#include <exception>

namespace atollog::view {

EditCommand::EditCommand(db::ProjectStore &store, db::RowEdit done, db::RowEdit undo_edit,
                         const QString &text, EditCallbacks callbacks)
    : QUndoCommand(text), store_(store), done_(std::move(done)),
      undo_edit_(std::move(undo_edit)), callbacks_(std::move(callbacks)) {}

bool EditCommand::apply(const db::RowEdit &edit, db::RowEdit &opposite) {
    QString message;
    try {
        db::EditOutcome outcome = db::applyEdit(store_, edit);
        opposite = std::move(outcome.inverse);
        if (callbacks_.applied) {
            callbacks_.applied(problemLines(outcome.warnings));
        }
        return true;
    } catch (const db::EditRefused &refused) {
        message = refusalText(refused);
    } catch (const std::exception &e) {
        message = QString::fromStdString(e.what());
    } catch (...) {
        message = QStringLiteral("an unknown error");
    }
    // The project holds what it held before this step; drop the command so the stack does not
    // claim otherwise (QUndoStack deletes an obsolete command after undo/redo).
    setObsolete(true);
    if (callbacks_.failed) {
        callbacks_.failed(QStringLiteral("cannot %1 \"%2\": %3")
                              .arg(&edit == &undo_edit_ ? QStringLiteral("undo")
                                                        : QStringLiteral("redo"),
                                   text(), message));
    }
    return false;
}

void EditCommand::undo() {
    db::RowEdit redo_edit;
    if (apply(undo_edit_, redo_edit)) {
        done_ = std::move(redo_edit);
    }
}

void EditCommand::redo() {
    if (first_redo_) {
        first_redo_ = false; // pushEdit applied it already
        return;
    }
    db::RowEdit inverse;
    if (apply(done_, inverse)) {
        undo_edit_ = std::move(inverse);
    }
}

std::vector<db::EditProblem> pushEdit(QUndoStack &stack, db::ProjectStore &store,
                                      const db::RowEdit &edit, const QString &text,
                                      const EditCallbacks &callbacks) {
    db::EditOutcome outcome = db::applyEdit(store, edit); // throws before anything is pushed
    stack.push(new EditCommand(store, edit, std::move(outcome.inverse), text, callbacks));
    return outcome.warnings;
}

QStringList problemLines(const std::vector<db::EditProblem> &problems) {
    QStringList lines;
    for (const db::EditProblem &p : problems) {
        lines << QString::fromStdString(p.format());
    }
    return lines;
}

QString refusalText(const db::EditRefused &refused) {
    return problemLines(refused.problems()).join(QLatin1Char('\n'));
}

} // namespace atollog::view
