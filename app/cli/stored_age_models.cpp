#include "cli/stored_age_models.hpp"

#include "atollog/db/age_model_store.hpp"

#include <algorithm>

namespace atollog::cli {

namespace {

/// The grid rows of a stored model: its points without a sample, in stored (grid) order.
AgeModel gridModel(const db::StoredAgeModel& stored) {
    AgeModel m;
    m.hole = stored.hole;
    m.draws = static_cast<int>(stored.draws);
    for (const db::StoredAgePoint& p : stored.points) {
        if (p.sample) continue;
        AgeGridRow row;
        row.depth_m = p.depth_m;
        row.age_q025_ma = p.age_q025_ma;
        row.age_q500_ma = p.age_q500_ma;
        row.age_q975_ma = p.age_q975_ma;
        row.age_mean_ma = p.age_mean_ma;
        // At a logged surface the grid has two rows at one depth, the one above stored first.
        if (!m.grid.empty() && m.grid.back().depth_m == row.depth_m)
            m.grid.back().above_surface = true;
        m.grid.push_back(row);
    }
    return m;
}

} // namespace

StoredModelChoice latestStoredAgeModels(db::ProjectStore& store, const CoreDataset& data) {
    StoredModelChoice out;
    const std::string current = db::ProjectStore::datasetHash(data);
    std::vector<db::ModelRunRecord> runs = store.modelRuns();
    std::stable_sort(runs.begin(), runs.end(),
                     [](const auto& a, const auto& b) { return a.id > b.id; });
    std::map<std::string, std::string> source_of;
    for (const db::ModelRunRecord& run : runs) {
        if (run.kind != "age-model" || run.inputs_sha256 != current) continue;
        for (const db::StoredAgeModel& stored : db::loadAgeModels(store, run.id)) {
            if (out.models.count(stored.hole)) continue;
            AgeModel m = gridModel(stored);
            if (m.grid.size() < 2) continue;
            out.models.emplace(stored.hole, std::move(m));
            source_of.emplace(stored.hole, stored.hole + ": run #" + std::to_string(run.id) +
                                               " of " + run.started_utc);
        }
    }
    for (const Hole& h : data.holes)
        if (const auto it = source_of.find(h.hole); it != source_of.end())
            out.sources.push_back(it->second);
    return out;
}

} // namespace atollog::cli
