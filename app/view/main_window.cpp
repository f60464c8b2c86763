#include "view/main_window.hpp"

#include "cli/figure_file.hpp"
#include "draw/panel_layout.hpp"
#include "view/exception_text.hpp"
#include "atollog/db/project_store.hpp"
#include "view/analysis_window.hpp"
#include "view/figure_window.hpp"
#include "view/logging_desk.hpp"
#include "view/panel_canvas.hpp"
#include "view/project_panel.hpp"
#include "view/selection_details.hpp"
#include "view/side_pane.hpp"

#include <QActionGroup>
#include <QCheckBox>
#include <QApplication>
#include <QCloseEvent>
#include <QComboBox>
#include <QDate>
#include <QDockWidget>
#include <QFileDialog>
#include <QFileInfo>
#include <QInputDialog>
#include <QLabel>
#include <QMenu>
#include <QMenuBar>
#include <QMessageBox>
#include <QSettings>
#include <QStatusBar>
#include <QTimer>
#include <QToolBar>

#include <algorithm>
#include <exception>
#include <set>

namespace atollog::view {

namespace {

constexpr const char *kGeometryKey = "window/geometry";
constexpr const char *kStateKey = "window/state";
constexpr const char *kLastProjectKey = "project/last";
constexpr const char *kRecentProjectsKey = "project/recent"; // newest first
constexpr const char *kTracksKey = "panel/tracks"; // the ticked track words, as --tracks lists them

const char *const kTrackWords[] = {"runs", "lithology", "surfaces", "samples",
                                   "taxa", "zones",     "dates",    "model"};

/// Drafting scales offered; 1:500 is the panel's own default (PanelView).
constexpr int kScales[] = {100, 200, 500, 1000, 2000, 5000};

} // namespace

MainWindow::MainWindow(QWidget *parent) : QMainWindow(parent) {
    setWindowTitle(tr("atollog-view"));
    canvas_ = new PanelCanvas(this);
    setCentralWidget(canvas_);

    side_ = new SidePane(this);
    auto *dock = new QDockWidget(tr("Panel"), this);
    dock->setObjectName(QStringLiteral("side-dock")); // saveState needs names
    dock->setWidget(side_);
    addDockWidget(Qt::RightDockWidgetArea, dock);

    desk_ = new LoggingDesk(this);
    auto *desk_dock = new QDockWidget(tr("Logging desk"), this);
    desk_dock->setObjectName(QStringLiteral("logging-desk-dock"));
    desk_dock->setWidget(desk_);
    addDockWidget(Qt::BottomDockWidgetArea, desk_dock);
    // The side pane keeps its full height; the desk sits under the canvas only.
    setCorner(Qt::BottomRightCorner, Qt::RightDockWidgetArea);
    // The panel shows the whole project, so it follows the desk's edits: once per burst, as
    // loading it builds age models.
    panel_reload_ = new QTimer(this);
    panel_reload_->setSingleShot(true);
    panel_reload_->setInterval(400);
    connect(desk_, &LoggingDesk::projectWritten, panel_reload_, qOverload<>(&QTimer::start));
    connect(panel_reload_, &QTimer::timeout, this, [this] {
        if (!project_path_.isEmpty()) {
            showProjectPanel(project_path_, true);
        }
    });

    readout_ = new QLabel(this);
    statusBar()->addPermanentWidget(readout_);

    sink_ = [this](const QString &title, const QString &text) {
        QMessageBox::critical(this, title, text);
    };

    buildToolBar();
    buildMenus();
    menuBar()->findChild<QMenu *>(QStringLiteral("view-menu"))->addAction(dock->toggleViewAction());
    menuBar()->findChild<QMenu *>(QStringLiteral("view-menu"))->addAction(desk_dock->toggleViewAction());

    connect(side_, &SidePane::choiceChanged, this, [this] {
        refreshFlattenChoices();
        relayout();
    });
    // Track choices persist between sessions; unset: every track shown.
    const QVariant saved = QSettings().value(kTracksKey);
    if (saved.isValid()) {
        const QStringList words = saved.toStringList();
        for (const char *word : kTrackWords) {
            side_->trackBox(QLatin1String(word))->setChecked(words.contains(QLatin1String(word)));
        }
    }
    connect(canvas_, &PanelCanvas::itemSelected, this, &MainWindow::onItemSelected);
    connect(canvas_, &PanelCanvas::columnOrderChanged, this, &MainWindow::onColumnOrderChanged);
    connect(canvas_, &PanelCanvas::cursorReadout, readout_, &QLabel::setText);

    QSettings settings;
    restoreGeometry(settings.value(kGeometryKey).toByteArray());
    restoreState(settings.value(kStateKey).toByteArray());
}

void MainWindow::buildToolBar() {
    auto *bar = addToolBar(tr("Look"));
    bar->setObjectName(QStringLiteral("look-bar"));

    auto *axes = new QActionGroup(this);
    depth_ = new QAction(tr("&Depth axis"), axes);
    elevation_ = new QAction(tr("&Elevation axis"), axes);
    age_ = new QAction(tr("&Age axis"), axes);
    depth_->setCheckable(true);
    elevation_->setCheckable(true);
    age_->setCheckable(true);
    depth_->setChecked(true);
    depth_->setToolTip(tr("Depth below each collar"));
    elevation_->setToolTip(tr("Elevation relative to present sea level"));
    age_->setToolTip(tr("Age: each hole drawn through its age model, so equal ages stand level "
                        "and the time of a surface opens as a grey gap"));
    connect(axes, &QActionGroup::triggered, this, [this] {
        // An age axis already stands every isochron level: nothing to flatten on.
        flatten_->setEnabled(!age_->isChecked());
        relayout();
    });
    bar->addAction(depth_);
    bar->addAction(elevation_);
    bar->addAction(age_);
    bar->addSeparator();

    bar->addWidget(new QLabel(tr(" Flatten on: "), bar));
    flatten_ = new QComboBox(bar);
    flatten_->setMinimumContentsLength(14);
    flatten_->setSizeAdjustPolicy(QComboBox::AdjustToMinimumContentsLengthWithIcon);
    flatten_->addItem(tr("(nothing)"), QString());
    connect(flatten_, &QComboBox::currentIndexChanged, this, [this] { relayout(); });
    bar->addWidget(flatten_);
    bar->addSeparator();

    bar->addWidget(new QLabel(tr(" Vertical scale: "), bar));
    scale_ = new QComboBox(bar);
    for (const int n : kScales) {
        scale_->addItem(QStringLiteral("1:%1").arg(n), n);
    }
    scale_->setCurrentIndex(scale_->findData(static_cast<int>(view_.scale_ratio)));
    connect(scale_, &QComboBox::currentIndexChanged, this, [this] {
        // A new scale changes the page size: fit so the whole panel stays in sight.
        relayout();
        canvas_->fitToWindow();
    });
    bar->addWidget(scale_);
}

void MainWindow::buildMenus() {
    QMenu *file = menuBar()->addMenu(tr("&File"));
    QAction *create = file->addAction(tr("&New project..."), this, &MainWindow::chooseAndCreate);
    create->setShortcut(QKeySequence::New);
    QAction *open = file->addAction(tr("&Open project..."), this, &MainWindow::chooseAndOpen);
    open->setShortcut(QKeySequence::Open);
    QAction *reopen = file->addAction(tr("&Reopen last project"), this, [this] {
        const QString last = QSettings().value(kLastProjectKey).toString();
        if (!last.isEmpty()) {
            openProject(last);
        }
    });
    reopen->setShortcut(QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_O));
    recent_menu_ = file->addMenu(tr("Recent &projects"));
    recent_menu_->setObjectName(QStringLiteral("recent-menu"));
    refreshRecentMenu();
    file->addSeparator();
    file->addAction(tr("&Import folder..."), this, &MainWindow::chooseAndImport);
    file->addAction(tr("Export &folder..."), this, &MainWindow::chooseAndExportFolder);
    file->addSeparator();
    QAction *exporting = file->addAction(tr("&Export..."), this, &MainWindow::chooseAndExport);
    exporting->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_E));
    file->addSeparator();
    QAction *quit = file->addAction(tr("&Quit"), this, &QWidget::close);
    quit->setShortcut(QKeySequence::Quit);

    QMenu *edit = menuBar()->addMenu(tr("&Edit"));
    edit->addAction(desk_->undoAction());
    edit->addAction(desk_->redoAction());
    edit->addSeparator();
    edit->addAction(desk_->addIntervalAction());

    QMenu *analyses = menuBar()->addMenu(tr("&Analyses"));
    QAction *figures = analyses->addAction(tr("&Figures..."), this, &MainWindow::showFigures);
    figures->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_G));
    QAction *runs = analyses->addAction(tr("&Picks, zones and sequence..."), this,
                                        &MainWindow::showAnalyses);
    runs->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_R));

    QMenu *view = menuBar()->addMenu(tr("&View"));
    view->setObjectName(QStringLiteral("view-menu"));
    QAction *fit = view->addAction(tr("&Fit to window"), canvas_, &PanelCanvas::fitToWindow);
    fit->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_0));
    QAction *in = view->addAction(tr("Zoom &in"), canvas_, &PanelCanvas::zoomIn);
    // Ctrl+= too: on many keyboards "+" needs Shift, and people press Ctrl and the "=" key.
    in->setShortcuts({QKeySequence::ZoomIn, QKeySequence(Qt::CTRL | Qt::Key_Equal)});
    QAction *out = view->addAction(tr("Zoom &out"), canvas_, &PanelCanvas::zoomOut);
    out->setShortcut(QKeySequence::ZoomOut);
    view->addSeparator();
    view->addAction(depth_);
    view->addAction(elevation_);
    view->addAction(age_);
    view->addSeparator();
}

