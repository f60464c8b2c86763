#include "atollog/engine/datum_picks.hpp"

#include "atollog/engine/number_text.hpp"
#include "atollog/engine/range_extension.hpp"

#include "biostrat_index.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace atollog {
namespace {

void requireUsableEvent(const TimeScaleEvent& e) {
    if (!std::isfinite(e.age_ma) || !std::isfinite(e.age_sd_ma) || e.age_sd_ma < 0.0)
        throw std::invalid_argument("biostratigraphy: event '" + e.event + "' has age_ma " +
                                    numberText(e.age_ma) + " and age_sd_ma " +
                                    numberText(e.age_sd_ma) +
                                    "; give a finite age and a finite sd of 0 or more");
}

// Nearest examined sample strictly shallower (step -1) or deeper (step +1) than the found one's
// level. Samples at the found level do not bracket anything.
std::optional<std::size_t> nextExaminedBeyond(const detail::BiostratIndex& index, std::size_t h,
                                              std::size_t found_pos, int step) {
    const double level_m = index.examinedSample(h, found_pos).top_m;
    const std::size_t n = index.holes()[h].examined.size();
    std::size_t pos = found_pos;
    while (true) {
        if (step < 0) {
            if (pos == 0)
                return std::nullopt;
            --pos;
        } else {
            if (pos + 1 >= n)
                return std::nullopt;
            ++pos;
        }
        if (index.examinedSample(h, pos).top_m != level_m)
            return pos;
    }
}

void placeTop(DatumPick& p, const detail::BiostratIndex& index, std::size_t h,
              const detail::TaxonInHole& t) {
    const Sample& found = index.examinedSample(h, t.counted_positions.front());
    const DepthModel& model = index.holes()[h].depth_model;
    p.found_sample = found.sample;
    p.found_top_m = found.top_m;
    p.found_base_m = found.base_m;
    const double deep_m = found.base_m;
    p.plain.deep_m = deep_m;
    if (const auto absent = nextExaminedBeyond(index, h, t.counted_positions.front(), -1)) {
        const Sample& a = index.examinedSample(h, *absent);
        p.absent_sample = a.sample;
        p.plain.shallow_m = std::min(a.base_m, deep_m); // overlapping samples: keep it ordered
    } else {
        p.open_ended = true;
        p.plain.shallow_m = found.top_m;
        p.plain.open_shallow = true;
    }
    p.widened = p.plain;
    p.widened.deep_m = std::max(deep_m, model.trueDepthRange(deep_m).deep_m);
}

void placeBase(DatumPick& p, const detail::BiostratIndex& index, std::size_t h,
               const detail::TaxonInHole& t) {
    const Sample& found = index.examinedSample(h, t.counted_positions.back());
    const DepthModel& model = index.holes()[h].depth_model;
    p.found_sample = found.sample;
    p.found_top_m = found.top_m;
    p.found_base_m = found.base_m;
    p.plain.shallow_m = found.top_m;
    p.widened = p.plain;
    if (const auto absent = nextExaminedBeyond(index, h, t.counted_positions.back(), +1)) {
        const Sample& a = index.examinedSample(h, *absent);
        p.absent_sample = a.sample;
        p.plain.deep_m = std::max(a.top_m, found.top_m);
        p.widened.deep_m = std::max(p.plain.deep_m, model.trueDepthRange(a.top_m).deep_m);
    } else {
        // Open below: the last depth known to hold the taxon is the found sample's true base.
        p.open_ended = true;
        p.plain.deep_m = found.base_m;
        p.plain.open_deep = true;
        p.widened.deep_m = std::max(found.base_m, model.trueDepthRange(found.base_m).deep_m);
    }
    p.widened.open_deep = p.plain.open_deep;
}

void quoteDepth(DatumPick& p, PickDepthQuote quote) {
    switch (quote) {
    case PickDepthQuote::SampleTop:
        p.depth_m = p.found_top_m;
        return;
    case PickDepthQuote::SampleBase:
        p.depth_m = p.found_base_m;
        return;
    case PickDepthQuote::Midpoint:
        if (p.open_ended) {
            p.depth_m = p.kind == EventKind::Top ? p.found_top_m : p.found_base_m;
            return;
        }
        p.depth_m = 0.5 * (p.plain.shallow_m + p.plain.deep_m);
        p.half_width_m = 0.5 * p.plain.width_m();
        return;
    }
}

// Outward only: the true end lies beyond the last find, never inside the observed range.
// A base extends from the deepest true depth its found sample may stand for.
void extend(DatumPick& p, const BiostratSettings& s, const DepthModel& model) {
    p.extended = p.widened;
    if (!s.range_extension_confidence)
        return;
    p.extension_fraction = rangeExtensionFraction(p.horizon_count, *s.range_extension_confidence);
    if (!p.extension_fraction) {
        // One horizon: the interval is unbounded (Strauss & Sadler 1989), so the extended
        // bracket is open on its outward side, to the collar or the deepest cored depth.
        p.extension_undefined = true;
        if (p.kind == EventKind::Top) {
            p.extended.shallow_m = 0.0;
            p.extended.open_shallow = true;
        } else {
            double floor_m = p.extended.deep_m;
            for (const CoreRun& r : model.runs())
                floor_m = std::max(floor_m, r.base_m);
            p.extended.deep_m = floor_m;
            p.extended.open_deep = true;
        }
        return;
    }
    const double reach_m = *p.extension_fraction * p.observed_range_m;
    if (p.kind == EventKind::Top)
        p.extended.shallow_m = std::max(0.0, std::min(p.widened.shallow_m, p.found_top_m - reach_m));
    else
        p.extended.deep_m = std::max(
            p.widened.deep_m,
            std::max(p.found_base_m, model.trueDepthRange(p.found_base_m).deep_m) + reach_m);
}

} // namespace

std::vector<DatumPick> pickDatums(const CoreDataset& data, const BiostratSettings& settings) {
    for (const TimeScaleEvent& e : data.events)
        requireUsableEvent(e);
    const detail::BiostratIndex index(data, settings);
    std::vector<DatumPick> out;
    out.reserve(index.holes().size() * data.events.size());
    for (std::size_t h = 0; h < index.holes().size(); ++h) {
        const Hole& hole = *index.holes()[h].hole;
        for (const TimeScaleEvent& e : data.events) {
            DatumPick p;
            p.hole = hole.hole;
            p.event = e.event;
            p.taxon = e.taxon;
            p.kind = e.kind;
            p.age_ma = e.age_ma;
            p.age_sd_ma = e.age_sd_ma;
            p.cuttings_hole = hole.kind == HoleKind::Cuttings;
            const detail::TaxonInHole* t = index.find(h, e.taxon);
            if (t && !t->counted_positions.empty()) {
                p.found = true;
                if (e.kind == EventKind::Top)
                    placeTop(p, index, h, *t);
                else
                    placeBase(p, index, h, *t);
                p.widened_by_recovery = p.widened.deep_m > p.plain.deep_m;
                quoteDepth(p, settings.depth_quote);
                p.horizon_count = detail::countHorizons(index, *t);
                p.observed_range_m =
                    index.examinedSample(h, t->counted_positions.back()).top_m -
                    index.examinedSample(h, t->counted_positions.front()).top_m;
                extend(p, settings, index.holes()[h].depth_model);
                p.unreliable_cuttings_base = p.cuttings_hole && e.kind == EventKind::Base;
            }
            out.push_back(std::move(p));
        }
    }
    markTruncatedPicks(out, loggedSurfaces(data));
    return out;
}

} // namespace atollog
