#include "atollog/engine/zone_assignment.hpp"

#include "atollog/engine/inversion_explanation.hpp"
#include "atollog/engine/number_text.hpp"

#include "pick_lookup.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <stdexcept>

namespace atollog {
namespace {

// Where a sample lies relative to one zone edge.
enum class EdgeSide {
    Inside,    ///< on the zone's side of the edge (or the edge is open)
    Outside,   ///< on the far side
    InBracket, ///< strictly inside the boundary bracket
    Unknown    ///< the edge's event is not found in this hole
};

struct EdgeState {
    EdgeSide side = EdgeSide::Inside;
    const DatumPick* pick = nullptr;
    std::string event;
};

// Above the boundary: at or above the shallow end; below: at or below the deep end.
bool atOrAbove(const DepthBracket& b, double d) { return !b.open_shallow && d <= b.shallow_m; }
bool atOrBelow(const DepthBracket& b, double d) { return !b.open_deep && d >= b.deep_m; }

EdgeState edgeState(const detail::PickLookup& lookup, const std::string& hole,
                    const std::optional<std::string>& event, ZoneEdge edge, double d) {
    EdgeState s;
    if (!event)
        return s; // open edge
    s.event = *event;
    s.pick = lookup.find(hole, *event);
    if (!s.pick || !s.pick->found) {
        s.side = EdgeSide::Unknown;
        return s;
    }
    const DepthBracket& b = s.pick->plain;
    const bool zone_side = edge == ZoneEdge::Top ? atOrBelow(b, d) : atOrAbove(b, d);
    const bool far_side = edge == ZoneEdge::Top ? atOrAbove(b, d) : atOrBelow(b, d);
    s.side = zone_side ? EdgeSide::Inside : far_side ? EdgeSide::Outside : EdgeSide::InBracket;
    return s;
}

// Inverted and not explained by a logged surface (explainInversion).
bool zoneInverted(const detail::PickLookup& lookup, const std::string& hole, const Zone& z,
                  const std::vector<LoggedSurface>& surfaces) {
    if (!z.base_event || !z.top_event)
        return false;
    const DatumPick* base = lookup.find(hole, *z.base_event);
    const DatumPick* top = lookup.find(hole, *z.top_event);
    return base && top && base->found && top->found && base->widened.whollyAbove(top->widened) &&
           !explainInversion(*base, *top, surfaces);
}

const DatumPick* foundPick(const detail::PickLookup& lookup, const std::string& hole,
                           const std::optional<std::string>& event) {
    const DatumPick* p = event ? lookup.find(hole, *event) : nullptr;
    return p && p->found ? p : nullptr;
}

// Two zones hold a sample when the older zone's top pick lies at or above it and the younger
// zone's base pick at or below it: the pair is out of order around the sample. When a logged
// surface explains that pair (explainInversion), the sample belongs to the rock on its side of
// the surface: above it, the younger zone; at or below it (a sample starting at the surface lies
// in the rock under it), the older zone. Bases truncated at the basement lie below every sample,
// so the younger zone holds it. Returns the zones left; unexplained pairs stay.
std::vector<const Zone*> dropExplainedHoldings(const std::vector<const Zone*>& holding,
                                               const detail::PickLookup& lookup,
                                               const std::vector<LoggedSurface>& surfaces,
                                               const Sample& s) {
    std::vector<char> dropped(holding.size(), 0);
    for (std::size_t i = 0; i < holding.size(); ++i)
        for (std::size_t j = 0; j < holding.size(); ++j) {
            if (i == j)
                continue;
            const DatumPick* older_top = foundPick(lookup, s.hole, holding[i]->top_event);
            const DatumPick* younger_base = foundPick(lookup, s.hole, holding[j]->base_event);
            if (!older_top || !younger_base || !(older_top->age_ma > younger_base->age_ma))
                continue;
            const auto why = explainInversion(*older_top, *younger_base, surfaces);
            if (!why)
                continue;
            const bool in_younger_rock = why->cause == InversionCause::BasementTruncation ||
                                         s.top_m < why->surface.depth_m;
            dropped[in_younger_rock ? i : j] = 1;
        }
    std::vector<const Zone*> kept;
    for (std::size_t i = 0; i < holding.size(); ++i)
        if (!dropped[i])
            kept.push_back(holding[i]);
    return kept;
}

std::string bracketText(const DepthBracket& b) {
    return (b.open_shallow ? "open above " : "") + derivedNumberText(b.shallow_m) + "-" +
           derivedNumberText(b.deep_m) + " m" + (b.open_deep ? " open below" : "");
}

SampleZoneCall callSample(const std::vector<const Zone*>& zones, const detail::PickLookup& lookup,
                          const std::vector<LoggedSurface>& surfaces, const Sample& s) {
    SampleZoneCall call;
    call.hole = s.hole;
    call.sample = s.sample;
    call.depth_m = s.top_m;
    std::vector<const Zone*> holding;
    std::string bracket_reason, unpicked_reason;
    for (const Zone* z : zones) {
        const EdgeState top = edgeState(lookup, s.hole, z->top_event, ZoneEdge::Top, s.top_m);
        const EdgeState base = edgeState(lookup, s.hole, z->base_event, ZoneEdge::Base, s.top_m);
        if (top.side == EdgeSide::Inside && base.side == EdgeSide::Inside) {
            holding.push_back(z);
            continue;
        }
        if (top.side == EdgeSide::Outside || base.side == EdgeSide::Outside)
            continue;
        for (const EdgeState* e : {&top, &base}) {
            if (e->side == EdgeSide::InBracket && bracket_reason.empty())
                bracket_reason = "inside the bracket " + bracketText(e->pick->plain) +
                                 " of event '" + e->event + "' (" +
                                 (e == &top ? "top" : "base") + " of zone " + z->zone + ")";
            if (e->side == EdgeSide::Unknown && unpicked_reason.empty())
                unpicked_reason = "event '" + e->event + "' (" + (e == &top ? "top" : "base") +
                                  " of zone " + z->zone + ") is not picked in hole " + s.hole;
        }
    }
    if (holding.size() > 1)
        holding = dropExplainedHoldings(holding, lookup, surfaces, s);
    if (holding.size() > 1) {
        call.call = ZoneCall::ConflictingPicks;
        call.reason = "zones";
        for (std::size_t i = 0; i < holding.size(); ++i)
            call.reason += (i ? ", " : " ") + holding[i]->zone;
        call.reason += " all hold the sample: their picks overlap or are out of order";
    } else if (holding.size() == 1 && zoneInverted(lookup, s.hole, *holding.front(), surfaces)) {
        call.call = ZoneCall::ConflictingPicks;
        call.reason = "zone " + holding.front()->zone + " is inverted in hole " + s.hole +
                      ": its base pick lies wholly above its top pick";
    } else if (holding.size() == 1) {
        call.call = ZoneCall::Assigned;
        call.zone = holding.front()->zone;
    } else if (!bracket_reason.empty()) {
        call.call = ZoneCall::InsideBoundaryBracket;
        call.reason = bracket_reason;
    } else if (!unpicked_reason.empty()) {
        call.call = ZoneCall::BoundaryNotPicked;
        call.reason = unpicked_reason;
    } else {
        call.call = ZoneCall::OutsideZones;
        call.reason = "no zone of the scheme holds level " + derivedNumberText(s.top_m) + " m";
    }
    return call;
}

} // namespace

std::string_view toString(ZoneCall c) {
    switch (c) {
    case ZoneCall::Assigned:
        return "assigned";
    case ZoneCall::BoundaryNotPicked:
        return "boundary_not_picked";
    case ZoneCall::InsideBoundaryBracket:
        return "inside_boundary_bracket";
    case ZoneCall::ConflictingPicks:
        return "conflicting_picks";
    case ZoneCall::OutsideZones:
        return "outside_zones";
    }
    return "outside_zones";
}

ZoneReport assignZones(const CoreDataset& data, const std::vector<DatumPick>& picks) {
    detail::requireKnownZoneEvents(data);
    for (const Sample& s : data.samples)
        if (!std::isfinite(s.top_m))
            throw std::invalid_argument("assignZones: sample '" + s.sample + "' of hole '" +
                                        s.hole + "' has a non-finite top_m " +
                                        numberText(s.top_m));
    const detail::PickLookup lookup(picks);
    const std::vector<LoggedSurface> surfaces = loggedSurfaces(data);

    std::vector<std::string> schemes;
    std::map<std::string, std::vector<const Zone*>> zones_of;
    for (const Zone& z : data.zones) {
        auto [it, inserted] = zones_of.try_emplace(z.scheme);
        if (inserted)
            schemes.push_back(z.scheme);
        it->second.push_back(&z);
    }
    std::map<std::string, std::vector<const Sample*>> samples_of;
    for (const Sample& s : data.samples)
        samples_of[s.hole].push_back(&s);
    for (auto& [hole, list] : samples_of)
        std::stable_sort(list.begin(), list.end(),
                         [](const Sample* a, const Sample* b) { return a->top_m < b->top_m; });

    ZoneReport report;
    for (const std::string& scheme : schemes) {
        const std::vector<const Zone*>& zones = zones_of[scheme];
        for (const Hole& h : data.holes) {
            for (const Zone* z : zones)
                for (ZoneEdge edge : {ZoneEdge::Base, ZoneEdge::Top}) {
                    const auto& event = edge == ZoneEdge::Base ? z->base_event : z->top_event;
                    if (!event)
                        continue;
                    ZoneBoundaryPick b;
                    b.scheme = scheme;
                    b.zone = z->zone;
                    b.hole = h.hole;
                    b.edge = edge;
                    b.event = *event;
                    if (const DatumPick* p = lookup.find(h.hole, *event); p && p->found) {
                        b.picked = true;
                        b.plain = p->plain;
                        b.widened = p->widened;
                        b.depth_m = p->depth_m;
                        b.open_ended = p->open_ended;
                        b.unreliable_cuttings_base = p->unreliable_cuttings_base;
                    }
                    report.boundaries.push_back(std::move(b));
                }
            for (const Sample* s : samples_of[h.hole]) {
                SampleZoneCall call = callSample(zones, lookup, surfaces, *s);
                call.scheme = scheme;
                report.samples.push_back(std::move(call));
            }
        }
    }
    return report;
}

} // namespace atollog
