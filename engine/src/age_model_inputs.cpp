#include "age_model_inputs.hpp"

#include "atollog/engine/basement_age.hpp"

#include <algorithm>
#include <cmath>
#include <sstream>
#include <stdexcept>

namespace atollog::detail {

namespace {

[[noreturn]] void fail(const std::string& what) {
    throw std::invalid_argument("buildAgeModel: " + what);
}

std::string num(double v) {
    std::ostringstream s;
    s << v;
    return s.str();
}

// Ages beyond this are no geology and would break the fixed-point means.
constexpr double kMaxAbsAgeMa = 1.0e6;

void validateSettings(const AgeModelSettings& s) {
    if (s.draws < 1 || s.draws > 10'000'000)
        fail("draws must be 1 .. 10,000,000, got " + std::to_string(s.draws));
    if (!std::isfinite(s.grid_step_m) || !(s.grid_step_m > 0))
        fail("grid_step_m must be finite and > 0, got " + num(s.grid_step_m));
    if (s.threads < 1 || s.threads > 256)
        fail("threads must be 1 .. 256, got " + std::to_string(s.threads));
    if (s.outlier_draws < 0 || s.outlier_draws > 10'000'000)
        fail("outlier_draws must be 0 .. 10,000,000, got " + std::to_string(s.outlier_draws));
    if (s.burn_in_sweeps < 0 || s.burn_in_sweeps > 1'000'000)
        fail("burn_in_sweeps must be 0 .. 1,000,000, got " + std::to_string(s.burn_in_sweeps));
    if (s.thin < 1 || s.thin > 1000)
        fail("thin must be 1 .. 1000, got " + std::to_string(s.thin));
    if (s.acceptance_draws < 1 || s.acceptance_draws > 10'000'000)
        fail("acceptance_draws must be 1 .. 10,000,000, got " +
             std::to_string(s.acceptance_draws));
    if (s.core_top) {
        if (!std::isfinite(s.core_top->age_ma) || std::fabs(s.core_top->age_ma) > kMaxAbsAgeMa)
            fail("core top age must be finite (|age| <= 1e6 Ma), got " + num(s.core_top->age_ma));
        if (!std::isfinite(s.core_top->sd_ma) || s.core_top->sd_ma < 0)
            fail("core top sd must be finite and >= 0, got " + num(s.core_top->sd_ma));
    }
    if (s.extrapolate_to_m && (!std::isfinite(*s.extrapolate_to_m) || *s.extrapolate_to_m < 0))
        fail("extrapolate_to_m must be finite and >= 0, got " + num(*s.extrapolate_to_m));
    if (s.section_base_m && (!std::isfinite(*s.section_base_m) || !(*s.section_base_m > 0)))
        fail("section_base_m must be finite and > 0, got " + num(*s.section_base_m));
    if (s.basement_contact_m &&
        (!std::isfinite(*s.basement_contact_m) || !(*s.basement_contact_m > 0)))
        fail("basement_contact_m must be finite and > 0, got " + num(*s.basement_contact_m));
    for (double d : s.hiatus_depths_m)
        if (!std::isfinite(d) || d < 0)
            fail("hiatus depth must be finite and >= 0, got " + num(d));
    for (const RateInterval& r : s.rate_intervals)
        if (!std::isfinite(r.top_m) || !std::isfinite(r.base_m) || !(r.base_m > r.top_m) ||
            r.top_m < 0)
            fail("rate interval '" + r.label + "' needs finite 0 <= top_m < base_m, got [" +
                 num(r.top_m) + ", " + num(r.base_m) + "]");
}

PreparedTie prepareTie(const std::string& hole, const AgeTie& t) {
    if (t.hole != hole)
        fail("tie '" + t.label + "' belongs to hole '" + t.hole + "', not '" + hole + "'");
    if (!std::isfinite(t.shallow_m) || !std::isfinite(t.deep_m) || t.shallow_m < 0 ||
        t.shallow_m > t.deep_m)
        fail("tie '" + t.label + "' needs finite 0 <= shallow_m <= deep_m, got [" +
             num(t.shallow_m) + ", " + num(t.deep_m) + "]");
    if (!(std::fabs(t.age.support_min_ma()) <= kMaxAbsAgeMa) ||
        !(std::fabs(t.age.support_max_ma()) <= kMaxAbsAgeMa))
        fail("tie '" + t.label + "' has ages beyond 1e6 Ma");
    PreparedTie p;
    p.label = t.label;
    p.shallow_m = t.shallow_m;
    p.deep_m = t.deep_m;
    p.age = t.age;
    return p;
}

} // namespace

PreparedModel prepareAgeModel(const std::string& hole, const std::vector<AgeTie>& ties,
                              const AgeModelSettings& settings,
                              const std::vector<double>& keep_draws_at_m) {
    if (hole.empty())
        fail("hole name is empty");
    validateSettings(settings);
    PreparedModel m;
    std::vector<PreparedTie> by_mid;
    for (const AgeTie& t : ties)
        by_mid.push_back(prepareTie(hole, t)); // validates before pooling reads any depth
    if (settings.basement_contact_m) {
        by_mid.clear();
        for (const AgeTie& t : poolBasementTies(ties, *settings.basement_contact_m))
            by_mid.push_back(prepareTie(hole, t));
    }
    // Why the midpoint: it only sets the order in which ties are first tried; each draw sorts
    // them by the depths it drew, so overlapping brackets may swap.
    std::stable_sort(by_mid.begin(), by_mid.end(), [](const PreparedTie& a, const PreparedTie& b) {
        return a.shallow_m + a.deep_m < b.shallow_m + b.deep_m;
    });
    if (settings.core_top) {
        PreparedTie top;
        top.label = "core top";
        top.is_core_top = true;
        const CoreTopAge& c = *settings.core_top;
        if (c.open) {
            // Flat from the given age to beyond every tie; the order cuts it at the shallowest
            // tie's age. Two points a quarter and three quarters in put the bin edges at the
            // ends (age_distribution.cpp).
            double oldest = c.age_ma;
            for (const PreparedTie& t : by_mid)
                oldest = std::max(oldest, t.age.support_max_ma());
            const double w = std::max(oldest - c.age_ma, 1e-9);
            top.age = AgeDistribution::gridded({c.age_ma + 0.25 * w, c.age_ma + 0.75 * w},
                                               {1.0, 1.0});
            top.open_floor = true;
        } else {
            top.exact_age = c.sd_ma == 0;
            top.age = top.exact_age ? AgeDistribution::normal(c.age_ma, 1.0)
                                    : AgeDistribution::normal(c.age_ma, c.sd_ma);
        }
        m.ties.push_back(std::move(top));
    }
    m.ties.insert(m.ties.end(), by_mid.begin(), by_mid.end());
    if (by_mid.empty())
        fail("hole '" + hole + "' has no tie");
    if (!settings.core_top && by_mid.size() < 2)
        fail("hole '" + hole + "' needs at least two ties without a core top age");

    double shallowest = by_mid.front().shallow_m;
    double deepest = 0;
    for (const PreparedTie& t : by_mid) {
        shallowest = std::min(shallowest, t.shallow_m);
        deepest = std::max(deepest, t.deep_m);
    }
    m.top_m = settings.core_top ? 0.0 : shallowest;
    m.base_m = deepest;
    if (settings.extrapolate_below) {
        if (settings.extrapolate_to_m)
            m.base_m = std::max(m.base_m, *settings.extrapolate_to_m);
        for (double d : keep_draws_at_m)
            if (std::isfinite(d))
                m.base_m = std::max(m.base_m, d);
        for (const RateInterval& r : settings.rate_intervals)
            m.base_m = std::max(m.base_m, r.base_m);
    }
    if (settings.section_base_m)
        m.base_m = std::min(m.base_m, *settings.section_base_m);
    if (settings.basement_contact_m)
        m.base_m = std::min(m.base_m, *settings.basement_contact_m);
    if (!(m.base_m > m.top_m))
        fail("hole '" + hole + "': the ties span no depth (top " + num(m.top_m) + " m, base " +
             num(m.base_m) + " m)");

    for (double d : keep_draws_at_m)
        if (!std::isfinite(d) || d < m.top_m || d > m.base_m)
            fail("kept depth " + num(d) + " m lies outside the model [" + num(m.top_m) + ", " +
                 num(m.base_m) + "] m");
    m.kept_m = keep_draws_at_m;
    for (const RateInterval& r : settings.rate_intervals)
        if (r.top_m < m.top_m || r.base_m > m.base_m)
            fail("rate interval '" + r.label + "' [" + num(r.top_m) + ", " + num(r.base_m) +
                 "] m lies outside the model [" + num(m.top_m) + ", " + num(m.base_m) + "] m");
    m.intervals = settings.rate_intervals;

    m.surfaces_m = settings.hiatus_depths_m;
    if (settings.basement_contact_m)
        m.surfaces_m.push_back(*settings.basement_contact_m);
    std::sort(m.surfaces_m.begin(), m.surfaces_m.end());
    m.surfaces_m.erase(std::unique(m.surfaces_m.begin(), m.surfaces_m.end()), m.surfaces_m.end());

    // Grid: multiples of the step inside [top, base], the two ends, and two nodes per surface.
    const double step = settings.grid_step_m;
    const double first_k = std::ceil(m.top_m / step - 1e-9);
    const double last_k = std::floor(m.base_m / step + 1e-9);
    if (last_k - first_k > 50'000'000)
        fail("grid_step_m " + num(step) + " over the model's depths [" + num(m.top_m) + ", " +
             num(m.base_m) + "] m gives more than 50,000,000 grid depths: check the tie "
             "depths and the grid step");
    m.nodes.push_back({m.top_m, false});
    for (double k = first_k; k <= last_k; ++k) {
        const double d = k * step;
        if (d > m.top_m + 1e-9 && d < m.base_m - 1e-9)
            m.nodes.push_back({d, false});
    }
    m.nodes.push_back({m.base_m, false});
    for (double s : m.surfaces_m)
        if (s > m.top_m && s <= m.base_m) {
            m.nodes.push_back({s, true});
            m.nodes.push_back({s, false});
        }
    std::sort(m.nodes.begin(), m.nodes.end(), [](const GridNode& a, const GridNode& b) {
        return a.depth_m != b.depth_m ? a.depth_m < b.depth_m
                                      : (a.above_surface && !b.above_surface);
    });
    m.nodes.erase(std::unique(m.nodes.begin(), m.nodes.end(),
                              [](const GridNode& a, const GridNode& b) {
                                  return a.depth_m == b.depth_m &&
                                         a.above_surface == b.above_surface;
                              }),
                  m.nodes.end());
    return m;
}

} // namespace atollog::detail
