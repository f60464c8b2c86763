#include "draw/panel_validation.hpp"

#include "draw/hole_column_validation.hpp"
#include "draw/metres_text.hpp"

#include <cmath>
#include <set>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace {

[[noreturn]] void fail(const std::string &what) {
    throw std::invalid_argument("correlation panel: " + what);
}

// Item names are passed as functions that build them, and built only when a check fails (a
// panel has a tie level per hole per event: the names cost more than the checks).

void requireFinite(double v, const char *what) {
    if (!std::isfinite(v)) {
        fail(std::string(what) + " is " + std::to_string(v) + "; give a finite number");
    }
}

template <class Name> void requireFinite(double v, const Name &what) {
    if (!std::isfinite(v)) {
        fail(what() + " is " + std::to_string(v) + "; give a finite number");
    }
}

/// The column exists, appears once in this item, and holds the depth span.
template <class Name>
void requireColumn(const PanelInput &in, std::size_t column, std::set<std::size_t> &seen,
                   const Name &item) {
    if (column >= in.columns.size()) {
        fail(item() + " names column " + std::to_string(column) + " but the panel has " +
             std::to_string(in.columns.size()) + " columns (0 to " +
             std::to_string(in.columns.size() - 1) + "); give the index of a drawn column");
    }
    if (!seen.insert(column).second) {
        fail(item() + " is given twice in column " + std::to_string(column) + " (hole '" +
             in.columns[column].hole + "'); give one level per hole");
    }
}

template <class Name>
void requireInHole(const HoleColumnInput &hole, double shallow_m, double deep_m, const Name &item) {
    if (shallow_m < 0.0 || deep_m > hole.drilled_base_m) {
        fail(item() + " spans " + metresText(shallow_m) + " to " + metresText(deep_m) +
             ", outside hole '" + hole.hole + "' (0 m to " + metresText(hole.drilled_base_m) +
             "); correct the depths or the column index");
    }
}

void checkTie(const PanelInput &in, const PanelTie &tie) {
    const auto name = [&tie] { return "tie '" + tie.event + "'"; };
    if (tie.event.empty()) {
        fail("a tie has an empty event id; give each tie the id of its event");
    }
    std::set<std::size_t> seen;
    for (const PanelTie::At &at : tie.at) {
        requireColumn(in, at.column, seen, name);
        const auto where = [&] { return name() + " in hole '" + in.columns[at.column].hole + "'"; };
        requireFinite(at.shallow_m, [&] { return where() + " shallow end"; });
        requireFinite(at.deep_m, [&] { return where() + " deep end"; });
        requireFinite(at.level_m, [&] { return where() + " level"; });
        if (!(at.shallow_m <= at.level_m && at.level_m <= at.deep_m)) {
            fail(where() + ": level " + metresText(at.level_m) + " is not inside its bracket " +
                 metresText(at.shallow_m) + " to " + metresText(at.deep_m) +
                 "; give shallow_m <= level_m <= deep_m");
        }
        requireInHole(in.columns[at.column], at.shallow_m, at.deep_m, where);
    }
}

void checkIsochron(const PanelInput &in, const PanelIsochron &iso) {
    const auto name = [&iso] { return "isochron '" + iso.label + "'"; };
    if (iso.label.empty()) {
        fail("an isochron has an empty label; give each isochron a label, e.g. its age");
    }
    requireFinite(iso.age_ma, [&] { return name() + " age"; });
    std::set<std::size_t> seen;
    for (const PanelIsochron::At &at : iso.at) {
        requireColumn(in, at.column, seen, name);
        const auto where = [&] { return name() + " in hole '" + in.columns[at.column].hole + "'"; };
        requireFinite(at.q025_m, [&] { return where() + " q025"; });
        requireFinite(at.q500_m, [&] { return where() + " q500"; });
        requireFinite(at.q975_m, [&] { return where() + " q975"; });
        if (!(at.q025_m <= at.q500_m && at.q500_m <= at.q975_m)) {
            fail(where() + ": depth quantiles q025 " + metresText(at.q025_m) + ", q500 " +
                 metresText(at.q500_m) + ", q975 " + metresText(at.q975_m) +
                 " are out of order; give q025_m <= q500_m <= q975_m (shallow to deep)");
        }
        requireInHole(in.columns[at.column], at.q025_m, at.q975_m, where);
    }
}

bool namesSomething(const PanelInput &in, const std::string &name) {
    for (const PanelTie &t : in.ties) {
        if (t.event == name) {
            return true;
        }
    }
    for (const PanelIsochron &i : in.isochrons) {
        if (i.label == name) {
            return true;
        }
    }
    return false;
}

void checkView(const PanelInput &in, const PanelView &view) {
    if (!std::isfinite(view.scale_ratio) || view.scale_ratio <= 0.0) {
        fail("vertical scale 1:N needs a positive finite N, got " +
             std::to_string(view.scale_ratio));
    }
    if (!std::isfinite(view.column_gap_mm) || view.column_gap_mm < 0.0) {
        fail("column gap " + std::to_string(view.column_gap_mm) +
             " mm is not a finite width of 0 mm or more; give e.g. 25 mm");
    }
    if (view.window_top_m) {
        requireFinite(*view.window_top_m, "window top");
    }
    if (view.window_base_m) {
        requireFinite(*view.window_base_m, "window base");
    }
    if (view.window_top_m && view.window_base_m && *view.window_base_m <= *view.window_top_m) {
        fail("window " + metresText(*view.window_top_m) + " to " +
             metresText(*view.window_base_m) +
             " is empty; give a window base below its top (axis values grow downward)");
    }
    if (view.flatten_on && !namesSomething(in, *view.flatten_on)) {
        fail("flatten_on '" + *view.flatten_on +
             "' names no tie event and no isochron label of this panel; give one of those, "
             "or leave flatten_on unset");
    }
}

} // namespace

void validatePanelInput(const PanelInput &in, const PanelView &view) {
    validatePanelLinks(in, view);
    for (const HoleColumnInput &c : in.columns) {
        HoleColumnView plain;
        plain.scale_ratio = view.scale_ratio;
        validateHoleColumnInput(c, plain);
    }
}

void validatePanelLinks(const PanelInput &in, const PanelView &view) {
    if (in.columns.empty()) {
        fail("no columns to draw; give at least one hole");
    }
    for (const HoleColumnInput &c : in.columns) {
        requireFinite(c.collar_elev_m,
                      [&c] { return "collar elevation of hole '" + c.hole + "'"; });
        requireFinite(c.drilled_base_m, [&c] { return "drilled base of hole '" + c.hole + "'"; });
        if (c.drilled_base_m <= 0.0) {
            fail("hole '" + c.hole + "' has drilled base " + metresText(c.drilled_base_m) +
                 "; give the total drilled depth, more than 0 m");
        }
    }
    for (const PanelTie &t : in.ties) {
        checkTie(in, t);
    }
    for (const PanelIsochron &i : in.isochrons) {
        checkIsochron(in, i);
    }
    checkView(in, view);
}

} // namespace atollog::draw
