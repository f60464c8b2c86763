#include "atollog/engine/inversion_explanation.hpp"

#include "atollog/engine/number_text.hpp"

namespace atollog {

std::string_view toString(InversionCause c) {
    switch (c) {
    case InversionCause::HiatusSurface:
        return "hiatus_surface";
    case InversionCause::BasementTruncation:
        return "basement_truncation";
    }
    return "hiatus_surface";
}

std::optional<InversionExplanation> explainInversion(const DatumPick& older,
                                                     const DatumPick& younger,
                                                     const std::vector<LoggedSurface>& surfaces) {
    if (!older.found || !younger.found || older.hole != younger.hole)
        return std::nullopt;
    if (older.kind == EventKind::Base && younger.kind == EventKind::Top) {
        const double from_m = older.widened.shallow_m;
        const double to_m = younger.widened.deep_m;
        const LoggedSurface* best = nullptr;
        for (const LoggedSurface& s : surfaces)
            if (s.hole == older.hole && s.depth_m >= from_m && s.depth_m <= to_m &&
                (!best || s.depth_m < best->depth_m))
                best = &s;
        if (best)
            return InversionExplanation{InversionCause::HiatusSurface, *best};
    }
    if (older.kind == EventKind::Base && older.truncated_at_basement && older.basement_contact_m)
        return InversionExplanation{
            InversionCause::BasementTruncation,
            LoggedSurface{older.hole, *older.basement_contact_m, LoggedSurfaceKind::BasementContact}};
    return std::nullopt;
}

std::string explanationText(const InversionExplanation& e) {
    const std::string where = std::string(toString(e.surface.kind)) + " surface at " +
                              derivedNumberText(e.surface.depth_m) + " m";
    switch (e.cause) {
    case InversionCause::HiatusSurface:
        return "explained by a possible hiatus at the " + where +
               ": the base lies at or above it and the top at or below it, as when both ages "
               "fall in missing time";
    case InversionCause::BasementTruncation:
        return "explained by the " + where +
               ": the older base is truncated at the floor of the carbonate section, so its "
               "true base lies at or below the floor and its pick only shows where sampling "
               "first met the taxon";
    }
    return {};
}

} // namespace atollog
