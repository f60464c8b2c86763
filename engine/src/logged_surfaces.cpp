#include "atollog/engine/logged_surfaces.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <iterator>
#include <map>
#include <optional>
#include <stdexcept>

namespace atollog {
namespace {

bool isVolcanic(Rock r) { return r == Rock::Basalt || r == Rock::Volcaniclastic; }

void requireFinite(const LithInterval& iv, double value_m, const char* column) {
    if (!std::isfinite(value_m))
        throw std::invalid_argument("logged surfaces: an interval of hole '" + iv.hole +
                                    "' has a non-finite " + column + " " + numberText(value_m));
}

std::optional<LoggedSurfaceKind> kindOf(Surface s) {
    switch (s) {
    case Surface::Exposure:
        return LoggedSurfaceKind::Exposure;
    case Surface::Hardground:
        return LoggedSurfaceKind::Hardground;
    case Surface::Erosion:
        return LoggedSurfaceKind::Erosion;
    case Surface::None:
        return std::nullopt;
    }
    return std::nullopt;
}

} // namespace

std::string_view toString(LoggedSurfaceKind k) {
    switch (k) {
    case LoggedSurfaceKind::Exposure:
        return "exposure";
    case LoggedSurfaceKind::Hardground:
        return "hardground";
    case LoggedSurfaceKind::Erosion:
        return "erosion";
    case LoggedSurfaceKind::BasementContact:
        return "basement_contact";
    }
    return "exposure";
}

std::vector<LoggedSurface> loggedSurfaces(const CoreDataset& data) {
    std::map<std::string, std::size_t> hole_index;
    for (const Hole& h : data.holes)
        hole_index.emplace(h.hole, hole_index.size());
    std::vector<std::vector<LoggedSurface>> by_hole(data.holes.size());
    std::vector<std::optional<double>> deepest_carbonate_m(data.holes.size());
    for (const LithInterval& iv : data.intervals) {
        const auto it = hole_index.find(iv.hole);
        if (it == hole_index.end())
            throw std::invalid_argument("logged surfaces: an interval names hole '" + iv.hole +
                                        "', which is not in holes");
        const std::size_t h = it->second;
        if (const auto kind = kindOf(iv.base_surface)) {
            requireFinite(iv, iv.base_m, "base_m");
            by_hole[h].push_back({iv.hole, iv.base_m, *kind});
        }
        if (isCarbonate(iv.rock)) {
            requireFinite(iv, iv.base_m, "base_m");
            auto& deepest = deepest_carbonate_m[h];
            deepest = std::max(deepest.value_or(iv.base_m), iv.base_m);
        }
    }
    // Second pass: the contact needs the deepest carbonate of the hole first.
    std::vector<std::optional<double>> contact_m(data.holes.size());
    for (const LithInterval& iv : data.intervals) {
        const std::size_t h = hole_index.at(iv.hole);
        if (!isVolcanic(iv.rock) || !deepest_carbonate_m[h])
            continue;
        requireFinite(iv, iv.top_m, "top_m");
        if (iv.top_m < *deepest_carbonate_m[h])
            continue; // a flow or ash bed inside the carbonate section, not its floor
        auto& c = contact_m[h];
        c = std::min(c.value_or(iv.top_m), iv.top_m);
    }
    std::vector<LoggedSurface> out;
    for (std::size_t h = 0; h < by_hole.size(); ++h) {
        auto& list = by_hole[h];
        if (contact_m[h])
            list.push_back({data.holes[h].hole, *contact_m[h], LoggedSurfaceKind::BasementContact});
        std::stable_sort(list.begin(), list.end(),
                         [](const LoggedSurface& a, const LoggedSurface& b) {
                             if (a.depth_m != b.depth_m)
                                 return a.depth_m < b.depth_m;
                             return static_cast<int>(a.kind) < static_cast<int>(b.kind);
                         });
        out.insert(out.end(), list.begin(), list.end());
    }
    return out;
}

std::vector<LoggedSurface> surfacesOfHole(const std::vector<LoggedSurface>& all,
                                          const std::string& hole) {
    std::vector<LoggedSurface> out;
    std::copy_if(all.begin(), all.end(), std::back_inserter(out),
                 [&](const LoggedSurface& s) { return s.hole == hole; });
    return out;
}

} // namespace atollog
