#include "view/item_description.hpp"

#include <QStringList>

#include <algorithm>

namespace atollog::view {

using draw::ItemRole;

bool isTieRole(ItemRole role) {
    return role == ItemRole::TieLine || role == ItemRole::TieBand || role == ItemRole::TieLabel;
}

bool isIsochronRole(ItemRole role) {
    return role == ItemRole::Isochron || role == ItemRole::IsochronBand ||
           role == ItemRole::IsochronLabel;
}

QString describeItem(const draw::ItemTag &tag) {
    const QString key = QString::fromStdString(tag.key);
    switch (tag.role) {
    case ItemRole::TieLine:
        return QStringLiteral("tie line: ") + key;
    case ItemRole::TieBand:
        return QStringLiteral("tie bracket: ") + key;
    case ItemRole::TieLabel:
        return QStringLiteral("tie: ") + key;
    case ItemRole::Isochron:
    case ItemRole::IsochronLabel:
        return QStringLiteral("isochron: ") + key;
    case ItemRole::IsochronBand:
        return QStringLiteral("isochron 95 % depth range: ") + key;
    case ItemRole::LithologyInterval:
        return QStringLiteral("interval ") + key + QStringLiteral(" m");
    case ItemRole::Surface:
        return QStringLiteral("surface: ") + key;
    case ItemRole::RecoveryRun:
        return QStringLiteral("run ") + key;
    case ItemRole::SampleTick:
        return QStringLiteral("sample ") + key;
    case ItemRole::DrilledBase:
        return QStringLiteral("drilled base of ") + key;
    case ItemRole::Title:
    case ItemRole::Subtitle:
        return key.isEmpty() ? QStringLiteral("title") : key;
    case ItemRole::ColumnNote:
        return QStringLiteral("note on ") + key;
    case ItemRole::SeaLevel:
        return QStringLiteral("present sea level");
    case ItemRole::PanelAxis:
    case ItemRole::PanelAxisLabel:
    case ItemRole::DepthAxis:
    case ItemRole::DepthTick:
    case ItemRole::DepthLabel:
        return QStringLiteral("axis");
    case ItemRole::TextureScale:
        return QStringLiteral("texture scale: ") + key;
    case ItemRole::ColumnTaxonName:
    case ItemRole::ColumnTaxonBar:
    case ItemRole::ColumnTaxonFind:
        return QStringLiteral("taxon ") + key;
    case ItemRole::ColumnTaxonExcluded:
        return QStringLiteral("taxon ") + key + QStringLiteral(", reworked or caved find");
    case ItemRole::ColumnZone:
    case ItemRole::ColumnZoneName:
        return QStringLiteral("zone ") + key;
    case ItemRole::ColumnZoneBracket:
        return QStringLiteral("zone ") + key + QStringLiteral(": boundary bracket");
    case ItemRole::ColumnZoneScheme:
        return QStringLiteral("zonation scheme: ") + key;
    case ItemRole::ColumnDateMarker:
    case ItemRole::ColumnDateBar:
        return QStringLiteral("date ") + key;
    case ItemRole::ColumnAgeModel:
        return key == QLatin1String("band") ? QStringLiteral("age model: 95 % band")
                                            : QStringLiteral("age model: median");
    case ItemRole::ColumnAgeScale:
        return QStringLiteral("age scale: ") + key;
    case ItemRole::LegendSwatch:
    case ItemRole::LegendText:
        return QStringLiteral("legend: ") + key;
    default:
        return key;
    }
}

bool isColumnTrackRole(ItemRole role) {
    switch (role) {
    case ItemRole::ColumnTaxonName:
    case ItemRole::ColumnTaxonBar:
    case ItemRole::ColumnTaxonFind:
    case ItemRole::ColumnTaxonExcluded:
    case ItemRole::ColumnZone:
    case ItemRole::ColumnZoneName:
    case ItemRole::ColumnZoneBracket:
    case ItemRole::ColumnDateMarker:
    case ItemRole::ColumnDateBar:
    case ItemRole::ColumnAgeModel:
        return true;
    default:
        return false;
    }
}

namespace {

QString m2(double v) {
    return QString::number(v, 'f', 2);
}

QString ma(double v) {
    return QString::number(v, 'g', 4) + QStringLiteral(" Ma");
}

QString depthList(std::vector<double> depths) {
    std::sort(depths.begin(), depths.end());
    QStringList out;
    for (const double d : depths) {
        out << m2(d);
    }
    return out.join(QStringLiteral(", ")) + QStringLiteral(" m");
}

QString edgeText(const draw::ColumnZoneEdge &e) {
    return e.open ? QStringLiteral("not picked (drawn to %1 m)").arg(m2(e.shallow_m))
                  : QStringLiteral("%1-%2 m").arg(m2(e.shallow_m), m2(e.deep_m));
}

QStringList taxonLines(const draw::HoleColumnInput &c, const std::string &key) {
    QStringList lines;
    for (const draw::ColumnTaxonRange &t : c.taxa) {
        if (t.taxon != key) {
            continue;
        }
        lines << QStringLiteral("%1: %2 counted finds%3")
                     .arg(QString::fromStdString(c.hole))
                     .arg(t.finds_m.size())
                     .arg(t.finds_m.empty() ? QString() : QStringLiteral(" at ") + depthList(t.finds_m));
        if (!t.reworked_m.empty()) {
            lines << QStringLiteral("  reworked at ") + depthList(t.reworked_m);
        }
        if (!t.caved_m.empty()) {
            lines << QStringLiteral("  caved at ") + depthList(t.caved_m);
        }
    }
    return lines;
}

QStringList zoneLines(const draw::HoleColumnInput &c, const std::string &key) {
    QStringList lines;
    for (const draw::ColumnZone &z : c.zones) {
        if (z.zone == key) {
            lines << QStringLiteral("%1 (%2): top %3, base %4")
                         .arg(QString::fromStdString(c.hole), QString::fromStdString(z.scheme),
                              edgeText(z.top), edgeText(z.base));
        }
    }
    return lines;
}

QStringList dateLines(const draw::HoleColumnInput &c, const std::string &key) {
    QStringList lines;
    for (const draw::ColumnDate &d : c.dates) {
        if (d.id == key) {
            lines << QStringLiteral("%1: %2, %3 (95 %: %4-%5) at %6-%7 m%8")
                         .arg(QString::fromStdString(c.hole), QString::fromStdString(d.method),
                              ma(d.age_ma), ma(d.age_low_ma), ma(d.age_high_ma), m2(d.shallow_m),
                              m2(d.deep_m),
                              d.used_in_model ? QString()
                                              : QStringLiteral(", not used in the age model"));
        }
    }
    return lines;
}

QStringList modelLines(const draw::HoleColumnInput &c, std::optional<double> depth_m) {
    const auto &rows = c.age_model.rows;
    if (rows.empty()) {
        return {};
    }
    if (!depth_m) {
        return {QStringLiteral("%1: age model %2-%3 m, median %4 to %5")
                    .arg(QString::fromStdString(c.hole), m2(rows.front().depth_m),
                         m2(rows.back().depth_m), ma(rows.front().q500_ma),
                         ma(rows.back().q500_ma))};
    }
    // Linear between the rows around the depth; at a surface the row below it (as the engine's
    // AgeModel::ageAt does).
    const auto below = std::find_if(rows.begin(), rows.end(),
                                    [&](const draw::ColumnAgeRow &r) { return r.depth_m > *depth_m; });
    if (below == rows.begin() || below == rows.end()) {
        return {QStringLiteral("%1: %2 m lies outside the age model (%3-%4 m)")
                    .arg(QString::fromStdString(c.hole), m2(*depth_m), m2(rows.front().depth_m),
                         m2(rows.back().depth_m))};
    }
    const draw::ColumnAgeRow &a = *(below - 1), &b = *below;
    const double f = (*depth_m - a.depth_m) / (b.depth_m - a.depth_m);
    const auto mix = [f](double u, double v) { return u + f * (v - u); };
    return {QStringLiteral("%1 at %2 m: median %3, 95 %: %4-%5")
                .arg(QString::fromStdString(c.hole), m2(*depth_m), ma(mix(a.q500_ma, b.q500_ma)),
                     ma(mix(a.q025_ma, b.q025_ma)), ma(mix(a.q975_ma, b.q975_ma)))};
}

} // namespace

QString describeTrackItem(const draw::PanelInput &input, const draw::ItemTag &tag,
                          std::optional<std::size_t> column, std::optional<double> depth_m) {
    if (!isColumnTrackRole(tag.role)) {
        return {};
    }
    QStringList lines{describeItem(tag)};
    for (std::size_t i = 0; i < input.columns.size(); ++i) {
        if (column && *column != i) {
            continue;
        }
        const draw::HoleColumnInput &c = input.columns[i];
        switch (tag.role) {
        case ItemRole::ColumnTaxonName:
        case ItemRole::ColumnTaxonBar:
        case ItemRole::ColumnTaxonFind:
        case ItemRole::ColumnTaxonExcluded:
            lines << taxonLines(c, tag.key);
            break;
        case ItemRole::ColumnZone:
        case ItemRole::ColumnZoneName:
        case ItemRole::ColumnZoneBracket:
            lines << zoneLines(c, tag.key);
            break;
        case ItemRole::ColumnDateMarker:
        case ItemRole::ColumnDateBar:
            lines << dateLines(c, tag.key);
            break;
        default:
            lines << modelLines(c, depth_m);
            break;
        }
    }
    return lines.join(QLatin1Char('\n'));
}

} // namespace atollog::view
