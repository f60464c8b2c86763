#include "draw/hole_column.hpp"

#include "draw/depth_ticks.hpp"
#include "draw/hole_column_ages.hpp"
#include "draw/hole_column_data_tracks.hpp"
#include "draw/hole_column_header.hpp"
#include "draw/hole_column_symbols.hpp"
#include "draw/hole_column_taxa.hpp"
#include "draw/hole_column_track_validation.hpp"
#include "draw/hole_column_validation.hpp"
#include "draw/hole_column_window.hpp"
#include "draw/hole_column_zones.hpp"
#include "draw/lithology_fill.hpp"
#include "draw/lithology_width.hpp"
#include "draw/lithology_words.hpp"
#include "draw/surface_stroke.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <cstdio>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace sym = column_symbols;

namespace {

constexpr double kMajorTick_mm = 1.8;
constexpr double kMinorTick_mm = 1.0;
constexpr double kLabelGap_mm = 0.8;
constexpr double kAxisToRuns_mm = 1.0; // runs never touch the axis, so they never read as ticks
constexpr double kSurfaceOverhang_mm = 1.0; // surfaces reach past the track edges, to be seen
constexpr double kDrilledBaseLabelGap_mm = 2.2;

std::string fixed(double v, int decimals) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f", decimals, v);
    return buf;
}

std::string intervalKey(const ColumnInterval &iv) {
    return fixed(iv.top_m, 2) + "-" + fixed(iv.base_m, 2);
}

void addDepthAxis(DisplayList &list, const HoleColumnView &view, const HoleColumnStyle &s,
                  const DepthScale &scale, const DepthWindow &w,
                  const HoleColumnTrackPositions &x) {
    const double unit_m = view.depth_unit == DepthUnit::Feet ? kMetresPerFoot : 1.0;
    list.add(Line{{x.axis_x_mm, scale.y_mm(w.top_m)},
                  {x.axis_x_mm, scale.y_mm(w.base_m)},
                  Stroke{sym::kInk, 0.35, DashStyle::Solid},
                  {ItemRole::DepthAxis, ""}});
    // Ticks are chosen in the label unit, so feet get round numbers of feet.
    const DepthTicks ticks =
        chooseDepthTicks(w.top_m / unit_m, w.base_m / unit_m, scale.mm_per_m() * unit_m,
                         s.major_tick_min_spacing_mm);
    for (const double d : ticks.minor_m) {
        const double y = scale.y_mm(d * unit_m);
        list.add(Line{{x.axis_x_mm - kMinorTick_mm, y},
                      {x.axis_x_mm, y},
                      Stroke{sym::kInk, 0.2, DashStyle::Solid},
                      {ItemRole::DepthTick, fixed(d, ticks.label_decimals + 1)}});
    }
    for (const double d : ticks.major_m) {
        const double y = scale.y_mm(d * unit_m);
        const std::string label = fixed(d, ticks.label_decimals);
        list.add(Line{{x.axis_x_mm - kMajorTick_mm, y},
                      {x.axis_x_mm, y},
                      Stroke{sym::kInk, 0.25, DashStyle::Solid},
                      {ItemRole::DepthTick, label}});
        list.add(Text{{x.axis_x_mm - kMajorTick_mm - kLabelGap_mm, y},
                      label,
                      TextAnchor::End,
                      s.label_size_pt,
                      FontWeight::Regular,
                      0.0,
                      sym::kInk,
                      {ItemRole::DepthLabel, label}});
    }
}

void addRuns(DisplayList &list, const HoleColumnInput &in, const DepthScale &scale,
             const DepthWindow &w, const HoleColumnTrackPositions &x,
             HoleColumnLegendContent &legend) {
    const double width = x.runs_right_mm - x.runs_left_mm;
    for (const ColumnRun &r : in.runs) {
        if (!w.meets(r.top_m, r.base_m)) {
            continue;
        }
        // Recovered core sits at the top of its run (see DEVELOPERS.md, depth model).
        const double split_m = r.top_m + r.recovered_m;
        if (auto box = boxInWindow(scale, w, r.top_m, split_m, x.runs_left_mm, width)) {
            list.add(Rect{*box,
                          sym::kRecovered,
                          FillPattern::None,
                          std::nullopt,
                          {ItemRole::RecoveryRun, r.id + " recovered"}});
            legend.recovered = true;
        }
        if (auto box = boxInWindow(scale, w, split_m, r.base_m, x.runs_left_mm, width)) {
            list.add(Rect{*box,
                          sym::kWhite,
                          FillPattern::None,
                          Stroke{sym::kOutline, sym::kRunOutline_mm, DashStyle::Solid},
                          {ItemRole::RecoveryRun, r.id + " unrecovered"}});
            legend.unrecovered = true;
        }
    }
    // A white cut at every run top, drawn over the boxes: without it consecutive well-recovered
    // runs merge into one dark bar and the run lengths cannot be read.
    for (const ColumnRun &r : in.runs) {
        if (r.top_m > w.top_m && r.top_m < w.base_m) {
            const double y = scale.y_mm(r.top_m);
            list.add(Line{{x.runs_left_mm, y},
                          {x.runs_right_mm, y},
                          Stroke{sym::kWhite, sym::kRunCut_mm, DashStyle::Solid},
                          {ItemRole::RecoveryRun, r.id + " top"}});
        }
    }
}

