#pragma once

#include "draw/xy_plot_frame.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog::draw {

enum class LocEventKind {
    Base,  // lowest occurrence (FO) of a taxon
    Top,   // highest occurrence (LO)
    Dated, // a dated horizon
};

/// An event both holes show: its depth bracket and observed level in each (m below collar).
struct LocPlotEvent {
    std::string id;
    LocEventKind kind = LocEventKind::Base;
    double x_shallow_m = 0.0, x_deep_m = 0.0, x_level_m = 0.0; // in the x hole
    double y_shallow_m = 0.0, y_deep_m = 0.0, y_level_m = 0.0; // in the y hole
    bool off_line = false; // flagged by the fit; ringed and labelled
};

/// The fitted line's 95 % band at one x: y_lo_m <= y_hi_m.
struct LocBandPoint {
    double x_m = 0.0;
    double y_lo_m = 0.0;
    double y_hi_m = 0.0;
};

/// One fitted piece of the line, y = intercept_m + slope * x over [x_from_m, x_to_m].
struct LocPlotSegment {
    double x_from_m = 0.0;
    double x_to_m = 0.0;
    double slope = 0.0;
    double intercept_m = 0.0;
    std::vector<LocBandPoint> band; // in x order inside the piece; empty: no band
};

struct LocPlotInput {
    std::string x_hole;
    std::string y_hole;
    std::string fit_name; // e.g. "York fit"; in the subtitle
    std::vector<LocPlotEvent> events; // at least one
    std::vector<LocPlotSegment> segments;
    std::vector<double> x_surfaces_m; // logged surfaces of the x hole: vertical lines
    std::vector<double> y_surfaces_m; // of the y hole: horizontal lines
    bool label_every_event = false;   // otherwise only the off-line events are labelled
    std::optional<ValueRange> x_axis_m; // automatic when empty
    std::optional<ValueRange> y_axis_m;
    double x_axis_length_mm = 120.0;
    double y_axis_length_mm = 120.0;
};

} // namespace atollog::draw
