#include "draw/panel_links.hpp"

#include "draw/panel_clip.hpp"

#include <algorithm>

namespace atollog::draw {

namespace {

constexpr double kStub_mm = 4.0;       // a level seen in one hole only gets a short stub

struct Strip {
    double top_mm, bottom_mm;
};

void addLine(DisplayList &out, PointMm a, PointMm b, const Strip &s, const Stroke &stroke,
             const ItemTag &tag) {
    if (const auto cut = clipSegmentToStrip(a, b, s.top_mm, s.bottom_mm)) {
        out.add(Line{cut->first, cut->second, stroke, tag});
    }
}

void addEdgeBar(DisplayList &out, const PanelFrame &f, const LinkLevel &l, double x_mm,
                const Strip &s, const LinkLook &look, const ItemTag &tag) {
    const double top = f.columnY_mm(l.column, l.shallow_m);
    const double bottom = f.columnY_mm(l.column, l.deep_m);
    // A zero-width span still gets a tick, so a sharp level is marked on the edge.
    const double half_tick = bottom - top < 0.6 ? 0.3 : 0.0;
    addLine(out, {x_mm, top - half_tick}, {x_mm, bottom + half_tick}, s,
            Stroke{look.line.colour, look.edge_bar_mm, DashStyle::Solid}, tag);
}

} // namespace

LinkResult appendLink(DisplayList &bands, DisplayList &lines,
                                          const PanelFrame &f, std::vector<LinkLevel> levels,
                                          const LinkLook &look, const std::string &key) {
    // On an age axis a hole without an age model has no place to put a level.
    std::erase_if(levels, [&f](const LinkLevel &l) { return !f.columns.at(l.column).scale; });
    if (levels.empty()) {
        return {};
    }
    std::sort(levels.begin(), levels.end(),
              [](const LinkLevel &a, const LinkLevel &b) { return a.column < b.column; });
    const Strip strip{f.y_mm(f.axis_top_m), f.y_mm(f.axis_base_m)};
    const ItemTag line_tag{look.line_role, key};
    const ItemTag band_tag{look.band_role, key};
    bool skips = false;

    for (std::size_t i = 0; i + 1 < levels.size(); ++i) {
        const LinkLevel &a = levels[i];
        const LinkLevel &b = levels[i + 1];
        const bool skip = b.column > a.column + 1;
        skips = skips || skip;
        // Out of a column at its right edge, past its samples, taxa, zones and ages, so a link
        // never crosses a column's data; into the next at its lithology (past its depth axis and
        // core runs, which are narrow and sit left of the rock).
        const double xa = f.columns[a.column].x.right_mm;
        const double xb = f.columns[b.column].x.lithology_left_mm;
        const std::vector<PointMm> band{{xa, f.columnY_mm(a.column, a.shallow_m)},
                                        {xb, f.columnY_mm(b.column, b.shallow_m)},
                                        {xb, f.columnY_mm(b.column, b.deep_m)},
                                        {xa, f.columnY_mm(a.column, a.deep_m)}};
        std::vector<PointMm> cut = clipPolygonToStrip(band, strip.top_mm, strip.bottom_mm);
        if (!cut.empty()) {
            bands.add(Polygon{std::move(cut), look.band, look.band_outline, band_tag});
        }
        addLine(lines, {xa, f.columnY_mm(a.column, a.level_m)},
                {xb, f.columnY_mm(b.column, b.level_m)}, strip, skip ? look.skip_line : look.line,
                line_tag);
        addEdgeBar(lines, f, a, xa + look.edge_inset_mm, strip, look, line_tag);
        addEdgeBar(lines, f, b, xb - look.edge_inset_mm, strip, look, line_tag);
    }

    const LinkLevel &last = levels.back();
    const double x_end = f.columns[last.column].x.right_mm;
    const double y_end = f.columnY_mm(last.column, last.level_m);
    if (levels.size() == 1) {
        addEdgeBar(lines, f, last, x_end + look.edge_inset_mm, strip, look, line_tag);
        addLine(lines, {x_end, y_end}, {x_end + kStub_mm, y_end}, strip, look.line, line_tag);
    }
    if (y_end < strip.top_mm || y_end > strip.bottom_mm) {
        return {std::nullopt, skips};
    }
    // A level seen in one hole ends in its stub right of the column: the label goes after it.
    return {PointMm{x_end + (levels.size() == 1 ? kStub_mm : 0.0), y_end}, skips};
}

} // namespace atollog::draw
