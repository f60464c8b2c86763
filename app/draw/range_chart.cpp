#include "draw/range_chart.hpp"

#include "draw/depth_ticks.hpp"
#include "draw/group_palette.hpp"
#include "draw/range_chart_legend.hpp"
#include "draw/range_chart_symbols.hpp"
#include "draw/range_chart_validation.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <cstdio>
#include <string>

namespace atollog::draw {

namespace cs = chart_symbols;

namespace {

constexpr double kTitleGap_mm = 1.5;
constexpr double kHeaderGap_mm = 4.0;  // between subtitle and the tallest rotated name
constexpr double kNameToBody_mm = 1.5; // rotated names end this far above the body
constexpr double kMajorTick_mm = 1.8;
constexpr double kMinorTick_mm = 1.0;
constexpr double kLabelGap_mm = 0.8;
constexpr double kMarkerGap_mm = 0.3;
// Sample ticks start this far right of the axis, so they never read as depth ticks continued.
constexpr double kSampleTrackOffset_mm = 1.0;

std::string fixed(double v, int decimals) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f", decimals, v);
    return buf;
}

/// Horizontal positions, all derived from the style and the number of columns.
struct ChartColumns {
    double axis_x_mm = 0;      // the depth axis line
    double sample_left_mm = 0; // sample tick track, right of the axis
    double recovery_left_mm = 0;
    bool has_recovery = false;
    double taxa_left_mm = 0;
    double taxa_right_mm = 0;

