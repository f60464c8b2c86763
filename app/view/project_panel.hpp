#pragma once
// A project file turned into everything the viewer can show: the panel of every hole with the
// tie lines of every event seen in two holes or more and isochrons at a series of ages. The
// content comes from the CLI library (panelInputFromDataset), as `atollog` draws it; the viewer
// then only chooses among it (panel_choice.hpp).
#include "draw/panel_input.hpp"

#include <filesystem>
#include <string>
#include <vector>

namespace atollog::view {

struct ProjectPanel {
    draw::PanelInput full;
    std::vector<std::string> default_events;    ///< shown when the project opens
    std::vector<std::string> default_isochrons; ///< labels shown when the project opens
    /// Where each hole's age model comes from: "HOLE: run #N of TIME" for stored runs used
    /// (cli::latestStoredAgeModels), and the holes whose models were built with defaults.
    std::vector<std::string> model_sources;
    std::vector<std::string> holes_with_default_models;
};

/// One line for the status bar: which age models the panel shows.
std::string modelSourceLine(const ProjectPanel &panel);

/// Round ages (Ma) for isochron candidates from a step on the 1-2-5 series up to `oldest_ma`,
/// at most 10 of them; none when oldest_ma is not positive.
std::vector<double> isochronAges(double oldest_ma);

/// Opens the project (ProjectStore::open, as every command does) and builds its panel, with each
/// hole's newest fresh stored age model where there is one. Throws what
/// the db and the CLI library throw (ProjectError for a bad file, std::invalid_argument for
/// data the panel cannot draw); the caller turns it into a message.
ProjectPanel loadProjectPanel(const std::filesystem::path &project);

} // namespace atollog::view
