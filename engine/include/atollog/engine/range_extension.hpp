#pragma once
// How far a taxon's true range end may lie beyond its observed end, from the number of fossil
// horizons alone: the classical confidence interval of Strauss & Sadler (1989, Math. Geol.
// 21:411), as applied to stratigraphic ranges by Marshall (1990, Paleobiology 16:1). It assumes
// fossil horizons are randomly (uniformly) spread over the true range.
#include <optional>

namespace atollog {

/// The one-ended interval as a fraction alpha of the observed range length:
/// alpha = (1 - C)^(-1/(H - 1)) - 1, with C the confidence level in (0, 1) and H the number of
/// horizons with the taxon. nullopt for H < 2 (no observed range, no estimate). Throws
/// std::invalid_argument for a confidence outside (0, 1) or a negative horizon count.
std::optional<double> rangeExtensionFraction(int horizon_count, double confidence);

} // namespace atollog
