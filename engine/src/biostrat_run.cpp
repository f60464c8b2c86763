#include "atollog/engine/biostrat_run.hpp"

namespace atollog {

BiostratResult runBiostratigraphy(const CoreDataset& data, const BiostratSettings& settings) {
    BiostratResult r;
    r.ranges = observeRanges(data, settings);
    r.picks = pickDatums(data, settings);
    r.zones = assignZones(data, r.picks);
    r.conflicts = findPickConflicts(data, r.picks);
    r.ties = makeTiePoints(r.picks, r.conflicts, settings);
    return r;
}

} // namespace atollog
