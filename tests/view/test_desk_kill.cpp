// A project survives the logging desk being killed in the middle of logging. A child process
// (fork) opens the desk on a copy of the demo project and types notes into KAL1's intervals
// through the intervals table, undoing every third step, reporting each finished step with one
// write(2) to a log. It is killed with SIGKILL at seeded random moments. After each kill the
// file must pass PRAGMA integrity_check (https://www.sqlite.org/pragma.html#pragma_integrity_check),
// open, and hold exactly the state after a whole number of the child's steps: the steps it
// reported, or one more whose commit was done but not yet reported. Nothing else changed.
// Each step is one SQLite transaction, atomic in WAL mode (https://www.sqlite.org/atomiccommit.html).
#include "desk_fixture.hpp"
#include "db/child_process.hpp"

#include "view/desk_project.hpp"
#include "view/intervals_table_model.hpp"

#include <SQLiteCpp/Database.h>

#include <QUndoStack>

#include <fcntl.h>

#include <chrono>
#include <random>
#include <thread>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;

namespace {

constexpr std::uint64_t kSeed = 0xDE5C0C1A55ULL;
constexpr int kKills = 10;
const std::string kHole = "KAL1";

double uniform01(std::mt19937_64 &random) {
    return static_cast<double>(random() >> 11) * 0x1.0p-53;
}

std::vector<std::string> notesOf(const CoreDataset &data) {
    std::vector<std::string> notes;
    for (const LithInterval &v : data.intervals) {
        if (v.hole == kHole) notes.push_back(v.notes);
    }
    return notes;
}

/// The dataset with KAL1's notes blanked: what no step may change.
CoreDataset withoutNotes(CoreDataset data) {
    for (LithInterval &v : data.intervals) {
        if (v.hole == kHole) v.notes.clear();
    }
    return data;
}

bool isUndoStep(int step) { return step % 3 == 2; }
int rowOfStep(int step, int rows) { return (step * 7) % rows; }
std::string noteOfStep(int child, int step) {
    return "desk kill test, child " + std::to_string(child) + ", step " + std::to_string(step);
}

/// The notes after each step of child `child`, from `start`: states[j] after j steps.
std::vector<std::vector<std::string>> expectedStates(const std::vector<std::string> &start,
                                                     int child, int steps) {
    std::vector<std::vector<std::string>> states{start};
    std::vector<std::pair<int, std::string>> undo; // row, notes before
    std::vector<std::string> notes = start;
    const int rows = static_cast<int>(start.size());
    for (int step = 0; step < steps; ++step) {
        if (isUndoStep(step)) {
            if (!undo.empty()) {
                notes[static_cast<std::size_t>(undo.back().first)] = undo.back().second;
                undo.pop_back();
            }
        } else {
            const int row = rowOfStep(step, rows);
            undo.emplace_back(row, notes[static_cast<std::size_t>(row)]);
            notes[static_cast<std::size_t>(row)] = noteOfStep(child, step);
        }
        states.push_back(notes);
    }
    return states;
}

/// The child: logs through the desk's table until it is killed.
void logAtTheDesk(const std::filesystem::path &project, const std::filesystem::path &log,
                  int child) {
    DeskProject desk;
    if (!desk.open(QString::fromStdString(project.string())))
        throw std::runtime_error(desk.lastMessage().toStdString());
    IntervalsTableModel intervals(desk);
    intervals.setHole(kHole);
    const int fd = ::open(log.c_str(), O_WRONLY | O_CREAT | O_TRUNC, 0644);
    if (fd < 0) throw std::runtime_error("cannot open the step log");
    for (int step = 0;; ++step) {
        if (isUndoStep(step)) {
            if (desk.undoStack()->canUndo()) desk.undoStack()->undo();
        } else {
            const QModelIndex cell =
                intervals.index(rowOfStep(step, intervals.rowCount()), IntervalsTableModel::Notes);
            if (!intervals.setData(cell, QString::fromStdString(noteOfStep(child, step))))
                throw std::runtime_error(desk.lastMessage().toStdString());
        }
        const std::string line = std::to_string(step) + "\n";
        if (::write(fd, line.data(), line.size()) != static_cast<ssize_t>(line.size()))
            throw std::runtime_error("cannot write the step log");
    }
}

int reportedSteps(const std::filesystem::path &log) {
    std::ifstream in(log);
    int n = 0, step = 0;
    while (in >> step) ++n;
    return n;
}

} // namespace

TEST_CASE("a project killed while the desk logs holds a whole number of steps",
          "[slow][view][desk]") {
    DemoCopy copy;
    atollog::test::TempDir logs("desk-kill-log");
    const CoreDataset original = copy.readBack();
    const CoreDataset fixed = withoutNotes(original);
    std::mt19937_64 random(kSeed);
    int total_steps = 0;
    int unreported = 0;
    std::string per_kill; // steps reported before each kill
    for (int kill = 0; kill < kKills; ++kill) {
        const std::vector<std::string> start = notesOf(copy.readBack()); // no connection kept
        const auto log = logs / ("steps-" + std::to_string(kill));
        const auto delay =
            std::chrono::microseconds(static_cast<long>(200000 + 500000 * uniform01(random)));
        INFO("seed " << kSeed << ", kill " << kill << " after " << delay.count() << " us");
        atollog::test::ChildProcess child([&] { logAtTheDesk(copy.path(), log, kill); });
        std::this_thread::sleep_for(delay);
        if (child.finished()) {
            FAIL("the child ended by itself: " << child.message());
        }
        child.kill();
        child.wait();

        {
            SQLite::Database check(copy.path().string(), SQLite::OPEN_READONLY);
            REQUIRE(check.execAndGet("PRAGMA integrity_check").getString() == "ok");
        }
        const CoreDataset after = copy.readBack();
        CHECK(withoutNotes(after) == fixed); // no step touched anything else
        const int reported = reportedSteps(log);
        const auto states = expectedStates(start, kill, reported + 1);
        const std::vector<std::string> notes = notesOf(after);
        INFO("reported " << reported << " steps");
        const bool as_reported = notes == states[static_cast<std::size_t>(reported)];
        const bool one_more = notes == states[static_cast<std::size_t>(reported) + 1];
        REQUIRE((as_reported || one_more));
        if (one_more && !as_reported) ++unreported;
        total_steps += reported;
        per_kill += (per_kill.empty() ? "" : " ") + std::to_string(reported);
    }
    // The children got steps done between the kills (opening the desk takes about 0.1 s, a step
    // 2-4 ms on the shared 2-core machine), so kills fell at many points of the stream.
    CHECK(total_steps > 10 * kKills);
    WARN("desk kill test, seed " << kSeed << ": " << kKills << " kills, " << total_steps
                                 << " steps reported, " << unreported
                                 << " kills fell between a commit and its report; steps per kill: "
                                 << per_kill);
}
