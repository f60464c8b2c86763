// Per-hole figures. Cored and recovered lengths come from DepthModel, so recovery is counted up
// to each run's cored length (ocean-drilling convention: recovery = recovered / cored, and core
// expansion beyond 100 % adds no depth). Distinct taxa per hole are found by interning ids and
// sorting (hole, taxon) pairs once, which stays fast for a million occurrences.
#include "atollog/engine/hole_summary.hpp"

#include "atollog/engine/depth_model.hpp"
#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <stdexcept>
#include <string_view>
#include <unordered_map>

namespace atollog {
namespace {

[[noreturn]] void refuse(Table table, std::size_t row, const std::string &what) {
    throw std::invalid_argument("summarizeHoles: " + std::string(tableFileName(table)) + " data row " +
                                std::to_string(row + 1) + ": " + what +
                                "; run validateDataset and fix its errors first");
}

std::string classOf(const LithInterval &v) {
    if (!isCarbonate(v.rock))
        return std::string(toString(v.rock));
    return v.texture ? std::string(toString(*v.texture)) : "unclassified";
}

} // namespace

std::vector<HoleSummary> summarizeHoles(const CoreDataset &data) {
    std::unordered_map<std::string_view, std::size_t> hole_of; // id -> index into summaries
    std::vector<HoleSummary> out(data.holes.size());
    for (std::size_t i = 0; i < data.holes.size(); ++i) {
        if (!hole_of.try_emplace(data.holes[i].hole, i).second)
            refuse(Table::Holes, i, "hole " + data.holes[i].hole + " appears twice");
        out[i].hole = data.holes[i].hole;
        out[i].site = data.holes[i].site;
    }
    auto find = [&](std::string_view id) -> HoleSummary * {
        auto it = hole_of.find(id);
        return it == hole_of.end() ? nullptr : &out[it->second];
    };

    std::vector<std::vector<CoreRun>> runs_of(out.size());
    for (const CoreRun &r : data.runs)
        if (auto it = hole_of.find(r.hole); it != hole_of.end())
            runs_of[it->second].push_back(r);
    for (std::size_t h = 0; h < out.size(); ++h) {
        try {
            const DepthModel model(std::move(runs_of[h]));
            out[h].run_count = model.runs().size();
            out[h].cored_m = model.cored_m();
            out[h].recovered_m = model.recovered_m();
            out[h].recovery_pct = 100.0 * model.recovery_fraction();
        } catch (const std::invalid_argument &e) {
            throw std::invalid_argument("summarizeHoles: runs.csv, hole " + out[h].hole + ": " +
                                        e.what() +
                                        "; run validateDataset and fix its errors "
                                        "first");
        }
    }

    for (std::size_t i = 0; i < data.intervals.size(); ++i) {
        const LithInterval &v = data.intervals[i];
        HoleSummary *s = find(v.hole);
        if (!s)
            continue;
        // The thickness itself must be finite too: finite ends far enough apart overflow.
        if (!std::isfinite(v.top_m) || !std::isfinite(v.base_m) || !(v.base_m > v.top_m) ||
            !std::isfinite(v.thickness_m()))
            refuse(Table::Intervals, i,
                   "interval " + numberText(v.top_m) + "-" + numberText(v.base_m) + " m of hole " +
                       v.hole + " has no positive finite thickness");
        s->logged_m += v.thickness_m();
        s->thickness_by_class_m[classOf(v)] += v.thickness_m();
        if (v.base_surface == Surface::Exposure)
            ++s->exposure_surface_count;
    }

    // Sample id -> hole index (first sample with an id wins, as in validation).
    std::unordered_map<std::string_view, std::uint32_t> sample_hole;
    sample_hole.reserve(data.samples.size());
    for (const Sample &smp : data.samples) {
        auto it = hole_of.find(smp.hole);
        if (it == hole_of.end())
            continue;
        ++out[it->second].sample_count;
        sample_hole.try_emplace(smp.sample, static_cast<std::uint32_t>(it->second));
    }

    std::unordered_map<std::string_view, std::uint32_t> taxon_number;
    std::vector<std::uint64_t> hole_taxon;
    hole_taxon.reserve(data.occurrences.size());
    for (const Occurrence &o : data.occurrences) {
        auto it = sample_hole.find(o.sample);
        if (it == sample_hole.end())
            continue;
        const auto taxon =
            taxon_number.try_emplace(o.taxon, static_cast<std::uint32_t>(taxon_number.size()))
                .first->second;
        hole_taxon.push_back((std::uint64_t{it->second} << 32) | taxon);
    }
    std::sort(hole_taxon.begin(), hole_taxon.end());
    hole_taxon.erase(std::unique(hole_taxon.begin(), hole_taxon.end()), hole_taxon.end());
    for (std::uint64_t key : hole_taxon)
        ++out[key >> 32].taxon_count;
    return out;
}

} // namespace atollog
