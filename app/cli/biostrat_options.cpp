#include "cli/biostrat_options.hpp"

#include <stdexcept>

namespace atollog::cli {

BiostratSettings BiostratOptions::settings() const {
    BiostratSettings s;
    if (quote == "midpoint") s.depth_quote = PickDepthQuote::Midpoint;
    else if (quote == "sample-top") s.depth_quote = PickDepthQuote::SampleTop;
    else if (quote == "sample-base") s.depth_quote = PickDepthQuote::SampleBase;
    else
        throw std::invalid_argument("--quote '" + quote +
                                    "': expected one of midpoint, sample-top, sample-base");
    if (!min_class.empty()) {
        s.min_abundance_class = parseAbundanceClass(min_class);
        if (!s.min_abundance_class)
            throw std::invalid_argument("--min-abundance '" + min_class + "': expected one of " +
                                        allowedWords<AbundanceClass>());
    }
    s.min_abundance_count = min_count;
    s.range_extension_confidence = extend;
    s.cuttings_bases_as_ties = cuttings_bases;
    s.ties_use_extended_bracket = ties_extended;
    s.surface_picks_as_ties = surface_picks;
    validateBiostratSettings(s);
    return s;
}

void addBiostratOptions(CLI::App& sub, BiostratOptions& o) {
    sub.add_option("--quote", o.quote,
                   "Depth quoted for a pick: midpoint (of the bracket, +/- half its width), "
                   "sample-top or sample-base (of the sample where the taxon was found)")
        ->capture_default_str();
    sub.add_option("--min-abundance", o.min_class,
                   "Count only occurrences at or above this abundance class (e.g. common: the "
                   "top of common occurrence)");
    sub.add_option("--min-count", o.min_count,
                   "Count only occurrences given as a whole count at or above this number");
    sub.add_option("--extend", o.extend,
                   "Confidence level (e.g. 0.95) of the range extension beyond each pick, from "
                   "the number of horizons with the taxon (Strauss & Sadler 1989)");
    sub.add_flag("--cuttings-bases", o.cuttings_bases,
                 "Use bases (first occurrences) in cuttings holes as tie points");
    sub.add_flag("--ties-extended", o.ties_extended,
                 "Tie points carry the extended bracket (needs --extend)");
    sub.add_flag("--surface-picks", o.surface_picks,
                 "Use picks whose bracket holds a logged surface as tie points (by default "
                 "not: their datum may be squeezed onto the surface)");
}

} // namespace atollog::cli
