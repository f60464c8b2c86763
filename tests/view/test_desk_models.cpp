// The logging desk's tables on a copy of the demo project: the model tester on both while
// logging, edit -> undo -> redo against the file read back by a fresh connection, refusals
// (the field, the fix, the file untouched), the depth unit, and adding an interval.
#include "desk_fixture.hpp"

#include "view/desk_project.hpp"
#include "view/intervals_table_model.hpp"
#include "view/runs_table_model.hpp"
#include "view/samples_table_model.hpp"

#include <SQLiteCpp/Database.h>

#include <QUndoStack>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;
using Catch::WithinAbs;

namespace {

using RunCol = RunsTableModel::Column;
using IvCol = IntervalsTableModel::Column;
using SampleCol = SamplesTableModel::Column;

struct Desk {
    DemoCopy copy;
    DeskProject project;
    RunsTableModel runs{project};
    IntervalsTableModel intervals{project};
    explicit Desk(const std::string &hole = "KAL1") {
        REQUIRE(project.open(copy.qpath()));
        runs.setHole(hole);
        intervals.setHole(hole);
        REQUIRE(runs.rowCount() > 0);
        REQUIRE(intervals.rowCount() > 0);
    }
    QString runCell(int r, int c) const { return runs.index(r, c).data().toString(); }
    QString ivCell(int r, int c) const { return intervals.index(r, c).data().toString(); }
    bool typeRun(int r, int c, const QString &text) { return runs.setData(runs.index(r, c), text); }
    bool typeIv(int r, int c, const QString &text) {
        return intervals.setData(intervals.index(r, c), text);
    }
};

const CoreRun &runNamed(const CoreDataset &data, const std::string &id) {
    for (const CoreRun &r : data.runs) {
        if (r.run == id) return r;
    }
    FAIL("no run " << id);
    throw std::logic_error("unreachable");
}

std::vector<LithInterval> intervalsOf(const CoreDataset &data, const std::string &hole) {
    std::vector<LithInterval> out;
    for (const LithInterval &v : data.intervals) {
        if (v.hole == hole) out.push_back(v);
    }
    return out;
}

} // namespace

TEST_CASE("both desk tables pass the model tester while logging", "[view][desk]") {
    ModelTesterLog log;
    Desk d;
    QAbstractItemModelTester run_tester(&d.runs,
                                        QAbstractItemModelTester::FailureReportingMode::Warning);
    QAbstractItemModelTester iv_tester(&d.intervals,
                                       QAbstractItemModelTester::FailureReportingMode::Warning);
    CHECK(d.typeRun(0, RunCol::Recovered, QStringLiteral("1.8")));
    CHECK(d.typeIv(0, IvCol::Notes, QStringLiteral("checked at the core table")));
    CHECK_FALSE(d.typeRun(0, RunCol::Recovered, QStringLiteral("-1")));
    CHECK_FALSE(d.typeIv(0, IvCol::Grains, QStringLiteral("lots")));
    d.runs.setDepthUnit(DepthUnit::Foot);
    d.intervals.setDepthUnit(DepthUnit::Foot);
    CHECK(d.intervals.addInterval().isValid());
    d.project.undoStack()->undo(); // the add
    d.project.undoStack()->undo(); // the notes
    d.project.undoStack()->redo();
    d.project.undoStack()->redo();
    d.runs.setHole("TOR1");
    d.intervals.setHole("TOR1");
    d.runs.setHole("NO-SUCH-HOLE");
    CHECK(d.runs.rowCount() == 0);
    INFO(log.messages().join(QLatin1Char('\n')).toStdString());
    CHECK(log.messages().isEmpty());
}