bool MainWindow::openProject(const QString &path) {
    const bool shown = showProjectPanel(path, false);
    // The desk opens even when the panel cannot be drawn: it may be how the data gets fixed.
    desk_->openProject(QFileInfo(path).absoluteFilePath());
    return shown;
}

bool MainWindow::showProjectPanel(const QString &path, bool keep_choice) {
    QApplication::setOverrideCursor(Qt::WaitCursor);
    try {
        if (!db::ProjectStore::open(path.toStdString()).hasData()) {
            QApplication::restoreOverrideCursor();
            showEmptyProject(path);
            return true;
        }
        ProjectPanel panel = loadProjectPanel(path.toStdString());
        QApplication::restoreOverrideCursor();
        PanelChoice choice;
        for (const auto &column : panel.full.columns) {
            choice.hole_order.push_back(column.hole);
        }
        choice.shown_events = {panel.default_events.begin(), panel.default_events.end()};
        choice.shown_isochrons = {panel.default_isochrons.begin(), panel.default_isochrons.end()};
        if (keep_choice) {
            choice = side_->choice();
        }
        project_path_ = QFileInfo(path).absoluteFilePath();
        setWindowTitle(tr("%1 - atollog-view").arg(QFileInfo(path).fileName()));
        if (keep_choice) {
            full_ = std::move(panel.full);
            side_->setContent(full_, choice);
            refreshFlattenChoices();
            relayout();
        } else {
            showPanel(std::move(panel.full), choice);
        }
        rememberProject(project_path_); // after the panel: the figures window takes its holes
        statusBar()->showMessage(QString::fromStdString(modelSourceLine(panel)));
        return true;
    } catch (...) {
        QApplication::restoreOverrideCursor();
        report(tr("Cannot open the project"),
               tr("%1\n\ncould not be opened:\n%2").arg(path, exceptionText()));
        return false;
    }
}

