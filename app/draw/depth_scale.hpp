#pragma once

namespace atollog::draw {

/// Maps depth below the hole's datum (metres, increasing downward) to paper y (millimetres, y
/// down) and back: y_mm = origin_y_mm + (depth_m - top_m) * mm_per_m.
class DepthScale {
  public:
    /// Throws std::invalid_argument when a value is not finite or mm_per_m is not positive.
    DepthScale(double top_m, double mm_per_m, double origin_y_mm = 0.0);

    /// A drafting ratio 1:N (paper length : true length), e.g. N = 200 puts 1 m on 5 mm.
    static DepthScale fromRatio(double top_m, double ratio_denominator, double origin_y_mm = 0.0);

    double y_mm(double depth_m) const { return origin_y_mm_ + (depth_m - top_m_) * mm_per_m_; }
    double depth_m(double y_mm) const { return top_m_ + (y_mm - origin_y_mm_) / mm_per_m_; }

    double top_m() const { return top_m_; }
    double mm_per_m() const { return mm_per_m_; }
    double origin_y_mm() const { return origin_y_mm_; }

  private:
    double top_m_;
    double mm_per_m_;
    double origin_y_mm_;
};

} // namespace atollog::draw
