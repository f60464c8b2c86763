// The panel layout under hostile input: thousands of seeded random corruptions of a valid panel
// (non-finite, negative, huge and swapped values in every numeric field of every track, ties and
// isochrons; random axes, windows, flattening and scales). Each must either be refused with
// std::invalid_argument or give a display list whose every coordinate is finite: never a crash,
// never a silent NaN on paper.
#include "draw/panel_layout.hpp"
#include "sample_column_tracks.hpp"
#include "sample_panel.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <random>
#include <stdexcept>
#include <variant>

using namespace atollog::draw;

namespace {

class Corrupter {
  public:
    explicit Corrupter(std::uint64_t seed) : rng_(seed) {}

    bool chance(double p) { return std::uniform_real_distribution<double>(0, 1)(rng_) < p; }
    std::size_t below(std::size_t n) { return std::uniform_int_distribution<std::size_t>(0, n - 1)(rng_); }

    /// A hostile replacement for a value: NaN, an infinity, a huge or tiny number, a sign flip,
    /// zero, or a small shift (which may make brackets cross or rows go out of order).
    double hostile(double v) {
        switch (below(8)) {
        case 0: return std::numeric_limits<double>::quiet_NaN();
        case 1: return chance(0.5) ? std::numeric_limits<double>::infinity()
                                   : -std::numeric_limits<double>::infinity();
        case 2: return chance(0.5) ? 1e300 : -1e300;
        case 3: return 1e-300;
        case 4: return -v;
        case 5: return 0.0;
        default: return v + std::uniform_real_distribution<double>(-20.0, 20.0)(rng_);
        }
    }
    void maybe(double &v, double p) {
        if (chance(p)) v = hostile(v);
    }

