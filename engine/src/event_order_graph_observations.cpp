// Direct observations between two events, and the rules that order events without a hole.
#include "event_order_graph_parts.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::detail {

const char* ruleOrdering(const SequenceEvent& a, const SequenceEvent& b) {
    // A taxon appears before it disappears, so its base is older than its top in every hole.
    if (a.kind == SequenceEventKind::Base && b.kind == SequenceEventKind::Top &&
        a.taxon == b.taxon)
        return kRuleBaseBeforeTop;
    // Two dates order their horizons only where the ages differ by more than two combined sds
    // (about 95 % for normal errors: common practice); closer dates may lie either way.
    if (a.kind == SequenceEventKind::Dated && b.kind == SequenceEventKind::Dated && a.age_ma &&
        b.age_ma) {
        const double sa = a.age_sd_ma.value_or(0.0);
        const double sb = b.age_sd_ma.value_or(0.0);
        if (*a.age_ma - *b.age_ma > 2.0 * std::hypot(sa, sb))
            return kRuleDatedAges;
    }
    return nullptr;
}

DirectObservations::DirectObservations(const CorrelationData& data)
    : data_(data), by_event_(data.events.size()) {
    for (std::size_t i = 0; i < data.levels.size(); ++i)
        by_event_[data.levels[i].event].emplace_back(data.levels[i].hole, i);
    for (auto& list : by_event_)
        std::sort(list.begin(), list.end());
}

std::vector<std::size_t> DirectObservations::holesShowingBelow(std::size_t older,
                                                               std::size_t younger) const {
    std::vector<std::size_t> holes;
    const auto& a = by_event_[older];
    const auto& b = by_event_[younger];
    // Both lists ascend by hole: walk them together.
    std::size_t i = 0, j = 0;
    while (i < a.size() && j < b.size()) {
        if (a[i].first < b[j].first) {
            ++i;
        } else if (b[j].first < a[i].first) {
            ++j;
        } else {
            if (data_.levels[a[i].second].shallow_m > data_.levels[b[j].second].deep_m)
                holes.push_back(a[i].first);
            ++i;
            ++j;
        }
    }
    return holes;
}

const EventLevel& DirectObservations::levelIn(std::size_t event, std::size_t hole) const {
    const auto& list = by_event_[event];
    const auto it = std::lower_bound(list.begin(), list.end(),
                                     std::pair<std::size_t, std::size_t>{hole, 0});
    return data_.levels[it->second];
}

std::optional<double> DirectObservations::meanLevel(std::size_t event) const {
    const auto& list = by_event_[event];
    if (list.empty())
        return std::nullopt;
    // Each term divided first, so depths near the largest double cannot overflow the sum.
    const double n = static_cast<double>(list.size());
    double mean = 0;
    for (const auto& [hole, level] : list)
        mean += data_.levels[level].level_m / n;
    return mean;
}

} // namespace atollog::detail
