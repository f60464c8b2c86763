#pragma once
// A canvas showing the invented three-hole panel, on screen (offscreen platform), and helpers to
// find drawn items and turn scene points into widget pixels.
#include "draw/panel_layout.hpp"
#include "view/panel_canvas.hpp"

#include "sample_panel.hpp"

#include <QTest>

#include <catch2/catch.hpp>

#include <cmath>
#include <variant>

namespace atollog::view::test {

inline PanelScene sampleScene(const draw::PanelView &view = {}) {
    const draw::PanelInput in = samplePanel();
    PanelScene scene;
    scene.list = draw::layoutPanel(in, view, &scene.geometry);
    for (const auto &c : in.columns) {
        scene.holes.push_back(c.hole);
    }
    scene.axis = view.axis;
    scene.flatten_on = view.flatten_on;
    return scene;
}

/// The tie (or isochron) line of `key` joining two columns: of the lines with this role and key,
/// the one spanning the widest gap (the others are the short bars at each column's edge).
inline const draw::Line *joiningLine(const draw::DisplayList &list, draw::ItemRole role,
                                     const std::string &key, double min_span_mm = 2.0) {
    const draw::Line *best = nullptr;
    for (const draw::DisplayItem *item : list.withRole(role)) {
        const auto *line = std::get_if<draw::Line>(item);
        if (line && line->tag.key == key) {
            const double span = std::fabs(line->to.x_mm - line->from.x_mm);
            if (span >= min_span_mm &&
                (!best || span > std::fabs(best->to.x_mm - best->from.x_mm))) {
                best = line;
            }
        }
    }
    return best;
}

inline QPointF midpointPx(const PanelCanvas &canvas, const draw::Line &line) {
    return canvas.transform().toWidget(
        draw::PointMm{(line.from.x_mm + line.to.x_mm) / 2, (line.from.y_mm + line.to.y_mm) / 2});
}

/// Moves the mouse in steps, so the widget sees a drag rather than a jump.
inline void dragMouse(QWidget *w, QPoint from, QPoint to, int steps = 8) {
    QTest::mousePress(w, Qt::LeftButton, Qt::NoModifier, from);
    for (int i = 1; i <= steps; ++i) {
        QTest::mouseMove(w, from + (to - from) * i / steps);
    }
    QTest::mouseRelease(w, Qt::LeftButton, Qt::NoModifier, to);
}

} // namespace atollog::view::test
