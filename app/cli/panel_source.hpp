#pragma once
// A correlation panel filled from a project's data: one column per hole (runs, intervals with
// their texture and base surface, samples), the tie lines of chosen events and the isochrons of
// chosen ages (from each hole's age model). Shared by `atollog panel` and the viewer, so both
// draw the same picture.
#include "cli/age_model_inputs.hpp"
#include "cli/correlation_inputs.hpp"

#include "draw/panel_input.hpp"

#include "atollog/engine/core_dataset.hpp"

#include <string>
#include <vector>

namespace atollog::cli {

struct PanelSourceOptions {
    /// Holes left to right; empty: every hole, by chain distance (holes without one last, in
    /// the project's order).
    std::vector<std::string> holes;
    std::vector<std::string> events;  ///< tie lines of these events (ids)
    std::vector<double> ages_ma;      ///< isochrons of these ages
    AgeModelOptions model;            ///< for isochrons; its pick and date settings for ties
    std::string title;
};

/// Throws std::invalid_argument naming an unknown hole or event, as the commands do.
draw::PanelInput panelInputFromDataset(const CoreDataset& data, const PanelSourceOptions& options);

/// One hole's column (clamping over-full runs to their cored length: core expansion is drawn as
/// full recovery).
draw::HoleColumnInput holeColumnFromDataset(const CoreDataset& data, const std::string& hole);

} // namespace atollog::cli
