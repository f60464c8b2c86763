#pragma once
// Tie points for age-depth models: each usable datum pick as a depth bracket with the event's
// age from the time scale.
#include "atollog/engine/biostrat_settings.hpp"
#include "atollog/engine/datum_picks.hpp"
#include "atollog/engine/pick_conflicts.hpp"

#include <string>
#include <vector>

namespace atollog {

struct TiePoint {
    std::string hole;
    std::string event;
    EventKind kind = EventKind::Base;
    double shallow_m = 0; ///< the bracket used (see makeTiePoints)
    double deep_m = 0;
    double depth_m = 0;   ///< the pick's quoted depth (inside the bracket)
    double age_ma = 0;
    double age_sd_ma = 0;
    /// Words, in this order when present: "widened_by_recovery", "extended", "cuttings_base", "order_conflict", "zone_inverted",
    /// "explained_inversion" (in a contradiction that a logged surface explains),
    /// "at_surface" (DatumPick::truncated_at_surface: a hiatus may have squeezed the datum onto
    /// the surface, so the age of the rock there may differ from the event's by the missing
    /// time), "at_basement" (DatumPick::truncated_at_basement, only with
    /// settings.basement_bases_as_ties).
    std::vector<std::string> flags;
};

/// One tie point per found pick, except open-ended picks (one side unbounded: no bracket to
/// give an age model), unless settings.cuttings_bases_as_ties bases in cuttings holes, and
/// unless settings.basement_bases_as_ties bases truncated at the basement (their age is only an
/// old bound: the taxon may have lived before the reef began). Picks truncated at a logged
/// surface stay, flagged "at_surface". The bracket is the pick's widened one (plain, widened for
/// partial recovery), or its extended one when settings.ties_use_extended_bracket. Picks in a
/// conflict are kept and flagged: the age model or the user decides. `conflicts` may hold
/// reported and explained contradictions alike (PickConflict::explained_by tells them apart;
/// runBiostratigraphy passes both). Order: as the picks. Throws std::invalid_argument on bad
/// settings.
std::vector<TiePoint> makeTiePoints(const std::vector<DatumPick>& picks,
                                    const std::vector<PickConflict>& conflicts,
                                    const BiostratSettings& settings);

/// The flags joined with ';' (empty string for none), for tables and the db.
std::string tieFlagsText(const TiePoint& t);

} // namespace atollog
