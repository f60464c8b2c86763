#include "view/holes_table_model.hpp"

#include "view/desk_project.hpp"
#include "view/next_id.hpp"
#include "view/value_with_sd.hpp"
#include "view/word_choice_delegate.hpp"

namespace atollog::view {

namespace {

const char *const kFieldNames[] = {"hole", "site", "kind", "lat_deg", "lon_deg",
                                   "collar_elev_m", "chain_km"};

QString word(std::string_view w) { return QString::fromUtf8(w.data(), static_cast<int>(w.size())); }

QString optionalText(const std::optional<double> &value) {
    return value ? exactNumberText(*value) : QString();
}

} // namespace

HolesTableModel::HolesTableModel(DeskProject &desk, QObject *parent) : DeskRows(desk, parent) {}

QString HolesTableModel::columnTitle(int column) const {
    switch (column) {
    case HoleId: return tr("Hole");
    case Site: return tr("Site");
    case Kind: return tr("Kind");
    case Latitude: return tr("Latitude (°)");
    case Longitude: return tr("Longitude (°)");
    case CollarElevation: return tr("Collar above sea level (%1)").arg(unitSymbol(depthUnit()));
    case ChainDistance: return tr("Along the chain (km)");
    default: return {};
    }
}

QString HolesTableModel::columnTip(int column) const {
    switch (column) {
    case HoleId: return tr("Unique id; runs, samples and dates name their hole by it");
    case Kind: return tr("One of: %1").arg(word(allowedWords<HoleKind>()));
    case Latitude: return tr("Decimal degrees, north positive; optional");
    case Longitude: return tr("Decimal degrees, east positive; optional");
    case CollarElevation:
        return tr("Height of the collar above present mean sea level, negative below; the "
                  "subsidence figures need it. Stored as collar_elev_m");
    case ChainDistance:
        return tr("Distance along the volcanic chain from the active centre; the chain figure "
                  "needs it. Stored as chain_km");
    default: return tr("Stored as %1").arg(QLatin1String(kFieldNames[column]));
    }
}

QVariant HolesTableModel::data(const QModelIndex &index, int role) const {
    if (role != kWordChoicesRole) {
        return DeskTableModel::data(index, role);
    }
    if (index.column() != Kind) {
        return {};
    }
    QStringList words;
    for (const HoleKind k : allValues<HoleKind>()) {
        words << word(toString(k));
    }
    return words;
}

QString HolesTableModel::cellText(int r, int column) const {
    const Hole &h = holeAt(r);
    switch (column) {
    case HoleId: return QString::fromStdString(h.hole);
    case Site: return QString::fromStdString(h.site);
    case Kind: return word(toString(h.kind));
    case Latitude: return optionalText(h.lat_deg);
    case Longitude: return optionalText(h.lon_deg);
    case CollarElevation:
        return h.collar_elev_m ? depthText(*h.collar_elev_m, depthUnit()) : QString();
    case ChainDistance: return optionalText(h.chain_km);
    default: return {};
    }
}

DeskTableModel::TypedRow HolesTableModel::typed(int r, int column, const QString &text) const {
    Hole h = holeAt(r);
    const QString where = tr("holes: hole '%1': %2").arg(QString::fromStdString(h.hole),
                                                         columnTitle(column));
    switch (column) {
    case HoleId: h.hole = text.toStdString(); return db::EditableRow{h};
    case Site: h.site = text.toStdString(); return db::EditableRow{h};
    case Kind:
        if (const auto k = parseHoleKind(text.toLower().toStdString())) {
            h.kind = *k;
            return db::EditableRow{h};
        }
        return tr("%1: '%2' is not a hole kind; type one of %3")
            .arg(where, text, word(allowedWords<HoleKind>()));
    default: break;
    }
    std::optional<double> &field = column == Latitude          ? h.lat_deg
                                   : column == Longitude       ? h.lon_deg
                                   : column == CollarElevation ? h.collar_elev_m
                                                               : h.chain_km;
    if (text.isEmpty()) {
        field.reset(); // not surveyed yet
        return db::EditableRow{h};
    }
    const std::optional<double> n = readNumber(text);
    if (!n) {
        const QString example = column == Latitude          ? tr("decimal degrees, e.g. -17.5392")
                                : column == Longitude       ? tr("decimal degrees, e.g. -149.8317")
                                : column == CollarElevation ? tr("%1, e.g. 3.2")
                                                                  .arg(unitSymbol(depthUnit()))
                                                            : tr("km, e.g. 412");
        return tr("%1: '%2' is not a number; type %3, or clear the field when not known")
            .arg(where, text, example);
    }
    field = column == CollarElevation ? depthInMetres(*n, depthUnit()) : *n;
    return db::EditableRow{h};
}

QString HolesTableModel::rowName(int r) const {
    return tr("hole %1").arg(QString::fromStdString(holeAt(r).hole));
}

QString HolesTableModel::editLabel(int r, int column) const {
    if (column == HoleId) {
        return tr("rename %1").arg(rowName(r));
    }
    return tr("%1 of %2").arg(QLatin1String(kFieldNames[column]), rowName(r));
}

DeskTableModel::TypedRow HolesTableModel::newRow() const {
    std::vector<std::string> taken;
    for (const Hole &h : rows_) {
        taken.push_back(h.hole);
    }
    Hole h;
    if (rows_.empty()) {
        h.hole = "HOLE1";
        h.site = "site";
    } else {
        h.hole = nextId(rows_.back().hole, taken);
        h.site = rows_.back().site;
        h.kind = rows_.back().kind;
    }
    return db::EditableRow{h};
}

} // namespace atollog::view
