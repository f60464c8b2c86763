#pragma once
// An age known as a probability distribution, in Ma before present: a normal (a time-scale
// event, an Ar-Ar date, a U-Th age) or a gridded density (a calibrated radiocarbon age). The age
// model draws from it, also between bounds (truncated draws), through cdf() and quantile().
#include <vector>

namespace atollog {

class AgeDistribution {
  public:
    /// Normal(mean, sd). Throws std::invalid_argument unless both are finite and sd > 0.
    static AgeDistribution normal(double mean_ma, double sd_ma);
    /// A density given at ascending, equally or unequally spaced ages (at least two points),
    /// piecewise constant between midpoints of neighbouring ages; normalised here. Throws
    /// std::invalid_argument on non-finite or negative values, unsorted ages, or zero mass.
    static AgeDistribution gridded(std::vector<double> ages_ma, std::vector<double> density);

    bool isNormal() const { return grid_ages_ma_.empty(); }
    double mean_ma() const { return mean_ma_; }
    double sd_ma() const { return sd_ma_; }
    /// P(age <= age_ma), in [0, 1].
    double cdf(double age_ma) const;
    /// The age at cumulative probability p; p in (0, 1) (throws std::invalid_argument outside).
    double quantile(double p) const;
    /// Smallest and largest age with non-negligible probability (normal: mean -/+ 8 sd).
    double support_min_ma() const;
    double support_max_ma() const;
    /// The grid of a gridded distribution (empty for a normal).
    const std::vector<double>& grid_ages_ma() const { return grid_ages_ma_; }
    const std::vector<double>& grid_cdf() const { return grid_cdf_; }

  private:
    AgeDistribution() = default;
    double mean_ma_ = 0;
    double sd_ma_ = 0;
    std::vector<double> grid_ages_ma_;  ///< bin edges (n + 1) for a gridded density
    std::vector<double> grid_cdf_;      ///< cumulative probability at each edge (0 ... 1)
};

} // namespace atollog
