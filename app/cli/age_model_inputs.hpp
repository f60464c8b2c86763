#pragma once
// What an age-depth model of each hole is built from, gathered once for the age, rates and
// subsidence commands: the options, the ties (datum picks and usable dates), the logged surfaces
// where age may jump, and the reef packages between them whose accretion rate is wanted.
#include "cli/biostrat_options.hpp"
#include "cli/date_options.hpp"

#include "atollog/engine/age_model.hpp"
#include "atollog/engine/age_model_settings.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <CLI/CLI.hpp>

#include <optional>
#include <string>
#include <vector>

namespace atollog::cli {

struct AgeModelOptions {
    int draws = 10000;
    std::uint64_t seed = 1;
    double grid_step_m = 0.5;
    std::optional<double> core_top_age_ka; ///< unset: the collar is present day
    double core_top_sd_ka = 0;
    bool core_top_open = false; ///< only bounded: no younger than the core top age
    bool extrapolate_below = false;
    int threads = 1;
    int outlier_draws = 1000;
    BiostratOptions biostrat;
    DateOptions dates;

    AgeModelSettings settings() const;
    /// Every setting (model, picks, dates) as "key=value" lines for the provenance record.
    std::string settingsText() const;
};

void addAgeModelOptions(CLI::App& sub, AgeModelOptions& options);

struct HoleModelInputs {
    std::string hole;
    std::vector<AgeTie> ties;
    /// Dates with an age that the model leaves out (e.g. a failed d234U screen): shown, not used.
    std::vector<AgeTie> excluded;
    std::vector<double> hiatus_depths_m;
    /// The logged basement contact (lava dates below it are pooled) and the drilled base.
    std::optional<double> basement_contact_m;
    std::optional<double> section_base_m;
    /// The carbonate packages between logged surfaces, clipped to the ties' depth range; a
    /// package is reef framework when most of its logged thickness is a boundstone texture.
    std::vector<RateInterval> packages;
};

/// Inputs for every hole with at least one tie (or only `hole` when not empty: throws
/// std::invalid_argument naming the holes when it is unknown or has no tie).
std::vector<HoleModelInputs> gatherAgeModelInputs(const CoreDataset& data,
                                                  const AgeModelOptions& options,
                                                  const std::string& hole);

/// Builds the model of one hole with the options' settings, its hiatus depths and packages;
/// `progress` as buildAgeModel's (WorkStopped when it says stop).
AgeModel buildHoleModel(const HoleModelInputs& in, const AgeModelOptions& options,
                        const std::vector<double>& keep_draws_at_m = {},
                        const WorkProgress& progress = {});

} // namespace atollog::cli
