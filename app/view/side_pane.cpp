#include "view/side_pane.hpp"

#include <QCheckBox>
#include <QGridLayout>
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

    // Column tracks, named as `atollog panel --tracks` names them.
    auto *tracks = new QWidget(this);
    auto *grid = new QGridLayout(tracks);
    grid->setContentsMargins(0, 0, 0, 0);
    const QString words[] = {QStringLiteral("runs"),  QStringLiteral("lithology"),
                             QStringLiteral("surfaces"), QStringLiteral("samples"),
                             QStringLiteral("taxa"),  QStringLiteral("zones"),
                             QStringLiteral("dates"), QStringLiteral("model")};
    for (int i = 0; i < 8; ++i) {
        auto *box = new QCheckBox(words[i], tracks);
        box->setObjectName(QStringLiteral("track-") + words[i]);
        grid->addWidget(box, i / 4, i % 4);
        track_boxes_.emplace_back(words[i], box);
    }
    setTracks(draw::HoleColumnTracks{});
    taxa_ = checkList(this);

    auto *layout = new QVBoxLayout(this);
    layout->addWidget(group(tr("Selected"), details_scroll), 2);
    layout->addWidget(group(tr("Column tracks"), tracks), 0);
    layout->addWidget(group(tr("Taxon lanes"), taxa_), 2);
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
    connect(taxa_, &QListWidget::itemChanged, this, changed);
    for (const auto &[word, box] : track_boxes_) {
        connect(box, &QCheckBox::toggled, this, changed);
    }
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
    // Every column carries the same lanes (panelInputFromDataset), so the first names them.
    const std::set<std::string> was = shownTaxa();
    taxa_->clear();
    if (!full.columns.empty()) {
        for (const draw::ColumnTaxonRange &t : full.columns.front().taxa) {
            auto *item = new QListWidgetItem(
                QString::fromStdString(t.name.empty() ? t.taxon : t.name + " (" + t.taxon + ")"),
                taxa_);
            item->setData(Qt::UserRole, QString::fromStdString(t.taxon));
            item->setFlags(Qt::ItemIsEnabled | Qt::ItemIsUserCheckable);
            item->setCheckState(was.count(t.taxon) ? Qt::Checked : Qt::Unchecked);
        }
    }
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

draw::HoleColumnTracks SidePane::tracks() const {
    draw::HoleColumnTracks t;
    const auto on = [this](const char *word) { return trackBox(QLatin1String(word))->isChecked(); };
    t.core_runs = on("runs");
    t.lithology = on("lithology");
    t.surfaces = on("surfaces");
    t.samples = on("samples");
    t.taxa = on("taxa");
    t.zones = on("zones");
    t.dates = on("dates");
    t.age_model = on("model");
    return t;
}

void SidePane::setTracks(const draw::HoleColumnTracks &t) {
    const bool was = filling_;
    filling_ = true;
    const std::pair<const char *, bool> flags[] = {
        {"runs", t.core_runs}, {"lithology", t.lithology}, {"surfaces", t.surfaces},
        {"samples", t.samples}, {"taxa", t.taxa},          {"zones", t.zones},
        {"dates", t.dates},     {"model", t.age_model}};
    for (const auto &[word, on] : flags) {
        trackBox(QLatin1String(word))->setChecked(on);
    }
    filling_ = was;
}

QCheckBox *SidePane::trackBox(const QString &word) const {
    for (const auto &[w, box] : track_boxes_) {
        if (w == word) {
            return box;
        }
    }
    return nullptr;
}

std::set<std::string> SidePane::shownTaxa() const {
    std::set<std::string> out;
    for (int i = 0; taxa_ && i < taxa_->count(); ++i) {
        if (taxa_->item(i)->checkState() == Qt::Checked) {
            out.insert(taxa_->item(i)->data(Qt::UserRole).toString().toStdString());
        }
    }
    return out;
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
