#pragma once
// The age-depth line of one draw: linear between ties in depth order, with a jump at a logged
// surface when the ties on either side, extrapolated to it, leave a gap (see age_model.hpp), and
// extrapolated beyond the end ties with the end segments' rates.
#include "age_model_draw.hpp"

#include <vector>

namespace atollog::detail {

struct SurfaceOutcome {
    bool resolved = false;      ///< the only surface between two ties with a rate on a side
    double jump_ma = 0;         ///< >= 0; 0 when unresolved
    double profile_jump_ma = 0; ///< the jump the line makes here (several surfaces: its share)
};

class AgeProfile {
  public:
    /// surfaces_m ascending. Reuses its storage between draws.
    void build(const TieDraw& draw, const std::vector<double>& surfaces_m);
    /// Age at a depth; above: the limit from above (just above a surface at that depth).
    double ageAt(double depth_m, bool above) const;
    /// Ages at ascending nodes (above-surface node first at equal depth), written to out[i * stride].
    template <class Node> void ageAtNodes(const std::vector<Node>& nodes, double* out,
                                          std::size_t stride) const {
        std::size_t k = 0;
        const std::size_t last = pieces_.size() - 1;
        for (std::size_t i = 0; i < nodes.size(); ++i) {
            const double d = nodes[i].depth_m;
            if (nodes[i].above_surface)
                while (k < last && pieces_[k + 1].from_m < d)
                    ++k;
            else
                while (k < last && pieces_[k + 1].from_m <= d)
                    ++k;
            const Piece& p = pieces_[k];
            out[i * stride] = p.anchor_age_ma + p.rate_ma_per_m * (d - p.anchor_m);
        }
    }
    const std::vector<SurfaceOutcome>& surfaces() const { return outcomes_; }

  private:
    struct Piece {
        double from_m;
        double anchor_m;
        double anchor_age_ma;
        double rate_ma_per_m; ///< age per metre, >= 0
    };
    void splitBetweenSurfaces(const TieDraw& draw, const std::vector<double>& surfaces_m,
                              std::size_t first, std::size_t last, double age_above,
                              double age_below, double r_above, double r_below);

    std::vector<Piece> pieces_;
    std::vector<double> cuts_;
    std::vector<SurfaceOutcome> outcomes_;
    std::vector<double> z_, a_;
};

} // namespace atollog::detail
