#include "draw/panel_title_block.hpp"

#include "draw/panel_style.hpp"
#include "draw/panel_vertical_axis.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <cstdio>
#include <string>

namespace atollog::draw {

namespace ps = panel_style;

namespace {

constexpr double kLineGap_mm = 1.2;

std::string holesLine(const PanelInput &in) {
    std::string s = in.columns.size() == 1 ? "hole " : "holes ";
    for (std::size_t i = 0; i < in.columns.size(); ++i) {
        s += (i ? ", " : "") + in.columns[i].hole;
    }
    return s;
}

std::string scaleLine(const PanelView &view, double mm_per_axis_unit) {
    char ratio[64];
    if (view.axis == PanelAxis::Age) {
        // A ratio means nothing between paper and time: give paper per million years.
        std::snprintf(ratio, sizeof ratio, "vertical scale %.3g mm per Myr", mm_per_axis_unit);
    } else {
        std::snprintf(ratio, sizeof ratio, "vertical scale 1:%.0f", view.scale_ratio);
    }
    std::string s = std::string(ratio) + "  \u00b7  " + panelAxisTitle(view);
    if (view.flatten_on) {
        s += ", flattened on " + *view.flatten_on;
    }
    if (!view.date_text.empty()) {
        s += "  \u00b7  " + view.date_text;
    }
    return s;
}

} // namespace

double panelTitleBlockHeight_mm(const PanelView &view) {
    if (!view.title_block) {
        return 0.0;
    }
    return textLineHeight_mm(ps::kTitleSize_pt) + 2 * kLineGap_mm +
           2 * textLineHeight_mm(ps::kSubtitleSize_pt);
}

RectMm appendPanelTitleBlock(DisplayList &list, const PanelInput &in, const PanelView &view,
                             PointMm top_left, double mm_per_axis_unit) {
    if (!view.title_block) {
        return RectMm{top_left.x_mm, top_left.y_mm, 0, 0};
    }
    double y = top_left.y_mm;
    double right = top_left.x_mm;
    const auto line = [&](const std::string &text, double size_pt, FontWeight weight,
                          ItemTag tag) {
        const double h = textLineHeight_mm(size_pt);
        list.add(Text{{top_left.x_mm, y + h / 2}, text, TextAnchor::Start, size_pt, weight, 0.0,
                      ps::kInk, std::move(tag)});
        right = std::max(right, top_left.x_mm + estimateTextWidth_mm(text, size_pt, weight));
        y += h + kLineGap_mm;
    };
    const std::string title = in.title.empty() ? "Correlation panel" : in.title;
    line(title, ps::kTitleSize_pt, FontWeight::Bold, {ItemRole::Title, title});
    line(holesLine(in), ps::kSubtitleSize_pt, FontWeight::Regular, {ItemRole::Subtitle, "holes"});
    line(scaleLine(view, mm_per_axis_unit), ps::kSubtitleSize_pt, FontWeight::Regular,
         {ItemRole::Subtitle, "scale"});
    return RectMm{top_left.x_mm, top_left.y_mm, right - top_left.x_mm, y - top_left.y_mm};
}

} // namespace atollog::draw