TEST_CASE("an edit, its undo and its redo are what the file holds", "[view][desk]") {
    Desk d;
    const CoreDataset original = d.copy.readBack();
    REQUIRE(d.runCell(0, RunCol::Run) == QLatin1String("KAL1-R01"));
    REQUIRE(d.runCell(0, RunCol::Recovered) == QLatin1String("1.69"));
    // 1.69 / 2.1 m (demo data; the share is simple arithmetic)
    CHECK(d.runCell(0, RunCol::Recovery) == QLatin1String("80.5"));

    REQUIRE(d.typeRun(0, RunCol::Recovered, QStringLiteral("1.8")));
    const CoreDataset edited = d.copy.readBack();
    CHECK(runNamed(edited, "KAL1-R01").recovered_m == 1.8);
    CHECK(d.runCell(0, RunCol::Recovery) == QLatin1String("85.7")); // 1.8 / 2.1 = 85.71 %
    CHECK(d.project.undoStack()->count() == 1);
    CHECK(d.project.undoStack()->undoText() == QLatin1String("recovered_m of run KAL1-R01"));

    d.project.undoStack()->undo();
    CHECK(d.copy.readBack() == original);
    CHECK(d.runCell(0, RunCol::Recovered) == QLatin1String("1.69"));
    CHECK(d.runCell(0, RunCol::Recovery) == QLatin1String("80.5"));

    d.project.undoStack()->redo();
    CHECK(d.copy.readBack() == edited);
    CHECK(d.runCell(0, RunCol::Recovered) == QLatin1String("1.8"));

    SECTION("an interval's texture, through undo and redo twice") {
        REQUIRE(d.ivCell(2, IvCol::Texture) == QLatin1String("grainstone"));
        REQUIRE(d.typeIv(2, IvCol::Texture, QStringLiteral("Packstone"))); // any case
        const CoreDataset textured = d.copy.readBack();
        CHECK(intervalsOf(textured, "KAL1")[2].texture == Texture::Packstone);
        for (int round = 0; round < 2; ++round) {
            d.project.undoStack()->undo();
            CHECK(d.copy.readBack() == edited);
            d.project.undoStack()->redo();
            CHECK(d.copy.readBack() == textured);
        }
        d.project.undoStack()->undo();
        d.project.undoStack()->undo();
        CHECK(d.copy.readBack() == original);
    }
}

TEST_CASE("the suggested texture follows the attributes as they are typed", "[view][desk]") {
    Desk d;
    // KAL1 2.1-2.79 m: grain supported (mud_supported no), 88 % grains, 1 % over 2 mm, no
    // binding. Dunham (1962): grain supported without mud -> grainstone; the folder has no
    // "mud present" column, so the classifier cannot tell grainstone from packstone.
    REQUIRE(d.ivCell(2, IvCol::MudSupported) == QLatin1String("no"));
    const QString before = d.ivCell(2, IvCol::Suggested);
    // Embry & Klovan (1971): more than 10 % of components over 2 mm, grain (clast) supported
    // -> rudstone.
    REQUIRE(d.typeIv(2, IvCol::Coarse, QStringLiteral("40")));
    CHECK(d.ivCell(2, IvCol::Suggested) == QLatin1String("rudstone"));
    // Matrix supported with over 10 % coarse components -> floatstone (Embry & Klovan 1971).
    REQUIRE(d.typeIv(2, IvCol::MudSupported, QStringLiteral("yes")));
    CHECK(d.ivCell(2, IvCol::Suggested) == QLatin1String("floatstone"));
    // Exactly 10 % coarse is not "more than 10 %": mud supported with 88 % grains -> wackestone
    // (Dunham 1962: mud supported, more than 10 % grains).
    REQUIRE(d.typeIv(2, IvCol::Coarse, QStringLiteral("10")));
    CHECK(d.ivCell(2, IvCol::Suggested) == QLatin1String("wackestone"));
    d.project.undoStack()->undo();
    d.project.undoStack()->undo();
    d.project.undoStack()->undo();
    CHECK(d.ivCell(2, IvCol::Suggested) == before);
    CHECK(d.intervals.index(2, IvCol::Suggested).flags().testFlag(Qt::ItemIsEditable) == false);
    CHECK_FALSE(d.intervals.setData(d.intervals.index(2, IvCol::Suggested), QStringLiteral("x")));
}

