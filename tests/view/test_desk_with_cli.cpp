// The viewer's desk and the command line writing to one project at once lose and tear
// nothing. A child process (fork) logs a fixed number of steps through the desk's intervals
// table (notes typed, every third step undone); meanwhile this process runs `atollog age` with
// a new seed each time, each run reading the project and storing a model run. Neither side may
// fail (SQLite's busy timeout and the store's bounded retry make a writer wait, never give up
// under this load); at the end the file passes PRAGMA integrity_check
// (https://www.sqlite.org/pragma.html#pragma_integrity_check), holds exactly the desk's final
// notes, and every age-model run the command line reported stored is there, whole.
#include "desk_fixture.hpp"
#include "db/child_process.hpp"

#include "view/desk_project.hpp"
#include "view/intervals_table_model.hpp"

#include "atollog/db/age_model_store.hpp"

#include <SQLiteCpp/Database.h>

#include <QUndoStack>

#include <chrono>
#include <thread>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;

namespace {

const std::string kHole = "KAL1";
constexpr int kDeskSteps = 600;

bool isUndoStep(int step) { return step % 3 == 2; }
int rowOfStep(int step, int rows) { return (step * 5) % rows; }
std::string noteOfStep(int step) { return "logged beside the command line, step " + std::to_string(step); }

std::vector<std::string> notesOf(const CoreDataset &data) {
    std::vector<std::string> notes;
    for (const LithInterval &v : data.intervals)
        if (v.hole == kHole) notes.push_back(v.notes);
    return notes;
}

/// The notes after all kDeskSteps steps, from `start`.
std::vector<std::string> finalNotes(std::vector<std::string> notes) {
    std::vector<std::pair<int, std::string>> undo;
    const int rows = static_cast<int>(notes.size());
    for (int step = 0; step < kDeskSteps; ++step) {
        if (isUndoStep(step)) {
            if (!undo.empty()) {
                notes[static_cast<std::size_t>(undo.back().first)] = undo.back().second;
                undo.pop_back();
            }
        } else {
            const int row = rowOfStep(step, rows);
            undo.emplace_back(row, notes[static_cast<std::size_t>(row)]);
            notes[static_cast<std::size_t>(row)] = noteOfStep(step);
        }
    }
    return notes;
}

/// The child: kDeskSteps steps at the desk; any refused or failed step ends it with an error.
void logSteps(const std::filesystem::path &project) {
    DeskProject desk;
    if (!desk.open(QString::fromStdString(project.string())))
        throw std::runtime_error(desk.lastMessage().toStdString());
    IntervalsTableModel intervals(desk);
    intervals.setHole(kHole);
    for (int step = 0; step < kDeskSteps; ++step) {
        if (isUndoStep(step)) {
            if (!desk.undoStack()->canUndo()) throw std::runtime_error("nothing to undo");
            const int before = desk.undoStack()->index();
            desk.undoStack()->undo();
            if (desk.undoStack()->index() != before - 1)
                throw std::runtime_error("undo failed: " + desk.lastMessage().toStdString());
        } else {
            const QModelIndex cell =
                intervals.index(rowOfStep(step, intervals.rowCount()), IntervalsTableModel::Notes);
            if (!intervals.setData(cell, QString::fromStdString(noteOfStep(step))))
                throw std::runtime_error("step " + std::to_string(step) + ": " +
                                         desk.lastMessage().toStdString());
        }
    }
}

int runsOf(const std::filesystem::path &project, const std::string &kind) {
    int n = 0;
    for (const auto &run : db::ProjectStore::open(project).modelRuns()) n += run.kind == kind;
    return n;
}

} // namespace

TEST_CASE("the desk and the command line write to one project at once and lose nothing",
          "[slow][view][desk][concurrent]") {
    DemoCopy copy;
    const std::vector<std::string> start = notesOf(copy.readBack()); // no connection kept
    const int runs_before = runsOf(copy.path(), "age-model");

    atollog::test::ChildProcess desk([&] { logSteps(copy.path()); });
    int cli_runs = 0;
    int runs_while_logging = 0; // started and ended while the desk was still logging
    std::vector<std::string> failures;
    // At least a few runs, and on while the desk is still logging.
    for (int seed = 1; seed <= 4 || (!desk.finished() && seed <= 60); ++seed) {
        const auto r = atollog::test::runAtollog(
            {"age", copy.path().string(), "--hole", "TOR1", "--draws", "300", "--outlier-draws",
             "0", "--seed", std::to_string(seed)});
        if (r.exit_code != 0) failures.push_back(r.err);
        else if (r.out.find("stored the age models as run #") != std::string::npos) ++cli_runs;
        if (!desk.finished()) ++runs_while_logging;
    }
    const int status = desk.wait();
    INFO(desk.message());
    REQUIRE(WIFEXITED(status));
    REQUIRE(WEXITSTATUS(status) == 0); // every desk step was accepted: none lost to a lock
    INFO((failures.empty() ? std::string() : failures.front()));
    REQUIRE(failures.empty());

    {
        SQLite::Database check(copy.path().string(), SQLite::OPEN_READONLY);
        REQUIRE(check.execAndGet("PRAGMA integrity_check").getString() == "ok");
    }
    CHECK(notesOf(copy.readBack()) == finalNotes(start));
    CHECK(runsOf(copy.path(), "age-model") == runs_before + cli_runs);
    // Every stored run is whole: its hole's model with its grid.
    db::ProjectStore store = db::ProjectStore::open(copy.path());
    for (const auto &run : store.modelRuns()) {
        if (run.kind != "age-model") continue;
        const auto models = db::loadAgeModels(store, run.id);
        REQUIRE(models.size() == 1);
        CHECK(models.front().hole == "TOR1");
        CHECK(models.front().points.size() > 10);
    }
    CHECK(cli_runs >= 4);
    CHECK(runs_while_logging >= 2); // the two writers did overlap
    WARN("desk with command line: " << kDeskSteps << " desk steps and " << cli_runs
                                    << " stored age-model runs (" << runs_while_logging
                                    << " of them wholly while the desk logged), nothing lost");
}
