// Age models of the invented demo archipelago against the generator's truth: how often the 95 %
// band holds the true age, whether the hiatuses found are the ones made, and whether the true
// rates fall inside their bands. A model-versus-truth check on invented data, not a published
// expected value.
#include "demo_data.hpp"
#include "truth.hpp"

#include "cli/age_model_inputs.hpp"

#include "atollog/engine/age_model.hpp"
#include "atollog/engine/biostrat_run.hpp"
#include "atollog/engine/date_ages.hpp"
#include "atollog/engine/logged_surfaces.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <iostream>

using namespace atollog;
using namespace atollog::demo;

namespace {

/// The options a user of the demo gives: ties over the 95 % range-extended brackets (the plain
/// ones miss the true datum depth about two times in three: rare taxa go unseen near their range
/// ends; DEVELOPERS.md), and an open core top, because the demo collars stand on emerged reef
/// flats 2 to 4 m above sea level that stopped growing at an unknown time.
cli::AgeModelOptions demoOptions() {
    cli::AgeModelOptions o;
    o.draws = 4000;
    o.seed = 730117;
    o.outlier_draws = 300;
    o.core_top_open = true;
    o.biostrat.extend = 0.95;
    o.biostrat.ties_extended = true;
    return o;
}

} // namespace

// What the four demo holes give with the options above (4000 draws): the 95 % band holds the
// true age at about 91 % of grid depths; 5 of the 13 hiatuses made are found (P(gap > 0) > 0.9)
// and none where none was made; about 94 % of true mean rates between ties lie in their band.
// Most remaining misses follow a rare taxon whose finds miss its true datum by more than the
// 95 % range extension allows (the extension assumes finds scattered at random; facies control
// breaks that), and the hiatuses not found lie between ties too far apart to show the gap.
TEST_CASE("demo age models hold the true age and find the hiatuses made",
          "[demo][demo_age_model][age_model]") {
    const DemoTruth& truth = demoData().truth;
    int rows = 0, held = 0, hiatus_made = 0, hiatus_found_made = 0, hiatus_found_other = 0;
    int rates = 0, rates_held = 0, holes_failed = 0;
    const cli::AgeModelOptions options = demoOptions();
    const auto inputs = cli::gatherAgeModelInputs(demoData().data, options, "");
    for (const TrueHoleHistory& h : truth.holes) {
        const auto in_it = std::find_if(inputs.begin(), inputs.end(),
                                        [&](const cli::HoleModelInputs& i) { return i.hole == h.hole; });
        REQUIRE(in_it != inputs.end());
        cli::HoleModelInputs in = *in_it;
        in.packages.clear(); // rates between ties are what the truth is compared with
        // What a user does with a conflict: drop the tie the leave-one-out search names while
        // it is a likely conflict (at most 8 rounds), and rebuild.
        const std::vector<AgeTie>& ties = in.ties;
        AgeModel m;
        try {
            m = cli::buildHoleModel(in, options);
        } catch (const std::invalid_argument& e) {
            std::cout << h.hole << ": " << e.what() << "\n";
            ++holes_failed;
            continue;
        }
        std::cout << h.hole << ": all " << ties.size() << " ties: acceptance 10^"
                  << m.log10_acceptance << ", effective draws " << m.effective_draws << "\n";
        for (int round = 0; round < 8 && !m.outlier_ranking.empty() &&
                            m.outlier_ranking.front().likely_conflict;
             ++round) {
            const std::string drop = m.outlier_ranking.front().label;
            if (std::none_of(in.ties.begin(), in.ties.end(),
                             [&](const AgeTie& t) { return t.label == drop; })) {
                std::cout << "  keeping " << drop << " (pooled lava dates)\n";
                break;
            }
            std::cout << "  dropping " << drop << " (log10 gain "
                      << m.outlier_ranking.front().log10_gain << ")\n";
            std::erase_if(in.ties, [&](const AgeTie& t) { return t.label == drop; });
            m = cli::buildHoleModel(in, options);
        }
        int hole_rows = 0, hole_held = 0;
        for (const AgeGridRow& r : m.grid) {
            if (r.above_surface)
                continue;
            const double age = trueAgeMa(truth, h.hole, r.depth_m);
            ++hole_rows;
            if (r.age_q025_ma <= age && age <= r.age_q975_ma)
                ++hole_held;
            else
                std::cout << "  " << h.hole << " " << r.depth_m << " m: true " << age
                          << " Ma outside [" << r.age_q025_ma << ", " << r.age_q975_ma << "]\n";
        }
        rows += hole_rows;
        held += hole_held;
        std::cout << h.hole << ": " << ties.size() << " ties kept, acceptance 10^"
                  << m.log10_acceptance << ", effective draws " << m.effective_draws
                  << ", 95 % band holds the true age at " << hole_held << "/" << hole_rows
                  << " grid depths; leading outlier "
                  << (m.outlier_ranking.empty() ? "-" : m.outlier_ranking.front().label)
                  << " (log10 gain "
                  << (m.outlier_ranking.empty() ? 0.0 : m.outlier_ranking.front().log10_gain)
                  << "); largest tail score " << m.tie_tails.front().label << " (z "
                  << m.tie_tails.front().z_score << ")\n";
        // The ties the order pulls farthest into their own tails, against the true age at
        // their posterior median depth.
        for (std::size_t k = 0; k < m.tie_tails.size() && k < 6; ++k) {
            const TieTail& t = m.tie_tails[k];
            std::cout << "  tail " << t.label << ": z " << t.z_score << ", median "
                      << t.age_q500_ma << " Ma at " << t.depth_q500_m << " m, true "
                      << trueAgeMa(truth, h.hole, t.depth_q500_m) << " Ma"
                      << (t.likely_outlier ? " [likely outlier]" : "") << "\n";
        }
        for (const HiatusEstimate& e : m.hiatuses) {
            bool made = false;
            for (const TrueHiatus& t : truth.hiatuses)
                made |= t.hole == h.hole && std::fabs(t.depth_m - e.depth_m) < 1e-6 &&
                        t.age_base_ma > t.age_top_ma;
            const bool found = e.duration_q500_myr && *e.duration_q500_myr > 0 &&
                               e.probability_positive > 0.9;
            hiatus_made += made;
            hiatus_found_made += made && found;
            hiatus_found_other += !made && found;
            std::cout << "  surface " << e.depth_m << " m: resolved " << e.resolved_share
                      << ", median " << e.duration_q500_myr.value_or(-1) << " Myr, P(>0) "
                      << e.probability_positive << (made ? " [made]" : " [none made]")
                      << (found ? " found" : "") << "\n";
        }
        for (const AccretionRate& r : m.rates) {
            if (r.defined_share < 0.5)
                continue;
            const double dt = trueAgeMa(truth, h.hole, r.base_m) - trueAgeMa(truth, h.hole, r.top_m);
            if (!(dt > 0) || !(r.base_m > r.top_m))
                continue;
            const double true_rate = (r.base_m - r.top_m) / dt;
            ++rates;
            rates_held += r.rate_q025_m_per_myr <= true_rate && true_rate <= r.rate_q975_m_per_myr;
        }
    }
    const double share = static_cast<double>(held) / rows;
    std::cout << "demo age models: 95 % band holds the true age at " << held << "/" << rows
              << " grid depths (" << 100 * share << " %); hiatuses made " << hiatus_made
              << ", found " << hiatus_found_made << ", found where none was made "
              << hiatus_found_other << "; true mean rate between tie midpoints inside its 95 % "
              << "band " << rates_held << "/" << rates << "\n";
    CHECK(holes_failed == 0);
    CHECK(share >= 0.90);
    CHECK(hiatus_found_made >= 4);
    CHECK(hiatus_found_other == 0);
    CHECK(rates_held >= 0.9 * rates);
}