TEST_CASE("a refused value names the field and the fix and leaves the file as it was",
          "[view][desk]") {
    Desk d;
    const CoreDataset before = d.copy.readBack();
    const std::string main_bytes = fileBytes(d.copy.path());
    const std::string wal_bytes = fileBytes(d.copy.path().string() + "-wal");
    std::vector<QString> signalled;
    QObject::connect(&d.runs, &DeskTableModel::editRefused,
                     [&](const QModelIndex &, const QString &m) { signalled.push_back(m); });

    SECTION("negative recovered length") {
        CHECK_FALSE(d.typeRun(0, RunCol::Recovered, QStringLiteral("-1")));
        const QString message = d.runs.index(0, RunCol::Recovered).data(kCellMessageRole).toString();
        INFO(message.toStdString());
        CHECK(message.contains(QLatin1String("recovered_m")));
        CHECK(message.contains(QLatin1String("negative")));
        CHECK(message.contains(QLatin1String("0 when nothing came up"))); // the fix
        CHECK(message.contains(QLatin1String("KAL1-R01")));
        REQUIRE(signalled.size() == 1);
        CHECK(signalled[0] == message);
        CHECK(d.project.lastWasRefusal());
        CHECK(d.project.lastMessage() == message);
        CHECK(d.runCell(0, RunCol::Recovered) == QLatin1String("1.69")); // still as stored
        CHECK(d.runs.index(0, RunCol::Recovered).data(Qt::ToolTipRole).toString() == message);
    }
    SECTION("base above top") {
        // KAL1 1.1-1.69 m: a base of 1.0 m lies above its top.
        CHECK_FALSE(d.typeIv(1, IvCol::Base, QStringLiteral("1.0")));
        const QString message = d.project.lastMessage();
        INFO(message.toStdString());
        CHECK(message.contains(QLatin1String("base_m")));
        CHECK(message.contains(QLatin1String("above top_m")));
        CHECK(message.contains(QLatin1String("swap them or correct the depth"))); // the fix
        CHECK(d.intervals.index(1, IvCol::Base).data(kCellMessageRole).toString() == message);
    }
    SECTION("an interval overlapping the next one") {
        CHECK_FALSE(d.typeIv(0, IvCol::Base, QStringLiteral("1.3"))); // the next starts at 1.1
        CHECK(d.project.lastMessage().contains(QLatin1String("overlaps")));
    }
    SECTION("text that is no number, and a word not in the vocabulary") {
        CHECK_FALSE(d.typeRun(0, RunCol::Top, QStringLiteral("1O.5")));
        CHECK(signalled.at(0).contains(QLatin1String("Top (m)")));
        CHECK(signalled.at(0).contains(QLatin1String("not a number")));
        CHECK(d.project.lastMessage() == signalled.at(0)); // the desk's message line too
        CHECK_FALSE(d.typeIv(0, IvCol::Rock, QStringLiteral("granite")));
        const QString rock = d.intervals.index(0, IvCol::Rock).data(kCellMessageRole).toString();
        CHECK(rock.contains(QLatin1String("'granite' is not a known word")));
        CHECK(rock.contains(QLatin1String("limestone, dolostone"))); // what to type instead
    }
    CHECK(d.project.undoStack()->count() == 0); // a refused edit never enters the stack
    CHECK(fileBytes(d.copy.path()) == main_bytes);
    CHECK(fileBytes(d.copy.path().string() + "-wal") == wal_bytes);
    CHECK(d.copy.readBack() == before);
    CHECK(integrity(d.copy.path()) == "ok");

    // The next accepted edit clears the cell's message.
    REQUIRE(d.typeRun(0, RunCol::Recovered, QStringLiteral("1.7")));
    CHECK_FALSE(d.runs.index(0, RunCol::Recovered).data(kCellMessageRole).isValid());
}

TEST_CASE("tabbing through a field unchanged writes nothing", "[view][desk]") {
    Desk d;
    d.runs.setDepthUnit(DepthUnit::Foot);
    const QString shown = d.runCell(0, RunCol::Base); // 2.1 m = 6.889763... ft, shown rounded
    REQUIRE(shown == QLatin1String("6.89"));
    CHECK(d.typeRun(0, RunCol::Base, shown));
    CHECK(d.project.undoStack()->count() == 0);
    CHECK(runNamed(d.copy.readBack(), "KAL1-R01").base_m == 2.1); // not 6.89 ft = 2.100072 m
}

