#include "view/axis_readout.hpp"

#include <QStringList>

#include <algorithm>
#include <cmath>

namespace atollog::view {

namespace {

QString metres(double m) {
    // Two decimals: a centimetre is the finest depth a core log records.
    return QString::number(m, 'f', 2) + QStringLiteral(" m");
}

} // namespace

std::optional<std::size_t> columnAt(const PanelScene &scene, const draw::PointMm &at) {
    const auto &boxes = scene.geometry.column_boxes;
    for (std::size_t c = 0; c < boxes.size(); ++c) {
        const draw::RectMm &b = boxes[c];
        if (at.x_mm >= b.left_mm && at.x_mm <= b.right_mm() && at.y_mm >= b.top_mm &&
            at.y_mm <= b.bottom_mm()) {
            return c;
        }
    }
    return std::nullopt;
}

double columnBodyTop_mm(const draw::PanelGeometry &g, std::size_t column) {
    if (column >= g.column_scales.size() || !g.column_scales[column]) {
        return g.axis_origin_y_mm;
    }
    // The collar (or, on an age axis, the top of the age model) or the window's top.
    return std::max(g.axis_origin_y_mm, g.column_scales[column]->y_mm(0.0));
}

QString axisReadout(const PanelScene &scene, const draw::PointMm &at) {
    const draw::PanelGeometry &g = scene.geometry;
    if (!(g.mm_per_axis_unit > 0.0)) {
        return {};
    }
    // Axis values grow downward: depth below the collar, depth below sea level on an elevation
    // axis, depth below the flattening level when flattened, age on an age axis (see
    // PanelGeometry).
    const double axis_m = g.axis_top_m + (at.y_mm - g.axis_origin_y_mm) / g.mm_per_axis_unit;
    QStringList lines;
    if (at.y_mm >= g.axis_origin_y_mm) {
        if (scene.axis == draw::PanelAxis::Age) {
            // Three decimals of a Ma: a thousand years, finer than any model here resolves.
            lines << QStringLiteral("age %1 Ma (median of the age model)").arg(axis_m, 0, 'f', 3);
        } else if (scene.flatten_on) {
            const QString name = QString::fromStdString(*scene.flatten_on);
            lines << (axis_m >= 0 ? metres(axis_m) + QStringLiteral(" below ") + name
                                  : metres(-axis_m) + QStringLiteral(" above ") + name);
        } else if (scene.axis == draw::PanelAxis::Elevation) {
            lines << QStringLiteral("elevation ") + metres(axis_m == 0.0 ? 0.0 : -axis_m);
        } else {
            lines << QStringLiteral("depth ") + metres(axis_m);
        }
    }
    if (const auto c = columnAt(scene, at)) {
        const QString hole =
            *c < scene.holes.size() ? QString::fromStdString(scene.holes[*c]) : QString();
        if (at.y_mm < columnBodyTop_mm(g, *c) || *c >= g.column_scales.size() ||
            !g.column_scales[*c]) {
            lines << QStringLiteral("hole ") + hole; // over its header, or off the axis
        } else {
            lines << QStringLiteral("hole ") + hole + QStringLiteral(": ") +
                         metres(draw::panelDepth_m(g, *c, at.y_mm)) +
                         QStringLiteral(" below collar");
        }
    }
    return lines.join(QLatin1Char('\n'));
}

} // namespace atollog::view
