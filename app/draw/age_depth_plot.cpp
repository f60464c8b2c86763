#include "draw/age_depth_plot.hpp"

#include "draw/age_depth_plot_envelope.hpp"
#include "draw/age_depth_plot_labels.hpp"
#include "draw/age_depth_plot_legend.hpp"
#include "draw/age_depth_plot_symbols.hpp"
#include "draw/age_depth_plot_validation.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace atollog::draw {

namespace sym = age_plot_symbols;

namespace {

constexpr double kMinorTick_mm = 1.0;
constexpr double kLabelGap_mm = 0.8;
constexpr double kTieLabelGap_mm = 1.0; // between a cross's end and its label
constexpr double kSecondColumn_mm = 28.0; // how far out the crowded labels' column stands
constexpr double kHiatusLabelInset_mm = 1.5;

std::string fixed(double v, int decimals) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f", decimals, v);
    return buf;
}

/// Two significant digits at least, never more than four decimals: 0.42, 0.042, 1.3, 12.
std::string duration(double ma) {
    if (ma <= 0.0) {
        return "0";
    }
    const int decimals = std::clamp(1 - static_cast<int>(std::floor(std::log10(ma))), 0, 4);
    return fixed(ma, decimals);
}

Text plainText(PointMm at, std::string text, TextAnchor anchor, double size_pt, Colour colour,
               ItemTag tag, FontWeight weight = FontWeight::Regular, double rotation_deg = 0.0) {
    return Text{at, std::move(text), anchor, size_pt, weight, rotation_deg, colour, std::move(tag)};
}

void addTitle(DisplayList &list, const AgeDepthPlotInput &in, const AgeDepthPlotStyle &s,
              const AgeDepthPlotFrame &f) {
    list.add(plainText({s.margin_mm, f.title_y_mm}, "Hole " + in.hole + " \u2013 age-depth model",
                       TextAnchor::Start, s.title_size_pt, sym::kInk, {ItemRole::Title, in.hole},
                       FontWeight::Bold));
    list.add(plainText(
        {s.margin_mm, f.subtitle_y_mm},
        "depth " + fixed(in.top_m, 2) + "\u2013" + fixed(in.base_m, 2) +
            " m at 1:" + fixed(in.scale_ratio, 0) + "; shaded: 95 % range of " + "the modelled age",
        TextAnchor::Start, s.subtitle_size_pt, sym::kInk, {ItemRole::Subtitle, in.hole}));
}

/// Light grid lines at the labelled depths and ages, over the band so it can be read through.
void addGrid(DisplayList &list, const AgeDepthPlotFrame &f) {
    const Stroke grid{sym::kGrid, 0.15, DashStyle::Solid};
    const ItemTag tag{ItemRole::Frame, "grid"};
    const RectMm &p = f.plot_mm;
    for (const double d : f.depth_ticks.major_m) {
        const double y = f.depth.y_mm(d);
        list.add(Line{{p.left_mm, y}, {p.right_mm(), y}, grid, tag});
    }
    for (const double a : f.age_ticks.major_m) {
        const double x = f.age.x_mm(a);
        list.add(Line{{x, p.top_mm}, {x, p.bottom_mm()}, grid, tag});
    }
}