    double taxonCentre_mm(std::size_t i, const RangeChartStyle &s) const {
        return taxa_left_mm + (static_cast<double>(i) + 0.5) * s.column_width_mm;
    }
};

ChartColumns placeColumns(const RangeChartInput &in, const RangeChartStyle &s) {
    ChartColumns c;
    c.axis_x_mm = s.margin_mm + s.depth_axis_width_mm;
    c.sample_left_mm = c.axis_x_mm + kSampleTrackOffset_mm;
    double x = c.sample_left_mm + s.sample_track_width_mm + s.track_gap_mm;
    c.has_recovery = !in.recovery.empty();
    if (c.has_recovery) {
        c.recovery_left_mm = x;
        x += s.recovery_track_width_mm + s.track_gap_mm;
    }
    c.taxa_left_mm = x;
    c.taxa_right_mm = x + static_cast<double>(in.taxa.size()) * s.column_width_mm;
    return c;
}

double titleBlockHeight_mm(const RangeChartStyle &s) {
    return textLineHeight_mm(s.title_size_pt) + kTitleGap_mm +
           textLineHeight_mm(s.subtitle_size_pt);
}

/// Header labels stand rotated above their column; the tallest sets the header height.
std::vector<std::string> trackHeadings(const RangeChartInput &in) {
    std::vector<std::string> names{"depth (m)", "samples"};
    if (!in.recovery.empty()) {
        names.emplace_back("recovery");
    }
    for (const ChartTaxon &t : in.taxa) {
        names.push_back(t.display_name);
    }
    return names;
}

double bodyTop_mm(const RangeChartInput &in, const RangeChartStyle &s) {
    double tallest = 0.0;
    for (const std::string &name : trackHeadings(in)) {
        tallest =
            std::max(tallest, estimateTextWidth_mm(name, s.label_size_pt, FontWeight::Regular));
    }
    return s.margin_mm + titleBlockHeight_mm(s) + kHeaderGap_mm + tallest + kNameToBody_mm;
}

Text rotatedHeading(double x_mm, double body_top_mm, const std::string &text,
                    const RangeChartStyle &s, ItemTag tag) {
    return Text{{x_mm, body_top_mm - kNameToBody_mm},
                text,
                TextAnchor::Start,
                s.label_size_pt,
                FontWeight::Regular,
                -90.0,
                cs::kInk,
                std::move(tag)};
}

void addTitle(DisplayList &list, const RangeChartInput &in, const RangeChartStyle &s) {
    const double title_h = textLineHeight_mm(s.title_size_pt);
    list.add(Text{{s.margin_mm, s.margin_mm + title_h / 2},
                  "Hole " + in.hole + " \u2013 range chart",
                  TextAnchor::Start,
                  s.title_size_pt,
                  FontWeight::Bold,
                  0.0,
                  cs::kInk,
                  {ItemRole::Title, in.hole}});
    const double sub_h = textLineHeight_mm(s.subtitle_size_pt);
    list.add(Text{{s.margin_mm, s.margin_mm + title_h + kTitleGap_mm + sub_h / 2},
                  "section " + fixed(in.top_m, 2) + "\u2013" + fixed(in.base_m, 2) +
                      " m, depth scale 1:" + fixed(in.scale_ratio, 0),
                  TextAnchor::Start,
                  s.subtitle_size_pt,
                  FontWeight::Regular,
                  0.0,
                  cs::kInk,
                  {ItemRole::Subtitle, in.hole}});
}

void addDepthAxis(DisplayList &list, const RangeChartInput &in, const RangeChartStyle &s,
                  const DepthScale &scale, const ChartColumns &cols, double body_top_mm) {
    const double top_y = scale.y_mm(in.top_m);
    const double base_y = scale.y_mm(in.base_m);
    const DepthTicks ticks =
        chooseDepthTicks(in.top_m, in.base_m, scale.mm_per_m(), s.major_tick_min_spacing_mm);
    // Light grid lines across the taxon columns at the labelled depths, drawn first (underneath).
    if (!in.taxa.empty()) {
        for (const double d : ticks.major_m) {
            list.add(Line{{cols.taxa_left_mm, scale.y_mm(d)},
                          {cols.taxa_right_mm, scale.y_mm(d)},
                          Stroke{cs::kGrid, 0.15, DashStyle::Solid},
                          {ItemRole::Frame, "grid"}});
        }
    }
    list.add(Line{{cols.axis_x_mm, top_y},
                  {cols.axis_x_mm, base_y},
                  Stroke{cs::kInk, 0.35, DashStyle::Solid},
                  {ItemRole::DepthAxis, ""}});
    for (const double d : ticks.minor_m) {
        list.add(Line{{cols.axis_x_mm - kMinorTick_mm, scale.y_mm(d)},
                      {cols.axis_x_mm, scale.y_mm(d)},
                      Stroke{cs::kInk, 0.2, DashStyle::Solid},
                      {ItemRole::DepthTick, fixed(d, ticks.label_decimals + 1)}});
    }
    for (const double d : ticks.major_m) {
        const std::string label = fixed(d, ticks.label_decimals);
        list.add(Line{{cols.axis_x_mm - kMajorTick_mm, scale.y_mm(d)},
                      {cols.axis_x_mm, scale.y_mm(d)},
                      Stroke{cs::kInk, 0.25, DashStyle::Solid},
                      {ItemRole::DepthTick, label}});
        list.add(Text{{cols.axis_x_mm - kMajorTick_mm - kLabelGap_mm, scale.y_mm(d)},
                      label,
                      TextAnchor::End,
                      s.label_size_pt,
                      FontWeight::Regular,
                      0.0,
                      cs::kInk,
                      {ItemRole::DepthLabel, label}});
    }
    list.add(rotatedHeading(cols.axis_x_mm - kMajorTick_mm - 2.5, body_top_mm, "depth (m)", s,
                            {ItemRole::DepthLabel, "heading"}));
}

void addSamples(DisplayList &list, const RangeChartInput &in, const RangeChartStyle &s,
                const DepthScale &scale, const ChartColumns &cols, double body_top_mm,
                RangeChartLegendContent &legend) {
    list.add(rotatedHeading(cols.sample_left_mm + s.sample_track_width_mm / 2, body_top_mm,
                            "samples", s, {ItemRole::SampleTick, "heading"}));
    for (const ChartSample &sample : in.samples) {
        const double y = scale.y_mm(sample.depth_m);
        if (sample.examined) {
            list.add(Line{{cols.sample_left_mm, y},
                          {cols.sample_left_mm + s.sample_track_width_mm, y},
                          Stroke{cs::kInk, 0.25, DashStyle::Solid},
                          {ItemRole::SampleTick, sample.id}});
            legend.sample_examined = true;
        } else {
            list.add(Marker{{cols.sample_left_mm + s.sample_track_width_mm / 2, y},
                            cs::kBarrenShape,
                            1.2,
                            cs::kInk,
                            true,
                            0.2,
                            {ItemRole::SampleTick, sample.id}});
            legend.sample_barren = true;
        }
    }
}

void addRecovery(DisplayList &list, const RangeChartInput &in, const RangeChartStyle &s,
                 const DepthScale &scale, const ChartColumns &cols, double body_top_mm,
                 RangeChartLegendContent &legend) {
    if (!cols.has_recovery) {
        return;
    }
    list.add(rotatedHeading(cols.recovery_left_mm + s.recovery_track_width_mm / 2, body_top_mm,
                            "recovery", s, {ItemRole::RecoveryRun, "heading"}));
    for (const RecoveryInterval &r : in.recovery) {
        const RectMm box{cols.recovery_left_mm, scale.y_mm(r.top_m), s.recovery_track_width_mm,
                         scale.y_mm(r.base_m) - scale.y_mm(r.top_m)};
        if (r.recovered) {
            list.add(Rect{box,
                          cs::kRecovered,
                          FillPattern::None,
                          std::nullopt,
                          {ItemRole::RecoveryRun, "recovered"}});
            legend.recovered = true;
        } else {
            list.add(Rect{box,
                          cs::kWhite,
                          FillPattern::None,
                          Stroke{cs::kOutline, 0.15, DashStyle::Solid},
                          {ItemRole::RecoveryRun, "unrecovered"}});
            legend.unrecovered = true;
        }
    }
}

/// A "]"-shaped bracket: the vertical at x_mm from shallow to deep with caps pointing left,
/// toward the pick marker.
Polyline bracket(double x_mm, double shallow_y_mm, double deep_y_mm, DashStyle dash, ItemTag tag) {
    return Polyline{{{x_mm - cs::kBracketCap_mm, shallow_y_mm},
                     {x_mm, shallow_y_mm},
                     {x_mm, deep_y_mm},
                     {x_mm - cs::kBracketCap_mm, deep_y_mm}},
                    Stroke{cs::kInk, cs::kBracketWidth_mm, dash},
                    std::move(tag)};
}

void addPick(DisplayList &list, const RangeChartInput &in, const ChartPick &p,
             const RangeChartStyle &s, const DepthScale &scale, double centre_x_mm,
             RangeChartLegendContent &legend) {
    const bool top = p.kind == PickKind::Top;
    const double marker_x = centre_x_mm + s.bar_width_mm / 2 + kMarkerGap_mm + s.pick_marker_mm / 2;
    const double bracket_x = marker_x + s.pick_marker_mm / 2 + 0.5;
    const double extended_x = bracket_x + 0.8;

    list.add(Marker{{marker_x, scale.y_mm(p.depth_m)},
                    top ? cs::kTopShape : cs::kBaseShape,
                    s.pick_marker_mm,
                    cs::kInk,
                    false,
                    0.2,
                    {ItemRole::PickMarker, p.event_id}});
    (top ? legend.top_pick : legend.base_pick) = true;

    list.add(bracket(bracket_x, scale.y_mm(p.shallow_m), scale.y_mm(p.deep_m), DashStyle::Solid,
                     {ItemRole::PickBracket, p.event_id}));
    legend.bracket = true;

    if (p.extended_shallow_m || p.extended_deep_m) {
        // Clipped to the section: the chart has no paper beyond it.
        const double shallow = std::max(in.top_m, p.extended_shallow_m.value_or(p.shallow_m));
        const double deep = std::min(in.base_m, p.extended_deep_m.value_or(p.deep_m));
        list.add(bracket(extended_x, scale.y_mm(shallow), scale.y_mm(deep), DashStyle::Dashed,
                         {ItemRole::PickExtendedBracket, p.event_id}));
        legend.extended_bracket = true;
    }

    if (p.open_ended) {
        // A dotted continuation of the bracket past its outward end, with an arrowhead.
        const double from_y = scale.y_mm(top ? p.shallow_m : p.deep_m);
        const double to_y = from_y + (top ? -cs::kOpenEndLength_mm : cs::kOpenEndLength_mm);
        list.add(Line{{bracket_x, from_y},
                      {bracket_x, to_y},
                      Stroke{cs::kInk, cs::kBracketWidth_mm, DashStyle::Dotted},
                      {ItemRole::PickBracket, p.event_id}});
        list.add(Marker{{bracket_x, to_y},
                        top ? MarkerShape::TriangleUp : MarkerShape::TriangleDown,
                        cs::kOpenEndMarker_mm,
                        cs::kInk,
                        true,
                        0.2,
                        {ItemRole::PickBracket, p.event_id}});
        legend.open_ended = true;
    }
}

void addTaxon(DisplayList &list, const ChartTaxon &taxon, const RangeChartStyle &s,
              const DepthScale &scale, double centre_x_mm, double body_top_mm,
              double body_bottom_mm, RangeChartLegendContent &legend) {
    const Colour colour = groupColour(taxon.group);
    list.add(rotatedHeading(centre_x_mm, body_top_mm, taxon.display_name, s,
                            {ItemRole::TaxonName, taxon.id}));
    // A faint guide down the column ties markers far below to the name at the top.
    list.add(Line{{centre_x_mm, body_top_mm},
                  {centre_x_mm, body_bottom_mm},
                  Stroke{cs::kGuide, 0.1, DashStyle::Dotted},
                  {ItemRole::Frame, taxon.id}});

    const ChartOccurrence *highest = nullptr;
    const ChartOccurrence *lowest = nullptr;
    for (const ChartOccurrence &o : taxon.occurrences) {
        if (o.kind != OccurrenceKind::InPlace) {
            continue;
        }
        if (highest == nullptr || o.depth_m < highest->depth_m) {
            highest = &o;
        }
        if (lowest == nullptr || o.depth_m > lowest->depth_m) {
            lowest = &o;
        }
    }
    if (highest != nullptr) {
        const double y0 = scale.y_mm(highest->depth_m);
        const double y1 = scale.y_mm(lowest->depth_m);
        list.add(Rect{{centre_x_mm - s.bar_width_mm / 2, y0, s.bar_width_mm, y1 - y0},
                      colour,
                      FillPattern::None,
                      Stroke{cs::kOutline, cs::kBarOutline_mm, DashStyle::Solid},
                      {ItemRole::TaxonRangeBar, taxon.id}});
        legend.range_bar = true;
    }

    // Not-in-place finds sit left of the bar, clear of it, so they are never read as range.
    const double aside_x = centre_x_mm - s.bar_width_mm / 2 - kMarkerGap_mm - s.max_marker_mm / 2;
    for (const ChartOccurrence &o : taxon.occurrences) {
        const double size = cs::occurrenceMarker_mm(s, o.abundance_rank);
        const double y = scale.y_mm(o.depth_m);
        switch (o.kind) {
        case OccurrenceKind::InPlace:
            list.add(Marker{{centre_x_mm, y},
                            MarkerShape::Circle,
                            size,
                            colour,
                            false,
                            0.15,
                            {ItemRole::Occurrence, taxon.id}});
            legend.in_place = true;
            break;
        case OccurrenceKind::Reworked:
            list.add(Marker{{aside_x, y},
                            cs::kReworkedShape,
                            size,
                            cs::kInk,
                            true,
                            0.2,
                            {ItemRole::Occurrence, taxon.id}});
            legend.reworked = true;
            break;
        case OccurrenceKind::Caved:
            list.add(Marker{{aside_x, y},
                            cs::kCavedShape,
                            size,
                            cs::kInk,
                            true,
                            0.2,
                            {ItemRole::Occurrence, taxon.id}});
            legend.caved = true;
            break;
        }
    }
}

} // namespace

