#include "view/depth_unit.hpp"

#include <cmath>

namespace atollog::view {

double depthInUnit(double depth_m, DepthUnit unit) {
    return unit == DepthUnit::Foot ? depth_m / kMetresPerFoot : depth_m;
}

double depthInMetres(double value, DepthUnit unit) {
    return unit == DepthUnit::Foot ? value * kMetresPerFoot : value;
}

QString unitSymbol(DepthUnit unit) {
    return unit == DepthUnit::Foot ? QStringLiteral("ft") : QStringLiteral("m");
}

QString numberCellText(double value) {
    QString text = QString::number(value, 'f', 3);
    // Trailing zeros carry no information in a logged depth or percentage.
    while (text.endsWith(QLatin1Char('0'))) {
        text.chop(1);
    }
    if (text.endsWith(QLatin1Char('.'))) {
        text.chop(1);
    }
    if (text == QLatin1String("-0")) {
        text = QStringLiteral("0");
    }
    return text;
}

QString depthText(double depth_m, DepthUnit unit) {
    return numberCellText(depthInUnit(depth_m, unit));
}

std::optional<double> readNumber(const QString &text) {
    QString t = text.trimmed();
    t.replace(QLatin1Char(','), QLatin1Char('.'));
    bool ok = false;
    const double v = t.toDouble(&ok);
    if (!ok || !std::isfinite(v)) {
        return std::nullopt;
    }
    return v;
}

} // namespace atollog::view
