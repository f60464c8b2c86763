#pragma once
// Private to the engine: picks found by (hole, event), and the zone-table check shared by the
// zone and conflict code.
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/datum_picks.hpp"

#include <string>
#include <unordered_map>
#include <vector>

namespace atollog::detail {

class PickLookup {
  public:
    explicit PickLookup(const std::vector<DatumPick>& picks) {
        for (const DatumPick& p : picks)
            map_.emplace(p.hole + '\n' + p.event, &p);
    }
    /// nullptr when no pick for the pair was given.
    const DatumPick* find(const std::string& hole, const std::string& event) const {
        auto it = map_.find(hole + '\n' + event);
        return it == map_.end() ? nullptr : it->second;
    }

  private:
    std::unordered_map<std::string, const DatumPick*> map_;
};

/// Throws std::invalid_argument when a zone names an event missing from the time scale.
void requireKnownZoneEvents(const CoreDataset& data);

} // namespace atollog::detail
