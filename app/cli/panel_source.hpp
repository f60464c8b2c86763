#pragma once
// A correlation panel filled from a project's data: one column per hole (runs, intervals with
// their texture and base surface, samples), the tie lines of chosen events and the isochrons of
// chosen ages (from each hole's age model). Shared by `atollog panel` and the viewer, so both
// draw the same picture.
#include "cli/age_model_inputs.hpp"
#include "cli/correlation_inputs.hpp"

#include "draw/panel_input.hpp"

#include "atollog/engine/core_dataset.hpp"

#include <map>
#include <string>
#include <vector>

namespace atollog::cli {

struct PanelSourceOptions {
    /// Holes left to right; empty: every hole, by chain distance (holes without one last, in
    /// the project's order).
    std::vector<std::string> holes;
    std::vector<std::string> events;  ///< tie lines of these events (ids)
    std::vector<double> ages_ma;      ///< isochrons of these ages
    AgeModelOptions model;            ///< for isochrons and the age track; its pick and date
                                      ///< settings for ties, taxa, zones and dates
    std::string title;
    // The columns' data tracks: filled only when asked for, so a plain panel costs nothing more.
    std::vector<std::string> taxa; ///< a lane per taxon id, in this order, in every column
    bool zones = false;            ///< zones of zone_scheme (empty: every scheme)
    std::string zone_scheme;
    bool dates = false;     ///< dates in the age track
    bool age_model = false; ///< each hole's age model in the age track
    draw::HoleColumnTracks tracks; ///< what every column shows
    /// Per hole: a model already run (e.g. stored in the project, stored_age_models.hpp), used
    /// for its isochrons and age track instead of building one with `model`.
    std::map<std::string, AgeModel> ready_models;
};

/// Throws std::invalid_argument naming an unknown hole, event, taxon or zonation scheme, as the
/// commands do. Each hole's age model is built once, for its isochrons and its age track; the
/// age tracks of all columns share one age range (setCommonAgeRange).
draw::PanelInput panelInputFromDataset(const CoreDataset& data, const PanelSourceOptions& options);

/// One hole's column (clamping over-full runs to their cored length: core expansion is drawn as
/// full recovery).
draw::HoleColumnInput holeColumnFromDataset(const CoreDataset& data, const std::string& hole);

} // namespace atollog::cli
