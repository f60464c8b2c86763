#include "view/logging_desk.hpp"

#include "view/dates_table_model.hpp"
#include "view/desk_project.hpp"
#include "view/desk_table_view.hpp"
#include "view/events_table_model.hpp"
#include "view/holes_table_model.hpp"
#include "view/intervals_table_model.hpp"
#include "view/next_interval.hpp"
#include "view/occurrence_cell.hpp"
#include "view/occurrence_grid_model.hpp"
#include "view/runs_table_model.hpp"
#include "view/samples_table_model.hpp"
#include "view/word_choice_delegate.hpp"
#include "view/zones_table_model.hpp"

#include <algorithm>

#include <QAction>

#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QInputDialog>
#include <QLabel>
#include <QStyle>
#include <QSplitter>
#include <QTabWidget>
#include <QToolButton>
#include <QUndoStack>
#include <QVBoxLayout>

namespace atollog::view {

namespace {

QToolButton *buttonFor(QAction *action, QWidget *parent) {
    auto *button = new QToolButton(parent);
    button->setDefaultAction(action);
    button->setToolButtonStyle(Qt::ToolButtonTextOnly);
    return button;
}

/// A bold title with buttons for `actions` on its right, over `body`.
QWidget *titled(const QString &title, QWidget *body, const QList<QAction *> &actions,
                QWidget *parent) {
    auto *box = new QWidget(parent);
    auto *layout = new QVBoxLayout(box);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);
    auto *head = new QHBoxLayout;
    head->addWidget(new QLabel(QStringLiteral("<b>%1</b>").arg(title.toHtmlEscaped()), box));
    head->addStretch(1);
    for (QAction *action : actions) {
        head->addWidget(buttonFor(action, box));
    }
    layout->addLayout(head);
    layout->addWidget(body, 1);
    return box;
}

} // namespace

