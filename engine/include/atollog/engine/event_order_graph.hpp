#pragma once
// The order of events that the holes and two rules imply, as a directed graph (older -> younger),
// its strongly connected components (Tarjan 1972, through Boost.Graph) and a first composite
// order. A component of more than one event is a contradiction: the holes disagree on the order
// of its events, and at least one pick in it is misplaced (Shaw 1964: where sections disagree on
// the order of events, a pick is at fault, not time). The composite sequence starts from this.
//
// Per hole only the covering pairs are kept (the transitive reduction of that hole's order): an
// edge older -> younger is added when no third event of the same hole lies wholly between them.
// A hole's order is an interval order (transitive: A below B below C puts A below C), so the
// dropped pairs are implied by kept paths of the same hole; the components and every topological
// order are the same as with all pairs. Well-spaced picks give about one edge per event and hole
// instead of k^2/2; many events sharing one coarse bracket (cuttings) still give one edge per pair
// between neighbouring groups, since then every such pair is a covering pair.
#include "atollog/engine/correlation_data.hpp"

#include <cstddef>
#include <string>
#include <vector>

namespace atollog {

inline constexpr const char* kRuleBaseBeforeTop = "base before top";
inline constexpr const char* kRuleDatedAges = "dated ages";

/// `older` lies wholly below `younger` (its bracket's shallow end deeper than the other's deep
/// end; touching or overlapping brackets give no order) in each hole listed, as a covering pair
/// of that hole; separations_m[i] = the gap between the brackets in holes[i]. Holes ascending.
/// Edges that a rule gives rather than a hole: a taxon's base is older than its top (rule
/// kRuleBaseBeforeTop), dated horizons whose ages differ by more than 2 sqrt(sd1^2 + sd2^2)
/// (kRuleDatedAges; a missing sd counts as 0). An edge that a rule gives and holes show too
/// keeps both: its holes and the rule. `rule` is empty for an edge that only holes give.
struct OrderEdge {
    std::size_t older = 0, younger = 0;
    std::vector<std::size_t> holes;
    std::vector<double> separations_m;
    std::string rule;
};

/// A contradiction: a cycle inside one strongly connected component, events in cycle order
/// (each older than the next by some hole's observation or a rule), starting at its lowest event
/// index. It is a shortest cycle of `edges` inside the component, then shortened where a hole
/// shows one of its events wholly below another of them directly (an order implied within that
/// hole, whose edge was dropped as transitive); so its length is at most that of the shortest
/// cycle of `edges` there. More cycles may exist in the component.
/// `holes`: every hole that shows one of the cycle's steps (ascending). `message`: one sentence
/// naming the events, holes and depths of each step.
struct OrderConflict {
    std::vector<std::size_t> cycle;
    std::vector<std::size_t> holes;
    std::string message;
};

struct EventOrderGraph {
    std::vector<OrderEdge> edges; ///< sorted by (older, younger); one edge per ordered pair
    /// Per event: its strongly connected component, numbered in first_composite order (the
    /// oldest component is 0), so an edge between components goes from a lower to a higher one.
    std::vector<int> component;
    /// Per component with more than one event, in component order: its shortest cycle first,
    /// then short cycles through every edge of the component not yet on one (at most 200 per
    /// component), each shortened and reported once. One faulty pick can tie dozens of events
    /// into one component; one cycle alone would hide the other contradictions in it.
    std::vector<OrderConflict> conflicts;
    /// All events, oldest first: a topological order of the condensed graph with the events of
    /// one component kept together, ordered inside it by mean observed level (deepest first; an
    /// event seen in no hole last) then id. Components that no edge orders are taken by age
    /// (older first; a component's age is the mean of its events' known ages; components without
    /// one after those with), then by their smallest event id.
    std::vector<std::size_t> first_composite;
};

/// Validates `data` first (validateCorrelationData; its std::invalid_argument passes through).
EventOrderGraph buildEventOrderGraph(const CorrelationData& data);

} // namespace atollog
