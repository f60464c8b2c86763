#pragma once

#include <memory>
#include <vector>

namespace atollog::draw {

/// One knot of a warped depth scale: a depth (m below the hole's datum) and its value on the
/// panel's vertical axis (e.g. an age in Ma through the hole's age model).
struct AxisKnot {
    double depth_m = 0.0;
    double axis_value = 0.0;
};

/// Maps depth below the hole's datum (metres, increasing downward) to paper y (millimetres, y
/// down) and back. Plain scales are linear: y_mm = origin_y_mm + (depth_m - top_m) * mm_per_m.
/// A warped scale first maps depth to an axis value through knots (piecewise linear, both
/// coordinates non-decreasing), then the axis value linearly to y: this is how a column stands on
/// an age axis. Two knots at one depth make a step: the time a surface stands for opens as a gap.
class DepthScale {
  public:
    /// Throws std::invalid_argument when a value is not finite or mm_per_m is not positive.
    DepthScale(double top_m, double mm_per_m, double origin_y_mm = 0.0);

    /// A drafting ratio 1:N (paper length : true length), e.g. N = 200 puts 1 m on 5 mm.
    static DepthScale fromRatio(double top_m, double ratio_denominator, double origin_y_mm = 0.0);

    /// y_mm = origin_y_mm + (value(depth_m) - axis_top) * mm_per_axis_unit, value() through the
    /// knots; depths beyond the end knots take the end values. Throws std::invalid_argument for
    /// fewer than two knots, a non-finite value, knots whose depth or value decreases, knots
    /// spanning no depth, or a non-positive scale.
    static DepthScale warped(std::vector<AxisKnot> knots, double axis_top, double mm_per_axis_unit,
                             double origin_y_mm = 0.0);

    /// At a step (two knots at one depth) the deeper side: where what lies below the surface
    /// starts.
    double y_mm(double depth_m) const {
        return knots_ ? origin_y_mm_ + (axisValueBelow(depth_m) - top_m_) * mm_per_m_
                      : origin_y_mm_ + (depth_m - top_m_) * mm_per_m_;
    }
    /// At a step the shallower side: where what lies above the surface ends. Elsewhere y_mm.
    double yAbove_mm(double depth_m) const {
        return knots_ ? origin_y_mm_ + (axisValueAbove(depth_m) - top_m_) * mm_per_m_
                      : y_mm(depth_m);
    }
    /// The depth drawn at y; inside a step, the step's depth.
    double depth_m(double y_mm) const;

    /// Linear scales: the depth at origin_y_mm. Warped ones: the axis value there.
    double top_m() const { return top_m_; }
    /// Linear scales: mm per metre. Warped ones: the mean over the knots' depth span (paper
    /// length of the knots over their depth span), for choosing tick spacing.
    double mm_per_m() const;
    double origin_y_mm() const { return origin_y_mm_; }
    bool isWarped() const { return knots_ != nullptr; }

  private:
    double axisValueBelow(double depth_m) const;
    double axisValueAbove(double depth_m) const;

    double top_m_;
    double mm_per_m_; // mm per axis unit when warped
    double origin_y_mm_;
    std::shared_ptr<const std::vector<AxisKnot>> knots_; // null: linear
};

} // namespace atollog::draw
