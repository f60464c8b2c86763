#pragma once
// Everything the correlation panel shows, as plain values (no engine or db types): the columns
// of the holes side by side, the tie lines of chosen events between them, and isochrons with
// their uncertainty. The command line (`atollog panel`) and the viewer fill it from a project.
#include "draw/hole_column_input.hpp"
#include "draw/hole_column_view.hpp"

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace atollog::draw {

/// One event's observed bracket in the holes that have it: drawn as a band from column to
/// column (the bracket's extent) with a line through the observed levels.
struct PanelTie {
    std::string event; ///< id; the key of its items
    struct At {
        std::size_t column = 0; ///< index into PanelInput::columns
        double shallow_m = 0, deep_m = 0, level_m = 0;
    };
    std::vector<At> at;
};

/// A level of one age in every hole, from the holes' age models: median depth as a line, the
/// 95 % depth range as a band between columns.
struct PanelIsochron {
    std::string label; ///< e.g. "0.125 Ma"; the key of its items
    double age_ma = 0;
    struct At {
        std::size_t column = 0;
        double q025_m = 0, q500_m = 0, q975_m = 0; ///< shallow to deep
    };
    std::vector<At> at;
};

/// The vertical axis: depth below each collar, elevation relative to present sea level (each
/// column shifted up by its collar elevation), or age: each column drawn through its hole's age
/// model (the medians, HoleColumnInput::age_model), so equal ages stand level and the time a
/// logged surface stands for opens as a gap in the column.
enum class PanelAxis { Depth, Elevation, Age };

struct PanelInput {
    std::string title;                    ///< project name for the title block
    std::vector<HoleColumnInput> columns; ///< left to right, as they are to be drawn
    std::vector<PanelTie> ties;
    std::vector<PanelIsochron> isochrons;
};

struct PanelView {
    PanelAxis axis = PanelAxis::Depth;
    /// Flatten on this tie's event (PanelTie::event) or isochron (PanelIsochron::label): every
    /// column is shifted so that its level (observed level, or median depth) lies on one line;
    /// columns without it keep the plain axis and are marked as not flattened.
    std::optional<std::string> flatten_on;
    double scale_ratio = 500.0; ///< vertical scale 1:N on paper
    /// Age axis only: paper per million years. 0: the height a depth axis at scale_ratio would
    /// give the deepest hole, shared over the span of the age models.
    double age_mm_per_myr = 0.0;
    DepthUnit depth_unit = DepthUnit::Metres;
    double column_gap_mm = 25.0; ///< room between columns for tie lines
    /// Window on the vertical axis (axis units: m below collar, m elevation, m below the
    /// flattening level, or Ma on an age axis); unset: everything.
    std::optional<double> window_top_m, window_base_m;
    bool legend = true;
    bool title_block = true;
    std::string date_text; ///< for the title block (the caller's clock, so layouts stay pure)
};

} // namespace atollog::draw
