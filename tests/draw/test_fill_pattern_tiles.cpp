// Fill patterns painted from cached raster tiles (raster devices) against the same patterns
// painted as line work (what SVG and PDF get). The line work is the reference: a tile must give
// nearly the same pixels wherever it is painted, continue across box edges, and never reach a
// vector file. The tolerances are ours (no standard covers them); each comparison is also run
// on a deliberately wrong case (the pattern moved by one pixel) to show that it can fail.
#include "draw/display_list_export.hpp"
#include "draw/fill_pattern_painter.hpp"
#include "draw/fill_pattern_tile.hpp"
#include "draw/fill_pattern_tile_brush.hpp"
#include "draw/fill_pattern_tile_cache.hpp"
#include "draw/paint_display_list.hpp"
#include "image_difference.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QByteArray>
#include <QFile>
#include <QImage>
#include <QPainter>
#include <QPdfWriter>
#include <QRegularExpression>
#include <QSvgGenerator>

#include <algorithm>
#include <cmath>
#include <cstdlib>
#include <thread>
#include <vector>

using namespace atollog::draw;
using atollog::draw::test::compareImages;
using atollog::draw::test::ImageDifference;
using atollog::draw::test::testOutputDir;

namespace {

const std::vector<FillPattern> kAllPatterns{
    FillPattern::Limestone,      FillPattern::Dolostone,    FillPattern::Sand,
    FillPattern::Clay,           FillPattern::Gravel,       FillPattern::Basalt,
    FillPattern::Volcaniclastic, FillPattern::ReefFramework};

/// Paints `list` over `visible` at `px_per_mm` into a white image of the given size.
QImage paintList(const DisplayList &list, const RectMm &visible, double px_per_mm, int width_px,
                 int height_px, PatternRendering rendering) {
    QImage image(width_px, height_px, QImage::Format_RGB32);
    image.fill(Qt::white);
    QPainter painter(&image);
    paintDisplayList(painter, list, visible, px_per_mm, {rendering});
    return image;
}

DisplayList boxes(FillPattern pattern, const std::vector<RectMm> &boxes_mm) {
    DisplayList list;
    for (const RectMm &b : boxes_mm) {
        list.add(Rect{b, std::nullopt, pattern, std::nullopt, {}});
    }
    return list;
}

// Our tolerances for "nearly the same pixels". A tile holds the line work drawn at a scale off
// by at most half a pixel per tile, with the scene origin rounded to 1/16 px; at a box edge the
// tile brush and the line work's clip anti-alias differently. Measured over these tests: at most
// 11 % of the ink moved, 0.09 % of the pixels differing by more than a quarter of the grey
// range, and 20 grey levels along the worst row or column (rows of gravel rings). The same line
// work moved by one whole pixel moves 13 % (sparse gravel rings) to 126 % of the ink and makes
// 1.9 % to 9.8 % of the pixels differ: the share of differing pixels is what tells the two
// apart (checked below for every pattern). A seam would be a row or column of missing or
// doubled ink.
constexpr double kMaxRelative = 0.15;
constexpr double kMaxShareDiffering = 0.005;
constexpr double kMaxWorstLineMean = 30.0; // grey levels

void checkNearlySame(const ImageDifference &d) {
    CAPTURE(d.ink, d.relative, d.share_differing, d.worst_line_mean);
    CHECK(d.ink > 5.0); // there is a pattern to compare
    CHECK(d.relative < kMaxRelative);
    CHECK(d.share_differing < kMaxShareDiffering);
    CHECK(d.worst_line_mean < kMaxWorstLineMean);
}

} // namespace

