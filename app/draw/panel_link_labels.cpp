#include "draw/panel_link_labels.hpp"

#include "draw/text_extent.hpp"

#include <algorithm>

namespace atollog::draw {

namespace {
constexpr double kLabelGap_mm = 1.0; // from the anchor (a column's right edge) to the text
constexpr double kLeaderMin_mm = 0.8; // moved further than this: a leader joins it to its line
} // namespace

double appendLinkLabels(DisplayList &list, std::vector<LinkLabel> labels, double size_pt) {
    std::stable_sort(labels.begin(), labels.end(), [](const LinkLabel &a, const LinkLabel &b) {
        return a.at.x_mm != b.at.x_mm ? a.at.x_mm < b.at.x_mm : a.at.y_mm < b.at.y_mm;
    });
    const double line_h = textLineHeight_mm(size_pt);
    double right = 0.0;
    double prev_x = 0.0, prev_y = 0.0;
    bool have_prev = false;
    for (const LinkLabel &l : labels) {
        double y = l.at.y_mm;
        if (have_prev && l.at.x_mm == prev_x) {
            y = std::max(y, prev_y + line_h);
        }
        const double x = l.at.x_mm + kLabelGap_mm;
        if (y - l.at.y_mm > kLeaderMin_mm) {
            list.add(Line{l.at, {x, y}, Stroke{l.colour, 0.15, DashStyle::Solid}, l.tag});
        }
        list.add(Text{{x + 0.3, y},
                      l.text,
                      TextAnchor::Start,
                      size_pt,
                      FontWeight::Regular,
                      0.0,
                      l.colour,
                      l.tag});
        right = std::max(right, x + 0.3 + estimateTextWidth_mm(l.text, size_pt, FontWeight::Regular));
        prev_x = l.at.x_mm;
        prev_y = y;
        have_prev = true;
    }
    return right;
}

} // namespace atollog::draw
