#pragma once
// Picks that contradict each other or the time scale. A conflict means a fault in the data
// (mislabelled depth, unflagged reworking or caving, a misidentified taxon) or in the time scale,
// and the picks involved should not be trusted as tie points without a look. A contradiction that
// a logged surface accounts for (inversion_explanation.hpp: a hiatus squeezing a base and a top
// onto it, bases truncated at the basement) is no fault: it is kept apart as an explained note.
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/datum_picks.hpp"
#include "atollog/engine/inversion_explanation.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog {

enum class PickConflictKind {
    /// A zone whose base pick lies wholly above (shallower than) its top pick in a hole.
    ZoneInverted,
    /// Two events picked in the opposite order to their ages, beyond the ages' sds.
    EventOrder
};

struct PickConflict {
    PickConflictKind kind = PickConflictKind::EventOrder;
    std::string hole;
    std::string scheme; ///< ZoneInverted only
    std::string zone;   ///< ZoneInverted only
    /// The event that should lie deeper (the older one; the zone's base event) and the one that
    /// should lie shallower (the younger one; the zone's top event).
    std::string expected_deeper_event;
    std::string expected_shallower_event;
    double age_gap_ma = 0;   ///< EventOrder: age(deeper) - age(shallower), > 0
    double tolerance_ma = 0; ///< EventOrder: 2 sqrt(sd1^2 + sd2^2)
    std::string message;
    /// Set when a logged surface accounts for the contradiction (explainInversion with the
    /// expected deeper event as `older`): then it is a note, not a fault, and the message says so.
    std::optional<InversionExplanation> explained_by;
};

struct PickConflictReport {
    std::vector<PickConflict> conflicts; ///< unexplained: faults to look at
    std::vector<PickConflict> explained; ///< explained by a logged surface: lower-severity notes
};

/// Contradictions of all found picks, hole by hole, each either a conflict or an explained note.
/// Brackets are the widened ones (partial recovery included), so a contradiction is reported
/// only when recovery cannot explain it; an open side never contradicts.
/// - ZoneInverted: zone base pick wholly above its top pick (Salvador 1994: an interval zone lies
///   between its lower and upper biohorizon).
/// - EventOrder: event a older than event b (age_a > age_b) but a's bracket lies wholly above
///   b's, and age_a - age_b > 2 sqrt(sd_a^2 + sd_b^2): the ages differ by more than about two
///   standard deviations of their difference (independent normal errors), so the time scale
///   alone cannot put them in the observed order.
/// Either kind goes to `explained` when explainInversion(deeper pick, shallower pick, the
/// logged surfaces of the data) gives an explanation (a base above and a top below a logged
/// surface, or two bases truncated at the basement), and to `conflicts` otherwise.
/// Throws std::invalid_argument on a zone that names an unknown event, or as loggedSurfaces.
PickConflictReport reviewPickConflicts(const CoreDataset& data,
                                       const std::vector<DatumPick>& picks);

/// reviewPickConflicts(data, picks).conflicts: the contradictions no logged surface explains.
std::vector<PickConflict> findPickConflicts(const CoreDataset& data,
                                            const std::vector<DatumPick>& picks);

} // namespace atollog
