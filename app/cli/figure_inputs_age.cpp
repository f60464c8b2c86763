// Age-depth and rate figures from an age model.
#include "cli/age_model_run.hpp"
#include "cli/figure_inputs.hpp"

#include "atollog/engine/basement_age.hpp"

namespace atollog::cli {
namespace {

draw::AgeDepthTie plotTie(const AgeTie& t, bool outlier, bool excluded) {
    return {t.label,
            t.source == AgeTieSource::Datum ? draw::AgeTieKind::Datum : draw::AgeTieKind::Date,
            t.shallow_m,
            t.deep_m,
            t.age.quantile(0.5),
            t.age.quantile(0.025),
            t.age.quantile(0.975),
            outlier,
            excluded};
}

/// Above this many ties the labels crowd each other: they are left off unless asked for.
constexpr std::size_t kMaxLabelledTies = 30;

} // namespace

draw::AgeDepthPlotInput ageDepthPlotInput(const AgeModel& m, const HoleModelInputs& in) {
    draw::AgeDepthPlotInput p;
    p.hole = m.hole;
    p.top_m = 0;
    p.base_m = m.grid.empty() ? 1.0 : m.grid.back().depth_m;
    for (const auto& r : m.grid)
        p.model.push_back({r.depth_m, r.age_q025_ma, r.age_q500_ma, r.age_q975_ma});
    const auto outlier = leadingOutlier(m);
    auto inside = [&](const AgeTie& t) { return t.shallow_m >= p.top_m && t.deep_m <= p.base_m; };
    // The ties as the model saw them: lava dates below a logged contact pooled into one.
    const std::vector<AgeTie> ties =
        in.basement_contact_m ? poolBasementTies(in.ties, *in.basement_contact_m) : in.ties;
    for (const auto& t : ties)
        if (inside(t)) p.ties.push_back(plotTie(t, outlier && *outlier == t.label, false));
    for (const auto& t : in.excluded)
        if (inside(t)) p.ties.push_back(plotTie(t, false, true));
    int n = 0;
    for (const auto& h : m.hiatuses)
        if (h.duration_q500_myr && h.probability_positive >= 0.5 && h.depth_m <= p.base_m)
            p.hiatuses.push_back({h.depth_m, *h.duration_q500_myr, "H" + std::to_string(++n)});
    return p;
}

draw::AgeDepthPlotStyle ageDepthPlotStyle(const draw::AgeDepthPlotInput& p, bool label_every_tie) {
    draw::AgeDepthPlotStyle style;
    style.show_tie_labels = label_every_tie || p.ties.size() <= kMaxLabelledTies;
    return style;
}

std::optional<draw::RatePlotInterval> ratePlotInterval(const AccretionRate& r, const AgeModel& m,
                                                       draw::RatePlotAlong along) {
    // Two ties at one depth (e.g. two dates of one sample) give no thickness: no rate.
    if (r.defined_share <= 0 || !(r.base_m > r.top_m)) return std::nullopt;
    draw::RatePlotInterval p{r.label,
                             r.between_ties ? draw::RateIntervalKind::BetweenTies
                                            : draw::RateIntervalKind::Package,
                             r.top_m, r.base_m, r.rate_q025_m_per_myr, r.rate_q500_m_per_myr,
                             r.rate_q975_m_per_myr};
    if (along == draw::RatePlotAlong::Age) {
        const auto top = m.ageAt(r.top_m), base = m.ageAt(r.base_m);
        if (!top || !base || !(base->q500_ma > top->q500_ma)) return std::nullopt;
        p.span_top = top->q500_ma;
        p.span_base = base->q500_ma;
    }
    return p;
}

draw::RatePlotInput ratePlotInput(const AgeModel& m, draw::RatePlotAlong along) {
    draw::RatePlotInput plot;
    plot.hole = m.hole;
    plot.along = along;
    for (const auto& r : m.rates)
        if (const auto p = ratePlotInterval(r, m, along)) plot.intervals.push_back(*p);
    return plot;
}

} // namespace atollog::cli
