#pragma once
// What correlation between holes works on: the events (bases and tops of taxa, dated horizons)
// and where each was observed in each hole, as a depth bracket. Plain values, filled from a
// project's datum picks and dates (correlationDataFrom, correlation_data_from.hpp) or by hand in
// tests; the event-order graph, the composite sequence, lines of correlation and isochrons all
// read this one structure.
#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace atollog {

/// A base (lowest occurrence, first appearance) or top (highest occurrence, last appearance)
/// of a taxon, or a dated horizon (one numerical date at its level in one hole).
enum class SequenceEventKind { Base, Top, Dated };

struct SequenceEvent {
    std::string id;    ///< unique; a time-scale event id ("B CYKA-VAS") or "date <sample>"
    SequenceEventKind kind = SequenceEventKind::Base;
    std::string taxon; ///< bases and tops; empty for a dated horizon
    /// A time-scale age (bases and tops given one) or the date's age; dated horizons keep the
    /// order of their ages where they differ by more than two combined sds.
    std::optional<double> age_ma;
    std::optional<double> age_sd_ma;
};

/// Where an event was observed in a hole: it lies somewhere in [shallow_m, deep_m] (depth below
/// the collar, increasing downward); `level_m` is the observed level itself (the lowest find
/// for a base, the highest for a top, the dated sample for a date), inside the bracket.
struct EventLevel {
    std::size_t hole = 0;  ///< index into CorrelationData::holes
    std::size_t event = 0; ///< index into CorrelationData::events
    double shallow_m = 0;
    double deep_m = 0;
    double level_m = 0;
};

struct CorrelationData {
    std::vector<std::string> holes;
    std::vector<SequenceEvent> events;
    std::vector<EventLevel> levels; ///< at most one per (hole, event)
    /// Per hole (same index as holes): the distinct examined sample depths, ascending (the
    /// "sampled levels" a misfit in levels counts).
    std::vector<std::vector<double>> sampled_levels_m;
    /// Per hole: logged surfaces that may be hiatuses (lines of correlation break there).
    std::vector<std::vector<double>> surfaces_m;
};

/// Throws std::invalid_argument naming the entry on: duplicate hole or event ids, an empty id,
/// a level with an index out of range, two levels for one (hole, event), non-finite depths,
/// shallow_m > deep_m, level_m outside its bracket, a base or top without a taxon, a dated
/// horizon without an age, a negative or non-finite age sd, per-hole lists of the wrong count,
/// or unsorted sampled levels.
void validateCorrelationData(const CorrelationData& data);

} // namespace atollog
