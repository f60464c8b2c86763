#include "draw/hole_column_track_validation.hpp"

#include "draw/hole_column_data_tracks.hpp"
#include "draw/metres_text.hpp"

#include <cmath>
#include <cstdio>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace {

std::string maText(double v) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.4g Ma", v);
    return buf;
}

[[noreturn]] void fail(const HoleColumnInput &in, const std::string &what) {
    throw std::invalid_argument("hole column of hole '" + in.hole + "': " + what);
}

void requireFinite(const HoleColumnInput &in, double v, const std::string &what) {
    if (!std::isfinite(v)) {
        fail(in, what + " is " + std::to_string(v) + "; give a finite number");
    }
}

void requireInHole(const HoleColumnInput &in, double d, const std::string &what) {
    requireFinite(in, d, what);
    if (d < 0.0 || d > in.drilled_base_m) {
        fail(in, what + " " + metresText(d) + " lies outside the hole (0 m to " +
                     metresText(in.drilled_base_m) + "); correct the depth");
    }
}

void requireBracket(const HoleColumnInput &in, double shallow_m, double deep_m,
                    const std::string &what) {
    requireInHole(in, shallow_m, what + " shallow end");
    requireInHole(in, deep_m, what + " deep end");
    if (deep_m < shallow_m) {
        fail(in, what + ": deep end " + metresText(deep_m) + " lies above the shallow end " +
                     metresText(shallow_m) + "; swap them");
    }
}

void checkTaxa(const HoleColumnInput &in) {
    for (const ColumnTaxonRange &t : in.taxa) {
        if (t.taxon.empty()) {
            fail(in, "a taxon lane has no taxon id; give the id (it keys the lane's items)");
        }
        const std::string name = "taxon '" + t.taxon + "'";
        for (const double d : t.finds_m) {
            requireInHole(in, d, name + " find at");
        }
        for (const double d : t.reworked_m) {
            requireInHole(in, d, name + " reworked find at");
        }
        for (const double d : t.caved_m) {
            requireInHole(in, d, name + " caved find at");
        }
    }
}

void checkZones(const HoleColumnInput &in) {
    for (const ColumnZone &z : in.zones) {
        if (z.zone.empty()) {
            fail(in, "a zone of scheme '" + z.scheme + "' has no name; give its name");
        }
        const std::string name = "zone '" + z.zone + "' (" + z.scheme + ")";
        for (const auto &[edge, word] : {std::pair{&z.top, "top"}, std::pair{&z.base, "base"}}) {
            requireBracket(in, edge->shallow_m, edge->deep_m, name + " " + word + " boundary");
            if (edge->open && edge->deep_m != edge->shallow_m) {
                fail(in, name + " " + word + " boundary is open but spans " +
                             metresText(edge->shallow_m) + " to " + metresText(edge->deep_m) +
                             "; give an open edge one depth (how far the box may reach)");
            }
        }
        if (z.top.shallow_m > z.base.deep_m) {
            fail(in, name + ": its top boundary (from " + metresText(z.top.shallow_m) +
                         ") lies below its base boundary (to " + metresText(z.base.deep_m) +
                         "); the picks are inverted in this hole: leave the zone out here");
        }
    }
}

void checkDates(const HoleColumnInput &in) {
    for (const ColumnDate &d : in.dates) {
        if (d.id.empty()) {
            fail(in, "a date has no id; give one (it keys the date's items)");
        }
        const std::string name = "date '" + d.id + "'";
        requireBracket(in, d.shallow_m, d.deep_m, name + " depth bracket");
        requireFinite(in, d.age_ma, name + " age");
        requireFinite(in, d.age_low_ma, name + " age range young end");
        requireFinite(in, d.age_high_ma, name + " age range old end");
        if (!(d.age_low_ma <= d.age_ma && d.age_ma <= d.age_high_ma)) {
            fail(in, name + ": age " + maText(d.age_ma) + " lies outside its range " +
                         maText(d.age_low_ma) + " to " + maText(d.age_high_ma) +
                         "; give the range young end first, around the age");
        }
    }
}

void checkModel(const HoleColumnInput &in) {
    const auto &rows = in.age_model.rows;
    for (std::size_t i = 0; i < rows.size(); ++i) {
        const ColumnAgeRow &r = rows[i];
        const std::string name = "age model row " + std::to_string(i + 1);
        requireInHole(in, r.depth_m, name + " depth");
        requireFinite(in, r.q025_ma, name + " 2.5 % age");
        requireFinite(in, r.q500_ma, name + " median age");
        requireFinite(in, r.q975_ma, name + " 97.5 % age");
        if (!(r.q025_ma <= r.q500_ma && r.q500_ma <= r.q975_ma)) {
            fail(in, name + " at " + metresText(r.depth_m) + ": ages " + maText(r.q025_ma) +
                         ", " + maText(r.q500_ma) + ", " + maText(r.q975_ma) +
                         " are not in order; give q025 <= q500 <= q975");
        }
        if (i > 0 && r.depth_m < rows[i - 1].depth_m) {
            fail(in, name + " at " + metresText(r.depth_m) + " lies above the row before it (" +
                         metresText(rows[i - 1].depth_m) + "); give the rows by depth, shallow "
                         "first");
        }
        if (i > 1 && r.depth_m == rows[i - 1].depth_m && r.depth_m == rows[i - 2].depth_m) {
            fail(in, name + ": three rows at " + metresText(r.depth_m) +
                         "; a surface has two (the age above it, then below it)");
        }
    }
}

void checkAgeRange(const HoleColumnInput &in) {
    if (!in.age_track_range_ma || !ageTrackShown(in)) {
        return;
    }
    const auto [young, old] = *in.age_track_range_ma;
    requireFinite(in, young, "age track range young end");
    requireFinite(in, old, "age track range old end");
    if (!(old > young)) {
        fail(in, "age track range " + maText(young) + " to " + maText(old) +
                     " is empty; give the young end first, the old end greater");
    }
    // Refuse rather than clip, as the age-depth plot does: a clipped curve would read as data.
    const auto inside = [&](double age, const std::string &what) {
        if (age < young || age > old) {
            fail(in, what + " " + maText(age) + " lies outside the age track range " +
                         maText(young) + " to " + maText(old) +
                         "; widen the range (a panel takes the span of all its columns)");
        }
    };
    if (ageModelShown(in)) {
        for (const ColumnAgeRow &r : in.age_model.rows) {
            inside(r.q025_ma, "age model 2.5 % age at " + metresText(r.depth_m) + ":");
            inside(r.q975_ma, "age model 97.5 % age at " + metresText(r.depth_m) + ":");
        }
    }
    if (datesShown(in)) {
        for (const ColumnDate &d : in.dates) {
            inside(d.age_low_ma, "date '" + d.id + "' range young end");
            inside(d.age_high_ma, "date '" + d.id + "' range old end");
        }
    }
}

} // namespace

void validateHoleColumnDataTracks(const HoleColumnInput &in) {
    checkTaxa(in);
    checkZones(in);
    checkDates(in);
    checkModel(in);
    checkAgeRange(in);
}

} // namespace atollog::draw
