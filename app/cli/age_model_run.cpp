#include "cli/age_model_run.hpp"

#include "atollog/db/tie_point_store.hpp"

#include <algorithm>

namespace atollog::cli {
namespace {

db::StoredAgeModel toStored(const AgeModel& m, const HoleModelInputs& in, const CoreDataset& data) {
    db::StoredAgeModel s;
    s.hole = m.hole;
    s.tie_count = static_cast<int>(in.ties.size());
    s.draws = m.draws;
    s.acceptance_rate = std::clamp(m.acceptance_rate, 0.0, 1.0);
    s.outlier_tie = leadingOutlier(m);
    for (const auto& r : m.grid)
        s.points.push_back({r.depth_m, std::nullopt, r.age_q025_ma, r.age_q500_ma, r.age_q975_ma,
                            r.age_mean_ma});
    for (const auto& sample : data.samples) {
        if (sample.hole != m.hole) continue;
        if (const auto q = m.ageAt(sample.top_m))
            s.points.push_back({sample.top_m, sample.sample, q->q025_ma, q->q500_ma, q->q975_ma,
                                q->mean_ma});
    }
    for (const auto& h : m.hiatuses)
        if (h.duration_q500_myr)
            s.hiatuses.push_back({h.depth_m, *h.duration_q025_myr, *h.duration_q500_myr,
                                  *h.duration_q975_myr, h.probability_positive});
    for (const auto& r : m.rates) {
        // Two ties at one depth (e.g. two dates of one sample) give no thickness: no rate.
        if (r.defined_share <= 0 || !(r.base_m > r.top_m)) continue;
        std::string flags = r.reef_framework ? "reef_framework" : "";
        if (r.reef_framework && r.median_outside_reef_range) flags += ";outside_reef_range";
        s.rates.push_back({r.label, r.top_m, r.base_m, r.rate_q025_m_per_myr, r.rate_q500_m_per_myr,
                           r.rate_q975_m_per_myr, flags});
    }
    return s;
}

} // namespace

AgeModelRun buildAgeModels(const CoreDataset& data, const AgeModelOptions& options,
                           const std::string& hole, const PhaseReport& phase,
                           const WorkProgress& step) {
    AgeModelRun run;
    run.inputs = gatherAgeModelInputs(data, options, hole);
    for (const auto& in : run.inputs) {
        reportPhase(phase, "age model of " + in.hole + " (" + std::to_string(in.ties.size()) +
                               " ties)");
        run.models.push_back(stoppable([&] { return buildHoleModel(in, options, {}, step); }));
    }
    return run;
}

std::optional<std::string> leadingOutlier(const AgeModel& m) {
    if (!m.tie_tails.empty() && m.tie_tails.front().likely_outlier) return m.tie_tails.front().label;
    if (!m.outlier_ranking.empty() && m.outlier_ranking.front().likely_conflict)
        return m.outlier_ranking.front().label;
    return std::nullopt;
}

db::ModelRunRecord ageModelRunRecord(const CoreDataset& data, const AgeModelOptions& options,
                                     const std::string& hole) {
    db::ModelRunRecord run;
    run.kind = "age-model";
    run.settings = options.settingsText() + (hole.empty() ? "" : "\nage.hole=" + hole);
    run.seed = options.seed;
    run.inputs_sha256 = db::ProjectStore::datasetHash(data);
    return run;
}

StoredRunOutcome storeAgeModelRun(db::ProjectStore& store, const CoreDataset& data,
                                  const AgeModelOptions& options, const std::string& hole,
                                  const AgeModelRun& models) {
    db::ModelRunRecord run = ageModelRunRecord(data, options, hole);
    if (const auto same = db::sameLatestRun(store, run)) return {same->id, true};
    std::vector<db::StoredAgeModel> stored;
    for (std::size_t i = 0; i < models.models.size(); ++i)
        stored.push_back(toStored(models.models[i], models.inputs[i], data));
    run.summary = std::to_string(stored.size()) + (stored.size() == 1 ? " hole" : " holes");
    return {db::storeAgeModels(store, run, stored), false};
}

} // namespace atollog::cli
