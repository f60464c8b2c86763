#include "draw/age_depth_plot_envelope.hpp"

#include "draw/age_depth_plot_symbols.hpp"


namespace atollog::draw {

namespace sym = age_plot_symbols;

std::vector<PointMm> ageEnvelopeOutline(const std::vector<AgeModelGridPoint> &model,
                                        const AgeDepthPlotFrame &frame) {
    std::vector<PointMm> outline;
    for (const AgeModelGridPoint &p : model) {
        outline.push_back({frame.age.x_mm(p.age_q025_ma), frame.depth.y_mm(p.depth_m)});
    }
    for (auto it = model.rbegin(); it != model.rend(); ++it) {
        outline.push_back({frame.age.x_mm(it->age_q975_ma), frame.depth.y_mm(it->depth_m)});
    }
    if (!outline.empty()) {
        outline.push_back(outline.front());
    }
    return outline;
}

void appendAgeEnvelope(DisplayList &list, const std::vector<AgeModelGridPoint> &model,
                       const AgeDepthPlotFrame &frame) {
    // The band as one polygon: down the young (2.5 %) edge, back up the old (97.5 %) edge. At a
    // hiatus the grid has two points at one depth, so the edge steps sideways there.
    std::vector<PointMm> outline = ageEnvelopeOutline(model, frame);
    if (!outline.empty()) outline.pop_back(); // a Polygon closes itself
    list.add(Polygon{std::move(outline), sym::kEnvelopeFill,
                     Stroke{sym::kEnvelopeEdge, sym::kEnvelopeEdge_mm, DashStyle::Solid},
                     {ItemRole::AgeEnvelope, "band"}});
}

} // namespace atollog::draw
