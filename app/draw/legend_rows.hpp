#pragma once
// Legend layout shared by every picture: rows of a swatch and a label under bold block headings,
// growing downward from a top-left corner; the caller draws each swatch at the centre it is given.
#include "draw/display_list.hpp"

#include <functional>
#include <string>

namespace atollog::draw {

struct LegendLayout {
    double row_mm = 4.5;          ///< height of one row
    double text_pt = 7.0;         ///< label size
    double swatch_width_mm = 5.0; ///< room for the swatch left of the label
    double text_gap_mm = 2.0;     ///< between swatch and label
    Colour ink;                   ///< label colour
};

class LegendRows {
  public:
    LegendRows(DisplayList& list, PointMm top_left, const LegendLayout& layout);

    /// A bold heading; a half row of space separates it from a block above.
    void heading(const std::string& text);
    /// One row: `draw_swatch` gets the swatch's centre and adds its items; then the label.
    void row(const std::string& label, const std::function<void(PointMm)>& draw_swatch);
    /// The area the legend covers so far (empty at `top_left` when nothing was added).
    RectMm box(PointMm top_left) const;
    DisplayList& list() { return list_; }

  private:
    void placeText(const std::string& text, double x_mm, FontWeight weight);

    DisplayList& list_;
    double left_;
    double y_;
    LegendLayout layout_;
    double right_;
    int rows_ = 0;
};

} // namespace atollog::draw
