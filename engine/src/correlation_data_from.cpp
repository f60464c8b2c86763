#include "atollog/engine/correlation_data_from.hpp"

#include <algorithm>
#include <map>
#include <set>

namespace atollog {

CorrelationData correlationDataFrom(const CoreDataset& data, const std::vector<DatumPick>& picks,
                                    const std::vector<DateAge>& dates,
                                    const std::vector<LoggedSurface>& surfaces,
                                    const CorrelationDataOptions& options) {
    CorrelationData out;
    std::map<std::string, std::size_t> hole_index;
    for (const Hole& h : data.holes) {
        hole_index.emplace(h.hole, out.holes.size());
        out.holes.push_back(h.hole);
    }
    out.sampled_levels_m.resize(out.holes.size());
    out.surfaces_m.resize(out.holes.size());
    for (const Sample& s : data.samples) {
        const auto it = hole_index.find(s.hole);
        if (it != hole_index.end())
            out.sampled_levels_m[it->second].push_back(s.top_m);
    }
    for (auto& levels : out.sampled_levels_m) {
        std::sort(levels.begin(), levels.end());
        levels.erase(std::unique(levels.begin(), levels.end()), levels.end());
    }
    for (const LoggedSurface& s : surfaces) {
        const auto it = hole_index.find(s.hole);
        if (it != hole_index.end())
            out.surfaces_m[it->second].push_back(s.depth_m);
    }
    for (auto& s : out.surfaces_m)
        std::sort(s.begin(), s.end());

    // Events in time-scale order, each once, only when some hole observes it.
    std::map<std::string, std::size_t> event_index;
    auto eventOf = [&](const std::string& id, SequenceEventKind kind, const std::string& taxon,
                       double age_ma, double age_sd_ma) {
        const auto [it, inserted] = event_index.emplace(id, out.events.size());
        if (inserted)
            out.events.push_back({id, kind, taxon, age_ma, age_sd_ma});
        return it->second;
    };
    std::map<std::string, std::size_t> time_scale_rank;
    for (const TimeScaleEvent& e : data.events)
        time_scale_rank.emplace(e.event, time_scale_rank.size());
    std::vector<const DatumPick*> usable;
    for (const DatumPick& p : picks)
        if (p.found && !p.open_ended && !p.truncated_at_basement && !p.unreliable_cuttings_base &&
            hole_index.count(p.hole))
            usable.push_back(&p);
    std::stable_sort(usable.begin(), usable.end(), [&](const DatumPick* a, const DatumPick* b) {
        return time_scale_rank[a->event] < time_scale_rank[b->event];
    });
    for (const DatumPick* p : usable) {
        const DepthBracket& b = options.use_extended_brackets ? p->extended : p->widened;
        const bool base = p->kind == EventKind::Base;
        const std::size_t e = eventOf(p->event, base ? SequenceEventKind::Base : SequenceEventKind::Top,
                                      p->taxon, p->age_ma, p->age_sd_ma);
        const double level = std::clamp(base ? p->found_top_m : p->found_base_m, b.shallow_m,
                                        b.deep_m);
        out.levels.push_back({hole_index[p->hole], e, b.shallow_m, b.deep_m, level});
    }
    if (options.include_dates) {
        for (const DateAge& d : dates) {
            if (!d.usable_for_model || !d.age || !hole_index.count(d.hole))
                continue;
            const std::string id = "date " + std::string(toString(d.method)) + " " +
                                   d.sample.value_or(d.hole + "@" + std::to_string(d.shallow_m));
            if (event_index.count(id))
                continue; // one horizon per sample and method
            const std::size_t e = eventOf(id, SequenceEventKind::Dated, "", d.age->mean_ma(),
                                          d.age->sd_ma());
            out.levels.push_back({hole_index[d.hole], e, d.shallow_m, d.deep_m, d.shallow_m});
        }
    }
    validateCorrelationData(out);
    return out;
}

} // namespace atollog
