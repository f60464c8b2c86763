// Zones: a zone is bounded by two different events, or at least by one.
#include "atollog/engine/validation_detail.hpp"

namespace atollog::detail {

void validateZones(const CoreDataset &data, IssueList &out) {
    for (std::size_t i = 0; i < data.zones.size(); ++i) {
        const Zone &z = data.zones[i];
        const std::string subject = "zone " + quoted(z.zone) + " of scheme " + quoted(z.scheme);
        // An empty event id leaves that end of the zone open, as a missing one does.
        const bool has_base = z.base_event && !z.base_event->empty();
        const bool has_top = z.top_event && !z.top_event->empty();
        if (has_base && has_top && *z.base_event == *z.top_event)
            out.error(Table::Zones, i, "top_event", *z.top_event,
                      subject + ": base_event and top_event are both " + quoted(*z.top_event),
                      "a zone lies between two different events; correct one of them");
        if (!has_base && !has_top)
            out.warning(Table::Zones, i, "base_event", "",
                        subject + " has neither base_event nor top_event, so it cannot be placed",
                        "give the event that defines its base, its top, or both");
    }
}

} // namespace atollog::detail
