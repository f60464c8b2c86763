#pragma once
// How far one painted image is from a reference, in grey levels: for comparing two ways of
// painting the same thing (tiles against line work, strokes against fills).
#include <catch2/catch.hpp>

#include <QImage>

#include <algorithm>
#include <cstdlib>
#include <vector>

namespace atollog::draw::test {

struct ImageDifference {
    double ink = 0.0;             ///< mean darkness (255 - grey) of the reference, 0-255
    double mean_abs = 0.0;        ///< mean |grey difference| over all pixels, 0-255
    double relative = 0.0;        ///< mean_abs / ink: the share of the ink that moved
    double share_differing = 0.0; ///< share of pixels whose grey differs by more than 64
    /// The largest mean |difference| along a single pixel column or row: a seam, or a line
    /// drawn in the wrong place, shows up here.
    double worst_line_mean = 0.0;
};

/// `a` against the reference `b` (same size).
inline ImageDifference compareImages(const QImage &a, const QImage &b) {
    REQUIRE(a.size() == b.size());
    ImageDifference d;
    long long total = 0, differing = 0, ink = 0;
    std::vector<long long> column(static_cast<std::size_t>(a.width()), 0);
    std::vector<long long> row(static_cast<std::size_t>(a.height()), 0);
    for (int y = 0; y < a.height(); ++y) {
        for (int x = 0; x < a.width(); ++x) {
            const int diff = std::abs(qGray(a.pixel(x, y)) - qGray(b.pixel(x, y)));
            total += diff;
            ink += 255 - qGray(b.pixel(x, y));
            differing += diff > 64 ? 1 : 0;
            column[static_cast<std::size_t>(x)] += diff;
            row[static_cast<std::size_t>(y)] += diff;
        }
    }
    const double pixels = static_cast<double>(a.width()) * a.height();
    d.mean_abs = static_cast<double>(total) / pixels;
    d.ink = static_cast<double>(ink) / pixels;
    d.relative = d.ink > 0.0 ? d.mean_abs / d.ink : 0.0;
    d.share_differing = static_cast<double>(differing) / pixels;
    d.worst_line_mean =
        std::max(static_cast<double>(*std::max_element(column.begin(), column.end())) / a.height(),
                 static_cast<double>(*std::max_element(row.begin(), row.end())) / a.width());
    return d;
}

} // namespace atollog::draw::test