TEST_CASE("A tile holds a whole number of repeats in a whole number of pixels",
          "[draw][pattern][tile]") {
    // 4 mm at 2.3 px/mm: 9.2 px a repeat, so 5 repeats make exactly 46 px.
    const TileRepeat brick = chooseTileRepeat(4.0, 2.3);
    CHECK(brick.repeats == 5);
    CHECK(brick.size_px == 46);
    // 10 px/mm: every repeat is already whole.
    CHECK(chooseTileRepeat(2.4, 10.0).repeats == 1);
    CHECK(chooseTileRepeat(2.4, 10.0).size_px == 24);
    for (const double px_per_mm : {0.7, 2.3, 3.779527559, 6.0, 7.31, 11.811023622, 23.6}) {
        for (const double period_mm : {2.4, 2.6, 3.0, 4.0, 5.0, 5.2, 8.0, 12.0, 26.0, 34.0}) {
            CAPTURE(px_per_mm, period_mm);
            const TileRepeat r = chooseTileRepeat(period_mm, px_per_mm);
            const double exact_px = r.repeats * period_mm * px_per_mm;
            CHECK(r.size_px >= 1);
            // Rounding to whole pixels moves the tile's end by at most half a pixel.
            CHECK(std::abs(r.size_px - exact_px) <= 0.5);
            // Close to whole pixels, unless no tile up to the searched side is.
            const double stretch = std::abs(r.size_px - exact_px) / exact_px;
            CHECK((r.repeats == 1 || r.size_px <= kSearchedTileSide_px));
            if (stretch > kGoodEnoughStretch) {
                for (int n = 1; n * period_mm * px_per_mm <= kSearchedTileSide_px; ++n) {
                    const double length = n * period_mm * px_per_mm;
                    CHECK(std::abs(std::round(length) - length) / length >= stretch - 1e-15);
                }
            }
        }
    }
    CHECK_THROWS_AS(chooseTileRepeat(0.0, 2.0), std::invalid_argument);
    CHECK_THROWS_AS(chooseTileRepeat(4.0, std::nan("")), std::invalid_argument);
}

TEST_CASE("Tile and line work give nearly the same pixels", "[draw][pattern][tile]") {
    // A box at fractional mm, seen from a visible area that starts at a fractional mm too, so the
    // scene origin falls inside a device pixel; at a scale with whole-pixel repeats (10 px/mm)
    // and at one without (7.31 px/mm, the tile then stretches by a part in several thousand).
    const RectMm box{1.37, 0.83, 41.3, 29.9};
    for (const double px_per_mm : {10.0, 7.31}) {
        const RectMm visible{-0.437, -0.611, 44.0, 32.0};
        const int w = static_cast<int>(visible.width_mm * px_per_mm);
        const int h = static_cast<int>(visible.height_mm * px_per_mm);
        // The same visible area moved by one device pixel: a pattern in the wrong place.
        const RectMm shifted{visible.left_mm + 1.0 / px_per_mm, visible.top_mm, visible.width_mm,
                             visible.height_mm};
        for (const FillPattern p : kAllPatterns) {
            CAPTURE(px_per_mm, static_cast<int>(p));
            const DisplayList list = boxes(p, {box});
            const QImage tiles =
                paintList(list, visible, px_per_mm, w, h, PatternRendering::Automatic);
            const QImage lines =
                paintList(list, visible, px_per_mm, w, h, PatternRendering::LineWork);
            checkNearlySame(compareImages(tiles, lines));
            // The measure sees a one-pixel move of the line work.
            const QImage moved =
                paintList(list, shifted, px_per_mm, w, h, PatternRendering::LineWork);
            const ImageDifference wrong = compareImages(moved, lines);
            CAPTURE(wrong.relative, wrong.share_differing);
            CHECK(wrong.share_differing > 2 * kMaxShareDiffering);
        }
    }
}

TEST_CASE("Tile-filled neighbours continue the pattern across their shared edge",
          "[draw][pattern][tile]") {
    // Two boxes meeting at x = 17.35 mm (inside a device pixel) against one box over both, in
    // line work. The columns at the shared edge are part of the comparison.
    const double px_per_mm = 10.0;
    const RectMm visible{0.0, 0.0, 36.0, 24.0};
    const int w = 360, h = 240;
    for (const FillPattern p : kAllPatterns) {
        CAPTURE(static_cast<int>(p));
        const QImage pair = paintList(boxes(p, {{1.0, 1.0, 16.35, 22.0}, {17.35, 1.0, 17.0, 22.0}}),
                                      visible, px_per_mm, w, h, PatternRendering::Automatic);
        const QImage whole = paintList(boxes(p, {{1.0, 1.0, 33.35, 22.0}}), visible, px_per_mm, w,
                                       h, PatternRendering::LineWork);
        checkNearlySame(compareImages(pair, whole));
        // The eleven columns around the shared edge alone (x = 168 to 178 px): a pattern cut or
        // restarted at the edge would show here.
        checkNearlySame(
            compareImages(pair.copy(168, 10, 11, h - 20), whole.copy(168, 10, 11, h - 20)));
    }
}