LoggingDesk::LoggingDesk(QWidget *parent) : QWidget(parent) {
    desk_ = new DeskProject(this);
    runs_ = new RunsTableModel(*desk_, this);
    intervals_ = new IntervalsTableModel(*desk_, this);
    samples_ = new SamplesTableModel(*desk_, this);
    occurrences_ = new OccurrenceGridModel(*desk_, this);
    dates_ = new DatesTableModel(*desk_, this);
    events_ = new EventsTableModel(*desk_, this);
    zones_ = new ZonesTableModel(*desk_, this);
    holes_ = new HolesTableModel(*desk_, this);

    hole_ = new QComboBox(this);
    hole_->setSizeAdjustPolicy(QComboBox::AdjustToContents);
    unit_ = new QComboBox(this);
    unit_->addItem(tr("metres (m)"), static_cast<int>(DepthUnit::Metre));
    unit_->addItem(tr("feet (ft)"), static_cast<int>(DepthUnit::Foot));

    undo_ = desk_->undoStack()->createUndoAction(this, tr("&Undo"));
    undo_->setShortcuts(QKeySequence::Undo);
    redo_ = desk_->undoStack()->createRedoAction(this, tr("&Redo"));
    redo_->setShortcuts(QKeySequence::Redo); // Ctrl+Y and Ctrl+Shift+Z on Linux
    add_interval_ = new QAction(tr("&Add interval"), this);
    add_interval_->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_I));
    add_interval_->setToolTip(tr("A new interval below the deepest one of this hole, %1 m long "
                                 "or to the end of the recovered core")
                                  .arg(kDefaultIntervalThickness_m));
    add_run_ = new QAction(tr("Add run"), this);
    add_run_->setToolTip(tr("A new run below the deepest one of this hole, as long as that one; "
                            "type its base and recovery"));
    remove_run_ = new QAction(tr("Remove run"), this);
    remove_run_->setToolTip(tr("Removes the selected run (refused while intervals, samples or "
                               "dates lie in it); undo puts it back in its place"));
    add_row_ = new QAction(tr("Add row"), this);
    add_row_->setShortcut(QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_N));
    remove_row_ = new QAction(tr("Remove row"), this);
    remove_row_->setToolTip(tr("Removes the selected row of this tab; refused while other rows "
                               "refer to it (the message says which); undo puts it back"));
    add_taxon_ = new QAction(tr("Add taxon column…"), this);
    add_taxon_->setToolTip(tr("A column for a taxon of the project's taxa table not yet in "
                              "this hole's grid"));
    // Shortcuts work wherever the desk is shown, also without a menu holding the actions.
    addActions({undo_, redo_, add_interval_, add_row_});

    auto *bar = new QHBoxLayout;
    bar->addWidget(new QLabel(tr("Hole:"), this));
    bar->addWidget(hole_);
    bar->addSpacing(12);
    bar->addWidget(new QLabel(tr("Depths in:"), this));
    bar->addWidget(unit_);
    bar->addSpacing(12);
    // The current tab's row actions; their text names the tab's rows ("Add sample"). Before
    // undo and redo, whose text grows with the edit they name.
    add_row_button_ = buttonFor(add_row_, this);
    remove_row_button_ = buttonFor(remove_row_, this);
    add_taxon_button_ = buttonFor(add_taxon_, this);
    bar->addWidget(add_row_button_);
    bar->addWidget(remove_row_button_);
    bar->addWidget(add_taxon_button_);
    bar->addSpacing(12);
    bar->addWidget(buttonFor(undo_, this));
    bar->addWidget(buttonFor(redo_, this));
    bar->addStretch(1);

    runs_view_ = new DeskTableView(this);
    runs_view_->setModel(runs_);
    intervals_view_ = new DeskTableView(this);
    intervals_view_->setModel(intervals_);
    intervals_view_->setItemDelegate(new WordChoiceDelegate(intervals_view_));
    samples_view_ = new DeskTableView(this);
    samples_view_->setModel(samples_);
    occurrences_view_ = new DeskTableView(this);
    occurrences_view_->setModel(occurrences_);
    occurrences_view_->setToolTip(tr("Samples (rows, by depth) x taxa (columns). %1")
                                      .arg(occurrenceCellSyntax()));
    dates_view_ = new DeskTableView(this);
    dates_view_->setModel(dates_);
    dates_view_->setItemDelegate(new WordChoiceDelegate(dates_view_));
    events_view_ = new DeskTableView(this);
    events_view_->setModel(events_);
    events_view_->setItemDelegate(new WordChoiceDelegate(events_view_));
    zones_view_ = new DeskTableView(this);
    zones_view_->setModel(zones_);
    zones_view_->setItemDelegate(new WordChoiceDelegate(zones_view_));
    holes_view_ = new DeskTableView(this);
    holes_view_->setModel(holes_);
    holes_view_->setItemDelegate(new WordChoiceDelegate(holes_view_));
    for (DeskTableView *view : {runs_view_, intervals_view_, samples_view_, occurrences_view_,
                                dates_view_, events_view_, zones_view_, holes_view_}) {
        view->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
        view->horizontalHeader()->setStretchLastSection(view != occurrences_view_);
        // A docked table may be squeezed to two rows by the panel; four is the least to log with.
        view->setMinimumHeight(5 * view->verticalHeader()->defaultSectionSize() +
                               view->horizontalHeader()->sizeHint().height());
        view->setContextMenuPolicy(Qt::ActionsContextMenu);
    }
    runs_view_->addActions({add_run_, remove_run_});
    for (DeskTableView *view : {intervals_view_, samples_view_, dates_view_, events_view_,
                                zones_view_, holes_view_}) {
        view->addActions({add_row_, remove_row_});
    }
    occurrences_view_->addAction(add_taxon_);

    auto *split = new QSplitter(Qt::Horizontal, this);
    split->addWidget(titled(tr("Core runs"), runs_view_, {add_run_, remove_run_}, split));
    tabs_ = new QTabWidget(split);
    tabs_->setDocumentMode(true);
    tabs_->addTab(intervals_view_, tr("Intervals"));
    tabs_->addTab(samples_view_, tr("Samples"));
    tabs_->addTab(occurrences_view_, tr("Occurrences"));
    tabs_->addTab(dates_view_, tr("Dates"));
    tabs_->addTab(events_view_, tr("Events"));
    tabs_->addTab(zones_view_, tr("Zones"));
    tabs_->addTab(holes_view_, tr("Holes"));
    tabs_->setTabToolTip(0, tr("Lithology intervals of the chosen hole"));
    tabs_->setTabToolTip(2, tr("Which taxa each sample of the chosen hole holds, how many, "
                               "and whether in place"));
    tabs_->setTabToolTip(3, tr("Numerical dates of the chosen hole"));
    tabs_->setTabToolTip(4, tr("Time-scale events (datums) of the whole project, not only of "
                               "the chosen hole"));
    tabs_->setTabToolTip(5, tr("Biozones of the whole project, bounded by events"));
    tabs_->setTabToolTip(6, tr("The project's holes: site, kind, position, collar height and "
                               "place along the chain"));
    split->addWidget(tabs_);
    split->setStretchFactor(0, 2);
    split->setStretchFactor(1, 5);

    refusal_line_ = new QLabel(this);
    refusal_line_->setWordWrap(true);
    refusal_line_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    refusal_line_->setStyleSheet(QStringLiteral("color: #a01010;"));
    warning_line_ = new QLabel(this);
    warning_line_->setWordWrap(true);
    warning_line_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    warning_line_->setStyleSheet(QStringLiteral("color: #805000;"));

    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(4, 4, 4, 4);
    layout->addLayout(bar);
    layout->addWidget(split, 1);
    layout->addWidget(refusal_line_);
    layout->addWidget(warning_line_);

    connect(hole_, &QComboBox::currentIndexChanged, this, [this] {
        const std::string hole = hole_->currentData().toString().toStdString();
        runs_->setHole(hole);
        intervals_->setHole(hole);
        samples_->setHole(hole);
        occurrences_->setHole(hole);
        dates_->setHole(hole);
        events_->setHole(hole);
        zones_->setHole(hole);
        holes_->setHole(hole);
    });
    connect(unit_, &QComboBox::currentIndexChanged, this, [this] {
        const auto unit = static_cast<DepthUnit>(unit_->currentData().toInt());
        runs_->setDepthUnit(unit);
        intervals_->setDepthUnit(unit);
        samples_->setDepthUnit(unit);
        dates_->setDepthUnit(unit);
        holes_->setDepthUnit(unit); // collar heights
    });
    connect(add_interval_, &QAction::triggered, this, &LoggingDesk::addInterval);
    connect(add_run_, &QAction::triggered, this, &LoggingDesk::addRun);
    connect(remove_run_, &QAction::triggered, this, &LoggingDesk::removeRun);
    connect(add_row_, &QAction::triggered, this, &LoggingDesk::addRow);
    connect(remove_row_, &QAction::triggered, this, &LoggingDesk::removeRow);
    connect(add_taxon_, &QAction::triggered, this, &LoggingDesk::chooseTaxonColumn);
    connect(tabs_, &QTabWidget::currentChanged, this, &LoggingDesk::updateRowActions);
    updateRowActions();
    connect(desk_, &DeskProject::messageChanged, this, &LoggingDesk::showMessage);
    connect(desk_, &DeskProject::written, this, &LoggingDesk::projectWritten);
    connect(desk_, &DeskProject::changed, this, &LoggingDesk::followHoles);
    showMessage({}, false);
}

