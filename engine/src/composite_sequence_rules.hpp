#pragma once
// The hard constraints of the composite sequence: each taxon's base precedes its top, and dated
// horizons keep the order of their ages where the ages differ by more than two combined sds.
// No move of the annealer and no start order may break them.
#include "atollog/engine/correlation_data.hpp"

#include <cstddef>
#include <cstdint>
#include <vector>

namespace atollog::detail {

/// rule[a * n + b]: kFirst when a must precede b, kSecond when b must precede a, 0 otherwise.
/// One byte per pair (1,000 events: 1 MB), read beside the pair-cost row in the annealer.
struct OrderRules {
    static constexpr std::uint8_t kFirst = 1, kSecond = 2;
    std::size_t n = 0;
    std::vector<std::uint8_t> rule;
    bool mustPrecede(std::size_t a, std::size_t b) const { return rule[a * n + b] == kFirst; }
};

/// Builds the rules from valid data. Throws std::invalid_argument when a taxon has two bases or
/// two tops (which of them would bound its range is undefined).
OrderRules hardOrderRules(const CorrelationData& data);

/// Our own start: events by their mean relative depth in the holes they were seen in (0 at the
/// hole's shallowest observed level, 1 at its deepest; 0.5 for an event seen nowhere), deepest
/// (oldest) first, then put in an order that respects the rules by a topological sort that
/// always takes the deepest event free to go next (ties: lower event index).
std::vector<std::size_t> meanLevelStartOrder(const CorrelationData& data, const OrderRules& rules);

/// The events in an order that respects the rules, by a topological sort that always takes the
/// free event of highest key next (ties: lower event index). key has one entry per event.
std::vector<std::size_t> ruleRespectingOrder(const OrderRules& rules,
                                             const std::vector<double>& key);

/// A given start made to respect the rules: the same topological sort, taking events in the
/// start's order wherever the rules allow (an order that already respects them comes back
/// unchanged). Throws std::invalid_argument unless `start` is a permutation of the events.
std::vector<std::size_t> repairedStartOrder(const CorrelationData& data, const OrderRules& rules,
                                            const std::vector<std::size_t>& start);

/// Throws std::invalid_argument naming the problem unless `order` is a permutation of all events
/// that respects the rules. `what` names the order in the message.
void checkOrder(const CorrelationData& data, const OrderRules& rules,
                const std::vector<std::size_t>& order, const char* what);

} // namespace atollog::detail
