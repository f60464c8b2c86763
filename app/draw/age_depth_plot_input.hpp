#pragma once

#include <optional>
#include <string>
#include <vector>

namespace atollog::draw {

/// One depth of the age model's grid: the 2.5 %, 50 % and 97.5 % quantiles of the modelled age.
/// At a hiatus the grid holds two points at the same depth (the age just above, then just
/// below), so the envelope steps across it.
struct AgeModelGridPoint {
    double depth_m = 0.0;
    double age_q025_ma = 0.0;
    double age_q500_ma = 0.0;
    double age_q975_ma = 0.0;
};

enum class AgeTieKind {
    Datum, // a biostratigraphic or other event placed in the hole, with its time-scale age
    Date,  // a numerical age measured on a sample (U-Th, Sr isotopes, ...)
};

/// A level of known age somewhere in a depth bracket. The cross is drawn at the middle of the
/// bracket: the level may lie anywhere in it, so the middle is the least committal point.
struct AgeDepthTie {
    std::string label; // the event id or "<method> <sample>"; drawn beside the cross, and its key
    AgeTieKind kind = AgeTieKind::Datum;
    double shallow_m = 0.0;
    double deep_m = 0.0;    // equal to shallow_m for a point
    double age_ma = 0.0;    // central age
    double age_lo_ma = 0.0; // e.g. the 2.5 % quantile
    double age_hi_ma = 0.0; // e.g. the 97.5 % quantile
    bool outlier = false;   // singled out by the leave-one-out check
    bool excluded = false;  // left out of the model (e.g. failed screening); drawn grey
};

struct AgeDepthHiatus {
    double depth_m = 0.0;
    double duration_q500_ma = 0.0; // median duration of the gap in the record
    std::string label;             // optional name, drawn before the duration
};

struct AgeDepthPoint {
    double depth_m = 0.0;
    double age_ma = 0.0;
};

/// A curve to compare the model with, e.g. the known ages of a synthetic hole.
struct AgeDepthReferenceLine {
    std::string label; // the legend's wording
    std::vector<AgeDepthPoint> points;
};

struct AgeRange {
    double min_ma = 0.0;
    double max_ma = 0.0;
};

/// Everything an age-depth plot shows, as plain values (no engine or db types): the CLI and the
/// viewer fill it from a project's age model.
struct AgeDepthPlotInput {
    std::string hole;
    double top_m = 0.0;  // depth axis, top of the plot
    double base_m = 0.0; // depth axis, bottom of the plot
    /// The age axis; when not given it runs from the youngest to the oldest age drawn, widened
    /// to whole tick steps.
    std::optional<AgeRange> age_axis;
    double scale_ratio = 500.0;           // depth scale 1:N
    double age_axis_length_mm = 120.0;    // paper length of the age axis
    std::vector<AgeModelGridPoint> model; // in depth order, at least two points
    std::vector<AgeDepthTie> ties;
    std::vector<AgeDepthHiatus> hiatuses;
    std::optional<AgeDepthReferenceLine> reference;
};

} // namespace atollog::draw
