#include "atollog/engine/basement_age.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <stdexcept>

namespace atollog {

PooledAge pooledAge(const std::vector<double>& ages_ma, const std::vector<double>& sds_ma) {
    if (ages_ma.empty())
        throw std::invalid_argument("pooledAge: no age to pool");
    if (ages_ma.size() != sds_ma.size())
        throw std::invalid_argument("pooledAge: " + std::to_string(ages_ma.size()) +
                                    " ages but " + std::to_string(sds_ma.size()) + " sds");
    // Weights relative to the smallest sd, w_i = (sd_min / sd_i)^2 in (0, 1]: plain 1/sd^2
    // overflowed for sds of 1e-300 and underflowed to 0 for 1e300 (mean 0/0 = NaN).
    double sd_min = std::numeric_limits<double>::infinity();
    for (double s : sds_ma)
        if (s > 0) sd_min = std::min(sd_min, s);
    double sw = 0, swx = 0;
    for (std::size_t i = 0; i < ages_ma.size(); ++i) {
        if (!std::isfinite(ages_ma[i]))
            throw std::invalid_argument("pooledAge: age " + std::to_string(i + 1) + " is " +
                                        numberText(ages_ma[i]) + "; give a finite age");
        if (!std::isfinite(sds_ma[i]) || !(sds_ma[i] > 0))
            throw std::invalid_argument("pooledAge: sd " + std::to_string(i + 1) + " is " +
                                        numberText(sds_ma[i]) + "; give a finite sd > 0");
        const double ratio = sd_min / sds_ma[i];
        const double w = ratio * ratio;
        sw += w;
        swx += w * ages_ma[i];
    }
    PooledAge p;
    p.count = static_cast<int>(ages_ma.size());
    p.mean_ma = swx / sw;
    p.sd_plain_ma = sd_min / std::sqrt(sw);
    if (p.count > 1) {
        double chi2 = 0;
        for (std::size_t i = 0; i < ages_ma.size(); ++i) {
            const double z = (ages_ma[i] - p.mean_ma) / sds_ma[i];
            chi2 += z * z;
        }
        p.mswd = chi2 / (p.count - 1);
    }
    p.sd_ma = p.mswd > 1 ? p.sd_plain_ma * std::sqrt(p.mswd) : p.sd_plain_ma;
    // Dates scattered by ~1e154 sds (or summing past 1e308) overflow the mean or the MSWD.
    if (!std::isfinite(p.mean_ma) || !std::isfinite(p.mswd) || !std::isfinite(p.sd_ma))
        throw std::invalid_argument("pooledAge: the mean or MSWD of " + std::to_string(p.count) +
                                    " dates overflows a double; the ages lie too many sds "
                                    "apart: check the ages and sds");
    return p;
}

std::vector<AgeTie> poolBasementTies(const std::vector<AgeTie>& ties, double contact_m) {
    if (!std::isfinite(contact_m) || contact_m < 0)
        throw std::invalid_argument("poolBasementTies: contact depth is " +
                                    numberText(contact_m) + "; give a finite depth >= 0");
    std::vector<AgeTie> out;
    std::vector<double> ages, sds;
    std::string hole;
    for (const AgeTie& t : ties) {
        if (t.shallow_m >= contact_m) {
            ages.push_back(t.age.mean_ma());
            sds.push_back(t.age.sd_ma());
            hole = t.hole;
            continue;
        }
        AgeTie kept = t;
        if (kept.deep_m > contact_m) {
            kept.deep_m = contact_m;
            kept.flags.emplace_back("cut_at_basement");
        }
        out.push_back(std::move(kept));
    }
    if (ages.empty())
        return out;
    const PooledAge p = pooledAge(ages, sds);
    AgeTie b;
    b.hole = hole;
    b.label = "basement (" + std::to_string(p.count) + (p.count == 1 ? " date" : " dates") +
              ", MSWD " + numberText(std::round(p.mswd * 100) / 100) + ")";
    b.source = AgeTieSource::Date;
    b.shallow_m = contact_m;
    b.deep_m = contact_m;
    b.age = AgeDistribution::normal(p.mean_ma, p.sd_ma);
    b.flags.emplace_back("pooled_basement");
    out.push_back(std::move(b));
    return out;
}

} // namespace atollog