bool LoggingDesk::openProject(const QString &path) {
    refusal_line_->clear();
    const bool opened = desk_->open(path);
    fillHoles();
    return opened;
}

namespace {

QString holeLabel(const Hole &h) {
    const QString id = QString::fromStdString(h.hole);
    return h.site.empty() ? id : LoggingDesk::tr("%1 (%2)").arg(id, QString::fromStdString(h.site));
}

} // namespace

void LoggingDesk::fillHoles() {
    const QString current = hole_->currentData().toString();
    const int current_at = hole_->currentIndex();
    QSignalBlocker quiet(hole_);
    hole_->clear();
    for (const Hole &h : desk_->data().holes) {
        hole_->addItem(holeLabel(h), QString::fromStdString(h.hole));
    }
    int at = hole_->findData(current);
    if (at < 0 && hole_->count() > 0) { // renamed or removed: the row in its place
        at = std::min(std::max(current_at, 0), hole_->count() - 1);
    }
    hole_->setCurrentIndex(std::max(0, at));
    const std::string hole = hole_->currentData().toString().toStdString();
    runs_->setHole(hole);
    intervals_->setHole(hole);
    samples_->setHole(hole);
    occurrences_->setHole(hole);
    dates_->setHole(hole);
    events_->setHole(hole);
    zones_->setHole(hole);
    holes_->setHole(hole);
    fitRunsWidth();
}

void LoggingDesk::followHoles() {
    const std::vector<Hole> &holes = desk_->data().holes;
    bool same = static_cast<int>(holes.size()) == hole_->count();
    for (int i = 0; same && i < hole_->count(); ++i) {
        const Hole &h = holes[static_cast<std::size_t>(i)];
        same = hole_->itemData(i).toString() == QString::fromStdString(h.hole) &&
               hole_->itemText(i) == holeLabel(h);
    }
    if (!same) {
        fillHoles();
    }
}

void LoggingDesk::fitRunsWidth() {
    runs_view_->resizeColumnsToContents();
    const int width = runs_view_->horizontalHeader()->length() +
                      runs_view_->verticalHeader()->sizeHint().width() +
                      runs_view_->style()->pixelMetric(QStyle::PM_ScrollBarExtent) +
                      2 * runs_view_->frameWidth() + 8; // slack: no scroll bar for a rounding
    runs_view_->setMinimumWidth(width);
}

QSize LoggingDesk::sizeHint() const {
    const int row = runs_view_->verticalHeader()->defaultSectionSize();
    return {QWidget::sizeHint().width(), 11 * row + 6 * fontMetrics().height()};
}

bool LoggingDesk::chooseHole(const QString &hole) {
    const int index = hole_->findData(hole);
    if (index < 0) {
        return false;
    }
    hole_->setCurrentIndex(index);
    return true;
}

void LoggingDesk::setDepthUnit(DepthUnit unit) {
    unit_->setCurrentIndex(unit_->findData(static_cast<int>(unit)));
}

