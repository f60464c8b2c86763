// Horizontal and vertical solid strokes painted as fills on raster devices (StrokesAsFills),
// against the same strokes painted by the raster engine's own stroker (the reference). The
// tolerances are ours; each comparison also runs on a deliberately wrong case (the strokes one
// pixel off) to show that it can fail.
#include "draw/display_list_export.hpp"
#include "draw/paint_display_list.hpp"
#include "draw/strokes_as_fills.hpp"
#include "image_difference.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QFile>
#include <QImage>
#include <QPainter>
#include <QSvgGenerator>

using namespace atollog::draw;
using atollog::draw::test::compareImages;
using atollog::draw::test::ImageDifference;
using atollog::draw::test::testOutputDir;

namespace {

/// Boxes stacked like logged intervals (outlined, filled, some of them patterned and some
/// thinner than their outline at small scales), an unfilled outlined box, a translucent outline,
/// and the ticks and cuts a column draws. Positions at fractions of a mm, so edges fall inside
/// device pixels.
DisplayList sampleStrokes() {
    DisplayList list;
    const Stroke ink{{20, 20, 20, 255}, 0.2, DashStyle::Solid};
    double top = 1.13;
    const double heights[] = {0.17, 2.31, 0.9, 4.47, 0.33, 1.6, 3.05};
    int i = 0;
    for (const double h : heights) {
        list.add(Rect{{2.07, top, 8.3 + 0.7 * i, h},
                      Colour{static_cast<std::uint8_t>(150 + 12 * i), 200, 230, 255},
                      i % 3 == 0 ? FillPattern::Limestone : FillPattern::None,
                      ink,
                      {}});
        top += h;
        ++i;
    }
    list.add(Rect{{14.2, 2.55, 6.1, 3.3},
                  std::nullopt,
                  FillPattern::None,
                  Stroke{{60, 60, 60, 255}, 0.15, DashStyle::Solid},
                  {}});
    list.add(Rect{{14.2, 7.05, 6.1, 4.3},
                  Colour{255, 255, 255, 255},
                  FillPattern::None,
                  Stroke{{200, 30, 30, 128}, 0.35, DashStyle::Solid},
                  {}});
    for (int t = 0; t < 8; ++t) {
        const double y = 1.37 + 1.61 * t;
        list.add(Line{{0.4, y}, {1.6, y}, Stroke{{20, 20, 20, 255}, 0.25, DashStyle::Solid}, {}});
        list.add(
            Line{{21.3, y}, {23.9, y}, Stroke{{255, 255, 255, 255}, 0.35, DashStyle::Solid}, {}});
    }
    list.add(Line{{22.0, 0.5}, {22.0, 14.5}, Stroke{{20, 20, 20, 255}, 0.3, DashStyle::Solid}, {}});
    list.add(
        Line{{11.5, 14.8}, {20.0, 14.8}, Stroke{{20, 20, 20, 255}, 0.0, DashStyle::Solid}, {}});
    return list;
}

QImage paint(const DisplayList &list, const RectMm &visible, double px_per_mm,
             bool strokes_as_fills) {
    QImage image(static_cast<int>(visible.width_mm * px_per_mm),
                 static_cast<int>(visible.height_mm * px_per_mm), QImage::Format_RGB32);
    // A grey background, so the white cuts show too.
    image.fill(QColor(150, 150, 150));
    QPainter painter(&image);
    paintDisplayList(painter, list, visible, px_per_mm,
                     {PatternRendering::Automatic, strokes_as_fills});
    return image;
}

// Our tolerances. Measured here: at most 0.6 % of the ink moved, no pixel differing by more
// than a quarter of the grey range, and 3.2 grey levels along the worst row or column. The same
// strokes one pixel off make 3.4 % to 6.1 % of the pixels differ by that much.
constexpr double kMaxRelative = 0.03;
constexpr double kMaxShareDiffering = 0.002;
constexpr double kMaxWorstLineMean = 10.0;

} // namespace

