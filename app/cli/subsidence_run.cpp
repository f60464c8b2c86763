#include "cli/subsidence_run.hpp"

#include "atollog/engine/sea_level_curve.hpp"
#include "atollog/engine/seeded_draws.hpp"

#include <algorithm>
#include <unordered_map>

namespace atollog::cli {

std::vector<HoleSubsidence> computeSubsidence(const CoreDataset& data,
                                              const AgeModelOptions& options,
                                              const std::string& hole_id,
                                              const PhaseReport& phase,
                                              const WorkProgress& step) {
    const SeaLevelCurve sea_level =
        data.sea_level.empty() ? SeaLevelCurve{} : SeaLevelCurve(data.sea_level);
    std::unordered_map<std::string, const Hole*> holes;
    for (const auto& h : data.holes) holes[h.hole] = &h;

    std::vector<HoleSubsidence> out;
    for (const auto& in : gatherAgeModelInputs(data, options, hole_id)) {
        HoleSubsidence result;
        result.hole = holes.at(in.hole);
        const Hole& hole = *result.hole;
        result.hole_flags = hole.collar_elev_m ? "" : "no_collar_elevation";
        // Samples in intervals that carry a water depth, within the model's depth range.
        struct Target {
            const Sample* sample;
            double min_m, max_m;
        };
        std::vector<Target> targets;
        double deepest_m = 0;
        for (const auto& t : in.ties) deepest_m = std::max(deepest_m, t.deep_m);
        for (const auto& s : data.samples) {
            if (s.hole != in.hole || s.top_m > deepest_m) continue;
            for (const auto& iv : data.intervals)
                if (iv.hole == in.hole && iv.paleodepth_min_m && iv.paleodepth_max_m &&
                    s.top_m >= iv.top_m && s.top_m < iv.base_m) {
                    targets.push_back({&s, *iv.paleodepth_min_m, *iv.paleodepth_max_m});
                    break;
                }
        }
        std::vector<double> keep;
        for (const auto& t : targets) keep.push_back(t.sample->top_m);
        reportPhase(phase, "age model of " + in.hole + " at " + std::to_string(keep.size()) +
                               " samples");
        const AgeModel m = stoppable([&] { return buildHoleModel(in, options, keep, step); });
        for (std::size_t i = 0; i < targets.size(); ++i) {
            const auto& t = targets[i];
            SampleSubsidence s{t.sample,
                               subsidenceDraws(t.sample->top_m, hole.collar_elev_m.value_or(0.0),
                                               t.min_m, t.max_m, m.kept_age_draws_ma[i],
                                               sea_level, streamSeed(options.seed, i)),
                               result.hole_flags};
            auto add = [&s](const char* f) {
                s.flags += (s.flags.empty() ? "" : ";") + std::string(f);
            };
            if (s.estimate.no_sea_level_curve) add("no_sea_level_curve");
            if (s.estimate.draws_beyond_sea_level_curve > 0) add("beyond_sea_level_curve");
            if (s.estimate.rate_undefined_young_age) add("rate_undefined_young_age");
            if (!s.estimate.rate_undefined_young_age)
                result.points.push_back(subsidencePoint(t.sample->sample, s.estimate));
            result.samples.push_back(std::move(s));
        }
        if (result.points.size() >= 3) result.rate = holeSubsidenceRate(result.points);
        out.push_back(std::move(result));
    }
    return out;
}

draw::SubsidencePlotInput subsidencePlotInput(const std::vector<HoleSubsidence>& holes) {
    draw::SubsidencePlotInput plot;
    plot.note = "each dated horizon's median with its 95 % ranges; lines: York fit per hole "
                "(York et al. 2004)";
    for (const HoleSubsidence& h : holes) {
        draw::SubsidencePlotHole plot_hole{h.hole->hole, {}, std::nullopt};
        for (const SampleSubsidence& s : h.samples) {
            const SubsidenceEstimate& e = s.estimate;
            plot_hole.points.push_back({s.sample->sample, e.age_ma.p50, e.age_ma.p2_5,
                                        e.age_ma.p97_5, e.subsidence_m.p50, e.subsidence_m.p2_5,
                                        e.subsidence_m.p97_5});
        }
        if (h.rate)
            plot_hole.rate = draw::SubsidenceRateLine{h.rate->rate_m_per_myr,
                                                      h.rate->rate_sd_m_per_myr, h.rate->intercept_m};
        if (!plot_hole.points.empty()) plot.holes.push_back(std::move(plot_hole));
    }
    return plot;
}

} // namespace atollog::cli