void LoggingDesk::startTyping(DeskTableView *view, const QModelIndex &cell) {
    if (!cell.isValid()) {
        return;
    }
    view->setFocus();
    view->setCurrentIndex(cell);
    view->scrollTo(cell);
    view->edit(cell);
}

void LoggingDesk::addInterval() {
    const QModelIndex added = intervals_->addInterval();
    if (added.isValid()) {
        tabs_->setCurrentWidget(intervals_view_);
        startTyping(intervals_view_, added); // the base next: the top continues the log
    }
}

void LoggingDesk::addRun() { startTyping(runs_view_, runs_->addRow()); }

void LoggingDesk::removeRun() {
    const QModelIndex current = runs_view_->currentIndex();
    if (!current.isValid()) {
        desk_->reportRefusal(tr("runs: no run is selected; click the run to remove first"));
        return;
    }
    runs_->removeRowAt(current.row());
}

DeskTableModel *LoggingDesk::currentTabModel() const {
    QWidget *tab = tabs_->currentWidget();
    if (tab == intervals_view_) return intervals_;
    if (tab == samples_view_) return samples_;
    if (tab == dates_view_) return dates_;
    if (tab == events_view_) return events_;
    if (tab == zones_view_) return zones_;
    if (tab == holes_view_) return holes_;
    return nullptr; // the occurrence grid: cells are added and cleared by typing
}

DeskTableView *LoggingDesk::currentTabView() const {
    return qobject_cast<DeskTableView *>(tabs_->currentWidget());
}

void LoggingDesk::addRow() {
    DeskTableModel *model = currentTabModel();
    if (model == intervals_) {
        addInterval();
    } else if (model) {
        startTyping(currentTabView(), model->addRow());
    }
}

void LoggingDesk::removeRow() {
    DeskTableModel *model = currentTabModel();
    if (!model) {
        return;
    }
    const QModelIndex current = currentTabView()->currentIndex();
    if (!current.isValid()) {
        desk_->reportRefusal(tr("%1: no row is selected; click the row to remove first")
                                 .arg(tabs_->tabText(tabs_->currentIndex())));
        return;
    }
    model->removeRowAt(current.row());
}

void LoggingDesk::updateRowActions() {
    QWidget *tab = tabs_->currentWidget();
    const bool grid = tab == occurrences_view_;
    const QString rows = tab == intervals_view_ ? tr("interval")
                         : tab == samples_view_ ? tr("sample")
                         : tab == dates_view_   ? tr("date")
                         : tab == events_view_  ? tr("event")
                         : tab == holes_view_   ? tr("hole")
                                                : tr("zone");
    add_row_->setText(tr("Add %1").arg(rows));
    remove_row_->setText(tr("Remove %1").arg(rows));
    add_row_->setEnabled(!grid);
    remove_row_->setEnabled(!grid);
    add_taxon_->setEnabled(grid);
    add_row_button_->setVisible(!grid);
    remove_row_button_->setVisible(!grid);
    add_taxon_button_->setVisible(grid);
    add_row_->setToolTip(tab == intervals_view_
                             ? add_interval_->toolTip()
                             : tr("A new %1, to be typed over (Ctrl+Shift+N)").arg(rows));
}

bool LoggingDesk::addTaxonColumn(const std::string &taxon) {
    if (!occurrences_->addTaxon(taxon)) {
        return false;
    }
    tabs_->setCurrentWidget(occurrences_view_);
    const int row = std::max(0, occurrences_view_->currentIndex().row());
    startTyping(occurrences_view_, occurrences_->index(row, occurrences_->columnOf(taxon)));
    return true;
}

void LoggingDesk::chooseTaxonColumn() {
    std::vector<std::string> ids;
    const QStringList labels = occurrences_->taxaWithoutColumn(&ids);
    if (labels.isEmpty()) {
        desk_->reportRefusal(tr("occurrences: every taxon of the project has a column already"));
        return;
    }
    bool ok = false;
    const QString chosen = QInputDialog::getItem(this, tr("Add taxon column"), tr("Taxon:"),
                                                 labels, 0, false, &ok);
    const qsizetype at = labels.indexOf(chosen);
    if (ok && at >= 0) {
        addTaxonColumn(ids[static_cast<std::size_t>(at)]);
    }
}

void LoggingDesk::showMessage(const QString &message, bool refusal) {
    if (refusal) {
        refusal_line_->setText(tr("Last refusal: %1").arg(message));
        warning_line_->clear();
    } else {
        warning_line_->setText(message.isEmpty() ? QString()
                                                 : tr("Warnings of the last edit: %1").arg(message));
    }
    refusal_line_->setVisible(!refusal_line_->text().isEmpty());
    warning_line_->setVisible(!warning_line_->text().isEmpty());
}

} // namespace atollog::view
