#pragma once

#include "draw/display_list.hpp"

#include <vector>

namespace atollog::draw {

/// Where a label may go: its anchor point and which end of the text sits there.
struct LabelSpot {
    PointMm anchor_mm;
    TextAnchor anchor = TextAnchor::Start;
};

/// A text to place near a symbol, with the spots it may take in order of preference.
struct LabelRequest {
    Text text; // its anchor and alignment are replaced by the spot chosen
    std::vector<LabelSpot> spots;
};

/// Places each label at the first spot, tried in order and then nudged up and down by up to
/// `max_nudges` half line heights, whose estimated box stays inside `bounds` and clear of the
/// `obstacles` and of the labels placed before it. When none fits, the first spot is used
/// unchanged (a label that overlaps is better than a label that is missing). Returns the
/// placed texts in request order; their boxes are appended to `obstacles`.
std::vector<Text> placeLabels(const std::vector<LabelRequest> &requests,
                              std::vector<RectMm> &obstacles, const RectMm &bounds,
                              int max_nudges = 4);

} // namespace atollog::draw
