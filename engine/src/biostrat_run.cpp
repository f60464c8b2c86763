#include "atollog/engine/biostrat_run.hpp"

#include <utility>

namespace atollog {

BiostratResult runBiostratigraphy(const CoreDataset& data, const BiostratSettings& settings) {
    BiostratResult r;
    r.ranges = observeRanges(data, settings);
    r.picks = pickDatums(data, settings);
    r.zones = assignZones(data, r.picks);
    PickConflictReport review = reviewPickConflicts(data, r.picks);
    r.conflicts = std::move(review.conflicts);
    r.explained_conflicts = std::move(review.explained);
    std::vector<PickConflict> all = r.conflicts;
    all.insert(all.end(), r.explained_conflicts.begin(), r.explained_conflicts.end());
    r.ties = makeTiePoints(r.picks, all, settings);
    return r;
}

} // namespace atollog
