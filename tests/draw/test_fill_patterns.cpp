// Lithology fill patterns, checked in pixels at 10 px per mm. Pattern numbers are those of
// FGDC-STD-013-2006 section 37 (checked against a copy of the standard's pattern
// chart); the line work follows the standard's style but is drawn from memory, so the checks
// test the trait that tells each pattern apart, not a copy of the chart.
#include "draw/fill_pattern_painter.hpp"
#include "draw/paint_display_list.hpp"

#include <catch2/catch.hpp>

#include <QImage>
#include <QPainter>

using namespace atollog::draw;

namespace {

constexpr double kPxPerMm = 10.0;

QImage paintPattern(FillPattern pattern, const RectMm &box, const RectMm &visible) {
    DisplayList list;
    list.add(Rect{box, std::nullopt, pattern, std::nullopt, {}});
    QImage image(static_cast<int>(visible.width_mm * kPxPerMm),
                 static_cast<int>(visible.height_mm * kPxPerMm), QImage::Format_RGB32);
    image.fill(Qt::white);
    QPainter painter(&image);
    paintDisplayList(painter, list, visible, kPxPerMm);
    return image;
}

QImage paintPattern(FillPattern pattern) {
    return paintPattern(pattern, {0, 0, 20, 20}, {0, 0, 20, 20});
}

bool dark(const QImage &image, int x, int y) {
    return qGray(image.pixel(x, y)) < 160;
}

double inkFraction(const QImage &image) {
    long long ink = 0;
    for (int y = 0; y < image.height(); ++y) {
        for (int x = 0; x < image.width(); ++x) {
            ink += dark(image, x, y) ? 1 : 0;
        }
    }
    return static_cast<double>(ink) / (image.width() * image.height());
}

/// The longest run of dark pixels along row y.
int longestDarkRun(const QImage &image, int y) {
    int best = 0, run = 0;
    for (int x = 0; x < image.width(); ++x) {
        run = dark(image, x, y) ? run + 1 : 0;
        best = std::max(best, run);
    }
    return best;
}

} // namespace

TEST_CASE("Dolostone (FGDC 642) is a brick bond with leaning joints", "[draw][pattern]") {
    // Courses 2 mm high as limestone 627; a joint starting at x = 4 mm on the course line
    // y = 4 mm leans 1 mm to the right by the next course line.
    const QImage image = paintPattern(FillPattern::Dolostone);
    CHECK(dark(image, 30, 40));       // course line at 4 mm
    CHECK(dark(image, 41, 42));       // near the joint's top: x ~ 4.1 mm at y = 4.2 mm
    CHECK(dark(image, 49, 58));       // near its foot: x ~ 4.9 mm at y = 5.8 mm
    CHECK_FALSE(dark(image, 41, 58)); // a vertical joint (limestone) would be here
    const QImage limestone = paintPattern(FillPattern::Limestone);
    CHECK(dark(limestone, 40, 50)); // limestone 627: the joint stands upright at x = 4 mm
    CHECK_FALSE(dark(image, 40, 55));
}

TEST_CASE("Sand (FGDC 607) is a stipple without lines", "[draw][pattern]") {
    const QImage image = paintPattern(FillPattern::Sand);
    const double ink = inkFraction(image);
    CHECK(ink > 0.01); // about one 0.24 mm dot per mm^2
    CHECK(ink < 0.15);
    for (int y = 0; y < image.height(); y += 7) {
        CHECK(longestDarkRun(image, y) < 6); // no mark longer than a dot (0.24 mm = 2.4 px)
    }
}

TEST_CASE("Clay (FGDC 620) is rows of short horizontal dashes", "[draw][pattern]") {
    // Rows every 1.2 mm; dashes 1.6 mm with 0.8 mm gaps, alternate rows offset by half a period.
    const QImage image = paintPattern(FillPattern::Clay);
    const int row = 24; // y = 2.4 mm, an even row
    CHECK(longestDarkRun(image, row) >= 14);
    CHECK(longestDarkRun(image, row) <= 18); // dashes, not a continuous line
    CHECK(longestDarkRun(image, 30) == 0);   // between rows
    CHECK(dark(image, 8, row));              // dash 0.0-1.6 mm
    CHECK_FALSE(dark(image, 20, row));       // gap 1.6-2.4 mm
    CHECK(dark(image, 20, 12));              // the odd row above is shifted: dash 1.2-2.8 mm
}

