#include "composite_sequence_rules.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <queue>
#include <stdexcept>
#include <string>
#include <utility>

namespace atollog::detail {

namespace {

void setRule(OrderRules& r, std::size_t first, std::size_t second) {
    r.rule[first * r.n + second] = OrderRules::kFirst;
    r.rule[second * r.n + first] = OrderRules::kSecond;
}

} // namespace

OrderRules hardOrderRules(const CorrelationData& data) {
    OrderRules r;
    r.n = data.events.size();
    r.rule.assign(r.n * r.n, 0);
    constexpr std::size_t kNone = static_cast<std::size_t>(-1);
    std::map<std::string, std::pair<std::size_t, std::size_t>> taxa; // base, top
    std::vector<std::size_t> dated;
    for (std::size_t e = 0; e < r.n; ++e) {
        const SequenceEvent& ev = data.events[e];
        if (ev.kind == SequenceEventKind::Dated) {
            dated.push_back(e);
            continue;
        }
        auto& bt = taxa.try_emplace(ev.taxon, kNone, kNone).first->second;
        std::size_t& slot = ev.kind == SequenceEventKind::Base ? bt.first : bt.second;
        if (slot != kNone)
            throw std::invalid_argument("composite sequence: taxon '" + ev.taxon + "' has two " +
                                        (ev.kind == SequenceEventKind::Base ? "bases" : "tops") +
                                        " ('" + data.events[slot].id + "' and '" + ev.id + "')");
        slot = e;
    }
    for (const auto& [taxon, bt] : taxa)
        if (bt.first != kNone && bt.second != kNone)
            setRule(r, bt.first, bt.second);
    // Ages differing by more than two combined sds keep their order (common practice for
    // "distinguishable"; the same rule the pick-conflict review uses). A missing sd counts as 0.
    for (std::size_t i = 0; i < dated.size(); ++i)
        for (std::size_t j = i + 1; j < dated.size(); ++j) {
            const SequenceEvent& a = data.events[dated[i]];
            const SequenceEvent& b = data.events[dated[j]];
            const double sa = a.age_sd_ma.value_or(0.0), sb = b.age_sd_ma.value_or(0.0);
            const double limit = 2.0 * std::sqrt(sa * sa + sb * sb);
            if (*a.age_ma - *b.age_ma > limit)
                setRule(r, dated[i], dated[j]); // a is older: it comes first
            else if (*b.age_ma - *a.age_ma > limit)
                setRule(r, dated[j], dated[i]);
        }
    return r;
}

std::vector<std::size_t> meanLevelStartOrder(const CorrelationData& data, const OrderRules& rules) {
    const std::size_t n = data.events.size();
    // Relative depth, so that a deep hole does not outweigh a shallow one.
    std::vector<double> lo(data.holes.size(), INFINITY), hi(data.holes.size(), -INFINITY);
    for (const EventLevel& l : data.levels) {
        lo[l.hole] = std::min(lo[l.hole], l.level_m);
        hi[l.hole] = std::max(hi[l.hole], l.level_m);
    }
    std::vector<double> sum(n, 0.0);
    std::vector<int> count(n, 0);
    for (const EventLevel& l : data.levels) {
        const double span = hi[l.hole] - lo[l.hole];
        sum[l.event] += span > 0 ? (l.level_m - lo[l.hole]) / span : 0.5;
        ++count[l.event];
    }
    std::vector<double> key(n, 0.5);
    for (std::size_t e = 0; e < n; ++e)
        if (count[e] > 0)
            key[e] = sum[e] / count[e];
    return ruleRespectingOrder(rules, key);
}

std::vector<std::size_t> repairedStartOrder(const CorrelationData& data, const OrderRules& rules,
                                            const std::vector<std::size_t>& start) {
    checkOrder(data, OrderRules{}, start, "composite sequence: start_order"); // a permutation
    std::vector<double> key(start.size());
    for (std::size_t i = 0; i < start.size(); ++i)
        key[start[i]] = static_cast<double>(start.size() - i); // earlier: higher priority
    return ruleRespectingOrder(rules, key);
}

std::vector<std::size_t> ruleRespectingOrder(const OrderRules& rules,
                                             const std::vector<double>& key) {
    const std::size_t n = key.size();
    std::vector<std::size_t> waiting(n, 0); // rules still to satisfy before e may go
    for (std::size_t a = 0; a < n; ++a)
        for (std::size_t b = 0; b < n; ++b)
            if (rules.mustPrecede(a, b))
                ++waiting[b];
    auto later = [&](std::size_t a, std::size_t b) { // priority: highest key first, then index
        return key[a] != key[b] ? key[a] < key[b] : a > b;
    };
    std::priority_queue<std::size_t, std::vector<std::size_t>, decltype(later)> ready(later);
    for (std::size_t e = 0; e < n; ++e)
        if (waiting[e] == 0)
            ready.push(e);
    std::vector<std::size_t> order;
    order.reserve(n);
    while (!ready.empty()) {
        const std::size_t e = ready.top();
        ready.pop();
        order.push_back(e);
        for (std::size_t b = 0; b < n; ++b)
            if (rules.mustPrecede(e, b) && --waiting[b] == 0)
                ready.push(b);
    }
    // The rules come from one base/top pair per taxon and a strict order of ages: never a
    // cycle, so every event is placed.
    return order;
}

void checkOrder(const CorrelationData& data, const OrderRules& rules,
                const std::vector<std::size_t>& order, const char* what) {
    const std::size_t n = data.events.size();
    const std::string name = what;
    if (order.size() != n)
        throw std::invalid_argument(name + " has " + std::to_string(order.size()) +
                                    " entries for " + std::to_string(n) + " events");
    std::vector<std::size_t> rank(n, n);
    for (std::size_t i = 0; i < n; ++i) {
        if (order[i] >= n || rank[order[i]] != n)
            throw std::invalid_argument(name + " is not a permutation of the events (entry " +
                                        std::to_string(i) + " is " + std::to_string(order[i]) +
                                        ")");
        rank[order[i]] = i;
    }
    if (rules.n != n)
        return;
    for (std::size_t a = 0; a < n; ++a)
        for (std::size_t b = 0; b < n; ++b)
            if (rules.mustPrecede(a, b) && rank[a] > rank[b])
                throw std::invalid_argument(name + " places '" + data.events[b].id +
                                            "' before '" + data.events[a].id +
                                            "', which must come first (a base before its top, "
                                            "distinguishable dated horizons by age)");
}

} // namespace atollog::detail
