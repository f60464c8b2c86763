// The three file backends, on the sample range chart.
#include "draw/display_list_export.hpp"
#include "draw/group_palette.hpp"
#include "draw/range_chart.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QByteArray>
#include <QFile>
#include <QImage>
#include <QRegularExpression>
#include <QXmlStreamReader>

#include <cmath>
#include <map>
#include <set>

using namespace atollog::draw;
using atollog::draw::test::sampleRangeChart;
using atollog::draw::test::testOutputDir;

namespace {

QByteArray readAll(const std::filesystem::path &path) {
    QFile file(QString::fromStdString(path.string()));
    REQUIRE(file.open(QIODevice::ReadOnly));
    return file.readAll();
}

} // namespace

TEST_CASE("PNG has the page size at the requested dpi and shows the chart", "[draw][export]") {
    const RangeChartInput in = sampleRangeChart();
    const DisplayList chart = layoutRangeChart(in);
    const auto path = testOutputDir("png") / "range_chart.png";
    const double dpi = 200.0;
    exportPng(chart, path, dpi);

    QImage image;
    REQUIRE(image.load(QString::fromStdString(path.string()), "PNG"));
    // 25.4 mm per inch (the inch is defined as 25.4 mm exactly).
    CHECK(image.width() == static_cast<int>(std::ceil(chart.page().width_mm / 25.4 * dpi)));
    CHECK(image.height() == static_cast<int>(std::ceil(chart.page().height_mm / 25.4 * dpi)));
    CHECK(std::abs(image.dotsPerMeterX() - dpi / 0.0254) < 1.0);

    // Not blank: a few percent of the pixels carry ink.
    long long inked = 0;
    for (int y = 0; y < image.height(); ++y) {
        for (int x = 0; x < image.width(); ++x) {
            inked += image.pixel(x, y) != qRgb(255, 255, 255) ? 1 : 0;
        }
    }
    const double inked_fraction = static_cast<double>(inked) / (image.width() * image.height());
    CHECK(inked_fraction > 0.01);
    CHECK(inked_fraction < 0.5);

    // The middle of tx-a's range bar (between its markers, at 36 m) has its group's colour.
    const DepthScale scale = rangeChartDepthScale(in);
    const auto bars = chart.withRole(ItemRole::TaxonRangeBar);
    const Rect &bar_a = std::get<Rect>(*bars.front());
    REQUIRE(bar_a.tag.key == "tx-a");
    const double px_per_mm = dpi / 25.4;
    const QColor centre =
        image.pixelColor(static_cast<int>((bar_a.box.left_mm + bar_a.box.width_mm / 2) * px_per_mm),
                         static_cast<int>(scale.y_mm(36.0) * px_per_mm));
    const Colour expected = groupColour("larger_benthic_foram");
    CHECK(centre == QColor(expected.r, expected.g, expected.b));
}

TEST_CASE("PNG output is byte-identical on two runs", "[draw][export]") {
    const DisplayList chart = layoutRangeChart(sampleRangeChart());
    const auto dir = testOutputDir("png-twice");
    exportPng(chart, dir / "first.png", 150.0);
    exportPng(chart, dir / "second.png", 150.0);
    const QByteArray first = readAll(dir / "first.png");
    CHECK(first.size() > 1000);
    CHECK(first == readAll(dir / "second.png"));
}

