#include "view/events_table_model.hpp"

#include "view/desk_project.hpp"
#include "view/next_id.hpp"
#include "view/value_with_sd.hpp"
#include "view/word_choice_delegate.hpp"

namespace atollog::view {

namespace {

const char *const kFieldNames[] = {"event", "taxon", "kind", "age_ma", "age_sd_ma", "source"};

QString word(std::string_view w) { return QString::fromUtf8(w.data(), static_cast<int>(w.size())); }

} // namespace

EventsTableModel::EventsTableModel(DeskProject &desk, QObject *parent) : DeskRows(desk, parent) {}

QString EventsTableModel::columnTitle(int column) const {
    switch (column) {
    case EventId: return tr("Event");
    case Taxon: return tr("Taxon");
    case Kind: return tr("Base / top");
    case Age: return tr("Age (Ma)");
    case AgeSd: return tr("Age sd (Ma)");
    case Source: return tr("Source");
    default: return {};
    }
}

QString EventsTableModel::columnTip(int column) const {
    switch (column) {
    case EventId: return tr("Unique id; zones name their bounding events by it");
    case Kind: return tr("base: the lowest occurrence of the taxon; top: the highest");
    case AgeSd: return tr("One standard deviation, greater than 0");
    default: return tr("Stored as %1").arg(QLatin1String(kFieldNames[column]));
    }
}

QVariant EventsTableModel::data(const QModelIndex &index, int role) const {
    if (role != kWordChoicesRole) {
        return DeskTableModel::data(index, role);
    }
    if (index.column() == Kind) {
        QStringList words;
        for (const EventKind k : allValues<EventKind>()) {
            words << word(toString(k));
        }
        return words;
    }
    if (index.column() == Taxon) {
        QStringList words;
        for (const atollog::Taxon &t : desk().data().taxa) {
            words << QString::fromStdString(t.taxon);
        }
        return words;
    }
    return {};
}

QString EventsTableModel::cellText(int r, int column) const {
    const TimeScaleEvent &e = eventAt(r);
    switch (column) {
    case EventId: return QString::fromStdString(e.event);
    case Taxon: return QString::fromStdString(e.taxon);
    case Kind: return word(toString(e.kind));
    case Age: return exactNumberText(e.age_ma);
    case AgeSd: return exactNumberText(e.age_sd_ma);
    case Source: return QString::fromStdString(e.source);
    default: return {};
    }
}

DeskTableModel::TypedRow EventsTableModel::typed(int r, int column, const QString &text) const {
    TimeScaleEvent e = eventAt(r);
    const QString where = tr("events: event '%1': %2")
                              .arg(QString::fromStdString(e.event),
                                   columnTitle(column));
    switch (column) {
    case EventId: e.event = text.toStdString(); break;
    case Taxon: e.taxon = text.toStdString(); break;
    case Source: e.source = text.toStdString(); break;
    case Kind:
        if (const auto k = parseEventKind(text.toLower().toStdString())) e.kind = *k;
        else return tr("%1: '%2' is not base or top; type one of %3")
                 .arg(where, text, word(allowedWords<EventKind>()));
        break;
    case Age:
    case AgeSd: {
        const auto n = readNumber(text);
        if (!n) {
            return tr("%1: '%2' is not a number; type an age in Ma, e.g. 3.75").arg(where, text);
        }
        (column == Age ? e.age_ma : e.age_sd_ma) = *n;
        break;
    }
    default: return tr("%1 cannot be typed").arg(where);
    }
    return db::EditableRow{e};
}

QString EventsTableModel::rowName(int r) const {
    return tr("event %1").arg(QString::fromStdString(eventAt(r).event));
}

QString EventsTableModel::editLabel(int r, int column) const {
    return tr("%1 of %2").arg(QLatin1String(kFieldNames[column]), rowName(r));
}

DeskTableModel::TypedRow EventsTableModel::newRow() const {
    if (rows_.empty()) {
        return tr("events: the project has no event to copy; import the time scale's events "
                  "with the project");
    }
    std::vector<std::string> taken;
    for (const TimeScaleEvent &e : rows_) {
        taken.push_back(e.event);
    }
    TimeScaleEvent e = rows_.back();
    e.event = nextId(e.event, taken);
    return db::EditableRow{e};
}

} // namespace atollog::view