TEST_CASE("Gravel, basalt and tuff patterns differ from each other and from sand",
          "[draw][pattern]") {
    // 601 gravel (open rings), 717 basaltic flows and 711 tuffaceous rock ("v" marks, the
    // tuff with a stipple): each must look different from every other pattern.
    const std::vector<FillPattern> patterns{
        FillPattern::Limestone,      FillPattern::Dolostone,    FillPattern::Sand,
        FillPattern::Clay,           FillPattern::Gravel,       FillPattern::Basalt,
        FillPattern::Volcaniclastic, FillPattern::ReefFramework};
    std::vector<QImage> images;
    for (const FillPattern p : patterns) {
        images.push_back(paintPattern(p));
        CHECK(inkFraction(images.back()) > 0.01);
    }
    for (std::size_t i = 0; i < images.size(); ++i) {
        for (std::size_t j = i + 1; j < images.size(); ++j) {
            CAPTURE(i, j);
            CHECK(images[i] != images[j]);
        }
    }
}

TEST_CASE("Patterns are anchored at the scene origin, so touching boxes continue",
          "[draw][pattern]") {
    // Two boxes side by side paint the same pixels as one box covering both (away from the
    // shared edge, where anti-aliasing of the two clips may differ by a pixel): as line work and
    // from raster tiles (what a QImage gets by default).
    for (const PatternRendering rendering :
         {PatternRendering::LineWork, PatternRendering::Automatic}) {
        for (const FillPattern p : {FillPattern::Dolostone, FillPattern::Sand, FillPattern::Clay,
                                    FillPattern::Gravel, FillPattern::Basalt}) {
            CAPTURE(static_cast<int>(rendering), static_cast<int>(p));
            DisplayList whole_list;
            whole_list.add(Rect{{0, 0, 20, 10}, std::nullopt, p, std::nullopt, {}});
            DisplayList halves;
            halves.add(Rect{{0, 0, 7.3, 10}, std::nullopt, p, std::nullopt, {}});
            halves.add(Rect{{7.3, 0, 12.7, 10}, std::nullopt, p, std::nullopt, {}});
            QImage whole(200, 100, QImage::Format_RGB32);
            QImage split(200, 100, QImage::Format_RGB32);
            whole.fill(Qt::white);
            split.fill(Qt::white);
            {
                QPainter painter(&whole);
                paintDisplayList(painter, whole_list, {0, 0, 20, 10}, kPxPerMm, {rendering});
            }
            {
                QPainter painter(&split);
                paintDisplayList(painter, halves, {0, 0, 20, 10}, kPxPerMm, {rendering});
            }
            int differing = 0;
            for (int y = 0; y < 100; ++y) {
                for (int x = 0; x < 200; ++x) {
                    if (std::abs(x - 73) > 1 && whole.pixel(x, y) != split.pixel(x, y)) {
                        ++differing;
                    }
                }
            }
            CHECK(differing == 0);
        }
    }
}

TEST_CASE("Stippled patterns repeat with their stated period", "[draw][pattern]") {
    // Sand, gravel and tuff place their dots and rings by a hash of the cell, taken modulo the
    // pattern's period, so that a raster tile of one period repeats them exactly. The line work
    // one period away must be the same pixels (10 px per mm: every period is whole pixels).
    for (const FillPattern p : {FillPattern::Sand, FillPattern::Gravel, FillPattern::Volcaniclastic,
                                FillPattern::Limestone, FillPattern::ReefFramework}) {
        CAPTURE(static_cast<int>(p));
        const PeriodMm period = fillPatternPeriod(p);
        const RectMm area{0, 0, 12, 12};
        const RectMm one_period_on{period.x_mm, period.y_mm, 12, 12};
        DisplayList list;
        list.add(Rect{{-1, -1, 80, 80}, std::nullopt, p, std::nullopt, {}});
        QImage here(120, 120, QImage::Format_RGB32), there(120, 120, QImage::Format_RGB32);
        here.fill(Qt::white);
        there.fill(Qt::white);
        {
            QPainter painter(&here);
            paintDisplayList(painter, list, area, kPxPerMm, {PatternRendering::LineWork});
        }
        {
            QPainter painter(&there);
            paintDisplayList(painter, list, one_period_on, kPxPerMm, {PatternRendering::LineWork});
        }
        CHECK(here == there);
        // Half a period on is not the same (the period is not shorter than stated).
        const RectMm half_on{period.x_mm / 2, 0, 12, 12};
        QImage half(120, 120, QImage::Format_RGB32);
        half.fill(Qt::white);
        {
            QPainter painter(&half);
            paintDisplayList(painter, list, half_on, kPxPerMm, {PatternRendering::LineWork});
        }
        CHECK(here != half);
    }
}