void addAxes(DisplayList &list, const AgeDepthPlotStyle &s, const AgeDepthPlotFrame &f) {
    const RectMm &p = f.plot_mm;
    list.add(Rect{p,
                  std::nullopt,
                  FillPattern::None,
                  Stroke{sym::kInk, 0.35, DashStyle::Solid},
                  {ItemRole::Frame, "plot"}});

    // Depth down the left side, ticks outward.
    for (const double d : f.depth_ticks.minor_m) {
        list.add(Line{{p.left_mm - kMinorTick_mm, f.depth.y_mm(d)},
                      {p.left_mm, f.depth.y_mm(d)},
                      Stroke{sym::kInk, 0.2, DashStyle::Solid},
                      {ItemRole::DepthTick, fixed(d, f.depth_ticks.label_decimals + 1)}});
    }
    for (const double d : f.depth_ticks.major_m) {
        const std::string label = fixed(d, f.depth_ticks.label_decimals);
        list.add(Line{{p.left_mm - f.major_tick_mm, f.depth.y_mm(d)},
                      {p.left_mm, f.depth.y_mm(d)},
                      Stroke{sym::kInk, 0.25, DashStyle::Solid},
                      {ItemRole::DepthTick, label}});
        list.add(plainText({p.left_mm - f.major_tick_mm - kLabelGap_mm, f.depth.y_mm(d)}, label,
                           TextAnchor::End, s.label_size_pt, sym::kInk,
                           {ItemRole::DepthLabel, label}));
    }
    // The heading reads bottom to top along the axis, centred on it.
    list.add(plainText(
        {s.margin_mm + textLineHeight_mm(s.label_size_pt) / 2, p.top_mm + p.height_mm / 2},
        "depth (m)", TextAnchor::Middle, s.label_size_pt, sym::kInk,
        {ItemRole::DepthLabel, "heading"}, FontWeight::Regular, -90.0));

    // Age along the top, ticks outward (up).
    list.add(Line{{p.left_mm, p.top_mm},
                  {p.right_mm(), p.top_mm},
                  Stroke{sym::kInk, 0.35, DashStyle::Solid},
                  {ItemRole::AgeAxis, ""}});
    for (const double a : f.age_ticks.minor_m) {
        list.add(Line{{f.age.x_mm(a), p.top_mm - kMinorTick_mm},
                      {f.age.x_mm(a), p.top_mm},
                      Stroke{sym::kInk, 0.2, DashStyle::Solid},
                      {ItemRole::AgeTick, fixed(a, f.age_ticks.label_decimals + 1)}});
    }
    for (const double a : f.age_ticks.major_m) {
        const std::string label = fixed(a, f.age_ticks.label_decimals);
        list.add(Line{{f.age.x_mm(a), p.top_mm - f.major_tick_mm},
                      {f.age.x_mm(a), p.top_mm},
                      Stroke{sym::kInk, 0.25, DashStyle::Solid},
                      {ItemRole::AgeTick, label}});
        list.add(plainText({f.age.x_mm(a), f.age_label_y_mm}, label, TextAnchor::Middle,
                           s.label_size_pt, sym::kInk, {ItemRole::AgeLabel, label}));
    }
    list.add(plainText({p.left_mm + p.width_mm / 2, f.age_heading_y_mm}, "age (Ma)",
                       TextAnchor::Middle, s.label_size_pt, sym::kInk,
                       {ItemRole::AgeLabel, "heading"}));
}

std::vector<PointMm> toPaper(const std::vector<AgeDepthPoint> &points, const AgeDepthPlotFrame &f) {
    std::vector<PointMm> out;
    for (const AgeDepthPoint &p : points) {
        out.push_back({f.age.x_mm(p.age_ma), f.depth.y_mm(p.depth_m)});
    }
    return out;
}

void addModelLines(DisplayList &list, const AgeDepthPlotInput &in, const AgeDepthPlotFrame &f,
                   AgeDepthLegendContent &legend) {
    if (in.reference) {
        list.add(Polyline{toPaper(in.reference->points, f),
                          Stroke{sym::kReference, sym::kReference_mm, DashStyle::Dotted},
                          {ItemRole::ReferenceLine, in.reference->label}});
        legend.reference_label = in.reference->label;
    }
    std::vector<AgeDepthPoint> median;
    for (const AgeModelGridPoint &p : in.model) {
        median.push_back({p.depth_m, p.age_q500_ma});
    }
    list.add(Polyline{toPaper(median, f),
                      Stroke{sym::kMedian, sym::kMedian_mm, DashStyle::Solid},
                      {ItemRole::AgeMedian, "median"}});
    legend.median = true;
}

std::string hiatusText(const AgeDepthHiatus &h) {
    return (h.label.empty() ? std::string{} : h.label + ": ") + "hiatus " +
           duration(h.duration_q500_ma) + " Ma";
}

void addHiatusLines(DisplayList &list, const AgeDepthPlotInput &in, const AgeDepthPlotFrame &f,
                    AgeDepthLegendContent &legend) {
    for (const AgeDepthHiatus &h : in.hiatuses) {
        const double y = f.depth.y_mm(h.depth_m);
        list.add(Line{{f.plot_mm.left_mm, y},
                      {f.plot_mm.right_mm(), y},
                      Stroke{sym::kHiatus, sym::kHiatus_mm, DashStyle::Dashed},
                      {ItemRole::Hiatus, hiatusKey(h.depth_m)}});
        legend.hiatus = true;
    }
}

Colour tieColour(const AgeDepthTie &t) {
    if (t.excluded) {
        return sym::kExcluded;
    }
    return t.kind == AgeTieKind::Datum ? sym::kDatum : sym::kDate;
}

