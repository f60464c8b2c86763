// Input checks of the hole column's data tracks: each refusal names the hole, the item, the
// value and the fix.
#include "draw/hole_column.hpp"
#include "sample_column_tracks.hpp"

#include <catch2/catch.hpp>

#include <limits>

using namespace atollog::draw;
using atollog::draw::test::sampleColumnWithTracks;
using Catch::Contains;

namespace {
constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
} // namespace

TEST_CASE("The sample hole with tracks is valid", "[draw][column][tracks][validation]") {
    CHECK_NOTHROW(layoutHoleColumn(sampleColumnWithTracks()));
}

TEST_CASE("Data tracks refuse bad values with the hole, item and fix",
          "[draw][column][tracks][validation]") {
    HoleColumnInput in = sampleColumnWithTracks();
    SECTION("a find that is not finite") {
        in.taxa[0].finds_m[1] = kNaN;
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("TAV-2") &&
                                                    Contains("taxon 'TAVK-MIN' find at") &&
                                                    Contains("nan") && Contains("finite"));
    }
    SECTION("a caved find below the drilled base") {
        in.taxa[0].caved_m[0] = 70.0;
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("taxon 'TAVK-MIN' caved find at") &&
                                                    Contains("70.000 m") &&
                                                    Contains("outside the hole"));
    }
    SECTION("an inverted zone bracket") {
        in.zones[1].base = {36.0, 33.0, false};
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("zone 'TV1' (TV forams) base boundary") &&
                                                    Contains("deep end 33.000 m") &&
                                                    Contains("swap them"));
    }
    SECTION("a zone upside down") {
        in.zones[1].top = {40.0, 41.0, false};
        CHECK_THROWS_WITH(layoutHoleColumn(in),
                          Contains("zone 'TV1'") && Contains("inverted") && Contains("leave"));
    }
    SECTION("an open edge spanning a bracket") {
        in.zones[0].top = {0.6, 1.0, true};
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("zone 'TV2'") &&
                                                    Contains("open") && Contains("one depth"));
    }
    SECTION("a date bracket inverted") {
        in.dates[0].deep_m = 2.0;
        CHECK_THROWS_WITH(layoutHoleColumn(in),
                          Contains("date 'u-th TAV-2-03' depth bracket") && Contains("swap"));
    }
    SECTION("a date outside its own range") {
        in.dates[2].age_ma = 0.05;
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("date 'c14 TAV-2-14'") &&
                                                    Contains("outside its range") &&
                                                    Contains("young end first"));
    }
    SECTION("model quantiles out of order") {
        in.age_model.rows[2].q025_ma = 0.016; // above the median 0.014
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("age model row 3") &&
                                                    Contains("10.000 m") &&
                                                    Contains("q025 <= q500 <= q975"));
    }
    SECTION("model rows out of depth order") {
        std::swap(in.age_model.rows[1], in.age_model.rows[2]);
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("age model row 3") &&
                                                    Contains("above the row before it") &&
                                                    Contains("shallow first"));
    }
    SECTION("three model rows at one depth") {
        in.age_model.rows.insert(in.age_model.rows.begin() + 4, in.age_model.rows[4]);
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("three rows at 19.500 m"));
    }
    SECTION("a model age that is not finite") {
        in.age_model.rows[5].q500_ma = kNaN;
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("age model row 6 median age") &&
                                                    Contains("finite"));
    }
    SECTION("a common range that leaves out a date") {
        in.age_track_range_ma = std::pair{0.0, 0.1};
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("outside the age track range") &&
                                                    Contains("widen the range"));
    }
    SECTION("an empty common range") {
        in.age_track_range_ma = std::pair{0.3, 0.3};
        CHECK_THROWS_WITH(layoutHoleColumn(in),
                          Contains("age track range") && Contains("is empty"));
    }
    SECTION("hidden tracks are not checked against the range") {
        in.age_track_range_ma = std::pair{0.0, 0.1};
        in.tracks.dates = false;
        in.tracks.age_model = false;
        CHECK_NOTHROW(layoutHoleColumn(in));
    }
}
