#include "draw/hole_column_zones.hpp"

#include "draw/hole_column_data_tracks.hpp"
#include "draw/hole_column_track_symbols.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::draw {

namespace ts = track_symbols;

namespace {

constexpr double kLaneInset_mm = 0.4; // boxes keep clear of the lane edges: lanes stay apart
constexpr double kNamePad_mm = 0.5;

void addEdgeLine(DisplayList &list, const DepthScale &scale, const DepthWindow &w, double d,
                 bool open, double l, double r, const std::string &zone,
                 HoleColumnLegendContent &legend) {
    if (!w.contains(d)) {
        return;
    }
    const double y = scale.y_mm(d);
    list.add(Line{{l, y},
                  {r, y},
                  Stroke{ts::kOutline, ts::kZoneEdge_mm, open ? DashStyle::Dashed : DashStyle::Solid},
                  {ItemRole::ColumnZone, zone}});
    if (open) {
        legend.zone_open = true;
    }
}

void addBracket(DisplayList &list, const DepthScale &scale, const DepthWindow &w,
                const ColumnZoneEdge &e, double l, double r, const std::string &zone,
                HoleColumnLegendContent &legend) {
    if (e.open || !(e.deep_m > e.shallow_m)) {
        return;
    }
    const auto box = boxInWindow(scale, w, e.shallow_m, e.deep_m, l, r - l);
    if (!box) {
        return;
    }
    const ItemTag tag{ItemRole::ColumnZoneBracket, zone};
    list.add(Rect{*box, ts::kWhite, FillPattern::None, std::nullopt, tag});
    for (Line &line :
         hatchLines(*box, ts::kZoneHatchSpacing_mm,
                    Stroke{ts::kZoneHatch, ts::kZoneHatch_mm, DashStyle::Solid}, tag)) {
        list.add(std::move(line));
    }
    legend.zone_bracket = true;
}

void addName(DisplayList &list, const HoleColumnStyle &s, const RectMm &body,
             const std::string &zone) {
    const double size = s.zone_label_size_pt;
    const double text_w = estimateTextWidth_mm(zone, size, FontWeight::Regular);
    const double text_h = textLineHeight_mm(size);
    const PointMm centre{body.left_mm + body.width_mm / 2, body.top_mm + body.height_mm / 2};
    double rotation = 0.0;
    if (text_w + kNamePad_mm <= body.width_mm && text_h <= body.height_mm) {
        rotation = 0.0;
    } else if (text_w + kNamePad_mm <= body.height_mm && text_h <= body.width_mm) {
        rotation = -90.0;
    } else {
        return;
    }
    list.add(Text{centre, zone, TextAnchor::Middle, size, FontWeight::Regular, rotation, ts::kInk,
                  {ItemRole::ColumnZoneName, zone}});
}

} // namespace

/// More hatch lines than this in one box (a box tens of metres high at 0.9 mm spacing) means the
/// page itself is absurd; the layouts refuse such pages, this is the last guard.
constexpr double kMaxHatchLines = 1e5;

std::vector<Line> hatchLines(const RectMm &box, double spacing_mm, const Stroke &stroke,
                             const ItemTag &tag) {
    std::vector<Line> out;
    if (!(spacing_mm > 0.0) || box.width_mm <= 0.0 || box.height_mm <= 0.0) {
        return out;
    }
    // Lines x + y = k (y down, so they rise to the right), k on multiples of the spacing.
    const double l = box.left_mm, r = box.right_mm(), t = box.top_mm, b = box.bottom_mm();
    const double k_first = std::ceil((l + t) / spacing_mm) * spacing_mm;
    // Counted, not stepped: at huge coordinates k += spacing would not move k at all.
    const double count = std::floor((r + b - k_first) / spacing_mm) + 1.0;
    if (!(count >= 1.0) || count > kMaxHatchLines) {
        return out; // nothing, or more lines than any page could show apart
    }
    for (long i = 0; i < static_cast<long>(count); ++i) {
        const double k = k_first + static_cast<double>(i) * spacing_mm;
        // Points of x + y = k inside the box: x from max(l, k - b) to min(r, k - t).
        const double x0 = std::max(l, k - b);
        const double x1 = std::min(r, k - t);
        if (x1 <= x0) {
            continue;
        }
        out.push_back(Line{{x0, k - x0}, {x1, k - x1}, stroke, tag});
    }
    return out;
}

