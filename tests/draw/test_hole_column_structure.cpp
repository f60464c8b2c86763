// Hole column structure: what the display list holds, hidden tracks, the depth window, SVG.
#include "display_list_queries.hpp"
#include "draw/display_list_export.hpp"
#include "draw/hole_column.hpp"
#include "draw/lithology_fill.hpp"
#include "sample_hole_column.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QFile>
#include <QXmlStreamReader>

#include <map>
#include <set>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::legendTexts;
using atollog::draw::test::onlyItem;
using atollog::draw::test::sampleHoleColumn;
using atollog::draw::test::testOutputDir;

TEST_CASE("Column lists one box per interval, one tick per sample, boxes per run",
          "[draw][column]") {
    const HoleColumnInput in = sampleHoleColumn();
    const DisplayList list = layoutHoleColumn(in);
    CHECK(itemsOf<Rect>(list, ItemRole::LithologyInterval).size() == in.intervals.size());
    CHECK(itemsOf<Line>(list, ItemRole::SampleTick).size() == in.samples.size());
    std::size_t run_boxes = 0;
    for (const ColumnRun &r : in.runs) {
        const double cored = r.base_m - r.top_m;
        run_boxes += (r.recovered_m > 0 ? 1 : 0) + (r.recovered_m < cored ? 1 : 0);
    }
    CHECK(itemsOf<Rect>(list, ItemRole::RecoveryRun).size() == run_boxes);
    onlyItem<Text>(list, ItemRole::Title, "TAV-2");
    CHECK(itemsOf<Line>(list, ItemRole::DrilledBase).size() == 1);

    // Patterns follow the rock; organically bound textures take the reef pattern. FGDC-STD-013-
    // 2006 section 37: 627 limestone, 642 dolostone, 607 massive sand, 620 clay, 601 gravel,
    // 717 basaltic flows, 711 tuffaceous rock (numbers checked against a copy of the
    // standard's pattern chart).
    const std::map<std::string, FillPattern> expected{
        {"4.20-7.50", FillPattern::Limestone},
        {"24.00-27.00", FillPattern::Dolostone},
        {"14.00-15.20", FillPattern::Sand},
        {"36.50-38.00", FillPattern::Clay},
        {"48.50-50.00", FillPattern::Gravel},
        {"53.00-62.00", FillPattern::Basalt},
        {"50.00-53.00", FillPattern::Volcaniclastic},
        {"0.60-4.20", FillPattern::ReefFramework},   // framestone (atollog's own pattern)
        {"43.00-48.50", FillPattern::ReefFramework}, // boundstone
        {"0.00-0.60", FillPattern::None},            // soil: colour only
    };
    for (const auto &[key, pattern] : expected) {
        CAPTURE(key);
        CHECK(onlyItem<Rect>(list, ItemRole::LithologyInterval, key).pattern == pattern);
    }
    // Neighbouring rocks never share a fill colour.
    const auto colour = [&](const std::string &key) {
        return *onlyItem<Rect>(list, ItemRole::LithologyInterval, key).fill;
    };
    CHECK_FALSE(colour("4.20-7.50") == colour("0.60-4.20"));     // limestone / reef
    CHECK_FALSE(colour("19.50-24.00") == colour("24.00-27.00")); // limestone / dolostone
    CHECK_FALSE(colour("50.00-53.00") == colour("53.00-62.00")); // volcaniclastic / basalt

    // The legend lists what is drawn, and only that.
    const std::set<std::string> legend = legendTexts(list);
    for (const char *t : {"Lithology", "Surfaces", "limestone", "dolostone", "basalt",
                          "exposure surface", "hardground", "erosion surface", "basement contact",
                          "core recovered", "no recovery", "sample"}) {
        CAPTURE(t);
        CHECK(legend.count(t) == 1);
    }
    HoleColumnInput plain = in;
    plain.intervals = {{0.0, 10.0, RockKind::Limestone, TextureClass::Packstone, std::nullopt}};
    const std::set<std::string> plain_legend = legendTexts(layoutHoleColumn(plain));
    CHECK(plain_legend.count("limestone") == 1);
    CHECK(plain_legend.count("basalt") == 0);
    CHECK(plain_legend.count("Surfaces") == 0);
}

TEST_CASE("Hidden tracks take no items and no room", "[draw][column]") {
    const HoleColumnInput full = sampleHoleColumn();
    HoleColumnInput lean = full;
    lean.tracks.samples = false;
    lean.tracks.core_runs = false;
    const DisplayList a = layoutHoleColumn(full);
    const DisplayList b = layoutHoleColumn(lean);
    CHECK(itemsOf<Line>(b, ItemRole::SampleTick).empty());
    CHECK(itemsOf<Rect>(b, ItemRole::RecoveryRun).empty());
    CHECK(itemsOf<Rect>(b, ItemRole::LithologyInterval).size() == full.intervals.size());
    const HoleColumnStyle s;
    const HoleColumnTrackPositions xa = holeColumnTrackPositions(full, s, 0.0);
    const HoleColumnTrackPositions xb = holeColumnTrackPositions(lean, s, 0.0);
    CHECK(xa.right_mm - xb.right_mm ==
          Approx(s.run_track_width_mm + s.sample_track_width_mm + 2 * s.track_gap_mm));

    SECTION("surfaces alone keep the lithology track's room") {
        HoleColumnInput only_surfaces = full;
        only_surfaces.tracks.lithology = false;
        const DisplayList c = layoutHoleColumn(only_surfaces);
        CHECK(itemsOf<Rect>(c, ItemRole::LithologyInterval).empty());
        CHECK(itemsOf<Polyline>(c, ItemRole::Surface).size() == 6);
    }
}

