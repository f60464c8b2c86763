#include "view/logging_desk.hpp"

#include "view/desk_project.hpp"
#include "view/desk_table_view.hpp"
#include "view/intervals_table_model.hpp"
#include "view/next_interval.hpp"
#include "view/runs_table_model.hpp"
#include "view/samples_table_model.hpp"
#include "view/word_choice_delegate.hpp"

#include <QAction>
#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QStyle>
#include <QSplitter>
#include <QTabWidget>
#include <QToolButton>
#include <QUndoStack>
#include <QVBoxLayout>

namespace atollog::view {

namespace {

QWidget *titled(const QString &title, QWidget *body, QWidget *parent) {
    auto *box = new QWidget(parent);
    auto *layout = new QVBoxLayout(box);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);
    auto *label = new QLabel(QStringLiteral("<b>%1</b>").arg(title.toHtmlEscaped()), box);
    layout->addWidget(label);
    layout->addWidget(body, 1);
    return box;
}

QToolButton *buttonFor(QAction *action, QWidget *parent) {
    auto *button = new QToolButton(parent);
    button->setDefaultAction(action);
    button->setToolButtonStyle(Qt::ToolButtonTextOnly);
    return button;
}

} // namespace

LoggingDesk::LoggingDesk(QWidget *parent) : QWidget(parent) {
    desk_ = new DeskProject(this);
    runs_ = new RunsTableModel(*desk_, this);
    intervals_ = new IntervalsTableModel(*desk_, this);
    samples_ = new SamplesTableModel(*desk_, this);

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
    // Shortcuts work wherever the desk is shown, also without a menu holding the actions.
    addActions({undo_, redo_, add_interval_});

    auto *bar = new QHBoxLayout;
    bar->addWidget(new QLabel(tr("Hole:"), this));
    bar->addWidget(hole_);
    bar->addSpacing(12);
    bar->addWidget(new QLabel(tr("Depths in:"), this));
    bar->addWidget(unit_);
    bar->addSpacing(12);
    bar->addWidget(buttonFor(add_interval_, this));
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
    for (DeskTableView *view : {runs_view_, intervals_view_, samples_view_}) {
        view->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
        view->horizontalHeader()->setStretchLastSection(true);
        // A docked table may be squeezed to two rows by the panel; four is the least to log with.
        view->setMinimumHeight(5 * view->verticalHeader()->defaultSectionSize() +
                               view->horizontalHeader()->sizeHint().height());
    }

    auto *split = new QSplitter(Qt::Horizontal, this);
    split->addWidget(titled(tr("Core runs"), runs_view_, split));
    tabs_ = new QTabWidget(split);
    tabs_->setDocumentMode(true);
    tabs_->addTab(intervals_view_, tr("Lithology intervals"));
    tabs_->addTab(samples_view_, tr("Samples"));
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
    });
    connect(unit_, &QComboBox::currentIndexChanged, this, [this] {
        const auto unit = static_cast<DepthUnit>(unit_->currentData().toInt());
        runs_->setDepthUnit(unit);
        intervals_->setDepthUnit(unit);
        samples_->setDepthUnit(unit);
    });
    connect(add_interval_, &QAction::triggered, this, &LoggingDesk::addInterval);
    connect(desk_, &DeskProject::messageChanged, this, &LoggingDesk::showMessage);
    connect(desk_, &DeskProject::written, this, &LoggingDesk::projectWritten);
    showMessage({}, false);
}

bool LoggingDesk::openProject(const QString &path) {
    refusal_line_->clear();
    const bool opened = desk_->open(path);
    fillHoles();
    return opened;
}

void LoggingDesk::fillHoles() {
    const QString current = hole_->currentData().toString();
    QSignalBlocker quiet(hole_);
    hole_->clear();
    for (const Hole &h : desk_->data().holes) {
        const QString id = QString::fromStdString(h.hole);
        hole_->addItem(h.site.empty() ? id : tr("%1 (%2)").arg(id, QString::fromStdString(h.site)),
                       id);
    }
    hole_->setCurrentIndex(std::max(0, hole_->findData(current)));
    const std::string hole = hole_->currentData().toString().toStdString();
    runs_->setHole(hole);
    intervals_->setHole(hole);
    samples_->setHole(hole);
    fitRunsWidth();
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

void LoggingDesk::addInterval() {
    const QModelIndex added = intervals_->addInterval();
    if (added.isValid()) {
        tabs_->setCurrentWidget(intervals_view_);
        intervals_view_->setFocus();
        intervals_view_->setCurrentIndex(added);
        intervals_view_->scrollTo(added);
        intervals_view_->edit(added); // the base next: the top continues the log
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
