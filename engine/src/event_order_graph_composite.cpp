// The first composite order: the condensed graph (one vertex per strongly connected component)
// in topological order, each component's events together.
//
// Kahn's algorithm with a priority queue rather than boost::topological_sort: the depth-first
// order Boost gives depends on vertex numbering, and the composite must break ties between
// unordered components by a stated rule (age, then id) so that it reads the same whatever order
// the events were listed in.
#include "event_order_graph_parts.hpp"

#include <algorithm>
#include <optional>
#include <queue>
#include <string>

namespace atollog::detail {

namespace {

struct ComponentKey {
    std::optional<double> age_ma;   ///< mean of its events' known ages
    const std::string* first_id{};  ///< its smallest event id
};

/// True when component a should come out before b among components no edge orders.
bool comesFirst(const ComponentKey& a, const ComponentKey& b) {
    if (a.age_ma.has_value() != b.age_ma.has_value())
        return a.age_ma.has_value();
    if (a.age_ma && *a.age_ma != *b.age_ma)
        return *a.age_ma > *b.age_ma; // older first
    return *a.first_id < *b.first_id;
}

std::vector<ComponentKey> componentKeys(const CorrelationData& data,
                                        const std::vector<std::vector<std::size_t>>& members) {
    std::vector<ComponentKey> keys(members.size());
    for (std::size_t c = 0; c < members.size(); ++c) {
        double mean = 0;
        std::size_t known = 0;
        for (std::size_t e : members[c])
            known += data.events[e].age_ma.has_value() ? 1 : 0;
        for (std::size_t e : members[c]) {
            const SequenceEvent& ev = data.events[e];
            if (ev.age_ma)
                mean += *ev.age_ma / static_cast<double>(known); // divided first: no overflow
            if (!keys[c].first_id || ev.id < *keys[c].first_id)
                keys[c].first_id = &ev.id;
        }
        if (known > 0)
            keys[c].age_ma = mean;
    }
    return keys;
}

} // namespace

std::vector<std::size_t> orderFirstComposite(const CorrelationData& data,
                                             const std::vector<OrderEdge>& edges,
                                             const DirectObservations& seen,
                                             std::vector<int>& component) {
    const std::size_t nc =
        component.empty()
            ? 0
            : static_cast<std::size_t>(*std::max_element(component.begin(), component.end())) + 1;
    std::vector<std::vector<std::size_t>> members(nc);
    for (std::size_t e = 0; e < component.size(); ++e)
        members[static_cast<std::size_t>(component[e])].push_back(e);
    const std::vector<ComponentKey> keys = componentKeys(data, members);

    std::vector<std::vector<std::size_t>> later(nc);
    std::vector<std::size_t> waiting_for(nc, 0); // in-degree in the condensed graph
    for (const OrderEdge& e : edges) {
        const auto a = static_cast<std::size_t>(component[e.older]);
        const auto b = static_cast<std::size_t>(component[e.younger]);
        if (a != b) {
            later[a].push_back(b);
            ++waiting_for[b];
        }
    }
    const auto after = [&](std::size_t a, std::size_t b) { return comesFirst(keys[b], keys[a]); };
    std::priority_queue<std::size_t, std::vector<std::size_t>, decltype(after)> ready(after);
    for (std::size_t c = 0; c < nc; ++c)
        if (waiting_for[c] == 0)
            ready.push(c);
    std::vector<int> rank(nc, -1);
    std::vector<std::size_t> composite;
    composite.reserve(component.size());
    int next_rank = 0;
    while (!ready.empty()) {
        const std::size_t c = ready.top();
        ready.pop();
        rank[c] = next_rank++;
        // Inside a component the holes disagree; the mean observed level (deepest first) is a
        // neutral start for the composite sequence to improve on.
        std::vector<std::pair<std::optional<double>, std::size_t>> inside;
        for (std::size_t e : members[c])
            inside.emplace_back(seen.meanLevel(e), e);
        std::sort(inside.begin(), inside.end(), [&](const auto& x, const auto& y) {
            if (x.first.has_value() != y.first.has_value())
                return x.first.has_value();
            if (x.first && *x.first != *y.first)
                return *x.first > *y.first;
            return data.events[x.second].id < data.events[y.second].id;
        });
        for (const auto& [level, e] : inside)
            composite.push_back(e);
        for (std::size_t d : later[c])
            if (--waiting_for[d] == 0)
                ready.push(d);
    }
    for (int& c : component)
        c = rank[static_cast<std::size_t>(c)];
    return composite;
}

} // namespace atollog::detail
