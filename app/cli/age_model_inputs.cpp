#include "cli/age_model_inputs.hpp"

#include "atollog/engine/biostrat_run.hpp"
#include "atollog/engine/date_ages.hpp"
#include "atollog/engine/logged_surfaces.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <sstream>
#include <stdexcept>

namespace atollog::cli {
namespace {

bool isBoundstoneFamily(const std::optional<Texture>& t) {
    return t && (*t == Texture::Boundstone || *t == Texture::Framestone ||
                 *t == Texture::Bindstone || *t == Texture::Bafflestone);
}

std::string metres(double v) {
    std::ostringstream out;
    out.setf(std::ios::fixed);
    out.precision(2);
    out << v;
    return out.str();
}

/// Carbonate packages between consecutive logged surfaces within [top_m, base_m].
std::vector<RateInterval> packagesOf(const CoreDataset& data, const std::string& hole,
                                     const std::vector<double>& surfaces, double top_m,
                                     double base_m) {
    std::vector<double> edges{top_m};
    for (double s : surfaces)
        if (s > top_m && s < base_m) edges.push_back(s);
    edges.push_back(base_m);
    std::vector<RateInterval> packages;
    for (std::size_t i = 0; i + 1 < edges.size(); ++i) {
        const double a = edges[i], b = edges[i + 1];
        if (b - a < 0.5) continue; // too thin for a meaningful rate
        double reef_m = 0, carbonate_m = 0;
        for (const auto& iv : data.intervals) {
            if (iv.hole != hole || !isCarbonate(iv.rock)) continue;
            const double overlap = std::min(b, iv.base_m) - std::max(a, iv.top_m);
            if (overlap <= 0) continue;
            carbonate_m += overlap;
            if (isBoundstoneFamily(iv.texture)) reef_m += overlap;
        }
        if (carbonate_m <= 0) continue;
        packages.push_back({"package " + metres(a) + "-" + metres(b) + " m", a, b,
                            reef_m > 0.5 * carbonate_m});
    }
    return packages;
}

} // namespace

AgeModelSettings AgeModelOptions::settings() const {
    AgeModelSettings s;
    s.draws = draws;
    s.seed = seed;
    s.grid_step_m = grid_step_m;
    s.core_top =
        CoreTopAge{core_top_age_ka.value_or(0.0) / 1e3, core_top_sd_ka / 1e3, core_top_open};
    s.extrapolate_below = extrapolate_below;
    s.threads = threads;
    s.outlier_draws = outlier_draws;
    return s;
}

std::string AgeModelOptions::settingsText() const {
    std::ostringstream out;
    out.precision(17);
    out << "age.draws=" << draws << "\nage.seed=" << seed << "\nage.grid_step_m=" << grid_step_m
        << "\nage.core_top_age_ka=" << core_top_age_ka.value_or(0.0)
        << "\nage.core_top_sd_ka=" << core_top_sd_ka
        << "\nage.core_top_open=" << core_top_open
        << "\nage.extrapolate_below=" << extrapolate_below
        << "\nage.outlier_draws=" << outlier_draws << '\n'
        << biostratSettingsText(biostrat.settings()) << '\n'
        << dates.settingsText();
    return out.str();
}

void addAgeModelOptions(CLI::App& sub, AgeModelOptions& o) {
    sub.add_option("--draws", o.draws, "Monte Carlo draws of the age model")
        ->check(CLI::Range(100, 10000000))
        ->capture_default_str();
    sub.add_option("--seed", o.seed, "Seed of the age model: the same seed gives the same result")
        ->capture_default_str();
    sub.add_option("--grid-step", o.grid_step_m, "Depth step of the age grid (m)")
        ->check(CLI::PositiveNumber)
        ->capture_default_str();
    sub.add_option("--core-top-age-ka", o.core_top_age_ka,
                   "Age of the core top (collar) in ka; default present day");
    sub.add_flag("--core-top-open", o.core_top_open,
                 "The core top is only known to be no younger than its age (present day or "
                 "--core-top-age-ka) and no older than the shallowest tie: for a raised, "
                 "emerged or eroded reef top");
    sub.add_option("--core-top-sd-ka", o.core_top_sd_ka, "Its standard deviation (ka)")
        ->check(CLI::NonNegativeNumber);
    sub.add_flag("--extrapolate-below", o.extrapolate_below,
                 "Extend the model below the deepest tie with the deepest segment's rate");
    sub.add_option("--threads", o.threads, "Threads (the result does not depend on it)")
        ->check(CLI::Range(1, 256))
        ->capture_default_str();
    sub.add_option("--outlier-draws", o.outlier_draws,
                   "Draws per leave-one-out run of the outlier search (0: no search)")
        ->check(CLI::Range(0, 1000000))
        ->capture_default_str();
    addBiostratOptions(sub, o.biostrat);
    addDateOptions(sub, o.dates);
}

std::vector<HoleModelInputs> gatherAgeModelInputs(const CoreDataset& data,
                                                  const AgeModelOptions& options,
                                                  const std::string& hole) {
    const BiostratResult bio = runBiostratigraphy(data, options.biostrat.settings());
    std::vector<AgeTie> ties = ageTiesFromTiePoints(bio.ties);
    const std::vector<DateAge> dates = computeDateAges(data, options.dates.settings());
    for (auto& t : ageTiesFromDates(dates)) ties.push_back(std::move(t));
    std::vector<AgeTie> excluded;
    for (const auto& d : dates)
        if (!d.usable_for_model && d.age)
            excluded.push_back({d.hole,
                                std::string(toString(d.method)) + " " +
                                    d.sample.value_or(metres(d.shallow_m) + " m"),
                                AgeTieSource::Date, d.shallow_m, d.deep_m, *d.age,
                                {dateFlagsText(d)}});
    const auto surfaces = loggedSurfaces(data);

    std::vector<HoleModelInputs> out;
    for (const auto& h : data.holes) {
        if (!hole.empty() && h.hole != hole) continue;
        HoleModelInputs in;
        in.hole = h.hole;
        for (const auto& t : ties)
            if (t.hole == h.hole) in.ties.push_back(t);
        for (const auto& t : excluded)
            if (t.hole == h.hole) in.excluded.push_back(t);
        if (in.ties.empty()) {
            if (!hole.empty())
                throw std::invalid_argument("hole '" + hole +
                                            "' has no tie (no datum pick and no usable date): "
                                            "no age model");
            continue;
        }
        for (const auto& s : surfacesOfHole(surfaces, h.hole)) {
            if (s.kind == LoggedSurfaceKind::BasementContact) {
                if (!in.basement_contact_m || s.depth_m < *in.basement_contact_m)
                    in.basement_contact_m = s.depth_m;
                continue; // the engine makes the contact a hiatus itself
            }
            in.hiatus_depths_m.push_back(s.depth_m);
        }
        for (const auto& r : data.runs)
            if (r.hole == h.hole)
                in.section_base_m = std::max(in.section_base_m.value_or(0.0), r.base_m);
        double deepest_m = 0;
        for (const auto& t : in.ties) deepest_m = std::max(deepest_m, t.deep_m);
        if (in.section_base_m) deepest_m = std::min(deepest_m, *in.section_base_m);
        if (in.basement_contact_m) deepest_m = std::min(deepest_m, *in.basement_contact_m);
        in.packages = packagesOf(data, h.hole, in.hiatus_depths_m, 0.0, deepest_m);
        out.push_back(std::move(in));
    }
    if (!hole.empty() && out.empty()) {
        std::string known;
        for (const auto& h : data.holes) known += (known.empty() ? "" : ", ") + h.hole;
        throw std::invalid_argument("no hole '" + hole + "' in the project; holes are: " + known);
    }
    return out;
}

AgeModel buildHoleModel(const HoleModelInputs& in, const AgeModelOptions& options,
                        const std::vector<double>& keep_draws_at_m, const WorkProgress& progress) {
    AgeModelSettings s = options.settings();
    s.hiatus_depths_m = in.hiatus_depths_m;
    s.rate_intervals = in.packages;
    s.basement_contact_m = in.basement_contact_m;
    s.section_base_m = in.section_base_m;
    return buildAgeModel(in.hole, in.ties, s, keep_draws_at_m, progress);
}

} // namespace atollog::cli
