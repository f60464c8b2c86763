#pragma once
// Builders for small invented biostratigraphy cases (holes of the invented Veya archipelago).
// Every value here is invented; the expected results in the tests are worked by hand.
#include "test_fixture_dataset.hpp"

#include "atollog/engine/core_dataset.hpp"

#include <string>

namespace atollog::test {

inline Hole makeHole(std::string id, HoleKind kind = HoleKind::Core) {
    Hole h;
    h.hole = std::move(id);
    h.site = "Veya test site";
    h.kind = kind;
    return h;
}

inline Sample makeKindSample(std::string hole, std::string id, double top_m, double base_m,
                             std::string kind) {
    Sample s = makeSample(std::move(hole), std::move(id), top_m, base_m);
    s.kind = std::move(kind);
    return s;
}

inline Occurrence makeCounted(std::string sample, std::string taxon, Abundance abundance,
                              OccurrenceStatus status = OccurrenceStatus::InPlace) {
    Occurrence o = makeOccurrence(std::move(sample), std::move(taxon), status);
    o.abundance = abundance;
    return o;
}

inline TimeScaleEvent makeEvent(std::string id, std::string taxon, EventKind kind, double age_ma,
                                double age_sd_ma) {
    TimeScaleEvent e;
    e.event = std::move(id);
    e.taxon = std::move(taxon);
    e.kind = kind;
    e.age_ma = age_ma;
    e.age_sd_ma = age_sd_ma;
    e.source = "invented test scale";
    return e;
}

inline Zone makeZone(std::string scheme, std::string zone, std::optional<std::string> base_event,
                     std::optional<std::string> top_event) {
    Zone z;
    z.scheme = std::move(scheme);
    z.zone = std::move(zone);
    z.base_event = std::move(base_event);
    z.top_event = std::move(top_event);
    return z;
}

} // namespace atollog::test