QStringList MainWindow::recentProjects() {
    return QSettings().value(kRecentProjectsKey).toStringList();
}

void MainWindow::rememberProject(const QString &path) {
    QSettings settings;
    settings.setValue(kLastProjectKey, path);
    QStringList recent = recentProjects();
    recent.removeAll(path);
    recent.prepend(path);
    while (recent.size() > kRecentProjects) {
        recent.removeLast();
    }
    settings.setValue(kRecentProjectsKey, recent);
    refreshRecentMenu();
    if (figures_ != nullptr) {
        QStringList holes;
        for (const auto &column : full_.columns) {
            holes << QString::fromStdString(column.hole);
        }
        figures_->setProject(path, holes);
    }
    if (analyses_ != nullptr) {
        QStringList holes;
        for (const auto &column : full_.columns) {
            holes << QString::fromStdString(column.hole);
        }
        analyses_->setProject(path, holes);
    }
}

void MainWindow::refreshRecentMenu() {
    if (recent_menu_ == nullptr) {
        return;
    }
    recent_menu_->clear();
    const QStringList recent = recentProjects();
    for (int i = 0; i < recent.size(); ++i) {
        const QString path = recent[i];
        QAction *a = recent_menu_->addAction(QStringLiteral("&%1 %2").arg(i + 1).arg(path),
                                             this, [this, path] { openProject(path); });
        a->setData(path);
    }
    recent_menu_->setEnabled(!recent.isEmpty());
}

