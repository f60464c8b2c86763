// dates and chain through the command line, on the demo archipelago.
#include "cli_runner.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/db/tie_point_store.hpp"

#include <catch2/catch.hpp>

#include <fstream>

#include <sstream>

using atollog::test::runAtollog;
using atollog::test::TempDir;

namespace {
const std::string kDemo = std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago";
std::string firstLine(const std::string& text) { return text.substr(0, text.find('\n')); }

/// The sample the generator altered, read from cores-demo/truth/faults.csv.
std::string alteredCoralSample() {
    std::ifstream in(std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/truth/faults.csv");
    std::string line;
    while (std::getline(in, line))
        if (line.rfind("altered_coral,", 0) == 0) {
            const auto a = line.find(',', 14); // after "altered_coral,<hole>"
            return line.substr(a + 1, line.find(',', a + 1) - a - 1);
        }
    return "";
}
} // namespace

TEST_CASE("dates prints the documented columns, flags the altered coral, records its seed",
          "[unit][cli]") {
    TempDir tmp("dates");
    const auto p = (tmp / "demo.atollog").string();
    REQUIRE(runAtollog({"import", p, kDemo}).exit_code == 0);
    const auto r = runAtollog({"dates", p, "--csv", "--date-seed", "77"});
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    const std::string header = "," + firstLine(r.out) + ",";
    for (const char* column :
         {"hole", "depth_m", "method", "age_ka", "age_sd_ka", "d234u_initial_permil", "flags"})
        CHECK(header.find(std::string(",") + column + ",") != std::string::npos);
    // The demo's altered coral (cores-demo/truth/faults.csv) fails the d234U screen.
    const std::string altered = alteredCoralSample();
    REQUIRE(!altered.empty());
    CHECK(r.out.find(altered) != std::string::npos);
    CHECK(r.out.find("d234u_out_of_range") != std::string::npos);
    CHECK(r.err.find(altered) != std::string::npos);

    const auto store = atollog::db::ProjectStore::open(p);
    const auto run = atollog::db::latestModelRun(store, "dates");
    REQUIRE(run);
    CHECK(run->seed == 77u);
    CHECK(run->settings.find("dates.half_lives=cheng2013") != std::string::npos);

    // The same seed and data give the same table, bit for bit.
    const auto again = runAtollog({"dates", p, "--csv", "--date-seed", "77", "--no-store"});
    CHECK(again.out == r.out);
    const auto bad = runAtollog({"dates", p, "--half-lives", "cheng1999"});
    CHECK(bad.exit_code == 2);
}

TEST_CASE("chain gives the migration rate with the documented CSV columns", "[unit][cli]") {
    TempDir tmp("chain");
    const auto p = (tmp / "demo.atollog").string();
    REQUIRE(runAtollog({"import", p, kDemo}).exit_code == 0);
    const auto r = runAtollog({"chain", p, "--csv"});
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    CHECK(firstLine(r.out).rfind("rate_mm_per_yr,rate_sd_mm_per_yr,", 0) == 0);
    const std::string header = "," + firstLine(r.out) + ",";
    CHECK(header.find(",intercept_ma,") != std::string::npos);
    CHECK(header.find(",mswd,") != std::string::npos);
    std::istringstream row(r.out.substr(r.out.find('\n') + 1));
    double rate = 0;
    char comma = 0;
    double rate_sd = 0;
    row >> rate >> comma >> rate_sd;
    // The generator moves the plate at 90 km/Myr (cores-demo/README.md): the fit must find it
    // within three of its standard deviations.
    CHECK(std::abs(rate - 90.0) < 3 * rate_sd);

    const auto points = runAtollog({"chain", p, "--points", "--csv"});
    CHECK(firstLine(points.out) == "hole,distance_km,distance_sd_km,basement_age_ma,age_sd_ma");
    const auto bad = runAtollog({"chain", p, "--distance-sd-km", "0"});
    CHECK(bad.exit_code == 2);
}
