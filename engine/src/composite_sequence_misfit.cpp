// sequenceMisfit: the full recompute, straight from the observations (not from the pair-cost
// matrix the annealer reads), so that it checks the incremental update independently.
#include "atollog/engine/composite_sequence.hpp"

#include "composite_sequence_pairs.hpp"
#include "composite_sequence_rules.hpp"

namespace atollog {

double sequenceMisfit(const CorrelationData& data, const std::vector<std::size_t>& order,
                      MisfitUnit unit) {
    validateCorrelationData(data);
    detail::checkOrder(data, detail::OrderRules{}, order, "sequenceMisfit: the order");
    std::vector<std::size_t> rank(order.size());
    for (std::size_t i = 0; i < order.size(); ++i)
        rank[order[i]] = i;
    return detail::misfitFromObservations(detail::observationsByHole(data), rank, unit);
}

} // namespace atollog
