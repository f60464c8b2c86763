#pragma once
// Datum picks: where each time-scale event (the base or top of a taxon) lies in each hole, as a
// depth bracket between the extreme sample with the taxon and the next examined sample without
// it, widened for partial core recovery and, optionally, extended by the range-extension
// confidence interval.
#include "atollog/engine/biostrat_settings.hpp"
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/depth_bracket.hpp"
#include "atollog/engine/logged_surfaces.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog {

struct DatumPick {
    std::string hole;
    std::string event;
    std::string taxon;
    EventKind kind = EventKind::Base;
    double age_ma = 0;
    double age_sd_ma = 0;
    bool cuttings_hole = false;

    /// False: the taxon has no counted in-place occurrence in the hole ("not found"); the
    /// members below are then left at their defaults and mean nothing.
    bool found = false;

    /// The extreme sample with the taxon: the highest for a top, the lowest for a base.
    std::string found_sample;
    double found_top_m = 0;
    double found_base_m = 0;
    /// The next examined sample without the taxon beyond it (shallower for a top, deeper for a
    /// base); unset when the pick is open-ended.
    std::optional<std::string> absent_sample;

    /// From logged depths. Top: [base_m of the absent sample, base_m of the found sample];
    /// base: [top_m of the found sample, top_m of the absent sample]: everything of the absent
    /// sample lies beyond the datum, some point of the found sample lies inside its range.
    DepthBracket plain;
    /// plain, with each end moved to the farthest true depth its sample may stand for when the
    /// sample lies in a partly recovered run (DepthModel::trueDepthRange). Logged depths only
    /// err upward, so only the deep end moves.
    DepthBracket widened;
    bool widened_by_recovery = false;
    /// The taxon is in the shallowest (top) or deepest (base) examined sample of the hole.
    bool open_ended = false;

    /// The quoted depth (BiostratSettings::depth_quote): the plain bracket's midpoint, or top_m
    /// or base_m of the found sample. On an open-ended pick the midpoint quote falls back to the
    /// found sample's edge on the open side, and half_width_m is unset.
    double depth_m = 0;
    std::optional<double> half_width_m; ///< midpoint quote on a closed bracket only

    int horizon_count = 0;     ///< distinct levels with the taxon in this hole
    double observed_range_m = 0; ///< from the highest to the lowest level with the taxon
    /// Range-extension fraction alpha (Strauss & Sadler 1989); unset when not asked for or
    /// undefined (fewer than 2 horizons: extension_undefined).
    std::optional<double> extension_fraction;
    bool extension_undefined = false;
    /// widened, extended outward by alpha x observed_range_m (a top upward, clipped at the collar
    /// 0 m; a base downward, never below a logged basement contact); equals widened without an
    /// extension. With the extension undefined (one horizon) it is open outward: a top to the
    /// collar, a base to the deepest cored depth.
    DepthBracket extended;

    /// A base (first occurrence) in a cuttings hole: caving carries younger fossils down the
    /// hole, so the pick may read too deep (common practice).
    bool unreliable_cuttings_base = false;

    /// Truncation by a logged surface (logged_surfaces.hpp), set by markTruncatedPicks.
    /// surfaces_at_pick: the surfaces of the hole that lie in the closed widened bracket
    /// [shallow_m, deep_m], ends included, shallowest first; an open side is not searched beyond
    /// its last known depth (it bounds nothing). truncated_at_surface: that list is not empty.
    /// Why: a surface may stand for missing time, and a datum whose age falls in that time is
    /// squeezed onto it, a base (first occurrence) found just above it and a top (last
    /// occurrence) just below (Shaw 1964: a dog-leg in the line of correlation marks a hiatus).
    /// The depth is then right, but the rock at the pick may be younger (base) or older (top)
    /// than the event by up to the missing time.
    bool truncated_at_surface = false;
    std::vector<LoggedSurface> surfaces_at_pick;
    /// A logged surface other than the basement contact lies in the range-extended bracket
    /// (not in the widened one): the datum may be squeezed onto it as well.
    bool extension_reaches_surface = false;
    /// A base (first occurrence) in a hole with a logged basement contact whose true datum may
    /// lie at or below the floor of the carbonate section: no carbonate below records an older
    /// first occurrence, so the taxon may have lived before the reef began. Either
    /// (a) its widened bracket reaches the contact (deep_m at or below it) or is open below (no
    ///     examined sample deeper), or
    /// (b) its age is at or above the age of a base of the same hole marked by (a): that taxon
    ///     was living when the deepest examined carbonate formed, so a first occurrence at least
    ///     as old lies at or below it as well, and the lowest find of this taxon only shows
    ///     where sampling first met it.
    /// The event's age is then only an old bound of the rock at the pick, and the pick's depth
    /// says nothing about the datum's depth. Tops are never truncated at the basement (a last
    /// occurrence above the floor is recorded in full). An unflagged caved find in the deepest
    /// sample would mark too many bases by (b): caving is a fault to flag in the data.
    bool truncated_at_basement = false;
    std::optional<double> basement_contact_m; ///< the hole's basement contact, when logged
};

/// A pick for every event of the time scale in every hole, holes in dataset order and events in
/// time-scale order within a hole, marked for truncation by the logged surfaces of the data
/// (loggedSurfaces, markTruncatedPicks). Throws std::invalid_argument on unusable input (as
/// observeRanges; also a non-finite event age or a negative or non-finite age sd) or settings.
std::vector<DatumPick> pickDatums(const CoreDataset& data, const BiostratSettings& settings);

/// Sets truncated_at_surface, surfaces_at_pick, truncated_at_basement and basement_contact_m
/// of every found pick from the surfaces of its hole (see the members for the rule). Picks
/// already marked are marked afresh. Throws std::invalid_argument on a non-finite surface depth.
void markTruncatedPicks(std::vector<DatumPick>& picks, const std::vector<LoggedSurface>& surfaces);

} // namespace atollog