void addLithology(DisplayList &list, const HoleColumnInput &in, const DepthScale &scale,
                  const DepthWindow &w, const HoleColumnTrackPositions &x,
                  HoleColumnLegendContent &legend) {
    const double track = x.lithology_right_mm - x.lithology_left_mm;
    for (const ColumnInterval &iv : in.intervals) {
        if (!w.meets(iv.top_m, iv.base_m)) {
            continue;
        }
        const auto box = boxInWindow(scale, w, iv.top_m, iv.base_m, x.lithology_left_mm,
                                     track * lithologyWidthFraction(iv.rock, iv.texture));
        if (!box) {
            continue;
        }
        const LithologyFill fill = lithologyFill(iv.rock, iv.texture);
        list.add(Rect{*box,
                      fill.colour,
                      fill.pattern,
                      Stroke{sym::kInk, sym::kBoxOutline_mm, DashStyle::Solid},
                      {ItemRole::LithologyInterval, intervalKey(iv)}});
        legend.addFill({iv.rock, fill.pattern == FillPattern::ReefFramework});
    }
}

/// Surfaces go on after every box, so no neighbouring box paints over them.
void addSurfaces(DisplayList &list, const HoleColumnInput &in, const DepthScale &scale,
                 const DepthWindow &w, const HoleColumnTrackPositions &x,
                 HoleColumnLegendContent &legend) {
    for (const ColumnInterval &iv : in.intervals) {
        if (!iv.base_surface || !w.contains(iv.base_m)) {
            continue;
        }
        const SurfaceLook look = surfaceLook(*iv.base_surface);
        list.add(
            Polyline{surfacePath(look, x.lithology_left_mm - kSurfaceOverhang_mm,
                                 x.lithology_right_mm + kSurfaceOverhang_mm, scale.yAbove_mm(iv.base_m)),
                     look.stroke,
                     {ItemRole::Surface, std::string(surfaceWord(*iv.base_surface))}});
        legend.addSurface(*iv.base_surface);
    }
}

void addSamples(DisplayList &list, const HoleColumnInput &in, const DepthScale &scale,
                const DepthWindow &w, const HoleColumnTrackPositions &x,
                HoleColumnLegendContent &legend) {
    for (const ColumnSample &sample : in.samples) {
        if (!w.contains(sample.depth_m)) {
            continue;
        }
        const double y = scale.y_mm(sample.depth_m);
        list.add(Line{{x.samples_left_mm, y},
                      {x.samples_right_mm, y},
                      Stroke{sym::kInk, sym::kSampleTick_mm, DashStyle::Solid},
                      {ItemRole::SampleTick, sample.id}});
        legend.samples = true;
    }
}

void addDrilledBase(DisplayList &list, const HoleColumnInput &in, const HoleColumnView &view,
                    const HoleColumnStyle &s, const DepthScale &scale, const DepthWindow &w,
                    const HoleColumnTrackPositions &x) {
    if (!w.contains(in.drilled_base_m)) {
        return;
    }
    const double y = scale.y_mm(in.drilled_base_m);
    list.add(Line{{x.axis_x_mm, y},
                  {x.right_mm, y},
                  Stroke{sym::kInk, sym::kDrilledBaseLine_mm, DashStyle::Solid},
                  {ItemRole::DrilledBase, in.hole}});
    list.add(Text{{x.axis_x_mm + kAxisToRuns_mm, y + kDrilledBaseLabelGap_mm},
                  "TD " + depthText(in.drilled_base_m, view.depth_unit, 2),
                  TextAnchor::Start,
                  s.label_size_pt,
                  FontWeight::Regular,
                  0.0,
                  sym::kInk,
                  {ItemRole::DrilledBase, in.hole}});
}

} // namespace

namespace {

HoleColumnTrackPositions trackPositions(const HoleColumnTracks &t, std::size_t taxon_lanes,
                                        std::size_t zone_lanes, bool ages,
                                        const HoleColumnStyle &s, double left_mm) {
    HoleColumnTrackPositions x;
    x.left_mm = left_mm;
    x.axis_x_mm = left_mm + (t.depth_axis ? s.depth_axis_width_mm : 0.0);
    double at = x.axis_x_mm + kAxisToRuns_mm;
    const auto track = [&at, &s](bool shown, double width, double &l, double &r) {
        l = at;
        r = at + (shown ? width : 0.0);
        at = shown ? r + s.track_gap_mm : at;
    };
    track(t.core_runs, s.run_track_width_mm, x.runs_left_mm, x.runs_right_mm);
    // Surfaces are drawn across the lithology track, so it keeps its room for them.
    track(t.lithology || t.surfaces, s.lithology_track_width_mm, x.lithology_left_mm,
          x.lithology_right_mm);
    track(t.samples, s.sample_track_width_mm, x.samples_left_mm, x.samples_right_mm);
    track(taxon_lanes > 0, s.taxon_lane_width_mm * static_cast<double>(taxon_lanes),
          x.taxa_left_mm, x.taxa_right_mm);
    track(zone_lanes > 0, s.zone_lane_width_mm * static_cast<double>(zone_lanes), x.zones_left_mm,
          x.zones_right_mm);
    track(ages, s.age_track_width_mm, x.ages_left_mm, x.ages_right_mm);
    x.right_mm = std::max(at - s.track_gap_mm, x.axis_x_mm);
    return x;
}

} // namespace

