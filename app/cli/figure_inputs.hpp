#pragma once
// The inputs of the x-y figures and the age-depth plot, built from analysis results. The
// commands' --plot options and the viewer's figures use these, so a figure drawn headless and
// one shown on screen come from one piece of code.
#include "cli/age_model_inputs.hpp"
#include "cli/correlation_inputs.hpp"

#include "atollog/engine/age_model.hpp"
#include "atollog/engine/chain_migration.hpp"
#include "atollog/engine/line_of_correlation.hpp"
#include "draw/age_depth_plot.hpp"
#include "draw/chain_plot_input.hpp"
#include "draw/loc_plot_input.hpp"
#include "draw/rate_plot_input.hpp"

#include <cstddef>
#include <optional>
#include <vector>

namespace atollog::cli {

/// The age-depth plot of one hole's model: its grid envelope, the ties as the model saw them
/// (lava dates below a logged contact pooled), excluded dates hollow, the leading outlier
/// ringed, hiatuses more likely than not labelled H1, H2, ... Tie labels are shown when asked
/// or when there are at most 30 ties.
draw::AgeDepthPlotInput ageDepthPlotInput(const AgeModel& m, const HoleModelInputs& in);
draw::AgeDepthPlotStyle ageDepthPlotStyle(const draw::AgeDepthPlotInput& p, bool label_every_tie);

/// One accretion rate as a rate-plot interval along depth or the model's median ages; empty
/// when the rate is undefined, the interval has no thickness, or (along age) the model has no
/// age at an end or the ages do not increase.
std::optional<draw::RatePlotInterval> ratePlotInterval(const AccretionRate& r, const AgeModel& m,
                                                       draw::RatePlotAlong along);
/// Every rate of the model that ratePlotInterval keeps.
draw::RatePlotInput ratePlotInput(const AgeModel& m, draw::RatePlotAlong along);

/// The holes' basement ages against distance with the chain's York fit (when it has a rate).
draw::ChainPlotInput chainPlotInput(const std::vector<ChainPoint>& points,
                                    const ChainMigration& fit);

/// The cross-plot of a line of correlation between holes x_hole and y_hole of `data`.
draw::LocPlotInput locPlotInput(const LineOfCorrelation& loc, const CorrelationData& data,
                                std::size_t x_hole, std::size_t y_hole);

} // namespace atollog::cli
