#pragma once
// The choices a biostratigrapher makes when turning occurrences into datum picks, with defaults,
// and their text form for provenance records.
#include "atollog/engine/vocabulary.hpp"

#include <cstdint>
#include <optional>
#include <string>

namespace atollog {

/// Which single depth a pick quotes. The bracket itself never changes with this setting.
enum class PickDepthQuote {
    Midpoint,   ///< middle of the plain bracket, +/- half its width (default)
    SampleTop,  ///< top_m of the sample in which the taxon was found (the extreme one)
    SampleBase  ///< base_m of that sample
};

struct BiostratSettings {
    PickDepthQuote depth_quote = PickDepthQuote::Midpoint;

    /// Abundance threshold ("top of common occurrence" and the like). When either threshold is
    /// set, an in-place occurrence counts for ranges and picks only if its own abundance passes
    /// the threshold of its own form: a class word at or above min_abundance_class (order present
    /// < rare < few < common < abundant < dominant), a whole count at or above
    /// min_abundance_count. A form whose threshold is not set passes. An occurrence without any
    /// abundance fails, since nothing shows it reaches the threshold. Occurrences that fail still
    /// make their sample examined, and a sample holding the taxon only below the threshold counts
    /// as a sample without it.
    std::optional<AbundanceClass> min_abundance_class;
    std::optional<std::int64_t> min_abundance_count;

    /// Confidence level C in (0, 1) of the range-extension interval (Strauss & Sadler 1989);
    /// not set = no extension.
    std::optional<double> range_extension_confidence;

    /// Tie points from the base (first occurrence) of a taxon in a cuttings hole. Off by default:
    /// caving carries younger fossils down the hole, so bases in cuttings read too deep
    /// (common practice).
    bool cuttings_bases_as_ties = false;

    /// Tie points from bases truncated at the basement (DatumPick::truncated_at_basement). Off by
    /// default: the taxon may have lived before the reef began, so the event's age is only an
    /// old bound of the rock at the pick, not its age.
    bool basement_bases_as_ties = false;

    /// Tie points from picks whose bracket holds a logged surface (DatumPick::
    /// truncated_at_surface; with extended ties also extension_reaches_surface). Off by default: a datum whose age falls in the missing time is
    /// squeezed onto the surface, so its age dates neither side; as a point tie it would pull
    /// the model across the surface as a ramp and hide the hiatus.
    bool surface_picks_as_ties = false;

    /// Tie points carry the extended bracket (range-extension confidence) instead of the plain
    /// one widened for partial recovery. Needs range_extension_confidence.
    bool ties_use_extended_bracket = false;

    bool abundanceThresholdActive() const {
        return min_abundance_class.has_value() || min_abundance_count.has_value();
    }
};

std::string_view toString(PickDepthQuote q); ///< "midpoint", "sample_top", "sample_base"

/// Throws std::invalid_argument naming the bad setting: confidence outside (0, 1) or not finite,
/// a negative count threshold, extended ties without a confidence level.
void validateBiostratSettings(const BiostratSettings& s);

/// One "key=value" line per setting, in a fixed order, "none" for an unset option; for the
/// provenance record of a run.
std::string biostratSettingsText(const BiostratSettings& s);

} // namespace atollog
