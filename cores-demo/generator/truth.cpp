#include "truth.hpp"

#include <stdexcept>

namespace atollog::demo {

const TrueHoleHistory& trueHistory(const DemoTruth& truth, const std::string& hole) {
    for (const auto& h : truth.holes)
        if (h.hole == hole) return h;
    throw std::out_of_range("no hole '" + hole + "' in the demo truth");
}

double trueAgeMa(const DemoTruth& truth, const std::string& hole, double depth_m) {
    return trueAgeMa(trueHistory(truth, hole), depth_m);
}

std::vector<TrueHiatus> hiatusesOf(const TrueHoleHistory& h) {
    std::vector<TrueHiatus> out;
    for (std::size_t i = 1; i < h.reef_segments.size(); ++i)
        out.push_back({h.hole, h.reef_segments[i].top_m, h.reef_segments[i - 1].age_base_ma,
                       h.reef_segments[i].age_top_ma, "exposure"});
    out.push_back({h.hole, h.basalt_top_m, h.reef_segments.back().age_base_ma,
                   h.basalt_top_age_ma, "basement"});
    return out;
}

} // namespace atollog::demo