double tieMiddle_m(const AgeDepthTie &t) {
    return (t.shallow_m + t.deep_m) / 2;
}

/// The tie's cross and marker; returns the box the marker (and ring) covers, which labels avoid.
RectMm addTie(DisplayList &list, const AgeDepthTie &t, const AgeDepthPlotStyle &s,
              const AgeDepthPlotFrame &f, AgeDepthLegendContent &legend) {
    const Colour colour = tieColour(t);
    const double x = f.age.x_mm(t.age_ma);
    const double y = f.depth.y_mm(tieMiddle_m(t));
    const double cap = sym::kTieBarCap_mm / 2;
    const Stroke bar{colour, sym::kTieBar_mm, DashStyle::Solid};
    const ItemTag bar_tag{ItemRole::AgeTieBar, t.label};

    if (t.deep_m > t.shallow_m) {
        const double y0 = f.depth.y_mm(t.shallow_m), y1 = f.depth.y_mm(t.deep_m);
        list.add(Line{{x, y0}, {x, y1}, bar, bar_tag});
        list.add(Line{{x - cap, y0}, {x + cap, y0}, bar, bar_tag});
        list.add(Line{{x - cap, y1}, {x + cap, y1}, bar, bar_tag});
        legend.tie_bars = true;
    }
    if (t.age_hi_ma > t.age_lo_ma) {
        const double x0 = f.age.x_mm(t.age_lo_ma), x1 = f.age.x_mm(t.age_hi_ma);
        list.add(Line{{x0, y}, {x1, y}, bar, bar_tag});
        list.add(Line{{x0, y - cap}, {x0, y + cap}, bar, bar_tag});
        list.add(Line{{x1, y - cap}, {x1, y + cap}, bar, bar_tag});
        legend.tie_bars = true;
    }

    const bool datum = t.kind == AgeTieKind::Datum;
    list.add(Marker{{x, y},
                    datum ? sym::kDatumShape : sym::kDateShape,
                    s.tie_marker_mm,
                    colour,
                    t.excluded,
                    0.25,
                    {ItemRole::AgeTieMarker, t.label}});
    if (t.excluded) {
        (datum ? legend.excluded_datum : legend.excluded_date) = true;
    } else {
        (datum ? legend.datum : legend.date) = true;
    }
    RectMm covered = itemBounds(list.items().back());
    if (t.outlier) {
        list.add(Polyline{outlierRing({x, y}, s.tie_marker_mm),
                          Stroke{sym::kInk, sym::kOutlierRing_mm, DashStyle::Solid},
                          {ItemRole::AgeTieOutlier, t.label}});
        covered = covered.united(itemBounds(list.items().back()));
        legend.outlier = true;
    }
    return covered;
}

