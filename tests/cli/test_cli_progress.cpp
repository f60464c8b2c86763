// The command line's progress on a terminal: phases as lines, and within an age model the share
// of its blocks done, one line rewritten in place; nothing of it when stderr is not a terminal.
#include "cli/command.hpp"

#include "cli/age_model_run.hpp"
#include "demo_data.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <sstream>

using namespace atollog;

TEST_CASE("steps show whole per cents on one rewritten line, only on a terminal", "[unit][cli]") {
    std::ostringstream out, err;
    const cli::CommandIo quiet{out, err, false};
    CHECK_FALSE(quiet.steps()); // not a terminal: no reporter at all

    const cli::CommandIo terminal{out, err, true};
    const WorkProgress steps = terminal.steps();
    REQUIRE(steps);
    for (std::size_t done = 0; done <= 8; ++done) {
        CHECK(steps(done, 8)); // never stops the work
    }
    CHECK(err.str() == "\ratollog:    0 %\ratollog:   12 %\ratollog:   25 %\ratollog:   37 %"
                       "\ratollog:   50 %\ratollog:   62 %\ratollog:   75 %\ratollog:   87 %"
                       "\ratollog:  100 %\n");
    err.str("");
    const WorkProgress fine = terminal.steps();
    for (std::size_t done = 0; done <= 1000; ++done) fine(done, 1000);
    const std::string lines = err.str();
    CHECK(std::count(lines.begin(), lines.end(), '\r') == 101); // a line per per cent
}

TEST_CASE("an age model run on a terminal reports its blocks through to 100 %", "[unit][cli]") {
    const CoreDataset& data = demo::demoData().data;
    cli::AgeModelOptions options;
    options.draws = 1500;
    options.outlier_draws = 100;
    std::ostringstream out, err;
    const cli::CommandIo terminal{out, err, true};
    const cli::AgeModelRun run = cli::buildAgeModels(data, options, "KAL1", {}, terminal.steps());
    REQUIRE(run.models.size() == 1);
    const std::string shown = err.str();
    INFO(shown);
    CHECK(shown.rfind("\ratollog:    0 %", 0) == 0);
    REQUIRE(shown.size() >= 6);
    CHECK(shown.substr(shown.size() - 6) == "100 %\n");
}
