// The four x-y plots through the file backends: SVG parsed for its elements, PNG and PDF
// written; "[.look]" leaves PNGs in $TMPDIR/atollog-draw-tests/xy-look for a look.
#include "draw/chain_plot.hpp"
#include "draw/display_list_export.hpp"
#include "draw/loc_plot.hpp"
#include "draw/rate_plot.hpp"
#include "draw/subsidence_plot.hpp"
#include "sample_range_chart.hpp"
#include "sample_xy_plots.hpp"

#include <catch2/catch.hpp>

#include <QFile>
#include <QImage>
#include <QXmlStreamReader>

#include <filesystem>
#include <set>

using namespace atollog::draw;
using namespace atollog::draw::test;

namespace {

std::vector<std::pair<std::string, DisplayList>> allPlots() {
    return {{"subsidence", layoutSubsidencePlot(sampleSubsidencePlot())},
            {"rates", layoutRatePlot(sampleRatePlot())},
            {"loc", layoutLocPlot(sampleLocPlot())},
            {"chain", layoutChainPlot(sampleChainPlot())}};
}

} // namespace

TEST_CASE("Subsidence plot SVG holds its title, axis headings and hole names as text",
          "[draw][xy][export]") {
    const auto path = testOutputDir("xy-svg") / "subsidence.svg";
    exportSvg(layoutSubsidencePlot(sampleSubsidencePlot()), path, "Subsidence");
    QFile file(QString::fromStdString(path.string()));
    REQUIRE(file.open(QIODevice::ReadOnly));
    QXmlStreamReader xml(&file);
    std::set<std::string> texts;
    QString root;
    int shapes = 0;
    while (!xml.atEnd()) {
        if (xml.readNext() != QXmlStreamReader::StartElement) {
            continue;
        }
        if (root.isEmpty()) {
            root = xml.name().toString();
        }
        if (xml.name() == u"text") {
            texts.insert(xml.readElementText(QXmlStreamReader::IncludeChildElements)
                             .trimmed()
                             .toStdString());
        } else if (xml.name() == u"path" || xml.name() == u"polyline" || xml.name() == u"rect") {
            ++shapes;
        }
    }
    REQUIRE_FALSE(xml.hasError());
    // Element names from SVG Tiny 1.2 (W3C Recommendation 2008): <svg> (5.1.2), <text> (10.4).
    CHECK(root == "svg");
    CHECK(texts.count("Subsidence against age") == 1);
    CHECK(texts.count("age (Ma)") == 1);
    CHECK(texts.count("subsidence since deposition (m)") == 1);
    CHECK(texts.count("QX-2") == 1);
    CHECK(shapes > 40); // 7 horizons x (marker + 6 bar lines), grid, ticks
}

TEST_CASE("Every x-y plot writes a PNG of its page size with ink and a PDF",
          "[draw][xy][export]") {
    for (const auto &[name, list] : allPlots()) {
        CAPTURE(name);
        const auto dir = testOutputDir("xy-export");
        const auto png = dir / (name + ".png");
        exportPng(list, png, 100);
        const QImage image(QString::fromStdString(png.string()));
        REQUIRE_FALSE(image.isNull());
        // 100 dpi: 100 / 25.4 px per mm.
        CHECK(image.width() == Approx(list.page().width_mm * 100 / 25.4).margin(2));
        int dark = 0;
        for (int y = 0; y < image.height(); y += 2) {
            for (int x = 0; x < image.width(); x += 2) {
                dark += qGray(image.pixel(x, y)) < 128 ? 1 : 0;
            }
        }
        CHECK(dark > 200);
        const auto pdf = dir / (name + ".pdf");
        exportPdf(list, pdf, PdfPageSize::FitChart, name);
        CHECK(std::filesystem::file_size(pdf) > 1000);
    }
}

TEST_CASE("x-y plots for a look", "[.look]") {
    for (const auto &[name, list] : allPlots()) {
        exportPng(list, testOutputDir("xy-look") / (name + ".png"), 200);
    }
}
