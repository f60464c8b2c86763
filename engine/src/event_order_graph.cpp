// buildEventOrderGraph: edges, strongly connected components (Tarjan 1972, "Depth-first search
// and linear graph algorithms", SIAM J. Comput. 1(2), through boost::strong_components), the
// first composite order, and the conflicts of each component of more than one event.
#include "atollog/engine/event_order_graph.hpp"

#include "event_order_graph_parts.hpp"

#include <boost/graph/adjacency_list.hpp>
#include <boost/graph/strong_components.hpp>

#include <algorithm>
#include <set>
#include <vector>

namespace atollog {

namespace {
/// Enough to show every distinct contradiction of a component the size of a field campaign's.
constexpr std::size_t kMaxCyclesPerComponent = 200;
} // namespace

EventOrderGraph buildEventOrderGraph(const CorrelationData& data) {
    validateCorrelationData(data);
    EventOrderGraph out;
    out.edges = detail::collectOrderEdges(data);

    const std::size_t n = data.events.size();
    using Graph = boost::adjacency_list<boost::vecS, boost::vecS, boost::directedS>;
    Graph graph(n);
    detail::Successors next(n);
    for (const OrderEdge& e : out.edges) {
        boost::add_edge(e.older, e.younger, graph);
        next[e.older].push_back(e.younger); // ascending: the edges are sorted
    }
    out.component.assign(n, 0);
    if (n > 0)
        boost::strong_components(
            graph, boost::make_iterator_property_map(out.component.begin(),
                                                     boost::get(boost::vertex_index, graph)));

    const detail::DirectObservations seen(data);
    out.first_composite = detail::orderFirstComposite(data, out.edges, seen, out.component);

    // Conflicts in component order; first_composite holds each component's events together.
    for (std::size_t i = 0; i < out.first_composite.size();) {
        const int c = out.component[out.first_composite[i]];
        std::vector<std::size_t> members;
        for (; i < out.first_composite.size() && out.component[out.first_composite[i]] == c; ++i)
            members.push_back(out.first_composite[i]);
        if (members.size() < 2)
            continue;
        std::sort(members.begin(), members.end());
        // The component's shortest cycle first, then cycles through every edge not yet shown;
        // the same cycle (after shortening) is reported once.
        std::set<std::vector<std::size_t>> shown;
        auto report = [&](const std::vector<std::size_t>& cycle) {
            std::vector<std::size_t> shortened = detail::shortenCycle(cycle, data, seen);
            if (shown.insert(shortened).second)
                out.conflicts.push_back(detail::describeConflict(shortened, data, seen));
        };
        report(detail::shortestCycleInComponent(next, out.component, c, members));
        for (const auto& cycle :
             detail::cyclesCoveringComponent(next, out.component, c, kMaxCyclesPerComponent))
            report(cycle);
    }
    return out;
}

} // namespace atollog
