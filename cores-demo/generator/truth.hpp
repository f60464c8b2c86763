#pragma once
// What really happened in the invented archipelago, for tests to compare models with.
#include "true_history.hpp"

#include "atollog/engine/vocabulary.hpp"

#include <cstdint>
#include <filesystem>
#include <string>
#include <vector>

namespace atollog::demo {

struct TrueHiatus {
    std::string hole;
    double depth_m = 0;
    double age_top_ma = 0;  ///< age of the rock just above the surface
    double age_base_ma = 0; ///< age of the rock just below
    std::string kind;       ///< "exposure" (a lowstand) or "basement" (reef on the volcano)
};

struct TrueRange {
    std::string taxon;
    double first_ma = 0; ///< first appearance
    double last_ma = 0;  ///< last appearance, 0 = living
};

struct TrueEvent {
    std::string event;
    std::string taxon;
    EventKind kind = EventKind::Base;
    double age_ma = 0;
};

/// A sample's true position: differs from samples.csv only for the mislabelled sample.
struct TrueSample {
    std::string hole;
    std::string sample;
    double recorded_depth_m = 0;
    double true_depth_m = 0;
    double age_ma = 0;
};

/// An error planted on purpose in the data, which a careful user or check should find.
struct PlantedFault {
    std::string kind; ///< unflagged_reworked, mislabelled_sample, altered_coral, over_recovery
    std::string hole;
    std::string item; ///< the sample, sample/taxon or run concerned
    std::string description;
};

struct DemoTruth {
    std::uint64_t seed = 0;
    std::vector<TrueHoleHistory> holes;
    std::vector<TrueHiatus> hiatuses;
    std::vector<TrueRange> ranges;
    std::vector<TrueEvent> events; ///< oldest first
    std::vector<TrueSample> samples;
    std::vector<PlantedFault> faults;
};

/// True age in a hole (see TrueHoleHistory); throws std::out_of_range for an unknown hole.
double trueAgeMa(const DemoTruth& truth, const std::string& hole, double depth_m);
const TrueHoleHistory& trueHistory(const DemoTruth& truth, const std::string& hole);

/// The hiatuses of a history: its exposure surfaces and the reef-basalt contact.
std::vector<TrueHiatus> hiatusesOf(const TrueHoleHistory& h);

/// Writes true_age.csv, true_water_depth.csv, true_events.csv, true_order.csv, true_ranges.csv,
/// true_samples.csv, hiatuses.csv, faults.csv and seed.txt (creating the folder; overwriting).
void writeTruthFolder(const DemoTruth& truth, const std::filesystem::path& folder);

} // namespace atollog::demo
