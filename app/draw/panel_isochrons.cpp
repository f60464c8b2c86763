#include "draw/panel_isochrons.hpp"

#include "draw/panel_links.hpp"
#include "draw/panel_style.hpp"

namespace atollog::draw {

namespace ps = panel_style;

bool appendPanelIsochrons(DisplayList &bands, DisplayList &lines, std::vector<LinkLabel> &labels,
                          const PanelFrame &frame, const PanelInput &in) {
    // The edge bars are thinner than a tie's: the band is a model range, not an observed bracket.
    const LinkLook look{ps::kIsochronStroke,
                        ps::kIsochronSkipStroke,
                        ps::kIsochronBand,
                        ps::kIsochronBandOutline,
                        0.3,
                        1.2,
                        ItemRole::Isochron,
                        ItemRole::IsochronBand};
    bool skipped = false;
    for (const PanelIsochron &iso : in.isochrons) {
        std::vector<LinkLevel> levels;
        for (const PanelIsochron::At &at : iso.at) {
            levels.push_back({at.column, at.q025_m, at.q500_m, at.q975_m});
        }
        const auto end = appendLink(bands, lines, frame, std::move(levels), look, iso.label);
        if (end.label_at) {
            labels.push_back({*end.label_at, iso.label, ps::kIsochron, {ItemRole::IsochronLabel, iso.label}});
        }
        skipped = skipped || end.skips;
    }
    return skipped;
}

} // namespace atollog::draw
