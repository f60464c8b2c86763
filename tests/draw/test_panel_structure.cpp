// Correlation panel structure: what the display list holds per role, drawing order (bands under
// the logs, lines over them), a legend of what is shown, and the SVG file.
#include "display_list_queries.hpp"
#include "draw/display_list_export.hpp"
#include "draw/panel_layout.hpp"
#include "sample_panel.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <QFile>
#include <QXmlStreamReader>

#include <algorithm>
#include <set>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::legendTexts;
using atollog::draw::test::samplePanel;
using atollog::draw::test::samplePanelView;
using atollog::draw::test::testOutputDir;

namespace {

std::size_t firstIndex(const DisplayList &list, ItemRole role) {
    for (std::size_t i = 0; i < list.size(); ++i) {
        if (itemTag(list.items()[i]).role == role) {
            return i;
        }
    }
    FAIL("no item with the role");
    return 0;
}

std::size_t lastIndex(const DisplayList &list, ItemRole role) {
    std::size_t last = 0;
    for (std::size_t i = 0; i < list.size(); ++i) {
        last = itemTag(list.items()[i]).role == role ? i : last;
    }
    return last;
}

} // namespace

TEST_CASE("Panel display list holds one band per joined pair and one label per link",
          "[panel]") {
    const DisplayList list = layoutPanel(samplePanel(), samplePanelView());
    // Tie 1 joins L1-F2 and F2-R3, tie 2 joins L1-R3: three bands; isochrons 2 x 2.
    CHECK(itemsOf<Polygon>(list, ItemRole::TieBand).size() == 3);
    CHECK(itemsOf<Polygon>(list, ItemRole::IsochronBand).size() == 4);
    CHECK(itemsOf<Text>(list, ItemRole::TieLabel).size() == 2);
    CHECK(itemsOf<Text>(list, ItemRole::IsochronLabel).size() == 2);
    // Each join: one slanted line and an edge bar at both ends.
    CHECK(itemsOf<Line>(list, ItemRole::TieLine).size() == 3 * 3);
    CHECK(itemsOf<Line>(list, ItemRole::Isochron).size() == 4 * 3);
    // Three headers, one title block.
    CHECK(itemsOf<Text>(list, ItemRole::Title).size() == 4);
    CHECK(itemsOf<Text>(list, ItemRole::Subtitle).size() == 3 + 2);
    // Labels name what they label.
    std::set<std::string> iso;
    for (const Text *t : itemsOf<Text>(list, ItemRole::IsochronLabel)) {
        iso.insert(t->text);
    }
    CHECK(iso == std::set<std::string>{"0.125 Ma", "0.400 Ma"});
}

TEST_CASE("Panel bands lie under the logs and lines over them", "[panel]") {
    const DisplayList list = layoutPanel(samplePanel(), samplePanelView());
    const std::size_t first_box = firstIndex(list, ItemRole::LithologyInterval);
    const std::size_t last_box = lastIndex(list, ItemRole::LithologyInterval);
    CHECK(lastIndex(list, ItemRole::TieBand) < first_box);
    CHECK(lastIndex(list, ItemRole::IsochronBand) < first_box);
    CHECK(firstIndex(list, ItemRole::TieLine) > last_box);
    CHECK(firstIndex(list, ItemRole::Isochron) > last_box);
    // Bands are translucent, so overlapping bands stay readable.
    for (const Polygon *p : itemsOf<Polygon>(list, ItemRole::TieBand)) {
        CHECK(p->fill.a < 128);
    }
}

TEST_CASE("Panel legend lists what the panel shows", "[panel]") {
    const std::set<std::string> all = legendTexts(layoutPanel(samplePanel(), samplePanelView()));
    CHECK(all.count("Correlation") == 1);
    CHECK(all.count("tie: observed level, bracket") == 1);
    CHECK(all.count("tie passing a hole without it") == 1);
    CHECK(all.count("isochron: median depth, 95 % range") == 1);
    CHECK(all.count("isochron passing a hole without it") == 0); // every isochron is in all holes
    CHECK(all.count("present sea level") == 0);
    CHECK(all.count("basalt") == 1); // the columns' fills, merged once
    CHECK(all.count("volcaniclastic") == 1);

    SECTION("no ties or isochrons: no correlation block") {
        PanelInput bare = samplePanel();
        bare.ties.clear();
        bare.isochrons.clear();
        const std::set<std::string> texts = legendTexts(layoutPanel(bare, samplePanelView()));
        CHECK(texts.count("Correlation") == 0);
        CHECK(texts.count("basalt") == 1);
    }
    SECTION("elevation: sea level is listed") {
        PanelView view = samplePanelView();
        view.axis = PanelAxis::Elevation;
        CHECK(legendTexts(layoutPanel(samplePanel(), view)).count("present sea level") == 1);
    }
    SECTION("a window without isochrons lists none") {
        PanelView view = samplePanelView();
        view.window_top_m = 16.0;
        view.window_base_m = 30.0;
        const std::set<std::string> texts = legendTexts(layoutPanel(samplePanel(), view));
        CHECK(texts.count("isochron: median depth, 95 % range") == 0);
        CHECK(texts.count("tie: observed level, bracket") == 1);
        CHECK(texts.count("basalt") == 0);
    }
}

TEST_CASE("Panel title block carries scale, axis mode and date", "[panel]") {
    PanelView view = samplePanelView();
    view.axis = PanelAxis::Elevation;
    const DisplayList list = layoutPanel(samplePanel(), view);
    const Text &scale = atollog::draw::test::onlyItem<Text>(list, ItemRole::Subtitle, "scale");
    CHECK(scale.text.find("1:500") != std::string::npos);
    CHECK(scale.text.find("elevation") != std::string::npos);
    CHECK(scale.text.find("2031-04-17") != std::string::npos);
    const Text &holes = atollog::draw::test::onlyItem<Text>(list, ItemRole::Subtitle, "holes");
    CHECK(holes.text == "holes MRV-L1, MRV-F2, MRV-R3");
    // The page holds everything drawn.
    const RectMm page = list.page();
    const RectMm all = list.boundingBox();
    CHECK(all.left_mm >= page.left_mm);
    CHECK(all.right_mm() <= page.right_mm());
    CHECK(all.bottom_mm() <= page.bottom_mm());
    CHECK(all.top_mm >= page.top_mm);
}

TEST_CASE("Panel SVG holds the title as text and no bitmap", "[panel]") {
    const DisplayList list = layoutPanel(samplePanel(), samplePanelView());
    const auto path = testOutputDir("panel-svg") / "panel.svg";
    exportSvg(list, path, "panel");
    QFile file(QString::fromStdString(path.string()));
    REQUIRE(file.open(QIODevice::ReadOnly));
    QXmlStreamReader xml(&file);
    bool title_found = false;
    int images = 0, texts = 0;
    QString current;
    while (!xml.atEnd()) {
        xml.readNext();
        if (xml.isStartElement()) {
            current = xml.name().toString();
            images += current == "image" ? 1 : 0;
            texts += current == "text" ? 1 : 0;
        } else if (xml.isCharacters() && current == "text") {
            title_found = title_found ||
                          xml.text().toString() == QString("Maruvai atoll: lagoon to outer rim");
        }
    }
    REQUIRE(!xml.hasError());
    CHECK(title_found);
    CHECK(images == 0);
    CHECK(texts > 20);
}
