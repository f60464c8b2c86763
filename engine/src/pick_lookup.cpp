#include "pick_lookup.hpp"

#include <stdexcept>
#include <unordered_set>

namespace atollog::detail {

void requireKnownZoneEvents(const CoreDataset& data) {
    std::unordered_set<std::string> events;
    for (const TimeScaleEvent& e : data.events)
        events.insert(e.event);
    for (const Zone& z : data.zones)
        for (const auto* ev : {&z.base_event, &z.top_event})
            if (*ev && !events.count(**ev))
                throw std::invalid_argument("biostratigraphy: zone '" + z.zone + "' of scheme '" +
                                            z.scheme + "' names event '" + **ev +
                                            "', which is not in the time scale (events)");
}

} // namespace atollog::detail
