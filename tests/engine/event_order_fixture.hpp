#pragma once
// Builds CorrelationData by hand for the event-order graph tests: holes, events and brackets in
// a few lines each.
#include "atollog/engine/correlation_data.hpp"

#include <string>

namespace atollog::test {

struct CorrelationBuilder {
    CorrelationData data;

    std::size_t hole(const std::string& name) {
        data.holes.push_back(name);
        data.sampled_levels_m.emplace_back();
        data.surfaces_m.emplace_back();
        return data.holes.size() - 1;
    }
    std::size_t event(const std::string& id, SequenceEventKind kind, const std::string& taxon) {
        SequenceEvent e;
        e.id = id;
        e.kind = kind;
        e.taxon = taxon;
        data.events.push_back(e);
        return data.events.size() - 1;
    }
    std::size_t base(const std::string& taxon) {
        return event("B " + taxon, SequenceEventKind::Base, taxon);
    }
    std::size_t top(const std::string& taxon) {
        return event("T " + taxon, SequenceEventKind::Top, taxon);
    }
    std::size_t dated(const std::string& sample, double age_ma, double sd_ma) {
        const std::size_t i = event("date " + sample, SequenceEventKind::Dated, "");
        data.events[i].age_ma = age_ma;
        data.events[i].age_sd_ma = sd_ma;
        return i;
    }
    /// Observes `event` in `hole` within [shallow_m, deep_m], its level at the middle.
    void at(std::size_t hole_index, std::size_t event_index, double shallow_m, double deep_m) {
        data.levels.push_back(
            {hole_index, event_index, shallow_m, deep_m, 0.5 * (shallow_m + deep_m)});
    }
};

} // namespace atollog::test