/// Hiatus labels first (they have few good places), then tie labels, each kept clear of the
/// markers, the hiatus lines and each other, inside the plot. A tie label that had to move off
/// its tie's line gets a leader back to the end of the cross, so it is not read as another's.
void addLabels(DisplayList &list, const AgeDepthPlotInput &in, const AgeDepthPlotStyle &s,
               const AgeDepthPlotFrame &f, std::vector<RectMm> obstacles) {
    const RectMm bounds = f.plot_mm.grown(-0.5);
    const double half_line = textLineHeight_mm(s.tie_label_size_pt) / 2;
    std::vector<LabelRequest> hiatus_requests;
    for (const AgeDepthHiatus &h : in.hiatuses) {
        const double y = f.depth.y_mm(h.depth_m);
        const double above = y - half_line - 0.4, below = y + half_line + 0.4;
        const double right = f.plot_mm.right_mm() - kHiatusLabelInset_mm;
        const double left = f.plot_mm.left_mm + kHiatusLabelInset_mm;
        hiatus_requests.push_back(
            {plainText({}, hiatusText(h), TextAnchor::End, s.tie_label_size_pt, sym::kInk,
                       {ItemRole::HiatusLabel, hiatusKey(h.depth_m)}),
             {{{right, above}, TextAnchor::End},
              {{left, above}, TextAnchor::Start},
              {{right, below}, TextAnchor::End},
              {{left, below}, TextAnchor::Start}}});
    }
    for (Text &text : placeLabels(hiatus_requests, obstacles, bounds)) {
        list.add(std::move(text));
    }
    if (!s.show_tie_labels) {
        return;
    }
    // Tie labels also keep off the dashed hiatus lines, which would strike them through.
    for (const AgeDepthHiatus &h : in.hiatuses) {
        const double y = f.depth.y_mm(h.depth_m);
        obstacles.push_back(RectMm{f.plot_mm.left_mm, y - sym::kHiatus_mm / 2, f.plot_mm.width_mm,
                                   sym::kHiatus_mm});
    }
    std::vector<LabelRequest> tie_requests;
    for (const AgeDepthTie &t : in.ties) {
        const double x = f.age.x_mm(t.age_ma);
        const double y = f.depth.y_mm(tieMiddle_m(t));
        const double reach = s.tie_marker_mm / 2 + sym::kOutlierRingGap_mm;
        const double right = std::max(f.age.x_mm(t.age_hi_ma), x + reach) + kTieLabelGap_mm;
        const double left = std::min(f.age.x_mm(t.age_lo_ma), x - reach) - kTieLabelGap_mm;
        tie_requests.push_back({plainText({}, t.label, TextAnchor::Start, s.tie_label_size_pt,
                                          t.excluded ? sym::kExcludedText : sym::kInk,
                                          {ItemRole::AgeTieLabel, t.label}),
                                {{{right, y}, TextAnchor::Start},
                                 {{left, y}, TextAnchor::End},
                                 // Crowded (two dates on one sample): a second column out right.
                                 {{right + kSecondColumn_mm, y}, TextAnchor::Start}}});
    }
    // Ties crowd near the core top (dates every metre): search up to six lines each way.
    const std::vector<Text> placed = placeLabels(tie_requests, obstacles, bounds, 12);
    for (std::size_t i = 0; i < placed.size(); ++i) {
        const Text &text = placed[i];
        const double tie_y = tie_requests[i].spots.front().anchor_mm.y_mm;
        const bool second_column =
            std::abs(text.anchor_mm.x_mm - tie_requests[i].spots.back().anchor_mm.x_mm) < 1e-9;
        if (std::abs(text.anchor_mm.y_mm - tie_y) > 1e-9 || second_column) {
            // From the end of the cross, just short of the label's near end.
            const double toward = text.anchor == TextAnchor::Start ? 1.0 : -1.0;
            const double near_x =
                second_column ? tie_requests[i].spots.front().anchor_mm.x_mm : text.anchor_mm.x_mm;
            const double cross_end = near_x - toward * (kTieLabelGap_mm - 0.2);
            list.add(Line{{cross_end, tie_y},
                          {text.anchor_mm.x_mm - toward * 0.3, text.anchor_mm.y_mm},
                          Stroke{sym::kLeader, sym::kLeader_mm, DashStyle::Solid},
                          {ItemRole::AgeTieLabel, in.ties[i].label}});
        }
        list.add(text);
    }
}

} // namespace

std::string hiatusKey(double depth_m) {
    return fixed(depth_m, 2);
}

DisplayList layoutAgeDepthPlot(const AgeDepthPlotInput &in, const AgeDepthPlotStyle &s) {
    validateAgeDepthPlotInput(in);
    const AgeDepthPlotFrame f = ageDepthPlotFrame(in, s);
    DisplayList list;
    AgeDepthLegendContent legend;

    addTitle(list, in, s, f);
    appendAgeEnvelope(list, in.model, f);
    legend.envelope = true;
    addGrid(list, f);
    addModelLines(list, in, f, legend);
    addHiatusLines(list, in, f, legend);

    // Excluded ties first, so a tie the model uses is never hidden under one it does not.
    std::vector<RectMm> markers;
    for (const bool excluded_pass : {true, false}) {
        for (const AgeDepthTie &t : in.ties) {
            if (t.excluded == excluded_pass) {
                markers.push_back(addTie(list, t, s, f, legend));
            }
        }
    }
    addLabels(list, in, s, f, markers);
    addAxes(list, s, f);

    const RectMm drawn = list.boundingBox();
    const double legend_left = std::max(f.plot_mm.right_mm(), drawn.right_mm()) + s.legend_gap_mm;
    const RectMm legend_box =
        appendAgeDepthLegend(list, legend, {legend_left, f.plot_mm.top_mm}, s);

    // The page holds everything drawn plus the margin on every side.
    const RectMm content = list.boundingBox().united(legend_box);
    list.setPage(
        RectMm{0.0, 0.0, content.right_mm() + s.margin_mm, content.bottom_mm() + s.margin_mm});
    return list;
}

} // namespace atollog::draw
