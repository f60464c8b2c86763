#include "draw/hole_column_header.hpp"

#include "draw/hole_column_ages.hpp"
#include "draw/hole_column_data_tracks.hpp"
#include "draw/hole_column_symbols.hpp"
#include "draw/hole_column_taxa.hpp"
#include "draw/lithology_width.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <array>
#include <cstdio>
#include <string>

namespace atollog::draw {

namespace sym = column_symbols;

namespace {

constexpr double kTitleGap_mm = 1.0;
constexpr double kHeadingGap_mm = 3.0; // between the subtitle and the tallest rotated heading
constexpr double kNameToBody_mm = 2.0; // rotated names end this far above the body
constexpr double kScaleTick_mm = 1.2;  // texture-scale ticks stand this far above the body

struct ScaleEntry {
    TextureClass texture;
    const char *label;
};

// The texture scale names each width step once; classes sharing a width share a label, and
// crystalline (0.65, between packstone and grainstone) is left to the legend of widths in
// DEVELOPERS.md, as its label would collide with its neighbours at 6 pt.
constexpr std::array<ScaleEntry, 6> kTextureScale{{
    {TextureClass::Mudstone, "mudstone"},
    {TextureClass::Wackestone, "wackestone"},
    {TextureClass::Packstone, "packstone"},
    {TextureClass::Grainstone, "grainstone"},
    {TextureClass::Rudstone, "float-/rudstone"},
    {TextureClass::Boundstone, "boundstone"},
}};

struct Heading {
    double x_mm;
    std::string text;
    double size_pt;
    ItemTag tag;
};

std::vector<Heading> headings(const HoleColumnInput &in, const HoleColumnView &view,
                              const HoleColumnStyle &s, const HoleColumnTrackPositions &x) {
    std::vector<Heading> out;
    const HoleColumnTracks &t = in.tracks;
    if (t.depth_axis) {
        out.push_back({x.axis_x_mm - 6.0,
                       std::string("depth (") + depthUnitWord(view.depth_unit) + ")",
                       s.label_size_pt,
                       {ItemRole::DepthLabel, "heading"}});
    }
    if (t.core_runs) {
        out.push_back({(x.runs_left_mm + x.runs_right_mm) / 2,
                       "core",
                       s.label_size_pt,
                       {ItemRole::RecoveryRun, "heading"}});
    }
    if (t.lithology) {
        const double width = x.lithology_right_mm - x.lithology_left_mm;
        for (const ScaleEntry &e : kTextureScale) {
            out.push_back({x.lithology_left_mm +
                               width * lithologyWidthFraction(RockKind::Limestone, e.texture),
                           e.label,
                           s.texture_label_size_pt,
                           {ItemRole::TextureScale, e.label}});
        }
    }
    if (t.samples) {
        out.push_back({(x.samples_left_mm + x.samples_right_mm) / 2,
                       "samples",
                       s.label_size_pt,
                       {ItemRole::SampleTick, "heading"}});
    }
    if (shownTaxonLanes(in) > 0) {
        for (std::size_t lane = 0; lane < in.taxa.size(); ++lane) {
            const ColumnTaxonRange &taxon = in.taxa[lane];
            out.push_back({taxonLaneCentre_mm(x, s, lane),
                           taxon.name.empty() ? taxon.taxon : taxon.name,
                           s.track_label_size_pt,
                           {ItemRole::ColumnTaxonName, taxon.taxon}});
        }
    }
    const std::vector<std::string> schemes = shownZoneSchemes(in);
    for (std::size_t lane = 0; lane < schemes.size(); ++lane) {
        out.push_back({x.zones_left_mm + s.zone_lane_width_mm * (static_cast<double>(lane) + 0.5),
                       schemes[lane],
                       s.track_label_size_pt,
                       {ItemRole::ColumnZoneScheme, schemes[lane]}});
    }
    // The age scale: rotated labels standing on ticks, as the texture scale's.
    if (const auto age = ageTrackScale(in, x)) {
        for (std::size_t i = 0; i < age->ticks_ma.size(); ++i) {
            const std::string label = age->tickLabel(i);
            out.push_back({age->x_mm(age->ticks_ma[i]),
                           label,
                           s.track_label_size_pt,
                           {ItemRole::ColumnAgeScale, label}});
        }
    }
    return out;
}

double tallestHeading_mm(const std::vector<Heading> &hs) {
    double tallest = 0.0;
    for (const Heading &h : hs) {
        tallest = std::max(tallest, estimateTextWidth_mm(h.text, h.size_pt, FontWeight::Regular));
    }
    return tallest;
}

} // namespace

const char *depthUnitWord(DepthUnit unit) {
    return unit == DepthUnit::Feet ? "ft" : "m";
}

std::string depthText(double depth_m, DepthUnit unit, int decimals) {
    const double v = unit == DepthUnit::Feet ? depth_m / kMetresPerFoot : depth_m;
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f %s", decimals, v, depthUnitWord(unit));
    return buf;
}

double holeColumnHeaderHeight_mm(const HoleColumnInput &in, const HoleColumnView &view,
                                 const HoleColumnStyle &s) {
    const HoleColumnTrackPositions x = holeColumnTrackPositions(in, s, 0.0);
    return textLineHeight_mm(s.title_size_pt) + kTitleGap_mm +
           textLineHeight_mm(s.subtitle_size_pt) + kHeadingGap_mm +
           tallestHeading_mm(headings(in, view, s, x)) + kNameToBody_mm;
}

void appendHoleColumnHeader(DisplayList &list, const HoleColumnInput &in,
                            const HoleColumnView &view, const HoleColumnStyle &s,
                            const HoleColumnTrackPositions &x, double body_top_mm) {
    const double top = body_top_mm - holeColumnHeaderHeight_mm(in, view, s);
    const double title_h = textLineHeight_mm(s.title_size_pt);
    list.add(Text{{x.left_mm, top + title_h / 2},
                  in.hole,
                  TextAnchor::Start,
                  s.title_size_pt,
                  FontWeight::Bold,
                  0.0,
                  sym::kInk,
                  {ItemRole::Title, in.hole}});
    // The collar elevation is a height, always signed; depths are below the collar.
    char collar[64];
    const double collar_v =
        view.depth_unit == DepthUnit::Feet ? in.collar_elev_m / kMetresPerFoot : in.collar_elev_m;
    std::snprintf(collar, sizeof collar, "collar %+.1f %s", collar_v,
                  depthUnitWord(view.depth_unit));
    const double sub_h = textLineHeight_mm(s.subtitle_size_pt);
    list.add(Text{{x.left_mm, top + title_h + kTitleGap_mm + sub_h / 2},
                  std::string(collar) + ", TD " + depthText(in.drilled_base_m, view.depth_unit, 1),
                  TextAnchor::Start,
                  s.subtitle_size_pt,
                  FontWeight::Regular,
                  0.0,
                  sym::kInk,
                  {ItemRole::Subtitle, in.hole}});

    for (const Heading &h : headings(in, view, s, x)) {
        const bool scale_entry =
            h.tag.role == ItemRole::TextureScale || h.tag.role == ItemRole::ColumnAgeScale;
        // Texture names stand on their tick; other headings straight on the body.
        const double foot = body_top_mm - kNameToBody_mm;
        list.add(Text{{h.x_mm, foot},
                      h.text,
                      TextAnchor::Start,
                      h.size_pt,
                      FontWeight::Regular,
                      -90.0,
                      sym::kInk,
                      h.tag});
        if (scale_entry) {
            list.add(Line{{h.x_mm, body_top_mm - kScaleTick_mm},
                          {h.x_mm, body_top_mm},
                          Stroke{sym::kInk, 0.2, DashStyle::Solid},
                          h.tag});
        }
    }
}

} // namespace atollog::draw
