#include "cli/chart_input.hpp"

#include <algorithm>
#include <limits>
#include <map>
#include <set>
#include <stdexcept>
#include <unordered_map>

namespace atollog::cli {

int abundanceRank(const std::optional<Abundance>& abundance) {
    if (!abundance) return 1;
    if (const auto* word = std::get_if<AbundanceClass>(&*abundance))
        return static_cast<int>(*word); // present=0 ... dominant=5, the declaration order
    const std::int64_t count = std::get<std::int64_t>(*abundance);
    if (count <= 1) return 1;
    if (count <= 4) return 2;
    if (count <= 9) return 3;
    if (count <= 19) return 4;
    return 5;
}

draw::RangeChartInput rangeChartInputFor(const CoreDataset& data, const BiostratResult& result,
                                         const std::string& hole,
                                         const std::vector<std::string>& taxa, double scale_ratio) {
    draw::RangeChartInput in;
    in.hole = hole;
    in.scale_ratio = scale_ratio;

    double top_m = std::numeric_limits<double>::infinity(), base_m = -top_m;
    for (const auto& r : data.runs) {
        if (r.hole != hole) continue;
        top_m = std::min(top_m, r.top_m);
        base_m = std::max(base_m, r.base_m);
        // Recovered core sits at the top of its run; the rest of the run came back empty.
        const double recovered_m = std::min(r.recovered_m, r.cored_m());
        if (recovered_m > 0) in.recovery.push_back({r.top_m, r.top_m + recovered_m, true});
        if (recovered_m < r.cored_m()) in.recovery.push_back({r.top_m + recovered_m, r.base_m, false});
    }

    std::unordered_map<std::string, const Sample*> samples;
    for (const auto& s : data.samples)
        if (s.hole == hole) {
            samples[s.sample] = &s;
            top_m = std::min(top_m, s.top_m);
            base_m = std::max(base_m, s.base_m);
        }
    if (!(top_m < base_m))
        throw std::invalid_argument("hole '" + hole + "' has no cored section or samples to chart");
    in.top_m = top_m;
    in.base_m = base_m;

    std::map<std::string, draw::ChartTaxon> columns;
    std::set<std::string> examined;
    for (const auto& o : data.occurrences) {
        const auto s = samples.find(o.sample);
        if (s == samples.end()) continue;
        examined.insert(o.sample);
        draw::OccurrenceKind kind = draw::OccurrenceKind::InPlace;
        if (o.status == OccurrenceStatus::Reworked) kind = draw::OccurrenceKind::Reworked;
        if (o.status == OccurrenceStatus::Caved) kind = draw::OccurrenceKind::Caved;
        columns[o.taxon].occurrences.push_back({s->second->top_m, kind, abundanceRank(o.abundance)});
    }
    for (const auto& s : data.samples)
        if (s.hole == hole && (examined.count(s.sample) || s.kind == "barren"))
            in.samples.push_back({s.sample, s.top_m, examined.count(s.sample) > 0});

    for (const auto& t : data.taxa) {
        auto c = columns.find(t.taxon);
        if (c == columns.end()) continue;
        c->second.id = t.taxon;
        c->second.display_name = t.name;
        c->second.group = std::string(toString(t.group));
    }

    std::vector<std::string> order = taxa;
    if (order.empty()) {
        std::map<std::string, std::pair<double, double>> extent; // lowest, highest in-place depth
        for (const auto& r : result.ranges)
            if (r.hole == hole && r.lowest && r.highest)
                extent[r.taxon] = {r.lowest->top_m, r.highest->top_m};
        for (const auto& [id, column] : columns) order.push_back(id);
        std::stable_sort(order.begin(), order.end(), [&](const auto& a, const auto& b) {
            const auto ea = extent.count(a) ? extent[a] : std::pair{-1.0, -1.0};
            const auto eb = extent.count(b) ? extent[b] : std::pair{-1.0, -1.0};
            return ea.first != eb.first ? ea.first > eb.first : ea.second > eb.second;
        });
    }
    std::set<std::string> shown;
    for (const auto& id : order) {
        const auto c = columns.find(id);
        if (c == columns.end())
            throw std::invalid_argument("taxon '" + id + "' has no occurrence in hole '" + hole + "'");
        in.taxa.push_back(c->second);
        shown.insert(id);
    }

    for (const auto& p : result.picks) {
        if (p.hole != hole || !p.found || !shown.count(p.taxon)) continue;
        draw::ChartPick pick;
        pick.event_id = p.event;
        pick.taxon_id = p.taxon;
        pick.kind = p.kind == EventKind::Top ? draw::PickKind::Top : draw::PickKind::Base;
        pick.depth_m = p.depth_m;
        pick.shallow_m = p.widened.shallow_m;
        pick.deep_m = p.widened.deep_m;
        if (p.extension_fraction) {
            pick.extended_shallow_m = p.extended.shallow_m;
            pick.extended_deep_m = p.extended.deep_m;
        }
        pick.open_ended = p.open_ended;
        in.picks.push_back(pick);
    }
    return in;
}

} // namespace atollog::cli