FigureWindow *MainWindow::showFigures() {
    if (figures_ == nullptr) {
        figures_ = new FigureWindow(this);
        // A figure that stored an age model: the panel shows the newest fresh models.
        connect(figures_, &FigureWindow::modelsStored, panel_reload_,
                qOverload<>(&QTimer::start));
    }
    QStringList holes;
    for (const auto &column : full_.columns) {
        holes << QString::fromStdString(column.hole);
    }
    figures_->setProject(project_path_, holes);
    figures_->show();
    figures_->raise();
    return figures_;
}

AnalysisWindow *MainWindow::showAnalyses() {
    if (analyses_ == nullptr) {
        analyses_ = new AnalysisWindow(this);
    }
    QStringList holes;
    for (const auto &column : full_.columns) {
        holes << QString::fromStdString(column.hole);
    }
    analyses_->setProject(project_path_, holes);
    analyses_->show();
    analyses_->raise();
    return analyses_;
}

void MainWindow::showPanel(draw::PanelInput full, const PanelChoice &choice) {
    full_ = std::move(full);
    side_->setContent(full_, choice);
    side_->setDetails(tr("Click an item in the panel."));
    refreshFlattenChoices();
    relayout();
    canvas_->fitToWindow();
}

void MainWindow::refreshFlattenChoices() {
    const QString current = flatten_->currentData().toString();
    const PanelChoice choice = side_->choice();
    QSignalBlocker quiet(flatten_); // relayout once, by the caller
    flatten_->clear();
    flatten_->addItem(tr("(nothing)"), QString());
    // Only what is shown: flattening on a hidden tie would leave the panel looking unflattened.
    for (const auto &tie : full_.ties) {
        if (choice.shown_events.count(tie.event)) {
            const QString name = QString::fromStdString(tie.event);
            flatten_->addItem(tr("tie %1").arg(name), name);
        }
    }
    for (const auto &iso : full_.isochrons) {
        if (choice.shown_isochrons.count(iso.label)) {
            const QString name = QString::fromStdString(iso.label);
            flatten_->addItem(tr("isochron %1").arg(name), name);
        }
    }
    flatten_->setCurrentIndex(std::max(0, flatten_->findData(current)));
}

void MainWindow::relayout() {
    try {
        shown_ = choosePanelContent(full_, side_->choice());
        // The tracks ticked, and only the chosen taxa's lanes.
        const draw::HoleColumnTracks tracks = side_->tracks();
        const std::set<std::string> taxa = side_->shownTaxa();
        for (draw::HoleColumnInput &column : shown_.columns) {
            column.tracks = tracks;
            std::erase_if(column.taxa, [&](const draw::ColumnTaxonRange &t) {
                return taxa.count(t.taxon) == 0;
            });
        }
        view_.axis = elevation_->isChecked() ? draw::PanelAxis::Elevation
                     : age_->isChecked()     ? draw::PanelAxis::Age
                                             : draw::PanelAxis::Depth;
        const QString flatten =
            view_.axis == draw::PanelAxis::Age ? QString() : flatten_->currentData().toString();
        view_.flatten_on =
            flatten.isEmpty() ? std::nullopt : std::optional<std::string>(flatten.toStdString());
        view_.scale_ratio = scale_->currentData().toInt();
        view_.date_text = QDate::currentDate().toString(Qt::ISODate).toStdString();
        PanelScene scene;
        if (!shown_.columns.empty()) {
            scene.list = draw::layoutPanel(shown_, view_, &scene.geometry);
        }
        for (const auto &column : shown_.columns) {
            scene.holes.push_back(column.hole);
        }
        scene.axis = view_.axis;
        scene.flatten_on = view_.flatten_on;
        scene.input = shown_;
        canvas_->setScene(std::move(scene));
    } catch (...) {
        canvas_->setScene(PanelScene{});
        report(tr("Cannot draw the panel"), exceptionText());
    }
}