TEST_CASE("A depth window produces only what meets it, cut at its edges", "[draw][column]") {
    const HoleColumnInput in = sampleHoleColumn();
    HoleColumnView view;
    view.window_top_m = 20.0;
    view.window_base_m = 30.0;
    const DisplayList list = layoutHoleColumn(in, view);
    const DepthScale scale = holeColumnDepthScale(in, view);
    std::size_t meeting = 0;
    for (const ColumnInterval &iv : in.intervals) {
        meeting += (iv.top_m <= 30.0 && iv.base_m >= 20.0) ? 1 : 0;
    }
    const auto boxes = itemsOf<Rect>(list, ItemRole::LithologyInterval);
    CHECK(boxes.size() == meeting);
    for (const Rect *r : boxes) {
        CHECK(r->box.top_mm >= scale.y_mm(20.0) - 1e-9);
        CHECK(r->box.bottom_mm() <= scale.y_mm(30.0) + 1e-9);
    }
    // 19.50-24.00 is cut at the window top; its key keeps the logged depths.
    const Rect &cut = onlyItem<Rect>(list, ItemRole::LithologyInterval, "19.50-24.00");
    CHECK(cut.box.top_mm == Approx(scale.y_mm(20.0)));
    for (const Line *t : itemsOf<Line>(list, ItemRole::SampleTick)) {
        CHECK(t->from.y_mm >= scale.y_mm(20.0));
        CHECK(t->from.y_mm <= scale.y_mm(30.0));
    }
    CHECK(itemsOf<Line>(list, ItemRole::DrilledBase).empty()); // 62.4 m is outside

    SECTION("a long hole lays out only its window") {
        HoleColumnInput big;
        big.hole = "LONG";
        big.drilled_base_m = 5000.0;
        for (int i = 0; i < 10000; ++i) {
            big.intervals.push_back({0.5 * i, 0.5 * (i + 1), RockKind::Limestone,
                                     i % 2 ? TextureClass::Packstone : TextureClass::Grainstone,
                                     std::nullopt});
            big.samples.push_back({"s" + std::to_string(i), 0.5 * i + 0.25});
        }
        HoleColumnView w;
        w.window_top_m = 2000.0;
        w.window_base_m = 2010.0;
        const DisplayList l = layoutHoleColumn(big, w);
        // 10 m of 0.5 m intervals: 20, plus the two that touch the window's edges.
        CHECK(itemsOf<Rect>(l, ItemRole::LithologyInterval).size() <= 22);
        CHECK(itemsOf<Line>(l, ItemRole::SampleTick).size() == 20);
        CHECK(l.size() < 200);
    }
}

TEST_CASE("Column SVG holds the hole id, depth labels and texture scale as text",
          "[draw][column][export]") {
    const HoleColumnInput in = sampleHoleColumn();
    const DisplayList list = layoutHoleColumn(in);
    const auto path = testOutputDir("column-svg") / "hole_column.svg";
    exportSvg(list, path, "TAV-2 column");
    QFile file(QString::fromStdString(path.string()));
    REQUIRE(file.open(QIODevice::ReadOnly));
    QXmlStreamReader xml(file.readAll());
    std::map<QString, int> count;
    std::set<std::string> texts;
    while (!xml.atEnd()) {
        if (xml.readNext() != QXmlStreamReader::StartElement) {
            continue;
        }
        const QString name = xml.name().toString();
        ++count[name];
        if (name == "text") {
            texts.insert(xml.readElementText(QXmlStreamReader::IncludeChildElements)
                             .trimmed()
                             .toStdString());
        }
    }
    REQUIRE_FALSE(xml.hasError());
    // SVG 1.1 (W3C 2011) 10.4: text stays <text>, so labels are searchable.
    CHECK(texts.count("TAV-2") == 1);
    CHECK(texts.count("mudstone") == 1);
    CHECK(texts.count("boundstone") == 1);
    CHECK(texts.count("50") == 1); // depth label at 50 m
    CHECK(texts.count("depth scale 1:200") == 1);
    CHECK(count["image"] == 0); // patterns are vector line work, never bitmaps
    // Boxes, runs and pattern paths: well over one element per interval.
    CHECK(count["path"] + count["rect"] + count["polyline"] >
          3 * static_cast<int>(in.intervals.size()));
}
