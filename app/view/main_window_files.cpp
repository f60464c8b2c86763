// The main window's file actions: a new project, a core data folder imported into the open
// project or written out of it. Each goes through the db layer, whose import is all or nothing
// and whose export writes a temporary folder renamed into place, so a refused action leaves the
// project and the folder as they were.
#include "view/exception_text.hpp"
#include "view/logging_desk.hpp"
#include "view/main_window.hpp"
#include "view/panel_canvas.hpp"
#include "view/side_pane.hpp"

#include "atollog/db/core_folder.hpp"
#include "atollog/db/importer.hpp"
#include "atollog/db/project_store.hpp"

#include <QApplication>
#include <QDir>
#include <QFileDialog>
#include <QFileInfo>
#include <QMessageBox>
#include <QStatusBar>

#include <filesystem>

namespace atollog::view {

bool MainWindow::createProject(const QString &path) {
    try {
        db::ProjectStore::create(path.toStdString());
    } catch (...) {
        report(tr("Cannot create the project"), tr("%1\n\n%2").arg(path, exceptionText()));
        return false;
    }
    return openProject(path);
}

bool MainWindow::importFolder(const QString &folder, bool replace) {
    if (project_path_.isEmpty()) {
        report(tr("No project open"), tr("Open or create a project first (File > New project)."));
        return false;
    }
    QApplication::setOverrideCursor(Qt::WaitCursor);
    try {
        auto store = db::ProjectStore::open(project_path_.toStdString());
        const db::ImportResult result = db::importCoreFolder(store, folder.toStdString(), replace);
        QApplication::restoreOverrideCursor();
        openProject(project_path_);
        statusBar()->showMessage(tr("Imported %1 rows from %2 (%3 warnings; atollog check lists "
                                    "them)")
                                     .arg(result.row_count)
                                     .arg(folder)
                                     .arg(result.warnings.size()));
        return true;
    } catch (...) {
        QApplication::restoreOverrideCursor();
        report(tr("Nothing was imported"), tr("%1\n\n%2").arg(folder, exceptionText()));
        return false;
    }
}

bool MainWindow::exportFolder(const QString &folder, bool overwrite) {
    if (project_path_.isEmpty()) {
        report(tr("No project open"), tr("Open a project first."));
        return false;
    }
    try {
        const auto store = db::ProjectStore::open(project_path_.toStdString());
        db::writeCoreFolder(store.loadDataset(), folder.toStdString(), overwrite);
        statusBar()->showMessage(tr("Exported the project to %1").arg(folder), 5000);
        return true;
    } catch (...) {
        report(tr("Nothing was exported"), tr("%1\n\n%2").arg(folder, exceptionText()));
        return false;
    }
}

void MainWindow::showEmptyProject(const QString &path) {
    project_path_ = QFileInfo(path).absoluteFilePath();
    setWindowTitle(tr("%1 - atollog-view").arg(QFileInfo(path).fileName()));
    full_ = {};
    shown_ = {};
    side_->setContent(full_, PanelChoice{});
    side_->setDetails(tr("The project is empty: import a core data folder (File > Import "
                         "folder)."));
    canvas_->setScene(PanelScene{});
    rememberProject(project_path_);
    statusBar()->showMessage(tr("Empty project: File > Import folder reads a core data folder."));
}

void MainWindow::chooseAndCreate() {
    const QString path = QFileDialog::getSaveFileName(this, tr("New project"), QString(),
                                                      tr("atollog projects (*.atollog)"));
    if (!path.isEmpty()) {
        createProject(path.endsWith(QStringLiteral(".atollog")) ? path
                                                                 : path + QStringLiteral(".atollog"));
    }
}

void MainWindow::chooseAndImport() {
    const QString folder = QFileDialog::getExistingDirectory(this, tr("Import a core data folder"));
    if (folder.isEmpty()) {
        return;
    }
    bool replace = false;
    if (!full_.columns.empty()) {
        const auto answer = QMessageBox::question(
            this, tr("Replace the project's data?"),
            tr("The project already holds data. Replace all of it with the folder's? The import "
               "is checked first; nothing changes if the folder has an error."));
        if (answer != QMessageBox::Yes) {
            return;
        }
        replace = true;
    }
    importFolder(folder, replace);
}

void MainWindow::chooseAndExportFolder() {
    const QString folder = QFileDialog::getExistingDirectory(this, tr("Export to a folder"));
    if (folder.isEmpty()) {
        return;
    }
    const bool used = !QDir(folder).isEmpty();
    if (used && QMessageBox::question(this, tr("Overwrite the folder?"),
                                      tr("%1 is not empty. Replace its contents?").arg(folder)) !=
                    QMessageBox::Yes) {
        return;
    }
    exportFolder(folder, used);
}

} // namespace atollog::view
