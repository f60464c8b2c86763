// The sentence a geologist reads for one contradiction: each step of the cycle with the hole and
// the two brackets that show it (or the rule that gives it), so the picks to re-check are named.
#include "event_order_graph_parts.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <string>

namespace atollog::detail {

namespace {

std::string quoted(const SequenceEvent& e) { return "'" + e.id + "'"; }

// Brackets are computed (widened for recovery) and dates' ages come from calibration: both are
// rounded for reading, depths to the centimetre, ages to four significant digits.
std::string metresText(double v) { return derivedNumberText(std::round(v * 100) / 100); }

std::string significant(double v) {
    if (!std::isfinite(v) || v == 0)
        return numberText(v);
    const double scale = std::pow(10.0, 3 - std::floor(std::log10(std::fabs(v))));
    return derivedNumberText(std::round(v * scale) / scale);
}

std::string bracketText(const EventLevel& l) {
    return l.shallow_m == l.deep_m ? metresText(l.shallow_m) + " m"
                                   : metresText(l.shallow_m) + "-" + metresText(l.deep_m) + " m";
}

std::string ageText(const SequenceEvent& e) {
    std::string t = significant(e.age_ma.value_or(0.0));
    if (e.age_sd_ma)
        t += " +/- " + significant(*e.age_sd_ma);
    return t + " Ma";
}

/// One step, older -> younger, as a clause; appends the holes that show it.
std::string describeStep(std::size_t older, std::size_t younger, const CorrelationData& data,
                         const DirectObservations& seen, std::vector<std::size_t>& holes) {
    const SequenceEvent& a = data.events[older];
    const SequenceEvent& b = data.events[younger];
    const std::vector<std::size_t> shown = seen.holesShowingBelow(older, younger);
    if (!shown.empty()) {
        holes.insert(holes.end(), shown.begin(), shown.end());
        const std::size_t h = shown.front();
        std::string text = quoted(a) + " lies below " + quoted(b) + " in hole " + data.holes[h] +
                           " (" + bracketText(seen.levelIn(older, h)) + " below " +
                           bracketText(seen.levelIn(younger, h)) + ")";
        if (shown.size() > 1)
            text += " and in " + std::to_string(shown.size() - 1) +
                    (shown.size() == 2 ? " other hole" : " other holes");
        return text;
    }
    const char* rule = ruleOrdering(a, b);
    if (rule == std::string(kRuleBaseBeforeTop))
        return quoted(a) + " is older than " + quoted(b) +
               " (a taxon's base comes before its top)";
    return quoted(a) + " (" + ageText(a) + ") is older than " + quoted(b) + " (" + ageText(b) +
           ", more than two combined sds younger)";
}

std::string listOfNames(const std::vector<std::size_t>& cycle, const CorrelationData& data) {
    std::string text;
    for (std::size_t i = 0; i < cycle.size(); ++i) {
        if (i > 0)
            text += i + 1 == cycle.size() ? (cycle.size() == 2 ? " and " : ", and ") : ", ";
        text += quoted(data.events[cycle[i]]);
    }
    return text;
}

} // namespace

OrderConflict describeConflict(const std::vector<std::size_t>& cycle, const CorrelationData& data,
                               const DirectObservations& seen) {
    OrderConflict conflict;
    conflict.cycle = cycle;
    std::string steps;
    for (std::size_t i = 0; i < cycle.size(); ++i) {
        if (i > 0)
            steps += i + 1 == cycle.size() ? ", and " : ", ";
        steps += describeStep(cycle[i], cycle[(i + 1) % cycle.size()], data, seen,
                              conflict.holes);
    }
    std::sort(conflict.holes.begin(), conflict.holes.end());
    conflict.holes.erase(std::unique(conflict.holes.begin(), conflict.holes.end()),
                         conflict.holes.end());
    conflict.message = "The order of " + listOfNames(cycle, data) + " contradicts itself: " +
                       steps + "; at least one of these picks is misplaced.";
    return conflict;
}

} // namespace atollog::detail