void MainWindow::onItemSelected(draw::ItemRole role, const QString &key) {
    const QString text = selectionDetails(shown_, role, key);
    side_->setDetails(text.isEmpty() ? tr("Click an item in the panel.") : text);
}

void MainWindow::onColumnOrderChanged(const QList<int> &order) {
    std::vector<std::string> holes;
    for (const int i : order) {
        if (i < 0 || static_cast<std::size_t>(i) >= shown_.columns.size()) {
            return; // from a stale layout; the next one reports the real columns
        }
        holes.push_back(shown_.columns[static_cast<std::size_t>(i)].hole);
    }
    side_->setHoleOrder(holes);
    relayout();
}

void MainWindow::chooseAndOpen() {
    const QString start = QFileInfo(QSettings().value(kLastProjectKey).toString()).absolutePath();
    const QString path = QFileDialog::getOpenFileName(
        this, tr("Open project"), start, tr("atollog projects (*.atollog);;All files (*)"));
    if (!path.isEmpty()) {
        openProject(path);
    }
}

void MainWindow::chooseAndExport() {
    if (shown_.columns.empty()) {
        report(tr("Nothing to export"), tr("Open a project first."));
        return;
    }
    QString filter;
    QString path = QFileDialog::getSaveFileName(
        this, tr("Export panel"), QFileInfo(project_path_).absolutePath(),
        tr("SVG drawing (*.svg);;PDF document (*.pdf);;PNG image (*.png)"), &filter);
    if (path.isEmpty()) {
        return;
    }
    if (QFileInfo(path).suffix().isEmpty()) {
        path += filter.contains(QLatin1String("pdf"))   ? QStringLiteral(".pdf")
                : filter.contains(QLatin1String("png")) ? QStringLiteral(".png")
                                                        : QStringLiteral(".svg");
    }
    const QString suffix = QFileInfo(path).suffix().toLower();
    draw::PdfPageSize page = draw::PdfPageSize::FitChart;
    double dpi = 300;
    bool ok = true;
    if (suffix == QLatin1String("pdf")) {
        const QStringList pages{tr("Fit the panel"), tr("A4"), tr("A3"), tr("Letter")};
        const QString chosen =
            QInputDialog::getItem(this, tr("Page size"), tr("Page:"), pages, 0, false, &ok);
        const draw::PdfPageSize sizes[] = {draw::PdfPageSize::FitChart, draw::PdfPageSize::A4,
                                           draw::PdfPageSize::A3, draw::PdfPageSize::Letter};
        page = sizes[std::max<qsizetype>(0, pages.indexOf(chosen))];
    } else if (suffix == QLatin1String("png")) {
        dpi = QInputDialog::getInt(this, tr("Resolution"), tr("Dots per inch:"), 300, 72, 1200, 50,
                                   &ok);
    }
    if (ok) {
        exportTo(path, page, dpi);
    }
}

bool MainWindow::exportTo(const QString &path, draw::PdfPageSize page, double png_dpi) {
    try {
        cli::writeFigure(canvas_->scene().list, path.toStdString(), "export file",
                         shown_.title.empty() ? "correlation panel" : shown_.title, png_dpi, page);
        statusBar()->showMessage(tr("Exported %1").arg(path), 5000);
        return true;
    } catch (...) {
        report(tr("Cannot export"), tr("%1\n\n%2").arg(path, exceptionText()));
        return false;
    }
}

void MainWindow::report(const QString &title, const QString &text) {
    if (sink_) {
        sink_(title, text);
    }
}

void MainWindow::closeEvent(QCloseEvent *event) {
    QSettings settings;
    settings.setValue(kGeometryKey, saveGeometry());
    settings.setValue(kStateKey, saveState());
    QStringList tracks;
    for (const char *word : kTrackWords) {
        if (side_->trackBox(QLatin1String(word))->isChecked()) {
            tracks << QLatin1String(word);
        }
    }
    settings.setValue(kTracksKey, tracks);
    QMainWindow::closeEvent(event);
}

} // namespace atollog::view