std::vector<std::size_t> zoneSubLanes(const std::vector<const ColumnZone *> &zones,
                                      std::size_t &count) {
    // Greedy interval partitioning over the zones in order of their tops: a zone goes into the
    // first sub-lane whose zones' bodies all end at or above its body's start.
    std::vector<double> lane_end; // deepest body end per sub-lane
    std::vector<std::size_t> lane_of;
    for (const ColumnZone *z : zones) {
        const double start = std::min(z->top.deep_m, z->base.shallow_m);
        const double end = std::max(z->top.deep_m, z->base.shallow_m);
        std::size_t k = 0;
        while (k < lane_end.size() && lane_end[k] > start) {
            ++k;
        }
        if (k == lane_end.size()) {
            lane_end.push_back(end);
        } else {
            lane_end[k] = end;
        }
        lane_of.push_back(k);
    }
    count = std::max<std::size_t>(1, lane_end.size());
    return lane_of;
}

void appendZoneLanes(DisplayList &list, const HoleColumnInput &in, const HoleColumnStyle &s,
                     const DepthScale &scale, const DepthWindow &w,
                     const HoleColumnTrackPositions &x, HoleColumnLegendContent &legend) {
    const std::vector<std::string> schemes = shownZoneSchemes(in);
    for (std::size_t lane = 0; lane < schemes.size(); ++lane) {
        const double lane_l = x.zones_left_mm + s.zone_lane_width_mm * static_cast<double>(lane) +
                              kLaneInset_mm;
        const double lane_w = s.zone_lane_width_mm - 2 * kLaneInset_mm;
        std::vector<const ColumnZone *> zones;
        for (const ColumnZone &z : in.zones) {
            if (z.scheme == schemes[lane]) {
                zones.push_back(&z);
            }
        }
        std::stable_sort(zones.begin(), zones.end(), [](const ColumnZone *a, const ColumnZone *b) {
            return a->top.shallow_m < b->top.shallow_m;
        });
        // Zones whose bodies overlap (the picks disagree in this hole) stand side by side.
        std::size_t sub_count = 1;
        const std::vector<std::size_t> sub = zoneSubLanes(zones, sub_count);
        const double sub_w = lane_w / static_cast<double>(sub_count);
        for (std::size_t i = 0; i < zones.size(); ++i) {
            const ColumnZone &z = *zones[i];
            if (!w.meets(z.top.shallow_m, z.base.deep_m)) {
                continue;
            }
            // Listed only when a zone drawn in this window stands beside another.
            legend.zone_overlap = legend.zone_overlap || sub[i] > 0;
            const double l = lane_l + sub_w * static_cast<double>(sub[i]);
            const double r = l + sub_w;
            // Neighbours alternate by order down the hole: the tint says only "next zone".
            const Colour tint = i % 2 == 0 ? ts::kZoneTintA : ts::kZoneTintB;
            // The certain body lies between the deep end of the top bracket and the shallow end
            // of the base bracket; it is empty when the two brackets overlap.
            if (const auto body = boxInWindow(scale, w, z.top.deep_m, z.base.shallow_m, l, r - l)) {
                list.add(Rect{*body, tint, FillPattern::None, std::nullopt,
                              {ItemRole::ColumnZone, z.zone}});
                legend.zone = true;
                addName(list, s, *body, z.zone);
            }
            addBracket(list, scale, w, z.top, l, r, z.zone, legend);
            addBracket(list, scale, w, z.base, l, r, z.zone, legend);
            // Sides along the whole zone, brackets included: the box reads as one zone.
            const double side_top = std::max(z.top.shallow_m, w.top_m);
            const double side_base = std::min(z.base.deep_m, w.base_m);
            if (side_base > side_top) {
                for (const double sx : {l, r}) {
                    list.add(Line{{sx, scale.y_mm(side_top)},
                                  {sx, scale.yAbove_mm(side_base)},
                                  Stroke{ts::kOutline, ts::kZoneEdge_mm, DashStyle::Solid},
                                  {ItemRole::ColumnZone, z.zone}});
                }
            }
            addEdgeLine(list, scale, w, z.top.shallow_m, z.top.open, l, r, z.zone, legend);
            addEdgeLine(list, scale, w, z.base.deep_m, z.base.open, l, r, z.zone, legend);
        }
    }
}

} // namespace atollog::draw
