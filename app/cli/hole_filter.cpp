#include "cli/hole_filter.hpp"

#include <stdexcept>

namespace atollog::cli {

void requireHole(const CoreDataset& data, const std::string& hole) {
    if (hole.empty()) return;
    for (const auto& h : data.holes)
        if (h.hole == hole) return;
    std::string known;
    for (const auto& h : data.holes) known += (known.empty() ? "" : ", ") + h.hole;
    throw std::invalid_argument("no hole '" + hole + "' in the project; holes are: " + known);
}

} // namespace atollog::cli
