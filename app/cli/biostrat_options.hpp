#pragma once
// The biostratigraphy settings as command-line options, shared by ranges, datums and zones.
#include "atollog/engine/biostrat_settings.hpp"

#include <CLI/CLI.hpp>

#include <memory>
#include <optional>
#include <string>

namespace atollog::cli {

struct BiostratOptions {
    std::string quote = "midpoint";
    std::string min_class;
    std::optional<std::int64_t> min_count;
    std::optional<double> extend;
    bool cuttings_bases = false;
    bool ties_extended = false;
    bool surface_picks = false;

    /// The engine settings; throws std::invalid_argument with the option name on a bad value.
    BiostratSettings settings() const;
};

/// Adds --quote, --min-abundance, --min-count, --extend, --cuttings-bases, --ties-extended,
/// --surface-picks.
void addBiostratOptions(CLI::App& sub, BiostratOptions& options);

} // namespace atollog::cli
