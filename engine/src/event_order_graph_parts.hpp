#pragma once
// The pieces buildEventOrderGraph is made of, each in its own event_order_graph_*.cpp: the edges
// (per-hole covering pairs and rule edges), a lookup of direct observations between two events,
// the shortest cycle inside a component, the conflict sentence, and the first composite order.
#include "atollog/engine/correlation_data.hpp"
#include "atollog/engine/event_order_graph.hpp"

#include <cstddef>
#include <optional>
#include <utility>
#include <vector>

namespace atollog::detail {

/// The rule that makes `a` older than `b` regardless of any hole, or nullptr: a base of the same
/// taxon before its top (kRuleBaseBeforeTop), or a dated horizon older than another by more than
/// two combined sds (kRuleDatedAges).
const char* ruleOrdering(const SequenceEvent& a, const SequenceEvent& b);

/// All edges: the covering pairs of each hole merged over holes, plus the rule edges; sorted by
/// (older, younger), one per ordered pair.
std::vector<OrderEdge> collectOrderEdges(const CorrelationData& data);

/// Where each event was observed, by hole, to ask whether a hole shows one event wholly below
/// another (an order that may have been dropped from the edges as implied within that hole).
class DirectObservations {
  public:
    explicit DirectObservations(const CorrelationData& data);
    /// Ascending holes in which `older`'s bracket lies wholly below `younger`'s.
    std::vector<std::size_t> holesShowingBelow(std::size_t older, std::size_t younger) const;
    /// The level of `event` in `hole`; the pair must have been observed.
    const EventLevel& levelIn(std::size_t event, std::size_t hole) const;
    /// Mean observed level over the holes that saw `event`; nullopt when none did.
    std::optional<double> meanLevel(std::size_t event) const;

  private:
    const CorrelationData& data_;
    /// Per event: (hole, index into data.levels), ascending by hole.
    std::vector<std::vector<std::pair<std::size_t, std::size_t>>> by_event_;
};

/// Out-neighbours per event, ascending (from the sorted edges).
using Successors = std::vector<std::vector<std::size_t>>;

/// A shortest directed cycle through the events of component `c` using only edges inside it, by
/// a breadth-first search from each member, pruned at the shortest length found so far. Members
/// are tried in ascending order, so ties go to the cycle found first. Empty if there is none.
std::vector<std::size_t> shortestCycleInComponent(const Successors& next,
                                                  const std::vector<int>& component, int c,
                                                  const std::vector<std::size_t>& members);

/// Short cycles that together use every edge inside component `c` (at most `limit` of them):
/// for each edge u -> v not yet on a reported cycle, in edge order, the shortest path v ~> u
/// inside the component closes a cycle through it. Why more than one per component: one faulty
/// pick can tie dozens of events into one component, and a single cycle would hide the other
/// contradictions in it.
std::vector<std::vector<std::size_t>> cyclesCoveringComponent(const Successors& next,
                                                              const std::vector<int>& component,
                                                              int c, std::size_t limit);

/// The cycle made shorter through steps between its own events that a hole shows directly or a
/// rule gives (a shortest cycle of that small graph), rotated to start at its lowest event index.
std::vector<std::size_t> shortenCycle(const std::vector<std::size_t>& cycle,
                                      const CorrelationData& data,
                                      const DirectObservations& seen);

/// The conflict for a cycle: its holes and one sentence naming events, holes and depths.
OrderConflict describeConflict(const std::vector<std::size_t>& cycle, const CorrelationData& data,
                               const DirectObservations& seen);

/// Events oldest first from the components and the edges (see EventOrderGraph::first_composite);
/// also renumbers `component` so that components follow that order.
std::vector<std::size_t> orderFirstComposite(const CorrelationData& data,
                                             const std::vector<OrderEdge>& edges,
                                             const DirectObservations& seen,
                                             std::vector<int>& component);

} // namespace atollog::detail
