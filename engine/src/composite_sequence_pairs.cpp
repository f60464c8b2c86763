#include "composite_sequence_pairs.hpp"

#include <algorithm>

namespace atollog::detail {

std::vector<std::vector<HoleObservation>> observationsByHole(const CorrelationData& data) {
    std::vector<std::vector<HoleObservation>> holes(data.holes.size());
    for (const EventLevel& l : data.levels) {
        const std::vector<double>& s = data.sampled_levels_m[l.hole];
        HoleObservation o;
        o.event = l.event;
        o.kind = data.events[l.event].kind;
        o.shallow_m = l.shallow_m;
        o.deep_m = l.deep_m;
        o.levels_above_shallow =
            static_cast<std::size_t>(std::lower_bound(s.begin(), s.end(), l.shallow_m) - s.begin());
        o.levels_to_deep =
            static_cast<std::size_t>(std::upper_bound(s.begin(), s.end(), l.deep_m) - s.begin());
        holes[l.hole].push_back(o);
    }
    return holes;
}

double orderedPairCost(const HoleObservation& older, const HoleObservation& younger,
                       MisfitUnit unit) {
    const double gap_m = younger.shallow_m - older.deep_m;
    if (!(gap_m > 0))
        return 0; // brackets overlap or the older event lies below: the hole agrees
    double cost = 1;
    if (unit == MisfitUnit::Metres) {
        cost = gap_m;
    } else if (unit == MisfitUnit::Levels) {
        // Levels strictly between the brackets: below older.deep_m and above younger.shallow_m.
        const std::size_t between = younger.levels_above_shallow > older.levels_to_deep
                                        ? younger.levels_above_shallow - older.levels_to_deep
                                        : 0;
        cost = static_cast<double>(std::max<std::size_t>(between, 1));
    }
    // Either one-sided move resolves the pair by the same gap, so the cheaper of the two
    // allowed moves costs the unit cost itself; only when neither is allowed is it penalised.
    const bool movable =
        older.kind == SequenceEventKind::Base || younger.kind == SequenceEventKind::Top;
    return movable ? cost : cost * kInfeasiblePairPenalty;
}

double misfitFromObservations(const std::vector<std::vector<HoleObservation>>& holes,
                              const std::vector<std::size_t>& rank, MisfitUnit unit) {
    double total = 0;
    for (const auto& hole : holes)
        for (std::size_t i = 0; i < hole.size(); ++i)
            for (std::size_t j = i + 1; j < hole.size(); ++j) {
                const bool i_first = rank[hole[i].event] < rank[hole[j].event];
                total += i_first ? orderedPairCost(hole[i], hole[j], unit)
                                 : orderedPairCost(hole[j], hole[i], unit);
            }
    return total;
}

std::vector<double> pairCostMatrix(const CorrelationData& data, MisfitUnit unit) {
    const std::size_t n = data.events.size();
    std::vector<double> cost(n * n, 0.0);
    for (auto hole : observationsByHole(data)) {
        // By event index, so that each row is written front to back.
        std::sort(hole.begin(), hole.end(), [](const HoleObservation& a, const HoleObservation& b) {
            return a.event < b.event;
        });
        for (std::size_t i = 0; i < hole.size(); ++i) {
            const HoleObservation& a = hole[i];
            double* row = &cost[a.event * n];
            for (std::size_t j = i + 1; j < hole.size(); ++j) {
                const HoleObservation& b = hole[j];
                row[b.event] += orderedPairCost(a, b, unit);
                cost[b.event * n + a.event] += orderedPairCost(b, a, unit);
            }
        }
    }
    return cost;
}

double misfitFromMatrix(const std::vector<double>& cost, const std::vector<std::size_t>& order) {
    const std::size_t n = order.size();
    double total = 0;
    for (std::size_t i = 0; i < n; ++i) {
        const double* row = &cost[order[i] * n];
        for (std::size_t j = i + 1; j < n; ++j)
            total += row[order[j]];
    }
    return total;
}

} // namespace atollog::detail
