#include "draw/panel_ties.hpp"

#include "draw/panel_links.hpp"
#include "draw/panel_style.hpp"

namespace atollog::draw {

namespace ps = panel_style;

bool appendPanelTies(DisplayList &bands, DisplayList &lines, std::vector<LinkLabel> &labels,
                     const PanelFrame &frame, const PanelInput &in) {
    const LinkLook look{ps::kTieStroke,     ps::kTieSkipStroke, ps::kTieBand,
                        std::nullopt,       ps::kBracketEnd_mm, 0.4,
                        ItemRole::TieLine,  ItemRole::TieBand};
    bool skipped = false;
    for (const PanelTie &tie : in.ties) {
        std::vector<LinkLevel> levels;
        for (const PanelTie::At &at : tie.at) {
            levels.push_back({at.column, at.shallow_m, at.level_m, at.deep_m});
        }
        const auto end = appendLink(bands, lines, frame, std::move(levels), look, tie.event);
        if (end.label_at) {
            labels.push_back({*end.label_at, tie.event, ps::kTie, {ItemRole::TieLabel, tie.event}});
        }
        skipped = skipped || end.skips;
    }
    return skipped;
}

} // namespace atollog::draw
