// Dates of a dataset -> age distributions at depth brackets, and age-model ties. Hand-made
// dataset; the expected values follow from the equations checked in test_uth_age.cpp and
// test_radiocarbon.cpp and from the depth convention checked in test_depth_model.cpp.
#include "atollog/engine/date_ages.hpp"

#include "atollog/engine/radiocarbon.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <stdexcept>

using namespace atollog;
using Catch::WithinAbs;

namespace {

bool hasFlag(const DateAge& d, const std::string& f) {
    return std::find(d.flags.begin(), d.flags.end(), f) != d.flags.end();
}

NumericalDate uthDate(const std::string& sample, double age_yr, double d234u_initial) {
    const UThRatios r = uthRatiosForAge(age_yr, d234u_initial, UThHalfLifeSet::Cheng2013);
    UThMeasurement m;
    m.th230_u238_act = r.th230_u238_act;
    m.th230_u238_act_sd = 0.0003;
    m.u234_u238_act = 1.0 + r.d234u_measured_permil / 1000.0;
    m.u234_u238_act_sd = 0.001;
    NumericalDate d;
    d.hole = "H1";
    d.sample = sample;
    d.method = DateMethod::UTh;
    d.uth = m;
    return d;
}

CoreDataset dataset() {
    CoreDataset data;
    Hole h;
    h.hole = "H1";
    data.holes.push_back(h);
    CoreRun run;
    run.hole = "H1";
    run.run = "H1-R1";
    run.top_m = 10.0;
    run.base_m = 13.0;
    run.recovered_m = 1.8; // 1.2 m lost: a piece logged at 10.5 m may be from 10.5-11.7 m
    data.runs.push_back(run);
    for (auto [id, top] : {std::pair{"S1", 10.5}, {"S2", 11.0}, {"S3", 11.5}, {"S4", 12.5}}) {
        Sample s;
        s.hole = "H1";
        s.sample = id;
        s.top_m = top;
        s.base_m = top;
        data.samples.push_back(s);
    }
    data.dates.push_back(uthDate("S1", 10000.0, 146.8));  // pristine coral
    data.dates.push_back(uthDate("S2", 12000.0, 175.0));  // d234U_i far above seawater
    NumericalDate c14;
    c14.hole = "H1";
    c14.sample = "S3";
    c14.method = DateMethod::C14;
    c14.c14 = C14Measurement{std::exp(-5000.0 / kLibbyMeanLifeYr), 0.002, {}, {}};
    data.dates.push_back(c14);
    NumericalDate ar;
    ar.hole = "H1";
    ar.depth_m = 20.0; // below the cored interval: a point
    ar.method = DateMethod::ArAr;
    ar.age_ma = 1.25;
    ar.age_sd_ma = 0.03;
    data.dates.push_back(ar);
    NumericalDate beyond = uthDate("S4", 10000.0, 146.8);
    beyond.uth->th230_u238_act = 1.3; // more 230Th than any closed system gives
    data.dates.push_back(beyond);
    return data;
}

} // namespace

TEST_CASE("dates of a dataset: U-Th, screen, radiocarbon without curve, as entered",
          "[unit][dates]") {
    const CoreDataset data = dataset();
    DateSettings s;
    const std::vector<DateAge> ages = computeDateAges(data, s);
    REQUIRE(ages.size() == 5);

    const DateAge& coral = ages[0];
    CHECK(coral.date_index == 0);
    CHECK(coral.sample == std::optional<std::string>("S1"));
    CHECK_THAT(coral.shallow_m, WithinAbs(10.5, 1e-9)); // m
    CHECK_THAT(coral.deep_m, WithinAbs(11.7, 1e-9));    // m
    REQUIRE(coral.age_ka);
    CHECK_THAT(*coral.age_ka, WithinAbs(10.0, 0.01)); // ka (MC mean; sd ~ 0.03 ka)
    CHECK(*coral.age_sd_ka > 0.02);
    CHECK(*coral.age_sd_ka < 0.05);
    CHECK_THAT(*coral.uth_age_yr, WithinAbs(10000.0, 0.01));
    CHECK_THAT(*coral.d234u_initial_permil, WithinAbs(146.8, 1e-6));
    CHECK(coral.usable_for_model);
    CHECK(coral.flags.empty());

    const DateAge& altered = ages[1];
    CHECK_THAT(*altered.d234u_initial_permil, WithinAbs(175.0, 1e-6));
    CHECK(hasFlag(altered, date_flag::kD234uOutOfRange));
    CHECK_FALSE(altered.usable_for_model);
    CHECK(altered.age); // still reported
    REQUIRE(altered.messages.size() == 1);
    CHECK_THAT(altered.messages[0], Catch::Contains("175") && Catch::Contains("not used"));

    const DateAge& c14 = ages[2];
    CHECK(hasFlag(c14, date_flag::kNoCalibrationCurve));
    CHECK_FALSE(c14.usable_for_model);
    CHECK_FALSE(c14.age);
    REQUIRE(c14.messages.size() == 1);
    CHECK_THAT(c14.messages[0], Catch::Contains("curve.csv") && Catch::Contains("5000 BP"));
    CHECK_THAT(*c14.cra_yr, WithinAbs(5000.0, 1e-6));

    const DateAge& ar = ages[3];
    CHECK(hasFlag(ar, date_flag::kAsEntered));
    CHECK_THAT(*ar.age_ka, WithinAbs(1250.0, 1e-9));
    CHECK_THAT(*ar.age_sd_ka, WithinAbs(30.0, 1e-9));
    CHECK_THAT(ar.shallow_m, WithinAbs(20.0, 0.0));
    CHECK_THAT(ar.deep_m, WithinAbs(20.0, 0.0));

    const DateAge& beyond = ages[4];
    CHECK(hasFlag(beyond, date_flag::kNoClosedSystemSolution));
    CHECK_FALSE(beyond.age);
    CHECK_FALSE(beyond.usable_for_model);
    CHECK_THAT(dateFlagsText(beyond), Catch::Equals("no_closed_system_solution"));

    const std::vector<AgeTie> ties = ageTiesFromDates(ages);
    REQUIRE(ties.size() == 2);
    CHECK(ties[0].label == "u-th S1");
    CHECK(ties[0].source == AgeTieSource::Date);
    CHECK_THAT(ties[0].deep_m, WithinAbs(11.7, 1e-9));
    CHECK(ties[1].label == "ar-ar 20 m");
}

