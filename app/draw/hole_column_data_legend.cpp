#include "draw/hole_column_data_legend.hpp"

#include "draw/group_palette.hpp"
#include "draw/hole_column_track_symbols.hpp"
#include "draw/hole_column_zones.hpp"

#include <string>

namespace atollog::draw {

namespace ts = track_symbols;

namespace {

ItemTag swatchTag(const std::string &what) {
    return {ItemRole::LegendSwatch, what};
}

void taxaBlock(LegendRows &w, const HoleColumnLegendContent &c) {
    DisplayList &list = w.list();
    if (c.taxon_groups.empty() && !c.taxon_reworked && !c.taxon_caved) {
        return;
    }
    w.heading("Taxa");
    for (const std::string &group : c.taxon_groups) {
        const Colour colour = groupColour(group);
        w.row(std::string(groupLabelWord(group)) + ": counted finds and range", [&](PointMm p) {
            list.add(Rect{{p.x_mm - ts::kTaxonBarWidth_mm / 2, p.y_mm - 2.0,
                           ts::kTaxonBarWidth_mm, 4.0},
                          colour,
                          FillPattern::None,
                          Stroke{ts::kOutline, ts::kTaxonBarOutline_mm, DashStyle::Solid},
                          swatchTag("taxon " + group)});
            list.add(Marker{{p.x_mm, p.y_mm}, MarkerShape::Circle, ts::kFindMarker_mm, colour,
                            false, 0.15, swatchTag("taxon " + group)});
        });
    }
    if (c.taxon_reworked) {
        w.row("reworked find (not in the range)", [&](PointMm p) {
            list.add(Marker{p, ts::kReworkedShape, ts::kExcludedMarker_mm, ts::kInk, true, 0.2,
                            swatchTag("reworked")});
        });
    }
    if (c.taxon_caved) {
        w.row("caved find (not in the range)", [&](PointMm p) {
            list.add(Marker{p, ts::kCavedShape, ts::kExcludedMarker_mm, ts::kInk, true, 0.2,
                            swatchTag("caved")});
        });
    }
}

void zonesBlock(LegendRows &w, const HoleColumnLegendContent &c) {
    DisplayList &list = w.list();
    if (!c.zone && !c.zone_bracket && !c.zone_open) {
        return;
    }
    w.heading("Zones");
    const Stroke edge{ts::kOutline, ts::kZoneEdge_mm, DashStyle::Solid};
    if (c.zone) {
        w.row("zone (neighbours alternate)", [&](PointMm p) {
            list.add(Rect{{p.x_mm - 3.0, p.y_mm - 1.6, 3.0, 3.2}, ts::kZoneTintA, FillPattern::None,
                          edge, swatchTag("zone")});
            list.add(Rect{{p.x_mm, p.y_mm - 1.6, 3.0, 3.2}, ts::kZoneTintB, FillPattern::None,
                          edge, swatchTag("zone")});
        });
    }
    if (c.zone_bracket) {
        w.row("boundary lies in this bracket", [&](PointMm p) {
            const RectMm box{p.x_mm - 3.0, p.y_mm - 1.6, 6.0, 3.2};
            list.add(Rect{box, ts::kWhite, FillPattern::None, edge, swatchTag("zone bracket")});
            for (Line &l : hatchLines(box, ts::kZoneHatchSpacing_mm,
                                      Stroke{ts::kZoneHatch, ts::kZoneHatch_mm, DashStyle::Solid},
                                      swatchTag("zone bracket"))) {
                list.add(std::move(l));
            }
        });
    }
    if (c.zone_overlap) {
        w.row("zones side by side: their picks overlap", [&](PointMm p) {
            list.add(Rect{{p.x_mm - 3.0, p.y_mm - 2.0, 3.0, 3.0}, ts::kZoneTintA, FillPattern::None,
                          edge, swatchTag("zone overlap")});
            list.add(Rect{{p.x_mm, p.y_mm - 1.0, 3.0, 3.0}, ts::kZoneTintB, FillPattern::None,
                          edge, swatchTag("zone overlap")});
        });
    }
    if (c.zone_open) {
        w.row("boundary not picked in the hole", [&](PointMm p) {
            list.add(Line{{p.x_mm - 3.0, p.y_mm},
                          {p.x_mm + 3.0, p.y_mm},
                          Stroke{ts::kOutline, ts::kZoneEdge_mm * 2, DashStyle::Dashed},
                          swatchTag("zone open")});
        });
    }
}

void agesBlock(LegendRows &w, const HoleColumnLegendContent &c) {
    DisplayList &list = w.list();
    if (!c.age_median && !c.age_band && !c.date_used && !c.date_unused) {
        return;
    }
    w.heading("Ages");
    if (c.age_median || c.age_band) {
        w.row("age model: median, 95 % band", [&](PointMm p) {
            list.add(Polygon{{{p.x_mm - 4.0, p.y_mm - 1.6},
                              {p.x_mm + 1.0, p.y_mm - 1.6},
                              {p.x_mm + 4.0, p.y_mm + 1.6},
                              {p.x_mm - 1.0, p.y_mm + 1.6}},
                             ts::kBand,
                             Stroke{ts::kBandEdge, ts::kBandEdge_mm, DashStyle::Solid},
                             swatchTag("age band")});
            list.add(Line{{p.x_mm - 1.5, p.y_mm - 1.6}, {p.x_mm + 1.5, p.y_mm + 1.6},
                          Stroke{ts::kMedian, ts::kMedian_mm, DashStyle::Solid},
                          swatchTag("age median")});
        });
    }
    const auto dateSwatch = [&](PointMm p, bool hollow, const std::string &what) {
        const Stroke bar{ts::kDate, ts::kDateBar_mm, DashStyle::Solid};
        list.add(Line{{p.x_mm - 3.0, p.y_mm}, {p.x_mm + 3.0, p.y_mm}, bar, swatchTag(what)});
        list.add(Line{{p.x_mm, p.y_mm - 2.0}, {p.x_mm, p.y_mm + 2.0}, bar, swatchTag(what)});
        list.add(Marker{p, MarkerShape::Circle, ts::kDateMarker_mm, ts::kDate, hollow, 0.2,
                        swatchTag(what)});
    };
    if (c.date_used) {
        w.row("date: 95 % age range, depth bracket",
              [&](PointMm p) { dateSwatch(p, false, "date"); });
    }
    if (c.date_unused) {
        w.row("date not used in the age model",
              [&](PointMm p) { dateSwatch(p, true, "date unused"); });
    }
}

} // namespace

void appendDataTrackLegend(LegendRows &w, const HoleColumnLegendContent &c) {
    taxaBlock(w, c);
    zonesBlock(w, c);
    agesBlock(w, c);
}

} // namespace atollog::draw
