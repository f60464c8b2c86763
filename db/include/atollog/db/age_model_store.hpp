#pragma once
// Age-depth model results stored per model run, so a figure in a report can be traced to the
// run (settings, seed, inputs hash, program version) that made it, and reproduced.
#include "atollog/db/project_store.hpp"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace atollog::db {

struct StoredAgePoint {
    double depth_m = 0;
    std::optional<std::string> sample; ///< set for a sample's age, unset for a grid depth
    double age_q025_ma = 0, age_q500_ma = 0, age_q975_ma = 0, age_mean_ma = 0;
    bool operator==(const StoredAgePoint&) const = default;
};

struct StoredHiatus {
    double depth_m = 0;
    double duration_q025_ma = 0, duration_q500_ma = 0, duration_q975_ma = 0;
    double probability_positive = 0;
    bool operator==(const StoredHiatus&) const = default;
};

struct StoredRate {
    std::string label; ///< e.g. "tie 3-4" or "interval 12.40-15.10 m"
    double top_m = 0, base_m = 0;
    double rate_q025_m_per_myr = 0, rate_q500_m_per_myr = 0, rate_q975_m_per_myr = 0;
    std::string flags; ///< ';'-separated words
    bool operator==(const StoredRate&) const = default;
};

struct StoredAgeModel {
    std::string hole;
    int tie_count = 0;
    std::int64_t draws = 0;
    double acceptance_rate = 0;
    std::optional<std::string> outlier_tie;
    std::vector<StoredAgePoint> points;
    std::vector<StoredHiatus> hiatuses;
    std::vector<StoredRate> rates;
    bool operator==(const StoredAgeModel&) const = default;
};

/// Records `run` and the models of every hole in one transaction; returns the run's id.
std::int64_t storeAgeModels(ProjectStore& store, ModelRunRecord run,
                            const std::vector<StoredAgeModel>& models);

/// The models stored with one run, holes in stored order, rows in stored order.
std::vector<StoredAgeModel> loadAgeModels(ProjectStore& store, std::int64_t run_id);

} // namespace atollog::db