TEST_CASE("Strokes painted as fills match stroked lines and outlines", "[draw][paint][strokes]") {
    // 2.3 and 3.94 px/mm: a 0.2 mm outline is under one pixel (the raster engine's cosmetic
    // case, drawn one pixel wide and as opaque as it is wide); 6 and 11.8 px/mm: over one pixel.
    const DisplayList list = sampleStrokes();
    for (const double px_per_mm : {2.3, 100.0 / 25.4, 6.0, 300.0 / 25.4}) {
        const RectMm visible{0.137, 0.291, 25.0, 16.0};
        const RectMm one_px_off{visible.left_mm + 1.0 / px_per_mm, visible.top_mm, visible.width_mm,
                                visible.height_mm};
        CAPTURE(px_per_mm);
        const QImage strokes = paint(list, visible, px_per_mm, false);
        const QImage fills = paint(list, visible, px_per_mm, true);
        const ImageDifference d = compareImages(fills, strokes);
        CAPTURE(d.ink, d.relative, d.share_differing, d.worst_line_mean);
        CHECK(d.relative < kMaxRelative);
        CHECK(d.share_differing < kMaxShareDiffering);
        CHECK(d.worst_line_mean < kMaxWorstLineMean);
        const ImageDifference wrong =
            compareImages(paint(list, one_px_off, px_per_mm, false), strokes);
        CAPTURE(wrong.relative, wrong.share_differing);
        CHECK(wrong.share_differing > 5 * kMaxShareDiffering);
        CHECK(wrong.worst_line_mean > kMaxWorstLineMean);
    }
}

TEST_CASE("Strokes become fills only on raster devices under a plain scale",
          "[draw][paint][strokes]") {
    const Rect box{{1, 1, 5, 3},
                   Colour{200, 200, 200, 255},
                   FillPattern::None,
                   Stroke{{0, 0, 0, 255}, 0.2, DashStyle::Solid},
                   {}};
    const Line tick{{1, 1}, {3, 1}, Stroke{{0, 0, 0, 255}, 0.25, DashStyle::Solid}, {}};
    QImage image(100, 100, QImage::Format_RGB32);
    QPainter painter(&image);
    painter.scale(4.0, 4.0);
    {
        const StrokesAsFills fills(painter, true);
        REQUIRE(fills.boxOutline(box));
        // 0.2 mm at 4 px/mm is 0.8 px: one pixel wide at 80 % opacity.
        CHECK(fills.boxOutline(box)->opacity == Approx(0.8));
        CHECK(fills.boxOutline(box)->outer.width() == Approx(5.0 + 1.0 / 4.0));
        CHECK(fills.line(tick));
        Line sloping = tick;
        sloping.to.y_mm = 2.0;
        CHECK_FALSE(fills.line(sloping));
        Rect dashed = box;
        dashed.stroke->dash = DashStyle::Dashed;
        CHECK_FALSE(fills.boxOutline(dashed));
        CHECK_FALSE(StrokesAsFills(painter, false).boxOutline(box));
    }
    painter.scale(3.0, 3.0); // 12 px/mm: 2.4 px, drawn at its own width and fully opaque
    CHECK(StrokesAsFills(painter, true).boxOutline(box)->opacity == 1.0);
    CHECK(StrokesAsFills(painter, true).boxOutline(box)->outer.width() == Approx(5.2));
    painter.rotate(10.0);
    CHECK_FALSE(StrokesAsFills(painter, true).boxOutline(box));
    painter.end();

    QSvgGenerator generator;
    const auto svg_path = testOutputDir("strokes-as-fills") / "outline.svg";
    generator.setFileName(QString::fromStdString(svg_path.string()));
    generator.setSize(QSize(100, 100));
    QPainter svg_painter(&generator);
    CHECK_FALSE(StrokesAsFills(svg_painter, true).boxOutline(box));
}

TEST_CASE("SVG keeps outlines and ticks as strokes", "[draw][paint][strokes][export]") {
    DisplayList list = sampleStrokes();
    list.setPage({0, 0, 25, 16});
    const auto path = testOutputDir("strokes-as-fills") / "sample.svg";
    exportSvg(list, path, "strokes");
    QFile file(QString::fromStdString(path.string()));
    REQUIRE(file.open(QIODevice::ReadOnly));
    const QByteArray svg = file.readAll();
    // The outline colour #141414 appears as a stroke, never as a fill.
    CHECK(svg.contains("stroke=\"#141414\""));
    CHECK_FALSE(svg.contains("fill=\"#141414\""));
}
