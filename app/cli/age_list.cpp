#include "cli/age_list.hpp"

#include <cmath>
#include <sstream>
#include <stdexcept>

namespace atollog::cli {

std::vector<double> parseAgeList(const std::string& text, const std::string& option) {
    std::vector<double> ages;
    std::stringstream in(text);
    std::string item;
    while (std::getline(in, item, ',')) {
        std::size_t used = 0;
        double v = 0;
        try {
            v = std::stod(item, &used);
        } catch (const std::exception&) {
            used = 0;
        }
        if (used != item.size() || !(v >= 0) || !std::isfinite(v))
            throw std::invalid_argument(option + ": '" + item +
                                        "' is not an age; give ages in Ma >= 0 separated by "
                                        "commas, e.g. " + option + " 0.125,0.4");
        ages.push_back(v);
    }
    if (ages.empty())
        throw std::invalid_argument(option + ": give at least one age in Ma");
    return ages;
}

} // namespace atollog::cli