TEST_CASE("depths are shown and typed in m or ft and stored in m", "[view][desk][units]") {
    // 1 ft = 0.3048 m exactly: the international yard of 0.9144 m agreed in 1959 by the
    // national standards laboratories of the USA, UK, Canada, Australia, New Zealand and South
    // Africa (US National Bureau of Standards notice "Refinement of values for the yard and the
    // pound", Federal Register, 1 July 1959; date and title from memory).
    CHECK(depthInMetres(1.0, DepthUnit::Foot) == 0.3048);
    CHECK(depthInUnit(0.3048, DepthUnit::Foot) == 1.0);
    CHECK_THAT(depthInMetres(3.0, DepthUnit::Foot), WithinAbs(0.9144, 1e-12)); // the yard, m
    CHECK_THAT(depthInMetres(5280.0, DepthUnit::Foot), WithinAbs(1609.344, 1e-9)); // statute mile
    CHECK_THAT(depthInUnit(30.48, DepthUnit::Foot), WithinAbs(100.0, 1e-12));
    CHECK(depthInUnit(12.5, DepthUnit::Metre) == 12.5);

    Desk d;
    d.runs.setDepthUnit(DepthUnit::Foot);
    d.intervals.setDepthUnit(DepthUnit::Foot);
    CHECK(d.runs.headerData(RunCol::Top, Qt::Horizontal).toString() == QLatin1String("Top (ft)"));
    CHECK(d.intervals.headerData(IvCol::Base, Qt::Horizontal).toString() ==
          QLatin1String("Base (ft)"));
    // KAL1-R01 0-2.1 m, 1.69 m recovered: 2.1 / 0.3048 = 6.8898 ft, 1.69 / 0.3048 = 5.5446 ft.
    CHECK(d.runCell(0, RunCol::Top) == QLatin1String("0"));
    CHECK(d.runCell(0, RunCol::Base) == QLatin1String("6.89"));
    CHECK(d.runCell(0, RunCol::Recovered) == QLatin1String("5.545"));
    CHECK(d.runCell(0, RunCol::Recovery) == QLatin1String("80.5")); // a ratio: no unit
    // Typed in feet, stored in metres: 6 ft = 1.8288 m.
    REQUIRE(d.typeRun(0, RunCol::Recovered, QStringLiteral("6")));
    CHECK_THAT(runNamed(d.copy.readBack(), "KAL1-R01").recovered_m, WithinAbs(1.8288, 1e-12));
    CHECK(d.runCell(0, RunCol::Recovered) == QLatin1String("6"));
    d.runs.setDepthUnit(DepthUnit::Metre);
    CHECK(d.runCell(0, RunCol::Recovered) == QLatin1String("1.829"));
    CHECK(d.runs.headerData(RunCol::Top, Qt::Horizontal).toString() == QLatin1String("Top (m)"));
    // A decimal comma is read as well (typed on a keyboard set up for it).
    REQUIRE(d.typeRun(0, RunCol::Recovered, QStringLiteral("1,75")));
    CHECK(runNamed(d.copy.readBack(), "KAL1-R01").recovered_m == 1.75);
}

TEST_CASE("a new interval continues the log at the base of the deepest one", "[view][desk]") {
    Desk d;
    const int n = d.intervals.rowCount();
    // KAL1's deepest interval is 37.67-37.88 m, which ends the recovered core of its last run
    // KAL1-R17 (36.8-38 m, 1.08 m recovered). Shortened to 37.8 m, the next one starts there
    // and runs to the end of the recovered core (less than the default 0.5 m).
    REQUIRE(d.ivCell(n - 1, IvCol::Base) == QLatin1String("37.88"));
    const bool shortened = d.typeIv(n - 1, IvCol::Base, QStringLiteral("37.8"));
    INFO(d.project.lastMessage().toStdString());
    REQUIRE(shortened);
    const QModelIndex added = d.intervals.addInterval();
    REQUIRE(added.isValid());
    CHECK(added.column() == IvCol::Base); // the field to type next
    CHECK(d.intervals.rowCount() == n + 1);
    CHECK(d.ivCell(added.row(), IvCol::Top) == QLatin1String("37.8"));
    CHECK(d.ivCell(added.row(), IvCol::Base) == QLatin1String("37.88"));
    const auto stored = intervalsOf(d.copy.readBack(), "KAL1");
    REQUIRE(stored.size() == static_cast<std::size_t>(n + 1));
    CHECK(stored.back().top_m == 37.8);
    CHECK(stored.back().base_m == 37.88);
    CHECK(d.project.undoStack()->undoText().startsWith(QLatin1String("add interval 37.8-37.88")));

    // Logged to the end of the recovered core of the last run: the rest of that run is
    // unrecovered, so the interval is accepted with the engine's warning about it.
    const QModelIndex next = d.intervals.addInterval();
    REQUIRE(next.isValid());
    CHECK(d.ivCell(next.row(), IvCol::Top) == QLatin1String("37.88"));
    CHECK(d.ivCell(next.row(), IvCol::Base) == QLatin1String("38")); // the drilled depth
    CHECK_FALSE(d.project.lastWasRefusal());
    CHECK(d.project.lastMessage().contains(QLatin1String("unrecovered")));

    // Now the drilled depth is reached: no interval, and the message says what to do.
    CHECK_FALSE(d.intervals.addInterval().isValid());
    CHECK(d.project.lastWasRefusal());
    CHECK(d.project.lastMessage().contains(QLatin1String("add the next run first")));
    CHECK(d.intervals.rowCount() == n + 2);

    d.project.undoStack()->undo();
    d.project.undoStack()->undo();
    CHECK(d.intervals.rowCount() == n);
}

