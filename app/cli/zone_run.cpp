#include "cli/zone_run.hpp"

#include "cli/datum_run.hpp"
#include "cli/hole_filter.hpp"

#include <algorithm>
#include <set>
#include <stdexcept>

namespace atollog::cli {
namespace {

using A = TablePrinter::Align;

} // namespace

const std::vector<std::string>& zoneTableKinds() {
    static const std::vector<std::string> kinds{"interval", "sample", "boundary", "conflict",
                                                "explained"};
    return kinds;
}

void requireScheme(const CoreDataset& data, const std::string& scheme) {
    if (scheme.empty()) return;
    std::set<std::string> schemes;
    for (const auto& z : data.zones) schemes.insert(z.scheme);
    if (!schemes.count(scheme))
        throw std::invalid_argument("no zonation scheme '" + scheme + "' in zones.csv");
}

BiostratResult assignZonesOf(const CoreDataset& data, const BiostratOptions& options,
                             const PhaseReport& phase) {
    const auto settings = options.settings();
    reportPhase(phase, "assigning zones");
    return runBiostratigraphy(data, settings);
}

TablePrinter zoneTable(const BiostratResult& result, const ZoneTableChoice& choice, bool csv) {
    const auto& kinds = zoneTableKinds();
    if (std::find(kinds.begin(), kinds.end(), choice.by) == kinds.end())
        throw std::invalid_argument("zone table '" + choice.by +
                                    "': expected interval, sample, boundary, conflict or explained");
    auto keep = [&](const std::string& scheme, const std::string& hole) {
        return wantedHole(choice.hole, hole) &&
               (choice.scheme.empty() || scheme.empty() || scheme == choice.scheme);
    };

    if (choice.by == "sample") {
        TablePrinter table({{"scheme"}, {"hole"}, {"sample"}, {"depth_m", A::Right}, {"zone"},
                            {"call"}, {"reason"}});
        for (const auto& c : result.zones.samples)
            if (keep(c.scheme, c.hole))
                table.addRow({c.scheme, c.hole, c.sample, formatNumber(c.depth_m, csv, 2),
                              c.zone.value_or(""), std::string(toString(c.call)), c.reason});
        return table;
    }
    if (choice.by == "interval") {
        // Consecutive samples with the same call and zone make one interval.
        TablePrinter table({{"scheme"}, {"hole"}, {"zone"}, {"top_m", A::Right},
                            {"base_m", A::Right}, {"samples", A::Right}, {"call"}});
        const auto& calls = result.zones.samples;
        for (std::size_t i = 0; i < calls.size();) {
            std::size_t j = i + 1;
            while (j < calls.size() && calls[j].scheme == calls[i].scheme &&
                   calls[j].hole == calls[i].hole && calls[j].call == calls[i].call &&
                   calls[j].zone == calls[i].zone)
                ++j;
            if (keep(calls[i].scheme, calls[i].hole))
                table.addRow({calls[i].scheme, calls[i].hole, calls[i].zone.value_or("-"),
                              formatNumber(calls[i].depth_m, csv, 2),
                              formatNumber(calls[j - 1].depth_m, csv, 2),
                              std::to_string(j - i), std::string(toString(calls[i].call))});
            i = j;
        }
        return table;
    }
    if (choice.by == "boundary") {
        TablePrinter table({{"scheme"}, {"zone"}, {"edge"}, {"event"}, {"hole"},
                            {"depth_m", A::Right}, {"shallow_m", A::Right},
                            {"deep_m", A::Right}, {"flags"}});
        for (const auto& b : result.zones.boundaries) {
            if (!keep(b.scheme, b.hole)) continue;
            std::string flags = b.picked ? "" : "not_picked";
            if (b.open_ended) flags += std::string(flags.empty() ? "" : ";") + "open_ended";
            if (b.unreliable_cuttings_base)
                flags += std::string(flags.empty() ? "" : ";") + "cuttings_base_unreliable";
            table.addRow({b.scheme, b.zone, b.edge == ZoneEdge::Base ? "base" : "top", b.event,
                          b.hole, b.picked ? formatNumber(b.depth_m, csv, 2) : "",
                          b.picked ? bracketEndCell(b.widened.shallow_m, b.widened.open_shallow, csv) : "",
                          b.picked ? bracketEndCell(b.widened.deep_m, b.widened.open_deep, csv) : "",
                          flags});
        }
        return table;
    }
    TablePrinter table({{"kind"}, {"hole"}, {"scheme"}, {"zone"}, {"deeper_event"},
                        {"shallower_event"}, {"age_gap_ma", A::Right},
                        {"tolerance_ma", A::Right}, {"message"}});
    const auto& list = choice.by == "conflict" ? result.conflicts : result.explained_conflicts;
    for (const auto& c : list) {
        if (!keep(c.scheme, c.hole)) continue;
        const bool order = c.kind == PickConflictKind::EventOrder;
        table.addRow({order ? "event_order" : "zone_inverted", c.hole, c.scheme, c.zone,
                      c.expected_deeper_event, c.expected_shallower_event,
                      order ? formatNumber(c.age_gap_ma, csv, 3) : "",
                      order ? formatNumber(c.tolerance_ma, csv, 3) : "", c.message});
    }
    return table;
}

} // namespace atollog::cli
