#include "draw/range_chart_validation.hpp"
#include "draw/metres_text.hpp"

#include <cmath>
#include <cstdio>
#include <set>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace {

[[noreturn]] void fail(const RangeChartInput &in, const std::string &what) {
    throw std::invalid_argument("range chart of hole '" + in.hole + "': " + what);
}

void requireInSection(const RangeChartInput &in, double depth_m, const std::string &what) {
    if (!std::isfinite(depth_m)) {
        fail(in, what + " is not a finite depth");
    }
    if (depth_m < in.top_m || depth_m > in.base_m) {
        fail(in, what + " at " + metresText(depth_m) + " lies outside the section " + metresText(in.top_m) +
                     " to " + metresText(in.base_m));
    }
}

} // namespace

void validateRangeChartInput(const RangeChartInput &in) {
    if (!std::isfinite(in.top_m) || !std::isfinite(in.base_m) || in.base_m <= in.top_m) {
        fail(in, "the section base " + metresText(in.base_m) + " must lie below its top " +
                     metresText(in.top_m));
    }
    if (!std::isfinite(in.scale_ratio) || in.scale_ratio <= 0.0) {
        fail(in, "the depth scale 1:N needs a positive N, got " + std::to_string(in.scale_ratio));
    }
    for (const RecoveryInterval &r : in.recovery) {
        requireInSection(in, r.top_m, "recovery interval top");
        requireInSection(in, r.base_m, "recovery interval base");
        if (r.base_m < r.top_m) {
            fail(in, "recovery interval base " + metresText(r.base_m) + " lies above its top " +
                         metresText(r.top_m));
        }
    }
    for (const ChartSample &s : in.samples) {
        requireInSection(in, s.depth_m, "sample '" + s.id + "'");
    }
    std::set<std::string> taxon_ids;
    for (const ChartTaxon &t : in.taxa) {
        if (!taxon_ids.insert(t.id).second) {
            fail(in, "taxon '" + t.id + "' has two columns");
        }
        for (const ChartOccurrence &o : t.occurrences) {
            requireInSection(in, o.depth_m, "occurrence of taxon '" + t.id + "'");
            if (o.abundance_rank < 0 || o.abundance_rank > 5) {
                fail(in, "occurrence of taxon '" + t.id + "' at " + metresText(o.depth_m) +
                             " has abundance rank " + std::to_string(o.abundance_rank) +
                             ", expected 0 to 5");
            }
        }
    }
    for (const ChartPick &p : in.picks) {
        const std::string name = "pick '" + p.event_id + "'";
        if (taxon_ids.count(p.taxon_id) == 0) {
            fail(in, name + " names taxon '" + p.taxon_id + "', which has no column");
        }
        requireInSection(in, p.depth_m, name);
        requireInSection(in, p.shallow_m, name + " shallow end");
        requireInSection(in, p.deep_m, name + " deep end");
        if (p.shallow_m > p.depth_m || p.depth_m > p.deep_m) {
            fail(in, name + " quotes " + metresText(p.depth_m) + " outside its interval " +
                         metresText(p.shallow_m) + " to " + metresText(p.deep_m));
        }
        // An extended interval may reach beyond the section (a correlation can push a datum
        // above the first core); the layout clips it to the section.
        if (p.extended_shallow_m &&
            !(std::isfinite(*p.extended_shallow_m) && *p.extended_shallow_m <= p.shallow_m)) {
            fail(in, name + " extended shallow end must be finite and not below " +
                         metresText(p.shallow_m));
        }
        if (p.extended_deep_m &&
            !(std::isfinite(*p.extended_deep_m) && *p.extended_deep_m >= p.deep_m)) {
            fail(in, name + " extended deep end must be finite and not above " + metresText(p.deep_m));
        }
    }
}

} // namespace atollog::draw
