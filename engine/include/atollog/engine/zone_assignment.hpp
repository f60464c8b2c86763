#pragma once
// Interval zones in each hole: which zone every sample lies in, and where every zone boundary
// lies. An interval zone is the body of strata between two biohorizons (International
// Stratigraphic Guide, Salvador 1994); zones.csv names the event at its base and at its top, and
// each boundary sits where that event is picked in the hole.
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/datum_picks.hpp"
#include "atollog/engine/depth_bracket.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog {

enum class ZoneCall {
    Assigned,              ///< exactly one zone holds the sample
    BoundaryNotPicked,     ///< a boundary event that could close the sample's zone is not found here
    InsideBoundaryBracket, ///< the sample lies inside the bracket of a boundary pick
    ConflictingPicks,      ///< several zones hold it, or its zone is inverted in this hole
    OutsideZones           ///< every boundary is picked and no zone holds the sample
};
std::string_view toString(ZoneCall c); ///< "assigned", "boundary_not_picked", ...

struct SampleZoneCall {
    std::string scheme;
    std::string hole;
    std::string sample;
    double depth_m = 0;              ///< the sample's top_m: the level that is compared
    std::optional<std::string> zone; ///< set when call == Assigned
    ZoneCall call = ZoneCall::OutsideZones;
    std::string reason; ///< for people: which zone or event and why; empty when assigned
};

enum class ZoneEdge { Base, Top };

/// One boundary of one zone in one hole, from the pick of its defining event.
struct ZoneBoundaryPick {
    std::string scheme;
    std::string zone;
    std::string hole;
    ZoneEdge edge = ZoneEdge::Base;
    std::string event;
    bool picked = false; ///< false: the event is not found in this hole; brackets mean nothing
    DepthBracket plain;
    DepthBracket widened;
    double depth_m = 0; ///< the pick's quoted depth
    bool open_ended = false;
    bool unreliable_cuttings_base = false;
};

struct ZoneReport {
    std::vector<SampleZoneCall> samples;       ///< scheme by scheme, hole by hole, by depth
    std::vector<ZoneBoundaryPick> boundaries;  ///< every zone edge that names an event
};

/// Zones of every scheme in zones.csv (schemes in order of first appearance) for every sample of
/// every hole. A sample at level d lies in a zone when it is at or below the deep end of the
/// zone's top boundary bracket and at or above the shallow end of its base boundary bracket
/// (an edge without an event is open). Plain brackets decide, because they are built from the
/// examined samples themselves: each examined sample falls on one side of every pick. When two
/// zones hold a sample because the older zone's top event and the younger zone's base event are
/// out of order around it, and a logged surface explains that pair (explainInversion: a hiatus
/// squeezing a base and a top onto the surface, or two bases truncated at the basement), the
/// sample keeps only the zone on its side of the surface: the younger above it, the older at or
/// below it (the younger one for basement truncation); the zone between the pair's events then
/// lies in the missing time. Exactly one zone left, not inverted in the hole (inversions a
/// logged surface explains do not count), assigns the sample; otherwise the call says why not,
/// in this order: several zones or an inverted zone (ConflictingPicks), a boundary bracket around
/// the sample, a boundary event not found. Throws std::invalid_argument on a zone naming an
/// unknown event, or on samples as observeRanges does, or as loggedSurfaces.
ZoneReport assignZones(const CoreDataset& data, const std::vector<DatumPick>& picks);

} // namespace atollog
