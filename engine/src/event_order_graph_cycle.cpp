// A short cycle to show for each contradiction: breadth-first search inside one strongly
// connected component, then shortened through direct observations between the cycle's events.
#include "event_order_graph_parts.hpp"

#include <algorithm>
#include <deque>
#include <set>
#include <utility>

namespace atollog::detail {

namespace {

/// Shortest cycle of a small dense graph given as an adjacency matrix; empty if none.
std::vector<std::size_t> shortestCycleOfMatrix(const std::vector<std::vector<bool>>& step) {
    const std::size_t m = step.size();
    std::vector<std::size_t> best;
    std::vector<std::size_t> parent(m);
    std::vector<int> dist(m);
    for (std::size_t s = 0; s < m; ++s) {
        std::fill(dist.begin(), dist.end(), -1);
        dist[s] = 0;
        std::deque<std::size_t> queue{s};
        bool found = false;
        while (!queue.empty() && !found) {
            const std::size_t u = queue.front();
            queue.pop_front();
            if (!best.empty() && static_cast<std::size_t>(dist[u]) + 1 >= best.size())
                break;
            for (std::size_t w = 0; w < m && !found; ++w) {
                if (!step[u][w])
                    continue;
                if (w == s) {
                    std::vector<std::size_t> cycle;
                    for (std::size_t x = u; x != s; x = parent[x])
                        cycle.push_back(x);
                    cycle.push_back(s);
                    std::reverse(cycle.begin(), cycle.end());
                    best = std::move(cycle);
                    found = true;
                } else if (dist[w] < 0) {
                    dist[w] = dist[u] + 1;
                    parent[w] = u;
                    queue.push_back(w);
                }
            }
        }
    }
    return best;
}

} // namespace

std::vector<std::size_t> shortestCycleInComponent(const Successors& next,
                                                  const std::vector<int>& component, int c,
                                                  const std::vector<std::size_t>& members) {
    // Girth by one BFS per member (the first return to the source is the shortest cycle through
    // it). A search stops expanding once a return could no longer beat the best cycle, so with
    // the common two- and three-event contradictions each search looks at a few edges only.
    std::vector<std::size_t> best;
    std::vector<int> dist(next.size(), -1);
    std::vector<std::size_t> parent(next.size());
    std::vector<std::size_t> touched;
    std::deque<std::size_t> queue;
    for (std::size_t source : members) {
        if (best.size() == 2)
            break; // no self-loops, so nothing is shorter
        for (std::size_t t : touched)
            dist[t] = -1;
        touched.assign(1, source);
        dist[source] = 0;
        queue.assign(1, source);
        bool found = false;
        while (!queue.empty() && !found) {
            const std::size_t u = queue.front();
            queue.pop_front();
            if (!best.empty() && static_cast<std::size_t>(dist[u]) + 1 >= best.size())
                break;
            for (std::size_t w : next[u]) {
                if (component[w] != c)
                    continue;
                if (w == source) {
                    std::vector<std::size_t> cycle;
                    for (std::size_t x = u; x != source; x = parent[x])
                        cycle.push_back(x);
                    cycle.push_back(source);
                    std::reverse(cycle.begin(), cycle.end());
                    best = std::move(cycle);
                    found = true;
                    break;
                }
                if (dist[w] < 0) {
                    dist[w] = dist[u] + 1;
                    parent[w] = u;
                    touched.push_back(w);
                    queue.push_back(w);
                }
            }
        }
    }
    return best;
}

std::vector<std::vector<std::size_t>> cyclesCoveringComponent(const Successors& next,
                                                              const std::vector<int>& component,
                                                              int c, std::size_t limit) {
    std::vector<std::vector<std::size_t>> cycles;
    std::set<std::pair<std::size_t, std::size_t>> covered;
    std::vector<int> dist(next.size(), -1);
    std::vector<std::size_t> parent(next.size());
    std::vector<std::size_t> touched;
    std::deque<std::size_t> queue;
    for (std::size_t u = 0; u < next.size() && cycles.size() < limit; ++u) {
        if (component[u] != c)
            continue;
        for (std::size_t v : next[u]) {
            if (component[v] != c || covered.count({u, v}) || cycles.size() >= limit)
                continue;
            // Shortest path v ~> u inside the component.
            for (std::size_t t : touched)
                dist[t] = -1;
            touched.assign(1, v);
            dist[v] = 0;
            queue.assign(1, v);
            bool reached = v == u;
            while (!queue.empty() && !reached) {
                const std::size_t x = queue.front();
                queue.pop_front();
                for (std::size_t w : next[x]) {
                    if (component[w] != c || dist[w] >= 0)
                        continue;
                    dist[w] = dist[x] + 1;
                    parent[w] = x;
                    touched.push_back(w);
                    if (w == u) {
                        reached = true;
                        break;
                    }
                    queue.push_back(w);
                }
            }
            if (!reached)
                continue; // cannot happen inside a strongly connected component
            std::vector<std::size_t> cycle;
            for (std::size_t x = u; x != v; x = parent[x])
                cycle.push_back(x);
            cycle.push_back(v);
            std::reverse(cycle.begin(), cycle.end()); // v ... u
            std::rotate(cycle.begin(), cycle.end() - 1, cycle.end()); // u, v, ...
            for (std::size_t k = 0; k < cycle.size(); ++k)
                covered.insert({cycle[k], cycle[(k + 1) % cycle.size()]});
            cycles.push_back(std::move(cycle));
        }
    }
    return cycles;
}

std::vector<std::size_t> shortenCycle(const std::vector<std::size_t>& cycle,
                                      const CorrelationData& data,
                                      const DirectObservations& seen) {
    // Chords cost a lookup per pair of the cycle's events; beyond 64 events (a component that
    // large has short cycles almost always) the cycle is kept as found.
    constexpr std::size_t kLongestToShorten = 64;
    std::vector<std::size_t> out = cycle;
    if (cycle.size() > 2 && cycle.size() <= kLongestToShorten) {
        const std::size_t m = cycle.size();
        std::vector<std::vector<bool>> step(m, std::vector<bool>(m, false));
        for (std::size_t a = 0; a < m; ++a)
            for (std::size_t b = 0; b < m; ++b)
                if (a != b)
                    step[a][b] =
                        ruleOrdering(data.events[cycle[a]], data.events[cycle[b]]) != nullptr ||
                        !seen.holesShowingBelow(cycle[a], cycle[b]).empty();
        const std::vector<std::size_t> positions = shortestCycleOfMatrix(step);
        if (!positions.empty() && positions.size() < m) {
            out.clear();
            for (std::size_t p : positions)
                out.push_back(cycle[p]);
        }
    }
    std::rotate(out.begin(), std::min_element(out.begin(), out.end()), out.end());
    return out;
}

} // namespace atollog::detail
