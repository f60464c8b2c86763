// Pixel goldens: a few fixed pictures painted to PNG through the same exporter people use, with
// the bundled DejaVu Sans, compared with reviewed images in tests/draw/goldens/. A change in any
// layout, style or painter that moves pixels fails here, so a picture only changes on purpose.
//
// After a deliberate change: look at the new images (written next to the failure message), then
// refresh the goldens with
//   ATOLLOG_UPDATE_GOLDENS=1 build/tests/draw_tests "[golden]"
// and look at them again before committing.
#include "draw/display_list_export.hpp"
#include "draw/hole_column.hpp"
#include "draw/panel_layout.hpp"
#include "draw/range_chart.hpp"
#include "sample_hole_column.hpp"
#include "sample_panel.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QColor>
#include <QImage>

#include <cstdlib>
#include <filesystem>
#include <string>

using namespace atollog::draw;
namespace fs = std::filesystem;

namespace {

// 100 dpi keeps the files small and still resolves 0.25 mm lines (about one pixel).
constexpr double kGoldenDpi = 100.0;
// Anti-aliased edges and glyphs may shift by a level or two between runs on threads; a pixel
// counts as different when a channel moves by more than this.
constexpr int kChannelTolerance = 40;
// Share of pixels allowed to differ: a moved label or line changes far more than this.
constexpr double kMaxDifferingShare = 0.001;

fs::path goldenPath(const std::string &name) {
    return fs::path(ATOLLOG_SOURCE_DIR) / "tests" / "draw" / "goldens" / (name + ".png");
}

QImage loadPng(const fs::path &path) {
    QImage image;
    image.load(QString::fromStdString(path.string()), "PNG");
    return image.convertToFormat(QImage::Format_RGB32);
}

struct Comparison {
    long differing = 0;
    long total = 0;
    QImage diff; // differing pixels in red over a faded copy of the golden
};

Comparison compareImages(const QImage &actual, const QImage &golden) {
    Comparison c;
    c.total = static_cast<long>(golden.width()) * golden.height();
    c.diff = golden.copy();
    for (int y = 0; y < golden.height(); ++y) {
        const auto *a = reinterpret_cast<const QRgb *>(actual.constScanLine(y));
        const auto *g = reinterpret_cast<const QRgb *>(golden.constScanLine(y));
        auto *d = reinterpret_cast<QRgb *>(c.diff.scanLine(y));
        for (int x = 0; x < golden.width(); ++x) {
            const int dr = std::abs(qRed(a[x]) - qRed(g[x]));
            const int dg = std::abs(qGreen(a[x]) - qGreen(g[x]));
            const int db = std::abs(qBlue(a[x]) - qBlue(g[x]));
            const bool differs = std::max({dr, dg, db}) > kChannelTolerance;
            c.differing += differs ? 1 : 0;
            const int grey = 200 + qGray(g[x]) / 5;
            d[x] = differs ? qRgb(255, 0, 0) : qRgb(grey, grey, grey);
        }
    }
    return c;
}

void checkAgainstGolden(const DisplayList &list, const std::string &name) {
    const fs::path out_dir = atollog::draw::test::testOutputDir("goldens");
    const fs::path actual_path = out_dir / (name + ".png");
    exportPng(list, actual_path, kGoldenDpi);
    const fs::path golden = goldenPath(name);
    if (const char *update = std::getenv("ATOLLOG_UPDATE_GOLDENS"); update && *update == '1') {
        fs::create_directories(golden.parent_path());
        // Quality 0 is zlib's best compression: the goldens live in the repository.
        REQUIRE(loadPng(actual_path).save(QString::fromStdString(golden.string()), "PNG", 0));
        WARN("golden " << golden << " rewritten; look at it before committing");
        return;
    }
    INFO("golden " << golden << "; this run's image " << actual_path);
    REQUIRE(fs::exists(golden));
    const QImage actual = loadPng(actual_path);
    const QImage expected = loadPng(golden);
    REQUIRE(!expected.isNull());
    REQUIRE(actual.size() == expected.size());
    const Comparison c = compareImages(actual, expected);
    const fs::path diff_path = out_dir / (name + "-diff.png");
    c.diff.save(QString::fromStdString(diff_path.string()), "PNG");
    INFO(c.differing << " of " << c.total << " pixels differ; differing pixels in red: "
                     << diff_path);
    CHECK(static_cast<double>(c.differing) <= kMaxDifferingShare * static_cast<double>(c.total));
}

} // namespace

TEST_CASE("Golden: a hole column", "[draw][golden]") {
    HoleColumnView view;
    view.scale_ratio = 200.0;
    checkAgainstGolden(layoutHoleColumn(atollog::draw::test::sampleHoleColumn(), view),
                       "hole-column");
}

TEST_CASE("Golden: a range chart", "[draw][golden]") {
    checkAgainstGolden(layoutRangeChart(atollog::draw::test::sampleRangeChart()), "range-chart");
}

TEST_CASE("Golden: a correlation panel", "[draw][golden]") {
    checkAgainstGolden(layoutPanel(atollog::draw::test::samplePanel(),
                                   atollog::draw::test::samplePanelView()),
                       "panel");
}

TEST_CASE("The golden comparison sees a moved line", "[draw][golden]") {
    // The tolerance must not hide a real change: a 0.5 mm line moved by 1 mm differs.
    DisplayList a, b;
    a.setPage(RectMm{0, 0, 40, 40});
    b.setPage(RectMm{0, 0, 40, 40});
    a.add(Line{{5, 20}, {35, 20}, Stroke{Colour{0, 0, 0, 255}, 0.5, DashStyle::Solid}, {}});
    b.add(Line{{5, 21}, {35, 21}, Stroke{Colour{0, 0, 0, 255}, 0.5, DashStyle::Solid}, {}});
    const fs::path dir = atollog::draw::test::testOutputDir("golden-self-check");
    exportPng(a, dir / "a.png", kGoldenDpi);
    exportPng(b, dir / "b.png", kGoldenDpi);
    const Comparison same = compareImages(loadPng(dir / "a.png"), loadPng(dir / "a.png"));
    const Comparison moved = compareImages(loadPng(dir / "b.png"), loadPng(dir / "a.png"));
    CHECK(same.differing == 0);
    CHECK(static_cast<double>(moved.differing) > kMaxDifferingShare * static_cast<double>(moved.total));
}