  private:
    std::mt19937_64 rng_;
};

/// Every number of the input, each corrupted with probability p.
void corrupt(PanelInput &in, Corrupter &c, double p) {
    for (HoleColumnInput &h : in.columns) {
        c.maybe(h.collar_elev_m, p);
        c.maybe(h.drilled_base_m, p);
        for (ColumnRun &r : h.runs) {
            c.maybe(r.top_m, p);
            c.maybe(r.base_m, p);
            c.maybe(r.recovered_m, p);
        }
        for (ColumnInterval &iv : h.intervals) {
            c.maybe(iv.top_m, p);
            c.maybe(iv.base_m, p);
        }
        for (ColumnSample &s : h.samples) c.maybe(s.depth_m, p);
        for (ColumnAgeRow &r : h.age_model.rows) {
            c.maybe(r.depth_m, p);
            c.maybe(r.q025_ma, p);
            c.maybe(r.q500_ma, p);
            c.maybe(r.q975_ma, p);
        }
        for (ColumnTaxonRange &t : h.taxa) {
            for (double &d : t.finds_m) c.maybe(d, p);
            for (double &d : t.reworked_m) c.maybe(d, p);
            for (double &d : t.caved_m) c.maybe(d, p);
        }
        for (ColumnZone &z : h.zones) {
            c.maybe(z.top.shallow_m, p);
            c.maybe(z.top.deep_m, p);
            c.maybe(z.base.shallow_m, p);
            c.maybe(z.base.deep_m, p);
        }
        for (ColumnDate &d : h.dates) {
            c.maybe(d.shallow_m, p);
            c.maybe(d.deep_m, p);
            c.maybe(d.age_ma, p);
            c.maybe(d.age_low_ma, p);
            c.maybe(d.age_high_ma, p);
        }
        if (h.age_track_range_ma && c.chance(p)) {
            h.age_track_range_ma->first = c.hostile(h.age_track_range_ma->first);
        }
    }
    for (PanelTie &t : in.ties) {
        for (PanelTie::At &at : t.at) {
            c.maybe(at.shallow_m, p);
            c.maybe(at.deep_m, p);
            c.maybe(at.level_m, p);
            if (c.chance(p / 4)) at.column = c.below(in.columns.size() + 2); // maybe no such column
        }
    }
    for (PanelIsochron &i : in.isochrons) {
        c.maybe(i.age_ma, p);
        for (PanelIsochron::At &at : i.at) {
            c.maybe(at.q025_m, p);
            c.maybe(at.q500_m, p);
            c.maybe(at.q975_m, p);
        }
    }
}

PanelView randomView(Corrupter &c, const PanelInput &in) {
    PanelView v = test::samplePanelView();
    v.axis = static_cast<PanelAxis>(c.below(3));
    if (c.chance(0.3)) {
        v.flatten_on = c.chance(0.5) && !in.ties.empty() ? in.ties.front().event : "0.125 Ma";
    }
    if (c.chance(0.3)) {
        v.window_top_m = c.hostile(5.0);
        v.window_base_m = c.hostile(30.0);
    }
    if (c.chance(0.2)) v.scale_ratio = c.hostile(500.0);
    if (c.chance(0.2)) v.age_mm_per_myr = c.hostile(100.0);
    if (c.chance(0.2)) v.column_gap_mm = c.hostile(25.0);
    v.depth_unit = c.chance(0.5) ? DepthUnit::Metres : DepthUnit::Feet;
    return v;
}

bool finite(const PointMm &p) { return std::isfinite(p.x_mm) && std::isfinite(p.y_mm); }
bool finite(const RectMm &r) {
    return std::isfinite(r.left_mm) && std::isfinite(r.top_mm) && std::isfinite(r.width_mm) &&
           std::isfinite(r.height_mm);
}

bool allFinite(const DisplayList &list) {
    for (const DisplayItem &item : list.items()) {
        const bool ok = std::visit(
            [](const auto &x) {
                using T = std::decay_t<decltype(x)>;
                if constexpr (std::is_same_v<T, Rect>) return finite(x.box);
                if constexpr (std::is_same_v<T, Line>) return finite(x.from) && finite(x.to);
                if constexpr (std::is_same_v<T, Polyline> || std::is_same_v<T, Polygon>) {
                    for (const PointMm &p : x.points)
                        if (!finite(p)) return false;
                    return true;
                }
                if constexpr (std::is_same_v<T, Text>) return finite(x.anchor_mm);
                if constexpr (std::is_same_v<T, Marker>) return finite(x.centre_mm);
                return true;
            },
            item);
        if (!ok) return false;
    }
    return finite(list.page());
}

} // namespace

TEST_CASE("Hostile panel input is refused or drawn with finite coordinates",
          "[draw][panel][bad-input]") {
    PanelInput base = test::samplePanel();
    // Give every column data tracks and an age model, so every code path has data to corrupt.
    for (HoleColumnInput &h : base.columns) {
        const HoleColumnInput tracks = test::sampleColumnWithTracks();
        h.taxa = tracks.taxa;
        h.zones = tracks.zones;
        h.dates = tracks.dates;
        h.age_model = tracks.age_model;
    }
    const int kCases = 3000;
    int refused = 0, drawn = 0;
    for (int i = 0; i < kCases; ++i) {
        Corrupter c(0xA7011 + static_cast<std::uint64_t>(i));
        PanelInput in = base;
        corrupt(in, c, i < 100 ? 0.0 : (c.chance(0.5) ? 0.002 : 0.03));
        const PanelView view = randomView(c, in);
        INFO("case " << i);
        try {
            const DisplayList list = layoutPanel(in, view);
            ++drawn;
            CHECK(allFinite(list));
        } catch (const std::invalid_argument &e) {
            ++refused;
            CHECK(std::string(e.what()).size() > 20); // a sentence, not a bare code
        }
    }
    // Both outcomes happen: the corruption is neither always harmless nor always fatal.
    CHECK(refused > kCases / 10);
    CHECK(drawn > kCases / 20);
    WARN(drawn << " drawn, " << refused << " refused of " << kCases);
}
