#include "draw/loc_plot.hpp"

#include "draw/age_depth_plot_labels.hpp"
#include "draw/age_depth_plot_legend.hpp"
#include "draw/legend_rows.hpp"
#include "draw/loc_plot_validation.hpp"
#include "draw/text_extent.hpp"
#include "draw/xy_plot_frame.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <optional>
#include <utility>

namespace atollog::draw {

namespace {

constexpr double kSegment_mm = 0.5;
constexpr double kSurface_mm = 0.35;
constexpr double kBracketEdge_mm = 0.15;
constexpr double kOffLineRing_mm = 0.3;
constexpr double kLabelGap_mm = 1.2;
constexpr double kSecondColumn_mm = 14.0; // how far out a crowded label's column stands
constexpr double kSwatchWidth_mm = 8.0;

// Okabe & Ito (2008) colours; every kind also differs by marker shape or dash.
const Colour kInk = colourFromHex(0x000000);
const Colour kBase = colourFromHex(0x009E73);    // bluish green
const Colour kTop = colourFromHex(0xE69F00);     // orange
const Colour kDated = colourFromHex(0xD55E00);   // vermillion
const Colour kLine = colourFromHex(0x0072B2);    // blue
const Colour kBand = colourFromHex(0xCCE9F8);    // sky blue 30:70 with white, opaque
const Colour kSurface = colourFromHex(0xCC79A7); // reddish purple
const Colour kBracketFill{0x99, 0x99, 0x99, 40};
const Colour kBracketEdge = colourFromHex(0x999999);
const Colour kLeader = colourFromHex(0x666666);
constexpr double kLeader_mm = 0.15;

MarkerShape shapeOf(LocEventKind k) {
    switch (k) {
    case LocEventKind::Base:
        return MarkerShape::TriangleDown;
    case LocEventKind::Top:
        return MarkerShape::TriangleUp;
    case LocEventKind::Dated:
        break;
    }
    return MarkerShape::Circle;
}

Colour colourOf(LocEventKind k) {
    switch (k) {
    case LocEventKind::Base:
        return kBase;
    case LocEventKind::Top:
        return kTop;
    case LocEventKind::Dated:
        break;
    }
    return kDated;
}

XyPlotSpec plotSpec(const LocPlotInput &in) {
    ValueRange x{std::numeric_limits<double>::max(), std::numeric_limits<double>::lowest()};
    ValueRange y = x;
    const auto take = [](ValueRange &r, double lo, double hi) {
        r = {std::min(r.min, lo), std::max(r.max, hi)};
    };
    for (const LocPlotEvent &e : in.events) {
        take(x, e.x_shallow_m, e.x_deep_m);
        take(y, e.y_shallow_m, e.y_deep_m);
    }
    // Only the events set the axes: a steep piece or its band may run far beyond them (into
    // negative depths, even), and is cut at the frame instead.
    XyPlotSpec spec;
    spec.key = in.x_hole + " " + in.y_hole;
    spec.title = "Line of correlation " + in.x_hole + " \u2013 " + in.y_hole;
    spec.subtitle = "shared events: box = depth brackets in both holes, marker = observed levels" +
                    (in.fit_name.empty() ? std::string() : "; lines: " + in.fit_name);
    spec.x = {"depth in " + in.x_hole + " (m)", x, in.x_axis_m, in.x_axis_length_mm, false,
              false};
    spec.y = {"depth in " + in.y_hole + " (m)", y, in.y_axis_m, in.y_axis_length_mm, true, false};
    return spec;
}

/// The piece's line cut to y in [y_min, y_max]; empty when it lies wholly outside.
std::optional<std::pair<PointMm, PointMm>> clippedPiece(const LocPlotSegment &g, ValueRange y) {
    double lo = g.x_from_m, hi = g.x_to_m;
    if (g.slope != 0.0) {
        const double xa = (y.min - g.intercept_m) / g.slope, xb = (y.max - g.intercept_m) / g.slope;
        lo = std::max(lo, std::min(xa, xb));
        hi = std::min(hi, std::max(xa, xb));
    } else if (g.intercept_m < y.min || g.intercept_m > y.max) {
        return std::nullopt;
    }
    if (!(hi > lo)) {
        return std::nullopt;
    }
    return std::pair{PointMm{lo, g.intercept_m + g.slope * lo},
                     PointMm{hi, g.intercept_m + g.slope * hi}};
}

/// Sutherland & Hodgman (1974) polygon clipping against one horizontal edge, in value space:
/// keeps the part with y >= bound (keep_above) or y <= bound.
std::vector<PointMm> clipAtY(const std::vector<PointMm> &ring, double bound, bool keep_above) {
    std::vector<PointMm> out;
    const auto inside = [&](const PointMm &p) {
        return keep_above ? p.y_mm >= bound : p.y_mm <= bound;
    };
    for (std::size_t i = 0; i < ring.size(); ++i) {
        const PointMm &a = ring[i];
        const PointMm &b = ring[(i + 1) % ring.size()];
        if (inside(a)) {
            out.push_back(a);
        }
        if (inside(a) != inside(b)) {
            const double t = (bound - a.y_mm) / (b.y_mm - a.y_mm);
            out.push_back({a.x_mm + t * (b.x_mm - a.x_mm), bound});
        }
    }
    return out;
}

struct LegendContent {
    bool bracket = false, base = false, top = false, dated = false, off_line = false;
    bool segment = false, band = false, x_surface = false, y_surface = false;
};

} // namespace

std::string locSurfaceKey(char axis, double depth_m) {
    return std::string(1, axis) + " " + fixedText(depth_m, 2);
}

XyPlotFrame locPlotFrame(const LocPlotInput &in, const XyPlotStyle &s) {
    return xyPlotFrame(plotSpec(in), s);
}

DisplayList layoutLocPlot(const LocPlotInput &in, const XyPlotStyle &s) {
    validateLocPlotInput(in);
    const XyPlotSpec spec = plotSpec(in);
    const XyPlotFrame f = xyPlotFrame(spec, s);
    const RectMm &p = f.plot_mm;
    DisplayList list;
    LegendContent legend;
    appendXyTitle(list, spec, f, s);

    // Bands, then the grid over them, then brackets, surfaces, lines and markers.
    for (std::size_t i = 0; i < in.segments.size(); ++i) {
        const LocPlotSegment &g = in.segments[i];
        if (g.band.size() < 2) {
            continue;
        }
        // In value space (x in m of the x hole, y in m of the y hole), cut to the y axis.
        std::vector<PointMm> ring;
        for (const LocBandPoint &b : g.band) {
            ring.push_back({b.x_m, b.y_lo_m});
        }
        for (auto it = g.band.rbegin(); it != g.band.rend(); ++it) {
            ring.push_back({it->x_m, it->y_hi_m});
        }
        ring = clipAtY(clipAtY(ring, f.y.range().min, true), f.y.range().max, false);
        if (ring.size() < 3) {
            continue;
        }
        for (PointMm &pt : ring) {
            pt = {f.x.mm(pt.x_mm), f.y.mm(pt.y_mm)};
        }
        list.add(Polygon{std::move(ring), kBand, std::nullopt,
                         {ItemRole::LocSegmentBand, "segment " + std::to_string(i + 1)}});
        legend.band = true;
    }
    appendXyGrid(list, f);
    for (const LocPlotEvent &e : in.events) {
        const double x0 = f.x.mm(e.x_shallow_m), x1 = f.x.mm(e.x_deep_m);
        const double y0 = f.y.mm(e.y_shallow_m), y1 = f.y.mm(e.y_deep_m);
        list.add(Rect{RectMm{x0, y0, x1 - x0, y1 - y0}, kBracketFill, FillPattern::None,
                      Stroke{kBracketEdge, kBracketEdge_mm, DashStyle::Solid},
                      {ItemRole::LocEventBracket, e.id}});
        legend.bracket = true;
    }
    const Stroke surface{kSurface, kSurface_mm, DashStyle::Dashed};
    std::vector<RectMm> obstacles;
    for (const double d : in.x_surfaces_m) {
        if (f.x.contains(d)) {
            const double x = f.x.mm(d);
            list.add(Line{{x, p.top_mm}, {x, p.bottom_mm()}, surface,
                          {ItemRole::LocSurface, locSurfaceKey('x', d)}});
            // Its depth just inside the bottom edge, reading up the line, clear of it.
            const double beside = textLineHeight_mm(s.point_label_size_pt) / 2 + 0.4;
            list.add(Text{{x + beside, p.bottom_mm() - 1.0}, fixedText(d, 2) + " m",
                          TextAnchor::Start, s.point_label_size_pt, FontWeight::Regular, -90.0,
                          kSurface,
                          {ItemRole::LocSurface, locSurfaceKey('x', d)}});
            obstacles.push_back(itemBounds(list.items().back()));
            legend.x_surface = true;
        }
    }
    for (const double d : in.y_surfaces_m) {
        if (f.y.contains(d)) {
            const double y = f.y.mm(d);
            list.add(Line{{p.left_mm, y}, {p.right_mm(), y}, surface,
                          {ItemRole::LocSurface, locSurfaceKey('y', d)}});
            list.add(Text{{p.right_mm() - 1.0, y - 1.4}, fixedText(d, 2) + " m", TextAnchor::End,
                          s.point_label_size_pt, FontWeight::Regular, 0.0, kSurface,
                          {ItemRole::LocSurface, locSurfaceKey('y', d)}});
            obstacles.push_back(itemBounds(list.items().back()));
            legend.y_surface = true;
        }
    }
    for (std::size_t i = 0; i < in.segments.size(); ++i) {
        const auto piece = clippedPiece(in.segments[i], f.y.range());
        if (!piece) {
            continue;
        }
        list.add(Line{{f.x.mm(piece->first.x_mm), f.y.mm(piece->first.y_mm)},
                      {f.x.mm(piece->second.x_mm), f.y.mm(piece->second.y_mm)},
                      Stroke{kLine, kSegment_mm, DashStyle::Solid},
                      {ItemRole::LocSegment, "segment " + std::to_string(i + 1)}});
        legend.segment = true;
    }
    for (const LocPlotEvent &e : in.events) {
        const PointMm at{f.x.mm(e.x_level_m), f.y.mm(e.y_level_m)};
        list.add(Marker{at, shapeOf(e.kind), s.marker_mm, colourOf(e.kind), false, 0.25,
                        {ItemRole::LocEventMarker, e.id}});
        obstacles.push_back(itemBounds(list.items().back()));
        (e.kind == LocEventKind::Base ? legend.base
                                      : e.kind == LocEventKind::Top ? legend.top : legend.dated) =
            true;
        if (e.off_line) {
            list.add(Polyline{outlierRing(at, s.marker_mm),
                              Stroke{kInk, kOffLineRing_mm, DashStyle::Solid},
                              {ItemRole::LocOffLine, e.id}});
            obstacles.push_back(itemBounds(list.items().back()));
            legend.off_line = true;
        }
    }
    std::vector<LabelRequest> requests;
    for (const LocPlotEvent &e : in.events) {
        if (!e.off_line && !in.label_every_event) {
            continue;
        }
        const PointMm at{f.x.mm(e.x_level_m), f.y.mm(e.y_level_m)};
        const double off = s.marker_mm / 2 + kLabelGap_mm + (e.off_line ? 0.7 : 0.0);
        requests.push_back({Text{{}, e.id, TextAnchor::Start, s.point_label_size_pt,
                                 e.off_line ? FontWeight::Bold : FontWeight::Regular, 0.0, kInk,
                                 {ItemRole::LocEventLabel, e.id}},
                            {{{at.x_mm + off, at.y_mm}, TextAnchor::Start},
                             {{at.x_mm - off, at.y_mm}, TextAnchor::End},
                             // Crowded: a second column further out on either side.
                             {{at.x_mm + off + kSecondColumn_mm, at.y_mm}, TextAnchor::Start},
                             {{at.x_mm - off - kSecondColumn_mm, at.y_mm}, TextAnchor::End}}});
    }
    // A label that had to move off its event's line gets a thin leader back to the marker.
    const std::vector<Text> placed = placeLabels(requests, obstacles, p, 24);
    for (std::size_t i = 0; i < placed.size(); ++i) {
        const Text &t = placed[i];
        const PointMm first = requests[i].spots.front().anchor_mm;
        const bool beside = std::abs(t.anchor_mm.x_mm - requests[i].spots[0].anchor_mm.x_mm) <
                                1e-9 ||
                            std::abs(t.anchor_mm.x_mm - requests[i].spots[1].anchor_mm.x_mm) < 1e-9;
        if (std::abs(t.anchor_mm.y_mm - first.y_mm) > 1e-9 || !beside) {
            const double toward = t.anchor == TextAnchor::Start ? 1.0 : -1.0;
            // The marker's centre lies halfway between the right and the left spot.
            const double centre_x =
                (requests[i].spots[0].anchor_mm.x_mm + requests[i].spots[1].anchor_mm.x_mm) / 2;
            list.add(Line{{centre_x + toward * (s.marker_mm / 2 + 0.3), first.y_mm},
                          {t.anchor_mm.x_mm - toward * 0.3, t.anchor_mm.y_mm},
                          Stroke{kLeader, kLeader_mm, DashStyle::Solid},
                          {ItemRole::LocEventLabel, t.tag.key}});
        }
        list.add(t);
    }
    appendXyAxes(list, spec, f, s);

    // The legend, from what was drawn.
    const PointMm corner = xyLegendCorner(list, f, s);
    LegendRows rows(list, corner, {s.legend_row_mm, s.label_size_pt, kSwatchWidth_mm, 2.0, kInk});
    const double h = kSwatchWidth_mm / 2;
    const auto marker = [&](LocEventKind k, const std::string &what) {
        return [&list, &s, k, what](PointMm c) {
            list.add(Marker{c, shapeOf(k), s.marker_mm, colourOf(k), false, 0.25,
                            {ItemRole::LegendSwatch, what}});
        };
    };
    rows.heading("Shared events");
    if (legend.base) {
        rows.row("base (FO)", marker(LocEventKind::Base, "base"));
    }
    if (legend.top) {
        rows.row("top (LO)", marker(LocEventKind::Top, "top"));
    }
    if (legend.dated) {
        rows.row("dated horizon", marker(LocEventKind::Dated, "dated"));
    }
    if (legend.bracket) {
        rows.row("depth brackets in both holes", [&](PointMm c) {
            list.add(Rect{RectMm{c.x_mm - h, c.y_mm - 1.4, kSwatchWidth_mm, 2.8}, kBracketFill,
                          FillPattern::None, Stroke{kBracketEdge, kBracketEdge_mm,
                                                    DashStyle::Solid},
                          {ItemRole::LegendSwatch, "bracket"}});
        });
    }
    if (legend.off_line) {
        rows.row("off the line (flagged)", [&](PointMm c) {
            list.add(Polyline{outlierRing(c, s.marker_mm),
                              Stroke{kInk, kOffLineRing_mm, DashStyle::Solid},
                              {ItemRole::LegendSwatch, "off line"}});
        });
    }
    if (legend.segment || legend.band) {
        rows.heading("Line of correlation");
    }
    if (legend.segment) {
        rows.row("fitted piece", [&](PointMm c) {
            list.add(Line{{c.x_mm - h, c.y_mm}, {c.x_mm + h, c.y_mm},
                          Stroke{kLine, kSegment_mm, DashStyle::Solid},
                          {ItemRole::LegendSwatch, "segment"}});
        });
    }
    if (legend.band) {
        rows.row("95 % band of the line", [&](PointMm c) {
            list.add(Rect{RectMm{c.x_mm - h, c.y_mm - 1.3, kSwatchWidth_mm, 2.6}, kBand,
                          FillPattern::None, std::nullopt, {ItemRole::LegendSwatch, "band"}});
        });
    }
    if (legend.x_surface || legend.y_surface) {
        rows.heading("Logged surfaces");
    }
    if (legend.x_surface) {
        rows.row("in " + in.x_hole + " (vertical)", [&](PointMm c) {
            list.add(Line{{c.x_mm, c.y_mm - 1.8}, {c.x_mm, c.y_mm + 1.8}, surface,
                          {ItemRole::LegendSwatch, "x surface"}});
        });
    }
    if (legend.y_surface) {
        rows.row("in " + in.y_hole + " (horizontal)", [&](PointMm c) {
            list.add(Line{{c.x_mm - h, c.y_mm}, {c.x_mm + h, c.y_mm}, surface,
                          {ItemRole::LegendSwatch, "y surface"}});
        });
    }
    finishXyPage(list, s);
    return list;
}

} // namespace atollog::draw
