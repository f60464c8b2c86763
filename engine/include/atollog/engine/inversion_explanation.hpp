#pragma once
// When a logged surface accounts for two picks in the opposite order to their ages. A hiatus
// never reverses the order of two events; it removes time, and the events whose ages fall in the
// missing time are squeezed onto the surface: a base (first occurrence) is found just above it,
// a top (last occurrence) just below (Shaw 1964, graphic correlation: a dog-leg in the line of
// correlation marks a hiatus). So an older base picked above a younger top, with the surface
// between them, is what a hiatus produces, not a fault. Likewise the carbonate section begins on
// volcanic basement: taxa already living when the reef began have their bases truncated at its
// floor, so those bases stand in arbitrary order there, wherever sampling first met each taxon.
#include "atollog/engine/datum_picks.hpp"
#include "atollog/engine/logged_surfaces.hpp"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace atollog {

enum class InversionCause {
    HiatusSurface,     ///< a base above, a top below a logged surface
    BasementTruncation ///< two bases, both truncated at the basement
};
std::string_view toString(InversionCause c); ///< "hiatus_surface", "basement_truncation"

struct InversionExplanation {
    InversionCause cause = InversionCause::HiatusSurface;
    LoggedSurface surface; ///< the surface that explains it (the basement contact for truncation)
    bool operator==(const InversionExplanation&) const = default;
};

/// Whether a logged surface explains `older`, the event expected deeper, being picked above
/// `younger` in the same hole. Found picks only (otherwise nullopt). In this order:
/// - HiatusSurface: older is a base, younger is a top, and a surface of the hole lies in
///   [older.widened.shallow_m, younger.widened.deep_m], that is inside the base's bracket,
///   between the two brackets or inside the top's bracket: the base at or above it, the top at
///   or below it. The shallowest such surface is given. The distance between the brackets is
///   not limited: sampling decides how far from the surface each taxon is first or last found.
/// - BasementTruncation: older is a base with truncated_at_basement: its true datum lies at or
///   below the floor of the carbonate section, below every pick, so its pick above `younger`
///   (of any kind) is no inversion (this covers two such bases, whose order at the floor means
///   nothing). The surface is the hole's basement contact.
/// Otherwise nullopt: no hiatus produces a top above a younger event, nor two bases out of order
/// when the older is not truncated at the basement (a hiatus squeezes events onto its surface in
/// their true order; it never reverses them).
/// `surfaces` may hold every hole's surfaces; only those of the picks' hole are used.
std::optional<InversionExplanation> explainInversion(const DatumPick& older,
                                                     const DatumPick& younger,
                                                     const std::vector<LoggedSurface>& surfaces);

/// For messages: "a hiatus at the exposure surface at 40 m squeezes both datums onto it", ...
std::string explanationText(const InversionExplanation& e);

} // namespace atollog
