#include "draw/hole_column_validation.hpp"
#include "draw/metres_text.hpp"

#include "draw/lithology_words.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <stdexcept>
#include <string>
#include <vector>

namespace atollog::draw {

namespace {

std::string intervalName(const ColumnInterval &iv) {
    char buf[96];
    std::snprintf(buf, sizeof buf, "interval %.3f-%.3f m (%s)", iv.top_m, iv.base_m,
                  std::string(rockWord(iv.rock)).c_str());
    return buf;
}

[[noreturn]] void fail(const HoleColumnInput &in, const std::string &what) {
    throw std::invalid_argument("hole column of hole '" + in.hole + "': " + what);
}

// The item names below are passed as functions that build them, and built only when a check
// fails: on the success path, formatting a name for every interval (two doubles through
// snprintf) was most of the time of checking a long hole.

void requireFinite(const HoleColumnInput &in, double v, const char *what) {
    if (!std::isfinite(v)) {
        fail(in, std::string(what) + " is " + std::to_string(v) + "; give a finite number");
    }
}

template <class Name> void requireFinite(const HoleColumnInput &in, double v, const Name &what) {
    if (!std::isfinite(v)) {
        fail(in, what() + " is " + std::to_string(v) + "; give a finite number");
    }
}

/// A cored or logged span: finite ends, base below top, inside 0..drilled base.
template <class Name>
void requireSpan(const HoleColumnInput &in, double top_m, double base_m, const Name &name) {
    requireFinite(in, top_m, [&] { return name() + " top"; });
    requireFinite(in, base_m, [&] { return name() + " base"; });
    if (base_m <= top_m) {
        fail(in, name() + ": base " + metresText(base_m) + " is not below its top " +
                     metresText(top_m) + "; give base_m deeper than top_m");
    }
    if (top_m < 0.0) {
        fail(in, name() + ": top " + metresText(top_m) +
                     " lies above the collar; depths are metres below the collar, 0 or more");
    }
    if (base_m > in.drilled_base_m) {
        fail(in, name() + ": base " + metresText(base_m) + " lies below the drilled base " +
                     metresText(in.drilled_base_m) + "; correct the depth or the drilled base");
    }
}

} // namespace

void validateHoleColumnInput(const HoleColumnInput &in, const HoleColumnView &view) {
    requireFinite(in, in.collar_elev_m, "collar elevation");
    requireFinite(in, in.drilled_base_m, "drilled base");
    if (in.drilled_base_m <= 0.0) {
        fail(in, "drilled base " + metresText(in.drilled_base_m) +
                     " is not below the collar; give the total drilled depth, more than 0 m");
    }
    if (!std::isfinite(view.scale_ratio) || view.scale_ratio <= 0.0) {
        fail(in, "depth scale 1:N needs a positive N, got " + std::to_string(view.scale_ratio));
    }
    const double window_top = view.window_top_m.value_or(0.0);
    const double window_base = view.window_base_m.value_or(in.drilled_base_m);
    requireFinite(in, window_top, "depth window top");
    requireFinite(in, window_base, "depth window base");
    if (window_base <= window_top) {
        fail(in, "depth window " + metresText(window_top) + " to " + metresText(window_base) +
                     " is empty; give a window base deeper than its top");
    }

    for (const ColumnRun &r : in.runs) {
        const auto name = [&r] { return "run '" + r.id + "'"; };
        requireSpan(in, r.top_m, r.base_m, name);
        requireFinite(in, r.recovered_m, [&] { return name() + " recovered length"; });
        if (r.recovered_m < 0.0) {
            fail(in, name() + ": recovered " + metresText(r.recovered_m) +
                         " is negative; give 0 m for a run that brought nothing back");
        }
        const double cored = r.base_m - r.top_m;
        if (r.recovered_m > cored) {
            fail(in, name() + " " + metresText(r.top_m) + " to " + metresText(r.base_m) +
                         ": recovered " + metresText(r.recovered_m) + " exceeds the cored " +
                         metresText(cored) +
                         "; clamp recovered_m to the cored length before drawing (core "
                         "expansion is not drawn)");
        }
    }

    for (const ColumnInterval &iv : in.intervals) {
        requireSpan(in, iv.top_m, iv.base_m, [&iv] { return intervalName(iv); });
    }
    // Overlaps are looked for in order of top. Logged intervals usually come in that order
    // already, with tops strictly increasing: then the sort below would keep their order, and
    // is skipped. (With two equal tops the sort decides which interval is named first, so it
    // runs.) Sorting pointers keeps the check O(n log n) for long holes.
    const auto top_not_above = [](const ColumnInterval &a, const ColumnInterval &b) {
        return a.top_m >= b.top_m;
    };
    std::vector<const ColumnInterval *> by_top;
    by_top.reserve(in.intervals.size());
    for (const ColumnInterval &iv : in.intervals) {
        by_top.push_back(&iv);
    }
    if (std::adjacent_find(in.intervals.begin(), in.intervals.end(), top_not_above) !=
        in.intervals.end()) {
        std::sort(
            by_top.begin(), by_top.end(),
            [](const ColumnInterval *a, const ColumnInterval *b) { return a->top_m < b->top_m; });
    }
    for (std::size_t i = 1; i < by_top.size(); ++i) {
        const ColumnInterval &upper = *by_top[i - 1];
        const ColumnInterval &lower = *by_top[i];
        if (lower.top_m < upper.base_m) {
            fail(in, intervalName(upper) + " and " + intervalName(lower) + " overlap by " +
                         metresText(upper.base_m - lower.top_m) + "; move the top of the second to " +
                         metresText(upper.base_m) + " or deeper, or the base of the first up");
        }
    }

    for (const ColumnSample &s : in.samples) {
        const auto name = [&s] { return "sample '" + s.id + "'"; };
        requireFinite(in, s.depth_m, [&] { return name() + " depth"; });
        if (s.depth_m < 0.0 || s.depth_m > in.drilled_base_m) {
            fail(in, name() + " at " + metresText(s.depth_m) + " lies outside the hole (0 m to " +
                         metresText(in.drilled_base_m) + "); correct its depth");
        }
    }
}

} // namespace atollog::draw
