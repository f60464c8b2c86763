// The canvas driven through QTest: zoom, pan, fit, tooltip, selection, column drag, culling,
// painting at a high-DPI device pixel ratio.
#include "canvas_fixture.hpp"

#include <QApplication>
#include <QHelpEvent>
#include <QToolTip>
#include <QWheelEvent>

#include <algorithm>
#include <cstdlib>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;
using Catch::WithinAbs;

namespace {

struct ShownCanvas {
    PanelCanvas canvas;
    ShownCanvas() {
        canvas.resize(900, 700);
        canvas.setScene(sampleScene());
        canvas.show();
        REQUIRE(QTest::qWaitForWindowExposed(&canvas));
        canvas.fitToWindow();
    }
};

void sendWheel(QWidget &w, QPointF at, int angle) {
    QWheelEvent wheel(at, w.mapToGlobal(at), QPoint(), QPoint(0, angle), Qt::NoButton,
                      Qt::NoModifier, Qt::NoScrollPhase, false);
    QApplication::sendEvent(&w, &wheel);
}

} // namespace

TEST_CASE("the wheel zooms about the cursor", "[view][canvas]") {
    ShownCanvas s;
    const QPointF cursor(317.0, 243.0);
    const draw::PointMm under = s.canvas.transform().toScene(cursor);
    const double scale = s.canvas.transform().pxPerMm();

    sendWheel(s.canvas, cursor, 120);
    CHECK_THAT(s.canvas.transform().pxPerMm(), WithinAbs(scale * PanelCanvas::kWheelStep, 1e-9));
    QPointF now = s.canvas.transform().toWidget(under);
    CHECK_THAT(now.x(), WithinAbs(cursor.x(), 0.5)); // px
    CHECK_THAT(now.y(), WithinAbs(cursor.y(), 0.5));

    sendWheel(s.canvas, cursor, 360);
    sendWheel(s.canvas, cursor, -240);
    CHECK_THAT(s.canvas.transform().pxPerMm(),
               WithinAbs(scale * std::pow(PanelCanvas::kWheelStep, 2), 1e-9));
    now = s.canvas.transform().toWidget(under);
    CHECK_THAT(now.x(), WithinAbs(cursor.x(), 0.5));
    CHECK_THAT(now.y(), WithinAbs(cursor.y(), 0.5));
}

TEST_CASE("a left drag pans by the dragged distance", "[view][canvas]") {
    ShownCanvas s;
    const PanelScene &scene = s.canvas.scene();
    // A point in the body of the first column: not its header, which would start a column drag.
    const draw::RectMm &box = scene.geometry.column_boxes[0];
    const QPoint from = s.canvas.transform()
                            .toWidget(draw::PointMm{box.left_mm + box.width_mm / 2,
                                                    scene.geometry.axis_origin_y_mm + 15.0})
                            .toPoint();
    const QPointF origin = s.canvas.transform().originPx();
    dragMouse(&s.canvas, from, from + QPoint(73, -41));
    const QPointF moved = s.canvas.transform().originPx() - origin;
    CHECK_THAT(moved.x(), WithinAbs(73.0, 1e-9));
    CHECK_THAT(moved.y(), WithinAbs(-41.0, 1e-9));
}

TEST_CASE("fit shows the whole page", "[view][canvas]") {
    ShownCanvas s;
    s.canvas.zoomIn();
    s.canvas.zoomIn();
    s.canvas.fitToWindow();
    const QRectF page = s.canvas.transform().toWidget(s.canvas.scene().list.page());
    const QRectF widget(s.canvas.rect());
    CHECK(widget.contains(page));
    // It fills the tighter direction up to the margin: fit is the largest such scale.
    const bool fills = std::abs(page.width() - (widget.width() - 24.0)) < 0.01 ||
                       std::abs(page.height() - (widget.height() - 24.0)) < 0.01;
    CHECK(fills);
}

TEST_CASE("hovering names the tie and the column under the cursor", "[view][canvas]") {
    ShownCanvas s;
    const draw::Line *tie = joiningLine(s.canvas.scene().list, draw::ItemRole::TieLine, "B ALPHA");
    REQUIRE(tie != nullptr);
    const QPoint at = midpointPx(s.canvas, *tie).toPoint();
    QHelpEvent help(QEvent::ToolTip, at, s.canvas.mapToGlobal(at));
    QApplication::sendEvent(&s.canvas, &help);
    CHECK(QToolTip::isVisible());
    CHECK(QToolTip::text().contains(QStringLiteral("tie line: B ALPHA")));
    CHECK(QToolTip::text().contains(QStringLiteral("depth ")));

    // Inside the second column's log: the hole and its own depth.
    const draw::PanelGeometry &g = s.canvas.scene().geometry;
    const double y = draw::panelY_mm(g, 1, 30.2);
    const QPointF in_column = s.canvas.transform().toWidget(
        draw::PointMm{(g.lithology_left_mm[1] + g.lithology_right_mm[1]) / 2, y});
    const QString tip = s.canvas.toolTipAt(in_column);
    CHECK(tip.contains(QStringLiteral("interval ")));
    CHECK(tip.contains(QStringLiteral("hole AX2: 30.2")));
    QToolTip::hideText();
}

