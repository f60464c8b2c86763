// The age-depth plot: geometry and structure on the display list, then the file backends.
// Hole, ties and ages are invented for the tests.
#include "display_list_queries.hpp"
#include "draw/age_depth_plot.hpp"
#include "draw/age_depth_plot_envelope.hpp"
#include "draw/age_depth_plot_labels.hpp"
#include "draw/age_depth_plot_symbols.hpp"
#include "draw/display_list_export.hpp"
#include "draw/text_extent.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QColor>
#include <QFile>
#include <QImage>
#include <QXmlStreamReader>

#include <algorithm>
#include <cmath>
#include <map>
#include <set>
#include <stdexcept>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::onlyItem;
using atollog::draw::test::testOutputDir;
namespace sym = atollog::draw::age_plot_symbols;

namespace {

constexpr double kHiatusDepth_m = 34.0;

double medianAge(double depth_m, bool below_hiatus) {
    return below_hiatus ? 0.05 + 0.68 + 0.6 + 0.03 * (depth_m - kHiatusDepth_m)
                        : 0.05 + 0.02 * depth_m;
}

AgeModelGridPoint gridPoint(double depth_m, bool below_hiatus) {
    const double median = medianAge(depth_m, below_hiatus);
    const double half = 0.02 + 0.0025 * depth_m + 0.04 * std::abs(std::sin(depth_m / 5));
    return {depth_m, median - half, median, median + 1.2 * half};
}

/// Hole NR-4: a model every 2 m (odd metres) with a hiatus at 34 m, three datums, two dates
/// (one an outlier) and the synthetic hole's true ages as the reference line.
AgeDepthPlotInput sampleAgeDepthPlot() {
    AgeDepthPlotInput in;
    in.hole = "NR-4";
    in.top_m = 0.0;
    in.base_m = 60.0;
    for (double d = 1.0; d < kHiatusDepth_m; d += 2.0) {
        in.model.push_back(gridPoint(d, false));
    }
    in.model.push_back(gridPoint(kHiatusDepth_m, false));
    in.model.push_back(gridPoint(kHiatusDepth_m, true));
    for (double d = 35.0; d < 60.0; d += 2.0) {
        in.model.push_back(gridPoint(d, true));
    }
    using K = AgeTieKind;
    in.ties = {
        {"T Atollina prima", K::Datum, 9.0, 11.0, 0.25, 0.21, 0.29, false, false},
        {"B Lagunella minor", K::Datum, 24.0, 27.0, 0.56, 0.50, 0.63, false, false},
        {"T Reefia crassa", K::Datum, 44.0, 46.0, 1.66, 1.58, 1.74, false, false},
        {"Sr NR4-18", K::Date, 18.2, 18.6, 0.95, 0.82, 1.08, true, false},
        {"U-Th NR4-52", K::Date, 51.8, 52.2, 1.86, 1.80, 1.93, false, false},
    };
    in.hiatuses = {{kHiatusDepth_m, 0.6, "H1"}};
    in.reference = AgeDepthReferenceLine{"true age (synthetic)",
                                         {{0.0, 0.06}, {34.0, 0.74}, {34.0, 1.34}, {60.0, 2.14}}};
    return in;
}


std::set<std::string> legendTexts(const DisplayList &list) {
    std::set<std::string> out;
    for (const Text *t : itemsOf<Text>(list, ItemRole::LegendText)) {
        out.insert(t->text);
    }
    return out;
}

bool overlaps(const RectMm &a, const RectMm &b) {
    return a.left_mm < b.right_mm() && b.left_mm < a.right_mm() && a.top_mm < b.bottom_mm() &&
           b.top_mm < a.bottom_mm();
}

QByteArray readAll(const std::filesystem::path &path) {
    QFile file(QString::fromStdString(path.string()));
    REQUIRE(file.open(QIODevice::ReadOnly));
    return file.readAll();
}

} // namespace

