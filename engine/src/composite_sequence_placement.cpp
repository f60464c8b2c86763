#include "composite_sequence_placement.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::detail {

namespace {

/// One event's cost per metre moved up (shallower) and down (deeper) from its observed level.
struct Kink {
    double at_m = 0, up = 1, down = 1;
};

Kink kinkOf(const PlacementInput& p) {
    constexpr double P = kInfeasiblePairPenalty;
    switch (p.kind) {
    case SequenceEventKind::Base: return {p.observed_m, P, 1.0};
    case SequenceEventKind::Top: return {p.observed_m, 1.0, P};
    case SequenceEventKind::Dated: break;
    }
    return {p.observed_m, P, P};
}

/// The lowest minimiser of the block's summed cost, a weighted median. Shallower than every kink
/// the slope is -sum(up) (all events would move up to x); passing a kink adds its up and its
/// down; the first kink after which the slope is no longer negative is the lowest minimiser.
double blockMedian(std::vector<Kink>& kinks) {
    std::sort(kinks.begin(), kinks.end(),
              [](const Kink& a, const Kink& b) { return a.at_m < b.at_m; });
    double slope = 0; // slope of the summed cost left of the first kink: every event moves up
    for (const Kink& k : kinks)
        slope -= k.up;
    for (const Kink& k : kinks) {
        slope += k.up + k.down; // passing a kink turns its "moving up" into "moving down"
        if (slope >= 0)
            return k.at_m;
    }
    return kinks.back().at_m; // not reached: the slope ends at +sum(down) > 0
}

} // namespace

std::vector<double> placeInOrder(const std::vector<PlacementInput>& oldest_first) {
    // Youngest first, the placed depths must not decrease: isotonic regression by blocks.
    struct Block {
        std::vector<Kink> kinks;
        double depth_m = 0;
    };
    std::vector<Block> blocks;
    for (auto it = oldest_first.rbegin(); it != oldest_first.rend(); ++it) {
        blocks.push_back(Block{{kinkOf(*it)}, it->observed_m});
        while (blocks.size() > 1 && blocks[blocks.size() - 2].depth_m > blocks.back().depth_m) {
            Block top = std::move(blocks.back());
            blocks.pop_back();
            Block& prev = blocks.back();
            prev.kinks.insert(prev.kinks.end(), top.kinks.begin(), top.kinks.end());
            prev.depth_m = blockMedian(prev.kinks);
        }
    }
    std::vector<double> placed;
    placed.reserve(oldest_first.size());
    for (const Block& b : blocks)
        placed.insert(placed.end(), b.kinks.size(), b.depth_m);
    std::reverse(placed.begin(), placed.end());
    return placed;
}

std::vector<HoleExtension> holeExtensions(const CorrelationData& data,
                                          const std::vector<std::size_t>& order) {
    std::vector<std::size_t> rank(order.size());
    for (std::size_t i = 0; i < order.size(); ++i)
        rank[order[i]] = i;
    std::vector<std::vector<const EventLevel*>> by_hole(data.holes.size());
    for (const EventLevel& l : data.levels)
        by_hole[l.hole].push_back(&l);
    std::vector<HoleExtension> out;
    for (std::size_t h = 0; h < by_hole.size(); ++h) {
        auto& ls = by_hole[h];
        std::sort(ls.begin(), ls.end(), [&](const EventLevel* a, const EventLevel* b) {
            return rank[a->event] < rank[b->event];
        });
        std::vector<PlacementInput> in;
        for (const EventLevel* l : ls)
            in.push_back({data.events[l->event].kind, l->level_m});
        const std::vector<double> placed = placeInOrder(in);
        for (std::size_t i = 0; i < ls.size(); ++i) {
            const double moved = placed[i] - in[i].observed_m; // > 0: deeper
            if (moved == 0)
                continue;
            const SequenceEventKind k = in[i].kind;
            const bool allowed = (k == SequenceEventKind::Base && moved > 0) ||
                                 (k == SequenceEventKind::Top && moved < 0);
            out.push_back(HoleExtension{h, ls[i]->event, in[i].observed_m, placed[i],
                                        std::fabs(moved), !allowed});
        }
    }
    return out;
}

} // namespace atollog::detail
