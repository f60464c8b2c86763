#include "atollog/engine/biostrat_settings.hpp"

#include "atollog/engine/number_text.hpp"

#include <cmath>
#include <stdexcept>

namespace atollog {

std::string_view toString(PickDepthQuote q) {
    switch (q) {
    case PickDepthQuote::Midpoint:
        return "midpoint";
    case PickDepthQuote::SampleTop:
        return "sample_top";
    case PickDepthQuote::SampleBase:
        return "sample_base";
    }
    return "midpoint";
}

void validateBiostratSettings(const BiostratSettings& s) {
    if (s.range_extension_confidence) {
        const double c = *s.range_extension_confidence;
        if (!std::isfinite(c) || !(c > 0.0) || !(c < 1.0))
            throw std::invalid_argument("biostratigraphy settings: range_extension_confidence " +
                                        numberText(c) +
                                        " must lie strictly between 0 and 1 (e.g. 0.95)");
    }
    if (s.min_abundance_count && *s.min_abundance_count < 0)
        throw std::invalid_argument("biostratigraphy settings: min_abundance_count " +
                                    std::to_string(*s.min_abundance_count) +
                                    " is negative; give a whole count of 0 or more");
    if (s.ties_use_extended_bracket && !s.range_extension_confidence)
        throw std::invalid_argument(
            "biostratigraphy settings: ties_use_extended_bracket needs "
            "range_extension_confidence (e.g. 0.95); set it or turn the option off");
}

std::string biostratSettingsText(const BiostratSettings& s) {
    std::string out;
    auto line = [&out](std::string_view key, const std::string& value) {
        out.append("biostrat.").append(key).append("=").append(value).append("\n");
    };
    line("depth_quote", std::string(toString(s.depth_quote)));
    line("min_abundance_class",
         s.min_abundance_class ? std::string(toString(*s.min_abundance_class)) : "none");
    line("min_abundance_count",
         s.min_abundance_count ? std::to_string(*s.min_abundance_count) : "none");
    line("range_extension_confidence",
         s.range_extension_confidence ? numberText(*s.range_extension_confidence) : "none");
    line("cuttings_bases_as_ties", s.cuttings_bases_as_ties ? "yes" : "no");
    line("basement_bases_as_ties", s.basement_bases_as_ties ? "yes" : "no");
    line("surface_picks_as_ties", s.surface_picks_as_ties ? "yes" : "no");
    line("ties_use_extended_bracket", s.ties_use_extended_bracket ? "yes" : "no");
    return out;
}

} // namespace atollog
