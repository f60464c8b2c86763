#pragma once
// What the correlation commands (order, sequence, line, isochrons) read: the events of every
// hole from its datum picks and usable dates, with the options that make them.
#include "cli/biostrat_options.hpp"
#include "cli/date_options.hpp"

#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/correlation_data.hpp"

#include <CLI/CLI.hpp>

#include <cstddef>
#include <string>

namespace atollog::cli {

struct CorrelationOptions {
    BiostratOptions biostrat;
    DateOptions dates;
    bool no_dates = false; ///< leave dated horizons out

    /// "correlation.key=value" lines (with the pick and date settings) for provenance records.
    std::string settingsText() const;
};

/// Adds the biostratigraphy and date options and --no-dates.
void addCorrelationOptions(CLI::App& sub, CorrelationOptions& options);

/// The events and levels of every hole. Brackets are the range-extended ones when --extend and
/// --ties-extended are given, else those widened for recovery.
CorrelationData gatherCorrelationData(const CoreDataset& data, const CorrelationOptions& options);

/// Index of a hole or an event by id; throws std::invalid_argument listing what there is.
std::size_t holeIndex(const CorrelationData& data, const std::string& hole);
std::size_t eventIndex(const CorrelationData& data, const std::string& event);

/// "base", "top" or "dated".
std::string kindWord(SequenceEventKind kind);

} // namespace atollog::cli