TEST_CASE("SVG is well-formed SVG with the names as text", "[draw][export]") {
    const RangeChartInput in = sampleRangeChart();
    const DisplayList chart = layoutRangeChart(in);
    const auto path = testOutputDir("svg") / "range_chart.svg";
    exportSvg(chart, path, "KT-7 range chart");

    QXmlStreamReader xml(readAll(path));
    std::map<QString, int> element_count;
    QString root_name, root_namespace, root_width, title;
    std::set<std::string> texts;
    while (!xml.atEnd()) {
        if (xml.readNext() != QXmlStreamReader::StartElement) {
            continue;
        }
        const QString name = xml.name().toString();
        ++element_count[name];
        if (root_name.isEmpty()) {
            root_name = name;
            root_namespace = xml.namespaceUri().toString();
            root_width = xml.attributes().value("width").toString();
        }
        if (name == "text") {
            texts.insert(xml.readElementText(QXmlStreamReader::IncludeChildElements)
                             .trimmed()
                             .toStdString());
        } else if (name == "title") {
            title = xml.readElementText();
        }
    }
    INFO(xml.errorString().toStdString());
    REQUIRE_FALSE(xml.hasError());

    // The root is <svg> in the SVG namespace: SVG 1.1 (W3C Recommendation 2011) 5.1.2, and SVG
    // Tiny 1.2 (W3C Recommendation 2008) 5.1.2, the profile QSvgGenerator writes.
    CHECK(root_name == "svg");
    CHECK(root_namespace == "http://www.w3.org/2000/svg");
    // Width in millimetres (unit identifier "mm", SVG 1.1 7.10), the chart's page to 0.1 mm.
    REQUIRE(root_width.endsWith("mm"));
    CHECK(root_width.chopped(2).toDouble() == Approx(chart.page().width_mm).margin(0.15));
    CHECK(title == "KT-7 range chart");

    for (const ChartTaxon &taxon : in.taxa) {
        CAPTURE(taxon.display_name);
        CHECK(texts.count(taxon.display_name) == 1);
    }
    CHECK(texts.count("reworked") == 1);
    // Shapes come out as <path> (markers, brackets) and <rect> or <path> (bars, swatches).
    CHECK(element_count["path"] + element_count["rect"] > 20);
    CHECK(element_count["image"] == 0); // vector only
}

TEST_CASE("PDF is written with a PDF header", "[draw][export]") {
    const DisplayList chart = layoutRangeChart(sampleRangeChart());
    const auto dir = testOutputDir("pdf");
    for (const PdfPageSize page : {PdfPageSize::FitChart, PdfPageSize::A4}) {
        const auto path = dir / (page == PdfPageSize::A4 ? "a4.pdf" : "fit.pdf");
        exportPdf(chart, path, page, "KT-7 range chart");
        const QByteArray bytes = readAll(path);
        // ISO 32000-1:2008, 7.5.2: a PDF file starts with "%PDF-" and the version;
        // 7.5.5: it ends with "%%EOF". Never compared byte for byte (creation date).
        CHECK(bytes.startsWith("%PDF-"));
        CHECK(bytes.trimmed().endsWith("%%EOF"));
        CHECK(bytes.size() > 2000);
        // The bundled font is embedded (ISO 32000-1, 9.6.2: a font dictionary names it in
        // /BaseFont).
        CHECK(bytes.contains("/BaseFont /DejaVuSans"));
        // 7.7.3.3: /MediaBox is the page in points (1/72 in). A4 is 210 x 297 mm (ISO 216),
        // i.e. 595.3 x 841.9 pt, which Qt rounds to whole points; the fitted page is the chart.
        const QRegularExpression media_box(R"(/MediaBox \[0 0 ([0-9.]+) ([0-9.]+)\])");
        const QRegularExpressionMatch match = media_box.match(QString::fromLatin1(bytes));
        REQUIRE(match.hasMatch());
        const double width_pt = match.captured(1).toDouble();
        const double height_pt = match.captured(2).toDouble();
        const double expected_w_pt =
            page == PdfPageSize::A4 ? 210.0 / 25.4 * 72 : chart.page().width_mm / 25.4 * 72;
        const double expected_h_pt =
            page == PdfPageSize::A4 ? 297.0 / 25.4 * 72 : chart.page().height_mm / 25.4 * 72;
        CHECK(width_pt == Approx(expected_w_pt).margin(1.0));
        CHECK(height_pt == Approx(expected_h_pt).margin(1.0));
    }
}

TEST_CASE("Exporters name the path they cannot write", "[draw][export]") {
    const DisplayList chart = layoutRangeChart(sampleRangeChart());
    const auto missing = testOutputDir("errors") / "no-such-dir" / "chart";
    std::filesystem::remove_all(missing.parent_path());
    CHECK_THROWS_WITH(exportPng(chart, missing.string() + ".png", 100.0),
                      Catch::Contains("no-such-dir/chart.png"));
    CHECK_THROWS_WITH(exportSvg(chart, missing.string() + ".svg", "t"),
                      Catch::Contains("no-such-dir/chart.svg"));
    CHECK_THROWS_WITH(exportPdf(chart, missing.string() + ".pdf", PdfPageSize::A4),
                      Catch::Contains("no-such-dir/chart.pdf"));
    CHECK_THROWS_AS(exportPng(chart, missing.string() + ".png", 0.0), std::invalid_argument);
    CHECK_THROWS_AS(exportPng(chart, missing.string() + ".png", 100000.0), std::invalid_argument);
}
