#include "view/selection_highlight.hpp"

#include "view/item_description.hpp"

#include <variant>

namespace atollog::view {

namespace {

// Orange (Okabe & Ito): apart from the panel's blue ties, vermillion isochrons and grey logs.
constexpr draw::Colour kHighlight = draw::colourFromHex(0xE69F00);
constexpr double kThicken = 2.5; // wide enough to see at fit-to-window scales

draw::Stroke highlighted(draw::Stroke s) {
    s.colour = kHighlight;
    s.width_mm *= kThicken;
    return s;
}

struct Recolour {
    void operator()(draw::Rect &r) const {
        r.fill.reset();
        r.pattern = draw::FillPattern::None;
        r.stroke = highlighted(r.stroke.value_or(draw::Stroke{}));
    }
    void operator()(draw::Line &l) const { l.stroke = highlighted(l.stroke); }
    void operator()(draw::Polyline &l) const { l.stroke = highlighted(l.stroke); }
    void operator()(draw::Polygon &g) const {
        // A band only tinted, no outline: its line, thickened, is what the eye should follow.
        g.fill = draw::Colour{kHighlight.r, kHighlight.g, kHighlight.b, 90};
        g.stroke.reset();
    }
    void operator()(draw::Text &t) const { t.colour = kHighlight; }
    void operator()(draw::Marker &m) const { m.colour = kHighlight; }
};

} // namespace

bool sameDatum(draw::ItemRole a, draw::ItemRole b) {
    return a == b || (isTieRole(a) && isTieRole(b)) || (isIsochronRole(a) && isIsochronRole(b));
}

draw::DisplayList selectionHighlight(const draw::DisplayList &list, const draw::ItemTag &tag) {
    draw::DisplayList out;
    out.setPage(list.page());
    for (const draw::DisplayItem &item : list.items()) {
        const draw::ItemTag &t = draw::itemTag(item);
        if (t.key == tag.key && sameDatum(t.role, tag.role)) {
            draw::DisplayItem copy = item;
            std::visit(Recolour{}, copy);
            out.add(std::move(copy));
        }
    }
    return out;
}

} // namespace atollog::view