TEST_CASE("settings: include failed screen, a curve, determinism", "[unit][dates]") {
    CoreDataset data = dataset();
    // Identity curve: the calibrated age is the CRA (analytic, see test_radiocarbon.cpp).
    for (int t = 0; t <= 12000; t += 100) {
        CalibrationPoint p;
        p.cal_bp = t;
        p.c14_bp = t;
        p.sd = 0;
        data.curve.push_back(p);
    }
    DateSettings s;
    s.include_failed_screen = true;
    const std::vector<DateAge> ages = computeDateAges(data, s);
    CHECK(ages[1].usable_for_model);
    CHECK(hasFlag(ages[1], date_flag::kD234uOutOfRange));
    REQUIRE(ages[2].age);
    CHECK(ages[2].usable_for_model);
    CHECK_THAT(*ages[2].age_ka, WithinAbs(5.0, 0.001)); // ka
    CHECK_THAT(*ages[2].age_sd_ka, WithinAbs(8033.0 * 0.002 / std::exp(-5000.0 / 8033.0) / 1e3,
                                             0.0001));
    CHECK(ages[2].hpd_95.size() == 1);

    // A wider tolerance passes the altered coral (28 per mil off).
    s.include_failed_screen = false;
    s.d234u_tolerance_permil = 30.0;
    CHECK(computeDateAges(data, s)[1].usable_for_model);

    // Same seed, same numbers; the row's own stream: dropping another row changes nothing.
    const auto a = computeDateAges(data, s);
    const auto b = computeDateAges(data, s);
    CHECK(*a[0].age_ka == *b[0].age_ka);
    CoreDataset fewer = data;
    fewer.dates.erase(fewer.dates.begin() + 3, fewer.dates.end());
    CHECK(*computeDateAges(fewer, s)[0].age_ka == *a[0].age_ka);
}

TEST_CASE("dates: bad rows and settings are refused with the row named", "[unit][dates]") {
    CoreDataset data = dataset();
    DateSettings s;
    s.mc_draws = 1;
    CHECK_THROWS_AS(computeDateAges(data, s), std::invalid_argument);

    CoreDataset unknown = dataset();
    unknown.dates[0].sample = "NOPE";
    CHECK_THROWS_WITH(computeDateAges(unknown, DateSettings{}),
                      Catch::Contains("dates row 1") && Catch::Contains("NOPE"));

    CoreDataset no_age = dataset();
    no_age.dates[3].age_ma.reset();
    CHECK_THROWS_WITH(computeDateAges(no_age, DateSettings{}), Catch::Contains("dates row 4"));

    CoreDataset bad_sd = dataset();
    bad_sd.dates[0].uth->u234_u238_act_sd = 0.0;
    CHECK_THROWS_WITH(computeDateAges(bad_sd, DateSettings{}), Catch::Contains("dates row 1"));
}

TEST_CASE("tie points from datum picks", "[unit][dates]") {
    TiePoint p;
    p.hole = "H1";
    p.event = "E7";
    p.shallow_m = 44.0;
    p.deep_m = 45.5;
    p.age_ma = 1.93;
    p.age_sd_ma = 0.02;
    p.flags = {"widened_by_recovery"};
    const std::vector<AgeTie> ties = ageTiesFromTiePoints({p});
    REQUIRE(ties.size() == 1);
    CHECK(ties[0].source == AgeTieSource::Datum);
    CHECK(ties[0].label == "E7");
    CHECK_THAT(ties[0].age.mean_ma(), WithinAbs(1.93, 0.0));
    CHECK_THAT(ties[0].age.sd_ma(), WithinAbs(0.02, 0.0));
    CHECK(ties[0].flags == p.flags);
    p.age_sd_ma = 0.0;
    CHECK_THROWS_AS(ageTiesFromTiePoints({p}), std::invalid_argument);
}
