#include "atollog/engine/chain_migration.hpp"

#include <cmath>
#include <map>
#include <stdexcept>
#include <string>

namespace atollog {
namespace {

bool isVolcanicMethod(DateMethod m) { return m == DateMethod::ArAr || m == DateMethod::KAr; }
bool isVolcanicRock(Rock r) { return r == Rock::Basalt || r == Rock::Volcaniclastic; }

struct DatedDepth {
    double depth_m = 0;
    double age_ma = 0;
    double age_sd_ma = 0;
};

} // namespace

std::vector<ChainPoint> basementAgesFromDataset(const CoreDataset& data, double distance_sd_km) {
    if (!std::isfinite(distance_sd_km) || distance_sd_km <= 0)
        throw std::invalid_argument("chain migration: distance_sd_km must be > 0, got " +
                                    std::to_string(distance_sd_km));
    std::map<std::string, const Sample*> samples;
    for (const Sample& s : data.samples)
        samples[s.sample] = &s;

    std::vector<ChainPoint> out;
    for (const Hole& hole : data.holes) {
        if (!hole.chain_km)
            continue;
        std::vector<DatedDepth> dated;
        for (const NumericalDate& d : data.dates) {
            if (d.hole != hole.hole || !isVolcanicMethod(d.method) || !d.age_ma || !d.age_sd_ma)
                continue;
            std::optional<double> depth = d.depth_m;
            if (!depth && d.sample) {
                const auto it = samples.find(*d.sample);
                if (it != samples.end())
                    depth = 0.5 * (it->second->top_m + it->second->base_m);
            }
            if (depth)
                dated.push_back({*depth, *d.age_ma, *d.age_sd_ma});
        }
        const DatedDepth* chosen = nullptr;
        for (const DatedDepth& dd : dated) {
            bool in_volcanic = false;
            for (const LithInterval& iv : data.intervals)
                if (iv.hole == hole.hole && isVolcanicRock(iv.rock) && iv.top_m <= dd.depth_m &&
                    dd.depth_m <= iv.base_m)
                    in_volcanic = true;
            if (in_volcanic && (!chosen || dd.age_ma > chosen->age_ma))
                chosen = &dd;
        }
        if (!chosen) // no date in a logged volcanic interval: the deepest volcanic date
            for (const DatedDepth& dd : dated)
                if (!chosen || dd.depth_m > chosen->depth_m)
                    chosen = &dd;
        if (!chosen)
            continue;
        if (!(chosen->age_sd_ma > 0))
            throw std::invalid_argument("chain migration: basement date of hole '" + hole.hole +
                                        "' has age_sd_ma " + std::to_string(chosen->age_sd_ma) +
                                        "; it must be > 0");
        out.push_back({hole.hole, *hole.chain_km, distance_sd_km, chosen->age_ma,
                       chosen->age_sd_ma});
    }
    return out;
}

ChainMigration chainMigration(std::span<const ChainPoint> points) {
    std::vector<double> x, x_sd, y, y_sd;
    for (const ChainPoint& p : points) {
        x.push_back(p.distance_km);
        x_sd.push_back(p.distance_sd_km);
        y.push_back(p.age_ma);
        y_sd.push_back(p.age_sd_ma);
    }
    ChainMigration m;
    m.york = yorkFit(x, x_sd, y, y_sd);
    m.ols = leastSquaresLine(x, y);
    m.points = static_cast<int>(points.size());
    m.intercept_ma = m.york.intercept;
    m.intercept_sd_ma = m.york.intercept_sd;
    m.mswd = m.york.mswd;
    if (m.york.slope > 0) {
        m.rate_km_per_myr = 1.0 / m.york.slope;
        // First-order propagation of the slope's sd through v = 1/b.
        m.rate_sd_km_per_myr = m.york.slope_sd / (m.york.slope * m.york.slope);
        // A slope near 0 (e.g. 1e-300 Myr/km) gives an infinite rate or sd: refused by name.
        if (!std::isfinite(*m.rate_km_per_myr) || !std::isfinite(*m.rate_sd_km_per_myr))
            throw std::invalid_argument("chain migration: the York slope " +
                                        std::to_string(m.york.slope) + " +/- " +
                                        std::to_string(m.york.slope_sd) +
                                        " Myr/km is too close to 0 for a rate 1/slope; the ages "
                                        "barely change along the chain");
    }
    if (m.ols.slope > 0)
        m.ols_rate_km_per_myr = 1.0 / m.ols.slope;
    return m;
}

} // namespace atollog
