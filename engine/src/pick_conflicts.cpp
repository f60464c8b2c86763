#include "atollog/engine/pick_conflicts.hpp"

#include "atollog/engine/number_text.hpp"

#include "pick_lookup.hpp"

#include <algorithm>
#include <cmath>
#include <map>

namespace atollog {
namespace {

std::string bracketText(const DepthBracket& b) {
    return derivedNumberText(b.shallow_m) + "-" + derivedNumberText(b.deep_m) + " m";
}

// Files the contradiction as a conflict or, when a logged surface accounts for it, as a note.
void file(PickConflict c, const DatumPick& deeper, const DatumPick& shallower,
          const std::vector<LoggedSurface>& surfaces, PickConflictReport& out) {
    c.explained_by = explainInversion(deeper, shallower, surfaces);
    if (c.explained_by) {
        c.message += "; " + explanationText(*c.explained_by);
        out.explained.push_back(std::move(c));
    } else {
        out.conflicts.push_back(std::move(c));
    }
}

void findZoneInversions(const CoreDataset& data, const detail::PickLookup& lookup,
                        const std::vector<std::string>& holes,
                        const std::vector<LoggedSurface>& surfaces, PickConflictReport& out) {
    for (const std::string& hole : holes)
        for (const Zone& z : data.zones) {
            if (!z.base_event || !z.top_event)
                continue;
            const DatumPick* base = lookup.find(hole, *z.base_event);
            const DatumPick* top = lookup.find(hole, *z.top_event);
            if (!base || !top || !base->found || !top->found)
                continue;
            if (!base->widened.whollyAbove(top->widened))
                continue;
            PickConflict c;
            c.kind = PickConflictKind::ZoneInverted;
            c.hole = hole;
            c.scheme = z.scheme;
            c.zone = z.zone;
            c.expected_deeper_event = *z.base_event;
            c.expected_shallower_event = *z.top_event;
            c.message = "zone " + z.zone + " (" + z.scheme + ") is inverted in hole " + hole +
                        ": its base event '" + *z.base_event + "' is picked at " +
                        bracketText(base->widened) + ", wholly above its top event '" +
                        *z.top_event + "' at " + bracketText(top->widened);
            file(std::move(c), *base, *top, surfaces, out);
        }
}

void findOrderConflicts(const std::vector<DatumPick>& picks,
                        const std::vector<LoggedSurface>& surfaces, PickConflictReport& out) {
    // Group found picks by hole, keeping the dataset's hole order.
    std::vector<std::string> hole_order;
    std::map<std::string, std::vector<const DatumPick*>> by_hole;
    for (const DatumPick& p : picks) {
        if (!p.found)
            continue;
        auto [it, inserted] = by_hole.try_emplace(p.hole);
        if (inserted)
            hole_order.push_back(p.hole);
        it->second.push_back(&p);
    }
    for (const std::string& hole : hole_order) {
        const std::vector<const DatumPick*>& list = by_hole[hole];
        for (const DatumPick* older : list)
            for (const DatumPick* younger : list) {
                if (!(older->age_ma > younger->age_ma))
                    continue;
                if (!older->widened.whollyAbove(younger->widened))
                    continue;
                const double gap_ma = older->age_ma - younger->age_ma;
                const double tol_ma = 2.0 * std::sqrt(older->age_sd_ma * older->age_sd_ma +
                                                      younger->age_sd_ma * younger->age_sd_ma);
                if (!(gap_ma > tol_ma))
                    continue;
                PickConflict c;
                c.kind = PickConflictKind::EventOrder;
                c.hole = hole;
                c.expected_deeper_event = older->event;
                c.expected_shallower_event = younger->event;
                c.age_gap_ma = gap_ma;
                c.tolerance_ma = tol_ma;
                c.message = "hole " + hole + ": '" + older->event + "' (" +
                            numberText(older->age_ma) + " Ma) is picked at " +
                            bracketText(older->widened) + ", wholly above the younger '" +
                            younger->event + "' (" + numberText(younger->age_ma) + " Ma) at " +
                            bracketText(younger->widened) + "; the ages differ by " +
                            derivedNumberText(gap_ma) + " Ma, more than 2 sd (" +
                            derivedNumberText(tol_ma) + " Ma)";
                file(std::move(c), *older, *younger, surfaces, out);
            }
    }
}

} // namespace

PickConflictReport reviewPickConflicts(const CoreDataset& data,
                                       const std::vector<DatumPick>& picks) {
    detail::requireKnownZoneEvents(data);
    const std::vector<LoggedSurface> surfaces = loggedSurfaces(data);
    const detail::PickLookup lookup(picks);
    std::vector<std::string> holes;
    for (const Hole& h : data.holes)
        holes.push_back(h.hole);
    PickConflictReport out;
    findZoneInversions(data, lookup, holes, surfaces, out);
    findOrderConflicts(picks, surfaces, out);
    return out;
}

std::vector<PickConflict> findPickConflicts(const CoreDataset& data,
                                            const std::vector<DatumPick>& picks) {
    return reviewPickConflicts(data, picks).conflicts;
}

} // namespace atollog
