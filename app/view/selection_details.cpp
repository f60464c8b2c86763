#include "view/selection_details.hpp"

#include "view/item_description.hpp"

#include <QStringList>

namespace atollog::view {

namespace {

QString m2(double v) {
    return QString::number(v, 'f', 2);
}

QString holeName(const draw::PanelInput &in, std::size_t column) {
    return column < in.columns.size() ? QString::fromStdString(in.columns[column].hole)
                                      : QStringLiteral("?");
}

QString tieDetails(const draw::PanelInput &in, const std::string &event) {
    for (const auto &tie : in.ties) {
        if (tie.event != event) {
            continue;
        }
        QStringList lines{QStringLiteral("Tie line: ") + QString::fromStdString(event),
                          QStringLiteral("observed in %1 holes:").arg(tie.at.size())};
        for (const auto &at : tie.at) {
            lines << QStringLiteral("  %1: %2 m, bracket %3-%4 m")
                         .arg(holeName(in, at.column), m2(at.level_m), m2(at.shallow_m),
                              m2(at.deep_m));
        }
        return lines.join(QLatin1Char('\n'));
    }
    return {};
}

QString isochronDetails(const draw::PanelInput &in, const std::string &label) {
    for (const auto &iso : in.isochrons) {
        if (iso.label != label) {
            continue;
        }
        QStringList lines{QStringLiteral("Isochron: %1 (%2 Ma)")
                              .arg(QString::fromStdString(label), QString::number(iso.age_ma)),
                          QStringLiteral("median depth, 95 % range:")};
        for (const auto &at : iso.at) {
            lines << QStringLiteral("  %1: %2 m (%3-%4 m)")
                         .arg(holeName(in, at.column), m2(at.q500_m), m2(at.q025_m), m2(at.q975_m));
        }
        return lines.join(QLatin1Char('\n'));
    }
    return {};
}

QString holeDetails(const draw::PanelInput &in, const std::string &hole) {
    for (const auto &c : in.columns) {
        if (c.hole != hole) {
            continue;
        }
        return QStringLiteral("Hole %1\ncollar %2 m above sea level\ndrilled to %3 m\n"
                              "%4 runs, %5 intervals, %6 samples")
            .arg(QString::fromStdString(hole), m2(c.collar_elev_m), m2(c.drilled_base_m))
            .arg(c.runs.size())
            .arg(c.intervals.size())
            .arg(c.samples.size());
    }
    return {};
}

} // namespace

QString selectionDetails(const draw::PanelInput &shown, draw::ItemRole role, const QString &key) {
    if (role == draw::ItemRole::None && key.isEmpty()) {
        return {};
    }
    const std::string k = key.toStdString();
    QString text;
    if (isTieRole(role)) {
        text = tieDetails(shown, k);
    } else if (isIsochronRole(role)) {
        text = isochronDetails(shown, k);
    } else if (isColumnTrackRole(role)) {
        text = describeTrackItem(shown, draw::ItemTag{role, k}, std::nullopt, std::nullopt);
    } else if (role == draw::ItemRole::Title || role == draw::ItemRole::Subtitle ||
               role == draw::ItemRole::DrilledBase || role == draw::ItemRole::ColumnNote) {
        text = holeDetails(shown, k);
    }
    return text.isEmpty() ? describeItem(draw::ItemTag{role, k}) : text;
}

} // namespace atollog::view