TEST_CASE("Age-depth plot puts a tie at its age and the middle of its bracket",
          "[draw][age-depth]") {
    AgeDepthPlotInput in = sampleAgeDepthPlot();
    in.age_axis = AgeRange{0.0, 3.0};
    in.age_axis_length_mm = 120.0; // 40 mm per Ma
    in.scale_ratio = 500.0;        // 1:500 puts 1 m of hole on 1000/500 = 2 mm of paper
    const DisplayList list = layoutAgeDepthPlot(in);
    const AgeDepthPlotFrame frame = ageDepthPlotFrame(in);

    // The axis ends are labelled with the range asked for, at the frame's corners.
    const Text &zero = onlyItem<Text>(list, ItemRole::AgeLabel, "0.0");
    const Text &three = onlyItem<Text>(list, ItemRole::AgeLabel, "3.0");
    CHECK_THAT(zero.anchor_mm.x_mm, Catch::Matchers::WithinAbs(frame.plot_mm.left_mm, 1e-9));
    CHECK_THAT(three.anchor_mm.x_mm - zero.anchor_mm.x_mm, Catch::Matchers::WithinAbs(120.0, 1e-9));
    const Text &top_label = onlyItem<Text>(list, ItemRole::DepthLabel, "0");
    const Text &base_label = onlyItem<Text>(list, ItemRole::DepthLabel, "60");
    CHECK_THAT(base_label.anchor_mm.y_mm - top_label.anchor_mm.y_mm,
               Catch::Matchers::WithinAbs(60 * 2.0, 1e-9));

    // "B Lagunella minor": 0.56 Ma, bracket 24-27 m, drawn at 25.5 m.
    const Marker &tie = onlyItem<Marker>(list, ItemRole::AgeTieMarker, "B Lagunella minor");
    CHECK_THAT(tie.centre_mm.x_mm - zero.anchor_mm.x_mm,
               Catch::Matchers::WithinAbs(0.56 * 40, 1e-9));
    CHECK_THAT(tie.centre_mm.y_mm - top_label.anchor_mm.y_mm,
               Catch::Matchers::WithinAbs(25.5 * 2.0, 1e-9));
    CHECK(tie.shape == sym::kDatumShape);

    // Its bars reach exactly from 24 to 27 m and from 0.50 to 0.63 Ma.
    double lowest_y = 1e9, highest_y = -1e9, left_x = 1e9, right_x = -1e9;
    for (const Line *bar : itemsOf<Line>(list, ItemRole::AgeTieBar)) {
        if (bar->tag.key != "B Lagunella minor") {
            continue;
        }
        for (const PointMm &p : {bar->from, bar->to}) {
            lowest_y = std::min(lowest_y, p.y_mm);
            highest_y = std::max(highest_y, p.y_mm);
            left_x = std::min(left_x, p.x_mm);
            right_x = std::max(right_x, p.x_mm);
        }
    }
    CHECK_THAT(lowest_y - top_label.anchor_mm.y_mm, Catch::Matchers::WithinAbs(24 * 2.0, 1e-9));
    CHECK_THAT(highest_y - top_label.anchor_mm.y_mm, Catch::Matchers::WithinAbs(27 * 2.0, 1e-9));
    CHECK_THAT(left_x - zero.anchor_mm.x_mm, Catch::Matchers::WithinAbs(0.50 * 40, 1e-9));
    CHECK_THAT(right_x - zero.anchor_mm.x_mm, Catch::Matchers::WithinAbs(0.63 * 40, 1e-9));
}

