// The sample panel painted: the PNG is not blank and the logs are not hidden under the bands.
#include "display_list_queries.hpp"
#include "draw/display_list_export.hpp"
#include "draw/paint_display_list.hpp"
#include "draw/panel_layout.hpp"
#include "sample_panel.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QImage>
#include <QPainter>

#include <filesystem>

using namespace atollog::draw;
using atollog::draw::test::onlyItem;
using atollog::draw::test::samplePanel;
using atollog::draw::test::samplePanelView;
using atollog::draw::test::testOutputDir;

TEST_CASE("Panel PNG keeps a log's fill where a band passes behind it", "[panel]") {
    const DisplayList list = layoutPanel(samplePanel(), samplePanelView());
    const auto path = testOutputDir("panel-png") / "panel.png";
    const double dpi = 200.0;
    exportPng(list, path, dpi);
    QImage image;
    REQUIRE(image.load(QString::fromStdString(path.string()), "PNG"));
    const double px_per_mm = dpi / 25.4;
    // MRV-F2's cavity at 27.5-28.3 m is white and unpatterned, and the band of the tie that
    // skips MRV-F2 (27-32 m) passes behind it: the pixel stays white, the band is underneath.
    const Rect &cavity = onlyItem<Rect>(list, ItemRole::LithologyInterval, "27.50-28.30");
    const QColor centre = image.pixelColor(
        static_cast<int>((cavity.box.left_mm + cavity.box.width_mm / 2) * px_per_mm),
        static_cast<int>((cavity.box.top_mm + cavity.box.height_mm / 2) * px_per_mm));
    CHECK(centre == QColor(255, 255, 255));
}

// Run by hand to look at the panel: draw_tests "[.look]" writes $TMPDIR/panel.png (depth axis),
// panel_elevation.png and panel_flattened.png at 300 dpi.
TEST_CASE("Write the sample panel for a look", "[.look]") {
    const auto dir = std::filesystem::temp_directory_path();
    PanelView view = samplePanelView();
    exportPng(layoutPanel(samplePanel(), view), dir / "panel.png", 300.0);
    view.axis = PanelAxis::Elevation;
    exportPng(layoutPanel(samplePanel(), view), dir / "panel_elevation.png", 300.0);
    view.flatten_on = "base Tavoripora rosea";
    exportPng(layoutPanel(samplePanel(), view), dir / "panel_flattened.png", 300.0);
    CHECK(std::filesystem::file_size(dir / "panel.png") > 10000);

    // A close look at the first gap (panel_zoom.png): the ties, isochrons and their labels.
    PanelGeometry g;
    const DisplayList plain = layoutPanel(samplePanel(), samplePanelView(), &g);
    const double px_per_mm = 24.0;
    const RectMm visible{g.lithology_left_mm[0], panelY_mm(g, 0, 4.0), 110.0, 60.0};
    QImage zoom(static_cast<int>(visible.width_mm * px_per_mm),
                static_cast<int>(visible.height_mm * px_per_mm), QImage::Format_RGB32);
    zoom.fill(Qt::white);
    QPainter painter(&zoom);
    paintDisplayList(painter, plain, visible, px_per_mm);
    painter.end();
    CHECK(zoom.save(QString::fromStdString((dir / "panel_zoom.png").string()), "PNG"));
}
