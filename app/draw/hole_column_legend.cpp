#include "draw/hole_column_legend.hpp"

#include "draw/hole_column_data_legend.hpp"
#include "draw/hole_column_symbols.hpp"
#include "draw/legend_rows.hpp"
#include "draw/lithology_fill.hpp"
#include "draw/lithology_words.hpp"
#include "draw/surface_stroke.hpp"

#include <algorithm>
#include <string>

namespace atollog::draw {

namespace sym = column_symbols;

namespace {

constexpr double kSwatchWidth_mm = 10.0; // wide and tall enough to show a few pattern repeats
constexpr double kSwatchHeight_mm = 4.0;
constexpr double kTextGap_mm = 2.0;

std::string fillLabel(const DrawnFill &f) {
    std::string label(rockWord(f.rock));
    if (f.reef_framework) {
        label += ", reef framework (boundstone)";
    }
    return label;
}

std::string surfaceLabel(SurfaceKind s) {
    switch (s) {
    case SurfaceKind::Exposure:
        return "exposure surface";
    case SurfaceKind::Hardground:
        return "hardground";
    case SurfaceKind::Erosion:
        return "erosion surface";
    case SurfaceKind::BasementContact:
        break;
    }
    return "basement contact";
}

ItemTag swatchTag(const std::string &what) {
    return {ItemRole::LegendSwatch, what};
}

} // namespace

void HoleColumnLegendContent::addFill(DrawnFill f) {
    if (std::find(fills.begin(), fills.end(), f) == fills.end()) {
        fills.push_back(f);
    }
}

void HoleColumnLegendContent::addSurface(SurfaceKind s) {
    if (std::find(surfaces.begin(), surfaces.end(), s) == surfaces.end()) {
        surfaces.push_back(s);
    }
}

void HoleColumnLegendContent::addTaxonGroup(const std::string &group_word) {
    if (std::find(taxon_groups.begin(), taxon_groups.end(), group_word) == taxon_groups.end()) {
        taxon_groups.push_back(group_word);
    }
}

void HoleColumnLegendContent::merge(const HoleColumnLegendContent &o) {
    for (const DrawnFill &f : o.fills) {
        addFill(f);
    }
    for (const SurfaceKind s : o.surfaces) {
        addSurface(s);
    }
    for (const std::string &g : o.taxon_groups) {
        addTaxonGroup(g);
    }
    recovered = recovered || o.recovered;
    unrecovered = unrecovered || o.unrecovered;
    samples = samples || o.samples;
    taxon_reworked = taxon_reworked || o.taxon_reworked;
    taxon_caved = taxon_caved || o.taxon_caved;
    zone = zone || o.zone;
    zone_bracket = zone_bracket || o.zone_bracket;
    zone_open = zone_open || o.zone_open;
    zone_overlap = zone_overlap || o.zone_overlap;
    age_median = age_median || o.age_median;
    age_band = age_band || o.age_band;
    date_used = date_used || o.date_used;
    date_unused = date_unused || o.date_unused;
}

RectMm appendHoleColumnLegend(DisplayList &list, const HoleColumnLegendContent &c, PointMm top_left,
                              const HoleColumnStyle &style) {
    LegendRows w(
        list, top_left,
        {style.legend_row_mm, style.label_size_pt, kSwatchWidth_mm, kTextGap_mm, sym::kInk});
    if (!c.fills.empty()) {
        w.heading("Lithology");
        for (const DrawnFill &f : c.fills) {
            const LithologyFill fill = lithologyFill(
                f.rock, f.reef_framework ? TextureClass::Framestone : TextureClass::None);
            w.row(fillLabel(f), [&](PointMm p) {
                list.add(Rect{{p.x_mm - kSwatchWidth_mm / 2, p.y_mm - kSwatchHeight_mm / 2,
                               kSwatchWidth_mm, kSwatchHeight_mm},
                              fill.colour,
                              fill.pattern,
                              Stroke{sym::kInk, sym::kBoxOutline_mm, DashStyle::Solid},
                              swatchTag(std::string(rockWord(f.rock)))});
            });
        }
    }
    if (!c.surfaces.empty()) {
        w.heading("Surfaces");
        for (const SurfaceKind s : c.surfaces) {
            const SurfaceLook look = surfaceLook(s);
            w.row(surfaceLabel(s), [&](PointMm p) {
                list.add(Polyline{surfacePath(look, p.x_mm - kSwatchWidth_mm / 2,
                                              p.x_mm + kSwatchWidth_mm / 2, p.y_mm),
                                  look.stroke, swatchTag(std::string(surfaceWord(s)))});
            });
        }
    }
    if (c.recovered || c.unrecovered || c.samples) {
        w.heading("Core and samples");
    }
    if (c.recovered) {
        w.row("core recovered", [&](PointMm p) {
            list.add(Rect{{p.x_mm - 1.5, p.y_mm - 1.4, 3.0, 2.8},
                          sym::kRecovered,
                          FillPattern::None,
                          std::nullopt,
                          swatchTag("recovered")});
        });
    }
    if (c.unrecovered) {
        w.row("no recovery", [&](PointMm p) {
            list.add(Rect{{p.x_mm - 1.5, p.y_mm - 1.4, 3.0, 2.8},
                          sym::kWhite,
                          FillPattern::None,
                          Stroke{sym::kOutline, sym::kRunOutline_mm, DashStyle::Solid},
                          swatchTag("unrecovered")});
        });
    }
    if (c.samples) {
        w.row("sample", [&](PointMm p) {
            list.add(Line{{p.x_mm - 2.0, p.y_mm},
                          {p.x_mm + 2.0, p.y_mm},
                          Stroke{sym::kInk, sym::kSampleTick_mm, DashStyle::Solid},
                          swatchTag("sample")});
        });
    }
    appendDataTrackLegend(w, c);
    return w.box(top_left);
}

} // namespace atollog::draw