TEST_CASE("Age axis without a given range covers the data and ends on ticks", "[draw][age-depth]") {
    const AgeDepthPlotInput in = sampleAgeDepthPlot();
    const AgeRange range = ageDepthPlotAgeRange(in, {});
    const AgeDepthPlotFrame frame = ageDepthPlotFrame(in);
    double youngest = 1e9, oldest = -1e9;
    for (const AgeModelGridPoint &p : in.model) {
        youngest = std::min(youngest, p.age_q025_ma);
        oldest = std::max(oldest, p.age_q975_ma);
    }
    CHECK(range.min_ma <= youngest);
    CHECK(range.max_ma >= oldest);
    REQUIRE(frame.age_ticks.major_m.size() >= 3);
    CHECK_THAT(frame.age_ticks.major_m.front(), Catch::Matchers::WithinAbs(range.min_ma, 1e-9));
    CHECK_THAT(frame.age_ticks.major_m.back(), Catch::Matchers::WithinAbs(range.max_ma, 1e-9));
    // Less than one step of air on either side.
    const double step = frame.age_ticks.major_step_m;
    CHECK(youngest - range.min_ma < step);
    CHECK(range.max_ma - oldest < step);
    // A step of the 1-2-5 series.
    const double mantissa = step / std::pow(10.0, std::floor(std::log10(step)));
    CHECK((std::abs(mantissa - 1) < 1e-9 || std::abs(mantissa - 2) < 1e-9 ||
           std::abs(mantissa - 5) < 1e-9));
}

TEST_CASE("Envelope spans the grid's depths and the median runs through the grid medians",
          "[draw][age-depth]") {
    const AgeDepthPlotInput in = sampleAgeDepthPlot();
    const DisplayList list = layoutAgeDepthPlot(in);
    const AgeDepthPlotFrame f = ageDepthPlotFrame(in);

    const Polygon &band = onlyItem<Polygon>(list, ItemRole::AgeEnvelope, "band");
    CHECK(band.fill == sym::kEnvelopeFill);
    REQUIRE(band.stroke);
    // Down the 2.5 % ages, back up the 97.5 % ages; the polygon closes itself.
    REQUIRE(band.points.size() == 2 * in.model.size());
    double top_y = 1e9, bottom_y = -1e9;
    for (const PointMm &p : band.points) {
        top_y = std::min(top_y, p.y_mm);
        bottom_y = std::max(bottom_y, p.y_mm);
    }
    CHECK_THAT(top_y, Catch::Matchers::WithinAbs(f.depth.y_mm(in.model.front().depth_m), 1e-9));
    CHECK_THAT(bottom_y, Catch::Matchers::WithinAbs(f.depth.y_mm(in.model.back().depth_m), 1e-9));
    for (std::size_t i = 0; i < in.model.size(); ++i) {
        CHECK_THAT(band.points[i].x_mm,
                   Catch::Matchers::WithinAbs(f.age.x_mm(in.model[i].age_q025_ma), 1e-9));
        CHECK_THAT(band.points[i].y_mm,
                   Catch::Matchers::WithinAbs(f.depth.y_mm(in.model[i].depth_m), 1e-9));
        const PointMm &back = band.points[2 * in.model.size() - 1 - i];
        CHECK_THAT(back.x_mm,
                   Catch::Matchers::WithinAbs(f.age.x_mm(in.model[i].age_q975_ma), 1e-9));
    }
    CHECK(itemsOf<Rect>(list, ItemRole::AgeEnvelope).empty());

    const Polyline &median = onlyItem<Polyline>(list, ItemRole::AgeMedian, "median");
    REQUIRE(median.points.size() == in.model.size());
    for (std::size_t i = 0; i < in.model.size(); ++i) {
        CHECK_THAT(median.points[i].x_mm,
                   Catch::Matchers::WithinAbs(f.age.x_mm(in.model[i].age_q500_ma), 1e-9));
        CHECK_THAT(median.points[i].y_mm,
                   Catch::Matchers::WithinAbs(f.depth.y_mm(in.model[i].depth_m), 1e-9));
    }
}

