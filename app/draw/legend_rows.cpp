#include "draw/legend_rows.hpp"

#include "draw/text_extent.hpp"

#include <algorithm>

namespace atollog::draw {

LegendRows::LegendRows(DisplayList& list, PointMm top_left, const LegendLayout& layout)
    : list_(list), left_(top_left.x_mm), y_(top_left.y_mm), layout_(layout),
      right_(top_left.x_mm) {}

void LegendRows::heading(const std::string& text) {
    if (rows_ > 0) y_ += layout_.row_mm * 0.5; // a half row between blocks
    placeText(text, left_, FontWeight::Bold);
    y_ += layout_.row_mm;
    ++rows_;
}

void LegendRows::row(const std::string& label, const std::function<void(PointMm)>& draw_swatch) {
    draw_swatch({left_ + layout_.swatch_width_mm / 2, y_ + layout_.row_mm / 2});
    placeText(label, left_ + layout_.swatch_width_mm + layout_.text_gap_mm, FontWeight::Regular);
    y_ += layout_.row_mm;
    ++rows_;
}

RectMm LegendRows::box(PointMm top_left) const {
    if (rows_ == 0) return RectMm{top_left.x_mm, top_left.y_mm, 0, 0};
    return RectMm{top_left.x_mm, top_left.y_mm, right_ - top_left.x_mm, y_ - top_left.y_mm};
}

void LegendRows::placeText(const std::string& text, double x_mm, FontWeight weight) {
    list_.add(Text{{x_mm, y_ + layout_.row_mm / 2},
                   text,
                   TextAnchor::Start,
                   layout_.text_pt,
                   weight,
                   0.0,
                   layout_.ink,
                   {ItemRole::LegendText, text}});
    right_ = std::max(right_, x_mm + estimateTextWidth_mm(text, layout_.text_pt, weight));
}

} // namespace atollog::draw
