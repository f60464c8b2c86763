#include "draw/age_depth_plot_labels.hpp"

#include "draw/text_extent.hpp"

#include <algorithm>

namespace atollog::draw {

namespace {

// Boxes closer than this count as touching: text needs a little air to be read.
constexpr double kLabelClearance_mm = 0.3;

bool strictlyOverlaps(const RectMm &a, const RectMm &b) {
    return a.left_mm < b.right_mm() && b.left_mm < a.right_mm() && a.top_mm < b.bottom_mm() &&
           b.top_mm < a.bottom_mm();
}

bool inside(const RectMm &box, const RectMm &bounds) {
    return box.left_mm >= bounds.left_mm && box.right_mm() <= bounds.right_mm() &&
           box.top_mm >= bounds.top_mm && box.bottom_mm() <= bounds.bottom_mm();
}

bool fits(const Text &t, const std::vector<RectMm> &obstacles, const RectMm &bounds) {
    const RectMm box = itemBounds(t).grown(kLabelClearance_mm);
    if (!inside(itemBounds(t), bounds)) {
        return false;
    }
    return std::none_of(obstacles.begin(), obstacles.end(),
                        [&](const RectMm &o) { return strictlyOverlaps(box, o); });
}

} // namespace

std::vector<Text> placeLabels(const std::vector<LabelRequest> &requests,
                              std::vector<RectMm> &obstacles, const RectMm &bounds,
                              int max_nudges) {
    std::vector<Text> placed;
    for (const LabelRequest &request : requests) {
        Text text = request.text;
        if (!request.spots.empty()) {
            text.anchor_mm = request.spots.front().anchor_mm;
            text.anchor = request.spots.front().anchor;
        }
        const double half_line = textLineHeight_mm(text.size_pt) / 2;
        bool found = false;
        // Nudge order 0, +1, -1, +2, -2, ...: the nearest free place first.
        for (int n = 0; n <= 2 * max_nudges && !found; ++n) {
            const int nudge = (n % 2 == 1) ? (n + 1) / 2 : -(n / 2);
            for (const LabelSpot &spot : request.spots) {
                Text candidate = text;
                candidate.anchor = spot.anchor;
                candidate.anchor_mm = {spot.anchor_mm.x_mm,
                                       spot.anchor_mm.y_mm + nudge * half_line};
                if (fits(candidate, obstacles, bounds)) {
                    text = candidate;
                    found = true;
                    break;
                }
            }
        }
        obstacles.push_back(itemBounds(text));
        placed.push_back(std::move(text));
    }
    return placed;
}

} // namespace atollog::draw
