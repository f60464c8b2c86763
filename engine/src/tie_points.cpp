#include "atollog/engine/tie_points.hpp"

#include <set>
#include <utility>

namespace atollog {

std::vector<TiePoint> makeTiePoints(const std::vector<DatumPick>& picks,
                                    const std::vector<PickConflict>& conflicts,
                                    const BiostratSettings& settings) {
    validateBiostratSettings(settings);
    std::set<std::pair<std::string, std::string>> in_order_conflict, in_inverted_zone,
        in_explained;
    for (const PickConflict& c : conflicts) {
        auto& set = c.explained_by                              ? in_explained
                     : c.kind == PickConflictKind::EventOrder ? in_order_conflict
                                                              : in_inverted_zone;
        set.emplace(c.hole, c.expected_deeper_event);
        set.emplace(c.hole, c.expected_shallower_event);
    }
    std::vector<TiePoint> out;
    for (const DatumPick& p : picks) {
        if (!p.found || p.open_ended)
            continue;
        if (p.unreliable_cuttings_base && !settings.cuttings_bases_as_ties)
            continue;
        if (p.truncated_at_basement && !settings.basement_bases_as_ties)
            continue;
        const bool bracket_holds_surface =
            p.truncated_at_surface ||
            (settings.ties_use_extended_bracket && p.extension_reaches_surface);
        if (bracket_holds_surface && !settings.surface_picks_as_ties)
            continue;
        // One horizon gives no range extension at any confidence (Strauss & Sadler 1989: the
        // interval is unbounded for H = 1), so an extended tie would have no outer end.
        if (settings.ties_use_extended_bracket && p.extension_undefined)
            continue;
        const DepthBracket& b = settings.ties_use_extended_bracket ? p.extended : p.widened;
        TiePoint t;
        t.hole = p.hole;
        t.event = p.event;
        t.kind = p.kind;
        t.shallow_m = b.shallow_m;
        t.deep_m = b.deep_m;
        t.depth_m = p.depth_m;
        t.age_ma = p.age_ma;
        t.age_sd_ma = p.age_sd_ma;
        if (p.widened_by_recovery)
            t.flags.emplace_back("widened_by_recovery");
        if (settings.ties_use_extended_bracket && p.extension_fraction)
            t.flags.emplace_back("extended");
        if (p.unreliable_cuttings_base)
            t.flags.emplace_back("cuttings_base");
        const auto key = std::make_pair(p.hole, p.event);
        if (in_order_conflict.count(key))
            t.flags.emplace_back("order_conflict");
        if (in_inverted_zone.count(key))
            t.flags.emplace_back("zone_inverted");
        if (in_explained.count(key))
            t.flags.emplace_back("explained_inversion");
        if (p.truncated_at_surface)
            t.flags.emplace_back("at_surface");
        if (p.truncated_at_basement)
            t.flags.emplace_back("at_basement");
        out.push_back(std::move(t));
    }
    return out;
}

std::string tieFlagsText(const TiePoint& t) {
    std::string s;
    for (const std::string& f : t.flags)
        s += (s.empty() ? "" : ";") + f;
    return s;
}

} // namespace atollog
