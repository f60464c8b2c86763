#pragma once
// The project as the logging desk edits it: one open ProjectStore, the dataset as last read
// from it, and the undo stack of the edits made through the desk. Every write goes through
// applyEdit (one transaction, the engine's checks); after every write, undo and redo the
// dataset is read back from the file, so the tables always show what is stored.
//
// Refusals and failures become a message (lastMessage, messageChanged), never an exception
// out of here: edit() returns false and the project is unchanged.
#include "atollog/db/project_edits.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <QObject>
#include <QString>

#include <memory>
#include <vector>

class QUndoStack;

namespace atollog::db {
class ProjectStore;
}

namespace atollog::view {

class DeskProject : public QObject {
    Q_OBJECT

  public:
    explicit DeskProject(QObject *parent = nullptr);
    ~DeskProject() override;

    /// Opens the project file (the undo stack starts empty); false, with lastMessage, when it
    /// cannot be opened (the previous project is then closed).
    bool open(const QString &path);
    void close();
    bool isOpen() const { return store_ != nullptr; }
    const QString &path() const { return path_; }

    /// The dataset as last read from the file.
    const CoreDataset &data() const { return data_; }
    QUndoStack *undoStack() const { return stack_; }

    /// Applies the edit and puts it on the undo stack. False when it was refused or failed:
    /// nothing was written, nothing pushed, and lastMessage says why (each problem naming
    /// table, row, field, value and fix). Warnings the edit brought in become the message too.
    bool edit(const db::RowEdit &edit, const QString &label);
    /// Several edits of one gesture as one undo step, all or none (edit_batch.hpp).
    bool editAll(const std::vector<db::RowEdit> &edits, const QString &label);

    /// Shows a refusal that did not come from applyEdit (e.g. no room for a new interval).
    void reportRefusal(const QString &message) { setMessage(message, true); }

    /// The newest refusal, failure or warning; empty after a clean edit.
    const QString &lastMessage() const { return message_; }
    /// True when lastMessage is a refusal or failure (not only warnings).
    bool lastWasRefusal() const { return refusal_; }

  signals:
    /// The dataset was read again after a write (edit, undo, redo).
    void changed();
    void messageChanged(const QString &message, bool refusal);
    /// Something was written to the file (an edit, an undo or a redo that went through).
    void written();

  private:
    void reload();
    void setMessage(const QString &message, bool refusal);

    std::unique_ptr<db::ProjectStore> store_;
    QString path_;
    CoreDataset data_;
    QUndoStack *stack_ = nullptr;
    QString message_;
    bool refusal_ = false;
};

} // namespace atollog::view