TEST_CASE("a click selects the item under it", "[view][canvas]") {
    ShownCanvas s;
    std::vector<std::pair<draw::ItemRole, QString>> selected;
    QObject::connect(
        &s.canvas, &PanelCanvas::itemSelected,
        [&](draw::ItemRole role, const QString &key) { selected.emplace_back(role, key); });
    const draw::Line *tie = joiningLine(s.canvas.scene().list, draw::ItemRole::TieLine, "T BETA");
    REQUIRE(tie != nullptr);
    QTest::mouseClick(&s.canvas, Qt::LeftButton, Qt::NoModifier,
                      midpointPx(s.canvas, *tie).toPoint());
    REQUIRE(selected.size() == 1);
    CHECK(selected[0].first == draw::ItemRole::TieLine);
    CHECK(selected[0].second == QStringLiteral("T BETA"));
    CHECK(s.canvas.selectedItem().has_value());
    // The whole tie is highlighted: its lines and bands between all three holes, nothing else.
    const auto &lit = s.canvas.highlightList().items();
    CHECK(lit.size() >= 4);
    for (const auto &item : lit) {
        CHECK(draw::itemTag(item).key == "T BETA");
    }

    // Off the page: nothing selected.
    QTest::mouseClick(&s.canvas, Qt::LeftButton, Qt::NoModifier, QPoint(2, 2));
    REQUIRE(selected.size() == 2);
    CHECK(selected[1].first == draw::ItemRole::None);
    CHECK_FALSE(s.canvas.selectedItem().has_value());
    CHECK(s.canvas.highlightList().items().empty());
}

TEST_CASE("dragging a column header past its neighbour reorders the columns", "[view][canvas]") {
    ShownCanvas s;
    QList<QList<int>> orders;
    QObject::connect(&s.canvas, &PanelCanvas::columnOrderChanged,
                     [&](const QList<int> &order) { orders << order; });
    const draw::PanelGeometry &g = s.canvas.scene().geometry;
    const auto centre = [&](std::size_t c) {
        return g.column_boxes[c].left_mm + g.column_boxes[c].width_mm / 2;
    };
    const auto &t = s.canvas.transform();
    const QPoint header =
        t.toWidget(draw::PointMm{centre(0), g.column_boxes[0].top_mm + 2.0}).toPoint();
    const int past_second = static_cast<int>((centre(1) - centre(0) + 5.0) * t.pxPerMm());

    // Short of the neighbour's centre: no change.
    dragMouse(&s.canvas, header, header + QPoint(past_second / 3, 0));
    CHECK(orders.isEmpty());

    dragMouse(&s.canvas, header, header + QPoint(past_second, 4));
    REQUIRE(orders.size() == 1);
    CHECK(orders[0] == QList<int>{1, 0, 2});
}

TEST_CASE("painting skips what is off screen", "[view][canvas]") {
    ShownCanvas s;
    (void)s.canvas.grab();
    const auto whole = s.canvas.lastPaintStats();
    CHECK(whole.painted > 0);
    for (int i = 0; i < 6; ++i) {
        s.canvas.zoomIn();
    }
    (void)s.canvas.grab();
    const auto zoomed = s.canvas.lastPaintStats();
    CHECK(zoomed.culled > 0);
    CHECK(zoomed.painted < whole.painted);
}

namespace {

/// Mean absolute difference per channel (0-255) of two images of one size.
double meanDifference(const QImage &a, const QImage &b) {
    double sum = 0;
    for (int y = 0; y < a.height(); ++y) {
        for (int x = 0; x < a.width(); ++x) {
            const QRgb p = a.pixel(x, y), q = b.pixel(x, y);
            sum += std::abs(qRed(p) - qRed(q)) + std::abs(qGreen(p) - qGreen(q)) +
                   std::abs(qBlue(p) - qBlue(q));
        }
    }
    return sum / (3.0 * a.width() * a.height());
}

/// Share of pixels whose largest channel difference exceeds `threshold`.
double shareDiffering(const QImage &a, const QImage &b, int threshold) {
    long long n = 0;
    for (int y = 0; y < a.height(); ++y) {
        for (int x = 0; x < a.width(); ++x) {
            const QRgb p = a.pixel(x, y), q = b.pixel(x, y);
            const int d = std::max({std::abs(qRed(p) - qRed(q)), std::abs(qGreen(p) - qGreen(q)),
                                    std::abs(qBlue(p) - qBlue(q))});
            n += d > threshold ? 1 : 0;
        }
    }
    return static_cast<double>(n) / (static_cast<double>(a.width()) * a.height());
}

} // namespace

TEST_CASE("on a high-DPI screen the canvas draws at the screen's resolution", "[view][canvas]") {
    // A screen at a device pixel ratio of 2 gets a paint device twice as dense (Qt's high-DPI
    // scaling); painting into such a pixmap is what the screen's backing store gets.
    ShownCanvas s;
    const QSize logical = s.canvas.size();
    const auto render = [&](qreal dpr) {
        QPixmap pixmap(logical * dpr);
        pixmap.setDevicePixelRatio(dpr);
        pixmap.fill(Qt::white);
        s.canvas.render(&pixmap);
        return pixmap.toImage().convertToFormat(QImage::Format_RGB32);
    };
    const QImage one = render(1.0), two = render(2.0);
    REQUIRE(two.size() == logical * 2);
    // The same drawing: the dense picture scaled down matches the plain one...
    const QImage down = two.scaled(logical, Qt::IgnoreAspectRatio, Qt::SmoothTransformation);
    const double mean = meanDifference(down, one);
    // ...and it is not the plain picture stretched (what a canvas painting into a 1x buffer
    // would show): its edges and text are drawn anew at each device pixel.
    const QImage stretched = one.scaled(logical * 2, Qt::IgnoreAspectRatio, Qt::FastTransformation);
    const double sharper = shareDiffering(two, stretched, 48);
    INFO("mean difference scaled down " << mean << ", share differing from stretched " << sharper);
    CHECK(mean < 3.0); // measured about 1 (text antialiasing)
    CHECK(sharper > 0.005);
}
