#include "draw/panel_vertical_axis.hpp"

#include "draw/depth_ticks.hpp"
#include "draw/hole_column_header.hpp"
#include "draw/panel_style.hpp"

#include <cstdio>

namespace atollog::draw {

namespace ps = panel_style;

namespace {

constexpr double kMajorTick_mm = 2.0;
constexpr double kMinorTick_mm = 1.0;
constexpr double kLabelGap_mm = 0.8;
constexpr double kMinLabelSpacing_mm = 10.0;

std::string fixed(double v, int decimals) {
    char buf[64];
    // Adding 0.0 turns -0.0 into 0.0, so the sea-level tick never reads "-0".
    std::snprintf(buf, sizeof buf, "%.*f", decimals, v + 0.0);
    return buf;
}

} // namespace

std::string panelAxisTitle(const PanelView &view) {
    if (view.axis == PanelAxis::Age) {
        return "age from the age models (Ma)";
    }
    const std::string unit = depthUnitWord(view.depth_unit);
    if (view.flatten_on) {
        return "depth below " + *view.flatten_on + " (" + unit + ")";
    }
    if (view.axis == PanelAxis::Elevation) {
        return "elevation above sea level (" + unit + ")";
    }
    return "depth below collar (" + unit + ")";
}

void appendPanelVerticalAxis(DisplayList &list, const PanelFrame &f, const PanelView &view,
                             double right_mm) {
    // Ages are in Ma whatever unit the depths are labelled in.
    const double unit_m =
        view.depth_unit == DepthUnit::Feet && view.axis != PanelAxis::Age ? kMetresPerFoot : 1.0;
    // Elevation labels are heights: the negated axis value.
    const double sign = view.axis == PanelAxis::Elevation && !view.flatten_on ? -1.0 : 1.0;
    const double x = f.axis_x_mm;
    const double top_y = f.y_mm(f.axis_top_m), base_y = f.y_mm(f.axis_base_m);
    list.add(Line{{x, top_y}, {x, base_y}, Stroke{ps::kInk, 0.35, DashStyle::Solid},
                  {ItemRole::PanelAxis, "axis"}});

    const DepthTicks ticks = chooseDepthTicks(f.axis_top_m / unit_m, f.axis_base_m / unit_m,
                                              f.mm_per_axis_unit * unit_m, kMinLabelSpacing_mm);
    for (const double v : ticks.minor_m) {
        const double y = f.y_mm(v * unit_m);
        list.add(Line{{x - kMinorTick_mm, y}, {x, y}, Stroke{ps::kInk, 0.2, DashStyle::Solid},
                      {ItemRole::PanelAxis, fixed(sign * v, ticks.label_decimals + 1)}});
    }
    for (const double v : ticks.major_m) {
        const double y = f.y_mm(v * unit_m);
        const std::string label = fixed(sign * v, ticks.label_decimals);
        list.add(Line{{x - kMajorTick_mm, y}, {x, y}, Stroke{ps::kInk, 0.25, DashStyle::Solid},
                      {ItemRole::PanelAxis, label}});
        list.add(Text{{x - kMajorTick_mm - kLabelGap_mm, y}, label, TextAnchor::End,
                      ps::kAxisLabelSize_pt, FontWeight::Regular, 0.0, ps::kInk,
                      {ItemRole::PanelAxisLabel, label}});
    }
    list.add(Text{{ps::kMargin_mm + 1.5, (top_y + base_y) / 2}, panelAxisTitle(view),
                  TextAnchor::Middle, ps::kAxisLabelSize_pt, FontWeight::Bold, -90.0, ps::kInk,
                  {ItemRole::PanelAxis, "title"}});

    if (sign < 0.0 && f.axis_top_m <= 0.0 && f.axis_base_m >= 0.0) {
        const double y = f.y_mm(0.0);
        list.add(Line{{x, y}, {right_mm, y}, ps::kSeaLevelStroke, {ItemRole::SeaLevel, "0"}});
    }
}

} // namespace atollog::draw