TEST_CASE("Tiles at export scale and a non-integer offset match line work",
          "[draw][pattern][tile]") {
    // 300 dpi (11.81 px/mm) and 96 dpi (3.78 px/mm): the scales of a PNG export and a screen.
    for (const double dpi : {300.0, 96.0}) {
        const double px_per_mm = dpi / 25.4;
        const RectMm visible{3.3, 2.7, 60.0, 45.0};
        const int w = static_cast<int>(visible.width_mm * px_per_mm);
        const int h = static_cast<int>(visible.height_mm * px_per_mm);
        for (const FillPattern p : kAllPatterns) {
            CAPTURE(dpi, static_cast<int>(p));
            const DisplayList list = boxes(p, {{5.05, 3.15, 55.5, 41.9}});
            checkNearlySame(compareImages(
                paintList(list, visible, px_per_mm, w, h, PatternRendering::Automatic),
                paintList(list, visible, px_per_mm, w, h, PatternRendering::LineWork)));
        }
    }
}

TEST_CASE("Boxes under three device pixels get no pattern either way", "[draw][pattern][tile]") {
    const double px_per_mm = 10.0;
    // 0.29 mm = 2.9 px tall: fill only. 0.31 mm = 3.1 px: patterned.
    for (const PatternRendering r : {PatternRendering::Automatic, PatternRendering::LineWork}) {
        DisplayList list;
        list.add(Rect{{0.0, 0.0, 20.0, 0.29}, std::nullopt, FillPattern::Clay, std::nullopt, {}});
        const QImage thin = paintList(list, {0, 0, 20, 1}, px_per_mm, 200, 10, r);
        CHECK(thin.pixel(8, 1) == qRgb(255, 255, 255));
        CHECK(thin.pixel(100, 2) == qRgb(255, 255, 255));
    }
}

TEST_CASE("SVG and PDF keep fill patterns as line work", "[draw][pattern][tile][export]") {
    DisplayList list;
    for (std::size_t i = 0; i < kAllPatterns.size(); ++i) {
        list.add(Rect{{10.0 + 22.0 * static_cast<double>(i), 10.0, 20.0, 30.0},
                      Colour{230, 230, 200, 255},
                      kAllPatterns[i],
                      std::nullopt,
                      {}});
    }
    list.setPage({0.0, 0.0, 200.0, 50.0});
    DisplayList plain;
    for (const DisplayItem &item : list.items()) {
        DisplayItem copy = item;
        std::get<Rect>(copy).pattern = FillPattern::None;
        plain.add(copy);
    }
    plain.setPage(list.page());
    const auto dir = testOutputDir("fill-pattern-vector");
    exportSvg(list, dir / "patterns.svg", "patterns");
    exportSvg(plain, dir / "plain.svg", "plain");
    const auto read = [](const std::filesystem::path &path) {
        QFile file(QString::fromStdString(path.string()));
        REQUIRE(file.open(QIODevice::ReadOnly));
        return file.readAll();
    };
    const QByteArray svg = read(dir / "patterns.svg");
    CHECK_FALSE(svg.contains("<image"));
    // Line work: a path element per pattern at least, and far more drawing than the plain boxes.
    CHECK(svg.count("<path") >= static_cast<qsizetype>(kAllPatterns.size()));
    CHECK(svg.size() > 4 * read(dir / "plain.svg").size());

    exportPdf(list, dir / "patterns.pdf", PdfPageSize::FitChart, "patterns");
    const QByteArray pdf = read(dir / "patterns.pdf");
    // A raster would be an image XObject (ISO 32000-1:2008, 8.9.5: /Subtype /Image).
    const QRegularExpression image_xobject(QStringLiteral("/Subtype\\s*/Image"));
    CHECK_FALSE(QString::fromLatin1(pdf).contains(image_xobject));
    CHECK(pdf.size() > 2000);

    // Both checks would see a raster: an image painted into each kind of file.
    QImage raster(40, 40, QImage::Format_RGB32);
    raster.fill(Qt::darkGray);
    {
        QSvgGenerator generator;
        generator.setFileName(QString::fromStdString((dir / "raster.svg").string()));
        generator.setSize(QSize(100, 100));
        QPainter painter(&generator);
        painter.drawImage(QPointF(10, 10), raster);
    }
    CHECK(read(dir / "raster.svg").contains("<image"));
    {
        QPdfWriter writer(QString::fromStdString((dir / "raster.pdf").string()));
        QPainter painter(&writer);
        painter.drawImage(QPointF(10, 10), raster);
    }
    CHECK(QString::fromLatin1(read(dir / "raster.pdf")).contains(image_xobject));
}

