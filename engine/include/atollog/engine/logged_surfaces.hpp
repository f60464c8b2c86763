#pragma once
// Surfaces logged in the cores that may stand for missing time: the base_surface of an interval
// (exposure, hardground, erosion) and the contact of the carbonate section on volcanic basement.
// A hiatus removes time at such a surface, so datums whose age falls in the missing time are
// squeezed onto it (Shaw 1964, graphic correlation: a dog-leg in the line of correlation marks a
// hiatus; International Stratigraphic Guide, Salvador 1994: an unconformity is a surface of
// erosion or non-deposition separating younger strata from older ones).
#include "atollog/engine/core_dataset.hpp"

#include <string>
#include <string_view>
#include <vector>

namespace atollog {

enum class LoggedSurfaceKind {
    Exposure,        ///< interval base_surface "exposure"
    Hardground,      ///< interval base_surface "hardground"
    Erosion,         ///< interval base_surface "erosion"
    BasementContact  ///< top of the volcanic basement under the carbonate section
};
std::string_view toString(LoggedSurfaceKind k); ///< "exposure", ..., "basement_contact"

struct LoggedSurface {
    std::string hole;
    double depth_m = 0;
    LoggedSurfaceKind kind = LoggedSurfaceKind::Exposure;
    bool operator==(const LoggedSurface&) const = default;
};

/// The logged surfaces of every hole, holes in dataset order, each hole's surfaces by depth
/// (shallowest first; at equal depth in the order of the kinds above):
/// - every interval whose base_surface is exposure, hardground or erosion gives a surface at its
///   base_m;
/// - the basement contact is the top_m of the shallowest basalt or volcaniclastic interval whose
///   top_m lies at or below the base_m of the deepest carbonate (limestone, dolostone) interval
///   of the hole. A hole without carbonate, or without volcanic rock below it, has none.
/// Holes without surfaces contribute nothing. Throws std::invalid_argument on an interval with a
/// non-finite depth that the rule needs, or on an interval in a hole that is not in data.holes.
std::vector<LoggedSurface> loggedSurfaces(const CoreDataset& data);

/// The surfaces of one hole, taken from the output of loggedSurfaces (depth order kept).
std::vector<LoggedSurface> surfacesOfHole(const std::vector<LoggedSurface>& all,
                                          const std::string& hole);

} // namespace atollog