HoleColumnTrackPositions holeColumnTrackPositions(const HoleColumnInput &in,
                                                  const HoleColumnStyle &s, double left_mm) {
    return trackPositions(in.tracks, shownTaxonLanes(in), shownZoneSchemes(in).size(),
                          ageTrackShown(in), s, left_mm);
}

HoleColumnPlacement appendHoleColumn(DisplayList &list, const HoleColumnInput &in,
                                     const DepthScale &scale, double left_mm,
                                     const HoleColumnView &view, const HoleColumnStyle &s) {
    validateHoleColumnInput(in, view);
    validateHoleColumnDataTracks(in);
    const std::size_t first_item = list.size();
    const DepthWindow w = depthWindowOf(in, view);
    const HoleColumnTrackPositions x = holeColumnTrackPositions(in, s, left_mm);
    HoleColumnPlacement placed;

    appendHoleColumnHeader(list, in, view, s, x, scale.y_mm(w.top_m));
    if (in.tracks.depth_axis) {
        addDepthAxis(list, view, s, scale, w, x);
    }
    if (in.tracks.core_runs) {
        addRuns(list, in, scale, w, x, placed.legend);
    }
    if (in.tracks.lithology) {
        addLithology(list, in, scale, w, x, placed.legend);
    }
    if (in.tracks.surfaces) {
        addSurfaces(list, in, scale, w, x, placed.legend);
    }
    if (in.tracks.samples) {
        addSamples(list, in, scale, w, x, placed.legend);
    }
    appendTaxonLanes(list, in, s, scale, w, x, placed.legend);
    appendZoneLanes(list, in, s, scale, w, x, placed.legend);
    appendAgeTrack(list, in, scale, w, x, placed.legend);
    addDrilledBase(list, in, view, s, scale, w, x);

    RectMm box = itemBounds(list.items()[first_item]);
    for (std::size_t i = first_item; i < list.size(); ++i) {
        box = box.united(itemBounds(list.items()[i]));
    }
    placed.box = box;
    return placed;
}

DepthScale holeColumnDepthScale(const HoleColumnInput &in, const HoleColumnView &view,
                                const HoleColumnStyle &s) {
    validateHoleColumnInput(in, view);
    // A kilometre of paper is beyond any page: refuse it before the layout loops over it.
    const DepthWindow w = depthWindowOf(in, view);
    if (!((w.base_m - w.top_m) * 1000.0 / view.scale_ratio <= 1e6)) {
        throw std::invalid_argument("hole column " + in.hole + ": " +
                                    std::to_string(w.base_m - w.top_m) + " m at 1:" +
                                    std::to_string(view.scale_ratio) +
                                    " would take over a kilometre of paper; choose a smaller "
                                    "scale or a depth window");
    }
    return DepthScale::fromRatio(w.top_m, view.scale_ratio,
                                 s.margin_mm + holeColumnHeaderHeight_mm(in, view, s));
}

DisplayList layoutHoleColumn(const HoleColumnInput &in, const HoleColumnView &view,
                             const HoleColumnStyle &s) {
    const DepthScale scale = holeColumnDepthScale(in, view, s);
    DisplayList list;
    const HoleColumnPlacement placed = appendHoleColumn(list, in, scale, s.margin_mm, view, s);

    const PointMm legend_at{placed.box.right_mm() + s.legend_gap_mm, scale.origin_y_mm()};
    const RectMm legend = appendHoleColumnLegend(list, placed.legend, legend_at, s);
    // The drafting ratio under the legend: a printed log is only measurable with it.
    const double note_y = legend.bottom_mm() + s.legend_row_mm;
    list.add(Text{{legend_at.x_mm, note_y},
                  "depth scale 1:" + fixed(view.scale_ratio, 0),
                  TextAnchor::Start,
                  s.label_size_pt,
                  FontWeight::Regular,
                  0.0,
                  sym::kInk,
                  {ItemRole::Subtitle, "scale"}});

    const RectMm all = list.boundingBox();
    list.setPage(RectMm{0.0, 0.0, all.right_mm() + s.margin_mm, all.bottom_mm() + s.margin_mm});
    return list;
}

} // namespace atollog::draw
