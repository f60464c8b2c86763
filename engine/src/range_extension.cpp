#include "atollog/engine/range_extension.hpp"

#include "atollog/engine/number_text.hpp"

#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog {

// Strauss & Sadler (1989), restated by Marshall (1990, eq. 1): with H horizons spread at random
// over the true range, the gap beyond the last horizon, as a fraction of the observed range, is
// below alpha with probability C for alpha = (1 - C)^(-1/(H-1)) - 1.
std::optional<double> rangeExtensionFraction(int horizon_count, double confidence) {
    if (!std::isfinite(confidence) || !(confidence > 0.0) || !(confidence < 1.0))
        throw std::invalid_argument("rangeExtensionFraction: confidence " +
                                    numberText(confidence) +
                                    " must lie strictly between 0 and 1 (e.g. 0.95)");
    if (horizon_count < 0)
        throw std::invalid_argument("rangeExtensionFraction: horizon count " +
                                    std::to_string(horizon_count) + " is negative");
    if (horizon_count < 2)
        return std::nullopt; // one horizon gives no range length to scale
    return std::pow(1.0 - confidence, -1.0 / static_cast<double>(horizon_count - 1)) - 1.0;
}

} // namespace atollog
