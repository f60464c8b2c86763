#include "cli/panel_tracks.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <limits>
#include <map>
#include <set>
#include <stdexcept>

namespace atollog::cli {

namespace {

std::vector<double> levels(const std::vector<SampleLevel>& samples) {
    std::vector<double> out;
    for (const SampleLevel& s : samples) out.push_back(s.top_m);
    return out;
}

} // namespace

void addTaxonLanes(std::vector<draw::HoleColumnInput>& columns, const CoreDataset& data,
                   const std::vector<ObservedRange>& ranges, const std::vector<std::string>& taxa,
                   const BiostratSettings& settings) {
    std::map<std::string, const Taxon*> taxon_of;
    for (const Taxon& t : data.taxa) taxon_of[t.taxon] = &t;
    for (const std::string& id : taxa)
        if (!taxon_of.count(id))
            throw std::invalid_argument("no taxon '" + id +
                                        "' in the project; `atollog ranges PROJECT` lists the "
                                        "taxa found in each hole (ids as in taxa.csv)");
    std::map<std::string, const Sample*> sample_of;
    for (const Sample& s : data.samples) sample_of[s.sample] = &s;
    for (draw::HoleColumnInput& c : columns) {
        for (const std::string& id : taxa) {
            const Taxon& t = *taxon_of[id];
            draw::ColumnTaxonRange lane{id, t.name, std::string(toString(t.group)), {}, {}, {}};
            for (const Occurrence& o : data.occurrences) {
                if (o.taxon != id || o.status != OccurrenceStatus::InPlace) continue;
                const auto s = sample_of.find(o.sample);
                if (s == sample_of.end() || s->second->hole != c.hole) continue;
                if (passesAbundanceThreshold(o, settings)) lane.finds_m.push_back(s->second->top_m);
            }
            for (const ObservedRange& r : ranges)
                if (r.hole == c.hole && r.taxon == id) {
                    lane.reworked_m = levels(r.reworked);
                    lane.caved_m = levels(r.caved);
                }
            c.taxa.push_back(std::move(lane));
        }
    }
}

void addZoneLanes(std::vector<draw::HoleColumnInput>& columns, const CoreDataset& data,
                  const ZoneReport& report, const std::string& scheme) {
    if (!scheme.empty() &&
        std::none_of(data.zones.begin(), data.zones.end(),
                     [&](const Zone& z) { return z.scheme == scheme; })) {
        std::set<std::string> known;
        for (const Zone& z : data.zones) known.insert(z.scheme);
        std::string list;
        for (const std::string& k : known) list += (list.empty() ? "" : ", ") + ("\"" + k + "\"");
        throw std::invalid_argument("no zonation scheme '" + scheme + "' in zones.csv (schemes: " +
                                    (list.empty() ? std::string("none") : list) + ")");
    }
    for (draw::HoleColumnInput& c : columns) {
        double first_sample = std::numeric_limits<double>::infinity(), last_sample = 0.0;
        for (const Sample& s : data.samples)
            if (s.hole == c.hole) {
                first_sample = std::min(first_sample, s.top_m);
                last_sample = std::max(last_sample, s.base_m);
            }
        if (!(first_sample <= last_sample)) continue; // no sample: no zone can be placed
        for (const Zone& z : data.zones) {
            if (!scheme.empty() && z.scheme != scheme) continue;
            const ZoneBoundaryPick* edges[2] = {nullptr, nullptr}; // top, base
            std::vector<const ZoneBoundaryPick*> others;           // picked, same scheme and hole
            for (const ZoneBoundaryPick& b : report.boundaries) {
                if (b.hole != c.hole || b.scheme != z.scheme || !b.picked) continue;
                if (b.zone == z.zone) edges[b.edge == ZoneEdge::Top ? 0 : 1] = &b;
                else others.push_back(&b);
            }
            if (!edges[0] && !edges[1]) continue;
            draw::ColumnZone out{z.scheme, z.zone, {}, {}};
            if (edges[0]) out.top = {edges[0]->plain.shallow_m, edges[0]->plain.deep_m, false};
            if (edges[1]) out.base = {edges[1]->plain.shallow_m, edges[1]->plain.deep_m, false};
            // An open edge reaches to the nearest picked boundary beyond the known part.
            if (!edges[0]) {
                double limit = first_sample;
                for (const ZoneBoundaryPick* b : others)
                    if (b->plain.deep_m <= out.base.shallow_m) limit = std::max(limit, b->plain.deep_m);
                out.top = {limit, limit, true};
            }
            if (!edges[1]) {
                double limit = last_sample;
                for (const ZoneBoundaryPick* b : others)
                    if (b->plain.shallow_m >= out.top.deep_m) limit = std::min(limit, b->plain.shallow_m);
                out.base = {limit, limit, true};
            }
            if (out.top.shallow_m > out.base.deep_m) continue; // inverted in this hole
            const auto inHole = [&](double d) { return d >= 0.0 && d <= c.drilled_base_m; };
            if (!inHole(out.top.shallow_m) || !inHole(out.base.deep_m)) continue;
            c.zones.push_back(std::move(out));
        }
    }
}

void addDates(std::vector<draw::HoleColumnInput>& columns, const std::vector<DateAge>& dates) {
    for (draw::HoleColumnInput& c : columns)
        for (const DateAge& d : dates) {
            if (d.hole != c.hole || !d.age) continue;
            draw::ColumnDate out;
            out.method = std::string(toString(d.method));
            out.id = out.method + " " + (d.sample ? *d.sample : derivedNumberText(d.shallow_m) + " m");
            out.shallow_m = d.shallow_m;
            out.deep_m = d.deep_m;
            out.age_ma = d.age->quantile(0.5);
            out.age_low_ma = d.age->quantile(0.025);
            out.age_high_ma = d.age->quantile(0.975);
            out.used_in_model = d.usable_for_model;
            c.dates.push_back(std::move(out));
        }
}

draw::ColumnAgeModel columnAgeModel(const AgeModel& model) {
    draw::ColumnAgeModel out;
    for (const AgeGridRow& r : model.grid)
        out.rows.push_back({r.depth_m, r.age_q025_ma, r.age_q500_ma, r.age_q975_ma});
    return out;
}

void setCommonAgeRange(std::vector<draw::HoleColumnInput>& columns) {
    double young = std::numeric_limits<double>::infinity(), old = -young;
    for (const draw::HoleColumnInput& c : columns) {
        if (c.tracks.age_model)
            for (const draw::ColumnAgeRow& r : c.age_model.rows) {
                young = std::min(young, r.q025_ma);
                old = std::max(old, r.q975_ma);
            }
        if (c.tracks.dates)
            for (const draw::ColumnDate& d : c.dates) {
                young = std::min(young, d.age_low_ma);
                old = std::max(old, d.age_high_ma);
            }
    }
    if (!(old > young)) return; // nothing, or one age: each column pads its own
    if (young >= 0.0 && young < 0.1 * (old - young)) young = 0.0;
    for (draw::HoleColumnInput& c : columns) c.age_track_range_ma = std::pair{young, old};
}

} // namespace atollog::cli
