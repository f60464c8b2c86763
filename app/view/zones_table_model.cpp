#include "view/zones_table_model.hpp"

#include "view/desk_project.hpp"
#include "view/next_id.hpp"
#include "view/word_choice_delegate.hpp"

namespace atollog::view {

namespace {

const char *const kFieldNames[] = {"scheme", "zone", "base_event", "top_event"};

QString optionalText(const std::optional<std::string> &v) {
    return v ? QString::fromStdString(*v) : QString();
}

} // namespace

ZonesTableModel::ZonesTableModel(DeskProject &desk, QObject *parent) : DeskRows(desk, parent) {}

QString ZonesTableModel::columnTitle(int column) const {
    switch (column) {
    case Scheme: return tr("Scheme");
    case ZoneName: return tr("Zone");
    case BaseEvent: return tr("Base event");
    case TopEvent: return tr("Top event");
    default: return {};
    }
}

QString ZonesTableModel::columnTip(int column) const {
    switch (column) {
    case BaseEvent:
    case TopEvent:
        return tr("An event id of the Events tab; empty leaves this end of the zone open");
    default: return tr("Stored as %1").arg(QLatin1String(kFieldNames[column]));
    }
}

QVariant ZonesTableModel::data(const QModelIndex &index, int role) const {
    if (role != kWordChoicesRole) {
        return DeskTableModel::data(index, role);
    }
    if (index.column() == BaseEvent || index.column() == TopEvent) {
        QStringList words{QString()};
        for (const TimeScaleEvent &e : desk().data().events) {
            words << QString::fromStdString(e.event);
        }
        return words;
    }
    return {};
}

QString ZonesTableModel::cellText(int r, int column) const {
    const Zone &z = zoneAt(r);
    switch (column) {
    case Scheme: return QString::fromStdString(z.scheme);
    case ZoneName: return QString::fromStdString(z.zone);
    case BaseEvent: return optionalText(z.base_event);
    case TopEvent: return optionalText(z.top_event);
    default: return {};
    }
}

DeskTableModel::TypedRow ZonesTableModel::typed(int r, int column, const QString &text) const {
    Zone z = zoneAt(r);
    const std::string t = text.toStdString();
    switch (column) {
    case Scheme: z.scheme = t; break;
    case ZoneName: z.zone = t; break;
    case BaseEvent:
        z.base_event = text.isEmpty() ? std::nullopt : std::optional<std::string>(t);
        break;
    case TopEvent:
        z.top_event = text.isEmpty() ? std::nullopt : std::optional<std::string>(t);
        break;
    default: return tr("zones: %1 cannot be typed").arg(rowName(r));
    }
    return db::EditableRow{z};
}

QString ZonesTableModel::rowName(int r) const {
    const Zone &z = zoneAt(r);
    return tr("zone %1 (%2)").arg(QString::fromStdString(z.zone), QString::fromStdString(z.scheme));
}

QString ZonesTableModel::editLabel(int r, int column) const {
    return tr("%1 of %2").arg(QLatin1String(kFieldNames[column]), rowName(r));
}

DeskTableModel::TypedRow ZonesTableModel::newRow() const {
    if (rows_.empty()) {
        return tr("zones: the project has no zone to continue; import the zonal scheme with "
                  "the project");
    }
    const Zone &last = rows_.back();
    std::vector<std::string> taken;
    for (const Zone &z : rows_) {
        if (z.scheme == last.scheme) {
            taken.push_back(z.zone);
        }
    }
    Zone z;
    z.scheme = last.scheme;
    z.zone = nextId(last.zone, taken);
    z.base_event = last.top_event;
    return db::EditableRow{z};
}

} // namespace atollog::view
