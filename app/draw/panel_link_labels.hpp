#pragma once
// Names of ties and isochrons at the right end of their lines. Several links often end in the
// same column a few millimetres apart, so labels sharing an x are pushed apart downward until
// no two overlap (a label never moves up, so the first of a cluster stays at its line).
#include "draw/display_list.hpp"

#include <string>
#include <vector>

namespace atollog::draw {

struct LinkLabel {
    PointMm at; ///< where the label's left end would sit
    std::string text;
    Colour colour;
    ItemTag tag;
};

/// Appends the labels (6 pt, start-anchored), nudged apart; returns the rightmost x any reaches.
double appendLinkLabels(DisplayList &list, std::vector<LinkLabel> labels, double size_pt);

} // namespace atollog::draw