TEST_CASE("Age-depth plot draws one marker per tie, one line per hiatus", "[draw][age-depth]") {
    AgeDepthPlotInput in = sampleAgeDepthPlot();
    in.ties.push_back({"U-Th NR4-40", AgeTieKind::Date, 40.0, 40.4, 1.9, 1.7, 2.1, false, true});
    const DisplayList list = layoutAgeDepthPlot(in);
    const AgeDepthPlotFrame f = ageDepthPlotFrame(in);

    const auto markers = itemsOf<Marker>(list, ItemRole::AgeTieMarker);
    REQUIRE(markers.size() == in.ties.size());
    std::map<std::string, const Marker *> by_label;
    for (const Marker *m : markers) {
        by_label[m->tag.key] = m;
    }
    for (const AgeDepthTie &t : in.ties) {
        CAPTURE(t.label);
        REQUIRE(by_label.count(t.label) == 1);
        const Marker &m = *by_label[t.label];
        CHECK(m.shape == (t.kind == AgeTieKind::Datum ? sym::kDatumShape : sym::kDateShape));
        CHECK(m.hollow == t.excluded);
        CHECK(m.colour == (t.excluded ? sym::kExcluded
                                      : (t.kind == AgeTieKind::Datum ? sym::kDatum : sym::kDate)));
    }
    // The excluded tie is drawn before (under) every tie the model uses.
    const auto first_marker = std::find_if(list.items().begin(), list.items().end(), [](auto &i) {
        return itemTag(i).role == ItemRole::AgeTieMarker;
    });
    CHECK(itemTag(*first_marker).key == "U-Th NR4-40");

    const auto rings = itemsOf<Polyline>(list, ItemRole::AgeTieOutlier);
    REQUIRE(rings.size() == 1);
    CHECK(rings.front()->tag.key == "Sr NR4-18");

    const auto hiatus_lines = itemsOf<Line>(list, ItemRole::Hiatus);
    REQUIRE(hiatus_lines.size() == 1);
    const Line &h = *hiatus_lines.front();
    CHECK(h.tag.key == hiatusKey(kHiatusDepth_m));
    CHECK(h.tag.key == "34.00");
    CHECK(h.stroke.dash == DashStyle::Dashed);
    CHECK_THAT(h.from.y_mm, Catch::Matchers::WithinAbs(f.depth.y_mm(kHiatusDepth_m), 1e-9));
    CHECK_THAT(h.from.x_mm, Catch::Matchers::WithinAbs(f.plot_mm.left_mm, 1e-9));
    CHECK_THAT(h.to.x_mm, Catch::Matchers::WithinAbs(f.plot_mm.right_mm(), 1e-9));
    CHECK(onlyItem<Text>(list, ItemRole::HiatusLabel, "34.00").text == "H1: hiatus 0.60 Ma");

    CHECK(itemsOf<Polyline>(list, ItemRole::ReferenceLine).size() == 1);
    CHECK(onlyItem<Text>(list, ItemRole::Title, "NR-4").text == "Hole NR-4 \u2013 age-depth model");
}

TEST_CASE("Age-depth legend lists only what is drawn", "[draw][age-depth]") {
    AgeDepthPlotInput in = sampleAgeDepthPlot();
    {
        const std::set<std::string> legend = legendTexts(layoutAgeDepthPlot(in));
        for (const char *row : {"95 % range", "median", "true age (synthetic)", "datum (event age)",
                                "date (measured age)", "outlier (leave-one-out)",
                                "hiatus (median duration)", "depth bracket, age range"}) {
            CAPTURE(row);
            CHECK(legend.count(row) == 1);
        }
        CHECK(legend.count("date left out of the model") == 0);
        CHECK(legend.count("datum left out of the model") == 0);
    }
    // Only dates, none an outlier, one left out; no hiatus, no reference line.
    std::erase_if(in.ties, [](const AgeDepthTie &t) { return t.kind == AgeTieKind::Datum; });
    for (AgeDepthTie &t : in.ties) {
        t.outlier = false;
    }
    in.ties.front().excluded = true;
    in.hiatuses.clear();
    in.reference.reset();
    const DisplayList list = layoutAgeDepthPlot(in);
    const std::set<std::string> legend = legendTexts(list);
    CHECK(legend.count("date (measured age)") == 1);
    CHECK(legend.count("date left out of the model") == 1);
    for (const char *row :
         {"datum (event age)", "outlier (leave-one-out)", "hiatus (median duration)", "Gaps",
          "true age (synthetic)", "datum left out of the model"}) {
        CAPTURE(row);
        CHECK(legend.count(row) == 0);
    }
    CHECK(list.withRole(ItemRole::Hiatus).empty());
    CHECK(list.withRole(ItemRole::ReferenceLine).empty());
}

