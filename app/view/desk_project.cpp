#include "view/desk_project.hpp"

#include "atollog/db/project_store.hpp"
#include "view/edit_batch.hpp"
#include "view/edit_command.hpp"

#include <QUndoStack>

#include <exception>

namespace atollog::view {

namespace {

QString currentExceptionText() {
    try {
        throw;
    } catch (const db::EditRefused &refused) {
        return refusalText(refused);
    } catch (const std::exception &e) {
        return QString::fromStdString(e.what());
    } catch (...) {
        return QStringLiteral("an unknown error");
    }
}

} // namespace

DeskProject::DeskProject(QObject *parent) : QObject(parent), stack_(new QUndoStack(this)) {}

DeskProject::~DeskProject() = default;

bool DeskProject::open(const QString &path) {
    close();
    try {
        auto store = std::make_unique<db::ProjectStore>(db::ProjectStore::open(path.toStdString()));
        data_ = store->loadDataset();
        store_ = std::move(store);
        path_ = path;
        setMessage({}, false);
    } catch (...) {
        data_ = {};
        setMessage(QStringLiteral("cannot open %1 for logging: %2").arg(path, currentExceptionText()),
                   true);
    }
    emit changed();
    return isOpen();
}

void DeskProject::close() {
    stack_->clear(); // its commands refer to the store
    store_.reset();
    path_.clear();
    data_ = {};
}

bool DeskProject::edit(const db::RowEdit &edit, const QString &label) {
    return editAll({edit}, label);
}

bool DeskProject::editAll(const std::vector<db::RowEdit> &edits, const QString &label) {
    if (!store_) {
        setMessage(QStringLiteral("no project is open; open one first"), true);
        return false;
    }
    if (edits.empty()) {
        return true; // nothing to write
    }
    EditCallbacks callbacks;
    callbacks.applied = [this](const QStringList &warnings) {
        reload();
        setMessage(warnings.join(QLatin1Char('\n')), false);
        emit changed();
        emit written();
    };
    callbacks.failed = [this](const QString &message) {
        reload(); // the file is the truth, whatever the stack thought
        setMessage(message, true);
        emit changed();
    };
    try {
        const auto warnings = edits.size() == 1
                                  ? pushEdit(*stack_, *store_, edits.front(), label, callbacks)
                                  : pushEdits(*stack_, *store_, edits, label, callbacks);
        reload();
        setMessage(problemLines(warnings).join(QLatin1Char('\n')), false);
        emit changed();
        emit written();
        return true;
    } catch (...) {
        setMessage(currentExceptionText(), true);
        // A refusal may come from rows another writer changed (the row as read is not found
        // any more): read the file again so the tables show what it holds now.
        reload();
        emit changed();
        return false;
    }
}

void DeskProject::reload() {
    try {
        data_ = store_->loadDataset();
    } catch (...) {
        setMessage(QStringLiteral("cannot read %1 again: %2").arg(path_, currentExceptionText()),
                   true);
    }
}

void DeskProject::setMessage(const QString &message, bool refusal) {
    message_ = message;
    refusal_ = refusal && !message.isEmpty();
    emit messageChanged(message_, refusal_);
}

} // namespace atollog::view
