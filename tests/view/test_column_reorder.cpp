#include "view/column_reorder.hpp"

#include <catch2/catch.hpp>

using atollog::draw::RectMm;
using atollog::view::reorderedColumns;
using Order = std::vector<std::size_t>;

namespace {
// Three 40 mm columns, 20 mm apart: centres at 20, 80, 140 mm.
const std::vector<RectMm> kBoxes{{0, 0, 40, 100}, {60, 0, 40, 100}, {120, 0, 40, 100}};
} // namespace

TEST_CASE("a column moves past the centres it crosses", "[view][reorder]") {
    CHECK(reorderedColumns(kBoxes, 0, 59.0) == Order{0, 1, 2}); // centre 79: short of 80
    CHECK(reorderedColumns(kBoxes, 0, 61.0) == Order{1, 0, 2});
    CHECK(reorderedColumns(kBoxes, 0, 500.0) == Order{1, 2, 0});
    CHECK(reorderedColumns(kBoxes, 2, -61.0) == Order{0, 2, 1});
    CHECK(reorderedColumns(kBoxes, 2, -130.0) == Order{2, 0, 1});
}

TEST_CASE("an unknown column leaves the order alone", "[view][reorder]") {
    CHECK(reorderedColumns(kBoxes, 7, 100.0) == Order{0, 1, 2});
    CHECK(reorderedColumns({}, 0, 100.0).empty());
}