DepthScale rangeChartDepthScale(const RangeChartInput &input, const RangeChartStyle &style) {
    return DepthScale::fromRatio(input.top_m, input.scale_ratio, bodyTop_mm(input, style));
}

DisplayList layoutRangeChart(const RangeChartInput &in, const RangeChartStyle &s) {
    validateRangeChartInput(in);
    DisplayList list;
    const DepthScale scale = rangeChartDepthScale(in, s);
    const ChartColumns cols = placeColumns(in, s);
    const double body_top = scale.y_mm(in.top_m);
    const double body_bottom = scale.y_mm(in.base_m);
    RangeChartLegendContent legend;

    addTitle(list, in, s);
    addDepthAxis(list, in, s, scale, cols, body_top);
    addSamples(list, in, s, scale, cols, body_top, legend);
    addRecovery(list, in, s, scale, cols, body_top, legend);

    for (std::size_t i = 0; i < in.taxa.size(); ++i) {
        const ChartTaxon &taxon = in.taxa[i];
        if (std::find(legend.groups.begin(), legend.groups.end(), taxon.group) ==
            legend.groups.end()) {
            legend.groups.push_back(taxon.group);
        }
        addTaxon(list, taxon, s, scale, cols.taxonCentre_mm(i, s), body_top, body_bottom, legend);
    }
    // Picks after all bars, so a bracket is never hidden under the next column's items.
    for (const ChartPick &p : in.picks) {
        const auto it = std::find_if(in.taxa.begin(), in.taxa.end(),
                                     [&](const ChartTaxon &t) { return t.id == p.taxon_id; });
        const auto column = static_cast<std::size_t>(it - in.taxa.begin());
        addPick(list, in, p, s, scale, cols.taxonCentre_mm(column, s), legend);
    }

    const double legend_left =
        std::max(cols.taxa_right_mm, cols.sample_left_mm + s.sample_track_width_mm) +
        s.legend_gap_mm;
    const RectMm legend_box = appendRangeChartLegend(list, legend, {legend_left, body_top}, s);

    // The page holds everything drawn plus the margin on every side.
    RectMm content = list.boundingBox().united(legend_box);
    const double right = content.right_mm() + s.margin_mm;
    const double bottom = std::max(body_bottom, content.bottom_mm()) + s.margin_mm;
    list.setPage(RectMm{0.0, 0.0, right, bottom});
    return list;
}

} // namespace atollog::draw
