// Units in column names: feet to metres, years and ka to Ma, exactly as decimal conversions.
#include "atollog/db/core_folder.hpp"

#include "folder_fixture.hpp"

#include <catch2/catch.hpp>

using atollog::db::InputError;
using atollog::db::readCoreFolder;
using atollog::testing::TempFolder;
using atollog::testing::writeFolder;

namespace {

const std::string kHoles = "hole,site,kind\nH1,Kalo reef,core\n";

std::string errorOf(const std::filesystem::path& folder) {
    try {
        readCoreFolder(folder);
    } catch (const InputError& e) {
        return e.what();
    }
    FAIL("no InputError");
    return {};
}

} // namespace

TEST_CASE("feet convert to metres exactly (1 ft = 0.3048 m)", "[unit]") {
    // International yard and pound agreement (1959): 1 ft = 0.3048 m exactly, so 100 ft is
    // 30.48 m and 1 ft is 0.3048 m, each the double nearest the exact decimal.
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site,collar_elev_ft\nH1,Kalo reef,10\n"},
                             {"runs.csv", "hole,run,top_ft,base_ft,recovered_ft\n"
                                          "H1,R1,0,100,1\nH1,R2,100,100.5,0.1\n"}});
    const auto d = readCoreFolder(dir.path());
    REQUIRE(d.runs.size() == 2);
    CHECK(d.runs[0].top_m == 0.0);
    CHECK(d.runs[0].base_m == 30.48);
    CHECK(d.runs[0].recovered_m == 0.3048);
    CHECK(d.runs[1].base_m == 30.6324);      // 100.5 * 0.3048 = 30.6324 exactly in decimal
    CHECK(d.runs[1].recovered_m == 0.03048); // 0.1 ft
    CHECK(d.holes[0].collar_elev_m == 3.048);
}

TEST_CASE("ages in yr and ka convert to Ma; sd follows its age's unit", "[unit]") {
    // 1 ka = 1e3 yr, 1 Ma = 1e6 yr (SI prefixes): 125 ka = 0.125 Ma, 2500 yr = 0.0025 Ma.
    TempFolder dir;
    writeFolder(dir.path(),
                {{"holes.csv", kHoles},
                 {"runs.csv", "hole,run,top_m,base_m,recovered_m\nH1,R1,0,10,9\n"},
                 {"dates.csv", "hole,depth_m,method,age_ka,age_sd_ka\nH1,2.5,u-th,125,1.5\n"},
                 {"taxa.csv", "taxon,name,group\nT1,Kaloina,coral\n"},
                 {"events.csv", "event,taxon,kind,age_yr,age_sd_yr\nE1,T1,base,2500,30\n"},
                 {"sealevel.csv", "age_ka,level_ft,level_sd_ft\n120,20,1\n"}});
    const auto d = readCoreFolder(dir.path());
    CHECK(d.dates[0].age_ma == 0.125);
    CHECK(d.dates[0].age_sd_ma == 0.0015);
    CHECK(d.events[0].age_ma == 0.0025);
    CHECK(d.events[0].age_sd_ma == 0.00003);
    CHECK(d.sea_level[0].age_ma == 0.12);
    CHECK(d.sea_level[0].level_m == 6.096); // 20 ft
    CHECK(d.sea_level[0].level_sd_m == 0.3048);
}

TEST_CASE("years of delta_r and of curve.csv stay years", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(),
                {{"holes.csv", kHoles},
                 {"runs.csv", "hole,run,top_m,base_m,recovered_m\nH1,R1,0,10,9\n"},
                 {"dates.csv", "hole,depth_m,method,f14c,f14c_sd,delta_r_yr,delta_r_sd_yr\n"
                               "H1,1,c14,0.8,0.004,-35,40\n"},
                 {"curve.csv", "cal_bp,c14_bp,sd\n1000,1100,15\n1010,1108,16\n"}});
    const auto d = readCoreFolder(dir.path());
    REQUIRE(d.dates[0].c14);
    CHECK(d.dates[0].c14->delta_r_yr == -35.0);
    CHECK(d.dates[0].c14->delta_r_sd_yr == 40.0);
    CHECK(d.curve[1].cal_bp == 1010.0);
    CHECK(d.curve[1].c14_bp == 1108.0);
    CHECK(d.curve[1].sd == 16.0);
}

TEST_CASE("one unit per quantity in a file", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", kHoles},
                             {"runs.csv", "hole,run,top_m,base_ft,recovered_m\nH1,R1,0,10,9\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("runs.csv:1: column base_ft (4)") &&
                                        Catch::Contains("mixed units"));
    writeFolder(dir.path(), {{"runs.csv", "hole,run,top_m,base_m,recovered_m\nH1,R1,0,10,9\n"},
                             {"dates.csv", "hole,depth_m,method,age_ka,age_sd_yr\nH1,1,sr,5,1\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("dates.csv:1: column age_sd_yr (5)") &&
                                        Catch::Contains("age_sd_ka"));
    writeFolder(dir.path(), {{"dates.csv", "hole,depth_m,method,age_ka,age_sd_ka\nH1,1,sr,5,1\n"},
                             {"sealevel.csv", "age_ma,level_m,level_sd_ft\n0.1,-5,1\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("sealevel.csv:1: column level_sd_ft") &&
                                        Catch::Contains("mixed units"));
}

TEST_CASE("numbers: '.' decimal mark, exponents, no NaN/Inf, no text", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site,lat_deg,lon_deg,chain_km\n"
                                           "H1,Kalo,-1.5e1,+170.25,.5\nH2,Tava,-0,1E2,12.\n"}});
    auto d = readCoreFolder(dir.path());
    CHECK(d.holes[0].lat_deg == -15.0);
    CHECK(d.holes[0].lon_deg == 170.25);
    CHECK(d.holes[0].chain_km == 0.5);
    CHECK(d.holes[1].lon_deg == 100.0);
    CHECK(d.holes[1].chain_km == 12.0);

    for (const std::string bad : {"10,5", "1O.5", "12 m", "0x1A", "e5", "1e", "--1", "."}) {
        writeFolder(dir.path(), {{"holes.csv", "hole,site,chain_km\nH1,Kalo,\"" + bad + "\"\n"}});
        CHECK_THAT(errorOf(dir.path()),
                   Catch::Contains("holes.csv:2: column chain_km (3): value '" + bad +
                                   "': not a number; expected a decimal number like 10.5"));
    }
    for (const std::string bad : {"NaN", "nan", "inf", "-Inf", "Infinity"}) {
        writeFolder(dir.path(), {{"holes.csv", "hole,site,chain_km\nH1,Kalo," + bad + "\n"}});
        CHECK_THAT(errorOf(dir.path()), Catch::Contains("NaN and infinity are not allowed"));
    }
    writeFolder(dir.path(), {{"holes.csv", "hole,site,chain_km\nH1,Kalo,1e400\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("out of the range"));
    writeFolder(dir.path(), {{"holes.csv", "hole,site,chain_km\nH1,Kalo, 12\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("spaces around the number"));
}
