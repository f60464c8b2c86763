// markTruncatedPicks: the truncation rule is documented on DatumPick (datum_picks.hpp).
#include "atollog/engine/datum_picks.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <stdexcept>

namespace atollog {

void markTruncatedPicks(std::vector<DatumPick>& picks, const std::vector<LoggedSurface>& surfaces) {
    std::map<std::string, std::vector<const LoggedSurface*>> by_hole;
    for (const LoggedSurface& s : surfaces) {
        if (!std::isfinite(s.depth_m))
            throw std::invalid_argument("logged surfaces: a " + std::string(toString(s.kind)) +
                                        " surface of hole '" + s.hole + "' has depth " +
                                        numberText(s.depth_m) + "; give a finite depth");
        by_hole[s.hole].push_back(&s);
    }
    for (DatumPick& p : picks) {
        p.truncated_at_surface = false;
        p.surfaces_at_pick.clear();
        p.truncated_at_basement = false;
        p.extension_reaches_surface = false;
        p.basement_contact_m.reset();
        if (!p.found)
            continue;
        const auto it = by_hole.find(p.hole);
        if (it == by_hole.end())
            continue;
        for (const LoggedSurface* s : it->second) {
            if (s->depth_m >= p.widened.shallow_m && s->depth_m <= p.widened.deep_m)
                p.surfaces_at_pick.push_back(*s);
            else if (s->kind != LoggedSurfaceKind::BasementContact &&
                     s->depth_m >= p.extended.shallow_m && s->depth_m <= p.extended.deep_m)
                p.extension_reaches_surface = true;
            if (s->kind == LoggedSurfaceKind::BasementContact && !p.basement_contact_m)
                p.basement_contact_m = s->depth_m;
        }
        std::stable_sort(p.surfaces_at_pick.begin(), p.surfaces_at_pick.end(),
                         [](const LoggedSurface& a, const LoggedSurface& b) {
                             return a.depth_m < b.depth_m;
                         });
        p.truncated_at_surface = !p.surfaces_at_pick.empty();
        // No reef taxon lived in the lava: an extension never reaches below the contact.
        if (p.basement_contact_m && p.extended.deep_m > *p.basement_contact_m)
            p.extended.deep_m = std::max(p.widened.deep_m, *p.basement_contact_m);
        p.truncated_at_basement = p.kind == EventKind::Base && p.basement_contact_m &&
                                  (p.widened.open_deep || p.widened.deep_m >= *p.basement_contact_m);
    }
    // A taxon found at the floor was living when the deepest carbonate formed, so every base at
    // least as old lies at or below the floor too, wherever its lowest find happens to be.
    std::map<std::string, double> youngest_floor_base_ma;
    for (const DatumPick& p : picks)
        if (p.truncated_at_basement) {
            auto [it, inserted] = youngest_floor_base_ma.try_emplace(p.hole, p.age_ma);
            if (!inserted)
                it->second = std::min(it->second, p.age_ma);
        }
    for (DatumPick& p : picks) {
        const auto it = youngest_floor_base_ma.find(p.hole);
        if (p.found && p.kind == EventKind::Base && it != youngest_floor_base_ma.end() &&
            p.age_ma >= it->second)
            p.truncated_at_basement = true;
    }
}

} // namespace atollog
