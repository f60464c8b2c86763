#include "view/item_description.hpp"

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
    case ItemRole::LegendSwatch:
    case ItemRole::LegendText:
        return QStringLiteral("legend: ") + key;
    default:
        return key;
    }
}

} // namespace atollog::view
