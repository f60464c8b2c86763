// Painting: placement on the device, culling against the visible rectangle, the bundled font.
#include "draw/bundled_font.hpp"
#include "draw/paint_display_list.hpp"
#include "draw/range_chart.hpp"
#include "draw/text_extent.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QFont>
#include <QFontInfo>
#include <QFontMetricsF>
#include <QImage>
#include <QPainter>

using namespace atollog::draw;

namespace {

DisplayList threeSquares() {
    // Three 2 mm squares, 10 mm apart along x.
    DisplayList list;
    for (int i = 0; i < 3; ++i) {
        list.add(Rect{{10.0 * i, 0.0, 2.0, 2.0},
                      colourFromHex(0xD55E00),
                      FillPattern::None,
                      std::nullopt,
                      {ItemRole::None, std::to_string(i)}});
    }
    return list;
}

QImage whiteImage(int w, int h) {
    QImage image(w, h, QImage::Format_RGB32);
    image.fill(Qt::white);
    return image;
}

} // namespace

TEST_CASE("Painting places scene millimetres at px_per_mm", "[draw][paint]") {
    QImage image = whiteImage(300, 40);
    {
        QPainter painter(&image);
        const PaintStats stats = paintDisplayList(painter, threeSquares(), {0, 0, 30, 4}, 10.0);
        CHECK(stats.painted == 3);
        CHECK(stats.culled == 0);
    }
    // Square 1 covers x 10..12 mm -> pixels 100..120 at 10 px/mm.
    CHECK(image.pixelColor(110, 10) == QColor(0xD5, 0x5E, 0x00));
    CHECK(image.pixelColor(50, 10) == QColor(Qt::white));
    CHECK(image.pixelColor(110, 30) == QColor(Qt::white)); // below the 2 mm square
}

TEST_CASE("Painting skips items outside the visible rectangle", "[draw][paint]") {
    SECTION("three squares, a window over the middle one") {
        QImage image = whiteImage(40, 40);
        QPainter painter(&image);
        // The window starts at scene (9, -1) mm: the middle square lands at pixel (10..30, 10..30).
        const PaintStats stats = paintDisplayList(painter, threeSquares(), {9, -1, 4, 4}, 10.0);
        painter.end();
        CHECK(stats.painted == 1);
        CHECK(stats.culled == 2);
        CHECK(image.pixelColor(20, 20) == QColor(0xD5, 0x5E, 0x00));
        CHECK(image.pixelColor(5, 5) == QColor(Qt::white));
    }
    SECTION("a range chart, a window over its top 30 mm") {
        const DisplayList chart = layoutRangeChart(test::sampleRangeChart());
        const RectMm page = chart.page();
        QImage image = whiteImage(200, 200);
        QPainter painter(&image);
        const PaintStats all = paintDisplayList(painter, chart, page, 1.0);
        const PaintStats top = paintDisplayList(painter, chart, {0, 0, page.width_mm, 30.0}, 1.0);
        painter.end();
        CHECK(all.painted == chart.size());
        CHECK(all.culled == 0);
        CHECK(top.painted + top.culled == chart.size());
        CHECK(top.painted > 0);
        CHECK(top.painted < all.painted / 2);
    }
}

TEST_CASE("Painting refuses a non-positive scale", "[draw][paint]") {
    QImage image = whiteImage(10, 10);
    QPainter painter(&image);
    CHECK_THROWS_AS(paintDisplayList(painter, threeSquares(), {0, 0, 1, 1}, 0.0),
                    std::invalid_argument);
}

TEST_CASE("The bundled font is DejaVu Sans and text uses it", "[draw][font]") {
    const QString family = bundledFontFamily();
    CHECK(family == QStringLiteral("DejaVu Sans"));
    // QFontInfo reports the font actually matched (Qt documentation: QFontInfo), not the request.
    const QFontInfo info{QFont(family)};
    CHECK(info.family() == family);
}

TEST_CASE("Text width estimate is wide enough for names and numbers", "[draw][font]") {
    // Checked against QFontMetricsF::horizontalAdvance of the bundled font, the measure Qt
    // itself uses to place text.
    QFont font(bundledFontFamily());
    font.setPixelSize(100);
    for (const bool bold : {false, true}) {
        font.setBold(bold);
        const QFontMetricsF metrics(font);
        for (const char *text :
             {"Atollina prima", "Lagunella minor", "Ghostella vetus", "larger benthic foram",
              "123.45", "depth (m)", "Hole KT-7 \u2013 range chart", "Mmmmw Wwwm",
              "MOUNT WAWA 0123", "%@ 1:200"}) {
            CAPTURE(text, bold);
            const double measured_mm =
                metrics.horizontalAdvance(QString::fromUtf8(text)) / 100.0 * 8.0 * kMmPerPoint;
            const double estimated_mm =
                estimateTextWidth_mm(text, 8.0, bold ? FontWeight::Bold : FontWeight::Regular);
            CHECK(estimated_mm >= measured_mm);
            CHECK(estimated_mm < 1.6 * measured_mm);
        }
    }
}

TEST_CASE("Limestone fill is a brick bond", "[draw][paint]") {
    // FGDC-STD-013-2006 pattern 627 (limestone): courses of bricks, joints offset by half a
    // brick in alternate courses. Here courses are 2 mm high and bricks 4 mm long.
    DisplayList list;
    list.add(Rect{{0, 0, 20, 20}, std::nullopt, FillPattern::Limestone, std::nullopt, {}});
    QImage image = whiteImage(200, 200);
    {
        QPainter painter(&image);
        paintDisplayList(painter, list, {0, 0, 20, 20}, 10.0); // 10 px per mm
    }
    const auto dark = [&](int x, int y) { return qGray(image.pixel(x, y)) < 128; };
    CHECK(dark(30, 40));       // course line at 4 mm
    CHECK_FALSE(dark(30, 30)); // inside a brick
    CHECK(dark(40, 10));       // course 0: joint at 4 mm
    CHECK_FALSE(dark(20, 10));
    CHECK(dark(20, 30)); // course 1: joints shifted by half a brick, at 2 mm
    CHECK_FALSE(dark(40, 30));
}