TEST_CASE("The tile cache gives the same tile for the same key", "[draw][pattern][tile]") {
    FillPatternTileCache cache;
    const FillPatternTileKey key{FillPattern::Limestone, 2.3, 2.3, 3, 5};
    const auto first = cache.tile(key);
    REQUIRE(first);
    CHECK(first->width() == 46); // 5 repeats of 4 mm at 2.3 px/mm
    CHECK(first->height() == 46);
    CHECK(first->format() == QImage::Format_ARGB32_Premultiplied);
    CHECK(cache.tile(key) == first);
    CHECK(cache.renders() == 1);
    // Any change of key is another tile.
    CHECK(cache.tile({FillPattern::Dolostone, 2.3, 2.3, 3, 5}) != first);
    CHECK(cache.tile({FillPattern::Limestone, 2.31, 2.3, 3, 5}) != first);
    CHECK(cache.tile({FillPattern::Limestone, 2.3, 2.3, 4, 5}) != first);
    CHECK(cache.renders() == 4);
    CHECK(cache.tilesHeld() == 4);
    CHECK_FALSE(cache.tile({FillPattern::None, 2.3, 2.3, 0, 0}));
    CHECK_THROWS_AS(cache.tile({FillPattern::Clay, 2.3, 2.3, kTilePhaseSteps, 0}),
                    std::invalid_argument);
    CHECK_THROWS_AS(cache.tile({FillPattern::Clay, -1.0, 2.3, 0, 0}), std::invalid_argument);

    SECTION("from two threads at once") {
        FillPatternTileCache shared;
        const FillPatternTileKey sand{FillPattern::Sand, 11.811, 11.811, 1, 7};
        std::shared_ptr<const QImage> a, b;
        std::thread other([&] { a = shared.tile(sand); });
        b = shared.tile(sand);
        other.join();
        REQUIRE(a);
        CHECK(a == b);
        CHECK(shared.tilesHeld() == 1);
    }
    SECTION("holding at most its byte budget, the most recent tile first") {
        FillPatternTileCache small(3 * 46 * 46 * 4); // three limestone tiles of 46 x 46 px
        for (int phase = 0; phase < kTilePhaseSteps; ++phase) {
            small.tile({FillPattern::Limestone, 2.3, 2.3, phase, 0});
        }
        CHECK(small.tilesHeld() == 3);
        CHECK(small.bytesHeld() <= 3 * 46 * 46 * 4);
        const auto renders = small.renders();
        small.tile({FillPattern::Limestone, 2.3, 2.3, kTilePhaseSteps - 1, 0}); // still held
        CHECK(small.renders() == renders);
        small.tile({FillPattern::Limestone, 2.3, 2.3, 0, 0}); // evicted: rendered again
        CHECK(small.renders() == renders + 1);
    }
}

TEST_CASE("Tile brushes only on raster devices with a plain scale", "[draw][pattern][tile]") {
    QImage image(100, 100, QImage::Format_RGB32);
    QPainter painter(&image);
    painter.scale(4.0, 4.0);
    CHECK(FillPatternTileBrushes(painter, true).usesTiles());
    CHECK_FALSE(FillPatternTileBrushes(painter, false).usesTiles());
    painter.rotate(30.0);
    CHECK_FALSE(FillPatternTileBrushes(painter, true).usesTiles());
    painter.resetTransform();
    painter.scale(-4.0, 4.0); // mirrored
    CHECK_FALSE(FillPatternTileBrushes(painter, true).usesTiles());
}
