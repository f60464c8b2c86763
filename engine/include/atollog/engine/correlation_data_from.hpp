#pragma once
// CorrelationData from a project's analyses: the datum picks of every hole (bases and tops of
// the time scale's taxa) and its usable numerical dates (dated horizons), with the examined
// sample levels and logged surfaces of each hole.
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/correlation_data.hpp"
#include "atollog/engine/date_ages.hpp"
#include "atollog/engine/datum_picks.hpp"
#include "atollog/engine/logged_surfaces.hpp"

#include <vector>

namespace atollog {

struct CorrelationDataOptions {
    /// Brackets from the range-extended picks (DatumPick::extended) instead of the widened ones.
    bool use_extended_brackets = false;
    /// Usable dates become dated horizons (one event each, "date <method> <sample or depth>").
    bool include_dates = true;
};

/// Every found pick except those whose datum the hole does not record: open-ended picks (the
/// taxon is in the first or last examined sample), bases truncated at the basement, and bases
/// in cuttings holes flagged unreliable. An event enters only when some hole observes it.
/// Levels: a base at its lowest find, a top at its highest, a date at its sample. Holes in
/// dataset order; events in time-scale order, then dates in row order.
CorrelationData correlationDataFrom(const CoreDataset& data, const std::vector<DatumPick>& picks,
                                    const std::vector<DateAge>& dates,
                                    const std::vector<LoggedSurface>& surfaces,
                                    const CorrelationDataOptions& options = {});

} // namespace atollog
