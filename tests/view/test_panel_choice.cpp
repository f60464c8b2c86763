#include "view/panel_choice.hpp"

#include "sample_panel.hpp"

#include <catch2/catch.hpp>

using namespace atollog;
using view::PanelChoice;

TEST_CASE("choosing holes reorders columns and renumbers ties", "[view][choice]") {
    const draw::PanelInput full = view::test::samplePanel();
    PanelChoice choice = view::showEverything(full);
    REQUIRE(choice.hole_order == std::vector<std::string>{"AX1", "AX2", "AX3"});
    choice.hole_order = {"AX3", "AX1"};
    choice.shown_events = {"B ALPHA", "date AX1-S9"};
    choice.shown_isochrons = {};

    const draw::PanelInput shown = view::choosePanelContent(full, choice);
    REQUIRE(shown.columns.size() == 2);
    CHECK(shown.columns[0].hole == "AX3");
    CHECK(shown.columns[1].hole == "AX1");
    REQUIRE(shown.ties.size() == 2);
    CHECK(shown.ties[0].event == "B ALPHA");
    REQUIRE(shown.ties[0].at.size() == 2);  // AX2 is hidden
    CHECK(shown.ties[0].at[0].column == 1); // AX1 now stands second
    CHECK(shown.ties[0].at[0].level_m == 12.3);
    CHECK(shown.ties[0].at[1].column == 0);
    CHECK(shown.ties[0].at[1].level_m == 14.0);
    CHECK(shown.isochrons.empty());
}

TEST_CASE("a tie left in no shown hole is dropped", "[view][choice]") {
    const draw::PanelInput full = view::test::samplePanel();
    PanelChoice choice = view::showEverything(full);
    choice.hole_order = {"AX2"};
    const draw::PanelInput shown = view::choosePanelContent(full, choice);
    for (const auto &tie : shown.ties) {
        CHECK(tie.event != "date AX1-S9"); // seen in AX1 and AX3 only
    }
    CHECK(shown.ties.size() == 2);
}

TEST_CASE("an unknown hole in the order is refused", "[view][choice]") {
    PanelChoice choice;
    choice.hole_order = {"AX9"};
    CHECK_THROWS_WITH(view::choosePanelContent(view::test::samplePanel(), choice),
                      Catch::Contains("AX9"));
}
