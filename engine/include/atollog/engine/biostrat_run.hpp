#pragma once
// The whole biostratigraphy of a dataset in one call, for the command line and the project file:
// ranges, picks, zones, conflicts and tie points under one set of settings.
#include "atollog/engine/biostrat_settings.hpp"
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/datum_picks.hpp"
#include "atollog/engine/observed_ranges.hpp"
#include "atollog/engine/pick_conflicts.hpp"
#include "atollog/engine/tie_points.hpp"
#include "atollog/engine/zone_assignment.hpp"

#include <vector>

namespace atollog {

struct BiostratResult {
    std::vector<ObservedRange> ranges;
    std::vector<DatumPick> picks;
    ZoneReport zones;
    std::vector<PickConflict> conflicts;           ///< unexplained: faults to look at
    std::vector<PickConflict> explained_conflicts; ///< explained by a logged surface: notes
    std::vector<TiePoint> ties;
};

/// observeRanges, pickDatums, assignZones, reviewPickConflicts and makeTiePoints (given both the
/// conflicts and the explained notes) in turn. Throws
/// std::invalid_argument as they do.
BiostratResult runBiostratigraphy(const CoreDataset& data, const BiostratSettings& settings);

} // namespace atollog
