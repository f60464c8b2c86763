// Numerical dates of the invented demo archipelago against the generator's truth: each computed
// U-Th and calibrated radiocarbon age should agree with the sample's true age within about 3 sd;
// the planted altered coral must be caught by the d234U screen. A model-versus-truth check on
// invented data (DEVELOPERS.md: demo data is never the expected value of a published check).
#include "demo_data.hpp"

#include "atollog/engine/date_ages.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <iostream>
#include <map>

using namespace atollog;
using namespace atollog::demo;

namespace {

bool hasFlag(const DateAge& d, const std::string& f) {
    return std::find(d.flags.begin(), d.flags.end(), f) != d.flags.end();
}

} // namespace

TEST_CASE("demo dates agree with the true sample ages", "[demo][dates]") {
    const DemoArchipelago& demo = demoData();
    std::map<std::string, double> true_age_ma;
    for (const TrueSample& s : demo.truth.samples) true_age_ma[s.sample] = s.age_ma;
    std::string altered;
    for (const PlantedFault& f : demo.truth.faults)
        if (f.kind == "altered_coral") altered = f.item;
    REQUIRE(!altered.empty());

    const std::vector<DateAge> ages = computeDateAges(demo.data, DateSettings{});
    REQUIRE(ages.size() == demo.data.dates.size());
    double worst_z = 0;
    std::string worst;
    int uth = 0, c14 = 0, arar = 0, screened_out = 0;
    for (const DateAge& a : ages) {
        INFO("dates row " << a.date_index + 1 << " " << a.sample.value_or("?"));
        REQUIRE(a.sample);
        REQUIRE(true_age_ma.count(*a.sample));
        const double truth_ka = true_age_ma[*a.sample] * 1e3;
        const NumericalDate& d = demo.data.dates[a.date_index];
        if (a.method == DateMethod::ArAr) {
            ++arar;
            REQUIRE(a.age_ka);
            CHECK(*a.age_ka == *d.age_ma * 1e3);
            CHECK(*a.age_sd_ka == *d.age_sd_ma * 1e3);
            CHECK(a.usable_for_model);
            continue;
        }
        if (a.method != DateMethod::UTh && a.method != DateMethod::C14) continue;
        REQUIRE(a.age_ka);
        REQUIRE(a.age_sd_ka);
        CHECK_FALSE(hasFlag(a, date_flag::kNoClosedSystemSolution));
        CHECK_FALSE(hasFlag(a, date_flag::kCalibrationAtCurveEdge));
        if (*a.sample == altered) {
            // The altered coral is the one date expected to miss: it is screened, not compared.
            CHECK(hasFlag(a, date_flag::kD234uOutOfRange));
            CHECK_FALSE(a.usable_for_model);
            ++screened_out;
            continue;
        }
        a.method == DateMethod::UTh ? ++uth : ++c14;
        CHECK_FALSE(hasFlag(a, date_flag::kD234uOutOfRange));
        CHECK(a.usable_for_model);
        const double z = (*a.age_ka - truth_ka) / *a.age_sd_ka;
        CHECK(std::abs(z) < 3.5); // "about 3 sd": 3.5 leaves room for ~40 dates' extremes
        if (std::abs(z) > std::abs(worst_z)) {
            worst_z = z;
            worst = *a.sample + " (" + std::string(toString(a.method)) + ")";
        }
    }
    CHECK(screened_out == 1);
    CHECK(uth > 20);
    CHECK(c14 > 10);
    CHECK(arar > 5);
    std::cout << "demo dates: " << uth << " U-Th, " << c14 << " radiocarbon, " << arar
              << " Ar-Ar; worst z " << worst_z << " at " << worst << "\n";

    // Left out of the models by default, but not lost: it is there with
    // include_failed_screen.
    const auto ties = ageTiesFromDates(ages);
    const auto isAltered = [&](const AgeTie& t) { return t.label == "u-th " + altered; };
    CHECK(std::none_of(ties.begin(), ties.end(), isAltered));
    DateSettings include;
    include.include_failed_screen = true;
    const auto all_ties = ageTiesFromDates(computeDateAges(demo.data, include));
    CHECK(std::count_if(all_ties.begin(), all_ties.end(), isAltered) == 1);
}
