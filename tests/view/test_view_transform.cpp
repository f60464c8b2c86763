#include "view/view_transform.hpp"

#include <catch2/catch.hpp>

using atollog::draw::PointMm;
using atollog::draw::RectMm;
using atollog::view::ViewTransform;
using Catch::WithinAbs;

TEST_CASE("zooming about a point keeps that scene point under it", "[view][transform]") {
    ViewTransform t;
    t.panBy({37.0, -12.0});
    const QPointF anchor(211.0, 97.0);
    const PointMm before = t.toScene(anchor);
    t.zoomAbout(anchor, 1.7);
    CHECK_THAT(t.pxPerMm(), WithinAbs(2.0 * 1.7, 1e-12));
    const QPointF after = t.toWidget(before);
    CHECK_THAT(after.x(), WithinAbs(anchor.x(), 1e-9)); // px
    CHECK_THAT(after.y(), WithinAbs(anchor.y(), 1e-9));
}

TEST_CASE("zoom stops at its limits and ignores a non-positive factor", "[view][transform]") {
    ViewTransform t;
    t.zoomAbout({0, 0}, 1e9);
    CHECK(t.pxPerMm() == ViewTransform::kMaxPxPerMm);
    t.zoomAbout({0, 0}, 1e-12);
    CHECK(t.pxPerMm() == ViewTransform::kMinPxPerMm);
    t.zoomAbout({0, 0}, 0.0);
    CHECK(t.pxPerMm() == ViewTransform::kMinPxPerMm);
}

TEST_CASE("scene and widget rectangles map both ways", "[view][transform]") {
    ViewTransform t;
    t.zoomAbout({0, 0}, 3.0); // 6 px/mm
    t.panBy({10.0, 20.0});
    const QRectF w = t.toWidget(RectMm{1.0, 2.0, 4.0, 5.0});
    CHECK(w == QRectF(16.0, 32.0, 24.0, 30.0));
    const RectMm back = t.toScene(w);
    CHECK_THAT(back.left_mm, WithinAbs(1.0, 1e-12));
    CHECK_THAT(back.height_mm, WithinAbs(5.0, 1e-12));
}

TEST_CASE("fit centres the page and fills the tighter direction", "[view][transform]") {
    ViewTransform t;
    const RectMm page{0.0, 0.0, 300.0, 100.0}; // wide page
    t.fit(page, QSizeF(640, 480), 20.0);
    CHECK_THAT(t.pxPerMm(), WithinAbs(600.0 / 300.0, 1e-12));
    const QRectF on = t.toWidget(page);
    CHECK_THAT(on.left(), WithinAbs(20.0, 1e-9));
    CHECK_THAT(on.right(), WithinAbs(620.0, 1e-9));
    CHECK_THAT(on.center().y(), WithinAbs(240.0, 1e-9));

    const ViewTransform unchanged = t;
    t.fit(RectMm{}, QSizeF(640, 480), 20.0);
    CHECK(t.pxPerMm() == unchanged.pxPerMm());
}
