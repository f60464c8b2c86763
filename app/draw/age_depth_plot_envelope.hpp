#pragma once

#include "draw/age_depth_plot_frame.hpp"
#include "draw/age_depth_plot_input.hpp"
#include "draw/display_list.hpp"

#include <vector>

namespace atollog::draw {

/// The closed outline of the model's 95 % band on paper: down the 2.5 % ages, up the 97.5 %
/// ages, back to the first point.
std::vector<PointMm> ageEnvelopeOutline(const std::vector<AgeModelGridPoint> &model,
                                        const AgeDepthPlotFrame &frame);

/// Appends the band as one filled Polygon with its outline (role AgeEnvelope, key "band"),
/// the points of ageEnvelopeOutline without the repeated closing point.
void appendAgeEnvelope(DisplayList &list, const std::vector<AgeModelGridPoint> &model,
                       const AgeDepthPlotFrame &frame);

} // namespace atollog::draw
