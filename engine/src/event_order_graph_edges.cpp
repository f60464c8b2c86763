// The edges of the event-order graph: per hole its covering pairs (transitive reduction of that
// hole's order), merged over holes; then the edges that rules give.
#include "event_order_graph_parts.hpp"

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <limits>
#include <map>
#include <string>
#include <unordered_map>
#include <utility>

namespace atollog::detail {

namespace {

/// Collects supports into one edge per ordered pair.
class EdgeMerger {
  public:
    explicit EdgeMerger(std::size_t events) : events_(events) {}

    OrderEdge& edge(std::size_t older, std::size_t younger) {
        const std::uint64_t key = static_cast<std::uint64_t>(older) * events_ + younger;
        const auto [it, added] = index_.try_emplace(key, edges_.size());
        if (added) {
            edges_.emplace_back();
            edges_.back().older = older;
            edges_.back().younger = younger;
        }
        return edges_[it->second];
    }

    std::vector<OrderEdge> sorted() && {
        std::sort(edges_.begin(), edges_.end(), [](const OrderEdge& a, const OrderEdge& b) {
            return a.older != b.older ? a.older < b.older : a.younger < b.younger;
        });
        return std::move(edges_);
    }

  private:
    std::uint64_t events_;
    std::unordered_map<std::uint64_t, std::size_t> index_;
    std::vector<OrderEdge> edges_;
};

/// Adds the covering pairs of hole `hole`, whose levels are `levels` (indices into data.levels).
///
/// Older i lies below younger j when shallow_i > deep_j. Sort the hole's levels by deep end;
/// the candidates for i are the prefix with deep < shallow_i. A candidate j is implied through a
/// third level k when k is itself a candidate (deep_k < shallow_i) and lies below j
/// (shallow_k > deep_j). With M = the largest shallow end in the prefix, j is therefore a covering
/// pair exactly when deep_j >= M: a contiguous run at the end of the prefix, found by two binary
/// searches and a prefix maximum. The level that gives M is always in that run, so every level
/// with candidates keeps at least one edge. Cost: k log k plus the edges kept.
void addCoveringPairs(const CorrelationData& data, std::size_t hole,
                      std::vector<std::size_t>& levels, EdgeMerger& merger) {
    const auto& all = data.levels;
    std::sort(levels.begin(), levels.end(), [&](std::size_t a, std::size_t b) {
        if (all[a].deep_m != all[b].deep_m)
            return all[a].deep_m < all[b].deep_m;
        return all[a].event < all[b].event; // deterministic among equal deep ends
    });
    std::vector<double> deep(levels.size()), max_shallow(levels.size());
    for (std::size_t i = 0; i < levels.size(); ++i) {
        deep[i] = all[levels[i]].deep_m;
        max_shallow[i] = std::max(i == 0 ? all[levels[i]].shallow_m : max_shallow[i - 1],
                                  all[levels[i]].shallow_m);
    }
    for (std::size_t li : levels) {
        const EventLevel& older = all[li];
        const auto end = static_cast<std::size_t>(
            std::lower_bound(deep.begin(), deep.end(), older.shallow_m) - deep.begin());
        if (end == 0)
            continue; // nothing lies wholly above this level
        const double m = max_shallow[end - 1];
        const auto begin = static_cast<std::size_t>(
            std::lower_bound(deep.begin(), deep.begin() + static_cast<std::ptrdiff_t>(end), m) -
            deep.begin());
        for (std::size_t j = begin; j < end; ++j) {
            const EventLevel& younger = all[levels[j]];
            OrderEdge& e = merger.edge(older.event, younger.event);
            e.holes.push_back(hole);
            // Depths near the largest doubles may give an infinite gap; keep it finite.
            const double gap = older.shallow_m - younger.deep_m;
            e.separations_m.push_back(std::isfinite(gap) ? gap
                                                         : std::numeric_limits<double>::max());
        }
    }
}

} // namespace

std::vector<OrderEdge> collectOrderEdges(const CorrelationData& data) {
    EdgeMerger merger(data.events.size());
    std::vector<std::vector<std::size_t>> per_hole(data.holes.size());
    for (std::size_t i = 0; i < data.levels.size(); ++i)
        per_hole[data.levels[i].hole].push_back(i);
    // Holes in ascending order, so each edge's holes come out ascending.
    for (std::size_t h = 0; h < per_hole.size(); ++h)
        addCoveringPairs(data, h, per_hole[h], merger);

    // Base before top: every base of a taxon to every top of it (normally one of each).
    std::map<std::string, std::pair<std::vector<std::size_t>, std::vector<std::size_t>>> taxa;
    std::vector<std::size_t> dated;
    for (std::size_t i = 0; i < data.events.size(); ++i) {
        const SequenceEvent& e = data.events[i];
        if (e.kind == SequenceEventKind::Base)
            taxa[e.taxon].first.push_back(i);
        else if (e.kind == SequenceEventKind::Top)
            taxa[e.taxon].second.push_back(i);
        else
            dated.push_back(i);
    }
    for (const auto& [taxon, ends] : taxa)
        for (std::size_t b : ends.first)
            for (std::size_t t : ends.second)
                merger.edge(b, t).rule = kRuleBaseBeforeTop;
    // Dated ages: all pairs. Projects carry tens of dates, not thousands, so the square is small;
    // the relation is transitive, but reducing it would cost more code than the edges it saves.
    for (std::size_t a : dated)
        for (std::size_t b : dated)
            if (a != b)
                if (const char* rule = ruleOrdering(data.events[a], data.events[b]))
                    merger.edge(a, b).rule = rule;
    return std::move(merger).sorted();
}

} // namespace atollog::detail
