#pragma once
// The settings of numerical dates as command-line options (dates; later age, rates, subsidence).
#include "atollog/engine/date_ages.hpp"

#include <CLI/CLI.hpp>

#include <string>

namespace atollog::cli {

struct DateOptions {
    std::string half_lives = "cheng2013";
    double d234u_tolerance_permil = 8.0;
    bool include_failed_screen = false;
    bool no_detrital = false;
    double detrital_ratio = 4.4e-6;
    std::size_t mc_draws = 2000;
    std::uint64_t seed = DateSettings{}.seed;

    DateSettings settings() const;
    /// "dates.key=value" lines for the provenance record.
    std::string settingsText() const;
};

void addDateOptions(CLI::App& sub, DateOptions& options);

} // namespace atollog::cli
