// The sample hole rendered to PNG: not blank, the right size, fills where the layout put them.
#include "display_list_queries.hpp"
#include "draw/display_list_export.hpp"
#include "draw/hole_column.hpp"
#include "draw/lithology_fill.hpp"
#include "sample_hole_column.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QImage>

#include <cmath>
#include <cstdlib>

using namespace atollog::draw;
using atollog::draw::test::onlyItem;
using atollog::draw::test::sampleHoleColumn;
using atollog::draw::test::testOutputDir;

TEST_CASE("Column PNG shows each fill colour inside its box", "[draw][column][export]") {
    const DisplayList list = layoutHoleColumn(sampleHoleColumn());
    const auto path = testOutputDir("column-png") / "hole_column.png";
    const double dpi = 300.0;
    exportPng(list, path, dpi);
    QImage image;
    REQUIRE(image.load(QString::fromStdString(path.string()), "PNG"));
    // 25.4 mm per inch (exact by definition).
    CHECK(image.width() == static_cast<int>(std::ceil(list.page().width_mm / 25.4 * dpi)));
    const double px_per_mm = dpi / 25.4;
    // In the soil box (no pattern) the middle pixel has the soil fill exactly.
    const Rect &soil = onlyItem<Rect>(list, ItemRole::LithologyInterval, "0.00-0.60");
    const QColor centre =
        image.pixelColor(static_cast<int>((soil.box.left_mm + soil.box.width_mm / 2) * px_per_mm),
                         static_cast<int>((soil.box.top_mm + soil.box.height_mm / 2) * px_per_mm));
    const Colour expected = *soil.fill;
    CHECK(centre == QColor(expected.r, expected.g, expected.b));
    // Most pixels inside the basalt box are its grey (the rest is pattern ink).
    const Rect &basalt = onlyItem<Rect>(list, ItemRole::LithologyInterval, "53.00-62.00");
    const Colour grey = *basalt.fill;
    int grey_px = 0, all_px = 0;
    for (double y = basalt.box.top_mm + 1; y < basalt.box.bottom_mm() - 1; y += 0.37) {
        for (double x = basalt.box.left_mm + 1; x < basalt.box.right_mm() - 1; x += 0.37) {
            const QColor c =
                image.pixelColor(static_cast<int>(x * px_per_mm), static_cast<int>(y * px_per_mm));
            grey_px += c == QColor(grey.r, grey.g, grey.b) ? 1 : 0;
            ++all_px;
        }
    }
    CHECK(grey_px > all_px / 2);
}

// Run by hand to look at the column: draw_tests "[.look]" writes $TMPDIR/hole_column.png
// (/tmp/hole_column.png by default) at 300 dpi.
TEST_CASE("Write the sample column for a look", "[.look]") {
    const auto path = std::filesystem::temp_directory_path() / "hole_column.png";
    exportPng(layoutHoleColumn(sampleHoleColumn()), path, 300.0);
    CHECK(std::filesystem::file_size(path) > 10000);
}