TEST_CASE("samples are logged through the same desk", "[view][desk]") {
    ModelTesterLog log;
    Desk d;
    SamplesTableModel samples(d.project);
    QAbstractItemModelTester tester(&samples, QAbstractItemModelTester::FailureReportingMode::Warning);
    samples.setHole("KAL1");
    REQUIRE(samples.rowCount() > 0);
    const CoreDataset original = d.copy.readBack();
    const Sample first = samples.sampleAt(0);
    CHECK(samples.headerData(SampleCol::Top, Qt::Horizontal).toString() == QLatin1String("Top (m)"));

    REQUIRE(samples.setData(samples.index(0, SampleCol::Kind), QStringLiteral("barren")));
    CHECK(d.copy.readBack().samples.at(0).kind == "barren");
    // The runs table and the samples table share one undo stack, in the order of the edits.
    REQUIRE(d.typeRun(0, RunCol::Recovered, QStringLiteral("1.8")));
    CHECK(d.project.undoStack()->count() == 2);
    d.project.undoStack()->undo();
    d.project.undoStack()->undo();
    CHECK(d.copy.readBack() == original);
    CHECK(samples.sampleAt(0) == first);

    // A sample below the drilled depth of KAL1 (38 m) lies outside every run: refused.
    CHECK_FALSE(samples.setData(samples.index(0, SampleCol::Top), QStringLiteral("60")));
    const QString message = samples.index(0, SampleCol::Top).data(kCellMessageRole).toString();
    INFO(message.toStdString());
    CHECK(message.startsWith(QLatin1String("samples: ")));
    CHECK(message.contains(QLatin1String("top_m")));
    CHECK(d.copy.readBack() == original);
    CHECK(d.project.undoStack()->count() == 2); // the two undone edits, nothing added
    INFO(log.messages().join(QLatin1Char('\n')).toStdString());
    CHECK(log.messages().isEmpty());
}

TEST_CASE("an edit of a row another writer changed is refused and the table shows theirs",
          "[view][desk]") {
    Desk d;
    REQUIRE(d.runCell(0, RunCol::Recovered) == QLatin1String("1.69"));
    {
        db::ProjectStore other = db::ProjectStore::open(d.copy.path());
        const CoreRun run = other.loadDataset().runs.at(0);
        CoreRun theirs = run;
        theirs.recovered_m = 1.6;
        db::applyEdit(other, db::RowEdit::update(run, theirs));
    }
    // The desk still shows 1.69: it reads the file after its own writes only.
    CHECK_FALSE(d.typeRun(0, RunCol::Recovered, QStringLiteral("1.7")));
    INFO(d.project.lastMessage().toStdString());
    CHECK(d.project.lastWasRefusal());
    CHECK(d.runCell(0, RunCol::Recovered) == QLatin1String("1.6")); // read again after refusal
    CHECK(d.copy.readBack().runs.at(0).recovered_m == 1.6);          // their change kept
    CHECK(d.project.undoStack()->count() == 0);
    REQUIRE(d.typeRun(0, RunCol::Recovered, QStringLiteral("1.7"))); // now from the fresh row
    CHECK(d.copy.readBack().runs.at(0).recovered_m == 1.7);
}