TEST_CASE("Age-depth labels stay inside the plot and clear of each other", "[draw][age-depth]") {
    AgeDepthPlotInput in = sampleAgeDepthPlot();
    // Two more ties crowding the first one, to make the placer work.
    in.ties.push_back(
        {"T Crowdia una", AgeTieKind::Datum, 9.5, 10.5, 0.26, 0.23, 0.30, false, false});
    in.ties.push_back({"Sr NR4-10", AgeTieKind::Date, 10.0, 10.2, 0.24, 0.20, 0.28, false, false});
    // And one on the hiatus line, whose label must not be struck through by it.
    in.ties.push_back({"Sr NR4-34", AgeTieKind::Date, 33.9, 34.1, 1.0, 0.9, 1.1, false, false});
    const DisplayList list = layoutAgeDepthPlot(in);
    const AgeDepthPlotFrame f = ageDepthPlotFrame(in);
    const Text &on_hiatus = onlyItem<Text>(list, ItemRole::AgeTieLabel, "Sr NR4-34");
    const double hiatus_y = f.depth.y_mm(kHiatusDepth_m);
    CHECK_FALSE(
        overlaps(itemBounds(on_hiatus), RectMm{f.plot_mm.left_mm, hiatus_y - sym::kHiatus_mm / 2,
                                               f.plot_mm.width_mm, sym::kHiatus_mm}));

    // A label moved off its tie's line has a leader back to it; the crowd forces some moves.
    int moved = 0;
    for (const Text *label : itemsOf<Text>(list, ItemRole::AgeTieLabel)) {
        const Marker &tie = onlyItem<Marker>(list, ItemRole::AgeTieMarker, label->tag.key);
        if (std::abs(label->anchor_mm.y_mm - tie.centre_mm.y_mm) > 1e-9) {
            ++moved;
            CAPTURE(label->text);
            const auto leaders = itemsOf<Line>(list, ItemRole::AgeTieLabel);
            CHECK(std::count_if(leaders.begin(), leaders.end(), [&](const Line *l) {
                      return l->tag.key == label->tag.key &&
                             std::abs(l->from.y_mm - tie.centre_mm.y_mm) < 1e-9;
                  }) == 1);
        }
    }
    CHECK(moved >= 1);

    std::vector<RectMm> boxes;
    for (const ItemRole role : {ItemRole::AgeTieLabel, ItemRole::HiatusLabel}) {
        for (const Text *t : itemsOf<Text>(list, role)) {
            boxes.push_back(itemBounds(*t));
        }
    }
    REQUIRE(boxes.size() == in.ties.size() + in.hiatuses.size());
    for (std::size_t i = 0; i < boxes.size(); ++i) {
        CHECK(boxes[i].left_mm >= f.plot_mm.left_mm);
        CHECK(boxes[i].right_mm() <= f.plot_mm.right_mm());
        for (std::size_t j = i + 1; j < boxes.size(); ++j) {
            CHECK_FALSE(overlaps(boxes[i], boxes[j]));
        }
    }
    // And clear of every tie marker.
    for (const Marker *m : itemsOf<Marker>(list, ItemRole::AgeTieMarker)) {
        for (const RectMm &b : boxes) {
            CHECK_FALSE(overlaps(itemBounds(*m), b));
        }
    }

    AgeDepthPlotStyle quiet;
    quiet.show_tie_labels = false;
    CHECK(layoutAgeDepthPlot(in, quiet).withRole(ItemRole::AgeTieLabel).empty());
}

