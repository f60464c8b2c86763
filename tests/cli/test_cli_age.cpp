// age, rates and subsidence through the command line, on the demo archipelago. Few draws keep
// them quick; the model's accuracy is checked in test_demo_age_model.cpp.
#include "cli_runner.hpp"

#include "atollog/db/age_model_store.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/db/tie_point_store.hpp"

#include <catch2/catch.hpp>

#include <QFile>
#include <QXmlStreamReader>

using atollog::test::runAtollog;
using atollog::test::TempDir;

namespace {
const std::string kDemo = std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago";
std::string firstLine(const std::string& text) { return text.substr(0, text.find('\n')); }
} // namespace

TEST_CASE("age stores each run with its seed and reproduces it bit for bit", "[unit][cli]") {
    TempDir tmp("age");
    const auto p = (tmp / "demo.atollog").string();
    REQUIRE(runAtollog({"import", p, kDemo}).exit_code == 0);
    const std::vector<std::string> args{"age", p, "--hole", "KAL1", "--draws", "400",
                                        "--outlier-draws", "0", "--seed", "11", "--by", "grid", "--csv"};
    const auto r = runAtollog(args);
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    CHECK(firstLine(r.out).find("depth_m,age_q025_ma,age_q500_ma,age_q975_ma,age_mean_ma") !=
          std::string::npos);

    std::int64_t first_run = 0;
    {
        auto store = atollog::db::ProjectStore::open(p);
        const auto run = atollog::db::latestModelRun(store, "age-model");
        REQUIRE(run);
        first_run = run->id;
        CHECK(run->seed == 11u);
        const auto models = atollog::db::loadAgeModels(store, run->id);
        REQUIRE(models.size() == 1);
        CHECK(models[0].hole == "KAL1");
        CHECK(models[0].points.size() > 10);
    }
    // Same seed, same settings, same data: unchanged, not stored again; printed bit for bit.
    const auto again = runAtollog(args);
    CHECK(again.out == r.out);
    CHECK(again.err.find("unchanged since run #" + std::to_string(first_run)) != std::string::npos);
    // Another seed: a new run, with (almost surely) other digits.
    auto other = args;
    other[9] = "12"; // the --seed value
    const auto r12 = runAtollog(other);
    REQUIRE(r12.exit_code == 0);
    CHECK(r12.out != r.out);
}

TEST_CASE("age draws the age-depth plot of one hole", "[unit][cli]") {
    TempDir tmp("age-plot");
    const auto p = (tmp / "demo.atollog").string();
    REQUIRE(runAtollog({"import", p, kDemo}).exit_code == 0);
    const auto svg = (tmp / "kal1-age.svg").string();
    const auto r = runAtollog({"age", p, "--hole", "KAL1", "--draws", "400", "--outlier-draws",
                               "0", "--plot", svg, "--no-store"});
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    QFile file(QString::fromStdString(svg));
    REQUIRE(file.open(QIODevice::ReadOnly));
    QXmlStreamReader xml(&file);
    bool title = false;
    while (!xml.atEnd())
        if (xml.readNext() == QXmlStreamReader::StartElement && xml.name() == u"text" &&
            xml.readElementText(QXmlStreamReader::IncludeChildElements).contains("KAL1"))
            title = true;
    CHECK_FALSE(xml.hasError());
    CHECK(title);
    CHECK(runAtollog({"age", p, "--plot", svg}).exit_code == 2); // --plot needs --hole
}

TEST_CASE("rates and subsidence print their tables", "[unit][cli]") {
    TempDir tmp("rates");
    const auto p = (tmp / "demo.atollog").string();
    REQUIRE(runAtollog({"import", p, kDemo}).exit_code == 0);
    const auto rates = runAtollog({"rates", p, "--hole", "TOR1", "--draws", "400",
                                   "--outlier-draws", "0", "--porosity-law", "0.5,2000", "--csv"});
    INFO(rates.err);
    REQUIRE(rates.exit_code == 0);
    CHECK(firstLine(rates.out).rfind("hole,interval,top_m,base_m,rate_q025_m_per_myr,", 0) == 0);
    CHECK(rates.out.find("package") != std::string::npos);
    const auto badLaw = runAtollog({"rates", p, "--porosity-law", "1.5,2000"});
    CHECK(badLaw.exit_code == 2);
    CHECK(badLaw.err.find("--porosity-law") != std::string::npos);

    const auto sub = runAtollog({"subsidence", p, "--hole", "PEL1", "--draws", "400",
                                 "--outlier-draws", "0", "--plate-age-ma", "60", "--csv"});
    INFO(sub.err);
    REQUIRE(sub.exit_code == 0);
    CHECK(firstLine(sub.out).rfind("hole,sample,depth_m,age_q500_ma,subsidence_q025_m,", 0) == 0);
    const auto perHole = runAtollog({"subsidence", p, "--hole", "PEL1", "--draws", "400",
                                     "--outlier-draws", "0", "--per-hole", "--csv"});
    REQUIRE(perHole.exit_code == 0);
    CHECK(firstLine(perHole.out) == "hole,points,rate_m_per_myr,rate_sd_m_per_myr,mswd,flags");
}
