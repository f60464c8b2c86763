// Correlation panel input checks: each bad input is refused with a message naming the item and
// the fix.
#include "draw/panel_layout.hpp"
#include "sample_panel.hpp"

#include <catch2/catch.hpp>

#include <limits>
#include <stdexcept>

using namespace atollog::draw;
using atollog::draw::test::samplePanel;
using atollog::draw::test::samplePanelView;
using Catch::Matchers::Contains;

TEST_CASE("Panel refuses bad input with a message naming item and fix", "[panel]") {
    PanelInput in = samplePanel();
    PanelView view = samplePanelView();
    SECTION("a tie names a column out of range") {
        in.ties[0].at[2].column = 3;
        CHECK_THROWS_WITH(layoutPanel(in, view),
                          Contains("tie 'top Maruvaiella alta'") && Contains("column 3") &&
                              Contains("has 3 columns"));
    }
    SECTION("an isochron names a column twice") {
        in.isochrons[0].at[1].column = 0;
        CHECK_THROWS_WITH(layoutPanel(in, view), Contains("isochron '0.125 Ma'") &&
                                                     Contains("twice") &&
                                                     Contains("one level per hole"));
    }
    SECTION("a non-finite level") {
        in.ties[1].at[0].level_m = std::numeric_limits<double>::quiet_NaN();
        CHECK_THROWS_WITH(layoutPanel(in, view),
                          Contains("tie 'base Tavoripora rosea' in hole 'MRV-L1' level") &&
                              Contains("finite"));
    }
    SECTION("isochron quantiles out of order") {
        in.isochrons[1].at[2].q500_m = 49.0; // below its q975 of 48.2 m
        CHECK_THROWS_WITH(layoutPanel(in, view),
                          Contains("isochron '0.400 Ma' in hole 'MRV-R3'") &&
                              Contains("out of order") && Contains("q025_m <= q500_m <= q975_m"));
    }
    SECTION("a tie level outside its bracket") {
        in.ties[0].at[0].level_m = 12.0;
        CHECK_THROWS_WITH(layoutPanel(in, view), Contains("not inside its bracket") &&
                                                     Contains("shallow_m <= level_m <= deep_m"));
    }
    SECTION("a level below the hole") {
        in.ties[0].at[1].deep_m = 70.0;
        CHECK_THROWS_WITH(layoutPanel(in, view),
                          Contains("outside hole 'MRV-F2'") && Contains("56.000 m"));
    }
    SECTION("flatten_on names nothing") {
        view.flatten_on = "0.250 Ma";
        CHECK_THROWS_WITH(layoutPanel(in, view),
                          Contains("flatten_on '0.250 Ma'") && Contains("leave flatten_on unset"));
    }
    SECTION("no columns") {
        in = PanelInput{};
        CHECK_THROWS_WITH(layoutPanel(in, view), Contains("give at least one hole"));
    }
    SECTION("an empty window") {
        view.window_top_m = 30.0;
        view.window_base_m = 20.0;
        CHECK_THROWS_WITH(layoutPanel(in, view), Contains("window") && Contains("is empty"));
    }
    SECTION("a window below every hole") {
        view.window_top_m = 500.0;
        CHECK_THROWS_WITH(layoutPanel(in, view), Contains("holds nothing"));
    }
    SECTION("a bad column reaches the column check") {
        in.columns[1].intervals[2].base_m = std::numeric_limits<double>::infinity();
        CHECK_THROWS_WITH(layoutPanel(in, view), Contains("hole 'MRV-F2'") && Contains("finite"));
    }
    CHECK_THROWS_AS(layoutPanel(in, view), std::invalid_argument);
}