TEST_CASE("Label placer moves a label off a taken spot", "[draw][age-depth]") {
    const Text text{{}, "label", TextAnchor::Start, 7.0, FontWeight::Regular, 0.0, {}, {}};
    const std::vector<LabelRequest> requests{{text, {{{10.0, 10.0}, TextAnchor::Start}}},
                                             {text, {{{10.0, 10.0}, TextAnchor::Start}}}};
    std::vector<RectMm> obstacles;
    const RectMm bounds{0, 0, 50, 50};
    const std::vector<Text> placed = placeLabels(requests, obstacles, bounds);
    REQUIRE(placed.size() == 2);
    CHECK(placed[0].anchor_mm == PointMm{10.0, 10.0});
    CHECK(placed[1].anchor_mm.x_mm == 10.0);
    CHECK_FALSE(overlaps(itemBounds(placed[0]), itemBounds(placed[1])));
    CHECK(obstacles.size() == 2);
}

TEST_CASE("Age-depth plot rejects bad input with a precise message", "[draw][age-depth]") {
    const AgeDepthPlotInput good = sampleAgeDepthPlot();
    REQUIRE_NOTHROW(layoutAgeDepthPlot(good));
    using Catch::Contains;

    AgeDepthPlotInput in = good;
    in.model.clear();
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in),
                      Contains("hole 'NR-4'") && Contains("grid has 0 point(s)"));

    in = good;
    std::swap(in.model[3].age_q025_ma, in.model[3].age_q975_ma);
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in),
                      Contains("grid point 4 at 7.000 m") && Contains("quantiles out of order"));

    in = good;
    std::swap(in.model[3], in.model[4]);
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in), Contains("must be in depth order"));

    in = good;
    in.ties[2].deep_m = 61.5;
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in),
                      Contains("tie 'T Reefia crassa' deep end at 61.500 m") &&
                          Contains("outside the depth axis"));

    in = good;
    in.model.back().depth_m = 60.5;
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in), Contains("outside the depth axis"));

    in = good;
    in.ties[0].age_ma = 0.4; // above its old end, 0.29 Ma
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in),
                      Contains("tie 'T Atollina prima' age 0.4 Ma lies outside its range"));

    in = good;
    in.age_axis = AgeRange{0.0, 1.5}; // cuts off the ages below the hiatus
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in), Contains("outside the age axis"));

    in = good;
    in.hiatuses.front().duration_q500_ma = -0.1;
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in), Contains("hiatus 'H1' at 34.000 m"));

    in = good;
    in.ties[1].label.clear();
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in), Contains("tie 2 has no label"));

    in = good;
    in.base_m = in.top_m;
    CHECK_THROWS_AS(layoutAgeDepthPlot(in), std::invalid_argument);

    in = good;
    in.model[5].age_q500_ma = std::nan("");
    CHECK_THROWS_WITH(layoutAgeDepthPlot(in), Contains("not a finite age"));
}

TEST_CASE("Age-depth plot exports to SVG with its title and tie labels as text",
          "[draw][age-depth][export]") {
    const AgeDepthPlotInput in = sampleAgeDepthPlot();
    const DisplayList plot = layoutAgeDepthPlot(in);
    const auto path = testOutputDir("age-depth-svg") / "age_depth.svg";
    exportSvg(plot, path, "NR-4 age-depth model");

    QXmlStreamReader xml(readAll(path));
    std::set<std::string> texts;
    QString root_name, title;
    int paths = 0;
    while (!xml.atEnd()) {
        if (xml.readNext() != QXmlStreamReader::StartElement) {
            continue;
        }
        const QString name = xml.name().toString();
        if (root_name.isEmpty()) {
            root_name = name;
        }
        if (name == "text") {
            texts.insert(xml.readElementText(QXmlStreamReader::IncludeChildElements)
                             .trimmed()
                             .toStdString());
        } else if (name == "title") {
            title = xml.readElementText();
        } else if (name == "path" || name == "polyline" || name == "rect") {
            ++paths;
        }
    }
    INFO(xml.errorString().toStdString());
    REQUIRE_FALSE(xml.hasError());
    // Element names from SVG Tiny 1.2 (W3C Recommendation 2008): the root <svg> (5.1.2), the
    // document <title> (5.4) and <text> (10.4), the profile QSvgGenerator writes.
    CHECK(root_name == "svg");
    CHECK(title == "NR-4 age-depth model");
    CHECK(texts.count("Hole NR-4 \u2013 age-depth model") == 1);
    for (const AgeDepthTie &t : in.ties) {
        CAPTURE(t.label);
        CHECK(texts.count(t.label) == 1);
    }
    CHECK(texts.count("H1: hiatus 0.60 Ma") == 1);
    CHECK(texts.count("age (Ma)") == 1);
    CHECK(paths > 50);
}

