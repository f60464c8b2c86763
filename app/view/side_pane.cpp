#include "view/side_pane.hpp"

#include <QGroupBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QListWidget>
#include <QPushButton>
#include <QScrollArea>
#include <QVBoxLayout>

namespace atollog::view {

namespace {

QListWidget *checkList(QWidget *parent) {
    auto *list = new QListWidget(parent);
    list->setSelectionMode(QAbstractItemView::NoSelection);
    return list;
}

QGroupBox *group(const QString &title, QWidget *content, QWidget *below = nullptr) {
    auto *box = new QGroupBox(title);
    auto *layout = new QVBoxLayout(box);
    layout->addWidget(content);
    if (below) {
        layout->addWidget(below);
    }
    return box;
}

void fillChecks(QListWidget *list, const std::vector<std::string> &names,
                const std::set<std::string> &ticked) {
    list->clear();
    for (const std::string &name : names) {
        auto *item = new QListWidgetItem(QString::fromStdString(name), list);
        item->setFlags(Qt::ItemIsEnabled | Qt::ItemIsUserCheckable);
        item->setCheckState(ticked.count(name) ? Qt::Checked : Qt::Unchecked);
    }
}

void scrollToFirstTicked(QListWidget *list) {
    for (int i = 0; i < list->count(); ++i) {
        if (list->item(i)->checkState() == Qt::Checked) {
            list->scrollToItem(list->item(i), QAbstractItemView::PositionAtTop);
            return;
        }
    }
}

std::set<std::string> ticked(const QListWidget *list) {
    std::set<std::string> out;
    for (int i = 0; i < list->count(); ++i) {
        if (list->item(i)->checkState() == Qt::Checked) {
            out.insert(list->item(i)->text().toStdString());
        }
    }
    return out;
}

} // namespace

SidePane::SidePane(QWidget *parent) : QWidget(parent) {
    details_ = new QLabel(tr("Click an item in the panel."), this);
    details_->setTextFormat(Qt::PlainText); // keys are data, never markup
    details_->setWordWrap(true);
    details_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    details_->setAlignment(Qt::AlignTop | Qt::AlignLeft);
    // In a scroll area: a tie seen in many holes lists one line per hole.
    auto *details_scroll = new QScrollArea(this);
    details_scroll->setWidget(details_);
    details_scroll->setWidgetResizable(true);
    details_scroll->setFrameShape(QFrame::NoFrame);
    details_scroll->setMinimumHeight(110);

    events_ = checkList(this);
    isochrons_ = checkList(this);

    holes_ = new QListWidget(this);
    holes_->setDragDropMode(QAbstractItemView::InternalMove);
    holes_->setSelectionMode(QAbstractItemView::SingleSelection);
    auto *buttons = new QWidget(this);
    auto *row = new QHBoxLayout(buttons);
    row->setContentsMargins(0, 0, 0, 0);
    auto *up = new QPushButton(tr("Move &left"), buttons);
    auto *down = new QPushButton(tr("Move &right"), buttons);
    row->addWidget(up);
    row->addWidget(down);
    connect(up, &QPushButton::clicked, this, [this] { moveSelectedHole(-1); });
    connect(down, &QPushButton::clicked, this, [this] { moveSelectedHole(+1); });

    auto *layout = new QVBoxLayout(this);
    layout->addWidget(group(tr("Selected"), details_scroll), 2);
    events_box_ = group(QString(), events_);
    isochrons_box_ = group(QString(), isochrons_);
    layout->addWidget(events_box_, 3);
    layout->addWidget(isochrons_box_, 2);
    updateCounts();
    layout->addWidget(group(tr("Hole order, left to right"), holes_, buttons), 2);

    const auto changed = [this] {
        if (!filling_) {
            updateCounts();
            emit choiceChanged();
        }
    };
    connect(events_, &QListWidget::itemChanged, this, changed);
    connect(isochrons_, &QListWidget::itemChanged, this, changed);
    // A drag inside the hole list moves a row: the model reports it as rows moved.
    connect(holes_->model(), &QAbstractItemModel::rowsMoved, this, changed);
}

void SidePane::setContent(const draw::PanelInput &full, const PanelChoice &choice) {
    filling_ = true;
    std::vector<std::string> events, ages;
    for (const auto &tie : full.ties) {
        events.push_back(tie.event);
    }
    for (const auto &iso : full.isochrons) {
        ages.push_back(iso.label);
    }
    fillChecks(events_, events, choice.shown_events);
    fillChecks(isochrons_, ages, choice.shown_isochrons);
    filling_ = false;
    updateCounts();
    // Long lists open where the shown entries are, not at an unticked top.
    scrollToFirstTicked(events_);
    scrollToFirstTicked(isochrons_);
    setHoleOrder(choice.hole_order);
}

void SidePane::setHoleOrder(const std::vector<std::string> &holes) {
    filling_ = true;
    holes_->clear();
    for (const std::string &hole : holes) {
        holes_->addItem(QString::fromStdString(hole));
    }
    filling_ = false;
}

PanelChoice SidePane::choice() const {
    PanelChoice c;
    for (int i = 0; i < holes_->count(); ++i) {
        c.hole_order.push_back(holes_->item(i)->text().toStdString());
    }
    c.shown_events = ticked(events_);
    c.shown_isochrons = ticked(isochrons_);
    return c;
}

void SidePane::updateCounts() {
    events_box_->setTitle(
        tr("Tie lines (events): %1 of %2 shown").arg(ticked(events_).size()).arg(events_->count()));
    isochrons_box_->setTitle(tr("Isochrons (ages): %1 of %2 shown")
                                 .arg(ticked(isochrons_).size())
                                 .arg(isochrons_->count()));
}

void SidePane::setDetails(const QString &text) {
    details_->setText(text);
}

QString SidePane::details() const {
    return details_->text();
}

void SidePane::moveSelectedHole(int step) {
    const int row = holes_->currentRow();
    const int to = row + step;
    if (row < 0 || to < 0 || to >= holes_->count()) {
        return;
    }
    QListWidgetItem *item = holes_->takeItem(row);
    holes_->insertItem(to, item);
    holes_->setCurrentRow(to);
    emit choiceChanged();
}

} // namespace atollog::view
