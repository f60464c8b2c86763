#include "view/hit_test.hpp"

#include <catch2/catch.hpp>

using namespace atollog::draw;
using atollog::view::hitTest;

namespace {

DisplayList twoLayers() {
    DisplayList list;
    list.add(Rect{{0, 0, 100, 100}, Colour{}, FillPattern::None, std::nullopt, {}}); // untagged
    list.add(Rect{{10, 10, 30, 30},
                  Colour{},
                  FillPattern::None,
                  std::nullopt,
                  {ItemRole::LithologyInterval, "0.00-6.00"}});
    list.add(Line{{0, 20}, {80, 60}, Stroke{}, {ItemRole::TieLine, "B ALPHA"}});
    list.add(Polygon{
        {{50, 70}, {90, 70}, {90, 90}}, Colour{}, std::nullopt, {ItemRole::TieBand, "T BETA"}});
    return list;
}

} // namespace

TEST_CASE("the topmost tagged item wins", "[view][hit]") {
    const DisplayList list = twoLayers();
    // The line (y = 20 + x/2) crosses the interval box and is drawn over it: at (20, 30) the
    // line wins; at (20, 25), about 4.5 mm off the line, the box.
    CHECK(hitTest(list, {20, 30}, 0.5) == std::optional<std::size_t>(2));
    CHECK(hitTest(list, {20, 25}, 0.5) == std::optional<std::size_t>(1));
}

TEST_CASE("lines count within the tolerance, untagged items never", "[view][hit]") {
    const DisplayList list = twoLayers();
    CHECK(hitTest(list, {60, 50.9}, 1.0) == std::optional<std::size_t>(2));
    CHECK(hitTest(list, {60, 52.0}, 1.0) == std::nullopt); // 2 mm below the line: background
    CHECK(hitTest(list, {95, 5}, 1.0) == std::nullopt);
}

TEST_CASE("polygons count inside their shape, not their whole box", "[view][hit]") {
    const DisplayList list = twoLayers();
    CHECK(hitTest(list, {85, 75}, 0.1) == std::optional<std::size_t>(3));
    CHECK(hitTest(list, {55, 88}, 0.1) == std::nullopt); // in the box, outside the triangle
}