TEST_CASE("Age-depth plot PNG shows the band without seams", "[draw][age-depth][export]") {
    const AgeDepthPlotInput in = sampleAgeDepthPlot();
    const DisplayList plot = layoutAgeDepthPlot(in);
    const AgeDepthPlotFrame f = ageDepthPlotFrame(in);
    const auto path = testOutputDir("age-depth-png") / "age_depth.png";
    const double dpi = 300.0;
    exportPng(plot, path, dpi);

    QImage image;
    REQUIRE(image.load(QString::fromStdString(path.string()), "PNG"));
    // 25.4 mm per inch.
    CHECK(image.width() == static_cast<int>(std::ceil(plot.page().width_mm / 25.4 * dpi)));
    long long inked = 0;
    for (int y = 0; y < image.height(); ++y) {
        for (int x = 0; x < image.width(); ++x) {
            inked += image.pixel(x, y) != qRgb(255, 255, 255) ? 1 : 0;
        }
    }
    const double inked_fraction = static_cast<double>(inked) / (image.width() * image.height());
    CHECK(inked_fraction > 0.02);
    CHECK(inked_fraction < 0.6);

    // Inside the band, halfway between its young edge and the median, at grid depths clear of
    // ties, grid lines and the hiatus, the pixel has exactly the fill colour: QPainter paints an
    // antialiased edge with partial coverage, so touching slabs would show a paler seam here.
    const double px_per_mm = dpi / 25.4;
    const QColor fill(sym::kEnvelopeFill.r, sym::kEnvelopeFill.g, sym::kEnvelopeFill.b);
    int checked = 0;
    const std::set<double> clear_depths_m{3.0, 7.0, 13.0, 21.0, 29.0, 39.0, 49.0, 57.0};
    for (const AgeModelGridPoint &p : in.model) {
        if (clear_depths_m.count(p.depth_m) == 0) {
            continue;
        }
        const double x_mm = f.age.x_mm((p.age_q025_ma + p.age_q500_ma) / 2);
        const bool on_grid =
            std::any_of(f.age_ticks.major_m.begin(), f.age_ticks.major_m.end(),
                        [&](double a) { return std::abs(f.age.x_mm(a) - x_mm) < 0.5; });
        if (on_grid) {
            continue;
        }
        CAPTURE(p.depth_m);
        const QColor pixel =
            image.pixelColor(static_cast<int>(x_mm * px_per_mm),
                             static_cast<int>(f.depth.y_mm(p.depth_m) * px_per_mm));
        CAPTURE(pixel.name().toStdString());
        CHECK(pixel == fill);
        ++checked;
    }
    CHECK(checked >= 5);
}

TEST_CASE("Age-depth plot exports to PDF", "[draw][age-depth][export]") {
    const DisplayList plot = layoutAgeDepthPlot(sampleAgeDepthPlot());
    const auto path = testOutputDir("age-depth-pdf") / "age_depth.pdf";
    exportPdf(plot, path, PdfPageSize::A4, "NR-4 age-depth model");
    const QByteArray bytes = readAll(path);
    // ISO 32000-1:2008, 7.5.2 and 7.5.5: "%PDF-" header, "%%EOF" trailer.
    CHECK(bytes.startsWith("%PDF-"));
    CHECK(bytes.trimmed().endsWith("%%EOF"));
}
