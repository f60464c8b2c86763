#include "cli/panel_source.hpp"

#include "cli/panel_tracks.hpp"

#include "atollog/engine/biostrat_run.hpp"
#include "atollog/engine/date_ages.hpp"
#include "atollog/engine/isochrons.hpp"
#include "atollog/engine/logged_surfaces.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <map>
#include <sstream>
#include <stdexcept>

namespace atollog::cli {

namespace {

draw::RockKind rockKind(Rock r) {
    switch (r) {
    case Rock::Limestone: return draw::RockKind::Limestone;
    case Rock::Dolostone: return draw::RockKind::Dolostone;
    case Rock::Basalt: return draw::RockKind::Basalt;
    case Rock::Volcaniclastic: return draw::RockKind::Volcaniclastic;
    case Rock::Clay: return draw::RockKind::Clay;
    case Rock::Sand: return draw::RockKind::Sand;
    case Rock::Gravel: return draw::RockKind::Gravel;
    case Rock::Soil: return draw::RockKind::Soil;
    case Rock::Cavity: return draw::RockKind::Cavity;
    }
    return draw::RockKind::Limestone;
}

draw::TextureClass textureClass(const std::optional<Texture>& t) {
    if (!t) return draw::TextureClass::None;
    switch (*t) {
    case Texture::Mudstone: return draw::TextureClass::Mudstone;
    case Texture::Wackestone: return draw::TextureClass::Wackestone;
    case Texture::Packstone: return draw::TextureClass::Packstone;
    case Texture::Grainstone: return draw::TextureClass::Grainstone;
    case Texture::Boundstone: return draw::TextureClass::Boundstone;
    case Texture::Floatstone: return draw::TextureClass::Floatstone;
    case Texture::Rudstone: return draw::TextureClass::Rudstone;
    case Texture::Bafflestone: return draw::TextureClass::Bafflestone;
    case Texture::Bindstone: return draw::TextureClass::Bindstone;
    case Texture::Framestone: return draw::TextureClass::Framestone;
    case Texture::Crystalline: return draw::TextureClass::Crystalline;
    }
    return draw::TextureClass::None;
}

draw::SurfaceKind surfaceKind(LoggedSurfaceKind k) {
    switch (k) {
    case LoggedSurfaceKind::Exposure: return draw::SurfaceKind::Exposure;
    case LoggedSurfaceKind::Hardground: return draw::SurfaceKind::Hardground;
    case LoggedSurfaceKind::Erosion: return draw::SurfaceKind::Erosion;
    case LoggedSurfaceKind::BasementContact: return draw::SurfaceKind::BasementContact;
    }
    return draw::SurfaceKind::Erosion;
}

std::string ageLabel(double age_ma) {
    std::ostringstream s;
    s << age_ma << " Ma";
    return s.str();
}

} // namespace

draw::HoleColumnInput holeColumnFromDataset(const CoreDataset& data, const std::string& hole) {
    const auto h = std::find_if(data.holes.begin(), data.holes.end(),
                                [&](const Hole& x) { return x.hole == hole; });
    if (h == data.holes.end())
        throw std::invalid_argument("no hole '" + hole + "' in the project");
    draw::HoleColumnInput c;
    c.hole = hole;
    c.collar_elev_m = h->collar_elev_m.value_or(0.0);
    double base = 0;
    for (const CoreRun& r : data.runs) {
        if (r.hole != hole) continue;
        c.runs.push_back({r.run, r.top_m, r.base_m, std::min(r.recovered_m, r.cored_m())});
        base = std::max(base, r.base_m);
    }
    for (const LithInterval& iv : data.intervals) {
        if (iv.hole != hole) continue;
        c.intervals.push_back({iv.top_m, iv.base_m, rockKind(iv.rock), textureClass(iv.texture), {}});
        base = std::max(base, iv.base_m);
    }
    for (const LoggedSurface& s : surfacesOfHole(loggedSurfaces(data), hole))
        for (auto& iv : c.intervals)
            if (std::fabs(iv.base_m - s.depth_m) < 1e-9) iv.base_surface = surfaceKind(s.kind);
    for (const Sample& s : data.samples)
        if (s.hole == hole) {
            c.samples.push_back({s.sample, s.top_m});
            base = std::max(base, s.base_m);
        }
    c.drilled_base_m = base;
    return c;
}

draw::PanelInput panelInputFromDataset(const CoreDataset& data, const PanelSourceOptions& o) {
    draw::PanelInput in;
    in.title = o.title;
    std::vector<std::string> holes = o.holes;
    if (holes.empty()) {
        std::vector<const Hole*> ordered;
        for (const Hole& h : data.holes) ordered.push_back(&h);
        std::stable_sort(ordered.begin(), ordered.end(), [](const Hole* a, const Hole* b) {
            const double inf = std::numeric_limits<double>::infinity();
            return a->chain_km.value_or(inf) < b->chain_km.value_or(inf);
        });
        for (const Hole* h : ordered) holes.push_back(h->hole);
    }
    std::map<std::string, std::size_t> column_of;
    for (const std::string& h : holes) {
        if (column_of.count(h))
            throw std::invalid_argument("hole '" + h + "' is listed twice; list each hole once");
        column_of.emplace(h, in.columns.size());
        in.columns.push_back(holeColumnFromDataset(data, h));
    }
    if (!o.events.empty()) {
        CorrelationOptions co;
        co.biostrat = o.model.biostrat;
        co.dates = o.model.dates;
        const CorrelationData c = gatherCorrelationData(data, co);
        for (const std::string& id : o.events) {
            const std::size_t e = eventIndex(c, id);
            draw::PanelTie tie;
            tie.event = id;
            for (const EventLevel& l : c.levels)
                if (l.event == e)
                    if (const auto it = column_of.find(c.holes[l.hole]); it != column_of.end())
                        tie.at.push_back({it->second, l.shallow_m, l.deep_m, l.level_m});
            std::sort(tie.at.begin(), tie.at.end(),
                      [](const auto& a, const auto& b) { return a.column < b.column; });
            in.ties.push_back(std::move(tie));
        }
    }
    for (draw::HoleColumnInput& c : in.columns) c.tracks = o.tracks;
    if (!o.taxa.empty() || o.zones) {
        const BiostratResult bio = runBiostratigraphy(data, o.model.biostrat.settings());
        if (!o.taxa.empty())
            addTaxonLanes(in.columns, data, bio.ranges, o.taxa, o.model.biostrat.settings());
        if (o.zones) addZoneLanes(in.columns, data, bio.zones, o.zone_scheme);
    }
    if (o.dates) addDates(in.columns, computeDateAges(data, o.model.dates.settings()));
    // Each hole's model once: for its isochrons and its age track.
    std::vector<std::pair<std::size_t, AgeModel>> models;
    if (!o.ages_ma.empty() || o.age_model) {
        for (const auto& [hole, model] : o.ready_models)
            if (const auto it = column_of.find(hole); it != column_of.end())
                models.emplace_back(it->second, model);
        // The rest are built; their inputs are only gathered when some hole needs them.
        const bool all_ready = std::all_of(column_of.begin(), column_of.end(), [&](const auto& c) {
            return o.ready_models.count(c.first) > 0;
        });
        if (!all_ready)
            for (const auto& hm : gatherAgeModelInputs(data, o.model, ""))
                if (const auto it = column_of.find(hm.hole);
                    it != column_of.end() && o.ready_models.count(hm.hole) == 0)
                    models.emplace_back(it->second, buildHoleModel(hm, o.model));
        std::sort(models.begin(), models.end(),
                  [](const auto& a, const auto& b) { return a.first < b.first; });
    }
    if (o.age_model)
        for (const auto& [column, m] : models) in.columns[column].age_model = columnAgeModel(m);
    setCommonAgeRange(in.columns);
    for (double age : o.ages_ma) {
        draw::PanelIsochron iso;
        iso.label = ageLabel(age);
        iso.age_ma = age;
        for (const auto& [column, m] : models) {
            const IsochronDepth d = isochronDepth(m, age);
            if (d.depth_q025_m && d.depth_q500_m && d.depth_q975_m)
                iso.at.push_back({column, *d.depth_q025_m, *d.depth_q500_m, *d.depth_q975_m});
        }
        std::sort(iso.at.begin(), iso.at.end(),
                  [](const auto& a, const auto& b) { return a.column < b.column; });
        in.isochrons.push_back(std::move(iso));
    }
    return in;
}

} // namespace atollog::cli
