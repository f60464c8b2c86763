#include "atollog/engine/correlation_data.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <set>
#include <stdexcept>
#include <utility>

namespace atollog {

namespace {

[[noreturn]] void fail(const std::string& what) {
    throw std::invalid_argument("correlation data: " + what);
}

} // namespace

void validateCorrelationData(const CorrelationData& d) {
    std::set<std::string> seen;
    for (const std::string& h : d.holes) {
        if (h.empty())
            fail("a hole has an empty id");
        if (!seen.insert(h).second)
            fail("hole '" + h + "' is listed twice");
    }
    seen.clear();
    for (const SequenceEvent& e : d.events) {
        if (e.id.empty())
            fail("an event has an empty id");
        if (!seen.insert(e.id).second)
            fail("event '" + e.id + "' is listed twice");
        if (e.kind != SequenceEventKind::Dated && e.taxon.empty())
            fail("event '" + e.id + "' is a base or top without a taxon");
        if (e.kind == SequenceEventKind::Dated && !e.age_ma)
            fail("dated horizon '" + e.id + "' has no age");
        if (e.age_ma && !std::isfinite(*e.age_ma))
            fail("event '" + e.id + "' has age " + numberText(*e.age_ma) + "; give a finite age");
        if (e.age_sd_ma && (!std::isfinite(*e.age_sd_ma) || *e.age_sd_ma < 0))
            fail("event '" + e.id + "' has age sd " + numberText(*e.age_sd_ma) +
                 "; give a finite sd >= 0");
    }
    std::set<std::pair<std::size_t, std::size_t>> pairs;
    for (const EventLevel& l : d.levels) {
        if (l.hole >= d.holes.size() || l.event >= d.events.size())
            fail("a level refers to hole " + std::to_string(l.hole) + " and event " +
                 std::to_string(l.event) + ", beyond the " + std::to_string(d.holes.size()) +
                 " holes and " + std::to_string(d.events.size()) + " events");
        const std::string where = "event '" + d.events[l.event].id + "' in hole '" +
                                  d.holes[l.hole] + "'";
        if (!pairs.insert({l.hole, l.event}).second)
            fail(where + " is observed twice");
        if (!std::isfinite(l.shallow_m) || !std::isfinite(l.deep_m) || !std::isfinite(l.level_m))
            fail(where + " has a non-finite depth (" + numberText(l.shallow_m) + ", " +
                 numberText(l.deep_m) + ", level " + numberText(l.level_m) + ")");
        if (l.shallow_m > l.deep_m)
            fail(where + " has shallow_m " + numberText(l.shallow_m) + " below deep_m " +
                 numberText(l.deep_m));
        if (l.level_m < l.shallow_m || l.level_m > l.deep_m)
            fail(where + " has its level " + numberText(l.level_m) + " m outside its bracket [" +
                 numberText(l.shallow_m) + ", " + numberText(l.deep_m) + "] m");
    }
    if (d.sampled_levels_m.size() != d.holes.size())
        fail("sampled_levels_m has " + std::to_string(d.sampled_levels_m.size()) +
             " lists for " + std::to_string(d.holes.size()) + " holes");
    if (d.surfaces_m.size() != d.holes.size())
        fail("surfaces_m has " + std::to_string(d.surfaces_m.size()) + " lists for " +
             std::to_string(d.holes.size()) + " holes");
    for (std::size_t h = 0; h < d.holes.size(); ++h) {
        const auto& s = d.sampled_levels_m[h];
        if (!std::is_sorted(s.begin(), s.end()) ||
            std::any_of(s.begin(), s.end(), [](double v) { return !std::isfinite(v); }))
            fail("the sampled levels of hole '" + d.holes[h] +
                 "' must be finite and ascending");
        for (double v : d.surfaces_m[h])
            if (!std::isfinite(v))
                fail("hole '" + d.holes[h] + "' has a surface at " + numberText(v) + " m");
    }
}

} // namespace atollog
